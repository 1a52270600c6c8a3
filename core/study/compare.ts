/**
 * Comparing options and sites: one row per variant and ambient case, plus each variant's worst case,
 * with each near-field method's key numbers side by side. Rows flatten to columns for tables and CSV.
 */
import type { Scenario } from "../scenario/types";
import { expandCases } from "./cases";
import { withRawOverride } from "./overrides";
import type { StudyFile, StudyIssue } from "./study-file";
import { worstIndex, type CaseSummary, type Evaluator } from "./summary";

/** The scenario reader the study uses (core/scenario/parse `parseScenario`). */
export type ScenarioReader = (
  raw: unknown,
) => { ok: true; scenario: Scenario } | { ok: false; issues: readonly { path: string; message: string }[] };

export interface StudyVariant {
  readonly name: string;
  readonly scenario: Scenario;
}

/**
 * The base scenario and every variant, each re-read from the patched raw scenario. Problems name the
 * variant and the path ("variants.1 (deep water): ambient.depth: …").
 */
export function studyVariants(
  study: StudyFile,
  baseRaw: unknown,
  read: ScenarioReader,
): { ok: true; variants: StudyVariant[] } | { ok: false; issues: StudyIssue[] } {
  const issues: StudyIssue[] = [];
  const out: StudyVariant[] = [];
  const list = [{ name: "base", overrides: {} as Record<string, unknown> }, ...(study.variants ?? [])];
  list.forEach((v, i) => {
    const where = i === 0 ? "base" : `variants.${i - 1} (${v.name})`;
    let raw = baseRaw;
    try {
      for (const [path, value] of Object.entries(v.overrides)) raw = withRawOverride(raw, path, value);
    } catch (err) {
      issues.push({ path: where, message: `${where}: ${err instanceof Error ? err.message : String(err)}` });
      return;
    }
    const r = read(raw);
    if (!r.ok) {
      for (const is of r.issues) {
        issues.push({ path: `${where}.${is.path}`, message: `${where}: ${is.message}` });
      }
      return;
    }
    out.push({ name: v.name, scenario: r.scenario });
  });
  return issues.length > 0 ? { ok: false, issues } : { ok: true, variants: out };
}

export interface CompareRow {
  readonly variant: string;
  /** Ambient case name, or "worst case" for the variant's governing case. */
  readonly case: string;
  readonly worstCase: boolean;
  /** For the worst-case row: the case that governs. */
  readonly governingCase: string | null;
  readonly summary: CaseSummary | null;
  readonly error?: string;
}

export const WORST_CASE_ROW = "worst case";

export function compareVariant(v: StudyVariant, evaluate: Evaluator): CompareRow[] {
  const rows: CompareRow[] = [];
  const summaries: { name: string; summary: CaseSummary }[] = [];
  for (const c of expandCases(v.scenario)) {
    try {
      const summary = evaluate(c.scenario);
      summaries.push({ name: c.name, summary });
      rows.push({ variant: v.name, case: c.name, worstCase: false, governingCase: null, summary });
    } catch (err) {
      const error = err instanceof Error ? err.message : String(err);
      rows.push({
        variant: v.name,
        case: c.name,
        worstCase: false,
        governingCase: null,
        summary: null,
        error,
      });
    }
  }
  if (summaries.length > 0) {
    const w = summaries[worstIndex(summaries.map((s) => s.summary))]!;
    const anyError = rows.some((r) => r.error !== undefined);
    rows.push({
      variant: v.name,
      case: WORST_CASE_ROW,
      worstCase: true,
      governingCase: w.name,
      summary: { ...w.summary, pass: w.summary.pass && !anyError && summaries.every((s) => s.summary.pass) },
    });
  }
  return rows;
}

/** "length-scale" → "lengthScale". */
function camel(method: string): string {
  return method.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
}

export type FlatRow = Record<string, string | number | boolean | null>;

/**
 * Flat columns: variant, case, governingCase, edgeDilution, requiredDilution, margin, verdict,
 * warnings, equationOfState, then per method `<method>MaxRise` (m), `<method>ImpactDistance` (m),
 * `<method>ImpactDilution`.
 */
export function flattenRow(r: CompareRow): FlatRow {
  const s = r.summary;
  const row: FlatRow = {
    variant: r.variant,
    case: r.case,
    governingCase: r.governingCase,
    edgeDilution: s?.edgeDilution ?? null,
    requiredDilution: s?.requiredDilution ?? null,
    margin: s?.margin ?? null,
    verdict: s ? (s.pass ? "pass" : "fail") : "error",
    warnings: s?.warningCount ?? null,
    equationOfState: s?.equationOfState ?? null,
  };
  for (const m of s?.methods ?? []) {
    const k = camel(m.method);
    row[`${k}MaxRise`] = m.maxRiseHeight;
    row[`${k}ImpactDistance`] = m.impactDistance;
    row[`${k}ImpactDilution`] = m.impactDilution;
  }
  if (r.error) row.error = r.error;
  return row;
}

/**
 * Sorts flat rows by a column; "-column" sorts descending. Numbers numerically, text alphabetically,
 * nulls last. Stable. Returns null when the column does not exist.
 */
export function sortRows(rows: readonly FlatRow[], spec: string): FlatRow[] | null {
  const desc = spec.startsWith("-");
  const col = desc ? spec.slice(1) : spec;
  if (!rows.some((r) => col in r)) return null;
  const sign = desc ? -1 : 1;
  return rows
    .map((r, i) => ({ r, i }))
    .sort((a, b) => {
      const x = a.r[col] ?? null;
      const y = b.r[col] ?? null;
      if (x === null || y === null) return x === y ? a.i - b.i : x === null ? 1 : -1;
      const c = typeof x === "number" && typeof y === "number" ? x - y : String(x).localeCompare(String(y));
      return c !== 0 ? sign * c : a.i - b.i;
    })
    .map((e) => e.r);
}

/** Every column name appearing in any row, in first-seen order. */
export function columnsOf(rows: readonly FlatRow[]): string[] {
  const cols: string[] = [];
  for (const r of rows) for (const k of Object.keys(r)) if (!cols.includes(k)) cols.push(k);
  return cols;
}
