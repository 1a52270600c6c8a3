/**
 * The one step/case evaluation every path uses when a scenario may carry an intake: the study summary of
 * a pipeline run, with the intake's figures added. An intake needs the spreading-layer series, so such
 * scenarios run with full detail (same physics, more output).
 */
import type { AmbientCaseResult } from "../pipeline";
import type { Scenario } from "../scenario/types";
import { summariseResult, type CaseSummary } from "../study/summary";
import { intakeFromResult } from "./intake";

export function caseDetail(s: Scenario): "full" | "edge" {
  return s.intake ? "full" : "edge";
}

export function summaryWithIntake(scenario: Scenario, result: AmbientCaseResult): CaseSummary {
  const s = summariseResult(result, scenario);
  return scenario.intake ? { ...s, intake: intakeFromResult(scenario, result) } : s;
}
