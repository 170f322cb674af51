/**
 * Spontaneous potential of the model: static SP from the filtrate/water resistivity contrast,
 * reduced in shaly rock.
 */

/**
 * Static SP, mV: SSP = -K log10(Rmfe / Rwe), K = 61 + 0.133 T(F), with Rmfe = 0.85 Rmf and
 * Rwe = Rw (no chart correction). // from memory: Asquith & Krygowski (2004) ch. 2.
 * Throws RangeError('staticSp: rmf must be > 0') and likewise for rw.
 * @example staticSp(0.5, 0.05, 150) // -(61 + 19.95) * log10(0.425 / 0.05) = -75.27
 */
export function staticSp(rmf: number, rw: number, temperatureF: number): number {
  if (!(rmf > 0)) throw new RangeError('staticSp: rmf must be > 0');
  if (!(rw > 0)) throw new RangeError('staticSp: rw must be > 0');
  return -(61 + 0.133 * temperatureF) * Math.log10((0.85 * rmf) / rw);
}

/**
 * SP read in rock of shale volume Vsh, against a shale baseline of 0 mV: SP = SSP (1 - Vsh)
 * (the pseudo-static SP taken as linear in Vsh; common practice).
 */
export function shalySp(ssp: number, vsh: number): number {
  return ssp * (1 - vsh);
}
