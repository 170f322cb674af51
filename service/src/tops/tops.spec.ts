import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createFormation, createOutsider, createWell, demoAssetId, lasText, uploadLas } from '../../test/workbench-fixtures.js';

describe('tops and zones API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let wellId: string;
  let url: string;
  let petro: string;
  let upper: { id: string };
  let middle: { id: string };
  let lower: { id: string };
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    petro = await t.tokenFor('petrophysicist');
    upper = await createFormation(t, assetId, { name: 'Upper' });
    middle = await createFormation(t, assetId, { name: 'Middle' });
    lower = await createFormation(t, assetId, { name: 'Lower' });
    wellId = await createWell(t, assetId, 'TOPS-1');
    url = `/api/assets/${assetId}/wells/${wellId}`;
  });
  afterAll(async () => t.close());

  it('GET tops of a new well is empty; PUT replaces them and GET lists them by depth with formation names', async () => {
    expect((await t.http.get(`${url}/tops`).set('Authorization', await t.tokenFor('viewer'))).body).toEqual([]);
    const res = await t.http
      .put(`${url}/tops`)
      .set('Authorization', petro)
      .send({ tops: [{ formationId: middle.id, md: 1100, source: 'depth-view' }, { formationId: upper.id, md: 1000 }] });
    expect(res.status).toBe(200);
    expect(res.body).toEqual([
      expect.objectContaining({ formationId: upper.id, formationName: 'Upper', md: 1000, source: 'table' }),
      expect.objectContaining({ formationId: middle.id, formationName: 'Middle', md: 1100, source: 'depth-view' }),
    ]);
    expect((await t.http.get(`${url}/tops`).set('Authorization', petro)).body).toEqual(res.body);
  });

  it('GET zones without logs: intervals between tops, the last without a base', async () => {
    const res = await t.http.get(`${url}/zones`).set('Authorization', await t.tokenFor('engineer'));
    expect(res.body).toEqual([
      expect.objectContaining({ formationId: upper.id, name: 'Upper', top: 1000, base: 1100 }),
      expect.objectContaining({ formationId: middle.id, name: 'Middle', top: 1100, base: null }),
    ]);
  });

  it('GET zones with logs: the last zone ends at the deepest logged depth (a metre log converted to feet)', async () => {
    // one run in feet 950..1250 ft, so the well's depth unit is ft
    await uploadLas(t, assetId, wellId, 'tops-ft.las', lasText({ start: 950, step: 1, count: 301, curves: [{ mnemonic: 'GR', unit: 'GAPI', at: () => 50 }] }));
    // a deeper run in metres: 390..400 m = 1279.53..1312.34 ft
    await uploadLas(t, assetId, wellId, 'tops-m.las', lasText({ depthUnit: 'M', start: 390, step: 0.5, count: 21, curves: [{ mnemonic: 'GR', unit: 'GAPI', at: () => 60 }] }));
    const res = await t.http.get(`${url}/zones`).set('Authorization', petro);
    expect(res.body[1].top).toBe(1100);
    expect(res.body[1].base).toBeCloseTo(400 / 0.3048, 9); // 400 m in ft, 1 ft = 0.3048 m exactly (NIST SP 811)
  });

  it('PUT tops out of formation order is 400 naming both formations; nothing changes', async () => {
    const res = await t.http
      .put(`${url}/tops`)
      .set('Authorization', petro)
      .send({ tops: [{ formationId: upper.id, md: 1000 }, { formationId: middle.id, md: 1200 }, { formationId: lower.id, md: 1150 }] });
    expect(res.status).toBe(400);
    expect(res.body.message).toContain('the top of "Lower" (1150) must be deeper than the top of "Middle" (1200)');
    expect((await t.http.get(`${url}/tops`).set('Authorization', petro)).body).toHaveLength(2);
  });

  it('PUT tops with bad fields is 400 naming the field: non-finite md, unknown or repeated formation, bad source', async () => {
    const nan = await t.http.put(`${url}/tops`).set('Authorization', petro).send({ tops: [{ formationId: upper.id, md: 'deep' }] });
    expect(nan.status).toBe(400);
    expect(JSON.stringify(nan.body.message)).toContain('md must be a finite number');
    const unknown = await t.http.put(`${url}/tops`).set('Authorization', petro).send({ tops: [{ formationId: '00000000-0000-4000-8000-000000000000', md: 5 }] });
    expect(unknown.body.message).toBe('tops[0].formationId is not a formation of this asset');
    const twice = await t.http.put(`${url}/tops`).set('Authorization', petro).send({ tops: [{ formationId: upper.id, md: 5 }, { formationId: upper.id, md: 6 }] });
    expect(twice.body.message).toMatch(/tops\[1\]\.formationId repeats "Upper"/);
    const source = await t.http.put(`${url}/tops`).set('Authorization', petro).send({ tops: [{ formationId: upper.id, md: 5, source: 'guess' }] });
    expect(JSON.stringify(source.body.message)).toContain('source must be one of');
    expect((await t.http.put(`${url}/tops`).set('Authorization', petro).send({})).status).toBe(400);
  });

  it('PUT tops is 403 for a viewer or reviewer; a formation of another asset is refused; another asset cannot read them', async () => {
    expect((await t.http.put(`${url}/tops`).set('Authorization', await t.tokenFor('viewer')).send({ tops: [] })).status).toBe(403);
    expect((await t.http.put(`${url}/tops`).set('Authorization', await t.tokenFor('reviewer')).send({ tops: [] })).status).toBe(403);
    const outsider = await createOutsider(t);
    expect((await t.http.get(`${url}/tops`).set('Authorization', outsider.token)).status).toBe(404);
    // the outsider's own well with this asset's formation id
    const res = await t.http
      .put(`/api/assets/${outsider.assetId}/wells/${outsider.wellId}/tops`)
      .set('Authorization', outsider.token)
      .send({ tops: [{ formationId: upper.id, md: 10 }] });
    expect(res.status).toBe(400);
    // this asset's well under the outsider's asset id
    expect((await t.http.get(`/api/assets/${outsider.assetId}/wells/${wellId}/tops`).set('Authorization', outsider.token)).status).toBe(404);
  });

  it('every change of tops is audited with before and after; an identical PUT writes nothing', async () => {
    const reviewer = await t.tokenFor('reviewer');
    const before = (await t.http.get(`/api/assets/${assetId}/audit?entity=well_tops`).set('Authorization', reviewer)).body;
    await t.http.put(`${url}/tops`).set('Authorization', petro).send({ tops: [{ formationId: upper.id, md: 1000 }, { formationId: middle.id, md: 1100, source: 'depth-view' }] });
    expect((await t.http.get(`/api/assets/${assetId}/audit?entity=well_tops`).set('Authorization', reviewer)).body).toHaveLength(before.length);
    await t.http.put(`${url}/tops`).set('Authorization', petro).send({ tops: [{ formationId: upper.id, md: 1001 }] });
    const after = (await t.http.get(`/api/assets/${assetId}/audit?entity=well_tops`).set('Authorization', reviewer)).body;
    expect(after).toHaveLength(before.length + 1);
    expect(after[0]).toMatchObject({
      action: 'replace',
      entityId: wellId,
      before: [{ formation: 'Upper', md: 1000 }, { formation: 'Middle', md: 1100 }],
      after: [{ formation: 'Upper', md: 1001, source: 'table' }],
    });
  });
});
