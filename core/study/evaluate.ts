/** The study evaluator backed by the one pipeline: `runScenario` without the path, edge detail only. */
import { runScenario } from "../pipeline";
import type { Scenario } from "../scenario/types";
import { summariseResult, type CaseSummary } from "./summary";

export function evaluateScenario(scenario: Scenario): CaseSummary {
  return summariseResult(runScenario(scenario, { includePath: false, detail: "edge" }), scenario);
}
