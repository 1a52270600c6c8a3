/**
 * Running a record: every step through the one case evaluator (the same one studies use), refused steps
 * recorded rather than thrown, identical steps computed once. The steps can be split into ranges (worker
 * threads run one range each) and the outcomes joined in step order; the summary is the same either way.
 */
import type { CaseResult, OverallResult } from "../result/contract";
import type { Scenario } from "../scenario/types";
import { ScenarioError } from "../scenario/parse";
import type { CaseSummary } from "../study/summary";
import { recordSteps, type RecordStep } from "./steps";
import { summariseRecord, type RecordResult, type StepOutcome } from "./summary";
import { intakeResult, overallWithIntake, type IntakeResult } from "../intake/result";
import type { ResultWarning } from "../warnings";

/** Salinity increase at the edge for an edge dilution: (discharge − background)/dilution, g/kg. */
export function edgeSalinityIncrease(s: Scenario, edgeDilution: number): number {
  const limit = s.mixingZone.limits.find((l) => l.constituent === "salinity");
  const background = limit?.background ?? s.ambient.profile[s.ambient.profile.length - 1]!.salinity;
  return (s.discharge.salinity - background) / edgeDilution;
}

function refusedOutcome(step: RecordStep, message: string): StepOutcome {
  return {
    time: step.time,
    duration: step.duration,
    name: step.spec.name,
    verdict: "refused",
    edgeDilution: Number.NaN,
    requiredDilution: Number.NaN,
    margin: Number.NaN,
    salinityIncrease: Number.NaN,
    scopeReasons: [],
    error: message,
    intake: null,
  };
}

export function outcomeFromSummary(step: RecordStep, summary: CaseSummary): StepOutcome {
  return {
    time: step.time,
    duration: step.duration,
    name: step.spec.name,
    verdict: summary.verdict,
    edgeDilution: summary.edgeDilution,
    requiredDilution: summary.requiredDilution,
    margin: summary.margin,
    salinityIncrease: edgeSalinityIncrease(step.spec.scenario, summary.edgeDilution),
    scopeReasons: summary.scopeReasons,
    intake: summary.intake ?? null,
  };
}

/**
 * Outcomes of the scenario's record steps, each through `evaluate` (one ambient, no cases): every step,
 * or only the steps listed in `indices` (a worker thread's share). A step with the same water as an
 * earlier step reuses its result when that step was computed here. `onStep(done)` is called after each.
 */
export function runRecordSteps(
  scenario: Scenario,
  evaluate: (s: Scenario) => CaseSummary,
  indices?: readonly number[],
  onStep?: (done: number) => void,
  onSummary?: (index: number, summary: CaseSummary) => void,
): StepOutcome[] {
  const steps = recordSteps(scenario, indices);
  const out: StepOutcome[] = [];
  const summaries = new Map<number, CaseSummary>();
  for (const step of steps) {
    const i = step.index;
    if (step.refused) out.push(refusedOutcome(step, step.refused));
    else {
      const reuse = step.sameAs !== null ? summaries.get(step.sameAs) : undefined;
      try {
        const summary = reuse ?? evaluate(step.spec.scenario);
        summaries.set(i, summary);
        onSummary?.(i, summary);
        out.push(outcomeFromSummary(step, summary));
      } catch (err) {
        if (!(err instanceof ScenarioError)) throw err;
        out.push(refusedOutcome(step, `${err.message} (record step ${step.spec.name})`));
      }
    }
    onStep?.(out.length);
  }
  return out;
}

/** The steps whose water is new (no earlier identical step) and that are not refused: those to compute. */
export function distinctStepIndices(scenario: Scenario): number[] {
  return recordSteps(scenario)
    .filter((s) => s.sameAs === null && !s.refused)
    .map((s) => s.index);
}

/**
 * Every step's outcome from the outcomes of the distinct steps (`computed`, by step index): repeated
 * water takes the earlier step's numbers with its own time; refused steps are refused.
 */
export function outcomesFromDistinct(scenario: Scenario, computed: ReadonlyMap<number, StepOutcome>): StepOutcome[] {
  return recordSteps(scenario).map((step) => {
    if (step.refused) return refusedOutcome(step, step.refused);
    const o = computed.get(step.sameAs ?? step.index);
    if (!o) throw new Error(`record step ${step.index} was not computed`);
    return { ...o, time: step.time, duration: step.duration, name: step.spec.name };
  });
}

export interface RecordEvaluation {
  readonly record: RecordResult;
  readonly overall: OverallResult;
  /** One case per step (a refused step is listed as outside-scope with the refusal as its reason). */
  readonly cases: CaseResult[];
  readonly intake: IntakeResult | null;
  readonly warnings: ResultWarning[];
}

/** The record, its overall verdict (with the intake limit folded in), cases and intake from step outcomes. */
export function recordFromOutcomes(scenario: Scenario, outcomes: readonly StepOutcome[]): RecordEvaluation {
  const rule = scenario.mixingZone.timeCompliance?.percentOfTime ?? null;
  const { record, overall } = summariseRecord(outcomes, rule, scenario.ambient.record?.start ?? null);
  const cases: CaseResult[] = outcomes.map((o) => ({
    name: o.name,
    kind: "record",
    edgeDilution: o.edgeDilution,
    verdict: o.verdict === "refused" ? "outside-scope" : o.verdict,
    margin: o.margin,
    scopeReasons:
      o.verdict === "refused" ? [`refused: ${o.error ?? "the step breaks a scenario rule"}`] : o.scopeReasons,
  }));
  const withIntake = outcomes.filter((o) => o.intake);
  const ir = intakeResult(
    scenario,
    withIntake.map((o) => ({ name: o.name, sample: o.intake!, duration: o.duration, time: o.time })),
    { percentOfTime: rule },
  );
  const warnings: ResultWarning[] = [...(ir?.warnings ?? [])];
  if (scenario.ambientCases.length > 0)
    warnings.push({
      code: "record-replaces-cases",
      severity: "info",
      message: `The ambient record's ${record.steps} steps are the cases; the ${scenario.ambientCases.length} listed ambient case(s) and the automatic slack-water case are not run.`,
      parameter: "ambient.record",
      stage: "record",
    });
  if (record.refusedPercent > 0 || record.outsideScopePercent > 0)
    warnings.push({
      code: "record-steps-not-judged",
      severity: "warning",
      message: `${record.counts.refused} step(s) refused (${record.refusedPercent.toFixed(1)} % of the time) and ${record.counts.outsideScope} step(s) outside the methods' scope (${record.outsideScopePercent.toFixed(1)} % of the time); they count as not meeting the limit.`,
      parameter: "ambient.record",
      stage: "record",
    });
  return { record, overall: overallWithIntake(overall, ir?.intake), cases, intake: ir?.intake ?? null, warnings };
}
