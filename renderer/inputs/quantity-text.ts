/**
 * Between what a field shows and what the scenario file stores. Stored values are SI numbers or strings
 * with a unit ("8 in"); fields show them in the chosen unit system and store what the user types:
 * a plain number means "in the unit shown beside the field", anything else is kept verbatim for core to
 * parse (so a bad unit becomes a parse issue at the field's path, shown inline).
 */
import { QUANTITY_KINDS, formatNumber, quantityToSI, siToDisplay } from "../../core/units";
import type { QuantityKind, UnitSystem } from "../../core/units";

export type { QuantityKind, UnitSystem };

/** The unit shown beside a field of `kind`, as a symbol ("m³/s", "°F", "" for ratios). */
export function displayUnit(kind: QuantityKind, system: UnitSystem): string {
  return siToDisplay(1, kind, system).unit;
}

/** mathjs name of the display unit, used when storing a plain number typed in US customary units. */
export function displayUnitName(kind: QuantityKind, system: UnitSystem): string {
  return QUANTITY_KINDS[kind][system];
}

/** The value in display units, or null when the stored value is not a quantity of this kind. */
export function displayValue(raw: unknown, kind: QuantityKind, system: UnitSystem): number | null {
  const parsed = quantityToSI(raw, kind);
  if (!parsed.ok) return null;
  return siToDisplay(parsed.value, kind, system).value;
}

/** Text a field shows for a stored value when the user is not editing it. */
export function displayText(raw: unknown, kind: QuantityKind, system: UnitSystem, significant = 4): string {
  if (raw === undefined || raw === null) return "";
  const value = displayValue(raw, kind, system);
  if (value === null) return typeof raw === "string" ? raw : JSON.stringify(raw);
  return formatNumber(value, significant);
}

/**
 * What to store for typed text. Plain numbers in SI are stored as numbers; plain numbers in US customary
 * units are stored with their unit ("12 MGD") so the file stays exact and readable; text with a unit, or
 * text that is not a number, is stored as typed. Empty text removes the value.
 */
export function storedValueFromText(text: string, kind: QuantityKind, system: UnitSystem): unknown {
  const trimmed = text.trim();
  if (trimmed === "") return undefined;
  const plain = Number(trimmed);
  if (!Number.isFinite(plain)) return trimmed;
  const unit = displayUnitName(kind, system);
  if (unit === QUANTITY_KINDS[kind].si || unit === "") return plain;
  return `${trimmed} ${unit}`;
}

/**
 * The stored text when it says something the field does not (a unit other than the one shown, e.g.
 * "8 in" shown as 0.2032 m); null when the field already shows the same number.
 */
export function enteredNote(raw: unknown, kind: QuantityKind, system: UnitSystem): string | null {
  if (typeof raw !== "string") return null;
  const shown = displayValue(raw, kind, system);
  if (shown === null) return null;
  const m = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)/i.exec(raw);
  if (m && Math.abs(Number(m[1]) - shown) <= 1e-9 * Math.max(1, Math.abs(shown))) return null;
  return raw.trim();
}

/** Formats an SI result for display: value and unit in the chosen system. */
export function formatQuantity(
  value: number | null | undefined,
  kind: QuantityKind,
  system: UnitSystem,
  significant = 3,
): { text: string; unit: string } {
  if (value === null || value === undefined || !Number.isFinite(value)) {
    return { text: "—", unit: displayUnit(kind, system) };
  }
  const shown = siToDisplay(value, kind, system);
  return { text: formatNumber(shown.value, significant), unit: shown.unit };
}

/** A plain SI number of `kind` from a stored value, or `fallback` when it cannot be read. */
export function siNumber(raw: unknown, kind: QuantityKind, fallback: number): number {
  const parsed = quantityToSI(raw, kind);
  return parsed.ok ? parsed.value : fallback;
}

const LEADING_NUMBER = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*(.*?)\s*$/i;

