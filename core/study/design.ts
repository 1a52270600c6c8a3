/**
 * Design search, part 1: the constraints and the candidate grid. A grid over port count, port diameter,
 * port angle, port height and port spacing (within a maximum diffuser length); each candidate is run
 * under every ambient case (design-rank.ts judges and ranks them).
 *
 * Diameters: for each port count, the diameters that keep the exit velocity within the allowed range
 * AND lie within [minPortDiameter, maxPortDiameter] — either `diameterSteps` diameters spread
 * geometrically over that interval (rounded to the millimetre) or, with `nominalSizes`, every nominal
 * pipe size in it (nominal-sizes.ts). Spacings: `spacingSteps` fractions of the longest spacing that
 * fits the maximum length (rounded down to 0.1 m), plus the scenario's own spacing when it fits; ports
 * never closer than one diameter. The grid is counted before it is built and refused over
 * `DESIGN_MAX_CANDIDATES` candidates or `DESIGN_MAX_RUNS` pipeline runs, naming the fields to narrow.
 */
import { z } from "zod";
import type { Scenario } from "../scenario/types";
import { quantityToSI, type QuantityKind } from "../units";
import type { Overrides } from "./overrides";
import { nominalDiametersBetween } from "./nominal-sizes";

/** Most candidates one search may try (each runs under every ambient case). */
export const DESIGN_MAX_CANDIDATES = 10_000;
/**
 * Most pipeline runs (candidates × ambient cases) one search may make. An edge-only run of the sandy-shelf
 * demo took 3–6 ms (1 to 200 ports) on our two-core build machine while it was heavily loaded, well under
 * that when idle: 30,000 runs over two workers stay within about a minute.
 */
export const DESIGN_MAX_RUNS = 30_000;

