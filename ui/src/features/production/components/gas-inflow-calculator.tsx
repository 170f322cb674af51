import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Heading, Table, Text } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { GasInputs } from '../../../types/reserves';
import { useGasInflow } from '../api/post-gas-inflow';
import { sig } from '../utils/axes';
import { optionalNumberText, positiveText } from '../utils/number-text';
import { NumberFieldGrid } from './number-field-grid';

const number = (label: string) =>
  z
    .string()
    .trim()
    .min(1, { error: `${label} is required.` })
    .refine((s) => Number.isFinite(Number(s)), { error: `${label} must be a number.` });

const schema = z
  .object({
    permeabilityMd: positiveText('Permeability'),
    netPayFt: positiveText('Net pay'),
    viscosityCp: positiveText('Gas viscosity'),
    reservoirPressurePsia: positiveText('Reservoir pressure'),
    bottomholePressurePsia: number('Bottom-hole pressure').refine((s) => Number(s) >= 0, { error: 'Bottom-hole pressure must be a number >= 0.' }),
    temperatureF: number('Reservoir temperature'),
    gasGravity: number('Gas gravity').refine((s) => Number(s) >= 0.55 && Number(s) <= 1.8, { error: 'Gas gravity must be between 0.55 and 1.8 (Sutton 1985 range).' }),
    drainageRadiusFt: positiveText('Drainage radius'),
    wellboreRadiusFt: positiveText('Wellbore radius'),
    skin: optionalNumberText('Skin'),
  })
  .refine((v) => Number(v.bottomholePressurePsia) <= Number(v.reservoirPressurePsia), {
    path: ['bottomholePressurePsia'],
    error: 'Bottom-hole pressure must not exceed the reservoir pressure (the well would inject).',
  });
type Values = z.infer<typeof schema>;

const FIELDS: { key: keyof Values; label: string }[] = [
  { key: 'permeabilityMd', label: 'Permeability k (md)' },
  { key: 'netPayFt', label: 'Net pay h (ft)' },
  { key: 'reservoirPressurePsia', label: 'Average reservoir pressure pr (psia)' },
  { key: 'bottomholePressurePsia', label: 'Flowing bottom-hole pressure pwf (psia)' },
  { key: 'temperatureF', label: 'Reservoir temperature (F)' },
  { key: 'gasGravity', label: 'Gas gravity (air = 1)' },
  { key: 'viscosityCp', label: 'Gas viscosity at the average pressure (cp)' },
  { key: 'drainageRadiusFt', label: 'Drainage radius re (ft)' },
  { key: 'wellboreRadiusFt', label: 'Wellbore radius rw (ft)' },
  { key: 'skin', label: 'Skin s' },
];

export interface GasInflowCalculatorProps {
  assetId: string;
  /** Start values from the case: net pay in ft and its gas PVT inputs. */
  netPayFt?: number | null;
  gas?: GasInputs | null;
}

/**
 * Rate to expect from a gas well: pseudo-steady-state radial inflow in the pressure-squared
 * form, z at the average pressure from the gas gravity (the case's z method), and the
 * absolute open flow.
 */
export function GasInflowCalculator({ assetId, netPayFt, gas }: GasInflowCalculatorProps) {
  const id = useId();
  const inflow = useGasInflow(assetId);
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: {
      permeabilityMd: '5',
      netPayFt: netPayFt ? String(Number(netPayFt.toPrecision(4))) : '30',
      viscosityCp: '0.018',
      reservoirPressurePsia: gas ? String(gas.pressurePsia) : '2000',
      bottomholePressurePsia: gas ? String(Math.round(gas.pressurePsia * 0.6)) : '1200',
      temperatureF: gas ? String(gas.temperatureF) : '180',
      gasGravity: gas ? String(gas.gasGravity) : '0.65',
      drainageRadiusFt: '1490',
      wellboreRadiusFt: '0.328',
      skin: '0',
    },
  });
  const submit = handleSubmit((v) => {
    const n = (s: string) => Number(s);
    inflow.mutate({
      permeabilityMd: n(v.permeabilityMd),
      netPayFt: n(v.netPayFt),
      viscosityCp: n(v.viscosityCp),
      reservoirPressurePsia: n(v.reservoirPressurePsia),
      bottomholePressurePsia: n(v.bottomholePressurePsia),
      temperatureF: n(v.temperatureF),
      gasGravity: n(v.gasGravity),
      zMethod: gas?.zMethod ?? 'dak',
      drainageRadiusFt: n(v.drainageRadiusFt),
      wellboreRadiusFt: n(v.wellboreRadiusFt),
      skin: v.skin === '' ? 0 : n(v.skin),
    });
  });
  const r = inflow.data;
  return (
    <Flex direction="column" gap="4">
      <Heading as="h2" size="4">
        Gas inflow estimate
      </Heading>
      <form onSubmit={submit} noValidate aria-label="Gas inflow inputs">
        <Flex direction="column" gap="3">
          <NumberFieldGrid idPrefix={id} fields={FIELDS} register={register} errors={errors} />
          <Flex>
            <Button type="submit" loading={inflow.isPending}>
              Estimate gas rate
            </Button>
          </Flex>
        </Flex>
      </form>
      {inflow.error ? (
        <Callout.Root color="tomato" size="1" role="alert">
          <Callout.Text>{inflow.error.message}</Callout.Text>
        </Callout.Root>
      ) : null}
      {r ? (
        <Flex direction="column" gap="2" role="region" aria-label="Gas inflow result">
          <Table.Root variant="surface" size="1">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Vertical well, pseudo-steady state</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">Value</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              <Table.Row data-stat="rate">
                <Table.RowHeaderCell>Gas rate at pwf (Mscf/d)</Table.RowHeaderCell>
                <Table.Cell className="summary-table__num" data-value={r.rateMscfPerDay}>
                  {sig(r.rateMscfPerDay)}
                </Table.Cell>
              </Table.Row>
              <Table.Row>
                <Table.RowHeaderCell>Absolute open flow, pwf = 0 (Mscf/d)</Table.RowHeaderCell>
                <Table.Cell className="summary-table__num">{sig(r.absoluteOpenFlowMscfPerDay)}</Table.Cell>
              </Table.Row>
              <Table.Row>
                <Table.RowHeaderCell>C = q / (pr² − pwf²) (Mscf/d/psi²)</Table.RowHeaderCell>
                <Table.Cell className="summary-table__num">{r.coefficient.toExponential(4)}</Table.Cell>
              </Table.Row>
              <Table.Row>
                <Table.RowHeaderCell>
                  z at {sig(r.averagePressurePsia)} psia ({r.pvt.zMethod === 'dak' ? 'Dranchuk & Abou-Kassem' : 'Hall & Yarborough'}; Tpr {sig(r.pvt.tpr)}, Ppr {sig(r.pvt.ppr)})
                </Table.RowHeaderCell>
                <Table.Cell className="summary-table__num">{r.pvt.z.toFixed(4)}</Table.Cell>
              </Table.Row>
            </Table.Body>
          </Table.Root>
          <Text size="1" color="gray">
            {r.equation}.
          </Text>
          <ul className="rc-conventions">
            {r.assumptions.map((a) => (
              <li key={a}>
                <Text size="1">{a}</Text>
              </li>
            ))}
          </ul>
        </Flex>
      ) : null}
    </Flex>
  );
}
