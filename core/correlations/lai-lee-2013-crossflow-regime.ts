/**
 * Lai & Lee (2013): the crossflow Froude number F_c = U_r·F decides whether an inclined dense jet in a
 * current still behaves like the stagnant-water jet the length-scale laws describe.
 *
 * Source: Lai, C.C.K., Lee, J.H.W., "Initial mixing of inclined dense jet in perpendicular crossflow",
 * Environmental Fluid Mechanics (2013), doi 10.1007/s10652-013-9290-7 — all statements below are from the
 * paper's abstract. The jet is "inclined (60° to vertical)" in the abstract's words,
 * the current perpendicular to it; U_r = u_a/U, F = U/√(g′d):
 *
 *   F_c < 0.8   jet-dominated: shear entrainment, strong detrainment, rise under-predicted by a Lagrangian
 *               model "as in the case of a dense jet in stagnant fluid"
 *   F_c ≥ 0.8   the jet is significantly bent over during its ascent; vortex (forced) entrainment dominates
 *   F_c ≥ 2     detrainment no longer affects the jet
 *
 * Consequence used by the length-scale method: for F_c ≥ 0.8 the stagnant-water geometry and dilution laws
 * no longer describe the jet. The 0.8 and 2 thresholds are the paper's; applying them to co- and
 * counter-flowing currents is an extension (Abessi & Roberts 2017, J. Hydraulic Eng. 143(6), used
 * current-speed parameters for both; their fitted values are not used here).
 *
 * Length-scale form (derived from the definitions of the fluxes): with the momentum length in a current l_m = M^{1/2}/u_a
 * (Roberts & Toms 1987 style scaling) and l_M = M^{3/4}/B^{1/2}, a round port gives
 *   l_m / l_M = (π/4)^{1/4} · √(g′d)/u_a = (π/4)^{1/4} / F_c ≈ 0.941 / F_c,
 * so F_c ≥ 0.8 means the current bends the jet within about 1.2 l_M — before the stagnant jet's rise
 * (≈ 2.2 l_M at 60°) is complete.
 */
import { warning, type ResultWarning } from "../warnings";

export const LAI_LEE_2013_SOURCE =
  "Lai & Lee (2013), Environ. Fluid Mech., doi 10.1007/s10652-013-9290-7: F_c = U_r·F; < 0.8 " +
  "jet-dominated, ≥ 0.8 bent over on ascent, ≥ 2 detrainment irrelevant (abstract)";

/** Below this F_c the jet is jet-dominated (Lai & Lee 2013, abstract). */
export const CROSSFLOW_BENT_OVER_FROUDE = 0.8;
/** From this F_c on, detrainment no longer matters (Lai & Lee 2013, abstract). */
export const CROSSFLOW_DOMINATED_FROUDE = 2;

export type CrossflowRegime = "stagnant" | "jet-dominated" | "bent-over" | "crossflow-dominated";

/**
 * Crossflow Froude number F_c = (u_a/U)·F.
 * @param currentSpeed u_a, m/s (≥ 0)
 * @param exitVelocity U, m/s (> 0)
 * @param froude F = U/√(g′d), dimensionless
 * @returns F_c, dimensionless; 0 for no current; NaN when U ≤ 0
 */
export function crossflowFroudeFromSpeeds(currentSpeed: number, exitVelocity: number, froude: number): number {
  if (!(exitVelocity > 0)) return Number.NaN; // no jet: the ratio is undefined
  return (Math.max(0, currentSpeed) / exitVelocity) * froude;
}

/** Regime of Lai & Lee (2013) for a crossflow Froude number. */
export function crossflowRegimeFromFroude(crossflowFroude: number): CrossflowRegime {
  if (!(crossflowFroude > 0)) return "stagnant";
  if (crossflowFroude < CROSSFLOW_BENT_OVER_FROUDE) return "jet-dominated";
  if (crossflowFroude < CROSSFLOW_DOMINATED_FROUDE) return "bent-over";
  return "crossflow-dominated";
}

/** l_m/l_M = (π/4)^{1/4}/F_c (DERIVED); Infinity without current. */
export function momentumLengthRatioFromCrossflowFroude(crossflowFroude: number): number {
  if (!(crossflowFroude > 0)) return Infinity;
  return Math.pow(Math.PI / 4, 0.25) / crossflowFroude;
}

/**
 * Warnings for applying stagnant-water length-scale laws in a current; never throws.
 * @param crossflowFroude F_c = U_r·F
 * @param relation plain words for the current relative to the jet, e.g. "counter-flowing (170° to the jet)"
 */
export function crossflowFroudeValidityIssues(crossflowFroude: number, relation = ""): ResultWarning[] {
  const regime = crossflowRegimeFromFroude(crossflowFroude);
  if (regime === "stagnant" || regime === "jet-dominated") return [];
  const ratio = momentumLengthRatioFromCrossflowFroude(crossflowFroude);
  const where = relation ? ` The current is ${relation}.` : "";
  const severe = regime === "crossflow-dominated";
  return [
    warning(
      severe ? "current-dominates-jet" : "current-bends-jet",
      "serious",
      `Current too strong for the stagnant-water correlations: crossflow Froude number F_c = U_r·F = ` +
        `${crossflowFroude.toFixed(2)} ≥ 0.8 (Lai & Lee 2013), so the jet is bent over before it reaches ` +
        `its stagnant-water rise (momentum length in the current l_m = ${ratio.toFixed(2)} l_M)` +
        `${severe ? "; at F_c ≥ 2 the current dominates the mixing" : ""}. Rise, return distance and ` +
        `dilution from the length-scale method do not apply; use a method that models the current.${where}`,
      {
        parameter: "crossflowFroude",
        value: crossflowFroude,
        range: [0, CROSSFLOW_BENT_OVER_FROUDE],
        source: LAI_LEE_2013_SOURCE,
        stage: "length-scale",
      },
    ),
  ];
}
