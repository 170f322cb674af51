import { describe, expect, it } from 'vitest';
import { DARCY_FIELD_CONSTANT, RADIAL_FLOW_CONSTANT, joshiHorizontalRate, radialInflowRate } from './inflow.js';

const BASE = { kMd: 50, netPayFt: 30, drawdownPsi: 500, muCp: 1.2, bo: 1.25, reFt: 1490, rwFt: 0.328 };

describe('radialInflowRate (Craft & Hawkins 1991 ch. 6; Dake 1978 ch. 6)', () => {
  it('RADIAL_FLOW_CONSTANT 0.00708 is 2 pi x 0.001127 rounded', () => {
    expect(Math.abs(RADIAL_FLOW_CONSTANT / (2 * Math.PI * DARCY_FIELD_CONSTANT) - 1)).toBeLessThan(2e-4);
  });

  it('radialInflowRate matches Darcy\'s law worked in Darcy units and converted (independent route, 0.05%)', () => {
    // Darcy units: q [cm3/s] = 2 pi k[D] h[cm] dp[atm] / (mu[cp] (ln(re/rw) - 3/4 + s)); 1 ft = 30.48 cm,
    // 1 atm = 14.696 psi, 1 bbl = 158,987.294928 cm3, 1 d = 86,400 s (NIST SP 811 factors).
    const kD = BASE.kMd / 1000;
    const hCm = BASE.netPayFt * 30.48;
    const dpAtm = BASE.drawdownPsi / 14.696;
    const qRes = (2 * Math.PI * kD * hCm * dpAtm) / (BASE.muCp * (Math.log(BASE.reFt / BASE.rwFt) - 0.75));
    const qStb = (qRes * 86400) / 158987.294928 / BASE.bo;
    const r = radialInflowRate(BASE);
    expect(Math.abs(r.rateStbPerDay / qStb - 1)).toBeLessThan(5e-4);
    expect(r.productivityIndex * 500).toBeCloseTo(r.rateStbPerDay, 10);
  });

  it('radialInflowRate falls with positive skin by the ratio of flow resistances', () => {
    const r0 = radialInflowRate(BASE).rateStbPerDay;
    const r5 = radialInflowRate({ ...BASE, skin: 5 }).rateStbPerDay;
    const ln = Math.log(1490 / 0.328) - 0.75;
    expect(r5 / r0).toBeCloseTo(ln / (ln + 5), 12);
  });

  it('radialInflowRate rejects bad input naming the field', () => {
    expect(() => radialInflowRate({ ...BASE, reFt: 0.2 })).toThrow(/radialInflowRate: reFt must be > rwFt/);
    expect(() => radialInflowRate({ ...BASE, kMd: 0 })).toThrow(/radialInflowRate: kMd/);
    expect(() => radialInflowRate({ ...BASE, skin: -20 })).toThrow(/radialInflowRate: ln\(re\/rw\)/);
  });
});

describe('joshiHorizontalRate (Joshi 1988, JPT 40(6))', () => {
  const H = { khMd: 100, netPayFt: 60, drawdownPsi: 500, muCp: 0.9, bo: 1.2, lengthFt: 1000, rehFt: 1290, rwFt: 0.3 };

  it('joshiHorizontalRate equals the effective-wellbore-radius form of Joshi (independent route)', () => {
    // Joshi's equivalent form: qh = 0.00708 k h dp / (mu B ln(reh / rw')), with
    // rw' = reh (L/2) / (a [1 + sqrt(1 - (L/(2a))^2)] (h/(2 rw))^(h/L))  (isotropic; Joshi 1991,
    // Horizontal Well Technology, p. 90, as quoted by petroleumoffice.com).
    const r = joshiHorizontalRate(H);
    const { lengthFt: L, rehFt: reh, rwFt: rw, netPayFt: h } = H;
    const a = r.aFt;
    const rwEff = (reh * (L / 2)) / (a * (1 + Math.sqrt(1 - (L / (2 * a)) ** 2)) * (h / (2 * rw)) ** (h / L));
    const q = (0.00708 * 100 * h * 500) / (0.9 * 1.2 * Math.log(reh / rwEff));
    expect(r.rateStbPerDay / q).toBeCloseTo(1, 12);
  });

  it('joshiHorizontalRate a-parameter satisfies its definition and the ratio exceeds 1 for a long lateral', () => {
    const r = joshiHorizontalRate(H);
    expect(r.aFt).toBeCloseTo(500 * Math.sqrt(0.5 + Math.sqrt(0.25 + (2580 / 1000) ** 4)), 9);
    expect(r.beta).toBe(1);
    expect(r.productivityRatio).toBeGreaterThan(1);
    expect(r.verticalRateStbPerDay).toBeCloseTo((0.00708 * 100 * 60 * 500) / (0.9 * 1.2 * Math.log(1290 / 0.3)), 9);
  });

  it('joshiHorizontalRate falls as vertical permeability falls (anisotropy)', () => {
    const iso = joshiHorizontalRate(H).rateStbPerDay;
    const aniso = joshiHorizontalRate({ ...H, kvMd: 10 }).rateStbPerDay;
    expect(aniso).toBeLessThan(iso);
  });

  it('joshiHorizontalRate rejects a lateral longer than the drainage allows', () => {
    expect(() => joshiHorizontalRate({ ...H, lengthFt: 3000 })).toThrow(/joshiHorizontalRate: lengthFt\/2/);
  });
});
