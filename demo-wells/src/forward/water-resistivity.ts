/**
 * Formation temperature and water resistivity at formation temperature, for the model.
 */

/**
 * Formation temperature from a linear geothermal gradient: T = Ts + g d / 100.
 * Units: F, F per 100 ft, ft below ground. Common practice (linear geothermal gradient;
 * Asquith & Krygowski 2004, ch. 1).
 * @example formationTemperatureF(68, 1.4, 5000) // 138
 */
export function formationTemperatureF(surfaceF: number, gradientFPer100Ft: number, depthBelowGroundFt: number): number {
  return surfaceF + (gradientFPer100Ft * depthBelowGroundFt) / 100;
}

/**
 * Brine resistivity at temperature t2 from r1 at t1 (Arps 1953, Trans. AIME 198, in F):
 * R2 = R1 (T1 + 6.77) / (T2 + 6.77). Units ohm.m and F.
 * Throws RangeError('arpsForward: r1 must be > 0') on a non-positive resistivity.
 * @example arpsForward(0.08, 75, 140) // 0.08 * 81.77 / 146.77 = 0.044570
 */
export function arpsForward(r1: number, t1F: number, t2F: number): number {
  if (!(r1 > 0)) throw new RangeError('arpsForward: r1 must be > 0');
  return (r1 * (t1F + 6.77)) / (t2F + 6.77);
}
