/**
 * Seeded uniform random numbers for the Monte Carlo engine.
 *
 * Generator: xoroshiro128+ (Blackman, D., Vigna, S. (2018) Scrambled linear pseudorandom number
 * generators, arXiv:1805.01407), written with the same 32-bit-word state layout, seeding and
 * 53-bit float construction as the pure-rand package (v8: `xoroshiro128plus(seed)` then
 * `uniformFloat64(rng)`), so a seed gives the very same sequence as pure-rand; the test
 * random.test.ts checks that draw for draw. It is written out here because holding the state
 * in local int32 variables is several times faster than pure-rand's object fields
 * (bench/montecarlo.bench.ts measures both).
 */

/** Outputs of the 32-bit generator discarded after seeding (the first few mix poorly). */
export const WARM_UP_STEPS = 16;

const SCALE26 = 1 / 67108864; // 2^-26
const SCALE53 = 1 / 9007199254740992; // 2^-53

/**
 * Fills `out` with uniform doubles in [0, 1) (multiples of 2^-53) from xoroshiro128+ seeded with
 * the 32-bit integer `seed`, after {@link WARM_UP_STEPS} discarded outputs. Equal, draw for draw,
 * to pure-rand: `rng = xoroshiro128plus(seed); skipN(rng, 16); uniformFloat64(rng)...`.
 *
 * @param seed integer; only its low 32 bits are used
 * @param out array to fill (also returned)
 * @throws RangeError('fillUniform: seed must be an integer ...')
 * @example fillUniform(42, new Float64Array(3))
 */
export function fillUniform(seed: number, out: Float64Array): Float64Array {
  if (!Number.isInteger(seed)) throw new RangeError(`fillUniform: seed must be an integer (got ${seed})`);
  // pure-rand: new XoroShiro128Plus(s01 = -1, s00 = ~seed, s11 = seed | 0, s10 = 0)
  let s01 = -1;
  let s00 = ~seed;
  let s11 = seed | 0;
  let s10 = 0;
  let a0 = 0;
  let a1 = 0;
  let t00 = 0;
  let t01 = 0;
  for (let i = 0; i < WARM_UP_STEPS; i++) {
    a0 = s10 ^ s00;
    a1 = s11 ^ s01;
    t00 = s00;
    t01 = s01;
    s00 = (t00 << 24) ^ (t01 >>> 8) ^ a0 ^ (a0 << 16);
    s01 = (t01 << 24) ^ (t00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
    s10 = (a1 << 5) ^ (a0 >>> 27);
    s11 = (a0 << 5) ^ (a1 >>> 27);
  }
  const n = out.length;
  for (let i = 0; i < n; i++) {
    // first 32-bit output: keep 26 bits
    const hi = ((s00 + s10) | 0) & 0x3ffffff;
    a0 = s10 ^ s00;
    a1 = s11 ^ s01;
    t00 = s00;
    t01 = s01;
    s00 = (t00 << 24) ^ (t01 >>> 8) ^ a0 ^ (a0 << 16);
    s01 = (t01 << 24) ^ (t00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
    s10 = (a1 << 5) ^ (a0 >>> 27);
    s11 = (a0 << 5) ^ (a1 >>> 27);
    // second 32-bit output: keep 27 bits
    const lo = ((s00 + s10) | 0) & 0x7ffffff;
    a0 = s10 ^ s00;
    a1 = s11 ^ s01;
    t00 = s00;
    t01 = s01;
    s00 = (t00 << 24) ^ (t01 >>> 8) ^ a0 ^ (a0 << 16);
    s01 = (t01 << 24) ^ (t00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
    s10 = (a1 << 5) ^ (a0 >>> 27);
    s11 = (a0 << 5) ^ (a1 >>> 27);
    out[i] = hi * SCALE26 + lo * SCALE53;
  }
  return out;
}

/**
 * Seed of an input's own random stream: a 32-bit hash of the case seed and the input name
 * (FNV-1a over the name's UTF-16 code units, then the murmur3 finaliser). Each input draws from
 * its own stream, so adding, removing or reordering other inputs does not change its samples.
 * Inputs are independent (no correlation is imposed).
 *
 * @example streamSeed(42, 'porosity') // a fixed 32-bit integer
 */
export function streamSeed(seed: number, name: string): number {
  if (!Number.isInteger(seed)) throw new RangeError(`streamSeed: seed must be an integer (got ${seed})`);
  let h = 0x811c9dc5 ^ (seed | 0);
  for (let i = 0; i < name.length; i++) {
    h ^= name.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h | 0;
}
