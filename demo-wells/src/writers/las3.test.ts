import { describe, it, expect } from 'vitest';
import { readLas } from '@poreline/core';
import { writeLas3 } from './las3.js';

const input = () => ({
  well: [
    { mnemonic: 'WELL', value: 'WM-TEST', description: 'Well' },
    { mnemonic: 'DATE', value: '2021-08-04', description: 'Log date', format: 'YYYY-MM-DD' },
  ],
  parameters: [{ mnemonic: 'BS', unit: 'IN', value: '8.5', description: 'Bit size', format: 'F' }],
  log: [
    { mnemonic: 'DEPT', unit: 'FT', description: 'Measured depth', decimals: 2, values: [5000, 5000.5, 5001] },
    { mnemonic: 'GR', unit: 'GAPI', description: 'Gamma ray', decimals: 2, values: [45.123, NaN, 60] },
  ],
  groups: [
    {
      name: 'Tops',
      columns: [
        { mnemonic: 'TOPT', unit: 'FT', description: 'Top depth', decimals: 2, values: [5000.25] },
        { mnemonic: 'TOPN', unit: '', description: 'Formation name', values: ['Wren Sand'] },
      ],
    },
  ],
});

describe('writeLas3', () => {
  it("writeLas3 output reads back with core's readLas as LAS 3.0, comma-delimited, nulls as NaN", () => {
    const text = writeLas3(input());
    const las = readLas(text);
    expect(las.version).toBe('3.0');
    expect(las.delimiter).toBe('comma');
    expect(las.diagnostics).toEqual([]);
    expect(Array.from(las.curves[0].values)).toEqual([5000, 5000.5, 5001]);
    expect(las.curves[1].values[0]).toBeCloseTo(45.12, 10); // written with 2 decimals
    expect(Number.isNaN(las.curves[1].values[1])).toBe(true);
    expect(las.index.step).toBe(0.5);
    // The Tops group is a LAS 3.0 group other than Log: kept as text.
    expect(las.sections.extra.map((s) => s.name)).toEqual(['Tops_Definition', 'Tops | Tops_Definition']);
    expect(text).toContain('~Log_Data | Log_Definition\n5000.00,45.12\n5000.50,-999.25\n5001.00,60.00\n');
    expect(text).toMatch(/^ DATE\.\s+2021-08-04 : Log date \{YYYY-MM-DD\}$/m);
  });

  it('writeLas3 refuses a header value holding a delimiter and a short index', () => {
    const bad = input();
    bad.well[0].value = 'WM,TEST';
    expect(() => writeLas3(bad)).toThrow("writeLas3: value of WELL must not contain ':', '{', '}', '|' or ','");
    const short = input();
    short.log[0].values = [5000];
    short.log[1].values = [1];
    expect(() => writeLas3(short)).toThrow('writeLas3: the log needs an index column with at least 2 samples');
  });
});
