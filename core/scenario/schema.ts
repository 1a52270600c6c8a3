/**
 * The `brinefield-scenario` file format, version 1, as a zod schema. The raw file may write any
 * quantity as a number in SI or as a string with a unit; this schema converts to SI and bounds every
 * value. Cross-field rules live in `normalise.ts`. The JSON Schema export (input side) is written to
 * core/scenario/scenario.schema.json by `brinefield schema` and checked in tests.
 */
import { z } from "zod";
import { quantity, count, fraction, text, salinityExpectation } from "./fields";
import { FIELD_BOUNDS, type BoundedPath } from "./bounds";
import { matchPracticalSalinity, matchTds, quantityToSI } from "../units";
import { recordSchema, timeComplianceSchema, intakeSchema } from "../record/schema";

export const SCENARIO_FORMAT = "brinefield-scenario";
export const SCENARIO_VERSION = 1;

/** Salinity with its basis: g/kg Absolute Salinity, practical salinity (psu) or TDS (mg/L). */
export type SalinityValue = {
  readonly basis: "absolute" | "practical" | "tds";
  readonly value: number;
  readonly raw: unknown;
};

export function salinity(min: number, max: number, what = "salinity") {
  const expectation = salinityExpectation(min, max, what);
  return z
    .union([z.number(), z.string()], { error: () => expectation })
    .meta({
      description: `${what}: number in g/kg (Absolute Salinity), or a string in g/kg, psu (practical) or mg/L (TDS)`,
    })
    .transform((raw, ctx): SalinityValue => {
      const sp = matchPracticalSalinity(raw);
      if (sp !== null) {
        if (!(sp >= 0 && sp <= max)) ctx.addIssue({ code: "custom", message: expectation });
        return { basis: "practical", value: sp, raw };
      }
      const tds = matchTds(raw);
      if (tds !== null) {
        if (!(tds >= 0 && tds <= max * 1200)) ctx.addIssue({ code: "custom", message: expectation });
        return { basis: "tds", value: tds, raw };
      }
      const q = quantityToSI(raw, "salinity");
      if (!q.ok) {
        ctx.addIssue({ code: "custom", message: `${q.message}; ${expectation}` });
        return z.NEVER;
      }
      if (!(q.value >= min && q.value <= max)) ctx.addIssue({ code: "custom", message: expectation });
      return { basis: "absolute", value: q.value, raw };
    });
}

/** A field built from its one declaration in bounds.ts. */
function bounded<P extends BoundedPath>(path: P) {
  const b = FIELD_BOUNDS[path];
  return quantity(b.kind, b, b.what);
}

const temperature = (what = "temperature") => quantity("temperature", { min: -2, max: 60 }, what);
const azimuth = (what: string) => quantity("angle", { min: 0, max: 360 }, what);

const profilePoint = z.strictObject({
  depth: quantity("length", { min: 0, max: 1000 }, "depth below the surface"),
  salinity: salinity(0, 80, "ambient salinity"),
  temperature: temperature("ambient temperature"),
});

const blendStream = z.strictObject({
  name: text("stream name", 80),
  flow: quantity("flow", { min: 0, max: 100 }, "blending flow"),
  salinity: salinity(0, 160, "blending salinity"),
  temperature: temperature("blending temperature"),
});

const plant = z.strictObject({
  productFlow: quantity("flow", { min: 0, max: 50, exclusiveMin: true }, "product-water flow"),
  recovery: fraction(0, 0.9, "recovery ratio", true),
  feedSalinity: salinity(0, 80, "feed salinity"),
  saltRejection: fraction(0, 1, "salt rejection").optional(),
  feedTemperature: temperature("feed temperature").optional(),
  blending: z
    .array(blendStream)
    .max(20, { error: () => "must list at most 20 blending streams" })
    .optional(),
  blendRatio: quantity(
    FIELD_BOUNDS["plant.blendRatio"].kind,
    FIELD_BOUNDS["plant.blendRatio"],
    FIELD_BOUNDS["plant.blendRatio"].what,
  ).optional(),
});

const constituent = z.strictObject({
  name: text("constituent name", 60),
  concentration: z
    .number({ error: () => "must be a number in the constituent's unit" })
    .min(0, { error: () => "must not be negative" })
    .max(1e9, { error: () => "is implausibly large (over 1e9)" }),
  unit: text("unit of the concentration, e.g. mg/L", 20),
  background: z
    .number({ error: () => "must be a number in the constituent's unit" })
    .min(0, { error: () => "must not be negative" })
    .max(1e9)
    .optional(),
});

