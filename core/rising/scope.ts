/**
 * Whether the screening methods apply to a rising plume (verdict "outside-scope" otherwise). A rising
 * plume is expected to reach the surface, so unlike a dense jet that is no reason; a case is outside the
 * scope when no near-field method covers it (each is not available, or carries a serious warning of its
 * own) or the densities are outside the equation of state's range.
 */
import type { NearFieldMethodResult } from "../nearfield/types";
import type { ResultWarning } from "../warnings";
import { methodNotCovering } from "../compliance/scope";

export function risingScopeReasons(
  nearField: readonly NearFieldMethodResult[],
  warnings: readonly ResultWarning[],
): string[] {
  const reasons: string[] = [];
  const all = [...warnings, ...nearField.flatMap((m) => m.warnings)];
  const notCovering = nearField.map((m) => ({ m, why: methodNotCovering(m, all) }));
  if (notCovering.length === 0 || notCovering.every((x) => x.why !== null)) {
    reasons.push(
      `No near-field method covers the rising plume${notCovering.length ? `: ${notCovering.map((x) => `${x.m.method} ${x.why}`).join("; ")}` : ""}.`,
    );
  }
  for (const w of all) if (w.severity === "serious" && w.stage === "properties") reasons.push(w.message);
  return [...new Set(reasons)];
}

/** Source warnings of the dense-jet checks that do not apply to a rising plume. */
export const DENSE_SOURCE_CODES: ReadonlySet<string> = new Set([
  "jet-reaches-surface",
  "jet-near-surface",
  "seabed-attachment-shallow-angle",
]);
