import type { CurveClass } from '@poreline/core';

/**
 * Plausible value ranges per curve class, in the class's canonical unit (core's CURVE_CLASSES).
 * A sample outside is worth a look (bad calibration, a wrong unit, a tool reading casing or
 * air), not necessarily wrong. All are common practice screening limits, deliberately wide;
 * the anchors beside them are from memory: Asquith, G., Krygowski, D. (2004) Basic Well Log
 * Analysis, 2nd ed., AAPG, matrix and fluid tables (dolomite matrix 43.5 us/ft, fresh water
 * 189 us/ft and 1.0 g/cm3; anhydrite 2.98 g/cm3).
 */
export const EXPECTED_RANGES: Readonly<Record<CurveClass, { min: number; max: number }>> = {
  gamma_ray: { min: 0, max: 500 }, // gAPI; common practice (hot shales stay below a few hundred)
  spontaneous_potential: { min: -500, max: 500 }, // mV; common practice (baseline is arbitrary, only wild values flagged)
  caliper: { min: 2, max: 40 }, // in; common practice (slim hole to large washout)
  bulk_density: { min: 1.0, max: 3.2 }, // g/cm3; water 1.0 up to anhydrite 2.98 plus margin (from memory, A&K 2004)
  neutron_porosity: { min: -0.15, max: 1.0 }, // v/v; common practice (slightly negative on dense minerals)
  sonic: { min: 40, max: 250 }, // us/ft; dolomite matrix 43.5 to fluid 189 plus margin (from memory, A&K 2004)
  photoelectric: { min: 0, max: 20 }, // b/e; common practice (barite mud reads far higher and is flagged)
  deep_resistivity: { min: 0.01, max: 100_000 }, // ohm.m; common practice
  medium_resistivity: { min: 0.01, max: 100_000 }, // ohm.m; common practice
  shallow_resistivity: { min: 0.01, max: 100_000 }, // ohm.m; common practice
};
