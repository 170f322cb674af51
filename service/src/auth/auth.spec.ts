import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { DEMO_ASSET, DEMO_USERS } from '../seed/demo-users.js';

describe('auth (real PGlite)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => t.close());

  it('POST /api/auth/login with a demo password returns a token and the user with its role', async () => {
    const petro = DEMO_USERS.find((u) => u.role === 'petrophysicist')!;
    const res = await t.http.post('/api/auth/login').send({ email: petro.email, password: petro.password });
    expect(res.status).toBe(200);
    expect(typeof res.body.token).toBe('string');
    expect(res.body.user.email).toBe(petro.email);
    expect(res.body.user.memberships).toEqual([expect.objectContaining({ assetName: DEMO_ASSET.name, role: 'petrophysicist' })]);
  });

  it('POST /api/auth/login with a wrong password is 401 and says so', async () => {
    const res = await t.http.post('/api/auth/login').send({ email: 'petro@poreline.demo', password: 'wrong' });
    expect(res.status).toBe(401);
    expect(res.body.message).toMatch(/password is wrong/);
  });

  it('POST /api/auth/login with a malformed body is 400 naming the field', async () => {
    const res = await t.http.post('/api/auth/login').send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/email must be an e-mail address/);
  });

  it('GET /api/auth/me without a token is 401; with a forged token is 401', async () => {
    expect((await t.http.get('/api/auth/me')).status).toBe(401);
    expect((await t.http.get('/api/auth/me').set('Authorization', 'Bearer abc.def.ghi')).status).toBe(401);
  });

  it('GET /api/auth/me with a token returns the caller', async () => {
    const res = await t.http.get('/api/auth/me').set('Authorization', await t.tokenFor('reviewer'));
    expect(res.status).toBe(200);
    expect(res.body.email).toBe('reviewer@poreline.demo');
    expect(res.body.isAdmin).toBe(false);
  });

  it('GET /api/health is public and reports the database reachable', async () => {
    const res = await t.http.get('/api/health');
    expect(res.body).toEqual({ status: 'ok', database: 'reachable' });
  });

  it('GET /api/docs-json serves the OpenAPI document with the login route', async () => {
    const res = await t.http.get('/api/docs-json');
    expect(res.status).toBe(200);
    expect(Object.keys(res.body.paths)).toContain('/api/auth/login');
  });

  it('GET /api/setup reports no first admin needed once demo users exist; POST is refused', async () => {
    expect((await t.http.get('/api/setup')).body).toEqual({ needsFirstAdmin: false });
    const res = await t.http.post('/api/setup').send({ organisation: 'X', name: 'Y', email: 'y@x.test', password: 'long-enough-password' });
    expect(res.status).toBe(409);
  });
});
