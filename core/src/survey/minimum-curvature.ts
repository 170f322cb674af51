/**
 * Deviation survey to true vertical depth by the minimum curvature method, and positions at
 * any measured depth along the computed path.
 *
 * Between two stations the well is a circular arc tangent to both station directions:
 *   cos(beta) = cos(I2 - I1) - sin(I1) sin(I2) (1 - cos(A2 - A1))     (dogleg angle)
 *   RF = (2 / beta) tan(beta / 2)                                       (ratio factor, 1 when beta -> 0)
 *   dN = dMD/2 (sin I1 cos A1 + sin I2 cos A2) RF
 *   dE = dMD/2 (sin I1 sin A1 + sin I2 sin A2) RF
 *   dV = dMD/2 (cos I1 + cos I2) RF
 * Source: Sawaryn, S.J., Thorogood, J.L. (2005) A compendium of directional calculations
 * based on the minimum curvature method. SPE Drilling & Completion 20(1) // from memory;
 * worked example in Lapeyrouse (2002) Formulas and Calculations for Drilling, Production
 * and Workover, 2nd ed. (checked in the tests).
 * Units: MD, TVD, north, east in the caller's depth unit; inclination and azimuth in degrees
 * (azimuth clockwise from north; inclination from vertical).
 */

import { arcSin, arcVersine } from './arc-terms.js';

export interface SurveyStation {
  md: number;
  /** Inclination from vertical, degrees, [0, 180]. */
  inc: number;
  /** Azimuth clockwise from north, degrees. */
  azi: number;
}

/** A survey already reduced to positions (e.g. a TVD table from a survey company). */
export interface SurveyTable {
  md: Float64Array | readonly number[];
  tvd: Float64Array | readonly number[];
  north?: Float64Array | readonly number[];
  east?: Float64Array | readonly number[];
}

/** Stations with computed positions; unit direction vectors kept for arc interpolation. */
export interface SurveyPath {
  md: Float64Array;
  tvd: Float64Array;
  north: Float64Array;
  east: Float64Array;
  /** Dogleg angle of the segment ending at each station, degrees (0 at the first). */
  dogleg: Float64Array;
  /** Whether north/east are known (false for a SurveyTable given without them). */
  hasHorizontal: boolean;
  /** Direction unit vectors (north, east, down) at each station; empty for a table. */
  tn: Float64Array;
  te: Float64Array;
  tv: Float64Array;
}

const RAD = Math.PI / 180;

/** Ratio factor RF = (2/beta) tan(beta/2), by its series below 1e-4 rad. */
export function ratioFactor(beta: number): number {
  if (beta < 1e-4) return 1 + (beta * beta) / 12;
  return (2 / beta) * Math.tan(beta / 2);
}

/**
 * Positions of every station by minimum curvature, starting from `tieIn` at the first
 * station (default TVD = MD of the first station, north = east = 0, i.e. a vertical well
 * above the first station).
 * Throws RangeError naming the station and field on fewer than 1 station, non-finite
 * values, inclination outside [0, 180], or MD not strictly increasing.
 * @example minimumCurvature([{ md: 0, inc: 0, azi: 0 }, { md: 1000, inc: 0, azi: 0 }]).tvd // [0, 1000]
 */
export function minimumCurvature(
  stations: readonly SurveyStation[],
  tieIn?: { tvd: number; north: number; east: number },
): SurveyPath {
  const fn = 'minimumCurvature';
  const k = stations.length;
  if (k < 1) throw new RangeError(`${fn}: stations must not be empty`);
  const md = new Float64Array(k), tvd = new Float64Array(k), north = new Float64Array(k), east = new Float64Array(k);
  const dogleg = new Float64Array(k), tn = new Float64Array(k), te = new Float64Array(k), tv = new Float64Array(k);
  for (let i = 0; i < k; i++) {
    const s = stations[i];
    for (const f of ['md', 'inc', 'azi'] as const) {
      if (!Number.isFinite(s[f])) throw new RangeError(`${fn}: station ${i} ${f} must be a finite number`);
    }
    if (s.inc < 0 || s.inc > 180) throw new RangeError(`${fn}: station ${i} inc must be in [0, 180] degrees`);
    if (i > 0 && !(s.md > stations[i - 1].md)) throw new RangeError(`${fn}: station ${i} md must be greater than the previous station's`);
    const inc = s.inc * RAD, azi = s.azi * RAD;
    md[i] = s.md;
    tn[i] = Math.sin(inc) * Math.cos(azi);
    te[i] = Math.sin(inc) * Math.sin(azi);
    tv[i] = Math.cos(inc);
  }
  tvd[0] = tieIn?.tvd ?? md[0];
  north[0] = tieIn?.north ?? 0;
  east[0] = tieIn?.east ?? 0;
  for (let i = 1; i < k; i++) {
    const beta = angleBetween(tn[i - 1], te[i - 1], tv[i - 1], tn[i], te[i], tv[i]);
    const h = ((md[i] - md[i - 1]) / 2) * ratioFactor(beta);
    north[i] = north[i - 1] + h * (tn[i - 1] + tn[i]);
    east[i] = east[i - 1] + h * (te[i - 1] + te[i]);
    tvd[i] = tvd[i - 1] + h * (tv[i - 1] + tv[i]);
    dogleg[i] = beta / RAD;
  }
  return { md, tvd, north, east, dogleg, hasHorizontal: true, tn, te, tv };
}

