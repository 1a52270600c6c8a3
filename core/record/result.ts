/**
 * Joining the stated conditions' full result with a record's step outcomes (or with every ambient case's
 * intake figures) into the result contract: `cases`, `overall`, `record`, `intake`, warnings, methods and
 * the caution. The CLI's worker threads and the in-process run both end here.
 */
import type { AmbientCaseResult } from "../pipeline";
import type { BrinefieldResult, CaseResult, OverallResult } from "../result/contract";
import type { Scenario } from "../scenario/types";
import type { StepOutcome } from "./summary";
import { QUASI_STEADY_NOTE } from "./summary";
import { recordFromOutcomes } from "./run";
import { intakeResult, overallWithIntake } from "../intake/result";
import { INTAKE_SOURCE, type IntakeSample } from "../intake/intake";

export const RECORD_METHOD = {
  stage: "record",
  name: "ambient record, quasi-steady steps",
  source: `${QUASI_STEADY_NOTE} Shares of time weight each step by the time until the next step (common practice, no source).`,
};
export const INTAKE_METHOD = { stage: "intake", name: "brine at the plant's intake", source: INTAKE_SOURCE };

/** With an intake, the "not modelled" note on intakes gives way to what is screened. */
function mixingZoneWithIntake<T extends { readonly mixingZone: AmbientCaseResult["mixingZone"] }>(
  scenario: Scenario,
  r: T,
): T["mixingZone"] {
  if (!scenario.intake) return r.mixingZone;
  return {
    ...r.mixingZone,
    notModelled: r.mixingZone.notModelled.map((x) =>
      /intake/i.test(x)
        ? "Brine reaching the plant's intake is screened by a simple steady rule (see intake.method); the plume's path between steps is not modelled."
        : x,
    ),
  };
}

export function withRecord(
  scenario: Scenario,
  top: AmbientCaseResult,
  outcomes: readonly StepOutcome[],
): BrinefieldResult {
  const r = recordFromOutcomes(scenario, outcomes);
  return {
    ...top,
    mixingZone: mixingZoneWithIntake(scenario, top),
    caution: `${top.caution} ${QUASI_STEADY_NOTE}`,
    cases: r.cases,
    overall: r.overall,
    record: r.record,
    ...(r.intake ? { intake: r.intake } : {}),
    warnings: [...top.warnings, ...r.warnings],
    methods: [...top.methods, RECORD_METHOD, ...(r.intake ? [INTAKE_METHOD] : [])],
  };
}

/** Ambient cases (no record): the intake over every case, and the overall verdict with its limit. */
export function withIntakeCases(
  scenario: Scenario,
  result: BrinefieldResult,
  samples: readonly { readonly name: string; readonly sample: IntakeSample | null | undefined }[],
): BrinefieldResult {
  const ir = intakeResult(
    scenario,
    samples.filter((c) => c.sample).map((c) => ({ name: c.name, sample: c.sample!, duration: 1 })),
    null,
  );
  if (!ir) return result;
  return {
    ...result,
    mixingZone: mixingZoneWithIntake(scenario, result),
    overall: overallWithIntake(result.overall, ir.intake),
    intake: ir.intake,
    warnings: [...result.warnings, ...ir.warnings],
    methods: [...result.methods, INTAKE_METHOD],
  };
}

/** The overall verdict of ambient cases with the intake limit folded in (study path). */
export function overallOfCasesWithIntake(
  scenario: Scenario,
  overall: OverallResult,
  samples: readonly { readonly name: string; readonly sample: IntakeSample | null | undefined }[],
): OverallResult {
  const ir = intakeResult(
    scenario,
    samples.filter((c) => c.sample).map((c) => ({ name: c.name, sample: c.sample!, duration: 1 })),
    null,
  );
  return overallWithIntake(overall, ir?.intake);
}

export type { CaseResult };
