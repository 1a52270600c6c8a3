/**
 * Seeded Monte Carlo over uncertain inputs: a loop around the same pipeline (through an `Evaluator`).
 *
 * Reproducibility: run i draws all of its inputs from its own stream `streamFor(seed, i)`, so a run's
 * inputs do not depend on how runs are split into chunks or workers; chunks are merged by run index.
 *
 * Ambient cases: a distribution on an `ambient.*` path describes the base ambient. In each ambient case
 * the sample is applied as a deviation from the base value (added; multiplied for lognormal), so cases
 * keep their differences; the slack-water case keeps zero current. Samples outside the physical bounds
 * of a path (e.g. negative current) are clamped and counted; azimuths wrap around. Each run uses the
 * same samples in every case (common random numbers), so the worst case of a run is the lowest-margin
 * case under one draw.
 */
import type { Scenario } from "../scenario/types";
import { expandCases } from "./cases";
import {
  DEFAULT_SPREADS_NOTE,
  defaultUncertainInputs,
  describeDistribution,
  resolveDistribution,
  sampleDistribution,
  type DistributionIssue,
  type ResolvedDistribution,
} from "./distributions";
import { OVERRIDE_PATHS, readPath, withOverrides } from "./overrides";
import { percentileSummary, type PercentileSummary } from "./percentiles";
import { streamFor } from "./random";
import type { CaseSummary, Evaluator } from "./summary";

export interface MonteCarloPlan {
  readonly seed: number;
  readonly runs: number;
  readonly distributions: readonly ResolvedDistribution[];
  readonly usedDefaultSpreads: boolean;
  readonly caseNames: readonly string[];
  readonly notes: readonly string[];
}

export type PlanResult = { ok: true; plan: MonteCarloPlan } | { ok: false; issues: DistributionIssue[] };

export const MAX_RUNS = 10_000_000;

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
    if (!OVERRIDE_PATHS[input.path] || !variable) {
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
  const notes = [
    ...(usedDefaultSpreads ? [DEFAULT_SPREADS_NOTE] : []),
    ...distributions.map(describeDistribution),
  ];
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
  /** 1 pass, 0 fail, 2 run failed (counted as not meeting the limit). */
  readonly pass: Uint8Array[];
  readonly clampedSamples: number;
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
  const cases = expandCases(scenario);
  const n = Math.max(0, end - start);
  const edge = cases.map(() => new Float64Array(n));
  const margin = cases.map(() => new Float64Array(n));
  const pass = cases.map(() => new Uint8Array(n));
  // Base values the ambient deviations are measured from, and each case's own values.
  const baseValues = plan.distributions.map((d) => readPath(scenario, d.path));
  const caseValues = cases.map((c) => plan.distributions.map((d) => readPath(c.scenario, d.path)));
  let clamped = 0;
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
        pass: pass.map(cut),
        clampedSamples: clamped,
        firstError,
        equationsOfState: eos,
      };
    }
    const samples = samplesForRun(plan, start + k);
    for (let c = 0; c < cases.length; c++) {
      const overrides: Record<string, number> = {};
      plan.distributions.forEach((d, i) => {
        let v = samples[i]!;
        if (d.path.startsWith("ambient.")) {
          if (d.path === "ambient.currentSpeed" && cases[c]!.addedSlackWater) return;
          const own = caseValues[c]![i]!;
          const ref = baseValues[i]!;
          v = d.distribution === "lognormal" && ref > 0 ? own * (v / ref) : own + (v - ref);
        }
        const info = OVERRIDE_PATHS[d.path]!;
        if (info.kind === "angle" && info.max === 360) {
          overrides[d.path] = ((v % 360) + 360) % 360; // azimuths wrap around instead of clamping
          return;
        }
        const low = info.exclusiveMin ? info.min + Number.EPSILON : info.min;
        if (v < low || v > info.max) {
          clamped++;
          v = Math.min(info.max, Math.max(low, v));
        }
        overrides[d.path] = v;
      });
      let s: CaseSummary | null = null;
      try {
        s = evaluate(withOverrides(cases[c]!.scenario, overrides));
      } catch (err) {
        const why = err instanceof Error ? err.message : String(err);
        firstError ??= `run ${start + k}, case ${cases[c]!.name}: ${why}`;
      }
      if (s) eos[s.equationOfState] = (eos[s.equationOfState] ?? 0) + 1;
      edge[c]![k] = s ? s.edgeDilution : Number.NaN;
      margin[c]![k] = s ? s.margin : Number.NaN;
      pass[c]![k] = s ? (s.pass ? 1 : 0) : 2;
    }
    onProgress?.(k + 1);
  }
  return { start, end, edgeDilution: edge, margin, pass, clampedSamples: clamped, firstError, equationsOfState: eos };
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

export interface MonteCarloStats {
  readonly name: string;
  readonly edgeDilution: PercentileSummary;
  readonly margin: PercentileSummary;
  /** Fraction of runs that do not meet every limit at the mixing-zone edge (failed runs count). */
  readonly probabilityOfExceedance: number;
  readonly failedRuns: number;
}

export interface MonteCarloSummary {
  readonly runs: number;
  readonly seed: number;
  readonly usedDefaultSpreads: boolean;
  readonly notes: readonly string[];
  readonly cases: readonly MonteCarloStats[];
  /** Per run, the lowest-margin case: its edge dilution and whether any case failed. */
  readonly worstCase: MonteCarloStats;
  readonly clampedSamples: number;
  readonly firstError: string | null;
  /** Evaluations per equation of state over all runs and cases. */
  readonly equationsOfState: Readonly<Record<string, number>>;
}

