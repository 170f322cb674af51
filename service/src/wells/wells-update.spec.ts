import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, createWell, demoAssetId } from '../../test/workbench-fixtures.js';

describe('PATCH /assets/:assetId/wells/:wellId (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let url: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    await createWell(t, assetId, 'PATCH-2');
    url = `/api/assets/${assetId}/wells/${await createWell(t, assetId, 'PATCH-1')}`;
  });
  afterAll(async () => t.close());

  it('changes name, UWI, location, elevations and depth reference; audited with before and after', async () => {
    const body = { name: 'PATCH-1A', uwi: '99-001-00001-00', latitude: 57.25, longitude: -3.5, kbElevation: 112.5, groundElevation: 98, depthReference: 'DF' };
    const res = await t.http.patch(url).set('Authorization', await t.tokenFor('petrophysicist')).send(body);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject(body);
    const cleared = await t.http.patch(url).set('Authorization', await t.tokenFor('admin')).send({ latitude: null, longitude: null });
    expect(cleared.body).toMatchObject({ name: 'PATCH-1A', latitude: null, longitude: null, kbElevation: 112.5 });
    const audit = await t.http.get(`/api/assets/${assetId}/audit?entity=well&limit=2`).set('Authorization', await t.tokenFor('reviewer'));
    expect(audit.body[0]).toMatchObject({ action: 'update', before: { latitude: 57.25, longitude: -3.5 }, after: { latitude: null, longitude: null } });
    expect(audit.body[1]).toMatchObject({ before: { name: 'PATCH-1', depthReference: 'KB' }, after: { name: 'PATCH-1A', depthReference: 'DF' } });
  });

  it('is 400 naming the field for out-of-range values, 409 for a name in use, 403 for a viewer, 404 for another asset', async () => {
    const petro = await t.tokenFor('petrophysicist');
    const bad = await t.http.patch(url).set('Authorization', petro).send({ latitude: 91, longitude: 'east', depthReference: 'XX', kbElevation: 'high' });
    expect(bad.status).toBe(400);
    const text = JSON.stringify(bad.body.message);
    for (const m of ['latitude must be between -90 and 90', 'longitude must be a number', 'depthReference must be one of', 'kbElevation must be a number']) expect(text).toContain(m);
    expect((await t.http.patch(url).set('Authorization', petro).send({ name: 'PATCH-2' })).status).toBe(409);
    expect((await t.http.patch(url).set('Authorization', await t.tokenFor('viewer')).send({ uwi: 'x' })).status).toBe(403);
    const outsider = await createOutsider(t);
    expect((await t.http.patch(url).set('Authorization', outsider.token).send({ uwi: 'x' })).status).toBe(404);
    expect((await t.http.patch(`/api/assets/${outsider.assetId}/wells/${url.split('/').pop()}`).set('Authorization', outsider.token).send({ uwi: 'x' })).status).toBe(404);
  });
});
