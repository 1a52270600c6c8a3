/**
 * Design search, part 2: judging each candidate against every ambient case, ranking the passing ones by
 * one stated rule, the nearest miss when none passes, and each design as a `diffuser` block that can be
 * pasted into a scenario as it is. Shared by `brinefield design` and the app.
 *
 * Ranking rule (DESIGN_RANKING_RULE): fewest ports, then the shortest diffuser, then the exit velocity
 * nearest the middle of the allowed band, then the larger worst-case margin, then the smaller diameter.
 * Fewer ports and a shorter pipe are the cheaper build (common practice, no source); within the band,
 * a velocity away from both ends leaves room for flow changes either way.
 */
import type { Scenario } from "../scenario/types";
import { CAUTION } from "../result/contract";
import type { PointEvaluation } from "./evaluate-point";
import type { DesignCandidate, DesignConstraints } from "./design";
import { NOMINAL_SIZES_SOURCE } from "./nominal-sizes";

export interface DesignVerdict {
  readonly candidate: DesignCandidate;
  readonly ok: boolean;
  /** The candidate's inputs break a scenario rule (counted apart from designs that do not meet the limit). */
  readonly refused: boolean;
  /** Lowest margin over the ambient cases (edge dilution ÷ required dilution). */
  readonly worstMargin: number;
  readonly governingCase: string | null;
  readonly worstEdgeDilution: number;
  readonly requiredDilution: number;
  /** Least water-surface clearance over cases and methods, m. */
  readonly surfaceClearance: number | null;
  readonly reachesSurface: boolean;
  readonly reasons: readonly string[];
}

export function judgeDesign(candidate: DesignCandidate, p: PointEvaluation, c: DesignConstraints): DesignVerdict {
  const reasons: string[] = [];
  if (p.worst < 0) {
    return {
      candidate,
      ok: false,
      refused: true,
      worstMargin: Number.NaN,
      governingCase: null,
      worstEdgeDilution: Number.NaN,
      requiredDilution: Number.NaN,
      surfaceClearance: null,
      reachesSurface: false,
      reasons: [p.error ?? "not run"],
    };
  }
  let clearance: number | null = null;
  let surfaced = false;
  for (const k of p.cases) {
    if (!(k.summary.margin >= c.minMargin)) {
      reasons.push(
        c.minMargin > 1
          ? `margin ${k.summary.margin.toFixed(2)} in case "${k.name}" is below the required ${c.minMargin}`
          : `does not meet the limit in case "${k.name}" (margin ${k.summary.margin.toFixed(2)})`,
      );
    }
    if (k.summary.verdict === "outside-scope") {
      reasons.push(`outside the screening methods' scope in case "${k.name}": ${k.summary.scopeReasons.join(" ")}`);
    }
    if (k.summary.reachesSurface) {
      surfaced = true;
      reasons.push(`jet reaches the surface in case "${k.name}"`);
    }
    const sc = k.summary.surfaceClearance;
    if (sc !== null) clearance = clearance === null ? sc : Math.min(clearance, sc);
  }
  if (clearance !== null && clearance < c.surfaceClearance && !surfaced) {
    reasons.push(
      `jet's upper edge only ${clearance.toFixed(2)} m below the surface (${c.surfaceClearance} m required)`,
    );
  }
  const w = p.cases[p.worst]!;
  return {
    candidate,
    ok: reasons.length === 0 && p.cases.every((k) => k.summary.pass),
    refused: false,
    worstMargin: w.summary.margin,
    governingCase: w.name,
    worstEdgeDilution: w.summary.edgeDilution,
    requiredDilution: w.summary.requiredDilution,
    surfaceClearance: clearance,
    reachesSurface: surfaced,
    reasons,
  };
}

export const DESIGN_RANKING_RULE =
  "Designs meeting every limit in every ambient case with at least the required margin, jet below the surface, are ranked by: " +
  "1) fewest ports, 2) shortest diffuser, 3) exit velocity nearest the middle of the allowed band, 4) larger worst-case margin, " +
  "5) smaller port diameter. A longer copy of a listed design with no more margin is left out.";

