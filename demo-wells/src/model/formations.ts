/**
 * The Wrenmoor stratigraphy, top to bottom, with each formation's layers, and the
 * hydrocarbon compartments. All names are invented.
 *
 * | formation          | lithology  | layers (top to bottom)                                   | fluids            |
 * |--------------------|------------|----------------------------------------------------------|-------------------|
 * | Greyling Shale     | shale      | seal                                                     | water             |
 * | Fenna Sand         | sandstone  | upper clean sand, lower shalier sand                     | gas over water    |
 * | Marrow Shale       | shale      | shale, a 5 ft sand (the thin bed), shale                 | thin bed: oil/water |
 * | Wren Sand          | sandstone  | 3.5 ft calcite-cemented streak (the tight streak), upper and lower sand | gas cap, oil leg, water |
 * | Tillet Shaly Sand  | shaly sand | one shaly sand                                           | oil/water (Wren contacts) |
 * | Corrie Limestone   | limestone  | porous limestone, tight limestone                        | water             |
 * | Pellow Shale       | shale      | shale (logged for about 35 ft)                           | water             |
 */
import { wrenTopTvdss as wrenTop } from './structure.js';
import type { Compartment, Formation, Layer } from './types.js';

const water = (sw = 1) => ({ gas: sw, oil: sw, water: 1 });

function shaleLayer(name: string, share = 1): Layer {
  return { name, lithology: 'shale', thickness: { kind: 'share', weight: share }, porosity: 0.02, vsh: 0.88, sw: water(), compartment: null };
}

const SIMANDOUX = { relation: 'simandoux', a: 1, m: 2, n: 2, rsh: 3.0 } as const;

/** The logged overburden above the Greyling Shale top (not a zone; no top is picked). */
export const OVERBURDEN: Formation = {
  name: 'Overburden',
  lithology: 'shale',
  matrix: 'sandstone',
  vshTransform: 'linear',
  resistivity: SIMANDOUX,
  isochore: () => 1000,
  layers: [{ name: 'Overburden mudstone', lithology: 'shale', thickness: { kind: 'share', weight: 1 }, porosity: 0.03, vsh: 0.74, sw: water(), compartment: null }],
};

export const FORMATIONS: readonly Formation[] = [
  {
    name: 'Greyling Shale',
    lithology: 'shale',
    matrix: 'sandstone',
    vshTransform: 'linear',
    resistivity: SIMANDOUX,
    isochore: (x, y) => 120 + 0.0012 * x - 0.0008 * y + 3 * Math.cos(y / 3500),
    layers: [shaleLayer('Greyling shale')],
  },
  {
    name: 'Fenna Sand',
    lithology: 'sandstone',
    matrix: 'sandstone',
    vshTransform: 'linear',
    resistivity: { relation: 'archie', a: 1, m: 2, n: 2 },
    isochore: (x, y) => 46 + 0.001 * x + 2 * Math.sin(x / 4000) + 0.0002 * y,
    layers: [
      { name: 'Fenna upper sand', lithology: 'sandstone', thickness: { kind: 'share', weight: 0.6 }, porosity: 0.215, vsh: 0.06, sw: { gas: 0.17, oil: 0.22, water: 1 }, compartment: 'Fenna' },
      { name: 'Fenna lower sand', lithology: 'shaly_sand', thickness: { kind: 'share', weight: 0.4 }, porosity: 0.17, vsh: 0.16, sw: { gas: 0.26, oil: 0.3, water: 1 }, compartment: 'Fenna' },
    ],
  },
  {
    name: 'Marrow Shale',
    lithology: 'shale',
    matrix: 'sandstone',
    vshTransform: 'linear',
    resistivity: SIMANDOUX,
    isochore: (x, y) => 60 - 0.0009 * x + 0.0006 * y,
    layers: [
      shaleLayer('Marrow upper shale', 0.42),
      { name: 'Marrow thin sand', lithology: 'sandstone', thickness: { kind: 'fixed', ft: 5 }, porosity: 0.19, vsh: 0.1, sw: { gas: 0.3, oil: 0.34, water: 1 }, compartment: 'Marrow thin sand' },
      shaleLayer('Marrow lower shale', 0.58),
    ],
  },
  {
    name: 'Wren Sand',
    lithology: 'sandstone',
    matrix: 'sandstone',
    vshTransform: 'linear',
    // Winsauer et al. (1952) a = 0.62, m = 2.15 (the "Humble" constants) for the main reservoir.
    resistivity: { relation: 'archie', a: 0.62, m: 2.15, n: 2 },
    isochore: (x, y) => 92 - 0.0012 * x + 0.001 * y + 3 * Math.cos(x / 5000),
    layers: [
      { name: 'Wren cemented streak', lithology: 'sandstone', thickness: { kind: 'fixed', ft: 3.5 }, porosity: 0.045, vsh: 0.05, sw: { gas: 0.7, oil: 0.7, water: 1 }, compartment: 'Wren' },
      { name: 'Wren upper sand', lithology: 'sandstone', thickness: { kind: 'share', weight: 0.55 }, porosity: 0.245, vsh: 0.05, sw: { gas: 0.15, oil: 0.21, water: 1 }, compartment: 'Wren' },
      { name: 'Wren lower sand', lithology: 'sandstone', thickness: { kind: 'share', weight: 0.45 }, porosity: 0.215, vsh: 0.08, sw: { gas: 0.18, oil: 0.25, water: 1 }, compartment: 'Wren' },
    ],
  },
  {
    name: 'Tillet Shaly Sand',
    lithology: 'shaly_sand',
    matrix: 'sandstone',
    vshTransform: 'larionov_older',
    resistivity: SIMANDOUX,
    isochore: (x, y) => 52 + 0.0008 * y,
    layers: [
      { name: 'Tillet shaly sand', lithology: 'shaly_sand', thickness: { kind: 'share', weight: 1 }, porosity: 0.165, vsh: 0.26, sw: { gas: 0.3, oil: 0.36, water: 1 }, compartment: 'Wren' },
    ],
  },
  {
    name: 'Corrie Limestone',
    lithology: 'limestone',
    matrix: 'limestone',
    vshTransform: 'linear',
    resistivity: { relation: 'archie', a: 1, m: 2, n: 2 },
    isochore: (x) => 85 + 0.001 * x,
    layers: [
      { name: 'Corrie porous limestone', lithology: 'limestone', thickness: { kind: 'share', weight: 0.7 }, porosity: 0.12, vsh: 0.04, sw: water(), compartment: null },
      { name: 'Corrie tight limestone', lithology: 'limestone', thickness: { kind: 'share', weight: 0.3 }, porosity: 0.035, vsh: 0.06, sw: water(), compartment: null },
    ],
  },
  {
    name: 'Pellow Shale',
    lithology: 'shale',
    matrix: 'sandstone',
    vshTransform: 'linear',
    resistivity: SIMANDOUX,
    isochore: () => 300,
    layers: [shaleLayer('Pellow shale')],
  },
];

