import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';

/**
 * A real deployment (DEMO_MODE=false) from an empty database: the first admin, then an asset,
 * an account and a membership, all through the API; the new user sees only their asset.
 */
describe('first run without demo data (DEMO_MODE=false)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ demoMode: false });
  });
  afterAll(async () => t.close());

  it('starts with no users and no assets: GET /api/setup asks for the first admin; demo sign-in fails', async () => {
    expect((await t.http.get('/api/setup')).body).toEqual({ needsFirstAdmin: true });
    expect((await t.http.post('/api/auth/login').send({ email: 'admin@poreline.demo', password: 'admin-demo-2026' })).status).toBe(401);
  });

  it('POST /api/setup validates the fields before creating anything', async () => {
    const res = await t.http.post('/api/setup').send({ organisation: '', name: 'Lee', email: 'lee@tern.test', password: 'short' });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toContain('password must be at least 12 characters');
    expect((await t.http.get('/api/setup')).body).toEqual({ needsFirstAdmin: true });
  });

  it('first admin -> asset -> account -> membership; the new user signs in and sees only that asset', async () => {
    const setup = await t.http.post('/api/setup').send({ organisation: 'Tern Energy', name: 'Lee Admin', email: 'Lee@Tern.test', password: 'first-admin-password' });
    expect(setup.status, JSON.stringify(setup.body)).toBe(201);
    expect(setup.body.user).toMatchObject({ email: 'lee@tern.test', isAdmin: true, memberships: [] });
    expect((await t.http.get('/api/setup')).body).toEqual({ needsFirstAdmin: false });
    const admin = `Bearer ${setup.body.token}`;

    const north = await t.http.post('/api/assets').set('Authorization', admin).send({ name: 'North Tern Field', description: 'Gas' });
    expect(north.status, JSON.stringify(north.body)).toBe(201);
    const south = await t.http.post('/api/assets').set('Authorization', admin).send({ name: 'South Tern Field' });
    expect(south.status).toBe(201);

    const user = await t.http.post('/api/users').set('Authorization', admin).send({ email: 'sam@tern.test', name: 'Sam Petro', password: 'sams-initial-password' });
    expect(user.status, JSON.stringify(user.body)).toBe(201);

    const members = await t.http.put(`/api/assets/${north.body.id}/members`).set('Authorization', admin).send({ email: 'sam@tern.test', role: 'petrophysicist' });
    expect(members.status, JSON.stringify(members.body)).toBe(200);
    expect(members.body.map((m: { email: string; role: string }) => `${m.email} ${m.role}`).sort()).toEqual(['lee@tern.test admin', 'sam@tern.test petrophysicist']);

    const login = await t.http.post('/api/auth/login').send({ email: 'sam@tern.test', password: 'sams-initial-password' });
    expect(login.status).toBe(200);
    expect(login.body.user.memberships).toEqual([{ assetId: north.body.id, assetName: 'North Tern Field', role: 'petrophysicist' }]);
    const sam = `Bearer ${login.body.token}`;
    const assets = await t.http.get('/api/assets').set('Authorization', sam);
    expect(assets.body).toEqual([expect.objectContaining({ id: north.body.id, name: 'North Tern Field', role: 'petrophysicist' })]);
    expect((await t.http.get(`/api/assets/${south.body.id}`).set('Authorization', sam)).status).toBe(404);
    // The petrophysicist can work in the asset (create a well) but cannot administer it.
    expect((await t.http.post(`/api/assets/${north.body.id}/wells`).set('Authorization', sam).send({ name: 'NT-1' })).status).toBe(201);
    expect((await t.http.post('/api/users').set('Authorization', sam).send({ email: 'x@tern.test', name: 'X', password: 'another-long-pass' })).status).toBe(403);

    const adminAssets = await t.http.get('/api/assets').set('Authorization', admin);
    expect(adminAssets.body.map((a: { name: string }) => a.name)).toEqual(['North Tern Field', 'South Tern Field']);
  });

  it('a second POST /api/setup is refused (409) once the first admin exists', async () => {
    const res = await t.http.post('/api/setup').send({ organisation: 'Other', name: 'Z', email: 'z@other.test', password: 'long-enough-password' });
    expect(res.status).toBe(409);
  });
});
