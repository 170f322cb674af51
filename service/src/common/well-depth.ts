import { depthUnitOf } from '@poreline/core';

export type DepthUnit = 'ft' | 'm';

/** Metres in one international foot (exact; NIST SP 811, 2008, App. B.8). */
const METRES_PER_FOOT = 0.3048;

/** A run's stored index unit as 'ft' | 'm' (null for a time index or an unknown unit). */
export function normaliseDepthUnit(unit: string | null | undefined): DepthUnit | null {
  return unit ? depthUnitOf(unit) : null;
}

/**
 * The depth unit of a well: the unit of its first uploaded log run with a depth index. Tops,
 * zones, the merged index and surveys are all expressed in it. null when the well has no logs.
 */
export function wellDepthUnit(runs: readonly { depthUnit: string }[]): DepthUnit | null {
  for (const r of runs) {
    const u = normaliseDepthUnit(r.depthUnit);
    if (u) return u;
  }
  return null;
}

/** A depth converted between feet and metres. */
export function convertDepth(value: number, from: DepthUnit, to: DepthUnit): number {
  if (from === to) return value;
  return from === 'ft' ? value * METRES_PER_FOOT : value / METRES_PER_FOOT;
}

/** Shallowest and deepest logged depth over the runs, in `unit` (null when no run has a depth index). */
export function loggedRange(runs: readonly { depthUnit: string; start: number; stop: number }[], unit: DepthUnit): { top: number; base: number } | null {
  let top = Infinity;
  let base = -Infinity;
  for (const r of runs) {
    const u = normaliseDepthUnit(r.depthUnit);
    if (!u) continue;
    for (const d of [r.start, r.stop]) {
      if (!Number.isFinite(d)) continue;
      const v = convertDepth(d, u, unit);
      top = Math.min(top, v);
      base = Math.max(base, v);
    }
  }
  return top <= base ? { top, base } : null;
}
