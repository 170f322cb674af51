/**
 * Shapes of the Wrenmoor earth model: formations made of layers, hydrocarbon compartments
 * with flat contacts, and wells. Depths are feet; TVDSS is true vertical depth below sea
 * level (positive down); MD is measured depth from the well's kelly bushing (KB).
 */

export type Lithology = 'sandstone' | 'shaly_sand' | 'shale' | 'limestone';
export type Fluid = 'gas' | 'oil' | 'water';
/** Rock matrix a formation's porosity tools are referred to. */
export type Matrix = 'sandstone' | 'limestone';
/** Shale-volume transform of the gamma-ray index the formation is evaluated with. */
export type VshTransform = 'linear' | 'larionov_tertiary' | 'larionov_older' | 'steiber' | 'clavier';
/** Saturation relation the formation's deep resistivity follows (and is evaluated with). */
export type SaturationRelation = 'archie' | 'simandoux';

/** Thickness of a layer inside its formation: fixed feet, or a share of what remains. */
export type LayerThickness = { kind: 'fixed'; ft: number } | { kind: 'share'; weight: number };

/** One layer of uniform rock inside a formation. */
export interface Layer {
  name: string;
  lithology: Lithology;
  thickness: LayerThickness;
  /** True effective porosity, v/v. */
  porosity: number;
  /** Shale volume, v/v. */
  vsh: number;
  /** Water saturation in each fluid leg, v/v of pore volume. */
  sw: { gas: number; oil: number; water: number };
  /** Hydrocarbon compartment whose contacts set the fluid; null: water-bearing everywhere. */
  compartment: string | null;
}

/** Saturation-relation constants (Archie a, m, n; shale resistivity for Simandoux). */
export interface ResistivityConstants {
  relation: SaturationRelation;
  a: number;
  m: number;
  n: number;
  /** Shale resistivity, ohm.m (Simandoux only). */
  rsh?: number;
}

/** A formation: the interval between its top and the next formation's top. */
export interface Formation {
  name: string;
  /** Dominant lithology (for display). */
  lithology: Lithology;
  matrix: Matrix;
  vshTransform: VshTransform;
  resistivity: ResistivityConstants;
  /** True vertical thickness (ft) at map position (x east, y north, ft). */
  isochore: (x: number, y: number) => number;
  layers: Layer[];
}

/**
 * A hydrocarbon compartment: flat contacts at TVDSS (ft). Gas above `goc`, oil from `goc`
 * to `owc`, water below `owc`. A gas reservoir without oil has goc = owc (its gas-water contact).
 */
export interface Compartment {
  name: string;
  goc: number;
  owc: number;
  /** Gas gravity (air = 1) of the compartment's free gas. */
  gasGravity: number;
}

/** Well path: vertical, or vertical to a kick-off point, a constant build, then a straight hold. */
export type Trajectory =
  | { kind: 'vertical' }
  | { kind: 'build_hold'; kickoffMd: number; buildRateDegPer100Ft: number; holdInclinationDeg: number; azimuthDeg: number };

/**
 * How a well's logs are delivered as files (the special cases the loader has to handle).
 * Two runs: run 1 is logged from the top of the logs to `overlapFt` below the split depth
 * (`splitOffsetFt` below the top of `splitAnchor`), run 2 from the split depth to the base.
 */
export type Delivery =
  | { kind: 'las2' }
  | { kind: 'las2_metric' }
  | { kind: 'las2_wrapped' }
  | { kind: 'las3' }
  | { kind: 'las2_two_runs'; splitAnchor: string; splitOffsetFt: number; overlapFt: number };

export interface WellSpec {
  name: string;
  uwi: string;
  /** Surface location, ft east and north of the field origin. */
  x: number;
  y: number;
  groundElevationFt: number;
  /** KB height above ground, ft. */
  kbHeightFt: number;
  trajectory: Trajectory;
  delivery: Delivery;
  status: 'gas producer' | 'oil producer' | 'suspended oil well' | 'observation' | 'dry hole';
  logDate: string;
  /**
   * Null runs to write: curve mnemonic, an interval starting `offsetFt` (MD) below the anchor
   * (the top of the logs, or a formation top), `lengthFt` long.
   */
  nullRuns: { curve: string; anchor: string; offsetFt: number; lengthFt: number }[];
  /** Washouts: hole enlarged to `peakIn` inches, centred `offsetFt` below the anchor's top, `halfWidthFt` each side. */
  washouts: { anchor: string; offsetFt: number; halfWidthFt: number; peakIn: number }[];
}
