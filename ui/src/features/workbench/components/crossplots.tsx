import { interpolateRgbBasis, scaleLinear, scaleLog } from 'd3';
import type { Ref } from 'react';
import { ChartAxis, decades, formatDecade } from '../../../components/chart-axis';
import { CURVE_COLOURS, SW_RAMP } from '../../../lib/palette';
import type { Cutoffs } from '../../../types/workbench';

/**
 * The three tuning crossplots, each over the samples of the selected formation's zones:
 * neutron-density, Pickett (log Rt against log porosity with iso-Sw lines from the zone's
 * Archie parameters) and porosity against Vsh coloured by Sw with the cutoff box.
 * D3 makes the scales; React draws the points.
 */

const W = 300;
const H = 260;
const M = { top: 14, right: 14, bottom: 44, left: 52 };
const IW = W - M.left - M.right;
const IH = H - M.top - M.bottom;
const MAX_POINTS = 2500;

/** Indices of the samples inside the zones, thinned evenly to at most MAX_POINTS. */
export function zoneSampleIndices(depth: ArrayLike<number>, zones: readonly { top: number; base: number }[]): number[] {
  const all: number[] = [];
  for (let i = 0; i < depth.length; i++) {
    const d = depth[i];
    if (zones.some((z) => d >= z.top && d < z.base)) all.push(i);
  }
  if (all.length <= MAX_POINTS) return all;
  const stride = all.length / MAX_POINTS;
  const out: number[] = [];
  for (let k = 0; k < MAX_POINTS; k++) out.push(all[Math.floor(k * stride)]);
  return out;
}

interface PlotFrameProps {
  title: string;
  svgRef?: Ref<SVGSVGElement>;
  children: React.ReactNode;
  description: string;
}

function PlotFrame({ title, children, description, svgRef }: PlotFrameProps) {
  return (
    <figure className="wb-plot">
      <figcaption className="wb-plot__title">{title}</figcaption>
      <svg ref={svgRef} role="img" aria-label={`${title}: ${description}`} width={W} height={H} viewBox={`0 0 ${W} ${H}`} className="wb-plot__svg">
        <g transform={`translate(${M.left},${M.top})`}>
          <rect width={IW} height={IH} className="wb-plot__frame" />
          {children}
        </g>
      </svg>
    </figure>
  );
}

const fin = (v: number) => Number.isFinite(v);

export interface NeutronDensityPlotProps {
  nphi: ArrayLike<number> | undefined;
  rhob: ArrayLike<number> | undefined;
  indices: readonly number[];
  colour: string;
  /** Matrix and fluid density of the zone, for its clean water-filled line. */
  rhoMatrix?: number;
  rhoFluid?: number;
}

/**
 * Neutron (v/v) across, bulk density down-scale (light at the top). The line is the clean,
 * water-filled response of the zone's matrix: RHOB = rhoMa - phi (rhoMa - rhoF) at NPHI = phi,
 * assuming the neutron reads true porosity on that matrix // common practice.
 */
