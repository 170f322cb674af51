import { describe, expect, it } from 'vitest';
import { pseudoCriticalSutton } from './pseudo-critical.js';

describe('pseudoCriticalSutton', () => {
  it('pseudoCriticalSutton(0.65) gives Tpc 365.11 R (Sutton 1985, SPE 14265, as worked by petrocalchub "Sutton pseudo-critical" default example)', () => {
    const r = pseudoCriticalSutton(0.65);
    expect(r.tpcR).toBeCloseTo(365.11, 2); // published example value
    // Ppc by hand: 756.8 - 131.0*0.65 - 3.6*0.4225 = 756.8 - 85.15 - 1.521 = 670.129
    expect(r.ppcPsia).toBeCloseTo(670.129, 3);
  });

  it('pseudoCriticalSutton(1.0) matches the coefficients summed by hand', () => {
    const r = pseudoCriticalSutton(1.0);
    expect(r.tpcR).toBeCloseTo(169.2 + 349.5 - 74.0, 10); // 444.7 R
    expect(r.ppcPsia).toBeCloseTo(756.8 - 131.0 - 3.6, 10); // 622.2 psia
  });

  it('pseudoCriticalSutton rejects a gravity outside [0.55, 1.8] naming the field', () => {
    expect(() => pseudoCriticalSutton(0.3)).toThrow(/pseudoCriticalSutton: gasGravity/);
    expect(() => pseudoCriticalSutton(Number.NaN)).toThrow(RangeError);
  });
});
