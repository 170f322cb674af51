import ExcelJS from 'exceljs';
import { createHash } from 'node:crypto';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, createWell, demoAssetId, KITE, lasText, setUpKiteWell } from '../../test/workbench-fixtures.js';
import { APP_VERSION } from '../common/app-version.js';

const binary = (res: import('supertest').Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('zone tables API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let kiteId: string;
  let url: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    url = `/api/assets/${assetId}/zone-table`;
    const petro = await t.tokenFor('petrophysicist');
    const one = await setUpKiteWell(t, assetId, 'ZT-1');
    kiteId = one.kite.id;
    const two = await setUpKiteWell(t, assetId, 'ZT-2');
    const v1 = (await t.http.post(`/api/assets/${assetId}/wells/${one.wellId}/interpretations`).set('Authorization', petro)).body.id;
    await t.http.post(`/api/assets/${assetId}/wells/${one.wellId}/interpretations/${v1}/submit`).set('Authorization', petro).expect(200);
    await t.http.post(`/api/assets/${assetId}/wells/${one.wellId}/interpretations/${v1}/approve`).set('Authorization', await t.tokenFor('reviewer')).send({}).expect(200);
    await t.http.post(`/api/assets/${assetId}/wells/${two.wellId}/interpretations`).set('Authorization', petro).expect(201);
    // a third well with a Kite Sand top and no version yet
    const three = await createWell(t, assetId, 'ZT-3');
    await t.http.put(`/api/assets/${assetId}/wells/${three}/tops`).set('Authorization', petro).send({ tops: [{ formationId: kiteId, md: 5010 }] }).expect(200);
  });
  afterAll(async () => t.close());

  it('GET zone-table lists every zone of the newest version of each well, with version, status and units', async () => {
    const res = await t.http.get(url).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.map((r: { wellName: string; formation: string; version: number; status: string }) => `${r.wellName} ${r.formation} v${r.version} ${r.status}`)).toEqual([
      'ZT-1 Kite Sand v1 approved',
      'ZT-1 Lark Shale v1 approved',
      'ZT-2 Kite Sand v1 draft',
      'ZT-2 Lark Shale v1 draft',
    ]);
    const kite = res.body[0];
    // hand calculation in interpretations.spec.ts: net pay 49.75 ft, porosity 0.35/1.65, Sw sqrt(0.05/(phi^2 * 20))
    expect(kite).toMatchObject({ formationId: kiteId, top: 5000, base: 5100, gross: 100, depthUnit: 'ft', grossTvd: null });
    expect(kite.netPay).toBeCloseTo(49.75, 9);
    expect(kite.phiMean).toBeCloseTo(0.35 / 1.65, 9);
    expect(kite.swMean).toBeCloseTo(Math.sqrt(0.05 / ((0.35 / 1.65) ** 2 * 20)), 9);
    expect(kite.phiH).toBeCloseTo(49.75 * (0.35 / 1.65), 9); // sum(phi h) over net pay with a constant phi
    expect(kite.ntg).toBeCloseTo(99.75 / 100, 9);
  });

  it('GET zone-table?formationId= gives one row per well with that top (empty for a well without a version); approvedOnly keeps approved versions', async () => {
    const res = await t.http.get(`${url}?formationId=${kiteId}`).set('Authorization', await t.tokenFor('engineer'));
    expect(res.body.map((r: { wellName: string; version: number | null }) => `${r.wellName} v${r.version}`)).toEqual(['ZT-1 v1', 'ZT-2 v1', 'ZT-3 vnull']);
    expect(res.body[2]).toMatchObject({ formation: 'Kite Sand', netPay: null, status: null, interpretationId: null });
    const approved = await t.http.get(`${url}?formationId=${kiteId}&approvedOnly=true`).set('Authorization', await t.tokenFor('engineer'));
    expect(approved.body.map((r: { wellName: string; version: number | null }) => `${r.wellName} v${r.version}`)).toEqual(['ZT-1 v1', 'ZT-2 vnull', 'ZT-3 vnull']);
    expect((await t.http.get(`${url}?approvedOnly=maybe`).set('Authorization', await t.tokenFor('engineer'))).status).toBe(400);
    expect((await t.http.get(`${url}?formationId=00000000-0000-4000-8000-000000000000`).set('Authorization', await t.tokenFor('engineer'))).status).toBe(404);
  });

  it('export CSV: provenance lines (#) with file sha256s, parameters, user, time and app version; units in the header row', async () => {
    const res = await t.http.get(`${url}/export?format=csv&formationId=${kiteId}`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename=".*zone-table-Kite_Sand\.csv"/);
    const text = res.text;
    const provenance = text.split('\r\n').filter((l) => l.startsWith('#'));
    const sha = createHash('sha256').update(lasText({ well: 'ZT-1', start: 4900, step: 0.5, count: 801, curves: [{ mnemonic: 'GR', unit: 'GAPI', at: KITE.gr }, { mnemonic: 'RHOB', unit: 'G/CC', at: KITE.rhob }] })).digest('hex');
    expect(provenance.join('\n')).toContain(`ZT-1-a.las sha256 ${sha}`);
    expect(provenance.join('\n')).toContain(`Poreline ${APP_VERSION}`);
    expect(provenance.join('\n')).toContain('Vic Viewer <viewer@poreline.demo>');
    expect(provenance.join('\n')).toMatch(/ZT-1 v1 parameters Kite Sand/);
    expect(provenance.join('\n')).toMatch(/SPE-PRMS/);
    const parsed = Papa.parse<string[]>(text, { comments: '#', skipEmptyLines: true });
    expect(parsed.data[0]).toEqual(expect.arrayContaining(['Net pay MD (ft)', 'Porosity net pay (v/v)', 'Gross TVD (ft)', 'Depth unit']));
    expect(parsed.data).toHaveLength(4); // header + 3 wells
    const col = parsed.data[0].indexOf('Net pay MD (ft)');
    expect(Number(parsed.data[1][col])).toBeCloseTo(49.75, 9);
  });

  it('export XLSX: a Zones sheet with units in the header and a Provenance sheet', async () => {
    const res = await t.http.get(`${url}/export?format=xlsx`).set('Authorization', await t.tokenFor('viewer')).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(new Uint8Array(res.body as Buffer).slice().buffer);
    const zones = wb.getWorksheet('Zones')!;
    const header = (zones.getRow(1).values as unknown[]).slice(1);
    expect(header).toContain('Net pay MD (ft)');
    expect(zones.rowCount).toBe(5);
    const prov = wb.getWorksheet('Provenance')!;
    const keys = prov.getColumn(1).values.slice(2) as string[];
    expect(keys).toEqual(expect.arrayContaining(['app', 'exported at', 'exported by', 'ZT-1 v1 file', 'ZT-2 v1 interpretation']));
  });

  it('export with a bad format is 400 naming it; a member of another asset gets 404', async () => {
    const bad = await t.http.get(`${url}/export?format=pdf`).set('Authorization', await t.tokenFor('viewer'));
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.message)).toContain('format must be one of: csv, xlsx');
    const outsider = await createOutsider(t);
    expect((await t.http.get(url).set('Authorization', outsider.token)).status).toBe(404);
    expect((await t.http.get(`${url}/export`).set('Authorization', outsider.token)).status).toBe(404);
  });
});
