/**
 * An ambient record from CSV text. The header names each column by its scenario field (time,
 * currentSpeed, currentDirection, depth, salinity, temperature), each optionally followed by its unit in
 * parentheses: `time (h),currentSpeed (m/s),currentDirection (deg)`. Every cell is then written as
 * "value unit" and read by the scenario reader exactly as the same value written inside
 * `ambient.record` (so a CSV and the same record in the scenario give the same numbers). Times may also be
 * ISO 8601 date-times. Commas, semicolons or tabs separate cells; blank lines and lines starting with "#"
 * are skipped.
 */

export const RECORD_COLUMNS = ["time", "currentSpeed", "currentDirection", "depth", "salinity", "temperature"] as const;
export type RecordColumn = (typeof RECORD_COLUMNS)[number];

export type CsvRecordParse =
  | { readonly ok: true; readonly record: Partial<Record<RecordColumn, (number | string)[]>>; readonly rows: number }
  | { readonly ok: false; readonly message: string };

const HEADER_CELL = /^\s*([A-Za-z]+)\s*(?:\(([^()]*)\))?\s*$/;

function unquote(cell: string): string {
  const t = cell.trim();
  return t.length >= 2 && t.startsWith('"') && t.endsWith('"') ? t.slice(1, -1).replace(/""/g, '"').trim() : t;
}

export function recordFromCsv(text: string, source = "record CSV"): CsvRecordParse {
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  const rows = lines.map((l, i) => ({ l, n: i + 1 })).filter(({ l }) => l.trim() !== "" && !l.trim().startsWith("#"));
  if (rows.length < 2)
    return { ok: false, message: `${source}: expected a header line and at least one row of values` };
  const headerLine = rows[0]!.l;
  const sep = headerLine.includes("\t") ? "\t" : headerLine.includes(";") && !headerLine.includes(",") ? ";" : ",";
  const header = headerLine.split(sep).map(unquote);
  const cols: { field: RecordColumn; unit: string }[] = [];
  for (const [i, h] of header.entries()) {
    const m = HEADER_CELL.exec(h);
    const field = m && RECORD_COLUMNS.find((c) => c.toLowerCase() === m[1]!.toLowerCase());
    if (!m || !field)
      return {
        ok: false,
        message: `${source}: header column ${i + 1} "${h}" must be one of ${RECORD_COLUMNS.join(", ")}, optionally followed by its unit in parentheses, e.g. "currentSpeed (m/s)"`,
      };
    if (cols.some((c) => c.field === field)) return { ok: false, message: `${source}: header names "${field}" twice` };
    cols.push({ field, unit: (m[2] ?? "").trim() });
  }
  for (const need of ["time", "currentSpeed", "currentDirection"] as const)
    if (!cols.some((c) => c.field === need))
      return { ok: false, message: `${source}: the header must name a "${need}" column` };
  const record: Partial<Record<RecordColumn, (number | string)[]>> = {};
  for (const c of cols) record[c.field] = [];
  for (const { l, n } of rows.slice(1)) {
    const cells = l.split(sep).map(unquote);
    if (cells.length !== cols.length)
      return { ok: false, message: `${source}: line ${n} has ${cells.length} cells; the header has ${cols.length}` };
    cells.forEach((cell, j) => {
      const c = cols[j]!;
      const isNumber = cell !== "" && Number.isFinite(Number(cell)) && !/^\s*[-+]?0[xob]/i.test(cell);
      // A bare number in SI stays a number; with a unit it becomes "value unit" for the scenario reader.
      const value: number | string = isNumber ? (c.unit === "" ? Number(cell) : `${cell} ${c.unit}`) : cell;
      record[c.field]!.push(value);
    });
  }
  return { ok: true, record, rows: rows.length - 1 };
}
