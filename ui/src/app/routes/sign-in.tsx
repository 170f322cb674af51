import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import { redirect, useNavigate, useSearchParams } from 'react-router-dom';
import { Wordmark } from '../../components/wordmark';
import { getSetupStatus } from '../../features/auth/api/get-setup-status';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { getToken } from '../../lib/auth-token';

/**
 * A signed-in user has nothing to do here; a new installation without any account goes to
 * /setup for its first admin. If the set-up check fails, the sign-in form is shown anyway.
 */
export async function signInLoader() {
  if (getToken()) return redirect('/assets');
  const status = await getSetupStatus().catch(() => null);
  return status?.needsFirstAdmin ? redirect('/setup') : null;
}

/** Only same-site paths are followed after sign-in. */
export function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/sign-in') && next !== '/' ? next : '/assets';
}

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <Flex className="sign-in-page" align="center" justify="center" p="4">
      <title>Sign in · Poreline</title>
      <Card size="4" style={{ width: '100%', maxWidth: 400 }}>
        <Flex direction="column" gap="5">
          <Flex direction="column" gap="2">
            <Wordmark size="lg" />
            <Text size="2" color="gray">
              Well logs to net pay an asset team can defend.
            </Text>
          </Flex>
          <Heading as="h1" size="5">
            Sign in
          </Heading>
          <SignInForm onSignedIn={() => navigate(safeNext(params.get('next')), { replace: true })} />
        </Flex>
      </Card>
    </Flex>
  );
}
