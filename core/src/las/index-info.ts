/**
 * Index (depth or time) facts of a parsed LAS file: first and last value, direction, regular
 * step or null, and the checks of the data against STRT / STOP / STEP in ~Well.
 */
import type { DiagnosticLog } from './errors.js';
import type { LasDirection, LasIndexInfo } from './types.js';
import { depthUnitOf } from '../units/units.js';

/**
 * Relative tolerance for calling sampling regular: every spacing within 1 % of the mean
 * spacing. Printed depths are rounded (4 decimals typical), which moves a 0.1524 m spacing by
 * up to 0.0001 m (0.07 %); a log with real gaps moves it by a whole step or more.
 */
export const STEP_TOLERANCE = 0.01;

export interface IndexInput {
  mnemonic: string;
  unit: string;
  strtUnit: string;
  values: Float64Array;
  declared: LasIndexInfo['declared'];
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(10)));
}

/** Null rows and the order of the non-null values, in one pass. */
interface OrderScan {
  nulls: number;
  firstNullRow: number;
  up: number;
  down: number;
  flat: number;
  firstDisorderRow: number;
}

function scanOrder(values: Float64Array): OrderScan {
  let nulls = 0;
  let firstNullRow = -1;
  let up = 0;
  let down = 0;
  let flat = 0;
  let firstDisorderRow = -1;
  let prev = Number.NaN;
  for (let r = 0; r < values.length; r++) {
    const v = values[r];
    if (v !== v) {
      nulls++;
      if (firstNullRow < 0) firstNullRow = r;
      continue;
    }
    if (prev === prev) {
      if (v > prev) up++;
      else if (v < prev) down++;
      else flat++;
      if (firstDisorderRow < 0 && ((up > 0 && down > 0) || flat > 0)) firstDisorderRow = r;
    }
    prev = v;
  }
  return { nulls, firstNullRow, up, down, flat, firstDisorderRow };
}

/** Whether every spacing of `values` is within {@link STEP_TOLERANCE} of `mean`. */
function evenlySpaced(values: Float64Array, mean: number): boolean {
  const tol = Math.abs(mean) * STEP_TOLERANCE;
  for (let r = 1; r < values.length; r++) {
    if (Math.abs(values[r] - values[r - 1] - mean) > tol) return false;
  }
  return true;
}

/**
 * Computes {@link LasIndexInfo} and records disagreements with the header in `log`. The two
 * passes over the values are functions of their own, so that the optimizing compiler
 * compiles each loop whole instead of entering this function mid-loop on every call.
 */
export function indexInfo(input: IndexInput, log: DiagnosticLog): LasIndexInfo {
  const { values, declared } = input;
  const rows = values.length;
  const { nulls, firstNullRow, up, down, flat, firstDisorderRow } = scanOrder(values);
  if (nulls > 0) {
    log.add('error', null, `index ${input.mnemonic} is null on ${nulls} rows (first: row ${firstNullRow + 1}); those rows have no depth`);
  }
  let direction: LasDirection;
  if (up > 0 && down === 0 && flat === 0) direction = 'ascending';
  else if (down > 0 && up === 0 && flat === 0) direction = 'descending';
  else if (up === 0 && down === 0 && flat === 0) direction = declared.step !== null && declared.step < 0 ? 'descending' : 'ascending';
  else {
    direction = 'unordered';
    log.add('warning', null, `index ${input.mnemonic} is not monotonic (first at row ${firstDisorderRow + 1}, value ${fmt(values[firstDisorderRow])}); treat sampling as irregular`);
  }

  const start = rows > 0 ? values[0] : Number.NaN;
  const stop = rows > 0 ? values[rows - 1] : Number.NaN;
  let step: number | null = null;
  if (direction !== 'unordered' && nulls === 0 && rows >= 2) {
    const mean = (stop - start) / (rows - 1);
    if (evenlySpaced(values, mean)) {
      const d = declared.step;
      step = d !== null && d !== 0 && Math.abs(d - mean) <= Math.abs(mean) * STEP_TOLERANCE ? d : Number(mean.toPrecision(12));
      if (d === null || d === 0) {
        log.add('info', null, `STEP is ${d === null ? 'missing' : '0 (irregular)'} but the index is regularly spaced at ${fmt(step)}`);
      } else if (step !== d) {
        log.add('warning', null, `STEP ${fmt(d)} does not match the index spacing ${fmt(step)}; the index spacing is used`);
      }
    } else if (declared.step !== null && declared.step !== 0) {
      log.add('warning', null, `STEP ${fmt(declared.step)} is declared but the index is irregularly spaced; use the index values`);
    }
  }
  const half = step !== null ? Math.abs(step) / 2 : 0;
  const tol = (v: number) => Math.max(half, Math.abs(v) * 1e-9, 1e-9);
  if (declared.start !== null && start === start && Math.abs(declared.start - start) > tol(start)) {
    log.add('warning', null, `STRT ${fmt(declared.start)} differs from the first index value ${fmt(start)}`);
  }
  if (declared.stop !== null && stop === stop && Math.abs(declared.stop - stop) > tol(stop)) {
    log.add('warning', null, `STOP ${fmt(declared.stop)} differs from the last index value ${fmt(stop)}`);
  }
  const unit = input.unit !== '' ? input.unit : input.strtUnit;
  const curveDepth = depthUnitOf(input.unit);
  const strtDepth = depthUnitOf(input.strtUnit);
  if (curveDepth && strtDepth && curveDepth !== strtDepth) {
    log.add('warning', null, `index unit ${input.unit} and STRT unit ${input.strtUnit} disagree; the index curve's unit is used`);
  }
  return { mnemonic: input.mnemonic, unit, depthUnit: depthUnitOf(unit), start, stop, step, direction, declared };
}
