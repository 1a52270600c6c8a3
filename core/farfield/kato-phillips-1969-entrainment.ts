/**
 * Entrainment across the top of a dense bottom layer stirred by turbulence generated at the bed by the
 * ambient current (bed-generated turbulence), as a function of the bulk Richardson number of the stirring.
 *
 * Source: Kato, H., Phillips, O.M., "On the penetration of a turbulent layer into stratified fluid",
 * J. Fluid Mech. 37(4):643–655 (1969): a turbulent layer stirred by a surface stress u*² deepens into the
 * still, denser fluid beside it at
 *
 *   u_e / u* = K / Ri*,   Ri* = Δb·h / u*²,   K = 2.5
 *
 * (K FROM MEMORY, quoted widely in the same form). Here the geometry is turned upside down: the dense
 * layer is the stirred layer, the bed is the stirring boundary, and u* = √C_D·u is the friction velocity of
 * the ambient current over the bed (quadratic drag; C_D = 0.0025, common practice, no source); Δb = g′·cosβ.
 *
 * @param richardson Ri* = g′·h·cosβ / u*², dimensionless
 * @returns u_e/u*, dimensionless, in [0, K/RI_STAR_MIN]
 *
 * Validity: the laboratory runs covered strongly stratified stirring (Ri* of tens to hundreds, from
 * memory). For Ri* below {@link KATO_PHILLIPS_RI_STAR_MIN} the law is held at its value there (a guard: a
 * weakly stratified layer cannot entrain faster than the turbulence velocity itself). Accuracy: not traced.
 */
import { warning, type ResultWarning } from "../warnings";

export const KATO_PHILLIPS_1969_SOURCE =
  "Kato & Phillips (1969) J. Fluid Mech. 37:643–655, u_e/u* = 2.5/Ri*, stirred by the " +
  "current's bed friction velocity u* = √C_D·u";

/** Coefficient K of u_e/u* = K/Ri* (Kato & Phillips 1969, from memory). */
export const KATO_PHILLIPS_COEFFICIENT = 2.5;
/** Lowest Ri* the law is applied at (guard, judgement: u_e ≤ 0.25·u*). */
export const KATO_PHILLIPS_RI_STAR_MIN = 10;

/** Bed-stirred entrainment ratio u_e/u* from the stirring Richardson number Ri* (see header). */
export function bedEntrainmentFromRichardson(richardson: number): number {
  // Ri* = ∞ (no stirring or no layer) entrains nothing; NaN likewise.
  if (Number.isNaN(richardson) || richardson === Infinity) return 0;
  return KATO_PHILLIPS_COEFFICIENT / Math.max(richardson, KATO_PHILLIPS_RI_STAR_MIN);
}

/** Range checks for {@link bedEntrainmentFromRichardson}; never throws. */
export function bedEntrainmentFromRichardsonValidityIssues(richardson: number): ResultWarning[] {
  if (Number.isFinite(richardson) && richardson >= 0 && richardson < KATO_PHILLIPS_RI_STAR_MIN) {
    return [
      warning(
        "bed-entrainment-weakly-stratified",
        "info",
        `The current stirs the dense layer strongly (Ri* = ${richardson.toFixed(1)}, below ${KATO_PHILLIPS_RI_STAR_MIN}); ` +
          `bed-stirred entrainment is held at its Ri* = ${KATO_PHILLIPS_RI_STAR_MIN} value.`,
        {
          parameter: "richardson",
          value: richardson,
          range: [KATO_PHILLIPS_RI_STAR_MIN, Infinity],
          source: KATO_PHILLIPS_1969_SOURCE,
          stage: "far-field",
        },
      ),
    ];
  }
  return [];
}
