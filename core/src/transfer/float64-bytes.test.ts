import { describe, expect, it } from 'vitest';
import { bytesToFloat64, float64ToBytes } from './float64-bytes.js';

describe('float64 bytes', () => {
  it('bytesToFloat64(float64ToBytes(x)) gives back every value, NaN and -0 included, without touching x', () => {
    const x = new Float64Array([1.5, NaN, -999.25, -0, 1e300]);
    const back = bytesToFloat64(float64ToBytes(x));
    expect(Array.from(back)).toEqual(Array.from(x));
    expect(Object.is(back[3], -0)).toBe(true);
  });

  it('writes IEEE 754 little-endian: 1.0 is 00 00 00 00 00 00 F0 3F', () => {
    // IEEE 754-2008 binary64: 1.0 = 0x3FF0000000000000, stored least significant byte first.
    expect(Array.from(float64ToBytes(new Float64Array([1])))).toEqual([0, 0, 0, 0, 0, 0, 0xf0, 0x3f]);
  });

  it('bytesToFloat64 refuses a byte count that is not a multiple of 8', () => {
    expect(() => bytesToFloat64(new Uint8Array(7))).toThrow(/not a whole number of float64/);
  });
});
