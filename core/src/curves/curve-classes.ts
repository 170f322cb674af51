/**
 * Curve classes Poreline evaluates with, and the alias table that recognises them.
 *
 * The classes follow the property classes of the Energistics Practical Well Log Standard
 * (PWLS), the open vendor-neutral catalogue that groups logging-company curve mnemonics under
 * common property classes (from memory: PWLS v3.0 classes such as "gamma ray", "spontaneous
 * potential", "caliper", "bulk density", "neutron porosity", "compressional slowness",
 * "photoelectric factor" and resistivity by depth of investigation; the PWLS tables were not
 * read for this file). The mnemonic lists are NOT copied from PWLS: they are mnemonics
 * commonly met in LAS files (common practice), each list kept short and unambiguous.
 */
import type { UnitQuantity } from '../units/units.js';

export type CurveClass =
  | 'gamma_ray'
  | 'spontaneous_potential'
  | 'caliper'
  | 'bulk_density'
  | 'neutron_porosity'
  | 'sonic'
  | 'photoelectric'
  | 'deep_resistivity'
  | 'medium_resistivity'
  | 'shallow_resistivity';

export interface CurveClassInfo {
  curveClass: CurveClass;
  /** Human label (English). */
  label: string;
  /** PWLS property class the class corresponds to (from memory, see file comment). */
  pwls: string;
  /** Quantity of the curve's unit, and the canonical unit Poreline computes in. */
  quantity: UnitQuantity;
  canonicalUnit: string;
  /** Mnemonics, upper case (common practice). */
  mnemonics: readonly string[];
  /** Lower-case phrases that identify the class in a curve description. */
  keywords: readonly string[];
}

export const CURVE_CLASSES: readonly CurveClassInfo[] = [
  {
    curveClass: 'gamma_ray',
    label: 'Gamma ray',
    pwls: 'gamma ray',
    quantity: 'gamma',
    canonicalUnit: 'gAPI',
    mnemonics: ['GR', 'GRC', 'GRD', 'GRS', 'SGR', 'CGR', 'HSGR', 'HCGR', 'ECGR', 'GAM', 'GAMMA'],
    keywords: ['gamma ray', 'gamma-ray', 'gammaray'],
  },
  {
    curveClass: 'spontaneous_potential',
    label: 'Spontaneous potential',
    pwls: 'spontaneous potential',
    quantity: 'potential',
    canonicalUnit: 'mV',
    mnemonics: ['SP', 'SPC', 'SPBR'],
    keywords: ['spontaneous potential', 'self potential', 'self-potential'],
  },
  {
    curveClass: 'caliper',
    label: 'Caliper',
    pwls: 'caliper (borehole diameter)',
    quantity: 'diameter',
    canonicalUnit: 'in',
    mnemonics: ['CALI', 'CAL', 'CALS', 'CALX', 'CALY', 'CAL1', 'CAL2', 'C1', 'C2', 'HCAL', 'LCAL', 'HD'],
    keywords: ['caliper', 'hole diameter', 'borehole diameter'],
  },
  {
    curveClass: 'bulk_density',
    label: 'Bulk density',
    pwls: 'bulk density',
    quantity: 'density',
    canonicalUnit: 'g/cm3',
    mnemonics: ['RHOB', 'RHOZ', 'ZDEN', 'DEN', 'DENS', 'HDEN'],
    keywords: ['bulk density'],
  },
  {
    curveClass: 'neutron_porosity',
    label: 'Neutron porosity',
    pwls: 'neutron porosity',
    quantity: 'fraction',
    canonicalUnit: 'v/v',
    mnemonics: ['NPHI', 'TNPH', 'NPOR', 'CNC', 'CNCF', 'CN', 'NEU', 'NEUT', 'PHIN', 'APLC'],
    keywords: ['neutron porosity', 'neutron'],
  },
  {
    curveClass: 'sonic',
    label: 'Sonic (compressional slowness)',
    pwls: 'compressional slowness',
    quantity: 'slowness',
    canonicalUnit: 'us/ft',
    mnemonics: ['DT', 'DTC', 'DTCO', 'DT4P', 'DTP', 'AC', 'SONIC'],
    keywords: ['sonic', 'delta-t', 'delta t', 'transit time', 'compressional slowness', 'slowness'],
  },
  {
    curveClass: 'photoelectric',
    label: 'Photoelectric factor',
    pwls: 'photoelectric factor',
    quantity: 'photoelectric',
    canonicalUnit: 'b/e',
    mnemonics: ['PE', 'PEF', 'PEFZ'],
    keywords: ['photoelectric', 'photo-electric', 'pe factor'],
  },
  {
    curveClass: 'deep_resistivity',
    label: 'Deep resistivity',
    pwls: 'deep resistivity',
    quantity: 'resistivity',
    canonicalUnit: 'ohm.m',
    mnemonics: ['ILD', 'RILD', 'IDPH', 'LLD', 'HLLD', 'RD', 'RDEP', 'RDEEP', 'RT', 'AT90', 'AHT90', 'RLA5', 'RESD'],
    keywords: ['deep resistivity', 'deep induction', 'laterolog deep', 'true resistivity', 'deep'],
  },
  {
    curveClass: 'medium_resistivity',
    label: 'Medium resistivity',
    pwls: 'medium resistivity',
    quantity: 'resistivity',
    canonicalUnit: 'ohm.m',
    mnemonics: ['ILM', 'RILM', 'IMPH', 'LLM', 'RMED', 'AT30', 'AHT30', 'RLA3', 'RESM'],
    keywords: ['medium resistivity', 'medium induction', 'medium'],
  },
  {
    curveClass: 'shallow_resistivity',
    label: 'Shallow resistivity',
    pwls: 'shallow resistivity',
    quantity: 'resistivity',
    canonicalUnit: 'ohm.m',
    mnemonics: ['SFL', 'SFLU', 'SFLA', 'LLS', 'HLLS', 'MSFL', 'RXO', 'RXOZ', 'RS', 'RSHAL', 'AT10', 'AT20', 'AHT10', 'AHT20', 'RLA1', 'RESS', 'MLL'],
    keywords: ['shallow resistivity', 'spherically focused', 'laterolog shallow', 'flushed zone', 'micro resistivity', 'shallow'],
  },
];

/**
 * The class record for a curve class name.
 * @throws RangeError for an unknown class
 * @example curveClassInfo('bulk_density').canonicalUnit // 'g/cm3'
 */
export function curveClassInfo(curveClass: CurveClass): CurveClassInfo {
  const info = CURVE_CLASSES.find((c) => c.curveClass === curveClass);
  if (!info) throw new RangeError(`curveClassInfo: unknown curveClass ${JSON.stringify(curveClass)}`);
  return info;
}
