/** The study evaluator backed by the one pipeline: one ambient case, without the path, edge detail only (full with an intake). */
import { runAmbientCase } from "../pipeline";
import type { Scenario } from "../scenario/types";
import type { CaseSummary } from "./summary";
import { caseDetail, summaryWithIntake } from "../intake/summary";

export function evaluateScenario(scenario: Scenario): CaseSummary {
  return summaryWithIntake(scenario, runAmbientCase(scenario, { includePath: false, detail: caseDetail(scenario) }));
}
