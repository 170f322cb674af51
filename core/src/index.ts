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
export {
  VSH_METHODS,
  gammaRayIndex,
  larionovTertiary,
  larionovOlder,
  steiber,
  clavier,
  vshFromIndex,
  shaleVolume,
  gammaRayPercentiles,
} from './petro/shale-volume.js';
export type { VshMethod, ShaleVolumeParams } from './petro/shale-volume.js';
export {
  MATRIX_CONSTANTS,
  FLUID_CONSTANTS,
  densityPorosity,
  bulkDensityFromPorosity,
  neutronDensityPorosity,
  neutronDensityGasPorosity,
  shalePorosityFromDensity,
  effectivePorosity,
  densityPorosityCurve,
  neutronDensityPorosityCurve,
  effectivePorosityCurve,
} from './petro/porosity.js';
export type { Lithology, DensityPorosityParams } from './petro/porosity.js';
export { sonicPorosityWyllie, transitTimeWyllie, sonicPorosityRhg, transitTimeRhg, sonicPorosity } from './petro/sonic-porosity.js';
export type { SonicPorosityParams } from './petro/sonic-porosity.js';
export {
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  celsiusToKelvin,
  toFahrenheit,
  temperatureLine,
  formationTemperature,
} from './petro/temperature.js';
export type { TemperatureUnit, TemperatureModel } from './petro/temperature.js';
export { arpsOffset, resistivityAtTemperature, arpsRw, spCoefficient, rwFromSsp } from './petro/water-resistivity.js';
export type { SspParams } from './petro/water-resistivity.js';
export { pickettFit } from './petro/pickett.js';
export type { PickettFit } from './petro/pickett.js';
export {
  SW_MODELS,
  formationFactor,
  archieSaturation,
  archieResistivity,
  simandouxSaturation,
  simandouxResistivity,
  indonesiaSaturation,
  indonesiaResistivity,
  waterSaturation,
} from './petro/saturation.js';
export type { SwModel, SaturationParams } from './petro/saturation.js';
export { bulkVolumeWater, bulkVolumeWaterCurve } from './petro/bulk-volume-water.js';
export {
  PERMEABILITY_METHODS,
  timurPermeability,
  coatesPermeability,
  permeabilityFrom,
  permeabilityCurve,
} from './petro/permeability.js';
export type { PermeabilityMethod } from './petro/permeability.js';
export { clampCurve } from './petro/clamp.js';
export type { ClampResult } from './petro/clamp.js';

// --- Cutoffs, zone summaries, sensitivity, deviation survey, pipeline ---
export { evaluateWell } from './evaluation/pipeline.js';
export type {
  EvaluateWellInput,
  EvaluateWellResult,
  EvaluatedCurves,
  EvaluationZone,
  EvaluationWarning,
  ResolvedZoneParameters,
  WellCurves,
} from './evaluation/pipeline.js';
export { POROSITY_METHODS, defaultZoneParameters, validateZoneParameters } from './evaluation/zone-parameters.js';
export type {
  ZoneParameters,
  PorosityMethod,
  RwSource,
  PermeabilityParameters,
  DefaultLithology,
} from './evaluation/zone-parameters.js';
export { applyCutoffs, reservoirFlag, payFlag, cutoffIssues } from './evaluation/cutoffs.js';
export type { CutoffSet, CutoffTable, CutoffCurves, ZoneInterval } from './evaluation/cutoffs.js';
export { summariseZones } from './evaluation/zone-summary.js';
export type { ZoneSummary, IntervalSummary, Thickness, SummariseInput } from './evaluation/zone-summary.js';
export { cutoffSensitivity } from './evaluation/sensitivity.js';
export type { CutoffName, CutoffSensitivity } from './evaluation/sensitivity.js';
export {
  sampleBoundaries,
  sampleThickness,
  zoneSampleRanges,
  zoneBoundsIssues,
  depthIssues,
} from './evaluation/sample-thickness.js';
export type { ZoneBounds, ZoneRange } from './evaluation/sample-thickness.js';
export { sampleGeometry, surveyPath } from './evaluation/sample-geometry.js';
export type { SampleGeometry, SurveyInput } from './evaluation/sample-geometry.js';
export { QC_VSH_CLIPPED, QC_PHIT_CLAMPED, QC_PHIE_CLAMPED, QC_SW_CLAMPED, QC_SW_NO_ROOT } from './evaluation/qc.js';
export { EVALUATION_CONVENTIONS } from './evaluation/conventions.js';
export type { EvaluationConvention } from './evaluation/conventions.js';
export { EvaluationInputError, formatIssue } from './evaluation/errors.js';
export type { ParameterIssue } from './evaluation/errors.js';
export {
  minimumCurvature,
  surveyPathFromTable,
  positionsAtMd,
  positionAtMd,
  ratioFactor,
  trueVerticalThickness,
} from './survey/minimum-curvature.js';
export type { SurveyStation, SurveyTable, SurveyPath, PathPositions } from './survey/minimum-curvature.js';

// --- Binary transfer of curve samples ---
export { encodeCurveBundle, decodeCurveBundle } from './transfer/curve-bundle.js';
export type { CurveBundle, CurveBundleEntry } from './transfer/curve-bundle.js';
export { float64ToBytes, bytesToFloat64 } from './transfer/float64-bytes.js';

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
export { normalCorrelationForRank, sampleRankCorrelation, MAX_RANK_CORRELATION } from './reserves/rank-correlation.js';
export type { InputCorrelation } from './reserves/rank-correlation.js';
export { percentilesPrms, exceedanceCurve, PRMS_CONVENTION } from './reserves/percentiles.js';
export type { PrmsSummary, ExceedanceCurve } from './reserves/percentiles.js';
export { histogram } from './reserves/histogram.js';
export type { Histogram, HistogramOptions } from './reserves/histogram.js';
export { tornado } from './reserves/tornado.js';
export type { TornadoBase, TornadoOptions, TornadoResult, TornadoRow } from './reserves/tornado.js';
export { evaluateReservesCase, RESERVES_DISCLAIMER, TORNADO_CORRELATION_NOTE } from './reserves/reserves-case.js';
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
export { gasRadialInflowRate, GAS_RADIAL_FLOW_CONSTANT } from './reserves/gas-inflow.js';
export type { GasInflowInput, GasInflowResult } from './reserves/gas-inflow.js';
