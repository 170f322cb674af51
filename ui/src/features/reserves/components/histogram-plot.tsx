import { ChartAxis } from '../../../components/chart-axis';
import type { OutputStats } from '../../../types/reserves';
import { formatFieldVolume } from '../utils/format-volume';
import { RESERVES_COLOURS, volumeAxis } from '../utils/labels';
import { histogramLayout } from '../utils/plots';

const W = 560;
const H = 270;
const M = { top: 26, right: 18, bottom: 44, left: 56 };
const box = { width: W - M.left - M.right, height: H - M.top - M.bottom };

export interface HistogramPlotProps {
  stats: OutputStats;
  /** 'Recoverable' or 'In place'. */
  label: string;
}

/** Monte Carlo histogram of one output, with P90 / P50 / P10 and the mean marked. */
export function HistogramPlot({ stats, label }: HistogramPlotProps) {
  const axis = volumeAxis(stats.fieldUnit, stats.max);
  const edges = stats.histogram.edges.map((e) => e / axis.factor);
  const { x, y, bars } = histogramLayout(edges, stats.histogram.counts, box);
  const marks = [
    { key: 'P90', v: stats.p90, colour: RESERVES_COLOURS.p90 },
    { key: 'P50', v: stats.p50, colour: RESERVES_COLOURS.p50 },
    { key: 'P10', v: stats.p10, colour: RESERVES_COLOURS.p10 },
  ];
  const summary = `${label} histogram of ${stats.count} trials: P90 ${formatFieldVolume(stats.p90, stats.fieldUnit)}, P50 ${formatFieldVolume(stats.p50, stats.fieldUnit)}, P10 ${formatFieldVolume(stats.p10, stats.fieldUnit)}`;
  return (
    <svg role="img" aria-label={summary} width={W} height={H} viewBox={`0 0 ${W} ${H}`} className="rc-plot">
      <g transform={`translate(${M.left},${M.top})`}>
        <ChartAxis scale={y} orient="left" label="Trials" ticks={5} grid={box.width} />
        <g transform={`translate(0,${box.height})`}>
          <ChartAxis scale={x} orient="bottom" label={`${label} (${axis.label})`} ticks={6} />
        </g>
        {bars.map((b, i) => (
          <rect key={i} x={b.x} y={b.y} width={b.width} height={b.height} fill={RESERVES_COLOURS.bar} stroke={RESERVES_COLOURS.barEdge} strokeWidth={0.5} />
        ))}
        {marks.map((m) => {
          const px = x(m.v / axis.factor);
          return (
            <g key={m.key} transform={`translate(${px},0)`}>
              <line y1={-4} y2={box.height} stroke={m.colour} strokeWidth={1.6} />
              <text y={-8} textAnchor="middle" fontSize={11} fill={m.colour} fontWeight={600}>
                {m.key}
              </text>
            </g>
          );
        })}
        <line x1={x(stats.mean / axis.factor)} x2={x(stats.mean / axis.factor)} y1={0} y2={box.height} stroke={RESERVES_COLOURS.mean} strokeDasharray="4 3" />
      </g>
    </svg>
  );
}
