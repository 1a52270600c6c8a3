/**
 * The variant comparison as CSV: core's flat rows as they are (lengths in metres, named "…_m"), opened
 * by the caution. The on-screen table shows the chosen unit system; the file keeps SI so it reads back
 * the same whatever the display was.
 */
import { csvFormatSafe } from "../../core/report/csv";
import { columnsOf, type FlatRow } from "../../core/study/compare";
import { csvWithCaution } from "../exports";

/** Columns of core's comparison rows that hold a length (metres). */
export const isLengthColumn = (c: string): boolean => /(MaxRise|ImpactDistance)$/.test(c);

/** Column name in the exported CSV: lengths carry their SI unit, "integralMaxRise_m". */
export function csvColumnName(c: string): string {
  return isLengthColumn(c) ? `${c}_m` : c;
}

export function variantsCsv(rows: readonly FlatRow[], caution?: string): string {
  const columns = columnsOf(rows);
  const cell = (v: FlatRow[string] | undefined) => (v === null || v === undefined ? "" : String(v));
  const named = rows.map((r) => Object.fromEntries(columns.map((c) => [csvColumnName(c), cell(r[c])])));
  return csvWithCaution(csvFormatSafe(named, columns.map(csvColumnName)), caution);
}
