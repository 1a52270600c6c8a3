/**
 * The claim check's verdict rule against hand-worked numbers. The chains come from the far-field stage
 * fed with the fixture near fields (see ../farfield/fixtures.ts): in still water on a flat bed, 100 m
 * from the port, the integral chain gives 1.06 F (impact dilution of Lai & Lee 2012, the fixture states a
 * ×1.43 upper scatter) and the length-scale chain 2.6 F (near-field dilution of Roberts, Ferrier &
 * Daviero 1997, from memory; scatter 1.06/1.6 below). F = 20, so 21.2 and 52.
 */
import { describe, expect, it } from "vitest";
import { checkClaimFromCases, CLAIM_TOLERANCE, chainParts, type ClaimCaseResult } from "../../../core/compliance/claim";
import { stagesAfterNearField } from "../../../core/pipeline";
import { CAUTION, RESULT_FORMAT, RESULT_VERSION, type BrinefieldResult } from "../../../core/result/contract";
import { beyondInputFixture, F, portFixture, scenarioFixture } from "../farfield/fixtures";

/** A result assembled from the far-field stage with the fixture near fields. */
function resultFixture(current = 0): BrinefieldResult {
  const input = beyondInputFixture(scenarioFixture({ ambient: { currentSpeed: current } }));
  const b = stagesAfterNearField(input);
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
    port: portFixture(input.scenario),
    nearField: b.nearField,
    multiport: b.multiport,
    mixingZone: b.mixingZone,
    compliance: b.compliance,
    cases: [
      {
        name: "stated",
        kind: "stated",
        edgeDilution: b.mixingZone.dilution,
        verdict: b.compliance.verdict,
        margin: b.compliance.margin,
        scopeReasons: [],
      },
    ],
    overall: {
      governingCase: "stated",
      verdict: b.compliance.verdict,
      margin: b.compliance.margin,
      edgeDilution: b.mixingZone.dilution,
    },
    warnings: b.warnings,
    methods: b.methods,
  };
}

const stated: ClaimCaseResult = { name: "stated", currentSpeed: 0, result: resultFixture() };
const INTEGRAL = 1.06 * F; // 21.2
const LENGTH_SCALE = 2.6 * F; // 52
const check = (claim: number) => checkClaimFromCases([stated], claim, 100);

describe("checkClaimFromCases() — supported, plausible or not supported", () => {
  it("evaluates each chain at the distance: integral 1.06 F, length-scale 2.6 F (hand values)", () => {
    const c = check(30);
    const integral = c.chains.find((x) => x.nearFieldMethod === "integral")!;
    const ls = c.chains.find((x) => x.nearFieldMethod === "length-scale")!;
    expect(integral.dilution, "integral chain 1.06 F (Lai & Lee 2012)").toBeCloseTo(INTEGRAL, 9);
    expect(integral.high, "integral scatter up to ×1.43").toBeCloseTo(INTEGRAL * 1.43, 9);
    expect(ls.dilution, "length-scale chain 2.6 F (Roberts et al. 1997)").toBeCloseTo(LENGTH_SCALE, 9);
    expect(ls.low, "length-scale low end 2.6 F × 1.06/1.6").toBeCloseTo(LENGTH_SCALE * (1.06 / 1.6), 9);
    expect(c.conservativeDilution, "lowest edge dilution = the integral chain").toBeCloseTo(INTEGRAL, 9);
    expect(c.range, "central values of the chains").toEqual([
      c.chains[0]!.dilution < c.chains[1]!.dilution ? c.chains[0]!.dilution : c.chains[1]!.dilution,
      Math.max(c.chains[0]!.dilution, c.chains[1]!.dilution),
    ]);
  });

  it("'supported' at or below the conservative value, within 0.1 %", () => {
    expect(check(10).verdict, "10 < 21.2").toBe("supported");
    expect(check(INTEGRAL).verdict, "exactly the conservative value").toBe("supported");
    expect(check(INTEGRAL * 1.0009).verdict, "0.09 % above: within the tolerance").toBe("supported");
    expect(check(INTEGRAL * 1.002).verdict, "0.2 % above: no longer supported").toBe("plausible");
    expect(CLAIM_TOLERANCE, "0.1 %").toBe(0.001);
  });

  it("ratioToConservative is claim ÷ conservative value", () => {
    expect(check(42.4).ratioToConservative, "42.4 / 21.2").toBeCloseTo(2, 12);
  });

  it("'plausible' names the chains that give at least the claim, and those only within their scatter", () => {
    const c30 = check(30);
    expect(c30.verdict, "21.2 < 30 ≤ 52").toBe("plausible");
    const integral = c30.chains.find((x) => x.nearFieldMethod === "integral")!;
    expect(integral.reproducesClaim, "30 ≤ 21.2 × 1.43 = 30.3").toBe(true);
    expect(integral.onlyWithinScatter, "30 > central 21.2").toBe(true);
    const c40 = check(40);
    expect(c40.verdict, "40 ≤ 52").toBe("plausible");
    expect(
      c40.chains.filter((x) => x.reproducesClaim).map((x) => x.nearFieldMethod),
      "only the length-scale chain gives 40",
    ).toEqual(["length-scale"]);
    expect(c40.summary, "names the reproducing chain").toContain("length-scale");
    expect(c40.summary, "does not name the integral chain as reproducing it").not.toMatch(
      /least that much: [^.]*integral/,
    );
    expect(c40.assumptionsNeeded.join(" "), "states the chain's assumptions").toContain(
      "Roberts, Ferrier & Daviero 1997",
    );
  });

  it("'not-supported' above every chain, scatter included", () => {
    expect(check(LENGTH_SCALE * 1.01).verdict, "52.5 > 52 (the top of every chain)").toBe("not-supported");
    expect(check(LENGTH_SCALE).verdict, "exactly the highest chain").toBe("plausible");
  });

  it("takes the lowest case as the conservative value and evaluates chains in every case", () => {
    const current: ClaimCaseResult = { name: "flood", currentSpeed: 0.2, result: resultFixture(0.2) };
    const c = checkClaimFromCases([current, stated], 30, 100);
    const lowest = Math.min(current.result.mixingZone.dilution, stated.result.mixingZone.dilution);
    expect(c.conservativeDilution, "lowest of the two cases' edge dilutions").toBe(lowest);
    expect(new Set(c.chains.map((x) => x.case)), "chains of both cases").toEqual(new Set(["flood", "stated"]));
    expect(
      c.chains.some((x) => x.farField === "passive-diffusion"),
      "the current adds passive-diffusion chains",
    ).toBe(true);
  });

  it("splits chain names into the near-field method and what carries it on", () => {
    expect(chainParts("integral + passive-diffusion"), "two-stage chain").toEqual({
      nearFieldMethod: "integral",
      farField: "passive-diffusion",
    });
    expect(chainParts("length-scale (jet crosses the edge)"), "edge inside the jet").toEqual({
      nearFieldMethod: "length-scale",
      farField: "jet",
    });
  });
});
