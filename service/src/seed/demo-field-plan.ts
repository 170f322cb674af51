/**
 * What the demo seed loads into the Wrenmoor demo asset, as plain data and pure helpers (the
 * loading itself is in demo-field.seeder.ts). Every value here describes the invented demo
 * scenario; none is a check value.
 */
import { COMPARTMENTS, FORMATIONS, MODEL_CUTOFFS, modelTruth, WELLS, type Lithology } from '@poreline/demo-wells';
import { FORMATION_PALETTE } from '../formations/formation-palette.js';
import type { FormationLithology } from '../formations/lithologies.js';
import { parsePressureCsv, parseRateCsv } from '../production/production-csv.js';

/** A formation of the demo asset: name, Poreline palette colour, lithology (for its defaults), cutoffs. */
export interface DemoFormationPlan {
  name: string;
  colour: string;
  lithology: FormationLithology;
  cutoffs: { vshMax: number; phiMin: number; swMax: number; permMin: null };
}

/** Palette colour per demo formation (all from FORMATION_PALETTE; sands warm, shales cool). */
const COLOUR_OF: Record<string, string> = {
  'Greyling Shale': '#5d6d7e', // storm
  'Fenna Sand': '#c9a227', // ochre
  'Marrow Shale': '#6a7fb0', // slate blue
  'Wren Sand': '#d98c5f', // apricot
  'Tillet Shaly Sand': '#a3b86c', // moss
  'Corrie Limestone': '#4f9fa8', // lagoon
  'Pellow Shale': '#8c6bb1', // heather
};

/**
 * A formation's lithology offers its zones default parameters only (the seed stores the
 * model's own parameters for every zone). Poreline has no 'shale' lithology: the model's
 * shales are evaluated with Simandoux on a sandstone matrix, which is what 'shaly_sand' offers.
 */
const LITHOLOGY_OF: Record<Lithology, FormationLithology> = {
  sandstone: 'sandstone',
  shaly_sand: 'shaly_sand',
  shale: 'shaly_sand',
  limestone: 'limestone',
};

/** The demo formations, shallowest first, with the model's cutoffs. */
export function demoFormationPlan(): DemoFormationPlan[] {
  return FORMATIONS.map((f) => {
    const colour = COLOUR_OF[f.name] ?? FORMATION_PALETTE[0];
    const c = MODEL_CUTOFFS[f.name];
    return { name: f.name, colour, lithology: LITHOLOGY_OF[f.lithology], cutoffs: { vshMax: c.vshMax, phiMin: c.phiMin, swMax: c.swMax, permMin: null } };
  });
}

/** Feet per metre: 1 ft = 0.3048 m exactly (Thompson & Taylor 2008, NIST SP 811). */
const M_PER_FT = 0.3048;

/** A demo well as the wells API takes it; elevations in the well's depth unit (WM-5 logs in metres). */
export interface DemoWellPlan {
  name: string;
  uwi: string;
  depthUnit: 'ft' | 'm';
  kbElevation: number;
  groundElevation: number;
}

export function demoWellPlan(): DemoWellPlan[] {
  return WELLS.map((w) => {
    const depthUnit = w.delivery.kind === 'las2_metric' ? 'm' : 'ft';
    const toUnit = (ft: number) => (depthUnit === 'm' ? Math.round((ft * M_PER_FT) / 0.01) * 0.01 : Math.round(ft * 10) / 10);
    return { name: w.name, uwi: w.uwi, depthUnit, kbElevation: toUnit(w.groundElevationFt + w.kbHeightFt), groundElevation: toUnit(w.groundElevationFt) };
  });
}

/**
 * WM-4 was logged in two runs. The seed binds WM-4 to its second run, which covers the
 * reservoir section (Marrow Shale thin sand, Wren Sand and below); above it the merge splices
 * in the same curves from the first run (Greyling Shale, Fenna Sand), and each merged curve
 * names the runs it took samples from.
 */
export const BINDING_RUN_FILE: Readonly<Record<string, string>> = { 'WM-4': 'WM-4_run2.las' };

/** Where the seed leaves each well's interpretation, and the reviewer's comment. */
export interface DemoReviewPlan {
  status: 'approved' | 'returned' | 'draft';
  comment: string | null;
}

const APPROVED = 'Bindings, tops and zone parameters checked against the logs; net pay accepted for reserves work.';

