import { describe, expect, it } from 'vitest';
import { zFactorHallYarborough } from './z-factor-hall-yarborough.js';

// Standing & Katz (1942) chart, as digitised from the original chart in the zFactor R package
// (Reyes, A., inst/extdata/sk_lp_tpr_*.txt, sk_hp_tpr_170.txt): [Tpr, Ppr, z]. Chart reading
// accuracy is about 0.01-0.02 in z.
const STANDING_KATZ_POINTS: ReadonlyArray<readonly [number, number, number]> = [
  [1.3, 1.002, 0.835],
  [1.3, 2.009, 0.684],
  [1.3, 3.008, 0.624],
  [1.5, 1.0, 0.9],
  [1.5, 2.006, 0.822],
  [1.5, 5.008, 0.81],
  [1.7, 14.801, 1.427],
  [2.0, 2.001, 0.947],
  [2.0, 5.009, 0.955],
  [3.0, 2.002, 1.013],
  [3.0, 7.001, 1.086],
];

describe('zFactorHallYarborough (Hall & Yarborough 1973)', () => {
  it('zFactorHallYarborough matches the Standing-Katz chart within 0.015 for Tpr 1.3-3.0', () => {
    for (const [tpr, ppr, zChart] of STANDING_KATZ_POINTS) {
      expect(Math.abs(zFactorHallYarborough(tpr, ppr) - zChart), `Tpr ${tpr} Ppr ${ppr}`).toBeLessThan(0.015);
    }
  });

  it('zFactorHallYarborough satisfies its reduced-density equation at the returned z', () => {
    // Re-evaluate the Hall-Yarborough residual independently at y = A Ppr / z.
    const tpr = 1.4;
    const ppr = 4.2;
    const z = zFactorHallYarborough(tpr, ppr);
    const t = 1 / tpr;
    const a = 0.06125 * t * Math.exp(-1.2 * (1 - t) ** 2);
    const y = (a * ppr) / z;
    const residual =
      -a * ppr +
      (y + y ** 2 + y ** 3 - y ** 4) / (1 - y) ** 3 -
      (14.76 * t - 9.76 * t ** 2 + 4.58 * t ** 3) * y ** 2 +
      (90.7 * t - 242.2 * t ** 2 + 42.4 * t ** 3) * y ** (2.18 + 2.82 * t);
    expect(Math.abs(residual)).toBeLessThan(1e-10);
  });

  it('zFactorHallYarborough tends to 1 at low pressure', () => {
    expect(zFactorHallYarborough(2, 0)).toBe(1);
    expect(Math.abs(zFactorHallYarborough(2, 1e-6) - 1)).toBeLessThan(1e-6);
  });

  it('zFactorHallYarborough rejects Tpr < 1 and Ppr > 24 naming the field', () => {
    expect(() => zFactorHallYarborough(0.95, 1)).toThrow(/zFactorHallYarborough: tpr/);
    expect(() => zFactorHallYarborough(1.5, 25)).toThrow(/zFactorHallYarborough: ppr/);
  });
});
