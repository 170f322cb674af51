import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateDemoField } from '../src/generate.js';

const DATA = fileURLToPath(new URL('../data/', import.meta.url));

function listFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? listFiles(p) : [relative(DATA, p).split(sep).join('/')];
  });
}

describe('generateDemoField', () => {
  const files = generateDemoField();

  it('generateDemoField() reproduces every committed file in data/ byte for byte', () => {
    // The committed files are the reference: written by scripts/generate.ts from the same seed.
    for (const f of files) {
      const committed = readFileSync(join(DATA, ...f.path.split('/')));
      expect(Buffer.from(f.content, 'utf8').equals(committed), `data/${f.path} differs from the generator output`).toBe(true);
    }
  });

  it('data/ holds exactly the generated files and stays small', () => {
    expect(listFiles(DATA).sort()).toEqual(files.map((f) => f.path).sort());
    const bytes = files.reduce((s, f) => s + Buffer.byteLength(f.content), 0);
    expect(bytes).toBeLessThan(3e6); // the issue asks for a few MB at most
  });

  it('writes the special cases the loader must handle', () => {
    const text = (p: string) => files.find((f) => f.path === p)!.content;
    expect(text('las/WM-5.las')).toMatch(/^ STRT\.M\s/m); // metric depths
    expect(text('las/WM-6.las')).toMatch(/^ WRAP\.\s+YES/m); // wrapped
    expect(text('las/WM-9.las')).toMatch(/^ VERS\.\s+3\.0/m); // LAS 3.0
    expect(text('las/WM-9.las')).toMatch(/^ DLM\.\s+COMMA/m);
    expect(files.filter((f) => f.wellName === 'WM-4' && f.kind === 'las')).toHaveLength(2); // two runs
    expect(text('surveys/WM-7_survey.csv').split('\n')[0]).toBe('md_ft,inclination_deg,azimuth_deg');
    expect(text('las/WM-3.las')).toContain('-999.25'); // a null run
  });
});
