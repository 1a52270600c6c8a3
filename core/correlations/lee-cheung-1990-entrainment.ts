/**
 * Entrainment closure of the Lagrangian buoyant-jet model of Lee & Cheung (1990), written per
 * unit length of jet centreline (the Eulerian form of the same closure, Lee & Chu 2003).
 *
 * Top-hat profiles: b is the top-hat radius, V the top-hat (absolute) jet speed along the axis,
 * g′ the top-hat reduced gravity |ρ − ρa|·g/ρa.
 *
 * Shear entrainment (Lee & Cheung 1990; restated in Lee & Chu 2003, ch. 8):
 *   dQ_s/ds = 2π·b·α·ΔU,  ΔU = V − u_s,  u_s = u_a·cos(angle between jet axis and current),
 *   α = √2·(0.057 + 0.554·sinφ / F_l²) / (1 + 5·u_s/ΔU).
 *   0.057 is the Gaussian pure-jet entrainment coefficient, √2 converts it to top-hat; 0.554 sets
 *   the plume value (α_Gauss → 0.0833 at F_l² = 0.554/(0.0833 − 0.057) = 21.1, the Fischer et al.
 *   1979 plume coefficient); 5 damps shear entrainment in co-flow.
 *   Local Froude number: F_l² = (2·ΔU)²/(g′·b) = 4·F_T², i.e. based on the Gaussian centreline
 *   velocity excess 2·ΔU (top-hat ↔ Gaussian: u_c = 2·u_T, b_T = √2·b_G). This reading is DERIVED
 *   from the published plume limit: a top-hat plume with constant α_T has F_T² = 5/(8α_T) = 5.32 at
 *   α_T = √2·0.0833, and only F_l² = 4·F_T² = 21.3 reproduces 0.0833 from the closure. With the bare
 *   top-hat F_T² instead, the closure has no plume equilibrium at all (lazy plumes run away:
 *   4·√2·0.554 > 5/2 in the top-hat plume equation), so that reading cannot be the published one.
 * Forced entrainment (projected-area term of Lee & Cheung 1990):
 *   dQ_f/ds = 2·b·u_a·|sin(angle between jet axis and current)|.
 * Combination: maximum hypothesis, dQ/ds = max(dQ_s/ds, dQ_f/ds) (Lee & Cheung 1990).
 *
 * What is implemented differently, and why (stated so nobody has to reverse-engineer it):
 * - sinφ (inclination above horizontal in the paper, for a jet whose buoyancy acts upward) is
 *   replaced by the cosine of the angle between the jet axis and the buoyancy force, floored at
 *   zero. For a positively buoyant rising jet this is the paper's sinφ; for a dense jet it gives the
 *   plume augmentation on the descending limb and the pure-jet value on the rising limb (where the
 *   paper's form would reduce α below the jet value and can make it negative).
 * - In the co-flow damping term u_s is floored at 0: a jet aimed against the current gets no
 *   damping (the published form is meant for co-flowing components; with u_s < 0 it can flip sign).
 * - The growth and curvature corrections of the forced-entrainment term (Lee & Cheung 1990) are
 *   omitted: they need db/ds and the axis curvature inside the right-hand side. They are secondary
 *   for the bent-over phase; this under-states forced entrainment slightly while the jet turns.
 *
 * Provenance of the numbers: 0.057, 0.554, 5 and √2 — from memory (Lee & Cheung 1990 / Lee &
 * Chu 2003), quoted in secondary literature and not checked against the original paper; one
 * secondary quotation gives 0.544 instead of 0.554. Sensitivity: 0.544 vs 0.554 changes the plume asymptote α by
 * < 1 %. The pure-jet and pure-plume limits of this closure are checked in the tests against
 * Fischer et al. (1979) constants.
 *
 * Validity (checked by `entrainmentLeeCheung1990ValidityIssues`): laboratory validation of
 * inclined dense jets spans densimetric Froude numbers ≈ 10–40 (Lai & Lee 2012, abstract) and
 * angles 15°–75° (Papakonstantis et al. 2011; Lai & Lee 2012); for crossflow Froude number
 * F_c = (u_a/U)·F < 0.8 the Lagrangian model under-predicts the rise (Lai & Lee 2013, abstract).
 *
 * References:
 * - Lee, J.H.W., Cheung, V., "Generalized Lagrangian model for buoyant jets in current",
 *   J. Environmental Engineering 116(6):1085–1106 (1990).
 * - Lee, J.H.W., Chu, V.H., Turbulent Jets and Plumes: A Lagrangian Approach, Kluwer (2003).
 * - Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., Brooks, N.H., Mixing in Inland and
 *   Coastal Waters, Academic Press (1979), ch. 9.
 */
import { warning, type ResultWarning } from "../warnings";

/** Coefficients of the closure, with their provenance. */
export const ENTRAINMENT_LEE_CHEUNG_1990 = {
  /** Gaussian pure-jet coefficient (FROM MEMORY; Fischer et al. 1979 give 0.0535 ± 0.0025). */
  jet: 0.057,
  /** Buoyancy (plume) term coefficient (FROM MEMORY; 0.544 in one secondary source). */
  buoyancy: 0.554,
  /** Co-flow damping factor (FROM MEMORY). */
  coflow: 5,
  /** Gaussian → top-hat conversion of the entrainment coefficient (b_T = √2·b_G). */
  topHat: Math.SQRT2,
  /** F_l² = froudeScale·ΔU²/(g′b): Gaussian-centreline velocity 2ΔU (DERIVED, see header). */
  froudeScale: 4,
} as const;

