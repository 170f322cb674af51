import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { Me } from '../../../types/api';
import { useLogin } from '../api/login';

const signInSchema = z.object({
  email: z.email({ error: 'Enter the email address you were invited with.' }),
  password: z.string().min(1, { error: 'Enter your password.' }),
});

type SignInValues = z.infer<typeof signInSchema>;

export interface SignInFormProps {
  /** Called once the token is stored. */
  onSignedIn: (user: Me) => void;
}

/** Email and password form; shows the server's own message when sign-in is refused. */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const id = useId();
  const login = useLogin();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<SignInValues>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit((values) => {
    login.mutate(values, { onSuccess: ({ user }) => onSignedIn(user) });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Sign in">
      <Flex direction="column" gap="4">
        {login.error ? (
          <Callout.Root color="red" role="alert">
            <Callout.Text>{login.error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        <Flex direction="column" gap="1">
          <Text as="label" htmlFor={`${id}-email`} size="2" weight="medium">
            Email
          </Text>
          <TextField.Root
            id={`${id}-email`}
            type="email"
            autoComplete="username"
            size="3"
            aria-invalid={errors.email ? true : undefined}
            aria-describedby={errors.email ? `${id}-email-error` : undefined}
            {...register('email')}
          />
          {errors.email ? (
            <Text id={`${id}-email-error`} size="1" color="red">
              {errors.email.message}
            </Text>
          ) : null}
        </Flex>
        <Flex direction="column" gap="1">
          <Text as="label" htmlFor={`${id}-password`} size="2" weight="medium">
            Password
          </Text>
          <TextField.Root
            id={`${id}-password`}
            type="password"
            autoComplete="current-password"
            size="3"
            aria-invalid={errors.password ? true : undefined}
            aria-describedby={errors.password ? `${id}-password-error` : undefined}
            {...register('password')}
          />
          {errors.password ? (
            <Text id={`${id}-password-error`} size="1" color="red">
              {errors.password.message}
            </Text>
          ) : null}
        </Flex>
        <Button type="submit" size="3" loading={login.isPending}>
          Sign in
        </Button>
      </Flex>
    </form>
  );
}
