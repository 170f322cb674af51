import { Button, Callout, Flex, Text, TextArea } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { ReservesCase } from '../../../types/reserves';
import { useApproveReservesCase } from '../api/approve-reserves-case';
import { useCopyReservesCase } from '../api/copy-reserves-case';
import { useExportReservesCase } from '../api/export-reserves-case';
import { useReturnReservesCase } from '../api/return-reserves-case';
import { useSubmitReservesCase } from '../api/submit-reserves-case';

export interface ReviewActionsProps {
  assetId: string;
  reservesCase: ReservesCase;
  canEdit: boolean;
  canReview: boolean;
}

/** Submit for review (author), approve or return with a comment (reviewer), copy, export. */
export function ReviewActions({ assetId, reservesCase: c, canEdit, canReview }: ReviewActionsProps) {
  const id = useId();
  const navigate = useNavigate();
  const submit = useSubmitReservesCase(assetId, c.id);
  const approve = useApproveReservesCase(assetId, c.id);
  const ret = useReturnReservesCase(assetId, c.id);
  const copy = useCopyReservesCase(assetId, c.id);
  const exporter = useExportReservesCase(assetId, c.id);
  const [comment, setComment] = useState('');
  const [commentError, setCommentError] = useState<string | null>(null);
  const editable = c.status === 'draft' || c.status === 'returned';
  const error = submit.error ?? approve.error ?? ret.error ?? copy.error ?? exporter.error;
  const submitBlocked = !c.resultsCurrent ? 'Run the case first.' : c.staleSources ? 'Refresh the stale sources first.' : null;

  return (
    <Flex direction="column" gap="2">
      <Flex gap="2" wrap="wrap" align="center">
        {canEdit && editable ? (
          <Button onClick={() => submit.mutate(undefined)} loading={submit.isPending} disabled={!!submitBlocked} title={submitBlocked ?? undefined}>
            Submit for review
          </Button>
        ) : null}
        {canEdit ? (
          <Button variant="soft" color="gray" onClick={() => copy.mutate(undefined, { onSuccess: (n) => navigate(`/assets/${assetId}/reserves/${n.id}`) })} loading={copy.isPending}>
            Copy to a new draft
          </Button>
        ) : null}
        <Button variant="soft" onClick={() => exporter.mutate({ name: c.name, revision: c.revision })} loading={exporter.isPending}>
          Export XLSX
        </Button>
        {submitBlocked && canEdit && editable ? (
          <Text size="1" color="gray">
            {submitBlocked}
          </Text>
        ) : null}
      </Flex>
      {canReview && c.status === 'submitted' ? (
        <Flex direction="column" gap="2" className="rc-review-box">
          <Text as="label" htmlFor={`${id}-comment`} size="2" weight="medium">
            Review comment (required to return)
          </Text>
          <TextArea id={`${id}-comment`} value={comment} onChange={(e) => setComment(e.currentTarget.value)} rows={2} aria-invalid={commentError ? true : undefined} />
          {commentError ? (
            <Text size="1" color="tomato">
              {commentError}
            </Text>
          ) : null}
          <Flex gap="2">
            <Button color="jade" onClick={() => approve.mutate(comment.trim() || undefined)} loading={approve.isPending}>
              Approve
            </Button>
            <Button
              color="orange"
              variant="soft"
              onClick={() => {
                if (!comment.trim()) {
                  setCommentError('Say what should change before returning the case.');
                  return;
                }
                setCommentError(null);
                ret.mutate(comment.trim());
              }}
              loading={ret.isPending}
            >
              Return
            </Button>
          </Flex>
        </Flex>
      ) : null}
      {error ? (
        <Callout.Root color="tomato" size="1" role="alert">
          <Callout.Text>{error.message}</Callout.Text>
        </Callout.Root>
      ) : null}
    </Flex>
  );
}
