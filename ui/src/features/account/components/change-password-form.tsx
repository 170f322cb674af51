import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Heading, Text } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { TextFormField } from '../../../components/text-form-field';
import { serverFieldErrors } from '../../../lib/server-field-errors';
import { useChangePassword } from '../api/change-password';

/** The service's rule for every account password. */
const MIN_PASSWORD_LENGTH = 12;

const LABELS = { currentPassword: 'Current password', newPassword: 'New password', confirmPassword: 'New password again' } as const;

type Field = keyof typeof LABELS;

const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, { error: 'Enter your current password.' }),
    newPassword: z
      .string()
      .min(MIN_PASSWORD_LENGTH, { error: `The new password needs at least ${MIN_PASSWORD_LENGTH} characters.` })
      .max(200, { error: 'A password is at most 200 characters.' }),
    confirmPassword: z.string(),
  })
  .refine((v) => v.confirmPassword === v.newPassword, { path: ['confirmPassword'], error: 'The two new passwords differ; type the same one twice.' })
  .refine((v) => !v.currentPassword || v.newPassword !== v.currentPassword, { path: ['newPassword'], error: 'The new password must differ from the current one.' });

type ChangePasswordValues = z.infer<typeof changePasswordSchema>;

const EMPTY: ChangePasswordValues = { currentPassword: '', newPassword: '', confirmPassword: '' };

/**
 * The signed-in user changes their own password. The service checks the current one; its
 * refusals show under the field they name. Other sessions end; this one stays signed in.
 */
export function ChangePasswordForm() {
  const id = useId();
  const change = useChangePassword();
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<ChangePasswordValues>({ resolver: zodResolver(changePasswordSchema), defaultValues: EMPTY });

  const onSubmit = handleSubmit(({ currentPassword, newPassword }) => {
    change.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => reset(EMPTY),
        onError: (error) => {
          const { fields } = serverFieldErrors(error, LABELS);
          for (const [field, message] of Object.entries(fields) as [Field, string][]) setError(field, { type: 'server', message });
        },
      },
    );
  });
  const other = change.error ? serverFieldErrors(change.error, LABELS).other : [];

  const field = (name: Field, autoComplete: string, hint?: string) => (
    <TextFormField id={`${id}-${name}`} label={LABELS[name]} type="password" autoComplete={autoComplete} error={errors[name]?.message} hint={hint} registration={register(name)} />
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={`${id}-title`}>
      <Flex direction="column" gap="3" maxWidth="380px">
        <Heading as="h2" size="4" id={`${id}-title`}>
          Change password
        </Heading>
        {other.length ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{other.join(' ')}</Callout.Text>
          </Callout.Root>
        ) : null}
        {change.isSuccess ? (
          <Text size="1" color="jade" role="status">
            Password changed. Other sessions with the old password are signed out; this one stays signed in.
          </Text>
        ) : null}
        {field('currentPassword', 'current-password')}
        {field('newPassword', 'new-password', `At least ${MIN_PASSWORD_LENGTH} characters.`)}
        {field('confirmPassword', 'new-password')}
        <Flex justify="end">
          <Button type="submit" loading={change.isPending}>
            Change password
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
