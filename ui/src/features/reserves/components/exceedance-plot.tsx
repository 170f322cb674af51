import { ChartAxis } from '../../../components/chart-axis';
import type { OutputStats } from '../../../types/reserves';
import { RESERVES_COLOURS, volumeAxis } from '../utils/labels';
import { exceedanceLayout } from '../utils/plots';

const W = 560;
const H = 270;
const M = { top: 18, right: 18, bottom: 44, left: 56 };
const box = { width: W - M.left - M.right, height: H - M.top - M.bottom };

export interface ExceedancePlotProps {
  stats: OutputStats;
  label: string;
}

/**
 * Cumulative plot as an exceedance curve: the probability that the outcome is larger than each
 * value. P90 is read where the curve crosses 90 % (SPE-PRMS: exceeded with 90 % probability).
 */
export function ExceedancePlot({ stats, label }: ExceedancePlotProps) {
  const axis = volumeAxis(stats.fieldUnit, stats.max);
  const { x, y, path } = exceedanceLayout(
    stats.exceedance.value.map((v) => v / axis.factor),
    stats.exceedance.exceedance,
    box,
  );
  const marks = [
    { key: 'P90', p: 0.9, v: stats.p90, colour: RESERVES_COLOURS.p90 },
    { key: 'P50', p: 0.5, v: stats.p50, colour: RESERVES_COLOURS.p50 },
    { key: 'P10', p: 0.1, v: stats.p10, colour: RESERVES_COLOURS.p10 },
  ];
  return (
    <svg role="img" aria-label={`${label}: probability of exceeding each value`} width={W} height={H} viewBox={`0 0 ${W} ${H}`} className="rc-plot">
      <g transform={`translate(${M.left},${M.top})`}>
        <ChartAxis scale={y} orient="left" label="Probability of exceeding" ticks={5} grid={box.width} format={(v) => `${Math.round(v * 100)} %`} />
        <g transform={`translate(0,${box.height})`}>
          <ChartAxis scale={x} orient="bottom" label={`${label} (${axis.label})`} ticks={6} />
        </g>
        <path d={path} fill="none" stroke={RESERVES_COLOURS.curve} strokeWidth={2} />
        {marks.map((m) => {
          const px = x(m.v / axis.factor);
          const py = y(m.p);
          return (
            <g key={m.key}>
              <line x1={0} x2={px} y1={py} y2={py} stroke={m.colour} strokeDasharray="3 3" />
              <line x1={px} x2={px} y1={py} y2={box.height} stroke={m.colour} strokeDasharray="3 3" />
              <circle cx={px} cy={py} r={4} fill={m.colour} />
              <text x={px + 6} y={py - 6} fontSize={11} fill={m.colour} fontWeight={600}>
                {m.key}
              </text>
            </g>
          );
        })}
      </g>
    </svg>
  );
}
