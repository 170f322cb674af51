import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Heading, Table, Text } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { useInflow } from '../api/post-inflow';
import { sig } from '../utils/axes';
import { optionalNumberText, positiveText } from '../utils/number-text';
import { NumberFieldGrid } from './number-field-grid';

const schema = z.object({
  permeabilityMd: positiveText('Permeability'),
  netPayFt: positiveText('Net pay'),
  viscosityCp: positiveText('Viscosity'),
  fvf: positiveText('Bo'),
  drawdownPsi: positiveText('Drawdown'),
  drainageRadiusFt: positiveText('Drainage radius'),
  wellboreRadiusFt: positiveText('Wellbore radius'),
  skin: optionalNumberText('Skin'),
  lengthFt: optionalNumberText('Lateral length', 1),
  kvMd: optionalNumberText('kv', 0),
});
type Values = z.infer<typeof schema>;

const FIELDS: { key: keyof Values; label: string }[] = [
  { key: 'permeabilityMd', label: 'Permeability k (md)' },
  { key: 'netPayFt', label: 'Net pay h (ft)' },
  { key: 'viscosityCp', label: 'Oil viscosity (cp)' },
  { key: 'fvf', label: 'Bo (rb/STB)' },
  { key: 'drawdownPsi', label: 'Drawdown pr − pwf (psi)' },
  { key: 'drainageRadiusFt', label: 'Drainage radius re (ft)' },
  { key: 'wellboreRadiusFt', label: 'Wellbore radius rw (ft)' },
  { key: 'skin', label: 'Skin s' },
  { key: 'lengthFt', label: 'Horizontal lateral L (ft)' },
  { key: 'kvMd', label: 'Vertical permeability kv (md, default k)' },
];

export interface InflowCalculatorProps {
  assetId: string;
  /** Start values from the case (net pay in ft, Bo). */
  netPayFt?: number | null;
  bo?: number | null;
}

/**
 * Rate to expect from a well: radial pseudo-steady-state Darcy inflow of a vertical well, and
 * a horizontal lateral by Joshi (1988), with the productivity ratio of the two.
 */
export function InflowCalculator({ assetId, netPayFt, bo }: InflowCalculatorProps) {
  const id = useId();
  const inflow = useInflow(assetId);
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: {
      permeabilityMd: '50',
      netPayFt: netPayFt ? String(Number(netPayFt.toPrecision(4))) : '30',
      viscosityCp: '1.2',
      fvf: bo ? String(bo) : '1.25',
      drawdownPsi: '500',
      drainageRadiusFt: '1490',
      wellboreRadiusFt: '0.328',
      skin: '0',
      lengthFt: '2000',
      kvMd: '',
    },
  });
  const submit = handleSubmit((v) => {
    const n = (s: string) => Number(s);
    inflow.mutate({
      permeabilityMd: n(v.permeabilityMd),
      netPayFt: n(v.netPayFt),
      viscosityCp: n(v.viscosityCp),
      fvf: n(v.fvf),
      drawdownPsi: n(v.drawdownPsi),
      drainageRadiusFt: n(v.drainageRadiusFt),
      wellboreRadiusFt: n(v.wellboreRadiusFt),
      skin: v.skin === '' ? 0 : n(v.skin),
      ...(v.lengthFt ? { horizontal: { lengthFt: n(v.lengthFt), ...(v.kvMd ? { kvMd: n(v.kvMd) } : {}) } } : {}),
    });
  });
  const r = inflow.data;
  return (
    <Flex direction="column" gap="4">
      <Heading as="h2" size="4">
        Inflow estimate
      </Heading>
      <form onSubmit={submit} noValidate aria-label="Inflow inputs">
        <Flex direction="column" gap="3">
          <NumberFieldGrid idPrefix={id} fields={FIELDS} register={register} errors={errors} />
          <Flex>
            <Button type="submit" loading={inflow.isPending}>
              Estimate rate
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
        <Flex direction="column" gap="2" role="region" aria-label="Inflow result">
          <Table.Root variant="surface" size="1">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Well</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">Oil rate (STB/d)</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">PI (STB/d/psi)</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              <Table.Row>
                <Table.RowHeaderCell>Vertical, pseudo-steady state</Table.RowHeaderCell>
                <Table.Cell className="summary-table__num">{sig(r.vertical.rateStbPerDay)}</Table.Cell>
                <Table.Cell className="summary-table__num">{sig(r.vertical.productivityIndex)}</Table.Cell>
              </Table.Row>
              {r.horizontal ? (
                <>
                  <Table.Row>
                    <Table.RowHeaderCell>Horizontal lateral (Joshi 1988, steady state)</Table.RowHeaderCell>
                    <Table.Cell className="summary-table__num">{sig(r.horizontal.rateStbPerDay)}</Table.Cell>
                    <Table.Cell className="summary-table__num">{sig(r.horizontal.productivityIndex)}</Table.Cell>
                  </Table.Row>
                  <Table.Row>
                    <Table.RowHeaderCell>Vertical, steady state, same drainage radius</Table.RowHeaderCell>
                    <Table.Cell className="summary-table__num">{sig(r.horizontal.verticalSteadyStateRateStbPerDay)}</Table.Cell>
                    <Table.Cell />
                  </Table.Row>
                </>
              ) : null}
            </Table.Body>
          </Table.Root>
          {r.horizontal ? (
            <Text size="2">
              The lateral contacts the reservoir about <strong>{r.horizontal.productivityRatio.toFixed(1)} ×</strong> as productively as a vertical well (Jh / Jv); drainage ellipse half-axis a = {sig(r.horizontal.aFt)} ft, β = {sig(r.horizontal.beta)}.
            </Text>
          ) : null}
          <Text size="1" color="gray">
            Vertical: {r.vertical.equation}.
            {r.horizontal ? ` Horizontal: ${r.horizontal.equation}.` : ''}
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
