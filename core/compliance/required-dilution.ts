/**
 * Compliance with concentration limits at the mixing-zone edge.
 *
 * Trade convention for dilution: S = (C_d − C_b)/(C − C_b), so the excess anywhere is the discharge
 * excess divided by S (follows from the definition). The dilution needed to meet a limit
 * C_limit (an absolute concentration, or background + allowed increase) is
 *   S_req = (C_d − C_b)/(C_limit − C_b)
 * (follows from the definition). A discharge already at or below
 * the limit needs S_req = 1; a limit at or below background can never be met by dilution.
 */
import { formatNumber, unitSymbol } from "../units";
import type { ConstituentInput, LimitInput, Scenario } from "../scenario/types";
import type { ComplianceResult, ConstituentAtEdge, ConstituentCompliance } from "../result/contract";
import { warning, type ResultWarning } from "../warnings";
import type { BasinResult } from "../result/contract";
import {
  BASIN_LIMITS,
  BASIN_METHOD,
  BASIN_SOURCE,
  backgroundIncreaseFromLoad,
  exchangeFlowFromBasin,
  flushingTimeFromBasin,
  timeTo95PercentFromBasin,
} from "../basin/box-model";

/**
 * Dilution needed to bring a discharge concentration down to a limit.
 * @param discharge C_d, in the constituent's unit
 * @param background C_b, same unit
 * @param limit C_limit (absolute), same unit
 */
export function requiredDilutionFromLimit(discharge: number, background: number, limit: number): number {
  if (discharge <= limit) return 1; // already compliant undiluted
  if (limit <= background) return Infinity; // no amount of dilution with this background meets it
  return Math.max(1, (discharge - background) / (limit - background));
}

/** Concentration after dilution S: C = C_b + (C_d − C_b)/S. */
export function concentrationFromDilution(discharge: number, background: number, dilution: number): number {
  return background + (discharge - background) / dilution;
}

export interface ConstituentSource {
  readonly name: string;
  readonly unit: string;
  readonly discharge: number;
  readonly background: number;
}

/** Salinity, temperature and the listed constituents with their discharge and background values. */
export function constituentSources(
  scenario: Scenario,
  ambientSalinity: number,
  ambientTemperature: number,
): ConstituentSource[] {
  return [
    { name: "salinity", unit: "g/kg", discharge: scenario.discharge.salinity, background: ambientSalinity },
    { name: "temperature", unit: "degC", discharge: scenario.discharge.temperature, background: ambientTemperature },
    ...scenario.discharge.constituents.map((c: ConstituentInput) => ({
      name: c.name,
      unit: c.unit,
      discharge: c.concentration,
      background: c.background,
    })),
  ];
}

function limitFor(
  source: ConstituentSource,
  limit: LimitInput,
): { absolute: number; background: number; text: string } {
  const background = limit.background ?? source.background;
  const fromIncrease = limit.maxIncrease !== undefined ? background + limit.maxIncrease : Infinity;
  const fromAbsolute = limit.maxConcentration ?? Infinity;
  const absolute = Math.min(fromIncrease, fromAbsolute);
  const parts: string[] = [];
  const unit = unitSymbol(limit.unit);
  if (limit.maxIncrease !== undefined)
    parts.push(
      `at most ${formatNumber(limit.maxIncrease)} ${unit} above background ${formatNumber(background)} ${unit}`,
    );
  if (limit.maxConcentration !== undefined) parts.push(`at most ${formatNumber(limit.maxConcentration)} ${unit}`);
  const basis = limit.basis ? ` (${limit.basis})` : "";
  return { absolute, background, text: `${source.name} ${parts.join(" and ")}${basis}` };
}

export interface ComplianceAssessment {
  readonly compliance: ComplianceResult;
  readonly constituents: ConstituentAtEdge[];
  readonly warnings: ResultWarning[];
  /** Present only with `ambient.basin`: the raised background used above. */
  readonly basin?: BasinResult;
}

