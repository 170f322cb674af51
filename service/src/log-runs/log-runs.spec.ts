import { decodeCurveBundle } from '@poreline/core';
import { curves, logRuns } from '@poreline/schema';
import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { DatabaseService } from '../database/database.module.js';

/** A small invented LAS 2.0 file (test data, not a check value). */
function lasFile(rows = 5, extraRowText = ''): string {
  const data = Array.from({ length: rows }, (_, i) => `${(1000 + 0.5 * i).toFixed(1)} ${(40 + i).toFixed(2)} ${(2.3 + 0.01 * i).toFixed(3)}`);
  return [
    '~VERSION INFORMATION',
    ' VERS.   2.0 : CWLS LAS 2.0',
    ' WRAP.   NO  : one line per depth',
    '~WELL INFORMATION',
    ` STRT.FT 1000.0 : start`,
    ` STOP.FT ${(1000 + 0.5 * (rows - 1)).toFixed(1)} : stop`,
    ' STEP.FT 0.5 : step',
    ' NULL. -999.25 : null',
    ' WELL. TEST-1 : well',
    '~CURVE INFORMATION',
    ' DEPT.FT : depth',
    ' GR.GAPI : gamma ray',
    ' RHOB.G/CC : bulk density',
    '~A',
    ...data,
    extraRowText,
  ].join('\n');
}

describe('log runs: LAS upload (real PGlite)', () => {
  let t: TestApp;
  let base: string;
  let petro: string;
  const counts = async () => {
    const db = t.app.get(DatabaseService).db;
    const [r] = await db.select({ n: count() }).from(logRuns);
    const [c] = await db.select({ n: count() }).from(curves);
    return { runs: r.n, curves: c.n };
  };

  beforeAll(async () => {
    t = await createTestApp({ uploadMaxBytes: 64 * 1024 });
    petro = await t.tokenFor('petrophysicist');
    const asset = (await t.http.get('/api/assets').set('Authorization', petro)).body[0];
    const well = await t.http.post(`/api/assets/${asset.id}/wells`).set('Authorization', petro).send({ name: 'UP-1' });
    base = `/api/assets/${asset.id}/wells/${well.body.id}`;
  });
  afterAll(async () => t.close());

  it('a petrophysicist uploads a good file: stored with its curves, samples read back as binary', async () => {
    const res = await t.http.post(`${base}/log-runs`).set('Authorization', petro).attach('files', Buffer.from(lasFile()), 'up-1.las');
    expect(res.status).toBe(201);
    expect(res.body.results[0]).toMatchObject({ fileName: 'up-1.las', status: 'stored' });
    const well = await t.http.get(base).set('Authorization', petro);
    const run = well.body.logRuns[0];
    expect(run.curveCount).toBe(3);
    expect(run.rowCount).toBe(5);
    expect(run.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(run.curves.map((c: { mnemonic: string }) => c.mnemonic)).toEqual(['DEPT', 'GR', 'RHOB']);
    expect(run.curves[1].curveClass).toBe('gamma_ray');
    const bin = await t.http
      .get(`${base}/log-runs/${run.id}/samples`)
      .set('Authorization', petro)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(bin.headers['content-type']).toMatch(/octet-stream/);
    const bundle = decodeCurveBundle(new Uint8Array(bin.body as Buffer));
    expect(bundle.entries.map((e) => e.mnemonic)).toEqual(['DEPT', 'GR', 'RHOB']);
    expect(bundle.values[1][2]).toBeCloseTo(42, 12); // third GR sample as written in the file
  });

  it('the same bytes again are reported as a duplicate and not stored twice', async () => {
    const before = await counts();
    const res = await t.http.post(`${base}/log-runs`).set('Authorization', petro).attach('files', Buffer.from(lasFile()), 'again.las');
    expect(res.body.results[0].status).toBe('duplicate');
    expect(await counts()).toEqual(before);
  });

  it('a malformed file is 400 naming what is wrong, and nothing is stored', async () => {
    const before = await counts();
    const bad = '~VERSION\n VERS. 2.0 : x\n~WELL\n NULL. -999.25 : null\n~CURVE\n DEPT.FT : depth\n';
    const res = await t.http.post(`${base}/log-runs`).set('Authorization', petro).attach('files', Buffer.from(bad), 'bad.las');
    expect(res.status).toBe(400);
    expect(res.body.results[0].status).toBe('rejected');
    expect(res.body.results[0].message).toMatch(/data section/i);
    expect(await counts()).toEqual(before);
  });

  it('a batch with one bad and one good file stores the good one and reports the bad one', async () => {
    const before = await counts();
    const res = await t.http
      .post(`${base}/log-runs`)
      .set('Authorization', petro)
      .attach('files', Buffer.from('\u0000\u0001\u0002 binary junk'), 'junk.las')
      .attach('files', Buffer.from(lasFile(7)), 'good.las');
    expect(res.status).toBe(201);
    expect(res.body.results.map((r: { status: string }) => r.status)).toEqual(['rejected', 'stored']);
    expect((await counts()).runs).toBe(before.runs + 1);
  });

  it('a viewer uploading gets 403 and nothing is stored', async () => {
    const before = await counts();
    const res = await t.http.post(`${base}/log-runs`).set('Authorization', await t.tokenFor('viewer')).attach('files', Buffer.from(lasFile(9)), 'v.las');
    expect(res.status).toBe(403);
    expect(await counts()).toEqual(before);
  });

  it('a file over the size limit is 413 with the limit in the message', async () => {
    const big = lasFile(6000); // ~130 kB against a 64 kB limit in this test app
    const res = await t.http.post(`${base}/log-runs`).set('Authorization', petro).attach('files', Buffer.from(big), 'big.las');
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/upload limit of 0.1 MB/);
  });

  it('an upload without files is 400', async () => {
    const res = await t.http.post(`${base}/log-runs`).set('Authorization', petro).field('x', '1');
    expect(res.status).toBe(400);
  });
});
