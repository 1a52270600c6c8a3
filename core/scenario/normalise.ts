/**
 * From the schema-checked file to the frozen, normalised `Scenario`: plant mass balance, salinity bases
 * (psu, TDS) to Absolute Salinity, uniform ambient to a two-point profile, defaults, cross-field rules.
 * Every problem is reported as an issue with the path, the value given and what is expected.
 */
import type {
  AmbientCase,
  AmbientCaseField,
  AmbientInput,
  BasinInput,
  ConstituentInput,
  DiffuserInput,
  LimitInput,
  Scenario,
  UncertainInput,
} from "./types";
import type { ScenarioFileParsed } from "./schema";
import { blendingAtRatio, brineFlowFromPlant, brineFromPlant } from "./plant";
import { formatNumber } from "../units";
import { issue, type NormaliseContext, type ScenarioIssue } from "./issue";
import { buildProfile, resolveSalinity, type RawAmbientLike } from "./normalise-ambient";
import { parseLimitValue } from "./normalise-limits";
import { scenarioRuleIssues } from "./rules";
import { normaliseRecord } from "../record/normalise";

export { issue, type ScenarioIssue } from "./issue";
export { MAX_EXIT_VELOCITY } from "./rules";

/** Ports usually point across the diffuser axis (common practice, no source): default axis ⟂ port azimuth. */
export function defaultDiffuserAzimuth(portAzimuth: number): number {
  return (portAzimuth + 90) % 360;
}

/** Default salt rejection of seawater RO membranes when not given (common practice, no source). */
export const DEFAULT_SALT_REJECTION = 0.997;

type Ctx = NormaliseContext;

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

