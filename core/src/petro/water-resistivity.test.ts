import { describe, expect, it } from 'vitest';
import { pickettFit } from './pickett.js';
import {
  celsiusToFahrenheit,
  celsiusToKelvin,
  fahrenheitToCelsius,
  fahrenheitToRankine,
  formationTemperature,
} from './temperature.js';
import { arpsRw, resistivityAtTemperature, rwFromSsp, spCoefficient } from './water-resistivity.js';

describe('temperature', () => {
  it('scale offsets: 212 F = 100 C, 0 F = 459.67 R, 0 C = 273.15 K (NIST SP 811)', () => {
    // Thompson & Taylor (2008) NIST SP 811, temperature conversions.
    expect(fahrenheitToCelsius(212)).toBeCloseTo(100, 12);
    expect(celsiusToFahrenheit(-40)).toBeCloseTo(-40, 12);
    expect(fahrenheitToRankine(0)).toBe(459.67);
    expect(celsiusToKelvin(0)).toBe(273.15);
  });

  it('formationTemperature from BHT: 80 F surface, 200 F at 10,000 ft gives 164 F at 7,000 ft', () => {
    // Linear geothermal gradient, Asquith & Krygowski (2004) ch. 1; hand-computed: 1.2 F/100 ft.
    const t = formationTemperature({ kind: 'bht', surfaceTemperature: 80, bht: 200, bhtDepth: 10000 }, 7000);
    expect(t).toBeCloseTo(164, 10);
  });

  it('formationTemperature from a gradient: 15 C + 3 C/100 m at 2,500 m is 90 C', () => {
    // Linear gradient, hand-computed.
    expect(formationTemperature({ kind: 'gradient', surfaceTemperature: 15, gradientPer100: 3 }, 2500)).toBeCloseTo(90, 10);
  });

  it('formationTemperature refuses a non-positive BHT depth', () => {
    expect(() => formationTemperature({ kind: 'bht', surfaceTemperature: 80, bht: 200, bhtDepth: 0 }, 1000)).toThrow(
      'temperatureLine: bhtDepth must be > 0',
    );
  });
});

describe('Arps temperature correction', () => {
  it('resistivityAtTemperature(0.6, 75 F -> 200 F) = 0.6 * 81.77 / 206.77 = 0.23728', () => {
    // Arps (1953) Trans. AIME 198, R2 = R1 (T1 + 6.77)/(T2 + 6.77) in F // from memory; hand-computed.
    expect(resistivityAtTemperature(0.6, 75, 200, 'F')).toBeCloseTo(0.237278, 6);
  });

  it('the Celsius form (offset 21.5) agrees with the Fahrenheit form within 0.1%', () => {
    // Independent check: T_F + 6.77 = 1.8 (T_C + 21.54), so the offsets are the same physics.
    const rF = resistivityAtTemperature(0.6, 75, 200, 'F');
    const rC = resistivityAtTemperature(0.6, fahrenheitToCelsius(75), fahrenheitToCelsius(200), 'C');
    expect(Math.abs(rC - rF) / rF).toBeLessThan(1e-3);
  });

  it('arpsRw refuses rw <= 0 naming the field', () => {
    expect(() => arpsRw(0, 75, 150, 'F')).toThrow('arpsRw: rw must be > 0');
    expect(() => arpsRw(0.1, 75, -30, 'C')).toThrow(/tFormation must be > -21.5 C/);
  });
});

describe('Rw from SSP and from a Pickett fit', () => {
  it('spCoefficient(150 F) = 61 + 0.133 * 150 = 80.95 mV/decade', () => {
    // Asquith & Krygowski (2004) ch. 2 // from memory.
    expect(spCoefficient(150)).toBeCloseTo(80.95, 10);
  });

  it('rwFromSsp: SSP -80 mV, Rmf 0.5 at 75 F, 150 F gives Rwe = 0.85 Rmf(150 F) / 10^(80/80.95)', () => {
    // SSP = -K log10(Rmfe/Rwe), Asquith & Krygowski (2004) ch. 2 // from memory; hand-computed the other
    // way round: Rmf(150) = 0.5 * 81.77/156.77 = 0.260796; Rmfe = 0.221677; ratio 10^(0.988264) = 9.73341.
    const rw = rwFromSsp({ ssp: -80, rmf: 0.5, rmfTemperature: 75, formationTemperature: 150, temperatureUnit: 'F' });
    expect(rw).toBeCloseTo(0.221677 / 9.73341, 5);
    // Zero SP means Rwe = Rmfe.
    expect(rwFromSsp({ ssp: 0, rmf: 0.5, rmfTemperature: 75, formationTemperature: 75, temperatureUnit: 'F' })).toBeCloseTo(0.425, 12);
  });

  it('pickettFit recovers m and a*Rw from a water zone made by Archie (Ro = a Rw phi^-m)', () => {
    // Archie (1942): in a water zone Rt = Ro = a Rw / phi^m, a straight line on log-log axes (Pickett 1966).
    const phi = [0.08, 0.12, 0.15, 0.2, 0.26, 0.3];
    const rt = phi.map((p) => (0.81 * 0.05) / p ** 2.1);
    const fit = pickettFit(phi, rt);
    expect(fit.m).toBeCloseTo(2.1, 10);
    expect(fit.aRw).toBeCloseTo(0.0405, 10);
    expect(fit.r2).toBeCloseTo(1, 10);
    expect(fit.count).toBe(6);
  });

  it('pickettFit skips NaN and non-positive samples and refuses fewer than 3', () => {
    expect(() => pickettFit([0.1, NaN, 0, 0.2], [10, 5, 5, 2])).toThrow('pickettFit: fewer than 3 samples');
  });
});
