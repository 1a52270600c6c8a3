/**
 * Formatting shared by the report, its tests and anything that must print the same digits: every number
 * in the report goes through `reportNumber`, so a test can format a `run --json` value the same way and
 * find it in the document.
 */
import { formatNumber } from "../units";

/** Significant figures used for every number the report prints. */
export const REPORT_SIGNIFICANT = 4;

/** A number as the report prints it ("—" for null/undefined/non-finite). */
export function reportNumber(value: number | null | undefined): string {
  if (value === null || value === undefined) return "—";
  if (!Number.isFinite(value)) return "—";
  return formatNumber(value, REPORT_SIGNIFICANT);
}

/**
 * Densities are printed to 0.01 kg/m³ (six or seven significant figures) in the report and by `run`:
 * the brine's buoyancy is a difference of two densities near 1025 kg/m³, so four significant figures
 * ("1025") would hide it.
 */
export const DENSITY_DECIMALS = 2;

export function densityNumber(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return value.toFixed(DENSITY_DECIMALS);
}

/** A traced result value as the report prints it: densities (kg/m³) to 0.01, everything else by reportNumber. */
export function reportValue(path: string, value: number | null | undefined): string {
  return /^densities\.(discharge|ambient\w*)$/.test(path) ? densityNumber(value) : reportNumber(value);
}

/** A percentage from a fraction, e.g. 0.45 → "45 %". */
export function reportPercent(fraction: number | null | undefined): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return "—";
  return `${formatNumber(fraction * 100, 3)} %`;
}

/** Escapes text for HTML element content and double-quoted attribute values. */
export function escapeHtml(text: string): string {
  return text
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

/** Tagged template helper: interpolated strings are escaped unless wrapped by `raw()`. */
export interface RawHtml {
  readonly __html: string;
}

export function raw(html: string): RawHtml {
  return { __html: html };
}

type HtmlValue = string | number | RawHtml | null | undefined | false | readonly HtmlValue[];

function htmlValue(value: HtmlValue): string {
  if (value === null || value === undefined || value === false) return "";
  if (Array.isArray(value)) return value.map((v: HtmlValue) => htmlValue(v)).join("");
  if (typeof value === "number") return escapeHtml(reportNumber(value));
  if (typeof value === "object" && "__html" in value) return value.__html;
  return escapeHtml(String(value));
}

export function html(strings: TemplateStringsArray, ...values: HtmlValue[]): RawHtml {
  let out = strings[0] ?? "";
  for (let i = 0; i < values.length; i++) out += htmlValue(values[i] as HtmlValue) + (strings[i + 1] ?? "");
  return raw(out);
}

/** Joins fragments. */
export function join(parts: readonly RawHtml[], separator = ""): RawHtml {
  return raw(parts.map((p) => p.__html).join(separator));
}
