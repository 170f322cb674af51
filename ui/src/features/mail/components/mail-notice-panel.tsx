import { Callout, Flex, Heading, Text } from '@radix-ui/themes';
import { PageSpinner } from '../../../components/page-spinner';
import { formatDateTime } from '../../../lib/format';
import { useMailNotice } from '../api/get-mail';
import { MailStatusBadge } from './mail-status-badge';

/** One notice: who it went to, its text, and the raw message as the catcher received it. */
export function MailNoticePanel({ id }: { id: string }) {
  const notice = useMailNotice(id);
  if (notice.isPending) return <PageSpinner label="Loading the notice…" />;
  if (notice.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>The notice could not be loaded: {notice.error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const n = notice.data;
  return (
    <Flex direction="column" gap="3" aria-label="Notice" role="region">
      <Heading as="h3" size="4">
        {n.subject}
      </Heading>
      <Flex gap="3" align="center" wrap="wrap">
        <Text size="2">To {n.to}</Text>
        <MailStatusBadge notice={n} />
        <Text size="1" color="gray">
          written {formatDateTime(n.createdAt)}
          {n.sentAt ? `, accepted by the server ${formatDateTime(n.sentAt)}` : ''}
        </Text>
      </Flex>
      {n.error ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>The SMTP server or the connection refused it: {n.error}</Callout.Text>
        </Callout.Root>
      ) : null}
      <pre className="mail-body">{n.body}</pre>
      {n.raw ? (
        <details>
          <summary>
            <Text size="2">The message as the catcher received it (headers and body)</Text>
          </summary>
          <pre className="mail-body mail-raw">{n.raw}</pre>
        </details>
      ) : null}
    </Flex>
  );
}
