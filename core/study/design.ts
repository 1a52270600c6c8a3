/**
 * Design search: a grid over port count, port diameter, port angle and port spacing (within a maximum
 * diffuser length), each candidate run under every ambient case (plus slack water unless the scenario
 * removes it). A candidate is kept when every case meets every limit at the mixing-zone edge and the
 * user's constraints hold: exit velocity within a range, diffuser length at most a maximum, the jet's
 * upper edge below the water surface by a clearance. The result is a short list with trade-offs,
 * not one answer.
 *
 * Diameters are chosen from the velocity range: for each port count, `diameterSteps` nominal diameters
 * (rounded to the millimetre) whose exit velocities are spread geometrically over the allowed range.
 */
import { z } from "zod";
import type { Scenario } from "../scenario/types";
import { quantityToSI, type QuantityKind } from "../units";
import type { PointEvaluation } from "./evaluate-point";
import type { Overrides } from "./overrides";

export interface DesignConstraints {
  readonly minExitVelocity: number; // m/s
  readonly maxExitVelocity: number; // m/s
  /** Longest diffuser allowed, m (ports spread over at most this length). */
  readonly maxLength: number;
  readonly portCounts: readonly number[];
  readonly portAngles: readonly number[]; // degrees above horizontal
  readonly portHeights: readonly number[]; // m above seabed
  readonly diameterSteps: number;
  /** Least distance between the jet's upper edge and the water surface, m (0: must not reach it). */
  readonly surfaceClearance: number;
  /** How many designs the short list holds at most. */
  readonly maxDesigns: number;
}

/**
 * Defaults (stated in `brinefield design --help`):
 * exit velocity 3–6 m/s, the typical range for brine diffusers (Bleninger & Jirka 2008, Desalination
 * 221:585–597, from memory); port angles 30°, 45° and 60°, the angles of the published laboratory series
 * (Cipollina et al. 2005; Lai & Lee 2012); 1 to 12 ports (a line diffuser needs 2 or more); the
 * scenario's port height; 5 diameters per port count; zero surface clearance (the jet must not reach
 * the surface); maximum length the scenario's diffuser length, or 50 m for a single port (screening
 * judgement, no source); a short list of at most 8.
 */
export function defaultConstraints(s: Scenario): DesignConstraints {
  return {
    minExitVelocity: 3,
    maxExitVelocity: 6,
    maxLength: s.diffuser.layout === "line" && s.diffuser.length > 0 ? s.diffuser.length : 50,
    portCounts: Array.from({ length: 12 }, (_, i) => i + 1),
    portAngles: [30, 45, 60],
    portHeights: [s.diffuser.portHeight],
    diameterSteps: 5,
    surfaceClearance: 0,
    maxDesigns: 8,
  };
}

const qty = (kind: QuantityKind, min: number, max: number, what: string) =>
  z.union([z.number(), z.string()]).transform((raw, ctx) => {
    const q = quantityToSI(raw, kind);
    if (!q.ok) {
      ctx.addIssue({ code: "custom", message: `${what}: ${q.message}` });
      return z.NEVER;
    }
    if (!(q.value >= min && q.value <= max)) {
      ctx.addIssue({ code: "custom", message: `${what} must be from ${min} to ${max} (SI)` });
      return z.NEVER;
    }
    return q.value;
  });

/** The `design` block of a scenario file (all optional; quantities as SI numbers or unit strings). */
export const designBlockSchema = z.strictObject({
  minExitVelocity: qty("speed", 0.1, 30, "minimum exit velocity").optional(),
  maxExitVelocity: qty("speed", 0.1, 30, "maximum exit velocity").optional(),
  maxLength: qty("length", 0, 10000, "maximum diffuser length").optional(),
  portCounts: z.array(z.number().int().min(1).max(200)).min(1).max(200).optional(),
  maxPorts: z.number().int().min(1).max(200).optional(),
  portAngles: z.array(qty("angle", 0, 90, "port angle")).min(1).max(20).optional(),
  portHeights: z.array(qty("length", 0, 100, "port height")).min(1).max(20).optional(),
  diameterSteps: z.number().int().min(1).max(50).optional(),
  surfaceClearance: qty("length", 0, 100, "surface clearance").optional(),
  maxDesigns: z.number().int().min(1).max(100).optional(),
});

