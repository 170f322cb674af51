import { describe, expect, it } from 'vitest';
import { GAS_RADIAL_FLOW_CONSTANT, gasRadialInflowRate } from './gas-inflow.js';
import { DARCY_FIELD_CONSTANT, radialInflowRate } from './inflow.js';

const BASE = { kMd: 5, netPayFt: 40, reservoirPressurePsia: 2000, bottomholePressurePsia: 1200, temperatureF: 180, muCp: 0.016, z: 0.87, reFt: 1490, rwFt: 0.328 };

describe('gasRadialInflowRate (Lee & Wattenbarger 1996 ch. 7; Ahmed 2006 ch. 6)', () => {
  it('1422 is the liquid constant 2 pi x 0.001127 with Bg at 14.7 psia and 520 R, per Mscf (0.05%)', () => {
    // Bg [rb/scf] = psc z T / (5.6146 Tsc p); the p^2 form carries 2 p_avg (pr^2 - pwf^2 = 2 p_avg (pr - pwf)).
    const derived = (2 * 1000 * 14.7) / (5.6146 * 520 * 2 * Math.PI * DARCY_FIELD_CONSTANT);
    expect(Math.abs(GAS_RADIAL_FLOW_CONSTANT / derived - 1)).toBeLessThan(5e-4);
  });

  it('matches the real-gas radial flow law worked in Darcy units and converted (independent route, 0.02%)', () => {
    // Darcy units: q_sc [cm3/s] = pi k[D] h[cm] Tsc (pr^2 - pwf^2)[atm^2] / (psc[atm] mu[cp] z T (ln(re/rw) - 3/4 + s)),
    // T and Tsc absolute; standard 14.7 psia and 520 R as the printed constant assumes. 1 ft = 30.48 cm,
    // 1 atm = 14.696 psi, 1 ft3 = 28,316.846592 cm3, 1 d = 86,400 s (NIST SP 811).
    const atm = (psi: number) => psi / 14.696;
    const tR = BASE.temperatureF + 459.67;
    const qCm3s =
      (Math.PI * (BASE.kMd / 1000) * BASE.netPayFt * 30.48 * 520 * (atm(BASE.reservoirPressurePsia) ** 2 - atm(BASE.bottomholePressurePsia) ** 2)) /
      (atm(14.7) * BASE.muCp * BASE.z * tR * (Math.log(BASE.reFt / BASE.rwFt) - 0.75));
    const qMscfd = (qCm3s * 86400) / 28316.846592 / 1000;
    const r = gasRadialInflowRate(BASE);
    expect(Math.abs(r.rateMscfPerDay / qMscfd - 1)).toBeLessThan(2e-4);
  });

  it('equals the liquid inflow equation with Bg taken at the average pressure (pr^2 - pwf^2 = 2 p_avg dp)', () => {
    const pAvg = (BASE.reservoirPressurePsia + BASE.bottomholePressurePsia) / 2;
    const bgRbPerMscf = (1000 * 14.7 * BASE.z * (BASE.temperatureF + 459.67)) / (5.6146 * 520 * pAvg);
    const liquid = radialInflowRate({ kMd: BASE.kMd, netPayFt: BASE.netPayFt, drawdownPsi: BASE.reservoirPressurePsia - BASE.bottomholePressurePsia, muCp: BASE.muCp, bo: bgRbPerMscf, reFt: BASE.reFt, rwFt: BASE.rwFt });
    expect(Math.abs(gasRadialInflowRate(BASE).rateMscfPerDay / liquid.rateStbPerDay - 1)).toBeLessThan(5e-4);
  });

  it('rate is C (pr^2 - pwf^2); AOF at pwf = 0; no flow at pwf = pr; skin lowers it by the resistance ratio', () => {
    const r = gasRadialInflowRate(BASE);
    expect(r.rateMscfPerDay).toBeCloseTo(r.coefficient * (2000 ** 2 - 1200 ** 2), 9);
    expect(r.absoluteOpenFlowMscfPerDay).toBeCloseTo(r.coefficient * 2000 ** 2, 9);
    expect(gasRadialInflowRate({ ...BASE, bottomholePressurePsia: 2000 }).rateMscfPerDay).toBe(0);
    const ln = Math.log(1490 / 0.328) - 0.75;
    expect(gasRadialInflowRate({ ...BASE, skin: 4 }).rateMscfPerDay / r.rateMscfPerDay).toBeCloseTo(ln / (ln + 4), 12);
  });

  it('refuses, naming the field: a bottom-hole pressure above the reservoir pressure, re <= rw, a zero viscosity', () => {
    expect(() => gasRadialInflowRate({ ...BASE, bottomholePressurePsia: 2100 })).toThrow(/bottomholePressurePsia must be <= reservoirPressurePsia/);
    expect(() => gasRadialInflowRate({ ...BASE, reFt: 0.2 })).toThrow(/reFt must be > rwFt/);
    expect(() => gasRadialInflowRate({ ...BASE, muCp: 0 })).toThrow(/gasRadialInflowRate: muCp must be in \(0/);
  });
});
