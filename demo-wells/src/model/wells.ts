/**
 * The ten Wrenmoor wells (invented names and identifiers). Surface locations are feet east
 * and north of the field origin on an invented local grid.
 *
 * Special cases: WM-5 is logged in metres; WM-6 is delivered wrapped; WM-9 as LAS 3.0; WM-4
 * in two logging runs to splice; WM-7 is deviated (build and hold) with its survey; washouts
 * in WM-2 and WM-6; null runs in WM-3, WM-8 and WM-10. WM-1 produces gas from the Fenna Sand,
 * WM-4 oil from the Wren Sand, WM-8 found the Wren below the oil-water contact.
 */
import type { WellSpec } from './types.js';

const LAS2 = { kind: 'las2' } as const;
const VERTICAL = { kind: 'vertical' } as const;

export const WELLS: readonly WellSpec[] = [
  {
    name: 'WM-1', uwi: 'WRN-0001', x: 200, y: 300, groundElevationFt: 318.7, kbHeightFt: 24.6,
    trajectory: VERTICAL, delivery: LAS2, status: 'gas producer', logDate: '2019-03-14',
    nullRuns: [], washouts: [],
  },
  {
    name: 'WM-2', uwi: 'WRN-0002', x: -1800, y: -900, groundElevationFt: 297.3, kbHeightFt: 24.6,
    trajectory: VERTICAL, delivery: LAS2, status: 'observation', logDate: '2019-07-02',
    nullRuns: [], washouts: [{ anchor: 'Greyling Shale', offsetFt: 55, halfWidthFt: 14, peakIn: 11.8 }],
  },
  {
    name: 'WM-3', uwi: 'WRN-0003', x: 2400, y: 1200, groundElevationFt: 341.2, kbHeightFt: 25.9,
    trajectory: VERTICAL, delivery: LAS2, status: 'suspended oil well', logDate: '2019-11-21',
    nullRuns: [{ curve: 'NPHI', anchor: 'Greyling Shale', offsetFt: 30, lengthFt: 24 }], washouts: [],
  },
  {
    name: 'WM-4', uwi: 'WRN-0004', x: -3500, y: 1500, groundElevationFt: 276.4, kbHeightFt: 25.9,
    trajectory: VERTICAL,
    delivery: { kind: 'las2_two_runs', splitAnchor: 'Marrow Shale', splitOffsetFt: 10, overlapFt: 60 },
    status: 'oil producer', logDate: '2020-02-09', nullRuns: [], washouts: [],
  },
  {
    name: 'WM-5', uwi: 'WRN-0005', x: 3600, y: -1800, groundElevationFt: 352.9, kbHeightFt: 27.1,
    trajectory: VERTICAL, delivery: { kind: 'las2_metric' }, status: 'observation', logDate: '2020-06-17',
    nullRuns: [{ curve: 'SP', anchor: 'log_top', offsetFt: 0, lengthFt: 40 }], washouts: [],
  },
  {
    name: 'WM-6', uwi: 'WRN-0006', x: -1200, y: 3000, groundElevationFt: 289.8, kbHeightFt: 24.6,
    trajectory: VERTICAL, delivery: { kind: 'las2_wrapped' }, status: 'observation', logDate: '2020-09-30',
    nullRuns: [], washouts: [{ anchor: 'Pellow Shale', offsetFt: 14, halfWidthFt: 9, peakIn: 10.9 }],
  },
  {
    name: 'WM-7', uwi: 'WRN-0007', x: -5200, y: -3600, groundElevationFt: 305.1, kbHeightFt: 27.1,
    trajectory: { kind: 'build_hold', kickoffMd: 3000, buildRateDegPer100Ft: 3, holdInclinationDeg: 35, azimuthDeg: 40 },
    delivery: LAS2, status: 'observation', logDate: '2021-01-26', nullRuns: [], washouts: [],
  },
  {
    name: 'WM-8', uwi: 'WRN-0008', x: 8000, y: 2500, groundElevationFt: 366.4, kbHeightFt: 25.9,
    trajectory: VERTICAL, delivery: LAS2, status: 'dry hole', logDate: '2021-05-12',
    nullRuns: [{ curve: 'DT', anchor: 'log_top', offsetFt: 0, lengthFt: 62 }], washouts: [],
  },
  {
    name: 'WM-9', uwi: 'WRN-0009', x: 800, y: -3200, groundElevationFt: 331.8, kbHeightFt: 24.6,
    trajectory: VERTICAL, delivery: { kind: 'las3' }, status: 'observation', logDate: '2021-08-04',
    nullRuns: [], washouts: [],
  },
  {
    name: 'WM-10', uwi: 'WRN-0010', x: -6000, y: 500, groundElevationFt: 284.2, kbHeightFt: 27.1,
    trajectory: VERTICAL, delivery: LAS2, status: 'observation', logDate: '2021-12-15',
    nullRuns: [{ curve: 'RT', anchor: 'log_top', offsetFt: 0, lengthFt: 16 }], washouts: [],
  },
];

/** KB elevation above sea level, ft. */
export function kbElevationFt(w: WellSpec): number {
  return w.groundElevationFt + w.kbHeightFt;
}

export function wellByName(name: string): WellSpec {
  const w = WELLS.find((k) => k.name === name);
  if (!w) throw new RangeError(`wellByName: unknown well '${name}'`);
  return w;
}
