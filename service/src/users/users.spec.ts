import { auditLog } from '@poreline/schema';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider } from '../../test/workbench-fixtures.js';
import { DatabaseService } from '../database/database.module.js';
import { UsersService } from './users.service.js';

describe(UsersService.name, () => {
  let t: TestApp;
  let admin: string;
  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.tokenFor('admin');
  });
  afterAll(async () => t.close());

  const newUser = { email: 'Kim.Larsen@poreline.demo', name: 'Kim Larsen', password: 'a-long-initial-pass' };

  it('POST /api/users creates an account in the admin organisation (201), e-mail lower-cased, no hash in the answer', async () => {
    const res = await t.http.post('/api/users').set('Authorization', admin).send(newUser);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ email: 'kim.larsen@poreline.demo', name: 'Kim Larsen', isAdmin: false, memberships: [] });
    expect(JSON.stringify(res.body)).not.toMatch(/password/i);
    const login = await t.http.post('/api/auth/login').send({ email: 'kim.larsen@poreline.demo', password: newUser.password });
    expect(login.status).toBe(200);
  });

  it('the creation is audited without the password or its hash', async () => {
    const db = t.app.get(DatabaseService).db;
    const rows = await db.select().from(auditLog).where(eq(auditLog.entity, 'user'));
    const created = rows.find((r) => r.action === 'create' && (r.after as { email?: string }).email === 'kim.larsen@poreline.demo');
    expect(created).toBeDefined();
    expect(created!.assetId).toBeNull();
    expect(created!.after).toEqual({ email: 'kim.larsen@poreline.demo', name: 'Kim Larsen', isAdmin: false });
    expect(JSON.stringify(rows)).not.toContain(newUser.password);
    expect(JSON.stringify(rows)).not.toMatch(/\$2[aby]\$/);
  });

  it('POST /api/users with a taken e-mail (any case) is 409 naming the field', async () => {
    const res = await t.http.post('/api/users').set('Authorization', admin).send({ ...newUser, email: 'PETRO@poreline.demo' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/^email: .*already exists/);
  });

  it('POST /api/users validates each field (400 naming it): short password, bad e-mail, blank name, unknown field', async () => {
    const short = await t.http.post('/api/users').set('Authorization', admin).send({ ...newUser, email: 'a@b.test', password: 'short-pass' });
    expect(short.status).toBe(400);
    expect(JSON.stringify(short.body.message)).toContain('password must be at least 12 characters');
    const bad = await t.http.post('/api/users').set('Authorization', admin).send({ email: 'nope', name: '  ', password: 'a-long-initial-pass', isAdmin: 'yes' });
    expect(bad.status).toBe(400);
    const text = JSON.stringify(bad.body.message);
    expect(text).toContain('email must be an e-mail address');
    expect(text).toContain('name must not be blank');
    expect(text).toContain('isAdmin must be true or false');
    const extra = await t.http.post('/api/users').set('Authorization', admin).send({ ...newUser, email: 'c@d.test', organisationId: '00000000-0000-4000-8000-000000000000' });
    expect(extra.status).toBe(400);
  });

  it('GET, POST and PATCH /api/users are 403 for users who are not global admins, 401 signed out', async () => {
    for (const role of ['petrophysicist', 'reviewer', 'viewer'] as const) {
      const token = await t.tokenFor(role);
      expect((await t.http.get('/api/users').set('Authorization', token)).status).toBe(403);
      expect((await t.http.post('/api/users').set('Authorization', token).send({ ...newUser, email: `${role}-new@x.test` })).status).toBe(403);
    }
    const me = (await t.http.get('/api/auth/me').set('Authorization', await t.tokenFor('viewer'))).body;
    expect((await t.http.patch(`/api/users/${me.id}`).set('Authorization', await t.tokenFor('viewer')).send({ isAdmin: true })).status).toBe(403);
    expect((await t.http.get('/api/users')).status).toBe(401);
  });

  it('GET /api/users lists the organisation accounts with their asset roles, not other organisations', async () => {
    const outsider = await createOutsider(t);
    const outsiderEmail = (await t.http.get('/api/auth/me').set('Authorization', outsider.token)).body.email;
    const res = await t.http.get('/api/users').set('Authorization', admin);
    expect(res.status).toBe(200);
    const emails = res.body.map((u: { email: string }) => u.email);
    expect(emails).toContain('kim.larsen@poreline.demo');
    expect(emails).toContain('petro@poreline.demo');
    expect(emails).not.toContain(outsiderEmail);
    const petro = res.body.find((u: { email: string }) => u.email === 'petro@poreline.demo');
    expect(petro.memberships).toEqual([expect.objectContaining({ assetName: 'Wrenmoor Field', role: 'petrophysicist' })]);
    expect(res.body.every((u: Record<string, unknown>) => !('passwordHash' in u))).toBe(true);
  });

  it('PATCH /api/users/:userId renames, grants admin and resets the password (audited as passwordReset only)', async () => {
    const kim = (await t.http.get('/api/users').set('Authorization', admin)).body.find((u: { email: string }) => u.email === 'kim.larsen@poreline.demo');
    const res = await t.http.patch(`/api/users/${kim.id}`).set('Authorization', admin).send({ name: 'Kim A. Larsen', isAdmin: true, password: 'a-reset-password-1' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Kim A. Larsen', isAdmin: true });
    expect((await t.http.post('/api/auth/login').send({ email: kim.email, password: newUser.password })).status).toBe(401);
    expect((await t.http.post('/api/auth/login').send({ email: kim.email, password: 'a-reset-password-1' })).status).toBe(200);
    const db = t.app.get(DatabaseService).db;
    const [entry] = (await db.select().from(auditLog).where(eq(auditLog.entityId, kim.id))).filter((r) => r.action === 'update');
    expect(entry.before).toEqual({ email: kim.email, name: 'Kim Larsen', isAdmin: false });
    expect(entry.after).toEqual({ email: kim.email, name: 'Kim A. Larsen', isAdmin: true, passwordReset: true });
    const short = await t.http.patch(`/api/users/${kim.id}`).set('Authorization', admin).send({ password: 'too-short' });
    expect(short.status).toBe(400);
    expect(JSON.stringify(short.body.message)).toContain('password must be at least 12 characters');
  });

  it('PATCH /api/users/:userId: another organisation user or a malformed id is 404, not a change', async () => {
    const outsider = await createOutsider(t);
    const outsiderId = (await t.http.get('/api/auth/me').set('Authorization', outsider.token)).body.id;
    const res = await t.http.patch(`/api/users/${outsiderId}`).set('Authorization', admin).send({ name: 'Taken Over' });
    expect(res.status).toBe(404);
    expect((await t.http.get('/api/auth/me').set('Authorization', outsider.token)).body.name).toBe('Out Sider');
    expect((await t.http.patch('/api/users/not-a-uuid').set('Authorization', admin).send({ name: 'X' })).status).toBe(404);
  });

  it('the last global admin of the organisation cannot withdraw their own admin flag (409)', async () => {
    const users = (await t.http.get('/api/users').set('Authorization', admin)).body as { id: string; email: string; isAdmin: boolean }[];
    const kim = users.find((u) => u.email === 'kim.larsen@poreline.demo')!;
    const ada = users.find((u) => u.email === 'admin@poreline.demo')!;
    expect((await t.http.patch(`/api/users/${kim.id}`).set('Authorization', admin).send({ isAdmin: false })).status).toBe(200);
    const res = await t.http.patch(`/api/users/${ada.id}`).set('Authorization', admin).send({ isAdmin: false });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/^isAdmin: .*last admin/);
  });

  it('PATCH /api/users/me/password changes the caller password after checking the current one (400 naming the field); other sessions end, this one gets a new token', async () => {
    const login = await t.http.post('/api/auth/login').send({ email: 'kim.larsen@poreline.demo', password: 'a-reset-password-1' });
    const kim = `Bearer ${login.body.token}`;
    const otherDevice = `Bearer ${(await t.http.post('/api/auth/login').send({ email: 'kim.larsen@poreline.demo', password: 'a-reset-password-1' })).body.token}`;
    const wrong = await t.http.patch('/api/users/me/password').set('Authorization', kim).send({ currentPassword: 'not-my-password', newPassword: 'my-own-new-password' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.message).toMatch(/^currentPassword /);
    const short = await t.http.patch('/api/users/me/password').set('Authorization', kim).send({ currentPassword: 'a-reset-password-1', newPassword: 'short' });
    expect(JSON.stringify(short.body.message)).toContain('newPassword must be at least 12 characters');
    const ok = await t.http.patch('/api/users/me/password').set('Authorization', kim).send({ currentPassword: 'a-reset-password-1', newPassword: 'my-own-new-password' });
    expect(ok.status).toBe(200);
    expect((await t.http.post('/api/auth/login').send({ email: 'kim.larsen@poreline.demo', password: 'my-own-new-password' })).status).toBe(200);
    expect((await t.http.post('/api/auth/login').send({ email: 'kim.larsen@poreline.demo', password: 'a-reset-password-1' })).status).toBe(401);
    // sessions opened with the old password are over; the new token carries on
    for (const old of [kim, otherDevice]) {
      const refused = await t.http.get('/api/auth/me').set('Authorization', old);
      expect(refused.status).toBe(401);
      expect(refused.body.message).toMatch(/password of this account has changed/);
    }
    expect((await t.http.get('/api/auth/me').set('Authorization', `Bearer ${ok.body.token}`)).body.email).toBe('kim.larsen@poreline.demo');
  });

  it('an admin resetting a password ends the sessions the user had; a name change does not', async () => {
    const before = `Bearer ${(await t.http.post('/api/auth/login').send({ email: 'kim.larsen@poreline.demo', password: 'my-own-new-password' })).body.token}`;
    const list = await t.http.get('/api/users').set('Authorization', admin);
    const kimId = list.body.find((u: { email: string }) => u.email === 'kim.larsen@poreline.demo').id;
    await t.http.patch(`/api/users/${kimId}`).set('Authorization', admin).send({ name: 'Kim Larsen-Berg' }).expect(200);
    expect((await t.http.get('/api/auth/me').set('Authorization', before)).status).toBe(200);
    await t.http.patch(`/api/users/${kimId}`).set('Authorization', admin).send({ password: 'an-admin-reset-2' }).expect(200);
    expect((await t.http.get('/api/auth/me').set('Authorization', before)).status).toBe(401);
  });
});
