import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, Flex, Text, TextArea, TextField } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { Override } from '../../../types/reserves';

const schema = z.object({
  value: z
    .string()
    .trim()
    .min(1, { error: 'Enter the value to use.' })
    .refine((s) => Number.isFinite(Number(s)), { error: 'The value must be a number.' }),
  reason: z.string().trim().min(3, { error: 'Say why the value is overridden (it is recorded).' }).max(1000, { error: 'Keep the reason under 1000 characters.' }),
});
type Values = z.infer<typeof schema>;

export interface OverrideDialogProps {
  /** What is overridden, e.g. "Sw of RC-A". */
  subject: string;
  unit: string;
  /** The value the interpretation (or the combination) gives. */
  computed: number | null;
  current: Override | undefined;
  /** Fractions must lie in [0, 1]. */
  fraction: boolean;
  onSave: (value: number, reason: string) => void;
  onRemove: () => void;
  disabled?: boolean;
}

/** Override one value with a reason; shows who overrode it, when and why. */
export function OverrideDialog({ subject, unit, computed, current, fraction, onSave, onRemove, disabled }: OverrideDialogProps) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { value: current ? String(current.value) : '', reason: current?.reason ?? '' } });
  const submit = handleSubmit((v) => {
    const value = Number(v.value);
    if (fraction && (value < 0 || value > 1)) {
      setError('value', { message: 'A fraction must lie between 0 and 1 (v/v).' });
      return;
    }
    if (!fraction && value < 0) {
      setError('value', { message: 'The value must be 0 or more.' });
      return;
    }
    onSave(value, v.reason.trim());
    setOpen(false);
  });
  return (
    <Dialog.Root
      open={open}
      onOpenChange={(o) => {
        setOpen(o);
        if (o) reset({ value: current ? String(current.value) : '', reason: current?.reason ?? '' });
      }}
    >
      <Dialog.Trigger>
        <Button size="1" variant={current ? 'solid' : 'ghost'} color={current ? 'orange' : 'gray'} disabled={disabled} aria-label={`Override ${subject}`}>
          {current ? 'Overridden' : 'Override'}
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="460px">
        <Dialog.Title>Override {subject}</Dialog.Title>
        <Dialog.Description size="2" color="gray">
          From the source: {computed === null ? 'no value' : `${computed} ${unit}`}. The override and its reason are recorded with your name.
        </Dialog.Description>
        {current ? (
          <Text as="p" size="1" color="gray" mt="2">
            Now {current.value} {unit}, set by {current.byName ?? 'unknown'} on {new Date(current.at).toLocaleString('en')}: “{current.reason}”
          </Text>
        ) : null}
        <form onSubmit={submit} noValidate>
          <Flex direction="column" gap="3" mt="3">
            <Flex direction="column" gap="1">
              <Text as="label" htmlFor={`${id}-value`} size="2" weight="medium">
                Value ({unit})
              </Text>
              <TextField.Root id={`${id}-value`} inputMode="decimal" aria-invalid={errors.value ? true : undefined} {...register('value')} />
              {errors.value ? (
                <Text size="1" color="tomato">
                  {errors.value.message}
                </Text>
              ) : null}
            </Flex>
            <Flex direction="column" gap="1">
              <Text as="label" htmlFor={`${id}-reason`} size="2" weight="medium">
                Reason
              </Text>
              <TextArea id={`${id}-reason`} rows={3} aria-invalid={errors.reason ? true : undefined} {...register('reason')} />
              {errors.reason ? (
                <Text size="1" color="tomato">
                  {errors.reason.message}
                </Text>
              ) : null}
            </Flex>
            <Flex gap="2" justify="end">
              {current ? (
                <Button
                  type="button"
                  variant="soft"
                  color="tomato"
                  onClick={() => {
                    onRemove();
                    setOpen(false);
                  }}
                >
                  Remove override
                </Button>
              ) : null}
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit">Save override</Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
