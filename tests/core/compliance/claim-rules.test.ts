/**
 * The claim check's rules and words, on hand-made chain values (the project's own rule; the chains'
 * physics is tested in the far-field and near-field suites): scatter widening, the conservative case,
 * the verdict boundaries, the sentences a permit writer reads, and the refusals of the scenario runner.
 */
import { describe, expect, it } from "vitest";
import { checkClaimFromCases, chainParts, type ClaimCaseResult } from "../../../core/compliance/claim";
import { checkClaimOnScenario, claimSeriesEnd } from "../../../core/compliance/claim-run";
import type { BrinefieldResult } from "../../../core/result/contract";
import { scenarioFixture } from "../farfield/fixtures";

interface Chain {
  method: string;
  dilution: number;
}
/** The parts of a result the claim check reads. */
function fake(
  chains: Chain[],
  opts: {
    edge?: number;
    ranges?: Record<string, readonly [number, number] | null>;
    impact?: Record<string, number | null>;
    merge?: number;
  } = {},
): BrinefieldResult {
  const ranges = opts.ranges ?? {};
  const methods = new Set(chains.map((c) => chainParts(c.method).nearFieldMethod));
  return {
    mixingZone: {
      method: chains[0]!.method,
      dilution: opts.edge ?? Math.min(...chains.map((c) => c.dilution)),
      alternatives: chains,
    },
    nearField: [...methods].map((m) => ({
      method: m,
      impactDilution: opts.impact?.[m] === undefined ? 10 : opts.impact[m],
      dilutionRange: ranges[m] === undefined ? [10, 10] : ranges[m],
    })),
    multiport: { dilutionFactor: opts.merge ?? 1, regime: opts.merge ? "partially-merged" : "independent" },
  } as unknown as BrinefieldResult;
}
const at = (name: string, currentSpeed: number, result: BrinefieldResult): ClaimCaseResult => ({
  name,
  currentSpeed,
  result,
});

describe("chainParts() — the near-field method and what carries it on", () => {
  it("reads '+ gravity-current', '+ passive-diffusion', a jet chain with or without a note", () => {
    expect(chainParts("integral + gravity-current")).toEqual({
      nearFieldMethod: "integral",
      farField: "gravity-current",
    });
    expect(chainParts("integral +  passive-diffusion ")).toEqual({
      nearFieldMethod: "integral",
      farField: "passive-diffusion",
    });
    expect(chainParts("length-scale")).toEqual({ nearFieldMethod: "length-scale", farField: "jet" });
  });
});

describe("checkClaimFromCases() — scatter, conservative case and verdict", () => {
  it("widens each chain by its method's scatter relative to the impact dilution, never below 1", () => {
    const r = fake([{ method: "integral + gravity-current", dilution: 30 }], {
      ranges: { integral: [8, 15] },
      impact: { integral: 10 },
    });
    const c = checkClaimFromCases([at("stated", 0, r)], 5, 100).chains[0]!;
    expect(c.low, "30 × 8/10").toBeCloseTo(24, 12);
    expect(c.high, "30 × 15/10").toBeCloseTo(45, 12);
    const inverted = fake([{ method: "integral + gravity-current", dilution: 30 }], { ranges: { integral: [12, 9] } });
    const k = checkClaimFromCases([at("stated", 0, inverted)], 5, 100).chains[0]!;
    expect([k.low, k.high], "a range that does not straddle the impact dilution is clipped to it").toEqual([30, 30]);
    for (const [why, ranges, impact] of [
      ["no range", { integral: null }, { integral: 10 }],
      ["no impact dilution", { integral: [8, 15] }, { integral: null }],
      ["zero impact dilution", { integral: [8, 15] }, { integral: 0 }],
    ] as const) {
      const x = checkClaimFromCases(
        [
          at(
            "stated",
            0,
            fake([{ method: "integral + gravity-current", dilution: 30 }], {
              ranges: { ...ranges },
              impact: { ...impact },
            }),
          ),
        ],
        5,
        100,
      ).chains[0]!;
      expect([x.low, x.high], why).toEqual([30, 30]);
    }
    const small = fake([{ method: "integral + gravity-current", dilution: 1.5 }], { ranges: { integral: [2, 10] } });
    expect(checkClaimFromCases([at("stated", 0, small)], 1, 100).chains[0]!.low, "at least 1").toBe(1);
  });

  it("uses the lowest case edge dilution as the conservative value, the first of equal ones", () => {
    const a = fake([{ method: "integral + gravity-current", dilution: 40 }]);
    const b = fake([{ method: "integral + gravity-current", dilution: 25 }]);
    const c = fake([{ method: "integral + gravity-current", dilution: 25 }]);
    const k = checkClaimFromCases([at("stated", 0.1, a), at("neap", 0.02, b), at("slack", 0, c)], 20, 100);
    expect(k.conservativeDilution).toBe(25);
    expect(k.conservativeCase).toBe("neap");
    expect(k.cases).toEqual([
      { name: "stated", edgeDilution: 40, currentSpeed: 0.1 },
      { name: "neap", edgeDilution: 25, currentSpeed: 0.02 },
      { name: "slack", edgeDilution: 25, currentSpeed: 0 },
    ]);
    expect(k.range).toEqual([25, 40]);
    expect(k.ratioToConservative).toBeCloseTo(0.8, 12);
    expect(k.distance).toBe(100);
    expect(k.claimedDilution).toBe(20);
  });

  it("falls back to the edge method when a result lists no alternatives", () => {
    const r = { ...fake([{ method: "length-scale + gravity-current", dilution: 33 }]) } as BrinefieldResult;
    const bare = { ...r, mixingZone: { ...r.mixingZone, alternatives: [] } } as unknown as BrinefieldResult;
    const k = checkClaimFromCases([at("stated", 0, bare)], 20, 100);
    expect(k.chains.map((c) => [c.method, c.dilution])).toEqual([["length-scale + gravity-current", 33]]);
  });

  it("refuses to check with no case results", () => {
    expect(() => checkClaimFromCases([], 20, 100)).toThrow(/no case results/);
  });
});

