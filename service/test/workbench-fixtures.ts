import { writeLas } from '@poreline/core';
import { assetMembers, assets, organisations, users } from '@poreline/schema';
import bcrypt from 'bcryptjs';
import { expect } from 'vitest';
import { DatabaseService } from '../src/database/database.module.js';
import type { TestApp } from './test-app.js';

/** A synthetic curve for a test LAS file: a value per depth (NaN = null). */
export interface TestCurve {
  mnemonic: string;
  unit: string;
  at: (depth: number) => number;
}

/** LAS 2.0 text of a regular log (core's writeLas). Test data, not a check value. */
export function lasText(opts: { well?: string; depthUnit?: string; start: number; step: number; count: number; curves: TestCurve[] }): string {
  const depth = Array.from({ length: opts.count }, (_, i) => opts.start + i * opts.step);
  return writeLas({
    well: [{ mnemonic: 'WELL', value: opts.well ?? 'TEST' }],
    curves: [{ mnemonic: 'DEPT', unit: opts.depthUnit ?? 'FT', values: depth }, ...opts.curves.map((c) => ({ mnemonic: c.mnemonic, unit: c.unit, values: depth.map(c.at) }))],
  });
}

/** Uploads one LAS text to a well through the API and returns the new log run id. */
export async function uploadLas(t: TestApp, assetId: string, wellId: string, fileName: string, text: string): Promise<string> {
  const res = await t.http
    .post(`/api/assets/${assetId}/wells/${wellId}/log-runs`)
    .set('Authorization', await t.tokenFor('petrophysicist'))
    .attach('files', Buffer.from(text), fileName);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  expect(res.body.results[0].status, JSON.stringify(res.body)).toBe('stored');
  return res.body.results[0].logRunId as string;
}

export async function demoAssetId(t: TestApp): Promise<string> {
  const res = await t.http.get('/api/assets').set('Authorization', await t.tokenFor('viewer'));
  return res.body[0].id as string;
}

export async function createWell(t: TestApp, assetId: string, name: string): Promise<string> {
  const res = await t.http.post(`/api/assets/${assetId}/wells`).set('Authorization', await t.tokenFor('petrophysicist')).send({ name });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id as string;
}

export async function createFormation(t: TestApp, assetId: string, body: Record<string, unknown>): Promise<{ id: string; name: string }> {
  const res = await t.http.post(`/api/assets/${assetId}/formations`).set('Authorization', await t.tokenFor('petrophysicist')).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

/** A petrophysicist of another organisation with a well in their own asset: for cross-asset refusals. */
export async function createOutsider(t: TestApp): Promise<{ token: string; assetId: string; wellId: string }> {
  const db = t.app.get(DatabaseService).db;
  const [org] = await db.insert(organisations).values({ name: 'Outside org' }).returning();
  const [asset] = await db.insert(assets).values({ organisationId: org.id, name: 'Outside asset' }).returning();
  const email = `outsider-${asset.id.slice(0, 8)}@other.test`;
  const [user] = await db.insert(users).values({ organisationId: org.id, email, name: 'Out Sider', passwordHash: await bcrypt.hash('outsider-pass', 4) }).returning();
  await db.insert(assetMembers).values({ assetId: asset.id, userId: user.id, role: 'petrophysicist' });
  const login = await t.http.post('/api/auth/login').send({ email, password: 'outsider-pass' });
  const token = `Bearer ${login.body.token}`;
  const well = await t.http.post(`/api/assets/${asset.id}/wells`).set('Authorization', token).send({ name: 'OUT-1' });
  return { token, assetId: asset.id, wellId: well.body.id };
}

/**
 * A synthetic two-zone well whose Kite Sand result is known by hand (test data, not a check
 * value of a formula): 4900-5300 ft; run A (0.5 ft) holds GR and RHOB, run B (1 ft) holds ILD.
 * Kite Sand 5000-5100 ft: GR 30 gAPI (clean), RHOB 2.30 g/cm3, RT 20 ohm.m above 5050 ft and
 * 0.5 ohm.m from 5050 ft. Lark Shale 5100-5300 ft: GR 100-120 gAPI, RHOB 2.55, RT 2.
 */
export const KITE = {
  gr: (d: number) => (d >= 5000 && d < 5100 ? 30 : d >= 5100 ? 100 + (d - 5100) / 10 : 100),
  rhob: (d: number) => (d >= 5000 && d < 5100 ? 2.3 : 2.55),
  rt: (d: number) => (d >= 5000 && d < 5050 ? 20 : d >= 5050 && d < 5100 ? 0.5 : 2),
  /** Kite Sand parameters: sandstone, GR picks 30/120 gAPI, Rw 0.05 ohm.m at a constant 75 F (so Arps changes nothing). */
  sandParams: (defaults: Record<string, unknown>) => ({
    ...defaults,
    grClean: 30,
    grShale: 120,
    temperatureUnit: 'F',
    temperature: { kind: 'constant', temperature: 75 },
    rw: { kind: 'at_temperature', rw: 0.05, temperature: 75 },
  }),
};

/** Creates (once per asset) the Kite Sand and Lark Shale formations. */
export async function kiteFormations(t: TestApp, assetId: string): Promise<{ kite: { id: string }; lark: { id: string } }> {
  const list = (await t.http.get(`/api/assets/${assetId}/formations`).set('Authorization', await t.tokenFor('petrophysicist'))).body as { id: string; name: string }[];
  const kite = list.find((f) => f.name === 'Kite Sand') ?? (await createFormation(t, assetId, { name: 'Kite Sand' }));
  const lark = list.find((f) => f.name === 'Lark Shale') ?? (await createFormation(t, assetId, { name: 'Lark Shale' }));
  return { kite, lark };
}

/** A well with the KITE logs, tops at 5000 and 5100 ft and the Kite Sand parameters stored. */
export async function setUpKiteWell(t: TestApp, assetId: string, name: string): Promise<{ wellId: string; runA: string; runB: string; kite: { id: string }; lark: { id: string } }> {
  const { kite, lark } = await kiteFormations(t, assetId);
  const wellId = await createWell(t, assetId, name);
  const runA = await uploadLas(t, assetId, wellId, `${name}-a.las`, lasText({ well: name, start: 4900, step: 0.5, count: 801, curves: [{ mnemonic: 'GR', unit: 'GAPI', at: KITE.gr }, { mnemonic: 'RHOB', unit: 'G/CC', at: KITE.rhob }] }));
  const runB = await uploadLas(t, assetId, wellId, `${name}-b.las`, lasText({ well: name, start: 4950, step: 1, count: 351, curves: [{ mnemonic: 'ILD', unit: 'OHMM', at: KITE.rt }] }));
  const petro = await t.tokenFor('petrophysicist');
  const base = `/api/assets/${assetId}/wells/${wellId}`;
  const tops = await t.http.put(`${base}/tops`).set('Authorization', petro).send({ tops: [{ formationId: kite.id, md: 5000 }, { formationId: lark.id, md: 5100 }] });
  expect(tops.status, JSON.stringify(tops.body)).toBe(200);
  const defaults = (await t.http.get(`${base}/zones/${kite.id}/parameters`).set('Authorization', petro)).body.params;
  const put = await t.http.put(`${base}/zones/${kite.id}/parameters`).set('Authorization', petro).send({ params: KITE.sandParams(defaults) });
  expect(put.status, JSON.stringify(put.body)).toBe(200);
  return { wellId, runA, runB, kite, lark };
}
