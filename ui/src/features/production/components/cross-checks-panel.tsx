import { Button, Callout, Flex, Heading, Text } from '@radix-ui/themes';
import { useId, useState } from 'react';
import type { DeclineCheck } from '../../../types/reserves';
import { useDeleteSeries } from '../api/delete-series';
import { useProduction } from '../api/get-production';
import { DeclinePanel } from './decline-panel';
import { PzPanel } from './pz-panel';
import { SeriesUploadForm } from './series-upload-form';

export interface CrossChecksPanelProps {
  assetId: string;
  caseId: string;
  caseRevision: number;
  wells: readonly { wellId: string; wellName: string }[];
  /** May upload production data (engineer/admin). */
  canUpload: boolean;
  declineChecks: Record<string, DeclineCheck>;
  /** Keeps a decline fit with the case (absent when the case cannot change). */
  onKeepDecline?: (seriesId: string, check: DeclineCheck) => void;
}

/**
 * Production cross-checks of the case's wells: p/z (pressure) and Arps decline (rate). Shown in
 * the case page, which carries the caution about volumes above its tabs.
 */
export function CrossChecksPanel({ assetId, caseId, caseRevision, wells, canUpload, declineChecks, onKeepDecline }: CrossChecksPanelProps) {
  const id = useId();
  const [wellId, setWellId] = useState(wells[0]?.wellId ?? '');
  const wellName = wells.find((w) => w.wellId === wellId)?.wellName ?? '';
  const series = useProduction(assetId, wellId);
  const [chosen, setChosen] = useState<string | null>(null);
  const remove = useDeleteSeries(assetId, wellId);
  if (!wells.length) return <Text color="gray">The case has no wells yet.</Text>;
  const list = series.data ?? [];
  const current = list.find((s) => s.id === chosen) ?? list[0];
  return (
    <Flex direction="column" gap="4">
      <Flex gap="3" align="center" wrap="wrap">
        <Text as="label" size="2" weight="medium" htmlFor={`${id}-well`}>
          Well
        </Text>
        <select
          id={`${id}-well`}
          className="native-select"
          value={wellId}
          onChange={(e) => {
            setWellId(e.target.value);
            setChosen(null);
          }}
        >
          {wells.map((w) => (
            <option key={w.wellId} value={w.wellId}>
              {w.wellName}
            </option>
          ))}
        </select>
        {list.length ? (
          <>
            <Text as="label" size="2" weight="medium" htmlFor={`${id}-series`}>
              Production data
            </Text>
            <select id={`${id}-series`} className="native-select" value={current?.id} onChange={(e) => setChosen(e.target.value)}>
              {list.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.kind === 'pressure' ? 'Pressure' : 'Rate'}: {s.label} ({s.points.length} points)
                </option>
              ))}
            </select>
            {canUpload && current ? (
              <Button size="1" variant="ghost" color="tomato" onClick={() => remove.mutate(current.id, { onSuccess: () => setChosen(null) })} loading={remove.isPending}>
                Delete this data
              </Button>
            ) : null}
          </>
        ) : null}
      </Flex>
      {series.isPending ? <Text color="gray">Loading production data…</Text> : null}
      {series.isError ? (
        <Callout.Root color="tomato" size="1" role="alert">
          <Callout.Text>{series.error.message}</Callout.Text>
        </Callout.Root>
      ) : null}
      {current ? (
        <Flex direction="column" gap="2" asChild>
          <section aria-labelledby={`${id}-h`}>
            <Heading as="h3" size="3" id={`${id}-h`}>
              {current.kind === 'pressure' ? 'Pressure: p/z material balance' : 'Rate: Arps decline'}
            </Heading>
            {current.kind === 'pressure' ? (
              <PzPanel assetId={assetId} wellId={wellId} wellName={wellName} series={current} caseId={caseId} caseRevision={caseRevision} />
            ) : (
              <DeclinePanel
                key={current.id}
                assetId={assetId}
                wellId={wellId}
                wellName={wellName}
                series={current}
                kept={declineChecks[current.id]}
                onKeep={onKeepDecline ? (check) => onKeepDecline(current.id, check) : undefined}
              />
            )}
          </section>
        </Flex>
      ) : series.isSuccess ? (
        <Text color="gray">No production data for {wellName} yet.</Text>
      ) : null}
      {canUpload && wellId ? (
        <Flex direction="column" gap="2">
          <Heading as="h3" size="3">
            Add production data to {wellName}
          </Heading>
          <SeriesUploadForm key={wellId} assetId={assetId} wellId={wellId} wellName={wellName} onStored={setChosen} />
        </Flex>
      ) : null}
    </Flex>
  );
}
