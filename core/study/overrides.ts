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
import type {
  AmbientCase,
  AmbientCaseField,
  AmbientInput,
  DiffuserInput,
  ProfilePoint,
  Scenario,
} from "../scenario/types";
import type { QuantityKind } from "../units";
import { FIELD_BOUNDS, fieldBounds, withinBounds } from "../scenario/bounds";
import { expectationFor } from "../scenario/fields";
import { issue } from "../scenario/issue";
import { scenarioRuleIssues } from "../scenario/rules";
import { ScenarioError } from "../scenario/parse";
import { scenarioFileSchema } from "../scenario/schema";
import { blendRatioOfPlant, scenarioWithBlendRatio } from "../scenario/plant";

export interface OverridePathInfo {
  readonly kind: QuantityKind;
  readonly label: string;
  readonly min: number;
  readonly max: number;
  readonly integer?: boolean;
  readonly exclusiveMin?: boolean;
}

/**
 * Every path that can be overridden on a normalised scenario, with its quantity kind and SI bounds:
 * derived from the one declaration of field bounds (core/scenario/bounds.ts) the file schema is built from.
 */
export const OVERRIDE_PATHS: Readonly<Record<string, OverridePathInfo>> = Object.freeze(
  Object.fromEntries(
    Object.entries(FIELD_BOUNDS).map(([path, b]) => [
      path,
      Object.freeze({
        kind: b.kind,
        label: b.what,
        min: b.min,
        max: b.max,
        ...("integer" in b && b.integer ? { integer: true } : {}),
        ...("exclusiveMin" in b && b.exclusiveMin ? { exclusiveMin: true } : {}),
      }),
    ]),
  ),
);

/** The override table's entry for a path, looked up as an own key only ("constructor", "__proto__" are not paths). */
export function overridePathInfo(path: string): OverridePathInfo | undefined {
  return Object.prototype.hasOwnProperty.call(OVERRIDE_PATHS, path) ? OVERRIDE_PATHS[path] : undefined;
}

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

/**
 * Checks a path and value against the override table; returns what is wrong (the path's own message, as
 * the file reader words it: "<value> must be …") or null.
 */
export function overrideIssue(path: string, value: number): string | null {
  const b = fieldBounds(path);
  if (!b) return `is not a path that can be varied; use one of ${Object.keys(OVERRIDE_PATHS).join(", ")}`;
  if (!withinBounds(b, value)) return issue(path, value, expectationFor(b)).message.slice(path.length + 2);
  return null;
}

/** Seabed value of a profile quantity (the deepest point). */
function bottom(profile: readonly ProfilePoint[], key: "salinity" | "temperature"): number {
  return profile[profile.length - 1]![key];
}

/** Reads the SI value at a path of a normalised scenario (ambient salinity/temperature: at the seabed). */
export function readPath(s: Scenario, path: string): number {
  if (!overridePathInfo(path)) throw new OverrideError(path, overrideIssue(path, 0) ?? "unknown path");
  const [group, field] = path.split(".") as [string, string];
  if (group === "ambient" && (field === "salinity" || field === "temperature")) {
    return bottom(s.ambient.profile, field);
  }
  if (group === "diffuser" && field === "portDiameter") return s.diffuser.portDiameterNominal;
  if (group === "plant") {
    if (!s.plant || s.plant.blending.length === 0)
      throw new OverrideError(path, "needs a plant with at least one blending stream");
    return blendRatioOfPlant(s.plant);
  }
  const obj = (s as unknown as Record<string, Record<string, unknown>>)[group];
  const v = obj?.[field];
  if (typeof v !== "number") throw new OverrideError(path, "has no numeric value in this scenario");
  return v;
}

/**
 * Returns a new, frozen scenario with the overrides applied (SI values). An `ambient.*` override applies to
 * the stated ambient and to every ambient case that does not set that field itself. The result is checked
 * against the scenario rules (core/scenario/rules.ts), the same ones the file reader applies: a broken
 * result throws ScenarioError with the same message as `run`; an unknown path throws OverrideError.
 */
export function withOverrides(s: Scenario, overrides: Overrides): Scenario {
  const entries = Object.entries(overrides);
  for (const [path, value] of entries) {
    const b = fieldBounds(path);
    if (!b) throw new OverrideError(path, overrideIssue(path, value) ?? "unknown path");
    if (!withinBounds(b, value)) throw new ScenarioError([issue(path, value, expectationFor(b))]);
  }
  const ambientPatch: Record<string, number> = {};
  const dischargePatch: Record<string, number> = {};
  const diffuserPatch: Record<string, number> = {};
  let radius: number | undefined;
  let blendRatio: number | undefined;
  for (const [path, value] of entries) {
    const [group, field] = path.split(".") as [string, string];
    if (group === "plant") blendRatio = value;
    else if (group === "ambient") ambientPatch[field] = value;
    else if (group === "discharge") dischargePatch[field] = value;
    else if (group === "diffuser") diffuserPatch[field] = value;
    else radius = value;
  }
  let out: Scenario = s;
  if (Object.keys(ambientPatch).length > 0) {
    out = {
      ...out,
      ambient: patchAmbient(out.ambient, ambientPatch),
      ambientCases: out.ambientCases.map((c) => patchCase(c, ambientPatch)),
    };
  }
  if (Object.keys(dischargePatch).length > 0) {
    // An overridden discharge no longer follows the plant's mass balance: drop the plant so results
    // and messages speak of the discharge (result.discharge.fromPlant becomes false).
    const discharge = { ...out.discharge, ...dischargePatch };
    if (out.plant === undefined && !("plant" in out)) out = { ...out, discharge };
    else {
      const { plant: _plant, ...rest } = out;
      out = { ...rest, discharge };
    }
  }
  if (Object.keys(diffuserPatch).length > 0) {
    out = { ...out, diffuser: patchDiffuser(out.diffuser, diffuserPatch) };
  }
  if (radius !== undefined) out = { ...out, mixingZone: { ...out.mixingZone, radius } };
  if (blendRatio !== undefined) {
    if (!out.plant || out.plant.blending.length === 0)
      throw new OverrideError("plant.blendRatio", "needs a plant with at least one blending stream");
    out = scenarioWithBlendRatio(out, blendRatio);
  }
  const broken = scenarioRuleIssues(out);
  if (broken.length > 0) throw new ScenarioError(broken);
  return deepFreeze(out);
}

