import { checkSample } from './validate.js';

/** One well's summary for a formation (from an approved interpretation). */
export interface WellPayInput {
  /** Well name, carried into messages. */
  name?: string;
  /** Net pay thickness, ft (>= 0). */
  netPayFt: number;
  /** Mean porosity over the net pay, fraction. */
  porosity: number;
  /** Mean water saturation over the net pay (pore-volume weighted), fraction. */
  sw: number;
  /** Drainage area the engineer assigns to the well, acres (> 0); needed for 'area' weighting. */
  drainageAreaAcres?: number;
}

/** How per-well values are combined into one formation value. */
export type WellWeighting = 'arithmetic' | 'thickness' | 'area';

/** What each average is weighted by, per weighting (shown to the user next to the result). */
export const WELL_WEIGHTING_NOTES: Readonly<Record<WellWeighting, Readonly<{ netPay: string; porosity: string; sw: string }>>> =
  Object.freeze({
    arithmetic: { netPay: 'arithmetic mean', porosity: 'arithmetic mean', sw: 'arithmetic mean' },
    thickness: { netPay: 'arithmetic mean', porosity: 'weighted by net pay h', sw: 'weighted by pore thickness phi*h' },
    area: {
      netPay: 'weighted by drainage area A',
      porosity: 'weighted by A*h',
      sw: 'weighted by pore volume A*h*phi',
    },
  });

/** Result of {@link combineWellInputs}. */
export interface CombinedWellInputs {
  netPayFt: number;
  porosity: number;
  sw: number;
  weighting: WellWeighting;
  /** Sum of the drainage areas, acres ('area' weighting only, else NaN). */
  totalAreaAcres: number;
  /** Wells that entered the averages. */
  wellsUsed: number;
  /** Wells skipped because a needed value was NaN (missing). */
  wellsSkipped: number;
}

/**
 * Combines per-well net pay, porosity and Sw into formation values.
 *
 *   arithmetic: h = mean(h), phi = mean(phi), Sw = mean(Sw)
 *   thickness:  h = mean(h), phi = sum(h phi)/sum(h), Sw = sum(h phi Sw)/sum(h phi)
 *   area:       h = sum(A h)/sum(A), phi = sum(A h phi)/sum(A h), Sw = sum(A h phi Sw)/sum(A h phi)
 *
 * The thickness and area forms conserve pore volume and hydrocarbon pore volume: with area
 * weighting, sum(A) h phi (1 - Sw) equals sum(A_i h_i phi_i (1 - Sw_i)) exactly, which is why
 * porosity is weighted by h (bulk volume) and Sw by phi*h (pore volume). // common practice
 * (volume-weighted averaging; e.g. Craft & Hawkins 1991, ch. 3 on average porosity and Sw)
 *
 * Missing values: a well with NaN in a needed field is skipped and counted.
 *
 * @throws RangeError('combineWellInputs: ...') for an empty list, an unknown weighting, a value
 *   out of range, a missing drainage area with 'area' weighting, or zero total weight
 * @example combineWellInputs([{ netPayFt: 10, porosity: 0.2, sw: 0.3 }, { netPayFt: 30, porosity: 0.1, sw: 0.5 }], 'thickness')
 *   // { netPayFt: 20, porosity: 0.125, sw: 0.42, ... }
 */
export function combineWellInputs(wells: readonly WellPayInput[], weighting: WellWeighting): CombinedWellInputs {
  const fn = 'combineWellInputs';
  if (weighting !== 'arithmetic' && weighting !== 'thickness' && weighting !== 'area') {
    throw new RangeError(`${fn}: weighting must be 'arithmetic', 'thickness' or 'area' (got ${String(weighting)})`);
  }
  if (!Array.isArray(wells) || wells.length === 0) throw new RangeError(`${fn}: wells must be a non-empty array`);
  let n = 0;
  let skipped = 0;
  let sA = 0;
  let sH = 0;
  let sPhi = 0;
  let sSw = 0; // arithmetic sums
  let sAh = 0;
  let sAhPhi = 0;
  let sAhPhiSw = 0; // weighted sums (A = 1 unless area weighting)
  wells.forEach((w, i) => {
    const label = `wells[${i}]${w.name ? ` (${w.name})` : ''}`;
    checkSample(fn, `${label}.netPayFt`, w.netPayFt, 0, Number.MAX_VALUE);
    checkSample(fn, `${label}.porosity`, w.porosity, 0, 1);
    checkSample(fn, `${label}.sw`, w.sw, 0, 1);
    let a = 1;
    if (weighting === 'area') {
      if (w.drainageAreaAcres === undefined) throw new RangeError(`${fn}: ${label}.drainageAreaAcres is required for area weighting`);
      checkSample(fn, `${label}.drainageAreaAcres`, w.drainageAreaAcres, 0, Number.MAX_VALUE, true);
      a = w.drainageAreaAcres;
    }
    if (Number.isNaN(w.netPayFt) || Number.isNaN(w.porosity) || Number.isNaN(w.sw) || Number.isNaN(a)) {
      skipped++;
      return;
    }
    n++;
    sA += a;
    sH += w.netPayFt;
    sPhi += w.porosity;
    sSw += w.sw;
    const ah = a * w.netPayFt;
    sAh += ah;
    sAhPhi += ah * w.porosity;
    sAhPhiSw += ah * w.porosity * w.sw;
  });
  if (n === 0) throw new RangeError(`${fn}: no well has all values (all ${skipped} skipped as missing)`);
  if (weighting === 'arithmetic') {
    return { netPayFt: sH / n, porosity: sPhi / n, sw: sSw / n, weighting, totalAreaAcres: NaN, wellsUsed: n, wellsSkipped: skipped };
  }
  if (!(sAh > 0)) throw new RangeError(`${fn}: total net pay is 0, so ${weighting} weighting of porosity is undefined`);
  if (!(sAhPhi > 0)) throw new RangeError(`${fn}: total pore thickness is 0, so ${weighting} weighting of sw is undefined`);
  return {
    netPayFt: weighting === 'area' ? sAh / sA : sH / n,
    porosity: sAhPhi / sAh,
    sw: sAhPhiSw / sAhPhi,
    weighting,
    totalAreaAcres: weighting === 'area' ? sA : NaN,
    wellsUsed: n,
    wellsSkipped: skipped,
  };
}