export function NeutronDensityPlot({ nphi, rhob, indices, colour, rhoMatrix, rhoFluid }: NeutronDensityPlotProps) {
  const x = scaleLinear().domain([-0.05, 0.45]).range([0, IW]);
  const y = scaleLinear().domain([1.9, 2.9]).range([0, IH]);
  if (!nphi || !rhob) {
    return (
      <PlotFrame title="Neutron-density" description="needs NPHI and RHOB">
        <text x={IW / 2} y={IH / 2} textAnchor="middle" className="wb-plot__empty">
          needs NPHI and RHOB
        </text>
      </PlotFrame>
    );
  }
  const line =
    rhoMatrix !== undefined && rhoFluid !== undefined
      ? [0, 0.45].map((p) => ({ x: x(p), y: y(rhoMatrix - p * (rhoMatrix - rhoFluid)) }))
      : null;
  return (
    <PlotFrame title="Neutron-density" description={`${indices.length} samples`}>
      <g transform={`translate(0,${IH})`}>
        <ChartAxis scale={x} orient="bottom" label="NPHI (v/v)" ticks={5} grid={IH} />
      </g>
      <ChartAxis scale={y} orient="left" label="RHOB (g/cm3)" ticks={5} grid={IW} />
      <g className="wb-plot__points" data-plot="neutron-density">
        {indices.map((i) =>
          fin(nphi[i]) && fin(rhob[i]) ? (
            <circle key={i} cx={clamp(x(nphi[i]), 0, IW)} cy={clamp(y(rhob[i]), 0, IH)} r={1.8} fill={colour} fillOpacity={0.55} />
          ) : null,
        )}
      </g>
      {line ? (
        <g>
          <line x1={line[0].x} y1={line[0].y} x2={line[1].x} y2={line[1].y} stroke={CURVE_COLOURS.nphi} strokeWidth={1.5} strokeDasharray="5 3" />
          <text x={line[0].x + 4} y={line[0].y - 6} className="wb-plot__note">
            clean, water-filled
          </text>
        </g>
      ) : null}
    </PlotFrame>
  );
}

export interface PickettPlotProps {
  phie: ArrayLike<number> | undefined;
  rt: ArrayLike<number> | undefined;
  sw: ArrayLike<number> | undefined;
  indices: readonly number[];
  /** Archie parameters of the zone and Rw at the zone's formation temperature (ohm.m). */
  a: number;
  m: number;
  n: number;
  rw: number | null;
  swMax: number;
}

/**
 * Pickett plot (Pickett 1966): log Rt up, log porosity across. Iso-Sw lines from Archie:
 * Rt = a Rw / (phi^m Sw^n), for Sw = 1, 0.5, 0.25 and the formation's Sw max.
 */
export function PickettPlot({ phie, rt, sw, indices, a, m, n, rw, swMax }: PickettPlotProps) {
  const x = scaleLog().domain([0.01, 1]).range([0, IW]);
  const y = scaleLog().domain([0.1, 1000]).range([IH, 0]);
  const ramp = interpolateRgbBasis([...SW_RAMP]);
  const lines: { sw: number; d: string; label: string; strong: boolean }[] = [];
  if (rw !== null && rw > 0 && a > 0 && m > 0 && n > 0) {
    const levels = [1, 0.5, 0.25];
    if (!levels.some((l) => Math.abs(l - swMax) < 1e-9)) levels.push(swMax);
    for (const s of levels) {
      const pts: string[] = [];
      for (let k = 0; k <= 40; k++) {
        const phi = 10 ** (-2 + (2 * k) / 40);
        const r = (a * rw) / (phi ** m * s ** n);
        if (r < 0.1 || r > 1000) continue;
        pts.push(`${x(phi).toFixed(1)},${y(r).toFixed(1)}`);
      }
      if (pts.length > 1) lines.push({ sw: s, d: `M${pts.join('L')}`, label: `Sw ${s}`, strong: Math.abs(s - swMax) < 1e-9 });
    }
  }
  return (
    <PlotFrame title="Pickett" description={rw === null ? 'Rw not resolved' : `Rw ${rw.toPrecision(3)} ohm.m, m ${m}, n ${n}`}>
      <g transform={`translate(0,${IH})`}>
        <ChartAxis scale={x} orient="bottom" label="PHIE (v/v, log)" tickValues={decades(0.01, 1)} format={formatDecade} grid={IH} />
      </g>
      <ChartAxis scale={y} orient="left" label="RT (ohm.m, log)" tickValues={decades(0.1, 1000)} format={formatDecade} grid={IW} />
      <g className="wb-plot__points" data-plot="pickett">
        {phie && rt
          ? indices.map((i) =>
              phie[i] > 0 && rt[i] > 0 ? (
                <circle
                  key={i}
                  cx={clamp(x(phie[i]), 0, IW)}
                  cy={clamp(y(rt[i]), 0, IH)}
                  r={1.8}
                  fill={sw && fin(sw[i]) ? ramp(sw[i]) : '#888'}
                  fillOpacity={0.65}
                />
              ) : null,
            )
          : null}
      </g>
      {lines.map((l) => (
        <g key={l.sw} data-iso-sw={l.sw}>
          <path d={l.d} fill="none" stroke={l.strong ? CURVE_COLOURS.netPay : CURVE_COLOURS.sw} strokeWidth={l.strong ? 1.8 : 1} strokeDasharray={l.strong ? undefined : '4 3'} />
        </g>
      ))}
      {lines.length ? (
        <text x={IW - 4} y={12} textAnchor="end" className="wb-plot__note">
          iso-Sw: {lines.map((l) => l.sw).join(', ')}
        </text>
      ) : null}
    </PlotFrame>
  );
}