/**
 * The background build-up of every constituent in an enclosed basin (core/basin/box-model.ts), or null
 * for open water. `naturalBackground` per constituent is the background the limit is relative to.
 */
export function basinFromScenario(scenario: Scenario, sources: readonly ConstituentSource[]): BasinResult | null {
  const b = scenario.ambient.basin;
  if (!b) return null;
  const qe = exchangeFlowFromBasin(b);
  const constituents = sources.map((s) => {
    const increase = backgroundIncreaseFromLoad(scenario.discharge.flow, s.discharge, s.background, qe);
    return {
      constituent: s.name,
      unit: s.unit,
      naturalBackground: s.background,
      increase,
      raisedBackground: s.background + increase,
    };
  });
  const sal = constituents.find((c) => c.constituent === "salinity")!;
  return {
    backgroundIncrease: sal.increase,
    timeTo95Percent: timeTo95PercentFromBasin(b),
    exchangeFlow: qe,
    method: BASIN_METHOD,
    volume: b.volume,
    flushingTime: flushingTimeFromBasin(b),
    naturalBackground: sal.naturalBackground,
    raisedBackground: sal.raisedBackground,
    constituents,
    source: BASIN_SOURCE,
    limits: BASIN_LIMITS,
  };
}

/**
 * Verdict per limit at the edge dilution; the governing constituent has the smallest margin.
 * @param edgeDilution centreline dilution at the mixing-zone edge
 * @param ambientSalinity background salinity at the seabed near the diffuser, g/kg
 * @param ambientTemperature background temperature there, °C
 */
export function complianceFromEdgeDilution(
  scenario: Scenario,
  edgeDilution: number,
  ambientSalinity: number,
  ambientTemperature: number,
): ComplianceAssessment {
  // Natural backgrounds: each limit's own background where it gives one, else the constituent's.
  const natural = constituentSources(scenario, ambientSalinity, ambientTemperature).map((s) => {
    const lim = scenario.mixingZone.limits.find(
      (l) => l.constituent.toLowerCase() === s.name.toLowerCase() && l.background !== undefined,
    );
    return lim ? { ...s, background: lim.background! } : s;
  });
  const basin = basinFromScenario(scenario, natural);
  // With a basin the water around the outfall carries the raised background: the plume dilutes toward it.
  const raisedOf = (name: string, fallback: number) =>
    basin?.constituents.find((c) => c.constituent === name)?.raisedBackground ?? fallback;
  const sources = constituentSources(scenario, ambientSalinity, ambientTemperature);
  const warnings: ResultWarning[] = [];
  if (basin) {
    warnings.push(
      warning(
        "basin-background-raised",
        "info",
        `Enclosed basin: a well-mixed box model raises the salinity background by ${formatNumber(basin.backgroundIncrease, 3)} g/kg ` +
          `(to ${formatNumber(basin.raisedBackground)} g/kg; 95 % of it within ${formatNumber(basin.timeTo95Percent / 86400, 3)} days; exchange flow ${formatNumber(basin.exchangeFlow, 3)} m³/s). ` +
          "The edge is checked with the raised background while each limit stays relative to the natural background: " +
          "required dilution = (C_discharge − C_raised)/(C_natural + allowed increase − C_raised). " +
          BASIN_LIMITS,
        { parameter: "ambient.basin", value: basin.backgroundIncrease, stage: "compliance", source: BASIN_SOURCE },
      ),
    );
  }
  const constituents: ConstituentAtEdge[] = sources.map((s, i) => {
    const nat = natural[i]!.background;
    const bg = basin ? raisedOf(s.name, s.background) : s.background;
    const concentration = concentrationFromDilution(s.discharge, bg, edgeDilution);
    return {
      constituent: s.name,
      unit: s.unit,
      concentration,
      increase: concentration - (basin ? nat : bg),
      background: bg,
      discharge: s.discharge,
      ...(basin ? { naturalBackground: nat } : {}),
    };
  });
  const verdicts: ConstituentCompliance[] = [];
  for (const limit of scenario.mixingZone.limits) {
    const v = limitVerdict({ limit, sources, edgeDilution, basin, raisedOf, warnings });
    if (v) verdicts.push(v);
  }
  if (!verdicts.length) {
    warnings.push(
      warning("no-limits", "info", "No concentration limits given; compliance was not assessed.", {
        stage: "compliance",
      }),
    );
    return {
      compliance: {
        governingConstituent: "none",
        requiredDilution: 1,
        pass: true,
        verdict: "meets",
        scopeReasons: [],
        margin: edgeDilution,
        constituents: [],
      },
      constituents,
      warnings,
      ...(basin ? { basin } : {}),
    };
  }
  const governing = verdicts.reduce((g, v) => (v.margin < g.margin ? v : g));
  return {
    compliance: {
      governingConstituent: governing.constituent,
      requiredDilution: governing.requiredDilution,
      pass: verdicts.every((v) => v.pass),
      verdict: verdicts.every((v) => v.pass) ? "meets" : "exceeds",
      scopeReasons: [],
      margin: governing.margin,
      constituents: verdicts,
    },
    constituents,
    warnings,
    ...(basin ? { basin } : {}),
  };
}

