/**
 * Seeded pseudo-random numbers for Monte-Carlo kinds: the same seed gives the same stream, bit for bit, on every
 * run and machine, so a frozen revision recomputes the numbers it stored.
 *
 *  - Generator: xoshiro128** 1.1 (32-bit state words ×4, 32-bit output), D. Blackman and S. Vigna, "Scrambled
 *    linear pseudorandom number generators", ACM Transactions on Mathematical Software (2021);
 *    reference C code xoshiro128starstar.c published by the authors (prng.di.unimi.it).
 *  - Seeding: the 32-bit state words are the high and low halves of the first two outputs of SplitMix64
 *    (G. L. Steele, D. Lea and C. H. Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014),
 *    the seeding the xoshiro authors recommend; a second, independent stream takes the next two outputs.
 *  - Uniform doubles: 53 random bits from two outputs, (a ≫ 5)·2²⁶ + (b ≫ 6) scaled by 2⁻⁵³ (the "res53"
 *    construction of Matsumoto and Nishimura's mt19937ar.c), so u ∈ [0, 1) with every double of that grid possible.
 *  - Normal deviates: Marsaglia's polar method (G. Marsaglia and T. A. Bray, "A convenient method for generating
 *    normal variables", SIAM Review 6(3) (1964) 260–264 — details from memory; the method is also in Knuth, TAOCP vol. 2), both deviates of each accepted pair used.
 *
 * Only integer arithmetic, IEEE-754 +, ×, √ and Math.log enter the stream; V8 computes Math.log with its fdlibm
 * port (ieee754::log), identical on every platform, so the normals are reproducible for a given Node/V8 line.
 */

const MASK_64 = (1n << 64n) - 1n;
const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;

/** SplitMix64 outputs from a 64-bit seed (Steele, Lea & Flood 2014, mix function "variant 13" of Stafford). */
export function splitMix64(seed: bigint, count: number): bigint[] {
  let state = BigInt.asUintN(64, seed);
  const out: bigint[] = [];
  for (let k = 0; k < count; k++) {
    state = (state + GOLDEN_GAMMA) & MASK_64;
    let z = state;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK_64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK_64;
    out.push(z ^ (z >> 31n));
  }
  return out;
}

/** A xoshiro128** generator; `state` holds four uint32 words, not all zero. */
export class Xoshiro128StarStar {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(state: readonly [number, number, number, number]) {
    [this.s0, this.s1, this.s2, this.s3] = state.map((w) => w >>> 0);
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) throw new Error('xoshiro128**: the state must not be all zero');
  }

  /** Next 32-bit output as an unsigned integer (0 … 2³² − 1). */
  nextUint32(): number {
    const s1 = this.s1;
    const x = Math.imul(s1, 5);
    const result = Math.imul((x << 7) | (x >>> 25), 9) >>> 0;
    const t = s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= s1;
    this.s1 = s1 ^ this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = (this.s3 << 11) | (this.s3 >>> 21);
    return result;
  }

  /** Uniform double in [0, 1) with 53 random bits. */
  nextDouble(): number {
    const a = this.nextUint32() >>> 5;
    const b = this.nextUint32() >>> 6;
    return (a * 67108864 + b) * (1 / 9007199254740992);
  }
}

/** Two independent xoshiro128** streams from one integer seed (SplitMix64 outputs 1–2 and 3–4). */
export function seededStreams(seed: number): [Xoshiro128StarStar, Xoshiro128StarStar] {
  const words = splitMix64(BigInt(seed), 4).flatMap((z) => [Number(z >> 32n), Number(z & 0xffffffffn)]);
  return [
    new Xoshiro128StarStar([words[0], words[1], words[2], words[3]]),
    new Xoshiro128StarStar([words[4], words[5], words[6], words[7]]),
  ];
}

/**
 * Fill `out` with standard normal deviates (mean 0, variance 1) from `rng` by Marsaglia's polar method:
 * u, v uniform on (−1, 1), s = u² + v² accepted when 0 < s < 1, then u·f and v·f with f = √(−2 ln s / s).
 */
export function fillStandardNormals(rng: Xoshiro128StarStar, out: Float64Array): Float64Array {
  let k = 0;
  while (k < out.length) {
    const u = 2 * rng.nextDouble() - 1;
    const v = 2 * rng.nextDouble() - 1;
    const s = u * u + v * v;
    if (s >= 1 || s === 0) continue;
    const f = Math.sqrt((-2 * Math.log(s)) / s);
    out[k++] = u * f;
    if (k < out.length) out[k++] = v * f;
  }
  return out;
}