export interface PhiVshPlotProps {
  phie: ArrayLike<number> | undefined;
  vsh: ArrayLike<number> | undefined;
  sw: ArrayLike<number> | undefined;
  indices: readonly number[];
  cutoffs: Cutoffs;
}

/** Effective porosity against Vsh, each point coloured by its Sw; the shaded box is net reservoir. */
export function PhiVshPlot({ phie, vsh, sw, indices, cutoffs }: PhiVshPlotProps) {
  const x = scaleLinear().domain([0, 1]).range([0, IW]);
  const y = scaleLinear().domain([0, 0.4]).range([IH, 0]);
  const ramp = interpolateRgbBasis([...SW_RAMP]);
  const bx = x(cutoffs.vshMax);
  const by = y(Math.min(0.4, cutoffs.phiMin));
  return (
    <PlotFrame title="Porosity vs Vsh" description={`coloured by Sw; Vsh max ${cutoffs.vshMax}, porosity min ${cutoffs.phiMin}`}>
      <rect x={0} y={0} width={bx} height={by} className="wb-plot__net-box" data-net-box="" />
      <g transform={`translate(0,${IH})`}>
        <ChartAxis scale={x} orient="bottom" label="VSH (v/v)" ticks={5} grid={IH} />
      </g>
      <ChartAxis scale={y} orient="left" label="PHIE (v/v)" ticks={4} grid={IW} />
      <g className="wb-plot__points" data-plot="phi-vsh">
        {phie && vsh
          ? indices.map((i) =>
              fin(phie[i]) && fin(vsh[i]) ? (
                <circle
                  key={i}
                  cx={x(vsh[i])}
                  cy={clamp(y(phie[i]), 0, IH)}
                  r={1.8}
                  fill={sw && fin(sw[i]) ? ramp(sw[i]) : '#888'}
                  fillOpacity={0.65}
                />
              ) : null,
            )
          : null}
      </g>
      <line x1={bx} x2={bx} y1={0} y2={IH} stroke={CURVE_COLOURS.vsh} strokeDasharray="4 3" />
      <line x1={0} x2={IW} y1={by} y2={by} stroke={CURVE_COLOURS.phie} strokeDasharray="4 3" />
      <SwLegend />
    </PlotFrame>
  );
}

function SwLegend() {
  const ramp = interpolateRgbBasis([...SW_RAMP]);
  const stops = [0, 0.25, 0.5, 0.75, 1];
  return (
    <g transform={`translate(${IW - 92},6)`} className="wb-plot__legend">
      <text x={0} y={8}>
        Sw
      </text>
      {stops.map((s, k) => (
        <g key={s} transform={`translate(${18 + k * 14},0)`}>
          <rect width={12} height={10} fill={ramp(s)} />
        </g>
      ))}
      <text x={18} y={22} className="wb-plot__note">
        0
      </text>
      <text x={18 + 4 * 14 + 12} y={22} textAnchor="end" className="wb-plot__note">
        1
      </text>
    </g>
  );
}

function clamp(v: number, lo: number, hi: number): number {
  return v < lo ? lo : v > hi ? hi : v;
}
