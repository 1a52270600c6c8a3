/**
 * Roberts, Ferrier & Daviero (1997): length and dilution laws for a 60° inclined dense jet in stagnant,
 * unstratified water.
 *
 * Source: Roberts, P.J.W., Ferrier, A., Daviero, G., "Mixing in inclined dense jets", J. Hydraulic
 * Engineering 123(8):693–699 (1997) — volume and pages checked against published reference lists; the
 * issue number is from memory. The study measured the 60° configuration only (as stated in later reviews of
 * dense-jet work).
 *
 *   y_t = 2.2·d·F   terminal rise of the jet's UPPER EDGE above the nozzle
 *   x_i = 2.4·d·F   centreline back at nozzle level ("impact" in the paper's words)
 *   S_i = 1.6·F     minimum (centreline) dilution there
 *   x_n = 9.0·d·F   end of the near field (bottom layer stops entraining strongly)
 *   S_n = 2.6·F     dilution at the end of the near field
 *
 * Provenance of the five coefficients: from memory and quoted in secondary literature, not checked against
 * the original paper. They ship because several independent secondary sources quote the same five numbers
 * the same way; the references section of the report and README's methods section say so once. No value
 * for the plan distance to maximum rise or for the dilution at maximum rise is known for this study: those
 * stay null.
 *
 * Validity: θ = 60° only (this file accepts 60° ± 2°, a build tolerance — common practice, no source).
 * The laws are asymptotic in F; the study's own laboratory F range is not traced here, so the lower bound
 * used is F ≥ 20, the threshold above which Lai & Lee (2012) found impact dilution source-independent
 * (Lai & Lee 2012, abstract). Accuracy: not known. Published 60° impact dilutions disagree by 50%
 * (1.6·F here vs 1.06·F in Lai & Lee 2012, abstract).
 */
import { warning, type ResultWarning } from "../warnings";
import type { DenseJetCoefficients, DenseJetDataset, DenseJetValidityInput, TracedValue } from "./dense-jet-dataset";

export const ROBERTS_1997_SOURCE =
  "Roberts, Ferrier & Daviero (1997), J. Hydraulic Eng. 123(8):693–699, 60° jet: y_t = 2.2 dF, " +
  "x_i = 2.4 dF, S_i = 1.6 F, x_n = 9.0 dF, S_n = 2.6 F";

/** The five coefficients are quoted in secondary literature, not checked against the original paper. */
const MEMORY = "Roberts, Ferrier & Daviero (1997), J. Hydraulic Eng. 123(8):693–699, 60° coefficients";

/** The 60° coefficient set of Roberts, Ferrier & Daviero (1997). */
export const ROBERTS_1997_COEFFICIENTS = {
  angle: 60,
  riseEdge: { value: 2.2, provenance: MEMORY } as TracedValue,
  returnDistance: { value: 2.4, provenance: MEMORY } as TracedValue,
  returnDilution: { value: 1.6, provenance: MEMORY } as TracedValue,
  nearFieldDistance: { value: 9.0, provenance: MEMORY } as TracedValue,
  nearFieldDilution: { value: 2.6, provenance: MEMORY } as TracedValue,
} as const;

/**
 * Growth from impact to the end of the near field in the same experiments: S_n/S_i = 2.6/1.6 over a
 * further x_n − x_i = (9.0 − 2.4)·d·F (Roberts et al. 1997, secondary quotation). Used to carry an impact
 * dilution to the end of the near field on a published basis when a method gives only the impact point.
 */
export const ROBERTS_1997_NEAR_FIELD_GROWTH = {
  /** S_n/S_i. */
  dilution: ROBERTS_1997_COEFFICIENTS.nearFieldDilution.value / ROBERTS_1997_COEFFICIENTS.returnDilution.value,
  /** (x_n − x_i)/(d·F). */
  spreadLength: ROBERTS_1997_COEFFICIENTS.nearFieldDistance.value - ROBERTS_1997_COEFFICIENTS.returnDistance.value,
} as const;

/** Angles within this many degrees of 60° count as 60° (build tolerance; common practice, no source). */
export const ROBERTS_1997_ANGLE_TOLERANCE = 2;