describe("checkClaimFromCases() — the sentences", () => {
  const stated = fake(
    [
      { method: "length-scale + gravity-current", dilution: 52 },
      { method: "integral + passive-diffusion", dilution: 21.2 },
    ],
    { ranges: { integral: [10, 14.3] } },
  );
  const neap = fake([{ method: "length-scale (jet crosses the edge)", dilution: 140 }], { merge: 0.8 });

  it("supported: the claim, the distance, the conservative value, its case and the ratio", () => {
    const k = checkClaimFromCases([at("stated", 0.2, stated)], 20, 150);
    expect(k.verdict).toBe("supported");
    expect(k.summary).toBe(
      "The claimed dilution 20 at 150 m is at or below Brinefield's conservative value 21.2 (case stated conditions; ratio 0.943).",
    );
    expect(k.assumptionsNeeded).toEqual([]);
  });

  it("plausible: the chains that give the claim, grouped by method with their cases and assumptions", () => {
    const k = checkClaimFromCases([at("stated", 0.2, stated), at("neap", 0.05, neap)], 30, 150);
    expect(k.verdict).toBe("plausible");
    expect(k.summary).toBe(
      "The claimed dilution 30 at 150 m is 1.42× Brinefield's conservative value 21.2 (case stated conditions). " +
        '3 of 3 method chains give at least that much: length-scale + gravity-current (stated conditions); integral + passive-diffusion (stated conditions); length-scale (jet crosses the edge) ("neap").',
    );
    expect(k.assumptionsNeeded).toEqual([
      "length-scale + gravity-current, in stated conditions: Near field: the length-scale correlations for an inclined dense jet (laboratory coefficients of Roberts, Ferrier & Daviero 1997 and Lai & Lee 2012). Beyond the near field: the brine spreads as a dense layer on the seabed, mixing by the Turner (1986) entrainment law E(Ri); it needs no current.",
      "integral + passive-diffusion, in stated conditions: Near field: the integral jet model (entrainment closure of Lee & Cheung 1990). Beyond the near field: the case's current, taken as steady, carries the layer and it mixes by Brooks (1960) passive diffusion; that current must persist (not slack water) and the layer's own spreading is neglected. In stated conditions only the top of the near-field method's stated scatter reaches the claim.",
      'length-scale (jet crosses the edge), in "neap": Near field: the length-scale correlations for an inclined dense jet (laboratory coefficients of Roberts, Ferrier & Daviero 1997 and Lai & Lee 2012). The distance (150 m) lies inside the jet: the jet\'s own centreline dilution there. Neighbouring jets merge in some of these cases, which lowers the single-jet dilution (already allowed for).',
    ]);
    const jet = k.chains.find((c) => c.case === "neap")!;
    expect(jet.assumptions).toContain('Ambient: case "neap" (current 0.05 m/s).');
    expect(jet.assumptions).toContain(
      "Neighbouring jets merge (partially-merged): single-jet dilution is reduced by a factor 0.80.",
    );
    expect(k.chains.find((c) => c.method === "integral + passive-diffusion")!).toMatchObject({
      reproducesClaim: true,
      onlyWithinScatter: true,
    });
    expect(k.chains.find((c) => c.method === "length-scale + gravity-current")!).toMatchObject({
      reproducesClaim: true,
      onlyWithinScatter: false,
    });
  });

  it("not supported: the highest chain with its scatter, its case, the ratio and what the claim would need", () => {
    const k = checkClaimFromCases([at("stated", 0.2, stated), at("neap", 0.05, neap)], 500, 150);
    expect(k.verdict).toBe("not-supported");
    expect(k.summary).toBe(
      'The claimed dilution 500 at 150 m is above every method chain, scatter included (highest 140, length-scale (jet crosses the edge) in "neap"); it is 23.58× the conservative value 21.2.',
    );
    expect(k.assumptionsNeeded).toHaveLength(1);
    expect(k.assumptionsNeeded[0]).toMatch(
      /^The claim would need a near-field law that dilutes more than the published ones/,
    );
    expect(k.chains.every((c) => !c.reproducesClaim && !c.onlyWithinScatter)).toBe(true);
  });

  it("names an unknown near-field method plainly", () => {
    const odd = fake([{ method: "other + gravity-current", dilution: 40 }]);
    const missing = { ...odd, nearField: [] } as unknown as BrinefieldResult;
    expect(checkClaimFromCases([at("stated", 0, odd)], 30, 100).chains[0]!.assumptions[1]).toBe(
      "Near field: the other method.",
    );
    expect(checkClaimFromCases([at("stated", 0, missing)], 30, 100).chains[0]!.assumptions[1]).toBe(
      "Near field: the other method (no result in this case).",
    );
  });
});

