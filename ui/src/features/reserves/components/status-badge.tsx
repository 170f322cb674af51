import { Badge } from '@radix-ui/themes';
import type { ReviewStatus } from '../../../types/reserves';

const COLOURS: Record<ReviewStatus, 'gray' | 'blue' | 'jade' | 'orange'> = { draft: 'gray', submitted: 'blue', approved: 'jade', returned: 'orange' };
const LABELS: Record<ReviewStatus, string> = { draft: 'Draft', submitted: 'Waiting for review', approved: 'Approved', returned: 'Returned' };

/** The review state of a case. */
export function CaseStatusBadge({ status }: { status: ReviewStatus }) {
  return (
    <Badge color={COLOURS[status]} variant="soft" size="2">
      {LABELS[status]}
    </Badge>
  );
}
