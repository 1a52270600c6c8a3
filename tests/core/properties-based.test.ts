/**
 * Property-based checks over the whole input space (fast-check, 1,000 cases each in the unit suite;
 * `npm run fuzz` runs 10,000+). Valid scenarios give finite results with physical ordering and never
 * throw; invalid ones always get an error naming a path, never a crash.
 */
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { checkValidScenario, checkInvalidScenario } from "../helpers/scenarioProperties";
import { validScenarioFile, corruption } from "../helpers/arbitraries";

const RUNS = Number(process.env.BRINEFIELD_PROPERTY_RUNS ?? 1000);

describe("any valid scenario", () => {
  // checkValidScenario also checks the verdicts: pass === (verdict === "meets"), scope reasons exactly
  // for outside-scope, and no "meets" with a dense jet rising to or above the water surface.
  it(`gives finite, physically ordered results, consistent verdicts and never throws (${RUNS} random scenarios)`, () => {
    fc.assert(fc.property(validScenarioFile, (raw) => checkValidScenario(raw)), { numRuns: RUNS, seed: 20261202 });
    // Scenarios of either buoyancy: rising plumes add integral runs to the surface; on a shared two-core
    // machine the 1,000 cases can need more than the default 30 s.
  }, 180_000);
});

describe("any invalid scenario", () => {
  it(`is refused with a message naming the path, never a crash (${RUNS} random corruptions)`, () => {
    fc.assert(
      fc.property(validScenarioFile, corruption, (raw, c) => checkInvalidScenario(raw, c)),
      { numRuns: RUNS, seed: 20261203 },
    );
  });
  it("survives input that is not an object at all", () => {
    for (const v of [null, 42, "text", [], true, undefined]) checkInvalidScenario(v, { what: "not an object", apply: () => {} });
    expect(true, "reached the end without throwing").toBe(true);
  });
});
