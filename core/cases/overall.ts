/**
 * The verdict over every ambient case. A case that exceeds a limit decides it ("exceeds": the design fails
 * in that water whatever the others say); otherwise a case outside the methods' scope does
 * ("outside-scope": no "meets" can be given); only when every case meets is the overall verdict "meets".
 * The governing case is the lowest-margin case among those with the deciding verdict.
 */
import type { OverallResult, Verdict } from "../result/contract";

export interface CaseVerdict {
  readonly name: string;
  readonly verdict: Verdict;
  readonly margin: number;
  readonly edgeDilution: number;
}

/** NaN margins (nothing computed) sort as the worst. */
function marginKey(m: number): number {
  return Number.isNaN(m) ? Number.NEGATIVE_INFINITY : m;
}

export function overallFromCases(cases: readonly CaseVerdict[]): OverallResult {
  if (cases.length === 0) throw new Error("overallFromCases: no cases");
  const order: Verdict[] = ["exceeds", "outside-scope", "meets"];
  const verdict = order.find((v) => cases.some((c) => c.verdict === v))!;
  const deciding = cases.filter((c) => c.verdict === verdict);
  const g = deciding.reduce((w, c) => (marginKey(c.margin) < marginKey(w.margin) ? c : w));
  return { governingCase: g.name, verdict, margin: g.margin, edgeDilution: g.edgeDilution };
}