export interface DesignConstraints {
  readonly minExitVelocity: number; // m/s
  readonly maxExitVelocity: number; // m/s
  /** Longest diffuser allowed, m (ports spread over at most this length). */
  readonly maxLength: number;
  readonly portCounts: readonly number[];
  readonly portAngles: readonly number[]; // degrees above horizontal
  readonly portHeights: readonly number[]; // m above seabed
  readonly diameterSteps: number;
  /** Smallest and largest port diameter, m (nominal, as entered in a scenario). */
  readonly minPortDiameter: number;
  readonly maxPortDiameter: number;
  /** Keep diameters to nominal pipe sizes (nominal-sizes.ts) instead of `diameterSteps` diameters. */
  readonly nominalSizes: boolean;
  /** Spacings tried per port count: this many fractions of the longest spacing that fits. */
  readonly spacingSteps: number;
  /** Least margin (edge dilution ÷ required dilution) in every case for a design to be listed. */
  readonly minMargin: number;
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
 * scenario's port height; 5 diameters per port count; port diameters from 0.05 to 0.5 m (common practice
 * for seabed brine and outfall diffuser ports, no source); 4 spacings per port count; a least margin of 1
 * (the limit is met); zero surface clearance (the jet must not reach the surface); maximum length the
 * scenario's diffuser length, or 50 m for a single port (screening judgement, no source); a short list of
 * at most 8.
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
    minPortDiameter: 0.05,
    maxPortDiameter: 0.5,
    nominalSizes: false,
    spacingSteps: 4,
    minMargin: 1,
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
  portAngles: z
    .array(qty("angle", 0, 90, "port angle"))
    .min(1)
    .max(20)
    .optional(),
  portHeights: z
    .array(qty("length", 0, 100, "port height"))
    .min(1)
    .max(20)
    .optional(),
  diameterSteps: z.number().int().min(1).max(50).optional(),
  minPortDiameter: qty("smallLength", 0.005, 3, "smallest port diameter").optional(),
  maxPortDiameter: qty("smallLength", 0.005, 3, "largest port diameter").optional(),
  nominalSizes: z.boolean().optional(),
  spacingSteps: z.number().int().min(1).max(20).optional(),
  minMargin: z.number().min(1).max(100).optional(),
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
      ...(b.portAngles !== undefined && { portAngles: [...new Set(b.portAngles)] }),
      ...(b.portHeights !== undefined && { portHeights: [...new Set(b.portHeights)] }),
      ...(b.diameterSteps !== undefined && { diameterSteps: b.diameterSteps }),
      ...(b.minPortDiameter !== undefined && { minPortDiameter: b.minPortDiameter }),
      ...(b.maxPortDiameter !== undefined && { maxPortDiameter: b.maxPortDiameter }),
      ...(b.nominalSizes !== undefined && { nominalSizes: b.nominalSizes }),
      ...(b.spacingSteps !== undefined && { spacingSteps: b.spacingSteps }),
      ...(b.minMargin !== undefined && { minMargin: b.minMargin }),
      ...(b.surfaceClearance !== undefined && { surfaceClearance: b.surfaceClearance }),
      ...(b.maxDesigns !== undefined && { maxDesigns: b.maxDesigns }),
    };
  }
  if (c.minExitVelocity > c.maxExitVelocity) {
    issues.push({ path: "design.minExitVelocity", message: "must not exceed the maximum exit velocity" });
  }
  if (c.minPortDiameter > c.maxPortDiameter) {
    issues.push({
      path: "design.minPortDiameter",
      message: "must not exceed the largest port diameter (design.maxPortDiameter)",
    });
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
export function exitVelocity(flow: number, portCount: number, nominalDiameter: number, contraction: number): number {
  return flow / portCount / ((Math.PI * nominalDiameter * nominalDiameter * contraction) / 4);
}

/** The diameters tried for `n` ports: within the velocity range and the diameter limits (m, nominal). */
export function diametersForPortCount(s: Scenario, c: DesignConstraints, n: number): number[] {
  const q = s.discharge.flow;
  const cc = s.diffuser.contraction;
  const dAt = (v: number) => Math.sqrt((4 * q) / (n * Math.PI * v * cc));
  const lo = Math.max(dAt(c.maxExitVelocity), c.minPortDiameter);
  const hi = Math.min(dAt(c.minExitVelocity), c.maxPortDiameter);
  if (!(lo <= hi * (1 + 1e-9))) return [];
  const raw = c.nominalSizes
    ? nominalDiametersBetween(lo, hi)
    : Array.from({ length: c.diameterSteps }, (_, k) => {
        const f = c.diameterSteps === 1 ? 0.5 : k / (c.diameterSteps - 1);
        return Math.round(lo * Math.pow(hi / lo, f) * 1000) / 1000;
      });
  const out = new Set<number>();
  for (const d of raw) {
    if (d < 0.005 || d > 3) continue; // outside the scenario format's port-diameter bounds
    if (d < c.minPortDiameter - 1e-12 || d > c.maxPortDiameter + 1e-12) continue;
    const v = exitVelocity(q, n, d, cc);
    if (v < c.minExitVelocity * (1 - 1e-9) || v > c.maxExitVelocity * (1 + 1e-9)) continue;
    out.add(d);
  }
  return [...out].sort((a, b) => a - b);
}

/** Spacings tried for `n` ports (m; none for a single port). */
export function spacingsForPortCount(s: Scenario, c: DesignConstraints, n: number): number[] {
  if (n === 1 || c.maxLength <= 0) return [];
  const longest = c.maxLength / (n - 1);
  const out: number[] = [];
  for (let k = 1; k <= c.spacingSteps; k++) {
    const sp = Math.floor(((longest * k) / c.spacingSteps) * 10 + 1e-9) / 10; // 0.1 m, never over the length
    if (sp > 0 && !out.some((x) => Math.abs(x - sp) < 0.01)) out.push(sp);
  }
  const own = s.diffuser.portSpacing;
  if (own > 0 && (n - 1) * own <= c.maxLength + 1e-9 && !out.some((x) => Math.abs(x - own) < 0.01)) out.push(own);
  return out.sort((a, b) => a - b);
}

export type DesignPlan =
  | { readonly ok: true; readonly candidates: DesignCandidate[] }
  | { readonly ok: false; readonly count: number; readonly message: string };

/**
 * Counts the grid before building it; refuses one over `DESIGN_MAX_CANDIDATES` candidates or
 * `DESIGN_MAX_RUNS` runs (candidates × `caseCount`), naming the fields that set its size.
 */
export function planDesignSearch(s: Scenario, c: DesignConstraints, caseCount: number): DesignPlan {
  let count = 0;
  let maxD = 0;
  let maxS = 1;
  for (const n of c.portCounts) {
    const nd = diametersForPortCount(s, c, n).length;
    const ns = n === 1 ? 1 : spacingsForPortCount(s, c, n).length;
    maxD = Math.max(maxD, nd);
    maxS = Math.max(maxS, ns);
    count += nd * ns * c.portAngles.length * c.portHeights.length;
  }
  const runs = count * Math.max(1, caseCount);
  if (count > DESIGN_MAX_CANDIDATES || runs > DESIGN_MAX_RUNS) {
    const what =
      `${c.portCounts.length} port counts (design.maxPorts or design.portCounts) × up to ${maxD} diameters (design.diameterSteps` +
      `${c.nominalSizes ? ", design.nominalSizes" : ""}, design.minPortDiameter–design.maxPortDiameter) × up to ${maxS} spacings (design.spacingSteps) × ` +
      `${c.portAngles.length} angles (design.portAngles) × ${c.portHeights.length} port heights (design.portHeights)`;
    return {
      ok: false,
      count,
      message:
        `the design search would try ${count} candidates (${what}) under ${caseCount} ambient cases = ${runs} runs, more than the ` +
        `cap of ${DESIGN_MAX_CANDIDATES} candidates and ${DESIGN_MAX_RUNS} runs that keeps a search within about a minute; narrow those fields.`,
    };
  }
  return { ok: true, candidates: designCandidates(s, c) };
}

/** Every candidate meeting the geometric and velocity constraints (no pipeline runs yet), without duplicates. */
export function designCandidates(s: Scenario, c: DesignConstraints): DesignCandidate[] {
  const out: DesignCandidate[] = [];
  const seen = new Set<string>();
  const q = s.discharge.flow;
  const cc = s.diffuser.contraction;
  for (const n of [...new Set(c.portCounts)]) {
    const spacings = n === 1 ? [0] : spacingsForPortCount(s, c, n);
    for (const d of diametersForPortCount(s, c, n)) {
      const v = exitVelocity(q, n, d, cc);
      for (const spacing of spacings) {
        if (n > 1 && spacing <= d) continue; // ports may not overlap
        for (const angle of c.portAngles) {
          for (const h of c.portHeights) {
            const key = designKey(n, d, angle, spacing, h);
            if (seen.has(key)) continue;
            seen.add(key);
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

/** Identity of a geometry (millimetre, 0.01° and centimetre resolution): equal keys are the same design. */
export function designKey(n: number, d: number, angle: number, spacing: number, height: number): string {
  const r = (x: number, k: number) => Math.round(x * k);
  return `${n}|${r(d, 1000)}|${r(angle, 100)}|${n > 1 ? r(spacing, 100) : 0}|${r(height, 100)}`;
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
