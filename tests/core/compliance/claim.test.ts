import { describe, expect, it } from "vitest";
import { checkClaim } from "../../../core/compliance/claim";
import { beyondNearField } from "../../../core/farfield/stage";
import { CAUTION, RESULT_FORMAT, RESULT_VERSION, type BrinefieldResult } from "../../../core/result/contract";
import { beyondInputFixture, F, scenarioFixture } from "../farfield/fixtures";

/** A result assembled from the far-field stage with the fixture near fields (see fixtures.ts). */
function resultFixture(current = 0): BrinefieldResult {
  const input = beyondInputFixture(scenarioFixture({ ambient: { currentSpeed: current } }));
  const b = beyondNearField(input);
  return {
    format: RESULT_FORMAT,
    version: RESULT_VERSION,
    program: { name: "brinefield", version: "test" },
    inputsHash: "test",
    scenarioName: "fixture",
    caution: CAUTION,
    conversions: [],
    discharge: { flow: input.scenario.discharge.flow, salinity: 70, temperature: 20, fromPlant: false },
    densities: input.densities,
    port: input.port,
    nearField: b.nearField,
    multiport: b.multiport,
    mixingZone: b.mixingZone,
    compliance: b.compliance,
    cases: [{ name: "stated", kind: "stated", edgeDilution: b.mixingZone.dilution, verdict: b.compliance.verdict, margin: b.compliance.margin, scopeReasons: [] }],
    overall: { governingCase: "stated", verdict: b.compliance.verdict, margin: b.compliance.margin, edgeDilution: b.mixingZone.dilution },
    warnings: b.warnings,
    methods: b.methods,
  };
}

describe("checkClaim() — a claimed dilution against Brinefield's independent range", () => {
  // Still water, flat bed: chains give 1.06 F (integral) and 2.6 F (length-scale) at 100 m; the
  // integral fixture states a ×1.43 upper scatter, the length-scale fixture 1.06/1.6 lower scatter.
  const result = resultFixture();

  it("spans the lowest to highest method, widened by each method's stated uncertainty", () => {
    const c = checkClaim(result, 30);
    // Integral chain 1.06 F is the lowest (its stated scatter only goes up); the length-scale chain's
    // low end 2.6 F × 1.06/1.6 = 34.45 lies above it.
    expect(c.range[0], "integral chain 1.06 F (Lai & Lee 2012)").toBeCloseTo(1.06 * F, 9);
    const ls = c.methods.find((m) => m.method.startsWith("length-scale"))!;
    expect(ls.low, "length-scale low end 2.6 F × 1.06/1.6").toBeCloseTo(2.6 * F * (1.06 / 1.6), 9);
    expect(c.range[1], "length-scale 2.6 F is the highest").toBeCloseTo(2.6 * F, 9);
    expect(c.distance, "defaults to the mixing-zone radius").toBe(100);
    expect(c.methods.length, "one entry per chain").toBe(2);
  });

  it("says 'above' for a claim higher than every method, with how much and what it would need", () => {
    const c = checkClaim(result, 200);
    expect(c.verdict, "200 > 52").toBe("above");
    expect(c.byHowMuch, "200 / 52").toBeCloseTo(200 / (2.6 * F), 9);
    expect(c.assumptionsNeeded.join(" "), "names the missing current").toContain("current");
  });

  it("says 'within' for a claim inside the range", () => {
    const c = checkClaim(result, 40);
    expect(c.verdict, "21.2 ≤ 40 ≤ 52").toBe("within");
    expect(c.byHowMuch, "no gap").toBe(1);
  });

  it("says 'below' for a claim more conservative than every method", () => {
    const c = checkClaim(result, 10);
    expect(c.verdict, "10 < 21.2").toBe("below");
    expect(c.byHowMuch, "ratio below 1").toBeLessThan(1);
  });

  it("checks at another distance by scaling with the governing series, and states that assumption", () => {
    const c = checkClaim(resultFixture(0.2), 60, 300);
    expect(c.distance, "as asked").toBe(300);
    expect(c.assumptionsNeeded.join(" "), "the scaling is stated").toContain("scaled");
    const atEdge = checkClaim(resultFixture(0.2), 60);
    expect(c.range[0], "dilution does not fall with distance").toBeGreaterThanOrEqual(atEdge.range[0]);
  });
});
