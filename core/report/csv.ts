/**
 * Every CSV Brinefield writes — the report's key results and series, compare, sweep and uncertainty from
 * the CLI, and the app's exports — follows one convention:
 *  - the first row holds the permitting caution as one quoted cell, then "scenario: <name>" and
 *    "inputsHash: <hash>" cells, so the file says what it was computed from (readers skip one row);
 *  - column names are the JSON keys (camelCase) with the unit in brackets for numbers:
 *    `edgeDilution (-)`, `impactDistance (m)`, `entrainedFlow (m3/s)`; "-" marks a dimensionless number;
 *    text columns (`verdict`, `name`) carry no unit; units are written in ASCII (m3/s, degC) so any
 *    spreadsheet reads them;
 *  - numbers are written to 6 significant figures (CSV_SIGNIFICANT), far finer than a screening
 *    estimate's accuracy, without exponent for ordinary magnitudes.
 */
import { csvFormat, csvFormatRows, csvParse } from "d3-dsv";
import { CAUTION, type BrinefieldResult } from "../result/contract";
import { fieldBounds } from "../scenario/bounds";
import { QUANTITY_KINDS } from "../units";

/** Significant figures of every number in a Brinefield CSV. */
export const CSV_SIGNIFICANT = 6;

/** A CSV column: its key (the JSON name) and, for numbers, its unit ("-" when dimensionless). */
export interface CsvColumn {
  readonly key: string;
  readonly unit?: string;
}

/** The header text of a column: "edgeDilution (-)", "verdict". */
export function csvColumnName(c: CsvColumn): string {
  return c.unit === undefined ? c.key : `${c.key} (${c.unit})`;
}

/** A number to CSV_SIGNIFICANT significant figures: "237.412", "0.0578704", "1.23457e-7"; "" when not finite. */
export function csvNumber(value: number | null | undefined, significant = CSV_SIGNIFICANT): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "";
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e-4 && abs < 1e9) return String(Number(value.toPrecision(significant)));
  return Number(value.toPrecision(significant)).toExponential().replace("e+", "e");
}

/** ASCII unit of a quantity kind's SI unit, as CSV headers write it. */
const KIND_UNITS: Record<keyof typeof QUANTITY_KINDS, string> = {
  length: "m",
  smallLength: "m",
  flow: "m3/s",
  speed: "m/s",
  salinity: "g/kg",
  temperature: "degC",
  angle: "deg",
  area: "m2",
  density: "kg/m3",
  acceleration: "m/s2",
  ratio: "-",
  volume: "m3",
  time: "s",
};

/** Units of the result columns Brinefield writes under the same key in every CSV. */
const KEY_UNITS: Readonly<Record<string, string>> = {
  edgeDilution: "-",
  requiredDilution: "-",
  margin: "-",
  warnings: "count",
  weight: "-",
  probability: "-",
  edgeRadius: "m",
  distance: "m",
  dilution: "-",
  salinityIncrease: "g/kg",
  layerThickness: "m",
};

/**
 * The unit of a column by its key: a scenario path ("ambient.depth") takes its field's SI unit, known
 * result keys theirs, method columns ("integralMaxRise", "lengthScaleImpactDistance") metres and
 * "…Dilution" columns "-". Undefined for text columns.
 */
export function unitOfKey(key: string): string | undefined {
  const bounds = fieldBounds(key);
  if (bounds) return KIND_UNITS[bounds.kind];
  if (Object.prototype.hasOwnProperty.call(KEY_UNITS, key)) return KEY_UNITS[key];
  if (/(MaxRise|MaxRiseHeight|MaxRiseDistance|ImpactDistance|ReturnDistance|NearFieldDistance)$/.test(key)) return "m";
  if (/Dilution(Low|High)?$/.test(key)) return "-";
  return undefined;
}

/** Columns for keys whose values are numbers or text, units found by `unitOfKey`. */
export function columnsForKeys(
  keys: readonly string[],
  rows: readonly Readonly<Record<string, unknown>>[] = [],
): CsvColumn[] {
  return keys.map((key) => {
    const unit = unitOfKey(key);
    const numeric = unit !== undefined || rows.some((r) => typeof r[key] === "number");
    return numeric ? { key, unit: unit ?? "-" } : { key };
  });
}

/**
 * A table in Brinefield's CSV convention: header from `columns`, numbers to CSV_SIGNIFICANT figures,
 * every cell neutralised against spreadsheet formulas.
 */
export function csvTable(rows: readonly Readonly<Record<string, unknown>>[], columns: readonly CsvColumn[]): string {
  const names = columns.map(csvColumnName);
  const body = rows.map((r) =>
    columns.map((c) => {
      const v = r[c.key];
      if (typeof v === "number") return csvNumber(v);
      if (v === null || v === undefined) return "";
      return v;
    }),
  );
  return csvFormatRowsSafe([names, ...body]);
}

