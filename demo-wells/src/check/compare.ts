/**
 * "Model vs evaluated": compares an evaluation of the demo field with the model's truth.
 *
 * Tolerances (the truth test's acceptance rules):
 * - net reservoir and net pay thickness (MD): within one sample step of the well's logs
 *   (0.5 ft, or 0.1 m for the metric well). With core's midpoint sample thickness each layer
 *   boundary inside a zone misplaces at most half a step, and the model's pay in any zone is
 *   one interval, so sampling alone stays inside one step;
 * - mean porosity over net pay: within 0.005 v/v; mean Sw over net pay: within 0.02 v/v
 *   (compared where the model has net pay);
 * - in-place volume of each accumulation: within 2% of the model's own.
 */
import { ACCUMULATIONS } from '../model/accumulations.js';
import { M_PER_FT } from '../model/constants.js';
import { modelTruth } from '../model/field.js';
import { type AccumulationVolume, accumulationVolume } from '../model/volumes.js';

/** The part of a zone summary the check reads (core's ZoneSummary fits it). */
export interface EvaluatedInterval {
  thickness: { md: number; tvd?: number | null };
  meanPhi: number | null;
  meanSw: number | null;
}
export interface EvaluatedZone {
  zone: string;
  netReservoir: EvaluatedInterval;
  netPay: EvaluatedInterval;
}
export interface EvaluatedWell {
  well: string;
  /** Depth unit of the zone thicknesses. */
  depthUnit: 'ft' | 'm';
  zones: readonly EvaluatedZone[];
}

export type ComparedQuantity = 'net reservoir' | 'net pay' | 'mean porosity' | 'mean Sw';

export interface ComparisonRow {
  well: string;
  zone: string;
  quantity: ComparedQuantity;
  /** 'ft' for thickness, 'v/v' for means. */
  unit: 'ft' | 'v/v';
  model: number;
  evaluated: number | null;
  tolerance: number;
  pass: boolean;
}

export const POROSITY_TOLERANCE = 0.005;
export const SW_TOLERANCE = 0.02;
export const VOLUME_TOLERANCE = 0.02;
/** Rounding slack on thickness comparisons, ft. */
const EPS = 1e-9;

function row(well: string, zone: string, quantity: ComparedQuantity, model: number, evaluated: number | null, tolerance: number): ComparisonRow {
  return {
    well,
    zone,
    quantity,
    unit: quantity === 'net reservoir' || quantity === 'net pay' ? 'ft' : 'v/v',
    model,
    evaluated,
    tolerance,
    pass: evaluated !== null && Number.isFinite(evaluated) && Math.abs(evaluated - model) <= tolerance + EPS,
  };
}

/**
 * Rows comparing evaluated zones with the model, for every evaluated zone whose well and
 * zone name (a formation, or a fluid zone such as "Wren Sand oil") the model knows; other
 * zones are skipped. Thickness rows are in ft whatever the well's unit.
 * @example compareWithModel([{ well: 'WM-1', depthUnit: 'ft', zones: evaluateWell(...).zones }]).every((r) => r.pass)
 */
export function compareWithModel(evaluated: readonly EvaluatedWell[]): ComparisonRow[] {
  const t = modelTruth();
  const out: ComparisonRow[] = [];
  for (const ew of evaluated) {
    const wt = t.wells.find((w) => w.name === ew.well);
    if (!wt) continue;
    const toFt = ew.depthUnit === 'm' ? 1 / M_PER_FT : 1;
    const stepFt = wt.column.sampling.unit === 'm' ? wt.column.sampling.step / M_PER_FT : wt.column.sampling.step;
    for (const ez of ew.zones) {
      const mz = [...wt.zones, ...wt.fluidZones].find((z) => z.zone === ez.zone);
      if (!mz) continue;
      out.push(row(ew.well, ez.zone, 'net reservoir', mz.netReservoir.md, ez.netReservoir.thickness.md * toFt, stepFt));
      out.push(row(ew.well, ez.zone, 'net pay', mz.netPay.md, ez.netPay.thickness.md * toFt, stepFt));
      if (mz.netPay.md > 0) {
        out.push(row(ew.well, ez.zone, 'mean porosity', mz.netPay.meanPhi!, ez.netPay.meanPhi, POROSITY_TOLERANCE));
        out.push(row(ew.well, ez.zone, 'mean Sw', mz.netPay.meanSw!, ez.netPay.meanSw, SW_TOLERANCE));
      }
    }
  }
  return out;
}

export interface VolumeComparisonRow {
  accumulation: string;
  fluid: 'gas' | 'oil';
  /** scf (gas) or STB (oil). */
  unit: 'scf' | 'STB';
  model: number;
  evaluated: number | null;
  /** (evaluated - model) / model. */
  relativeDifference: number | null;
  /** Relative tolerance (0.02). */
  tolerance: number;
  pass: boolean;
  modelVolume: AccumulationVolume;
  evaluatedVolume: AccumulationVolume | null;
  /** Wells the model counts in the accumulation that the evaluation did not cover. */
  missingWells: string[];
}

/**
 * In-place volume of every accumulation from evaluated FLUID zones (see fluidZones), against
 * the model's own, by the same volumetric function. Each accumulation uses the wells the
 * model has net pay in; a well's net pay is its TVD thickness when the evaluation had a
 * survey (thickness.tvd), else MD (vertical wells). An accumulation with a well missing from
 * `evaluated` gets evaluated = null and fails.
 */
export function compareVolumesWithModel(evaluated: readonly EvaluatedWell[]): VolumeComparisonRow[] {
  const t = modelTruth();
  return ACCUMULATIONS.map((a) => {
    const modelVolume = t.volumes.find((v) => v.accumulation === a.name)!;
    const inputs = [];
    const missingWells: string[] = [];
    for (const well of modelVolume.wells) {
      const ew = evaluated.find((e) => e.well === well);
      const ez = ew?.zones.find((z) => z.zone === a.zoneName);
      if (!ew || !ez || ez.netPay.meanPhi === null || ez.netPay.meanSw === null) {
        missingWells.push(well);
        continue;
      }
      const toFt = ew.depthUnit === 'm' ? 1 / M_PER_FT : 1;
      const h = ez.netPay.thickness.tvd ?? ez.netPay.thickness.md;
      inputs.push({ well, netPayTvdFt: h * toFt, meanPhi: ez.netPay.meanPhi, meanSw: ez.netPay.meanSw });
    }
    const evaluatedVolume = missingWells.length === 0 ? accumulationVolume(a, inputs) : null;
    const ev = evaluatedVolume ? evaluatedVolume.inPlace : null;
    const rel = ev === null ? null : (ev - modelVolume.inPlace) / modelVolume.inPlace;
    return {
      accumulation: a.name,
      fluid: a.fluid,
      unit: modelVolume.inPlaceUnit,
      model: modelVolume.inPlace,
      evaluated: ev,
      relativeDifference: rel,
      tolerance: VOLUME_TOLERANCE,
      pass: rel !== null && Math.abs(rel) <= VOLUME_TOLERANCE,
      modelVolume,
      evaluatedVolume,
      missingWells,
    };
  });
}
