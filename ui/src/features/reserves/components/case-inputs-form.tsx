import { zodResolver } from '@hookform/resolvers/zod';
import { gasPvt } from '@poreline/core';
import { Button, Callout, Flex, Heading, Table, Text } from '@radix-ui/themes';
import { useEffect, useId, useMemo } from 'react';
import { useForm, type FieldError } from 'react-hook-form';
import type { ReservesCase } from '../../../types/reserves';
import { useRunReservesCase } from '../api/run-reserves-case';
import { useUpdateReservesCase } from '../api/update-reserves-case';
import { formatSig } from '../utils/format-volume';
import { INPUT_ORDER, formValuesOf, inputsFormSchema, patchOf, scaleDistributionForm, type InputsFormValues } from '../utils/inputs-form';
import { inputLabel, inputUnit } from '../utils/labels';
import { CorrelationsEditor } from './correlations-editor';
import { DistributionRow } from './distribution-editor';

const ACRES_PER_KM2 = 1e6 / 4046.8564224; // NIST SP 811 acre
const M_PER_FT = 0.3048;

export interface CaseInputsFormProps {
  assetId: string;
  reservesCase: ReservesCase;
  editable: boolean;
  /** Called after a successful run (the page shows the results). */
  onRan?: () => void;
}

function Field({ label, htmlFor, error, children, hint }: { label: string; htmlFor: string; error?: FieldError; children: React.ReactNode; hint?: string }) {
  return (
    <Flex direction="column" gap="1" className="rc-field">
      <Text as="label" htmlFor={htmlFor} size="2" weight="medium">
        {label}
      </Text>
      {children}
      {hint ? (
        <Text size="1" color="gray">
          {hint}
        </Text>
      ) : null}
      {error ? (
        <Text size="1" color="tomato" role="alert">
          {error.message}
        </Text>
      ) : null}
    </Flex>
  );
}

/**
 * Area, fluid and PVT, recovery factor, standard conditions, Monte Carlo settings and one
 * distribution per input. "Save inputs" stores them; "Run" saves unsaved changes first, then
 * runs the deterministic case and the Monte Carlo with the stored seed.
 */
