import { describe, expect, it } from 'vitest';
import { bulkVolumeWater, bulkVolumeWaterCurve } from './bulk-volume-water.js';
import { clampCurve } from './clamp.js';
import { coatesPermeability, permeabilityCurve, timurPermeability } from './permeability.js';
import {
  archieResistivity,
  archieSaturation,
  formationFactor,
  indonesiaResistivity,
  indonesiaSaturation,
  simandouxResistivity,
  simandouxSaturation,
  waterSaturation,
} from './saturation.js';

describe('Archie', () => {
  it('formationFactor(0.2, 0.62, 2.15) = 19.73 (Humble form of Winsauer et al. 1952)', () => {
    // Winsauer et al. (1952) AAPG Bull. 36(2): F = 0.62 phi^-2.15; hand-computed 0.62 * 0.2^-2.15.
    expect(formationFactor(0.2, 0.62, 2.15)).toBeCloseTo(19.73, 2);
    // Archie (1942): F = phi^-m; m = 2 at 10% porosity gives F = 100.
    expect(formationFactor(0.1, 1, 2)).toBeCloseTo(100, 10);
  });

  it('archieSaturation with F = 20, Rw = 0.05, Rt = 10 gives Sw = sqrt(0.1) = 0.3162', () => {
    // Archie (1942): Sw^n = F Rw / Rt with n = 2. F = 20 from a = 0.8, m = 2 at phi = 0.2; hand-computed.
    expect(archieSaturation(0.2, 10, 0.05, 0.8, 2, 2)).toBeCloseTo(0.316228, 6);
  });

  it('archieSaturation with n = 2.5 and m = 1.8 matches the power form computed directly', () => {
    // Archie (1942), general exponents; hand-computed: (1 * 0.03 / (0.15^1.8 * 20))^(1/2.5).
    const expected = Math.exp(Math.log(0.03 / (Math.exp(1.8 * Math.log(0.15)) * 20)) / 2.5);
    expect(archieSaturation(0.15, 20, 0.03, 1, 1.8, 2.5)).toBeCloseTo(expected, 12);
  });

  it('archieSaturation inverts archieResistivity exactly and phi = 0 gives +Infinity (clamped later)', () => {
    expect(archieSaturation(0.22, archieResistivity(0.22, 0.4, 0.06, 1, 2, 2), 0.06, 1, 2, 2)).toBeCloseTo(0.4, 13);
    expect(archieSaturation(0, 10, 0.05, 1, 2, 2)).toBe(Infinity);
  });
});

describe('Simandoux (form 1/Rt = phi^m Sw^n/(a Rw) + Vsh Sw/Rsh)', () => {
  it('with a = 0.8, m = n = 2 equals the closed form 0.4 Rw/phi^2 [sqrt((Vsh/Rsh)^2 + 5 phi^2/(Rw Rt)) - Vsh/Rsh]', () => {
    // Closed form as printed in Asquith & Krygowski (2004) ch. 7 (Simandoux 1963) // from memory.
    const phi = 0.18, rt = 8, vsh = 0.25, rw = 0.04, rsh = 3;
    const b = vsh / rsh;
    const printed = ((0.4 * rw) / phi ** 2) * (Math.sqrt(b * b + (5 * phi ** 2) / (rw * rt)) - b);
    expect(simandouxSaturation(phi, rt, vsh, rw, rsh, 0.8, 2, 2)).toBeCloseTo(printed, 12);
  });

  it('reduces to Archie at Vsh = 0 for n = 2 and n = 2.3', () => {
    // Required of every Simandoux form (Bassiouni 1994, Theory, Measurement and Interpretation of Well Logs) // from memory.
    expect(simandouxSaturation(0.2, 10, 0, 0.05, 2, 1, 2, 2)).toBeCloseTo(archieSaturation(0.2, 10, 0.05, 1, 2, 2), 12);
    expect(simandouxSaturation(0.2, 10, 0, 0.05, 2, 1, 2, 2.3)).toBeCloseTo(archieSaturation(0.2, 10, 0.05, 1, 2, 2.3), 12);
  });

  it('n = 2 example hand-computed: phi 0.2, Rt 10, Vsh 0.2, Rw 0.05, Rsh 2 gives 0.29653', () => {
    // A = 0.8, B = 0.1, C = 0.1: Sw = (-0.1 + sqrt(0.01 + 0.32)) / 1.6 = 0.296535.
    expect(simandouxSaturation(0.2, 10, 0.2, 0.05, 2, 1, 2, 2)).toBeCloseTo(0.296535, 6);
  });

  it('n != 2 is solved iteratively: the root reproduces Rt through the forward form', () => {
    for (const n of [1.6, 2.4, 3]) {
      const sw = simandouxSaturation(0.2, 10, 0.2, 0.05, 2, 1, 2, n);
      expect(simandouxResistivity(0.2, sw, 0.2, 0.05, 2, 1, 2, n)).toBeCloseTo(10, 9);
    }
    // And the n = 2 forward/inverse pair is exact.
    expect(simandouxSaturation(0.25, simandouxResistivity(0.25, 0.35, 0.15, 0.04, 2.5, 1, 2, 2), 0.15, 0.04, 2.5, 1, 2, 2)).toBeCloseTo(0.35, 13);
  });

  it('gives less water than Archie in shaly rock (the shale conducts)', () => {
    expect(simandouxSaturation(0.2, 10, 0.3, 0.05, 2, 1, 2, 2)).toBeLessThan(archieSaturation(0.2, 10, 0.05, 1, 2, 2));
  });
});

