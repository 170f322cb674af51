// The small LAS corpus (test/las-corpus): invented wells, one file per edge case. Each
// expected value below is read off the file itself (the numbers written in its ~A and ~Well
// lines), so every check is independent of the reader.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { LasParseError, readLas, type LasFile } from '../../src/index.js';

const dir = new URL('../las-corpus/', import.meta.url);
const bytes = (name: string) => new Uint8Array(readFileSync(new URL(name, dir)));
const read = (name: string) => readLas(bytes(name));
const values = (f: LasFile, mnemonic: string) => {
  const c = f.curves.find((x) => x.mnemonic === mnemonic);
  if (!c) throw new Error(`no curve ${mnemonic}`);
  return Array.from(c.values);
};
const well = (f: LasFile, mnemonic: string) => f.sections.well.find((i) => i.mnemonic.toUpperCase() === mnemonic);
const messages = (f: LasFile) => f.diagnostics.map((d) => d.message).join('\n');

/** The three-row file most line-ending and encoding variants share (DEPT 100..101, GR 10.5..12.5). */
function expectBaseRows(f: LasFile) {
  expect(f.curves.map((c) => c.mnemonic)).toEqual(['DEPT', 'GR']);
  expect(values(f, 'DEPT')).toEqual([100, 100.5, 101]);
  expect(values(f, 'GR')).toEqual([10.5, 11.5, 12.5]);
  expect(f.index.step).toBe(0.5);
}

