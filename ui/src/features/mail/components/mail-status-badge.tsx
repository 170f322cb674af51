import { Badge } from '@radix-ui/themes';
import type { MailNotice } from '../../../types/mail';

/** Where a notice stands; in catcher mode a sent notice was received here, not delivered. */
export function MailStatusBadge({ notice }: { notice: Pick<MailNotice, 'status' | 'caught'> }) {
  if (notice.status === 'failed') {
    return (
      <Badge color="tomato" variant="soft">
        not sent
      </Badge>
    );
  }
  if (notice.status === 'pending') {
    return (
      <Badge color="gray" variant="soft">
        sending
      </Badge>
    );
  }
  return (
    <Badge color={notice.caught ? 'indigo' : 'grass'} variant="soft">
      {notice.caught ? 'caught here' : 'sent'}
    </Badge>
  );
}
