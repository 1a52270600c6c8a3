/**
 * Independent check of a claimed dilution at a distance: which of Brinefield's method chains reproduce
 * it, and how it compares with the conservative value.
 *
 * Each method chain (a near-field method carried on by the spreading dense layer or by passive diffusion,
 * or the jet itself where the distance lies inside the near field) is evaluated AT the distance of the
 * claim, by the same code that gives the mixing-zone edge — no scaling from the edge. It is evaluated in
 * every ambient case the overall verdict covers (the stated conditions, every listed case and, unless
 * turned off, slack water). Each chain also carries its near-field method's stated scatter (the method's
 * `dilutionRange` relative to its impact dilution).
 *
 * - conservative value: the lowest edge dilution at the distance over those cases (each case's own edge
 *   dilution, chosen as `run` chooses it); at the mixing-zone radius it is `run`'s
 *   `mixingZone.dilution` when the stated conditions govern.
 * - `supported`: the claim is at or below the conservative value (within 0.1 %).
 * - `plausible`: above the conservative value but at or below what at least one chain gives (its
 *   central value or the top of its stated scatter); those chains are named with their assumptions.
 * - `not-supported`: above every chain, scatter included.
 *
 * The scenario-level entry point (running the cases) is in claim-run.ts.
 */
import type { BrinefieldResult } from "../result/contract";

export type ClaimVerdict = "supported" | "plausible" | "not-supported";

/** Relative tolerance of "at or below" (0.1 %): a claim quoted to three figures is not penalised. */
export const CLAIM_TOLERANCE = 0.001;

export type ClaimFarField = "gravity-current" | "passive-diffusion" | "jet";

export interface ClaimChain {
  /** The ambient case the chain was evaluated in ("stated", a listed case, or the added slack water). */
  readonly case: string;
  /** Chain name as in `mixingZone.alternatives`, e.g. "integral + gravity-current". */
  readonly method: string;
  readonly nearFieldMethod: string;
  readonly farField: ClaimFarField;
  /** The chain's centreline dilution at the distance of the claim. */
  readonly dilution: number;
  /** Widened by the near-field method's stated scatter. */
  readonly low: number;
  readonly high: number;
  /** The claim is at or below this chain's value (central or top of its scatter), within 0.1 %. */
  readonly reproducesClaim: boolean;
  /** Reproduced only by the top of the method's stated scatter, not by its central value. */
  readonly onlyWithinScatter: boolean;
  /** What has to hold for this chain's number to apply. */
  readonly assumptions: readonly string[];
}

export interface ClaimCase {
  readonly name: string;
  /** The case's edge dilution at the distance (as `run` would give with the radius set there). */
  readonly edgeDilution: number;
  readonly currentSpeed: number;
}

export interface ClaimCheck {
  readonly verdict: ClaimVerdict;
  readonly claimedDilution: number;
  /** Plan distance of the claim, m. */
  readonly distance: number;
  /** Lowest edge dilution at the distance over the cases. */
  readonly conservativeDilution: number;
  /** Which case gives the conservative value. */
  readonly conservativeCase: string;
  /** Claimed ÷ conservative dilution. */
  readonly ratioToConservative: number;
  readonly chains: readonly ClaimChain[];
  readonly cases: readonly ClaimCase[];
  /** Lowest and highest chain value (central values), kept for scripts reading earlier versions. */
  readonly range: readonly [number, number];
  /** One sentence that says the verdict in words. */
  readonly summary: string;
  /** Sentences on what the claim needs (the reproducing chains' assumptions, or why none does). */
  readonly assumptionsNeeded: readonly string[];
}

/** One case's pipeline result, run with the mixing-zone radius set to the distance of the claim. */
export interface ClaimCaseResult {
  readonly name: string;
  readonly currentSpeed: number;
  readonly result: BrinefieldResult;
}

function fmt(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  return Math.abs(v) >= 100 ? v.toFixed(0) : String(Number(v.toPrecision(3)));
}

