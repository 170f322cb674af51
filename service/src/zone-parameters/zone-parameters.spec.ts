import { defaultZoneParameters } from '@poreline/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createFormation, createOutsider, createWell, demoAssetId, lasText, uploadLas } from '../../test/workbench-fixtures.js';

describe('zone parameters API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let wellId: string;
  let sand: { id: string };
  let lime: { id: string };
  let petro: string;
  const url = (formationId: string) => `/api/assets/${assetId}/wells/${wellId}/zones/${formationId}/parameters`;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    petro = await t.tokenFor('petrophysicist');
    sand = await createFormation(t, assetId, { name: 'Param Sand', lithology: 'shaly_sand' });
    lime = await createFormation(t, assetId, { name: 'Param Lime', lithology: 'limestone' });
    wellId = await createWell(t, assetId, 'PARAM-1');
    // a metric well: defaults follow its depth unit
    await uploadLas(t, assetId, wellId, 'm.las', lasText({ depthUnit: 'M', start: 1000, step: 0.5, count: 10, curves: [{ mnemonic: 'GR', unit: 'GAPI', at: () => 50 }] }));
  });
  afterAll(async () => t.close());

  it('GET without stored parameters returns the lithology defaults of core for the well\'s depth unit', async () => {
    const res = await t.http.get(url(sand.id)).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ params: defaultZoneParameters('shaly_sand', 'm'), isDefault: true });
    expect((await t.http.get(url(lime.id)).set('Authorization', petro)).body.params).toEqual(defaultZoneParameters('limestone', 'm'));
  });

  it('PUT stores valid parameters; GET then returns them; the change is audited', async () => {
    const params = { ...defaultZoneParameters('shaly_sand', 'm'), grClean: 30, grShale: 120, rhoMatrix: 2.68 };
    const res = await t.http.put(url(sand.id)).set('Authorization', petro).send({ params });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ params, isDefault: false });
    expect((await t.http.get(url(sand.id)).set('Authorization', petro)).body).toEqual({ params, isDefault: false });
    const audit = await t.http.get(`/api/assets/${assetId}/audit?entity=zone_parameters&limit=1`).set('Authorization', await t.tokenFor('reviewer'));
    expect(audit.body[0]).toMatchObject({ action: 'create', before: null, after: { well: 'PARAM-1', formation: 'Param Sand', params: { rhoMatrix: 2.68 } } });
  });

  it('PUT with out-of-range values is 400 listing every issue, each naming the zone and field; nothing is stored', async () => {
    const params = { ...defaultZoneParameters('sandstone'), rhoMatrix: 1.0, rhoFluid: 1.0, m: -2, rw: { kind: 'at_temperature', rw: 0, temperature: 75 } };
    const res = await t.http.put(url(lime.id)).set('Authorization', petro).send({ params });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(
      expect.arrayContaining([
        "zone 'Param Lime': rhoMatrix must differ from rhoFluid (both 1 g/cm3)",
        "zone 'Param Lime': m must be > 0",
        "zone 'Param Lime': rw.rw must be > 0",
      ]),
    );
    expect(res.body.issues).toEqual(expect.arrayContaining([{ zone: 'Param Lime', field: 'm', message: 'm must be > 0' }]));
    expect((await t.http.get(url(lime.id)).set('Authorization', petro)).body.isDefault).toBe(true);
  });

  it('PUT with a missing or unknown field is 400 naming it; params must be an object', async () => {
    const { a: _a, ...withoutA } = defaultZoneParameters('sandstone');
    const missing = await t.http.put(url(lime.id)).set('Authorization', petro).send({ params: { ...withoutA, colourOfRock: 'grey' } });
    expect(missing.status).toBe(400);
    expect(missing.body.message).toEqual(["zone 'Param Lime': params.a is missing", "zone 'Param Lime': params.colourOfRock is not a zone parameter"]);
    const notObject = await t.http.put(url(lime.id)).set('Authorization', petro).send({ params: 5 });
    expect(JSON.stringify(notObject.body.message)).toContain('params must be an object');
  });

  it('PUT is 403 for viewer, engineer and reviewer; unknown formation 404; another asset 404', async () => {
    const params = defaultZoneParameters('sandstone');
    for (const role of ['viewer', 'engineer', 'reviewer'] as const) {
      expect((await t.http.put(url(sand.id)).set('Authorization', await t.tokenFor(role)).send({ params })).status).toBe(403);
    }
    expect((await t.http.get(url('00000000-0000-4000-8000-000000000000')).set('Authorization', petro)).status).toBe(404);
    const outsider = await createOutsider(t);
    expect((await t.http.get(url(sand.id)).set('Authorization', outsider.token)).status).toBe(404);
    // the outsider's well with this asset's formation
    expect((await t.http.put(`/api/assets/${outsider.assetId}/wells/${outsider.wellId}/zones/${sand.id}/parameters`).set('Authorization', outsider.token).send({ params })).status).toBe(404);
  });
});
