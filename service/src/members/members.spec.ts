import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, demoAssetId } from '../../test/workbench-fixtures.js';

describe('asset members API (real PGlite)', () => {
  let t: TestApp;
  let url: string;
  let admin: string;
  beforeAll(async () => {
    t = await createTestApp();
    url = `/api/assets/${await demoAssetId(t)}/members`;
    admin = await t.tokenFor('admin');
  });
  afterAll(async () => t.close());

  it('GET lists the members with their roles to any member', async () => {
    const res = await t.http.get(url).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.map((m: { email: string; role: string }) => `${m.email} ${m.role}`).sort()).toEqual([
      'admin@poreline.demo admin',
      'engineer@poreline.demo engineer',
      'petro@poreline.demo petrophysicist',
      'reviewer@poreline.demo reviewer',
      'viewer@poreline.demo viewer',
    ]);
  });

  it('PUT changes a role (audited); only an admin may (403); unknown e-mail 404; bad role 400', async () => {
    const res = await t.http.put(url).set('Authorization', admin).send({ email: 'VIEWER@poreline.demo', role: 'reviewer' });
    expect(res.status).toBe(200);
    expect(res.body.find((m: { email: string }) => m.email === 'viewer@poreline.demo').role).toBe('reviewer');
    const audit = await t.http.get(`${url.replace('/members', '')}/audit?entity=asset_member&limit=1`).set('Authorization', admin);
    expect(audit.body[0]).toMatchObject({ action: 'update', before: { role: 'viewer' }, after: { role: 'reviewer' } });
    expect((await t.http.put(url).set('Authorization', await t.tokenFor('petrophysicist')).send({ email: 'viewer@poreline.demo', role: 'admin' })).status).toBe(403);
    expect((await t.http.put(url).set('Authorization', admin).send({ email: 'nobody@poreline.demo', role: 'viewer' })).status).toBe(404);
    const bad = await t.http.put(url).set('Authorization', admin).send({ email: 'viewer@poreline.demo', role: 'boss' });
    expect(JSON.stringify(bad.body.message)).toContain('role must be one of');
  });

  it('a user of another organisation cannot be added (404); an outsider cannot read the members (404)', async () => {
    const outsider = await createOutsider(t);
    const outsiderEmail = (await t.http.get('/api/auth/me').set('Authorization', outsider.token)).body.email;
    expect((await t.http.put(url).set('Authorization', admin).send({ email: outsiderEmail, role: 'viewer' })).status).toBe(404);
    expect((await t.http.get(url).set('Authorization', outsider.token)).status).toBe(404);
  });

  it('DELETE removes a member; the last admin cannot be removed or demoted (409)', async () => {
    const members = (await t.http.get(url).set('Authorization', admin)).body as { userId: string; email: string }[];
    const engineer = members.find((m) => m.email === 'engineer@poreline.demo')!;
    const res = await t.http.delete(`${url}/${engineer.userId}`).set('Authorization', admin);
    expect(res.status).toBe(200);
    expect(res.body.map((m: { email: string }) => m.email)).not.toContain('engineer@poreline.demo');
    const self = members.find((m) => m.email === 'admin@poreline.demo')!;
    expect((await t.http.delete(`${url}/${self.userId}`).set('Authorization', admin)).status).toBe(409);
    expect((await t.http.put(url).set('Authorization', admin).send({ email: 'admin@poreline.demo', role: 'viewer' })).status).toBe(409);
    expect((await t.http.delete(`${url}/${engineer.userId}`).set('Authorization', admin)).status).toBe(404);
  });
});
