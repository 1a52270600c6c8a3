/**
 * Seeded Monte Carlo over uncertain inputs: a loop around the same pipeline (through an `Evaluator`).
 *
 * Reproducibility: run i draws all of its inputs from its own stream `streamFor(seed, i)`, so a run's
 * inputs do not depend on how runs are split into chunks or workers; chunks are merged by run index.
 *
 * Ambient cases: a distribution on an `ambient.*` path describes the stated ambient. Each draw applies to
 * the stated conditions and to every ambient case that does not set that field itself (a case that sets
 * it keeps its own value; the slack-water case keeps zero current) — the same rule as studies and
 * sweeps. Samples outside the physical bounds of a path (e.g. negative current) are clamped and counted;
 * azimuths wrap around. A draw whose scenario breaks a scenario rule (a depth below the port, …) is
 * "refused" with the rule's message — never a pass. Each run is judged like `run`'s `overall`: the
 * verdict over every case, governed by the deciding case.
 */
import { MAX_MONTE_CARLO_RUNS } from "./budget";
import type { Scenario } from "../scenario/types";
import { expandCases } from "../cases";
import type { StudyVerdict } from "../result/contract";
import {
  DEFAULT_SPREADS_NOTE,
  defaultUncertainInputs,
  describeDistribution,
  resolveDistribution,
  sampleDistribution,
  type DistributionIssue,
  type ResolvedDistribution,
} from "./distributions";
import { overridePathInfo, withOverrides } from "./overrides";
import { streamFor } from "./random";
import { evaluateCases, type CasesEvaluation, type Evaluator } from "./summary";

export { summariseMonteCarlo } from "./montecarlo-summary";
export type { MonteCarloStats, MonteCarloSummary } from "./montecarlo-summary";

/** Verdict codes in the typed arrays of a chunk. */
export const VERDICT_CODE: Readonly<Record<StudyVerdict, number>> = {
  exceeds: 0,
  meets: 1,
  refused: 2,
  "outside-scope": 3,
};
export const VERDICT_OF_CODE: readonly StudyVerdict[] = ["exceeds", "meets", "refused", "outside-scope"];

export interface MonteCarloPlan {
  readonly seed: number;
  readonly runs: number;
  readonly distributions: readonly ResolvedDistribution[];
  readonly usedDefaultSpreads: boolean;
  readonly caseNames: readonly string[];
  readonly notes: readonly string[];
}

export type PlanResult = { ok: true; plan: MonteCarloPlan } | { ok: false; issues: DistributionIssue[] };

export const MAX_RUNS = MAX_MONTE_CARLO_RUNS;

export function planMonteCarlo(scenario: Scenario, runs: number, seed: number): PlanResult {
  const issues: DistributionIssue[] = [];
  if (!Number.isInteger(runs) || runs < 1 || runs > MAX_RUNS) {
    issues.push({ path: "runs", message: `must be a whole number from 1 to ${MAX_RUNS}` });
  }
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    issues.push({ path: "seed", message: "must be a whole number from 0 to 4294967295" });
  }
  const stated = scenario.uncertainty?.inputs ?? [];
  const usedDefaultSpreads = stated.length === 0;
  const inputs = usedDefaultSpreads ? defaultUncertainInputs(scenario) : stated;
  const distributions: ResolvedDistribution[] = [];
  inputs.forEach((input, i) => {
    const variable = input.path.startsWith("ambient.") || input.path.startsWith("discharge.");
    if (!overridePathInfo(input.path) || !variable) {
      issues.push({
        path: `uncertainty.inputs.${i}.path`,
        message: `"${input.path}" cannot be varied in a Monte Carlo study`,
      });
      return;
    }
    const r = resolveDistribution(input, scenario);
    if (r.ok) distributions.push(r.value);
    else issues.push({ path: `uncertainty.inputs.${i}`, message: r.issue.message });
  });
  if (issues.length > 0) return { ok: false, issues };
  const cases = expandCases(scenario);
  const notes = [...(usedDefaultSpreads ? [DEFAULT_SPREADS_NOTE] : []), ...distributions.map(describeDistribution)];
  return {
    ok: true,
    plan: { seed, runs, distributions, usedDefaultSpreads, caseNames: cases.map((c) => c.name), notes },
  };
}

