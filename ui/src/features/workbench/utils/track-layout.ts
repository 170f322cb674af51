import { CURVE_COLOURS } from '../../../lib/palette';

/**
 * Which curves go in which track of the workbench depth view, and on which scale.
 *
 * Track order follows API RP 31A (the American Petroleum Institute's recommended log
 * heading and track layout): track 1 holds the correlation curves (gamma ray, SP, caliper),
 * then the depth track, then track 2 (resistivities on a logarithmic scale) and track 3
 * (density, neutron, sonic). Poreline adds its computed tracks to the right: Vsh, porosity,
 * saturation, then the net reservoir / net pay flags. Scales, widths, colours, dash patterns
 * and names are Poreline's own.
 */

export type TrackScale = 'linear' | 'log';

export interface TrackCurveSpec {
  /** Curve key in the sample set (GR, RT, PHIE, ...); also its data-curve attribute. */
  key: string;
  label: string;
  unit: string;
  colour: string;
  /** Value at the left edge and at the right edge of the track (reversed scales have left > right). */
  domain: [number, number];
  dash?: string;
}

export interface TrackSpec {
  id: string;
  title: string;
  kind: 'curves' | 'depth' | 'flags';
  scale: TrackScale;
  width: number;
  curves: TrackCurveSpec[];
}

const c = (key: string, label: string, unit: string, colour: string, domain: [number, number], dash?: string): TrackCurveSpec => ({
  key,
  label,
  unit,
  colour,
  domain,
  dash,
});

/** Every track the view knows, in display order; tracks with none of their curves present are dropped. */
const ALL_TRACKS: TrackSpec[] = [
  {
    id: 'correlation',
    title: 'Correlation',
    kind: 'curves',
    scale: 'linear',
    width: 130,
    curves: [
      c('GR', 'GR', 'gAPI', CURVE_COLOURS.gr, [0, 150]),
      c('SP', 'SP', 'mV', CURVE_COLOURS.sp, [-120, 30], '5 3'),
      c('CALI', 'CALI', 'in', CURVE_COLOURS.cali, [6, 16], '2 2'),
    ],
  },
  { id: 'depth', title: 'Depth', kind: 'depth', scale: 'linear', width: 62, curves: [] },
  {
    id: 'resistivity',
    title: 'Resistivity',
    kind: 'curves',
    scale: 'log',
    width: 140,
    curves: [
      c('RT', 'RT deep', 'ohm.m', CURVE_COLOURS.rt, [0.2, 2000]),
      c('RM', 'RM medium', 'ohm.m', CURVE_COLOURS.rm, [0.2, 2000], '6 3'),
      c('RXO', 'RXO shallow', 'ohm.m', CURVE_COLOURS.rxo, [0.2, 2000], '2 2'),
    ],
  },
  {
    id: 'porosity-logs',
    title: 'Density · neutron · sonic',
    kind: 'curves',
    scale: 'linear',
    width: 150,
    curves: [
      c('RHOB', 'RHOB', 'g/cm3', CURVE_COLOURS.rhob, [1.95, 2.95]),
      c('NPHI', 'NPHI', 'v/v', CURVE_COLOURS.nphi, [0.45, -0.15], '6 3'),
      c('DT', 'DT', 'us/ft', CURVE_COLOURS.dt, [140, 40], '2 2'),
      c('PE', 'PE', 'b/e', CURVE_COLOURS.pe, [0, 10], '1 3'),
    ],
  },
  {
    id: 'vsh',
    title: 'Shale volume',
    kind: 'curves',
    scale: 'linear',
    width: 90,
    curves: [c('VSH', 'VSH', 'v/v', CURVE_COLOURS.vsh, [0, 1])],
  },
  {
    id: 'porosity',
    title: 'Porosity',
    kind: 'curves',
    scale: 'linear',
    width: 100,
    curves: [c('PHIT', 'PHIT', 'v/v', CURVE_COLOURS.phit, [0.5, 0], '4 2'), c('PHIE', 'PHIE', 'v/v', CURVE_COLOURS.phie, [0.5, 0])],
  },
  {
    id: 'saturation',
    title: 'Saturation',
    kind: 'curves',
    scale: 'linear',
    width: 100,
    curves: [c('SW', 'SW', 'v/v', CURVE_COLOURS.sw, [1, 0]), c('BVW', 'BVW', 'v/v', CURVE_COLOURS.bvw, [0.5, 0], '4 2')],
  },
  {
    id: 'flags',
    title: 'Net flags',
    kind: 'flags',
    scale: 'linear',
    width: 76,
    curves: [c('NET_RES', 'Net res.', '', CURVE_COLOURS.netReservoir, [0, 1]), c('NET_PAY', 'Net pay', '', CURVE_COLOURS.netPay, [0, 1])],
  },
];

/** The cutoff each computed curve is judged against (drawn as a dashed line inside each zone). */
export const CUTOFF_OF_CURVE: Record<string, 'vshMax' | 'phiMin' | 'swMax'> = { VSH: 'vshMax', PHIE: 'phiMin', SW: 'swMax' };

/**
 * The tracks to draw for the curves present: each track keeps only the curves the set holds,
 * and tracks left empty disappear (the depth track always stays).
 */
export function layoutTracks(present: ReadonlySet<string>): TrackSpec[] {
  return ALL_TRACKS.map((t) => ({ ...t, curves: t.curves.filter((cv) => present.has(cv.key)) })).filter(
    (t) => t.kind === 'depth' || t.curves.length > 0,
  );
}

/** Every curve the layout knows, for the cursor readout (in track order). */
export function knownCurves(): TrackCurveSpec[] {
  return ALL_TRACKS.flatMap((t) => t.curves);
}
