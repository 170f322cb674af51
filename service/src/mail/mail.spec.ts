import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { demoAssetId, setUpKiteWell } from '../../test/workbench-fixtures.js';
import { MailService } from './mail.service.js';

interface ListedMail {
  id: string;
  to: string;
  subject: string;
  status: string;
  event: string;
  caught: boolean;
  error: string | null;
}

/** A saved interpretation version of a fresh well, ready to submit. */
async function savedVersion(t: TestApp, assetId: string, well: string): Promise<{ base: string; id: string }> {
  const { wellId } = await setUpKiteWell(t, assetId, well);
  const base = `/api/assets/${assetId}/wells/${wellId}`;
  const res = await t.http.post(`${base}/interpretations`).set('Authorization', await t.tokenFor('petrophysicist'));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { base, id: res.body.id as string };
}

describe('e-mail notices of review steps (real PGlite, real SMTP catcher)', () => {
  let t: TestApp;
  let assetId: string;
  let admin: string;
  const mails = async (): Promise<{ mode: string; messages: ListedMail[] }> => {
    await t.app.get(MailService).settled();
    const res = await t.http.get('/api/admin/mail').set('Authorization', admin);
    expect(res.status).toBe(200);
    return res.body;
  };

  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    admin = await t.tokenFor('admin');
  });
  afterAll(async () => t.close());

  it('submit tells the reviewers; the catcher receives the message as sent, with subject, link and Message-ID', async () => {
    const v = await savedVersion(t, assetId, 'MAIL-1');
    await t.http.post(`${v.base}/interpretations/${v.id}/submit`).set('Authorization', await t.tokenFor('petrophysicist')).expect(200);
    const list = await mails();
    expect(list.mode).toBe('catcher');
    const notice = list.messages.find((m) => m.subject.includes('MAIL-1'))!;
    expect(notice).toMatchObject({ to: 'Rui Reviewer <reviewer@poreline.demo>', status: 'sent', event: 'interpretation.submitted', caught: true, error: null });
    expect(notice.subject).toBe('[Poreline] Waiting for your review: interpretation v1 of well MAIL-1 (Wrenmoor Field)');
    const detail = await t.http.get(`/api/admin/mail/${notice.id}`).set('Authorization', admin);
    expect(detail.status).toBe(200);
    expect(detail.body.body).toContain('Pia Petro submitted the interpretation v1 of well MAIL-1');
    expect(detail.body.body).toContain(`Open it: http://poreline.test${v.base.replace('/api', '')}/workbench`);
    // What the SMTP server received: the headers nodemailer wrote and the body.
    expect(detail.body.raw).toMatch(/^To: Rui Reviewer <reviewer@poreline\.demo>$/m);
    expect(detail.body.raw).toMatch(/^From: Poreline test <poreline@localhost>$/m);
    expect(detail.body.raw).toContain('Waiting for your review');
    // Only reviewers: nobody else was told.
    expect(list.messages.filter((m) => m.subject.includes('MAIL-1')).map((m) => m.to)).toEqual(['Rui Reviewer <reviewer@poreline.demo>']);
  });

  it('return and approve tell the author (with the comment), never the reviewer who took the step', async () => {
    const v = await savedVersion(t, assetId, 'MAIL-2');
    const petro = await t.tokenFor('petrophysicist');
    const reviewer = await t.tokenFor('reviewer');
    await t.http.post(`${v.base}/interpretations/${v.id}/submit`).set('Authorization', petro).expect(200);
    await t.http.post(`${v.base}/interpretations/${v.id}/return`).set('Authorization', reviewer).send({ comment: 'Mark the washout first.' }).expect(200);
    await t.http.post(`${v.base}/interpretations/${v.id}/submit`).set('Authorization', petro).expect(200);
    await t.http.post(`${v.base}/interpretations/${v.id}/approve`).set('Authorization', reviewer).send({ comment: 'Agreed.' }).expect(200);
    const mine = (await mails()).messages.filter((m) => m.subject.includes('MAIL-2'));
    expect(mine.map((m) => `${m.event} -> ${m.to}`).sort()).toEqual([
      'interpretation.approved -> Pia Petro <petro@poreline.demo>',
      'interpretation.returned -> Pia Petro <petro@poreline.demo>',
      'interpretation.submitted -> Rui Reviewer <reviewer@poreline.demo>',
      'interpretation.submitted -> Rui Reviewer <reviewer@poreline.demo>',
    ]);
    const returned = mine.find((m) => m.event === 'interpretation.returned')!;
    const detail = await t.http.get(`/api/admin/mail/${returned.id}`).set('Authorization', admin);
    expect(detail.body.body).toContain('Comment:\n  Mark the washout first.');
    expect(detail.body.raw).toContain('Mark the washout first.');
  });

  it('the mail list is for global admins only (403 for others, 404 for an unknown id, 400 naming a bad limit)', async () => {
    expect((await t.http.get('/api/admin/mail').set('Authorization', await t.tokenFor('reviewer'))).status).toBe(403);
    expect((await t.http.get('/api/admin/mail/not-an-id').set('Authorization', admin)).status).toBe(404);
    const badLimit = await t.http.get('/api/admin/mail?limit=lots').set('Authorization', admin);
    expect(badLimit.status).toBe(400);
    expect(badLimit.body.message).toMatch(/^limit must be a whole number/);
    expect((await t.http.get('/api/admin/mail?limit=100000').set('Authorization', admin)).status).toBe(200);
    expect((await t.http.get('/api/admin/mail/00000000-0000-4000-8000-000000000000').set('Authorization', admin)).status).toBe(404);
  });
});

describe('e-mail notices when the SMTP server cannot be reached', () => {
  let t: TestApp;
  beforeAll(async () => {
    // Port 9 on 127.0.0.1 (discard) is closed here: a real refused connection, no mock.
    t = await createTestApp({ smtpUrl: 'smtp://127.0.0.1:9' });
  });
  afterAll(async () => t.close());

  it('the review step still succeeds; the notice is kept as failed with the error', async () => {
    const assetId = await demoAssetId(t);
    const v = await savedVersion(t, assetId, 'MAIL-3');
    const submitted = await t.http.post(`${v.base}/interpretations/${v.id}/submit`).set('Authorization', await t.tokenFor('petrophysicist'));
    expect(submitted.status).toBe(200);
    expect(submitted.body.status).toBe('submitted');
    await t.app.get(MailService).settled();
    const list = await t.http.get('/api/admin/mail').set('Authorization', await t.tokenFor('admin'));
    expect(list.body.mode).toBe('smtp');
    const notice = list.body.messages.find((m: ListedMail) => m.subject.includes('MAIL-3'));
    expect(notice).toMatchObject({ status: 'failed', caught: false });
    expect(notice.error).toMatch(/ECONNREFUSED|connect/i);
  });
});
