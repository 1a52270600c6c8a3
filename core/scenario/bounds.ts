/**
 * Bounds of the scenario's single-valued fields, declared once. The zod schema (schema.ts) builds these
 * fields from this table, the study override table (core/study/overrides.ts) is derived from it, and
 * the scenario rules (rules.ts) check every normalised scenario against it — whether the scenario came
 * from a file, an edit in the app, a sweep, a study variant, a Monte Carlo draw or a design candidate —
 * with the same message as the file reader.
 */
import type { QuantityKind } from "../units";

export interface FieldBounds {
  /** How the field is written: a quantity with a unit, a salinity (g/kg, psu, mg/L), a whole count or a plain fraction. */
  readonly form: "quantity" | "salinity" | "count" | "fraction";
  readonly kind: QuantityKind;
  /** Words for the field in messages, e.g. "water depth". */
  readonly what: string;
  readonly min: number;
  readonly max: number;
  /** When true the minimum itself is not allowed (e.g. a flow must be > 0). */
  readonly exclusiveMin?: boolean;
  readonly integer?: boolean;
}

const q = (kind: QuantityKind, what: string, min: number, max: number, exclusiveMin = false): FieldBounds => ({
  form: "quantity",
  kind,
  what,
  min,
  max,
  ...(exclusiveMin ? { exclusiveMin } : {}),
});

/** Every single-valued field whose bounds are shared, by its dotted path in the scenario file (SI values). */
export const FIELD_BOUNDS = Object.freeze({
  "ambient.depth": q("length", "water depth", 0, 1000, true),
  "ambient.salinity": { form: "salinity", kind: "salinity", what: "ambient salinity", min: 0, max: 80 },
  "ambient.temperature": q("temperature", "ambient temperature", -2, 60),
  "ambient.currentSpeed": q("speed", "current speed", 0, 5),
  "ambient.currentDirection": q("angle", "current direction", 0, 360),
  "ambient.bedSlope": { form: "fraction", kind: "ratio", what: "bed slope (rise over run)", min: 0, max: 0.5 },
  "ambient.bedSlopeAzimuth": q("angle", "downslope direction", 0, 360),
  "discharge.flow": q("flow", "total brine flow", 0, 100, true),
  "discharge.salinity": { form: "salinity", kind: "salinity", what: "discharge salinity", min: 0, max: 160 },
  "discharge.temperature": q("temperature", "discharge temperature", -2, 60),
  "diffuser.portCount": { form: "count", kind: "ratio", what: "ports", min: 1, max: 1000, integer: true },
  "diffuser.portDiameter": q("smallLength", "port diameter", 0.005, 3),
  "diffuser.portAngle": q("angle", "port angle above horizontal", 0, 90),
  "diffuser.portHeight": q("length", "port height above the seabed", 0, 100),
  "diffuser.portSpacing": q("length", "port spacing", 0, 1000, true),
  "diffuser.portAzimuth": q("angle", "port azimuth", 0, 360),
  "diffuser.diffuserAzimuth": q("angle", "diffuser axis azimuth", 0, 360),
  "diffuser.length": q("length", "diffuser length", 0, 10000),
  "mixingZone.radius": q("length", "mixing-zone radius", 0, 20000, true),
  // Total blending flow ÷ brine flow; 100 parts of blending water per part of brine is far beyond practice.
  "plant.blendRatio": q("ratio", "blend ratio (total blending flow ÷ brine flow)", 0, 100),
} satisfies Record<string, FieldBounds>);

export type BoundedPath = keyof typeof FIELD_BOUNDS;

/** The bounds of a path, looked up as an own key of the fixed table only (never the prototype chain). */
export function fieldBounds(path: string): FieldBounds | undefined {
  return Object.prototype.hasOwnProperty.call(FIELD_BOUNDS, path)
    ? (FIELD_BOUNDS as Record<string, FieldBounds>)[path]
    : undefined;
}

/** True when `value` lies within the bounds (whole numbers for counts). */
export function withinBounds(b: FieldBounds, value: number): boolean {
  if (!Number.isFinite(value)) return false;
  if (b.integer && !Number.isInteger(value)) return false;
  const low = b.exclusiveMin ? value <= b.min : value < b.min;
  return !low && value <= b.max;
}
