import type { Role } from '../../../types/api';
import type { ReviewStatus } from '../../../types/workbench';

/** Petrophysicists (and admins) save and submit interpretations. */
export function canAuthor(role: Role | null): boolean {
  return role === 'petrophysicist' || role === 'admin';
}

/** Reviewers (and admins) approve or return what was submitted. */
export function canReview(role: Role | null): boolean {
  return role === 'reviewer' || role === 'admin';
}

/** The audit log is for admins and reviewers. */
export function canSeeAudit(role: Role | null): boolean {
  return role === 'reviewer' || role === 'admin';
}

/** Poreline's own words for the review states. */
export const STATUS_TEXT: Record<ReviewStatus, string> = {
  draft: 'draft',
  submitted: 'waiting for review',
  approved: 'approved',
  returned: 'returned',
};

export const STATUS_COLOUR: Record<ReviewStatus, 'gray' | 'amber' | 'jade' | 'tomato'> = {
  draft: 'gray',
  submitted: 'amber',
  approved: 'jade',
  returned: 'tomato',
};