export const ENTRAINMENT_LEE_CHEUNG_1990_SOURCE =
  "Lee, J.H.W., Cheung, V. (1990), Generalized Lagrangian model for buoyant jets in current, " +
  "J. Environ. Eng. 116(6):1085–1106; Lee & Chu (2003) Turbulent Jets and Plumes, Kluwer";

/**
 * Top-hat shear entrainment coefficient α of Lee & Cheung (1990), as adapted above.
 * @param deltaU ΔU, jet speed minus its co-flowing ambient component, m/s (> 0)
 * @param coflowSpeed u_s, ambient current component along the jet axis, m/s
 * @param buoyancyAlignment cosine of the angle between jet axis and buoyancy force, −1…1
 * @param reducedGravity |g′| of the jet relative to the local ambient, m/s²
 * @param radius b, top-hat radius, m
 * @returns α, dimensionless (top-hat)
 */
export function entrainmentLeeCheung1990Alpha(
  deltaU: number,
  coflowSpeed: number,
  buoyancyAlignment: number,
  reducedGravity: number,
  radius: number,
): number {
  const c = ENTRAINMENT_LEE_CHEUNG_1990;
  // ΔU ≤ 0 (jet slower than the co-flow) has no shear entrainment; tiny floor avoids 0/0.
  const du = deltaU > 1e-12 ? deltaU : 1e-12;
  const align = buoyancyAlignment > 0 ? buoyancyAlignment : 0;
  // sinφ/F_l² = align·g′·b/(4·ΔU²)
  const plumeTerm = (c.buoyancy * align * reducedGravity * radius) / (c.froudeScale * du * du);
  const us = coflowSpeed > 0 ? coflowSpeed : 0;
  return (c.topHat * (c.jet + plumeTerm)) / (1 + (c.coflow * us) / du);
}

/**
 * Entrainment rate per unit centreline length, dQ/ds (m²/s), maximum of shear and forced terms.
 * @param speed V, top-hat jet speed along the axis, m/s
 * @param radius b, top-hat radius, m
 * @param currentSpeed u_a ≥ 0, m/s
 * @param cosAxisCurrent cosine of the angle between jet axis and current direction
 * @param buoyancyAlignment cosine of the angle between jet axis and buoyancy force
 * @param reducedGravity |g′| relative to the local ambient, m/s²
 */
export function entrainmentLeeCheung1990Rate(
  speed: number,
  radius: number,
  currentSpeed: number,
  cosAxisCurrent: number,
  buoyancyAlignment: number,
  reducedGravity: number,
): number {
  const us = currentSpeed * cosAxisCurrent;
  const deltaU = speed - us;
  const alpha = entrainmentLeeCheung1990Alpha(deltaU, us, buoyancyAlignment, reducedGravity, radius);
  const shear = deltaU > 0 ? 2 * Math.PI * radius * alpha * deltaU : 0;
  const sin2 = 1 - cosAxisCurrent * cosAxisCurrent;
  const forced = 2 * radius * currentSpeed * Math.sqrt(sin2 > 0 ? sin2 : 0);
  return shear > forced ? shear : forced;
}

export interface EntrainmentValidityInputs {
  /** Port densimetric Froude number F = U/√(g′d). */
  readonly froude: number;
  /** Discharge angle above horizontal, degrees. */
  readonly angle: number;
  /** Ambient current speed, m/s. */
  readonly currentSpeed: number;
  /** Port exit velocity, m/s. */
  readonly velocity: number;
}

/** Structured warnings where the closure is used outside its validated range. Never throws. */
export function entrainmentLeeCheung1990ValidityIssues(inputs: EntrainmentValidityInputs): ResultWarning[] {
  const out: ResultWarning[] = [];
  const { froude, angle, currentSpeed, velocity } = inputs;
  if (Number.isFinite(froude) && (froude < 10 || froude > 40)) {
    out.push(
      warning(
        "integral-froude-outside-validation",
        "info",
        `Densimetric Froude number ${froude.toFixed(1)} is outside the 10–40 range of the laboratory data the inclined dense-jet integral predictions were compared with.`,
        { parameter: "froude", value: froude, range: [10, 40], source: "Lai & Lee (2012)", stage: "integral" },
      ),
    );
  }
  if (angle < 15 || angle > 75) {
    out.push(
      warning(
        "integral-angle-outside-validation",
        "info",
        `Discharge angle ${angle.toFixed(0)}° is outside the 15°–75° range of inclined dense-jet experiments.`,
        {
          parameter: "angle",
          value: angle,
          range: [15, 75],
          source: "Papakonstantis et al. (2011); Lai & Lee (2012)",
          stage: "integral",
        },
      ),
    );
  }
  if (currentSpeed > 0 && velocity > 0 && Number.isFinite(froude)) {
    const fc = (currentSpeed / velocity) * froude;
    if (fc < 0.8) {
      out.push(
        warning(
          "integral-weak-crossflow",
          "info",
          `Crossflow Froude number ${fc.toFixed(2)} < 0.8: jet-dominated regime with detrainment, where a Lagrangian integral model under-predicts the maximum rise.`,
          {
            parameter: "crossflowFroude",
            value: fc,
            range: [0.8, Infinity],
            source: "Lai & Lee (2013)",
            stage: "integral",
          },
        ),
      );
    }
  }
  return out;
}
