import { Badge } from '@radix-ui/themes';
import type { ReviewStatus } from '../../../types/workbench';
import { STATUS_COLOUR, STATUS_TEXT } from '../utils/review-permissions';

/** A version's review status as a small coloured label. */
export function StatusBadge({ status, version }: { status: ReviewStatus; version?: number }) {
  return (
    <Badge color={STATUS_COLOUR[status]} variant="soft" data-status={status}>
      {version !== undefined ? `v${version} · ` : ''}
      {STATUS_TEXT[status]}
    </Badge>
  );
}
