import { Flex, Text } from '@radix-ui/themes';
import type { FieldErrors, FieldValues, Path, UseFormRegister } from 'react-hook-form';

export interface NumberFieldGridProps<V extends FieldValues> {
  /** Prefix of the inputs' ids (useId of the form). */
  idPrefix: string;
  fields: readonly { key: Path<V> & keyof V; label: string }[];
  register: UseFormRegister<V>;
  errors: FieldErrors<V>;
}

/** The inputs of a calculator form: one labelled number box per field, its message beneath. */
export function NumberFieldGrid<V extends FieldValues>({ idPrefix, fields, register, errors }: NumberFieldGridProps<V>) {
  return (
    <div className="rc-input-grid">
      {fields.map((f) => {
        const message = errors[f.key]?.message;
        return (
          <Flex direction="column" gap="1" key={String(f.key)} className="rc-field">
            <Text as="label" htmlFor={`${idPrefix}-${String(f.key)}`} size="2" weight="medium">
              {f.label}
            </Text>
            <input id={`${idPrefix}-${String(f.key)}`} className="number-input" inputMode="decimal" aria-invalid={message ? true : undefined} {...register(f.key)} />
            {typeof message === 'string' ? (
              <Text size="1" color="tomato">
                {message}
              </Text>
            ) : null}
          </Flex>
        );
      })}
    </div>
  );
}
