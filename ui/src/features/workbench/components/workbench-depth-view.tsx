import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from 'd3';
import { memo, useCallback, useEffect, useId, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent, type Ref } from 'react';
import type { Cutoffs } from '../../../types/workbench';
import { curvePath, flagPath } from '../utils/curve-path';
import { nearestIndex, panWindow, visibleRange, windowForKey, zoomWindow, type DepthWindow } from '../utils/depth-window';
import { CUTOFF_OF_CURVE, layoutTracks, type TrackCurveSpec, type TrackSpec } from '../utils/track-layout';

export interface DepthViewZone {
  name: string;
  formation: string;
  colour: string;
  top: number;
  base: number;
}

export interface WorkbenchDepthViewProps {
  wellName: string;
  depthUnit: string;
  depth: Float64Array;
  /** Raw and computed curves by key (GR, RT, VSH, NET_PAY, ...), each as long as depth. */
  curves: Readonly<Record<string, ArrayLike<number>>>;
  zones: readonly DepthViewZone[];
  /** Cutoffs by formation name: drawn as dashed lines inside each zone on VSH, PHIE and SW. */
  cutoffs?: Readonly<Record<string, Cutoffs>>;
  /** Formation whose zone is highlighted (the one being tuned). */
  selectedFormation?: string | null;
  /** When set, a click on the plot reports its depth (picking a top) instead of starting a pan. */
  onPickDepth?: (md: number) => void;
  /** Called with the sample index under the cursor (or null when it leaves). */
  onCursor?: (index: number | null) => void;
  plotHeight?: number;
  svgRef?: Ref<SVGSVGElement>;
}

const HEADER_ROW = 15;
const HEADER_TOP = 22;
const TRACK_GAP = 6;
const PAD = 8;

type XScale = ScaleContinuousNumeric<number, number>;

function xScaleFor(track: TrackSpec, curve: TrackCurveSpec): XScale {
  const s = track.scale === 'log' ? scaleLog() : scaleLinear();
  return s.domain(curve.domain).range([0, track.width]) as XScale;
}

/**
 * The well workbench depth view: raw and computed curves in tracks (order after API RP 31A,
 * see track-layout.ts), zone bands with names, cutoff lines, net flags, a depth cursor.
 * Zoom with the wheel or + / -, pan by dragging or with the arrow and page keys, Home resets.
 * D3 computes scales and paths; React renders every node.
 */
