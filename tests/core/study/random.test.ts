import { describe, it, expect } from "vitest";
import { Xoshiro128, streamFor, standardNormal, mix32, seedFromText } from "../../../core/study/random";
import { assertInDelta } from "../../helpers/assert";

const N = 200_000;

describe("Xoshiro128 (xoshiro128**)", () => {
  it("repeats exactly for the same seed and stream, and differs between streams and seeds", () => {
    const a = new Xoshiro128(42, 7);
    const b = new Xoshiro128(42, 7);
    const seqA = Array.from({ length: 20 }, () => a.nextUint32());
    const seqB = Array.from({ length: 20 }, () => b.nextUint32());
    expect(seqA, "same seed and stream give the same sequence").toEqual(seqB);
    const c = Array.from(
      { length: 20 },
      (
        (r) => () =>
          r.nextUint32()
      )(new Xoshiro128(42, 8)),
    );
    const d = Array.from(
      { length: 20 },
      (
        (r) => () =>
          r.nextUint32()
      )(new Xoshiro128(43, 7)),
    );
    expect(c, "a different stream gives a different sequence").not.toEqual(seqA);
    expect(d, "a different seed gives a different sequence").not.toEqual(seqA);
  });

  it("draws uniforms in [0, 1) with the closed-form moments of U(0,1): mean 1/2, variance 1/12", () => {
    // Closed form: E[U] = 1/2, Var[U] = 1/12 for U ~ uniform(0, 1). Tolerances are ~5 standard errors
    // of the estimators for N = 200 000 (σ_mean = 0.289/√N ≈ 6.5e-4; σ_var ≈ 0.0745/√N ≈ 1.7e-4).
    const r = streamFor(2024, 0);
    let sum = 0;
    let sum2 = 0;
    let min = 1;
    let max = 0;
    for (let i = 0; i < N; i++) {
      const u = r.next();
      sum += u;
      sum2 += u * u;
      min = Math.min(min, u);
      max = Math.max(max, u);
    }
    const mean = sum / N;
    assertInDelta(mean, 0.5, 0.0033, "uniform mean");
    assertInDelta(sum2 / N - mean * mean, 1 / 12, 0.0009, "uniform variance");
    expect(min >= 0 && max < 1, `uniforms stay in [0, 1): min ${min}, max ${max}`).toBe(true);
  });

  it("fills ten equal bins evenly (chi-square below the 0.999 quantile of χ²(9), 27.88)", () => {
    // χ²(9) 0.999 quantile 27.877 (standard χ² tables, e.g. Abramowitz & Stegun Table 26.8; from memory).
    const r = new Xoshiro128(7);
    const bins = new Array<number>(10).fill(0);
    for (let i = 0; i < N; i++) bins[Math.floor(r.next() * 10)]!++;
    const e = N / 10;
    const chi2 = bins.reduce((s, o) => s + ((o - e) * (o - e)) / e, 0);
    expect(chi2, `chi-square of 10 bins ${chi2.toFixed(2)}`).toBeLessThan(27.88);
  });

  it("mix32 is a bijection on a sample (no two inputs map to the same word)", () => {
    const seen = new Set<number>();
    for (let i = 0; i < 50_000; i++) seen.add(mix32(i));
    expect(seen.size, "MurmurHash3's finaliser is invertible, so outputs are distinct").toBe(50_000);
  });
});

describe("standardNormal() (Box–Muller)", () => {
  it("has mean 0, variance 1 and 95 % of draws within ±1.959964 (standard normal, closed form)", () => {
    // ±1.959964 is the 0.975 quantile of N(0, 1): Python 3 statistics.NormalDist().inv_cdf(0.975).
    const r = new Xoshiro128(99);
    let sum = 0;
    let sum2 = 0;
    let inside = 0;
    for (let i = 0; i < N; i++) {
      const z = standardNormal(r);
      sum += z;
      sum2 += z * z;
      if (Math.abs(z) <= 1.959964) inside++;
    }
    assertInDelta(sum / N, 0, 0.012, "normal mean (5 standard errors, 1/√N = 0.0022)");
    assertInDelta(sum2 / N, 1, 0.016, "normal variance (5 standard errors, √(2/N) = 0.0032)");
    // 5 standard errors of a proportion: √(0.95·0.05/N) = 4.9e-4.
    assertInDelta(inside / N, 0.95, 0.0025, "fraction within ±1.96");
  });

  it("consumes exactly two uniforms per call, so streams stay aligned", () => {
    const a = new Xoshiro128(5);
    const b = new Xoshiro128(5);
    standardNormal(a);
    b.next();
    b.next();
    expect(a.nextUint32(), "after one normal the generator has advanced by two draws").toBe(b.nextUint32());
  });
});

describe("seedFromText()", () => {
  it("accepts whole numbers 0 … 2^32 − 1 and rejects anything else", () => {
    expect(seedFromText("0"), "zero is a seed").toBe(0);
    expect(seedFromText("4294967295"), "the largest 32-bit seed").toBe(4294967295);
    expect(seedFromText("4294967296"), "over 32 bits").toBeNull();
    expect(seedFromText("-1"), "negative").toBeNull();
    expect(seedFromText("1.5"), "fraction").toBeNull();
    expect(seedFromText("abc"), "not a number").toBeNull();
  });
});
