import { decodeCurveBundle, evaluateWell, type WellCurves, type ZoneSummary } from '@poreline/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, demoAssetId, setUpKiteWell } from '../../test/workbench-fixtures.js';

const binary = (res: import('supertest').Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('workbench and interpretations API (real PGlite)', () => {
  let t: TestApp;
  let assetId: string;
  let well: Awaited<ReturnType<typeof setUpKiteWell>>;
  let base: string;
  let petro: string;
  let reviewer: string;
  let v1: string;
  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    petro = await t.tokenFor('petrophysicist');
    reviewer = await t.tokenFor('reviewer');
    well = await setUpKiteWell(t, assetId, 'KITE-1');
    base = `/api/assets/${assetId}/wells/${well.wellId}`;
  });
  afterAll(async () => t.close());

  it('GET workbench gives the zones to evaluate (with parameters), cutoffs by formation, bindings and the merged index', async () => {
    const res = await t.http.get(`${base}/workbench`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.depthUnit).toBe('ft');
    expect(res.body.zones.map((z: { name: string; top: number; base: number; isDefault: boolean }) => [z.name, z.top, z.base, z.isDefault])).toEqual([
      ['Kite Sand', 5000, 5100, false],
      ['Lark Shale', 5100, 5300, true],
    ]);
    expect(res.body.cutoffs['Kite Sand']).toEqual({ vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: null });
    expect(res.body.bindings.map((b: { binding: string; mnemonic: string }) => `${b.binding}=${b.mnemonic}`)).toEqual(['gr=GR', 'rhob=RHOB', 'rt=ILD']);
    expect(res.body.merged).toEqual({ start: 4900, stop: 5300, step: 0.5, samples: 801 });
    expect(res.body.survey).toBeNull();
    expect(res.body.latest).toBeNull();
    expect(res.body.conventions.length).toBeGreaterThan(5);
  });

  it('GET merged-samples is a curve bundle: DEPT, then each binding in canonical units with its source; the 1 ft run is held over its half step', async () => {
    const res = await t.http.get(`${base}/merged-samples`).set('Authorization', await t.tokenFor('viewer')).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/octet-stream');
    const bundle = decodeCurveBundle(new Uint8Array(res.body as Buffer));
    expect(bundle.entries.map((e) => `${e.mnemonic}:${e.unit}`)).toEqual(['DEPT:ft', 'GR:gAPI', 'RHOB:g/cm3', 'RT:ohm.m']);
    expect(bundle.entries[3].source).toEqual({ logRunId: well.runB, fileName: 'KITE-1-b.las', mnemonic: 'ILD', unit: 'OHMM' });
    const depth = bundle.values[0];
    const at = (d: number) => depth.indexOf(d);
    expect(bundle.values[3][at(5049.5)]).toBe(20); // tie between 5049 and 5050 ft: the shallower sample
    expect(bundle.values[3][at(5050)]).toBe(0.5);
    expect(bundle.values[3][at(4949)]).toBeNaN(); // 1 ft above run B's first sample
  });

  it('POST (Save) evaluates with core and stores version 1 as a draft; Kite Sand matches the hand calculation', async () => {
    const res = await t.http.post(`${base}/interpretations`).set('Authorization', petro);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    v1 = res.body.id;
    expect(res.body).toMatchObject({ version: 1, status: 'draft', createdBy: { name: 'Pia Petro' } });
    const kite = (res.body.summaries as ZoneSummary[]).find((s) => s.zone === 'Kite Sand')!;
    // By hand: density porosity (2.65 - 2.30)/(2.65 - 1.00) = 0.212121 (Asquith & Krygowski 2004, eq. for phiD;
    // sandstone matrix 2.65 g/cm3). GR 30 = grClean -> Vsh 0, PHIE = PHIT. Archie (1942), a = 1, m = n = 2,
    // Rw = 0.05 at the formation temperature: Sw = sqrt(0.05 / (0.212121^2 * 20)) = 0.235702 above 5050 ft
    // (pay), and sqrt(0.05 / (0.212121^2 * 0.5)) > 1 -> 1 below (not pay). Samples every 0.5 ft each stand for
    // +-0.25 ft clipped at the zone top, so net pay = 5049.75 - 5000 = 49.75 ft. Net reservoir: the sample at
    // 5100 ft is computed with Lark Shale's values (its centre lies there: RHOB 2.55 -> phi 0.0606 < 0.08), so
    // the last 0.25 ft of the zone is not reservoir: 100 - 0.25 = 99.75 ft.
    expect(kite.gross.thickness.md).toBeCloseTo(100, 9);
    expect(kite.netReservoir.thickness.md).toBeCloseTo(99.75, 9);
    expect(kite.netPay.thickness.md).toBeCloseTo(49.75, 9);
    expect(kite.netPay.meanPhi!).toBeCloseTo(0.35 / 1.65, 9);
    expect(kite.netPay.meanSw!).toBeCloseTo(Math.sqrt(0.05 / ((0.35 / 1.65) ** 2 * 20)), 9);
    expect(res.body.inputs.logRuns.map((r: { sha256: string }) => r.sha256)).toHaveLength(2);
    expect(res.body.inputs.cutoffs).toEqual({ 'Kite Sand': { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: null }, 'Lark Shale': { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: null } });
  });

  it('the stored summaries equal what the browser computes with core from GET workbench and merged-samples', async () => {
    const wb = (await t.http.get(`${base}/workbench`).set('Authorization', petro)).body;
    const bundle = decodeCurveBundle(new Uint8Array((await t.http.get(`${base}/merged-samples`).set('Authorization', petro).buffer(true).parse(binary)).body as Buffer));
    const curves: WellCurves = {};
    bundle.entries.slice(1).forEach((e, i) => ((curves as Record<string, Float64Array>)[String(e.binding)] = bundle.values[i + 1]));
    const local = evaluateWell({ depth: bundle.values[0], depthUnit: wb.depthUnit, curves, zones: wb.zones, cutoffs: wb.cutoffs, survey: wb.survey?.stations });
    expect(JSON.parse(JSON.stringify(local.zones))).toEqual(wb.latest.summaries);
    expect(wb.latest.id).toBe(v1);
  });

  it('Save again on a draft updates the same version; the list is newest first', async () => {
    const res = await t.http.post(`${base}/interpretations`).set('Authorization', petro);
    expect(res.body).toMatchObject({ id: v1, version: 1, status: 'draft' });
    const list = await t.http.get(`${base}/interpretations`).set('Authorization', await t.tokenFor('engineer'));
    expect(list.body.map((v: { version: number }) => v.version)).toEqual([1]);
  });

  it('review: reviewer cannot submit (403); petrophysicist submits; then Save and PUT are 409 (waiting for review)', async () => {
    expect((await t.http.post(`${base}/interpretations/${v1}/submit`).set('Authorization', reviewer)).status).toBe(403);
    const submitted = await t.http.post(`${base}/interpretations/${v1}/submit`).set('Authorization', petro);
    expect(submitted.status).toBe(200);
    expect(submitted.body).toMatchObject({ status: 'submitted', submittedBy: { name: 'Pia Petro' } });
    expect((await t.http.post(`${base}/interpretations/${v1}/submit`).set('Authorization', petro)).status).toBe(409);
    const save = await t.http.post(`${base}/interpretations`).set('Authorization', petro);
    expect(save.status).toBe(409);
    expect(save.body.message).toMatch(/waiting for review/);
    expect((await t.http.put(`${base}/interpretations/${v1}`).set('Authorization', petro)).status).toBe(409);
  });

  it('review: petrophysicist cannot approve (403); return needs a comment (400); reviewer returns; Save makes it a draft again', async () => {
    expect((await t.http.post(`${base}/interpretations/${v1}/approve`).set('Authorization', petro).send({})).status).toBe(403);
    const noComment = await t.http.post(`${base}/interpretations/${v1}/return`).set('Authorization', reviewer).send({ comment: '  ' });
    expect(noComment.status).toBe(400);
    expect(JSON.stringify(noComment.body.message)).toContain('comment must say what to change');
    const returned = await t.http.post(`${base}/interpretations/${v1}/return`).set('Authorization', reviewer).send({ comment: 'Check Rw against the water sample.' });
    expect(returned.body).toMatchObject({ status: 'returned', reviewComment: 'Check Rw against the water sample.', reviewedBy: { name: 'Rui Reviewer' } });
    const saved = await t.http.put(`${base}/interpretations/${v1}`).set('Authorization', petro);
    expect(saved.body).toMatchObject({ id: v1, version: 1, status: 'draft' });
  });

  it('approve: the submitter may not approve their own version (403); a reviewer approves; approved is immutable (409) and Save starts version 2', async () => {
    const admin = await t.tokenFor('admin');
    await t.http.post(`${base}/interpretations/${v1}/submit`).set('Authorization', admin).expect(200);
    const own = await t.http.post(`${base}/interpretations/${v1}/approve`).set('Authorization', admin).send({});
    expect(own.status).toBe(403);
    const approved = await t.http.post(`${base}/interpretations/${v1}/approve`).set('Authorization', reviewer).send({ comment: 'Agreed.' });
    expect(approved.body).toMatchObject({ status: 'approved', reviewComment: 'Agreed.' });
    const put = await t.http.put(`${base}/interpretations/${v1}`).set('Authorization', petro);
    expect(put.status).toBe(409);
    expect(put.body.message).toMatch(/approved and immutable/);
    expect((await t.http.post(`${base}/interpretations/${v1}/return`).set('Authorization', reviewer).send({ comment: 'x' })).status).toBe(409);
    const v2 = await t.http.post(`${base}/interpretations`).set('Authorization', petro);
    expect(v2.status).toBe(201);
    expect(v2.body).toMatchObject({ version: 2, status: 'draft' });
    const list = await t.http.get(`${base}/interpretations`).set('Authorization', petro);
    expect(list.body.map((v: { version: number; status: string }) => `${v.version}:${v.status}`)).toEqual(['2:draft', '1:approved']);
    expect((await t.http.put(`${base}/interpretations/${v1}`).set('Authorization', petro)).status).toBe(409);
  });

  it('PUT cutoffs recomputes the draft of every well with the formation and leaves approved versions alone', async () => {
    const other = await setUpKiteWell(t, assetId, 'KITE-2');
    const otherBase = `/api/assets/${assetId}/wells/${other.wellId}`;
    const o1 = (await t.http.post(`${otherBase}/interpretations`).set('Authorization', petro)).body.id;
    await t.http.post(`${otherBase}/interpretations/${o1}/submit`).set('Authorization', petro).expect(200);
    await t.http.post(`${otherBase}/interpretations/${o1}/approve`).set('Authorization', reviewer).send({}).expect(200);
    // Sw above 5050 ft is 0.2357 (see the Save test): a 0.2 Sw cutoff removes all Kite Sand pay.
    const res = await t.http.put(`/api/assets/${assetId}/formations/${well.kite.id}/cutoffs`).set('Authorization', petro).send({ vshMax: 0.4, phiMin: 0.08, swMax: 0.2 });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.formation.cutoffs.swMax).toBe(0.2);
    const byWell = Object.fromEntries(res.body.recomputed.map((r: { wellName: string }) => [r.wellName, r]));
    expect(byWell['KITE-1']).toMatchObject({ version: 2, status: 'draft', recomputed: true, changed: true, netPayAfter: 0 });
    expect(byWell['KITE-1'].netPayBefore).toBeCloseTo(49.75, 9);
    expect(byWell['KITE-2']).toMatchObject({ version: 1, status: 'approved', recomputed: false, changed: false });
    const v1Row = (await t.http.get(`${base}/interpretations/${v1}`).set('Authorization', petro)).body;
    expect(v1Row.summaries.find((s: ZoneSummary) => s.zone === 'Kite Sand').netPay.thickness.md).toBeCloseTo(49.75, 9);
    const audit = await t.http.get(`/api/assets/${assetId}/audit?limit=5`).set('Authorization', reviewer);
    expect(audit.body.map((e: { action: string; entity: string }) => `${e.action} ${e.entity}`)).toEqual(expect.arrayContaining(['update formation_cutoffs', 'recompute interpretation']));
  });

  it('Save with invalid zone methods is 400 naming the zone and the curve; nothing is stored', async () => {
    const wb = (await t.http.get(`${base}/workbench`).set('Authorization', petro)).body;
    const kite = wb.zones.find((z: { name: string }) => z.name === 'Kite Sand');
    await t.http.put(`${base}/zones/${well.kite.id}/parameters`).set('Authorization', petro).send({ params: { ...kite.params, porosityMethod: 'sonic_wyllie' } }).expect(200);
    const res = await t.http.post(`${base}/interpretations`).set('Authorization', petro);
    expect(res.status).toBe(400);
    expect(res.body.message).toContain("zone 'Kite Sand': curves.dt is required by this zone's methods");
    await t.http.put(`${base}/zones/${well.kite.id}/parameters`).set('Authorization', petro).send({ params: kite.params }).expect(200);
  });

  it('with a deviation survey the summaries carry TVD thickness; the browser computes the same from the workbench stations', async () => {
    const dev = await setUpKiteWell(t, assetId, 'KITE-DEV');
    const devBase = `/api/assets/${assetId}/wells/${dev.wellId}`;
    // a straight hole inclined 30 degrees from the surface: TVD = MD cos(30 deg) (geometry, by hand)
    await t.http.post(`${devBase}/survey`).set('Authorization', petro).attach('file', Buffer.from('md,inclination,azimuth\n0,30,90\n6000,30,90\n'), 'dev.csv').expect(201);
    const saved = await t.http.post(`${devBase}/interpretations`).set('Authorization', petro);
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    const kite = (saved.body.summaries as ZoneSummary[]).find((s) => s.zone === 'Kite Sand')!;
    expect(kite.gross.thickness.tvd!).toBeCloseTo(100 * Math.cos(Math.PI / 6), 6);
    expect(kite.netReservoir.thickness.tvd!).toBeCloseTo(99.75 * Math.cos(Math.PI / 6), 6); // net pay is 0 here: Kite Sand's Sw cutoff is 0.2 since the cutoffs test
    const wb = (await t.http.get(`${devBase}/workbench`).set('Authorization', petro)).body;
    expect(wb.survey.stations).toEqual([{ md: 0, inc: 30, azi: 90 }, { md: 6000, inc: 30, azi: 90 }]);
    const bundle = decodeCurveBundle(new Uint8Array((await t.http.get(`${devBase}/merged-samples`).set('Authorization', petro).buffer(true).parse(binary)).body as Buffer));
    const curves: WellCurves = {};
    bundle.entries.slice(1).forEach((e, i) => ((curves as Record<string, Float64Array>)[String(e.binding)] = bundle.values[i + 1]));
    const local = evaluateWell({ depth: bundle.values[0], depthUnit: wb.depthUnit, curves, zones: wb.zones, cutoffs: wb.cutoffs, survey: wb.survey.stations });
    expect(JSON.parse(JSON.stringify(local.zones))).toEqual(saved.body.summaries);
  });

  it('audit log: 403 for petrophysicist, engineer and viewer; reviewers and admins see who changed what', async () => {
    for (const role of ['petrophysicist', 'engineer', 'viewer'] as const) {
      expect((await t.http.get(`/api/assets/${assetId}/audit`).set('Authorization', await t.tokenFor(role))).status).toBe(403);
    }
    const res = await t.http.get(`/api/assets/${assetId}/audit?entity=interpretation`).set('Authorization', await t.tokenFor('admin'));
    expect(res.body.map((e: { action: string }) => e.action)).toEqual(expect.arrayContaining(['create', 'save', 'submit', 'return', 'approve']));
    const approve = res.body.find((e: { action: string }) => e.action === 'approve');
    expect(approve).toMatchObject({ user: { name: 'Rui Reviewer', email: 'reviewer@poreline.demo' }, before: { status: 'submitted' }, after: { status: 'approved' } });
    expect((await t.http.get(`/api/assets/${assetId}/audit?limit=0`).set('Authorization', reviewer)).status).toBe(400);
  });

  it('a member of another asset gets 404 for the workbench, the versions and the review steps', async () => {
    const outsider = await createOutsider(t);
    expect((await t.http.get(`${base}/workbench`).set('Authorization', outsider.token)).status).toBe(404);
    expect((await t.http.get(`${base}/interpretations/${v1}`).set('Authorization', outsider.token)).status).toBe(404);
    expect((await t.http.get(`/api/assets/${outsider.assetId}/wells/${outsider.wellId}/interpretations/${v1}`).set('Authorization', outsider.token)).status).toBe(404);
    expect((await t.http.post(`/api/assets/${outsider.assetId}/wells/${well.wellId}/interpretations`).set('Authorization', outsider.token)).status).toBe(404);
    const empty = await t.http.post(`/api/assets/${outsider.assetId}/wells/${outsider.wellId}/interpretations`).set('Authorization', outsider.token);
    expect(empty.status).toBe(400); // no logs: nothing to evaluate
    expect((await t.http.get(`/api/assets/${outsider.assetId}/wells/${outsider.wellId}/merged-samples`).set('Authorization', outsider.token)).status).toBe(409); // nothing bound
    expect(empty.body.message).toMatch(/Nothing to evaluate/);
  });
});
