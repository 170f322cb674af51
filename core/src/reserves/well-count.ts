import { FT3_PER_ACRE_FT } from './units-constants.js';
import { checkSample } from './validate.js';

/** Assumptions behind a well count from drained volumes (shown with the result). */
export const WELL_COUNT_ASSUMPTIONS: readonly string[] = Object.freeze([
  'The producing well is representative: other wells will drain a similar volume (same rock quality, thickness and completion).',
  'The drained volume comes from boundary-dominated data: a straight p/z line (volumetric depletion, no water drive) or an established Arps decline.',
  'Wells are spaced so that their drainage volumes do not overlap and together cover the reservoir; no barriers leave volume undrained.',
  'The volumetric in-place estimate and the drained volume refer to the same reservoir and fluid, at the same standard conditions.',
  'The count is an engineering screen, not a development plan: economics, interference timing and facilities are not considered.',
]);

/** Result of {@link wellsNeeded}. */
export interface WellCount {
  /** In-place (or recoverable) volume of the reservoir divided by the volume one well drains. */
  ratio: number;
  /** Whole wells: ceil(ratio). */
  wells: number;
  assumptions: readonly string[];
}

/**
 * Number of wells needed to drain a reservoir: ceil(reservoir volume / volume one well drains),
 * e.g. volumetric OGIP over the gas in place one well drains from its p/z line, or recoverable
 * volume over one well's Arps EUR (use the same basis on both sides). // common practice
 *
 * @param reservoirVolume volumetric in-place (or recoverable) volume (> 0)
 * @param drainedPerWell volume one well drains (> 0), same unit
 * @throws RangeError('wellsNeeded: drainedPerWell must be in (0, ...]')
 * @example wellsNeeded(120e9, 35e9) // { ratio: 3.43, wells: 4, assumptions: [...] }
 */
export function wellsNeeded(reservoirVolume: number, drainedPerWell: number): WellCount {
  checkSample('wellsNeeded', 'reservoirVolume', reservoirVolume, 0, Number.MAX_VALUE, true);
  checkSample('wellsNeeded', 'drainedPerWell', drainedPerWell, 0, Number.MAX_VALUE, true);
  if (Number.isNaN(reservoirVolume) || Number.isNaN(drainedPerWell)) {
    throw new RangeError('wellsNeeded: reservoirVolume and drainedPerWell must be numbers (got NaN)');
  }
  const ratio = reservoirVolume / drainedPerWell;
  return { ratio, wells: Math.ceil(ratio - 1e-9), assumptions: WELL_COUNT_ASSUMPTIONS };
}

/**
 * Drainage area implied by the gas in place a well drains (inverse of the volumetric OGIP):
 *   A [acres] = G Bg / (43,560 h phi (1 - Sw))
 *
 * @param input.gasInPlaceScf drained gas in place, scf (> 0)
 * @param input.bg Bg at initial pressure, rcf/scf (> 0)
 * @throws RangeError naming the field
 * @example drainageAreaFromGas({ gasInPlaceScf: 25.1e9, bg: 0.005, netPayFt: 30, porosity: 0.2, sw: 0.25 }) // ~640
 */
export function drainageAreaFromGas(input: {
  gasInPlaceScf: number;
  bg: number;
  netPayFt: number;
  porosity: number;
  sw: number;
}): number {
  const fn = 'drainageAreaFromGas';
  checkSample(fn, 'gasInPlaceScf', input.gasInPlaceScf, 0, Number.MAX_VALUE, true);
  checkSample(fn, 'bg', input.bg, 0, Number.MAX_VALUE, true);
  checkSample(fn, 'netPayFt', input.netPayFt, 0, Number.MAX_VALUE, true);
  checkSample(fn, 'porosity', input.porosity, 0, 1, true);
  checkSample(fn, 'sw', input.sw, 0, 1);
  if (input.sw === 1) throw new RangeError(`${fn}: sw must be < 1`);
  return (input.gasInPlaceScf * input.bg) / (FT3_PER_ACRE_FT * input.netPayFt * input.porosity * (1 - input.sw));
}