export type DesignCriterion = "fewest ports" | "lowest exit velocity" | "largest margin" | "shortest diffuser";

export interface RankedDesign extends DesignVerdict {
  readonly rank: number;
  /** The criteria this design is best at within the passing set (for information; the rank follows the rule). */
  readonly bestFor: readonly DesignCriterion[];
}

/** Orders two verdicts by DESIGN_RANKING_RULE. */
export function compareDesigns(c: DesignConstraints): (a: DesignVerdict, b: DesignVerdict) => number {
  const mid = (c.minExitVelocity + c.maxExitVelocity) / 2;
  return (a, b) =>
    a.candidate.portCount - b.candidate.portCount ||
    roundCm(a.candidate.length) - roundCm(b.candidate.length) ||
    Math.abs(a.candidate.exitVelocity - mid) - Math.abs(b.candidate.exitVelocity - mid) ||
    b.worstMargin - a.worstMargin ||
    a.candidate.portDiameter - b.candidate.portDiameter;
}

const roundCm = (x: number) => Math.round(x * 100);

/**
 * The short list: passing designs ordered by DESIGN_RANKING_RULE, at most `c.maxDesigns`. A design is left
 * out when a better-ranked one has the same ports, diameter, angle and height and at least its margin
 * (only a longer pipe, nothing gained).
 */
export function shortList(verdicts: readonly DesignVerdict[], c: DesignConstraints): RankedDesign[] {
  const ok = verdicts.filter((v) => v.ok);
  if (ok.length === 0) return [];
  const order = compareDesigns(c);
  const sorted = [...ok].sort(order);
  const kept: DesignVerdict[] = [];
  for (const v of sorted) {
    const same = (k: DesignVerdict) =>
      k.candidate.portCount === v.candidate.portCount &&
      k.candidate.portDiameter === v.candidate.portDiameter &&
      k.candidate.portAngle === v.candidate.portAngle &&
      k.candidate.portHeight === v.candidate.portHeight;
    if (kept.some((k) => same(k) && k.worstMargin >= v.worstMargin - 1e-9)) continue;
    kept.push(v);
  }
  const best = new Map<DesignVerdict, DesignCriterion[]>();
  const pick = (name: DesignCriterion, score: (v: DesignVerdict) => number) => {
    // Ties go to the better-ranked design.
    const top = kept.reduce((x, y) => (score(y) < score(x) - 1e-12 ? y : x));
    best.set(top, [...(best.get(top) ?? []), name]);
  };
  pick("fewest ports", (v) => v.candidate.portCount);
  pick("shortest diffuser", (v) => roundCm(v.candidate.length));
  pick("lowest exit velocity", (v) => v.candidate.exitVelocity);
  pick("largest margin", (v) => -v.worstMargin);
  return kept.slice(0, Math.max(1, c.maxDesigns)).map((v, i) => ({ ...v, rank: i + 1, bestFor: best.get(v) ?? [] }));
}

/** A change that would close the gap of the nearest miss. */
export interface DesignGapStep {
  /** The constraint or scenario field to change ("" for the dilution shortfall itself). */
  readonly field: string;
  readonly message: string;
}

export interface NearestMiss {
  readonly design: RankedDesignJson;
  readonly reasons: readonly string[];
  /** The margin a listed design needs (design.minMargin). */
  readonly requiredMargin: number;
  /** Factor by which the governing case's edge dilution must rise to reach it. */
  readonly dilutionShortfall: number;
  readonly toClose: readonly DesignGapStep[];
}

