/**
 * Part of normalising a scenario (normalise.ts): salinity bases (psu, TDS) to Absolute Salinity and the
 * ambient (uniform or a profile) to a sorted, checked profile.
 */
import type { ProfilePoint } from "./types";
import type { SalinityValue } from "./schema";
import { absoluteSalinityFromPractical, salinityFromTds } from "../properties";
import { formatNumber } from "../units";
import { issue, type NormaliseContext as Ctx } from "./issue";

export function resolveSalinity(s: SalinityValue, temperature: number, path: string, ctx: Ctx): number {
  if (s.basis === "absolute") return s.value;
  if (s.basis === "practical") {
    const sa = absoluteSalinityFromPractical(s.value);
    ctx.conversions.push(
      `${path}: ${String(s.raw)} practical salinity → ${formatNumber(sa)} g/kg Absolute Salinity (TEOS-10 reference-composition factor 35.16504/35)`,
    );
    return sa;
  }
  const sa = salinityFromTds(s.value, temperature, 0);
  ctx.conversions.push(
    `${path}: ${String(s.raw)} total dissolved solids → ${formatNumber(sa)} g/kg (divided by the solution's density at ${formatNumber(temperature)} °C, atmospheric pressure)`,
  );
  return sa;
}

export interface RawAmbientLike {
  depth?: number;
  salinity?: SalinityValue;
  temperature?: number;
  profile?: { depth: number; salinity: SalinityValue; temperature: number }[];
  currentSpeed?: number;
  currentDirection?: number;
}

export function buildProfile(
  a: RawAmbientLike,
  depth: number,
  path: string,
  ctx: Ctx,
): { profile: ProfilePoint[]; uniform: boolean } | null {
  if (a.profile && (a.salinity !== undefined || a.temperature !== undefined)) {
    ctx.issues.push(
      issue(
        `${path}.profile`,
        "(profile and uniform values)",
        "give either a profile or uniform salinity and temperature, not both",
      ),
    );
    return null;
  }
  if (a.profile) {
    const pts = a.profile.map((p, i) => ({
      depth: p.depth,
      temperature: p.temperature,
      salinity: resolveSalinity(p.salinity, p.temperature, `${path}.profile.${i}.salinity`, ctx),
    }));
    const below = pts.findIndex((p) => p.depth > depth);
    if (below >= 0) {
      ctx.issues.push(
        issue(
          `${path}.profile.${below}.depth`,
          pts[below]!.depth,
          `is below the seabed (the water is ${formatNumber(depth)} m deep)`,
          [`${path}.depth`],
        ),
      );
      return null;
    }
    pts.sort((p, q) => p.depth - q.depth);
    for (let i = 1; i < pts.length; i++) {
      if (pts[i]!.depth === pts[i - 1]!.depth) {
        ctx.issues.push(issue(`${path}.profile`, pts[i]!.depth, "lists the same depth twice; each depth once"));
        return null;
      }
    }
    if (pts[0]!.depth > 0) {
      ctx.conversions.push(
        `${path}.profile: extended from ${formatNumber(pts[0]!.depth)} m up to the surface with the shallowest point's values`,
      );
      pts.unshift({ ...pts[0]!, depth: 0 });
    }
    const last = pts[pts.length - 1]!;
    if (last.depth < depth) {
      ctx.conversions.push(
        `${path}.profile: extended from ${formatNumber(last.depth)} m down to the seabed at ${formatNumber(depth)} m with the deepest point's values`,
      );
      pts.push({ ...last, depth });
    }
    return {
      profile: pts,
      uniform: pts.every((p) => p.salinity === pts[0]!.salinity && p.temperature === pts[0]!.temperature),
    };
  }
  if (a.salinity === undefined) {
    ctx.issues.push(issue(`${path}.salinity`, undefined, "expected the ambient salinity (g/kg) or a profile"));
    return null;
  }
  if (a.temperature === undefined) {
    ctx.issues.push(issue(`${path}.temperature`, undefined, "expected the ambient temperature (°C) or a profile"));
    return null;
  }
  const s = resolveSalinity(a.salinity, a.temperature, `${path}.salinity`, ctx);
  return {
    profile: [
      { depth: 0, salinity: s, temperature: a.temperature },
      { depth, salinity: s, temperature: a.temperature },
    ],
    uniform: true,
  };
}
