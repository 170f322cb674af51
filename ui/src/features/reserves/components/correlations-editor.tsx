import { Button, Flex, Table, Text } from '@radix-ui/themes';
import { useFieldArray, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { InputName } from '../../../types/reserves';
import { INPUT_ORDER, MAX_RANK, type InputsFormValues } from '../utils/inputs-form';

export interface CorrelationsEditorProps {
  control: Control<InputsFormValues>;
  register: UseFormRegister<InputsFormValues>;
  errors: FieldErrors<InputsFormValues>;
  /** Inputs that have a distribution (only they can be correlated). */
  uncertain: readonly InputName[];
  labelOf: (name: InputName) => string;
  disabled: boolean;
}

/**
 * Rank (Spearman) correlations between uncertain inputs: one row per pair, with a number from
 * -0.99 to 0.99. The service draws them through a Gaussian copula; each input keeps its own
 * distribution.
 */
export function CorrelationsEditor({ control, register, errors, uncertain, labelOf, disabled }: CorrelationsEditorProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'correlations' });
  const rowErrors = errors.correlations;
  const canAdd = !disabled && uncertain.length >= 2;
  return (
    <Flex direction="column" gap="2">
      {fields.length ? (
        <Table.Root variant="surface" size="1">
          <caption className="visually-hidden">Rank correlations between inputs</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Input</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Moves with</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Rank correlation</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>
                <span className="visually-hidden">Remove</span>
              </Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {fields.map((f, i) => {
              const e = rowErrors?.[i];
              const message = e?.a?.message ?? e?.b?.message ?? e?.rank?.message;
              return (
                <Table.Row key={f.id}>
                  {(['a', 'b'] as const).map((side) => (
                    <Table.Cell key={side}>
                      <select
                        className="native-select"
                        aria-label={`Correlation ${i + 1}: ${side === 'a' ? 'first' : 'second'} input`}
                        disabled={disabled}
                        aria-invalid={e?.[side] ? true : undefined}
                        {...register(`correlations.${i}.${side}`)}
                      >
                        {INPUT_ORDER.map((n) => (
                          <option key={n} value={n}>
                            {labelOf(n)}
                          </option>
                        ))}
                      </select>
                    </Table.Cell>
                  ))}
                  <Table.Cell>
                    <Flex direction="column" gap="1">
                      <input
                        className="number-input number-input--narrow"
                        aria-label={`Correlation ${i + 1}: rank correlation`}
                        inputMode="decimal"
                        disabled={disabled}
                        aria-invalid={e?.rank ? true : undefined}
                        {...register(`correlations.${i}.rank`)}
                      />
                      {message ? (
                        <Text size="1" color="tomato" role="alert">
                          {message}
                        </Text>
                      ) : null}
                    </Flex>
                  </Table.Cell>
                  <Table.Cell>
                    <Button type="button" size="1" variant="ghost" color="gray" disabled={disabled} aria-label={`Remove correlation ${i + 1}`} onClick={() => remove(i)}>
                      Remove
                    </Button>
                  </Table.Cell>
                </Table.Row>
              );
            })}
          </Table.Body>
        </Table.Root>
      ) : null}
      <Flex gap="3" align="center" wrap="wrap">
        <Button
          type="button"
          size="1"
          variant="soft"
          disabled={!canAdd}
          onClick={() => append({ a: uncertain[0], b: uncertain[1], rank: uncertain.includes('porosity') && uncertain.includes('sw') ? '-0.5' : '0.5' })}
        >
          Add a correlation
        </Button>
        <Text size="1" color="gray">
          {uncertain.length < 2
            ? 'Give two inputs a distribution to correlate them.'
            : `Spearman rank correlation from -${MAX_RANK} to ${MAX_RANK}; negative when one input tends to be low where the other is high (porosity and Sw often are).`}
        </Text>
      </Flex>
    </Flex>
  );
}
