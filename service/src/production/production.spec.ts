import { assets, formations, interpretations, wells } from '@poreline/schema';
import { eq } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { DatabaseService } from '../database/database.module.js';
import { DEMO_ASSET } from '../seed/demo-users.js';

function summary(formation: string, netPayFt: number, phi: number, sw: number) {
  const t = (md: number) => ({ md, tvd: null, tvt: null });
  return { zone: formation, formation, top: 0, base: 100, gross: { thickness: t(100) }, netPay: { thickness: t(netPayFt), meanPhi: phi, meanSw: sw } };
}

/** Ordinary least squares of y on x, written out here independently of core (by hand). */
function ols(xs: number[], ys: number[]) {
  const n = xs.length;
  const mx = xs.reduce((a, b) => a + b, 0) / n;
  const my = ys.reduce((a, b) => a + b, 0) / n;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < n; i++) {
    sxy += (xs[i] - mx) * (ys[i] - my);
    sxx += (xs[i] - mx) ** 2;
  }
  const slope = sxy / sxx;
  return { slope, intercept: my - slope * mx };
}

const PRESSURE_CSV = ['# static pressures, well PC-1', 'cum_gas (MMscf),pressure (psia)', '0,3000', '500,2810', '1000,2620', '1500,2440', '2000,2255', ''].join('\n');

