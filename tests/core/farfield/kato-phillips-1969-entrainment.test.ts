import { describe, expect, it } from "vitest";
import {
  bedEntrainmentFromRichardson,
  bedEntrainmentFromRichardsonValidityIssues,
  KATO_PHILLIPS_RI_STAR_MIN,
} from "../../../core/farfield/kato-phillips-1969-entrainment";

describe("bedEntrainmentFromRichardson() — Kato & Phillips (1969) u_e/u* = 2.5/Ri* (from memory)", () => {
  it("follows 2.5/Ri* in its range", () => {
    expect(bedEntrainmentFromRichardson(25), "Ri* = 25").toBeCloseTo(0.1, 12);
    expect(bedEntrainmentFromRichardson(250), "Ri* = 250").toBeCloseTo(0.01, 12);
  });
  it("is held at the Ri* = 10 value below it (guard), and zero for no stirring", () => {
    expect(bedEntrainmentFromRichardson(1), "weak stratification").toBeCloseTo(2.5 / KATO_PHILLIPS_RI_STAR_MIN, 12);
    expect(bedEntrainmentFromRichardson(0), "neutral layer").toBeCloseTo(0.25, 12);
    expect(bedEntrainmentFromRichardson(Infinity), "no stirring").toBe(0);
    expect(bedEntrainmentFromRichardson(NaN), "undefined input").toBe(0);
  });
  it("warns below the guard and not inside the range", () => {
    expect(
      bedEntrainmentFromRichardsonValidityIssues(3).map((w) => w.code),
      "Ri* = 3",
    ).toEqual(["bed-entrainment-weakly-stratified"]);
    expect(bedEntrainmentFromRichardsonValidityIssues(30), "Ri* = 30").toEqual([]);
  });
});
