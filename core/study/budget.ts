/**
 * Caps on the work one command or study may ask for, so that no input under the 5 MB file cap keeps the
 * machine busy for more than about a minute on two cores. Counts are capped directly (sweep points,
 * Monte Carlo runs) and the total is capped in work units: one unit is about one ambient-case evaluation
 * of a two-port diffuser in a uniform water column (≈ 1–3 ms on our two-vCPU build machine). A profile
 * and more ports make each evaluation dearer; measured there: a 500-point profile with 12 ports ≈ 30×
 * a uniform two-port case, a 50-point profile ≈ 3×, 12 ports in uniform water ≈ 2×. The caps are
 * deterministic (never timed), so the same input is accepted or refused on every machine.
 */
import type { Scenario } from "../scenario/types";

/** Most points in one sweep (e.g. 200 × 200). */
export const MAX_SWEEP_POINTS = 40_000;
/** Most Monte Carlo runs in one uncertainty analysis. */
export const MAX_MONTE_CARLO_RUNS = 1_000_000;
/** Most work units in one command (see the module comment): about a minute on two cores. */
export const MAX_WORK_UNITS = 60_000;

/** Work units of evaluating one ambient case of `scenario`. */
export function caseWorkUnits(scenario: Scenario): number {
  const ports = Math.max(1, scenario.diffuser.portCount);
  const profilePoints = scenario.ambient.uniform ? 0 : scenario.ambient.profile.length;
  return (1 + ports / 12) * (1 + profilePoints / 25);
}

/** Rounded for messages: "880,000". */
function roundedCount(n: number): string {
  const digits = Math.max(0, Math.floor(Math.log10(Math.max(1, n))) - 1);
  const r = Math.round(n / 10 ** digits) * 10 ** digits;
  return r.toLocaleString("en-US");
}

/**
 * Null when `evaluations` ambient-case evaluations of `scenario` fit the work cap; otherwise a message
 * that says what was asked (`what`, e.g. "a sweep of 250000 points × 3 ambient cases"), how much work
 * it is, the cap, and what to change.
 */
export function workIssue(what: string, evaluations: number, scenario: Scenario): string | null {
  const units = evaluations * caseWorkUnits(scenario);
  if (units <= MAX_WORK_UNITS) return null;
  const profile = scenario.ambient.uniform ? "uniform water" : `a ${scenario.ambient.profile.length}-point profile`;
  const ports = `${scenario.diffuser.portCount} port${scenario.diffuser.portCount === 1 ? "" : "s"}`;
  return (
    `${what} is about ${roundedCount(units)} work units for this scenario (${ports}, ${profile}), over the ` +
    `${MAX_WORK_UNITS.toLocaleString("en-US")} one command may take (about a minute on two cores); ` +
    `ask for fewer points or runs, fewer ambient cases or a shorter profile`
  );
}

/** Null when a sweep grid of `points` points fits the point cap. */
export function sweepPointsIssue(points: number): string | null {
  return points > MAX_SWEEP_POINTS
    ? `a sweep of ${points} points is more than the ${MAX_SWEEP_POINTS.toLocaleString("en-US")} points Brinefield runs at once; use fewer steps`
    : null;
}
