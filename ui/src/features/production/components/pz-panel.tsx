import { Callout, Flex, Table, Text } from '@radix-ui/themes';
import { PlotFigure } from '../../../components/plot-figure';
import type { SeriesDto } from '../../../types/reserves';
import { usePzFit } from '../api/get-pz-fit';
import { formatGas, sig } from '../utils/axes';
import { PzPlot } from './pz-plot';

export interface PzPanelProps {
  assetId: string;
  wellId: string;
  wellName: string;
  series: SeriesDto;
  caseId: string;
  caseRevision: number;
}

/** p/z against cumulative gas fitted with a straight line: drained gas in place and wells needed. */
export function PzPanel({ assetId, wellId, wellName, series, caseId, caseRevision }: PzPanelProps) {
  const fit = usePzFit(assetId, wellId, series.id, caseId, caseRevision);
  if (fit.isPending) return <Text color="gray">Fitting p/z…</Text>;
  if (fit.isError) {
    return (
      <Callout.Root color="orange" size="1" role="alert">
        <Callout.Text>{fit.error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const f = fit.data;
  return (
    <Flex direction="column" gap="3">
      <PlotFigure title={`p/z: ${wellName} – ${series.label}`} fileName={`${wellName}-pz`} note={f.method}>
        <PzPlot fit={f} />
      </PlotFigure>
      <Table.Root variant="surface" size="1">
        <caption className="visually-hidden">p/z fit</caption>
        <Table.Body>
          <Table.Row>
            <Table.RowHeaderCell>Fit p/z = a + b Gp</Table.RowHeaderCell>
            <Table.Cell className="tabular">
              a = {sig(f.fit.intercept)} psia, b = {f.fit.slope.toExponential(4)} psia/scf, r² = {f.fit.r2.toFixed(4)} ({f.fit.n} points)
            </Table.Cell>
          </Table.Row>
          <Table.Row>
            <Table.RowHeaderCell>Gas in place this well drains</Table.RowHeaderCell>
            <Table.Cell className="tabular">
              <strong>{formatGas(f.drainedGipScf)}</strong> ({sig(f.drainedGipM3 / 1e6)} × 10⁶ m³)
            </Table.Cell>
          </Table.Row>
          <Table.Row>
            <Table.RowHeaderCell>z</Table.RowHeaderCell>
            <Table.Cell>
              {f.zMethod === 'dak' ? 'Dranchuk & Abou-Kassem (1975)' : 'Hall & Yarborough (1973)'} at {f.temperatureF} F, gas gravity {f.gasGravity}
            </Table.Cell>
          </Table.Row>
        </Table.Body>
      </Table.Root>
      {f.volumetric.length ? (
        <Table.Root variant="surface" size="1">
          <caption className="visually-hidden">Wells needed</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Volumetric gas in place ({f.volumetric[0].caseName})</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell className="summary-table__num">GIP</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell className="summary-table__num">GIP / drained</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell className="summary-table__num">Wells needed</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {f.volumetric.map((v) => (
              <Table.Row key={v.basis}>
                <Table.RowHeaderCell>{v.basis}</Table.RowHeaderCell>
                <Table.Cell className="summary-table__num">{formatGas(v.gipScf)}</Table.Cell>
                <Table.Cell className="summary-table__num">{v.ratio.toFixed(2)}</Table.Cell>
                <Table.Cell className="summary-table__num">
                  <strong>{v.wells}</strong>
                </Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      ) : (
        <Text size="2" color="gray">
          Run the case (gas) to compare the drained volume with the volumetric gas in place and see how many wells the reservoir needs.
        </Text>
      )}
      <Flex direction="column" gap="1">
        <Text size="2" weight="medium">
          Assumptions
        </Text>
        <ul className="rc-conventions">
          {f.assumptions.map((a) => (
            <li key={a}>
              <Text size="1">{a}</Text>
            </li>
          ))}
        </ul>
      </Flex>
    </Flex>
  );
}
