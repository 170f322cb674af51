import { Button, Callout, Flex, Heading, Table, Text, TextArea } from '@radix-ui/themes';
import { useState, type ReactNode } from 'react';
import { formatDateTime } from '../../../lib/format';
import type { Role } from '../../../types/api';
import type { InterpretationDto } from '../../../types/workbench';
import { useInterpretations } from '../api/interpretations';
import { useReviewAction, type ReviewAction } from '../api/review-actions';
import { canAuthor, canReview } from '../utils/review-permissions';
import { StatusBadge } from './status-badge';

export interface VersionsPanelProps {
  assetId: string;
  wellId: string;
  role: Role | null;
  /** Extra controls per version (exports), supplied by the page. */
  versionActions?: (version: InterpretationDto) => ReactNode;
}

function who(v: InterpretationDto['reviewedBy']): string {
  return v?.name ?? '';
}

/**
 * The well's interpretation versions, newest first, and the review step on the latest:
 * the author submits a draft (or a returned version); a reviewer approves it or returns it
 * with a comment. Approved versions are final; the next save starts a new version.
 */
export function VersionsPanel({ assetId, wellId, role, versionActions }: VersionsPanelProps) {
  const versions = useInterpretations(assetId, wellId);
  const review = useReviewAction(assetId, wellId);
  const [comment, setComment] = useState('');
  const [commentError, setCommentError] = useState<string | null>(null);

  if (versions.isPending) return <Text color="gray">Loading versions…</Text>;
  if (versions.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>Versions could not be loaded: {versions.error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const list = versions.data;
  const latest = list[0] ?? null;
  const run = (action: ReviewAction) => {
    if (!latest) return;
    if (action === 'return' && !comment.trim()) {
      setCommentError('Comment is required to return a version: say what to change.');
      return;
    }
    setCommentError(null);
    review.mutate(
      { id: latest.id, action, comment },
      {
        onSuccess: () => setComment(''),
      },
    );
  };

  return (
    <Flex direction="column" gap="3">
      <Heading as="h3" size="3">
        Versions and review
      </Heading>
      {latest === null ? (
        <Text color="gray">No version saved yet. “Save” stores the first one as a draft.</Text>
      ) : (
        <Flex direction="column" gap="2" className="review-box" aria-label="Review of the latest version" role="group">
          <Flex align="center" gap="2" wrap="wrap">
            <Text weight="medium">Latest:</Text>
            <StatusBadge status={latest.status} version={latest.version} />
            {latest.reviewComment ? (
              <Text size="2" color="gray">
                “{latest.reviewComment}”{who(latest.reviewedBy) ? ` (${who(latest.reviewedBy)})` : ''}
              </Text>
            ) : null}
          </Flex>
          {(latest.status === 'draft' || latest.status === 'returned') && canAuthor(role) ? (
            <Flex gap="2" align="center">
              <Button onClick={() => run('submit')} loading={review.isPending && review.variables?.action === 'submit'}>
                Submit for review
              </Button>
              <Text size="1" color="gray">
                Reviewers of this asset will see it waiting.
              </Text>
            </Flex>
          ) : null}
          {latest.status === 'submitted' && canReview(role) ? (
            <Flex direction="column" gap="2">
              <label htmlFor="review-comment">
                <Text size="2" weight="medium">
                  Review comment
                </Text>{' '}
                <Text size="1" color="gray">
                  (required to return)
                </Text>
              </label>
              <TextArea
                id="review-comment"
                value={comment}
                onChange={(e) => setComment(e.currentTarget.value)}
                aria-invalid={commentError ? true : undefined}
                rows={2}
              />
              {commentError ? (
                <Text size="1" color="tomato" role="alert">
                  {commentError}
                </Text>
              ) : null}
              <Flex gap="2">
                <Button color="jade" onClick={() => run('approve')} loading={review.isPending && review.variables?.action === 'approve'}>
                  Approve
                </Button>
                <Button color="tomato" variant="soft" onClick={() => run('return')} loading={review.isPending && review.variables?.action === 'return'}>
                  Return
                </Button>
              </Flex>
            </Flex>
          ) : null}
          {latest.status === 'submitted' && !canReview(role) ? (
            <Text size="2" color="gray">
              Waiting for a reviewer. Edits are locked until it is approved or returned.
            </Text>
          ) : null}
          {review.isError ? (
            <Callout.Root color="tomato" role="alert">
              <Callout.Text>{review.error.message}</Callout.Text>
            </Callout.Root>
          ) : null}
        </Flex>
      )}
      {list.length ? (
        <Table.Root size="1" variant="surface">
          <caption className="visually-hidden">Interpretation versions</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Version</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Updated</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Review</Table.ColumnHeaderCell>
              {versionActions ? <Table.ColumnHeaderCell>Files</Table.ColumnHeaderCell> : null}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {list.map((v) => (
              <Table.Row key={v.id} data-version={v.version}>
                <Table.RowHeaderCell>v{v.version}</Table.RowHeaderCell>
                <Table.Cell>
                  <StatusBadge status={v.status} />
                </Table.Cell>
                <Table.Cell>
                  <Text size="1">{formatDateTime(v.updatedAt)}</Text>
                </Table.Cell>
                <Table.Cell>
                  <Text size="1" color="gray">
                    {v.reviewedAt ? `${formatDateTime(v.reviewedAt)}${who(v.reviewedBy) ? ` by ${who(v.reviewedBy)}` : ''}` : v.submittedAt ? `submitted ${formatDateTime(v.submittedAt)}` : '–'}
                    {v.reviewComment ? ` · “${v.reviewComment}”` : ''}
                  </Text>
                </Table.Cell>
                {versionActions ? <Table.Cell>{versionActions(v)}</Table.Cell> : null}
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      ) : null}
    </Flex>
  );
}
