/** The claim range bar: one dot per chain placed by its value, the claim and the conservative value marked. */
import { describe, expect, it } from "vitest";
import { claimRangeBarSvg } from "../../../core/report/claim-figure";
import type { ClaimCheck, ClaimChain } from "../../../core/compliance/claim";

const chain = (method: string, dilution: number, reproducesClaim: boolean): ClaimChain => ({
  case: "stated",
  method,
  nearFieldMethod: method.split(" ")[0]!,
  farField: "gravity-current",
  dilution,
  low: dilution,
  high: dilution * 1.43,
  reproducesClaim,
  onlyWithinScatter: false,
  assumptions: [],
});

const check: ClaimCheck = {
  verdict: "plausible",
  claimedDilution: 60,
  distance: 150,
  conservativeDilution: 23.7,
  conservativeCase: "stated",
  ratioToConservative: 60 / 23.7,
  chains: [chain("integral + gravity-current", 23.7, false), chain("length-scale + gravity-current", 69, true)],
  cases: [{ name: "stated", edgeDilution: 23.7, currentSpeed: 0 }],
  range: [23.7, 69],
  summary: "",
  assumptionsNeeded: [],
};

describe("claimRangeBarSvg()", () => {
  const svg = claimRangeBarSvg(check);
  const dots = [...svg.matchAll(/<circle cx="([\d.]+)"/g)].map((m) => Number(m[1]));

  it("draws one dot per chain, in the order of their values", () => {
    expect(dots.length, "two chains").toBe(2);
    expect(dots[0]!, "23.7 left of 69").toBeLessThan(dots[1]!);
  });

  it("puts the claim between the two chains and marks the conservative value at the lower chain", () => {
    const claimX = Number(/<line x1="([\d.]+)"[^>]*stroke="#b91c1c" stroke-width="2"/.exec(svg)![1]);
    const consX = Number(/<line x1="([\d.]+)"[^>]*stroke-dasharray="3 3"/.exec(svg)![1]);
    expect(claimX > dots[0]! && claimX < dots[1]!, "23.7 < 60 < 69 on the axis").toBe(true);
    expect(consX, "conservative line through the lower dot").toBeCloseTo(dots[0]!, 0);
    expect(svg, "labelled").toContain("claim 60");
  });
});
