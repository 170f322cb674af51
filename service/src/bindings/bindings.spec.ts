import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, createWell, demoAssetId, lasText, uploadLas } from '../../test/workbench-fixtures.js';

describe('curve bindings API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let wellId: string;
  let url: string;
  let petro: string;
  let run1: string;
  let run2: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    petro = await t.tokenFor('petrophysicist');
    wellId = await createWell(t, assetId, 'BIND-1');
    url = `/api/assets/${assetId}/wells/${wellId}/bindings`;
    // run 1: GR and ILD with a short interval; run 2: GR over more depth, RHOB, NPHI in %, and a GR in ohm.m (unit conflict)
    run1 = await uploadLas(t, assetId, wellId, 'run1.las', lasText({ start: 1000, step: 0.5, count: 11, curves: [{ mnemonic: 'GR', unit: 'GAPI', at: () => 60 }, { mnemonic: 'ILD', unit: 'OHMM', at: () => 10 }] }));
    run2 = await uploadLas(
      t,
      assetId,
      wellId,
      'run2.las',
      lasText({
        start: 990,
        step: 0.5,
        count: 41,
        curves: [
          { mnemonic: 'GR', unit: 'GAPI', at: () => 70 },
          { mnemonic: 'RHOB', unit: 'G/CC', at: () => 2.4 },
          { mnemonic: 'NPHI', unit: '%', at: () => 20 },
          { mnemonic: 'SGR', unit: 'OHMM', at: () => 1 },
        ],
      }),
    );
  });
  afterAll(async () => t.close());

  it('GET proposes, per input, the recognised curve with the most values and a fitting unit', async () => {
    const res = await t.http.get(url).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body).toEqual([
      { binding: 'gr', logRunId: run2, fileName: 'run2.las', mnemonic: 'GR', unit: 'GAPI', confirmed: false, proposed: true },
      { binding: 'rhob', logRunId: run2, fileName: 'run2.las', mnemonic: 'RHOB', unit: 'G/CC', confirmed: false, proposed: true },
      { binding: 'nphi', logRunId: run2, fileName: 'run2.las', mnemonic: 'NPHI', unit: '%', confirmed: false, proposed: true },
      { binding: 'rt', logRunId: run1, fileName: 'run1.las', mnemonic: 'ILD', unit: 'OHMM', confirmed: false, proposed: true },
    ]);
  });

  it('PUT confirms an override (GR from run 1); the stored set is then the whole truth', async () => {
    const res = await t.http
      .put(url)
      .set('Authorization', petro)
      .send({ bindings: [{ binding: 'gr', logRunId: run1, mnemonic: 'GR' }, { binding: 'rt', logRunId: run1, mnemonic: 'ILD' }] });
    expect(res.status).toBe(200);
    expect(res.body).toEqual([
      { binding: 'gr', logRunId: run1, fileName: 'run1.las', mnemonic: 'GR', unit: 'GAPI', confirmed: true, proposed: false },
      { binding: 'rt', logRunId: run1, fileName: 'run1.las', mnemonic: 'ILD', unit: 'OHMM', confirmed: true, proposed: false },
    ]);
    const audit = await t.http.get(`/api/assets/${assetId}/audit?entity=curve_bindings`).set('Authorization', await t.tokenFor('admin'));
    expect(audit.body[0]).toMatchObject({
      action: 'replace',
      entityId: wellId,
      before: expect.arrayContaining([{ binding: 'gr', fileName: 'run2.las', mnemonic: 'GR' }]),
      after: [{ binding: 'gr', fileName: 'run1.las', mnemonic: 'GR' }, { binding: 'rt', fileName: 'run1.las', mnemonic: 'ILD' }],
    });
  });

  it('PUT is 400 naming the field: unknown key, a run of another well, a missing curve, a unit of the wrong kind, a key twice', async () => {
    const put = (bindings: unknown[]) => t.http.put(url).set('Authorization', petro).send({ bindings });
    const unknownKey = await put([{ binding: 'xx', logRunId: run1, mnemonic: 'GR' }]);
    expect(JSON.stringify(unknownKey.body.message)).toContain('binding must be one of');
    expect((await put([{ binding: 'gr', logRunId: '00000000-0000-4000-8000-000000000000', mnemonic: 'GR' }])).body.message).toBe('bindings[0].logRunId is not a log run of this well');
    expect((await put([{ binding: 'gr', logRunId: run1, mnemonic: 'NOPE' }])).body.message).toBe('bindings[0].mnemonic "NOPE" is not a curve of that log run');
    const wrongUnit = await put([{ binding: 'rhob', logRunId: run2, mnemonic: 'SGR' }]);
    expect(wrongUnit.status).toBe(400);
    expect(wrongUnit.body.message).toMatch(/bindings\[0\]\.mnemonic "SGR" cannot be rhob/);
    expect((await put([{ binding: 'gr', logRunId: run1, mnemonic: 'GR' }, { binding: 'gr', logRunId: run2, mnemonic: 'GR' }])).body.message).toMatch(/bindings\[1\]\.binding "gr" is listed twice/);
  });

  it('PUT is 403 for viewer, engineer and reviewer; another asset gets 404', async () => {
    for (const role of ['viewer', 'engineer', 'reviewer'] as const) {
      expect((await t.http.put(url).set('Authorization', await t.tokenFor(role)).send({ bindings: [] })).status).toBe(403);
    }
    const outsider = await createOutsider(t);
    expect((await t.http.get(url).set('Authorization', outsider.token)).status).toBe(404);
    const res = await t.http
      .put(`/api/assets/${outsider.assetId}/wells/${outsider.wellId}/bindings`)
      .set('Authorization', outsider.token)
      .send({ bindings: [{ binding: 'gr', logRunId: run1, mnemonic: 'GR' }] });
    expect(res.status).toBe(400); // a run of a well of another asset is not a run of this well
  });
});
