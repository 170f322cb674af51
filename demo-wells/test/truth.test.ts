/**
 * The truth test at core level: the committed demo LAS files, read with core's readLas,
 * bound and normalised by core's curve recognition, evaluated with core's evaluateWell and
 * the model's zone parameters and cutoffs, must recover the earth model they were generated
 * from (compare.ts states the tolerances and why sampling alone stays inside them).
 * Expected values come from the model itself (integrated exactly over its layers), never
 * from the evaluation.
 */
import { describe, it, expect } from 'vitest';
import { readLas } from '@poreline/core';
import { evaluateDemoWell, type DemoWellFiles } from '../src/check/evaluate-demo.js';
import { compareVolumesWithModel, compareWithModel, type EvaluatedWell } from '../src/check/compare.js';
import { demoFileEntries } from '../src/files.js';
import { readDemoFile, readDemoText } from '../src/load.js';
import { modelTruth } from '../src/model/field.js';
import { WELLS } from '../src/model/wells.js';

function wellFiles(wellName: string): DemoWellFiles {
  const entries = demoFileEntries().filter((e) => e.wellName === wellName);
  const survey = entries.find((e) => e.kind === 'survey');
  return {
    wellName,
    las: entries.filter((e) => e.kind === 'las').map((e) => readLas(readDemoFile(e.path))),
    topsCsv: readDemoText('tops.csv'),
    surveyCsv: survey ? readDemoText(survey.path) : undefined,
  };
}

const formationRuns: EvaluatedWell[] = [];
const fluidRuns: EvaluatedWell[] = [];
for (const w of WELLS) {
  const files = wellFiles(w.name);
  const r = evaluateDemoWell(files, 'formations');
  formationRuns.push({ well: w.name, depthUnit: r.log.depthUnit, zones: r.zones });
  if (modelTruth().wells.find((m) => m.name === w.name)!.fluidZones.length > 0) {
    const f = evaluateDemoWell(files, 'fluids');
    fluidRuns.push({ well: w.name, depthUnit: f.log.depthUnit, zones: f.zones });
  }
}
const failures = (rows: { pass: boolean }[]) => rows.filter((r) => !r.pass);

describe('demo field truth test (core readLas + evaluateWell)', () => {
  it('evaluates every formation zone of every well', () => {
    // 10 wells x 7 formations; the model's zones per well come from its tops.
    expect(formationRuns).toHaveLength(10);
    for (const r of formationRuns) expect(r.zones.map((z) => z.zone)).toEqual(modelTruth().wells.find((w) => w.name === r.well)!.zones.map((z) => z.zone));
  });

  it('per zone: net reservoir and net pay within one sample step, mean porosity within 0.005, mean Sw within 0.02', () => {
    const rows = compareWithModel(formationRuns);
    const payZones = modelTruth().wells.flatMap((w) => w.zones).filter((z) => z.netPay.md > 0).length;
    // 2 thickness rows per zone, 2 mean rows per zone with model pay: the check cannot pass empty.
    expect(rows).toHaveLength(2 * 70 + 2 * payZones);
    expect(payZones).toBeGreaterThanOrEqual(20);
    expect(failures(rows)).toEqual([]);
  });

  it('per fluid zone (formations cut at the contacts): same tolerances', () => {
    const rows = compareWithModel(fluidRuns);
    expect(rows.length).toBeGreaterThan(60);
    expect(failures(rows)).toEqual([]);
  });

  it('in-place volumes from the evaluated fluid zones are within 2% of the model volumes', () => {
    const rows = compareVolumesWithModel(fluidRuns);
    expect(rows.map((r) => r.accumulation)).toEqual(['Fenna gas', 'Marrow thin-sand oil', 'Wren gas cap', 'Wren oil leg', 'Tillet oil leg']);
    for (const r of rows) {
      expect(r.missingWells, r.accumulation).toEqual([]);
      expect(Math.abs(r.relativeDifference!), r.accumulation).toBeLessThanOrEqual(0.02);
    }
  });

  it('the deviated well WM-7 reports TVD net pay through its survey (hold at 35 degrees)', () => {
    const z = fluidRuns.find((r) => r.well === 'WM-7')!.zones.find((k) => k.zone === 'Wren Sand oil')!;
    // Straight hold section at 35 degrees: TVD = MD cos 35 (geometry), within rounding of the survey MDs.
    expect(z.netPay.thickness.tvd!).toBeCloseTo(z.netPay.thickness.md * Math.cos((35 * Math.PI) / 180), 2);
  });
});
