/**
 * Property-based checks over the whole input space (fast-check, 1,000 cases each in the unit suite, BRINEFIELD_PROPERTY_RUNS lowers it for mutation runs;
 * `npm run fuzz` runs 10,000+). Valid scenarios give finite results with physical ordering and never
 * throw; invalid ones always get an error naming a path, never a crash.
 */
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { checkValidScenario, checkInvalidScenario, type ValidOutcome } from "../helpers/scenario-properties";
import { validScenarioFile, directDischargeFile, corruption } from "../helpers/arbitraries";

const RUNS = Number(process.env.BRINEFIELD_PROPERTY_RUNS ?? 1000);
// Mutation runs only ask whether a property fails, not for the smallest counterexample: no shrinking.
const endOnFailure = process.env.BRINEFIELD_PROPERTY_SHRINK === "0";

describe("any valid scenario", () => {
  // checkValidScenario also checks the verdicts: pass === (verdict === "meets"), scope reasons exactly
  // for outside-scope, and no "meets" with a dense jet rising to or above the water surface.
  it(`gives finite, physically ordered results, consistent verdicts and never throws (${RUNS} random scenarios)`, () => {
    const seen: Record<ValidOutcome, number> = { meets: 0, exceeds: 0, "outside-scope": 0, refused: 0 };
    fc.assert(
      fc.property(validScenarioFile, (raw) => {
        seen[checkValidScenario(raw)]++;
      }),
      { numRuns: RUNS, seed: 20261202, endOnFailure },
    );
    // A core that refuses or sets aside everything would pass every per-scenario check: the generator
    // stays inside the dense-jet scope, so at most a tenth may be refused, and every verdict must occur.
    expect(
      seen.refused <= RUNS / 10,
      `refused ${seen.refused} of ${RUNS} valid scenarios (at most a tenth allowed)`,
    ).toBe(true);
    for (const v of ["meets", "exceeds", "outside-scope"] as const)
      expect(seen[v] > 0, `the verdict "${v}" occurs (${JSON.stringify(seen)})`).toBe(true);
  }, 300_000); // each scenario runs every ambient case; 1,000 of them take tens of seconds on a shared machine
});

describe("any invalid scenario", () => {
  it(`is refused with a message naming the path, never a crash (${RUNS} random corruptions)`, () => {
    fc.assert(
      fc.property(directDischargeFile, corruption, (raw, c) => checkInvalidScenario(raw, c)),
      { numRuns: RUNS, seed: 20261203, endOnFailure },
    );
  });
  it("survives input that is not an object at all", () => {
    for (const v of [null, 42, "text", [], true, undefined])
      checkInvalidScenario(v, { what: "not an object", apply: () => {} });
    expect(true, "reached the end without throwing").toBe(true);
  });
});
