/**
 * The truth test through the real API: the demo field's LAS files go in through POST
 * .../log-runs, tops, the model's zone parameters and cutoffs through the workbench routes,
 * interpretations are saved through POST .../interpretations, and the results must recover
 * the layered earth model the files were generated from (demo-wells compare.ts states the
 * tolerances and why sampling alone stays inside them). Expected values come from the model
 * itself (integrated over its layers), never from the evaluation.
 */
import {
  MODEL_CUTOFFS,
  WELLS,
  compareWithModel,
  demoFieldFiles,
  demoSurvey,
  demoTops,
  modelTruth,
  zoneParametersFor,
  type EvaluatedWell,
} from '@poreline/demo-wells';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createOutsider, demoAssetId } from '../../test/workbench-fixtures.js';
import { demoFormationPlan } from '../seed/demo-field-plan.js';
import { DemoCheckService } from './demo-check.service.js';
import type { DemoCheckDto } from './dto/demo-check.dto.js';

/** WM-4's two runs are spliced (run 2 bound, run 1 above it), so every zone is reached. */
const UNREACHED: string[] = [];

describe(DemoCheckService.name, () => {
  let t: TestApp;
  let assetId: string;
  const evaluated: EvaluatedWell[] = [];
  const wellIds = new Map<string, string>();

  async function call(method: 'get' | 'post' | 'put', path: string, role: 'petrophysicist' | 'reviewer' | 'viewer', body?: unknown) {
    const req = t.http[method](`/api/assets/${assetId}${path}`).set('Authorization', await t.tokenFor(role));
    const res = body === undefined ? await req : await req.send(body as object);
    expect(res.status, `${method.toUpperCase()} ${path}: ${JSON.stringify(res.body).slice(0, 500)}`).toBeLessThan(300);
    return res.body;
  }

  beforeAll(async () => {
    t = await createTestApp();
    assetId = await demoAssetId(t);
    // Formations in order, with the model's cutoffs.
    const formationIds = new Map<string, string>();
    for (const f of demoFormationPlan()) {
      const created = await call('post', '/formations', 'petrophysicist', { name: f.name, colour: f.colour, lithology: f.lithology });
      formationIds.set(f.name, created.id);
      await call('put', `/formations/${created.id}/cutoffs`, 'petrophysicist', { vshMax: f.cutoffs.vshMax, phiMin: f.cutoffs.phiMin, swMax: f.cutoffs.swMax });
    }
    const files = demoFieldFiles();
    const tops = demoTops();
    for (const w of WELLS) {
      const well = await call('post', '/wells', 'petrophysicist', { name: w.name, uwi: w.uwi });
      wellIds.set(w.name, well.id);
      const base = `/wells/${well.id}`;
      // The LAS files through the upload route, as a user would drop them.
      let upload = t.http.post(`/api/assets/${assetId}${base}/log-runs`).set('Authorization', await t.tokenFor('petrophysicist'));
      for (const f of files.filter((k) => k.wellName === w.name)) upload = upload.attach('files', Buffer.from(f.bytes), f.fileName.split('/').pop()!);
      const up = await upload;
      expect(up.status, JSON.stringify(up.body)).toBe(201);
      expect(up.body.results.map((r: { status: string }) => r.status)).toEqual(files.filter((k) => k.wellName === w.name).map(() => 'stored'));
      await call('put', `${base}/tops`, 'petrophysicist', {
        tops: tops.filter((k) => k.well === w.name).map((k) => ({ formationId: formationIds.get(k.formation), md: k.topMd })),
      });
      for (const [formation, params] of Object.entries(zoneParametersFor(w.name))) {
        await call('put', `${base}/zones/${formationIds.get(formation)}/parameters`, 'petrophysicist', { params });
      }
      const survey = demoSurvey(w.name);
      if (survey) {
        const csv = ['md (ft),inclination,azimuth', ...survey.map((s) => `${s.md},${s.inc},${s.azi}`)].join('\n');
        const res = await t.http
          .post(`/api/assets/${assetId}${base}/survey`)
          .set('Authorization', await t.tokenFor('petrophysicist'))
          .attach('file', Buffer.from(csv), `${w.name}_survey.csv`);
        expect(res.status, JSON.stringify(res.body)).toBe(201);
      }
      if (w.name === 'WM-4') {
        // Bind WM-4 to run 2 (the reservoir section); the merge splices run 1 in above it.
        const run2 = up.body.results.find((r: { fileName: string }) => r.fileName === 'WM-4_run2.las').logRunId;
        const proposed = (await call('get', `${base}/bindings`, 'viewer')) as { binding: string; mnemonic: string }[];
        await call('put', `${base}/bindings`, 'petrophysicist', { bindings: proposed.map((b) => ({ binding: b.binding, logRunId: run2, mnemonic: b.mnemonic })) });
      }
      const saved = await call('post', `${base}/interpretations`, 'petrophysicist');
      expect(saved.status).toBe('draft');
      evaluated.push({ well: w.name, depthUnit: saved.inputs.depthUnit, zones: saved.summaries });
    }
  }, 300_000);
  afterAll(() => t?.close());

  it('saved interpretations with the model parameters recover every zone: net reservoir and net pay within one sample step, porosity within 0.005, Sw within 0.02', () => {
    const rows = compareWithModel(evaluated);
    const truth = modelTruth();
    const evaluatedZones = new Set(rows.map((r) => `${r.well} ${r.zone}`));
    const missing = truth.wells.flatMap((w) => w.zones.map((z) => `${w.name} ${z.zone}`)).filter((k) => !evaluatedZones.has(k));
    expect(missing).toEqual(UNREACHED);
    const payZones = truth.wells.flatMap((w) => w.zones.filter((z) => z.netPay.md > 0 && !UNREACHED.includes(`${w.name} ${z.zone}`))).length;
    // 2 thickness rows per evaluated zone, 2 mean rows per zone with model pay: the check cannot pass empty.
    expect(rows).toHaveLength(2 * (70 - UNREACHED.length) + 2 * payZones);
    expect(payZones).toBeGreaterThanOrEqual(20);
    const worst = (q: string) => Math.max(...rows.filter((r) => r.quantity === q).map((r) => Math.abs((r.evaluated ?? NaN) - r.model)));
    console.info(
      `truth test via API: ${rows.length} rows; largest |evaluated - model|: net reservoir ${worst('net reservoir').toFixed(3)} ft, net pay ${worst('net pay').toFixed(3)} ft, porosity ${worst('mean porosity').toFixed(4)}, Sw ${worst('mean Sw').toFixed(4)}`,
    );
    expect(rows.filter((r) => !r.pass)).toEqual([]);
  });

  it('GET demo-check: every zone row passes and the in-place volumes from the evaluated fluid zones are within 2% of the model', async () => {
    const check = (await call('get', '/demo-check', 'viewer')) as DemoCheckDto;
    console.info(
      `demo-check volumes: ${check.volumes.map((v) => `${v.accumulation} ${(100 * v.relativeDifference!).toFixed(2)}%`).join(', ')}; largest ${JSON.stringify(check.summary.largest)}`,
    );
    expect(check.volumes.map((v) => v.accumulation)).toEqual(['Fenna gas', 'Marrow thin-sand oil', 'Wren gas cap', 'Wren oil leg', 'Tillet oil leg']);
    for (const v of check.volumes) {
      expect(v.missingWells, v.accumulation).toEqual([]);
      expect(Math.abs(v.relativeDifference!), v.accumulation).toBeLessThanOrEqual(0.02);
      expect(v.pass).toBe(true);
    }
    expect(check.zones.filter((r) => !r.pass)).toEqual([]);
    expect(check.summary).toMatchObject({ allPass: true, zonesInModel: 70, zonesEvaluated: 70 - UNREACHED.length });
    expect(check.notEvaluated.map((z) => `${z.well} ${z.zone}`)).toEqual(UNREACHED);
    expect(check.caution).toMatch(/SPE-PRMS/);
  });

  it('GET demo-check evaluates the formation zones exactly as the saved interpretations did (same engine, same inputs)', async () => {
    const check = (await call('get', '/demo-check', 'viewer')) as DemoCheckDto;
    const fromSaves = compareWithModel(evaluated);
    const fromCheck = check.zones.filter((r) => r.zoneKind === 'formation');
    expect(fromCheck.map((r) => [r.well, r.zone, r.quantity])).toEqual(fromSaves.map((r) => [r.well, r.zone, r.quantity]));
    fromCheck.forEach((r, i) => expect(r.evaluated, `${r.well} ${r.zone} ${r.quantity}`).toBeCloseTo(fromSaves[i].evaluated!, 9));
  });

  it('GET demo-check uses the model cutoffs even after a user changes a formation’s cutoffs', async () => {
    const formations = (await call('get', '/formations', 'viewer')) as { id: string; name: string }[];
    const wren = formations.find((f) => f.name === 'Wren Sand')!;
    await call('put', `/formations/${wren.id}/cutoffs`, 'petrophysicist', { vshMax: 0.2, phiMin: 0.2, swMax: 0.3 });
    const check = (await call('get', '/demo-check', 'viewer')) as DemoCheckDto;
    expect(check.summary.allPass).toBe(true);
    const c = MODEL_CUTOFFS['Wren Sand'];
    await call('put', `/formations/${wren.id}/cutoffs`, 'petrophysicist', { vshMax: c.vshMax, phiMin: c.phiMin, swMax: c.swMax });
  });

  it('GET demo-check is 404 for an asset that is not the demo asset, and for a caller who is not a member', async () => {
    const outsider = await createOutsider(t);
    const own = await t.http.get(`/api/assets/${outsider.assetId}/demo-check`).set('Authorization', outsider.token);
    expect(own.status).toBe(404);
    const demo = await t.http.get(`/api/assets/${assetId}/demo-check`).set('Authorization', outsider.token);
    expect(demo.status).toBe(404);
  });
});
