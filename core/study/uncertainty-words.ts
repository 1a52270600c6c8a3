/**
 * The words that explain a Monte Carlo result, shared by the app, the command line and the report so
 * that all three say the same thing: what the percentiles and the per-run worst case mean, what an
 * outside-scope or refused run is, how the chance of not meeting the limit is counted, which input was
 * clamped and how often. Probabilities are shown as percentages; JSON keeps fractions.
 */
import { formatNumber, siToDisplay } from "../units";
import { overridePathInfo } from "./overrides";
import type { MonteCarloStats, MonteCarloSummary } from "./montecarlo";

export const PERCENTILE_MEANING =
  "P5, P50 and P95 are percentiles over the runs: 5 % of the runs give a dilution at the mixing-zone edge " +
  "below P5, half give less than P50 (the median) and 95 % give less than P95. P5 is the value to watch: " +
  "one run in twenty dilutes less than that.";

export const WORST_CASE_MEANING =
  "Each run is judged over every ambient case, as a single run's overall verdict is. The run's worst case " +
  "is the case that decides its verdict (the lowest margin among the cases with that verdict); the " +
  "\u201coverall\u201d row (and the histogram, where one is drawn) gathers those per-run worst cases.";

export const OUTSIDE_SCOPE_MEANING =
  "A run outside scope (outside-scope) is one whose drawn conditions lie outside what the screening " +
  "methods were built and checked for; it gives no dilution to rely on, so it counts as not meeting the limit.";

export const REFUSED_MEANING =
  "A refused run is a draw that broke a scenario rule (for example a water depth below the port height): " +
  "it describes no real discharge, gives no result and is counted apart \u2014 neither as meeting nor as " +
  "not meeting the limit.";

export const PROBABILITY_MEANING =
  "The chance of not meeting the limit is the share of the computed runs (refused runs left out) whose " +
  "verdict is not \u201cmeets\u201d: runs that exceed a limit and runs outside scope both count.";

export const MARGIN_MEANING =
  "Margin is the dilution at the edge divided by the required dilution: 1 or more meets the limit.";

/** A probability (fraction 0–1) as a percentage for people: "12.3 %", "0 %", "< 0.1 %", "100 %". */
export function percentText(p: number): string {
  if (!Number.isFinite(p)) return "not available (no computed runs)";
  const pct = 100 * p;
  if (pct === 0 || pct === 100) return `${pct} %`;
  if (pct < 0.1) return "< 0.1 %";
  if (pct > 99.9) return "> 99.9 %";
  return `${formatNumber(pct, 3)} %`;
}

/** "current speed" for "ambient.currentSpeed" (the field's words), else the path. */
export function inputWords(path: string): string {
  return overridePathInfo(path)?.label ?? path;
}

/**
 * One sentence per clamped input: "current speed (ambient.currentSpeed): 778 of 2000 draws (38.9 %) fell
 * outside 0–5 m/s and were set to the nearest bound." Empty when nothing was clamped.
 */
export function clampedSentences(
  summary: Pick<MonteCarloSummary, "runs" | "clampedByInput" | "clampedSamples">,
): string[] {
  const by = summary.clampedByInput ?? {};
  const out = Object.entries(by)
    .filter(([, n]) => n > 0)
    .map(([path, n]) => {
      const info = overridePathInfo(path);
      const unit = info ? siToDisplay(1, info.kind, "si").unit : "";
      const range = info
        ? `${formatNumber(info.min)}\u2013${formatNumber(info.max)}${unit ? ` ${unit}` : ""}`
        : "its bounds";
      return `${inputWords(path)} (${path}): ${n} of ${summary.runs} draws (${percentText(n / Math.max(1, summary.runs))}) fell outside ${range} and were set to the nearest bound.`;
    });
  if (out.length === 0 && summary.clampedSamples > 0) {
    out.push(`${summary.clampedSamples} draws fell outside their physical bounds and were set to the nearest bound.`);
  }
  return out;
}

/** The run counts in words: "812 of 1000 runs meet every limit, 150 exceed a limit, …". */
export function verdictCountsSentence(stats: MonteCarloStats, runs: number): string {
  const v = stats.verdicts;
  return (
    `${v.meets} of ${runs} runs meet every limit, ${v.exceeds} exceed a limit, ${v["outside-scope"]} are outside ` +
    `the screening methods' scope and ${v.refused} were refused (the draw broke a scenario rule).`
  );
}

/** The headline sentence for a case or the per-run worst case, with units and the chance as a percentage. */
export function headlineSentence(stats: MonteCarloStats, requiredDilution: number | null): string {
  const d = stats.edgeDilution;
  const req =
    requiredDilution !== null && Number.isFinite(requiredDilution)
      ? ` (required: ${formatNumber(requiredDilution)}\u00d7 at the stated inputs)`
      : "";
  return (
    `Dilution at the mixing-zone edge, per-run worst case: P5 ${formatNumber(d.p5)}\u00d7, P50 ${formatNumber(d.p50)}\u00d7, ` +
    `P95 ${formatNumber(d.p95)}\u00d7${req}; chance of not meeting the limit ${percentText(stats.probabilityOfExceedance)}.`
  );
}

/** Every explanation sentence, in reading order (app, report). */
export const UNCERTAINTY_EXPLANATIONS: readonly string[] = [
  PERCENTILE_MEANING,
  WORST_CASE_MEANING,
  PROBABILITY_MEANING,
  OUTSIDE_SCOPE_MEANING,
  REFUSED_MEANING,
];
