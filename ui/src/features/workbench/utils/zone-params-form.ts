import { z } from 'zod';

/**
 * The zone parameters form: flat string values (what the inputs hold), a zod schema that turns
 * them into numbers with messages naming each field by its label, and the mapping to and from
 * core's ZoneParameters (the JSON the server stores and validates again).
 */

export const VSH_METHOD_LABELS = {
  linear: 'Linear GR index',
  larionov_tertiary: 'Larionov, tertiary rocks',
  larionov_older: 'Larionov, older rocks',
  steiber: 'Steiber',
  clavier: 'Clavier',
} as const;

export const POROSITY_METHOD_LABELS = {
  density: 'Density',
  neutron_density: 'Neutron-density',
  neutron_density_gas: 'Neutron-density, gas form',
  sonic_wyllie: 'Sonic, Wyllie',
  sonic_rhg: 'Sonic, Raymer-Hunt-Gardner',
} as const;

export const SW_MODEL_LABELS = { archie: 'Archie', simandoux: 'Simandoux', indonesia: 'Indonesia' } as const;

export const LITHOLOGY_LABELS = { sandstone: 'Sandstone', shaly_sand: 'Shaly sand', limestone: 'Limestone', dolomite: 'Dolomite' } as const;

type Keys<T> = keyof T & string;

export interface ZoneParamsFormValues {
  vshMethod: Keys<typeof VSH_METHOD_LABELS>;
  grPick: 'fixed' | 'percentile';
  grClean: string;
  grShale: string;
  grCleanPercentile: string;
  grShalePercentile: string;
  porosityMethod: Keys<typeof POROSITY_METHOD_LABELS>;
  rhoMatrix: string;
  rhoFluid: string;
  dtMatrix: string;
  dtFluid: string;
  sonicCompaction: string;
  phiShale: string;
  phiMax: string;
  temperatureUnit: 'F' | 'C';
  temperatureKind: 'gradient' | 'bht' | 'constant';
  surfaceTemperature: string;
  gradientPer100: string;
  bht: string;
  bhtDepth: string;
  constantTemperature: string;
  rwKind: 'at_temperature' | 'ssp' | 'pickett';
  rw: string;
  rwTemperature: string;
  ssp: string;
  rmf: string;
  rmfTemperature: string;
  pickettTop: string;
  pickettBase: string;
  pickettFitM: boolean;
  swModel: Keys<typeof SW_MODEL_LABELS>;
  a: string;
  m: string;
  n: string;
  rsh: string;
  permMethod: 'none' | 'timur' | 'coates';
  swIrr: string;
}

/** Human labels of the fields: the same words the form shows and the messages use. */
export const FIELD_LABELS: Record<string, string> = {
  grClean: 'GR clean',
  grShale: 'GR shale',
  grCleanPercentile: 'GR clean percentile',
  grShalePercentile: 'GR shale percentile',
  rhoMatrix: 'Matrix density',
  rhoFluid: 'Fluid density',
  dtMatrix: 'Matrix transit time',
  dtFluid: 'Fluid transit time',
  sonicCompaction: 'Compaction factor',
  phiShale: 'Shale porosity',
  phiMax: 'Porosity max',
  surfaceTemperature: 'Surface temperature',
  gradientPer100: 'Temperature gradient',
  bht: 'Bottom-hole temperature',
  bhtDepth: 'BHT depth',
  constantTemperature: 'Zone temperature',
  rw: 'Rw',
  rwTemperature: 'Rw temperature',
  ssp: 'SSP',
  rmf: 'Rmf',
  rmfTemperature: 'Rmf temperature',
  pickettTop: 'Pickett interval top',
  pickettBase: 'Pickett interval base',
  a: 'Tortuosity a',
  m: 'Cementation m',
  n: 'Saturation exponent n',
  rsh: 'Rsh',
  swIrr: 'Irreducible Sw',
};

const numberText = z.string().trim();

/** A finite number parsed from text, or NaN (the superRefine below names what is wrong). */
const toNumber = (s: string) => (s.trim() === '' ? NaN : Number(s));

