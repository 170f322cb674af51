import { describe, expect, it } from 'vitest';
import { composeReviewNotice, mailbox, noticeEvent, VOLUMES_CAUTION, type ReviewNoticeInput } from './review-notice.js';

const base: ReviewNoticeInput = {
  action: 'submit',
  item: { kind: 'interpretation', wellName: 'KITE-1', version: 3 },
  assetName: 'Test Asset',
  actorName: 'Pia Petro',
  recipientName: 'Rui Reviewer',
  comment: null,
  link: 'http://poreline.test/assets/a/wells/w/workbench',
};

describe('composeReviewNotice', () => {
  it('a submitted interpretation asks the reviewer to review it, names the author, the version and the link', () => {
    const n = composeReviewNotice(base);
    expect(n.subject).toBe('[Poreline] Waiting for your review: interpretation v3 of well KITE-1 (Test Asset)');
    expect(n.body).toContain('Hello Rui Reviewer,');
    expect(n.body).toContain('Pia Petro submitted the interpretation v3 of well KITE-1 in Test Asset for review.');
    expect(n.body).toContain('Open it: http://poreline.test/assets/a/wells/w/workbench');
    expect(n.body).not.toContain(VOLUMES_CAUTION);
  });

  it('a returned item carries the comment, indented line by line, and asks for a new submission', () => {
    const n = composeReviewNotice({ ...base, action: 'return', actorName: 'Rui Reviewer', recipientName: 'Pia Petro', comment: 'Check Rw.\nThe washout too.' });
    expect(n.subject).toBe('[Poreline] Returned: interpretation v3 of well KITE-1 (Test Asset)');
    expect(n.body).toContain('Rui Reviewer returned the interpretation v3 of well KITE-1 in Test Asset.');
    expect(n.body).toContain('Comment:\n  Check Rw.\n  The washout too.\n');
    expect(n.body).toContain('submit it again');
  });

  it('an approved reserves case names the revision and carries the caution that volumes are estimates', () => {
    const n = composeReviewNotice({ ...base, action: 'approve', item: { kind: 'reserves-case', caseName: 'Wren base', revision: 4 }, comment: null });
    expect(n.subject).toBe('[Poreline] Approved: reserves case "Wren base" (revision 4) (Test Asset)');
    expect(n.body).not.toContain('Comment:');
    expect(n.body).toContain(VOLUMES_CAUTION);
  });

  it('noticeEvent names the item kind and the step in the past tense', () => {
    expect(noticeEvent(base.item, 'submit')).toBe('interpretation.submitted');
    expect(noticeEvent({ kind: 'reserves-case', caseName: 'x', revision: 1 }, 'return')).toBe('reserves-case.returned');
  });
});

describe('mailbox', () => {
  it('quotes a display name holding a comma or a dot, leaves a plain one bare, drops quotes', () => {
    expect(mailbox('Rui Reviewer', 'r@x.test')).toBe('Rui Reviewer <r@x.test>');
    expect(mailbox('Larsen, Kim', 'k@x.test')).toBe('"Larsen, Kim" <k@x.test>');
    expect(mailbox('J. "Jo" Smith', 'j@x.test')).toBe('"J. Jo Smith" <j@x.test>');
    expect(mailbox('  ', 'e@x.test')).toBe('e@x.test');
  });
});