/** Every run's results in run order, per case and for the per-run worst case. */
export interface MonteCarloSamples {
  readonly caseNames: readonly string[];
  readonly edgeDilution: readonly Float64Array[];
  readonly margin: readonly Float64Array[];
  readonly pass: readonly Uint8Array[];
  readonly worstEdgeDilution: Float64Array;
  readonly worstMargin: Float64Array;
  readonly worstPass: Uint8Array;
  readonly clampedSamples: number;
  readonly firstError: string | null;
  readonly equationsOfState: Readonly<Record<string, number>>;
}

/** Merges chunks (in any order) by run index. */
export function mergeMonteCarloChunks(
  plan: MonteCarloPlan,
  chunks: readonly MonteCarloChunk[],
): MonteCarloSamples {
  const ordered = [...chunks].sort((a, b) => a.start - b.start);
  const total = ordered.reduce((n, c) => n + (c.end - c.start), 0);
  const nc = plan.caseNames.length;
  const edge = Array.from({ length: nc }, () => new Float64Array(total));
  const margin = Array.from({ length: nc }, () => new Float64Array(total));
  const pass = Array.from({ length: nc }, () => new Uint8Array(total));
  let at = 0;
  for (const ch of ordered) {
    for (let c = 0; c < nc; c++) {
      edge[c]!.set(ch.edgeDilution[c]!, at);
      margin[c]!.set(ch.margin[c]!, at);
      pass[c]!.set(ch.pass[c]!, at);
    }
    at += ch.end - ch.start;
  }
  const we = new Float64Array(total);
  const wm = new Float64Array(total);
  const wp = new Uint8Array(total);
  for (let i = 0; i < total; i++) {
    let w = 0;
    for (let c = 1; c < nc; c++) if (marginKey(margin[c]![i]!) < marginKey(margin[w]![i]!)) w = c;
    we[i] = edge[w]![i]!;
    wm[i] = margin[w]![i]!;
    // 1 only when every case passes; 2 when any case's run failed; otherwise 0.
    let p = 1;
    for (let c = 0; c < nc; c++) {
      const q = pass[c]![i]!;
      if (q === 2) p = 2;
      else if (q === 0 && p === 1) p = 0;
    }
    wp[i] = p;
  }
  return {
    caseNames: plan.caseNames,
    edgeDilution: edge,
    margin,
    pass,
    worstEdgeDilution: we,
    worstMargin: wm,
    worstPass: wp,
    clampedSamples: ordered.reduce((n, c) => n + c.clampedSamples, 0),
    firstError: ordered.find((c) => c.firstError !== null)?.firstError ?? null,
    equationsOfState: sumCounts(ordered.map((c) => c.equationsOfState)),
  };
}

function sumCounts(list: readonly Readonly<Record<string, number>>[]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const r of list) for (const [k, v] of Object.entries(r)) out[k] = (out[k] ?? 0) + v;
  return out;
}

/** A note when the runs do not all use one equation of state (salinity crossing 42 g/kg). */
export function equationOfStateNote(counts: Readonly<Record<string, number>>): string | null {
  const names = Object.keys(counts);
  if (names.length < 2) return null;
  const total = names.reduce((n, k) => n + counts[k]!, 0);
  const parts = names.map((k) => `${counts[k]} of ${total} evaluations used ${k}`);
  return `The equation of state changes between runs (a salinity crosses TEOS-10's 42 g/kg range): ${parts.join("; ")}.`;
}

function marginKey(m: number): number {
  return Number.isNaN(m) ? Number.NEGATIVE_INFINITY : m;
}

function stats(name: string, e: Float64Array, m: Float64Array, p: Uint8Array): MonteCarloStats {
  let notMet = 0;
  let failed = 0;
  for (let i = 0; i < p.length; i++) {
    if (p[i] !== 1) notMet++;
    if (p[i] === 2) failed++;
  }
  return {
    name,
    edgeDilution: percentileSummary(e),
    margin: percentileSummary(m),
    probabilityOfExceedance: p.length > 0 ? notMet / p.length : Number.NaN,
    failedRuns: failed,
  };
}

/** Percentiles and exceedance probabilities per case and for the worst case. */
export function summariseMonteCarlo(
  plan: MonteCarloPlan,
  chunks: readonly MonteCarloChunk[],
): MonteCarloSummary {
  const m = mergeMonteCarloChunks(plan, chunks);
  return {
    runs: m.worstPass.length,
    seed: plan.seed,
    usedDefaultSpreads: plan.usedDefaultSpreads,
    notes: [...plan.notes, ...[equationOfStateNote(m.equationsOfState)].filter((x): x is string => x !== null)],
    equationsOfState: m.equationsOfState,
    cases: plan.caseNames.map((name, c) => stats(name, m.edgeDilution[c]!, m.margin[c]!, m.pass[c]!)),
    worstCase: stats("worst case", m.worstEdgeDilution, m.worstMargin, m.worstPass),
    clampedSamples: m.clampedSamples,
    firstError: m.firstError,
  };
}

/** Histogram of a sample for charts: `bins` equal-width bins between the finite min and max. */
export function histogram(
  values: ArrayLike<number>,
  bins: number,
): { x0: number; x1: number; count: number }[] {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (Number.isFinite(v)) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  }
  if (!Number.isFinite(lo)) return [];
  const width = hi > lo ? (hi - lo) / bins : 1;
  const out = Array.from({ length: bins }, (_, i) => ({
    x0: lo + i * width,
    x1: lo + (i + 1) * width,
    count: 0,
  }));
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (!Number.isFinite(v)) continue;
    const b = Math.min(bins - 1, Math.floor((v - lo) / width));
    out[b]!.count++;
  }
  return out;
}
