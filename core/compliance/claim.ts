/**
 * Independent check of a claimed dilution at a distance against Brinefield's own range.
 *
 * The range at distance L runs from the lowest to the highest dilution over the method chains reported
 * at the mixing-zone edge (`mixingZone.alternatives`) and over each near-field method's stated
 * uncertainty (`dilutionRange` relative to its impact dilution). Away from the edge the chains are
 * scaled by the governing series' dilution at L relative to the edge (the series' shape is assumed to
 * apply to every chain — a screening simplification stated in `assumptionsNeeded`).
 */
import type { BrinefieldResult } from "../result/contract";

export type ClaimVerdict = "above" | "within" | "below";

export interface ClaimMethodValue {
  readonly method: string;
  readonly dilution: number;
  readonly low: number;
  readonly high: number;
}

export interface ClaimCheck {
  readonly verdict: ClaimVerdict;
  readonly range: readonly [number, number];
  readonly distance: number;
  readonly claimedDilution: number;
  /** Claimed ÷ nearest end of the range (1 when within). */
  readonly byHowMuch: number;
  readonly assumptionsNeeded: string[];
  readonly methods: ClaimMethodValue[];
}

function seriesDilutionAt(result: BrinefieldResult, distance: number): number {
  const { distance: xs, dilution: ys } = result.mixingZone.series;
  if (!xs.length) return result.mixingZone.dilution;
  if (distance <= xs[0]) return ys[0];
  for (let i = 1; i < xs.length; i++) {
    if (distance <= xs[i]) {
      const t = (distance - xs[i - 1]) / (xs[i] - xs[i - 1]);
      return ys[i - 1] + t * (ys[i] - ys[i - 1]);
    }
  }
  return ys[ys.length - 1];
}

/**
 * Compare a claimed dilution with Brinefield's independent range.
 * @param claimedDilution the dilution someone claims (dimensionless, > 0)
 * @param atDistance plan distance of the claim, m (default: the mixing-zone radius)
 */
export function checkClaim(result: BrinefieldResult, claimedDilution: number, atDistance?: number): ClaimCheck {
  const mz = result.mixingZone;
  const distance = atDistance ?? mz.radius;
  const atEdge = Math.abs(distance - mz.radius) < 1e-9;
  const governingAtL = atEdge ? mz.dilution : seriesDilutionAt(result, distance);
  const scale = mz.dilution > 0 ? governingAtL / mz.dilution : 1;
  const uncertainty = new Map<string, [number, number]>();
  for (const nf of result.nearField) {
    if (nf.dilutionRange && nf.impactDilution && nf.impactDilution > 0) {
      uncertainty.set(nf.method, [
        Math.min(1, nf.dilutionRange[0] / nf.impactDilution),
        Math.max(1, nf.dilutionRange[1] / nf.impactDilution),
      ]);
    }
  }
  const chains = mz.alternatives.length ? mz.alternatives : [{ method: mz.method, dilution: mz.dilution }];
  const methods: ClaimMethodValue[] = chains.map((alt) => {
    const dilution = Math.max(1, alt.dilution * scale);
    const nfName = [...uncertainty.keys()].find((k) => alt.method.startsWith(k));
    const [lo, hi] = nfName ? uncertainty.get(nfName)! : [1, 1];
    return { method: alt.method, dilution, low: Math.max(1, dilution * lo), high: Math.max(1, dilution * hi) };
  });
  const low = Math.min(governingAtL, ...methods.map((m) => m.low));
  const high = Math.max(governingAtL, ...methods.map((m) => m.high));
  const verdict: ClaimVerdict = claimedDilution > high ? "above" : claimedDilution < low ? "below" : "within";
  const byHowMuch = verdict === "above" ? claimedDilution / high : verdict === "below" ? claimedDilution / low : 1;
  const assumptionsNeeded: string[] = [];
  if (!atEdge) {
    assumptionsNeeded.push(
      `Away from the mixing-zone edge (${mz.radius} m) every method is scaled by the governing series' dilution at ${distance} m.`,
    );
  }
  if (verdict === "above") {
    assumptionsNeeded.push(
      `The claim is ${byHowMuch.toFixed(2)}× the highest dilution any method gives at ${distance} m, including each method's published scatter.`,
    );
    if (result.multiport.merged || result.multiport.dilutionFactor < 1) {
      assumptionsNeeded.push(
        `It would need the jets to dilute as if they did not interact (Brinefield reduced dilution by a factor ${result.multiport.dilutionFactor.toFixed(2)} for merging).`,
      );
    }
    if (!mz.alternatives.some((a) => a.method.includes("passive-diffusion"))) {
      assumptionsNeeded.push("It would need mixing beyond the near field from a current; the scenario has none.");
    }
    assumptionsNeeded.push(
      "Or it would need a different near-field law, more mixing in the spreading layer than E(Ri) allows, or different inputs (flow, port size, depth, salinity).",
    );
  } else if (verdict === "below") {
    assumptionsNeeded.push(
      `The claim is ${byHowMuch.toFixed(2)}× the lowest dilution any method gives: it is more conservative than all of them, for example by allowing for background build-up, re-entrainment or a lower-dilution near-field law.`,
    );
  }
  return { verdict, range: [low, high], distance, claimedDilution, byHowMuch, assumptionsNeeded, methods };
}
