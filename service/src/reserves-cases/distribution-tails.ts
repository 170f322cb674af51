import { lognormalFromMeanSd, lognormalFromP90P10, type Distribution } from '@poreline/core';

/** Truncation bounds further than this many standard deviations out are pulled in to it. */
export const TAIL_LIMIT_SD = 8;

/**
 * A normal or lognormal whose truncation bound lies far out in a tail (e.g. porosity N(0.2,
 * 0.02) truncated to [0, 1]: 1 is 40 SD away) has a cumulative probability at that bound that
 * rounds to exactly 0 or 1, and core's quantile then returns an infinite support, so the case
 * is refused although the bound is fine. The bound is pulled in to 8 SD (in log space for a
 * lognormal), which leaves out a probability below 1.3e-15 and changes no sample at double
 * precision. Returns the distribution unchanged when no bound is that far out.
 */
export function tightenFarTails(d: Distribution): { distribution: Distribution; tightened: boolean } {
  if ((d.kind !== 'normal' && d.kind !== 'lognormal') || !d.truncate) return { distribution: d, tightened: false };
  let lo: number;
  let hi: number;
  let toX: (z: number) => number;
  if (d.kind === 'normal') {
    if (!(d.sd > 0)) return { distribution: d, tightened: false };
    lo = d.mean - TAIL_LIMIT_SD * d.sd;
    hi = d.mean + TAIL_LIMIT_SD * d.sd;
    toX = (x) => x;
  } else {
    let p;
    try {
      p = 'p90' in d ? lognormalFromP90P10(d.p90, d.p10) : lognormalFromMeanSd(d.mean, d.sd);
    } catch {
      return { distribution: d, tightened: false };
    }
    lo = p.mu - TAIL_LIMIT_SD * p.sigma;
    hi = p.mu + TAIL_LIMIT_SD * p.sigma;
    toX = Math.exp;
  }
  const min = d.truncate.min;
  const max = d.truncate.max;
  const loX = toX(lo);
  const hiX = toX(hi);
  const newMin = min !== undefined && min < loX ? loX : min;
  const newMax = max !== undefined && max > hiX ? hiX : max;
  if (newMin === min && newMax === max) return { distribution: d, tightened: false };
  const truncate = { ...(newMin !== undefined ? { min: newMin } : {}), ...(newMax !== undefined ? { max: newMax } : {}) };
  return { distribution: { ...d, truncate } as Distribution, tightened: true };
}