/** Splits an alternatives entry ("integral + passive-diffusion", "length-scale (jet crosses the edge)"). */
export function chainParts(method: string): { nearFieldMethod: string; farField: ClaimFarField } {
  const plus = method.indexOf(" + ");
  if (plus >= 0) {
    const far = method.slice(plus + 3).trim();
    return {
      nearFieldMethod: method.slice(0, plus),
      farField: far === "passive-diffusion" ? "passive-diffusion" : "gravity-current",
    };
  }
  const paren = method.indexOf(" (");
  return { nearFieldMethod: paren >= 0 ? method.slice(0, paren) : method, farField: "jet" };
}

function chainAssumptions(c: ClaimCaseResult, nf: string, far: ClaimFarField, distance: number): string[] {
  const r = c.result;
  const method = r.nearField.find((m) => m.method === nf);
  const out: string[] = [];
  out.push(
    c.name === "stated"
      ? `Ambient: the stated conditions (current ${fmt(c.currentSpeed)} m/s).`
      : `Ambient: case "${c.name}" (current ${fmt(c.currentSpeed)} m/s).`,
  );
  out.push(nearFieldSentence(nf, method !== undefined));
  if (far === "jet") {
    out.push(`The distance (${fmt(distance)} m) lies inside the jet: the jet's own centreline dilution there.`);
  } else if (far === "gravity-current") {
    out.push(
      "Beyond the near field: the brine spreads as a dense layer on the seabed, mixing by the Turner (1986) entrainment law E(Ri); it needs no current.",
    );
  } else {
    out.push(
      "Beyond the near field: the case's current, taken as steady, carries the layer and it mixes by Brooks (1960) passive diffusion; that current must persist (not slack water) and the layer's own spreading is neglected.",
    );
  }
  if (r.multiport.dilutionFactor < 1) {
    out.push(
      `Neighbouring jets merge (${r.multiport.regime}): single-jet dilution is reduced by a factor ${r.multiport.dilutionFactor.toFixed(2)}.`,
    );
  }
  return out;
}

/** A short sentence on the near-field method (its full source is in the run's result and the report). */
function nearFieldSentence(nf: string, known: boolean): string {
  if (nf === "length-scale") {
    return "Near field: the length-scale correlations for an inclined dense jet (laboratory coefficients of Roberts, Ferrier & Daviero 1997 and Lai & Lee 2012).";
  }
  if (nf === "integral") return "Near field: the integral jet model (entrainment closure of Lee & Cheung 1990).";
  return known ? `Near field: the ${nf} method.` : `Near field: the ${nf} method (no result in this case).`;
}

/** The near-field method's stated scatter relative to its impact dilution: [≤ 1, ≥ 1]. */
function scatterOf(r: BrinefieldResult, nf: string): [number, number] {
  const m = r.nearField.find((x) => x.method === nf);
  if (!m || !m.dilutionRange || !m.impactDilution || !(m.impactDilution > 0)) return [1, 1];
  return [Math.min(1, m.dilutionRange[0] / m.impactDilution), Math.max(1, m.dilutionRange[1] / m.impactDilution)];
}

/**
 * The claim check from case results already computed at the distance (every result's mixing-zone radius
 * is `distance`). Pure: the scenario-level runner is `checkClaimOnScenario` (claim-run.ts).
 */
