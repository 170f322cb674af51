/**
 * Seeded pseudo-random numbers for the demo field, so the generator reproduces its files
 * byte for byte.
 *
 * Generator: xoshiro128** 1.1 (Blackman, D., Vigna, S. (2021) Scrambled linear pseudorandom
 * number generators. ACM Trans. Math. Softw. 47(4), article 36), state seeded from a 64-bit
 * seed by SplitMix64 (Steele, G.L., Lea, D., Flood, C.H. (2014) Fast splittable pseudorandom
 * number generators. OOPSLA 2014), as the xoshiro authors recommend. Normal deviates by the
 * Box-Muller transform (Box, G.E.P., Muller, M.E. (1958) Ann. Math. Statist. 29(2), 610-611).
 *
 * Each noise stream has its own generator, seeded from the field seed and a label (well and
 * curve), so changing one well does not shift the noise of another.
 */

const MASK64 = (1n << 64n) - 1n;

/** SplitMix64 step: returns [next state, output]. */
function splitMix64(state: bigint): [bigint, bigint] {
  const s = (state + 0x9e3779b97f4a7c15n) & MASK64;
  let z = s;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
  return [s, z ^ (z >> 31n)];
}

/** FNV-1a 64-bit hash of a label (Fowler, Noll, Vo; common practice for string hashing). */
function fnv1a64(label: string): bigint {
  let h = 0xcbf29ce484222325n;
  for (let i = 0; i < label.length; i++) {
    h ^= BigInt(label.charCodeAt(i) & 0xffff);
    h = (h * 0x100000001b3n) & MASK64;
  }
  return h;
}

export interface Random {
  /** Next raw 32-bit output (unsigned). */
  nextUint32(): number;
  /** Uniform deviate in the open interval (0, 1). */
  uniform(): number;
  /** Normal deviate with the given mean and standard deviation (default 0, 1). */
  normal(mean?: number, sd?: number): number;
}

/**
 * A xoshiro128** generator seeded by SplitMix64 from `seed` (and, when given, the FNV-1a hash
 * of `label` XOR-ed into the seed).
 * Throws RangeError('createRandom: seed must be a non-negative safe integer') otherwise.
 * @example createRandom(20240611).nextUint32() // 3179726471 (reference C code, same seeding)
 */
export function createRandom(seed: number, label?: string): Random {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError('createRandom: seed must be a non-negative safe integer');
  }
  let st = BigInt(seed);
  if (label !== undefined) st ^= fnv1a64(label);
  const [st1, a] = splitMix64(st);
  const [, b] = splitMix64(st1);
  const s = new Uint32Array([Number(a & 0xffffffffn), Number(a >> 32n), Number(b & 0xffffffffn), Number(b >> 32n)]);
  const rotl = (x: number, k: number): number => ((x << k) | (x >>> (32 - k))) >>> 0;

  const nextUint32 = (): number => {
    const result = Math.imul(rotl(Math.imul(s[1], 5) >>> 0, 7), 9) >>> 0;
    const t = (s[1] << 9) >>> 0;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11);
    return result;
  };
  const uniform = (): number => (nextUint32() + 0.5) / 4294967296;
  const normal = (mean = 0, sd = 1): number => {
    const u1 = uniform();
    const u2 = uniform();
    return mean + sd * Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
  };
  return { nextUint32, uniform, normal };
}
