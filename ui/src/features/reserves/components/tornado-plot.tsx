import { ChartAxis } from '../../../components/chart-axis';
import type { TornadoDto } from '../../../types/reserves';
import { formatSig } from '../utils/format-volume';
import { RESERVES_COLOURS, inputLabel, volumeAxis } from '../utils/labels';
import { tornadoLayout } from '../utils/plots';

const W = 560;
const M = { top: 12, right: 24, bottom: 44, left: 150 };

export interface TornadoPlotProps {
  tornado: TornadoDto;
  fieldUnit: 'STB' | 'scf';
  fluid: 'oil' | 'gas';
  label: string;
}

/**
 * Tornado: each input at its P90 (low value) and its P10 (high value), the others at the
 * deterministic values; bars from the base output, largest swing on top. Inputs held fixed have
 * no bar.
 */
export function TornadoPlot({ tornado, fieldUnit, fluid, label }: TornadoPlotProps) {
  const rows = tornado.rows.filter((r) => r.swing > 0);
  const H = M.top + M.bottom + Math.max(1, rows.length) * 34;
  const box = { width: W - M.left - M.right, height: H - M.top - M.bottom };
  const axis = volumeAxis(fieldUnit, Math.max(tornado.baseOutput, ...rows.map((r) => r.high)));
  const scaled = rows.map((r) => ({
    ...r,
    outputAtInputP90: r.outputAtInputP90 / axis.factor,
    outputAtInputP10: r.outputAtInputP10 / axis.factor,
    low: r.low / axis.factor,
    high: r.high / axis.factor,
  }));
  const { x, baseX, bars } = tornadoLayout(scaled, tornado.baseOutput / axis.factor, box);
  return (
    <svg role="img" aria-label={`Tornado of ${label}: ${rows.map((r) => inputLabel(r.input, fluid)).join(', ') || 'no uncertain inputs'}`} width={W} height={H} viewBox={`0 0 ${W} ${H}`} className="rc-plot">
      <g transform={`translate(${M.left},${M.top})`}>
        <g transform={`translate(0,${box.height})`}>
          <ChartAxis scale={x} orient="bottom" label={`${label} (${axis.label})`} ticks={6} grid={box.height} />
        </g>
        {bars.map((b) => (
          <g key={b.input} data-input={b.input}>
            <rect x={b.atP90.x} y={b.y} width={Math.max(1, b.atP90.width)} height={b.height} fill={RESERVES_COLOURS.lowSide} />
            <rect x={b.atP10.x} y={b.y} width={Math.max(1, b.atP10.width)} height={b.height} fill={RESERVES_COLOURS.highSide} />
            <text x={-8} y={b.y + b.height / 2} dy="0.32em" textAnchor="end" fontSize={11}>
              {inputLabel(b.input, fluid)} ({formatSig(b.row.inputP90)} – {formatSig(b.row.inputP10)})
            </text>
          </g>
        ))}
        {rows.length === 0 ? (
          <text x={box.width / 2} y={box.height / 2} textAnchor="middle" fontSize={12}>
            Every input is fixed: give an input a distribution to see its swing.
          </text>
        ) : null}
        <line x1={baseX} x2={baseX} y1={-4} y2={box.height} stroke="currentColor" strokeWidth={1.2} />
      </g>
    </svg>
  );
}
