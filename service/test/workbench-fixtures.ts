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
