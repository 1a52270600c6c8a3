/**
 * The variant comparison as CSV, in the one CSV convention of every Brinefield export (core/report/csv.ts):
 * core's flat rows with the unit of each number in its column name ("integralMaxRise (m)",
 * "edgeDilution (-)"), in SI whatever the display was, opened by the caution and the study's name.
 */
import { columnsForKeys, csvColumnName as headerOf, flatRowsCsv } from "../../core/report/csv";
import { columnsOf, type FlatRow } from "../../core/study/compare";
import { csvWithCaution } from "../exports";

/** Columns of core's comparison rows that hold a length (metres). */
export const isLengthColumn = (c: string): boolean => /(MaxRise|ImpactDistance)$/.test(c);

/** Column name in the exported CSV: "integralMaxRise (m)", "verdict". */
export function csvColumnName(c: string, rows: readonly FlatRow[] = []): string {
  return headerOf(columnsForKeys([c], rows)[0]!);
}

export function variantsCsv(rows: readonly FlatRow[], caution?: string, study?: string): string {
  return csvWithCaution(flatRowsCsv(rows, columnsOf(rows)), caution, study === undefined ? {} : { study });
}
