import { assetMembers, assets, auditLog, formations, interpretations, organisations, users, wells } from '@poreline/schema';
import bcrypt from 'bcryptjs';
import { and, eq } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { DatabaseService } from '../database/database.module.js';
import { MailService } from '../mail/mail.service.js';
import { VOLUMES_CAUTION } from '../mail/review-notice.js';
import { DEMO_ASSET } from '../seed/demo-users.js';

/** A zone summary in the shape core's summariseZones writes (depths in ft, no survey). */
function zoneSummary(formation: string, netPayFt: number, phi: number, sw: number) {
  const t = (md: number) => ({ md, tvd: null, tvt: null });
  return {
    zone: formation,
    formation,
    top: 5000,
    base: 5100,
    gross: { thickness: t(100), meanPhi: 0.15, meanSw: 0.5, meanVsh: 0.3, phiH: t(15), hcpt: t(7.5) },
    netReservoir: { thickness: t(netPayFt + 5), meanPhi: phi, meanSw: sw, meanVsh: 0.1, phiH: t(phi * netPayFt), hcpt: t(0) },
    netPay: { thickness: t(netPayFt), meanPhi: phi, meanSw: sw, meanVsh: 0.1, phiH: t(phi * netPayFt), hcpt: t(phi * (1 - sw) * netPayFt) },
    netToGross: 0.3,
    payToGross: 0.3,
    sampleCount: 200,
    nullCount: 0,
    nullThickness: 0,
    clamped: { vsh: 0, phit: 0, phie: 0, sw: 0 },
  };
}

// Two wells whose thickness-weighted combination is exactly h = 30 ft, phi = 0.2, Sw = 0.25
// (by hand: h = (20 + 40)/2 = 30; phi = (20*0.15 + 40*0.225)/60 = 12/60 = 0.2;
//  Sw = (3*0.31 + 9*0.23)/(3 + 9) = 3/12 = 0.25, pore thickness phi*h = 3 and 9).
const WELL_A = { netPayFt: 20, phi: 0.15, sw: 0.31 };
const WELL_B = { netPayFt: 40, phi: 0.225, sw: 0.23 };

// Craft, Hawkins & Terry (1991) ch. 3: N = 7758 A h phi (1 - Sw) / Bo, with 7758.37 = 43,560/5.614583
// (NIST SP 811 acre-ft and barrel). By hand for A = 640 acres, h = 30 ft, phi = 0.2, Sw = 0.25, Bo = 1.2:
// 43,560 / 5.614583 = 7758.367..., x 640 x 30 x 0.2 x 0.75 / 1.2 = 18,620,081 STB.
const OOIP_BY_HAND = ((43_560 / 5.614583) * 640 * 30 * 0.2 * 0.75) / 1.2;

