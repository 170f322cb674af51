import { Button, Callout, Flex, Table, Text } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { PlotFigure } from '../../../components/plot-figure';
import type { DeclineCheck, DeclineKind, SeriesDto } from '../../../types/reserves';
import { useDeclineFit } from '../api/get-decline-fit';
import { sig } from '../utils/axes';
import { DeclinePlot } from './decline-plot';

export interface DeclinePanelProps {
  assetId: string;
  wellId: string;
  wellName: string;
  series: SeriesDto;
  /** The fit kept with the case for this series, if any. */
  kept: DeclineCheck | undefined;
  /** Keeps the fit with the case (absent when the case cannot change). */
  onKeep?: (check: DeclineCheck) => void;
}

/** Arps decline fitted by least squares: the fit, its parameters and the EUR to an economic limit. */
export function DeclinePanel({ assetId, wellId, wellName, series, kept, onKeep }: DeclinePanelProps) {
  const id = useId();
  const [kind, setKind] = useState<DeclineKind>(kept?.kind ?? 'hyperbolic');
  const [limitText, setLimitText] = useState(String(kept?.economicLimit ?? (series.units.rate === 'STB/d' ? 5 : 50)));
  const limit = Number(limitText);
  const limitOk = Number.isFinite(limit) && limit > 0;
  const fit = useDeclineFit(assetId, wellId, series.id, kind, limitOk ? limit : 0);
  const isKept = kept && kept.kind === kind && kept.economicLimit === limit;
  return (
    <Flex direction="column" gap="3">
      <Flex gap="3" align="end" wrap="wrap">
        <Flex direction="column" gap="1">
          <Text as="label" size="2" weight="medium" htmlFor={`${id}-kind`}>
            Arps decline
          </Text>
          <select id={`${id}-kind`} className="native-select" value={kind} onChange={(e) => setKind(e.target.value as DeclineKind)}>
            <option value="exponential">Exponential (b = 0)</option>
            <option value="hyperbolic">Hyperbolic (0 &lt; b &lt; 1, fitted)</option>
            <option value="harmonic">Harmonic (b = 1)</option>
          </select>
        </Flex>
        <Flex direction="column" gap="1">
          <Text as="label" size="2" weight="medium" htmlFor={`${id}-limit`}>
            Economic limit ({series.units.rate})
          </Text>
          <input id={`${id}-limit`} className="number-input" inputMode="decimal" value={limitText} onChange={(e) => setLimitText(e.currentTarget.value)} aria-invalid={limitOk ? undefined : true} />
        </Flex>
        {onKeep && fit.isSuccess ? (
          <Button variant="soft" disabled={!!isKept} onClick={() => onKeep({ kind, economicLimit: limit })}>
            {isKept ? 'Kept with the case' : 'Keep this fit with the case'}
          </Button>
        ) : null}
      </Flex>
      {!limitOk ? (
        <Text size="1" color="tomato">
          The economic limit must be a rate above 0.
        </Text>
      ) : fit.isPending ? (
        <Text color="gray">Fitting…</Text>
      ) : fit.isError ? (
        <Callout.Root color="orange" size="1" role="alert">
          <Callout.Text>{fit.error.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <>
          <PlotFigure title={`Decline: ${wellName} – ${series.label}`} fileName={`${wellName}-decline-${kind}`} note={fit.data.notes.join(' ')}>
            <DeclinePlot fit={fit.data} />
          </PlotFigure>
          <Table.Root variant="surface" size="1">
            <caption className="visually-hidden">Decline fit</caption>
            <Table.Body>
              <Table.Row>
                <Table.RowHeaderCell>qi</Table.RowHeaderCell>
                <Table.Cell className="tabular">
                  {sig(fit.data.qi)} {fit.data.rateUnit}
                </Table.Cell>
                <Table.RowHeaderCell>b</Table.RowHeaderCell>
                <Table.Cell className="tabular">{fit.data.b.toFixed(3)}</Table.Cell>
              </Table.Row>
              <Table.Row>
                <Table.RowHeaderCell>Di nominal</Table.RowHeaderCell>
                <Table.Cell className="tabular">{sig(fit.data.diNominalPerYear)} per year</Table.Cell>
                <Table.RowHeaderCell>Di effective</Table.RowHeaderCell>
                <Table.Cell className="tabular">{(fit.data.diEffectivePerYear * 100).toFixed(1)} % per year</Table.Cell>
              </Table.Row>
              <Table.Row>
                <Table.RowHeaderCell>r²</Table.RowHeaderCell>
                <Table.Cell className="tabular">{fit.data.r2.toFixed(4)}</Table.Cell>
                <Table.RowHeaderCell>Time to limit</Table.RowHeaderCell>
                <Table.Cell className="tabular">{sig(fit.data.timeToLimitDays / 365.25)} years</Table.Cell>
              </Table.Row>
              <Table.Row>
                <Table.RowHeaderCell>Produced to date</Table.RowHeaderCell>
                <Table.Cell className="tabular">
                  {sig(fit.data.cumulativeToDate)} {fit.data.volumeUnit}
                </Table.Cell>
                <Table.RowHeaderCell>EUR</Table.RowHeaderCell>
                <Table.Cell className="tabular">
                  <strong>
                    {sig(fit.data.eur)} {fit.data.volumeUnit}
                  </strong>
                </Table.Cell>
              </Table.Row>
            </Table.Body>
          </Table.Root>
        </>
      )}
    </Flex>
  );
}
