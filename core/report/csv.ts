/**
 * CSV exports of a result: key results (one row per near-field method and per constituent at the
 * mixing-zone edge) and the dilution-against-distance series. Numbers are written at full precision
 * (JavaScript's shortest round-trip form) so a CSV parses back to exactly the result's numbers.
 */
import { csvFormat, csvFormatRows, csvParse } from "d3-dsv";
import { CAUTION, type BrinefieldResult } from "../result/contract";

/** Column order of `resultCsv`; units are in the column names. */
export const RESULT_CSV_COLUMNS = [
  "scenario",
  "inputs_hash",
  "section",
  "name",
  "source",
  "max_rise_height_m",
  "max_rise_distance_m",
  "return_distance_m",
  "impact_distance_m",
  "impact_dilution",
  "impact_dilution_low",
  "impact_dilution_high",
  "near_field_distance_m",
  "near_field_dilution",
  "entrained_flow_m3_s",
  "unit",
  "edge_radius_m",
  "edge_dilution",
  "discharge_concentration",
  "background_concentration",
  "edge_concentration",
  "edge_increase",
  "required_dilution",
  "margin",
  "pass",
  "verdict",
  "scope_reasons",
] as const;

export const SERIES_CSV_COLUMNS = [
  "distance_m",
  "dilution",
  "salinity_increase_g_kg",
  "layer_thickness_m",
  "stage",
] as const;

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

type Row = Partial<Record<(typeof RESULT_CSV_COLUMNS)[number], string>>;

function num(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? "" : String(value);
}

/** Key results: one row per near-field method, then one per constituent at the mixing-zone edge. */
export function resultCsv(result: BrinefieldResult): string {
  const rows: Row[] = [];
  const common = { scenario: result.scenarioName, inputs_hash: result.inputsHash };
  for (const m of result.nearField) {
    rows.push({
      ...common,
      section: "near-field",
      name: m.method,
      source: m.source,
      max_rise_height_m: num(m.maxRiseHeight),
      max_rise_distance_m: num(m.maxRiseDistance),
      return_distance_m: num(m.returnDistance),
      impact_distance_m: num(m.impactDistance),
      impact_dilution: num(m.impactDilution),
      impact_dilution_low: num(m.dilutionRange?.[0]),
      impact_dilution_high: num(m.dilutionRange?.[1]),
      near_field_distance_m: num(m.nearFieldDistance),
      near_field_dilution: num(m.nearFieldDilution),
      entrained_flow_m3_s: num(m.entrainedFlow),
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
      edge_radius_m: num(mz.radius),
      edge_dilution: num(mz.dilution),
      discharge_concentration: num(c.discharge),
      background_concentration: num(c.background),
      edge_concentration: num(c.concentration),
      edge_increase: num(c.increase),
      required_dilution: num(check?.requiredDilution),
      margin: num(check?.margin),
      pass: check ? String(check.pass && result.compliance.verdict === "meets") : "",
      verdict: check ? (result.compliance.verdict === "outside-scope" ? "outside-scope" : check.pass ? "meets" : "exceeds") : "",
      scope_reasons: result.compliance.scopeReasons.join(" "),
    });
  }
  // One row per ambient case and the overall verdict over them (as `run --json` reports `cases`, `overall`).
  for (const k of result.cases ?? []) {
    rows.push({
      ...common,
      section: "ambient-case",
      name: k.name,
      edge_radius_m: num(mz.radius),
      edge_dilution: num(k.edgeDilution),
      margin: num(k.margin),
      pass: String(k.verdict === "meets"),
      verdict: k.verdict,
      scope_reasons: k.scopeReasons.join(" "),
    });
  }
  if (result.overall) {
    rows.push({
      ...common,
      section: "overall",
      name: result.overall.governingCase,
      edge_radius_m: num(mz.radius),
      edge_dilution: num(result.overall.edgeDilution),
      margin: num(result.overall.margin),
      pass: String(result.overall.verdict === "meets"),
      verdict: result.overall.verdict,
    });
  }
  return csvFormatSafe(rows, RESULT_CSV_COLUMNS);
}

/** Dilution, salinity increase and layer thickness against plan distance from the diffuser. */
export function seriesCsv(result: BrinefieldResult): string {
  const s = result.mixingZone.series;
  const rows = s.distance.map((d, i) => ({
    distance_m: num(d),
    dilution: num(s.dilution[i]),
    salinity_increase_g_kg: num(s.salinityIncrease[i]),
    layer_thickness_m: num(s.layerThickness[i]),
    stage: s.stage[i] ?? "",
  }));
  return csvFormatSafe(rows, SERIES_CSV_COLUMNS);
}

/** A study's key results: every variant's `resultCsv` rows with the variant name in front. */
export function studyResultCsv(variants: readonly { readonly name: string; readonly result: BrinefieldResult }[]): string {
  return withVariantColumn(variants.map((v) => ({ name: v.name, csv: resultCsv(v.result) })), [...RESULT_CSV_COLUMNS]);
}

/** A study's dilution series: every variant's `seriesCsv` rows with the variant name in front. */
export function studySeriesCsv(variants: readonly { readonly name: string; readonly result: BrinefieldResult }[]): string {
  return withVariantColumn(variants.map((v) => ({ name: v.name, csv: seriesCsv(v.result) })), [...SERIES_CSV_COLUMNS]);
}

function withVariantColumn(parts: readonly { name: string; csv: string }[], columns: string[]): string {
  const rows: Record<string, string>[] = parts.flatMap((p) => csvParse(p.csv).map((row) => ({ variant: p.name, ...row }) as Record<string, string>));
  return csvFormatSafe(rows, ["variant", ...columns]);
}

/**
 * A CSV file as written for people: the permitting caution (beginning "Caution") as one quoted cell on
 * the first row, then the table. Readers that want the table alone skip the first line.
 */
export function csvWithCaution(csv: string, caution: string = CAUTION): string {
  return csvFormatRowsSafe([[caution || CAUTION]]) + "\n" + csv;
}
