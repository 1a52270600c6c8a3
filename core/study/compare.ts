/**
 * Comparing options and sites: one row per variant and ambient case (the stated conditions, each listed
 * case, slack water), plus each variant's overall row — the same cases and overall verdict as `run` —
 * with each near-field method's key numbers side by side. Rows flatten to columns for tables and CSV.
 * A variant whose scenario breaks a rule is one "refused" row carrying the rule's message.
 */
import type { StudyVerdict } from "../result/contract";
import type { Scenario } from "../scenario/types";
import { keptValueNotes } from "../cases";
import { withRawOverride } from "./overrides";
import type { StudyFile, StudyIssue } from "./study-file";
import { evaluateCases, type CaseSummary, type Evaluator } from "./summary";

/** The scenario reader the study uses (core/scenario/parse `parseScenario`). */
export type ScenarioReader = (
  raw: unknown,
) => { ok: true; scenario: Scenario } | { ok: false; issues: readonly { path: string; message: string }[] };

export interface StudyVariant {
  readonly name: string;
  /** Null when the variant's scenario breaks a rule (see `refused`). */
  readonly scenario: Scenario | null;
  /** The scenario reader's messages for a variant that breaks a rule (the same as `run` gives). */
  readonly refused?: readonly string[];
  /** The override paths the variant changes. */
  readonly paths: readonly string[];
}

/**
 * The base scenario and every variant, each re-read from the patched raw scenario. A variant that breaks a
 * scenario rule is kept as refused, with the reader's messages; an override path that is not a field of the
 * scenario format is a problem of the study file (named "variants.1 (deep water): …"), as is a base
 * scenario that cannot be read.
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
    const paths = Object.keys(v.overrides);
    if (!r.ok) {
      if (i === 0) {
        for (const is of r.issues) issues.push({ path: `${where}.${is.path}`, message: `${where}: ${is.message}` });
      } else out.push({ name: v.name, scenario: null, refused: r.issues.map((x) => x.message), paths });
      return;
    }
    out.push({ name: v.name, scenario: r.scenario, paths });
  });
  return issues.length > 0 ? { ok: false, issues } : { ok: true, variants: out };
}

export interface CompareRow {
  readonly variant: string;
  /** Ambient case name, or "overall" for the variant's verdict over every case. */
  readonly case: string;
  /** True for the overall row. */
  readonly worstCase: boolean;
  /** For the overall row: the case that governs. */
  readonly governingCase: string | null;
  readonly verdict: StudyVerdict;
  readonly summary: CaseSummary | null;
  /** The rule's message for a refused variant. */
  readonly error?: string;
  /** Where a case keeps its own value against the variant's ambient changes. */
  readonly notes?: readonly string[];
}

/** The name of each variant's overall row (the verdict over every case, as `run`'s `overall`). */
export const OVERALL_ROW = "overall";
/** @deprecated the overall row is named "overall"; kept for callers of the old name. */
export const WORST_CASE_ROW = OVERALL_ROW;

export function compareVariant(v: StudyVariant, evaluate: Evaluator): CompareRow[] {
  const refusedRow = (error: string): CompareRow[] => [
    {
      variant: v.name,
      case: OVERALL_ROW,
      worstCase: true,
      governingCase: null,
      verdict: "refused",
      summary: null,
      error,
    },
  ];
  if (!v.scenario) return refusedRow((v.refused ?? ["refused"]).join("; "));
  let e: ReturnType<typeof evaluateCases>;
  try {
    e = evaluateCases(v.scenario, evaluate);
  } catch (err) {
    return refusedRow(err instanceof Error ? err.message : String(err));
  }
  const notes = keptValueNotes(v.scenario, v.paths);
  const rows: CompareRow[] = e.cases.map((c) => ({
    variant: v.name,
    case: c.name,
    worstCase: false,
    governingCase: null,
    verdict: c.summary.verdict,
    summary: c.summary,
  }));
  rows.push({
    variant: v.name,
    case: OVERALL_ROW,
    worstCase: true,
    governingCase: e.overall.governingCase,
    verdict: e.overall.verdict,
    summary: e.cases[e.governing]!.summary,
    ...(notes.length ? { notes } : {}),
  });
  return rows;
}

/** "length-scale" → "lengthScale". */
function camel(method: string): string {
  return method.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
}

export type FlatRow = Record<string, string | number | boolean | null>;

/**
 * Flat columns: variant, case, governingCase, edgeDilution, requiredDilution, margin, verdict,
 * scopeReasons, warnings, equationOfState, chain (the method chain that reached the edge; on the overall
 * row, the governing case's chain), then per method `<method>MaxRise` (m), `<method>ImpactDistance` (m),
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
    verdict: r.verdict,
    scopeReasons: s && s.scopeReasons.length > 0 ? s.scopeReasons.join(" ") : null,
    warnings: s?.warningCount ?? null,
    equationOfState: s?.equationOfState ?? null,
    chain: s?.chain ?? null,
  };
  for (const m of s?.methods ?? []) {
    const k = camel(m.method);
    row[`${k}MaxRise`] = m.maxRiseHeight;
    row[`${k}ImpactDistance`] = m.impactDistance;
    row[`${k}ImpactDilution`] = m.impactDilution;
  }
  if (r.error) row.error = r.error;
  if (r.notes) row.notes = r.notes.join(" ");
  return row;
}

/**
 * Sorts flat rows by a column; "-column" sorts descending. Numbers numerically, text alphabetically,
 * nulls last. Stable. Returns null when the column is not one of the rows' own columns (names such as
 * "constructor" or "__proto__" are never columns).
 */
export function sortRows(rows: readonly FlatRow[], spec: string): FlatRow[] | null {
  const desc = spec.startsWith("-");
  const col = desc ? spec.slice(1) : spec;
  if (!columnsOf(rows).includes(col)) return null;
  const sign = desc ? -1 : 1;
  return rows
    .map((r, i) => ({ r, i }))
    .sort((a, b) => {
      const x = Object.prototype.hasOwnProperty.call(a.r, col) ? (a.r[col] ?? null) : null;
      const y = Object.prototype.hasOwnProperty.call(b.r, col) ? (b.r[col] ?? null) : null;
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