export const zoneParamsSchema = z
  .object({
    vshMethod: z.enum(Object.keys(VSH_METHOD_LABELS) as [Keys<typeof VSH_METHOD_LABELS>], { error: 'Vsh method must be chosen' }),
    grPick: z.enum(['fixed', 'percentile']),
    grClean: numberText,
    grShale: numberText,
    grCleanPercentile: numberText,
    grShalePercentile: numberText,
    porosityMethod: z.enum(Object.keys(POROSITY_METHOD_LABELS) as [Keys<typeof POROSITY_METHOD_LABELS>], { error: 'Porosity method must be chosen' }),
    rhoMatrix: numberText,
    rhoFluid: numberText,
    dtMatrix: numberText,
    dtFluid: numberText,
    sonicCompaction: numberText,
    phiShale: numberText,
    phiMax: numberText,
    temperatureUnit: z.enum(['F', 'C']),
    temperatureKind: z.enum(['gradient', 'bht', 'constant']),
    surfaceTemperature: numberText,
    gradientPer100: numberText,
    bht: numberText,
    bhtDepth: numberText,
    constantTemperature: numberText,
    rwKind: z.enum(['at_temperature', 'ssp', 'pickett']),
    rw: numberText,
    rwTemperature: numberText,
    ssp: numberText,
    rmf: numberText,
    rmfTemperature: numberText,
    pickettTop: numberText,
    pickettBase: numberText,
    pickettFitM: z.boolean(),
    swModel: z.enum(Object.keys(SW_MODEL_LABELS) as [Keys<typeof SW_MODEL_LABELS>], { error: 'Sw model must be chosen' }),
    a: numberText,
    m: numberText,
    n: numberText,
    rsh: numberText,
    permMethod: z.enum(['none', 'timur', 'coates']),
    swIrr: numberText,
  })
  .superRefine((v, ctx) => {
    const issue = (field: keyof ZoneParamsFormValues, what: string) =>
      ctx.addIssue({ code: 'custom', path: [field], message: `${FIELD_LABELS[field] ?? field} ${what}` });
    /** The number in a field, or undefined after reporting that it is not one. */
    const num = (field: keyof ZoneParamsFormValues): number | undefined => {
      const x = toNumber(v[field] as string);
      if (!Number.isFinite(x)) {
        issue(field, (v[field] as string).trim() === '' ? 'is required' : 'must be a number');
        return undefined;
      }
      return x;
    };
    const positive = (field: keyof ZoneParamsFormValues) => {
      const x = num(field);
      if (x !== undefined && !(x > 0)) issue(field, 'must be greater than 0');
      return x;
    };
    const inRange = (field: keyof ZoneParamsFormValues, lo: number, hi: number, loOpen = false, hiOpen = false) => {
      const x = num(field);
      if (x !== undefined && ((loOpen ? x <= lo : x < lo) || (hiOpen ? x >= hi : x > hi))) {
        issue(field, `must be ${loOpen ? '>' : '≥'} ${lo} and ${hiOpen ? '<' : '≤'} ${hi}`);
      }
      return x;
    };

    if (v.grPick === 'fixed') {
      const c = num('grClean');
      const s = num('grShale');
      if (c !== undefined && s !== undefined && !(s > c)) issue('grShale', `must be greater than GR clean (${c} gAPI)`);
    } else {
      const c = inRange('grCleanPercentile', 0, 100);
      const s = inRange('grShalePercentile', 0, 100);
      if (c !== undefined && s !== undefined && !(s > c)) issue('grShalePercentile', 'must be greater than GR clean percentile');
    }
    if (v.porosityMethod.startsWith('sonic')) {
      const ma = positive('dtMatrix');
      const fl = positive('dtFluid');
      if (ma !== undefined && fl !== undefined && !(fl > ma)) issue('dtFluid', `must be greater than matrix transit time (${ma} us/ft)`);
      positive('sonicCompaction');
    } else {
      const ma = positive('rhoMatrix');
      const fl = positive('rhoFluid');
      if (ma !== undefined && fl !== undefined && ma === fl) issue('rhoMatrix', `must differ from fluid density (both ${ma} g/cm3)`);
    }
    inRange('phiShale', 0, 1, false, true);
    inRange('phiMax', 0, 1, true, false);
    // Temperatures must stay above Arps' pole (-6.77 F, -21.5 C).
    const pole = v.temperatureUnit === 'F' ? -6.77 : -21.5;
    const aboveArps = (field: keyof ZoneParamsFormValues) => {
      const x = num(field);
      if (x !== undefined && !(x > pole)) issue(field, `must be above ${pole} °${v.temperatureUnit}`);
    };
    if (v.temperatureKind === 'gradient') {
      num('surfaceTemperature');
      num('gradientPer100');
    } else if (v.temperatureKind === 'bht') {
      num('surfaceTemperature');
      num('bht');
      positive('bhtDepth');
    } else aboveArps('constantTemperature');
    if (v.rwKind === 'at_temperature') {
      positive('rw');
      aboveArps('rwTemperature');
    } else if (v.rwKind === 'ssp') {
      if (v.ssp.trim() !== '') num('ssp');
      positive('rmf');
      aboveArps('rmfTemperature');
    } else {
      const t = num('pickettTop');
      const b = num('pickettBase');
      if (t !== undefined && b !== undefined && !(b > t)) issue('pickettBase', `must be deeper than Pickett interval top (${t})`);
    }
    positive('a');
    positive('m');
    positive('n');
    if (v.swModel !== 'archie') positive('rsh');
    if (v.permMethod !== 'none' && v.swIrr.trim() !== '') inRange('swIrr', 0, 1, true, false);
  });

