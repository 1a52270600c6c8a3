/**
 * Lai & Lee (2012): maximum rise, dilution at maximum rise and impact dilution of inclined dense jets in
 * stagnant, unstratified water, 15°–60°.
 *
 * Source: Lai, C.C.K., Lee, J.H.W., "Mixing of inclined dense jets in stationary ambient",
 * J. Hydro-environment Research 6:9–28 (2012). Angles 15, 30, 38, 45, 52 and 60°; F = 10–40; planar LIF
 * and PIV. All numbers below are stated in the paper's abstract (J. Hydro-environment Research 6, p. 9):
 *
 *   Z_max/(F·D) = 0.44 at θ = 15°, 2.08 at θ = 60°, independent of source conditions for F ≥ 25
 *   S_t/F = 0.45 (dilution at terminal rise), asymptotic, little difference over θ = 38°–60°
 *   S_i/F = 1.06 (impact dilution), for F ≥ 20, insensitive to angle over θ = 38°–60°
 *
 * Not traced: the paper's own rise values at 30°, 38°, 45° and 52°, the plan distances to maximum rise and
 * to impact, and any stated scatter. Between 15° and 60° the rise is interpolated LINEARLY IN ANGLE between
 * the two traced end points; the result says so. The true curve is not straight, so interpolated values
 * carry more uncertainty than the end points (no number can be given for it). S_t and S_i are given only
 * on 38°–60°, where the paper states them; below 38° they are null.
 *
 * Definitions: Z_max is taken as the UPPER-EDGE terminal rise (definition FROM MEMORY; consistent with its
 * 60° value lying beside the edge-based 2.2 of Roberts et al. 1997). S_i is taken as the centreline dilution
 * where the centreline returns to port level, as in Roberts et al. (1997) (FROM MEMORY).
 *
 * Known bias, stated in the same abstract: a Lagrangian integral jet model under-predicts Z_max by 10–15 % and
 * the dilution at Z_max by about 30 %; detrainment from the lower edge is observed for θ > 15°.
 */
import { warning, type ResultWarning } from "../warnings";
import {
  interpolateAngleTable,
  type AngleTablePoint,
  type DenseJetCoefficients,
  type DenseJetDataset,
  type DenseJetValidityInput,
} from "./dense-jet-dataset";

export const LAI_LEE_2012_SOURCE =
  "Lai & Lee (2012), J. Hydro-environment Res. 6:9–28: Z_max/(FD) = 0.44 (15°) to 2.08 (60°), F ≥ 25; " +
  "S_t/F = 0.45 and S_i/F = 1.06 (F ≥ 20) for 38°–60° (abstract)";

const ABSTRACT = "Lai & Lee (2012), J. Hydro-environment Res. 6:9–28, abstract";

/** Upper-edge terminal rise Z_max/(F·D) by discharge angle (only the two angles stated in the abstract). */
export const LAI_LEE_2012_RISE: readonly AngleTablePoint[] = [
  { angle: 15, value: { value: 0.44, provenance: ABSTRACT } },
  { angle: 60, value: { value: 2.08, provenance: ABSTRACT } },
];

/** Angles over which S_t/F and S_i/F are stated as angle-insensitive constants, degrees. */
export const LAI_LEE_2012_DILUTION_ANGLES: readonly [number, number] = [38, 60];
export const LAI_LEE_2012_MAX_RISE_DILUTION = { value: 0.45, provenance: ABSTRACT } as const;
export const LAI_LEE_2012_IMPACT_DILUTION = { value: 1.06, provenance: ABSTRACT } as const;

/** Angles studied, degrees. */
export const LAI_LEE_2012_ANGLE_RANGE: readonly [number, number] = [15, 60];
/** Densimetric Froude numbers studied (Lai & Lee 2012, abstract). */
export const LAI_LEE_2012_FROUDE_RANGE: readonly [number, number] = [10, 40];
/** F above which the rise coefficient is source-independent (Lai & Lee 2012, abstract). */
export const LAI_LEE_2012_RISE_ASYMPTOTIC_FROUDE = 25;
/** F above which the impact-dilution coefficient holds (Lai & Lee 2012, abstract). */
export const LAI_LEE_2012_DILUTION_ASYMPTOTIC_FROUDE = 20;

/**
 * Dimensionless coefficients of Lai & Lee (2012) at one angle.
 * @param angle discharge angle above horizontal θ, degrees, within 15°–60°
 * @returns coefficients (rise ÷ d·F, dilutions ÷ F), or null outside 15°–60° (the caller clamps and warns)
 */
