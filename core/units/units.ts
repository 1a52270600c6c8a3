/**
 * Units at the edge of core: strings such as "8 in", "0.5 knot", "12 MGD", "68 g/kg", "20 degC" are
 * parsed with mathjs units and converted to the SI unit of the quantity's kind. Trade units mathjs lacks
 * are defined here once. Inside core every number is SI (m, s, m³/s, g/kg, °C, degrees for angles).
 */
import { create, createUnitDependencies, unitDependencies } from "mathjs";
import { PLAIN_QUANTITY, plainConvert } from "./plain-units";

// mathjs with the trade units below, created on first use: study worker threads never parse a unit, and
// creating the instance is most of their start-up time.
let mathWithTradeUnits: ReturnType<typeof create> | null = null;

function math(): ReturnType<typeof create> {
  if (mathWithTradeUnits) return mathWithTradeUnits;
  const m = create({ createUnitDependencies, unitDependencies });
  // Trade units missing from mathjs. Definitions are exact by statute or convention.
  // MGD: million US gallons per day (US gallon = 3.785411784 L, exact).
  m.createUnit("MGD", "3785.411784 m^3/day");
  // Megalitres per day, common for Australian plant capacities.
  m.createUnit("MLD", "1000 m^3/day");
  // International knot: 1852 m per hour (exact).
  m.createUnit("knot", { definition: "1852 m/hour", aliases: ["knots", "kn", "kt"] });
  // Cubic metres per day and per hour are written as m^3/day, m^3/h; "cms" is the trade's m³/s shorthand.
  m.createUnit("cms", "1 m^3/s");
  // US cubic feet per second.
  m.createUnit("cfs", "1 ft^3/s");
  // Salinity: g/kg is a mass ratio; ppt and ‰ are treated as g/kg (a screening convention, said in notes).
  m.createUnit("ppt", "1 g/kg");
  // Density deficit or concentration units used in limits (mass per volume) are parsed natively (mg/L).
  mathWithTradeUnits = m;
  return m;
}

/** mathjs's own conversion, without the fast path of plain-units.ts: the reference that path is held to. */
export function mathjsConvert(value: number, from: string, to: string): number {
  return math().unit(value, from).toNumber(to);
}

/** mathjs's own reading of a quantity string in `to`, without the fast path (see mathjsConvert). */
export function mathjsQuantity(text: string, to: string): number {
  return math().unit(text).toNumber(to);
}

/**
 * `value` in `from` expressed in `to`, with the one units instance of core (trade units included).
 * The micro sign may be written as µ. Throws when mathjs does not know a unit or the two are not of one kind.
 */
export function convertUnit(value: number, from: string, to: string): number {
  const fromUnit = withAsciiMicro(from);
  const toUnit = withAsciiMicro(to);
  return plainConvert(value, fromUnit, toUnit) ?? math().unit(value, fromUnit).toNumber(toUnit);
}

/** The micro sign (µ, or Greek mu) written as mathjs's prefix "u": "µg/L" → "ug/L". */
function withAsciiMicro(unit: string): string {
  return unit.replace(/[\u00b5\u03bc]/g, "u");
}

/** Kinds of quantity the scenario format uses, with their SI unit and a US customary display unit. */
export const QUANTITY_KINDS = {
  length: { si: "m", us: "ft", label: "length" },
  smallLength: { si: "m", us: "in", label: "length" },
  flow: { si: "m^3/s", us: "MGD", label: "flow" },
  speed: { si: "m/s", us: "ft/s", label: "speed" },
  salinity: { si: "g/kg", us: "g/kg", label: "salinity" },
  temperature: { si: "degC", us: "degF", label: "temperature" },
  angle: { si: "deg", us: "deg", label: "angle" },
  area: { si: "m^2", us: "ft^2", label: "area" },
  density: { si: "kg/m^3", us: "kg/m^3", label: "density" },
  acceleration: { si: "m/s^2", us: "ft/s^2", label: "acceleration" },
  ratio: { si: "", us: "", label: "ratio" },
  volume: { si: "m^3", us: "ft^3", label: "volume" },
  time: { si: "s", us: "s", label: "time" },
} as const;

export type QuantityKind = keyof typeof QUANTITY_KINDS;
export type UnitSystem = "si" | "us";

/** Display symbol of a mathjs unit name. */
export function unitSymbol(unit: string): string {
  const map: Record<string, string> = {
    "m^3/s": "m³/s",
    "m^2": "m²",
    "m^3": "m³",
    "ft^3": "ft³",
    "ft^2": "ft²",
    "kg/m^3": "kg/m³",
    "m/s^2": "m/s²",
    "ft/s^2": "ft/s²",
    degC: "°C",
    degF: "°F",
    deg: "°",
  };
  return map[unit] ?? unit;
}

export type QuantityParse =
  | { readonly ok: true; readonly value: number; readonly converted: boolean; readonly note?: string }
  | { readonly ok: false; readonly message: string };

const PERCENT = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*%$/i;
const SALINITY_PRACTICAL = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*(psu|PSU|pss|PSS-78)\s*$/;
const TDS = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*(mg\/L|mg\/l|ppm)\s*$/;

/**
 * Parses a number (already SI) or a string with a unit into the SI unit of `kind`.
 * Salinity strings in psu or mg/L are NOT handled here (they need TEOS-10 and density); the scenario
 * reader does that. Returns a message naming what was expected instead of throwing.
 */