describe('readLas on the corpus', () => {
  it('readLas(v20-basic) reads header items, curves, NULL as NaN and the index', () => {
    const f = read('v20-basic.las');
    expect(f.version).toBe('2.0');
    expect(f.wrapped).toBe(false);
    expect(well(f, 'WELL')).toMatchObject({ value: 'KESTREL 7-14', description: 'WELL', line: 11 });
    expect(well(f, 'STRT')).toMatchObject({ unit: 'FT', value: '1500.0000' });
    expect(f.curves.map((c) => `${c.mnemonic}.${c.unit}`)).toEqual(['DEPT.FT', 'GR.GAPI', 'RHOB.G/CC', 'NPHI.V/V', 'ILD.OHMM']);
    expect(values(f, 'GR')).toEqual([45.21, 48, Number.NaN, 88.75, 92.1]);
    expect(values(f, 'RHOB')).toEqual([2.45, 2.47, 2.51, 2.6, Number.NaN]);
    expect(values(f, 'ILD')).toEqual([12.5, 11.25, Number.NaN, 3.125, 2.9]);
    expect(f.sections.parameters.map((p) => [p.mnemonic, p.unit, p.value])).toEqual([['BHT', 'DEGF', '156.0'], ['RMF', 'OHMM', '0.082']]);
    expect(f.index).toMatchObject({ mnemonic: 'DEPT', unit: 'FT', depthUnit: 'ft', start: 1500, stop: 1502, step: 0.5, direction: 'ascending' });
    expect(f.rowCount).toBe(5);
    expect(f.nullValue).toBe(-999.25);
    expect(f.diagnostics).toEqual([]);
  });

  it('readLas(v12-swapped-well) takes LAS 1.2 ~Well values from after the colon', () => {
    const f = read('v12-swapped-well.las');
    expect(f.version).toBe('1.2');
    expect(well(f, 'COMP')).toMatchObject({ value: 'HERON RIDGE EXPLORATION', description: 'COMPANY' });
    expect(well(f, 'WELL')?.value).toBe('HERON RIDGE 3-22');
    expect(well(f, 'STRT')?.value).toBe('820.0000'); // STRT/STOP/STEP/NULL are never swapped
    expect(f.curves[1]).toMatchObject({ mnemonic: 'DT', unit: 'US/M', apiCode: '60 520 32 00', description: '2  SONIC TRANSIT TIME' });
    expect(values(f, 'SP')).toEqual([-42.5, -44, -47.25]);
    expect(f.index).toMatchObject({ depthUnit: 'm', step: -0.5, direction: 'descending' });
  });

  it('readLas(v20-wrapped) assembles rows spread over three lines', () => {
    const f = read('v20-wrapped.las');
    expect(f.wrapped).toBe(true);
    expect(values(f, 'DEPT')).toEqual([910, 910.25, 910.5]);
    expect(values(f, 'NPHI')).toEqual([0.28, Number.NaN, 0.27]);
    expect(values(f, 'CALI')).toEqual([8.5, 8.52, 8.6]);
    expect(f.diagnostics).toEqual([]);
  });

  it('readLas(v30-comma) reads LAS 3.0 log sections, DLM COMMA, formats and other groups', () => {
    const f = read('v30-comma.las');
    expect(f.version).toBe('3.0');
    expect(f.delimiter).toBe('comma');
    expect(values(f, 'RHOB')).toEqual([2450, Number.NaN, 2480]);
    expect(values(f, 'GR')).toEqual([55.1, 57.3, Number.NaN]); // empty field between commas
    expect(messages(f)).toContain('line 23: 1 empty field read as null');
    expect(well(f, 'DATE')).toMatchObject({ value: '2021-06-04 09:15:00', description: 'Log date', format: 'YYYY-MM-DD hh:mm:ss' });
    expect(f.sections.parameters[1]).toMatchObject({ mnemonic: 'RMF', value: '0.120', format: 'F', association: 'Run[1]' });
    expect(f.sections.extra.map((s) => s.name)).toEqual(['Tops_Definition', 'Tops_Data | Tops_Definition']);
    expect(f.index.step).toBe(0.15);
  });

  it('readLas(v30-space-formats) reads the 2.0 section names in a 3.0 file and {hh:mm:ss} formats', () => {
    const f = read('v30-space-formats.las');
    expect(f.version).toBe('3.0');
    expect(well(f, 'TIME')).toMatchObject({ value: '09:15:00', description: 'Time on bottom', format: 'hh:mm:ss' });
    expect(f.curves[1]).toMatchObject({ mnemonic: 'ILD', description: 'Deep induction resistivity', });
    expect(f.sections.curves[1]).toMatchObject({ format: 'E0.00', association: 'Run[1]' });
    expect(values(f, 'PEF')).toEqual([2.81, 2.79, 2.75]);
  });

  it('readLas(metres-descending) reports metres and a negative step', () => {
    const f = read('metres-descending.las');
    expect(f.index).toMatchObject({ mnemonic: 'DEPTH', depthUnit: 'm', start: 1005, stop: 1004, step: -0.5, direction: 'descending' });
  });

  it('readLas(irregular-step0) gives step null and keeps the index column', () => {
    const f = read('irregular-step0.las');
    expect(f.index.step).toBeNull();
    expect(f.index.declared.step).toBe(0);
    expect(values(f, 'DEPT')).toEqual([2000, 2000.4, 2001.9, 2004.7]);
  });

  it('readLas(step-missing) derives the step from regular data and says so', () => {
    const f = read('step-missing.las');
    expect(f.index.declared.step).toBeNull();
    expect(f.index.step).toBe(0.5);
    expect(f.diagnostics).toEqual([{ severity: 'info', line: null, message: 'STEP is missing but the index is regularly spaced at 0.5' }]);
  });

  it.each(['crlf.las', 'cr-only.las', 'mixed-endings.las'])('readLas(%s) reads any line ending and numbers lines alike', (name) => {
    const f = read(name);
    expectBaseRows(f);
    expect(well(f, 'WELL')?.line).toBe(9);
    expect(f.curves[1].line).toBe(12);
    expect(f.diagnostics).toEqual([]);
  });

  it('readLas(bom-utf8) skips the BOM and decodes UTF-8', () => {
    const f = read('bom-utf8.las');
    expect(f.encoding).toBe('utf-8');
    expect(f.sections.version[0].mnemonic).toBe('VERS');
    expect(well(f, 'WELL')?.value).toBe('GRÈBE 4 (Ærø)');
    expectBaseRows(f);
  });

  it('readLas(latin1) falls back to Latin-1 with an info diagnostic', () => {
    const f = read('latin1.las');
    expect(f.encoding).toBe('latin-1');
    expect(well(f, 'WELL')?.value).toBe('GRÈBE 5 SÜD');
    expect(f.diagnostics.map((d) => d.severity)).toEqual(['info']);
    expectBaseRows(f);
  });

  it('readLas(tabs-trailing-spaces) treats tabs as spaces and trims', () => {
    const f = read('tabs-trailing-spaces.las');
    expect(well(f, 'WELL')).toMatchObject({ value: 'CURLEW 6 TABS', description: 'well' });
    expectBaseRows(f);
    expect(f.diagnostics).toEqual([]);
  });

  it('readLas(comments-blank-lines) skips comments and blank lines everywhere', () => {
    const f = read('comments-blank-lines.las');
    expectBaseRows(f);
    expect(well(f, 'STOP')?.line).toBe(13);
    expect(f.diagnostics).toEqual([]);
  });

  it('readLas(lowercase-sections) accepts ~v ~w ~c ~a', () => {
    const f = read('lowercase-sections.las');
    expect(f.curves.map((c) => c.mnemonic)).toEqual(['dept', 'gr']);
    expect(values(f, 'gr')).toEqual([10.5, 11.5, 12.5]);
    expect(f.index).toMatchObject({ depthUnit: 'ft', step: 0.5 });
  });

  it('readLas(duplicate-mnemonics) keeps both curves and suffixes the second', () => {
    const f = read('duplicate-mnemonics.las');
    expect(f.curves.map((c) => [c.mnemonic, c.originalMnemonic])).toEqual([['DEPT', 'DEPT'], ['GR', 'GR'], ['GR_2', 'GR'], ['RHOB', 'RHOB']]);
    expect(values(f, 'GR')).toEqual([40, 41]);
    expect(values(f, 'GR_2')).toEqual([42, 43]);
    expect(f.diagnostics).toEqual([{ severity: 'warning', line: 13, message: 'line 13: curve GR is defined twice; the second is named GR_2' }]);
  });

  it('readLas(null-spellings) reads -999.25, -999.2500, -999.250000 and -9999 as null', () => {
    const f = read('null-spellings.las');
    expect(values(f, 'GR').every(Number.isNaN)).toBe(true);
    expect(values(f, 'NPHI')).toEqual([0.2, 0.21, Number.NaN, 0.23]);
    expect(messages(f)).toContain('2 values spelled -9999 were read as null');
  });

  it('readLas(null-header-custom) uses the header NULL -1e30 in any spelling', () => {
    const f = read('null-header-custom.las');
    expect(f.nullValue).toBe(-1e30);
    expect(values(f, 'GR').every(Number.isNaN)).toBe(true);
  });

  it('readLas(null-spellings, { nullAliases: [] }) keeps -9999 as a number', () => {
    const f = readLas(bytes('null-spellings.las'), { nullAliases: [] });
    expect(values(f, 'NPHI')).toEqual([0.2, 0.21, -9999, 0.23]);
  });

  it('readLas(non-numeric-tokens) reads bad tokens as null with a warning naming the line', () => {
    const f = read('non-numeric-tokens.las');
    expect(values(f, 'GR')).toEqual([Number.NaN, 45, 46]);
    expect(values(f, 'RHOB')).toEqual([2.4, Number.NaN, 2.42]);
    expect(f.diagnostics).toEqual([
      { severity: 'warning', line: 15, message: 'line 15: "N/A" is not a number; read as null' },
      { severity: 'warning', line: 16, message: 'line 16: "1.#IND" is not a number; read as null' },
    ]);
  });

  it('readLas(short-long-rows) pads short rows, drops extras, and names both lines', () => {
    const f = read('short-long-rows.las');
    expect(values(f, 'RHOB')).toEqual([2.4, Number.NaN, 2.42, 2.43]);
    expect(values(f, 'GR')).toEqual([40, 41, 42, 43]);
    expect(f.diagnostics.map((d) => [d.severity, d.line])).toEqual([['error', 16], ['error', 17]]);
  });

  it('readLas(text-after-data) ignores trailing text with one warning', () => {
    const f = read('text-after-data.las');
    expect(values(f, 'GR')).toEqual([40, 41]);
    expect(f.diagnostics).toHaveLength(1);
    expect(f.diagnostics[0]).toMatchObject({ severity: 'warning', line: 16 });
  });

  it('readLas(other-block) keeps ~Other text, before and after the data', () => {
    const f = read('other-block.las');
    expect(f.sections.other).toBe('Tool stuck at 100.2 ft on the first pass.\n  Second pass logged up from TD.\nRemarks written after the data by a careless exporter.');
    expect(f.sections.parameters[1]).toMatchObject({ mnemonic: 'MUD', unit: '', value: 'WATER BASED' });
    expect(values(f, 'GR')).toEqual([40, 41]);
  });

  it('readLas(units-dots-colons) splits units with dots and slashes, empty units and colons in values', () => {
    const f = read('units-dots-colons.las');
    expect(f.curves.map((c) => c.unit)).toEqual(['M', 'OHM.M', 'G/CM3', 'US/M', '0.1IN', '']);
    expect(well(f, 'DATE')).toMatchObject({ unit: '', value: '2019-03-12 10:30:00', description: 'Log date and time' });
    expect(well(f, 'TIME')).toMatchObject({ unit: 'HH:MM', value: '14:45', description: 'Time logger on bottom' });
    expect(well(f, 'RUN')).toMatchObject({ unit: '', value: '', description: 'run number (empty value)' });
    expect(values(f, 'FLAG')).toEqual([1, 0]);
  });

  it('readLas(wrap-mislabelled) reads wrapped data declared WRAP NO, with a warning', () => {
    const f = read('wrap-mislabelled.las');
    expect(f.wrapped).toBe(true);
    expect(values(f, 'NPHI')).toEqual([0.2, 0.21]);
    expect(messages(f)).toContain('WRAP is NO but the data is wrapped');
  });

  it('readLas(data-before-curves) reads data placed before ~Curve, with a warning', () => {
    const f = read('data-before-curves.las');
    expect(values(f, 'GR')).toEqual([40, 41]);
    expect(f.diagnostics[0]).toMatchObject({ severity: 'warning', line: 4 });
  });

  it.each([
    ['empty.las', 'empty', null],
    ['blank-only.las', 'empty', null],
    ['binary.las', 'binary', null],
    ['no-sections.las', 'not_las', null],
    ['no-data-section.las', 'no_data_section', null],
    ['no-curves.las', 'no_curves', 10],
    ['no-data-rows.las', 'no_data_rows', 13],
    ['curve-count-mismatch.las', 'curve_count_mismatch', 14],
  ] as const)('readLas(%s) refuses with kind %s and line %s', (name, kind, line) => {
    let caught: unknown;
    try {
      read(name);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(LasParseError);
    expect(caught).toMatchObject({ kind, line });
    expect((caught as Error).message.length).toBeGreaterThan(20);
  });

  it('readLas(curve-count-mismatch) names both counts in its message', () => {
    expect(() => read('curve-count-mismatch.las')).toThrow('~Curve defines 2 curves but 3 of 3 data rows have another number of values (first: line 14 has 4)');
  });

  it('readLas(v20-basic, { maxBytes }) refuses a file over the limit, bytes or string', () => {
    const b = bytes('v20-basic.las');
    expect(() => readLas(b, { maxBytes: 100 })).toThrow(expect.objectContaining({ kind: 'too_large' }));
    expect(() => readLas(new TextDecoder().decode(b), { maxBytes: 100 })).toThrow(LasParseError);
    expect(readLas(b, { maxBytes: b.length }).rowCount).toBe(5);
  });

  it('readLas(string) reads the same file as readLas(bytes)', () => {
    const b = bytes('v20-basic.las');
    const s = readLas(new TextDecoder().decode(b));
    expect(values(s, 'GR')).toEqual(values(readLas(b), 'GR'));
  });
});
