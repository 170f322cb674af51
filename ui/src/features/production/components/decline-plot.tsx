import { max, scaleLinear } from 'd3';
import { ChartAxis } from '../../../components/chart-axis';
import type { DeclineFitDto } from '../../../types/reserves';
import { CROSS_CHECK_COLOURS, sig } from '../utils/axes';

const W = 560;
const H = 300;
const M = { top: 16, right: 20, bottom: 46, left: 62 };
const IW = W - M.left - M.right;
const IH = H - M.top - M.bottom;

/**
 * Rate against time: the data, the fitted Arps curve and its forecast toward the economic limit
 * (drawn at most 30 years past the last point; the EUR table gives the time to the limit).
 */
export function DeclinePlot({ fit }: { fit: DeclineFitDto }) {
  const years = (d: number) => d / 365.25;
  const tLast = max(fit.points, (p) => p.tDays) ?? 0;
  // Show the forecast to the limit, but at most 30 years past the data (a long tail would squeeze the fit).
  const tMax = Math.max(tLast, Math.min(max(fit.forecast, (p) => p.tDays) ?? 0, tLast + 30 * 365.25));
  const shown = fit.forecast.filter((p) => p.tDays <= tMax + 1e-9);
  const x = scaleLinear().domain([0, years(tMax) || 1]).range([0, IW]).nice(6);
  const y = scaleLinear()
    .domain([0, Math.max(fit.qi, max(fit.points, (p) => p.rate) ?? 0) * 1.06])
    .range([IH, 0])
    .nice(5);
  const path = (pts: { tDays: number; rate: number }[]) => pts.map((p, i) => `${i ? 'L' : 'M'}${x(years(p.tDays)).toFixed(2)},${y(p.rate).toFixed(2)}`).join('');
  const lastData = fit.points[fit.points.length - 1]?.tDays ?? 0;
  const fitted = shown.filter((p) => p.tDays <= lastData);
  const ahead = shown.filter((p) => p.tDays >= lastData);
  return (
    <svg role="img" aria-label={`Rate against time with the ${fit.kind} Arps fit; EUR ${sig(fit.eur)} ${fit.volumeUnit}`} width={W} height={H} viewBox={`0 0 ${W} ${H}`} className="rc-plot">
      <g transform={`translate(${M.left},${M.top})`}>
        <ChartAxis scale={y} orient="left" label={`Rate (${fit.rateUnit})`} grid={IW} />
        <g transform={`translate(0,${IH})`}>
          <ChartAxis scale={x} orient="bottom" label="Time since the first point (years of 365.25 d)" ticks={6} />
        </g>
        <line x1={0} x2={IW} y1={y(fit.economicLimit)} y2={y(fit.economicLimit)} stroke={CROSS_CHECK_COLOURS.limit} strokeDasharray="2 3" />
        <text x={IW} y={y(fit.economicLimit) - 5} textAnchor="end" fontSize={11} fill={CROSS_CHECK_COLOURS.limit}>
          economic limit {sig(fit.economicLimit)} {fit.rateUnit}
        </text>
        <path d={path(fitted)} fill="none" stroke={CROSS_CHECK_COLOURS.fit} strokeWidth={2} />
        <path d={path(ahead)} fill="none" stroke={CROSS_CHECK_COLOURS.forecast} strokeWidth={1.6} strokeDasharray="6 4" />
        {fit.points.map((p, i) => (
          <circle key={i} cx={x(years(p.tDays))} cy={y(p.rate)} r={3.5} fill={CROSS_CHECK_COLOURS.point} />
        ))}
      </g>
    </svg>
  );
}
