import { describe, expect, it } from 'vitest';
import {
  bulkDensityFromPorosity,
  densityPorosity,
  densityPorosityCurve,
  effectivePorosity,
  MATRIX_CONSTANTS,
  neutronDensityGasPorosity,
  neutronDensityPorosity,
  neutronDensityPorosityCurve,
  shalePorosityFromDensity,
} from './porosity.js';
import { sonicPorosity, sonicPorosityRhg, sonicPorosityWyllie, transitTimeRhg, transitTimeWyllie } from './sonic-porosity.js';

describe('density and neutron-density porosity', () => {
  it('densityPorosity(2.40, 2.65, 1.0) = 0.25/1.65 = 0.1515', () => {
    // Density porosity equation, Asquith & Krygowski (2004) ch. 4; hand-computed.
    expect(densityPorosity(2.4, 2.65, 1.0)).toBeCloseTo(0.151515, 6);
  });

  it('densityPorosity on limestone 2.71 and dolomite 2.87 matrices, rhob 2.50, fluid 1.1', () => {
    // Same equation; hand-computed (2.71-2.5)/(2.71-1.1) = 0.13043, (2.87-2.5)/1.77 = 0.20904.
    expect(densityPorosity(2.5, MATRIX_CONSTANTS.limestone.rhoMatrix, 1.1)).toBeCloseTo(0.130435, 6);
    expect(densityPorosity(2.5, MATRIX_CONSTANTS.dolomite.rhoMatrix, 1.1)).toBeCloseTo(0.209040, 6);
  });

  it('densityPorosity inverts bulkDensityFromPorosity exactly (forward/inverse pair)', () => {
    for (const phi of [0, 0.05, 0.17, 0.33]) {
      expect(densityPorosity(bulkDensityFromPorosity(phi, 2.65, 1.05), 2.65, 1.05)).toBeCloseTo(phi, 14);
    }
  });

  it('densityPorosityCurve refuses rhoMatrix equal to rhoFluid, naming both fields', () => {
    expect(() => densityPorosityCurve([2.3], { rhoMatrix: 1, rhoFluid: 1 })).toThrow('densityPorosityCurve: rhoMatrix must differ from rhoFluid');
  });

  it('neutronDensityPorosity is the arithmetic mean: (0.20 + 0.16)/2 = 0.18', () => {
    // Asquith & Krygowski (2004) ch. 4, liquid-filled neutron-density porosity // common practice.
    expect(neutronDensityPorosity(0.2, 0.16)).toBeCloseTo(0.18, 12);
  });

  it('neutronDensityGasPorosity(0.10, 0.30) = sqrt(0.05) = 0.22361 (Gaymard & Poupon 1968 RMS form)', () => {
    // Gaymard & Poupon (1968) The Log Analyst 9(5) // from memory; hand-computed sqrt((0.01+0.09)/2).
    expect(neutronDensityGasPorosity(0.1, 0.3)).toBeCloseTo(0.223607, 6);
    // With no gas effect (phiN = phiD) the RMS equals the porosity.
    expect(neutronDensityGasPorosity(0.2, 0.2)).toBeCloseTo(0.2, 12);
  });

  it('neutronDensityPorosityCurve combines nphi with density porosity, gas flag selects the RMS form', () => {
    const nd = neutronDensityPorosityCurve([0.1], [2.65 - 0.3 * 1.65], { rhoMatrix: 2.65, rhoFluid: 1 });
    const gas = neutronDensityPorosityCurve([0.1], [2.65 - 0.3 * 1.65], { rhoMatrix: 2.65, rhoFluid: 1, gas: true });
    expect(nd[0]).toBeCloseTo(0.2, 12);
    expect(gas[0]).toBeCloseTo(0.223607, 6);
  });

  it('effectivePorosity subtracts Vsh times shale porosity; shale porosity from shale density', () => {
    // PHIE = PHIT - Vsh * phiSh (common practice); phiSh = (2.65-2.45)/1.65 = 0.121212 hand-computed.
    const phiSh = shalePorosityFromDensity(2.45, 2.65, 1.0);
    expect(phiSh).toBeCloseTo(0.121212, 6);
    expect(effectivePorosity(0.25, 0.2, phiSh)).toBeCloseTo(0.25 - 0.2 * 0.121212, 6);
    expect(effectivePorosity(0.25, NaN, 0)).toBe(0.25);
  });
});

describe('sonic porosity', () => {
  it('sonicPorosityWyllie(80, 55.5, 189) = 24.5/133.5 = 0.18352', () => {
    // Wyllie, Gregory & Gardner (1956) Geophysics 21(1); constants 55.5 and 189 us/ft from
    // Asquith & Krygowski (2004) ch. 4 // from memory; hand-computed.
    expect(sonicPorosityWyllie(80, 55.5, 189)).toBeCloseTo(0.183521, 6);
    // Compaction correction divides: Cp = 1.2 gives 0.152934.
    expect(sonicPorosityWyllie(80, 55.5, 189, 1.2)).toBeCloseTo(0.152934, 6);
  });

  it('sonicPorosityWyllie inverts transitTimeWyllie exactly', () => {
    for (const phi of [0, 0.1, 0.3]) expect(sonicPorosityWyllie(transitTimeWyllie(phi, 47.6, 189), 47.6, 189)).toBeCloseTo(phi, 13);
  });

  it('sonicPorosityRhg satisfies Raymer et al. (1980) V = (1 - phi)^2 Vma + phi Vf at the returned porosity', () => {
    // Raymer, Hunt & Gardner (1980) SPWLA 21st symposium, velocity form // from memory.
    // Check by the velocity form (independent of the closed-form root used in the code).
    const dtMa = 55.5, dtF = 189;
    for (const dt of [60, 70, 80, 90, 100]) {
      const phi = sonicPorosityRhg(dt, dtMa, dtF);
      const v = (1 - phi) ** 2 * (1e6 / dtMa) + phi * (1e6 / dtF);
      expect(Math.abs(v - 1e6 / dt) / (1e6 / dt)).toBeLessThan(1e-12);
      expect(phi).toBeGreaterThan(0);
      expect(phi).toBeLessThan(0.45);
    }
    expect(sonicPorosityRhg(transitTimeRhg(0.2, dtMa, dtF), dtMa, dtF)).toBeCloseTo(0.2, 13);
  });

  it('sonicPorosityRhg is within 0.02 of the 5/8 approximation printed with the method', () => {
    // phi ~= (5/8)(dt - dtMa)/dt, as quoted in Asquith & Krygowski (2004) ch. 4 // from memory.
    for (const dt of [65, 75, 85]) {
      expect(Math.abs(sonicPorosityRhg(dt, 55.5, 189) - 0.625 * (dt - 55.5) / dt)).toBeLessThan(0.02);
    }
  });

  it('sonicPorosity refuses dtFluid <= dtMatrix', () => {
    expect(() => sonicPorosity([80], { method: 'wyllie', dtMatrix: 189, dtFluid: 55.5 })).toThrow('sonicPorosity: dtFluid must be > dtMatrix');
  });
});