/**
 * Lower Froude bound: the asymptotic threshold of Lai & Lee (2012) (abstract), used because this study's
 * own range is not traced. Upper bound: none traced (the laws are asymptotic in F).
 */
export const ROBERTS_1997_FROUDE_RANGE: readonly [number, number] = [20, Infinity];

/**
 * Dimensionless coefficients of Roberts et al. (1997).
 * @param angle discharge angle above horizontal θ, degrees
 * @returns coefficients (lengths ÷ d·F, dilutions ÷ F), or null when the angle is not 60° ± 2°
 */
export function roberts1997CoefficientsAtAngle(angle: number): DenseJetCoefficients | null {
  if (!Number.isFinite(angle)) return null;
  const c = ROBERTS_1997_COEFFICIENTS;
  if (Math.abs(angle - c.angle) > ROBERTS_1997_ANGLE_TOLERANCE) return null;
  const notes: string[] = [];
  if (angle !== c.angle) {
    notes.push(
      `Roberts et al. (1997) 60° coefficients used for ${angle.toFixed(1)}° ` +
        `(within the ±${ROBERTS_1997_ANGLE_TOLERANCE}° build tolerance; common practice, no source).`,
    );
  }
  return {
    angle: c.angle,
    riseEdge: c.riseEdge.value,
    maxRiseDistance: null,
    returnDistance: c.returnDistance.value,
    returnDilution: c.returnDilution.value,
    maxRiseDilution: null,
    nearFieldDistance: c.nearFieldDistance.value,
    nearFieldDilution: c.nearFieldDilution.value,
    interpolated: false,
    notes,
  };
}

/** Range checks for {@link roberts1997CoefficientsAtAngle}; never throws. */
export function roberts1997CoefficientsAtAngleValidityIssues(input: DenseJetValidityInput): ResultWarning[] {
  const out: ResultWarning[] = [];
  const { angle, froude } = input;
  const lo = ROBERTS_1997_COEFFICIENTS.angle - ROBERTS_1997_ANGLE_TOLERANCE;
  const hi = ROBERTS_1997_COEFFICIENTS.angle + ROBERTS_1997_ANGLE_TOLERANCE;
  if (!(angle >= lo && angle <= hi)) {
    out.push(
      warning(
        "roberts-1997-angle-not-studied",
        "warning",
        `Discharge angle ${angle.toFixed(1)}° is not the 60° Roberts et al. (1997) studied ` +
          `(accepted ${lo}–${hi}°).`,
        {
          parameter: "angle",
          value: angle,
          range: [lo, hi],
          source: ROBERTS_1997_SOURCE,
          stage: "length-scale",
        },
      ),
    );
  }
  if (!(froude >= ROBERTS_1997_FROUDE_RANGE[0])) {
    out.push(
      warning(
        "roberts-1997-froude-below-asymptotic",
        "warning",
        `Densimetric Froude number ${froude.toFixed(1)} is below 20; the 60° laws are asymptotic in F and ` +
          `Lai & Lee (2012) found dilution source-independent only for F ≥ 20.`,
        {
          parameter: "froude",
          value: froude,
          range: [ROBERTS_1997_FROUDE_RANGE[0], ROBERTS_1997_FROUDE_RANGE[1]],
          source: ROBERTS_1997_SOURCE,
          stage: "length-scale",
        },
      ),
    );
  }
  return out;
}

/** The dataset as the length-scale method sees it. */
export const ROBERTS_1997_DATASET: DenseJetDataset = {
  id: "roberts-1997",
  label: "Roberts, Ferrier & Daviero (1997)",
  source: ROBERTS_1997_SOURCE,
  angleRange: [ROBERTS_1997_COEFFICIENTS.angle, ROBERTS_1997_COEFFICIENTS.angle],
  froudeRange: ROBERTS_1997_FROUDE_RANGE,
  coefficientsAtAngle: (angle) => roberts1997CoefficientsAtAngle(angle),
  validityIssues: roberts1997CoefficientsAtAngleValidityIssues,
};
