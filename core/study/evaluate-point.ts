/**
 * One point of a sweep or one design candidate: a set of overrides, run under every ambient case (the
 * same cases and overall verdict as `run`). A point whose inputs break a scenario rule is "refused" with
 * the rule's message (the same as `run` gives); it is recorded, not thrown, so one bad point does not
 * stop a study.
 */
import type { OverallResult, StudyVerdict } from "../result/contract";
import type { Scenario } from "../scenario/types";
import { withOverrides, type Overrides } from "./overrides";
import { evaluateCases, type CaseEvaluation, type CaseSummary, type Evaluator } from "./summary";

export interface PointEvaluation {
  readonly overrides: Overrides;
  readonly cases: readonly CaseEvaluation[];
  /** Index into `cases` of the governing case (`overall.governingCase`); −1 when the point was refused. */
  readonly worst: number;
  readonly overall: OverallResult | null;
  /** The overall verdict, or "refused". */
  readonly verdict: StudyVerdict;
  /** Set when the point was refused: the rule's message. */
  readonly error?: string;
}

export function evaluatePoint(base: Scenario, overrides: Overrides, evaluate: Evaluator): PointEvaluation {
  try {
    const scenario = withOverrides(base, overrides);
    const e = evaluateCases(scenario, evaluate);
    return { overrides, cases: e.cases, worst: e.governing, overall: e.overall, verdict: e.overall.verdict };
  } catch (err) {
    return {
      overrides,
      cases: [],
      worst: -1,
      overall: null,
      verdict: "refused",
      error: err instanceof Error ? err.message : String(err),
    };
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

/** The governing case's summary, or null for a refused point. */
export function worstSummary(p: PointEvaluation): CaseSummary | null {
  return p.worst >= 0 ? p.cases[p.worst]!.summary : null;
}