export function laiLee2012CoefficientsAtAngle(angle: number): DenseJetCoefficients | null {
  const rise = interpolateAngleTable(LAI_LEE_2012_RISE, angle);
  if (!rise) return null;
  const notes: string[] = [];
  if (rise.interpolated) {
    notes.push(
      `Lai & Lee (2012) rise interpolated linearly between ${rise.bracket[0]}° and ${rise.bracket[1]}° ` +
        `(the paper's values at 30°, 38°, 45° and 52° are not held).`,
    );
  }
  const [dLo, dHi] = LAI_LEE_2012_DILUTION_ANGLES;
  const inDilutionRange = angle >= dLo && angle <= dHi;
  if (!inDilutionRange) {
    notes.push(`Lai & Lee (2012) state S_t and S_i only for ${dLo}°–${dHi}°; none given at ${angle.toFixed(1)}°.`);
  }
  return {
    angle,
    riseEdge: rise.value,
    maxRiseDistance: null,
    returnDistance: null,
    returnDilution: inDilutionRange ? LAI_LEE_2012_IMPACT_DILUTION.value : null,
    maxRiseDilution: inDilutionRange ? LAI_LEE_2012_MAX_RISE_DILUTION.value : null,
    nearFieldDistance: null,
    nearFieldDilution: null,
    interpolated: rise.interpolated,
    notes,
  };
}

/** Range checks for {@link laiLee2012CoefficientsAtAngle}; never throws. */
export function laiLee2012CoefficientsAtAngleValidityIssues(input: DenseJetValidityInput): ResultWarning[] {
  const out: ResultWarning[] = [];
  const { angle, froude } = input;
  const [aLo, aHi] = LAI_LEE_2012_ANGLE_RANGE;
  const [fLo, fHi] = LAI_LEE_2012_FROUDE_RANGE;
  const extra = { source: LAI_LEE_2012_SOURCE, stage: "length-scale" } as const;
  if (!(angle >= aLo && angle <= aHi)) {
    out.push(
      warning(
        "lai-lee-2012-angle-outside-range",
        "warning",
        `Discharge angle ${angle.toFixed(1)}° is outside the ${aLo}°–${aHi}° Lai & Lee (2012) studied.`,
        { parameter: "angle", value: angle, range: [aLo, aHi], ...extra },
      ),
    );
  }
  if (!(froude >= fLo)) {
    out.push(
      warning(
        "lai-lee-2012-froude-below-range",
        "serious",
        `Densimetric Froude number ${froude.toFixed(1)} is below the F = ${fLo}–${fHi} ` + `Lai & Lee (2012) studied.`,
        { parameter: "froude", value: froude, range: [fLo, fHi], ...extra },
      ),
    );
  } else if (froude < LAI_LEE_2012_RISE_ASYMPTOTIC_FROUDE) {
    out.push(
      warning(
        "lai-lee-2012-froude-not-asymptotic",
        "warning",
        `Densimetric Froude number ${froude.toFixed(1)} is below 25 (rise) ` +
          `${froude < LAI_LEE_2012_DILUTION_ASYMPTOTIC_FROUDE ? "and 20 (impact dilution) " : ""}` +
          `where Lai & Lee (2012) found the coefficients independent of source conditions.`,
        { parameter: "froude", value: froude, range: [LAI_LEE_2012_RISE_ASYMPTOTIC_FROUDE, fHi], ...extra },
      ),
    );
  } else if (froude > fHi) {
    out.push(
      warning(
        "lai-lee-2012-froude-above-range",
        "info",
        `Densimetric Froude number ${froude.toFixed(1)} is above the laboratory F = ${fLo}–${fHi}; the ` +
          `coefficients are asymptotic in F and are applied unchanged (common practice, no source).`,
        { parameter: "froude", value: froude, range: [fLo, fHi], ...extra },
      ),
    );
  }
  return out;
}

/** The dataset as the length-scale method sees it. */
export const LAI_LEE_2012_DATASET: DenseJetDataset = {
  id: "lai-lee-2012",
  label: "Lai & Lee (2012)",
  source: LAI_LEE_2012_SOURCE,
  angleRange: LAI_LEE_2012_ANGLE_RANGE,
  froudeRange: LAI_LEE_2012_FROUDE_RANGE,
  coefficientsAtAngle: laiLee2012CoefficientsAtAngle,
  validityIssues: laiLee2012CoefficientsAtAngleValidityIssues,
};
