/**
 * The `brinefield-study` file format, version 1: a base scenario (inline, or a path relative to the
 * study file) and named variants, each a set of overrides written like scenario fields
 * (`"ambient.depth": "12 m"`, `"diffuser.portCount": 6`), plus an optional sweep. Variants are applied
 * to the RAW scenario and re-read by the scenario parser, so units, defaults and ambient-case
 * inheritance behave exactly as in a scenario file. The JSON Schema is core/study/study.schema.json.
 */
import { z } from "zod";

export const STUDY_FORMAT = "brinefield-study";
export const STUDY_VERSION = 1;

const name = (what: string) =>
  z
    .string({ error: () => `must be text (${what})` })
    .min(1, { error: () => `must not be empty (${what})` })
    .max(200, { error: () => `must be at most 200 characters (${what})` });

const overridePath = z.string().regex(/^[A-Za-z][A-Za-z0-9]*(\.([A-Za-z][A-Za-z0-9]*|\d+))+$/, {
  error: () => 'must be a dotted scenario path such as "ambient.depth" or "diffuser.portCount"',
});

const overrideValue = z.union(
  [z.number(), z.string(), z.boolean(), z.array(z.unknown()), z.record(z.string(), z.unknown())],
  { error: () => "must be a number, a string with a unit, true/false, a list or an object" },
);

const variant = z.strictObject({
  name: name("variant name"),
  description: z.string().max(2000).optional(),
  overrides: z.record(overridePath, overrideValue, { error: () => "must be an object of path: value pairs" }),
});

const sweepAxis = z.strictObject({
  path: z.string({ error: () => 'must be a scenario path such as "ambient.currentSpeed"' }),
  from: z.union([z.number(), z.string()], { error: () => "must be a number (SI) or a string with a unit" }),
  to: z.union([z.number(), z.string()], { error: () => "must be a number (SI) or a string with a unit" }),
  steps: z
    .number({ error: () => "must be a whole number of steps" })
    .int({ error: () => "must be a whole number of steps" })
    .min(1, { error: () => "must be at least 1" })
    .max(500, { error: () => "must be at most 500" }),
});

const RESERVED = '"base" is reserved for the unmodified scenario';

export const studyFileSchema = z
  .strictObject({
    $schema: z.string().optional(),
    format: z.literal(STUDY_FORMAT, { error: () => `must be "${STUDY_FORMAT}"` }),
    version: z.literal(STUDY_VERSION, { error: () => `must be ${STUDY_VERSION}` }),
    name: name("study name"),
    description: z.string().max(5000).optional(),
    base: z.union([z.string().min(1), z.record(z.string(), z.unknown())], {
      error: () => "must be a scenario object or the path of a scenario file relative to the study",
    }),
    variants: z
      .array(variant, { error: () => "must be a list of variants" })
      .max(500, { error: () => "must list at most 500 variants" })
      .optional(),
    sweep: z
      .strictObject({
        vary: z
          .array(sweepAxis)
          .min(1, { error: () => "must vary one or two inputs" })
          .max(2, { error: () => "must vary one or two inputs" }),
      })
      .optional(),
  })
  .superRefine((s, ctx) => {
    const seen = new Set<string>();
    (s.variants ?? []).forEach((v, i) => {
      if (v.name === "base" || seen.has(v.name)) {
        ctx.addIssue({
          code: "custom",
          path: ["variants", i, "name"],
          message: v.name === "base" ? RESERVED : `"${v.name}" is used twice`,
        });
      }
      seen.add(v.name);
    });
  })
  .meta({
    title: "Brinefield study",
    description: "Variants and sweeps of a Brinefield scenario (format version 1).",
  });

export type StudyFile = z.output<typeof studyFileSchema>;

export interface StudyIssue {
  /** Dotted path in the study file, e.g. "variants.2.overrides". */
  readonly path: string;
  readonly message: string;
}

export function parseStudy(raw: unknown): { ok: true; study: StudyFile } | { ok: false; issues: StudyIssue[] } {
  const r = studyFileSchema.safeParse(raw);
  if (r.success) return { ok: true, study: r.data };
  return {
    ok: false,
    issues: r.error.issues.map((i) => {
      const path = i.path.map(String).join(".") || "(study)";
      return { path, message: `${path}: ${i.message}` };
    }),
  };
}

/** The JSON Schema of the study format (input side). */
export function studyJsonSchema(): unknown {
  return z.toJSONSchema(studyFileSchema, { io: "input", unrepresentable: "any", target: "draft-2020-12" });
}
