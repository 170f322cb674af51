// Fuzzing readLas with random mutations of valid files (the corpus and writer output):
// truncation, byte flips, inserted lines, huge numbers, deleted and repeated ranges. The
// reader must either return a well-formed LasFile or throw LasParseError, quickly.
import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { LasParseError, readLas, writeLas, type LasFile } from '../../src/index.js';

const dir = new URL('../las-corpus/', import.meta.url);
const seeds: Uint8Array[] = readdirSync(dir)
  .filter((f) => f.endsWith('.las'))
  .map((f) => new Uint8Array(readFileSync(new URL(f, dir))))
  .filter((b) => {
    try {
      readLas(b);
      return true;
    } catch {
      return false;
    }
  });
const enc = new TextEncoder();
seeds.push(
  enc.encode(
    writeLas(
      { curves: [{ mnemonic: 'DEPT', unit: 'M', values: [1, 1.5, 2, 2.5] }, ...Array.from({ length: 9 }, (_, k) => ({ mnemonic: `C${k}`, values: [k, -k / 3, Number.NaN, 1e-300] }))] },
      { wrap: true },
    ),
  ),
);

const insertedLines = [
  '~A', '~C', '~V', '~W', '~Log_Data', '~', '#', 'junk text here', '1e999999', '-1e999999', '9'.repeat(400),
  '1 2 3 4 5 6 7 8 9 10 11 12', '-', '.', '"quoted token" 1', 'VERS. 3.0 :', 'WRAP. YES :', 'DLM. COMMA :',
  'NULL. 1 :', 'STEP. 0 :', '\u0000\u0001\u0002', '\t\t', ' '.repeat(1000), 'x'.repeat(5000), '0.'.repeat(300), '1,,,,2',
];

type Mutation =
  | { op: 'truncate'; at: number }
  | { op: 'flip'; at: number; byte: number }
  | { op: 'insert'; at: number; line: string; eol: string }
  | { op: 'delete'; at: number; length: number }
  | { op: 'repeat'; at: number; length: number; times: number };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ op: fc.constant('truncate' as const), at: fc.nat() }),
  fc.record({ op: fc.constant('flip' as const), at: fc.nat(), byte: fc.integer({ min: 0, max: 255 }) }),
  fc.record({ op: fc.constant('insert' as const), at: fc.nat(), line: fc.oneof(fc.constantFrom(...insertedLines), fc.string({ maxLength: 40 })), eol: fc.constantFrom('\n', '\r\n', '\r', '') }),
  fc.record({ op: fc.constant('delete' as const), at: fc.nat(), length: fc.integer({ min: 1, max: 200 }) }),
  fc.record({ op: fc.constant('repeat' as const), at: fc.nat(), length: fc.integer({ min: 1, max: 200 }), times: fc.integer({ min: 1, max: 50 }) }),
);

function apply(bytes: Uint8Array, m: Mutation): Uint8Array {
  const n = bytes.length;
  const at = n === 0 ? 0 : m.at % (n + 1);
  switch (m.op) {
    case 'truncate':
      return bytes.slice(0, at);
    case 'flip': {
      const b = bytes.slice();
      if (at < n) b[at] = m.byte;
      return b;
    }
    case 'insert': {
      const ins = enc.encode(m.line + m.eol);
      const b = new Uint8Array(n + ins.length);
      b.set(bytes.subarray(0, at));
      b.set(ins, at);
      b.set(bytes.subarray(at), at + ins.length);
      return b;
    }
    case 'delete': {
      const b = new Uint8Array(n - Math.min(m.length, n - at));
      b.set(bytes.subarray(0, at));
      b.set(bytes.subarray(at + m.length), at);
      return b;
    }
    case 'repeat': {
      const piece = bytes.subarray(at, Math.min(n, at + m.length));
      const b = new Uint8Array(n + piece.length * m.times);
      b.set(bytes.subarray(0, at));
      for (let t = 0; t < m.times; t++) b.set(piece, at + t * piece.length);
      b.set(bytes.subarray(at), at + piece.length * m.times);
      return b;
    }
  }
}

function checkWellFormed(f: LasFile) {
  expect(f.rowCount).toBeGreaterThan(0);
  expect(f.curves.length).toBe(f.sections.curves.length);
  expect(new Set(f.curves.map((c) => c.mnemonic.toUpperCase())).size).toBe(f.curves.length);
  for (const c of f.curves) {
    expect(c.values.length).toBe(f.rowCount);
    for (const v of c.values) if (!Number.isNaN(v)) expect(Number.isFinite(v)).toBe(true);
  }
  for (const d of f.diagnostics) {
    expect(['error', 'warning', 'info']).toContain(d.severity);
    if (d.line !== null) expect(Number.isInteger(d.line) && d.line > 0).toBe(true);
    expect(d.message.length).toBeGreaterThan(0);
  }
  expect(f.diagnostics.length).toBeLessThan(500);
}

describe('readLas fuzzing', () => {
  it('readLas on mutated valid files returns a well-formed file or throws LasParseError, each run well under a second', () => {
    let slowest = 0;
    fc.assert(
      fc.property(fc.constantFrom(...seeds), fc.array(mutation, { minLength: 1, maxLength: 6 }), (seed, mutations) => {
        const bytes = mutations.reduce(apply, seed);
        const t0 = performance.now();
        try {
          checkWellFormed(readLas(bytes));
        } catch (e) {
          if (!(e instanceof LasParseError)) throw e;
          expect(e.line === null || (Number.isInteger(e.line) && e.line > 0)).toBe(true);
        }
        slowest = Math.max(slowest, performance.now() - t0);
      }),
      { numRuns: Number(process.env.FUZZ_RUNS ?? 1500), seed: Number(process.env.FUZZ_SEED ?? 20260601) },
    );
    expect(slowest).toBeLessThan(1000);
  }, 20_000);

  it('readLas on random bytes and random text throws only LasParseError', () => {
    fc.assert(
      fc.property(fc.oneof(fc.uint8Array({ maxLength: 2000 }), fc.string({ maxLength: 2000 }).map((s) => enc.encode(s))), (bytes) => {
        try {
          checkWellFormed(readLas(bytes));
        } catch (e) {
          if (!(e instanceof LasParseError)) throw e;
        }
      }),
      { numRuns: 1000, seed: 7 },
    );
  });
});
