import type { ReviewStatus } from '@poreline/schema';

/** A review step on an existing version. */
export type ReviewAction = 'submit' | 'approve' | 'return';

/** From which statuses each step may be taken, and where it leads. */
export const REVIEW_STEPS: Readonly<Record<ReviewAction, { from: readonly ReviewStatus[]; to: ReviewStatus }>> = {
  submit: { from: ['draft', 'returned'], to: 'submitted' },
  approve: { from: ['submitted'], to: 'approved' },
  return: { from: ['submitted'], to: 'returned' },
};

/** What "Save" does given the newest version's status. */
export type SavePlan = { kind: 'update'; from: readonly ReviewStatus[] } | { kind: 'new-version' } | { kind: 'refuse'; reason: string };

/**
 * Save on the newest version: a draft or returned version is updated in place (and becomes a
 * draft); after an approved version (or none) a new version starts as a draft; a submitted
 * version waits for review and cannot change.
 */
export function planSave(latest: ReviewStatus | null): SavePlan {
  if (latest === null || latest === 'approved') return { kind: 'new-version' };
  if (latest === 'submitted') return { kind: 'refuse', reason: 'it is waiting for review; a reviewer must approve or return it first' };
  return { kind: 'update', from: ['draft', 'returned'] };
}

/**
 * The status after a review step, or the reason it is refused.
 * @example reviewStep('submitted', 'approve') // { ok: true, to: 'approved' }
 */
export function reviewStep(current: ReviewStatus, action: ReviewAction): { ok: true; to: ReviewStatus } | { ok: false; reason: string } {
  const step = REVIEW_STEPS[action];
  if (step.from.includes(current)) return { ok: true, to: step.to };
  const verbs = { submit: 'submitted', approve: 'approved', return: 'returned' } as const;
  return { ok: false, reason: `a ${current} version cannot be ${verbs[action]} (only a ${step.from.join(' or ')} one can)` };
}