/** The failed candidate closest to passing: highest worst margin, preferring jets below the surface. */
export function nearestMiss(
  verdicts: readonly DesignVerdict[],
  c: DesignConstraints,
  s: Scenario,
  rawDiffuser?: unknown,
): NearestMiss | null {
  const ran = verdicts.filter((v) => !v.ok && !v.refused && Number.isFinite(v.worstMargin));
  if (ran.length === 0) return null;
  const below = ran.filter((v) => !v.reachesSurface);
  const pool = below.length ? below : ran;
  const miss = pool.reduce((a, b) => (b.worstMargin > a.worstMargin ? b : a));
  const d = miss.candidate;
  const shortfall = c.minMargin / miss.worstMargin;
  const steps: DesignGapStep[] = [];
  if (shortfall > 1) {
    steps.push({
      field: "",
      message:
        `the edge dilution in case "${miss.governingCase}" must rise ×${shortfall.toFixed(2)} (from ${miss.worstEdgeDilution.toFixed(1)} ` +
        `to ${(miss.worstEdgeDilution * shortfall).toFixed(1)}) to reach the required margin ${c.minMargin}`,
    });
  }
  const maxPorts = Math.max(...c.portCounts);
  if (d.portCount >= maxPorts)
    steps.push({
      field: "design.maxPorts",
      message: `it already has the most ports allowed (${maxPorts}): allow more ports`,
    });
  if (d.portCount > 1 && d.length >= c.maxLength * 0.74) {
    steps.push({
      field: "design.maxLength",
      message: `its diffuser is ${d.length.toFixed(1)} m of the ${c.maxLength} m allowed: allow a longer diffuser (wider spacing, less merging)`,
    });
  }
  if (d.exitVelocity >= c.maxExitVelocity * 0.9) {
    steps.push({
      field: "design.maxExitVelocity",
      message: `its exit velocity ${d.exitVelocity.toFixed(2)} m/s is near the ${c.maxExitVelocity} m/s allowed: a faster jet (higher Froude number) dilutes more`,
    });
  }
  if (d.portDiameter <= c.minPortDiameter * 1.05) {
    steps.push({
      field: "design.minPortDiameter",
      message: `its ports are at the smallest diameter allowed (${c.minPortDiameter} m)`,
    });
  }
  if (miss.reachesSurface) {
    steps.push({ field: "design.portAngles", message: "the jet reaches the surface: try lower port angles" });
  }
  if (steps.length <= (shortfall > 1 ? 1 : 0)) {
    steps.push({
      field: "mixingZone",
      message:
        "no design constraint is at its bound: the site (depth, current) or the limit itself decides; a longer outfall to deeper water is the usual remedy",
    });
  }
  const asRanked: RankedDesign = { ...miss, rank: 0, bestFor: [] };
  return {
    design: designJson(asRanked, s, rawDiffuser),
    reasons: miss.reasons,
    requiredMargin: c.minMargin,
    dilutionShortfall: shortfall,
    toClose: steps,
  };
}

/**
 * The diffuser block of a design, ready to paste into a scenario: the scenario's own diffuser fields
 * (port and axis azimuths, contraction, discharge coefficient, as written) with the design's layout,
 * port count, diameter (m, nominal), angle, height and — for more than one port — spacing. Fields that
 * follow from the port layout (length, flow split) are left out so the scenario derives them.
 */
export function designDiffuserBlock(d: DesignCandidate, s: Scenario, rawDiffuser?: unknown): Record<string, unknown> {
  const base: Record<string, unknown> =
    rawDiffuser !== null && typeof rawDiffuser === "object" && !Array.isArray(rawDiffuser)
      ? { ...(rawDiffuser as Record<string, unknown>) }
      : {
          portAzimuth: s.diffuser.portAzimuth,
          diffuserAzimuth: s.diffuser.diffuserAzimuth,
          ...(s.diffuser.contraction !== 1 && { contraction: s.diffuser.contraction }),
          ...(s.diffuser.dischargeCoefficient !== undefined && {
            dischargeCoefficient: s.diffuser.dischargeCoefficient,
          }),
        };
  for (const k of [
    "layout",
    "portCount",
    "portDiameter",
    "portAngle",
    "portHeight",
    "portSpacing",
    "length",
    "flowSplit",
    "risers",
  ])
    delete base[k];
  return {
    layout: d.portCount === 1 ? "single" : "line",
    portCount: d.portCount,
    portDiameter: d.portDiameter,
    portAngle: d.portAngle,
    portHeight: d.portHeight,
    ...(d.portCount > 1 && { portSpacing: d.portSpacing }),
    ...base,
  };
}