describe('Indonesia (Poupon & Leveaux 1971)', () => {
  it('hand-computed example: phi 0.2, Rt 10, Vsh 0.2, Rw 0.05, Rsh 2, m = n = 2 gives 0.29818', () => {
    // 1/sqrt(Rt) = [Vsh^(1-Vsh/2)/sqrt(Rsh) + sqrt(phi^m/(a Rw))] Sw^(n/2), Poupon & Leveaux (1971) // from memory.
    // 0.2^0.9 = 0.234924, /sqrt 2 = 0.166115; sqrt(0.8) = 0.894427; Sw = 1/(3.162278 * 1.060542) = 0.298178.
    expect(indonesiaSaturation(0.2, 10, 0.2, 0.05, 2, 1, 2, 2)).toBeCloseTo(0.298178, 5);
  });

  it('reduces to Archie at Vsh = 0 and inverts its forward form for n = 1.8', () => {
    expect(indonesiaSaturation(0.2, 10, 0, 0.05, 2, 1, 2, 2)).toBeCloseTo(archieSaturation(0.2, 10, 0.05, 1, 2, 2), 12);
    const rt = indonesiaResistivity(0.15, 0.5, 0.3, 0.05, 1.5, 1, 2, 1.8);
    expect(indonesiaSaturation(0.15, rt, 0.3, 0.05, 1.5, 1, 2, 1.8)).toBeCloseTo(0.5, 12);
  });
});

describe('waterSaturation array form', () => {
  it('refuses rw <= 0 and missing rsh, naming the field', () => {
    expect(() => waterSaturation([0.2], [10], { model: 'archie', rw: 0, a: 1, m: 2, n: 2 })).toThrow('waterSaturation: rw must be > 0');
    expect(() => waterSaturation([0.2], [10], { model: 'simandoux', rw: 0.05, a: 1, m: 2, n: 2 }, [0.1])).toThrow(
      'waterSaturation: rsh must be > 0',
    );
    expect(() => waterSaturation([0.2], [10], { model: 'archie', rw: 0.05, a: 1, m: 0, n: 2 })).toThrow('waterSaturation: m must be > 0');
  });

  it('accepts a per-sample Rw curve and lets NaN through', () => {
    const sw = waterSaturation([0.2, 0.2, NaN], [10, 10, 10], { model: 'archie', rw: [0.05, 0.2, 0.05], a: 1, m: 2, n: 2 });
    expect(sw[0]).toBeCloseTo(Math.sqrt(0.125), 12);
    expect(sw[1]).toBeCloseTo(Math.sqrt(0.5), 12);
    expect(Number.isNaN(sw[2])).toBe(true);
  });
});

describe('bulk volume water, permeability, clamping', () => {
  it('bulkVolumeWater = phi * Sw (Buckles 1965): 0.25 * 0.4 = 0.1', () => {
    // Buckles (1965) J. Can. Pet. Technol. 4(1); hand-computed.
    expect(bulkVolumeWater(0.25, 0.4)).toBeCloseTo(0.1, 12);
    expect(Array.from(bulkVolumeWaterCurve([0.2, 0.1], [0.5, 1]))).toEqual([0.1, 0.1]);
  });

  it('timurPermeability(0.25, 0.20) equals the published percent form 0.136 * 25^4.4 / 20^2', () => {
    // Timur (1968) The Log Analyst 9(4): k = 0.136 phi^4.4 / Swi^2, phi and Swi in percent // from memory.
    const percentForm = (0.136 * 25 ** 4.4) / 20 ** 2;
    expect(timurPermeability(0.25, 0.2)).toBeCloseTo(percentForm, 8);
    expect(percentForm).toBeGreaterThan(400);
    expect(percentForm).toBeLessThan(600);
  });

  it('coatesPermeability(0.25, 0.20) = (100 * 0.0625 * 0.8 / 0.2)^2 = 625 mD', () => {
    // Coates & Denoo (1981), sqrt(k) = 100 phi^2 (1 - Swi)/Swi // from memory; hand-computed.
    expect(coatesPermeability(0.25, 0.2)).toBeCloseTo(625, 9);
    expect(coatesPermeability(0.25, 1)).toBe(0);
  });

  it('permeabilityCurve refuses a constant swi outside (0, 1]', () => {
    expect(() => permeabilityCurve('timur', [0.2], 0)).toThrow('permeabilityCurve: swi must be in (0, 1]');
  });

  it('clampCurve counts samples pulled to each bound and keeps NaN', () => {
    const r = clampCurve([-0.1, 0.5, 1.2, NaN, Infinity], 0, 1);
    expect(Array.from(r.values.subarray(0, 3))).toEqual([0, 0.5, 1]);
    expect(Number.isNaN(r.values[3])).toBe(true);
    expect(r.values[4]).toBe(1);
    expect(r.belowCount).toBe(1);
    expect(r.aboveCount).toBe(2);
  });
});
