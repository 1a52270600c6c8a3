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

function limitFor(source: ConstituentSource, limit: LimitInput): { absolute: number; background: number; text: string } {
  const background = limit.background ?? source.background;
  const fromIncrease = limit.maxIncrease !== undefined ? background + limit.maxIncrease : Infinity;
  const fromAbsolute = limit.maxConcentration ?? Infinity;
  const absolute = Math.min(fromIncrease, fromAbsolute);
  const parts: string[] = [];
  const unit = unitSymbol(limit.unit);
  if (limit.maxIncrease !== undefined) parts.push(`at most ${formatNumber(limit.maxIncrease)} ${unit} above background ${formatNumber(background)} ${unit}`);
  if (limit.maxConcentration !== undefined) parts.push(`at most ${formatNumber(limit.maxConcentration)} ${unit}`);
  const basis = limit.basis ? ` (${limit.basis})` : "";
  return { absolute, background, text: `${source.name} ${parts.join(" and ")}${basis}` };
}

export interface ComplianceAssessment {
  readonly compliance: ComplianceResult;
  readonly constituents: ConstituentAtEdge[];
  readonly warnings: ResultWarning[];
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
  const sources = constituentSources(scenario, ambientSalinity, ambientTemperature);
  const warnings: ResultWarning[] = [];
  const constituents: ConstituentAtEdge[] = sources.map((s) => {
    const concentration = concentrationFromDilution(s.discharge, s.background, edgeDilution);
    return {
      constituent: s.name,
      unit: s.unit,
      concentration,
      increase: concentration - s.background,
      background: s.background,
      discharge: s.discharge,
    };
  });
  const verdicts: ConstituentCompliance[] = [];
  for (const limit of scenario.mixingZone.limits) {
    const source = sources.find((s) => s.name.toLowerCase() === limit.constituent.toLowerCase());
    if (!source) {
      warnings.push(
        warning("limit-constituent-unknown", "serious", `Limit on "${limit.constituent}" names no known constituent; it was not checked.`, {
          parameter: "mixingZone.limits", stage: "compliance",
        }),
      );
      continue;
    }
    const lim = limitFor({ ...source, background: limit.background ?? source.background }, limit);
    const required = requiredDilutionFromLimit(source.discharge, lim.background, lim.absolute);
    const pass = Number.isFinite(required) && edgeDilution >= required;
    const margin = Number.isFinite(required) ? edgeDilution / required : 0;
    let text = lim.text;
    if (!Number.isFinite(required)) {
      text += `: can never be met — the limit ${lim.absolute} ${limit.unit} is at or below the background ${lim.background}`;
      warnings.push(
        warning("limit-below-background", "serious", `The ${source.name} limit (${lim.absolute} ${limit.unit}) is at or below background (${lim.background}); no dilution meets it.`, {
          parameter: "mixingZone.limits", value: lim.absolute, stage: "compliance",
        }),
      );
    } else if (required === 1) {
      text += ": met by the undiluted discharge";
    }
    verdicts.push({ constituent: source.name, unit: limit.unit, requiredDilution: required, edgeDilution, pass, margin, limit: text });
  }
  if (!verdicts.length) {
    warnings.push(warning("no-limits", "info", "No concentration limits given; compliance was not assessed.", { stage: "compliance" }));
    return {
      compliance: { governingConstituent: "none", requiredDilution: 1, pass: true, verdict: "meets", scopeReasons: [], margin: edgeDilution, constituents: [] },
      constituents,
      warnings,
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
  };
}
