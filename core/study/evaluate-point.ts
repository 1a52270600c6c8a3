/**
 * One point of a sweep or one design candidate: a set of overrides, run under every ambient case.
 * Evaluation errors (a combination the pipeline rejects) are recorded, not thrown, so one bad point
 * does not stop a study.
 */
import type { Scenario } from "../scenario/types";
import { expandCases } from "./cases";
import { withOverrides, type Overrides } from "./overrides";
import { worstIndex, type CaseSummary, type Evaluator } from "./summary";

export interface PointEvaluation {
  readonly overrides: Overrides;
  readonly cases: readonly { readonly name: string; readonly summary: CaseSummary }[];
  /** Index into `cases` of the governing (lowest-margin) case; −1 when the point failed. */
  readonly worst: number;
  /** Set when the point could not be run (bad override or pipeline error). */
  readonly error?: string;
}

export function evaluatePoint(base: Scenario, overrides: Overrides, evaluate: Evaluator): PointEvaluation {
  try {
    const scenario = withOverrides(base, overrides);
    const cases = expandCases(scenario).map((c) => ({ name: c.name, summary: evaluate(c.scenario) }));
    return { overrides, cases, worst: worstIndex(cases.map((c) => c.summary)) };
  } catch (err) {
    return { overrides, cases: [], worst: -1, error: err instanceof Error ? err.message : String(err) };
  }
}

export function evaluatePoints(
  base: Scenario,
  list: readonly Overrides[],
  evaluate: Evaluator,
  onPoint?: (done: number) => void,
): PointEvaluation[] {
  const out: PointEvaluation[] = [];
  for (const o of list) {
    out.push(evaluatePoint(base, o, evaluate));
    onPoint?.(out.length);
  }
  return out;
}

/** The governing case's summary, or null for a failed point. */
export function worstSummary(p: PointEvaluation): CaseSummary | null {
  return p.worst >= 0 ? p.cases[p.worst]!.summary : null;
}