export type DesignBlock = z.input<typeof designBlockSchema>;

/** Merges a raw `design` block (and CLI flags, same shape, winning) over the defaults. */
export function designConstraintsFrom(
  s: Scenario,
  ...blocks: readonly unknown[]
): { ok: true; constraints: DesignConstraints } | { ok: false; issues: { path: string; message: string }[] } {
  let c = defaultConstraints(s);
  const issues: { path: string; message: string }[] = [];
  for (const block of blocks) {
    if (block === undefined) continue;
    const r = designBlockSchema.safeParse(block);
    if (!r.success) {
      for (const i of r.error.issues) {
        issues.push({ path: ["design", ...i.path.map(String)].join("."), message: i.message });
      }
      continue;
    }
    const b = r.data;
    c = {
      ...c,
      ...(b.minExitVelocity !== undefined && { minExitVelocity: b.minExitVelocity }),
      ...(b.maxExitVelocity !== undefined && { maxExitVelocity: b.maxExitVelocity }),
      ...(b.maxLength !== undefined && { maxLength: b.maxLength }),
      ...(b.maxPorts !== undefined && { portCounts: Array.from({ length: b.maxPorts }, (_, i) => i + 1) }),
      ...(b.portCounts !== undefined && { portCounts: [...new Set(b.portCounts)].sort((x, y) => x - y) }),
      ...(b.portAngles !== undefined && { portAngles: b.portAngles }),
      ...(b.portHeights !== undefined && { portHeights: b.portHeights }),
      ...(b.diameterSteps !== undefined && { diameterSteps: b.diameterSteps }),
      ...(b.surfaceClearance !== undefined && { surfaceClearance: b.surfaceClearance }),
      ...(b.maxDesigns !== undefined && { maxDesigns: b.maxDesigns }),
    };
  }
  if (c.minExitVelocity > c.maxExitVelocity) {
    issues.push({ path: "design.minExitVelocity", message: "must not exceed the maximum exit velocity" });
  }
  if (s.diffuser.layout === "rosette") {
    issues.push({
      path: "diffuser.layout",
      message: "design search covers single-port and line diffusers, not rosettes",
    });
  }
  return issues.length > 0 ? { ok: false, issues } : { ok: true, constraints: c };
}

/** One candidate, named by the scenario's own diffuser fields (SI; portDiameter is as entered). */
export interface DesignCandidate {
  readonly portCount: number;
  readonly portDiameter: number;
  readonly portAngle: number;
  readonly portSpacing: number;
  readonly portHeight: number;
  readonly length: number;
  /** Mean port exit velocity, m/s (effective area). */
  readonly exitVelocity: number;
}

/** Exit velocity of the mean port for a nominal diameter (contraction applied to the area). */
export function exitVelocity(
  flow: number,
  portCount: number,
  nominalDiameter: number,
  contraction: number,
): number {
  return flow / portCount / ((Math.PI * nominalDiameter * nominalDiameter * contraction) / 4);
}

