import '../../styles/workbench.css';
import { Button, Callout, Card, Flex, Heading, Separator, Table, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageSpinner } from '../../components/page-spinner';
import { PanelErrorBoundary } from '../../components/panel-error-boundary';
import { usersQueryOptions, useUsers } from '../../features/admin/api/get-users';
import { MembersPanel } from '../../features/admin/components/members-panel';
import { NewUserForm } from '../../features/admin/components/new-user-form';
import { UsersTable } from '../../features/admin/components/users-table';
import { assetsQueryOptions, useAssets } from '../../features/assets/api/get-assets';
import { EditAssetDialog } from '../../features/assets/components/edit-asset-dialog';
import { NewAssetForm } from '../../features/assets/components/new-asset-form';
import { useMe } from '../../features/auth/api/get-me';
import { requireUser } from './require-user';

export const adminLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await requireUser(queryClient, request);
    if (me.isAdmin) await Promise.all([queryClient.ensureQueryData(usersQueryOptions()), queryClient.ensureQueryData(assetsQueryOptions())]);
    return null;
  };

/** /admin: the organisation's people and assets (created, renamed, edited), and who holds which role in each asset (organisation admins). */
export function AdminRoute() {
  const me = useMe();
  if (!me.data?.isAdmin) {
    return (
      <Callout.Root color="amber" role="alert">
        <Callout.Text>Team and assets are managed by the organisation's admins.</Callout.Text>
      </Callout.Root>
    );
  }
  return (
    <Flex direction="column" gap="6">
      <title>Team and assets · Poreline</title>
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Team and assets
        </Heading>
        <Text color="gray">Create accounts and assets, and give each person a role per asset.</Text>
      </Flex>
      <PanelErrorBoundary title="The people list">
        <PeopleSection currentUserId={me.data.id} />
      </PanelErrorBoundary>
      <Separator size="4" />
      <PanelErrorBoundary title="The assets list">
        <AssetsSection />
      </PanelErrorBoundary>
    </Flex>
  );
}

function PeopleSection({ currentUserId }: { currentUserId: string }) {
  const users = useUsers();
  return (
    <section aria-labelledby="admin-people">
      <Flex direction="column" gap="4">
        <Heading as="h2" size="5" id="admin-people">
          People
        </Heading>
        {users.isPending ? (
          <PageSpinner label="Loading people…" />
        ) : users.isError ? (
          <Callout.Root color="tomato" role="alert">
            <Callout.Text>People could not be loaded: {users.error.message}</Callout.Text>
          </Callout.Root>
        ) : (
          <UsersTable users={users.data} currentUserId={currentUserId} />
        )}
        <Card>
          <NewUserForm />
        </Card>
      </Flex>
    </section>
  );
}

function AssetsSection() {
  const assets = useAssets();
  const users = useUsers();
  const [params, setParams] = useSearchParams();
  const list = assets.data ?? [];
  const chosen = list.find((a) => a.id === params.get('asset')) ?? list[0];
  const choose = (assetId: string) => setParams({ asset: assetId }, { replace: true, preventScrollReset: true });

  return (
    <section aria-labelledby="admin-assets">
      <Flex direction="column" gap="4">
        <Heading as="h2" size="5" id="admin-assets">
          Assets
        </Heading>
        {assets.isPending ? (
          <PageSpinner label="Loading assets…" />
        ) : assets.isError ? (
          <Callout.Root color="tomato" role="alert">
            <Callout.Text>Assets could not be loaded: {assets.error.message}</Callout.Text>
          </Callout.Root>
        ) : list.length === 0 ? (
          <Text color="gray">No assets yet: create the first one below, then add people to it.</Text>
        ) : (
          <Table.Root variant="surface" size="2">
            <caption className="visually-hidden">Assets of the organisation</caption>
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Asset</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Description</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>
                  <span className="visually-hidden">Members and edit</span>
                </Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {list.map((a) => (
                <Table.Row key={a.id} aria-current={a.id === chosen?.id ? 'true' : undefined}>
                  <Table.RowHeaderCell>{a.name}</Table.RowHeaderCell>
                  <Table.Cell>
                    <Text color="gray">{a.description || '–'}</Text>
                  </Table.Cell>
                  <Table.Cell>
                    <Flex gap="2" justify="end">
                      <Button size="1" variant={a.id === chosen?.id ? 'solid' : 'soft'} aria-label={`Members of ${a.name}`} onClick={() => choose(a.id)}>
                        Members
                      </Button>
                      <EditAssetDialog asset={a} />
                    </Flex>
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        )}
        <Card>
          <NewAssetForm onCreated={(asset) => choose(asset.id)} />
        </Card>
        {chosen ? (
          <Card>
            <MembersPanel key={chosen.id} assetId={chosen.id} assetName={chosen.name} knownEmails={users.data?.map((u) => u.email)} />
          </Card>
        ) : null}
      </Flex>
    </section>
  );
}
