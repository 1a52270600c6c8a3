/**
 * The claim check on a scenario: refuses what cannot be checked (a claimed dilution below 1, a distance
 * outside the computed series), runs every ambient case the overall verdict covers with the mixing-zone
 * radius set to the distance of the claim, and hands the results to `checkClaimFromCases`.
 */
import type { Scenario } from "../scenario/types";
import { runScenario } from "../pipeline";
import { expandCases, scenarioForAmbient, STATED_CASE } from "../cases";
import { withOverrides } from "../study/overrides";
import { checkClaimFromCases, type ClaimCaseResult, type ClaimCheck } from "./claim";

export { STATED_CASE };

export interface OverallCase {
  readonly name: string;
  readonly scenario: Scenario;
}

/**
 * The cases the overall verdict covers, the same cases every path runs (`expandCases`): the stated
 * conditions, every listed ambient case and slack water unless `options.addSlackWater` is false; a case
 * with the very same water as an earlier one is run once. Each is a scenario with that ambient and no
 * cases of its own.
 */
export function casesForOverall(s: Scenario): OverallCase[] {
  return expandCases(s)
    .filter((c) => c.sameAs === null && !c.refused)
    .map((c) => ({ name: c.name, scenario: c.kind === "stated" ? scenarioForAmbient(s, s.ambient) : c.scenario }));
}

export type ClaimOutcome =
  | { readonly ok: true; readonly check: ClaimCheck; readonly seriesEnd: number }
  | { readonly ok: false; readonly field: "claimedDilution" | "at"; readonly message: string };

/** Last distance of the dilution series `run` reports for the stated conditions, m. */
export function claimSeriesEnd(s: Scenario): number {
  const r = runScenario(scenarioForAmbient(s, s.ambient));
  const d = r.mixingZone.series.distance;
  return d.length ? d[d.length - 1]! : r.mixingZone.radius;
}

/**
 * Checks a claimed dilution at a distance (default: the mixing-zone radius). A claimed dilution below 1
 * (more concentrated than the discharge) and a distance that is not positive or lies beyond the computed
 * series are refused with a plain message, never extrapolated.
 */
export function checkClaimOnScenario(s: Scenario, claimedDilution: number, atDistance?: number): ClaimOutcome {
  if (!Number.isFinite(claimedDilution) || claimedDilution < 1) {
    return {
      ok: false,
      field: "claimedDilution",
      message: `claimed dilution ${claimedDilution} is not possible: a dilution is at least 1 (1 is the undiluted brine at the port).`,
    };
  }
  const distance = atDistance ?? s.mixingZone.radius;
  if (!Number.isFinite(distance) || !(distance > 0)) {
    return {
      ok: false,
      field: "at",
      message: `distance ${distance} m must be a finite number of metres greater than 0.`,
    };
  }
  const seriesEnd = claimSeriesEnd(s);
  if (distance > seriesEnd * (1 + 1e-9)) {
    return {
      ok: false,
      field: "at",
      message:
        `distance ${distance} m lies beyond the computed dilution series, which ends at ${Number(seriesEnd.toPrecision(4))} m ` +
        `(twice the mixing-zone radius, or past the near field); Brinefield does not extrapolate. ` +
        `Give a distance up to ${Number(seriesEnd.toPrecision(4))} m, or enlarge mixingZone.radius.`,
    };
  }
  const cases: ClaimCaseResult[] = casesForOverall(s).map((c) => ({
    name: c.name,
    currentSpeed: c.scenario.ambient.currentSpeed,
    result: runScenario(withOverrides(c.scenario, { "mixingZone.radius": distance })),
  }));
  return { ok: true, check: checkClaimFromCases(cases, claimedDilution, distance), seriesEnd };
}
