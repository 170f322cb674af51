import { Flex, Table, Text } from '@radix-ui/themes';
import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import type { InputName } from '../../../types/reserves';
import { KIND_LABELS, PARAMETERS, distributionPercentiles, lognormalBothForms, type DistributionForm, type DistributionKind } from '../utils/distribution-form';
import { formatSig } from '../utils/format-volume';
import type { InputsFormValues } from '../utils/inputs-form';

export interface DistributionRowProps {
  name: InputName;
  label: string;
  unit: string;
  /** The deterministic value the input holds when it has no distribution. */
  baseValue: number | null;
  form: DistributionForm;
  register: UseFormRegister<InputsFormValues>;
  errors: FieldErrors<InputsFormValues>;
  disabled: boolean;
  /** Kinds not offered (a gas case's Bg has none). */
  fixedOnly?: boolean;
}

const KINDS = Object.keys(KIND_LABELS) as DistributionKind[];

/**
 * One input's distribution: kind, parameters and optional truncation, with the input's own
 * P90 / P50 / P10 (P90 = its 10th percentile) and, for a lognormal, both parameter forms.
 */
export function DistributionRow({ name, label, unit, baseValue, form, register, errors, disabled, fixedOnly }: DistributionRowProps) {
  const params = PARAMETERS[form.kind];
  const e = errors.dist?.[name];
  const pct = distributionPercentiles(form);
  const ln = lognormalBothForms(form);
  const field = (k: 'a' | 'b' | 'c', i: number) => (
    <Flex direction="column" gap="1" key={k}>
      <input
        className="number-input number-input--narrow"
        aria-label={`${label} ${params[i]}`}
        placeholder={params[i]}
        inputMode="decimal"
        disabled={disabled}
        aria-invalid={e?.[k] ? true : undefined}
        {...register(`dist.${name}.${k}`)}
      />
    </Flex>
  );
  const messages = e ? Object.values(e).map((x) => (x as { message?: string })?.message).filter(Boolean) : [];
  return (
    <Table.Row data-input={name}>
      <Table.RowHeaderCell>
        <Text weight="medium">{label}</Text>
        <Text as="div" size="1" color="gray">
          {unit} · base {formatSig(baseValue)}
        </Text>
      </Table.RowHeaderCell>
      <Table.Cell>
        <select className="native-select" aria-label={`${label} distribution`} disabled={disabled || fixedOnly} {...register(`dist.${name}.kind`)}>
          {KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </Table.Cell>
      <Table.Cell>
        <Flex gap="1" wrap="wrap">
          {(['a', 'b', 'c'] as const).slice(0, params.length).map((k, i) => field(k, i))}
        </Flex>
      </Table.Cell>
      <Table.Cell>
        {form.kind === 'base' ? null : (
          <Flex gap="1">
            <input className="number-input number-input--narrow" aria-label={`${label} truncate min`} placeholder="min" inputMode="decimal" disabled={disabled} {...register(`dist.${name}.truncMin`)} />
            <input className="number-input number-input--narrow" aria-label={`${label} truncate max`} placeholder="max" inputMode="decimal" disabled={disabled} {...register(`dist.${name}.truncMax`)} />
          </Flex>
        )}
      </Table.Cell>
      <Table.Cell>
        {pct ? (
          <Text size="1" className="tabular">
            P90 {formatSig(pct.p90)} · P50 {formatSig(pct.p50)} · P10 {formatSig(pct.p10)}
          </Text>
        ) : null}
        {ln ? (
          <Text as="div" size="1" color="gray" className="tabular">
            {form.kind === 'lognormal-moments' ? `as P90/P10: ${formatSig(ln.p90)} / ${formatSig(ln.p10)}` : `as mean/SD: ${formatSig(ln.mean)} / ${formatSig(ln.sd)}`} · μ {formatSig(ln.mu)}, σ {formatSig(ln.sigma)}
          </Text>
        ) : null}
        {messages.map((m) => (
          <Text as="div" size="1" color="tomato" key={m}>
            {m}
          </Text>
        ))}
      </Table.Cell>
    </Table.Row>
  );
}
