/**
 * Minimum (centreline) dilution of a line plume in stagnant, unstratified water.
 *
 * S_m = C·b^{1/3}·z/q, with q the volume flux per unit diffuser length (m²/s), b = g′·q the buoyancy
 * flux per unit length (m³/s³) and z the distance the plume travels (m). C = 0.27 for the minimum
 * dilution (the average dilution is about 0.38·b^{1/3}·z/q).
 * Source: Fischer, List, Koh, Imberger & Brooks (1979) *Mixing in Inland and Coastal Waters* ch. 9;
 * Roberts, Snyder & Baumgartner (1989) J. Hydraulic Engineering 115(1):49–70 — coefficients from memory,
 * not checked against either original, with low confidence on which coefficient (0.27 or 0.38) is the
 * minimum. Roberts et al. (1989, abstract) report that closely spaced multiport plumes dilute like a line
 * plume.
 *
 * For a dense line of inclined jets the plume falls from its maximum rise to the seabed; taking z as
 * that fall height (rise above the port + port height) is engineering judgement, not a published rule.
 * The result is a lower bound on the merged dilution (the initial jet momentum is ignored).
 */
import { warning, type ResultWarning } from "../warnings";

export const LINE_PLUME_MIN_COEFFICIENT = 0.27;
export const LINE_PLUME_MEAN_COEFFICIENT = 0.38;
export const LINE_PLUME_SOURCE =
  "Line plume S_m = 0.27 b^(1/3) z/q — Fischer et al. (1979) ch. 9; Roberts, Snyder & Baumgartner (1989)";

/**
 * @param flowPerLength q, m²/s
 * @param reducedGravity g′ of the source, m/s² (magnitude; sign of buoyancy does not matter)
 * @param height z, plume travel distance, m
 * @param coefficient C (default 0.27, minimum dilution)
 * @returns dilution (dimensionless, at least 1)
 */
export function linePlumeDilutionFromFlux(
  flowPerLength: number,
  reducedGravity: number,
  height: number,
  coefficient = LINE_PLUME_MIN_COEFFICIENT,
): number {
  // Zero flux or zero height: the formula degenerates; an undiluted source is the safe answer.
  if (!(flowPerLength > 0) || !(height > 0) || !(Math.abs(reducedGravity) > 0)) return 1;
  const b = Math.abs(reducedGravity) * flowPerLength;
  return Math.max(1, (coefficient * Math.cbrt(b) * height) / flowPerLength);
}

/** Range checks: the line-plume law assumes the plume is far from its source (z ≫ q^{2/3}/b^{1/3}). */
export function linePlumeDilutionFromFluxValidityIssues(
  flowPerLength: number,
  reducedGravity: number,
  height: number,
): ResultWarning[] {
  if (!(flowPerLength > 0) || !(Math.abs(reducedGravity) > 0)) return [];
  // Source length scale of a line plume, l_q = q^{2/3}/b^{1/3} (derived from dimensions).
  const lq = Math.pow(flowPerLength, 2 / 3) / Math.cbrt(Math.abs(reducedGravity) * flowPerLength);
  if (height < 5 * lq) {
    return [
      warning(
        "line-plume-near-source",
        "info",
        `Line-plume fall height ${height.toFixed(2)} m is under five source lengths (${(5 * lq).toFixed(2)} m); the plume law is rough there.`,
        {
          parameter: "height",
          value: height,
          range: [5 * lq, Infinity],
          source: LINE_PLUME_SOURCE,
          stage: "multiport",
        },
      ),
    ];
  }
  return [];
}
