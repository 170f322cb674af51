import { Badge, Callout, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { PageSpinner } from '../../components/page-spinner';
import { PanelErrorBoundary } from '../../components/panel-error-boundary';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { useMe } from '../../features/auth/api/get-me';
import { EditAssetDialog } from '../../features/assets/components/edit-asset-dialog';
import { canEditWells, roleInAsset } from '../../features/auth/utils/permissions';
import { DemoCheckPanel } from '../../features/demo-check/components/demo-check-panel';
import { useWells, wellsQueryOptions } from '../../features/wells/api/get-wells';
import { NewWellForm } from '../../features/wells/components/new-well-form';
import { WellsTable } from '../../features/wells/components/wells-table';
import { requireUser } from './require-user';

export const assetLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const assetId = params.assetId!;
    await Promise.all([queryClient.ensureQueryData(assetQueryOptions(assetId)), queryClient.prefetchQuery(wellsQueryOptions(assetId))]);
    return null;
  };

export function AssetRoute() {
  const assetId = useParams().assetId!;
  const asset = useAsset(assetId);
  const wells = useWells(assetId);
  const me = useMe();
  const canEdit = me.data ? canEditWells(me.data, assetId) : false;

  if (asset.isPending) return <PageSpinner label="Loading asset…" />;
  if (asset.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>{asset.error.message}</Callout.Text>
      </Callout.Root>
    );
  }

  return (
    <Flex direction="column" gap="5">
      <title>{`${asset.data.name} · Poreline`}</title>
      <Breadcrumbs items={[{ label: 'Assets', to: '/assets' }, { label: asset.data.name }]} />
      <Flex direction="column" gap="1">
        <Flex align="center" gap="3" wrap="wrap">
          <Heading as="h1" size="7">
            {asset.data.name}
          </Heading>
          {me.data ? <Badge variant="soft">{roleInAsset(me.data, assetId) ?? asset.data.role}</Badge> : null}
          {me.data && roleInAsset(me.data, assetId) === 'admin' ? <EditAssetDialog asset={asset.data} /> : null}
        </Flex>
        {asset.data.description ? <Text color="gray">{asset.data.description}</Text> : null}
        <AssetLinks assetId={assetId} showAudit={me.data ? ['admin', 'reviewer'].includes(roleInAsset(me.data, assetId) ?? '') : false} />
      </Flex>

      {canEdit ? (
        <Card size="2">
          <NewWellForm assetId={assetId} />
        </Card>
      ) : null}

      <Flex direction="column" gap="2">
        <Heading as="h2" size="4">
          Wells and log runs
        </Heading>
        {canEdit ? (
          <Text size="2" color="gray">
            Drop LAS files (1.2, 2.0 or 3.0) on a well, or browse for them; several at once is fine.
          </Text>
        ) : null}
        <PanelErrorBoundary title="The wells table">
          {wells.isPending ? (
            <PageSpinner label="Loading wells…" />
          ) : wells.isError ? (
            <Callout.Root color="tomato" role="alert">
              <Callout.Text>Wells could not be loaded: {wells.error.message}</Callout.Text>
            </Callout.Root>
          ) : (
            <WellsTable assetId={assetId} wells={wells.data} canUpload={canEdit} />
          )}
        </PanelErrorBoundary>
      </Flex>

      {asset.data.isDemo ? (
        <PanelErrorBoundary title="The model-vs-evaluated check">
          <DemoCheckPanel assetId={assetId} />
        </PanelErrorBoundary>
      ) : null}
    </Flex>
  );
}

/** Links to the asset's formations, zone table, reserves cases and (admins, reviewers) audit log. */
function AssetLinks({ assetId, showAudit }: { assetId: string; showAudit: boolean }) {
  return (
    <nav aria-label="Asset pages">
      <Flex gap="4" mt="1">
        <Link className="strong-link" to={`/assets/${assetId}/formations`}>
          Formations and cutoffs
        </Link>
        <Link className="strong-link" to={`/assets/${assetId}/zone-table`}>
          Zone table
        </Link>
        <Link className="strong-link" to={`/assets/${assetId}/reserves`}>
          Reserves cases
        </Link>
        {showAudit ? (
          <Link className="strong-link" to={`/assets/${assetId}/audit`}>
            Audit log
          </Link>
        ) : null}
      </Flex>
    </nav>
  );
}
