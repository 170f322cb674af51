import { Callout, Flex, Heading, SegmentedControl, Table, Text } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { PlotFigure } from '../../../components/plot-figure';
import type { CaseResults, OutputStats, ReservesCase } from '../../../types/reserves';
import { formatFieldVolume, formatMetricVolume, formatSig } from '../utils/format-volume';
import { INPUT_ORDER } from '../utils/inputs-form';
import { inputLabel, inputUnit } from '../utils/labels';
import { ExceedancePlot } from './exceedance-plot';
import { HistogramPlot } from './histogram-plot';
import { TornadoPlot } from './tornado-plot';

const exact = new Intl.NumberFormat('en', { maximumFractionDigits: 0 });

/**
 * Deterministic and probabilistic volumes of the case's last run, with plots and the tornado.
 * Shown inside the case page, which carries the caution about volumes above its tabs.
 */
export function ResultsPanel({ reservesCase: c }: { reservesCase: ReservesCase }) {
  const id = useId();
  const [output, setOutput] = useState<'recoverable' | 'inPlace'>('recoverable');
  const r = c.results;
  if (!r) {
    return (
      <Text color="gray">Not run on the current inputs yet. Fill the inputs and press Run.</Text>
    );
  }
  const fluid = r.fluid;
  const inPlaceName = fluid === 'oil' ? 'Oil in place (OOIP)' : 'Gas in place (OGIP)';
  const stats: OutputStats = r.probabilistic[output];
  const outputLabel = output === 'recoverable' ? 'Recoverable' : fluid === 'oil' ? 'Oil in place' : 'Gas in place';
  const stem = `${c.name}-${output}`;
  return (
    <Flex direction="column" gap="4">
      {!c.resultsCurrent ? (
        <Callout.Root color="orange" size="1">
          <Callout.Text>These results belong to revision {r.revision}; the case has changed since. Run it again.</Callout.Text>
        </Callout.Root>
      ) : null}
      <Flex direction="column" gap="2" asChild>
        <section aria-labelledby={`${id}-det`}>
          <Heading as="h2" size="4" id={`${id}-det`}>
            Deterministic volumes
          </Heading>
          <Table.Root variant="surface" size="1">
            <caption className="visually-hidden">Deterministic volumes</caption>
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Volume</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">Field units</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">{r.deterministic.inPlace.fieldUnit}</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">Metric</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {[
                [inPlaceName, r.deterministic.inPlace],
                ['Recoverable', r.deterministic.recoverable],
              ].map(([name, v]) => {
                const vol = v as CaseResults['deterministic']['inPlace'];
                return (
                  <Table.Row key={name as string}>
                    <Table.RowHeaderCell>{name as string}</Table.RowHeaderCell>
                    <Table.Cell className="summary-table__num">{formatFieldVolume(vol.field, vol.fieldUnit)}</Table.Cell>
                    <Table.Cell className="summary-table__num">{exact.format(vol.field)}</Table.Cell>
                    <Table.Cell className="summary-table__num">{formatMetricVolume(vol.m3)}</Table.Cell>
                  </Table.Row>
                );
              })}
            </Table.Body>
          </Table.Root>
          <Text size="1" color="gray">
            {r.deterministic.formula}. Values used:{' '}
            {INPUT_ORDER.map((k) => `${inputLabel(k, fluid)} ${formatSig(r.deterministic.values[k])} ${inputUnit(k, { fluid, areaUnit: c.inputs.areaUnit, lengthUnit: c.inputs.lengthUnit })}`).join('; ')}.
            {r.deterministic.pvt
              ? ` Gas PVT: z ${r.deterministic.pvt.z.toFixed(4)} (${r.deterministic.pvt.zMethod === 'dak' ? 'Dranchuk & Abou-Kassem' : 'Hall & Yarborough'}), Tpr ${formatSig(r.deterministic.pvt.tpr)}, Ppr ${formatSig(r.deterministic.pvt.ppr)}.`
              : ''}
          </Text>
        </section>
      </Flex>
      <Flex direction="column" gap="2" asChild>
        <section aria-labelledby={`${id}-mc`}>
          <Heading as="h2" size="4" id={`${id}-mc`}>
            Monte Carlo: {r.probabilistic.trials.toLocaleString('en')} trials, seed {r.probabilistic.seed}
          </Heading>
          <Text size="2" color="gray">
            P90 is the low estimate: the value exceeded with 90 % probability (SPE-PRMS). P10 is the high estimate. Run took {r.probabilistic.elapsedMs} ms.
          </Text>
          {r.notes
            .filter((n) => n.startsWith('Truncation bounds'))
            .map((n) => (
              <Text key={n} size="1" color="gray">
                {n}
              </Text>
            ))}
          <Table.Root variant="surface" size="1">
            <caption className="visually-hidden">Probabilistic volumes</caption>
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Statistic</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">{inPlaceName}</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">metric</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">Recoverable</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell className="summary-table__num">metric</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {(['p90', 'p50', 'p10', 'mean'] as const).map((k) => (
                <Table.Row key={k} data-stat={k}>
                  <Table.RowHeaderCell>{k === 'mean' ? 'Mean' : k.toUpperCase()}</Table.RowHeaderCell>
                  <Table.Cell className="summary-table__num">{formatFieldVolume(r.probabilistic.inPlace[k], r.probabilistic.inPlace.fieldUnit)}</Table.Cell>
                  <Table.Cell className="summary-table__num">{formatMetricVolume(r.probabilistic.inPlace.m3[k])}</Table.Cell>
                  <Table.Cell className="summary-table__num" data-value={r.probabilistic.recoverable[k]}>
                    {formatFieldVolume(r.probabilistic.recoverable[k], r.probabilistic.recoverable.fieldUnit)}
                  </Table.Cell>
                  <Table.Cell className="summary-table__num">{formatMetricVolume(r.probabilistic.recoverable.m3[k])}</Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
          {r.probabilistic.correlations?.length ? (
            <Text size="1" color="gray" role="note" aria-label="Correlated inputs">
              Correlated inputs (rank correlation asked, then drawn):{' '}
              {r.probabilistic.correlations.map((x) => `${inputLabel(x.a, fluid)} with ${inputLabel(x.b, fluid)} ${x.rank.toFixed(2)}, drawn ${x.sampled.toFixed(3)}`).join('; ')}. The
              tornado moves one input at a time, so it shows each input alone.
            </Text>
          ) : null}
          {Object.keys(r.probabilistic.lognormals).length ? (
            <Text size="1" color="gray">
              Lognormal inputs in both forms:{' '}
              {Object.entries(r.probabilistic.lognormals)
                .map(([k, l]) => `${inputLabel(k as never, fluid)}: mean ${formatSig(l!.mean)}, SD ${formatSig(l!.sd)}, P90 ${formatSig(l!.p90)}, P10 ${formatSig(l!.p10)} (μ ${formatSig(l!.mu)}, σ ${formatSig(l!.sigma)})`)
                .join('; ')}
              .
            </Text>
          ) : null}
        </section>
      </Flex>
      <Flex gap="3" align="center">
        <Text size="2" weight="medium" id={`${id}-out`}>
          Plots show
        </Text>
        <SegmentedControl.Root aria-labelledby={`${id}-out`} value={output} onValueChange={(x) => setOutput(x as 'recoverable' | 'inPlace')} size="1">
          <SegmentedControl.Item value="recoverable">Recoverable</SegmentedControl.Item>
          <SegmentedControl.Item value="inPlace">In place</SegmentedControl.Item>
        </SegmentedControl.Root>
      </Flex>
      <div className="rc-plots">
        <PlotFigure title={`Histogram: ${outputLabel}`} fileName={`${stem}-histogram`} note="Solid lines: P90, P50, P10; dashed: mean.">
          <HistogramPlot stats={stats} label={outputLabel} />
        </PlotFigure>
        <PlotFigure title={`Cumulative (exceedance): ${outputLabel}`} fileName={`${stem}-exceedance`} note="Probability that the outcome exceeds each value; P90 is read at 90 %.">
          <ExceedancePlot stats={stats} label={outputLabel} />
        </PlotFigure>
        <PlotFigure title={`Tornado: ${outputLabel}`} fileName={`${stem}-tornado`} note={`${stats.tornado.method} Left/right colours: input at its P90 (low) / P10 (high); the line is the deterministic result.`}>
          <TornadoPlot tornado={stats.tornado} fieldUnit={stats.fieldUnit} fluid={fluid} label={outputLabel} />
        </PlotFigure>
      </div>
      <Flex direction="column" gap="1">
        <Text size="2" weight="medium">
          Conventions
        </Text>
        <ul className="rc-conventions">
          {c.conventions.map((x) => (
            <li key={x}>
              <Text size="1">{x}</Text>
            </li>
          ))}
        </ul>
      </Flex>
    </Flex>
  );
}
