import { zodResolver } from '@hookform/resolvers/zod';
import { Badge, Button, Callout, Flex, Heading, Text } from '@radix-ui/themes';
import { useEffect, useId, useState, type ReactNode } from 'react';
import { useForm, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import {
  FIELD_LABELS,
  LITHOLOGY_LABELS,
  POROSITY_METHOD_LABELS,
  SW_MODEL_LABELS,
  VSH_METHOD_LABELS,
  toFormValues,
  toZoneParameters,
  zoneParamsSchema,
  type ZoneParametersJson,
  type ZoneParamsFormValues,
} from '../utils/zone-params-form';

export interface ZoneParamsFormProps {
  zoneName: string;
  depthUnit: string;
  params: ZoneParametersJson;
  isDefault: boolean;
  canEdit: boolean;
  /** Starting parameters for a lithology (core's defaultZoneParameters). */
  defaultsFor: (lithology: keyof typeof LITHOLOGY_LABELS) => ZoneParametersJson;
  onSave: (params: ZoneParametersJson) => Promise<unknown>;
  /** The formation's lithology: the first choice of "Defaults for". */
  lithology?: string;
}

/**
 * Evaluation parameters of one zone: shale volume, porosity, temperature and Rw, saturation,
 * permeability. Checked with zod before sending (each message names the field); the server
 * checks again with core and its message is shown as it comes.
 */
export function ZoneParamsForm({ zoneName, depthUnit, params, isDefault, canEdit, defaultsFor, onSave, lithology: formationLithology }: ZoneParamsFormProps) {
  const form = useForm<ZoneParamsFormValues>({
    resolver: zodResolver(zoneParamsSchema) as never,
    defaultValues: toFormValues(params),
    mode: 'onBlur',
  });
  const { register, handleSubmit, watch, reset, formState } = form;
  const errors = formState.errors;
  const [serverError, setServerError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [lithology, setLithology] = useState<keyof typeof LITHOLOGY_LABELS>(
    formationLithology && formationLithology in LITHOLOGY_LABELS ? (formationLithology as keyof typeof LITHOLOGY_LABELS) : 'sandstone',
  );
  useEffect(() => reset(toFormValues(params)), [params, reset]);

  const v = watch();
  const sonic = v.porosityMethod?.startsWith('sonic');
  const unitT = `°${v.temperatureUnit}`;

  const submit = handleSubmit(async (values) => {
    setServerError(null);
    setSaved(false);
    try {
      await onSave(toZoneParameters(values, params));
      setSaved(true);
    } catch (e) {
      setServerError(e instanceof Error ? e.message : String(e));
    }
  });

  const field = (name: keyof ZoneParamsFormValues, unit?: string, hint?: string) => (
    <NumberField name={name} unit={unit} hint={hint} register={register} errors={errors} disabled={!canEdit} />
  );

  return (
    <form onSubmit={submit} noValidate aria-label={`Parameters of ${zoneName}`} className="zp-form">
      <Flex direction="column" gap="4">
        <Flex align="center" gap="3" wrap="wrap" justify="between">
          <Flex align="center" gap="2">
            <Heading as="h3" size="3">
              {zoneName}
            </Heading>
            {isDefault ? (
              <Badge color="gray" variant="soft">
                defaults, not stored yet
              </Badge>
            ) : null}
          </Flex>
          {canEdit ? (
            <Flex align="center" gap="2">
              <label className="zp-inline-label" htmlFor={`lith-${zoneName}`}>
                Defaults for
              </label>
              <select id={`lith-${zoneName}`} className="native-select" value={lithology} onChange={(e) => setLithology(e.currentTarget.value as typeof lithology)}>
                {Object.entries(LITHOLOGY_LABELS).map(([k, label]) => (
                  <option key={k} value={k}>
                    {label}
                  </option>
                ))}
              </select>
              <Button type="button" variant="soft" size="1" onClick={() => reset(toFormValues(defaultsFor(lithology)), { keepDefaultValues: true })}>
                Fill defaults
              </Button>
            </Flex>
          ) : null}
        </Flex>

        <Section title="Shale volume">
          <SelectField name="vshMethod" label="Vsh method" options={VSH_METHOD_LABELS} register={register} disabled={!canEdit} />
          <SelectField name="grPick" label="GR clean and shale" options={{ percentile: 'Percentiles of the zone', fixed: 'Fixed values' }} register={register} disabled={!canEdit} />
          {v.grPick === 'fixed' ? (
            <>
              {field('grClean', 'gAPI')}
              {field('grShale', 'gAPI')}
            </>
          ) : (
            <>
              {field('grCleanPercentile', '%')}
              {field('grShalePercentile', '%')}
            </>
          )}
        </Section>

        <Section title="Porosity">
          <SelectField name="porosityMethod" label="Porosity method" options={POROSITY_METHOD_LABELS} register={register} disabled={!canEdit} />
          {sonic ? (
            <>
              {field('dtMatrix', 'us/ft')}
              {field('dtFluid', 'us/ft')}
              {field('sonicCompaction', '', 'Wyllie only; 1 = none')}
            </>
          ) : (
            <>
              {field('rhoMatrix', 'g/cm3')}
              {field('rhoFluid', 'g/cm3')}
            </>
          )}
          {field('phiShale', 'v/v', 'PHIE = PHIT − Vsh × this')}
          {field('phiMax', 'v/v')}
        </Section>

        <Section title="Temperature and Rw">
          <SelectField name="temperatureUnit" label="Temperature unit" options={{ F: '°F', C: '°C' }} register={register} disabled={!canEdit} />
          <SelectField
            name="temperatureKind"
            label="Formation temperature"
            options={{ gradient: 'Surface + gradient', bht: 'From a bottom-hole temperature', constant: 'One value for the zone' }}
            register={register}
            disabled={!canEdit}
          />
          {v.temperatureKind === 'gradient' ? (
            <>
              {field('surfaceTemperature', unitT)}
              {field('gradientPer100', `${unitT}/100 ${depthUnit}`)}
            </>
          ) : v.temperatureKind === 'bht' ? (
            <>
              {field('surfaceTemperature', unitT)}
              {field('bht', unitT)}
              {field('bhtDepth', depthUnit)}
            </>
          ) : (
            field('constantTemperature', unitT)
          )}
          <SelectField
            name="rwKind"
            label="Rw source"
            options={{ at_temperature: 'Given at a temperature', ssp: 'From the SP', pickett: 'Pickett fit on a water zone' }}
            register={register}
            disabled={!canEdit}
          />
          {v.rwKind === 'at_temperature' ? (
            <>
              {field('rw', 'ohm.m')}
              {field('rwTemperature', unitT)}
            </>
          ) : v.rwKind === 'ssp' ? (
            <>
              {field('ssp', 'mV', 'empty: picked from the SP curve')}
              {field('rmf', 'ohm.m')}
              {field('rmfTemperature', unitT)}
            </>
          ) : (
            <>
              {field('pickettTop', depthUnit)}
              {field('pickettBase', depthUnit)}
              <label className="zp-check">
                <input type="checkbox" {...register('pickettFitM')} disabled={!canEdit} /> use the fitted m
              </label>
            </>
          )}
        </Section>

        <Section title="Saturation">
          <SelectField name="swModel" label="Sw model" options={SW_MODEL_LABELS} register={register} disabled={!canEdit} />
          {field('a')}
          {field('m')}
          {field('n')}
          {v.swModel !== 'archie' ? field('rsh', 'ohm.m') : null}
        </Section>

        <Section title="Permeability">
          <SelectField
            name="permMethod"
            label="Permeability transform"
            options={{ none: 'None', timur: 'Timur', coates: 'Coates' }}
            register={register}
            disabled={!canEdit}
          />
          {v.permMethod !== 'none' ? field('swIrr', 'v/v', 'empty: each sample’s Sw') : null}
        </Section>

        {serverError ? (
          <Callout.Root color="tomato" role="alert">
            <Callout.Text>The server refused the parameters: {serverError}</Callout.Text>
          </Callout.Root>
        ) : null}
        {canEdit ? (
          <Flex gap="3" align="center">
            <Button type="submit" loading={formState.isSubmitting}>
              Save parameters
            </Button>
            {saved && !formState.isDirty ? (
              <Text size="2" color="green" role="status">
                Stored; the curves were recomputed.
              </Text>
            ) : null}
          </Flex>
        ) : null}
      </Flex>
    </form>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="zp-section">
      <legend>{title}</legend>
      <div className="zp-grid">{children}</div>
    </fieldset>
  );
}

interface FieldProps {
  name: keyof ZoneParamsFormValues;
  register: UseFormRegister<ZoneParamsFormValues>;
  disabled?: boolean;
}

function NumberField({ name, unit, hint, register, errors, disabled }: FieldProps & { unit?: string; hint?: string; errors: FieldErrors<ZoneParamsFormValues> }) {
  const id = useId();
  const error = errors[name]?.message as string | undefined;
  const label = FIELD_LABELS[name] ?? name;
  return (
    <div className="zp-field">
      <label htmlFor={id}>
        {label}
        {unit ? <span className="zp-unit"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        className="number-input"
        inputMode="decimal"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        disabled={disabled}
        {...register(name)}
      />
      {hint ? <span className="zp-hint">{hint}</span> : null}
      {error ? (
        <span id={`${id}-error`} className="zp-error" role="alert">
          {error}
        </span>
      ) : null}
    </div>
  );
}

function SelectField({ name, label, options, register, disabled }: FieldProps & { label: string; options: Record<string, string> }) {
  const id = useId();
  return (
    <div className="zp-field">
      <label htmlFor={id}>{label}</label>
      <select id={id} className="native-select" disabled={disabled} {...register(name)}>
        {Object.entries(options).map(([k, text]) => (
          <option key={k} value={k}>
            {text}
          </option>
        ))}
      </select>
    </div>
  );
}