export function normaliseScenario(f: ScenarioFileParsed): { scenario: Scenario | null; issues: ScenarioIssue[] } {
  const ctx: Ctx = { issues: [], conversions: [] };
  const d = f.discharge ?? {};

  // --- discharge or plant -------------------------------------------------------------------------------
  let flow = Number.NaN;
  let salinity = Number.NaN;
  let temperature = Number.NaN;
  let plantOut: Scenario["plant"];
  if (f.plant) {
    if (d.flow !== undefined || d.salinity !== undefined) {
      ctx.issues.push(
        issue(
          "plant",
          "(plant and discharge.flow/salinity)",
          "give either plant (to compute the brine) or discharge.flow and discharge.salinity, not both",
        ),
      );
    } else {
      const p = f.plant;
      const brineT = d.temperature ?? p.feedTemperature;
      if (brineT === undefined) {
        ctx.issues.push(
          issue("discharge.temperature", undefined, "expected the brine temperature (°C), or plant.feedTemperature"),
        );
      } else {
        const feedS = resolveSalinity(p.feedSalinity, p.feedTemperature ?? brineT, "plant.feedSalinity", ctx);
        let blending = (p.blending ?? []).map((b, i) => ({
          name: b.name,
          flow: b.flow,
          temperature: b.temperature,
          salinity: resolveSalinity(b.salinity, b.temperature, `plant.blending.${i}.salinity`, ctx),
        }));
        if (p.blendRatio !== undefined) {
          if (blending.length === 0)
            ctx.issues.push(
              issue("plant.blendRatio", p.blendRatio, "needs at least one stream under plant.blending to scale"),
            );
          else {
            blending = blendingAtRatio(blending, brineFlowFromPlant(p.productFlow, p.recovery), p.blendRatio);
            ctx.conversions.push(
              `plant.blendRatio: blending streams scaled together to ${formatNumber(p.blendRatio)} × the brine flow`,
            );
          }
        }
        const rej = p.saltRejection ?? DEFAULT_SALT_REJECTION;
        const bal = brineFromPlant({
          productFlow: p.productFlow,
          recovery: p.recovery,
          feedSalinity: feedS,
          saltRejection: rej,
          brineTemperature: brineT,
          blending,
        });
        flow = bal.dischargeFlow;
        salinity = bal.dischargeSalinity;
        temperature = bal.dischargeTemperature;
        ctx.conversions.push(
          `plant: product ${formatNumber(p.productFlow)} m³/s at recovery ${formatNumber(p.recovery)} and salt rejection ${formatNumber(rej)}${p.saltRejection === undefined ? " (default)" : ""} → brine ${formatNumber(bal.brineFlow)} m³/s at ${formatNumber(bal.brineSalinity)} g/kg (${formatNumber(bal.concentrationFactor, 3)}× the feed)` +
            (blending.length
              ? `; after blending ${blending.length} stream(s): ${formatNumber(flow)} m³/s at ${formatNumber(salinity)} g/kg, ${formatNumber(temperature)} °C`
              : ""),
        );
        plantOut = {
          productFlow: p.productFlow,
          recovery: p.recovery,
          feedSalinity: feedS,
          saltRejection: rej,
          feedTemperature: p.feedTemperature,
          blending,
        };
      }
    }
  } else {
    if (d.flow === undefined)
      ctx.issues.push(
        issue(
          "discharge.flow",
          undefined,
          'expected the total brine flow (m³/s, e.g. 0.5 or "12 MGD"), or a plant section',
        ),
      );
    if (d.salinity === undefined)
      ctx.issues.push(issue("discharge.salinity", undefined, "expected the brine salinity (g/kg), or a plant section"));
    if (d.temperature === undefined)
      ctx.issues.push(issue("discharge.temperature", undefined, "expected the brine temperature (°C)"));
    if (d.flow !== undefined && d.salinity !== undefined && d.temperature !== undefined) {
      flow = d.flow;
      temperature = d.temperature;
      salinity = resolveSalinity(d.salinity, d.temperature, "discharge.salinity", ctx);
    }
  }

  const constituents: ConstituentInput[] = (d.constituents ?? []).map((c) => ({
    name: c.name,
    concentration: c.concentration,
    unit: c.unit,
    background: c.background ?? 0,
  }));
  const names = new Set<string>();
  constituents.forEach((c, i) => {
    const k = c.name.toLowerCase();
    if (k === "salinity" || k === "temperature")
      ctx.issues.push(
        issue(
          `discharge.constituents.${i}.name`,
          c.name,
          "is implicit: salinity and temperature come from the discharge and ambient; use another name",
        ),
      );
    if (names.has(k)) ctx.issues.push(issue(`discharge.constituents.${i}.name`, c.name, "is listed twice"));
    names.add(k);
  });

  // --- ambient ------------------------------------------------------------------------------------------
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
    const quiet: Ctx = { issues: ctx.issues, conversions: [] };
    const rec = normaliseRecord(a.record, ambient.profile[ambient.profile.length - 1]!.temperature, (sv, t) =>
      resolveSalinity(sv, t, "ambient.record.salinity", quiet),
    );
    ctx.issues.push(...rec.issues);
    ctx.conversions.push(...rec.notes);
    if (rec.record) (ambient as { record?: AmbientInput["record"] }).record = rec.record;
  }

  const ambientCases: AmbientCase[] = [];
  (f.ambientCases ?? []).forEach((c, i) => {
    if (!ambient) return;
    const cd = c.depth ?? ambient.depth;
    const hasOwnWater = c.profile !== undefined || c.salinity !== undefined || c.temperature !== undefined;
    let profile = ambient.profile.map((p) => ({ ...p }));
    let uniform = ambient.uniform;
    if (hasOwnWater) {
      const base = ambient.profile[0]!;
      const own: RawAmbientLike = c.profile
        ? { profile: c.profile }
        : {
            salinity: c.salinity ?? { basis: "absolute", value: base.salinity, raw: base.salinity },
            temperature: c.temperature ?? base.temperature,
          };
      const pr = buildProfile(own, cd, `ambientCases.${i}`, ctx);
      if (!pr) return;
      profile = pr.profile;
      uniform = pr.uniform;
    } else if (cd !== ambient.depth) {
      const last = profile[profile.length - 1]!;
      if (last.depth < cd) profile.push({ ...last, depth: cd });
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

  // --- diffuser -----------------------------------------------------------------------------------------
  const g = f.diffuser;
  let portCount = g.portCount ?? 1;
  const layout = g.layout ?? (g.risers ? "rosette" : portCount > 1 ? "line" : "single");
  if (layout === "rosette") {
    if (!g.risers)
      ctx.issues.push(
        issue("diffuser.risers", undefined, "expected {count, portsPerRiser, spacing} for a rosette diffuser"),
      );
    else {
      const n = g.risers.count * g.risers.portsPerRiser;
      if (g.portCount !== undefined && g.portCount !== n)
        ctx.issues.push(
          issue(
            "diffuser.portCount",
            g.portCount,
            `must equal risers.count × risers.portsPerRiser = ${n} (or be left out)`,
          ),
        );
      portCount = n;
      if (g.risers.count > 1 && g.risers.spacing === undefined)
        ctx.issues.push(issue("diffuser.risers.spacing", undefined, "expected the spacing between risers (m)"));
      if (g.risers.portAzimuths && g.risers.portAzimuths.length !== g.risers.portsPerRiser)
        ctx.issues.push(
          issue(
            "diffuser.risers.portAzimuths",
            g.risers.portAzimuths,
            `must list ${g.risers.portsPerRiser} azimuths, one per port on a riser`,
          ),
        );
    }
  }
  if (layout === "single" && portCount !== 1)
    ctx.issues.push(
      issue("diffuser.portCount", portCount, 'must be 1 for layout "single" (use "line" or "rosette" for more ports)'),
    );
  if (layout === "line" && portCount > 1 && g.portSpacing === undefined)
    ctx.issues.push(
      issue(
        "diffuser.portSpacing",
        undefined,
        "expected the spacing between ports (m) for a diffuser with more than one port",
      ),
    );
  const portSpacing = g.portSpacing ?? 0;
  // Neighbouring ports closer than a port diameter would overlap on the pipe (geometry, no source).
  if (layout === "line" && portCount > 1 && g.portSpacing !== undefined && g.portSpacing < g.portDiameter * (1 - 1e-9))
    ctx.issues.push(
      issue(
        "diffuser.portSpacing",
        g.portSpacing,
        `must be at least the port diameter (${formatNumber(g.portDiameter)} m): closer ports would overlap`,
      ),
    );
  const portAzimuth = g.portAzimuth ?? 0;
  const diffuserAzimuth = g.diffuserAzimuth ?? defaultDiffuserAzimuth(portAzimuth);
  const riserSpacing = g.risers?.spacing ?? 0;
  const naturalLength =
    layout === "rosette"
      ? Math.max(0, ((g.risers?.count ?? 1) - 1) * riserSpacing)
      : Math.max(0, (portCount - 1) * portSpacing);
  const length = g.length ?? naturalLength;
  let flowSplit: number[];
  if (g.flowSplit) {
    const sum = g.flowSplit.reduce((s, v) => s + v, 0);
    if (g.flowSplit.length !== portCount) {
      ctx.issues.push(
        issue("diffuser.flowSplit", `${g.flowSplit.length} values`, `must list one share per port (${portCount})`),
      );
      flowSplit = [];
    } else if (!(sum > 0) || g.flowSplit.some((v) => v <= 0)) {
      ctx.issues.push(
        issue(
          "diffuser.flowSplit",
          g.flowSplit.slice(0, 5),
          "must list positive shares (any scale; they are normalised)",
        ),
      );
      flowSplit = [];
    } else flowSplit = g.flowSplit.map((v) => v / sum);
  } else flowSplit = new Array<number>(portCount).fill(1 / portCount);
  const contraction = g.contraction ?? 1;
  const effectiveDiameter = g.portDiameter * Math.sqrt(contraction);
  if (contraction !== 1)
    ctx.conversions.push(
      `diffuser.portDiameter: vena-contracta contraction ${formatNumber(contraction)} applied to the area → effective diameter ${formatNumber(effectiveDiameter)} m`,
    );
  const riserAzimuths =
    g.risers &&
    (g.risers.portAzimuths ??
      Array.from(
        { length: g.risers.portsPerRiser },
        (_, k) => (portAzimuth + (360 * k) / g.risers!.portsPerRiser) % 360,
      ));

  const diffuser: DiffuserInput = {
    layout,
    portCount,
    portDiameter: effectiveDiameter,
    portDiameterNominal: g.portDiameter,
    contraction,
    portAngle: g.portAngle,
    portHeight: g.portHeight,
    portSpacing,
    portAzimuth,
    diffuserAzimuth,
    length,
    flowSplit,
    dischargeCoefficient: g.dischargeCoefficient,
    risers: g.risers && {
      count: g.risers.count,
      portsPerRiser: g.risers.portsPerRiser,
      spacing: riserSpacing,
      portAzimuths: riserAzimuths ?? [],
    },
  };

  // --- limits -------------------------------------------------------------------------------------------
  const limits: LimitInput[] = [];
  f.mixingZone.limits.forEach((l, i) => {
    const path = `mixingZone.limits.${i}`;
    const key = l.constituent.toLowerCase();
    const c = constituents.find((x) => x.name.toLowerCase() === key);
    if (key !== "salinity" && key !== "temperature" && !c) {
      ctx.issues.push(
        issue(
          `${path}.constituent`,
          l.constituent,
          `must be "salinity", "temperature" or a name listed under discharge.constituents`,
        ),
      );
      return;
    }
    const unit = key === "salinity" ? "g/kg" : key === "temperature" ? "degC" : c!.unit;
    if ((l.maxIncrease === undefined) === (l.maxConcentration === undefined)) {
      ctx.issues.push(issue(path, l.constituent, "must give exactly one of maxIncrease or maxConcentration"));
      return;
    }
    const inc = parseLimitValue(l.maxIncrease, key, unit, "maxIncrease", `${path}.maxIncrease`, ctx);
    const abs = parseLimitValue(l.maxConcentration, key, unit, "maxConcentration", `${path}.maxConcentration`, ctx);
    const bg = parseLimitValue(l.background, key, unit, "background", `${path}.background`, ctx);
    limits.push({
      constituent: key === "salinity" || key === "temperature" ? key : c!.name,
      unit,
      ...(inc !== undefined ? { maxIncrease: inc } : {}),
      ...(abs !== undefined ? { maxConcentration: abs } : {}),
      ...(bg !== undefined ? { background: bg } : {}),
      ...(l.basis ? { basis: l.basis } : {}),
    });
  });

  // --- uncertainty --------------------------------------------------------------------------------------
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

  if (ctx.issues.length || !ambient) return { scenario: null, issues: ctx.issues };

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
