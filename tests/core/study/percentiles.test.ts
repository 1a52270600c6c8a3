import { describe, it, expect } from "vitest";
import { quantile, quantileSorted, percentileSummary } from "../../../core/study/percentiles";
import { assertInDelta } from "../../helpers/assert";

describe("quantile() — Hyndman & Fan definition 7", () => {
  it("matches NumPy's percentile() (method 'linear') on a small unsorted sample", () => {
    // Reference: numpy 1.24.2, np.percentile([3.1, -2.0, 7.5, 0.0, 4.25, 9.0, 1.5], [5, 50, 95, 25])
    // → [-1.4, 3.1, 8.55, 0.75] (run with /usr/bin/python3 while writing this test).
    const x = [3.1, -2.0, 7.5, 0.0, 4.25, 9.0, 1.5];
    assertInDelta(
      [quantile(x, 0.05), quantile(x, 0.5), quantile(x, 0.95), quantile(x, 0.25)],
      [-1.4, 3.1, 8.55, 0.75],
      1e-12,
      "percentiles of the sample",
    );
  });

  it("returns the single value of a one-element sample and NaN for an empty one", () => {
    expect(quantileSorted([4], 0.95), "one value is every percentile").toBe(4);
    expect(Number.isNaN(quantile([], 0.5)), "no values, no percentile").toBe(true);
  });

  it("returns a repeated value exactly (no rounding from interpolation)", () => {
    const x = new Array<number>(101).fill(0.1 + 0.2);
    const s = percentileSummary(x);
    expect([s.p5, s.p50, s.p95], "a constant sample's percentiles are the constant").toEqual([
      0.1 + 0.2,
      0.1 + 0.2,
      0.1 + 0.2,
    ]);
  });

  it("drops NaN values and reports the count used", () => {
    const s = percentileSummary([1, Number.NaN, 3]);
    expect(s.count, "NaN is not a value").toBe(2);
    expect(s.p50, "median of 1 and 3").toBe(2);
  });
});
