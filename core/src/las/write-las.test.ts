// Round trip writeLas -> readLas, property-tested: the expected values are the inputs
// themselves (exact for the shortest format; within 0.5 x 10^-decimals for fixed notation).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { writeLas, type LasWriteCurve } from './write-las.js';
import { readLas } from './read-las.js';

const isNull = (v: number) => v === -999.25 || v === -9999;
const sample = fc.oneof(
  { weight: 1, arbitrary: fc.constant(Number.NaN) },
  { weight: 6, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }).filter((v) => !isNull(v)) },
  { weight: 3, arbitrary: fc.double({ min: -5000, max: 5000, noNaN: true }).filter((v) => !isNull(v)) },
);
const mnemonic = fc.stringMatching(/^[A-Z][A-Z0-9_]{0,7}$/);
const safeText = fc.stringMatching(/^[A-Za-z0-9 ,()/+\-_]{0,30}$/);

const lasInput = fc
  .record({
    rows: fc.integer({ min: 1, max: 40 }),
    names: fc.uniqueArray(mnemonic, { minLength: 1, maxLength: 6, selector: (m) => m.toUpperCase() }),
    start: fc.double({ min: -1000, max: 10000, noNaN: true }),
    step: fc.oneof(fc.constant(0.5), fc.constant(-0.1524), fc.double({ min: 0.01, max: 10, noNaN: true })),
  })
  .chain(({ rows, names, start, step }) =>
    fc.record({
      index: fc.constant(Array.from({ length: rows }, (_, i) => start + i * step)),
      curves: fc.tuple(...names.slice(1).map((m) => fc.record({ mnemonic: fc.constant(m), values: fc.array(sample, { minLength: rows, maxLength: rows }), unit: fc.constantFrom('GAPI', 'G/CC', 'V/V', '', 'OHM.M') }))),
      indexName: fc.constant(names[0]),
      wellName: safeText,
      wrap: fc.boolean(),
    }),
  );

const same = (a: number, b: number) => Object.is(a, b) || (Number.isNaN(a) && Number.isNaN(b));

