/**
 * Whether the screening methods apply to a case, and the three-state verdict that follows.
 *
 * A case is outside the scope of the screening methods (verdict "outside-scope", with the reasons) when
 * - a dense jet reaches the water surface: any available near-field method puts the jet's upper edge
 *   (port height + maximum rise) at or above the surface, or a surface warning is raised — the
 *   methods assume a jet that falls back to the seabed in deep water;
 * - the dense layer spreading from the impact point is as thick as the water is deep;
 * - no near-field method covers the case: every method is not available, or carries a "serious"
 *   warning of its own (a serious warning means the method's result does not apply: a current that
 *   bends the jet over, stratification that traps it, an angle or Froude number outside its data);
 * - the densities are taken outside the equation of state's range (a serious property warning).
 * Otherwise the verdict is "meets" when every limit is met and "exceeds" when one is not.
 * Outside-scope results keep every computed number, so a reader sees why.
 */
import type { ComplianceResult, Verdict } from "../result/contract";
import type { NearFieldMethodResult } from "../nearfield/types";
import type { ResultWarning } from "../warnings";
import { formatNumber } from "../units";

/** Warning codes that mean the jet or the layer reaches the water surface. */
export const SURFACE_WARNING_CODES: ReadonlySet<string> = new Set([
  "jet-reaches-surface",
  "surface-contact",
  "layer-reaches-surface",
]);

export interface ScopeInput {
  readonly depth: number; // m, water depth at the diffuser
  readonly portHeight: number; // m above the seabed
  readonly nearField: readonly NearFieldMethodResult[];
  /** Every warning of the run (near-field methods' own warnings included or not: both are read). */
  readonly warnings: readonly ResultWarning[];
}

/** Why a near-field method does not cover the case, or null when it does. */
export function methodNotCovering(m: NearFieldMethodResult, warnings: readonly ResultWarning[]): string | null {
  if (!m.available) return `not available (${m.notAvailableReason ?? "no reason given"})`;
  const serious = [...m.warnings, ...warnings].find((w) => w.severity === "serious" && w.stage === m.method);
  return serious ? `does not apply: ${serious.message}` : null;
}

/** The reasons the case is outside the screening methods' scope (empty when they apply). */
export function scopeReasons(input: ScopeInput): string[] {
  const reasons: string[] = [];
  const all = [...input.warnings, ...input.nearField.flatMap((m) => m.warnings)];
  // 1. A dense jet reaching the surface.
  for (const m of input.nearField) {
    if (!m.available || m.maxRiseHeight === null || !Number.isFinite(m.maxRiseHeight)) continue;
    const top = input.portHeight + m.maxRiseHeight;
    if (top >= input.depth) {
      reasons.push(
        `The jet reaches the water surface (${m.method}): its upper edge rises to ${formatNumber(top, 3)} m above the seabed (port height ${formatNumber(input.portHeight, 3)} m + rise ${formatNumber(m.maxRiseHeight, 3)} m) in ${formatNumber(input.depth, 3)} m of water.`,
      );
    }
  }
  for (const w of all) if (SURFACE_WARNING_CODES.has(w.code) && w.severity !== "info") reasons.push(w.message);
  // 2. No near-field method covering the case.
  const notCovering = input.nearField.map((m) => ({ m, why: methodNotCovering(m, all) }));
  if (notCovering.length === 0 || notCovering.every((x) => x.why !== null)) {
    const list = notCovering.map((x) => `${x.m.method} ${x.why}`).join("; ");
    reasons.push(`No near-field method covers the case${list ? `: ${list}` : ""}.`);
  }
  // 3. Densities outside the equation of state's range.
  for (const w of all) if (w.severity === "serious" && w.stage === "properties") reasons.push(w.message);
  return [...new Set(reasons)];
}

/** The compliance result with its three-state verdict: outside-scope whenever there are scope reasons. */
export function complianceWithScope(c: ComplianceResult, reasons: readonly string[]): ComplianceResult {
  const verdict: Verdict = reasons.length > 0 ? "outside-scope" : c.pass ? "meets" : "exceeds";
  return { ...c, verdict, scopeReasons: verdict === "outside-scope" ? [...reasons] : [], pass: verdict === "meets" };
}
