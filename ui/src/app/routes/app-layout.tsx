import { Badge, Box, Button, Container, Flex, Separator, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { NavLink, Outlet, useNavigation, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageSpinner } from '../../components/page-spinner';
import { Wordmark } from '../../components/wordmark';
import { useMe } from '../../features/auth/api/get-me';
import { useSignOut } from '../../features/auth/hooks/use-sign-out';
import { roleLabel } from '../../features/auth/utils/permissions';
import { requireUser } from './require-user';

/** Every page but sign-in needs a user: no token sends to /sign-in (remembering where to return). */
export const appLayoutLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) =>
    requireUser(queryClient, request);

/** The shell: product name, main navigation, the signed-in user with their role, their account page, sign out. */
export function AppLayout() {
  const me = useMe();
  const { assetId } = useParams();
  const signOut = useSignOut();
  const navigation = useNavigation();

  return (
    <Flex direction="column" minHeight="100vh">
      <header className="shell-header">
        <Container size="4" px="4">
          <Flex align="center" justify="between" gap="4" py="3">
            <Flex align="center" gap="5">
              <NavLink to="/assets" aria-label="Poreline, go to assets" style={{ textDecoration: 'none', color: 'inherit' }}>
                <Wordmark />
              </NavLink>
              <nav aria-label="Main">
                <NavLink to="/assets" className="strong-link" end>
                  Assets
                </NavLink>
                {me.data?.isAdmin ? (
                  <NavLink to="/admin" end className="strong-link" style={{ marginLeft: 'var(--space-4)' }}>
                    Team and assets
                  </NavLink>
                ) : null}
                {me.data?.isAdmin ? (
                  <NavLink to="/admin/mail" className="strong-link" style={{ marginLeft: 'var(--space-4)' }}>
                    Mail
                  </NavLink>
                ) : null}
              </nav>
            </Flex>
            {me.data ? (
              <Flex align="center" gap="3">
                <Flex direction="column" align="end">
                  <Text size="2" weight="medium">
                    {me.data.name}
                  </Text>
                  <Text size="1" color="gray">
                    {me.data.email}
                  </Text>
                </Flex>
                <Badge variant="soft" title="Your role">
                  {roleLabel(me.data, assetId)}
                </Badge>
                <Separator orientation="vertical" size="2" />
                <NavLink to="/account" className="strong-link">
                  Your account
                </NavLink>
                <Button variant="ghost" color="gray" onClick={signOut}>
                  Sign out
                </Button>
              </Flex>
            ) : null}
          </Flex>
        </Container>
        {navigation.state === 'loading' ? <div className="shell-progress" role="progressbar" aria-label="Loading page" /> : <Box height="2px" />}
      </header>
      <main className="shell-main">
        <Container size="4" px="4" py="5">
          {me.data ? <Outlet /> : <PageSpinner />}
        </Container>
      </main>
    </Flex>
  );
}
