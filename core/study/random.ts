/**
 * A small seeded pseudo-random number generator for reproducible Monte Carlo studies.
 *
 * Generator: xoshiro128** (Blackman & Vigna, "Scrambled linear pseudorandom number generators",
 * ACM Transactions on Mathematical Software 47(4), 2021), 32-bit state words, period 2^128 − 1.
 * Seeding: the 128-bit state is filled from a 32-bit Weyl sequence passed through the MurmurHash3
 * 32-bit finaliser (Appleby, public domain), the usual way to spread a small seed over a large state.
 *
 * Reproducibility across worker counts: every Monte Carlo run i draws from its own stream
 * `streamFor(seed, i)`, so the numbers a run sees do not depend on which worker runs it or in what order.
 */

/** MurmurHash3 32-bit finaliser: a bijective avalanche mix of one 32-bit word. */
export function mix32(x: number): number {
  let z = x >>> 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return (z ^ (z >>> 16)) >>> 0;
}

/** A uniform random source: `next()` returns a float in [0, 1). */
export interface RandomSource {
  next(): number;
  /** A 32-bit unsigned integer. */
  nextUint32(): number;
}

const GOLDEN_32 = 0x9e3779b9; // 2^32 / golden ratio, the Weyl increment

/** xoshiro128** seeded from a 32-bit seed and an optional 32-bit stream index. */
export class Xoshiro128 implements RandomSource {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(seed: number, stream = 0) {
    // Weyl sequence over (seed, stream) → four well-mixed, not-all-zero words.
    let w = (mix32(seed >>> 0) ^ mix32((Math.imul(stream >>> 0, 0x632be5ab) + 0x1b873593) >>> 0)) >>> 0;
    const fill = (): number => {
      w = (w + GOLDEN_32) >>> 0;
      return mix32(w);
    };
    this.s0 = fill();
    this.s1 = fill();
    this.s2 = fill();
    this.s3 = fill();
    // An all-zero state is the one state xoshiro cannot leave; fill() makes it practically impossible.
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1;
  }

  nextUint32(): number {
    const s1 = this.s1;
    const r = Math.imul(rotl(Math.imul(s1, 5), 7), 9) >>> 0;
    const t = s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3, 11);
    return r;
  }

  next(): number {
    return this.nextUint32() / 4294967296;
  }
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/** The independent stream used by Monte Carlo run `index` of a study seeded with `seed`. */
export function streamFor(seed: number, index: number): Xoshiro128 {
  return new Xoshiro128(seed, index);
}

/**
 * One standard normal deviate by the Box–Muller transform (Box & Muller, "A note on the generation of
 * random normal deviates", Annals of Mathematical Statistics 29(2):610–611, 1958). Uses two uniforms
 * and returns the cosine branch only, so each call consumes exactly two draws (keeps streams aligned).
 */
export function standardNormal(rng: RandomSource): number {
  const u1 = 1 - rng.next(); // in (0, 1]: log stays finite
  const u2 = rng.next();
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}

/** Parses a user seed: a whole number 0 … 2^32 − 1. Returns null when it is not one. */
export function seedFromText(text: string): number | null {
  if (!/^\d+$/.test(text.trim())) return null;
  const v = Number(text.trim());
  return Number.isSafeInteger(v) && v <= 0xffffffff ? v : null;
}
