/** A step of the review workflow that sends notices. */
export type NoticeAction = 'submit' | 'approve' | 'return';

/** What went through review: a well's interpretation version, or a reserves case revision. */
export type ReviewedItem =
  | { kind: 'interpretation'; wellName: string; version: number }
  | { kind: 'reserves-case'; caseName: string; revision: number };

export interface ReviewNoticeInput {
  action: NoticeAction;
  item: ReviewedItem;
  assetName: string;
  actorName: string;
  recipientName: string;
  /** The reviewer's comment (approve: optional; return: required). */
  comment: string | null;
  /** Absolute address of the item in the app. */
  link: string;
}

/** The caution every notice about volumes carries (DESIGN: results are estimates). */
export const VOLUMES_CAUTION =
  'Volumes in Poreline are estimates. Classifying and reporting reserves follows the applicable rules (for example SPE-PRMS or the local regulator) and needs sign-off by a qualified evaluator.';

/** `interpretation.submitted`, `reserves-case.returned`, ... (stored with each notice). */
export function noticeEvent(item: ReviewedItem, action: NoticeAction): string {
  const past = { submit: 'submitted', approve: 'approved', return: 'returned' } as const;
  return `${item.kind}.${past[action]}`;
}

function describe(item: ReviewedItem): string {
  return item.kind === 'interpretation' ? `interpretation v${item.version} of well ${item.wellName}` : `reserves case "${item.caseName}" (revision ${item.revision})`;
}

/**
 * Subject and plain-text body of a review notice: a submitted item goes to the asset's
 * reviewers; an approved or returned one to its author, with the reviewer's comment.
 */
export function composeReviewNotice(n: ReviewNoticeInput): { subject: string; body: string } {
  const what = describe(n.item);
  const lines: string[] = [`Hello ${n.recipientName},`, ''];
  let subject: string;
  if (n.action === 'submit') {
    subject = `Waiting for your review: ${what} (${n.assetName})`;
    lines.push(`${n.actorName} submitted the ${what} in ${n.assetName} for review.`, '');
    lines.push(`Open it: ${n.link}`, '');
    lines.push(
      n.item.kind === 'interpretation'
        ? 'Approving it makes this version final (a later edit starts a new version); returning it sends it back with your comment.'
        : 'Approving it fixes this revision of the case; returning it sends it back with your comment.',
    );
  } else {
    const verb = n.action === 'approve' ? 'approved' : 'returned';
    subject = `${n.action === 'approve' ? 'Approved' : 'Returned'}: ${what} (${n.assetName})`;
    lines.push(`${n.actorName} ${verb} the ${what} in ${n.assetName}.`, '');
    if (n.comment) lines.push('Comment:', ...n.comment.split(/\r?\n/).map((l) => `  ${l}`), '');
    lines.push(`Open it: ${n.link}`);
    if (n.action === 'return') lines.push('', 'Make the changes asked for and submit it again.');
  }
  if (n.item.kind === 'reserves-case') lines.push('', VOLUMES_CAUTION);
  lines.push('', '-- ', `Poreline. You get this notice as a member of ${n.assetName}.`);
  return { subject: `[Poreline] ${subject}`, body: lines.join('\n') + '\n' };
}

/**
 * An address with a display name for the To header: the name is quoted when it holds a
 * character that would otherwise split or end it (RFC 5322 3.2.3 "specials", e.g. a comma in
 * "Larsen, Kim"); quotes and backslashes in it are dropped.
 */
export function mailbox(name: string, email: string): string {
  const clean = name.replace(/["\\\r\n]/g, '').trim();
  if (!clean) return email;
  return /[()<>[\]:;@,.]/.test(clean) ? `"${clean}" <${email}>` : `${clean} <${email}>`;
}
