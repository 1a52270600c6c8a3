/**
 * Parameter sweeps over one or two inputs: a grid of override sets, each run under every ambient case
 * (through `evaluatePoint`). Reports per point the governing case's edge dilution, margin and verdict
 * and the equation of state used, and where neighbouring points change equation of state.
 */
import { quantityToSI } from "../units";
import type { PointEvaluation } from "./evaluate-point";
import type { StudyVerdict } from "../result/contract";
import { overrideIssue, overridePathInfo, type Overrides } from "./overrides";

export interface SweepAxis {
  readonly path: string;
  readonly from: number; // SI
  readonly to: number; // SI
  readonly steps: number;
}

export const MAX_SWEEP_STEPS = 500;

/**
 * Parses "path=from:to:steps" (bounds as SI numbers or with units, e.g. "ambient.currentSpeed=0:1 knot:11").
 * Returns a message naming the problem instead of throwing.
 */
export function parseSweepAxis(text: string): { ok: true; axis: SweepAxis } | { ok: false; message: string } {
  const eq = text.indexOf("=");
  if (eq <= 0) {
    return {
      ok: false,
      message: `"${text}" must look like path=from:to:steps, e.g. ambient.currentSpeed=0:0.5:11`,
    };
  }
  const path = text.slice(0, eq).trim();
  const parts = text.slice(eq + 1).split(":");
  if (parts.length !== 3) return { ok: false, message: `"${text}" must give from:to:steps after "${path}="` };
  return axisFromParts(path, parts[0]!, parts[1]!, parts[2]!);
}

export function axisFromParts(
  path: string,
  fromRaw: unknown,
  toRaw: unknown,
  stepsRaw: unknown,
): { ok: true; axis: SweepAxis } | { ok: false; message: string } {
  const info = overridePathInfo(path);
  if (!info) return { ok: false, message: `${path.slice(0, 80)}: ${overrideIssue(path, 0)}` };
  const steps = typeof stepsRaw === "number" ? stepsRaw : Number(String(stepsRaw).trim());
  if (!Number.isInteger(steps) || steps < 1 || steps > MAX_SWEEP_STEPS) {
    return { ok: false, message: `${path}: steps must be a whole number from 1 to ${MAX_SWEEP_STEPS}` };
  }
  const bounds: number[] = [];
  for (const [what, raw] of [
    ["from", fromRaw],
    ["to", toRaw],
  ] as const) {
    const q = quantityToSI(typeof raw === "string" ? raw.trim() : raw, info.kind);
    if (!q.ok) return { ok: false, message: `${path}: "${what}" ${q.message}` };
    const issue = overrideIssue(path, info.integer ? Math.round(q.value) : q.value);
    if (issue) return { ok: false, message: `${path}: "${what}" ${issue}` };
    bounds.push(q.value);
  }
  return { ok: true, axis: { path, from: bounds[0]!, to: bounds[1]!, steps } };
}

/** Evenly spaced values from `from` to `to` inclusive; whole numbers for integer paths. */
export function axisValues(axis: SweepAxis): number[] {
  const info = overridePathInfo(axis.path);
  const out: number[] = [];
  for (let i = 0; i < axis.steps; i++) {
    const v = axis.steps === 1 ? axis.from : axis.from + ((axis.to - axis.from) * i) / (axis.steps - 1);
    out.push(info?.integer ? Math.round(v) : v);
  }
  return out;
}

export interface SweepGridPoint {
  /** Index along each axis. */
  readonly index: readonly number[];
  readonly overrides: Overrides;
}

/** Grid points, first axis slowest. */
export function sweepGrid(axes: readonly SweepAxis[]): SweepGridPoint[] {
  if (axes.length < 1 || axes.length > 2) throw new Error("a sweep varies one or two inputs");
  if (axes.length === 2 && axes[0]!.path === axes[1]!.path) {
    throw new Error(`${axes[0]!.path} is varied twice`);
  }
  const v0 = axisValues(axes[0]!);
  const v1 = axes.length === 2 ? axisValues(axes[1]!) : [null];
  const out: SweepGridPoint[] = [];
  v0.forEach((a, i) =>
    v1.forEach((b, j) => {
      const overrides: Record<string, number> = { [axes[0]!.path]: a };
      if (b !== null) overrides[axes[1]!.path] = b;
      out.push({ index: b === null ? [i] : [i, j], overrides });
    }),
  );
  return out;
}

export interface SweepRow {
  readonly index: readonly number[];
  readonly values: Overrides;
  readonly governingCase: string | null;
  readonly edgeDilution: number;
  readonly requiredDilution: number;
  readonly margin: number;
  /** True only when `verdict` is "meets". */
  readonly pass: boolean;
  /** The overall verdict over every ambient case (as `run`'s `overall`), or "refused". */
  readonly verdict: StudyVerdict;
  /** Why the governing case is outside the methods' scope (empty otherwise). */
  readonly scopeReasons: readonly string[];
  /** Equations of state used, one per ambient case, distinct names joined by " / ". */
  readonly equationOfState: string;
  /** "sinks" or "rises" (distinct values over the ambient cases joined by " / "); "" when refused. */
  readonly buoyancy: string;
  readonly error?: string;
}