export function checkClaimFromCases(
  cases: readonly ClaimCaseResult[],
  claimedDilution: number,
  distance: number,
): ClaimCheck {
  if (cases.length === 0) throw new Error("checkClaimFromCases: no case results");
  const tol = 1 + CLAIM_TOLERANCE;
  const chains: ClaimChain[] = [];
  for (const c of cases) {
    const mz = c.result.mixingZone;
    const list = mz.alternatives.length ? mz.alternatives : [{ method: mz.method, dilution: mz.dilution }];
    for (const alt of list) {
      const { nearFieldMethod, farField } = chainParts(alt.method);
      const [lo, hi] = scatterOf(c.result, nearFieldMethod);
      const dilution = alt.dilution;
      const low = Math.max(1, dilution * lo);
      const high = Math.max(1, dilution * hi);
      const central = claimedDilution <= dilution * tol;
      const reproducesClaim = claimedDilution <= high * tol;
      chains.push({
        case: c.name,
        method: alt.method,
        nearFieldMethod,
        farField,
        dilution,
        low,
        high,
        reproducesClaim,
        onlyWithinScatter: reproducesClaim && !central,
        assumptions: chainAssumptions(c, nearFieldMethod, farField, distance),
      });
    }
  }
  const caseList: ClaimCase[] = cases.map((c) => ({
    name: c.name,
    edgeDilution: c.result.mixingZone.dilution,
    currentSpeed: c.currentSpeed,
  }));
  let gov = caseList[0]!;
  for (const k of caseList) if (k.edgeDilution < gov.edgeDilution) gov = k;
  const conservative = gov.edgeDilution;
  const ratio = claimedDilution / conservative;
  const reproducing = chains.filter((c) => c.reproducesClaim);
  const verdict: ClaimVerdict =
    claimedDilution <= conservative * tol ? "supported" : reproducing.length > 0 ? "plausible" : "not-supported";
  const centrals = chains.map((c) => c.dilution);
  const range: [number, number] = [Math.min(...centrals), Math.max(...centrals)];
  const where = `at ${fmt(distance)} m`;
  const caseLabel = (name: string) => (name === "stated" ? "stated conditions" : `"${name}"`);
  // Reproducing chains grouped by method, each with the cases it reproduces the claim in.
  const groups = new Map<string, ClaimChain[]>();
  for (const c of reproducing) groups.set(c.method, [...(groups.get(c.method) ?? []), c]);
  const groupText = [...groups.entries()].map(([m, list]) => `${m} (${list.map((c) => caseLabel(c.case)).join(", ")})`);
  let summary: string;
  const assumptionsNeeded: string[] = [];
  if (verdict === "supported") {
    summary =
      `The claimed dilution ${fmt(claimedDilution)} ${where} is at or below Brinefield's conservative value ` +
      `${fmt(conservative)} (case ${caseLabel(gov.name)}; ratio ${ratio.toFixed(3)}).`;
  } else if (verdict === "plausible") {
    summary =
      `The claimed dilution ${fmt(claimedDilution)} ${where} is ${ratio.toFixed(2)}× Brinefield's conservative value ` +
      `${fmt(conservative)} (case ${caseLabel(gov.name)}). ${reproducing.length} of ${chains.length} method chains give at least that much: ` +
      groupText.join("; ") +
      ".";
    for (const [m, list] of groups) {
      const first = list[0]!;
      const scatterOnly = list.filter((c) => c.onlyWithinScatter).map((c) => caseLabel(c.case));
      const rest = first.assumptions.filter((a) => !a.startsWith("Ambient:") && !a.startsWith("Neighbouring jets"));
      const merged = list.some((c) => c.assumptions.some((a) => a.startsWith("Neighbouring jets")))
        ? " Neighbouring jets merge in some of these cases, which lowers the single-jet dilution (already allowed for)."
        : "";
      const scatter = scatterOnly.length
        ? ` In ${scatterOnly.join(", ")} only the top of the near-field method's stated scatter reaches the claim.`
        : "";
      assumptionsNeeded.push(
        `${m}, in ${list.map((c) => caseLabel(c.case)).join(", ")}: ${rest.join(" ")}${merged}${scatter}`,
      );
    }
  } else {
    const top = chains.reduce((a, b) => (b.high > a.high ? b : a));
    summary =
      `The claimed dilution ${fmt(claimedDilution)} ${where} is above every method chain, scatter included ` +
      `(highest ${fmt(top.high)}, ${top.method} in ${caseLabel(top.case)}); it is ${ratio.toFixed(2)}× the conservative value ${fmt(conservative)}.`;
    assumptionsNeeded.push(
      "The claim would need a near-field law that dilutes more than the published ones, more mixing in the spreading layer than E(Ri) allows, a steadier or stronger current, or different inputs (flow, port size, depth, salinity).",
    );
  }
  return {
    verdict,
    claimedDilution,
    distance,
    conservativeDilution: conservative,
    conservativeCase: gov.name,
    ratioToConservative: ratio,
    chains,
    cases: caseList,
    range,
    summary,
    assumptionsNeeded,
  };
}
