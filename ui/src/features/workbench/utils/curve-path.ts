/**
 * SVG path data for a curve against depth over an index range, decimated to the screen:
 * when there are more samples than pixel rows, each row keeps its first, minimum, maximum and
 * last value, so spikes stay visible and the path stays a few thousand points long.
 * Missing values (NaN, or <= 0 on a log scale) break the line.
 */

export type Scale = (v: number) => number;

export interface CurvePathInput {
  depth: ArrayLike<number>;
  values: ArrayLike<number>;
  start: number;
  end: number;
  x: Scale;
  y: Scale;
  /** Values the scale can place (e.g. v > 0 for a log scale). */
  usable?: (v: number) => boolean;
  /** Pixel rows available; decimation starts above 2 samples a row. */
  rows: number;
  /** Horizontal clamp so off-scale values sit on the track edge. */
  clampX?: [number, number];
}

const fmt = (v: number) => (Math.round(v * 10) / 10).toString();

export function curvePath({ depth, values, start, end, x, y, usable, rows, clampX }: CurvePathInput): string {
  const ok = (v: number, d: number) => Number.isFinite(v) && Number.isFinite(d) && (!usable || usable(v));
  const cx = clampX ? (px: number) => Math.min(Math.max(px, clampX[0]), clampX[1]) : (px: number) => px;
  let out = '';
  let pen = false;
  const count = end - start;
  if (count <= rows * 2) {
    for (let i = start; i < end; i++) {
      const v = values[i];
      const d = depth[i];
      if (!ok(v, d)) {
        pen = false;
        continue;
      }
      out += `${pen ? 'L' : 'M'}${fmt(cx(x(v)))},${fmt(y(d))}`;
      pen = true;
    }
    return out;
  }
  // Bucket by pixel row.
  let row = NaN;
  let first = NaN;
  let min = Infinity;
  let max = -Infinity;
  let last = NaN;
  let rowY = 0;
  const flush = () => {
    if (!Number.isFinite(first)) return;
    const pts = [first, min, max, last];
    for (const v of pts) {
      out += `${pen ? 'L' : 'M'}${fmt(cx(x(v)))},${fmt(rowY)}`;
      pen = true;
    }
  };
  for (let i = start; i < end; i++) {
    const v = values[i];
    const d = depth[i];
    if (!ok(v, d)) {
      flush();
      first = NaN;
      min = Infinity;
      max = -Infinity;
      row = NaN;
      pen = false;
      continue;
    }
    const py = y(d);
    const r = Math.floor(py);
    if (r !== row) {
      flush();
      row = r;
      rowY = py;
      first = v;
      min = v;
      max = v;
    }
    if (v < min) min = v;
    if (v > max) max = v;
    last = v;
  }
  flush();
  return out;
}

/**
 * Path data of filled bands for a 0/1 flag curve: one rectangle per run of flagged samples,
 * each sample covering half a step above and below its depth (the sample-thickness convention).
 */
export function flagPath(
  depth: ArrayLike<number>,
  flags: ArrayLike<number>,
  start: number,
  end: number,
  y: Scale,
  x0: number,
  x1: number,
): string {
  let out = '';
  let runStart = -1;
  const half = (i: number) => {
    const prev = i > 0 ? depth[i - 1] : NaN;
    const next = i + 1 < depth.length ? depth[i + 1] : NaN;
    const step = Number.isFinite(next) ? next - depth[i] : Number.isFinite(prev) ? depth[i] - prev : 0;
    return step / 2;
  };
  const close = (a: number, b: number) => {
    const top = y(depth[a] - half(a));
    const bottom = y(depth[b] + half(b));
    out += `M${fmt(x0)},${fmt(top)}H${fmt(x1)}V${fmt(Math.max(bottom, top + 0.5))}H${fmt(x0)}Z`;
  };
  for (let i = start; i < end; i++) {
    const on = flags[i] === 1;
    if (on && runStart < 0) runStart = i;
    if (!on && runStart >= 0) {
      close(runStart, i - 1);
      runStart = -1;
    }
  }
  if (runStart >= 0) close(runStart, end - 1);
  return out;
}