export function sweepRows(grid: readonly SweepGridPoint[], points: readonly PointEvaluation[]): SweepRow[] {
  return grid.map((g, k) => {
    const p = points[k]!;
    if (p.worst < 0) {
      return {
        index: g.index,
        values: g.overrides,
        governingCase: null,
        edgeDilution: Number.NaN,
        requiredDilution: Number.NaN,
        margin: Number.NaN,
        pass: false,
        verdict: "refused",
        scopeReasons: [],
        equationOfState: "",
        buoyancy: "",
        error: p.error ?? "not run",
      };
    }
    const w = p.cases[p.worst]!;
    const eos = [...new Set(p.cases.map((c) => c.summary.equationOfState))].join(" / ");
    return {
      index: g.index,
      values: g.overrides,
      governingCase: w.name,
      edgeDilution: w.summary.edgeDilution,
      requiredDilution: w.summary.requiredDilution,
      margin: w.summary.margin,
      pass: p.verdict === "meets",
      verdict: p.verdict,
      scopeReasons: w.summary.scopeReasons,
      equationOfState: eos,
      buoyancy: [...new Set(p.cases.map((c) => c.summary.buoyancy))].join(" / "),
    };
  });
}

export interface EosCrossing {
  readonly path: string;
  readonly between: readonly [Overrides, Overrides];
  readonly from: string;
  readonly to: string;
}

/** Neighbouring grid points (along either axis) where the discharge changes from sinking to rising or back. */
export function buoyancyCrossings(
  axes: readonly SweepAxis[],
  rows: readonly SweepRow[],
): (EosCrossing & { readonly verdicts: readonly [string, string] })[] {
  const key = (idx: readonly number[]) => idx.join(",");
  const byIndex = new Map(rows.map((r) => [key(r.index), r]));
  const out: (EosCrossing & { verdicts: readonly [string, string] })[] = [];
  for (const r of rows) {
    axes.forEach((axis, a) => {
      const next = [...r.index];
      next[a] = next[a]! + 1;
      const n = byIndex.get(key(next));
      if (n && r.buoyancy && n.buoyancy && n.buoyancy !== r.buoyancy) {
        out.push({
          path: axis.path,
          between: [r.values, n.values],
          from: r.buoyancy,
          to: n.buoyancy,
          verdicts: [r.verdict, n.verdict],
        });
      }
    });
  }
  return out;
}

/** Neighbouring grid points (along either axis) whose equation of state differs. */
export function eosCrossings(axes: readonly SweepAxis[], rows: readonly SweepRow[]): EosCrossing[] {
  const key = (idx: readonly number[]) => idx.join(",");
  const byIndex = new Map(rows.map((r) => [key(r.index), r]));
  const out: EosCrossing[] = [];
  for (const r of rows) {
    axes.forEach((axis, a) => {
      const next = [...r.index];
      next[a] = next[a]! + 1;
      const n = byIndex.get(key(next));
      if (n && r.equationOfState && n.equationOfState && n.equationOfState !== r.equationOfState) {
        out.push({
          path: axis.path,
          between: [r.values, n.values],
          from: r.equationOfState,
          to: n.equationOfState,
        });
      }
    });
  }
  return out;
}

/** Columns of a sweep's table and CSV: the varied paths (SI), then the results of each point. */
export const SWEEP_RESULT_COLUMNS = [
  "governingCase",
  "edgeDilution",
  "requiredDilution",
  "margin",
  "verdict",
  "pass",
  "scopeReasons",
  "equationOfState",
  "discharge",
  "error",
] as const;

/**
 * A sweep as flat records for CSV (command line and app alike): the varied paths with SI values, then
 * governing case, edge and required dilution, margin, verdict, pass, scope reasons, equation of state,
 * whether the discharge sinks or rises, and the refusal message.
 */
export function sweepRecords(
  axes: readonly SweepAxis[],
  rows: readonly SweepRow[],
): { columns: string[]; records: Record<string, unknown>[] } {
  const records = rows.map((r) => ({
    ...r.values,
    governingCase: r.governingCase,
    edgeDilution: r.edgeDilution,
    requiredDilution: r.requiredDilution,
    margin: r.margin,
    verdict: r.verdict,
    pass: r.pass,
    scopeReasons: r.scopeReasons.join(" "),
    equationOfState: r.equationOfState,
    discharge: r.buoyancy,
    ...(r.error ? { error: r.error } : {}),
  }));
  return { columns: [...axes.map((a) => a.path), ...SWEEP_RESULT_COLUMNS], records };
}