/** Flat rows (compare, sweep) in the CSV convention: the keys as columns, units by `unitOfKey`. */
export function flatRowsCsv(rows: readonly Readonly<Record<string, unknown>>[], keys: readonly string[]): string {
  return csvTable(rows, columnsForKeys(keys, rows));
}

/** Column order of `resultCsv` (header names, units in brackets). */
export const RESULT_COLUMNS: readonly CsvColumn[] = [
  { key: "scenario" },
  { key: "inputsHash" },
  { key: "section" },
  { key: "name" },
  { key: "source" },
  { key: "maxRiseHeight", unit: "m" },
  { key: "maxRiseDistance", unit: "m" },
  { key: "returnDistance", unit: "m" },
  { key: "impactDistance", unit: "m" },
  { key: "impactDilution", unit: "-" },
  { key: "impactDilutionLow", unit: "-" },
  { key: "impactDilutionHigh", unit: "-" },
  { key: "nearFieldDistance", unit: "m" },
  { key: "nearFieldDilution", unit: "-" },
  { key: "entrainedFlow", unit: "m3/s" },
  { key: "unit" },
  { key: "edgeRadius", unit: "m" },
  { key: "edgeDilution", unit: "-" },
  { key: "dischargeConcentration", unit: "see unit" },
  { key: "backgroundConcentration", unit: "see unit" },
  { key: "edgeConcentration", unit: "see unit" },
  { key: "edgeIncrease", unit: "see unit" },
  { key: "requiredDilution", unit: "-" },
  { key: "margin", unit: "-" },
  { key: "pass" },
  { key: "verdict" },
  { key: "scopeReasons" },
];

export const SERIES_COLUMNS: readonly CsvColumn[] = [
  { key: "distance", unit: "m" },
  { key: "dilution", unit: "-" },
  { key: "salinityIncrease", unit: "g/kg" },
  { key: "layerThickness", unit: "m" },
  { key: "stage" },
];

/** Header names of `resultCsv`, in order. */
export const RESULT_CSV_COLUMNS = RESULT_COLUMNS.map(csvColumnName);
/** Header names of `seriesCsv`, in order. */
export const SERIES_CSV_COLUMNS = SERIES_COLUMNS.map(csvColumnName);

/** A decimal number as text ("-2.5", "1e-3", "+4"): a spreadsheet reads it as the number it is. */
const DECIMAL_NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;
/** First characters that make a spreadsheet read a cell as a formula (or a hidden control). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * A CSV cell that no spreadsheet runs as a formula: text beginning with =, +, -, @, tab or carriage
 * return gets a single quote in front (the usual neutralising, common practice, no source). Numbers,
 * including negative ones and numbers already written as text, stay as they are.
 */
export function csvSafeCell(value: unknown): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  const text = String(value);
  return FORMULA_START.test(text) && !DECIMAL_NUMBER.test(text) ? `'${text}` : text;
}

/** d3's csvFormat with every cell through `csvSafeCell`: the one way Brinefield writes CSV tables. */
export function csvFormatSafe(rows: readonly Readonly<Record<string, unknown>>[], columns: readonly string[]): string {
  const safe = rows.map((r) => Object.fromEntries(columns.map((c) => [c, csvSafeCell(r[c])])));
  return csvFormat(safe, [...columns]);
}

/** d3's csvFormatRows with every cell through `csvSafeCell` (header row included). */
export function csvFormatRowsSafe(rows: readonly (readonly unknown[])[]): string {
  return csvFormatRows(rows.map((r) => r.map(csvSafeCell)));
}

type Row = Record<string, string | number | null | undefined>;

function num(value: number | null | undefined): number | null {
  return value === null || value === undefined || !Number.isFinite(value) ? null : value;
}

