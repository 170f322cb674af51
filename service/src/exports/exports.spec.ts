import { readLas } from '@poreline/core';
import ExcelJS from 'exceljs';
import { createHash } from 'node:crypto';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, demoAssetId, KITE, lasText, setUpKiteWell } from '../../test/workbench-fixtures.js';

const binary = (res: import('supertest').Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('interpretation export API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let url: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    const well = await setUpKiteWell(t, assetId, 'EXP-1');
    const saved = await t.http.post(`/api/assets/${assetId}/wells/${well.wellId}/interpretations`).set('Authorization', await t.tokenFor('petrophysicist'));
    url = `/api/assets/${assetId}/wells/${well.wellId}/interpretations/${saved.body.id}/export`;
  });
  afterAll(async () => t.close());

  it('format=las: LAS 2.0 with the merged inputs and the computed curves; values match the hand calculation; provenance in ~Other', async () => {
    const res = await t.http.get(`${url}?format=las`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toContain('filename="EXP-1-v1-draft.las"');
    const las = readLas(res.text);
    expect(las.version).toBe('2.0');
    expect(las.curves.map((c) => c.mnemonic)).toEqual(['DEPT', 'GR', 'RHOB', 'RT', 'VSH', 'PHIT', 'PHIE', 'SW', 'BVW', 'NET_RES', 'NET_PAY']);
    const depth = las.curves[0].values;
    const col = (m: string) => las.curves.find((c) => c.mnemonic === m)!.values;
    const i = depth.indexOf(5020);
    // by hand (see interpretations.spec.ts): PHIE = 0.35/1.65, SW = sqrt(0.05/(PHIE^2 * 20)), BVW = PHIE * SW
    expect(col('PHIE')[i]).toBeCloseTo(0.35 / 1.65, 12);
    expect(col('SW')[i]).toBeCloseTo(Math.sqrt(0.05 / ((0.35 / 1.65) ** 2 * 20)), 12);
    expect(col('BVW')[i]).toBeCloseTo((0.35 / 1.65) * Math.sqrt(0.05 / ((0.35 / 1.65) ** 2 * 20)), 12);
    expect(col('NET_PAY')[depth.indexOf(5049.5)]).toBe(1);
    expect(col('NET_PAY')[depth.indexOf(5050)]).toBe(0);
    expect(col('SW')[depth.indexOf(4950)]).toBeNaN(); // above every zone
    const sha = createHash('sha256').update(lasText({ well: 'EXP-1', start: 4950, step: 1, count: 351, curves: [{ mnemonic: 'ILD', unit: 'OHMM', at: KITE.rt }] })).digest('hex');
    expect(las.sections.other).toContain(`EXP-1-b.las sha256 ${sha}`);
    expect(las.sections.well.find((w) => w.mnemonic === 'WELL')?.value).toBe('EXP-1');
  });

  it('format=csv (the default): the zone rows with units in the header and the parameter snapshot in the provenance', async () => {
    const res = await t.http.get(url).set('Authorization', await t.tokenFor('engineer'));
    expect(res.status).toBe(200);
    const lines = res.text.split('\r\n');
    const provenance = lines.filter((l) => l.startsWith('#')).join('\n');
    expect(provenance).toContain('# EXP-1 v1 parameters Kite Sand,"5000-5100 ft; {');
    expect(provenance).toContain('""grClean"":30');
    expect(provenance).toContain('# EXP-1 v1 cutoffs Kite Sand,');
    const rows = Papa.parse<string[]>(res.text, { comments: '#', skipEmptyLines: true }).data;
    expect(rows[0][0]).toBe('Well');
    expect(rows.slice(1).map((r) => r[1])).toEqual(['Kite Sand', 'Lark Shale']);
  });

  it('format=xlsx: Zones, Parameters and Provenance sheets', async () => {
    const res = await t.http.get(`${url}?format=xlsx`).set('Authorization', await t.tokenFor('viewer')).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(new Uint8Array(res.body as Buffer).slice().buffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Zones', 'Parameters', 'Provenance']);
    const params = wb.getWorksheet('Parameters')!;
    const rows = params.getSheetValues().slice(2) as unknown[][];
    expect(rows).toEqual(expect.arrayContaining([[undefined, 'Kite Sand', 5000, 5100, 'rw.rw', 0.05]]));
  });

  it('a bad format is 400; an unknown version 404; another asset 404', async () => {
    expect((await t.http.get(`${url}?format=doc`).set('Authorization', await t.tokenFor('viewer'))).status).toBe(400);
    expect((await t.http.get(url.replace(/interpretations\/[^/]+/, 'interpretations/00000000-0000-4000-8000-000000000000')).set('Authorization', await t.tokenFor('viewer'))).status).toBe(404);
    const outsider = await createOutsider(t);
    expect((await t.http.get(url).set('Authorization', outsider.token)).status).toBe(404);
  });
});
