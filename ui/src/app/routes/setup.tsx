import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate } from 'react-router-dom';
import { Wordmark } from '../../components/wordmark';
import { setupStatusQueryOptions } from '../../features/auth/api/get-setup-status';
import { FirstAdminForm } from '../../features/auth/components/first-admin-form';
import { getToken } from '../../lib/auth-token';

/** Only a fresh real deployment (no users yet) shows this page; otherwise sign in (or carry on signed in). */
export const setupLoader = (queryClient: QueryClient) => async () => {
  if (getToken()) return redirect('/assets');
  const status = await queryClient.fetchQuery(setupStatusQueryOptions());
  return status.needsFirstAdmin ? null : redirect('/sign-in');
};

/** /setup: the first admin of a new installation (DEMO_MODE=false); they land in the admin area. */
export function SetupRoute() {
  const navigate = useNavigate();
  return (
    <Flex className="sign-in-page" align="center" justify="center" p="4">
      <title>First start · Poreline</title>
      <Card size="4" style={{ width: '100%', maxWidth: 440 }}>
        <Flex direction="column" gap="5">
          <Flex direction="column" gap="2">
            <Wordmark size="lg" />
            <Heading as="h1" size="5">
              Set up Poreline
            </Heading>
            <Text size="2" color="gray">
              This installation has no accounts yet. Create the first admin: they add the assets and the people, and give each person a role per asset.
            </Text>
          </Flex>
          <FirstAdminForm onCreated={() => navigate('/admin', { replace: true })} />
        </Flex>
      </Card>
    </Flex>
  );
}
