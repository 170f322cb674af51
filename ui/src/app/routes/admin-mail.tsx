import { Callout, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageSpinner } from '../../components/page-spinner';
import { PanelErrorBoundary } from '../../components/panel-error-boundary';
import { useMe } from '../../features/auth/api/get-me';
import { mailQueryOptions, useMail } from '../../features/mail/api/get-mail';
import { MailNoticePanel } from '../../features/mail/components/mail-notice-panel';
import { MailTable } from '../../features/mail/components/mail-table';
import { requireUser } from './require-user';

export const adminMailLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await requireUser(queryClient, request);
    if (me.isAdmin) await queryClient.ensureQueryData(mailQueryOptions());
    return null;
  };

/** /admin/mail: the e-mail notices of review steps, and where they go (organisation admins). */
export function AdminMailRoute() {
  const me = useMe();
  const mail = useMail();
  const [params, setParams] = useSearchParams();
  if (!me.data?.isAdmin) {
    return (
      <Callout.Root color="amber" role="alert">
        <Callout.Text>E-mail notices are shown to the organisation's admins.</Callout.Text>
      </Callout.Root>
    );
  }
  const selected = params.get('notice');
  return (
    <Flex direction="column" gap="5">
      <title>Mail notices · Poreline</title>
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Mail notices
        </Heading>
        <Text color="gray">Reviewers hear when an interpretation or a reserves case waits for them; authors when it is approved or returned.</Text>
      </Flex>
      {mail.isPending ? (
        <PageSpinner label="Loading notices…" />
      ) : mail.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>Notices could not be loaded: {mail.error.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <>
          <Callout.Root color={mail.data.mode === 'catcher' ? 'amber' : 'gray'} role="status">
            <Callout.Text>
              {mail.data.mode === 'catcher'
                ? 'No SMTP server is set (SMTP_URL), so notices are caught here and not delivered. Set SMTP_URL to send them.'
                : 'Notices go out through the SMTP server set in SMTP_URL.'}
            </Callout.Text>
          </Callout.Root>
          {mail.data.messages.length === 0 ? (
            <Text color="gray">No notices yet: they are written when someone submits, approves or returns an interpretation or a reserves case.</Text>
          ) : (
            <MailTable notices={mail.data.messages} selectedId={selected} onSelect={(id) => setParams({ notice: id }, { replace: true, preventScrollReset: true })} />
          )}
          {selected ? (
            <Card>
              <PanelErrorBoundary title="The notice">
                <MailNoticePanel key={selected} id={selected} />
              </PanelErrorBoundary>
            </Card>
          ) : null}
        </>
      )}
    </Flex>
  );
}