describe('writeLas', () => {
  it('readLas(writeLas(x)) gives back every value exactly with the shortest format (property, NaN, -0, negatives, wrap)', () => {
    fc.assert(
      fc.property(lasInput, ({ index, curves, indexName, wellName, wrap }) => {
        const all: LasWriteCurve[] = [{ mnemonic: indexName, unit: 'M', values: index }, ...curves];
        const text = writeLas({ well: [{ mnemonic: 'WELL', value: wellName, description: 'Well name' }], curves: all }, { wrap });
        const f = readLas(text);
        expect(f.wrapped).toBe(wrap);
        expect(f.curves.map((c) => c.mnemonic)).toEqual(all.map((c) => c.mnemonic));
        expect(f.sections.well.find((i) => i.mnemonic === 'WELL')?.value).toBe(wellName.trim());
        all.forEach((c, k) => {
          expect(f.curves[k].unit).toBe(c.unit ?? '');
          c.values.forEach((v, i) => expect(same(f.curves[k].values[i], v), `${c.mnemonic}[${i}] ${v} -> ${f.curves[k].values[i]}`).toBe(true));
        });
        expect(f.diagnostics.filter((d) => d.severity !== 'info')).toEqual([]);
        if (wrap) {
          for (const line of text.slice(text.indexOf('~A')).split('\n').slice(1)) expect(line.length).toBeLessThanOrEqual(80);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('readLas(writeLas(x, decimals d)) is within 0.5 x 10^-d of every value (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 8 }),
        fc.array(fc.oneof(fc.constant(Number.NaN), fc.double({ min: -1e6, max: 1e6, noNaN: true })), { minLength: 1, maxLength: 30 }),
        (d, values) => {
          fc.pre(values.every((v) => Number.isNaN(v) || (!isNull(Number(v.toFixed(d))))));
          const text = writeLas({ curves: [{ mnemonic: 'DEPT', values: values.map((_, i) => i) }, { mnemonic: 'X', values, decimals: d }] });
          const back = readLas(text).curves[1].values;
          values.forEach((v, i) => {
            if (Number.isNaN(v)) expect(back[i]).toBeNaN();
            else expect(Math.abs(back[i] - v)).toBeLessThanOrEqual(0.5 * 10 ** -d * (1 + 1e-9) + Math.abs(v) * Number.EPSILON);
          });
        },
      ),
      { numRuns: 200 },
    );
  });

  it('writeLas computes STRT, STOP, STEP, NULL and keeps well items, parameters and other text', () => {
    const text = writeLas({
      well: [{ mnemonic: 'WELL', value: 'KESTREL 7-14', description: 'Well' }, { mnemonic: 'STRT', value: 1 }, { mnemonic: 'UWI', value: '100071400000' }],
      parameters: [{ mnemonic: 'BHT', unit: 'DEGC', value: 71.5, description: 'Bottom hole temperature' }],
      other: 'Computed curves.\nSecond line.',
      curves: [
        { mnemonic: 'DEPT', unit: 'M', values: [1000, 1000.5, 1001] },
        { mnemonic: 'PHIE', unit: 'V/V', values: [0.2, Number.NaN, 0.1], decimals: 4, description: 'Effective porosity' },
      ],
    });
    const f = readLas(text);
    const well = Object.fromEntries(f.sections.well.map((i) => [i.mnemonic, i.value]));
    expect(well).toEqual({ STRT: '1000', STOP: '1001', STEP: '0.5', NULL: '-999.25', WELL: 'KESTREL 7-14', UWI: '100071400000' });
    expect(f.sections.parameters[0]).toMatchObject({ mnemonic: 'BHT', unit: 'DEGC', value: '71.5' });
    expect(f.sections.other).toBe('Computed curves.\nSecond line.');
    expect(f.index).toMatchObject({ step: 0.5, depthUnit: 'm' });
    expect(text).toContain('  0.2000');
    expect(f.diagnostics).toEqual([]);
  });

  it('writeLas writes STEP 0 for an irregular index', () => {
    const f = readLas(writeLas({ curves: [{ mnemonic: 'DEPT', values: [1, 2, 4] }] }));
    expect(f.index.declared.step).toBe(0);
    expect(f.index.step).toBeNull();
  });

  it('writeLas with wrap puts the index alone on its line', () => {
    const curves = [{ mnemonic: 'DEPT', values: [10, 11] }, ...Array.from({ length: 12 }, (_, k) => ({ mnemonic: `C${k}`, values: [k + 0.123456789, -k - 0.987654321] }))];
    const text = writeLas({ curves }, { wrap: true });
    const data = text.slice(text.indexOf('~A')).trimEnd().split('\n').slice(1);
    expect(data[0]).toBe('10');
    expect(data.every((l) => l.length <= 80)).toBe(true);
    expect(data.filter((l) => l === '11')).toHaveLength(1);
    expect(readLas(text).curves[12].values[1]).toBe(-11.987654321);
  });

  it.each([
    [{ curves: [] }, 'curves must hold at least the index curve'],
    [{ curves: [{ mnemonic: 'DEPT', values: [] }] }, 'index curve DEPT has no samples'],
    [{ curves: [{ mnemonic: 'DEPT', values: [1, Number.NaN] }] }, 'index curve DEPT is null at sample 1'],
    [{ curves: [{ mnemonic: 'DEPT', values: [1] }, { mnemonic: 'GR', values: [1, 2] }] }, 'curve GR has 2 samples, the index has 1'],
    [{ curves: [{ mnemonic: 'DEPT', values: [1] }, { mnemonic: 'GR', values: [-999.25] }] }, 'would read back as null'],
    [{ curves: [{ mnemonic: 'DEPT', values: [1] }, { mnemonic: 'GR', values: [-999.2501], decimals: 2 }] }, 'would read back as null'],
    [{ curves: [{ mnemonic: 'DEPT', values: [1] }, { mnemonic: 'GR', values: [Infinity] }] }, 'LAS holds finite numbers only'],
    [{ curves: [{ mnemonic: 'DEPT', values: [1] }, { mnemonic: 'dept', values: [1] }] }, 'duplicate curve mnemonic'],
    [{ curves: [{ mnemonic: 'DE PT', values: [1] }] }, 'mnemonic "DE PT"'],
    [{ curves: [{ mnemonic: 'DEPT', unit: 'M M', values: [1] }] }, 'unit "M M" must not contain spaces'],
    [{ curves: [{ mnemonic: 'DEPT', description: 'a: b', values: [1] }] }, "must not contain ':'"],
    [{ curves: [{ mnemonic: 'DEPT', values: [1] }], other: 'ok\n~A' }, "other text line 2 must not start with '~'"],
    [{ curves: [{ mnemonic: 'DEPT', values: [1], decimals: 1.5 }] }, 'decimals of curve DEPT must be an integer 0..20'],
  ] as const)('writeLas(%j) throws a RangeError: %s', (input, message) => {
    expect(() => writeLas(input as never)).toThrow(RangeError);
    expect(() => writeLas(input as never)).toThrow(message);
  });
});
