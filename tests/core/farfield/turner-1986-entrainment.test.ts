import { describe, expect, it } from "vitest";
import {
  entrainmentFromRichardson,
  entrainmentFromRichardsonValidityIssues,
  ENTRAINMENT_CUTOFF_RICHARDSON,
} from "../../../core/farfield/turner-1986-entrainment";

describe("entrainmentFromRichardson() — Turner (1986) E(Ri) with the Ellison & Turner (1959) cut-off", () => {
  it("starts at 0.08 for a neutral layer and falls to zero at Ri = 0.8 (Turner 1986, from memory; cut-off from Ellison & Turner 1959)", () => {
    expect(entrainmentFromRichardson(0), "E(0) = 0.08, Turner 1986 (from memory)").toBeCloseTo(0.08, 12);
    expect(entrainmentFromRichardson(0.8), "E(0.8) = 0, Ellison & Turner 1959 (confirmed)").toBe(0);
    expect(ENTRAINMENT_CUTOFF_RICHARDSON, "cut-off Ri = 0.8, Ellison & Turner 1959 (confirmed)").toBe(0.8);
  });

  it("decreases monotonically with Ri over the fitted range, as the published curve does", () => {
    let previous = Infinity;
    for (let ri = 0; ri <= 0.8; ri += 0.01) {
      const e = entrainmentFromRichardson(ri);
      expect(e, `E(${ri.toFixed(2)}) should not exceed E at smaller Ri`).toBeLessThanOrEqual(previous);
      expect(e, `E(${ri.toFixed(2)}) is non-negative`).toBeGreaterThanOrEqual(0);
      previous = e;
    }
  });

  it("gives zero entrainment for a strongly stable or stagnant layer (Ri ≥ 0.8, Ri = ∞)", () => {
    expect(entrainmentFromRichardson(5), "Ri = 5 is beyond the cut-off").toBe(0);
    expect(entrainmentFromRichardson(Infinity), "a layer at rest entrains nothing").toBe(0);
  });

  it("warns, without throwing, for a negative (unstable) Richardson number and uses E(0)", () => {
    const issues = entrainmentFromRichardsonValidityIssues(-0.3);
    expect(
      issues.map((w) => w.code),
      "a structured warning names the problem",
    ).toContain("entrainment-richardson-negative");
    expect(entrainmentFromRichardson(-0.3), "clamped to Ri = 0").toBeCloseTo(0.08, 12);
    expect(entrainmentFromRichardsonValidityIssues(0.3), "no warning inside the fitted range").toEqual([]);
  });
});
