/**
 * From the schema-checked file to the frozen, normalised `Scenario`: plant mass balance, salinity bases
 * (psu, TDS) to Absolute Salinity, uniform ambient to a two-point profile, defaults, cross-field rules.
 * Every problem is reported as an issue with the path, the value given and what is expected.
 */
import type { Scenario, UncertainInput } from "./types";
import type { ScenarioFileParsed } from "./schema";
import { issue, type NormaliseContext, type ScenarioIssue } from "./issue";
import { ambientCasesFromFile, ambientFromFile } from "./normalise-ambient";
import { constituentsFromFile, dischargeFromFile } from "./normalise-discharge";
import { diffuserFromFile } from "./normalise-diffuser";
import { limitsFromFile } from "./normalise-limits";
import { scenarioRuleIssues } from "./rules";

export { issue, type ScenarioIssue } from "./issue";
export { MAX_EXIT_VELOCITY } from "./rules";
export { defaultDiffuserAzimuth } from "./normalise-diffuser";
export { DEFAULT_SALT_REJECTION } from "./normalise-discharge";

type Ctx = NormaliseContext;

export function normaliseScenario(f: ScenarioFileParsed): { scenario: Scenario | null; issues: ScenarioIssue[] } {
  const ctx: Ctx = { issues: [], conversions: [], warnings: [] };
  const discharge = dischargeFromFile(f, ctx);
  const constituents = constituentsFromFile(f, ctx);
  const ambient = ambientFromFile(f, ctx);
  const ambientCases = ambientCasesFromFile(f, ambient, ctx);
  const diffuser = diffuserFromFile(f, ctx);
  const limits = limitsFromFile(f, constituents, ctx);
  const uncertainty = uncertaintyFromFile(f, ctx);

  if (ctx.issues.length || !ambient || !discharge) return { scenario: null, issues: ctx.issues };
  const { flow, salinity, temperature, plant: plantOut } = discharge;

  const scenario: Scenario = {
    format: "brinefield-scenario",
    version: 1,
    name: f.name,
    ...(f.description ? { description: f.description } : {}),
    discharge: { flow, salinity, temperature, constituents },
    ...(plantOut ? { plant: plantOut } : {}),
    ambient,
    ambientCases,
    diffuser,
    mixingZone: {
      radius: f.mixingZone.radius,
      limits,
      ...(f.mixingZone.timeCompliance
        ? { timeCompliance: { percentOfTime: f.mixingZone.timeCompliance.percentOfTime } }
        : {}),
    },
    ...(f.intake ? { intake: { ...f.intake } } : {}),
    options: {
      nearFieldForEdge: f.options?.nearFieldForEdge ?? "conservative",
      farField: f.options?.farField ?? "conservative",
      addSlackWater: f.options?.addSlackWater ?? true,
    },
    ...(uncertainty ? { uncertainty } : {}),
    conversions: ctx.conversions,
    ...(ctx.warnings?.length ? { conversionWarnings: ctx.warnings } : {}),
  };
  const broken = scenarioRuleIssues(scenario);
  if (broken.length > 0) return { scenario: null, issues: broken };
  return { scenario: deepFreeze(scenario), issues: [] };
}

export function deepFreeze<T>(o: T): T {
  if (o && typeof o === "object" && !Object.isFrozen(o)) {
    Object.freeze(o);
    for (const v of Object.values(o as Record<string, unknown>)) deepFreeze(v);
  }
  return o;
}

/** The uncertain inputs, each listed once, with their distribution parameters. */
function uncertaintyFromFile(f: ScenarioFileParsed, ctx: Ctx): Scenario["uncertainty"] {
  f.uncertainty?.inputs.forEach((u, i, all) => {
    if (all.findIndex((v) => v.path === u.path) !== i)
      ctx.issues.push(issue(`uncertainty.inputs.${i}.path`, u.path, "is listed twice; give each uncertain input once"));
  });
  const uncertainty = f.uncertainty && {
    inputs: f.uncertainty.inputs.map((u): UncertainInput => {
      const { path, distribution, ...rest } = u;
      const params: Record<string, number> = {};
      for (const [k, v] of Object.entries(rest)) if (typeof v === "number") params[k] = v;
      return { path, distribution, params };
    }),
  };
  return uncertainty;
}
