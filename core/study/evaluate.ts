/** The study evaluator backed by the one pipeline: one ambient case, without the path, edge detail only. */
import { runAmbientCase } from "../pipeline";
import type { Scenario } from "../scenario/types";
import { summariseResult, type CaseSummary } from "./summary";

export function evaluateScenario(scenario: Scenario): CaseSummary {
  return summariseResult(runAmbientCase(scenario, { includePath: false, detail: "edge" }), scenario);
}
