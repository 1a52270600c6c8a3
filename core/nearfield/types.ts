/**
 * Inputs and outputs shared by the near-field methods. Everything in SI.
 * Frame: origin at the port centre, x east, y north, z up. Azimuths clockwise from north.
 */
import type { ResultWarning } from "../warnings";
import type { RisingField } from "../rising/types";

/** Ambient water column as seen by a jet: density, salinity and temperature by depth. */
export interface AmbientColumn {
  /** Total water depth at the diffuser, m. */
  readonly depth: number;
  /** Depths below surface, m, ascending (at least two points). */
  readonly depths: readonly number[];
  /**
   * Potential density at each depth referenced to the port's pressure, kg/m³ (same equation of state as
   * the discharge), so a uniform column is neutral and the jet's buoyancy compares like with like.
   */
  readonly densities: readonly number[];
  readonly salinities: readonly number[]; // g/kg
  readonly temperatures: readonly number[]; // °C
  readonly currentSpeed: number; // m/s
  readonly currentDirection: number; // degrees clockwise from north, direction flowed toward
}

/** One round jet (a single port, or a merged group represented by an equivalent port). */
export interface JetSource {
  readonly diameter: number; // m, effective
  readonly flow: number; // m³/s
  readonly velocity: number; // m/s
  readonly density: number; // kg/m³ of the discharge
  readonly salinity: number; // g/kg
  readonly temperature: number; // °C
  readonly angle: number; // degrees above horizontal
  readonly azimuth: number; // degrees clockwise from north
  readonly portHeight: number; // m above seabed
  /** Reduced gravity at the port g(ρ0 − ρa)/ρa, m/s² (positive for a dense jet). */
  readonly reducedGravity: number;
  /** Densimetric Froude number U/√(g′d). */
  readonly froude: number;
}

export interface PathPoint {
  readonly s: number; // m along the centreline
  readonly x: number; // m east of the port
  readonly y: number; // m north of the port
  readonly z: number; // m above the port
  readonly halfWidth: number; // m (velocity half-width, e-folding or top-hat as documented by the method)
  readonly dilution: number; // centreline (minimum) dilution
}

export type NearFieldMethodName = "length-scale" | "integral";

/** The numbers every near-field estimate gives (null where it gives none). */
export interface NearFieldNumbers {
  /** Upper edge of the jet above the port, m. */
  readonly maxRiseHeight: number | null;
  /** Plan distance from the port to the point of maximum rise, m. */
  readonly maxRiseDistance: number | null;
  /** Plan distance where the centreline is back at port level, m. */
  readonly returnDistance: number | null;
  /** Plan distance where the centreline reaches the seabed, m. */
  readonly impactDistance: number | null;
  /** Centreline dilution at impact. */
  readonly impactDilution: number | null;
  /** Plan distance to the end of the near field, m. */
  readonly nearFieldDistance: number | null;
  readonly nearFieldDilution: number | null;
}

export interface NearFieldVariant extends NearFieldNumbers {
  readonly source: string;
  readonly note?: string;
}

export interface NearFieldEvent {
  readonly kind:
    | "max-rise"
    | "return-to-port-level"
    | "seabed-contact"
    | "surface-contact"
    | "centreline-impact"
    | "passive-layer"
    | "step-limit"
    | "length-limit"
    | "trapped"
    | "neutral-buoyancy";
  readonly s: number;
  readonly x: number;
  readonly y: number;
  readonly z: number;
  readonly dilution: number;
}

/** One method's result, the shape promised under `nearField` in the result contract. */
export interface NearFieldMethodResult extends NearFieldNumbers {
  readonly method: NearFieldMethodName;
  readonly source: string;
  /** False when the method does not cover the case (its numbers are then null). */
  readonly available: boolean;
  /** Why the method does not cover the case; null when available. */
  readonly notAvailableReason: string | null;
  /** Dilution at maximum rise (centreline), where the method gives it. */
  readonly maxRiseDilution?: number | null;
  /**
   * Flux-averaged (volume-flux) dilutions beside the centreline ones: the spreading layer is handed the
   * volume flux. `fluxAveragingFactor` = flux-averaged ÷ centreline dilution used (one basis for both methods).
   */
  readonly impactDilutionFluxAveraged?: number | null;
  readonly nearFieldDilutionFluxAveraged?: number | null;
  readonly fluxAveragingFactor?: number | null;
  /** [low, high] centreline impact dilution from the method's published scatter or documented bias. */
  readonly dilutionRange: readonly [number, number] | null;
  /** Entrained seawater flow at impact, Q₀ × (flux-averaged impact dilution − 1), m³/s (per port or group). */
  readonly entrainedFlow: number | null;
  /** Plain statement of the method's known bias, shown in results and the report. */
  readonly bias: string;
  readonly warnings: readonly ResultWarning[];
  readonly variants?: readonly NearFieldVariant[];
  /** Integral method only: the centreline path. */
  readonly path?: readonly PathPoint[];
  readonly events?: readonly NearFieldEvent[];
  /** Whether the numbers were interpolated between tabulated angles, etc. */
  readonly notes?: readonly string[];
  /** Rising discharges only: where the plume spreads (surface or trap level) and its dilution there. */
  readonly risingField?: RisingField;
}

/** Receiver of integral-model samples (chart arrays, 3D buffers, CSV) without core knowing which. */
export interface PathSink {
  begin(capacityHint: number): void;
  sample(s: number, x: number, y: number, z: number, halfWidth: number, dilution: number): void;
  end(): void;
}

/** The headline numbers every near-field method reports (null where a method has none). */
export const NEAR_FIELD_HEADLINE_FIELDS = [
  "maxRiseHeight",
  "maxRiseDistance",
  "returnDistance",
  "impactDistance",
  "impactDilution",
  "nearFieldDistance",
  "nearFieldDilution",
  "maxRiseDilution",
] as const;
export type NearFieldHeadlineField = (typeof NEAR_FIELD_HEADLINE_FIELDS)[number];

/** Every headline field, null. */
export function emptyNearFieldHeadline(): Record<NearFieldHeadlineField, number | null> {
  // Written out (in NEAR_FIELD_HEADLINE_FIELDS order): a literal has one fixed shape; this runs in every study case.
  return {
    maxRiseHeight: null,
    maxRiseDistance: null,
    returnDistance: null,
    impactDistance: null,
    impactDilution: null,
    nearFieldDistance: null,
    nearFieldDilution: null,
    maxRiseDilution: null,
  };
}

/**
 * A method's result with every number null (inputs it cannot run with, so "not available"), to be
 * completed by the caller. `reason` says why (default: the bias text).
 */
export function nullNearFieldResult(
  method: NearFieldMethodName,
  source: string,
  bias: string,
  warnings: readonly ResultWarning[],
  reason?: string,
): NearFieldMethodResult {
  return {
    method,
    source,
    available: false,
    notAvailableReason: reason ?? bias,
    ...(emptyNearFieldHeadline() as Record<NearFieldHeadlineField, null>),
    dilutionRange: null,
    impactDilutionFluxAveraged: null,
    nearFieldDilutionFluxAveraged: null,
    fluxAveragingFactor: null,
    entrainedFlow: null,
    bias,
    warnings,
  };
}
