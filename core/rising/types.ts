/**
 * Where a rising plume ends up: at the surface or trapped below it by the stratification, the field
 * that spreads from there, and the numbers the far field and the result need.
 */
export interface RisingField {
  /** "surface": the plume reaches the surface; "trapped": it spreads below it; "none": no result. */
  readonly kind: "surface" | "trapped" | "none";
  /** Height above the port where the field spreads (the surface, or the trap level), m. */
  readonly height: number;
  /** Centreline dilution where the field starts. */
  readonly dilution: number;
  /** Plan distance from the port to the start of the field, m. */
  readonly distance: number;
  /** Half-width of the plume where the field starts, m. */
  readonly halfWidth: number;
  /** Trap level above the port (where the plume's buoyancy vanishes), m; null when it reaches the surface. */
  readonly trapHeight: number | null;
  /** Bulk buoyancy frequency N over the water above the port, s⁻¹ (0 when unstratified). */
  readonly buoyancyFrequency: number;
}
