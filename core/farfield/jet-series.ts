/**
 * Near-field dilution as a function of plan distance from the port, read from one method's result.
 *
 * With an integral path: the centreline dilution where the path first reaches the plan distance
 * (linear interpolation between path points). Without a path (length-scale methods): piecewise-linear
 * interpolation through (0, 1), (max-rise distance, max-rise dilution), (impact distance, impact dilution)
 * and (near-field distance, near-field dilution), keeping only points that increase in both distance
 * and dilution. The interpolation between published points is engineering judgement.
 */
import type { NearFieldMethodResult } from "../nearfield/types";
import { interpolateLinear } from "../interpolate";

export interface JetProfile {
  readonly distance: readonly number[]; // m, plan distance, ascending
  readonly dilution: readonly number[];
  readonly basis: "path" | "length-scale points";
}

/** Monotone (distance, dilution) profile of a near-field method up to its near-field end. */
export function jetProfileFromNearField(nf: NearFieldMethodResult): JetProfile {
  const dist: number[] = [0];
  const dil: number[] = [1];
  if (nf.path && nf.path.length >= 2) {
    for (const p of nf.path) {
      const r = Math.hypot(p.x, p.y);
      if (r > dist[dist.length - 1] && p.dilution >= dil[dil.length - 1]) {
        dist.push(r);
        dil.push(p.dilution);
      }
    }
    const xn = nf.nearFieldDistance;
    const sn = nf.nearFieldDilution;
    if (xn !== null && sn !== null && xn > dist[dist.length - 1] && sn >= dil[dil.length - 1]) {
      dist.push(xn);
      dil.push(sn);
    }
    return { distance: dist, dilution: dil, basis: "path" };
  }
  const pts: [number | null | undefined, number | null | undefined][] = [
    [nf.maxRiseDistance, nf.maxRiseDilution],
    [nf.impactDistance, nf.impactDilution],
    [nf.nearFieldDistance, nf.nearFieldDilution],
  ];
  for (const [x, s] of pts) {
    if (x === null || x === undefined || s === null || s === undefined) continue;
    if (x > dist[dist.length - 1] && s >= dil[dil.length - 1]) {
      dist.push(x);
      dil.push(s);
    }
  }
  return { distance: dist, dilution: dil, basis: "length-scale points" };
}

/** Dilution at plan distance r on a profile (clamped to the profile's end values). */
export function dilutionFromProfile(profile: JetProfile, r: number): number {
  return interpolateLinear(profile.distance, profile.dilution, r);
}

/** End of the near field used downstream: near-field end, else impact, else return point (m, dilution). */
export function nearFieldEndFromResult(nf: NearFieldMethodResult): { distance: number; dilution: number } | null {
  const x = nf.nearFieldDistance ?? nf.impactDistance ?? nf.returnDistance;
  const s = nf.nearFieldDilution ?? nf.impactDilution;
  if (x === null || s === null) return null;
  return { distance: x, dilution: s };
}
