import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Dialog, Flex, Text } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { TextFormField } from '../../../components/text-form-field';
import { serverFieldErrors } from '../../../lib/server-field-errors';
import type { UserAccount } from '../../../types/admin';
import { useUpdateUser, type UpdateUserInput } from '../api/update-user';
import { MIN_PASSWORD_LENGTH } from './new-user-form';

const LABELS = { name: 'Name', password: 'New password' } as const;

type Field = keyof typeof LABELS;

const editUserSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the person a name.' }).max(120, { error: 'A name is at most 120 characters.' }),
  password: z.union([
    z.literal(''),
    z
      .string()
      .min(MIN_PASSWORD_LENGTH, { error: `A new password needs at least ${MIN_PASSWORD_LENGTH} characters (or leave it empty).` })
      .max(200, { error: 'A password is at most 200 characters.' }),
  ]),
});

type EditUserValues = z.infer<typeof editUserSchema>;

/**
 * An admin renames an account or resets its password (the admin flag has its own button in the
 * table). Changed fields go in one request, so nothing is half-saved; the service's refusals
 * show under the field they name. After saving, the row says what changed.
 */
export function EditUserDialog({ user }: { user: UserAccount }) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [saved, setSaved] = useState<string | null>(null);
  const update = useUpdateUser();
  const initial: EditUserValues = { name: user.name, password: '' };
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<EditUserValues>({ resolver: zodResolver(editUserSchema), defaultValues: initial });

  const onSubmit = handleSubmit((values) => {
    const input: UpdateUserInput = {
      ...(values.name !== user.name ? { name: values.name } : {}),
      ...(values.password ? { password: values.password } : {}),
    };
    if (!Object.keys(input).length) return setOpen(false);
    update.mutate(
      { userId: user.id, ...input },
      {
        onSuccess: () => {
          setSaved(input.password ? (input.name ? 'Saved; password reset.' : 'Password reset.') : 'Saved.');
          setOpen(false);
        },
        onError: (error) => {
          const { fields } = serverFieldErrors(error, LABELS);
          for (const [field, message] of Object.entries(fields) as [Field, string][]) setError(field, { type: 'server', message });
        },
      },
    );
  });
  const other = update.error ? serverFieldErrors(update.error, LABELS).other : [];

  const field = (name: Field, type: 'text' | 'password', autoComplete: string, hint?: string) => (
    <TextFormField id={`${id}-${name}`} label={LABELS[name]} type={type} autoComplete={autoComplete} error={errors[name]?.message} hint={hint} registration={register(name)} />
  );

  return (
    <Flex direction="column" gap="1" align="start">
      <Dialog.Root
        open={open}
        onOpenChange={(o) => {
          setOpen(o);
          if (o) {
            reset(initial);
            update.reset();
            setSaved(null);
          }
        }}
      >
        <Dialog.Trigger>
          <Button size="1" variant="soft" color="gray" aria-label={`Edit ${user.name}`}>
            Edit
          </Button>
        </Dialog.Trigger>
        <Dialog.Content maxWidth="440px">
          <Dialog.Title>Edit {user.name}</Dialog.Title>
          <Dialog.Description size="2" color="gray">
            <span className="mono">{user.email}</span>. The e-mail stays as it is; the change is recorded in the audit log (a reset shows as a reset, never the password).
          </Dialog.Description>
          <form onSubmit={onSubmit} noValidate aria-label={`Edit ${user.name}`}>
            <Flex direction="column" gap="3" mt="3">
              {other.length ? (
                <Callout.Root color="tomato" size="1" role="alert">
                  <Callout.Text>{other.join(' ')}</Callout.Text>
                </Callout.Root>
              ) : null}
              {field('name', 'text', 'off')}
              {field('password', 'password', 'new-password', `Leave empty to keep the current password. At least ${MIN_PASSWORD_LENGTH} characters; hand it over safely. Their open sessions end.`)}
              <Flex gap="2" justify="end">
                <Dialog.Close>
                  <Button type="button" variant="soft" color="gray">
                    Cancel
                  </Button>
                </Dialog.Close>
                <Button type="submit" loading={update.isPending}>
                  Save user
                </Button>
              </Flex>
            </Flex>
          </form>
        </Dialog.Content>
      </Dialog.Root>
      {saved ? (
        <Text size="1" color="jade" role="status">
          {saved}
        </Text>
      ) : null}
    </Flex>
  );
}
