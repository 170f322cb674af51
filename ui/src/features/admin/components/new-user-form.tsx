import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Checkbox, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { useCreateUser } from '../api/create-user';

/** The server's rule: an initial password of at least 12 characters. */
export const MIN_PASSWORD_LENGTH = 12;

const newUserSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the person a name.' }).max(120, { error: 'A name is at most 120 characters.' }),
  email: z.email({ error: 'Enter an e-mail address.' }),
  password: z.string().min(MIN_PASSWORD_LENGTH, { error: `The initial password needs at least ${MIN_PASSWORD_LENGTH} characters.` }).max(200, { error: 'A password is at most 200 characters.' }),
  isAdmin: z.boolean(),
});

type NewUserValues = z.infer<typeof newUserSchema>;

/** Creates an account in the admin's organisation with an initial password to hand over; shows the server's refusal (a taken e-mail). */
export function NewUserForm() {
  const id = useId();
  const createUser = useCreateUser();
  const {
    register,
    control,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm<NewUserValues>({ resolver: zodResolver(newUserSchema), defaultValues: { name: '', email: '', password: '', isAdmin: false } });

  const onSubmit = handleSubmit((values) => {
    createUser.mutate({ ...values, name: values.name.trim() }, { onSuccess: () => reset() });
  });

  const field = (name: 'name' | 'email' | 'password', label: string, type: 'text' | 'email' | 'password', autoComplete: string) => (
    <Flex direction="column" gap="1" flexGrow="1" minWidth="180px">
      <Text as="label" htmlFor={`${id}-${name}`} size="2" weight="medium">
        {label}
      </Text>
      <TextField.Root
        id={`${id}-${name}`}
        type={type}
        autoComplete={autoComplete}
        aria-invalid={errors[name] ? true : undefined}
        aria-describedby={errors[name] ? `${id}-${name}-error` : undefined}
        {...register(name)}
      />
      {errors[name] ? (
        <Text id={`${id}-${name}-error`} size="1" color="tomato">
          {errors[name].message}
        </Text>
      ) : null}
    </Flex>
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={`${id}-title`}>
      <Flex direction="column" gap="3">
        <Heading as="h3" size="3" id={`${id}-title`}>
          New user
        </Heading>
        {createUser.error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{createUser.error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        {createUser.isSuccess ? (
          <Text size="1" color="jade" role="status">
            Account for {createUser.data.email} created. Hand over the initial password safely; add them to assets below.
          </Text>
        ) : null}
        <Flex gap="3" wrap="wrap" align="start">
          {field('name', 'Name', 'text', 'off')}
          {field('email', 'E-mail', 'email', 'off')}
          {field('password', 'Initial password', 'password', 'new-password')}
        </Flex>
        <Flex gap="4" align="center" justify="between" wrap="wrap">
          <Text as="label" size="2">
            <Flex gap="2" align="center">
              <Controller control={control} name="isAdmin" render={({ field: f }) => <Checkbox checked={f.value} onCheckedChange={(v) => f.onChange(v === true)} />} />
              Organisation admin (sees every asset, manages people)
            </Flex>
          </Text>
          <Button type="submit" loading={createUser.isPending}>
            Create account
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
