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
