/**
 * The units written most often, with mathjs's own factors, so that reading "5000 m^3/day" or "24 degC"
 * needs no mathjs instance (creating one is most of the first run's time in a fresh page or worker).
 * The arithmetic below is mathjs's own (Unit._normalize, Unit.to, Unit._denormalize for plain numbers),
 * so the numbers are the same to the last bit; tests/core/units/units-fast-path.test.ts checks every unit
 * here against mathjs. Anything else (other units, powers, prefixes, offsets between units) goes to mathjs
 * (core/units/units.ts).
 */
interface PlainUnit {
  /** mathjs's unit value and prefix value (kept apart: mathjs multiplies them before the power). */
  readonly value: number;
  readonly prefix: number;
  /** Exponents of mass, length, time, temperature. */
  readonly dims: readonly [number, number, number, number];
  readonly offset: number;
}

const plain = (value: number, dims: PlainUnit["dims"], prefix = 1, offset = 0): PlainUnit => ({
  value,
  prefix,
  dims,
  offset,
});
const LENGTH = [0, 1, 0, 0] as const;
const MASS = [1, 0, 0, 0] as const;
const TIME = [0, 0, 1, 0] as const;

const PLAIN_BASE_UNITS: Readonly<Record<string, PlainUnit>> = {
  m: plain(1, LENGTH),
  km: plain(1, LENGTH, 1e3),
  cm: plain(1, LENGTH, 1e-2),
  mm: plain(1, LENGTH, 1e-3),
  in: plain(0.0254, LENGTH),
  ft: plain(0.3048, LENGTH),
  L: plain(0.001, [0, 3, 0, 0]),
  ML: plain(0.001, [0, 3, 0, 0], 1e6),
  g: plain(0.001, MASS),
  kg: plain(0.001, MASS, 1e3),
  mg: plain(0.001, MASS, 1e-3),
  s: plain(1, TIME),
  min: plain(60, TIME),
  h: plain(3600, TIME),
  hour: plain(3600, TIME),
  day: plain(86400, TIME),
  degC: plain(1, [0, 0, 0, 1], 1, 273.15),
};

interface UnitPart {
  readonly unit: PlainUnit;
  readonly power: number;
}

const WS = "[ \\t\\n\\r]";
const PLAIN_PART = "([A-Za-z]+)(?:\\^([1-9]))?";
const PLAIN_UNIT = new RegExp(`^${PLAIN_PART}(?:${WS}*/${WS}*${PLAIN_PART})?$`);
export const PLAIN_QUANTITY = new RegExp(`^([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)${WS}+(.+)$`);

/** "m^3/day" as unit parts with powers, or null when the fast path does not read it. */
function plainParts(text: string): UnitPart[] | null {
  const m = PLAIN_UNIT.exec(text);
  if (!m) return null;
  const first = PLAIN_UNITS[m[1]!];
  if (!first) return null;
  const parts: UnitPart[] = [{ unit: first, power: Number(m[2] ?? 1) }];
  if (m[3] !== undefined) {
    const second = PLAIN_UNITS[m[3]];
    if (!second) return null;
    parts.push({ unit: second, power: -Number(m[4] ?? 1) });
  }
  return parts;
}

/** mathjs's Unit._normalize for a number: the value in SI base units. */
function normalised(value: number, parts: readonly UnitPart[]): number {
  let res = value;
  for (const { unit, power } of parts) res = res * Math.pow(unit.value * unit.prefix, power);
  return res;
}

function dimsOf(parts: readonly UnitPart[]): number[] {
  const dims = [0, 0, 0, 0];
  for (const { unit, power } of parts) for (let i = 0; i < 4; i++) dims[i]! += unit.dims[i]! * power;
  return dims;
}

/** Trade units defined from the units above, as mathjs's createUnit derives them from their definitions. */
function tradeUnit(value: number, definition: string): PlainUnit {
  const parts = plainParts(definition)!;
  const d = dimsOf(parts);
  return plain(normalised(value, parts), [d[0]!, d[1]!, d[2]!, d[3]!]);
}

// The trade units that math() in units.ts defines, from the same definitions.
const PLAIN_UNITS: Record<string, PlainUnit> = { ...PLAIN_BASE_UNITS };
Object.assign(PLAIN_UNITS, {
  MGD: tradeUnit(3785.411784, "m^3/day"),
  MLD: tradeUnit(1000, "m^3/day"),
  cms: tradeUnit(1, "m^3/s"),
  cfs: tradeUnit(1, "ft^3/s"),
  ppt: tradeUnit(1, "g/kg"),
});
const KNOT = tradeUnit(1852, "m/hour");
for (const name of ["knot", "knots", "kn", "kt"]) PLAIN_UNITS[name] = KNOT;

/**
 * `value` `from` in `to` by mathjs's arithmetic, or null when the fast path cannot say (a unit it does
 * not hold, units of different kinds, or two units with different offsets): mathjs then decides.
 */
export function plainConvert(value: number, from: string, to: string): number | null {
  const source = plainParts(from);
  const target = plainParts(to);
  if (!source || !target) return null;
  const a = dimsOf(source);
  const b = dimsOf(target);
  for (let i = 0; i < 4; i++) if (Math.abs(a[i]! - b[i]!) > 1e-12) return null;
  const derived = source.length > 1 || source[0]!.power !== 1;
  if (!derived && source[0]!.unit.offset !== target[0]!.unit.offset) return null;
  let res = normalised(value, source);
  for (const { unit, power } of target) res = res / Math.pow(unit.value * unit.prefix, power);
  return res;
}

/** The unit names the fast path reads. */
export function plainUnitNames(): string[] {
  return Object.keys(PLAIN_UNITS);
}
