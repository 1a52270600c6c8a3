/**
 * Zod building blocks for scenario fields. A quantity field accepts a plain number (SI) or a string
 * with a unit; it is converted to SI with mathjs and checked against bounds. Messages state the value
 * given and what is expected; the path is added by the reader (core/scenario/parse.ts).
 */
import { z } from "zod";
import { quantityToSI, siLabel, QUANTITY_KINDS, type QuantityKind } from "../units";
import type { FieldBounds } from "./bounds";

export interface Bounds {
  readonly min: number;
  readonly max: number;
  /** When true the minimum itself is not allowed (e.g. a flow must be > 0). */
  readonly exclusiveMin?: boolean;
}

const EXAMPLES: Record<QuantityKind, string> = {
  length: `e.g. 12 or "40 ft"`,
  smallLength: `e.g. 0.2 or "8 in"`,
  flow: `e.g. 0.5 or "12 MGD"`,
  speed: `e.g. 0.1 or "0.2 knot"`,
  salinity: `e.g. 68 or "68 g/kg"`,
  temperature: `e.g. 20 or "20 degC"`,
  angle: `e.g. 60 or "60 deg"`,
  area: `e.g. 10 or "100 ft^2"`,
  density: `e.g. 1025`,
  acceleration: `e.g. 0.3`,
  ratio: `e.g. 0.45 or "45 %"`,
  volume: `e.g. 2e8 or "0.2 km^3"`,
  time: `e.g. 864000 or "10 days"`,
};

/** "a" or "an" before a word, for readable messages. */
export function article(word: string): string {
  return /^[aeiou]/i.test(word) ? `an ${word}` : `a ${word}`;
}

function describeRange(kind: QuantityKind, b: Bounds, what: string): string {
  const unit = siLabel(kind);
  const u = unit === "(dimensionless)" ? "" : ` ${unit}`;
  if (b.exclusiveMin && b.min === 0) return `must be a positive ${what} up to ${b.max}${u} (${EXAMPLES[kind]})`;
  return `must be ${article(what)} from ${b.min} to ${b.max}${u} (${EXAMPLES[kind]})`;
}

/** A physical quantity: number in SI or "value unit" string; converted and range-checked. */
export function quantity(kind: QuantityKind, bounds: Bounds, what: string = QUANTITY_KINDS[kind].label) {
  const expectation = describeRange(kind, bounds, what);
  return z
    .union([z.number(), z.string()], { error: () => expectation })
    .meta({ description: `${what} in ${siLabel(kind)} (number) or a string with a unit, ${EXAMPLES[kind]}` })
    .transform((raw, ctx) => {
      const parsed = quantityToSI(raw, kind);
      if (!parsed.ok) {
        ctx.addIssue({ code: "custom", message: `${parsed.message}; ${expectation}` });
        return z.NEVER;
      }
      const v = parsed.value;
      const belowMin = bounds.exclusiveMin ? v <= bounds.min : v < bounds.min;
      if (belowMin || v > bounds.max) {
        ctx.addIssue({ code: "custom", message: expectation });
        return z.NEVER;
      }
      return v;
    });
}

function countExpectation(min: number, max: number, what: string): string {
  return `must be a whole number of ${what} from ${min} to ${max}`;
}

function fractionExpectation(min: number, max: number, what: string, exclusiveMin: boolean): string {
  return `must be a ${what} (a fraction) ${exclusiveMin ? "greater than" : "from"} ${min} ${exclusiveMin ? "and at most" : "to"} ${max}, e.g. 0.45 or "45 %"`;
}

export function salinityExpectation(min: number, max: number, what: string): string {
  return `must be ${article(what)} from ${min} to ${max} g/kg Absolute Salinity (e.g. 68, "68 g/kg", "36 psu" or "40000 mg/L")`;
}

/**
 * What a bounded field expects, word for word as the file reader says it: the scenario rules use it
 * so that a value out of bounds from any path (sweep, study, Monte Carlo, design) reads like `run`.
 */
export function expectationFor(b: FieldBounds): string {
  switch (b.form) {
    case "quantity":
      return describeRange(b.kind, b, b.what);
    case "salinity":
      return salinityExpectation(b.min, b.max, b.what);
    case "count":
      return countExpectation(b.min, b.max, b.what);
    case "fraction":
      return fractionExpectation(b.min, b.max, b.what, b.exclusiveMin ?? false);
  }
}

/** A whole number within bounds (port counts and the like). */
export function count(min: number, max: number, what: string) {
  const expectation = countExpectation(min, max, what);
  return z
    .number({ error: () => expectation })
    .int({ error: () => expectation })
    .min(min, { error: () => expectation })
    .max(max, { error: () => expectation });
}

/** A dimensionless fraction: a number (0.45) or a percentage string ("45 %"). */
export function fraction(min: number, max: number, what: string, exclusiveMin = false) {
  const expectation = fractionExpectation(min, max, what, exclusiveMin);
  return z
    .union([z.number(), z.string()], { error: () => expectation })
    .meta({ description: `${what}: a fraction (number) or a percentage string such as "45 %"` })
    .transform((raw, ctx) => {
      const parsed = quantityToSI(raw, "ratio");
      if (!parsed.ok) {
        ctx.addIssue({
          code: "custom",
          message: typeof raw === "string" ? `${parsed.message}; ${expectation}` : expectation,
        });
        return z.NEVER;
      }
      const v = parsed.value;
      if (!(Number.isFinite(v) && (exclusiveMin ? v > min : v >= min) && v <= max)) {
        ctx.addIssue({ code: "custom", message: expectation });
        return z.NEVER;
      }
      return v;
    });
}

export function text(what: string, max = 200) {
  return z
    .string({ error: () => `must be text (${what})` })
    .min(1, { error: () => `must not be empty (${what})` })
    .max(max, { error: () => `must be at most ${max} characters (${what})` });
}
