/**
 * @poreline/core: pure computation for Poreline. No I/O, no Node-only APIs: the same
 * code runs in the service and in the browser. Typed arrays in, new typed arrays out;
 * LAS NULL becomes NaN at the reader and stays NaN.
 *
 * Explicit grouped re-exports only (no `export *`).
 */

// --- LAS reading and writing ---
export { readLas, DEFAULT_LAS_NULL, DEFAULT_NULL_ALIASES } from './las/read-las.js';
export { LasParseError } from './las/errors.js';
export type { LasParseErrorKind, LasDiagnostic } from './las/errors.js';
export type {
  LasFile,
  LasCurve,
  LasHeaderItem,
  LasSections,
  LasRawSection,
  LasIndexInfo,
  LasDirection,
  ReadLasOptions,
} from './las/types.js';

// --- Units and curve recognition ---
export { parseUnit, depthUnitOf, feetToMetres, metresToFeet, convertDepths, METRES_PER_FOOT } from './units/units.js';
export type { UnitInfo, UnitQuantity } from './units/units.js';
export { normaliseCurveUnits } from './units/normalise-curve-units.js';
export type { NormalisedCurve } from './units/normalise-curve-units.js';
export { CURVE_CLASSES, curveClassInfo } from './curves/curve-classes.js';
export type { CurveClass, CurveClassInfo } from './curves/curve-classes.js';
export { recogniseCurve } from './curves/recognise-curve.js';
export type { CurveRecognition } from './curves/recognise-curve.js';

// --- Petrophysics: shale volume, porosity, water resistivity, saturation ---

// --- Cutoffs, zone summaries, sensitivity, deviation survey, pipeline ---

// --- Binary transfer of curve samples ---
export { encodeCurveBundle, decodeCurveBundle } from './transfer/curve-bundle.js';
export type { CurveBundle, CurveBundleEntry } from './transfer/curve-bundle.js';

// --- Reserves: volumetrics, gas PVT, Monte Carlo, decline, material balance, inflow ---