/** A unit as people write it, with superscripts: "m^3/day" and "m3/d" → "m³/day", "m³/d"; degC → °C. */
export function prettyUnit(unit: string): string {
  return unit
    .replace(/\^3|(?<=\b(?:m|ft|cm|mm|in))3\b/g, "³")
    .replace(/\^2|(?<=\b(?:m|ft|cm|mm|in))2\b/g, "²")
    .replace(/\bdegC\b/g, "°C")
    .replace(/\bdegF\b/g, "°F")
    .replace(/\bdeg\b/g, "°");
}

/**
 * The unit a stored value was entered in, when the field should keep showing it: "5000 m^3/day" stays in
 * m³/day, "45 %" in %, "0.15 knot" in knots. Values in the SI unit itself ("18 m") or in the unit system's
 * own unit ("40 ft" with US units on) follow the unit system as plain numbers do. Null otherwise.
 */
export function enteredUnit(
  raw: unknown,
  kind: QuantityKind,
  system: UnitSystem,
): { value: number; unit: string; text: string } | null {
  if (typeof raw !== "string") return null;
  const m = LEADING_NUMBER.exec(raw);
  if (!m || m[2] === "") return null;
  const value = Number(m[1]);
  const unit = m[2];
  if (!Number.isFinite(value) || !quantityToSI(raw, kind).ok) return null;
  const one = quantityToSI(`1 ${unit}`, kind);
  const zero = quantityToSI(`0 ${unit}`, kind);
  if (one.ok && zero.ok && Math.abs(one.value - 1) < 1e-12 && Math.abs(zero.value) < 1e-12) return null; // the SI unit itself
  if (system === "us") {
    const us = QUANTITY_KINDS[kind].us;
    const inUs = quantityToSI(`1 ${us}`, kind);
    if (us !== "" && one.ok && inUs.ok && Math.abs(one.value - inUs.value) <= 1e-12 * Math.abs(inUs.value)) return null;
  }
  return { value, unit: prettyUnit(unit), text: unit };
}

/**
 * What a quantity field shows: the number and unit it was entered in (or the unit system's unit), and
 * beside it the value in SI (and in US units when those are chosen) when that differs from what is shown.
 */
export function fieldView(
  raw: unknown,
  kind: QuantityKind,
  system: UnitSystem,
  significant = 4,
): { text: string; unit: string; beside: string | null; enteredIn: string | null } {
  const entered = enteredUnit(raw, kind, system);
  if (!entered) {
    // With US units on, the SI value stands beside the US one.
    const siUnit = displayUnit(kind, "si");
    const si = system === "us" && displayUnit(kind, "us") !== siUnit ? quantityToSI(raw, kind) : null;
    const beside = si && si.ok ? `= ${formatNumber(si.value, 4)}${siUnit ? ` ${siUnit}` : ""}` : null;
    return {
      text: displayText(raw, kind, system, significant),
      unit: displayUnit(kind, system),
      beside,
      enteredIn: null,
    };
  }
  const si = quantityToSI(raw, kind);
  const parts: string[] = [];
  if (si.ok) {
    const siUnit = displayUnit(kind, "si");
    parts.push(`${formatNumber(si.value, 4)}${siUnit ? ` ${siUnit}` : ""}`);
    if (system === "us") {
      const us = siToDisplay(si.value, kind, "us");
      if (us.unit !== siUnit && us.unit !== entered.unit) parts.push(`${formatNumber(us.value, 4)} ${us.unit}`);
    }
  }
  return {
    text: formatNumber(entered.value, Math.max(significant, String(entered.value).replace(/[^0-9]/g, "").length)),
    unit: entered.unit,
    beside: parts.length ? `= ${parts.join(" = ")}` : null,
    enteredIn: entered.text,
  };
}

/**
 * What to store for text typed into a field that shows `enteredIn` (a unit of the user's own): a plain
 * number is taken in that unit. Otherwise as storedValueFromText.
 */
export function storedValueInField(
  text: string,
  kind: QuantityKind,
  system: UnitSystem,
  enteredIn: string | null,
): unknown {
  const trimmed = text.trim();
  if (enteredIn !== null && trimmed !== "" && Number.isFinite(Number(trimmed))) return `${trimmed} ${enteredIn}`;
  return storedValueFromText(text, kind, system);
}
