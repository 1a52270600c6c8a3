/**
 * Compliance over a record. Each step stands for the time until the next step (see steps.ts); shares of
 * time are sums of those durations. The rules:
 * - `meetsPercent`: share of the record's time whose step meets every limit. Steps that are
 *   "outside-scope" (the methods do not apply) or "refused" (the step's water breaks a scenario rule)
 *   count as NOT meeting, and are counted apart (`outsideScopePercent`, `refusedPercent`).
 * - With `mixingZone.timeCompliance.percentOfTime` = P: "meets" when meetsPercent ≥ P; "exceeds" when the
 *   exceeding steps alone take more than 100 − P % of the time; otherwise "outside-scope" (the steps that
 *   cannot be judged decide). The margin is the step margin (edge dilution ÷ required dilution) reached or
 *   bettered for P % of the time — with a constant required dilution, the edge dilution exceeded for P % of
 *   the time ÷ the required dilution. Refused steps have margin 0.
 * - Without it: the verdict over every step as over ambient cases ("exceeds" if any step exceeds, else
 *   "outside-scope" if any step is outside scope or refused, else "meets"); the margin is the worst step's.
 * - Percentiles are time-weighted without interpolation: pX is the smallest value not exceeded for X % of
 *   the time (the steps with a computed edge dilution).
 * - `longestExceedanceHours`: the longest unbroken run of steps that do not meet, in hours.
 */
import type { OverallResult, StudyVerdict, Verdict } from "../result/contract";
import type { IntakeSample } from "../intake/intake";

export interface StepOutcome {
  readonly time: number;
  readonly duration: number;
  readonly name: string;
  readonly verdict: StudyVerdict;
  /** NaN for a refused step. */
  readonly edgeDilution: number;
  readonly requiredDilution: number;
  readonly margin: number;
  /** Salinity increase over the step's background at the edge, g/kg (NaN when refused). */
  readonly salinityIncrease: number;
  readonly scopeReasons: readonly string[];
  readonly error?: string;
  readonly intake?: IntakeSample | null;
}

export interface RecordResult {
  readonly steps: number;
  readonly meetsPercent: number;
  readonly edgeDilution: { readonly min: number; readonly p5: number; readonly p50: number; readonly p95: number };
  readonly worstStep: { readonly time: number; readonly edgeDilution: number; readonly verdict: StudyVerdict };
  readonly longestExceedanceHours: number;
  /** Shares of the record's time, %, by step verdict. */
  readonly exceedsPercent: number;
  readonly outsideScopePercent: number;
  readonly refusedPercent: number;
  /** Steps by verdict. */
  readonly counts: {
    readonly meets: number;
    readonly exceeds: number;
    readonly outsideScope: number;
    readonly refused: number;
  };
  /** The time-share rule when set. */
  readonly percentOfTime: number | null;
  /** Seconds, from the first step; ISO 8601 date-time of the first step when the record gave date-times. */
  readonly start: string | null;
  readonly durationHours: number;
  /** One entry per step, for charts: time (s), edge dilution, salinity increase at the edge (g/kg), verdict. */
  readonly series: {
    readonly time: readonly number[];
    readonly edgeDilution: readonly (number | null)[];
    readonly salinityIncrease: readonly (number | null)[];
    readonly requiredDilution: readonly (number | null)[];
    readonly verdict: readonly StudyVerdict[];
  };
  /** Why steps were refused (the first few distinct messages). */
  readonly refusals: readonly string[];
  readonly note: string;
}

export const QUASI_STEADY_NOTE =
  "Each step of the record is screened as a quasi-steady state: the screening does not carry brine from one step to the next (no build-up over slack water, no return of brine on the turning tide).";

/** Smallest value not exceeded for share q (0–1) of the total weight; NaN when empty. */
export function weightedQuantile(values: readonly number[], weights: readonly number[], q: number): number {
  const idx = values.map((_, i) => i).filter((i) => Number.isFinite(values[i]!));
  if (idx.length === 0) return Number.NaN;
  idx.sort((a, b) => values[a]! - values[b]!);
  return valueAtWeightShare(values, weights, idx, q);
}

/** Largest value reached or bettered for share q (0–1) of the total weight (NaN values count as −∞). */
export function valueExceededFor(values: readonly number[], weights: readonly number[], q: number): number {
  const idx = values.map((_, i) => i);
  const key = (v: number) => (Number.isNaN(v) ? Number.NEGATIVE_INFINITY : v);
  idx.sort((a, b) => key(values[b]!) - key(values[a]!));
  return valueAtWeightShare(values, weights, idx, q);
}

/** Walking the values in the order `idx`, the first at which share q of the total weight is reached. */
function valueAtWeightShare(
  values: readonly number[],
  weights: readonly number[],
  idx: readonly number[],
  q: number,
): number {
  const total = idx.reduce((s, i) => s + weights[i]!, 0);
  let acc = 0;
  for (const i of idx) {
    acc += weights[i]!;
    if (acc >= q * total * (1 - 1e-12)) return values[i]!;
  }
  return values[idx[idx.length - 1]!]!;
}

