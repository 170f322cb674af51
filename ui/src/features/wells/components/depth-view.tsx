import { useMemo } from 'react';
import { buildDepthView, DEFAULT_LAYOUT, type DepthViewLayout, type TrackCurve } from '../utils/depth-tracks';

/**
 * Track colours are Poreline's own "estuary" set: muted, distinct on a light ground, and assigned
 * by track position only (no colour stands for a curve type).
 */
const TRACK_COLOURS = ['#2a6f6a', '#a0612b', '#4f5fa8', '#7b4f7a', '#5d7f3a', '#a14848', '#3b7f99', '#8a7a2e'];

export interface DepthViewProps {
  wellName: string;
  depthUnit: string;
  depth: ArrayLike<number>;
  curves: readonly TrackCurve[];
  layout?: DepthViewLayout;
}

/** Raw curves against depth: one track per curve, side by side, one shared depth scale. */
export function DepthView({ wellName, depthUnit, depth, curves, layout = DEFAULT_LAYOUT }: DepthViewProps) {
  const view = useMemo(() => buildDepthView(depth, curves, layout), [depth, curves, layout]);
  const { headerHeight, plotHeight, trackWidth, depthAxisWidth } = layout;

  return (
    <svg
      role="img"
      aria-label={`Depth view of ${wellName}`}
      width={view.width}
      height={view.height}
      viewBox={`0 0 ${view.width} ${view.height}`}
      className="depth-view"
    >
      <g transform={`translate(0,${headerHeight})`} className="depth-view__depth-axis">
        <text x={depthAxisWidth - 10} y={-10} textAnchor="end" className="depth-view__unit">
          {depthUnit}
        </text>
        {view.depthTicks.map((tick) => (
          <g key={tick.value} transform={`translate(0,${tick.position})`}>
            <line x1={depthAxisWidth - 6} x2={depthAxisWidth} stroke="currentColor" />
            <text x={depthAxisWidth - 10} dy="0.32em" textAnchor="end">
              {tick.label}
            </text>
          </g>
        ))}
      </g>
      {view.tracks.map((track, i) => {
        const colour = TRACK_COLOURS[i % TRACK_COLOURS.length];
        return (
          <g key={`${track.mnemonic}-${i}`} transform={`translate(${track.left},0)`} className="depth-view__track">
            <text x={trackWidth / 2} y={16} textAnchor="middle" className="depth-view__mnemonic" style={{ fill: colour }}>
              {track.mnemonic}
            </text>
            <text x={trackWidth / 2} y={30} textAnchor="middle" className="depth-view__curve-unit">
              {track.unit || 'no unit'}
              {track.scaleType === 'log' ? ' · log' : ''}
            </text>
            {track.ticks.map((tick) => (
              <text key={tick.value} x={tick.position} y={headerHeight - 6} textAnchor={tickAnchor(tick.position, trackWidth)} className="depth-view__tick">
                {tick.label}
              </text>
            ))}
            <g transform={`translate(0,${headerHeight})`}>
              <rect width={trackWidth} height={plotHeight} className="depth-view__frame" />
              {track.ticks.map((tick) => (
                <line key={tick.value} x1={tick.position} x2={tick.position} y2={plotHeight} className="depth-view__grid" />
              ))}
              {view.depthTicks.map((tick) => (
                <line key={tick.value} x2={trackWidth} y1={tick.position} y2={tick.position} className="depth-view__grid" />
              ))}
              {track.path ? (
                <path data-curve={track.mnemonic} d={track.path} fill="none" stroke={colour} strokeWidth={1.25} strokeLinejoin="round" />
              ) : (
                <text x={trackWidth / 2} y={plotHeight / 2} textAnchor="middle" className="depth-view__empty">
                  no samples
                </text>
              )}
            </g>
          </g>
        );
      })}
    </svg>
  );
}

/** Edge ticks are drawn inside their track so neighbouring tracks' labels never collide. */
function tickAnchor(position: number, trackWidth: number): 'start' | 'middle' | 'end' {
  if (position < 12) return 'start';
  if (position > trackWidth - 12) return 'end';
  return 'middle';
}
