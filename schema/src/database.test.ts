import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, type OpenDatabase } from './database.js';
import { assets, curves, logRuns, organisations, wells } from './tables/index.js';

describe('openDatabase (PGlite) with the generated migrations', () => {
  let handle: OpenDatabase;
  beforeAll(async () => {
    handle = await openDatabase({ dataDir: 'memory://' });
    await handle.migrate();
  });
  afterAll(async () => handle.close());

  it('migrate() creates the tables and ping() answers', async () => {
    expect(await handle.ping()).toBe(true);
  });

  it('stores curve samples as bytea and gives back the same float64 bytes, NaN included', async () => {
    const { db } = handle;
    const [org] = await db.insert(organisations).values({ name: 'Test org' }).returning();
    const [asset] = await db.insert(assets).values({ organisationId: org.id, name: 'A' }).returning();
    const [well] = await db.insert(wells).values({ assetId: asset.id, name: 'W-1' }).returning();
    const [run] = await db
      .insert(logRuns)
      .values({
        wellId: well.id,
        fileName: 'w1.las',
        sha256: 'ab',
        sizeBytes: 3,
        original: new Uint8Array([1, 2, 3]),
        lasVersion: '2.0',
        wrapped: false,
        header: {},
        diagnostics: [],
        depthUnit: 'ft',
        start: 1,
        stop: 2,
        step: 1,
        rowCount: 2,
        curveCount: 1,
      })
      .returning();
    const values = new Float64Array([1.5, NaN, -999.25]);
    await db.insert(curves).values({
      logRunId: run.id,
      position: 0,
      mnemonic: 'DEPT',
      originalMnemonic: 'DEPT',
      unit: 'ft',
      samples: new Uint8Array(values.buffer),
      nullCount: 1,
    });
    const [row] = await db.select().from(curves).where(eq(curves.logRunId, run.id));
    const back = new Float64Array(row.samples.slice().buffer);
    expect(back[0]).toBe(1.5);
    expect(Number.isNaN(back[1])).toBe(true);
    expect(back[2]).toBe(-999.25);
  });

  it('refuses a second well of the same name in one asset (unique index)', async () => {
    const { db } = handle;
    const [org] = await db.insert(organisations).values({ name: 'Org 2' }).returning();
    const [asset] = await db.insert(assets).values({ organisationId: org.id, name: 'B' }).returning();
    await db.insert(wells).values({ assetId: asset.id, name: 'Same' });
    await expect(db.insert(wells).values({ assetId: asset.id, name: 'Same' })).rejects.toThrow();
  });
});
