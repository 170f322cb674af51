import { describe, it, expect } from 'vitest';
import { createHash } from 'node:crypto';
import { demoFieldFiles, demoSurvey, demoTops } from '../src/load.js';
import { generateDemoField } from '../src/generate.js';

describe('load', () => {
  it('demoFieldFiles() gives the 11 LAS files of the 10 wells with their bytes', () => {
    const files = demoFieldFiles();
    expect(files).toHaveLength(11);
    expect(new Set(files.map((f) => f.wellName)).size).toBe(10);
    const gen = new Map(generateDemoField().map((g) => [g.path, g.content]));
    for (const f of files) {
      const sha = (b: Uint8Array | string) => createHash('sha256').update(b).digest('hex');
      expect(sha(f.bytes)).toBe(sha(gen.get(f.fileName)!));
    }
  });

  it('demoTops() has 7 tops per well in depth order, and demoSurvey() only for WM-7', () => {
    const tops = demoTops();
    expect(tops).toHaveLength(70);
    const wm5 = tops.filter((t) => t.well === 'WM-5');
    expect(wm5.every((t) => t.depthUnit === 'm')).toBe(true);
    expect(wm5.map((t) => t.topMd)).toEqual([...wm5.map((t) => t.topMd)].sort((a, b) => a - b));
    expect(demoSurvey('WM-1')).toBeNull();
    expect(demoSurvey('WM-7')![0]).toEqual({ md: 0, inc: 0, azi: 40 });
  });
});