/** Core's ZoneParameters as plain JSON (kept loose here; the server validates the shape). */
export interface ZoneParametersJson {
  vshMethod: string;
  grClean: number | null;
  grShale: number | null;
  grCleanPercentile: number;
  grShalePercentile: number;
  porosityMethod: string;
  rhoMatrix: number;
  rhoFluid: number;
  dtMatrix: number;
  dtFluid: number;
  sonicCompaction: number;
  phiShale: number;
  phiMax: number;
  temperatureUnit: 'F' | 'C';
  temperature:
    | { kind: 'gradient'; surfaceTemperature: number; gradientPer100: number }
    | { kind: 'bht'; surfaceTemperature: number; bht: number; bhtDepth: number }
    | { kind: 'constant'; temperature: number };
  rw:
    | { kind: 'at_temperature'; rw: number; temperature: number }
    | { kind: 'ssp'; ssp: number | null; rmf: number; rmfTemperature: number }
    | { kind: 'pickett'; top: number; base: number; fitM: boolean };
  swModel: string;
  a: number;
  m: number;
  n: number;
  rsh: number | null;
  permeability: { method: string; swIrr: number | null } | null;
}

const s = (x: number | null | undefined) => (x === null || x === undefined || !Number.isFinite(x) ? '' : String(x));

/** Form values from stored parameters (unset fields of other branches get empty text or a neutral value). */
export function toFormValues(p: ZoneParametersJson): ZoneParamsFormValues {
  const t = p.temperature;
  const rw = p.rw;
  return {
    vshMethod: p.vshMethod as ZoneParamsFormValues['vshMethod'],
    grPick: p.grClean === null || p.grShale === null ? 'percentile' : 'fixed',
    grClean: s(p.grClean),
    grShale: s(p.grShale),
    grCleanPercentile: s(p.grCleanPercentile),
    grShalePercentile: s(p.grShalePercentile),
    porosityMethod: p.porosityMethod as ZoneParamsFormValues['porosityMethod'],
    rhoMatrix: s(p.rhoMatrix),
    rhoFluid: s(p.rhoFluid),
    dtMatrix: s(p.dtMatrix),
    dtFluid: s(p.dtFluid),
    sonicCompaction: s(p.sonicCompaction),
    phiShale: s(p.phiShale),
    phiMax: s(p.phiMax),
    temperatureUnit: p.temperatureUnit,
    temperatureKind: t.kind,
    surfaceTemperature: t.kind === 'constant' ? '' : s(t.surfaceTemperature),
    gradientPer100: t.kind === 'gradient' ? s(t.gradientPer100) : '',
    bht: t.kind === 'bht' ? s(t.bht) : '',
    bhtDepth: t.kind === 'bht' ? s(t.bhtDepth) : '',
    constantTemperature: t.kind === 'constant' ? s(t.temperature) : '',
    rwKind: rw.kind,
    rw: rw.kind === 'at_temperature' ? s(rw.rw) : '',
    rwTemperature: rw.kind === 'at_temperature' ? s(rw.temperature) : '',
    ssp: rw.kind === 'ssp' ? s(rw.ssp) : '',
    rmf: rw.kind === 'ssp' ? s(rw.rmf) : '',
    rmfTemperature: rw.kind === 'ssp' ? s(rw.rmfTemperature) : '',
    pickettTop: rw.kind === 'pickett' ? s(rw.top) : '',
    pickettBase: rw.kind === 'pickett' ? s(rw.base) : '',
    pickettFitM: rw.kind === 'pickett' ? rw.fitM : false,
    swModel: p.swModel as ZoneParamsFormValues['swModel'],
    a: s(p.a),
    m: s(p.m),
    n: s(p.n),
    rsh: s(p.rsh),
    permMethod: p.permeability ? (p.permeability.method as 'timur' | 'coates') : 'none',
    swIrr: p.permeability ? s(p.permeability.swIrr) : '',
  };
}

