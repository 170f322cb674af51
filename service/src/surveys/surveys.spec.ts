import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, createWell, demoAssetId, lasText, uploadLas } from '../../test/workbench-fixtures.js';

describe('deviation survey API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let wellId: string;
  let url: string;
  let petro: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    petro = await t.tokenFor('petrophysicist');
    wellId = await createWell(t, assetId, 'SURVEY-1');
    url = `/api/assets/${assetId}/wells/${wellId}/survey`;
  });
  afterAll(async () => t.close());

  it('GET before any upload is 404', async () => {
    expect((await t.http.get(url).set('Authorization', petro)).status).toBe(404);
  });

  it('POST without a depth unit on a well without logs is 400 naming depthUnit', async () => {
    const res = await t.http.post(url).set('Authorization', petro).attach('file', Buffer.from('md,inclination,azimuth\n0,0,0\n1000,0,0\n'), 'plain.csv');
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/depthUnit is needed/);
  });

  it('POST stores the stations and returns TVD by minimum curvature; GET returns the same', async () => {
    await uploadLas(t, assetId, wellId, 's.las', lasText({ start: 900, step: 1, count: 1200, curves: [{ mnemonic: 'GR', unit: 'GAPI', at: () => 50 }] }));
    const csv = 'md,inclination,azimuth\n0,0,0\n1000,0,0\n2000,30,0\n';
    const res = await t.http.post(url).set('Authorization', petro).attach('file', Buffer.from(csv), 'dev.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ fileName: 'dev.csv', depthUnit: 'ft', stations: [{ md: 0 }, { md: 1000 }, { md: 2000, inclination: 30, azimuth: 0 }] });
    // Independently: a 30 degree build over 1000 ft on a circular arc of radius R = 1000 / (pi/6)
    // drops R sin(30 deg) = 3000/pi ft vertically (arc geometry, worked by hand).
    expect(res.body.tvdAtStations[0]).toBe(0);
    expect(res.body.tvdAtStations[1]).toBeCloseTo(1000, 9);
    expect(res.body.tvdAtStations[2]).toBeCloseTo(1000 + 3000 / Math.PI, 6);
    const get = await t.http.get(url).set('Authorization', await t.tokenFor('viewer'));
    expect(get.body).toEqual(res.body);
  });

  it('POST with a bad line is 400 naming the file and the line; nothing replaces the stored survey', async () => {
    const res = await t.http.post(url).set('Authorization', petro).attach('file', Buffer.from('md,inclination,azimuth\n0,0,0\n500,200,0\n'), 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('bad.csv: line 3: inclination must be between 0 and 180 degrees, got 200');
    expect(res.body.line).toBe(3);
    expect((await t.http.get(url).set('Authorization', petro)).body.fileName).toBe('dev.csv');
  });

  it('POST with a depthUnit contradicting the header is 400; a metre survey is kept in metres', async () => {
    const clash = await t.http.post(url).set('Authorization', petro).field('depthUnit', 'ft').attach('file', Buffer.from('md (m),inc,azi\n0,0,0\n300,0,0\n'), 'm.csv');
    expect(clash.status).toBe(400);
    expect(clash.body.message).toMatch(/depthUnit "ft" contradicts the md header/);
    const badUnit = await t.http.post(url).set('Authorization', petro).field('depthUnit', 'yd').attach('file', Buffer.from('md,inc,azi\n0,0,0\n300,0,0\n'), 'm.csv');
    expect(JSON.stringify(badUnit.body.message)).toContain("depthUnit must be 'ft' or 'm'");
    const ok = await t.http.post(url).set('Authorization', petro).field('depthUnit', 'm').attach('file', Buffer.from('md,inc,azi\n0,0,0\n300,0,0\n'), 'm.csv');
    expect(ok.status).toBe(201);
    expect(ok.body.depthUnit).toBe('m');
    const audit = await t.http.get(`/api/assets/${assetId}/audit?entity=well_survey&limit=1`).set('Authorization', await t.tokenFor('reviewer'));
    expect(audit.body[0]).toMatchObject({ action: 'replace', before: { fileName: 'dev.csv', stationCount: 3 }, after: { fileName: 'm.csv', depthUnit: 'm', stationCount: 2 } });
  });

  it('POST without a file is 400; by a viewer or engineer is 403; another asset gets 404', async () => {
    expect((await t.http.post(url).set('Authorization', petro)).status).toBe(400);
    for (const role of ['viewer', 'engineer'] as const) {
      expect((await t.http.post(url).set('Authorization', await t.tokenFor(role)).attach('file', Buffer.from('md,inc,azi\n0,0,0\n1,0,0\n'), 'x.csv')).status).toBe(403);
    }
    const outsider = await createOutsider(t);
    expect((await t.http.get(url).set('Authorization', outsider.token)).status).toBe(404);
    expect((await t.http.get(`/api/assets/${outsider.assetId}/wells/${wellId}/survey`).set('Authorization', outsider.token)).status).toBe(404);
  });
});