export function quantityToSI(raw: unknown, kind: QuantityKind): QuantityParse {
  if (typeof raw === "number") {
    if (!Number.isFinite(raw)) return { ok: false, message: "must be a finite number" };
    return { ok: true, value: raw, converted: false };
  }
  if (typeof raw !== "string")
    return { ok: false, message: `must be a number in ${siLabel(kind)} or a string with a unit` };
  const text = raw.trim();
  if (text === "") return { ok: false, message: "is empty" };
  // Number() and mathjs read hex, octal and binary ("0x1E"): a typo or a trick, never a quantity.
  if (/^[-+]?0[xob]/i.test(text))
    return { ok: false, message: "must be a decimal number (hex, octal and binary forms are not accepted)" };
  const plain = Number(text);
  if (Number.isFinite(plain)) return { ok: true, value: plain, converted: false };
  if (!Number.isNaN(plain)) return { ok: false, message: "is not a finite number" };
  const target = QUANTITY_KINDS[kind].si;
  if (target === "") {
    // A fraction may be written as a percentage ("45 %", "45%"): the trade states recovery that way.
    const percent = PERCENT.exec(text);
    if (percent) {
      const v = Number(percent[1]) / 100;
      return Number.isFinite(v)
        ? { ok: true, value: v, converted: true, note: `${raw} → ${formatNumber(v)}` }
        : { ok: false, message: "is not a finite number" };
    }
    return { ok: false, message: 'must be a plain number or a percentage (e.g. 0.45 or "45 %")' };
  }
  let value: number;
  const unitText = normaliseUnitText(text);
  const quantity = PLAIN_QUANTITY.exec(unitText);
  const fast = quantity ? plainConvert(parseFloat(quantity[1]!), quantity[2]!, target) : null;
  if (fast !== null) value = fast;
  else
    try {
      const u = math().unit(unitText);
      if (u.value === null || u.value === undefined) return { ok: false, message: "has a unit but no number" };
      value = u.toNumber(target);
    } catch (err) {
      const msg = err instanceof Error ? err.message : String(err);
      const unknown = /Unit "([^"]*)" not found/i.exec(msg);
      if (unknown) return { ok: false, message: `has a unit Brinefield does not know ("${unknown[1]}")` };
      return {
        ok: false,
        message: `is not a ${QUANTITY_KINDS[kind].label} (expected a unit convertible to ${unitSymbol(target)})`,
      };
    }
  if (!Number.isFinite(value)) return { ok: false, message: `is not a finite ${QUANTITY_KINDS[kind].label}` };
  return { ok: true, value, converted: true, note: `${raw} → ${formatNumber(value)} ${unitSymbol(target)}` };
}

/**
 * Accepts "°C", "°F", "‰" and the trade's ways of writing volumes and days by mapping them to mathjs
 * names: "m3/d", "m^3/d", "m³/d" → m^3/day; "ML/d" → megalitres per day; "ft3/s" → ft^3/s.
 */
export function normaliseUnitText(text: string): string {
  return text
    .replace(/°\s*C\b/g, "degC")
    .replace(/°\s*F\b/g, "degF")
    .replace(/°/g, "deg")
    .replace(/‰/g, "ppt")
    .replace(/³/g, "^3")
    .replace(/²/g, "^2")
    .replace(/\b(m|ft|cm|mm|in|yd)([23])\b/g, "$1^$2")
    .replace(/\/\s*d\b/g, "/day")
    .replace(/\/\s*hr\b/g, "/hour");
}

export function siLabel(kind: QuantityKind): string {
  return unitSymbol(QUANTITY_KINDS[kind].si) || "(dimensionless)";
}

export function matchPracticalSalinity(raw: unknown): number | null {
  if (typeof raw !== "string") return null;
  const m = SALINITY_PRACTICAL.exec(raw);
  return m ? Number(m[1]) : null;
}

export function matchTds(raw: unknown): number | null {
  if (typeof raw !== "string") return null;
  const m = TDS.exec(raw);
  return m ? Number(m[1]) : null;
}

/** Converts an SI value of `kind` to the display unit of `system`. */
export function siToDisplay(value: number, kind: QuantityKind, system: UnitSystem): { value: number; unit: string } {
  const k = QUANTITY_KINDS[kind];
  const target = system === "si" ? k.si : k.us;
  if (target === k.si || target === "") return { value, unit: unitSymbol(target) };
  return { value: convertUnit(value, k.si, target), unit: unitSymbol(target) };
}

/** Converts a display value back to SI. */
export function displayToSI(value: number, kind: QuantityKind, system: UnitSystem): number {
  const k = QUANTITY_KINDS[kind];
  const from = system === "si" ? k.si : k.us;
  if (from === k.si || from === "") return value;
  return convertUnit(value, from, k.si);
}

/** Compact engineering formatting: 4 significant figures, no exponent for ordinary magnitudes. */
export function formatNumber(value: number, significant = 4): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e7) {
    const digits = Math.max(0, significant - 1 - Math.floor(Math.log10(abs)));
    const text = value.toFixed(Math.min(digits, 10));
    if (text.indexOf(".") < 0) return text;
    // Trailing zeros of the fraction go, then a bare decimal point (a loop: this runs in every study case).
    let end = text.length;
    while (text.charCodeAt(end - 1) === 48) end--; // "0"
    if (text.charCodeAt(end - 1) === 46) end--; // "."
    return end === text.length ? text : text.slice(0, end);
  }
  return value.toExponential(significant - 1);
}
