/**
 * The few numbers a study keeps from each pipeline run, and the evaluator protocol the study loops
 * call. Studies only need a summary; the full result stays available to whoever runs one scenario.
 */
import type { BrinefieldResult, CaseKind, OverallResult, Verdict } from "../result/contract";
import type { Scenario } from "../scenario/types";
import { expandCases, overallFromCases, runCases } from "../cases";
import type { IntakeSample } from "../intake/intake";
import { recordSteps } from "../record/steps";
import { recordFromOutcomes, runRecordSteps } from "../record/run";
import { overallOfCasesWithIntake } from "../record/result";
import { ScenarioError } from "../scenario/parse";

export interface MethodSummary {
  readonly method: string;
  /** Upper edge of the jet above the port, m. */
  readonly maxRiseHeight: number | null;
  readonly impactDistance: number | null;
  readonly impactDilution: number | null;
}

export interface CaseSummary {
  readonly edgeDilution: number;
  readonly requiredDilution: number;
  /** Edge dilution ÷ required dilution (≥ 1 meets when in scope). */
  readonly margin: number;
  /** True only when `verdict` is "meets". */
  readonly pass: boolean;
  readonly verdict: Verdict;
  /** Why the methods do not apply (non-empty exactly when outside-scope). */
  readonly scopeReasons: readonly string[];
  readonly governingConstituent: string;
  readonly equationOfState: string;
  /** "sinks" (denser than the sea at the port) or "rises" (a rising plume). */
  readonly buoyancy: "sinks" | "rises";
  readonly warningCount: number;
  readonly seriousWarningCount: number;
  readonly exitVelocity: number;
  readonly froude: number;
  /** True when any near-field method puts the jet's upper edge at or above the water surface. */
  readonly reachesSurface: boolean;
  /** Water depth minus (port height + max rise), m: the smallest over methods (negative = surfaces). */
  readonly surfaceClearance: number | null;
  readonly methods: readonly MethodSummary[];
  /** The method chain that reached the mixing-zone edge (near field, then far field), as `run` names it. */
  readonly chain: string;
  /** The intake's figures for this case, when the scenario has an intake (core/intake). */
  readonly intake?: IntakeSample | null;
}

/** Runs one scenario (one ambient, no cases) and returns its summary. */
export type Evaluator = (scenario: Scenario) => CaseSummary;

const SURFACE_CODES = new Set(["jet-reaches-surface", "surface-contact"]);

export function summariseResult(result: Omit<BrinefieldResult, "cases" | "overall">, scenario: Scenario): CaseSummary {
  const methods = result.nearField.map((m) => ({
    method: m.method,
    maxRiseHeight: m.maxRiseHeight,
    impactDistance: m.impactDistance,
    impactDilution: m.impactDilution,
  }));
  let clearance: number | null = null;
  for (const m of methods) {
    if (m.maxRiseHeight === null) continue;
    const c = scenario.ambient.depth - (scenario.diffuser.portHeight + m.maxRiseHeight);
    clearance = clearance === null ? c : Math.min(clearance, c);
  }
  const surfaceWarning =
    result.warnings.some((w) => SURFACE_CODES.has(w.code)) ||
    result.nearField.some((m) => m.warnings.some((w) => SURFACE_CODES.has(w.code)));
  return {
    edgeDilution: result.mixingZone.dilution,
    requiredDilution: result.compliance.requiredDilution,
    margin: result.compliance.margin,
    pass: result.compliance.pass,
    verdict: result.compliance.verdict,
    scopeReasons: result.compliance.scopeReasons,
    governingConstituent: result.compliance.governingConstituent,
    equationOfState: result.densities.equationOfState.name,
    buoyancy: result.densities.reducedGravity > 0 ? "sinks" : "rises",
    warningCount: result.warnings.length,
    seriousWarningCount: result.warnings.filter((w) => w.severity === "serious").length,
    exitVelocity: result.port.velocity,
    froude: result.port.froude,
    reachesSurface: surfaceWarning || (clearance !== null && clearance <= 0),
    surfaceClearance: clearance,
    methods,
    chain: result.mixingZone.method,
  };
}

/** Index of the governing (lowest-margin) summary; ties go to the first. */
export function worstIndex(summaries: readonly CaseSummary[]): number {
  let worst = 0;
  for (let i = 1; i < summaries.length; i++) {
    if (marginKey(summaries[i]!) < marginKey(summaries[worst]!)) worst = i;
  }
  return worst;
}

/** NaN margins (failed runs) sort as worst. */
function marginKey(s: CaseSummary): number {
  return Number.isNaN(s.margin) ? Number.NEGATIVE_INFINITY : s.margin;
}

export interface CaseEvaluation {
  readonly name: string;
  readonly kind: CaseKind;
  readonly summary: CaseSummary;
}

export interface CasesEvaluation {
  readonly cases: readonly CaseEvaluation[];
  readonly overall: OverallResult;
  /** Index into `cases` of the governing case. */
  readonly governing: number;
}

/**
 * Every ambient case of a scenario (stated, listed, slack water: core/cases) through one evaluator, and
 * the overall verdict over them — what `run` reports as `cases` and `overall`. Throws ScenarioError when
 * a case breaks a rule.
 */
export function evaluateCases(scenario: Scenario, evaluate: Evaluator): CasesEvaluation {
  if (scenario.ambient.record) return evaluateRecordCases(scenario, evaluate);
  const specs = expandCases(scenario);
  const summaries = runCases(specs, (c) => evaluate(c.scenario));
  const cases = specs.map((c, i) => ({ name: c.name, kind: c.kind, summary: summaries[i]! }));
  const overCases = overallFromCases(
    cases.map((c) => ({
      name: c.name,
      verdict: c.summary.verdict,
      margin: c.summary.margin,
      edgeDilution: c.summary.edgeDilution,
    })),
  );
  const overall = scenario.intake
    ? overallOfCasesWithIntake(
        scenario,
        overCases,
        cases.map((c) => ({ name: c.name, sample: c.summary.intake })),
      )
    : overCases;
  const g = cases.findIndex((c) => c.name === overall.governingCase);
  return { cases, overall, governing: g >= 0 ? g : cases.findIndex((c) => c.name === overCases.governingCase) };
}

/**
 * A record's steps as the cases (core/record): the overall verdict is the record's (the time-share rule
 * when set), the cases are the computed steps. Throws ScenarioError when every step is refused.
 */
function evaluateRecordCases(scenario: Scenario, evaluate: Evaluator): CasesEvaluation {
  const steps = recordSteps(scenario);
  const summaries = new Map<number, CaseSummary>();
  const outcomes = runRecordSteps(scenario, evaluate, undefined, undefined, (i, s) => summaries.set(i, s));
  const cases: CaseEvaluation[] = [];
  outcomes.forEach((o, i) => {
    const s = summaries.get(i) ?? (steps[i]!.sameAs !== null ? summaries.get(steps[i]!.sameAs!) : undefined);
    if (s && o.verdict !== "refused") cases.push({ name: o.name, kind: "record", summary: s });
  });
  if (cases.length === 0)
    throw new ScenarioError([
      { path: "ambient.record", message: outcomes[0]?.error ?? "every step of the ambient record was refused" },
    ]);
  const { overall } = recordFromOutcomes(scenario, outcomes);
  let g = cases.findIndex((c) => c.name === overall.governingCase);
  if (g < 0) g = worstIndex(cases.map((c) => c.summary));
  return { cases, overall, governing: g };
}