/** Every candidate meeting the geometric and velocity constraints (no pipeline runs yet). */
export function designCandidates(s: Scenario, c: DesignConstraints): DesignCandidate[] {
  const out: DesignCandidate[] = [];
  const q = s.discharge.flow;
  const cc = s.diffuser.contraction;
  for (const n of c.portCounts) {
    // Diameters whose velocities are spread geometrically over [vmin, vmax].
    const diameters = new Set<number>();
    for (let k = 0; k < c.diameterSteps; k++) {
      const f = c.diameterSteps === 1 ? 0.5 : k / (c.diameterSteps - 1);
      const v = c.minExitVelocity * Math.pow(c.maxExitVelocity / c.minExitVelocity, f);
      const d = Math.sqrt((4 * q) / (n * Math.PI * v * cc));
      diameters.add(Math.round(d * 1000) / 1000);
    }
    const spacings = n === 1 ? [0] : spacingOptions(s, n, c.maxLength);
    for (const d of diameters) {
      if (d < 0.005 || d > 3) continue; // outside the scenario format's port-diameter bounds
      const v = exitVelocity(q, n, d, cc);
      if (v < c.minExitVelocity * (1 - 1e-9) || v > c.maxExitVelocity * (1 + 1e-9)) continue;
      for (const spacing of spacings) {
        if (n > 1 && spacing <= d) continue; // ports may not overlap
        for (const angle of c.portAngles) {
          for (const h of c.portHeights) {
            out.push({
              portCount: n,
              portDiameter: d,
              portAngle: angle,
              portSpacing: spacing,
              portHeight: h,
              length: (n - 1) * spacing,
              exitVelocity: v,
            });
          }
        }
      }
    }
  }
  return out;
}

/** Ports spread over the full allowed length (least merging), and the scenario's spacing if it fits. */
function spacingOptions(s: Scenario, n: number, maxLength: number): number[] {
  if (maxLength <= 0) return [];
  const full = Math.floor((maxLength / (n - 1)) * 100) / 100; // centimetre-rounded, never over the length
  const out = [full];
  const own = s.diffuser.portSpacing;
  if (own > 0 && (n - 1) * own <= maxLength && Math.abs(own - full) > 0.01) out.push(own);
  return out.filter((x) => x > 0);
}

export function candidateOverrides(d: DesignCandidate): Overrides {
  const o: Record<string, number> = {
    "diffuser.portCount": d.portCount,
    "diffuser.portDiameter": d.portDiameter,
    "diffuser.portAngle": d.portAngle,
    "diffuser.portHeight": d.portHeight,
  };
  if (d.portCount > 1) o["diffuser.portSpacing"] = d.portSpacing;
  else o["diffuser.length"] = 0;
  return o;
}

export interface DesignVerdict {
  readonly candidate: DesignCandidate;
  readonly ok: boolean;
  /** Lowest margin over the ambient cases (edge dilution ÷ required dilution). */
  readonly worstMargin: number;
  readonly governingCase: string | null;
  readonly worstEdgeDilution: number;
  /** Least water-surface clearance over cases and methods, m. */
  readonly surfaceClearance: number | null;
  readonly reasons: readonly string[];
}

export function judgeDesign(
  candidate: DesignCandidate,
  p: PointEvaluation,
  c: DesignConstraints,
): DesignVerdict {
  const reasons: string[] = [];
  if (p.worst < 0) {
    return {
      candidate,
      ok: false,
      worstMargin: Number.NaN,
      governingCase: null,
      worstEdgeDilution: Number.NaN,
      surfaceClearance: null,
      reasons: [p.error ?? "not run"],
    };
  }
  let clearance: number | null = null;
  for (const k of p.cases) {
    if (k.summary.verdict === "exceeds") {
      reasons.push(`does not meet the limit in case "${k.name}" (margin ${k.summary.margin.toFixed(2)})`);
    } else if (k.summary.verdict === "outside-scope") {
      reasons.push(`outside the screening methods' scope in case "${k.name}": ${k.summary.scopeReasons.join(" ")}`);
    }
    if (k.summary.reachesSurface) reasons.push(`jet reaches the surface in case "${k.name}"`);
    const sc = k.summary.surfaceClearance;
    if (sc !== null) clearance = clearance === null ? sc : Math.min(clearance, sc);
  }
  const surfaced = reasons.some((r) => r.startsWith("jet reaches"));
  if (clearance !== null && clearance < c.surfaceClearance && !surfaced) {
    reasons.push(
      `jet's upper edge only ${clearance.toFixed(2)} m below the surface (${c.surfaceClearance} m required)`,
    );
  }
  const w = p.cases[p.worst]!;
  return {
    candidate,
    ok: reasons.length === 0,
    worstMargin: w.summary.margin,
    governingCase: w.name,
    worstEdgeDilution: w.summary.edgeDilution,
    surfaceClearance: clearance,
    reasons,
  };
}

