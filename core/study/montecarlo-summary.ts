/** Merging and summarising Monte Carlo chunks: per-run samples, statistics per case and the histogram. */
import type { StudyVerdict } from "../result/contract";
import { percentileSummary, type PercentileSummary } from "./percentiles";
import { VERDICT_CODE, VERDICT_OF_CODE, MonteCarloPlan, MonteCarloChunk } from "./montecarlo";

export interface MonteCarloStats {
  readonly name: string;
  readonly edgeDilution: PercentileSummary;
  readonly margin: PercentileSummary;
  /** Required dilution of the same runs (it follows the drawn salinities). */
  readonly requiredDilution: PercentileSummary;
  /**
   * Share of the computed runs without a "meets" verdict (exceeds and outside-scope runs count: neither
   * shows that the limit is met). Refused runs — draws that break a scenario rule — are not outcomes of
   * the discharge and are counted apart, in `verdicts.refused` and `failedRuns`.
   */
  readonly probabilityOfExceedance: number;
  /** Runs per verdict. */
  readonly verdicts: Readonly<Record<StudyVerdict, number>>;
  /** Runs that meet every limit (`verdicts.meets`). */
  readonly meetingRuns: number;
  /** Computed runs that do not meet every limit (exceeds + outside-scope). */
  readonly exceedingRuns: number;
  /** Refused runs (the draw broke a scenario rule); the same as `verdicts.refused`. */
  readonly failedRuns: number;
}

export interface MonteCarloSummary {
  readonly runs: number;
  readonly seed: number;
  readonly usedDefaultSpreads: boolean;
  readonly notes: readonly string[];
  readonly cases: readonly MonteCarloStats[];
  /** Per run, the verdict over every case (as `run`'s `overall`) and the governing case's numbers. */
  readonly worstCase: MonteCarloStats;
  readonly clampedSamples: number;
  /** Clamped samples per input path (only paths with at least one). */
  readonly clampedByInput: Readonly<Record<string, number>>;
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
  readonly requiredDilution: readonly Float64Array[];
  readonly worstRequiredDilution: Float64Array;
  readonly clampedSamples: number;
  readonly clampedByInput: Readonly<Record<string, number>>;
  readonly firstError: string | null;
  readonly equationsOfState: Readonly<Record<string, number>>;
}

/** Merges chunks (in any order) by run index. */
export function mergeMonteCarloChunks(plan: MonteCarloPlan, chunks: readonly MonteCarloChunk[]): MonteCarloSamples {
  const ordered = [...chunks].sort((a, b) => a.start - b.start);
  const total = ordered.reduce((n, c) => n + (c.end - c.start), 0);
  const nc = plan.caseNames.length;
  const edge = Array.from({ length: nc }, () => new Float64Array(total));
  const margin = Array.from({ length: nc }, () => new Float64Array(total));
  const pass = Array.from({ length: nc }, () => new Uint8Array(total));
  const req = Array.from({ length: nc }, () => new Float64Array(total).fill(Number.NaN));
  let at = 0;
  for (const ch of ordered) {
    for (let c = 0; c < nc; c++) {
      edge[c]!.set(ch.edgeDilution[c]!, at);
      margin[c]!.set(ch.margin[c]!, at);
      pass[c]!.set(ch.pass[c]!, at);
      if (ch.requiredDilution) req[c]!.set(ch.requiredDilution[c]!, at);
    }
    at += ch.end - ch.start;
  }
  const we = new Float64Array(total);
  const wm = new Float64Array(total);
  const wp = new Uint8Array(total);
  const wr = new Float64Array(total);
  // Per run, the verdict over every case as `run`'s `overall`: refused if the draw was refused, else
  // exceeds if any case exceeds, else outside-scope if any case is, else meets; the governing case is the
  // lowest-margin case among those with the deciding verdict.
  const priority = [VERDICT_CODE.refused, VERDICT_CODE.exceeds, VERDICT_CODE["outside-scope"], VERDICT_CODE.meets];
  for (let i = 0; i < total; i++) {
    let verdict: number = VERDICT_CODE.meets;
    for (const code of priority) {
      let found = false;
      for (let c = 0; c < nc; c++) if (pass[c]![i] === code) found = true;
      if (found) {
        verdict = code;
        break;
      }
    }
    let w = -1;
    for (let c = 0; c < nc; c++) {
      if (pass[c]![i] !== verdict) continue;
      if (w < 0 || marginKey(margin[c]![i]!) < marginKey(margin[w]![i]!)) w = c;
    }
    we[i] = w >= 0 ? edge[w]![i]! : Number.NaN;
    wm[i] = w >= 0 ? margin[w]![i]! : Number.NaN;
    wr[i] = w >= 0 ? req[w]![i]! : Number.NaN;
    wp[i] = verdict;
  }
  return {
    caseNames: plan.caseNames,
    edgeDilution: edge,
    margin,
    pass,
    worstEdgeDilution: we,
    worstMargin: wm,
    worstPass: wp,
    requiredDilution: req,
    worstRequiredDilution: wr,
    clampedSamples: ordered.reduce((n, c) => n + c.clampedSamples, 0),
    clampedByInput: sumCounts(ordered.map((c) => c.clampedByInput ?? {})),
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

function stats(name: string, e: Float64Array, m: Float64Array, p: Uint8Array, r: Float64Array): MonteCarloStats {
  const counts = [0, 0, 0, 0];
  for (let i = 0; i < p.length; i++) counts[p[i]!] = (counts[p[i]!] ?? 0) + 1;
  const verdicts = Object.fromEntries(VERDICT_OF_CODE.map((v, code) => [v, counts[code] ?? 0])) as Record<
    StudyVerdict,
    number
  >;
  const computed = p.length - verdicts.refused;
  return {
    name,
    edgeDilution: percentileSummary(e),
    margin: percentileSummary(m),
    requiredDilution: percentileSummary(r),
    probabilityOfExceedance: computed > 0 ? (computed - verdicts.meets) / computed : Number.NaN,
    verdicts,
    meetingRuns: verdicts.meets,
    exceedingRuns: computed - verdicts.meets,
    failedRuns: verdicts.refused,
  };
}

/** Percentiles and exceedance probabilities per case and for the worst case. */
export function summariseMonteCarlo(plan: MonteCarloPlan, chunks: readonly MonteCarloChunk[]): MonteCarloSummary {
  const m = mergeMonteCarloChunks(plan, chunks);
  return {
    runs: m.worstPass.length,
    seed: plan.seed,
    usedDefaultSpreads: plan.usedDefaultSpreads,
    notes: [...plan.notes, ...[equationOfStateNote(m.equationsOfState)].filter((x): x is string => x !== null)],
    equationsOfState: m.equationsOfState,
    cases: plan.caseNames.map((name, c) =>
      stats(name, m.edgeDilution[c]!, m.margin[c]!, m.pass[c]!, m.requiredDilution[c]!),
    ),
    worstCase: stats("overall", m.worstEdgeDilution, m.worstMargin, m.worstPass, m.worstRequiredDilution),
    clampedSamples: m.clampedSamples,
    clampedByInput: m.clampedByInput,
    firstError: m.firstError,
  };
}

/** Histogram of a sample for charts: `bins` equal-width bins between the finite min and max. */
export function histogram(values: ArrayLike<number>, bins: number): { x0: number; x1: number; count: number }[] {
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