export function CaseInputsForm({ assetId, reservesCase: c, editable, onRan }: CaseInputsFormProps) {
  const id = useId();
  const update = useUpdateReservesCase(assetId, c.id);
  const run = useRunReservesCase(assetId, c.id);
  const {
    register,
    handleSubmit,
    reset,
    watch,
    getValues,
    setValue,
    control,
    formState: { errors, isDirty },
  } = useForm<InputsFormValues>({ resolver: zodResolver(inputsFormSchema), defaultValues: formValuesOf(c.inputs, c.seed) });
  useEffect(() => reset(formValuesOf(c.inputs, c.seed)), [c.id, c.revision, c.inputs, c.seed, reset]);
  const v = watch();
  const pvt = useMemo(() => {
    if (v.fluid !== 'gas') return null;
    try {
      return gasPvt({
        pressurePsia: Number(v.gasPressure),
        temperatureF: Number(v.gasTemperature),
        gasGravity: Number(v.gasGravity),
        zMethod: v.zMethod,
        standard: { pressurePsia: Number(v.stdPressure), temperatureF: Number(v.stdTemperature) },
      });
    } catch (error) {
      return (error as Error).message;
    }
  }, [v.fluid, v.gasPressure, v.gasTemperature, v.gasGravity, v.zMethod, v.stdPressure, v.stdTemperature]);

  const save = handleSubmit((values) => {
    const { inputs, seed } = patchOf(values);
    update.mutate({ inputs, seed });
  });
  const saveAndRun = handleSubmit(async (values) => {
    if (isDirty) {
      const { inputs, seed } = patchOf(values);
      await update.mutateAsync({ inputs, seed });
    }
    await run.mutateAsync(undefined);
    onRan?.();
  });
  const onUnit = (kind: 'area' | 'length', next: string) => {
    if (kind === 'area') {
      const k = next === 'km2' ? 1 / ACRES_PER_KM2 : ACRES_PER_KM2;
      const a = getValues('area');
      if (a.trim() !== '' && Number.isFinite(Number(a))) setValue('area', String(Number((Number(a) * k).toPrecision(10))), { shouldDirty: true });
      setValue('dist.area', scaleDistributionForm(getValues('dist.area'), k), { shouldDirty: true });
    } else {
      const k = next === 'm' ? M_PER_FT : 1 / M_PER_FT;
      setValue('dist.netPay', scaleDistributionForm(getValues('dist.netPay'), k), { shouldDirty: true });
    }
  };

  const final = c.combined?.final;
  const lengthFactor = v.lengthUnit === c.inputs.lengthUnit ? 1 : v.lengthUnit === 'm' ? M_PER_FT : 1 / M_PER_FT;
  const bases = {
    area: v.area.trim() === '' ? null : Number(v.area),
    netPay: final ? final.netPay * lengthFactor : null,
    porosity: final?.porosity ?? null,
    sw: final?.sw ?? null,
    bo: v.fluid === 'oil' ? (v.bo.trim() === '' ? null : Number(v.bo)) : pvt && typeof pvt === 'object' ? pvt.bgRcfPerScf : null,
    recoveryFactor: v.recoveryFactor.trim() === '' ? null : Number(v.recoveryFactor),
  };
  const unitCtx = { fluid: v.fluid, areaUnit: v.areaUnit, lengthUnit: v.lengthUnit };
  const disabled = !editable;
  const error = update.error ?? run.error;

  return (
    <form onSubmit={save} noValidate aria-labelledby={`${id}-h`}>
      <Flex direction="column" gap="4">
        <Heading as="h2" size="4" id={`${id}-h`}>
          Volumetric inputs
        </Heading>
        <div className="rc-input-grid">
          <Field label="Area" htmlFor={`${id}-area`} error={errors.area}>
            <Flex gap="1">
              <input id={`${id}-area`} className="number-input" inputMode="decimal" disabled={disabled} aria-invalid={errors.area ? true : undefined} {...register('area')} />
              <select className="native-select" aria-label="Area unit" disabled={disabled} {...register('areaUnit', { onChange: (e) => onUnit('area', e.target.value) })}>
                <option value="acre">acres</option>
                <option value="km2">km²</option>
              </select>
            </Flex>
          </Field>
          <Field label="Net pay unit" htmlFor={`${id}-lu`} hint={final ? `Combined net pay ${formatSig(final.netPay * lengthFactor)} ${v.lengthUnit}` : undefined}>
            <select id={`${id}-lu`} className="native-select" disabled={disabled} {...register('lengthUnit', { onChange: (e) => onUnit('length', e.target.value) })}>
              <option value="ft">ft</option>
              <option value="m">m</option>
            </select>
          </Field>
          <Field label="Fluid" htmlFor={`${id}-fluid`}>
            <select id={`${id}-fluid`} className="native-select" disabled={disabled} {...register('fluid')}>
              <option value="oil">Oil</option>
              <option value="gas">Gas</option>
            </select>
          </Field>
          {v.fluid === 'oil' ? (
            <Field label="Bo (rb/STB)" htmlFor={`${id}-bo`} error={errors.bo}>
              <input id={`${id}-bo`} className="number-input" inputMode="decimal" disabled={disabled} aria-invalid={errors.bo ? true : undefined} {...register('bo')} />
            </Field>
          ) : (
            <>
              <Field label="Reservoir pressure (psia)" htmlFor={`${id}-gp`} error={errors.gasPressure}>
                <input id={`${id}-gp`} className="number-input" inputMode="decimal" disabled={disabled} {...register('gasPressure')} />
              </Field>
              <Field label="Reservoir temperature (F)" htmlFor={`${id}-gt`} error={errors.gasTemperature}>
                <input id={`${id}-gt`} className="number-input" inputMode="decimal" disabled={disabled} {...register('gasTemperature')} />
              </Field>
              <Field label="Gas gravity (air = 1)" htmlFor={`${id}-gg`} error={errors.gasGravity}>
                <input id={`${id}-gg`} className="number-input" inputMode="decimal" disabled={disabled} {...register('gasGravity')} />
              </Field>
              <Field label="z-factor" htmlFor={`${id}-z`}>
                <select id={`${id}-z`} className="native-select" disabled={disabled} {...register('zMethod')}>
                  <option value="dak">Dranchuk & Abou-Kassem (1975)</option>
                  <option value="hall-yarborough">Hall & Yarborough (1973)</option>
                </select>
              </Field>
            </>
          )}
          <Field label="Recovery factor (v/v)" htmlFor={`${id}-rf`} error={errors.recoveryFactor}>
            <input id={`${id}-rf`} className="number-input" inputMode="decimal" disabled={disabled} aria-invalid={errors.recoveryFactor ? true : undefined} {...register('recoveryFactor')} />
          </Field>
          <Field label="Standard pressure (psia)" htmlFor={`${id}-sp`} error={errors.stdPressure}>
            <input id={`${id}-sp`} className="number-input" inputMode="decimal" disabled={disabled} {...register('stdPressure')} />
          </Field>
          <Field label="Standard temperature (F)" htmlFor={`${id}-st`} error={errors.stdTemperature}>
            <input id={`${id}-st`} className="number-input" inputMode="decimal" disabled={disabled} {...register('stdTemperature')} />
          </Field>
          <Field label="Trials" htmlFor={`${id}-trials`} error={errors.trials}>
            <input id={`${id}-trials`} className="number-input" inputMode="numeric" disabled={disabled} {...register('trials')} />
          </Field>
          <Field label="Seed" htmlFor={`${id}-seed`} error={errors.seed} hint="Stored with the case: the same seed gives the same run.">
            <input id={`${id}-seed`} className="number-input rc-wide-input" inputMode="numeric" disabled={disabled} {...register('seed')} />
          </Field>
        </div>
        {v.fluid === 'gas' ? (
          <Text size="2" className="tabular" role="status" aria-label="Gas PVT">
            {pvt === null ? null : typeof pvt === 'string' ? (
              <Text color="tomato">{pvt}</Text>
            ) : (
              <>
                Sutton (1985): Tpc {formatSig(pvt.tpcR)} R, Ppc {formatSig(pvt.ppcPsia)} psia · Tpr {formatSig(pvt.tpr)}, Ppr {formatSig(pvt.ppr)} · z {pvt.z.toFixed(4)} · Bg{' '}
                {pvt.bgRcfPerScf.toExponential(4)} rcf/scf at {v.stdPressure} psia, {v.stdTemperature} F (T in R = F + 459.67)
              </>
            )}
          </Text>
        ) : null}
        <Heading as="h3" size="3">
          Distributions for Monte Carlo
        </Heading>
        <Text size="1" color="gray">
          Inputs are sampled independently unless correlated below. An input left fixed keeps its deterministic (base) value. P90 is the low value (exceeded with 90 % probability).
        </Text>
        <Table.Root variant="surface" size="1">
          <caption className="visually-hidden">Input distributions</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Input</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Distribution</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Parameters</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Truncate to</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Input P90 / P50 / P10</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {INPUT_ORDER.map((name) => (
              <DistributionRow
                key={name}
                name={name}
                label={inputLabel(name, v.fluid)}
                unit={inputUnit(name, unitCtx)}
                baseValue={bases[name]}
                form={v.dist[name]}
                register={register}
                errors={errors}
                disabled={disabled}
                fixedOnly={name === 'bo' && v.fluid === 'gas'}
              />
            ))}
          </Table.Body>
        </Table.Root>
        <Heading as="h3" size="3">
          Correlated inputs
        </Heading>
        <CorrelationsEditor
          control={control}
          register={register}
          errors={errors}
          uncertain={INPUT_ORDER.filter((n) => v.dist[n].kind !== 'base')}
          labelOf={(n) => inputLabel(n, v.fluid)}
          disabled={disabled}
        />
        {error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        {editable ? (
          <Flex gap="2" align="center" wrap="wrap">
            <Button type="submit" variant="soft" disabled={!isDirty} loading={update.isPending && !run.isPending}>
              Save inputs
            </Button>
            <Button type="button" onClick={() => saveAndRun()} loading={run.isPending}>
              Run
            </Button>
            {run.isPending ? (
              <Text size="2" color="gray" role="status">
                Running {Number(v.trials).toLocaleString('en')} trials…
              </Text>
            ) : isDirty ? (
              <Text size="1" color="gray">
                Unsaved changes: Run saves them first.
              </Text>
            ) : null}
          </Flex>
        ) : null}
      </Flex>
    </form>
  );
}
