import '../../styles/workbench.css';
import { Callout, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { PageSpinner } from '../../components/page-spinner';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { useMe } from '../../features/auth/api/get-me';
import { canEditWells } from '../../features/auth/utils/permissions';
import { formationsQueryOptions, useFormations } from '../../features/formations/api/get-formations';
import { FormationsManager } from '../../features/formations/components/formations-manager';
import { requireUser } from './require-user';

export const formationsLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const assetId = params.assetId!;
    await Promise.all([queryClient.ensureQueryData(assetQueryOptions(assetId)), queryClient.prefetchQuery(formationsQueryOptions(assetId))]);
    return null;
  };

/** /assets/:assetId/formations: formation names, order, colours and cutoffs of the asset. */
export function FormationsRoute() {
  const assetId = useParams().assetId!;
  const asset = useAsset(assetId);
  const formations = useFormations(assetId);
  const me = useMe();
  const canEdit = me.data ? canEditWells(me.data, assetId) : false;
  return (
    <Flex direction="column" gap="4">
      <title>{`Formations · ${asset.data?.name ?? 'Asset'} · Poreline`}</title>
      <Breadcrumbs items={[{ label: 'Assets', to: '/assets' }, { label: asset.data?.name ?? 'Asset', to: `/assets/${assetId}` }, { label: 'Formations' }]} />
      <Heading as="h1" size="6">
        Formations and cutoffs
      </Heading>
      <Text color="gray" size="2">
        Names are defined once for the asset, top to bottom. Cutoffs set here apply to the formation in every well; cutoffs are inclusive.
      </Text>
      {formations.isPending ? (
        <PageSpinner label="Loading formations…" />
      ) : formations.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>{formations.error.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <FormationsManager assetId={assetId} formations={formations.data} canEdit={canEdit} />
      )}
    </Flex>
  );
}
