import '../../styles/workbench.css';
import '../../styles/reserves.css';
import { Callout, Flex } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { PageSpinner } from '../../components/page-spinner';
import { PanelErrorBoundary } from '../../components/panel-error-boundary';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { useMe } from '../../features/auth/api/get-me';
import { roleInAsset } from '../../features/auth/utils/permissions';
import { CrossChecksPanel } from '../../features/production/components/cross-checks-panel';
import { GasInflowCalculator } from '../../features/production/components/gas-inflow-calculator';
import { InflowCalculator } from '../../features/production/components/inflow-calculator';
import { reservesCaseQueryOptions, useReservesCase } from '../../features/reserves/api/get-reserves-case';
import { useUpdateReservesCase } from '../../features/reserves/api/update-reserves-case';
import { CaseEditor } from '../../features/reserves/components/case-editor';
import type { DeclineCheck } from '../../types/reserves';
import { requireUser } from './require-user';

export const reservesCaseLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const assetId = params.assetId!;
    await Promise.all([queryClient.ensureQueryData(assetQueryOptions(assetId)), queryClient.prefetchQuery(reservesCaseQueryOptions(assetId, params.caseId!))]);
    return null;
  };

/**
 * /assets/:assetId/reserves/:caseId: one reserves case. The page composes the case editor
 * (reserves feature) with the production cross-checks and the inflow calculator (production
 * feature); a decline fit is kept with the case through the case's update.
 */
export function ReservesCaseRoute() {
  const params = useParams();
  const assetId = params.assetId!;
  const caseId = params.caseId!;
  const asset = useAsset(assetId);
  const found = useReservesCase(assetId, caseId);
  const update = useUpdateReservesCase(assetId, caseId);
  const me = useMe();
  const role = me.data ? roleInAsset(me.data, assetId) : null;
  const canEdit = role === 'engineer' || role === 'admin';
  const canReview = role === 'reviewer' || role === 'admin';

  if (found.isPending) return <PageSpinner label="Loading case…" />;
  if (found.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>{found.error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const c = found.data;
  const editable = canEdit && (c.status === 'draft' || c.status === 'returned');
  const keepDecline = (seriesId: string, check: DeclineCheck) => update.mutate({ inputs: { declineChecks: { ...c.inputs.declineChecks, [seriesId]: check } } });
  const netPayFt = c.combined ? (c.inputs.lengthUnit === 'ft' ? c.combined.final.netPay : c.combined.final.netPay / 0.3048) : null;
  return (
    <Flex direction="column" gap="4">
      <title>{`${c.name} · Reserves · Poreline`}</title>
      <Breadcrumbs
        items={[
          { label: 'Assets', to: '/assets' },
          { label: asset.data?.name ?? 'Asset', to: `/assets/${assetId}` },
          { label: 'Reserves cases', to: `/assets/${assetId}/reserves` },
          { label: c.name },
        ]}
      />
      <CaseEditor
        assetId={assetId}
        reservesCase={c}
        canEdit={canEdit}
        canReview={canReview}
        crossChecks={
          <PanelErrorBoundary title="The cross-checks">
            <CrossChecksPanel
              assetId={assetId}
              caseId={c.id}
              caseRevision={c.revision}
              wells={c.sources.map((s) => ({ wellId: s.wellId, wellName: s.wellName }))}
              canUpload={canEdit}
              declineChecks={c.inputs.declineChecks}
              onKeepDecline={editable ? keepDecline : undefined}
            />
          </PanelErrorBoundary>
        }
        inflow={
          <PanelErrorBoundary title="The inflow calculator">
            {c.inputs.fluid === 'gas' ? (
              <GasInflowCalculator assetId={assetId} netPayFt={netPayFt} gas={c.inputs.gas} />
            ) : (
              <InflowCalculator assetId={assetId} netPayFt={netPayFt} bo={c.inputs.bo} />
            )}
          </PanelErrorBoundary>
        }
      />
    </Flex>
  );
}
