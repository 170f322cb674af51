import { describe, it, expect } from 'vitest';
import { gammaRayFromVsh, gammaRayIndexFromVsh } from './gamma-ray.js';
import { bulkDensity, neutronPorosity, sonicTransitTime } from './porosity-logs.js';
import { archieRt, simandouxRt } from './resistivity.js';
import { shalySp, staticSp } from './spontaneous-potential.js';
import { arpsForward, formationTemperatureF } from './water-resistivity.js';

describe('forward log responses', () => {
  it('gammaRayIndexFromVsh inverts each published transform', () => {
    // Forward transforms as printed in Asquith & Krygowski (2004) ch. 3, evaluated here at the
    // recovered index: each must give back the Vsh we started from.
    const v = 0.3;
    const larT = (i: number) => 0.083 * (2 ** (3.7 * i) - 1);
    const larO = (i: number) => 0.33 * (2 ** (2 * i) - 1);
    const stb = (i: number) => i / (3 - 2 * i);
    const clv = (i: number) => 1.7 - Math.sqrt(3.38 - (i + 0.7) ** 2);
    expect(gammaRayIndexFromVsh('linear', v)).toBe(0.3);
    expect(larT(gammaRayIndexFromVsh('larionov_tertiary', v))).toBeCloseTo(v, 12);
    expect(larO(gammaRayIndexFromVsh('larionov_older', v))).toBeCloseTo(v, 12);
    expect(stb(gammaRayIndexFromVsh('steiber', v))).toBeCloseTo(v, 12);
    expect(clv(gammaRayIndexFromVsh('clavier', v))).toBeCloseTo(v, 12);
    // Steiber at IGR = 0.5 gives 0.5 / 2 = 0.25 (hand calculation).
    expect(gammaRayIndexFromVsh('steiber', 0.25)).toBeCloseTo(0.5, 12);
  });

  it('gammaRayFromVsh(0.5, linear, 20, 120) is 70 and out-of-range vsh throws', () => {
    expect(gammaRayFromVsh(0.5, 'linear', 20, 120)).toBe(70); // hand: 20 + 0.5 * 100
    expect(() => gammaRayIndexFromVsh('linear', 1.2)).toThrow('gammaRayIndexFromVsh: vsh must be in [0, 1]');
  });

  it('bulkDensity of clean sandstone inverts by the density-porosity equation', () => {
    // Asquith & Krygowski (2004) ch. 4: phi = (rhoma - rhob) / (rhoma - rhof).
    const rhob = bulkDensity(0.25, 0, 2.65, 2.45, 1.0);
    expect(rhob).toBeCloseTo(2.2375, 12); // hand: 0.25 * 1 + 0.75 * 2.65
    expect((2.65 - rhob) / (2.65 - 1.0)).toBeCloseTo(0.25, 12);
    // With shale, density porosity reads phi + Vsh (rhoma - rhosh) / (rhoma - rhof).
    const shaly = bulkDensity(0.2, 0.1, 2.65, 2.45, 1.0);
    expect((2.65 - shaly) / 1.65).toBeCloseTo(0.2 + (0.1 * 0.2) / 1.65, 12);
  });

  it('neutronPorosity and sonicTransitTime follow the volumetric sums', () => {
    expect(neutronPorosity(0.2, 0.1, -0.03, 0.36)).toBeCloseTo(0.215, 12); // hand
    // Wyllie et al. (1956): 0.2 * 189 + 0.8 * 55.5 = 82.2 us/ft (hand).
    expect(sonicTransitTime(0.2, 0, 55.5, 105, 189)).toBeCloseTo(82.2, 12);
  });

  it('archieRt inverts to the Archie saturation', () => {
    // Archie (1942): Sw = (a Rw / (phi^m Rt))^(1/n); hand: 0.05 / (0.04 * 0.25) = 5 ohm.m.
    expect(archieRt(0.2, 0.5, 0.05, 1, 2, 2)).toBeCloseTo(5, 12);
    const rt = archieRt(0.245, 0.21, 0.0441, 0.62, 2.15, 2);
    expect(Math.sqrt((0.62 * 0.0441) / (0.245 ** 2.15 * rt))).toBeCloseTo(0.21, 12);
    expect(() => archieRt(0, 0.5, 0.05, 1, 2, 2)).toThrow('archieRt: phi must be > 0');
  });

  it('simandouxRt reduces to Archie at Vsh = 0 and solves back by the quadratic', () => {
    expect(simandouxRt(0.2, 0.5, 0, 0.05, 2, 1, 2, 2)).toBeCloseTo(archieRt(0.2, 0.5, 0.05, 1, 2, 2), 12);
    expect(simandouxRt(0.2, 0.5, 0.2, 0.05, 2, 1, 2, 2)).toBeCloseTo(4, 12); // hand: 1 / (0.2 + 0.05)
    // n = 2: A Sw^2 + B Sw - 1/Rt = 0 with A = phi^2/(a Rw), B = Vsh/Rsh; positive root.
    const rt = simandouxRt(0.165, 0.36, 0.26, 0.044, 3, 1, 2, 2);
    const A = 0.165 ** 2 / 0.044;
    const B = 0.26 / 3;
    expect((-B + Math.sqrt(B * B + (4 * A) / rt)) / (2 * A)).toBeCloseTo(0.36, 12);
    expect(() => simandouxRt(0.2, 0.5, 0.2, 0.05, 0, 1, 2, 2)).toThrow('simandouxRt: rsh must be > 0');
  });

  it('staticSp, shalySp, arpsForward and formationTemperatureF match hand values', () => {
    // K = 61 + 0.133 * 150 = 80.95; Rmfe = 0.425; log10(8.5) = 0.929419 -> -75.237 mV (hand).
    expect(staticSp(0.5, 0.05, 150)).toBeCloseTo(-80.95 * Math.log10(8.5), 10);
    expect(shalySp(-80, 0.25)).toBe(-60);
    // Arps (1953): 0.08 * (75 + 6.77) / (140 + 6.77) = 0.044570 (hand).
    expect(arpsForward(0.08, 75, 140)).toBeCloseTo(0.0445704, 6);
    expect(formationTemperatureF(68, 1.4, 5000)).toBeCloseTo(138, 12);
    expect(() => arpsForward(0, 75, 140)).toThrow('arpsForward: r1 must be > 0');
  });
});