describe("checkClaimOnScenario() — what cannot be checked is refused, never extrapolated", () => {
  const s = scenarioFixture({ options: { addSlackWater: false } });

  it("refuses a claimed dilution below 1 or not a number, and a distance that is not positive", () => {
    for (const claim of [0.5, 0, -3, Number.NaN, Infinity]) {
      const o = checkClaimOnScenario(s, claim);
      expect(o.ok, `claim ${claim}`).toBe(false);
      if (!o.ok) {
        expect(o.field).toBe("claimedDilution");
        expect(o.message).toBe(
          `claimed dilution ${claim} is not possible: a dilution is at least 1 (1 is the undiluted brine at the port).`,
        );
      }
    }
    for (const d of [0, -10, Number.NaN, Infinity]) {
      const o = checkClaimOnScenario(s, 10, d);
      expect(o.ok, `distance ${d}`).toBe(false);
      if (!o.ok) {
        expect(o.field).toBe("at");
        expect(o.message).toBe(`distance ${d} m must be a finite number of metres greater than 0.`);
      }
    }
  });

  it("checks at the mixing-zone radius by default, up to the end of the series and not beyond", () => {
    const end = claimSeriesEnd(s);
    expect(end, "the series reaches past the radius").toBeGreaterThanOrEqual(s.mixingZone.radius);
    const def = checkClaimOnScenario(s, 1);
    expect(def.ok && def.check.distance).toBe(s.mixingZone.radius);
    expect(def.ok && def.seriesEnd).toBe(end);
    expect(def.ok && def.check.verdict, "a dilution of 1 is always supported").toBe("supported");
    expect(checkClaimOnScenario(s, 10, end).ok, "the last point").toBe(true);
    const beyond = checkClaimOnScenario(s, 10, end * 1.01);
    expect(beyond.ok).toBe(false);
    if (!beyond.ok) {
      expect(beyond.field).toBe("at");
      expect(beyond.message).toContain(
        `lies beyond the computed dilution series, which ends at ${Number(end.toPrecision(4))} m`,
      );
      expect(beyond.message).toContain("Brinefield does not extrapolate");
    }
  });
});
