/**
 * Gamma-ray log from shale volume: the inverse of each published Vsh transform of the
 * gamma-ray index IGR = (GR - GRclean) / (GRshale - GRclean) (Asquith & Krygowski 2004,
 * Basic Well Log Analysis, 2nd ed., ch. 3), so that GR = GRclean + IGR (GRshale - GRclean).
 */
import type { VshTransform } from '../model/types.js';

/**
 * Gamma-ray index that a transform maps to `vsh` (the transform's inverse), for vsh in [0, 1]:
 * - linear: IGR = Vsh
 * - Larionov (1969) tertiary, Vsh = 0.083 (2^(3.7 IGR) - 1): IGR = log2(Vsh / 0.083 + 1) / 3.7
 * - Larionov (1969) older rocks, Vsh = 0.33 (2^(2 IGR) - 1): IGR = log2(Vsh / 0.33 + 1) / 2
 * - Steiber (1970, SPE 2961), Vsh = IGR / (3 - 2 IGR): IGR = 3 Vsh / (1 + 2 Vsh)
 * - Clavier et al. (1971, JPT 23(6)), Vsh = 1.7 - sqrt(3.38 - (IGR + 0.7)^2):
 *   IGR = sqrt(3.38 - (1.7 - Vsh)^2) - 0.7
 * Throws RangeError('gammaRayIndexFromVsh: vsh must be in [0, 1]') otherwise.
 * @example gammaRayIndexFromVsh('steiber', 0.25) // 0.5
 */
export function gammaRayIndexFromVsh(transform: VshTransform, vsh: number): number {
  if (!(vsh >= 0 && vsh <= 1)) throw new RangeError('gammaRayIndexFromVsh: vsh must be in [0, 1]');
  switch (transform) {
    case 'linear':
      return vsh;
    case 'larionov_tertiary':
      return Math.log2(vsh / 0.083 + 1) / 3.7;
    case 'larionov_older':
      return Math.log2(vsh / 0.33 + 1) / 2;
    case 'steiber':
      return (3 * vsh) / (1 + 2 * vsh);
    case 'clavier':
      return Math.sqrt(3.38 - (1.7 - vsh) ** 2) - 0.7;
    default:
      throw new RangeError(`gammaRayIndexFromVsh: unknown transform '${transform as string}'`);
  }
}

/**
 * Gamma ray (gAPI) of rock with shale volume `vsh` under `transform`:
 * GR = GRclean + IGR(Vsh) (GRshale - GRclean).
 * @example gammaRayFromVsh(0.5, 'linear', 20, 120) // 70
 */
export function gammaRayFromVsh(vsh: number, transform: VshTransform, grClean: number, grShale: number): number {
  return grClean + gammaRayIndexFromVsh(transform, vsh) * (grShale - grClean);
}
