/** Result of {@link fitPZ}. */
export interface PZFit {
  /** Fitted p/z at Gp = 0 (initial p/z), psia. */
  intercept: number;
  /** Fitted slope d(p/z)/dGp, psia per unit of Gp (< 0). */
  slope: number;
  /** Gas in place drained: Gp where the fitted p/z reaches 0, -intercept/slope (Gp units). */
  gasInPlace: number;
  /** Coefficient of determination of p/z on Gp. */
  rSquared: number;
  /** Points used. */
  n: number;
  /** Points skipped because a value was NaN. */
  skipped: number;
  /** p/z of each point used, in input order. */
  pz: Float64Array;
  /** Plain statement of the method, for display. */
  method: string;
}

/** p/z data as p/z values or as pressure and z. */
export type PZInput =
  | { gp: Float64Array | readonly number[]; pz: Float64Array | readonly number[] }
  | { gp: Float64Array | readonly number[]; pressurePsia: Float64Array | readonly number[]; z: Float64Array | readonly number[] };

/** Text naming the regression direction and the model's assumptions. */
export const PZ_METHOD =
  'Straight line p/z = (pi/zi)(1 - Gp/G) fitted by ordinary least squares of p/z on cumulative gas Gp ' +
  '(Gp is the independent variable; p/z carries the pressure error); G is the Gp at which the line reaches p/z = 0. ' +
  'Valid for a volumetric dry-gas reservoir: no water influx, negligible rock and water compressibility, ' +
  'average reservoir pressures (stabilised build-ups).';

/**
 * Fits the p/z material balance line of a volumetric gas reservoir and reads the gas in place.
 *
 *   p/z = pi/zi - (pi/zi)/G * Gp   =>   G = -intercept / slope
 * by ordinary least squares of p/z ON Gp (regress p/z on Gp, not Gp on p/z).
 * Source: Craft, B.C., Hawkins, M.F., rev. Terry, R.E. (1991) Applied Petroleum Reservoir
 * Engineering, 2nd ed., ch. 2 (p/z vs Gp for volumetric gas reservoirs); Dake, L.P. (1978)
 * Fundamentals of Reservoir Engineering, ch. 1.
 *
 * @param input Gp (any volume unit; G comes out in the same unit) with p/z (psia) or pressure
 *   (psia) and z; points with NaN are skipped and counted
 * @throws RangeError('fitPZ: ...') for unequal lengths, fewer than 2 points, non-positive p/z,
 *   negative Gp, all Gp equal, or a slope >= 0 (p/z not falling: no gas in place can be read)
 * @example fitPZ({ gp: [0, 1e9, 2e9], pz: [4000, 3920, 3840] }).gasInPlace // 50e9
 */
export function fitPZ(input: PZInput): PZFit {
  const fn = 'fitPZ';
  const gp = input.gp;
  let pzIn: ArrayLike<number>;
  if ('pz' in input) {
    pzIn = input.pz;
  } else {
    const { pressurePsia: p, z } = input;
    if (p.length !== z.length) throw new RangeError(`${fn}: pressurePsia and z must have the same length`);
    const arr = new Float64Array(p.length);
    for (let i = 0; i < p.length; i++) {
      if (!Number.isNaN(z[i]) && !(z[i] > 0)) throw new RangeError(`${fn}: z[${i}] must be > 0 (got ${z[i]})`);
      arr[i] = p[i] / z[i];
    }
    pzIn = arr;
  }
  if (gp.length !== pzIn.length) throw new RangeError(`${fn}: gp and p/z must have the same length`);
  const xs: number[] = [];
  const ys: number[] = [];
  let skipped = 0;
  for (let i = 0; i < gp.length; i++) {
    const x = gp[i];
    const y = pzIn[i];
    if (Number.isNaN(x) || Number.isNaN(y)) {
      skipped++;
      continue;
    }
    if (!(x >= 0) || !Number.isFinite(x)) throw new RangeError(`${fn}: gp[${i}] must be finite and >= 0 (got ${x})`);
    if (!(y > 0) || !Number.isFinite(y)) throw new RangeError(`${fn}: p/z[${i}] must be finite and > 0 (got ${y})`);
    xs.push(x);
    ys.push(y);
  }
  const n = xs.length;
  if (n < 2) throw new RangeError(`${fn}: needs at least 2 points with values (got ${n})`);
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += xs[i] / n;
    my += ys[i] / n;
  }
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (xs[i] - mx) ** 2;
    sxy += (xs[i] - mx) * (ys[i] - my);
    syy += (ys[i] - my) ** 2;
  }
  if (!(sxx > 0)) throw new RangeError(`${fn}: gp values are all equal; a line cannot be fitted`);
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  if (!(slope < 0)) throw new RangeError(`${fn}: p/z does not fall with Gp (slope ${slope}); no gas in place can be read`);
  return {
    intercept,
    slope,
    gasInPlace: -intercept / slope,
    rSquared: syy > 0 ? (sxy * sxy) / (sxx * syy) : 1,
    n,
    skipped,
    pz: Float64Array.from(ys),
    method: PZ_METHOD,
  };
}

/**
 * Cumulative gas at an abandonment p/z on a fitted line: Gp = (pz_ab - intercept) / slope.
 *
 * @throws RangeError('pzCumulativeAt: abandonmentPz must be in [0, intercept] ...')
 * @example pzCumulativeAt(fit, 500)
 */
export function pzCumulativeAt(fit: Pick<PZFit, 'intercept' | 'slope'>, abandonmentPz: number): number {
  if (!(abandonmentPz >= 0 && abandonmentPz <= fit.intercept)) {
    throw new RangeError(`pzCumulativeAt: abandonmentPz must be in [0, ${fit.intercept}] (got ${abandonmentPz})`);
  }
  return (abandonmentPz - fit.intercept) / fit.slope;
}
