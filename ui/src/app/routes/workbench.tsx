import '../../styles/workbench.css';
import { Callout, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { PageSpinner } from '../../components/page-spinner';
import { PanelErrorBoundary } from '../../components/panel-error-boundary';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { useMe } from '../../features/auth/api/get-me';
import { canEditWells, roleInAsset } from '../../features/auth/utils/permissions';
import { formationsQueryOptions, useFormations } from '../../features/formations/api/get-formations';
import { StatusBadge } from '../../features/review/components/status-badge';
import { VersionsPanel } from '../../features/review/components/versions-panel';
import { useWell, wellQueryOptions } from '../../features/wells/api/get-well';
import { mergedSamplesQueryOptions } from '../../features/workbench/api/get-merged-samples';
import { workbenchQueryOptions } from '../../features/workbench/api/get-workbench';
import { WorkbenchScreen } from '../../features/workbench/components/workbench-screen';
import { InterpretationExports } from '../../features/zone-tables/components/interpretation-exports';
import { requireUser } from './require-user';

export const workbenchLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const assetId = params.assetId!;
    const wellId = params.wellId!;
    await queryClient.ensureQueryData(wellQueryOptions(assetId, wellId));
    void queryClient.prefetchQuery(assetQueryOptions(assetId));
    void queryClient.prefetchQuery(formationsQueryOptions(assetId));
    void queryClient.prefetchQuery(workbenchQueryOptions(assetId, wellId));
    void queryClient.prefetchQuery(mergedSamplesQueryOptions(assetId, wellId));
    return null;
  };

/** /assets/:assetId/wells/:wellId/workbench: depth view, tuning, tops, parameters, curves, versions. */
export function WorkbenchRoute() {
  const { assetId, wellId } = useParams() as { assetId: string; wellId: string };
  const well = useWell(assetId, wellId);
  const asset = useAsset(assetId);
  const me = useMe();
  const formations = useFormations(assetId);
  const role = me.data ? roleInAsset(me.data, assetId) : null;
  const canEdit = me.data ? canEditWells(me.data, assetId) : false;

  if (well.isPending) return <PageSpinner label="Loading well…" />;
  if (well.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>{well.error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const w = well.data;
  const runNames = Object.fromEntries(w.logRuns.map((r) => [r.id, r.fileName]));

  return (
    <Flex direction="column" gap="4" className="full-bleed">
      <title>{`${w.name} workbench · Poreline`}</title>
      <Breadcrumbs
        items={[
          { label: 'Assets', to: '/assets' },
          { label: asset.data?.name ?? 'Asset', to: `/assets/${assetId}` },
          { label: w.name, to: `/assets/${assetId}/wells/${wellId}` },
          { label: 'Workbench' },
        ]}
      />
      <Flex align="baseline" gap="3" wrap="wrap">
        <Heading as="h1" size="6">
          {w.name} workbench
        </Heading>
        <Text size="2" color="gray">
          {w.uwi ?? ''}
        </Text>
        <Link className="strong-link" to={`/assets/${assetId}/formations`}>
          <Text size="2">Formations and cutoffs</Text>
        </Link>
        <Link className="strong-link" to={`/assets/${assetId}/zone-table`}>
          <Text size="2">Zone table of the asset</Text>
        </Link>
      </Flex>
      {w.logRuns.length === 0 ? (
        <Text color="gray">This well has no log runs yet: load LAS files from the asset page first.</Text>
      ) : (
        <PanelErrorBoundary title="The workbench">
          <WorkbenchScreen
            assetId={assetId}
            wellId={wellId}
            wellName={w.name}
            canEdit={canEdit}
            formations={formations.data ?? []}
            runNames={runNames}
            renderLatest={(latest) =>
              latest ? (
                <Flex align="center" gap="2" wrap="wrap">
                  <StatusBadge status={latest.status} version={latest.version} />
                  <InterpretationExports assetId={assetId} wellId={wellId} wellName={w.name} interpretationId={latest.id} version={latest.version} />
                </Flex>
              ) : (
                <Text size="2" color="gray">
                  No version saved yet.
                </Text>
              )
            }
            versionsPanel={
              <VersionsPanel
                assetId={assetId}
                wellId={wellId}
                role={role}
                versionActions={(v) => (
                  <InterpretationExports assetId={assetId} wellId={wellId} wellName={w.name} interpretationId={v.id} version={v.version} naming="per-version" />
                )}
              />
            }
          />
        </PanelErrorBoundary>
      )}
    </Flex>
  );
}
