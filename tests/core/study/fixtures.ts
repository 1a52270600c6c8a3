/** Small scenarios and fake evaluators shared by the study tests. */
import { parseScenario } from "../../../core/scenario/parse";
import type { Scenario } from "../../../core/scenario/types";
import { fourPortScenarioRaw } from "../../helpers/four-port-scenario";
import type { CaseSummary, Evaluator } from "../../../core/study/summary";

/** A 4-port line diffuser in a uniform 15 m ambient with a weak current (invented example). */
export function fourPortRaw(): Record<string, unknown> {
  return fourPortScenarioRaw("Four-port test diffuser");
}

export function scenarioFrom(raw: unknown): Scenario {
  const r = parseScenario(raw);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.scenario;
}

/**
 * A fake evaluator whose "edge dilution" is the ambient current speed and whose required dilution is
 * fixed: an identity-like, monotone output, so the output's percentiles are the input's.
 */
export function identityEvaluator(required: number, read: (s: Scenario) => number): Evaluator {
  return (s: Scenario): CaseSummary => {
    const d = read(s);
    return {
      edgeDilution: d,
      requiredDilution: required,
      margin: d / required,
      pass: d >= required,
      verdict: d >= required ? "meets" : "exceeds",
      scopeReasons: [],
      governingConstituent: "salinity",
      equationOfState: "test",
      buoyancy: "sinks",
      warningCount: 0,
      seriousWarningCount: 0,
      exitVelocity: 0,
      froude: 0,
      reachesSurface: false,
      surfaceClearance: null,
      methods: [],
      chain: "test",
    };
  };
}