const discharge = z.strictObject({
  flow: bounded("discharge.flow").optional(),
  salinity: salinity(
    FIELD_BOUNDS["discharge.salinity"].min,
    FIELD_BOUNDS["discharge.salinity"].max,
    FIELD_BOUNDS["discharge.salinity"].what,
  ).optional(),
  temperature: bounded("discharge.temperature").optional(),
  constituents: z
    .array(constituent)
    .max(50, { error: () => "must list at most 50 constituents" })
    .optional(),
});

const ambientFields = {
  depth: bounded("ambient.depth"),
  salinity: salinity(
    FIELD_BOUNDS["ambient.salinity"].min,
    FIELD_BOUNDS["ambient.salinity"].max,
    FIELD_BOUNDS["ambient.salinity"].what,
  ).optional(),
  temperature: bounded("ambient.temperature").optional(),
  profile: z
    .array(profilePoint)
    .min(1, { error: () => "must have at least one point" })
    .max(500, { error: () => "must have at most 500 points" })
    .optional(),
  currentSpeed: bounded("ambient.currentSpeed").optional(),
  currentDirection: bounded("ambient.currentDirection").optional(),
  bedSlope: fraction(
    FIELD_BOUNDS["ambient.bedSlope"].min,
    FIELD_BOUNDS["ambient.bedSlope"].max,
    FIELD_BOUNDS["ambient.bedSlope"].what,
  ).optional(),
  bedSlopeAzimuth: bounded("ambient.bedSlopeAzimuth").optional(),
};

/**
 * Enclosed water: the basin volume with its flushing time or its exchange flow (one of the two).
 * Bounds: from a small harbour (1,000 m³) to a large lagoon (1e12 m³); a flushing time from an hour to
 * ten years; an exchange flow up to 1e6 m³/s (plausibility bounds, no source).
 */
const basin = z
  .strictObject({
    volume: quantity("volume", { min: 1e3, max: 1e12 }, "basin volume"),
    flushingTime: quantity("time", { min: 3600, max: 3.2e8 }, "flushing time").optional(),
    exchangeFlow: quantity("flow", { min: 0, max: 1e6, exclusiveMin: true }, "exchange flow").optional(),
  })
  .meta({
    description:
      "Enclosed water: {volume, flushingTime} or {volume, exchangeFlow}; a well-mixed box model raises the background",
  });

const ambient = z.strictObject({
  ...ambientFields,
  basin: basin.optional(),
  record: recordSchema({
    currentSpeed: bounded("ambient.currentSpeed"),
    currentDirection: bounded("ambient.currentDirection"),
    depth: bounded("ambient.depth"),
    salinity: salinity(
      FIELD_BOUNDS["ambient.salinity"].min,
      FIELD_BOUNDS["ambient.salinity"].max,
      FIELD_BOUNDS["ambient.salinity"].what,
    ),
    temperature: bounded("ambient.temperature"),
  }).optional(),
});

const ambientCase = z.strictObject({
  name: text("case name", 80),
  weight: z
    .number({ error: () => "must be a number" })
    .min(0, { error: () => "must not be negative" })
    .max(1e6)
    .optional(),
  depth: ambientFields.depth.optional(),
  salinity: ambientFields.salinity,
  temperature: ambientFields.temperature,
  profile: ambientFields.profile,
  currentSpeed: ambientFields.currentSpeed,
  currentDirection: ambientFields.currentDirection,
});

const risers = z.strictObject({
  count: count(1, 200, "risers"),
  portsPerRiser: count(1, 12, "ports per riser"),
  spacing: quantity("length", { min: 0, max: 1000, exclusiveMin: true }, "riser spacing").optional(),
  portAzimuths: z.array(azimuth("port azimuth")).max(12).optional(),
});

