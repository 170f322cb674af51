/**
 * @poreline/core: pure computation for Poreline. No I/O, no Node-only APIs: the same
 * code runs in the service and in the browser. Typed arrays in, new typed arrays out;
 * LAS NULL becomes NaN at the reader and stays NaN.
 *
 * Explicit grouped re-exports only (no `export *`).
 */

// --- LAS reading and writing ---
export { readLas, DEFAULT_LAS_NULL, DEFAULT_NULL_ALIASES } from './las/read-las.js';
export { writeLas } from './las/write-las.js';
export type { LasWriteInput, LasWriteCurve, LasWriteItem, WriteLasOptions } from './las/write-las.js';
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
export {
  FT3_PER_ACRE_FT,
  FT3_PER_BBL,
  M_PER_FT,
  M3_PER_BBL,
  M2_PER_ACRE,
  M3_PER_FT3,
  M2_PER_KM2,
  BBL_PER_ACRE_FT,
  RANKINE_OFFSET,
  DAYS_PER_YEAR,
} from './reserves/units-constants.js';
export { STANDARD_CONDITIONS, fahrenheitToRankine } from './reserves/standard-conditions.js';
export type { StandardConditions } from './reserves/standard-conditions.js';
export {
  hydrocarbonPoreVolumeAcreFt,
  oilInPlace,
  gasInPlace,
  recoverable,
  areaToAcres,
  lengthToFeet,
  stbToM3,
  scfToM3,
  volumetricsMetric,
} from './reserves/volumetrics.js';
export type { AreaUnit, LengthUnit, VolumetricRockInput, VolumetricMetricInput } from './reserves/volumetrics.js';
export { combineWellInputs, WELL_WEIGHTING_NOTES } from './reserves/well-averages.js';
export type { WellPayInput, WellWeighting, CombinedWellInputs } from './reserves/well-averages.js';
export { pseudoCriticalSutton } from './reserves/pseudo-critical.js';
export type { PseudoCritical } from './reserves/pseudo-critical.js';
export { zFactorDak } from './reserves/z-factor-dak.js';
export { zFactorHallYarborough } from './reserves/z-factor-hall-yarborough.js';
export { gasFvf, gasPvt } from './reserves/gas-fvf.js';
export type { GasFvfInput, GasPvtInput, GasPvtResult, ZFactorMethod } from './reserves/gas-fvf.js';
export { normalCdf, normalQuantile, Z_P10 } from './reserves/normal.js';
export { fillUniform, streamSeed } from './reserves/random.js';
export {
  lognormalFromMeanSd,
  lognormalFromP90P10,
  lognormalSummary,
  distributionQuantile,
  sampleDistribution,
  checkDistribution,
} from './reserves/distributions.js';
export type { Distribution, Truncation, LognormalParams, LognormalSummary } from './reserves/distributions.js';
export { runMonteCarlo, sampleInputs, perTrial, MAX_TRIALS } from './reserves/monte-carlo.js';
export type { MonteCarloOptions, MonteCarloRun, VectorModel } from './reserves/monte-carlo.js';
export { percentilesPrms, exceedanceCurve, PRMS_CONVENTION } from './reserves/percentiles.js';
export type { PrmsSummary, ExceedanceCurve } from './reserves/percentiles.js';
export { histogram } from './reserves/histogram.js';
export type { Histogram, HistogramOptions } from './reserves/histogram.js';
export { tornado } from './reserves/tornado.js';
export type { TornadoBase, TornadoOptions, TornadoResult, TornadoRow } from './reserves/tornado.js';
export { evaluateReservesCase, RESERVES_DISCLAIMER } from './reserves/reserves-case.js';
export type {
  ReservesCaseInput,
  ReservesCaseResult,
  ReservesGasInput,
  ReservesInputName,
  InputSummary,
  OutputDistribution,
  VolumePair,
} from './reserves/reserves-case.js';
export {
  arpsRate,
  arpsRates,
  arpsCumulative,
  arpsTimeToRate,
  arpsEur,
  nominalToEffective,
  effectiveToNominal,
} from './reserves/decline.js';
export type { ArpsKind, ArpsParams, ArpsEur } from './reserves/decline.js';
export { fitArpsDecline } from './reserves/decline-fit.js';
export type { ArpsFit, ArpsFitOptions } from './reserves/decline-fit.js';
export { fitPZ, pzCumulativeAt, PZ_METHOD } from './reserves/material-balance.js';
export type { PZFit, PZInput } from './reserves/material-balance.js';
export { wellsNeeded, drainageAreaFromGas, WELL_COUNT_ASSUMPTIONS } from './reserves/well-count.js';
export type { WellCount } from './reserves/well-count.js';
export {
  radialInflowRate,
  joshiHorizontalRate,
  RADIAL_FLOW_CONSTANT,
  DARCY_FIELD_CONSTANT,
} from './reserves/inflow.js';
export type { RadialInflowInput, JoshiInput, JoshiResult, InflowResult } from './reserves/inflow.js';