export type RankedDesignJson = ReturnType<typeof designJson>;

/** A design as its pasteable `diffuser` block plus its numbers (the `--json` entry). */
export function designJson(d: RankedDesign, s: Scenario, rawDiffuser?: unknown) {
  return {
    rank: d.rank,
    diffuser: designDiffuserBlock(d.candidate, s, rawDiffuser),
    bestFor: d.bestFor,
    portCount: d.candidate.portCount,
    portDiameter: d.candidate.portDiameter,
    portAngle: d.candidate.portAngle,
    portSpacing: d.candidate.portCount > 1 ? d.candidate.portSpacing : null,
    portHeight: d.candidate.portHeight,
    length: d.candidate.length,
    layout: d.candidate.portCount === 1 ? "single" : "line",
    exitVelocity: d.candidate.exitVelocity,
    worstMargin: d.worstMargin,
    worstEdgeDilution: d.worstEdgeDilution,
    requiredDilution: d.requiredDilution,
    governingCase: d.governingCase,
    surfaceClearance: d.surfaceClearance,
  };
}

export interface DesignOutcome {
  /** First line of the text output: how many passed, or that none did. */
  readonly headline: string;
  readonly rankingRule: string;
  readonly candidatesTried: number;
  readonly candidatesPassing: number;
  /** Candidates whose inputs break a scenario rule (refused, never a pass). */
  readonly candidatesRefused: number;
  readonly designs: ReturnType<typeof designJson>[];
  readonly ranked: readonly RankedDesign[];
  readonly nearestMiss: NearestMiss | null;
  readonly notes: readonly string[];
  readonly caution: string;
}

/** Everything the CLI and the app show after the candidates have been run. */
export function designOutcome(
  s: Scenario,
  c: DesignConstraints,
  candidates: readonly DesignCandidate[],
  points: readonly PointEvaluation[],
  rawDiffuser?: unknown,
): DesignOutcome {
  const verdicts = candidates.map((d, i) => judgeDesign(d, points[i]!, c));
  const ranked = shortList(verdicts, c);
  const passing = verdicts.filter((v) => v.ok).length;
  const refused = verdicts.filter((v) => v.refused).length;
  const miss = ranked.length === 0 ? nearestMiss(verdicts, c, s, rawDiffuser) : null;
  const headline =
    ranked.length > 0
      ? `${passing} of ${candidates.length} candidate designs meet every limit in every ambient case; the best ${ranked.length} are listed.`
      : `No design meets every limit in every ambient case (${candidates.length} candidates tried${refused ? `, ${refused} refused by the scenario rules` : ""})` +
        (miss
          ? `; nearest miss: ${miss.design.portCount} port(s) of ${(miss.design.portDiameter * 1000).toFixed(0)} mm, worst margin ${miss.design.worstMargin.toFixed(2)}.`
          : ".");
  const notes = [DESIGN_RANKING_RULE];
  if (c.nominalSizes) notes.push(`Port diameters kept to nominal sizes: ${NOMINAL_SIZES_SOURCE}.`);
  if (refused) {
    const first = verdicts.find((v) => v.refused)!;
    notes.push(`${refused} candidate(s) were refused by the scenario rules, e.g. ${first.reasons[0]}`);
  }
  return {
    headline,
    rankingRule: DESIGN_RANKING_RULE,
    candidatesTried: candidates.length,
    candidatesPassing: passing,
    candidatesRefused: refused,
    designs: ranked.map((d) => designJson(d, s, rawDiffuser)),
    ranked,
    nearestMiss: miss,
    notes,
    caution: CAUTION,
  };
}
