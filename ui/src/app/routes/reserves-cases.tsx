import '../../styles/workbench.css';
import '../../styles/reserves.css';
import { Callout, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { PageSpinner } from '../../components/page-spinner';
import { PanelErrorBoundary } from '../../components/panel-error-boundary';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { useMe } from '../../features/auth/api/get-me';
import { roleInAsset } from '../../features/auth/utils/permissions';
import { formationsQueryOptions, useFormations } from '../../features/formations/api/get-formations';
import { reservesCasesQueryOptions, useReservesCases } from '../../features/reserves/api/get-reserves-cases';
import { CasesList } from '../../features/reserves/components/cases-list';
import { NewCaseForm } from '../../features/reserves/components/new-case-form';
import { ReservesCaution } from '../../features/reserves/components/reserves-caution';
import { requireUser } from './require-user';

export const reservesCasesLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const assetId = params.assetId!;
    await Promise.all([
      queryClient.ensureQueryData(assetQueryOptions(assetId)),
      queryClient.prefetchQuery(reservesCasesQueryOptions(assetId)),
      queryClient.prefetchQuery(formationsQueryOptions(assetId)),
    ]);
    return null;
  };

/** /assets/:assetId/reserves: the asset's reserves cases and a form to start one. */
export function ReservesCasesRoute() {
  const assetId = useParams().assetId!;
  const asset = useAsset(assetId);
  const cases = useReservesCases(assetId);
  const formations = useFormations(assetId);
  const me = useMe();
  const role = me.data ? roleInAsset(me.data, assetId) : null;
  const canEdit = role === 'engineer' || role === 'admin';
  return (
    <Flex direction="column" gap="4">
      <title>{`Reserves cases · ${asset.data?.name ?? 'Asset'} · Poreline`}</title>
      <Breadcrumbs items={[{ label: 'Assets', to: '/assets' }, { label: asset.data?.name ?? 'Asset', to: `/assets/${assetId}` }, { label: 'Reserves cases' }]} />
      <Heading as="h1" size="6">
        Reserves cases
      </Heading>
      <Text color="gray" size="2">
        A case takes net pay, porosity and Sw of a target formation from approved interpretations, adds area, fluid and recovery factor, and gives deterministic and Monte Carlo volumes.
      </Text>
      <ReservesCaution />
      {canEdit ? (
        <Card size="2">
          {formations.isError ? (
            <Text color="tomato">{formations.error.message}</Text>
          ) : (
            <NewCaseForm assetId={assetId} formations={formations.data ?? []} />
          )}
        </Card>
      ) : null}
      <PanelErrorBoundary title="The cases list">
        {cases.isPending ? (
          <PageSpinner label="Loading cases…" />
        ) : cases.isError ? (
          <Callout.Root color="tomato" role="alert">
            <Callout.Text>{cases.error.message}</Callout.Text>
          </Callout.Root>
        ) : (
          <CasesList assetId={assetId} cases={cases.data} />
        )}
      </PanelErrorBoundary>
    </Flex>
  );
}
