/**
 * The study evaluator backed by the one pipeline: one ambient case, edge detail only (full with an intake).
 * The result is summarised and dropped, so the near-field path it carries is not copied out (the summary
 * reads no path).
 */
import { runAmbientCase } from "../pipeline";
import type { Scenario } from "../scenario/types";
import type { CaseSummary } from "./summary";
import { caseDetail, summaryWithIntake } from "../intake/summary";

export function evaluateScenario(scenario: Scenario): CaseSummary {
  return summaryWithIntake(scenario, runAmbientCase(scenario, { detail: caseDetail(scenario) }));
}
