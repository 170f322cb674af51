import '../../styles/workbench.css';
import { Callout, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { formationsQueryOptions, useFormations } from '../../features/formations/api/get-formations';
import { zoneTableQueryOptions } from '../../features/zone-tables/api/zone-table';
import { AssetZoneTable } from '../../features/zone-tables/components/asset-zone-table';
import { requireUser } from './require-user';

export const zoneTableLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const assetId = params.assetId!;
    await queryClient.ensureQueryData(assetQueryOptions(assetId));
    void queryClient.prefetchQuery(formationsQueryOptions(assetId));
    void queryClient.prefetchQuery(zoneTableQueryOptions(assetId, null));
    return null;
  };

/** /assets/:assetId/zone-table: zone summaries across the asset's wells, with exports. */
export function ZoneTableRoute() {
  const assetId = useParams().assetId!;
  const asset = useAsset(assetId);
  const formations = useFormations(assetId);
  const name = asset.data?.name ?? 'Asset';
  return (
    <Flex direction="column" gap="4">
      <title>{`Zone table · ${name} · Poreline`}</title>
      <Breadcrumbs items={[{ label: 'Assets', to: '/assets' }, { label: name, to: `/assets/${assetId}` }, { label: 'Zone table' }]} />
      <Heading as="h1" size="6">
        Zone summaries across wells
      </Heading>
      <Text size="2" color="gray">
        Numbers are estimates from log evaluation. Reserves classification and reporting follow the applicable rules (for example SPE-PRMS or the
        local regulator) and need sign-off by a qualified evaluator.
      </Text>
      {formations.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>{formations.error.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <AssetZoneTable assetId={assetId} assetName={name} formations={formations.data ?? []} />
      )}
    </Flex>
  );
}
