import { FORMATIONS, MODEL_CUTOFFS, WELLS, demoTops } from '@poreline/demo-wells';
import { auditLog } from '@poreline/schema';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { DatabaseService } from '../database/database.module.js';
import { FORMATION_PALETTE } from '../formations/formation-palette.js';
import { DEMO_CASE, REVIEW_PLAN } from './demo-field-plan.js';
import { DEMO_FIELD_MARKER } from './demo-field.seeder.js';
import { DemoSeedService } from './demo-seed.service.js';

/** Everything the seed creates, counted through the API (what a second run must not change). */
async function inventory(t: TestApp, assetId: string) {
  const auth = await t.tokenFor('admin');
  const get = async (path: string) => {
    const res = await t.http.get(`/api/assets/${assetId}${path}`).set('Authorization', auth);
    expect(res.status, `${path}: ${JSON.stringify(res.body)}`).toBe(200);
    return res.body;
  };
  const wells = (await get('/wells')) as { id: string; name: string; uwi: string; logRunCount: number; kbElevation: number | null }[];
  const perWell: Record<string, { runs: number; tops: number; versions: string[]; series: number; confirmed: number }> = {};
  for (const w of wells) {
    const tops = await get(`/wells/${w.id}/tops`);
    const versions = (await get(`/wells/${w.id}/interpretations`)) as { status: string }[];
    const series = await get(`/wells/${w.id}/production`);
    const bindings = (await get(`/wells/${w.id}/bindings`)) as { confirmed: boolean }[];
    perWell[w.name] = { runs: w.logRunCount, tops: tops.length, versions: versions.map((v) => v.status), series: series.length, confirmed: bindings.filter((b) => b.confirmed).length };
  }
  const formations = (await get('/formations')) as { name: string; colour: string; ordinal: number; cutoffs: { vshMax: number; phiMin: number; swMax: number } }[];
  const cases = (await get('/reserves-cases')) as { id: string; name: string }[];
  return { wells, perWell, formations, cases };
}

