/**
 * Immutable patching of a normalised (SI) scenario by dotted paths, for sweeps, design search and
 * Monte Carlo, where re-reading unit strings thousands of times would be slow. Derived fields are kept
 * consistent: a uniform ambient's two-point profile follows its salinity, temperature and depth; the
 * flow split, layout and diffuser length follow the port count; spacing and length follow each other;
 * the effective port diameter follows the nominal one through the contraction coefficient; a
 * `discharge.*` override removes the plant block (the discharge is then the stated one, not the plant's).
 *
 * An `ambient.*` override sets that field in the base ambient and in every ambient case.
 * A profile (non-uniform ambient) is shifted as a whole by `ambient.salinity` / `ambient.temperature`
 * so that its value at the seabed becomes the given one; stratification is kept.
 */
import type { AmbientInput, DiffuserInput, ProfilePoint, Scenario } from "../scenario/types";
import type { QuantityKind } from "../units";

export interface OverridePathInfo {
  readonly kind: QuantityKind;
  readonly label: string;
  readonly min: number;
  readonly max: number;
  readonly integer?: boolean;
  readonly exclusiveMin?: boolean;
}

/** Every path that can be overridden on a normalised scenario, with its quantity kind and SI bounds. */
export const OVERRIDE_PATHS: Readonly<Record<string, OverridePathInfo>> = {
  "ambient.depth": { kind: "length", label: "water depth", min: 0, max: 1000, exclusiveMin: true },
  "ambient.salinity": { kind: "salinity", label: "ambient salinity", min: 0, max: 80 },
  "ambient.temperature": { kind: "temperature", label: "ambient temperature", min: -2, max: 60 },
  "ambient.currentSpeed": { kind: "speed", label: "current speed", min: 0, max: 5 },
  "ambient.currentDirection": { kind: "angle", label: "current direction", min: 0, max: 360 },
  "ambient.bedSlope": { kind: "ratio", label: "bed slope", min: 0, max: 0.5 },
  "discharge.flow": { kind: "flow", label: "brine flow", min: 0, max: 100, exclusiveMin: true },
  "discharge.salinity": { kind: "salinity", label: "brine salinity", min: 0, max: 160 },
  "discharge.temperature": { kind: "temperature", label: "brine temperature", min: -2, max: 60 },
  "diffuser.portCount": { kind: "ratio", label: "port count", min: 1, max: 1000, integer: true },
  "diffuser.portDiameter": { kind: "smallLength", label: "port diameter", min: 0.005, max: 3 },
  "diffuser.portAngle": { kind: "angle", label: "port angle", min: 0, max: 90 },
  "diffuser.portHeight": { kind: "length", label: "port height", min: 0, max: 100 },
  "diffuser.portSpacing": { kind: "length", label: "port spacing", min: 0, max: 1000, exclusiveMin: true },
  "diffuser.portAzimuth": { kind: "angle", label: "port azimuth", min: 0, max: 360 },
  "diffuser.diffuserAzimuth": { kind: "angle", label: "diffuser azimuth", min: 0, max: 360 },
  "diffuser.length": { kind: "length", label: "diffuser length", min: 0, max: 10000 },
  "mixingZone.radius": {
    kind: "length",
    label: "mixing-zone radius",
    min: 0,
    max: 20000,
    exclusiveMin: true,
  },
};

export class OverrideError extends Error {
  constructor(
    readonly path: string,
    message: string,
  ) {
    super(`${path}: ${message}`);
    this.name = "OverrideError";
  }
}

export type Overrides = Readonly<Record<string, number>>;

/** Checks a path and value against `OVERRIDE_PATHS`; returns a message or null. */
export function overrideIssue(path: string, value: number): string | null {
  const info = OVERRIDE_PATHS[path];
  if (!info) return `is not a path that can be varied; use one of ${Object.keys(OVERRIDE_PATHS).join(", ")}`;
  if (!Number.isFinite(value)) return "must be a finite number";
  if (info.integer && !Number.isInteger(value)) return `must be a whole number (${info.label})`;
  const low = info.exclusiveMin ? value <= info.min : value < info.min;
  if (low || value > info.max) {
    return `${info.label} ${value} is outside ${info.exclusiveMin ? "(" : "["}${info.min}, ${info.max}] (SI)`;
  }
  return null;
}