export const REVIEW_PLAN: Readonly<Record<string, DemoReviewPlan>> = {
  'WM-1': { status: 'approved', comment: `${APPROVED} Fenna gas pay agrees with the production test.` },
  'WM-2': { status: 'approved', comment: APPROVED },
  'WM-3': { status: 'approved', comment: `${APPROVED} NPHI null run in the Greyling Shale does not touch a reservoir zone.` },
  'WM-4': { status: 'approved', comment: `${APPROVED} Run 2 (the reservoir section) spliced with run 1 above it.` },
  'WM-5': { status: 'approved', comment: `${APPROVED} Metric well: thicknesses read in metres.` },
  'WM-6': { status: 'returned', comment: 'The caliper shows a washout in the Pellow Shale: mark the bad-hole interval and check its density porosity before resubmitting.' },
  'WM-7': { status: 'approved', comment: `${APPROVED} Deviated well: TVD thickness from the survey checked.` },
  'WM-8': { status: 'approved', comment: `${APPROVED} Wren Sand below the oil-water contact: no pay, as expected for this dry hole.` },
  'WM-9': { status: 'approved', comment: APPROVED },
  'WM-10': { status: 'draft', comment: null },
};

/** The demo reserves case: Fenna Sand gas from the approved interpretations of WM-1 to WM-3. */
export const DEMO_CASE = {
  name: 'Fenna Sand gas – base case',
  formation: 'Fenna Sand',
  wells: ['WM-1', 'WM-2', 'WM-3'],
  /** Fixed Monte Carlo seed: the demo case gives the same P90/P50/P10 on every machine. */
  seed: 20240611,
  trials: 50_000,
  /** Recovery factor of a depletion-drive gas reservoir (common practice: 0.7 to 0.9). */
  recoveryFactor: 0.75,
} as const;

/**
 * Inputs of the demo case: the map area, pressure, temperature and gas gravity of the model's
 * Fenna gas accumulation (rounded as an engineer would enter them), Dranchuk & Abou-Kassem z,
 * and ranges for the Monte Carlo around them.
 */
export function demoCaseInputs(): Record<string, unknown> {
  const fenna = modelTruth().volumes.find((v) => v.accumulation === 'Fenna gas');
  const compartment = COMPARTMENTS.find((c) => c.name === 'Fenna');
  if (!fenna || !compartment) throw new RangeError('demoCaseInputs: the model has no Fenna gas accumulation');
  const area = Math.round(fenna.areaAcres);
  return {
    weighting: 'thickness',
    areaUnit: 'acre',
    lengthUnit: 'ft',
    area,
    fluid: 'gas',
    bo: null,
    gas: { pressurePsia: Math.round(fenna.pressurePsia), temperatureF: Math.round(fenna.temperatureF), gasGravity: compartment.gasGravity, zMethod: 'dak' },
    recoveryFactor: DEMO_CASE.recoveryFactor,
    trials: DEMO_CASE.trials,
    distributions: {
      area: { kind: 'triangular', min: Math.round(0.8 * area), mode: area, max: Math.round(1.15 * area) },
      recoveryFactor: { kind: 'uniform', min: 0.65, max: 0.85 },
    },
  };
}

/** A production series as POST .../production takes it (JSON entry). */
export interface DemoSeries {
  well: string;
  kind: 'pressure' | 'rate';
  fluid: 'gas' | 'oil';
  units: Record<string, string>;
  points: Record<string, number>[];
  label: string;
}

/** Reads a demo CSV with the same reader as the upload route; a problem is a bug in the demo data. */
function parsed<T>(what: string, r: { points: T[]; problems: { line: number | null; message: string }[] }): T[] {
  if (r.problems.length) throw new RangeError(`demoProductionSeries: ${what}: ${r.problems.map((p) => `line ${p.line}: ${p.message}`).join('; ')}`);
  return r.points;
}

/**
 * The demo production as series: WM-1 static pressures against cumulative gas (MMscf, psia),
 * WM-1 gas rate (Mscf/d) and WM-4 oil rate (STB/d) from the monthly CSV files.
 */
export function demoProductionSeries(files: { wm1Pressures: string; wm1Monthly: string; wm4Monthly: string }): DemoSeries[] {
  const pressures = parsed('WM-1_static_pressures.csv', parsePressureCsv(files.wm1Pressures));
  return [
    { well: 'WM-1', kind: 'pressure', fluid: 'gas', units: { cumGas: 'MMscf', pressure: 'psia' }, points: pressures, label: 'WM-1 static pressure surveys (Fenna Sand)' },
    { well: 'WM-1', kind: 'rate', fluid: 'gas', units: { time: 'day', rate: 'Mscf/d' }, points: parsed('WM-1_monthly.csv', parseRateCsv(files.wm1Monthly, 'gas')).map(({ t, rate }) => ({ t, rate })), label: 'WM-1 monthly gas rate (per producing day)' },
    { well: 'WM-4', kind: 'rate', fluid: 'oil', units: { time: 'day', rate: 'STB/d' }, points: parsed('WM-4_monthly.csv', parseRateCsv(files.wm4Monthly, 'oil')).map(({ t, rate }) => ({ t, rate })), label: 'WM-4 monthly oil rate (per producing day)' },
  ];
}