/** Angle between two unit vectors, accurate for small angles (atan2 of |cross| and dot). */
function angleBetween(n1: number, e1: number, v1: number, n2: number, e2: number, v2: number): number {
  const cn = e1 * v2 - v1 * e2, ce = v1 * n2 - n1 * v2, cv = n1 * e2 - e1 * n2;
  return Math.atan2(Math.sqrt(cn * cn + ce * ce + cv * cv), n1 * n2 + e1 * e2 + v1 * v2);
}

/**
 * A survey path from a table of MD/TVD (and optionally north/east), interpolated linearly.
 * Throws RangeError on unequal lengths, fewer than 2 rows, non-finite values or MD not
 * strictly increasing.
 */
export function surveyPathFromTable(table: SurveyTable): SurveyPath {
  const fn = 'surveyPathFromTable';
  const k = table.md.length;
  if (k < 2) throw new RangeError(`${fn}: md must have at least 2 rows`);
  for (const f of ['tvd', 'north', 'east'] as const) {
    const c = table[f];
    if (c && c.length !== k) throw new RangeError(`${fn}: ${f} has ${c.length} rows, expected ${k}`);
  }
  if ((table.north === undefined) !== (table.east === undefined)) throw new RangeError(`${fn}: north and east must be given together`);
  for (let i = 0; i < k; i++) {
    if (!Number.isFinite(table.md[i]) || !Number.isFinite(table.tvd[i])) throw new RangeError(`${fn}: row ${i} md and tvd must be finite`);
    if (i > 0 && !(table.md[i] > table.md[i - 1])) throw new RangeError(`${fn}: row ${i} md must be greater than the previous row's`);
  }
  const hasHorizontal = table.north !== undefined;
  return {
    md: Float64Array.from(table.md),
    tvd: Float64Array.from(table.tvd),
    north: hasHorizontal ? Float64Array.from(table.north!) : new Float64Array(k),
    east: hasHorizontal ? Float64Array.from(table.east!) : new Float64Array(k),
    dogleg: new Float64Array(k),
    hasHorizontal,
    tn: new Float64Array(0),
    te: new Float64Array(0),
    tv: new Float64Array(0),
  };
}

export interface PathPositions {
  tvd: Float64Array;
  north: Float64Array;
  east: Float64Array;
}

/**
 * TVD, north and east at each measured depth along a path. Within a station pair of a
 * minimum-curvature path the position lies on the same circular arc (exact: at MD fraction f
 * the point of the arc after a turn of f*beta); a table path is interpolated linearly. Above the first station and below
 * the last the path continues straight along the end direction (table: along the end chord).
 * `md` must be non-decreasing for speed (one forward pass); NaN md gives NaN.
 * Throws RangeError when md decreases.
 */
export function positionsAtMd(path: SurveyPath, md: Float64Array | readonly number[]): PathPositions {
  const fn = 'positionsAtMd';
  const n = md.length;
  const out = { tvd: new Float64Array(n), north: new Float64Array(n), east: new Float64Array(n) };
  const k = path.md.length;
  const arcs = path.tn.length === k;
  const arc = new ArcSegment();
  let seg = 0; // index of the upper station of the current segment
  let prev = -Infinity;
  for (let i = 0; i < n; i++) {
    const m = md[i];
    if (m !== m) {
      out.tvd[i] = out.north[i] = out.east[i] = NaN;
      continue;
    }
    if (m < prev) throw new RangeError(`${fn}: md must be non-decreasing (sample ${i})`);
    prev = m;
    while (seg < k - 2 && m > path.md[seg + 1]) seg++;
    positionAt(path, arcs, k, seg, m, out, i, arc);
  }
  return out;
}

/** Position at one measured depth (any order). */
export function positionAtMd(path: SurveyPath, md: number): { tvd: number; north: number; east: number } {
  const k = path.md.length;
  let lo = 0, hi = Math.max(0, k - 2);
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (path.md[mid] < md) lo = mid;
    else hi = mid - 1;
  }
  const out = { tvd: new Float64Array(1), north: new Float64Array(1), east: new Float64Array(1) };
  positionAt(path, path.tn.length === k, k, lo, md, out, 0, new ArcSegment());
  return { tvd: out.tvd[0], north: out.north[0], east: out.east[0] };
}

