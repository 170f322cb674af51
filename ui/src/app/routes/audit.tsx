import '../../styles/workbench.css';
import { Callout, Flex, Heading } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Breadcrumbs } from '../../components/breadcrumbs';
import { assetQueryOptions, useAsset } from '../../features/assets/api/get-asset';
import { useMe } from '../../features/auth/api/get-me';
import { roleInAsset } from '../../features/auth/utils/permissions';
import { AuditLog } from '../../features/review/components/audit-log';
import { canSeeAudit } from '../../features/review/utils/review-permissions';
import { requireUser } from './require-user';

export const auditLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    await queryClient.ensureQueryData(assetQueryOptions(params.assetId!));
    return null;
  };

/** /assets/:assetId/audit: the asset's audit log (admins and reviewers). */
export function AuditRoute() {
  const assetId = useParams().assetId!;
  const asset = useAsset(assetId);
  const me = useMe();
  const allowed = me.data ? canSeeAudit(roleInAsset(me.data, assetId)) : false;
  const name = asset.data?.name ?? 'Asset';
  return (
    <Flex direction="column" gap="4">
      <title>{`Audit log · ${name} · Poreline`}</title>
      <Breadcrumbs items={[{ label: 'Assets', to: '/assets' }, { label: name, to: `/assets/${assetId}` }, { label: 'Audit log' }]} />
      <Heading as="h1" size="6">
        Audit log
      </Heading>
      {allowed ? (
        <AuditLog assetId={assetId} />
      ) : (
        <Callout.Root color="amber" role="alert">
          <Callout.Text>The audit log is open to admins and reviewers of this asset.</Callout.Text>
        </Callout.Root>
      )}
    </Flex>
  );
}
