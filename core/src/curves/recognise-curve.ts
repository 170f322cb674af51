/**
 * Curve recognition: proposes a curve class for a LAS curve from its mnemonic, unit and
 * description, with a confidence and a reason the user can read. The proposal is only a
 * proposal: the user's binding (kept by the service) overrides it.
 */
import { CURVE_CLASSES, type CurveClass, type CurveClassInfo } from './curve-classes.js';
import { parseUnit } from '../units/units.js';

export interface CurveRecognition {
  curveClass: CurveClass;
  /** The unit Poreline computes this class in (g/cm3, v/v, us/ft, gAPI, mV, in, ohm.m, b/e). */
  canonicalUnit: string;
  /** 0..1: how sure the proposal is (see `recogniseCurve`). */
  confidence: number;
  /** Why, in words. */
  reason: string;
  matchedBy: 'mnemonic' | 'mnemonic_suffix' | 'description';
  /** Multiply values by this to get `canonicalUnit`; null when the unit is missing or does not fit. */
  unitFactor: number | null;
}

type UnitFit = 'fits' | 'missing' | 'unknown' | 'conflicts';

/** Confidence by how the class was found and how the unit fits (rows) - a ranking, not a probability. */
const CONFIDENCE: Record<CurveRecognition['matchedBy'], Record<UnitFit, number>> = {
  mnemonic: { fits: 0.95, missing: 0.7, unknown: 0.5, conflicts: 0.2 },
  mnemonic_suffix: { fits: 0.85, missing: 0.6, unknown: 0.4, conflicts: 0.15 },
  description: { fits: 0.6, missing: 0.4, unknown: 0.3, conflicts: 0 },
};

const BY_MNEMONIC = new Map<string, CurveClassInfo>();
for (const c of CURVE_CLASSES) for (const m of c.mnemonics) BY_MNEMONIC.set(m, c);
const KEYWORDS = CURVE_CLASSES.flatMap((c) => c.keywords.map((k) => ({ k, c }))).sort((a, b) => b.k.length - a.k.length);

/**
 * Proposes a curve class for a curve.
 *
 * Order: exact mnemonic in the alias table (`CURVE_CLASSES`, PWLS-based classes); then the
 * mnemonic without a run/copy suffix (`GR_2`, `RHOB1`, `ILD-3`); then a phrase of the
 * description ("bulk density"). The unit then sets the confidence: it fits the class's
 * quantity, is missing, is not a unit Poreline knows, or belongs to another quantity
 * (confidence table in the source; a description match with a conflicting unit is dropped).
 *
 * @param mnemonic curve mnemonic as in the file
 * @param unit unit as in the file ('' when none)
 * @param description curve description (optional)
 * @returns the proposal, or null when nothing matches
 * @example recogniseCurve('RHOB', 'G/CC') // { curveClass: 'bulk_density', confidence: 0.95, unitFactor: 1, ... }
 * @example recogniseCurve('XYZ', 'K/M3', 'Bulk density') // bulk_density, matchedBy 'description', unitFactor 0.001
 */
export function recogniseCurve(mnemonic: string, unit: string, description = ''): CurveRecognition | null {
  const m = mnemonic.trim().toUpperCase();
  let info = BY_MNEMONIC.get(m);
  let matchedBy: CurveRecognition['matchedBy'] = 'mnemonic';
  let found = `mnemonic ${mnemonic.trim()} is a common ${'{label}'} mnemonic`;
  if (!info) {
    const base = /^(.*?[A-Z])[_:\-.]?\d+$/.exec(m)?.[1];
    if (base && base.length >= 2) info = BY_MNEMONIC.get(base);
    matchedBy = 'mnemonic_suffix';
    found = `mnemonic ${mnemonic.trim()} reads as ${base} with a suffix, a common ${'{label}'} mnemonic`;
  }
  if (!info) {
    const d = description.toLowerCase();
    const hit = KEYWORDS.find(({ k }) => d.includes(k));
    if (!hit) return null;
    info = hit.c;
    matchedBy = 'description';
    found = `description "${description.trim()}" names ${'{label}'}`;
  }
  const u = parseUnit(unit);
  const fit: UnitFit = unit.trim() === '' ? 'missing' : !u ? 'unknown' : u.quantity === info.quantity ? 'fits' : 'conflicts';
  const confidence = CONFIDENCE[matchedBy][fit];
  if (confidence === 0) return null;
  const label = info.label.toLowerCase();
  const unitWords = {
    fits: `unit ${unit.trim()} fits (${info.canonicalUnit}${u && u.factor !== 1 ? ` x ${u.factor}` : ''})`,
    missing: `no unit given; ${info.canonicalUnit} assumed`,
    unknown: `unit ${unit.trim()} is not a known ${label} unit; check before use`,
    conflicts: `unit ${unit.trim()} is a ${u?.quantity} unit, not a ${label} unit; check the binding`,
  }[fit];
  return {
    curveClass: info.curveClass,
    canonicalUnit: info.canonicalUnit,
    confidence,
    reason: `${found.replace('{label}', label)}; ${unitWords}`,
    matchedBy,
    unitFactor: fit === 'fits' && u ? u.factor : null,
  };
}