const marginKey = (m: number) => (Number.isNaN(m) ? Number.NEGATIVE_INFINITY : m);

export function summariseRecord(
  steps: readonly StepOutcome[],
  percentOfTime: number | null,
  start: string | null = null,
): { record: RecordResult; overall: OverallResult } {
  if (steps.length === 0) throw new Error("summariseRecord: no steps");
  const w = steps.map((s) => s.duration);
  const total = w.reduce((a, b) => a + b, 0);
  const share = (pred: (s: StepOutcome) => boolean) =>
    (100 * steps.reduce((a, s, i) => a + (pred(s) ? w[i]! : 0), 0)) / total;
  const meetsPercent = share((s) => s.verdict === "meets");
  const exceedsPercent = share((s) => s.verdict === "exceeds");
  const outsideScopePercent = share((s) => s.verdict === "outside-scope");
  const refusedPercent = share((s) => s.verdict === "refused");
  const count = (v: StudyVerdict) => steps.filter((s) => s.verdict === v).length;
  const dil = steps.map((s) => (s.verdict === "refused" ? Number.NaN : s.edgeDilution));
  const finite = dil.filter((d) => Number.isFinite(d));
  const edgeDilution = {
    min: finite.length ? Math.min(...finite) : Number.NaN,
    p5: weightedQuantile(dil, w, 0.05),
    p50: weightedQuantile(dil, w, 0.5),
    p95: weightedQuantile(dil, w, 0.95),
  };
  // Worst step: refused steps first (nothing could be computed), then the lowest margin.
  let worst = 0;
  for (let i = 1; i < steps.length; i++) {
    const a = steps[i]!;
    const b = steps[worst]!;
    const ka = a.verdict === "refused" ? Number.NEGATIVE_INFINITY : marginKey(a.margin);
    const kb = b.verdict === "refused" ? Number.NEGATIVE_INFINITY : marginKey(b.margin);
    if (ka < kb) worst = i;
  }
  let longest = 0;
  let run = 0;
  for (let i = 0; i < steps.length; i++) {
    if (steps[i]!.verdict === "meets") run = 0;
    else {
      run += w[i]!;
      longest = Math.max(longest, run);
    }
  }
  let verdict: Verdict;
  let margin: number;
  let governing: StepOutcome;
  let governingDilution: number;
  const margins = steps.map((s) => (s.verdict === "refused" ? 0 : s.margin));
  if (percentOfTime !== null) {
    const p = percentOfTime;
    const tol = 1e-9;
    verdict = meetsPercent + tol >= p ? "meets" : exceedsPercent > 100 - p + tol ? "exceeds" : "outside-scope";
    margin = valueExceededFor(margins, w, p / 100);
    const gi = margins.findIndex((m) => m === margin || (Number.isNaN(m) && Number.isNaN(margin)));
    governing = steps[gi >= 0 ? gi : worst]!;
    governingDilution = valueExceededFor(dil, w, p / 100);
  } else {
    const order: Verdict[] = ["exceeds", "outside-scope", "meets"];
    const asVerdict = (v: StudyVerdict): Verdict => (v === "refused" ? "outside-scope" : v);
    verdict = order.find((v) => steps.some((s) => asVerdict(s.verdict) === v))!;
    const deciding = steps.map((s, i) => i).filter((i) => asVerdict(steps[i]!.verdict) === verdict);
    const gi = deciding.reduce((a, i) => (marginKey(margins[i]!) < marginKey(margins[a]!) ? i : a), deciding[0]!);
    governing = steps[gi]!;
    margin = margins[gi]!;
    governingDilution = governing.edgeDilution;
  }
  const refusals = [...new Set(steps.filter((s) => s.error).map((s) => s.error!))].slice(0, 5);
  const record: RecordResult = {
    steps: steps.length,
    meetsPercent,
    edgeDilution,
    worstStep: { time: steps[worst]!.time, edgeDilution: steps[worst]!.edgeDilution, verdict: steps[worst]!.verdict },
    longestExceedanceHours: longest / 3600,
    exceedsPercent,
    outsideScopePercent,
    refusedPercent,
    counts: {
      meets: count("meets"),
      exceeds: count("exceeds"),
      outsideScope: count("outside-scope"),
      refused: count("refused"),
    },
    percentOfTime,
    start,
    durationHours: total / 3600,
    series: {
      time: steps.map((s) => s.time),
      edgeDilution: steps.map((s) => (Number.isFinite(s.edgeDilution) ? s.edgeDilution : null)),
      salinityIncrease: steps.map((s) => (Number.isFinite(s.salinityIncrease) ? s.salinityIncrease : null)),
      requiredDilution: steps.map((s) => (Number.isFinite(s.requiredDilution) ? s.requiredDilution : null)),
      verdict: steps.map((s) => s.verdict),
    },
    refusals,
    note: QUASI_STEADY_NOTE,
  };
  return { record, overall: { governingCase: governing.name, verdict, margin, edgeDilution: governingDilution } };
}
