/**
 * File-format pieces for records, time compliance and the intake (zod). The element schemas of the
 * record's columns are the very field schemas of the stated ambient (passed in by core/scenario/schema.ts),
 * so a value in a record is read and bounded exactly as the same value in `ambient`.
 */
import { z } from "zod";
import { quantity } from "../scenario/fields";
import { TIME_EXPECTATION } from "./time";

/** Most steps a record may hold: a year of 10-minute steps fits (52,560). */
export const MAX_RECORD_STEPS = 60000;

export function recordSchema<
  A extends z.ZodType,
  B extends z.ZodType,
  C extends z.ZodType,
  D extends z.ZodType,
  E extends z.ZodType,
>(el: { currentSpeed: A; currentDirection: B; depth: C; salinity: D; temperature: E }) {
  const column = <T extends z.ZodType>(t: T) =>
    z
      .array(t)
      .min(1, { error: () => "must list at least one value" })
      .max(MAX_RECORD_STEPS, { error: () => `must list at most ${MAX_RECORD_STEPS} steps` });
  return z.strictObject({
    time: column(z.union([z.number(), z.string()], { error: () => TIME_EXPECTATION })),
    currentSpeed: column(el.currentSpeed),
    currentDirection: column(el.currentDirection),
    depth: column(el.depth).optional(),
    salinity: column(el.salinity).optional(),
    temperature: column(el.temperature).optional(),
  });
}

export const timeComplianceSchema = z.strictObject({
  percentOfTime: z
    .number({ error: () => "must be a percentage of the record's time, greater than 0 and at most 100 (e.g. 95)" })
    .refine((v) => Number.isFinite(v) && v > 0 && v <= 100, {
      error: () => "must be a percentage of the record's time, greater than 0 and at most 100 (e.g. 95)",
    }),
});

export const intakeSchema = z.strictObject({
  distance: quantity("length", { min: 0, max: 100000 }, "intake distance from the diffuser centre"),
  bearing: quantity("angle", { min: 0, max: 360 }, "intake bearing from the diffuser centre"),
  heightAboveSeabed: quantity("length", { min: 0, max: 1000 }, "intake height above the seabed"),
  maxSalinityIncrease: quantity(
    "salinity",
    { min: 0, max: 100, exclusiveMin: true },
    "largest salinity increase allowed at the intake",
  ).optional(),
});
