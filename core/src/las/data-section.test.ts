// The byte scanner's number fast path must give exactly what Number() gives for the same text
// (the independent reference: ECMAScript's own StringToNumber), and the fast and general
// scanners must agree on any unwrapped file.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DiagnosticLog } from './errors.js';
import { scanDataFast, scanDataGeneral, type DataScanParams } from './data-section.js';
import { parseNumberText } from './number.js';

const enc = new TextEncoder();
const params = (nCurves: number, over: Partial<DataScanParams> = {}): DataScanParams => ({
  nCurves,
  nullValue: -999.25,
  nullAliases: [-9999],
  wrapped: false,
  delimiter: 'space',
  startLine: 1,
  log: new DiagnosticLog(),
  ...over,
});
const same = (a: number, b: number) => Object.is(a, b) || (Number.isNaN(a) && Number.isNaN(b));

const numberText = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((v) => String(v)),
  fc.tuple(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 12 })).map(([v, d]) => v.toFixed(d)),
  fc.tuple(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 1, max: 17 })).map(([v, d]) => v.toExponential(d - 1)),
  fc.stringMatching(/^[+-]?\d{1,25}(\.\d{0,25})?([eE][+-]?\d{1,3})?$/),
);

describe('scanDataFast', () => {
  it('scanDataFast parses every decimal exactly as Number() does (property)', () => {
    fc.assert(
      fc.property(fc.array(numberText, { minLength: 1, maxLength: 30 }), (tokens) => {
        const text = tokens.map((t) => `1 ${t}`).join('\n');
        const r = scanDataFast(enc.encode(text), 0, params(2, { nullAliases: [] }));
        expect(r.rows).toBe(tokens.length);
        tokens.forEach((t, k) => {
          let want = Number(t);
          if (want === -999.25 || !Number.isFinite(want)) want = Number.NaN;
          expect(same(r.columns[1][k], want), `${t} -> ${r.columns[1][k]} vs ${want}`).toBe(true);
        });
      }),
      { numRuns: 300 },
    );
  });

  it('scanDataFast and scanDataGeneral agree on values, rows and diagnostics (property)', () => {
    const token = fc.oneof(numberText, fc.constantFrom('-999.25', '-9999', 'abc', '1.#IND', '-', '.', '1e999', '1.5D+02'));
    const line = fc.oneof(fc.array(token, { minLength: 1, maxLength: 5 }).map((t) => t.join(' \t ')), fc.constantFrom('', '# c', '  # indented', 'some text', ' \t~X section'));
    const eol = fc.constantFrom('\n', '\r\n', '\r');
    fc.assert(
      fc.property(fc.array(fc.tuple(line, eol), { minLength: 1, maxLength: 20 }), fc.integer({ min: 1, max: 4 }), (lines, nc) => {
        const bytes = enc.encode(lines.map(([l, e]) => l + e).join('') + '~O\nnext section');
        const pf = params(nc);
        const pg = params(nc);
        const f = scanDataFast(bytes, 0, pf);
        const g = scanDataGeneral(bytes, 0, pg);
        expect(f.rows).toBe(g.rows);
        expect(f.end).toBe(g.end);
        expect(f.endLine).toBe(g.endLine);
        expect(f.mismatchedRows).toBe(g.mismatchedRows);
        expect(f.aliasNulls).toBe(g.aliasNulls);
        for (let c = 0; c < nc; c++) for (let r = 0; r < f.rows; r++) expect(same(f.columns[c][r], g.columns[c][r])).toBe(true);
        const strip = (l: DiagnosticLog) => l.finish().map((d) => `${d.severity}@${d.line}`);
        expect(strip(pf.log)).toEqual(strip(pg.log));
      }),
      { numRuns: 300 },
    );
  });

  it('scanDataFast grows its columns when rows get longer mid-section and matches scanDataGeneral', () => {
    // 100 short rows then 5000 long ones: the first size estimate is far too small.
    const lines = [
      ...Array.from({ length: 100 }, (_, r) => `${r} 1 2`),
      ...Array.from({ length: 5000 }, (_, r) => `${100 + r}.000000001 ${(r * 1.000001).toFixed(9)} ${(-r / 7).toExponential(12)}`),
    ];
    const bytes = enc.encode(lines.join('\n'));
    const f = scanDataFast(bytes, 0, params(3));
    const g = scanDataGeneral(bytes, 0, params(3));
    expect(f.rows).toBe(5100);
    for (let c = 0; c < 3; c++) expect(Array.from(f.columns[c])).toEqual(Array.from(g.columns[c]));
    expect(f.columns[1][5099]).toBe(Number((4999 * 1.000001).toFixed(9)));
  });

  it('scanDataFast stops at a line starting with ~ and reports where', () => {
    const r = scanDataFast(enc.encode('1 2\n3 4\n  ~Other\ntext'), 0, params(2));
    expect(r.rows).toBe(2);
    expect(r.end).toBe(8);
    expect(r.endLine).toBe(3);
  });
});

describe('parseNumberText', () => {
  it.each([
    ['-999.2500', -999.25],
    ['1.5D+02', 150],
    ['.5', 0.5],
    ['5.', 5],
    ['+3e2', 300],
  ])('parseNumberText(%j) = %d', (t, v) => expect(parseNumberText(t)).toBe(v));

  it.each(['', 'null', 'NaN', 'Infinity', '0x10', '1.#IND', '1e', '--1'])('parseNumberText(%j) is NaN', (t) => {
    expect(parseNumberText(t)).toBeNaN();
  });
});

describe('scanDataGeneral (wrapped)', () => {
  it('scanDataGeneral starts a new row at a lone index when a wrapped row is short', () => {
    const p = params(4, { wrapped: true });
    const r = scanDataGeneral(enc.encode('100\n1 2 3\n101\n4\n102\n6 7 8\n'), 0, p);
    expect(r.rows).toBe(3);
    expect(Array.from(r.columns[0])).toEqual([100, 101, 102]);
    expect(Array.from(r.columns[2])).toEqual([2, Number.NaN, 7]);
    expect(p.log.finish()).toHaveLength(1);
  });

  it('scanDataGeneral completes a wrapped row whose last line holds one value', () => {
    const r = scanDataGeneral(enc.encode('100\n1 2\n3\n101\n4 5\n6\n'), 0, params(4, { wrapped: true }));
    expect(Array.from(r.columns[3])).toEqual([3, 6]);
    expect(r.mismatchedRows).toBe(0);
  });
});