/** Results of runs [start, end), per case, in run order. Typed arrays: cheap to post between threads. */
export interface MonteCarloChunk {
  readonly start: number;
  readonly end: number;
  /** edgeDilution[caseIndex][run − start]; NaN for a run the pipeline rejected. */
  readonly edgeDilution: Float64Array[];
  readonly margin: Float64Array[];
  /** Required dilution per case and run (it follows the drawn salinities); NaN for a refused run. */
  readonly requiredDilution?: Float64Array[];
  /** Verdict codes (VERDICT_CODE): 1 meets, 0 exceeds, 3 outside-scope, 2 refused (never a pass). */
  readonly pass: Uint8Array[];
  readonly clampedSamples: number;
  /** Clamped samples per input path (only paths with at least one). */
  readonly clampedByInput: Readonly<Record<string, number>>;
  readonly firstError: string | null;
  /** Evaluations per equation of state (a run can cross from TEOS-10 to the brine correlation). */
  readonly equationsOfState: Readonly<Record<string, number>>;
}

/** The values a run draws, in distribution order. */
export function samplesForRun(plan: MonteCarloPlan, run: number): number[] {
  const rng = streamFor(plan.seed, run);
  return plan.distributions.map((d) => sampleDistribution(d, rng));
}

export function runMonteCarloChunk(
  scenario: Scenario,
  plan: MonteCarloPlan,
  start: number,
  end: number,
  evaluate: Evaluator,
  onProgress?: (runsDone: number) => void,
  shouldStop?: () => boolean,
): MonteCarloChunk {
  const nc = plan.caseNames.length;
  const n = Math.max(0, end - start);
  const edge = Array.from({ length: nc }, () => new Float64Array(n));
  const margin = Array.from({ length: nc }, () => new Float64Array(n));
  const required = Array.from({ length: nc }, () => new Float64Array(n));
  const pass = Array.from({ length: nc }, () => new Uint8Array(n));
  let clamped = 0;
  const clampedBy: Record<string, number> = {};
  let firstError: string | null = null;
  const eos: Record<string, number> = {};
  for (let k = 0; k < n; k++) {
    if (shouldStop?.()) {
      const cut = <T extends Float64Array | Uint8Array>(a: T): T => a.slice(0, k) as T;
      return {
        start,
        end: start + k,
        edgeDilution: edge.map(cut),
        margin: margin.map(cut),
        requiredDilution: required.map(cut),
        pass: pass.map(cut),
        clampedSamples: clamped,
        clampedByInput: clampedBy,
        firstError,
        equationsOfState: eos,
      };
    }
    const samples = samplesForRun(plan, start + k);
    const overrides: Record<string, number> = {};
    plan.distributions.forEach((d, i) => {
      let v = samples[i]!;
      const info = overridePathInfo(d.path)!;
      if (info.kind === "angle" && info.max === 360) {
        overrides[d.path] = ((v % 360) + 360) % 360; // azimuths wrap around instead of clamping
        return;
      }
      const low = info.exclusiveMin ? info.min + Number.EPSILON : info.min;
      if (v < low || v > info.max) {
        clamped++;
        clampedBy[d.path] = (clampedBy[d.path] ?? 0) + 1;
        v = Math.min(info.max, Math.max(low, v));
      }
      overrides[d.path] = v;
    });
    let e: CasesEvaluation | null = null;
    try {
      e = evaluateCases(withOverrides(scenario, overrides), evaluate);
    } catch (err) {
      const why = err instanceof Error ? err.message : String(err);
      firstError ??= `run ${start + k}: ${why}`;
    }
    // A record's refused steps are left out of e.cases: then match the cases by name, not by position.
    const aligned = e !== null && e.cases.length === nc;
    const byName = e !== null && !aligned ? new Map(e.cases.map((x) => [x.name, x.summary])) : null;
    for (let c = 0; c < nc; c++) {
      const s = aligned ? e!.cases[c]!.summary : byName?.get(plan.caseNames[c]!);
      if (s) eos[s.equationOfState] = (eos[s.equationOfState] ?? 0) + 1;
      edge[c]![k] = s ? s.edgeDilution : Number.NaN;
      margin[c]![k] = s ? s.margin : Number.NaN;
      required[c]![k] = s ? s.requiredDilution : Number.NaN;
      pass[c]![k] = s ? VERDICT_CODE[s.verdict] : VERDICT_CODE.refused;
    }
    onProgress?.(k + 1);
  }
  return {
    start,
    end,
    edgeDilution: edge,
    margin,
    requiredDilution: required,
    pass,
    clampedSamples: clamped,
    clampedByInput: clampedBy,
    firstError,
    equationsOfState: eos,
  };
}

/**
 * Splits runs [0, runs) into contiguous chunks, a deterministic function of (runs, parts) only.
 * Any split gives the same merged result; the split only decides which worker does what.
 */
export function splitRuns(runs: number, parts: number): { start: number; end: number }[] {
  const p = Math.max(1, Math.min(parts, runs));
  const out: { start: number; end: number }[] = [];
  for (let i = 0; i < p; i++) {
    out.push({ start: Math.floor((runs * i) / p), end: Math.floor((runs * (i + 1)) / p) });
  }
  return out.filter((c) => c.end > c.start);
}
