import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Checkbox, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { useCaseCandidates } from '../api/get-case-candidates';
import { useCreateReservesCase } from '../api/create-reserves-case';
import { formatFraction, formatSig } from '../utils/format-volume';

const schema = z.object({
  name: z.string().trim().min(1, { error: 'Give the case a name.' }).max(120, { error: 'A case name is at most 120 characters.' }),
  formationId: z.string().min(1, { error: 'Pick the target formation.' }),
  fluid: z.enum(['oil', 'gas']),
  wellIds: z.array(z.string()).min(1, { error: 'Pick at least one well with an approved interpretation.' }),
});
type Values = z.infer<typeof schema>;

export interface NewCaseFormProps {
  assetId: string;
  formations: readonly { id: string; name: string }[];
}

/**
 * Starts a case: a name, the target formation and the wells whose newest approved
 * interpretation feeds it (their net pay, porosity and Sw for that formation are shown).
 */
export function NewCaseForm({ assetId, formations }: NewCaseFormProps) {
  const id = useId();
  const navigate = useNavigate();
  const create = useCreateReservesCase(assetId);
  const {
    register,
    handleSubmit,
    control,
    watch,
    formState: { errors },
  } = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { name: '', formationId: '', fluid: 'oil', wellIds: [] } });
  const formationId = watch('formationId');
  const candidates = useCaseCandidates(assetId, formationId);

  const onSubmit = handleSubmit((v) =>
    create.mutate(
      { name: v.name, formationId: v.formationId, wellIds: v.wellIds, inputs: { fluid: v.fluid } },
      { onSuccess: (c) => navigate(`/assets/${assetId}/reserves/${c.id}`) },
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={`${id}-title`}>
      <Flex direction="column" gap="3">
        <Heading as="h2" size="3" id={`${id}-title`}>
          New reserves case
        </Heading>
        {create.error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{create.error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        <Flex gap="3" wrap="wrap" align="start">
          <Flex direction="column" gap="1" minWidth="220px" flexGrow="1">
            <Text as="label" htmlFor={`${id}-name`} size="2" weight="medium">
              Case name
            </Text>
            <TextField.Root id={`${id}-name`} aria-invalid={errors.name ? true : undefined} {...register('name')} />
            {errors.name ? (
              <Text size="1" color="tomato">
                {errors.name.message}
              </Text>
            ) : null}
          </Flex>
          <Flex direction="column" gap="1">
            <Text as="label" htmlFor={`${id}-formation`} size="2" weight="medium">
              Target formation
            </Text>
            <select id={`${id}-formation`} className="native-select" aria-invalid={errors.formationId ? true : undefined} {...register('formationId')}>
              <option value="">Choose…</option>
              {formations.map((f) => (
                <option key={f.id} value={f.id}>
                  {f.name}
                </option>
              ))}
            </select>
            {errors.formationId ? (
              <Text size="1" color="tomato">
                {errors.formationId.message}
              </Text>
            ) : null}
          </Flex>
          <Flex direction="column" gap="1">
            <Text as="label" htmlFor={`${id}-fluid`} size="2" weight="medium">
              Fluid
            </Text>
            <select id={`${id}-fluid`} className="native-select" {...register('fluid')}>
              <option value="oil">Oil</option>
              <option value="gas">Gas</option>
            </select>
          </Flex>
        </Flex>
        {formationId ? (
          <fieldset className="rc-fieldset">
            <legend>Approved interpretations with this formation</legend>
            {candidates.isPending ? (
              <Text size="2" color="gray">
                Looking for approved interpretations…
              </Text>
            ) : candidates.isError ? (
              <Text size="2" color="tomato">
                {candidates.error.message}
              </Text>
            ) : candidates.data.length === 0 ? (
              <Text size="2" color="gray">
                No well has an approved interpretation with this formation yet.
              </Text>
            ) : (
              <Controller
                control={control}
                name="wellIds"
                render={({ field }) => (
                  <Flex direction="column" gap="1">
                    {candidates.data.map((c) => (
                      <Text as="label" size="2" key={c.wellId}>
                        <Flex gap="2" align="center">
                          <Checkbox
                            checked={field.value.includes(c.wellId)}
                            onCheckedChange={(on) => field.onChange(on ? [...field.value, c.wellId] : field.value.filter((w) => w !== c.wellId))}
                          />
                          <span>
                            <strong>{c.wellName}</strong> v{c.version}: net pay {formatSig(c.netPay)} {c.depthUnit}, porosity {formatFraction(c.porosity)}, Sw {formatFraction(c.sw)}
                          </span>
                        </Flex>
                      </Text>
                    ))}
                  </Flex>
                )}
              />
            )}
            {errors.wellIds ? (
              <Text size="1" color="tomato">
                {errors.wellIds.message}
              </Text>
            ) : null}
          </fieldset>
        ) : null}
        <Flex>
          <Button type="submit" loading={create.isPending}>
            Create case
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
