import { max, min, scaleBand, scaleLinear } from 'd3';
import type { InputName, TornadoRowDto } from '../../../types/reserves';

/**
 * Geometry of the reserves charts, computed with D3 scales (React renders the SVG): histogram
 * bars, the exceedance curve and tornado bars. Sizes are the inner plot area in pixels.
 */

export interface Box {
  width: number;
  height: number;
}

export interface Bar {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Bars of a histogram over `edges` (length counts + 1), with its scales. */
export function histogramLayout(edges: readonly number[], counts: readonly number[], box: Box) {
  const x = scaleLinear()
    .domain([edges[0], edges[edges.length - 1]])
    .range([0, box.width]);
  const y = scaleLinear()
    .domain([0, Math.max(1, max(counts) ?? 1)])
    .range([box.height, 0])
    .nice(5);
  const bars: Bar[] = counts.map((c, i) => {
    const x0 = x(edges[i]);
    const x1 = x(edges[i + 1]);
    return { x: x0, y: y(c), width: Math.max(0, x1 - x0 - 1), height: box.height - y(c) };
  });
  return { x, y, bars };
}

/** The exceedance curve: value on x, probability of exceeding on y (1 at the top). */
export function exceedanceLayout(values: readonly number[], exceedance: readonly number[], box: Box) {
  const x = scaleLinear()
    .domain([min(values) ?? 0, max(values) ?? 1])
    .range([0, box.width])
    .nice(5);
  const y = scaleLinear().domain([0, 1]).range([box.height, 0]);
  const points = values.map((v, i) => [x(v), y(exceedance[i])] as const);
  const path = points.map(([px, py], i) => `${i === 0 ? 'M' : 'L'}${px.toFixed(2)},${py.toFixed(2)}`).join('');
  return { x, y, path };
}

export interface TornadoBar {
  input: InputName;
  row: TornadoRowDto;
  y: number;
  height: number;
  /** Bar from the base to the output with the input at its P90 (low input value). */
  atP90: { x: number; width: number };
  /** Bar from the base to the output with the input at its P10 (high input value). */
  atP10: { x: number; width: number };
}

/** Tornado bars in the given order (largest swing first), centred on the base output. */
export function tornadoLayout(rows: readonly TornadoRowDto[], baseOutput: number, box: Box) {
  const lo = Math.min(baseOutput, min(rows, (r) => r.low) ?? baseOutput);
  const hi = Math.max(baseOutput, max(rows, (r) => r.high) ?? baseOutput);
  const pad = (hi - lo) * 0.04 || Math.abs(baseOutput) * 0.05 || 1;
  const x = scaleLinear()
    .domain([lo - pad, hi + pad])
    .range([0, box.width])
    .nice(5);
  const y = scaleBand<string>()
    .domain(rows.map((r) => r.input))
    .range([0, box.height])
    .padding(0.28);
  const span = (a: number, b: number) => ({ x: Math.min(x(a), x(b)), width: Math.abs(x(b) - x(a)) });
  const bars: TornadoBar[] = rows.map((r) => ({
    input: r.input,
    row: r,
    y: y(r.input) ?? 0,
    height: y.bandwidth(),
    atP90: span(baseOutput, r.outputAtInputP90),
    atP10: span(baseOutput, r.outputAtInputP10),
  }));
  return { x, baseX: x(baseOutput), bars };
}
