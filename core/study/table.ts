/** Plain-text tables for terminal output: right-aligned numbers, 4 significant figures. */
import { formatNumber } from "../units";

export type Cell = string | number | boolean | null | undefined;

export function formatCell(v: Cell): string {
  if (v === null || v === undefined) return "—";
  if (typeof v === "number") return Number.isNaN(v) ? "—" : formatNumber(v);
  if (typeof v === "boolean") return v ? "yes" : "no";
  return v;
}

/** Renders rows under headers; numeric columns are right-aligned. */
export function textTable(headers: readonly string[], rows: readonly (readonly Cell[])[]): string {
  const cells = rows.map((r) => r.map(formatCell));
  const numeric = headers.map((_, c) =>
    rows.every((r) => typeof r[c] === "number" || r[c] === null || r[c] === undefined),
  );
  const width = headers.map((h, c) => Math.max(h.length, ...cells.map((r) => (r[c] ?? "").length)));
  const line = (r: readonly string[]) =>
    r
      .map((x, c) => (numeric[c] ? x.padStart(width[c]!) : x.padEnd(width[c]!)))
      .join("  ")
      .trimEnd();
  return [line(headers), line(width.map((w) => "-".repeat(w))), ...cells.map(line)].join("\n") + "\n";
}
