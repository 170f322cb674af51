import { Callout, Card, DataList, Flex, Heading, Select, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { PageSpinner } from '../../components/page-spinner';
import { PanelErrorBoundary } from '../../components/panel-error-boundary';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { useWell, wellQueryOptions } from '../../features/wells/api/get-well';
import { LogRunDepthView } from '../../features/wells/components/log-run-depth-view';
import { LogRunPanel } from '../../features/wells/components/log-run-panel';
import { formatDepthRange } from '../../lib/format';
import { requireUser } from './require-user';

export const wellLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const assetId = params.assetId!;
    const wellId = params.wellId!;
    await Promise.all([queryClient.ensureQueryData(wellQueryOptions(assetId, wellId)), queryClient.prefetchQuery(assetQueryOptions(assetId))]);
    return null;
  };

export function WellRoute() {
  const params = useParams();
  const assetId = params.assetId!;
  const wellId = params.wellId!;
  const well = useWell(assetId, wellId);
  const asset = useAsset(assetId);
  const [chosenRunId, setChosenRunId] = useState<string | null>(null);

  if (well.isPending) return <PageSpinner label="Loading well…" />;
  if (well.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>{well.error.message}</Callout.Text>
      </Callout.Root>
    );
  }

  const w = well.data;
  const runs = w.logRuns;
  const runId = runs.some((r) => r.id === chosenRunId) ? chosenRunId! : (runs[0]?.id ?? null);

  return (
    <Flex direction="column" gap="5">
      <title>{`${w.name} · Poreline`}</title>
      <Breadcrumbs
        items={[
          { label: 'Assets', to: '/assets' },
          { label: asset.data?.name ?? 'Asset', to: `/assets/${assetId}` },
          { label: w.name },
        ]}
      />
      <Flex direction="column" gap="2">
        <Flex align="baseline" gap="4" wrap="wrap">
          <Heading as="h1" size="7">
            {w.name}
          </Heading>
          <Link className="strong-link" to={`/assets/${assetId}/wells/${wellId}/workbench`}>
            Open the workbench
          </Link>
        </Flex>
        <DataList.Root orientation="horizontal" size="2">
          <DataList.Item>
            <DataList.Label>UWI</DataList.Label>
            <DataList.Value>{w.uwi || '–'}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Depth range</DataList.Label>
            <DataList.Value>{formatDepthRange(w.top, w.base, w.depthUnit)}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Log runs</DataList.Label>
            <DataList.Value>
              {w.logRunCount} ({w.curveCount} curves)
            </DataList.Value>
          </DataList.Item>
        </DataList.Root>
      </Flex>

      {runs.length === 0 ? (
        <Card size="3">
          <Text color="gray">No log runs yet. Load LAS files for this well from its asset page.</Text>
        </Card>
      ) : (
        <>
          <Flex direction="column" gap="3" asChild>
            <section aria-labelledby="depth-view-heading">
              <Flex justify="between" align="center" gap="3" wrap="wrap">
                <Heading as="h2" size="4" id="depth-view-heading">
                  Depth view
                </Heading>
                {runs.length > 1 ? (
                  <Flex align="center" gap="2">
                    <Text as="label" size="2" id="run-picker-label">
                      Log run
                    </Text>
                    <Select.Root value={runId ?? undefined} onValueChange={setChosenRunId}>
                      <Select.Trigger aria-labelledby="run-picker-label" />
                      <Select.Content>
                        {runs.map((run) => (
                          <Select.Item key={run.id} value={run.id}>
                            {run.fileName}
                          </Select.Item>
                        ))}
                      </Select.Content>
                    </Select.Root>
                  </Flex>
                ) : null}
              </Flex>
              <PanelErrorBoundary title="The depth view" key={runId}>
                {runId ? <LogRunDepthView assetId={assetId} wellId={wellId} wellName={w.name} runId={runId} /> : null}
              </PanelErrorBoundary>
            </section>
          </Flex>
          <Flex direction="column" gap="3" asChild>
            <section aria-labelledby="log-runs-heading">
              <Heading as="h2" size="4" id="log-runs-heading">
                Log runs
              </Heading>
              {runs.map((run) => (
                <LogRunPanel key={run.id} run={run} />
              ))}
            </section>
          </Flex>
        </>
      )}
    </Flex>
  );
}
