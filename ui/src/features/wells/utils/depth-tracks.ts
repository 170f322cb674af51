import { extent, line, range, scaleLinear, scaleLog } from 'd3';

/**
 * Geometry of the depth view, computed with D3 (scales, line paths, ticks) and rendered by React.
 * Depth increases downwards and one depth scale is shared by every track; each curve gets its own
 * track and horizontal scale: logarithmic for resistivity-class curves, linear otherwise.
 * Missing samples (NaN, and values <= 0 on a log scale) break the line instead of being joined.
 */

export interface TrackCurve {
  mnemonic: string;
  unit: string;
  curveClass: string | null;
  values: ArrayLike<number>;
}

export interface DepthViewLayout {
  /** Height of the plotted depth interval, px. */
  plotHeight: number;
  /** Height above the plot for track titles and value ticks, px. */
  headerHeight: number;
  /** Width of the depth scale column at the left, px. */
  depthAxisWidth: number;
  trackWidth: number;
  trackGap: number;
}

export const DEFAULT_LAYOUT: DepthViewLayout = {
  plotHeight: 640,
  headerHeight: 58,
  depthAxisWidth: 64,
  trackWidth: 136,
  trackGap: 10,
};

export interface Tick {
  value: number;
  /** Position along the scale, px (y for depth ticks, x inside the track for value ticks). */
  position: number;
  label: string;
}

export interface TrackGeometry {
  mnemonic: string;
  unit: string;
  scaleType: 'linear' | 'log';
  /** Left edge of the track in the SVG, px. */
  left: number;
  /** Horizontal scale domain (left end, right end). */
  domain: [number, number];
  /** SVG path data in track coordinates, or null when the curve has no plottable sample. */
  path: string | null;
  ticks: Tick[];
}

export interface DepthViewGeometry {
  width: number;
  height: number;
  layout: DepthViewLayout;
  depthDomain: [number, number];
  depthTicks: Tick[];
  tracks: TrackGeometry[];
}

/** Whether a curve class is drawn on a logarithmic scale (resistivity classes). */
export function isResistivityClass(curveClass: string | null | undefined): boolean {
  return typeof curveClass === 'string' && curveClass.toLowerCase().split('_').includes('resistivity');
}

/**
 * Computes the depth view geometry.
 * @param depth index samples (depth), in the run's depth unit; NaN entries are skipped.
 * @param curves curves sampled at the same depths (same length as `depth`).
 * @throws RangeError when depth has no finite value or a curve's length differs from depth's.
 */
export function buildDepthView(
  depth: ArrayLike<number>,
  curves: readonly TrackCurve[],
  layout: DepthViewLayout = DEFAULT_LAYOUT,
): DepthViewGeometry {
  const n = depth.length;
  for (const curve of curves) {
    if (curve.values.length !== n) {
      throw new RangeError(`buildDepthView: curve ${curve.mnemonic} has ${curve.values.length} samples, depth has ${n}`);
    }
  }
  const [top, base] = finiteExtent(depth, () => true);
  if (top === undefined || base === undefined) throw new RangeError('buildDepthView: depth has no finite value');
  const depthDomain: [number, number] = top === base ? [top - 1, base + 1] : [top, base];
  const y = scaleLinear().domain(depthDomain).range([0, layout.plotHeight]);
  const depthTicks = y.ticks(Math.max(2, Math.round(layout.plotHeight / 56))).map((value) => ({
    value,
    position: y(value),
    label: y.tickFormat()(value),
  }));
  const indices = range(n);

  const tracks = curves.map<TrackGeometry>((curve, i) => {
    const left = layout.depthAxisWidth + i * (layout.trackWidth + layout.trackGap);
    const values = curve.values;
    const log = isResistivityClass(curve.curveClass);
    const usable = log ? (v: number) => v > 0 : () => true;
    const [lo, hi] = finiteExtent(values, usable);
    const xRange: [number, number] = [0, layout.trackWidth];
    const isDefined = (k: number) => Number.isFinite(values[k]) && usable(values[k]) && Number.isFinite(depth[k]);

    if (log) {
      const x = scaleLog()
        .domain(lo === undefined || hi === undefined ? [1, 10] : lo === hi ? [lo / 10, hi * 10] : [lo, hi])
        .range(xRange)
        .nice();
      const path = lo === undefined ? null : line<number>().defined(isDefined).x((k) => x(values[k])).y((k) => y(depth[k]))(indices);
      const [d0, d1] = x.domain() as [number, number];
      const ticks = x
        .ticks()
        .filter((t) => Number.isInteger(Math.round(Math.log10(t) * 1e9) / 1e9))
        .map((value) => ({ value, position: x(value), label: formatLogTick(value) }));
      return { mnemonic: curve.mnemonic, unit: curve.unit, scaleType: 'log', left, domain: [d0, d1], path, ticks };
    }

    const x = scaleLinear()
      .domain(lo === undefined || hi === undefined ? [0, 1] : lo === hi ? padFlat(lo) : [lo, hi])
      .range(xRange)
      .nice(4);
    const path = lo === undefined ? null : line<number>().defined(isDefined).x((k) => x(values[k])).y((k) => y(depth[k]))(indices);
    const [d0, d1] = x.domain() as [number, number];
    const format = x.tickFormat(3);
    const ticks = x.ticks(3).map((value) => ({ value, position: x(value), label: format(value) }));
    return { mnemonic: curve.mnemonic, unit: curve.unit, scaleType: 'linear', left, domain: [d0, d1], path, ticks };
  });

  const width = layout.depthAxisWidth + Math.max(1, curves.length) * (layout.trackWidth + layout.trackGap);
  return { width, height: layout.headerHeight + layout.plotHeight + 8, layout, depthDomain, depthTicks, tracks };
}

/** Min and max of the finite values accepted by `keep`, or undefineds when there are none. */
function finiteExtent(values: ArrayLike<number>, keep: (v: number) => boolean): [number | undefined, number | undefined] {
  const [lo, hi] = extent(Array.from(values).filter((v) => Number.isFinite(v) && keep(v)));
  return [lo, hi];
}

function padFlat(value: number): [number, number] {
  const pad = value === 0 ? 1 : Math.abs(value) * 0.1;
  return [value - pad, value + pad];
}

function formatLogTick(value: number): string {
  return value >= 1000 ? `${value / 1000}k` : String(Number(value.toPrecision(3)));
}
