import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, demoAssetId } from '../../test/workbench-fixtures.js';
import { AssetsService } from './assets.service.js';

describe(`${AssetsService.name}: creating and editing assets`, () => {
  let t: TestApp;
  let admin: string;
  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.tokenFor('admin');
  });
  afterAll(async () => t.close());

  it('POST /api/assets (global admin) creates the asset with the creator as its admin member, audited', async () => {
    const res = await t.http.post('/api/assets').set('Authorization', admin).send({ name: '  North Tern Field ', description: 'Gas appraisal' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ name: 'North Tern Field', description: 'Gas appraisal', role: 'admin', isDemo: false });
    const members = await t.http.get(`/api/assets/${res.body.id}/members`).set('Authorization', admin);
    expect(members.body).toEqual([expect.objectContaining({ email: 'admin@poreline.demo', role: 'admin' })]);
    const audit = await t.http.get(`/api/assets/${res.body.id}/audit?entity=asset`).set('Authorization', admin);
    expect(audit.body).toEqual([expect.objectContaining({ action: 'create', entity: 'asset', after: { name: 'North Tern Field', description: 'Gas appraisal' } })]);
  });

  it('POST /api/assets: a name taken in the organisation (any case) is 409; a blank name is 400 naming the field', async () => {
    const dup = await t.http.post('/api/assets').set('Authorization', admin).send({ name: 'north tern field' });
    expect(dup.status).toBe(409);
    expect(dup.body.message).toMatch(/^name: /);
    const blank = await t.http.post('/api/assets').set('Authorization', admin).send({ name: '   ' });
    expect(blank.status).toBe(400);
    expect(JSON.stringify(blank.body.message)).toContain('name must not be blank');
    const badDescription = await t.http.post('/api/assets').set('Authorization', admin).send({ name: 'Y', description: 7 });
    expect(JSON.stringify(badDescription.body.message)).toContain('description must be a string');
  });

  it('POST /api/assets is 403 for anyone but a global admin, even an asset admin', async () => {
    for (const role of ['petrophysicist', 'engineer', 'reviewer', 'viewer'] as const) {
      expect((await t.http.post('/api/assets').set('Authorization', await t.tokenFor(role)).send({ name: `By ${role}` })).status).toBe(403);
    }
    // Ada's admin flag is global; give the reviewer the admin role of the demo asset only.
    const demo = await demoAssetId(t);
    expect((await t.http.put(`/api/assets/${demo}/members`).set('Authorization', admin).send({ email: 'reviewer@poreline.demo', role: 'admin' })).status).toBe(200);
    expect((await t.http.post('/api/assets').set('Authorization', await t.tokenFor('reviewer')).send({ name: 'By an asset admin' })).status).toBe(403);
  });

  it('PATCH /api/assets/:assetId (asset admin) renames it, audited with before and after; an asset admin who is not a global admin may', async () => {
    const demo = await demoAssetId(t);
    const res = await t.http.patch(`/api/assets/${demo}`).set('Authorization', await t.tokenFor('reviewer')).send({ description: 'Edited by the asset admin' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ name: 'Wrenmoor Field', description: 'Edited by the asset admin', role: 'admin' });
    const [entry] = (await t.http.get(`/api/assets/${demo}/audit?entity=asset&limit=1`).set('Authorization', admin)).body;
    expect(entry).toMatchObject({ action: 'update', after: { description: 'Edited by the asset admin' } });
    expect(Object.keys(entry.before)).toEqual(['description']);
  });

  it('PATCH /api/assets/:assetId: 403 for other roles, 409 on a taken name, 400 on a blank one', async () => {
    const demo = await demoAssetId(t);
    expect((await t.http.patch(`/api/assets/${demo}`).set('Authorization', await t.tokenFor('petrophysicist')).send({ name: 'Mine' })).status).toBe(403);
    const dup = await t.http.patch(`/api/assets/${demo}`).set('Authorization', admin).send({ name: 'NORTH TERN FIELD' });
    expect(dup.status).toBe(409);
    const blank = await t.http.patch(`/api/assets/${demo}`).set('Authorization', admin).send({ name: '' });
    expect(JSON.stringify(blank.body.message)).toContain('name must not be empty');
  });

  it('an asset of another organisation is 404 to PATCH, and not listed', async () => {
    const outsider = await createOutsider(t);
    expect((await t.http.patch(`/api/assets/${outsider.assetId}`).set('Authorization', admin).send({ name: 'Taken over' })).status).toBe(404);
    const names = (await t.http.get('/api/assets').set('Authorization', admin)).body.map((a: { name: string }) => a.name);
    expect(names).not.toContain('Outside asset');
    expect(names).toEqual(expect.arrayContaining(['North Tern Field', 'Wrenmoor Field']));
  });
});
