/** The long property run (`npm run fuzz`): 10,000 valid and 10,000 invalid scenarios. */
import { describe, it } from "vitest";
import fc from "fast-check";
import { checkValidScenario, checkInvalidScenario } from "../helpers/scenario-properties";
import { validScenarioFile, directDischargeFile, corruption } from "../helpers/arbitraries";

const RUNS = Number(process.env.BRINEFIELD_FUZZ_RUNS ?? 10_000);

describe("fuzz", () => {
  it(`valid scenarios (${RUNS})`, () => {
    fc.assert(
      fc.property(validScenarioFile, (raw) => {
        checkValidScenario(raw);
      }),
      { numRuns: RUNS },
    );
  });
  it(`invalid scenarios (${RUNS})`, () => {
    fc.assert(
      fc.property(directDischargeFile, corruption, (raw, c) => checkInvalidScenario(raw, c)),
      { numRuns: RUNS },
    );
  });
});
