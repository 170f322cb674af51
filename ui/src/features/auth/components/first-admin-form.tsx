import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { Me } from '../../../types/api';
import { useCreateFirstAdmin } from '../api/create-first-admin';

/** The server's rule for every password (setup and accounts). */
const MIN_PASSWORD_LENGTH = 12;

const firstAdminSchema = z
  .object({
    organisation: z.string().trim().min(1, { error: 'Name your company or team.' }).max(120, { error: 'At most 120 characters.' }),
    name: z.string().trim().min(1, { error: 'Enter your name.' }).max(120, { error: 'At most 120 characters.' }),
    email: z.email({ error: 'Enter your e-mail address.' }),
    password: z.string().min(MIN_PASSWORD_LENGTH, { error: `Use at least ${MIN_PASSWORD_LENGTH} characters.` }).max(200, { error: 'At most 200 characters.' }),
    repeat: z.string(),
  })
  .refine((v) => v.password === v.repeat, { path: ['repeat'], error: 'The two passwords differ.' });

type FirstAdminValues = z.infer<typeof firstAdminSchema>;

type FieldName = keyof FirstAdminValues;

const FIELDS: { name: FieldName; label: string; type: 'text' | 'email' | 'password'; autoComplete: string }[] = [
  { name: 'organisation', label: 'Organisation', type: 'text', autoComplete: 'organization' },
  { name: 'name', label: 'Your name', type: 'text', autoComplete: 'name' },
  { name: 'email', label: 'E-mail', type: 'email', autoComplete: 'username' },
  { name: 'password', label: 'Password', type: 'password', autoComplete: 'new-password' },
  { name: 'repeat', label: 'Repeat password', type: 'password', autoComplete: 'new-password' },
];

export interface FirstAdminFormProps {
  /** Called once the admin exists and their token is stored. */
  onCreated: (user: Me) => void;
}

/** First run of a real deployment: the organisation and its first admin, who is then signed in. */
export function FirstAdminForm({ onCreated }: FirstAdminFormProps) {
  const id = useId();
  const create = useCreateFirstAdmin();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<FirstAdminValues>({
    resolver: zodResolver(firstAdminSchema),
    defaultValues: { organisation: '', name: '', email: '', password: '', repeat: '' },
  });

  const onSubmit = handleSubmit(({ repeat: _repeat, ...values }) => {
    create.mutate({ ...values, organisation: values.organisation.trim(), name: values.name.trim() }, { onSuccess: ({ user }) => onCreated(user) });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Create the first admin">
      <Flex direction="column" gap="4">
        {create.error ? (
          <Callout.Root color="red" role="alert">
            <Callout.Text>{create.error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        {FIELDS.map((f) => (
          <Flex key={f.name} direction="column" gap="1">
            <Text as="label" htmlFor={`${id}-${f.name}`} size="2" weight="medium">
              {f.label}
            </Text>
            <TextField.Root
              id={`${id}-${f.name}`}
              type={f.type}
              autoComplete={f.autoComplete}
              size="3"
              aria-invalid={errors[f.name] ? true : undefined}
              aria-describedby={errors[f.name] ? `${id}-${f.name}-error` : undefined}
              {...register(f.name)}
            />
            {errors[f.name] ? (
              <Text id={`${id}-${f.name}-error`} size="1" color="red">
                {errors[f.name]?.message}
              </Text>
            ) : null}
          </Flex>
        ))}
        <Button type="submit" size="3" loading={create.isPending}>
          Create admin and sign in
        </Button>
      </Flex>
    </form>
  );
}
