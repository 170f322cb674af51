import { assetMembers, assets, organisations, users } from '@poreline/schema';
import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { DatabaseService } from '../database/database.module.js';
import { DEMO_ASSET } from '../seed/demo-users.js';

describe('assets: membership decides what a user sees', () => {
  let t: TestApp;
  let otherAssetId: string;
  let outsiderToken: string;
  beforeAll(async () => {
    t = await createTestApp();
    const db = t.app.get(DatabaseService).db;
    const [org] = await db.insert(organisations).values({ name: 'Other org' }).returning();
    const [asset] = await db.insert(assets).values({ organisationId: org.id, name: 'Other asset' }).returning();
    const [user] = await db
      .insert(users)
      .values({ organisationId: org.id, email: 'outsider@other.test', name: 'Out Sider', passwordHash: await bcrypt.hash('outsider-pass', 4) })
      .returning();
    await db.insert(assetMembers).values({ assetId: asset.id, userId: user.id, role: 'petrophysicist' });
    otherAssetId = asset.id;
    const res = await t.http.post('/api/auth/login').send({ email: 'outsider@other.test', password: 'outsider-pass' });
    outsiderToken = `Bearer ${res.body.token}`;
  });
  afterAll(async () => t.close());

  it('GET /api/assets lists only the assets the caller is a member of, with the role', async () => {
    const res = await t.http.get('/api/assets').set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.map((a: { name: string }) => a.name)).toEqual([DEMO_ASSET.name]);
    expect(res.body[0].role).toBe('viewer');
    const other = await t.http.get('/api/assets').set('Authorization', outsiderToken);
    expect(other.body.map((a: { name: string }) => a.name)).toEqual(['Other asset']);
  });

  it('a member of another asset gets 404 for the demo asset and its wells, not the data', async () => {
    const demo = (await t.http.get('/api/assets').set('Authorization', await t.tokenFor('viewer'))).body[0];
    expect((await t.http.get(`/api/assets/${demo.id}`).set('Authorization', outsiderToken)).status).toBe(404);
    expect((await t.http.get(`/api/assets/${demo.id}/wells`).set('Authorization', outsiderToken)).status).toBe(404);
    expect((await t.http.get(`/api/assets/${otherAssetId}/wells`).set('Authorization', await t.tokenFor('petrophysicist'))).status).toBe(404);
  });

  it('the demo global admin does not see an asset of another organisation', async () => {
    expect((await t.http.get(`/api/assets/${otherAssetId}`).set('Authorization', await t.tokenFor('admin'))).status).toBe(404);
  });

  it('a malformed asset id is 404, not a database error', async () => {
    expect((await t.http.get('/api/assets/not-a-uuid').set('Authorization', await t.tokenFor('viewer'))).status).toBe(404);
  });

  it('POST wells: viewer gets 403; petrophysicist creates; same name again is 409; blank name is 400', async () => {
    const demo = (await t.http.get('/api/assets').set('Authorization', await t.tokenFor('viewer'))).body[0];
    const url = `/api/assets/${demo.id}/wells`;
    const viewer = await t.http.post(url).set('Authorization', await t.tokenFor('viewer')).send({ name: 'T-1' });
    expect(viewer.status).toBe(403);
    const created = await t.http.post(url).set('Authorization', await t.tokenFor('petrophysicist')).send({ name: 'T-1', uwi: '00-000-00001' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'T-1', uwi: '00-000-00001', logRunCount: 0 });
    const again = await t.http.post(url).set('Authorization', await t.tokenFor('petrophysicist')).send({ name: 'T-1' });
    expect(again.status).toBe(409);
    const blank = await t.http.post(url).set('Authorization', await t.tokenFor('petrophysicist')).send({ name: '   ' });
    expect(blank.status).toBe(400);
    expect(JSON.stringify(blank.body.message)).toMatch(/name must not be blank/);
  });
});