/** Seabed value of a profile quantity (the deepest point). */
function bottom(profile: readonly ProfilePoint[], key: "salinity" | "temperature"): number {
  return profile[profile.length - 1]![key];
}

/** Reads the SI value at a path of a normalised scenario (ambient salinity/temperature: at the seabed). */
export function readPath(s: Scenario, path: string): number {
  if (!OVERRIDE_PATHS[path]) throw new OverrideError(path, overrideIssue(path, 0) ?? "unknown path");
  const [group, field] = path.split(".") as [string, string];
  if (group === "ambient" && (field === "salinity" || field === "temperature")) {
    return bottom(s.ambient.profile, field);
  }
  if (group === "diffuser" && field === "portDiameter") return s.diffuser.portDiameterNominal;
  const obj = (s as unknown as Record<string, Record<string, unknown>>)[group];
  const v = obj?.[field];
  if (typeof v !== "number") throw new OverrideError(path, "has no numeric value in this scenario");
  return v;
}

/** Returns a new, frozen scenario with the overrides applied (SI values). Throws OverrideError. */
export function withOverrides(s: Scenario, overrides: Overrides): Scenario {
  const entries = Object.entries(overrides);
  for (const [path, value] of entries) {
    const issue = overrideIssue(path, value);
    if (issue) throw new OverrideError(path, issue);
  }
  const ambientPatch: Record<string, number> = {};
  const dischargePatch: Record<string, number> = {};
  const diffuserPatch: Record<string, number> = {};
  let radius: number | undefined;
  for (const [path, value] of entries) {
    const [group, field] = path.split(".") as [string, string];
    if (group === "ambient") ambientPatch[field] = value;
    else if (group === "discharge") dischargePatch[field] = value;
    else if (group === "diffuser") diffuserPatch[field] = value;
    else radius = value;
  }
  let out: Scenario = s;
  if (Object.keys(ambientPatch).length > 0) {
    out = {
      ...out,
      ambient: patchAmbient(out.ambient, ambientPatch),
      ambientCases: out.ambientCases.map((c) => ({
        ...patchAmbient(c, ambientPatch),
        name: c.name,
        weight: c.weight,
      })),
    };
  }
  if (Object.keys(dischargePatch).length > 0) {
    // An overridden discharge no longer follows the plant's mass balance: drop the plant so results
    // and messages speak of the discharge (result.discharge.fromPlant becomes false).
    const { plant: _plant, ...rest } = out;
    out = { ...rest, discharge: { ...out.discharge, ...dischargePatch } };
  }
  if (Object.keys(diffuserPatch).length > 0) {
    out = { ...out, diffuser: patchDiffuser(out.diffuser, diffuserPatch) };
  }
  if (radius !== undefined) out = { ...out, mixingZone: { ...out.mixingZone, radius } };
  return deepFreeze(out);
}

function patchAmbient<T extends AmbientInput>(a: T, p: Record<string, number>): T {
  let profile = a.profile;
  const depth = p.depth ?? a.depth;
  if (a.uniform) {
    const sal = p.salinity ?? bottom(profile, "salinity");
    const temp = p.temperature ?? bottom(profile, "temperature");
    profile = [
      { depth: 0, salinity: sal, temperature: temp },
      { depth, salinity: sal, temperature: temp },
    ];
  } else {
    if (p.depth !== undefined) profile = profileToDepth(profile, depth);
    if (p.salinity !== undefined) {
      const d = p.salinity - bottom(profile, "salinity");
      profile = profile.map((q) => ({ ...q, salinity: Math.max(0, q.salinity + d) }));
    }
    if (p.temperature !== undefined) {
      const d = p.temperature - bottom(profile, "temperature");
      profile = profile.map((q) => ({ ...q, temperature: q.temperature + d }));
    }
  }
  const { salinity: _s, temperature: _t, ...scalar } = p;
  return { ...a, ...scalar, depth, profile };
}