/** Key results: one row per near-field method, then one per constituent at the mixing-zone edge. */
export function resultCsv(result: BrinefieldResult): string {
  const rows: Row[] = [];
  const common = { scenario: result.scenarioName, inputsHash: result.inputsHash };
  for (const m of result.nearField) {
    rows.push({
      ...common,
      section: "near-field",
      name: m.method,
      source: m.source,
      maxRiseHeight: num(m.maxRiseHeight),
      maxRiseDistance: num(m.maxRiseDistance),
      returnDistance: num(m.returnDistance),
      impactDistance: num(m.impactDistance),
      impactDilution: num(m.impactDilution),
      impactDilutionLow: num(m.dilutionRange?.[0]),
      impactDilutionHigh: num(m.dilutionRange?.[1]),
      nearFieldDistance: num(m.nearFieldDistance),
      nearFieldDilution: num(m.nearFieldDilution),
      entrainedFlow: num(m.entrainedFlow),
    });
  }
  const mz = result.mixingZone;
  for (const c of mz.constituents) {
    const check = result.compliance.constituents.find((k) => k.constituent === c.constituent);
    rows.push({
      ...common,
      section: "mixing-zone-edge",
      name: c.constituent,
      source: mz.method,
      unit: c.unit,
      edgeRadius: num(mz.radius),
      edgeDilution: num(mz.dilution),
      dischargeConcentration: num(c.discharge),
      backgroundConcentration: num(c.background),
      edgeConcentration: num(c.concentration),
      edgeIncrease: num(c.increase),
      requiredDilution: num(check?.requiredDilution),
      margin: num(check?.margin),
      pass: check ? String(check.pass && result.compliance.verdict === "meets") : "",
      verdict: check
        ? result.compliance.verdict === "outside-scope"
          ? "outside-scope"
          : check.pass
            ? "meets"
            : "exceeds"
        : "",
      scopeReasons: result.compliance.scopeReasons.join(" "),
    });
  }
  // One row per ambient case and the overall verdict over them (as `run --json` reports `cases`, `overall`).
  for (const k of result.cases ?? []) {
    rows.push({
      ...common,
      section: "ambient-case",
      name: k.name,
      edgeRadius: num(mz.radius),
      edgeDilution: num(k.edgeDilution),
      margin: num(k.margin),
      pass: String(k.verdict === "meets"),
      verdict: k.verdict,
      scopeReasons: k.scopeReasons.join(" "),
    });
  }
  if (result.overall) {
    rows.push({
      ...common,
      section: "overall",
      name: result.overall.governingCase,
      edgeRadius: num(mz.radius),
      edgeDilution: num(result.overall.edgeDilution),
      margin: num(result.overall.margin),
      pass: String(result.overall.verdict === "meets"),
      verdict: result.overall.verdict,
    });
  }
  return csvTable(rows, RESULT_COLUMNS);
}

/** Dilution, salinity increase and layer thickness against plan distance from the diffuser. */
export function seriesCsv(result: BrinefieldResult): string {
  const s = result.mixingZone.series;
  const rows = s.distance.map((d, i) => ({
    distance: num(d),
    dilution: num(s.dilution[i]),
    salinityIncrease: num(s.salinityIncrease[i]),
    layerThickness: num(s.layerThickness[i]),
    stage: s.stage[i] ?? "",
  }));
  return csvTable(rows, SERIES_COLUMNS);
}

/** A study's key results: every variant's `resultCsv` rows with the variant name in front. */
export function studyResultCsv(
  variants: readonly { readonly name: string; readonly result: BrinefieldResult }[],
): string {
  return withVariantColumn(
    variants.map((v) => ({ name: v.name, csv: resultCsv(v.result) })),
    [...RESULT_CSV_COLUMNS],
  );
}

/** A study's dilution series: every variant's `seriesCsv` rows with the variant name in front. */
export function studySeriesCsv(
  variants: readonly { readonly name: string; readonly result: BrinefieldResult }[],
): string {
  return withVariantColumn(
    variants.map((v) => ({ name: v.name, csv: seriesCsv(v.result) })),
    [...SERIES_CSV_COLUMNS],
  );
}

function withVariantColumn(parts: readonly { name: string; csv: string }[], columns: string[]): string {
  const rows: Record<string, string>[] = parts.flatMap((p) =>
    csvParse(p.csv).map((row) => ({ variant: p.name, ...row }) as Record<string, string>),
  );
  return csvFormatSafe(rows, ["variant", ...columns]);
}

/** What a CSV was computed from, written beside the caution on its first row. */
export interface CsvAbout {
  readonly scenario?: string;
  readonly inputsHash?: string;
  readonly study?: string;
}

/**
 * A CSV file as written for people: the permitting caution (beginning "Caution") as one quoted cell on
 * the first row, followed on that row by what the numbers were computed from ("scenario: …",
 * "inputsHash: …"), then the table. Readers that want the table alone skip the first line.
 */
export function csvWithCaution(csv: string, caution: string = CAUTION, about: CsvAbout = {}): string {
  const cells = [caution || CAUTION];
  if (about.study !== undefined) cells.push(`study: ${about.study}`);
  if (about.scenario !== undefined) cells.push(`scenario: ${about.scenario}`);
  if (about.inputsHash !== undefined) cells.push(`inputsHash: ${about.inputsHash}`);
  return csvFormatRowsSafe([cells]) + "\n" + csv;
}

/** The first-row facts of a result's CSV. */
export function aboutResult(result: Pick<BrinefieldResult, "scenarioName" | "inputsHash">): CsvAbout {
  return { scenario: result.scenarioName, inputsHash: result.inputsHash };
}
