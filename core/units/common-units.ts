/**
 * The units scenarios are written in most often, with exact factors, so reading "8 in" or "20 degC" does
 * not build the mathjs units instance (typed functions for every unit operation: most of a command's
 * start-up and of the app worker's first result). Anything not listed here (prefixes, products,
 * unusual spellings) goes to mathjs as before; tests check every entry against mathjs.
 *
 * Factors are exact by definition: the international foot 0.3048 m, inch 0.0254 m and yard 0.9144 m
 * (International Yard and Pound Agreement, 1959); the US gallon 231 in³ = 3.785411784 L; the
 * international knot 1852 m per hour; the litre 10⁻³ m³ and the SI prefixes (BIPM, The International
 * System of Units, 9th edition, 2019); °F = K × 9/5 − 459.67 and °C = K − 273.15 (same brochure and
 * NIST Special Publication 811, 2008, appendix B.8). MGD, MLD, cms, cfs and ppt are the trade's
 * shorthands (common practice, no source), defined as in core/units/units.ts.
 */

/** What a unit measures; a conversion is only made between units of one dimension. */
type Dimension =
  | "length"
  | "area"
  | "volume"
  | "time"
  | "speed"
  | "flow"
  | "acceleration"
  | "massPerVolume"
  | "massRatio"
  | "temperature"
  | "angle";

/** A value v in this unit is (v + offset) × factor in the dimension's base unit. */
interface CommonUnit {
  readonly dimension: Dimension;
  readonly factor: number;
  readonly offset: number;
}

const FOOT = 0.3048;
const INCH = 0.0254;
const US_GALLON = 3.785411784e-3;
const DAY = 86_400;
const HOUR = 3_600;

const ENTRIES: Readonly<Record<string, readonly [Dimension, number, number?]>> = {
  m: ["length", 1],
  meter: ["length", 1],
  meters: ["length", 1],
  cm: ["length", 0.01],
  mm: ["length", 0.001],
  km: ["length", 1000],
  ft: ["length", FOOT],
  foot: ["length", FOOT],
  feet: ["length", FOOT],
  in: ["length", INCH],
  inch: ["length", INCH],
  inches: ["length", INCH],
  yd: ["length", 0.9144],
  "m^2": ["area", 1],
  "cm^2": ["area", 1e-4],
  "ft^2": ["area", FOOT * FOOT],
  "in^2": ["area", INCH * INCH],
  "m^3": ["volume", 1],
  "ft^3": ["volume", FOOT * FOOT * FOOT],
  L: ["volume", 1e-3],
  l: ["volume", 1e-3],
  gal: ["volume", US_GALLON],
  s: ["time", 1],
  min: ["time", 60],
  h: ["time", HOUR],
  hr: ["time", HOUR],
  hour: ["time", HOUR],
  hours: ["time", HOUR],
  day: ["time", DAY],
  days: ["time", DAY],
  "m/s": ["speed", 1],
  "cm/s": ["speed", 0.01],
  "ft/s": ["speed", FOOT],
  "km/h": ["speed", 1000 / HOUR],
  knot: ["speed", 1852 / HOUR],
  knots: ["speed", 1852 / HOUR],
  kn: ["speed", 1852 / HOUR],
  kt: ["speed", 1852 / HOUR],
  "m^3/s": ["flow", 1],
  cms: ["flow", 1],
  "m^3/day": ["flow", 1 / DAY],
  "m^3/h": ["flow", 1 / HOUR],
  "m^3/hour": ["flow", 1 / HOUR],
  "L/s": ["flow", 1e-3],
  "l/s": ["flow", 1e-3],
  "ML/day": ["flow", 1000 / DAY],
  MLD: ["flow", 1000 / DAY],
  MGD: ["flow", (1e6 * US_GALLON) / DAY],
  "ft^3/s": ["flow", FOOT * FOOT * FOOT],
  cfs: ["flow", FOOT * FOOT * FOOT],
  "gal/min": ["flow", US_GALLON / 60],
  "m/s^2": ["acceleration", 1],
  "ft/s^2": ["acceleration", FOOT],
  "kg/m^3": ["massPerVolume", 1],
  "g/L": ["massPerVolume", 1],
  "g/l": ["massPerVolume", 1],
  "g/m^3": ["massPerVolume", 1e-3],
  "mg/L": ["massPerVolume", 1e-3],
  "mg/l": ["massPerVolume", 1e-3],
  "ug/L": ["massPerVolume", 1e-6],
  "ug/l": ["massPerVolume", 1e-6],
  "g/kg": ["massRatio", 1],
  ppt: ["massRatio", 1],
  K: ["temperature", 1],
  degC: ["temperature", 1, 273.15],
  degF: ["temperature", 5 / 9, 459.67],
  deg: ["angle", 1],
  degree: ["angle", 1],
  degrees: ["angle", 1],
  rad: ["angle", 180 / Math.PI],
};

const UNITS: ReadonlyMap<string, CommonUnit> = new Map(
  Object.entries(ENTRIES).map(([name, [dimension, factor, offset]]) => [
    name,
    { dimension, factor, offset: offset ?? 0 },
  ]),
);

/** Every unit name with a fast conversion (for the tests that check each against mathjs). */
export const COMMON_UNIT_NAMES: readonly string[] = [...UNITS.keys()];

/**
 * `value` in `from` expressed in `to` when both are common units of one dimension; `undefined` when
 * either is not in the list (the caller asks mathjs), `null` when they measure different things.
 */
export function convertCommonUnit(value: number, from: string, to: string): number | null | undefined {
  const a = UNITS.get(from);
  const b = UNITS.get(to);
  if (a === undefined || b === undefined) return undefined;
  if (a.dimension !== b.dimension) return null;
  if (from === to) return value;
  return ((value + a.offset) * a.factor) / b.factor - b.offset;
}

const NUMBER_AND_UNIT = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*([A-Za-z][A-Za-z0-9^/]*)$/;

/**
 * A quantity written as a decimal number and one common unit ("8 in", "0.5 knot", "20 degC") in `to`;
 * `undefined` when the text is not of that form or its unit is not a common one (the caller asks mathjs),
 * `null` when the unit measures something else than `to`.
 */
export function commonQuantityIn(text: string, to: string): number | null | undefined {
  const m = NUMBER_AND_UNIT.exec(text);
  if (!m) return undefined;
  return convertCommonUnit(Number(m[1]), m[2]!, to);
}
