/**
 * Part of normalising a scenario (normalise.ts): concentration limits written as numbers or as strings
 * with units, converted to the constituent's unit and checked the same way whichever way they were written.
 */
import { absoluteSalinityFromPractical } from "../properties";
import { convertUnit, formatNumber } from "../units";
import { issue, type NormaliseContext as Ctx } from "./issue";
import type { ConstituentInput, LimitInput } from "./types";
import type { ScenarioFileParsed } from "./schema";

/** Which value of a limit is read: the allowed increase, the allowed concentration or the background. */
type LimitField = "maxIncrease" | "maxConcentration" | "background";

/** Number-like text that is not a plain decimal (hex, octal, binary): refused rather than guessed. */
const NON_DECIMAL = /^\s*[-+]?0[xob]/i;

/**
 * A limit value, written as a number or as a string with a unit, converted to the constituent's unit and
 * then put through the same finite, sign and range checks whichever way it was written.
 */
export function parseLimitValue(
  raw: number | string | undefined,
  constituent: string,
  unit: string,
  field: LimitField,
  path: string,
  ctx: Ctx,
): number | undefined {
  if (raw === undefined) return undefined;
  const value = limitValueInUnit(raw, constituent, unit, field === "maxIncrease", path, ctx);
  if (value === undefined) return undefined;
  const problem = limitValueProblem(value, constituent, unit, field);
  if (problem) {
    ctx.issues.push(issue(path, raw, problem));
    return undefined;
  }
  return value;
}

/** Null when the value is acceptable for the field, else what is expected. */
function limitValueProblem(value: number, constituent: string, unit: string, field: LimitField): string | null {
  if (!Number.isFinite(value) || Math.abs(value) > 1e9)
    return `must be a finite number (in ${unit}) of at most 1e9 in size`;
  if (field === "maxIncrease") {
    if (value === 0) return "must be a positive increase (a zero increase can never be met)";
    if (value < 0) return `must be a positive increase (in ${unit})`;
    return null;
  }
  if (constituent === "temperature") {
    // Seawater and brine temperatures: the scenario's own bounds (-2 to 60 °C); a limit may sit up to 100 °C.
    const hi = field === "background" ? 60 : 100;
    return value < -2 || value > hi ? `must be a temperature from -2 to ${hi} °C` : null;
  }
  if (field === "background") return value < 0 ? `must not be negative (a background concentration, in ${unit})` : null;
  // An absolute limit of zero or below can never be met by dilution.
  return value <= 0 ? `must be a positive concentration (in ${unit}); a limit of zero or less can never be met` : null;
}

/** A decimal number, then whatever follows it (the unit, possibly empty). */
const NUMBER_THEN_UNIT = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*(.*)$/i;

function limitValueInUnit(
  raw: number | string,
  constituent: string,
  unit: string,
  isIncrease: boolean,
  path: string,
  ctx: Ctx,
): number | undefined {
  if (typeof raw === "number") return raw;
  if (NON_DECIMAL.test(raw)) {
    ctx.issues.push(
      issue(
        path,
        raw,
        `must be a decimal number with an optional unit (in ${unit}); hex, octal and binary forms are not accepted`,
      ),
    );
    return undefined;
  }
  const m = NUMBER_THEN_UNIT.exec(raw);
  if (!m) {
    ctx.issues.push(issue(path, raw, `must be a number with an optional unit (in ${unit})`));
    return undefined;
  }
  const value = Number(m[1]);
  const u = m[2]!.trim();
  if (u === "" || u === unit) return value;
  const key = constituent.toLowerCase();
  // Practical-salinity values and increments both scale by the reference-composition factor (linear).
  if (key === "salinity" && /^(psu|pss)$/i.test(u)) return absoluteSalinityFromPractical(value);
  if (key === "salinity" && /^(g\/kg|ppt|‰)$/i.test(u)) return value;
  if (key === "temperature" && isIncrease) {
    // A temperature increase is a difference: 1 °F of difference is 5/9 K (exact).
    if (/^(degF|°F|F)$/i.test(u)) return (value * 5) / 9;
    if (/^(degC|°C|C|K)$/i.test(u)) return value;
  }
  try {
    const target = key === "temperature" ? "degC" : unit;
    const converted = convertUnit(value, u, target);
    if (Number.isFinite(converted)) {
      ctx.conversions.push(`${path}: ${raw} → ${formatNumber(converted)} ${target}`);
      return converted;
    }
  } catch {
    // fall through to the message below
  }
  ctx.issues.push(issue(path, raw, `has a unit that cannot be converted to the constituent's unit (${unit})`));
  return undefined;
}

/**
 * A limit value with the limit's `unit` attached when the value itself names none: `500` with unit "ug/L"
 * is read as "500 ug/L" and converted to the constituent's unit like any written unit.
 */
function withLimitUnit(raw: number | string | undefined, unit: string | undefined): number | string | undefined {
  if (raw === undefined || unit === undefined || unit.trim() === "") return raw;
  if (typeof raw === "number") return Number.isFinite(raw) ? `${raw} ${unit.trim()}` : raw;
  const m = NUMBER_THEN_UNIT.exec(raw);
  return m && m[2]!.trim() === "" ? `${raw.trim()} ${unit.trim()}` : raw;
}

/** The mixing zone's limits, each in its constituent's unit; problems are added to the issues. */
export function limitsFromFile(
  f: ScenarioFileParsed,
  constituents: readonly ConstituentInput[],
  ctx: Ctx,
): LimitInput[] {
  const limits: LimitInput[] = [];
  f.mixingZone.limits.forEach((l, i) => {
    const path = `mixingZone.limits.${i}`;
    const key = l.constituent.toLowerCase();
    const c = constituents.find((x) => x.name.toLowerCase() === key);
    if (key !== "salinity" && key !== "temperature" && !c) {
      ctx.issues.push(
        issue(
          `${path}.constituent`,
          l.constituent,
          `must be "salinity", "temperature" or a name listed under discharge.constituents`,
        ),
      );
      return;
    }
    const unit = key === "salinity" ? "g/kg" : key === "temperature" ? "degC" : c!.unit;
    if ((l.maxIncrease === undefined) === (l.maxConcentration === undefined)) {
      ctx.issues.push(issue(path, l.constituent, "must give exactly one of maxIncrease or maxConcentration"));
      return;
    }
    // The limit's own `unit` applies to its values that carry none (a value written with a unit keeps it).
    const inUnit = (raw: number | string | undefined) => withLimitUnit(raw, l.unit);
    const inc = parseLimitValue(inUnit(l.maxIncrease), key, unit, "maxIncrease", `${path}.maxIncrease`, ctx);
    const abs = parseLimitValue(
      inUnit(l.maxConcentration),
      key,
      unit,
      "maxConcentration",
      `${path}.maxConcentration`,
      ctx,
    );
    const bg = parseLimitValue(inUnit(l.background), key, unit, "background", `${path}.background`, ctx);
    limits.push({
      constituent: key === "salinity" || key === "temperature" ? key : c!.name,
      unit,
      ...(inc !== undefined ? { maxIncrease: inc } : {}),
      ...(abs !== undefined ? { maxConcentration: abs } : {}),
      ...(bg !== undefined ? { background: bg } : {}),
      ...(l.basis ? { basis: l.basis } : {}),
    });
  });
  return limits;
}
