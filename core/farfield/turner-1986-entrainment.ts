/**
 * Entrainment into a dense bottom gravity current as a function of the layer Richardson number.
 *
 * Concept: entrainment velocity w_e = E(Ri)·V with the overall layer Richardson number
 * Ri = g′·h·cosβ / V² (Ellison, T.H., Turner, J.S., "Turbulent entrainment in stratified flows",
 * J. Fluid Mech. 6:423–448, 1959 — concept and the cut-off "negligible for Ri ≳ 0.8" read in the paper,
 * p. 423).
 * Parametrisation: E(Ri) = (0.08 − 0.1·Ri)/(1 + 5·Ri) for Ri < 0.8, else 0 (Turner, J.S., "Turbulent
 * entrainment: the development of the entrainment assumption, and its application to geophysical
 * flows", J. Fluid Mech. 173:431–471, 1986 — formula from memory, quoted in secondary literature and not
 * checked against the original paper; self-consistent with the 0.8 cut-off
 * since the numerator vanishes there).
 *
 * Validity: fitted to laboratory inclined-plume data for Ri ≈ 0–0.8 (from memory). Negative Ri (an
 * unstable layer) is outside the fit. Accuracy: laboratory scatter of roughly a factor of two in E
 * (from memory).
 */
import { warning, type ResultWarning } from "../warnings";

export const TURNER_1986_SOURCE =
  "Turner (1986) J. Fluid Mech. 173:431–471, E = (0.08 − 0.1 Ri)/(1 + 5 Ri); " +
  "cut-off Ri ≥ 0.8 from Ellison & Turner (1959) J. Fluid Mech. 6:423–448";

/** Richardson number above which entrainment is taken as zero (Ellison & Turner 1959, p. 423). */
export const ENTRAINMENT_CUTOFF_RICHARDSON = 0.8;

/**
 * Entrainment coefficient E of a dense bottom layer.
 * @param richardson Ri = g′ h cosβ / V², dimensionless
 * @returns E, dimensionless (entrainment velocity ÷ layer velocity), in [0, 0.08]
 */
export function entrainmentFromRichardson(richardson: number): number {
  if (!Number.isFinite(richardson)) return 0; // Ri → ∞: a stagnant layer entrains nothing.
  // An unstable (Ri < 0) layer is outside the fit; use the Ri = 0 value rather than extrapolate.
  const ri = Math.max(0, richardson);
  if (ri >= ENTRAINMENT_CUTOFF_RICHARDSON) return 0;
  return (0.08 - 0.1 * ri) / (1 + 5 * ri);
}

/** Range checks for {@link entrainmentFromRichardson}; never throws. */
export function entrainmentFromRichardsonValidityIssues(richardson: number): ResultWarning[] {
  if (Number.isFinite(richardson) && richardson < 0) {
    return [
      warning(
        "entrainment-richardson-negative",
        "warning",
        `Layer Richardson number ${richardson.toFixed(3)} is negative (unstable layer); entrainment taken at Ri = 0.`,
        {
          parameter: "richardson",
          value: richardson,
          range: [0, Infinity],
          source: TURNER_1986_SOURCE,
          stage: "far-field",
        },
      ),
    ];
  }
  return [];
}
