/**
 * Reads a receiving-water profile pasted from a spreadsheet (tab-separated) or loaded from a CSV file,
 * with d3-dsv. Columns are found by header name (depth, salinity, temperature, in any order; a unit in
 * brackets such as "depth (ft)" or "temperature [degF]" is attached to every value of that column). With
 * no header the columns are taken as depth, salinity, temperature in SI.
 */
import { csvParseRows, tsvParseRows } from "d3-dsv";

export interface ProfileRowText {
  readonly depth: number | string;
  readonly salinity: number | string;
  readonly temperature: number | string;
}

export interface ProfileParse {
  readonly rows: ProfileRowText[];
  readonly errors: string[];
}

const COLUMN_NAMES = {
  depth: /^(depth|z|d)\b/i,
  salinity: /^(salinity|sal|sa|s)\b/i,
  temperature: /^(temperature|temp|t)\b/i,
} as const;

type Column = keyof typeof COLUMN_NAMES;

function unitOf(header: string): string | null {
  const m = /[([]\s*([^)\]]+?)\s*[)\]]/.exec(header);
  return m ? m[1] : null;
}

function cell(text: string, unit: string | null): number | string {
  const trimmed = text.trim().replace(/,(?=\d{1,}$)/, "."); // decimal comma from some spreadsheets
  const n = Number(trimmed);
  if (trimmed !== "" && Number.isFinite(n)) return unit ? `${n} ${unit}` : n;
  return trimmed;
}

export function parseProfileText(text: string): ProfileParse {
  const errors: string[] = [];
  const clean = text.replace(/\r\n?/g, "\n").trim();
  if (clean === "") return { rows: [], errors: ["no rows found"] };
  const firstLine = clean.split("\n")[0];
  const delimiter = firstLine.includes("\t") ? "\t" : firstLine.includes(";") ? ";" : ",";
  const table =
    delimiter === "\t"
      ? tsvParseRows(clean)
      : delimiter === ","
        ? csvParseRows(clean)
        : clean.split("\n").map((line) => line.split(";"));
  const rowsIn = table.filter((r) => r.some((c) => c.trim() !== ""));
  const header = rowsIn[0] ?? [];
  const headerIsText = header.some((c) => c.trim() !== "" && !Number.isFinite(Number(c.trim().replace(",", "."))));
  const columns: Record<Column, number> = { depth: 0, salinity: 1, temperature: 2 };
  const units: Record<Column, string | null> = { depth: null, salinity: null, temperature: null };
  if (headerIsText) {
    for (const key of Object.keys(COLUMN_NAMES) as Column[]) {
      const index = header.findIndex((h) => COLUMN_NAMES[key].test(h.trim()));
      if (index < 0) errors.push(`no "${key}" column in the header (${header.join(", ")})`);
      else {
        columns[key] = index;
        units[key] = unitOf(header[index]);
      }
    }
  }
  const body = headerIsText ? rowsIn.slice(1) : rowsIn;
  const rows: ProfileRowText[] = [];
  body.forEach((r, i) => {
    const line = i + (headerIsText ? 2 : 1);
    if (r.length < 3) {
      errors.push(`row ${line} has ${r.length} column${r.length === 1 ? "" : "s"}, expected 3`);
      return;
    }
    const row = {
      depth: cell(r[columns.depth] ?? "", units.depth),
      salinity: cell(r[columns.salinity] ?? "", units.salinity),
      temperature: cell(r[columns.temperature] ?? "", units.temperature),
    };
    for (const key of Object.keys(row) as Column[]) {
      if (typeof row[key] === "string" && !/\d/.test(String(row[key])))
        errors.push(`row ${line}: ${key} "${row[key]}" is not a number`);
    }
    rows.push(row);
  });
  if (rows.length < 2 && errors.length === 0) errors.push("a profile needs at least two rows");
  return { rows, errors };
}
