import type { CutoffSensitivity } from '@poreline/core';
import { line, max, scaleLinear } from 'd3';
import { ChartAxis } from '../../../components/chart-axis';
import { CURVE_COLOURS } from '../../../lib/palette';
import type { Cutoffs } from '../../../types/workbench';
import type { SweptCutoff } from '../utils/live-evaluation';

const W = 300;
const H = 210;
const M = { top: 14, right: 48, bottom: 42, left: 48 };
const IW = W - M.left - M.right;
const IH = H - M.top - M.bottom;

const LABELS: Record<SweptCutoff, string> = { vshMax: 'Vsh max', phiMin: 'Porosity min', swMax: 'Sw max' };

export interface SensitivityPlotsProps {
  sensitivity: Record<SweptCutoff, CutoffSensitivity>;
  cutoffs: Cutoffs;
  depthUnit: string;
}

/**
 * Net pay (left axis) and phi-h of net pay (right axis) against each cutoff, the others held at
 * the formation's values; the vertical mark is the current value. Under porosity min, the
 * share of the total storage capacity lost at each cutoff (Worthington & Cosentino 2005).
 */
export function SensitivityPlots({ sensitivity, cutoffs, depthUnit }: SensitivityPlotsProps) {
  return (
    <div className="wb-plots" role="group" aria-label="Cutoff sensitivity">
      {(Object.keys(LABELS) as SweptCutoff[]).map((k) => (
        <SensitivityPlot key={k} name={k} s={sensitivity[k]} current={cutoffs[k]} depthUnit={depthUnit} />
      ))}
    </div>
  );
}

function SensitivityPlot({ name, s, current, depthUnit }: { name: SweptCutoff; s: CutoffSensitivity; current: number; depthUnit: string }) {
  const values = Array.from(s.values);
  const x = scaleLinear()
    .domain([values[0], values[values.length - 1]])
    .range([0, IW]);
  // An all-zero series still gets a readable axis (0 to 1).
  const top = (v: number | undefined) => (v !== undefined && v > 0 ? v * 1.08 : 1);
  const yPay = scaleLinear()
    .domain([0, top(max(s.netPay))])
    .range([IH, 0])
    .nice(4);
  const yPhiH = scaleLinear()
    .domain([0, top(max(s.phiH))])
    .range([IH, 0])
    .nice(4);
  const k = values.map((_, i) => i);
  const payPath = line<number>()
    .x((i) => x(values[i]))
    .y((i) => yPay(s.netPay[i]))(k);
  const phiHPath = line<number>()
    .x((i) => x(values[i]))
    .y((i) => yPhiH(s.phiH[i]))(k);
  const lost = s.storageLostShare;
  const yLost = scaleLinear().domain([0, 1]).range([IH, 0]);
  const lostPath = lost
    ? line<number>()
        .x((i) => x(values[i]))
        .y((i) => yLost(lost[i]))(k)
    : null;
  const at = nearest(values, current);
  const title = `Net pay and phi-h against ${LABELS[name]}`;
  return (
    <figure className="wb-plot">
      <figcaption className="wb-plot__title">{LABELS[name]}</figcaption>
      <svg
        role="img"
        aria-label={`${title}: at ${current}, net pay ${fmt(s.netPay[at])} ${depthUnit}, phi-h ${fmt(s.phiH[at])} ${depthUnit}`}
        width={W}
        height={H}
        viewBox={`0 0 ${W} ${H}`}
        className="wb-plot__svg"
        data-sensitivity={name}
      >
        <g transform={`translate(${M.left},${M.top})`}>
          <rect width={IW} height={IH} className="wb-plot__frame" />
          <g transform={`translate(0,${IH})`}>
            <ChartAxis scale={x} orient="bottom" label={`${LABELS[name]} (v/v)`} ticks={5} grid={IH} />
          </g>
          <ChartAxis scale={yPay} orient="left" label={`net pay (${depthUnit})`} ticks={4} grid={IW} />
          <g transform={`translate(${IW},0)`}>
            <ChartAxis scale={yPhiH} orient="right" label={`phi-h (${depthUnit})`} ticks={4} />
          </g>
          {lostPath ? <path d={lostPath} fill="none" stroke={CURVE_COLOURS.vsh} strokeWidth={1.2} strokeDasharray="2 3" data-series="storage-lost" /> : null}
          <path d={payPath ?? ''} fill="none" stroke={CURVE_COLOURS.netPay} strokeWidth={1.8} data-series="net-pay" />
          <path d={phiHPath ?? ''} fill="none" stroke={CURVE_COLOURS.phie} strokeWidth={1.4} strokeDasharray="5 3" data-series="phi-h" />
          <line x1={x(current)} x2={x(current)} y1={0} y2={IH} className="wb-plot__current" />
          <circle cx={x(values[at])} cy={yPay(s.netPay[at])} r={3} fill={CURVE_COLOURS.netPay} />
        </g>
      </svg>
      <div className="wb-plot__key">
        <span style={{ color: CURVE_COLOURS.netPay }}>━ net pay</span>
        <span style={{ color: CURVE_COLOURS.phie }}>╍ phi-h</span>
        {lost ? <span style={{ color: CURVE_COLOURS.vsh }}>┈ storage lost (share)</span> : null}
      </div>
    </figure>
  );
}

function nearest(values: number[], v: number): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (Math.abs(values[i] - v) < Math.abs(values[best] - v)) best = i;
  return best;
}

function fmt(v: number): string {
  return Number.isFinite(v) ? String(Number(v.toPrecision(4))) : '–';
}
