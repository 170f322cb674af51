import { scaleLinear } from 'd3';
import { ChartAxis } from '../../../components/chart-axis';
import type { PzFitDto } from '../../../types/reserves';
import { CROSS_CHECK_COLOURS, gasAxis, sig } from '../utils/axes';

const W = 560;
const H = 300;
const M = { top: 16, right: 20, bottom: 46, left: 62 };
const IW = W - M.left - M.right;
const IH = H - M.top - M.bottom;

/** p/z against cumulative gas, with the fitted straight line extended to p/z = 0 (the drained gas in place). */
export function PzPlot({ fit }: { fit: PzFitDto }) {
  const axis = gasAxis(fit.drainedGipScf);
  const gMax = Math.max(fit.drainedGipScf, ...fit.points.map((p) => p.cumGasScf)) / axis.factor;
  const x = scaleLinear().domain([0, gMax * 1.05]).range([0, IW]).nice(6);
  const y = scaleLinear()
    .domain([0, Math.max(fit.fit.intercept, ...fit.points.map((p) => p.pOverZ)) * 1.06])
    .range([IH, 0])
    .nice(5);
  const g = fit.drainedGipScf / axis.factor;
  return (
    <svg role="img" aria-label={`p/z against cumulative gas: fitted line reaches p/z = 0 at ${sig(g)} ${axis.label}`} width={W} height={H} viewBox={`0 0 ${W} ${H}`} className="rc-plot">
      <g transform={`translate(${M.left},${M.top})`}>
        <ChartAxis scale={y} orient="left" label="p/z (psia)" grid={IW} />
        <g transform={`translate(0,${IH})`}>
          <ChartAxis scale={x} orient="bottom" label={`Cumulative gas Gp (${axis.label})`} ticks={6} />
        </g>
        <line x1={x(0)} y1={y(fit.fit.intercept)} x2={x(g)} y2={y(0)} stroke={CROSS_CHECK_COLOURS.fit} strokeWidth={1.8} strokeDasharray="6 3" />
        {fit.points.map((p, i) => (
          <circle key={i} cx={x(p.cumGasScf / axis.factor)} cy={y(p.pOverZ)} r={4.5} fill={CROSS_CHECK_COLOURS.point} />
        ))}
        <g transform={`translate(${x(g)},${y(0)})`}>
          <circle r={5} fill="none" stroke={CROSS_CHECK_COLOURS.fit} strokeWidth={2} />
          <text y={-10} textAnchor="end" fontSize={11} fill={CROSS_CHECK_COLOURS.fit} fontWeight={600}>
            G = {sig(g)} {axis.label}
          </text>
        </g>
      </g>
    </svg>
  );
}
