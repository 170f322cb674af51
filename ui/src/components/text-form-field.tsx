import { Flex, Text, TextField } from '@radix-ui/themes';
import type { UseFormRegisterReturn } from 'react-hook-form';

export interface TextFormFieldProps {
  /** The input's id; the message and hint take it with -error / -hint. */
  id: string;
  label: string;
  type?: 'text' | 'password' | 'email';
  autoComplete?: string;
  /** The field's message (from the form's rules or the service); shown instead of the hint. */
  error?: string;
  hint?: string;
  registration: UseFormRegisterReturn;
}

/** A labelled text box of a react-hook-form form, with its message or hint beneath it. */
export function TextFormField({ id, label, type = 'text', autoComplete, error, hint, registration }: TextFormFieldProps) {
  return (
    <Flex direction="column" gap="1">
      <Text as="label" htmlFor={id} size="2" weight="medium">
        {label}
      </Text>
      <TextField.Root
        id={id}
        type={type}
        autoComplete={autoComplete}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        {...registration}
      />
      {error ? (
        <Text id={`${id}-error`} size="1" color="tomato">
          {error}
        </Text>
      ) : hint ? (
        <Text id={`${id}-hint`} size="1" color="gray">
          {hint}
        </Text>
      ) : null}
    </Flex>
  );
}
