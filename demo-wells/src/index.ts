/**
 * @poreline/demo-wells: the invented Wrenmoor Field, generated from a known layered earth
 * model, and the check that an evaluation recovers the model ("model vs evaluated").
 *
 * Pure modules (no I/O) except load.ts, which reads the committed files with node:fs.
 */

// --- Field identity and the model's choices ---
export { FIELD_NAME, OPERATOR_NAME, FIELD_SEED, STEP_FT, STEP_M } from './model/constants.js';
export { FORMATIONS, COMPARTMENTS } from './model/formations.js';
export { WELLS, wellByName } from './model/wells.js';
export { ACCUMULATIONS } from './model/accumulations.js';
export type { Accumulation } from './model/accumulations.js';
export type { Formation, Layer, Compartment, WellSpec, Trajectory, Lithology, Fluid } from './model/types.js';

// --- Evaluation inputs of the model (zone parameters and cutoffs) ---
export { MODEL_CUTOFFS, formationZoneParameters, shaleDensityPorosity } from './model/parameters.js';
export type { ModelCutoffs, ModelZoneParameters } from './model/parameters.js';
export { zoneParametersFor, formationZones, fluidZones } from './check/zones.js';
export type { DemoZone } from './check/zones.js';

// --- The model's truth ---
export { modelTruth, modelJson } from './model/field.js';
export type { ModelTruth, WellTruth } from './model/field.js';
export type { ZoneTruth, FluidZoneTruth, IntervalTruth } from './model/truth.js';
export { accumulationVolume } from './model/volumes.js';
export type { AccumulationVolume, AccumulationWellInput } from './model/volumes.js';

// --- Model vs evaluated ---
export { compareWithModel, compareVolumesWithModel, POROSITY_TOLERANCE, SW_TOLERANCE, VOLUME_TOLERANCE } from './check/compare.js';
export type { ComparisonRow, VolumeComparisonRow, EvaluatedWell, EvaluatedZone, EvaluatedInterval, ComparedQuantity } from './check/compare.js';
export { canonicalLog, spliceRuns } from './check/well-curves.js';
export { evaluateDemoWell, demoWellLog } from './check/evaluate-demo.js';
export type { DemoWellFiles } from './check/evaluate-demo.js';
export type { CanonicalLog, CanonicalKey } from './check/well-curves.js';
export { parseTopsCsv, parseSurveyCsv } from './check/text-files.js';
export type { TopRow, SurveyRow } from './check/text-files.js';

// --- Files: the list, the generator, and reading them from disk ---
export { demoFileEntries, demoLasFiles } from './files.js';
export type { DemoFileEntry, DemoFileKind } from './files.js';
export { generateDemoField } from './generate.js';
export type { GeneratedFile } from './generate.js';
export { demoFieldFiles, allDemoFiles, readDemoFile, readDemoText, demoTops, demoSurvey, DEMO_DATA_DIR } from './load.js';
export type { DemoFieldFile } from './load.js';