/**
 * One station pair as a circular arc: dogleg beta, radius R = dMD / beta, and the unit
 * normal u (in the arc's plane, toward the lower station's direction) so that at arc
 * length s = f dMD the position is P1 + R [sin(f beta) t1 + (1 - cos(f beta)) u].
 * Cached per segment (positionsAtMd walks the samples in order).
 */
class ArcSegment {
  seg = -1;
  beta = 0;
  dmd = 0;
  un = 0;
  ue = 0;
  uv = 0;
  set(path: SurveyPath, seg: number): void {
    this.seg = seg;
    const n1 = path.tn[seg], e1 = path.te[seg], v1 = path.tv[seg];
    const n2 = path.tn[seg + 1], e2 = path.te[seg + 1], v2 = path.tv[seg + 1];
    const beta = angleBetween(n1, e1, v1, n2, e2, v2);
    this.beta = beta;
    this.dmd = path.md[seg + 1] - path.md[seg];
    if (beta < 1e-6) {
      // Near-straight: u * beta ~ t2 - t1; keep that difference (the series form below uses it).
      this.un = n2 - n1; this.ue = e2 - e1; this.uv = v2 - v1;
    } else {
      const c = Math.cos(beta), s = Math.sin(beta);
      this.un = (n2 - c * n1) / s; this.ue = (e2 - c * e1) / s; this.uv = (v2 - c * v1) / s;
    }
  }
}

function positionAt(path: SurveyPath, arcs: boolean, k: number, seg: number, m: number, out: PathPositions, i: number, arc: ArcSegment): void {
  if (k === 1 || (arcs && (m <= path.md[0] || m >= path.md[k - 1]))) {
    // Straight continuation along the end direction (arc paths).
    const j = k === 1 || m <= path.md[0] ? 0 : k - 1;
    const d = m - path.md[j];
    out.tvd[i] = path.tvd[j] + d * (arcs ? path.tv[j] : 1);
    out.north[i] = path.north[j] + d * (arcs ? path.tn[j] : 0);
    out.east[i] = path.east[j] + d * (arcs ? path.te[j] : 0);
    return;
  }
  const m1 = path.md[seg];
  const f = (m - m1) / (path.md[seg + 1] - m1);
  if (!arcs) {
    out.tvd[i] = path.tvd[seg] + f * (path.tvd[seg + 1] - path.tvd[seg]);
    out.north[i] = path.north[seg] + f * (path.north[seg + 1] - path.north[seg]);
    out.east[i] = path.east[seg] + f * (path.east[seg + 1] - path.east[seg]);
    return;
  }
  if (arc.seg !== seg) arc.set(path, seg);
  const n1 = path.tn[seg], e1 = path.te[seg], v1 = path.tv[seg];
  let a: number, b: number; // position = P1 + a t1 + b u
  if (arc.beta < 1e-6) {
    // Series of R sin(f beta) and R (1 - cos(f beta)) with u beta ~ t2 - t1.
    a = f * arc.dmd;
    b = 0.5 * f * f * arc.dmd;
  } else {
    const R = arc.dmd / arc.beta, th = f * arc.beta;
    a = R * arcSin(th);
    b = R * arcVersine(th);
  }
  out.tvd[i] = path.tvd[seg] + a * v1 + b * arc.uv;
  out.north[i] = path.north[seg] + a * n1 + b * arc.un;
  out.east[i] = path.east[seg] + a * e1 + b * arc.ue;
}

/**
 * True vertical thickness of the interval between two points of the well crossing a bed of
 * uniform dip: TVT = dTVD - tan(dip) * (dN cos(dipAzimuth) + dE sin(dipAzimuth)), the vertical
 * distance between the two parallel bed surfaces through the points. dip and dipAzimuth in
 * degrees (dip azimuth = the direction the bed deepens). For a straight hole of inclination
 * I and azimuth A this is dMD (cos I - sin I cos(A - dipAzimuth) tan dip) // from memory:
 * the textbook TVT form; for zero dip TVT = dTVD. No argument checks.
 */
export function trueVerticalThickness(dTvd: number, dNorth: number, dEast: number, dipDeg: number, dipAzimuthDeg: number): number {
  if (dipDeg === 0) return dTvd;
  return dTvd - Math.tan(dipDeg * RAD) * (dNorth * Math.cos(dipAzimuthDeg * RAD) + dEast * Math.sin(dipAzimuthDeg * RAD));
}
