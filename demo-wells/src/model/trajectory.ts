/**
 * Well paths of the model. A build-and-hold well is vertical to its kick-off point, builds
 * inclination at a constant rate along a circular arc in one vertical plane, then holds a
 * straight tangent. Minimum-curvature survey calculation reproduces such a path exactly when
 * the kick-off and end-of-build points are survey stations, because minimum curvature
 * assumes a circular arc between stations (Taylor, H.L., Mason, C.M. (1972) A systematic
 * approach to well surveying calculations. SPE J. 12(6); as described in Bourgoyne et al.
 * (1986) Applied Drilling Engineering, ch. 8 // from memory).
 */
import type { Trajectory } from './types.js';

const DEG = Math.PI / 180;

export interface PathPoint {
  /** True vertical depth below KB, ft. */
  tvd: number;
  /** Horizontal displacement from the surface location, ft east and north. */
  east: number;
  north: number;
  inclinationDeg: number;
  azimuthDeg: number;
}

/** Radius of curvature (ft) of a build at `rateDegPer100Ft`: R = 18000 / (pi rate). */
export function buildRadiusFt(rateDegPer100Ft: number): number {
  return 18000 / (Math.PI * rateDegPer100Ft);
}

/** MD (ft) where the build ends. */
export function endOfBuildMd(t: Extract<Trajectory, { kind: 'build_hold' }>): number {
  return t.kickoffMd + (100 * t.holdInclinationDeg) / t.buildRateDegPer100Ft;
}

/**
 * Position of the path at measured depth `md` (ft from KB).
 * Throws RangeError('pathAt: md must be >= 0') for a negative or non-finite md.
 * @example pathAt({ kind: 'vertical' }, 5000).tvd // 5000
 */
export function pathAt(t: Trajectory, md: number): PathPoint {
  if (!(md >= 0) || !Number.isFinite(md)) throw new RangeError('pathAt: md must be >= 0');
  if (t.kind === 'vertical' || md <= t.kickoffMd) {
    return { tvd: md, east: 0, north: 0, inclinationDeg: 0, azimuthDeg: t.kind === 'vertical' ? 0 : t.azimuthDeg };
  }
  const r = buildRadiusFt(t.buildRateDegPer100Ft);
  const eob = endOfBuildMd(t);
  const az = t.azimuthDeg * DEG;
  let tvd: number;
  let horiz: number;
  let inc: number;
  if (md <= eob) {
    inc = ((md - t.kickoffMd) * t.buildRateDegPer100Ft) / 100;
    tvd = t.kickoffMd + r * Math.sin(inc * DEG);
    horiz = r * (1 - Math.cos(inc * DEG));
  } else {
    inc = t.holdInclinationDeg;
    const i = inc * DEG;
    tvd = t.kickoffMd + r * Math.sin(i) + (md - eob) * Math.cos(i);
    horiz = r * (1 - Math.cos(i)) + (md - eob) * Math.sin(i);
  }
  return { tvd, east: horiz * Math.sin(az), north: horiz * Math.cos(az), inclinationDeg: inc, azimuthDeg: t.azimuthDeg };
}

/** Survey stations (MD, inclination, azimuth) every `stepFt` from 0 to `tdMd`, plus the kick-off and end-of-build points. */
export function surveyStations(t: Trajectory, tdMd: number, stepFt = 100): { md: number; inclinationDeg: number; azimuthDeg: number }[] {
  const mds = new Set<number>();
  for (let md = 0; md < tdMd; md += stepFt) mds.add(md);
  mds.add(tdMd);
  if (t.kind === 'build_hold') {
    mds.add(t.kickoffMd);
    mds.add(endOfBuildMd(t));
  }
  return [...mds]
    .filter((md) => md <= tdMd)
    .sort((a, b) => a - b)
    .map((md) => {
      const p = pathAt(t, md);
      return { md, inclinationDeg: p.inclinationDeg, azimuthDeg: p.azimuthDeg };
    });
}