describe('production data and cross-checks (p/z, Arps decline, inflow)', () => {
  let t: TestApp;
  let assetId: string;
  let wellId: string;
  let formationId: string;
  const url = () => `/api/assets/${assetId}/wells/${wellId}/production`;

  beforeAll(async () => {
    t = await createTestApp();
    const db = t.app.get(DatabaseService).db;
    const [asset] = await db.select().from(assets).where(eq(assets.name, DEMO_ASSET.name));
    assetId = asset.id;
    const [w] = await db.insert(wells).values({ assetId, name: 'PC-1' }).returning();
    wellId = w.id;
    const [f] = await db.insert(formations).values({ assetId, name: 'Plover Sand', ordinal: 1, colour: '#88aacc' }).returning();
    formationId = f.id;
    await db.insert(interpretations).values({ wellId, version: 1, status: 'approved', inputs: { depthUnit: 'ft' }, summaries: [summary('Plover Sand', 30, 0.2, 0.25)], reviewedAt: new Date() });
  });
  afterAll(async () => t.close());

  it('a CSV with bad lines is refused whole, each problem with its line number; nothing is stored', async () => {
    const bad = ['cum_gas,pressure', '0,3000', '500,abc', '400,2600', '600,-5'].join('\n');
    const res = await t.http
      .post(`${url()}/upload`)
      .set('Authorization', await t.tokenFor('engineer'))
      .field('kind', 'pressure')
      .field('fluid', 'gas')
      .attach('file', Buffer.from(bad), 'pc1-bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      { line: 3, message: 'pressure must be a number (got "abc")' },
      { line: 4, message: 'cumulative gas must not decrease (400 after 500)' },
      { line: 5, message: 'pressure must be > 0 (an absolute pressure; got -5)' },
    ]);
    expect(res.body.message[0]).toBe('pc1-bad.csv line 3: pressure must be a number (got "abc")');
    const list = await t.http.get(url()).set('Authorization', await t.tokenFor('viewer'));
    expect(list.body).toEqual([]);
    const noColumn = await t.http
      .post(`${url()}/upload`)
      .set('Authorization', await t.tokenFor('engineer'))
      .field('kind', 'pressure')
      .field('fluid', 'gas')
      .attach('file', Buffer.from('when,what\n1,2\n3,4'), 'x.csv');
    expect(noColumn.status).toBe(400);
    expect(noColumn.body.errors[0]).toMatchObject({ line: 1 });
    expect(noColumn.body.errors[0].message).toMatch(/no cumulative gas column/);
  });

  it('roles: viewer cannot upload (403), reads (200); bad unit is 400 naming the field', async () => {
    const viewer = await t.http.post(`${url()}/upload`).set('Authorization', await t.tokenFor('viewer')).field('kind', 'pressure').field('fluid', 'gas').attach('file', Buffer.from(PRESSURE_CSV), 'p.csv');
    expect(viewer.status).toBe(403);
    const badUnit = await t.http
      .post(`${url()}/upload`)
      .set('Authorization', await t.tokenFor('engineer'))
      .field('kind', 'pressure')
      .field('fluid', 'gas')
      .field('cumGasUnit', 'barrels')
      .attach('file', Buffer.from(PRESSURE_CSV), 'p.csv');
    expect(badUnit.status).toBe(400);
    expect(JSON.stringify(badUnit.body.message)).toMatch(/cumGasUnit must be one of/);
  });

  it('p/z fit: drained GIP is the x-intercept of p/z regressed on Gp (checked by an independent OLS)', async () => {
    const up = await t.http
      .post(`${url()}/upload`)
      .set('Authorization', await t.tokenFor('engineer'))
      .field('kind', 'pressure')
      .field('fluid', 'gas')
      .field('cumGasUnit', 'MMscf')
      .field('pressureUnit', 'psia')
      .attach('file', Buffer.from(PRESSURE_CSV), 'pc1-pressures.csv');
    expect(up.status).toBe(201);
    expect(up.body).toMatchObject({ kind: 'pressure', label: 'pc1-pressures.csv', units: { cumGas: 'MMscf', pressure: 'psia' } });
    expect(up.body.points).toHaveLength(5);
    const missing = await t.http.get(`${url()}/${up.body.id}/pz-fit`).set('Authorization', await t.tokenFor('viewer'));
    expect(missing.status).toBe(400);
    expect(JSON.stringify(missing.body.message)).toMatch(/temperatureF is required/);
    const res = await t.http.get(`${url()}/${up.body.id}/pz-fit?temperatureF=180&gasGravity=0.7&zMethod=dak`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    const xs = res.body.points.map((p: { cumGasScf: number }) => p.cumGasScf);
    const ys = res.body.points.map((p: { pOverZ: number }) => p.pOverZ);
    expect(xs[1]).toBe(500e6);
    for (const p of res.body.points) expect(p.pOverZ).toBeCloseTo(p.pressurePsia / p.z, 9);
    const line = ols(xs, ys);
    expect(res.body.fit.slope / line.slope).toBeCloseTo(1, 10);
    expect(res.body.drainedGipScf / (-line.intercept / line.slope)).toBeCloseTo(1, 10);
    expect(res.body.drainedGipM3).toBeCloseTo(res.body.drainedGipScf * 0.028316846592, 0);
    expect(res.body.wellsNeeded).toBeNull();
    expect(res.body.method).toMatch(/p\/z on cumulative gas/);
  });

  it('p/z with a gas case: wells needed = ceil(volumetric GIP / drained GIP), on each basis, with the assumptions', async () => {
    const created = await t.http
      .post(`/api/assets/${assetId}/reserves-cases`)
      .set('Authorization', await t.tokenFor('engineer'))
      .send({
        name: 'Plover gas',
        formationId,
        wellIds: [wellId],
        seed: 11,
        inputs: { fluid: 'gas', area: 5000, recoveryFactor: 0.8, trials: 2000, gas: { pressurePsia: 3000, temperatureF: 180, gasGravity: 0.7, zMethod: 'dak' }, distributions: { area: { kind: 'uniform', min: 4000, max: 6000 } } },
      });
    expect(created.status).toBe(201);
    const caseId = created.body.id;
    const ran = await t.http.post(`/api/assets/${assetId}/reserves-cases/${caseId}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(ran.status).toBe(200);
    const [series] = (await t.http.get(url()).set('Authorization', await t.tokenFor('viewer'))).body;
    const res = await t.http.get(`${url()}/${series.id}/pz-fit?caseId=${caseId}`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    const gip = ran.body.results.deterministic.inPlace.field;
    expect(res.body.wellsNeeded).toBe(Math.ceil(gip / res.body.drainedGipScf));
    expect(res.body.volumetric.map((v: { basis: string }) => v.basis)).toEqual(['deterministic', 'P90', 'P50', 'P10']);
    expect(res.body.assumptions.join(' ')).toMatch(/representative/);
    expect(res.body.caution).toMatch(/SPE-PRMS/);

    // the case export carries the p/z table of its well
    const xlsx = await t.http
      .get(`/api/assets/${assetId}/reserves-cases/${caseId}/export?format=xlsx`)
      .set('Authorization', await t.tokenFor('viewer'))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(Uint8Array.from(xlsx.body as Buffer).buffer);
    const sheet = wb.getWorksheet('Cross-checks')!;
    const texts: string[] = [];
    sheet.eachRow((row) => texts.push(row.values?.toString() ?? ''));
    expect(texts.join('\n')).toMatch(/p\/z: PC-1/);
    expect(texts.join('\n')).toMatch(/Wells needed/);
  });

  it('decline fit on exact exponential data recovers qi and Di (Arps 1945, b = 0) and the EUR by hand', async () => {
    // q = 1000 exp(-0.5 t[yr]) sampled monthly (t in months, 1 month = 365.25/12 days)
    const points = Array.from({ length: 13 }, (_, m) => ({ t: m, rate: 1000 * Math.exp((-0.5 * m) / 12) }));
    const res = await t.http
      .post(url())
      .set('Authorization', await t.tokenFor('engineer'))
      .send({ kind: 'rate', fluid: 'gas', units: { time: 'month', rate: 'Mscf/d' }, points, label: 'PC-1 monthly gas' });
    expect(res.status).toBe(201);
    const fit = await t.http.get(`${url()}/${res.body.id}/decline-fit?kind=exponential&economicLimit=100`).set('Authorization', await t.tokenFor('viewer'));
    expect(fit.status).toBe(200);
    expect(fit.body.qi).toBeCloseTo(1000, 3);
    expect(fit.body.diNominalPerYear).toBeCloseTo(0.5, 6);
    expect(fit.body.b).toBe(0);
    // effective annual decline of an exponential: 1 - exp(-Di) (Arps 1945)
    expect(fit.body.diEffectivePerYear).toBeCloseTo(1 - Math.exp(-0.5), 6);
    // by hand: remaining from the last point (1 yr, q = 1000 e^-0.5) to 100 Mscf/d = (q_last - 100) / D, D = 0.5/365.25 per day
    const qLast = 1000 * Math.exp(-0.5);
    expect(fit.body.remaining / ((qLast - 100) / (0.5 / 365.25))).toBeCloseTo(1, 5);
    let trapezoid = 0;
    for (let i = 1; i < points.length; i++) trapezoid += 0.5 * (points[i].rate + points[i - 1].rate) * (365.25 / 12);
    expect(fit.body.cumulativeToDate).toBeCloseTo(trapezoid, 6);
    expect(fit.body.eur).toBeCloseTo(trapezoid + fit.body.remaining, 6);
    expect(fit.body.volumeUnit).toBe('Mscf');
    expect(fit.body.notes.join(' ')).toMatch(/nominal .* 365\.25 days/);
  });

  it('harmonic data fitted as harmonic gives b = 1 and Di; bad query fields are 400 naming them', async () => {
    // q = 800 / (1 + D t), D = 1.2 / yr nominal (Arps 1945 harmonic), t in days
    const d = 1.2 / 365.25;
    const points = Array.from({ length: 10 }, (_, i) => ({ t: i * 60, rate: 800 / (1 + d * i * 60) }));
    const res = await t.http.post(url()).set('Authorization', await t.tokenFor('engineer')).send({ kind: 'rate', fluid: 'oil', units: { time: 'day', rate: 'STB/d' }, points });
    const fit = await t.http.get(`${url()}/${res.body.id}/decline-fit?kind=harmonic&economicLimit=10`).set('Authorization', await t.tokenFor('viewer'));
    expect(fit.body.b).toBe(1);
    expect(fit.body.diNominalPerYear).toBeCloseTo(1.2, 5);
    const hyper = await t.http.get(`${url()}/${res.body.id}/decline-fit?kind=hyperbolic&economicLimit=10`).set('Authorization', await t.tokenFor('viewer'));
    expect(hyper.status).toBe(200);
    expect(hyper.body.b).toBeGreaterThan(0.95);
    const noLimit = await t.http.get(`${url()}/${res.body.id}/decline-fit?kind=harmonic`).set('Authorization', await t.tokenFor('viewer'));
    expect(noLimit.status).toBe(400);
    expect(JSON.stringify(noLimit.body.message)).toMatch(/economicLimit/);
    const badKind = await t.http.get(`${url()}/${res.body.id}/decline-fit?kind=linear&economicLimit=5`).set('Authorization', await t.tokenFor('viewer'));
    expect(JSON.stringify(badKind.body.message)).toMatch(/kind must be exponential, hyperbolic or harmonic/);
    const badPoints = await t.http
      .post(url())
      .set('Authorization', await t.tokenFor('engineer'))
      .send({ kind: 'rate', fluid: 'oil', units: { time: 'day', rate: 'STB/d' }, points: [{ t: 0, rate: 5 }, { t: 0, rate: -1 }] });
    expect(badPoints.status).toBe(400);
    expect(badPoints.body.message).toEqual(expect.arrayContaining(['points[1].rate must be a number >= 0', 'points[1].t must increase']));
  });

  it('DELETE removes a series (engineer), 404 after; viewer 403', async () => {
    const [first] = (await t.http.get(url()).set('Authorization', await t.tokenFor('viewer'))).body;
    const made = await t.http.post(url()).set('Authorization', await t.tokenFor('engineer')).send({ kind: 'pressure', fluid: 'gas', units: { cumGas: 'Bcf', pressure: 'kPa' }, points: [{ cumGas: 0, pressure: 20000 }, { cumGas: 1, pressure: 18000 }] });
    expect((await t.http.delete(`${url()}/${made.body.id}`).set('Authorization', await t.tokenFor('viewer'))).status).toBe(403);
    expect((await t.http.delete(`${url()}/${made.body.id}`).set('Authorization', await t.tokenFor('engineer'))).status).toBe(204);
    expect((await t.http.get(`${url()}/${made.body.id}/pz-fit?temperatureF=150&gasGravity=0.65`).set('Authorization', await t.tokenFor('viewer'))).status).toBe(404);
    expect(first).toBeDefined();
  });

  it('POST inflow: radial pseudo-steady-state rate by hand (Craft & Hawkins 1991), Joshi (1988) lateral beats the vertical', async () => {
    const body = { permeabilityMd: 50, netPayFt: 30, viscosityCp: 1.2, fvf: 1.25, drawdownPsi: 500, drainageRadiusFt: 1490, wellboreRadiusFt: 0.328, skin: 2, horizontal: { lengthFt: 2000 } };
    const res = await t.http.post(`/api/assets/${assetId}/inflow`).set('Authorization', await t.tokenFor('viewer')).send(body);
    expect(res.status).toBe(200);
    // q = 0.00708 k h dp / (mu Bo (ln(re/rw) - 0.75 + s)), by hand
    const byHand = (0.00708 * 50 * 30 * 500) / (1.2 * 1.25 * (Math.log(1490 / 0.328) - 0.75 + 2));
    expect(res.body.vertical.rateStbPerDay).toBeCloseTo(byHand, 6);
    expect(res.body.horizontal.productivityRatio).toBeGreaterThan(1);
    expect(res.body.horizontal.equation).toMatch(/Joshi \(1988\)/);
    const bad = await t.http.post(`/api/assets/${assetId}/inflow`).set('Authorization', await t.tokenFor('viewer')).send({ ...body, drainageRadiusFt: 0.1 });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.message)).toMatch(/reFt must be > rwFt/);
    const missing = await t.http.post(`/api/assets/${assetId}/inflow`).set('Authorization', await t.tokenFor('viewer')).send({ ...body, viscosityCp: undefined });
    expect(JSON.stringify(missing.body.message)).toMatch(/viscosityCp must be a number/);
  });

  it('POST inflow/gas: pressure-squared rate by hand with z from DAK at the average pressure; a bottom-hole pressure above the reservoir is 400', async () => {
    const body = { permeabilityMd: 5, netPayFt: 40, viscosityCp: 0.016, reservoirPressurePsia: 2000, bottomholePressurePsia: 1200, temperatureF: 180, gasGravity: 0.65, drainageRadiusFt: 1490, wellboreRadiusFt: 0.328 };
    const res = await t.http.post(`/api/assets/${assetId}/inflow/gas`).set('Authorization', await t.tokenFor('viewer')).send(body);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.averagePressurePsia).toBe(1600);
    const z = res.body.pvt.z;
    expect(z).toBeGreaterThan(0.8);
    expect(z).toBeLessThan(0.95);
    // q = k h (pr^2 - pwf^2) / (1422 T mu z (ln(re/rw) - 0.75)), T = 180 + 459.67 R, by hand
    const byHand = (5 * 40 * (2000 ** 2 - 1200 ** 2)) / (1422 * 639.67 * 0.016 * z * (Math.log(1490 / 0.328) - 0.75));
    expect(res.body.rateMscfPerDay).toBeCloseTo(byHand, 6);
    expect(res.body.absoluteOpenFlowMscfPerDay).toBeGreaterThan(res.body.rateMscfPerDay);
    expect(res.body.equation).toMatch(/1422/);
    const bad = await t.http.post(`/api/assets/${assetId}/inflow/gas`).set('Authorization', await t.tokenFor('viewer')).send({ ...body, bottomholePressurePsia: 2500 });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.message)).toMatch(/bottomholePressurePsia must be <= reservoirPressurePsia/);
    const missing = await t.http.post(`/api/assets/${assetId}/inflow/gas`).set('Authorization', await t.tokenFor('viewer')).send({ ...body, gasGravity: 'x' });
    expect(JSON.stringify(missing.body.message)).toMatch(/gasGravity must be a number/);
  });
});
