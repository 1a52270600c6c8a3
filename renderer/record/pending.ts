/**
 * A long ambient record in the app: the core worker computes the stated conditions only and marks the
 * record as pending (no verdict: "outside-scope" with the reason); the record's steps then run on the
 * study workers (useRecordRun) and the full result replaces this one.
 */
import { runAmbientCase } from "../../core/pipeline";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import { QUASI_STEADY_NOTE } from "../../core/record/summary";

/** Records up to this many steps run at once in the core worker; longer ones on the study workers. */
export const INLINE_RECORD_STEPS = 150;
export const RECORD_PENDING_CASE = "record not yet computed";

export function pendingRecordResult(scenario: Scenario): BrinefieldResult {
  const top = runAmbientCase(scenario, { includePath: true });
  const steps = scenario.ambient.record?.time.length ?? 0;
  const reason = `The ambient record's ${steps} steps are being computed; no verdict until they are.`;
  return {
    ...top,
    caution: `${top.caution} ${QUASI_STEADY_NOTE}`,
    cases: [
      {
        name: RECORD_PENDING_CASE,
        kind: "record",
        edgeDilution: Number.NaN,
        verdict: "outside-scope",
        margin: Number.NaN,
        scopeReasons: [reason],
      },
    ],
    overall: {
      governingCase: RECORD_PENDING_CASE,
      verdict: "outside-scope",
      margin: Number.NaN,
      edgeDilution: Number.NaN,
    },
    warnings: [
      ...top.warnings,
      { code: "record-pending", severity: "serious", message: reason, parameter: "ambient.record", stage: "record" },
    ],
  };
}

export function isRecordPending(result: BrinefieldResult | null): boolean {
  return result !== null && result.overall.governingCase === RECORD_PENDING_CASE && !result.record;
}
