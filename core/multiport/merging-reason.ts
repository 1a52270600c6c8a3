/**
 * The words of the merging decision (the result's `multiport.reason`): jet widths against neighbour
 * spacings per near-field method, the check against other jet-width definitions, and s/(dF) for comparison.
 */
import type { MergingSensitivity, MethodMerging } from "./merging";

/** Why the regime was chosen: widths against spacings per method, the width-definition check, s/(dF). */
export function mergingReason(input: {
  readonly known: readonly MethodMerging[];
  readonly sensitivity: readonly MergingSensitivity[];
  /** Port diameter × densimetric Froude number, m. */
  readonly dF: number;
  /** Spacing of ports (or risers of a rosette), m. */
  readonly spacing: number;
}): string {
  const { known, sensitivity, dF, spacing } = input;
  const parts = known.map(
    (m) =>
      `${m.method}: jet width ${m.widths!.widthAtMaxRise.toFixed(2)} m at max rise vs spacing ` +
      `${fmt(m.spacingAtMaxRise)} m, ${m.widths!.widthAtImpact.toFixed(2)} m at impact vs ${fmt(m.spacingAtImpact)} m ` +
      `→ ${m.regime}, factor ${m.factor.toFixed(3)}`,
  );
  const changes = sensitivity.filter(
    (x) => x.widthFactor !== 1 && x.regime !== known.find((m) => m.method === x.method)?.regime,
  );
  const sensitivityText = known.length
    ? changes.length
      ? ` Sensitivity to the jet-width definition: ${changes
          .map(
            (x) => `${x.method} with widths ×${x.widthFactor.toFixed(2)} → ${x.regime} (factor ${x.factor.toFixed(3)})`,
          )
          .join("; ")}.`
      : " The decision is the same with jet widths ÷√2 or ×√2 (other common width definitions)."
    : "";
  return (
    (parts.length ? parts.join("; ") + "." : "Merging not assessed.") +
    sensitivityText +
    ` s/(dF) = ${dF > 0 && Number.isFinite(dF) ? (spacing / dF).toFixed(2) : "n/a"} reported for comparison only: ` +
    "no published dense-jet threshold in s/(dF) (Abessi & Roberts 2014) could be cited, so the geometric " +
    "criterion was used."
  );
}

function fmt(v: number): string {
  return Number.isFinite(v) ? v.toFixed(2) : "∞";
}
