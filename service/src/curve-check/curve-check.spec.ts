import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, createWell, demoAssetId, lasText, uploadLas } from '../../test/workbench-fixtures.js';

describe('curve check API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let wellId: string;
  let runId: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    wellId = await createWell(t, assetId, 'CHECK-1');
    // 2000..2009 ft every 1 ft: GR with a two-sample gap and one value above 500 gAPI;
    // RHOB in kg/m3 (so the plausible range 1.0-3.2 g/cm3 reads 1000-3200 kg/m3), one below.
    runId = await uploadLas(
      t,
      assetId,
      wellId,
      'check.las',
      lasText({
        start: 2000,
        step: 1,
        count: 10,
        curves: [
          { mnemonic: 'GR', unit: 'GAPI', at: (d) => (d === 2003 || d === 2004 ? NaN : d === 2007 ? 650 : 80) },
          { mnemonic: 'RHOB', unit: 'K/M3', at: (d) => (d === 2000 ? 900 : 2400) },
          { mnemonic: 'XYZ', unit: 'ABC', at: () => 1 },
        ],
      }),
    );
  });
  afterAll(async () => t.close());

  it('GET curve-check reports coverage, inner null runs and range violations per curve, in the curve unit', async () => {
    const res = await t.http.get(`/api/assets/${assetId}/wells/${wellId}/curve-check`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.map((c: { mnemonic: string }) => c.mnemonic)).toEqual(['GR', 'RHOB', 'XYZ']);
    const [gr, rhob, xyz] = res.body;
    expect(gr).toMatchObject({
      logRunId: runId,
      fileName: 'check.las',
      curveClass: 'gamma_ray',
      coverage: { first: 2000, last: 2009, fraction: 0.8 },
      nullRuns: [{ from: 2003, to: 2004, samples: 2 }],
      rangeViolations: { below: 0, above: 1, min: 80, max: 650, expectedMin: 0, expectedMax: 500 },
    });
    expect(rhob.rangeViolations).toMatchObject({ below: 1, above: 0, min: 900, max: 2400 });
    expect(rhob.rangeViolations.expectedMin).toBeCloseTo(1000, 9); // 1.0 g/cm3 = 1000 kg/m3 (SI prefix)
    expect(rhob.rangeViolations.expectedMax).toBeCloseTo(3200, 9);
    expect(xyz).toMatchObject({ curveClass: null, rangeViolations: { expectedMin: null, expectedMax: null, below: 0, above: 0 } });
  });

  it('GET curve-check of a well of another asset is 404', async () => {
    const outsider = await createOutsider(t);
    expect((await t.http.get(`/api/assets/${assetId}/wells/${wellId}/curve-check`).set('Authorization', outsider.token)).status).toBe(404);
    expect((await t.http.get(`/api/assets/${outsider.assetId}/wells/${wellId}/curve-check`).set('Authorization', outsider.token)).status).toBe(404);
  });
});