const diffuser = z.strictObject({
  layout: z.enum(["single", "line", "rosette"], { error: () => 'must be "single", "line" or "rosette"' }).optional(),
  portCount: count(
    FIELD_BOUNDS["diffuser.portCount"].min,
    FIELD_BOUNDS["diffuser.portCount"].max,
    FIELD_BOUNDS["diffuser.portCount"].what,
  ).optional(),
  portDiameter: bounded("diffuser.portDiameter"),
  contraction: fraction(0.5, 1, "contraction coefficient (effective/nominal area)").optional(),
  portAngle: bounded("diffuser.portAngle"),
  portHeight: bounded("diffuser.portHeight"),
  portSpacing: bounded("diffuser.portSpacing").optional(),
  portAzimuth: bounded("diffuser.portAzimuth").optional(),
  diffuserAzimuth: bounded("diffuser.diffuserAzimuth").optional(),
  length: bounded("diffuser.length").optional(),
  flowSplit: z
    .array(
      z
        .number({ error: () => "must be a number" })
        .min(0, { error: () => "must not be negative" })
        .max(1e6),
    )
    .max(1000)
    .optional(),
  dischargeCoefficient: fraction(0.3, 1, "port discharge coefficient").optional(),
  risers: risers.optional(),
});

const limit = z.strictObject({
  constituent: text("constituent (salinity, temperature or a listed constituent name)", 60),
  maxIncrease: z
    .union([z.number(), z.string()], { error: () => "must be a number or a string with a unit" })
    .optional(),
  maxConcentration: z
    .union([z.number(), z.string()], { error: () => "must be a number or a string with a unit" })
    .optional(),
  unit: text("unit of the limit", 20).optional(),
  background: z.union([z.number(), z.string()], { error: () => "must be a number or a string with a unit" }).optional(),
  basis: text("where the limit comes from", 2000).optional(),
});

const mixingZone = z.strictObject({
  radius: bounded("mixingZone.radius"),
  limits: z
    .array(limit)
    .min(1, { error: () => "must list at least one limit (salinity at least)" })
    .max(50),
  timeCompliance: timeComplianceSchema.optional(),
});

const options = z.strictObject({
  nearFieldForEdge: z
    .enum(["conservative", "length-scale", "integral"], {
      error: () => 'must be "conservative", "length-scale" or "integral"',
    })
    .optional(),
  farField: z
    .enum(["conservative", "gravity-current", "passive-diffusion"], {
      error: () => 'must be "conservative", "gravity-current" or "passive-diffusion"',
    })
    .optional(),
  addSlackWater: z.boolean({ error: () => "must be true or false" }).optional(),
});

export const UNCERTAIN_PATHS = [
  "ambient.currentSpeed",
  "ambient.currentDirection",
  "ambient.salinity",
  "ambient.temperature",
  "ambient.depth",
  "discharge.salinity",
  "discharge.temperature",
  "discharge.flow",
] as const;

const uncertainInput = z.strictObject({
  path: z.enum(UNCERTAIN_PATHS, { error: () => `must be one of ${UNCERTAIN_PATHS.join(", ")}` }),
  distribution: z.enum(["normal", "uniform", "lognormal", "triangular"], {
    error: () => 'must be "normal", "uniform", "lognormal" or "triangular"',
  }),
  mean: z.number().optional(),
  sd: z.number().min(0).optional(),
  min: z.number().optional(),
  max: z.number().optional(),
  mode: z.number().optional(),
  median: z.number().positive().optional(),
  gsd: z.number().min(1).optional(),
});

export const scenarioFileSchema = z
  .strictObject({
    $schema: z.string().optional(),
    format: z.literal(SCENARIO_FORMAT, { error: () => `must be "${SCENARIO_FORMAT}"` }),
    version: z.literal(SCENARIO_VERSION, { error: () => `must be ${SCENARIO_VERSION}` }),
    name: text("scenario name", 200),
    description: z.string().max(5000).optional(),
    discharge: discharge.optional(),
    plant: plant.optional(),
    ambient,
    ambientCases: z
      .array(ambientCase)
      .max(50, { error: () => "must list at most 50 cases" })
      .optional(),
    diffuser,
    mixingZone,
    options: options.optional(),
    intake: intakeSchema.optional(),
    uncertainty: z.strictObject({ inputs: z.array(uncertainInput).max(20) }).optional(),
    /** Design-search constraints, read by `brinefield design`; free-form here, validated there. */
    design: z.record(z.string(), z.unknown()).optional(),
    notes: z.string().max(20000).optional(),
  })
  .meta({ title: "Brinefield scenario", description: "A brine outfall screening scenario (format version 1)." });

export type ScenarioFileParsed = z.output<typeof scenarioFileSchema>;
export type ScenarioFile = z.input<typeof scenarioFileSchema>;

/** The JSON Schema of the file format (input side: what a user writes). */
export function scenarioJsonSchema(): unknown {
  return z.toJSONSchema(scenarioFileSchema, { io: "input", unrepresentable: "any", target: "draft-2020-12" });
}
