/**
 * A chart axis rendered by React from a D3 scale (D3 computes the ticks; no d3.select).
 * `orient` says which side of the plot the axis sits on; the caller translates it there.
 */

export interface AxisScale {
  (value: number): number;
  ticks(count?: number): number[];
  tickFormat(count?: number, specifier?: string): (value: number) => string;
  range(): number[];
}

export interface ChartAxisProps {
  scale: AxisScale;
  orient: 'left' | 'right' | 'bottom' | 'top';
  label?: string;
  ticks?: number;
  /** Explicit tick values (e.g. decades on a log scale). */
  tickValues?: number[];
  format?: (value: number) => string;
  /** Length of grid lines drawn across the plot from each tick (0 = none). */
  grid?: number;
}

export function ChartAxis({ scale, orient, label, ticks = 5, tickValues, format, grid = 0 }: ChartAxisProps) {
  const values = tickValues ?? scale.ticks(ticks);
  const fmt = format ?? scale.tickFormat(ticks);
  const [r0, r1] = scale.range();
  const vertical = orient === 'left' || orient === 'right';
  const sign = orient === 'left' || orient === 'top' ? -1 : 1;
  const mid = (r0 + r1) / 2;
  return (
    <g className="chart-axis" aria-hidden="true">
      {vertical ? <line y1={r0} y2={r1} className="chart-axis__domain" /> : <line x1={r0} x2={r1} className="chart-axis__domain" />}
      {values.map((v) => {
        const p = scale(v);
        if (!Number.isFinite(p)) return null;
        return vertical ? (
          <g key={v} transform={`translate(0,${p})`}>
            {grid ? <line x2={-sign * grid} className="chart-axis__grid" /> : null}
            <line x2={sign * 4} className="chart-axis__tick" />
            <text x={sign * 7} dy="0.32em" textAnchor={sign < 0 ? 'end' : 'start'}>
              {fmt(v)}
            </text>
          </g>
        ) : (
          <g key={v} transform={`translate(${p},0)`}>
            {grid ? <line y2={-sign * grid} className="chart-axis__grid" /> : null}
            <line y2={sign * 4} className="chart-axis__tick" />
            <text y={sign * 7} dy={sign > 0 ? '0.71em' : '0'} textAnchor="middle">
              {fmt(v)}
            </text>
          </g>
        );
      })}
      {label ? (
        vertical ? (
          <text transform={`translate(${sign * 38},${mid}) rotate(-90)`} textAnchor="middle" className="chart-axis__label">
            {label}
          </text>
        ) : (
          <text x={mid} y={sign * 32} dy={sign > 0 ? '0.71em' : '0'} textAnchor="middle" className="chart-axis__label">
            {label}
          </text>
        )
      ) : null}
    </g>
  );
}

/** Powers of ten inside [lo, hi] (log-axis ticks). */
export function decades(lo: number, hi: number): number[] {
  const out: number[] = [];
  for (let e = Math.ceil(Math.log10(Math.min(lo, hi)) - 1e-9); e <= Math.floor(Math.log10(Math.max(lo, hi)) + 1e-9); e++) out.push(10 ** e);
  return out;
}

/** Compact log tick label: 0.01, 0.1, 1, 10, 100, 1k. */
export function formatDecade(v: number): string {
  return v >= 1000 ? `${v / 1000}k` : String(Number(v.toPrecision(2)));
}
