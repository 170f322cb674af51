/**
 * Deep resistivity from water saturation: the forward forms of Archie and of Simandoux.
 */

/**
 * Archie (1942, Trans. AIME 146, 54-62) forward form, Rt = a Rw / (phi^m Sw^n), ohm.m;
 * tortuosity factor a after Winsauer et al. (1952, AAPG Bull. 36(2)).
 * Throws RangeError('archieRt: phi must be > 0') and likewise for sw and rw.
 * @example archieRt(0.2, 0.5, 0.05, 1, 2, 2) // 0.05 / (0.04 * 0.25) = 5
 */
export function archieRt(phi: number, sw: number, rw: number, a: number, m: number, n: number): number {
  if (!(phi > 0)) throw new RangeError('archieRt: phi must be > 0');
  if (!(sw > 0)) throw new RangeError('archieRt: sw must be > 0');
  if (!(rw > 0)) throw new RangeError('archieRt: rw must be > 0');
  return (a * rw) / (phi ** m * sw ** n);
}

/**
 * Simandoux forward form, 1/Rt = phi^m Sw^n / (a Rw) + Vsh Sw / Rsh (ohm.m): Simandoux (1963,
 * Revue de l'IFP) with the shale term linear in Sw and no (1 - Vsh) factor on the clean term,
 * generalised to a, m, n. Simandoux is printed in several forms (SOURCES.md, convention 1);
 * this is the one core's `simandouxSaturation` solves, so the evaluation inverts it exactly.
 * Reduces to Archie at Vsh = 0.
 * Throws RangeError('simandouxRt: rsh must be > 0') and likewise for phi, sw, rw.
 * @example simandouxRt(0.2, 0.5, 0.2, 0.05, 2, 1, 2, 2) // 1 / (0.04*0.25/0.05 + 0.2*0.5/2) = 4
 */
export function simandouxRt(phi: number, sw: number, vsh: number, rw: number, rsh: number, a: number, m: number, n: number): number {
  if (!(phi > 0)) throw new RangeError('simandouxRt: phi must be > 0');
  if (!(sw > 0)) throw new RangeError('simandouxRt: sw must be > 0');
  if (!(rw > 0)) throw new RangeError('simandouxRt: rw must be > 0');
  if (!(rsh > 0)) throw new RangeError('simandouxRt: rsh must be > 0');
  return 1 / ((phi ** m * sw ** n) / (a * rw) + (vsh * sw) / rsh);
}