/** An ambient case under an ambient patch: the fields the case sets itself are kept. */
function patchCase(c: AmbientCase, p: Record<string, number>): AmbientCase {
  const own: Record<string, number> = {};
  for (const [k, v] of Object.entries(p)) if (!c.sets.includes(k as AmbientCaseField)) own[k] = v;
  if (Object.keys(own).length === 0) return c;
  return { ...patchAmbient(c, own), name: c.name, weight: c.weight, sets: c.sets };
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

/** Keys no path may use whatever the schema says: they reach an object's prototype. */
const PROTOTYPE_KEYS = new Set(Object.getOwnPropertyNames(Object.prototype).concat(["__proto__", "prototype"]));

interface ZodNode {
  readonly _zod: {
    readonly def: {
      readonly type: string;
      readonly shape?: Record<string, ZodNode>;
      readonly innerType?: ZodNode;
      readonly element?: ZodNode;
    };
  };
}

/**
 * Why a dotted path cannot be set in a raw scenario, or null. Each segment must be an own field of the
 * scenario format's fixed table at that level (the zod schema), and each index must lie within the
 * array the raw scenario already has ("ambientCases.0.currentSpeed" needs at least one case).
 */
export function rawPathIssue(raw: unknown, path: string): string | null {
  const parts = path.split(".");
  let node: ZodNode | null = scenarioFileSchema as unknown as ZodNode;
  let value: unknown = raw;
  for (let i = 0; i < parts.length; i++) {
    const key = parts[i]!;
    const here = parts.slice(0, i + 1).join(".");
    if (key === "" || PROTOTYPE_KEYS.has(key))
      return `"${key}" is not a field of the scenario format (in ${JSON.stringify(here.slice(0, 80))})`;
    while (node && node._zod.def.type === "optional" && node._zod.def.innerType) node = node._zod.def.innerType;
    const type = node?._zod.def.type;
    if (type === "object") {
      const shape: Record<string, ZodNode> = node!._zod.def.shape!;
      if (!Object.prototype.hasOwnProperty.call(shape, key)) {
        const where = i === 0 ? "the scenario" : parts.slice(0, i).join(".");
        return `"${key}" is not a field of ${where}; fields: ${Object.keys(shape).join(", ")}`;
      }
      node = shape[key]!;
      value =
        value !== null && typeof value === "object" && Object.prototype.hasOwnProperty.call(value, key)
          ? (value as Record<string, unknown>)[key]
          : undefined;
    } else if (type === "array") {
      if (!/^\d+$/.test(key)) return `"${key}" must be an index into ${parts.slice(0, i).join(".")}`;
      const length = Array.isArray(value) ? value.length : 0;
      const index = Number(key);
      if (index >= length)
        return `index ${key} is beyond ${parts.slice(0, i).join(".")}, which has ${length} entr${length === 1 ? "y" : "ies"} (indices from 0)`;
      node = node!._zod.def.element!;
      value = (value as unknown[])[index];
    } else if (type === "record") {
      // Free-form blocks (the design constraints) are validated by their own reader.
      if (!/^[A-Za-z][A-Za-z0-9]*$/.test(key)) return `"${key}" is not a valid field name`;
      node = null;
      value = undefined;
    } else if (node === null) {
      if (!/^[A-Za-z][A-Za-z0-9]*$/.test(key)) return `"${key}" is not a valid field name`;
    } else {
      return `${parts.slice(0, i).join(".")} is a value, not a section: it has no field "${key}"`;
    }
  }
  return null;
}

/**
 * Sets a dotted path in a RAW scenario object (as read from JSON), returning a deep copy. The path is
 * checked first (`rawPathIssue`): own fields of the scenario format only, indices within the arrays.
 * Used by studies, where override values may be unit strings ("12 m") and the scenario is re-read by the
 * scenario parser afterwards.
 */
export function withRawOverride(raw: unknown, path: string, value: unknown): unknown {
  const problem = rawPathIssue(raw, path);
  if (problem) throw new OverrideError(path, problem);
  const copy: unknown = JSON.parse(JSON.stringify(raw)); // raw scenarios are JSON data
  const parts = path.split(".");
  let node = copy as Record<string, unknown>;
  for (let i = 0; i < parts.length - 1; i++) {
    const key = parts[i]!;
    let next = Object.prototype.hasOwnProperty.call(node, key) ? node[key] : undefined;
    if (next === undefined) {
      next = {};
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
