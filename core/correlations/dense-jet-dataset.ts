/**
 * Shared shape of the published length-scale datasets for an inclined dense jet from a round port in
 * stagnant, unstratified water, and the angle interpolation they all use.
 *
 * Scaling (derived from the definitions of the fluxes): the jet-to-plume length l_M = M^{3/4}/B^{1/2} = (π/4)^{1/4}·d·F, so
 * every length scales with d·F and every dilution with F once the source is far enough from the plume
 * limit (F ≳ 20–25, Lai & Lee 2012, abstract). Each dataset file gives dimensionless coefficients:
 *
 *   length = coefficient × d × F        dilution = coefficient × F
 *
 * Conventions, once for all dataset files: θ is the discharge angle above horizontal in degrees; "rise" is
 * the UPPER EDGE of the jet above the port centre; "return" is where the CENTRELINE is back at port level;
 * dilutions are centreline (minimum) values. A study that reports another definition says so in its file
 * and converts or declares the difference.
 */
import type { ResultWarning } from "../warnings";

/** One published value: the number and the published place it comes from (authors, year, part of the paper). */
export interface TracedValue {
  readonly value: number;
  readonly provenance: string;
}

/** A coefficient tabulated against discharge angle (degrees), ascending, at least one point. */
export interface AngleTablePoint {
  readonly angle: number;
  readonly value: TracedValue;
}

/** Dimensionless coefficients of one dataset at one discharge angle (null where the study gives none). */
export interface DenseJetCoefficients {
  /** Angle the coefficients belong to, degrees (the requested angle, or the nearest studied one). */
  readonly angle: number;
  /** Upper-edge terminal rise above the port ÷ (d·F). */
  readonly riseEdge: number | null;
  /** Plan distance to the point of maximum rise ÷ (d·F). */
  readonly maxRiseDistance: number | null;
  /** Plan distance where the centreline is back at port level ÷ (d·F). */
  readonly returnDistance: number | null;
  /** Centreline (minimum) dilution where the centreline is back at port level ÷ F. */
  readonly returnDilution: number | null;
  /** Centreline dilution at maximum rise ÷ F. */
  readonly maxRiseDilution: number | null;
  /** Plan distance to the end of the near field ÷ (d·F). */
  readonly nearFieldDistance: number | null;
  /** Dilution at the end of the near field ÷ F. */
  readonly nearFieldDilution: number | null;
  /** True when at least one coefficient was interpolated between tabulated angles. */
  readonly interpolated: boolean;
  /** Plain statements of what was interpolated, clamped or converted. */
  readonly notes: readonly string[];
}

export interface DenseJetValidityInput {
  /** Discharge angle above horizontal, degrees. */
  readonly angle: number;
  /** Densimetric Froude number U/√(g′d). */
  readonly froude: number;
}

/** A published dataset, as the length-scale method sees it. */
export interface DenseJetDataset {
  /** Stable identifier, kebab-case, e.g. "roberts-1997". */
  readonly id: string;
  /** Short name for notes, e.g. "Roberts, Ferrier & Daviero (1997)". */
  readonly label: string;
  /** Citation with the provenance of the numbers, shown as the result's `source`. */
  readonly source: string;
  /** Discharge angles studied, degrees [low, high]. */
  readonly angleRange: readonly [number, number];
  /** Densimetric Froude numbers studied [low, high]. */
  readonly froudeRange: readonly [number, number];
  /** Coefficients at `angle` (clamped to `angleRange`), or null when the dataset cannot be used there. */
  coefficientsAtAngle(angle: number): DenseJetCoefficients | null;
  /** Structured range checks; never throws. */
  validityIssues(input: DenseJetValidityInput): ResultWarning[];
}

export interface AngleInterpolation {
  readonly value: number;
  /** Tabulated angles bracketing the request (equal when the request hits a tabulated angle). */
  readonly bracket: readonly [number, number];
  readonly interpolated: boolean;
}

/**
 * Linear interpolation of a coefficient in discharge angle between the two tabulated angles that bracket
 * `angle`. Returns null outside the tabulated range: callers clamp and warn, never extrapolate silently.
 */
export function interpolateAngleTable(table: readonly AngleTablePoint[], angle: number): AngleInterpolation | null {
  if (table.length === 0 || !Number.isFinite(angle)) return null;
  const first = table[0];
  const last = table[table.length - 1];
  if (angle < first.angle || angle > last.angle) return null;
  for (let i = 0; i < table.length; i++) {
    const p = table[i];
    if (angle === p.angle) return { value: p.value.value, bracket: [p.angle, p.angle], interpolated: false };
    const q = table[i + 1];
    if (q && angle > p.angle && angle < q.angle) {
      const t = (angle - p.angle) / (q.angle - p.angle);
      const value = p.value.value + t * (q.value.value - p.value.value);
      return { value, bracket: [p.angle, q.angle], interpolated: true };
    }
  }
  return null; // unreachable for an ascending table; kept so a malformed table yields "no value", not NaN
}

/** Clamps an angle to a studied range, degrees. */
export function clampAngle(angle: number, range: readonly [number, number]): number {
  return Math.min(range[1], Math.max(range[0], angle));
}