export type DesignCriterion =
  | "fewest ports"
  | "lowest exit velocity"
  | "largest margin"
  | "shortest diffuser";

export interface RankedDesign extends DesignVerdict {
  readonly rank: number;
  /** The trade-offs this design is best at within the passing set. */
  readonly bestFor: readonly DesignCriterion[];
}

/**
 * The short list: the best passing design for each criterion (fewest ports, lowest exit velocity,
 * largest margin, shortest diffuser), then the rest of the Pareto front on (ports ↓, velocity ↓,
 * margin ↑, length ↓) ordered by margin, up to `max` designs.
 */
export function shortList(verdicts: readonly DesignVerdict[], max: number): RankedDesign[] {
  const ok = verdicts.filter((v) => v.ok);
  if (ok.length === 0) return [];
  type Order = (a: DesignVerdict, b: DesignVerdict) => number;
  const byMargin: Order = (a, b) => b.worstMargin - a.worstMargin;
  const crit: Record<DesignCriterion, Order> = {
    "fewest ports": (a, b) => a.candidate.portCount - b.candidate.portCount || byMargin(a, b),
    "lowest exit velocity": (a, b) => a.candidate.exitVelocity - b.candidate.exitVelocity || byMargin(a, b),
    "largest margin": (a, b) => byMargin(a, b) || a.candidate.portCount - b.candidate.portCount,
    "shortest diffuser": (a, b) => a.candidate.length - b.candidate.length || byMargin(a, b),
  };
  const best = new Map<DesignVerdict, DesignCriterion[]>();
  for (const [name, cmp] of Object.entries(crit) as [DesignCriterion, Order][]) {
    const top = [...ok].sort(cmp)[0]!;
    best.set(top, [...(best.get(top) ?? []), name]);
  }
  const dominated = (a: DesignVerdict) =>
    ok.some(
      (b) =>
        b !== a &&
        b.candidate.portCount <= a.candidate.portCount &&
        b.candidate.exitVelocity <= a.candidate.exitVelocity &&
        b.worstMargin >= a.worstMargin &&
        b.candidate.length <= a.candidate.length &&
        (b.candidate.portCount < a.candidate.portCount ||
          b.candidate.exitVelocity < a.candidate.exitVelocity ||
          b.worstMargin > a.worstMargin ||
          b.candidate.length < a.candidate.length),
    );
  const front = ok.filter((v) => !best.has(v) && !dominated(v)).sort(crit["largest margin"]);
  const list = [...best.keys(), ...front].slice(0, Math.max(1, max));
  return list.map((v, i) => ({ ...v, rank: i + 1, bestFor: best.get(v) ?? [] }));
}

/** A design as the scenario's own diffuser fields plus its trade-off numbers (the `--json` entry). */
export function designJson(d: RankedDesign) {
  return {
    rank: d.rank,
    bestFor: d.bestFor,
    portCount: d.candidate.portCount,
    portDiameter: d.candidate.portDiameter,
    portAngle: d.candidate.portAngle,
    portSpacing: d.candidate.portSpacing,
    portHeight: d.candidate.portHeight,
    length: d.candidate.length,
    layout: d.candidate.portCount === 1 ? "single" : "line",
    exitVelocity: d.candidate.exitVelocity,
    worstMargin: d.worstMargin,
    worstEdgeDilution: d.worstEdgeDilution,
    governingCase: d.governingCase,
    surfaceClearance: d.surfaceClearance,
  };
}