export function WorkbenchDepthView({
  wellName,
  depthUnit,
  depth,
  curves,
  zones,
  cutoffs,
  selectedFormation,
  onPickDepth,
  onCursor,
  plotHeight = 620,
  svgRef,
}: WorkbenchDepthViewProps) {
  const uid = useId().replace(/:/g, '');
  const limits = useMemo<DepthWindow>(() => {
    let top = Infinity;
    let base = -Infinity;
    for (let i = 0; i < depth.length; i++) {
      const d = depth[i];
      if (Number.isFinite(d)) {
        if (d < top) top = d;
        if (d > base) base = d;
      }
    }
    if (!(top < base)) return { top: 0, base: 1 };
    return { top, base };
  }, [depth]);
  const [win, setWin] = useState<DepthWindow>(limits);
  const [cursor, setCursor] = useState<number | null>(null);
  useEffect(() => setWin(limits), [limits]);

  const present = useMemo(() => new Set(Object.keys(curves)), [curves]);
  const tracks = useMemo(() => layoutTracks(present), [present]);
  const maxRows = Math.max(1, ...tracks.map((t) => t.curves.length));
  const headerHeight = HEADER_TOP + maxRows * HEADER_ROW + 6;
  const lefts: number[] = [];
  let x = PAD;
  for (const t of tracks) {
    lefts.push(x);
    x += t.width + TRACK_GAP;
  }
  const width = x - TRACK_GAP + PAD;
  const height = headerHeight + plotHeight + PAD;

  const y = useMemo(() => scaleLinear().domain([win.top, win.base]).range([0, plotHeight]), [win, plotHeight]);
  const [start, end] = useMemo(() => visibleRange(depth, win), [depth, win]);
  const depthTicks = useMemo(() => y.ticks(Math.max(3, Math.round(plotHeight / 60))), [y, plotHeight]);
  const visibleZones = zones.filter((z) => z.base >= win.top && z.top <= win.base);

  // Wheel zoom needs a non-passive listener (React's onWheel is passive): attached to our own node.
  const plotRef = useRef<SVGRectElement | null>(null);
  const stateRef = useRef({ win, limits, y });
  stateRef.current = { win, limits, y };
  useEffect(() => {
    const el = plotRef.current;
    if (!el) return;
    const onWheel = (event: WheelEvent) => {
      event.preventDefault();
      const { win: w, limits: l, y: ys } = stateRef.current;
      const rect = el.getBoundingClientRect();
      const anchor = ys.invert(((event.clientY - rect.top) / rect.height) * plotHeight);
      const factor = Math.exp(Math.max(-1, Math.min(1, event.deltaY / 300)));
      setWin(zoomWindow(w, factor, anchor, l));
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => el.removeEventListener('wheel', onWheel);
  }, [plotHeight]);

  const drag = useRef<{ y0: number; win: DepthWindow; moved: boolean } | null>(null);
  const depthAt = useCallback(
    (event: PointerEvent<SVGRectElement>) => {
      const rect = event.currentTarget.getBoundingClientRect();
      return y.invert(((event.clientY - rect.top) / rect.height) * plotHeight);
    },
    [y, plotHeight],
  );
  const setCursorIndex = (i: number | null) => {
    setCursor(i);
    onCursor?.(i);
  };

  const onPointerDown = (event: PointerEvent<SVGRectElement>) => {
    drag.current = { y0: event.clientY, win, moved: false };
    event.currentTarget.setPointerCapture?.(event.pointerId);
  };
  const onPointerMove = (event: PointerEvent<SVGRectElement>) => {
    const d = drag.current;
    if (d) {
      const rect = event.currentTarget.getBoundingClientRect();
      const dy = event.clientY - d.y0;
      if (Math.abs(dy) > 3) d.moved = true;
      if (d.moved) {
        const perPx = (d.win.base - d.win.top) / rect.height;
        setWin(panWindow(d.win, -dy * perPx, limits));
      }
    }
    setCursorIndex(nearestIndex(depth, depthAt(event)));
  };
  const onPointerUp = (event: PointerEvent<SVGRectElement>) => {
    const d = drag.current;
    drag.current = null;
    if (d && !d.moved && onPickDepth) onPickDepth(Math.round(depthAt(event) * 10) / 10);
  };
  const onKeyDown = (event: KeyboardEvent<SVGSVGElement>) => {
    const next = windowForKey(event.key, win, limits);
    if (next) {
      event.preventDefault();
      setWin(next);
    }
  };

  const cursorDepth = cursor !== null && cursor >= 0 ? depth[cursor] : null;
  const spanLabel = `${fmtDepth(win.top)} to ${fmtDepth(win.base)} ${depthUnit}`;

  return (
    <svg
      ref={svgRef}
      role="img"
      aria-label={`Workbench depth view of ${wellName}, showing ${spanLabel}. Arrow keys pan, plus and minus zoom, Home shows the whole well.`}
      tabIndex={0}
      onKeyDown={onKeyDown}
      width={width}
      height={height}
      viewBox={`0 0 ${width} ${height}`}
      className="wb-depth"
      data-window-top={win.top}
      data-window-base={win.base}
    >
      <defs>
        {tracks.map((t, i) => (
          <clipPath key={t.id} id={`${uid}-clip-${t.id}`}>
            <rect x={0} y={0} width={t.width} height={plotHeight} transform={`translate(${lefts[i]},${headerHeight})`} />
          </clipPath>
        ))}
      </defs>
      {tracks.map((track, i) => (
        <g key={track.id} className="wb-depth__track" data-track={track.id}>
          <TrackHeader track={track} left={lefts[i]} depthUnit={depthUnit} />
          <g transform={`translate(${lefts[i]},${headerHeight})`}>
            <rect width={track.width} height={plotHeight} className="wb-depth__frame" />
            {visibleZones.map((z) => (
              <rect
                key={z.name}
                y={Math.max(0, y(z.top))}
                width={track.width}
                height={Math.max(0, Math.min(plotHeight, y(z.base)) - Math.max(0, y(z.top)))}
                fill={z.colour}
                opacity={z.formation === selectedFormation ? 0.28 : 0.14}
              />
            ))}
            {track.kind !== 'depth' ? <TrackGrid track={track} plotHeight={plotHeight} depthTicks={depthTicks.map((t) => y(t))} /> : null}
          </g>
          <g clipPath={`url(#${uid}-clip-${track.id})`}>
            <g transform={`translate(${lefts[i]},${headerHeight})`}>
              {track.kind === 'depth' ? (
                <DepthTrack track={track} y={y} ticks={depthTicks} zones={visibleZones} plotHeight={plotHeight} selected={selectedFormation} />
              ) : track.kind === 'flags' ? (
                <FlagTrack track={track} depth={depth} curves={curves} start={start} end={end} y={y} />
              ) : (
                <CurveTrack track={track} depth={depth} curves={curves} start={start} end={end} y={y} plotHeight={plotHeight} />
              )}
              {track.kind === 'curves' ? <CutoffLines track={track} zones={visibleZones} cutoffs={cutoffs} y={y} /> : null}
              {visibleZones.map((z) => (
                <line key={z.name} x1={0} x2={track.width} y1={y(z.top)} y2={y(z.top)} stroke={z.colour} strokeWidth={1.5} className="wb-depth__top-line" />
              ))}
            </g>
          </g>
        </g>
      ))}
      {cursorDepth !== null && cursorDepth >= win.top && cursorDepth <= win.base ? (
        <g transform={`translate(0,${headerHeight + y(cursorDepth)})`} className="wb-depth__cursor" pointerEvents="none">
          <line x1={PAD} x2={width - PAD} />
        </g>
      ) : null}
      <rect
        ref={plotRef}
        x={PAD}
        y={headerHeight}
        width={width - 2 * PAD}
        height={plotHeight}
        className={onPickDepth ? 'wb-depth__overlay wb-depth__overlay--pick' : 'wb-depth__overlay'}
        data-testid="depth-view-plot"
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
        onPointerLeave={() => {
          drag.current = null;
          setCursorIndex(null);
        }}
      />
    </svg>
  );
}

function fmtDepth(v: number): string {
  return (Math.round(v * 10) / 10).toString();
}

function fmtScale(v: number): string {
  const a = Math.abs(v);
  if (a >= 1000) return `${v / 1000}k`;
  return String(Number(v.toPrecision(3)));
}

function TrackHeader({ track, left, depthUnit }: { track: TrackSpec; left: number; depthUnit: string }) {
  return (
    <g transform={`translate(${left},0)`} className="wb-depth__header">
      <text x={track.width / 2} y={13} textAnchor="middle" className="wb-depth__track-title">
        {track.kind === 'depth' ? `MD ${depthUnit}` : track.title}
      </text>
      {track.curves.map((cv, k) => {
        const yy = HEADER_TOP + k * HEADER_ROW;
        return (
          <g key={cv.key} transform={`translate(0,${yy})`}>
            <line x1={2} x2={track.width - 2} y1={10} y2={10} stroke={cv.colour} strokeWidth={1.6} strokeDasharray={cv.dash} />
            <text x={2} y={7} className="wb-depth__scale">
              {track.kind === 'flags' ? '' : fmtScale(cv.domain[0])}
            </text>
            <text x={track.width / 2} y={7} textAnchor="middle" className="wb-depth__curve-label" style={{ fill: cv.colour }}>
              {cv.label}
            </text>
            <text x={track.width - 2} y={7} textAnchor="end" className="wb-depth__scale">
              {track.kind === 'flags' ? '' : fmtScale(cv.domain[1])}
            </text>
          </g>
        );
      })}
    </g>
  );
}

function TrackGrid({ track, plotHeight, depthTicks }: { track: TrackSpec; plotHeight: number; depthTicks: number[] }) {
  let xs: number[] = [];
  if (track.kind === 'curves' && track.curves.length) {
    if (track.scale === 'log') {
      const s = xScaleFor(track, track.curves[0]);
      const [a, b] = track.curves[0].domain;
      for (let e = Math.ceil(Math.log10(Math.min(a, b))); e <= Math.floor(Math.log10(Math.max(a, b))); e++) xs.push(s(10 ** e));
    } else {
      xs = [1, 2, 3].map((k) => (track.width * k) / 4);
    }
  }
  return (
    <g className="wb-depth__grid">
      {xs.map((gx) => (
        <line key={gx} x1={gx} x2={gx} y2={plotHeight} />
      ))}
      {depthTicks.map((gy) => (
        <line key={gy} x2={track.width} y1={gy} y2={gy} />
      ))}
    </g>
  );
}

interface TrackDataProps {
  track: TrackSpec;
  depth: Float64Array;
  curves: Readonly<Record<string, ArrayLike<number>>>;
  start: number;
  end: number;
  y: (v: number) => number;
}

const CurveTrack = memo(function CurveTrack({ track, depth, curves, start, end, y, plotHeight }: TrackDataProps & { plotHeight: number }) {
  return (
    <g>
      {track.curves.map((cv) => {
        const values = curves[cv.key];
        if (!values) return null;
        const xs = xScaleFor(track, cv);
        const d = curvePath({
          depth,
          values,
          start,
          end,
          x: xs,
          y,
          rows: plotHeight,
          usable: track.scale === 'log' ? (v) => v > 0 : undefined,
          clampX: [0, track.width],
        });
        return (
          <path
            key={cv.key}
            data-curve={cv.key}
            d={d}
            fill="none"
            stroke={cv.colour}
            strokeWidth={1.3}
            strokeDasharray={cv.dash}
            strokeLinejoin="round"
          />
        );
      })}
    </g>
  );
});

const FlagTrack = memo(function FlagTrack({ track, depth, curves, start, end, y }: TrackDataProps) {
  const half = track.width / track.curves.length;
  return (
    <g>
      {track.curves.map((cv, k) => {
        const values = curves[cv.key];
        if (!values) return null;
        return (
          <path
            key={cv.key}
            data-curve={cv.key}
            d={flagPath(depth, values, start, end, y, k * half + 2, (k + 1) * half - 2)}
            fill={cv.colour}
            fillOpacity={0.85}
            stroke="none"
          />
        );
      })}
    </g>
  );
});

function CutoffLines({
  track,
  zones,
  cutoffs,
  y,
}: {
  track: TrackSpec;
  zones: readonly DepthViewZone[];
  cutoffs?: Readonly<Record<string, Cutoffs>>;
  y: (v: number) => number;
}) {
  if (!cutoffs) return null;
  const lines: { key: string; x: number; y1: number; y2: number; colour: string }[] = [];
  for (const cv of track.curves) {
    const which = CUTOFF_OF_CURVE[cv.key];
    if (!which) continue;
    const xs = xScaleFor(track, cv);
    for (const z of zones) {
      const value = cutoffs[z.formation]?.[which];
      if (value === undefined || value === null) continue;
      lines.push({ key: `${cv.key}-${z.name}`, x: xs(value), y1: y(z.top), y2: y(z.base), colour: cv.colour });
    }
  }
  return (
    <g className="wb-depth__cutoffs">
      {lines.map((l) => (
        <line key={l.key} data-cutoff={l.key} x1={l.x} x2={l.x} y1={l.y1} y2={l.y2} stroke={l.colour} strokeDasharray="3 3" strokeWidth={1.2} />
      ))}
    </g>
  );
}

function DepthTrack({
  track,
  y,
  ticks,
  zones,
  plotHeight,
  selected,
}: {
  track: TrackSpec;
  y: (v: number) => number;
  ticks: number[];
  zones: readonly DepthViewZone[];
  plotHeight: number;
  selected?: string | null;
}) {
  const strip = 12;
  return (
    <g className="wb-depth__depth-track">
      {zones.map((z) => {
        const y0 = Math.max(0, y(z.top));
        const y1 = Math.min(plotHeight, y(z.base));
        const mid = (y0 + y1) / 2;
        return (
          <g key={z.name}>
            <rect x={0} y={y0} width={strip} height={Math.max(0, y1 - y0)} fill={z.colour} />
            {y1 - y0 > 24 ? (
              <text
                transform={`translate(${strip / 2 + 0.5},${mid}) rotate(-90)`}
                textAnchor="middle"
                dy="0.32em"
                className={z.formation === selected ? 'wb-depth__zone-name wb-depth__zone-name--selected' : 'wb-depth__zone-name'}
              >
                {y1 - y0 > z.name.length * 6 ? z.name : z.name.slice(0, Math.max(2, Math.floor((y1 - y0) / 7)))}
              </text>
            ) : null}
          </g>
        );
      })}
      {ticks.map((t) => (
        <g key={t} transform={`translate(0,${y(t)})`}>
          <line x1={track.width - 6} x2={track.width} stroke="currentColor" />
          <text x={track.width - 8} dy="0.32em" textAnchor="end" className="wb-depth__depth-label">
            {fmtDepth(t)}
          </text>
        </g>
      ))}
    </g>
  );
}
