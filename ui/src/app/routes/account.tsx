import { Card, DataList, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ChangePasswordForm } from '../../features/account/components/change-password-form';
import { useMe } from '../../features/auth/api/get-me';
import { roleLabel } from '../../features/auth/utils/permissions';
import { requireUser } from './require-user';

export const accountLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    return null;
  };

/** /account: the signed-in user's own account (any role): who they are, and their password. */
export function AccountRoute() {
  const me = useMe();
  if (!me.data) return null;
  return (
    <Flex direction="column" gap="5">
      <title>Your account · Poreline</title>
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Your account
        </Heading>
        <Text color="gray">Your name and e-mail are kept by your organisation's admins; ask them to change either.</Text>
      </Flex>
      <DataList.Root>
        <DataList.Item>
          <DataList.Label>Name</DataList.Label>
          <DataList.Value>{me.data.name}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>E-mail</DataList.Label>
          <DataList.Value>
            <span className="mono">{me.data.email}</span>
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Roles</DataList.Label>
          <DataList.Value>{me.data.isAdmin ? 'organisation admin (every asset, as admin)' : roleLabel(me.data)}</DataList.Value>
        </DataList.Item>
      </DataList.Root>
      <Card style={{ maxWidth: 460 }}>
        <ChangePasswordForm />
      </Card>
    </Flex>
  );
}
