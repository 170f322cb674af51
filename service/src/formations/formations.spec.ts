import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, createWell, demoAssetId } from '../../test/workbench-fixtures.js';
import { FORMATION_PALETTE } from './formation-palette.js';

describe('formations API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let url: string;
  let petro: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    url = `/api/assets/${assetId}/formations`;
    petro = await t.tokenFor('petrophysicist');
  });
  afterAll(async () => t.close());

  it('POST creates formations in order, with the next palette colour and sandstone by default', async () => {
    const a = await t.http.post(url).set('Authorization', petro).send({ name: 'Alder Sand' });
    expect(a.status).toBe(201);
    expect(a.body).toMatchObject({ name: 'Alder Sand', ordinal: 1, colour: FORMATION_PALETTE[0], lithology: 'sandstone', cutoffs: { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: null } });
    const b = await t.http.post(url).set('Authorization', petro).send({ name: 'Birch Shale', colour: '#123ABC', lithology: 'shaly_sand' });
    expect(b.body).toMatchObject({ ordinal: 2, colour: '#123abc', lithology: 'shaly_sand' });
    // inserting at position 1 shifts the others down
    const c = await t.http.post(url).set('Authorization', petro).send({ name: 'Cedar Lime', lithology: 'limestone', ordinal: 1 });
    expect(c.body.ordinal).toBe(1);
    expect(c.body.colour).toBe(FORMATION_PALETTE[1]); // palette[0] is taken by Alder Sand
    const list = await t.http.get(url).set('Authorization', await t.tokenFor('viewer'));
    expect(list.status).toBe(200);
    expect(list.body.map((f: { name: string; ordinal: number }) => `${f.ordinal}:${f.name}`)).toEqual(['1:Cedar Lime', '2:Alder Sand', '3:Birch Shale']);
  });

  it('POST with a name already used (any case) is 409; bad fields are 400 naming the field', async () => {
    expect((await t.http.post(url).set('Authorization', petro).send({ name: 'alder sand' })).status).toBe(409);
    const bad = await t.http.post(url).set('Authorization', petro).send({ name: ' ', colour: 'red', lithology: 'granite', ordinal: 0 });
    expect(bad.status).toBe(400);
    const text = JSON.stringify(bad.body.message);
    for (const m of ['name must not be blank', 'colour must be a hex colour', 'lithology must be one of', 'ordinal must be 1 or more']) expect(text).toContain(m);
    const extra = await t.http.post(url).set('Authorization', petro).send({ name: 'X', vshMax: 0.2 });
    expect(extra.status).toBe(400);
  });

  it('POST and PATCH are 403 for viewer, engineer and reviewer; 404 for a member of another asset', async () => {
    for (const role of ['viewer', 'engineer', 'reviewer'] as const) {
      expect((await t.http.post(url).set('Authorization', await t.tokenFor(role)).send({ name: `By ${role}` })).status).toBe(403);
    }
    const outsider = await createOutsider(t);
    expect((await t.http.get(url).set('Authorization', outsider.token)).status).toBe(404);
    const list = await t.http.get(url).set('Authorization', petro);
    expect((await t.http.patch(`${url}/${list.body[0].id}`).set('Authorization', outsider.token).send({ name: 'Taken' })).status).toBe(404);
    // a formation id of this asset used under another asset is not found either
    expect((await t.http.patch(`/api/assets/${outsider.assetId}/formations/${list.body[0].id}`).set('Authorization', outsider.token).send({ name: 'Taken' })).status).toBe(404);
  });

  it('PATCH renames, recolours and moves a formation (others renumbered) and audits before/after', async () => {
    const list = (await t.http.get(url).set('Authorization', petro)).body as { id: string; name: string }[];
    const birch = list.find((f) => f.name === 'Birch Shale')!;
    const res = await t.http.patch(`${url}/${birch.id}`).set('Authorization', petro).send({ name: 'Birch Shaly Sand', colour: '#4f9fa8', ordinal: 1 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Birch Shaly Sand', colour: '#4f9fa8', ordinal: 1 });
    const after = (await t.http.get(url).set('Authorization', petro)).body as { name: string; ordinal: number }[];
    expect(after.map((f) => `${f.ordinal}:${f.name}`)).toEqual(['1:Birch Shaly Sand', '2:Cedar Lime', '3:Alder Sand']);
    const audit = await t.http.get(`/api/assets/${assetId}/audit?entity=formation&limit=1`).set('Authorization', await t.tokenFor('reviewer'));
    expect(audit.body[0]).toMatchObject({ action: 'update', entityId: birch.id, before: { name: 'Birch Shale', ordinal: 3 }, after: { name: 'Birch Shaly Sand', ordinal: 1 } });
    expect(audit.body[0].user.email).toBe('petro@poreline.demo');
  });

  it('PATCH of an unknown formation is 404; a rename onto another formation is 409', async () => {
    expect((await t.http.patch(`${url}/00000000-0000-4000-8000-000000000000`).set('Authorization', petro).send({ name: 'Z' })).status).toBe(404);
    expect((await t.http.patch(`${url}/not-a-uuid`).set('Authorization', petro).send({ name: 'Z' })).status).toBe(404);
    const list = (await t.http.get(url).set('Authorization', petro)).body as { id: string }[];
    expect((await t.http.patch(`${url}/${list[0].id}`).set('Authorization', petro).send({ name: 'Cedar Lime' })).status).toBe(409);
  });

  it('PATCH ordinal is 409 when it would put a well\'s tops out of depth order', async () => {
    const list = (await t.http.get(url).set('Authorization', petro)).body as { id: string; name: string }[];
    const wellId = await createWell(t, assetId, 'ORDER-1');
    const tops = await t.http
      .put(`/api/assets/${assetId}/wells/${wellId}/tops`)
      .set('Authorization', petro)
      .send({ tops: [{ formationId: list[0].id, md: 1000 }, { formationId: list[1].id, md: 1100 }] });
    expect(tops.status).toBe(200);
    const res = await t.http.patch(`${url}/${list[1].id}`).set('Authorization', petro).send({ ordinal: 1 });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/ORDER-1/);
  });

  it('PUT cutoffs validates each field (fractions in [0, 1], permMin >= 0 or null) and names it', async () => {
    const list = (await t.http.get(url).set('Authorization', petro)).body as { id: string }[];
    const cut = `${url}/${list[0].id}/cutoffs`;
    const bad = await t.http.put(cut).set('Authorization', petro).send({ vshMax: 1.5, phiMin: -0.1, swMax: 'high', permMin: -1 });
    expect(bad.status).toBe(400);
    const text = JSON.stringify(bad.body.message);
    for (const m of ['vshMax must be between 0 and 1', 'phiMin must be between 0 and 1', 'swMax must be a number', 'permMin must be 0 mD or more']) expect(text).toContain(m);
    expect((await t.http.put(cut).set('Authorization', await t.tokenFor('reviewer')).send({ vshMax: 0.3, phiMin: 0.1, swMax: 0.5 })).status).toBe(403);
    const ok = await t.http.put(cut).set('Authorization', petro).send({ vshMax: 0.3, phiMin: 0.1, swMax: 0.5, permMin: null });
    expect(ok.status).toBe(200);
    expect(ok.body.formation.cutoffs).toEqual({ vshMax: 0.3, phiMin: 0.1, swMax: 0.5, permMin: null });
    expect(ok.body.recomputed).toEqual([expect.objectContaining({ wellName: 'ORDER-1', interpretationId: null, changed: false })]);
  });
});