/** One limit's verdict at the edge (null, with a warning, when it names no known constituent). */
function limitVerdict(input: {
  readonly limit: LimitInput;
  readonly sources: readonly ConstituentSource[];
  readonly edgeDilution: number;
  readonly basin: BasinResult | null;
  /** The raised background of a constituent with a basin, else the fallback. */
  readonly raisedOf: (name: string, fallback: number) => number;
  readonly warnings: ResultWarning[];
}): ConstituentCompliance | null {
  const { limit, sources, edgeDilution, basin, raisedOf, warnings } = input;
  const source = sources.find((s) => s.name.toLowerCase() === limit.constituent.toLowerCase());
  if (!source) {
    warnings.push(
      warning(
        "limit-constituent-unknown",
        "serious",
        `Limit on "${limit.constituent}" names no known constituent; it was not checked.`,
        {
          parameter: "mixingZone.limits",
          stage: "compliance",
        },
      ),
    );
    return null;
  }
  const lim = limitFor({ ...source, background: limit.background ?? source.background }, limit);
  // With a basin the limit stays relative to the natural background while the water carries the raised
  // one: S_req = (C_d − C_raised)/(C_natural + allowed − C_raised).
  const dilutesToward = basin ? raisedOf(source.name, lim.background) : lim.background;
  const required = requiredDilutionFromLimit(source.discharge, dilutesToward, lim.absolute);
  const pass = Number.isFinite(required) && edgeDilution >= required;
  const margin = Number.isFinite(required) ? edgeDilution / required : 0;
  let text = lim.text;
  if (!Number.isFinite(required)) {
    const u = unitSymbol(limit.unit);
    text += `: can never be met — the limit ${formatNumber(lim.absolute)} ${u} is at or below the background ${formatNumber(dilutesToward)} ${u}${basin ? " raised by the basin build-up" : ""}`;
    warnings.push(
      warning(
        "limit-below-background",
        "serious",
        basin
          ? `The ${source.name} limit (${formatNumber(lim.absolute)} ${u}) is at or below the background raised by the basin build-up (${formatNumber(dilutesToward)} ${u}); no dilution meets it.`
          : `The ${source.name} limit (${formatNumber(lim.absolute)} ${u}) is at or below background (${formatNumber(lim.background)} ${u}); no dilution meets it.`,
        { parameter: basin ? "ambient.basin" : "mixingZone.limits", value: lim.absolute, stage: "compliance" },
      ),
    );
  } else if (required === 1) {
    text += ": met by the undiluted discharge";
  }
  if (basin && Number.isFinite(required))
    text += `; background raised by the basin build-up to ${formatNumber(dilutesToward)} ${unitSymbol(limit.unit)}`;
  return {
    constituent: source.name,
    unit: limit.unit,
    requiredDilution: required,
    edgeDilution,
    pass,
    margin,
    limit: text,
  };
}
