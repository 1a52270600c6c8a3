/**
 * Part of normalising a scenario (normalise.ts): salinity bases (psu, TDS) to Absolute Salinity and the
 * ambient (uniform or a profile) to a sorted, checked profile; the stated ambient and the ambient cases.
 */
import type { AmbientCase, AmbientCaseField, AmbientInput, BasinInput, ProfilePoint } from "./types";
import type { SalinityValue, ScenarioFileParsed } from "./schema";
import { normaliseRecord } from "../record/normalise";
import {
  absoluteSalinityFromPractical,
  absoluteSalinityFromPracticalValidityIssues,
  salinityFromTds,
  salinityFromTdsValidityIssues,
} from "../properties";
import { formatNumber } from "../units";
import { addConversionWarnings, issue, type NormaliseContext as Ctx } from "./issue";

export function resolveSalinity(s: SalinityValue, temperature: number, path: string, ctx: Ctx): number {
  if (s.basis === "absolute") return s.value;
  if (s.basis === "practical") {
    const sa = absoluteSalinityFromPractical(s.value);
    addConversionWarnings(ctx, path, absoluteSalinityFromPracticalValidityIssues(s.value));
    ctx.conversions.push(
      `${path}: ${String(s.raw)} practical salinity → ${formatNumber(sa)} g/kg Absolute Salinity (TEOS-10 reference-composition factor 35.16504/35)`,
    );
    return sa;
  }
  const sa = salinityFromTds(s.value, temperature, 0);
  addConversionWarnings(ctx, path, salinityFromTdsValidityIssues(s.value));
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

/** The stated ambient: its profile, current, bed slope, basin and record. Null (with issues) when unusable. */
export function ambientFromFile(f: ScenarioFileParsed, ctx: Ctx): AmbientInput | null {
  const a = f.ambient;
  const depth = a.depth;
  const prof = buildProfile(a as RawAmbientLike, depth, "ambient", ctx);
  const ambient: AmbientInput | null = prof && {
    depth,
    profile: prof.profile,
    uniform: prof.uniform,
    currentSpeed: num(a.currentSpeed, 0),
    currentDirection: num(a.currentDirection, 0),
    bedSlope: num(a.bedSlope, 0),
    bedSlopeAzimuth: num(a.bedSlopeAzimuth, 0),
    ...(a.basin ? { basin: basinFrom(a.basin, ctx) } : {}),
  };
  if (ambient && a.record) {
    // One note for the whole column: the conversions themselves follow resolveSalinity.
    const quiet: Ctx = { issues: ctx.issues, conversions: [], ...(ctx.warnings ? { warnings: ctx.warnings } : {}) };
    const rec = normaliseRecord(a.record, ambient.profile[ambient.profile.length - 1]!.temperature, (sv, t) =>
      resolveSalinity(sv, t, "ambient.record.salinity", quiet),
    );
    ctx.issues.push(...rec.issues);
    ctx.conversions.push(...rec.notes);
    if (rec.record) (ambient as { record?: AmbientInput["record"] }).record = rec.record;
  }
  return ambient;
}

function basinFrom(b: { volume: number; flushingTime?: number; exchangeFlow?: number }, ctx: Ctx): BasinInput {
  if ((b.flushingTime === undefined) === (b.exchangeFlow === undefined))
    ctx.issues.push(
      issue(
        "ambient.basin",
        "(basin)",
        'must give exactly one of flushingTime (s, e.g. "10 days") or exchangeFlow (m³/s) beside the volume',
      ),
    );
  return b.flushingTime !== undefined
    ? { volume: b.volume, flushingTime: b.flushingTime }
    : { volume: b.volume, exchangeFlow: b.exchangeFlow };
}

function num(v: number | undefined, fallback: number): number {
  return v === undefined ? fallback : v;
}

/** A profile held at its deepest values down to a deeper seabed (in place). */
function extendToDepth(profile: ProfilePoint[], depth: number): void {
  const last = profile[profile.length - 1]!;
  if (last.depth < depth) profile.push({ ...last, depth });
}

/** The stated profile with a case's own salinity or own temperature at every depth. */
function profileWithOneQuantity(
  stated: readonly ProfilePoint[],
  c: { salinity?: SalinityValue; temperature?: number },
  path: string,
  ctx: Ctx,
): ProfilePoint[] {
  if (c.temperature !== undefined) return stated.map((p) => ({ ...p, temperature: c.temperature! }));
  const sa = resolveSalinity(c.salinity!, stated[0]!.temperature, `${path}.salinity`, ctx);
  return stated.map((p) => ({ ...p, salinity: sa }));
}

/** The ambient cases: each the stated ambient with the fields it sets. */
export function ambientCasesFromFile(f: ScenarioFileParsed, ambient: AmbientInput | null, ctx: Ctx): AmbientCase[] {
  const ambientCases: AmbientCase[] = [];
  (f.ambientCases ?? []).forEach((c, i) => {
    if (!ambient) return;
    const cd = c.depth ?? ambient.depth;
    const hasOwnWater = c.profile !== undefined || c.salinity !== undefined || c.temperature !== undefined;
    let profile = ambient.profile.map((p) => ({ ...p }));
    let uniform = ambient.uniform;
    const onlyOneOfTwo = c.profile === undefined && (c.salinity === undefined) !== (c.temperature === undefined);
    if (hasOwnWater && onlyOneOfTwo && !ambient.uniform) {
      // Stratified stated water and a case that sets only its salinity or only its temperature: the other
      // quantity keeps the stated profile, depth by depth, rather than its surface value all the way down.
      profile = profileWithOneQuantity(ambient.profile, c, `ambientCases.${i}`, ctx);
      extendToDepth(profile, cd);
      uniform = profile.every((p) => p.salinity === profile[0]!.salinity && p.temperature === profile[0]!.temperature);
    } else if (hasOwnWater) {
      const base = ambient.profile[0]!;
      // A case's profile beside its own salinity or temperature is refused, as for the stated ambient.
      const own: RawAmbientLike = c.profile
        ? { profile: c.profile, salinity: c.salinity, temperature: c.temperature }
        : {
            salinity: c.salinity ?? { basis: "absolute", value: base.salinity, raw: base.salinity },
            temperature: c.temperature ?? base.temperature,
          };
      const pr = buildProfile(own, cd, `ambientCases.${i}`, ctx);
      if (!pr) return;
      profile = pr.profile;
      uniform = pr.uniform;
    } else {
      extendToDepth(profile, cd);
    }
    const sets: AmbientCaseField[] = [];
    if (c.depth !== undefined) sets.push("depth");
    if (c.salinity !== undefined || c.profile !== undefined) sets.push("salinity");
    if (c.temperature !== undefined || c.profile !== undefined) sets.push("temperature");
    if (c.currentSpeed !== undefined) sets.push("currentSpeed");
    if (c.currentDirection !== undefined) sets.push("currentDirection");
    ambientCases.push({
      ...ambient,
      name: c.name,
      weight: c.weight ?? 1,
      sets,
      depth: cd,
      profile,
      uniform,
      currentSpeed: c.currentSpeed ?? ambient.currentSpeed,
      currentDirection: c.currentDirection ?? ambient.currentDirection,
    });
  });
  return ambientCases;
}