describe('reserves cases: sources, overrides, runs, review and export', () => {
  let t: TestApp;
  let assetId: string;
  let formationId: string;
  let wellA: string;
  let wellB: string;
  let outsiderToken: string;
  let caseId: string;
  const base = () => `/api/assets/${assetId}/reserves-cases`;

  async function approve(wellId: string, version: number, values: { netPayFt: number; phi: number; sw: number }) {
    const db = t.app.get(DatabaseService).db;
    const [row] = await db
      .insert(interpretations)
      .values({
        wellId,
        version,
        status: 'approved',
        inputs: { depthUnit: 'ft' },
        summaries: [zoneSummary('Kestrel Sand', values.netPayFt, values.phi, values.sw), zoneSummary('Other Shale', 0, 0.05, 1)],
        reviewedAt: new Date(),
      })
      .returning();
    return row.id;
  }

  beforeAll(async () => {
    t = await createTestApp();
    const db = t.app.get(DatabaseService).db;
    const [asset] = await db.select().from(assets).where(eq(assets.name, DEMO_ASSET.name));
    assetId = asset.id;
    const [f] = await db.insert(formations).values({ assetId, name: 'Kestrel Sand', ordinal: 1, colour: '#c9a227' }).returning();
    formationId = f.id;
    const [a] = await db.insert(wells).values({ assetId, name: 'RC-A' }).returning();
    const [b] = await db.insert(wells).values({ assetId, name: 'RC-B' }).returning();
    wellA = a.id;
    wellB = b.id;
    await approve(wellA, 1, WELL_A);
    await approve(wellB, 1, WELL_B);
    // a draft version 2 of B must not count as a source or make B stale
    await db.insert(interpretations).values({ wellId: wellB, version: 2, status: 'draft', inputs: {}, summaries: [zoneSummary('Kestrel Sand', 99, 0.3, 0.1)] });
    const [org] = await db.insert(organisations).values({ name: 'Elsewhere' }).returning();
    const [other] = await db.insert(assets).values({ organisationId: org.id, name: 'Elsewhere asset' }).returning();
    const [user] = await db
      .insert(users)
      .values({ organisationId: org.id, email: 'out@else.test', name: 'Out', passwordHash: await bcrypt.hash('out-pass-1', 4) })
      .returning();
    await db.insert(assetMembers).values({ assetId: other.id, userId: user.id, role: 'engineer' });
    outsiderToken = `Bearer ${(await t.http.post('/api/auth/login').send({ email: 'out@else.test', password: 'out-pass-1' })).body.token}`;
  });
  afterAll(async () => t.close());

  it('GET candidates lists the newest approved interpretation per well for the formation, with its values', async () => {
    const res = await t.http.get(`${base()}/candidates?formationId=${formationId}`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    const byName = Object.fromEntries(res.body.map((c: { wellName: string }) => [c.wellName, c]));
    expect(byName['RC-A']).toMatchObject({ version: 1, netPay: 20, netPayFt: 20, porosity: 0.15, sw: 0.31, depthUnit: 'ft', thicknessBasis: 'MD' });
    expect(byName['RC-B']).toMatchObject({ version: 1, netPay: 40 });
  });

  it('POST: viewer 403, outsider 404, unknown formation 400 naming formationId, bad input 400 naming the field', async () => {
    const body = { name: 'Kestrel base', formationId, wellIds: [wellA, wellB] };
    expect((await t.http.post(base()).set('Authorization', await t.tokenFor('viewer')).send(body)).status).toBe(403);
    expect((await t.http.post(base()).set('Authorization', await t.tokenFor('reviewer')).send(body)).status).toBe(403);
    expect((await t.http.post(base()).set('Authorization', outsiderToken).send(body)).status).toBe(404);
    const badFormation = await t.http.post(base()).set('Authorization', await t.tokenFor('engineer')).send({ ...body, formationId: wellA });
    expect(badFormation.status).toBe(400);
    expect(JSON.stringify(badFormation.body.message)).toMatch(/formationId/);
    const badArea = await t.http.post(base()).set('Authorization', await t.tokenFor('engineer')).send({ ...body, inputs: { area: -5 } });
    expect(badArea.status).toBe(400);
    expect(JSON.stringify(badArea.body.message)).toMatch(/inputs\.area: area must be > 0/);
    const noReason = await t.http
      .post(base())
      .set('Authorization', await t.tokenFor('engineer'))
      .send({ ...body, inputs: { overrides: { porosity: { value: 0.2, reason: '  ' } } } });
    expect(noReason.status).toBe(400);
    expect(JSON.stringify(noReason.body.message)).toMatch(/inputs\.overrides\.porosity\.reason/);
  });

  it('POST creates a draft that pulls each well’s values and combines them by thickness (by-hand values)', async () => {
    const res = await t.http
      .post(base())
      .set('Authorization', await t.tokenFor('engineer'))
      .send({ name: 'Kestrel base', formationId, wellIds: [wellA, wellB], seed: 20261202, inputs: { weighting: 'thickness', area: 640, bo: 1.2, recoveryFactor: 0.3 } });
    expect(res.status).toBe(201);
    caseId = res.body.id;
    expect(res.body).toMatchObject({ status: 'draft', revision: 1, seed: 20261202, formationName: 'Kestrel Sand', staleSources: 0, resultsCurrent: false });
    expect(res.body.sources.map((s: { wellName: string; version: number }) => [s.wellName, s.version])).toEqual([
      ['RC-A', 1],
      ['RC-B', 1],
    ]);
    expect(res.body.combined.computed.netPay).toBeCloseTo(30, 10);
    expect(res.body.combined.computed.porosity).toBeCloseTo(0.2, 12);
    expect(res.body.combined.computed.sw).toBeCloseTo(0.25, 12);
    expect(res.body.caution).toMatch(/SPE-PRMS/);
    expect(res.body.conventions.join(' ')).toMatch(/14\.696 psia and 60 F/);
  });

  it('arithmetic weighting gives plain means (by hand: phi = 0.1875, Sw = 0.27)', async () => {
    const res = await t.http.patch(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { weighting: 'arithmetic' } });
    expect(res.status).toBe(200);
    expect(res.body.combined.computed.porosity).toBeCloseTo((0.15 + 0.225) / 2, 12);
    expect(res.body.combined.computed.sw).toBeCloseTo((0.31 + 0.23) / 2, 12);
    expect(res.body.revision).toBe(2);
    const back = await t.http.patch(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { weighting: 'thickness' }, expectedRevision: 2 });
    expect(back.status).toBe(200);
    const stale = await t.http.patch(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('engineer')).send({ name: 'x', expectedRevision: 1 });
    expect(stale.status).toBe(409);
  });

  it('area weighting needs a drainage area per well and weights by it (by hand: A 80/160 acres)', async () => {
    const missing = await t.http.patch(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { weighting: 'area' } });
    expect(missing.body.combinedError).toMatch(/drainage area for RC-A, RC-B/);
    const res = await t.http
      .patch(`${base()}/${caseId}`)
      .set('Authorization', await t.tokenFor('engineer'))
      .send({ inputs: { drainageAreas: { [wellA]: 80, [wellB]: 160 } } });
    // h = (80*20 + 160*40)/240 = 33.333; phi = (1600*0.15 + 6400*0.225)/8000 = 0.21
    expect(res.body.combined.computed.netPay).toBeCloseTo(8000 / 240, 10);
    expect(res.body.combined.computed.porosity).toBeCloseTo(0.21, 12);
    expect(res.body.combined.computed.totalDrainageArea).toBeCloseTo(240, 10);
    await t.http.patch(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { weighting: 'thickness' } });
  });

  it('a per-well override with a reason replaces the value, is stamped with who and why, and is audited', async () => {
    const res = await t.http
      .patch(`${base()}/${caseId}`)
      .set('Authorization', await t.tokenFor('engineer'))
      .send({ inputs: { wellOverrides: { [wellA]: { sw: { value: 0.35, reason: 'core Sw from the 2025 plug set' } } } } });
    expect(res.status).toBe(200);
    const o = res.body.inputs.wellOverrides[wellA].sw;
    expect(o).toMatchObject({ value: 0.35, reason: 'core Sw from the 2025 plug set', byName: 'Eli Engineer' });
    expect(res.body.combined.wells.find((w: { wellId: string }) => w.wellId === wellA).overridden).toEqual(['sw']);
    // by hand: Sw = (3*0.35 + 9*0.23)/12 = 0.26
    expect(res.body.combined.computed.sw).toBeCloseTo(0.26, 12);
    const db = t.app.get(DatabaseService).db;
    const entries = await db.select().from(auditLog).where(and(eq(auditLog.entity, 'reserves-case'), eq(auditLog.entityId, caseId)));
    const last = entries.filter((e) => e.action === 'update').at(-1)!;
    expect(JSON.stringify(last.after)).toMatch(/core Sw from the 2025 plug set/);
    expect(JSON.stringify(last.before)).not.toMatch(/core Sw from the 2025 plug set/);
    // remove it again
    await t.http.patch(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { wellOverrides: {} } });
  });

  it('POST run: deterministic OOIP matches Craft & Hawkins by hand, metric = STB x 0.158987294928', async () => {
    const res = await t.http.post(`${base()}/${caseId}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(res.status).toBe(200);
    const d = res.body.results.deterministic;
    expect(Math.abs(d.inPlace.field - OOIP_BY_HAND) / OOIP_BY_HAND).toBeLessThan(1e-9);
    expect(d.inPlace.m3).toBeCloseTo(OOIP_BY_HAND * 0.158987294928, 0);
    expect(d.recoverable.field).toBeCloseTo(OOIP_BY_HAND * 0.3, 2);
    expect(res.body.resultsCurrent).toBe(true);
  });

  it('Monte Carlo with distributions: P90 < P50 < P10, 100,000 trials, same seed same numbers', async () => {
    const distributions = {
      area: { kind: 'triangular', min: 480, mode: 640, max: 900 },
      // truncated to the physical range [0, 1]: bounds 10 and 40 sd out (core keeps quantiles inside them)
      porosity: { kind: 'normal', mean: 0.2, sd: 0.02, truncate: { min: 0, max: 1 } },
      sw: { kind: 'uniform', min: 0.2, max: 0.32 },
      recoveryFactor: { kind: 'lognormal', p90: 0.2, p10: 0.4, truncate: { max: 0.6 } },
    };
    const patched = await t.http.patch(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { distributions, trials: 100_000 } });
    expect(patched.status).toBe(200);
    const run1 = await t.http.post(`${base()}/${caseId}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(run1.status, JSON.stringify(run1.body.message)).toBe(200);
    const r = run1.body.results.probabilistic.recoverable;
    expect(r.count).toBe(100_000);
    expect(r.p90).toBeLessThan(r.p50);
    expect(r.p50).toBeLessThan(r.p10);
    // lognormal given by P90/P10 is shown in both forms: its P90/P10 come back (exact inversion)
    const ln = run1.body.results.probabilistic.lognormals.recoveryFactor;
    expect(ln.p90).toBeCloseTo(0.2, 10);
    expect(ln.p10).toBeCloseTo(0.4, 10);
    expect(ln.mean).toBeGreaterThan(0);
    expect(run1.body.results.probabilistic.recoverable.histogram.counts.reduce((a: number, b: number) => a + b, 0)).toBe(100_000);
    expect(run1.body.results.probabilistic.recoverable.tornado.rows[0].swing).toBeGreaterThan(0);
    const run2 = await t.http.post(`${base()}/${caseId}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(run2.body.results.probabilistic.recoverable.p50).toBe(r.p50);
    expect(run2.body.results.probabilistic.inPlace.mean).toBe(run1.body.results.probabilistic.inPlace.mean);
  });

  it('rank correlations: kept with the inputs, drawn on run (sampled value reported, stated in the conventions), refused naming the entry', async () => {
    const copy = await t.http.post(`${base()}/${caseId}/copy`).set('Authorization', await t.tokenFor('engineer'));
    const url = `${base()}/${copy.body.id}`;
    const bad = await t.http.patch(url).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { correlations: [{ a: 'sw', b: 'sw', rank: 0.3 }, { a: 'porosity', b: 'sw', rank: 1.2 }] } });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(expect.arrayContaining(['inputs.correlations.0: a and b must be two different inputs', 'inputs.correlations.1.rank: rank must be in [-0.99, 0.99]']));
    const ok = await t.http.patch(url).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { correlations: [{ a: 'porosity', b: 'sw', rank: -0.6 }], trials: 50_000 } });
    expect(ok.status).toBe(200);
    expect(ok.body.inputs.correlations).toEqual([{ a: 'porosity', b: 'sw', rank: -0.6 }]);
    const run = await t.http.post(`${url}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(run.status, JSON.stringify(run.body.message)).toBe(200);
    const [c] = run.body.results.probabilistic.correlations;
    expect(c).toMatchObject({ a: 'porosity', b: 'sw', rank: -0.6 });
    // sampling error of a Spearman correlation at n = 50,000: about (1 - rho^2) / sqrt(n) = 0.003 (common practice)
    expect(Math.abs(c.sampled + 0.6)).toBeLessThan(0.015);
    expect(run.body.results.conventions.join(' ')).toMatch(/Porosity \(fraction\) with Sw \(fraction\): -0.6.*Kruskal 1958/);
    // a correlation with an input that has no distribution is refused on run, naming it
    await t.http.patch(url).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { correlations: [{ a: 'bo', b: 'sw', rank: 0.2 }] } }).expect(200);
    const refused = await t.http.post(`${url}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(refused.status).toBe(400);
    expect(JSON.stringify(refused.body.message)).toMatch(/correlations\[0\]\.a: bo is fixed; give it a distribution/);
  });

  it('an unbounded normal porosity is refused on run with a message naming the input', async () => {
    const copy = await t.http.post(`${base()}/${caseId}/copy`).set('Authorization', await t.tokenFor('engineer'));
    expect(copy.status).toBe(201);
    await t.http
      .patch(`${base()}/${copy.body.id}`)
      .set('Authorization', await t.tokenFor('engineer'))
      .send({ inputs: { distributions: { porosity: { kind: 'normal', mean: 0.2, sd: 0.05 } } } });
    const res = await t.http.post(`${base()}/${copy.body.id}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/distributions\.porosity/);
    const missing = await t.http.patch(`${base()}/${copy.body.id}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { distributions: {}, bo: null } });
    expect(missing.status).toBe(200);
    const run = await t.http.post(`${base()}/${copy.body.id}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(run.status).toBe(400);
    expect(JSON.stringify(run.body.message)).toMatch(/inputs\.bo is required/);
  });

  it('a gas case computes Bg from p, T and gravity (DAK or Hall-Yarborough) and states standard conditions', async () => {
    const res = await t.http
      .post(base())
      .set('Authorization', await t.tokenFor('engineer'))
      .send({
        name: 'Kestrel gas',
        formationId,
        wellIds: [wellA, wellB],
        seed: 7,
        inputs: { fluid: 'gas', area: 640, recoveryFactor: 0.8, trials: 1000, gas: { pressurePsia: 2000, temperatureF: 150, gasGravity: 0.65, zMethod: 'hall-yarborough' } },
      });
    expect(res.status).toBe(201);
    const run = await t.http.post(`${base()}/${res.body.id}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect(run.status).toBe(200);
    const d = run.body.results.deterministic;
    expect(d.pvt.zMethod).toBe('hall-yarborough');
    // Bg = (14.696/519.67) z (150 + 459.67)/2000 rcf/scf (Craft & Hawkins 1991, real-gas law), by hand from z
    expect(d.fvf).toBeCloseTo((14.696 / 519.67) * d.pvt.z * (609.67 / 2000), 12);
    // G = 43,560 A h phi (1 - Sw) / Bg (Craft & Hawkins 1991), by hand
    expect(d.inPlace.field / ((43_560 * 640 * 30 * 0.2 * 0.75) / d.fvf)).toBeCloseTo(1, 9);
    expect(d.inPlace.fieldUnit).toBe('scf');
  });

  it('workflow: submit needs a current run; submitted and approved cases are immutable (409); roles are enforced', async () => {
    const url = `${base()}/${caseId}`;
    await t.http.patch(url).set('Authorization', await t.tokenFor('engineer')).send({ name: 'Kestrel base case' });
    expect((await t.http.post(`${url}/submit`).set('Authorization', await t.tokenFor('engineer'))).status).toBe(409);
    await t.http.post(`${url}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect((await t.http.post(`${url}/submit`).set('Authorization', await t.tokenFor('viewer'))).status).toBe(403);
    const submitted = await t.http.post(`${url}/submit`).set('Authorization', await t.tokenFor('engineer'));
    expect(submitted.status).toBe(200);
    expect(submitted.body.status).toBe('submitted');
    expect((await t.http.patch(url).set('Authorization', await t.tokenFor('engineer')).send({ name: 'y' })).status).toBe(409);
    expect((await t.http.post(`${url}/approve`).set('Authorization', await t.tokenFor('engineer'))).status).toBe(403);
    const blank = await t.http.post(`${url}/return`).set('Authorization', await t.tokenFor('reviewer')).send({ comment: ' ' });
    expect(blank.status).toBe(400);
    const returned = await t.http.post(`${url}/return`).set('Authorization', await t.tokenFor('reviewer')).send({ comment: 'Explain the RF range.' });
    expect(returned.body).toMatchObject({ status: 'returned', reviewComment: 'Explain the RF range.' });
    await t.http.post(`${url}/submit`).set('Authorization', await t.tokenFor('engineer'));
    const approved = await t.http.post(`${url}/approve`).set('Authorization', await t.tokenFor('reviewer')).send({ comment: 'OK' });
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({ status: 'approved', reviewedBy: { name: 'Rui Reviewer' } });
    expect((await t.http.patch(url).set('Authorization', await t.tokenFor('admin')).send({ name: 'z' })).status).toBe(409);
    expect((await t.http.post(`${url}/run`).set('Authorization', await t.tokenFor('engineer'))).status).toBe(409);
    const trail = await t.http.get(`${url}/audit`).set('Authorization', await t.tokenFor('viewer'));
    expect(trail.body.map((e: { action: string }) => e.action)).toEqual(expect.arrayContaining(['create', 'update', 'run', 'submit', 'return', 'approve']));
    // E-mail notices: each submission to the reviewer, the return and the approval to the engineer, caution included.
    await t.app.get(MailService).settled();
    const mail = await t.http.get('/api/admin/mail').set('Authorization', await t.tokenFor('admin'));
    const notices = (mail.body.messages as { id: string; event: string; to: string; status: string }[]).filter((m) => m.event.startsWith('reserves-case.'));
    expect(notices.map((m) => `${m.event} -> ${m.to} (${m.status})`).sort()).toEqual([
      'reserves-case.approved -> Eli Engineer <engineer@poreline.demo> (sent)',
      'reserves-case.returned -> Eli Engineer <engineer@poreline.demo> (sent)',
      'reserves-case.submitted -> Rui Reviewer <reviewer@poreline.demo> (sent)',
      'reserves-case.submitted -> Rui Reviewer <reviewer@poreline.demo> (sent)',
    ]);
    const returnedNotice = await t.http.get(`/api/admin/mail/${notices.find((m) => m.event === 'reserves-case.returned')!.id}`).set('Authorization', await t.tokenFor('admin'));
    expect(returnedNotice.body.body).toContain('Explain the RF range.');
    expect(returnedNotice.body.body).toContain('Kestrel base case');
    expect(returnedNotice.body.body).toContain(VOLUMES_CAUTION);
  });

  it('a newer approved interpretation makes the source stale; refresh moves a copy to it', async () => {
    await approve(wellA, 2, { netPayFt: 26, phi: 0.16, sw: 0.3 });
    const got = await t.http.get(`${base()}/${caseId}`).set('Authorization', await t.tokenFor('viewer'));
    expect(got.body.staleSources).toBe(1);
    expect(got.body.sources.find((s: { wellId: string }) => s.wellId === wellA)).toMatchObject({ version: 1, latestApprovedVersion: 2, stale: true });
    expect((await t.http.post(`${base()}/${caseId}/refresh-sources`).set('Authorization', await t.tokenFor('engineer')).send({})).status).toBe(409);
    const copy = await t.http.post(`${base()}/${caseId}/copy`).set('Authorization', await t.tokenFor('engineer'));
    await t.http.post(`${base()}/${copy.body.id}/run`).set('Authorization', await t.tokenFor('engineer'));
    expect((await t.http.post(`${base()}/${copy.body.id}/submit`).set('Authorization', await t.tokenFor('engineer'))).status).toBe(409);
    const refreshed = await t.http.post(`${base()}/${copy.body.id}/refresh-sources`).set('Authorization', await t.tokenFor('engineer')).send({});
    expect(refreshed.status).toBe(200);
    expect(refreshed.body.staleSources).toBe(0);
    expect(refreshed.body.sources.find((s: { wellId: string }) => s.wellId === wellA)).toMatchObject({ version: 2, netPay: 26 });
    expect(refreshed.body.resultsCurrent).toBe(false);
    const list = await t.http.get(base()).set('Authorization', await t.tokenFor('viewer'));
    expect(list.body.find((c: { id: string }) => c.id === caseId)).toMatchObject({ status: 'approved', staleSources: 1 });
  });

  it('GET export?format=xlsx: any member (viewer) gets a workbook with the caution, inputs with provenance and percentiles', async () => {
    const res = await t.http
      .get(`${base()}/${caseId}/export?format=xlsx`)
      .set('Authorization', await t.tokenFor('viewer'))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/spreadsheetml/);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(Uint8Array.from(res.body as Buffer).buffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(expect.arrayContaining(['Summary', 'Sources', 'Inputs', 'Deterministic', 'Probabilistic', 'Tornado', 'Cross-checks', 'Audit']));
    const summary = wb.getWorksheet('Summary')!;
    expect(String(summary.getRow(2).getCell(2).value)).toMatch(/SPE-PRMS/);
    const sources = wb.getWorksheet('Sources')!;
    expect(sources.getRow(2).getCell(1).value).toBe('RC-A');
    const inputsSheet = wb.getWorksheet('Inputs')!;
    const cells: string[] = [];
    inputsSheet.eachRow((row) => row.eachCell((cell) => cells.push(String(cell.value))));
    expect(cells).toContain('Rank correlations between inputs (Spearman; none = drawn independently)');
    expect(cells).toContain('(none)');
    const prob = wb.getWorksheet('Probabilistic')!;
    const p90 = prob.getRow(3);
    expect(p90.getCell(1).value).toBe('P90');
    expect(Number(p90.getCell(4).value)).toBeLessThan(Number(prob.getRow(5).getCell(4).value));
    expect((await t.http.get(`${base()}/${caseId}/export?format=pdf`).set('Authorization', await t.tokenFor('viewer'))).status).toBe(400);
  });

  it('changing the area or length unit converts the stored values it does not replace (640 acres = 1 square mile)', async () => {
    const made = await t.http
      .post(base())
      .set('Authorization', await t.tokenFor('engineer'))
      .send({
        name: 'Units',
        formationId,
        wellIds: [wellA],
        inputs: { area: 640, drainageAreas: { [wellA]: 64 }, overrides: { netPay: { value: 100, reason: 'log shows a thicker pay' } }, distributions: { area: { kind: 'uniform', min: 320, max: 960 } } },
      });
    const res = await t.http.patch(`${base()}/${made.body.id}`).set('Authorization', await t.tokenFor('engineer')).send({ inputs: { areaUnit: 'km2', lengthUnit: 'm' } });
    expect(res.status).toBe(200);
    // 1 square mile = 640 acres = 1609.344^2 m2 = 2.589988110336 km2 (international mile, NIST SP 811)
    expect(res.body.inputs.area).toBeCloseTo(2.589988110336, 10);
    expect(res.body.inputs.drainageAreas[wellA]).toBeCloseTo(0.2589988110336, 10);
    expect(res.body.inputs.distributions.area.max).toBeCloseTo(2.589988110336 * 1.5, 10);
    expect(res.body.inputs.overrides.netPay.value).toBeCloseTo(30.48, 10);
    expect(res.body.inputs.overrides.netPay.reason).toBe('log shows a thicker pay');
  });

  it('a case of another asset, or a malformed id, is 404', async () => {
    expect((await t.http.get(`${base()}/${caseId}`).set('Authorization', outsiderToken)).status).toBe(404);
    expect((await t.http.get(`${base()}/not-a-case`).set('Authorization', await t.tokenFor('viewer'))).status).toBe(404);
  });
});