/** Cuts or extends a profile so that its deepest point is at `depth` (constant extension, linear cut). */
function profileToDepth(profile: readonly ProfilePoint[], depth: number): ProfilePoint[] {
  const kept = profile.filter((q) => q.depth < depth);
  const below = profile.find((q) => q.depth >= depth);
  const above = kept[kept.length - 1];
  let last: ProfilePoint;
  if (below && above) {
    const f = (depth - above.depth) / (below.depth - above.depth);
    last = {
      depth,
      salinity: above.salinity + f * (below.salinity - above.salinity),
      temperature: above.temperature + f * (below.temperature - above.temperature),
    };
  } else {
    const ref = below ?? above!;
    last = { depth, salinity: ref.salinity, temperature: ref.temperature };
  }
  const out = [...kept, last];
  // Keep at least two points (the scenario promise).
  return out.length >= 2 ? out : [{ ...last, depth: 0 }, last];
}

function patchDiffuser(d: DiffuserInput, p: Record<string, number>): DiffuserInput {
  let out: DiffuserInput = { ...d };
  if (p.portCount !== undefined && p.portCount !== d.portCount) {
    const n = p.portCount;
    let risers = d.risers;
    if (d.layout === "rosette" && risers) {
      if (n % risers.portsPerRiser !== 0) {
        throw new OverrideError(
          "diffuser.portCount",
          `${n} ports cannot be arranged on risers of ${risers.portsPerRiser} ports each`,
        );
      }
      risers = { ...risers, count: n / risers.portsPerRiser };
    }
    const layout = d.layout === "rosette" ? "rosette" : n === 1 ? "single" : "line";
    const spacing = d.portSpacing;
    out = {
      ...out,
      portCount: n,
      layout,
      risers,
      flowSplit: new Array<number>(n).fill(1 / n),
      length: layout === "rosette" && risers ? (risers.count - 1) * risers.spacing : (n - 1) * spacing,
    };
  }
  if (p.portDiameter !== undefined) {
    const effective = p.portDiameter * Math.sqrt(out.contraction); // contraction applies to the area
    out = { ...out, portDiameterNominal: p.portDiameter, portDiameter: effective };
  }
  if (p.portSpacing !== undefined && out.layout !== "rosette") {
    out = { ...out, portSpacing: p.portSpacing, length: (out.portCount - 1) * p.portSpacing };
  } else if (p.portSpacing !== undefined) {
    out = { ...out, portSpacing: p.portSpacing };
  }
  if (p.length !== undefined) {
    out = { ...out, length: p.length };
    if (out.layout === "line" && out.portCount > 1 && p.portSpacing === undefined) {
      out = { ...out, portSpacing: p.length / (out.portCount - 1) };
    }
  }
  for (const key of ["portAngle", "portHeight", "portAzimuth", "diffuserAzimuth"] as const) {
    if (p[key] !== undefined) out = { ...out, [key]: p[key] };
  }
  return out;
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object" && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value as Record<string, unknown>)) deepFreeze(v);
  }
  return value;
}

/**
 * Sets a dotted path in a RAW scenario object (as read from JSON), returning a deep copy. Numeric
 * segments index arrays ("ambientCases.0.currentSpeed"). Used by studies, where override values may be
 * unit strings ("12 m") and the scenario is re-read by the scenario parser afterwards.
 */
export function withRawOverride(raw: unknown, path: string, value: unknown): unknown {
  const copy: unknown = JSON.parse(JSON.stringify(raw)); // raw scenarios are JSON data
  const parts = path.split(".");
  if (parts.some((p) => p === "" || p === "__proto__" || p === "constructor" || p === "prototype")) {
    throw new OverrideError(path, "is not a valid path");
  }
  let node = copy as Record<string, unknown>;
  for (let i = 0; i < parts.length - 1; i++) {
    const key = parts[i]!;
    let next = node[key];
    if (next === undefined) {
      next = /^\d+$/.test(parts[i + 1]!) ? [] : {};
      node[key] = next;
    }
    if (typeof next !== "object" || next === null) {
      throw new OverrideError(path, `"${parts.slice(0, i + 1).join(".")}" is not an object`);
    }
    node = next as Record<string, unknown>;
  }
  node[parts[parts.length - 1]!] = value;
  return copy;
}