/** Index of the Wren Sand, the formation the structure map is drawn on. */
export const WREN_INDEX = 3;

/** Hydrocarbon compartments, contacts TVDSS ft (model choice). The Marrow thin sand has no gas cap: its goc lies above the crest. */
export const COMPARTMENTS: readonly Compartment[] = [
  { name: 'Fenna', goc: 4838, owc: 4838, gasGravity: 0.66 },
  { name: 'Marrow thin sand', goc: 4700, owc: 4945, gasGravity: 0.7 },
  { name: 'Wren', goc: 4948, owc: 5012, gasGravity: 0.7 },
];

export function compartmentByName(name: string): Compartment {
  const c = COMPARTMENTS.find((k) => k.name === name);
  if (!c) throw new RangeError(`compartmentByName: unknown compartment '${name}'`);
  return c;
}

/**
 * TVDSS (ft) of every formation top at (x, y), top to bottom, plus the base of the last
 * formation. The Wren Sand top is the structure map; tops above subtract isochores, tops
 * below add them.
 */
export function formationTopsTvdss(x: number, y: number): number[] {
  const tops = new Array<number>(FORMATIONS.length + 1);
  tops[WREN_INDEX] = wrenTop(x, y);
  for (let k = WREN_INDEX - 1; k >= 0; k--) tops[k] = tops[k + 1] - FORMATIONS[k].isochore(x, y);
  for (let k = WREN_INDEX + 1; k <= FORMATIONS.length; k++) tops[k] = tops[k - 1] + FORMATIONS[k - 1].isochore(x, y);
  return tops;
}


/**
 * Layer boundaries of one formation, TVDSS ft, from its top and true vertical thickness:
 * fixed layers keep their thickness, shared layers split the rest by weight.
 * Throws RangeError when the fixed layers do not fit.
 */
export function layerBoundaries(formation: Formation, top: number, thickness: number): number[] {
  const fixed = formation.layers.reduce((s, l) => s + (l.thickness.kind === 'fixed' ? l.thickness.ft : 0), 0);
  const weights = formation.layers.reduce((s, l) => s + (l.thickness.kind === 'share' ? l.thickness.weight : 0), 0);
  const rest = thickness - fixed;
  if (!(rest > 0)) throw new RangeError(`layerBoundaries: fixed layers of ${formation.name} exceed its thickness`);
  const out = [top];
  let z = top;
  for (const l of formation.layers) {
    z += l.thickness.kind === 'fixed' ? l.thickness.ft : (rest * l.thickness.weight) / weights;
    out.push(z);
  }
  return out;
}