/**
 * Parameters from validated form values. Fields of the branches not chosen keep the previous
 * parameters' values (so switching porosity method back and forth loses nothing).
 */
export function toZoneParameters(v: ZoneParamsFormValues, previous: ZoneParametersJson): ZoneParametersJson {
  const n = (x: string, fallback: number) => (x.trim() === '' || !Number.isFinite(Number(x)) ? fallback : Number(x));
  const sonic = v.porosityMethod.startsWith('sonic');
  return {
    vshMethod: v.vshMethod,
    grClean: v.grPick === 'fixed' ? Number(v.grClean) : null,
    grShale: v.grPick === 'fixed' ? Number(v.grShale) : null,
    grCleanPercentile: n(v.grCleanPercentile, previous.grCleanPercentile),
    grShalePercentile: n(v.grShalePercentile, previous.grShalePercentile),
    porosityMethod: v.porosityMethod,
    rhoMatrix: sonic ? n(v.rhoMatrix, previous.rhoMatrix) : Number(v.rhoMatrix),
    rhoFluid: sonic ? n(v.rhoFluid, previous.rhoFluid) : Number(v.rhoFluid),
    dtMatrix: sonic ? Number(v.dtMatrix) : n(v.dtMatrix, previous.dtMatrix),
    dtFluid: sonic ? Number(v.dtFluid) : n(v.dtFluid, previous.dtFluid),
    sonicCompaction: n(v.sonicCompaction, previous.sonicCompaction),
    phiShale: Number(v.phiShale),
    phiMax: Number(v.phiMax),
    temperatureUnit: v.temperatureUnit,
    temperature:
      v.temperatureKind === 'gradient'
        ? { kind: 'gradient', surfaceTemperature: Number(v.surfaceTemperature), gradientPer100: Number(v.gradientPer100) }
        : v.temperatureKind === 'bht'
          ? { kind: 'bht', surfaceTemperature: Number(v.surfaceTemperature), bht: Number(v.bht), bhtDepth: Number(v.bhtDepth) }
          : { kind: 'constant', temperature: Number(v.constantTemperature) },
    rw:
      v.rwKind === 'at_temperature'
        ? { kind: 'at_temperature', rw: Number(v.rw), temperature: Number(v.rwTemperature) }
        : v.rwKind === 'ssp'
          ? { kind: 'ssp', ssp: v.ssp.trim() === '' ? null : Number(v.ssp), rmf: Number(v.rmf), rmfTemperature: Number(v.rmfTemperature) }
          : { kind: 'pickett', top: Number(v.pickettTop), base: Number(v.pickettBase), fitM: v.pickettFitM },
    swModel: v.swModel,
    a: Number(v.a),
    m: Number(v.m),
    n: Number(v.n),
    rsh: v.swModel !== 'archie' ? Number(v.rsh) : Number(v.rsh) > 0 ? Number(v.rsh) : null,
    permeability: v.permMethod === 'none' ? null : { method: v.permMethod, swIrr: v.swIrr.trim() === '' ? null : Number(v.swIrr) },
  };
}