describe(DemoSeedService.name, () => {
  let t: TestApp;
  let assetId: string;
  let startSeconds: number;

  beforeAll(async () => {
    const started = performance.now();
    t = await createTestApp({ demoData: 'full' });
    startSeconds = (performance.now() - started) / 1000;
    assetId = (await t.http.get('/api/assets').set('Authorization', await t.tokenFor('viewer'))).body[0].id;
  }, 180_000);
  afterAll(() => t?.close());

  it('loads the demo field on a fresh database: wells, logs, formations in order, tops, review states, production, a reserves case', async () => {
    const [marker] = await t.app.get(DatabaseService).db.select().from(auditLog).where(and(eq(auditLog.assetId, assetId), eq(auditLog.entity, DEMO_FIELD_MARKER.entity)));
    console.info(`demo seed: app with the full demo field ready in ${startSeconds.toFixed(1)} s; seed ${JSON.stringify(marker.after)}`);
    const inv = await inventory(t, assetId);
    expect(inv.wells.map((w) => w.name).sort()).toEqual(WELLS.map((w) => w.name).sort());
    expect(inv.wells.find((w) => w.name === 'WM-7')!.uwi).toBe('WRN-0007');
    // WM-1: ground 318.7 ft + KB height 24.6 ft (demo-wells/data/wells.csv kb_elevation_ft 343.3)
    expect(inv.wells.find((w) => w.name === 'WM-1')!.kbElevation).toBeCloseTo(343.3, 6);
    expect(inv.formations.map((f) => f.name)).toEqual(FORMATIONS.map((f) => f.name));
    for (const f of inv.formations) {
      expect(FORMATION_PALETTE).toContain(f.colour);
      expect(f.cutoffs).toMatchObject(MODEL_CUTOFFS[f.name]);
    }
    expect(new Set(inv.formations.map((f) => f.colour)).size).toBe(FORMATIONS.length);
    for (const w of WELLS) {
      const p = inv.perWell[w.name];
      expect(p.runs, w.name).toBe(w.name === 'WM-4' ? 2 : 1);
      expect(p.tops, w.name).toBe(demoTops().filter((k) => k.well === w.name).length);
      expect(p.confirmed, w.name).toBeGreaterThanOrEqual(6);
      expect(p.versions, w.name).toEqual([REVIEW_PLAN[w.name].status]);
    }
    expect(inv.perWell['WM-1'].series).toBe(2);
    expect(inv.perWell['WM-4'].series).toBe(1);
    expect(inv.cases.map((c) => c.name)).toEqual([DEMO_CASE.name]);
  });

  it('stores the model zone parameters, the WM-7 survey and WM-4 bindings on its second run', async () => {
    const auth = await t.tokenFor('viewer');
    const wells = (await t.http.get(`/api/assets/${assetId}/wells`).set('Authorization', auth)).body as { id: string; name: string; logRuns: { id: string; fileName: string }[] }[];
    const wm7 = wells.find((w) => w.name === 'WM-7')!;
    const survey = await t.http.get(`/api/assets/${assetId}/wells/${wm7.id}/survey`).set('Authorization', auth);
    expect(survey.status).toBe(200);
    expect(survey.body.depthUnit).toBe('ft');
    const formations = (await t.http.get(`/api/assets/${assetId}/formations`).set('Authorization', auth)).body as { id: string; name: string }[];
    const wren = formations.find((f) => f.name === 'Wren Sand')!;
    const params = await t.http.get(`/api/assets/${assetId}/wells/${wm7.id}/zones/${wren.id}/parameters`).set('Authorization', auth);
    expect(params.body.isDefault).toBe(false);
    // Wren Sand: Winsauer et al. (1952) a = 0.62, m = 2.15 (the model's choice, demo-wells formations.ts)
    expect(params.body.params).toMatchObject({ a: 0.62, m: 2.15, swModel: 'archie' });
    const wm4 = wells.find((w) => w.name === 'WM-4')!;
    const run2 = wm4.logRuns.find((r) => r.fileName === 'WM-4_run2.las')!;
    const bindings = (await t.http.get(`/api/assets/${assetId}/wells/${wm4.id}/bindings`).set('Authorization', auth)).body as { binding: string; logRunId: string }[];
    expect(bindings.find((b) => b.binding === 'gr')!.logRunId).toBe(run2.id);
  });

  it('reviews as planned: approvals and the return carry the reviewer comment, and the case was run on approved sources', async () => {
    const auth = await t.tokenFor('engineer');
    const wells = (await t.http.get(`/api/assets/${assetId}/wells`).set('Authorization', auth)).body as { id: string; name: string }[];
    const wm6 = wells.find((w) => w.name === 'WM-6')!;
    const [returned] = (await t.http.get(`/api/assets/${assetId}/wells/${wm6.id}/interpretations`).set('Authorization', auth)).body;
    expect(returned.status).toBe('returned');
    expect(returned.reviewComment).toBe(REVIEW_PLAN['WM-6'].comment);
    const cases = (await t.http.get(`/api/assets/${assetId}/reserves-cases`).set('Authorization', auth)).body as { id: string }[];
    const c = (await t.http.get(`/api/assets/${assetId}/reserves-cases/${cases[0].id}`).set('Authorization', auth)).body;
    expect(c.resultsCurrent).toBe(true);
    expect(c.sources.map((s: { wellName: string }) => s.wellName).sort()).toEqual([...DEMO_CASE.wells].sort());
    expect(c.results.fluid).toBe('gas');
    const p = c.results.probabilistic.recoverable;
    expect(p.p90).toBeLessThanOrEqual(p.p50);
    expect(p.p50).toBeLessThanOrEqual(p.p10);
  });

  it('the seeded field passes its own model-vs-evaluated check', async () => {
    const res = await t.http.get(`/api/assets/${assetId}/demo-check`).set('Authorization', await t.tokenFor('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.summary).toMatchObject({ allPass: true, volumeRows: 5, volumeRowsPassed: 5 });
  });

  it('is idempotent: a second seed adds nothing, and a seed resumed without its completion marker adds nothing either', async () => {
    const before = await inventory(t, assetId);
    const seed = t.app.get(DemoSeedService);
    const again = await seed.seed();
    expect(again.created).toBe(false);
    expect(again.field?.loaded).toBe(false);
    const db = t.app.get(DatabaseService).db;
    const markerWhere = and(eq(auditLog.assetId, assetId), eq(auditLog.action, DEMO_FIELD_MARKER.action), eq(auditLog.entity, DEMO_FIELD_MARKER.entity));
    expect(await db.select().from(auditLog).where(markerWhere)).toHaveLength(1);
    const auditBefore = (await db.select({ id: auditLog.id }).from(auditLog).where(eq(auditLog.assetId, assetId))).length;
    await db.delete(auditLog).where(markerWhere);
    const resumed = await seed.seed();
    expect(resumed.field).toMatchObject({ loaded: true, wellsCreated: 0, logRunsStored: 0, interpretationSteps: 0, casesCreated: 0 });
    // Only the marker is written again: no step changed anything.
    expect((await db.select({ id: auditLog.id }).from(auditLog).where(eq(auditLog.assetId, assetId))).length).toBe(auditBefore);
    expect(await inventory(t, assetId)).toEqual(before);
  });
});
