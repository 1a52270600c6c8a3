/**
 * Chart series from a result, in display units. Reads the arrays core produced; no physics here.
 */
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import { concentrationFromDilution } from "../../core/compliance";
import { siToDisplay, type UnitSystem } from "../../core/units";

export interface TrajectoryPoint {
  /** Plan distance from the port, display length unit. */
  readonly distance: number;
  /** Centreline height above the seabed, display length unit. */
  readonly height: number;
  readonly lower: number;
  readonly upper: number;
  readonly dilution: number;
}

export interface MethodMarker {
  readonly method: string;
  readonly label: string;
  readonly distance: number;
  readonly value: number;
}

const len = (v: number, system: UnitSystem) => siToDisplay(v, "length", system).value;

/** What the side view of the jet (chart and table) is drawn from. */
export interface SideViewProps {
  readonly result: BrinefieldResult;
  readonly scenario: Scenario;
  readonly unitSystem: UnitSystem;
}

export function trajectorySeries(result: BrinefieldResult, scenario: Scenario, system: UnitSystem): TrajectoryPoint[] {
  const path = result.nearField.find((m) => m.method === "integral")?.path ?? [];
  const portHeight = scenario.diffuser.portHeight;
  return path.map((p) => {
    const height = p.z + portHeight;
    return {
      distance: len(Math.hypot(p.x, p.y), system),
      height: len(height, system),
      lower: len(Math.max(0, height - p.halfWidth), system),
      upper: len(height + p.halfWidth, system),
      dilution: p.dilution,
    };
  });
}

/** Max-rise and impact points of each near-field method (markers to compare methods on the side view). */
export function riseMarkers(result: BrinefieldResult, scenario: Scenario, system: UnitSystem): MethodMarker[] {
  const out: MethodMarker[] = [];
  for (const m of result.nearField) {
    if (m.maxRiseHeight !== null && m.maxRiseDistance !== null) {
      out.push({
        method: m.method,
        label: "max rise",
        distance: len(m.maxRiseDistance, system),
        value: len(m.maxRiseHeight + scenario.diffuser.portHeight, system),
      });
    }
    if (m.impactDistance !== null) {
      out.push({ method: m.method, label: "impact", distance: len(m.impactDistance, system), value: 0 });
    }
  }
  return out;
}

export interface DistanceSeriesPoint {
  readonly distance: number;
  readonly dilution: number;
  readonly increase: number;
  readonly stage: string;
}

export function distanceSeries(result: BrinefieldResult, system: UnitSystem): DistanceSeriesPoint[] {
  const s = result.mixingZone.series;
  const out: DistanceSeriesPoint[] = [];
  for (let i = 0; i < s.distance.length; i++) {
    if (!(s.dilution[i] > 0) || !Number.isFinite(s.distance[i])) continue;
    out.push({
      distance: len(s.distance[i], system),
      dilution: s.dilution[i],
      increase: s.salinityIncrease[i],
      stage: s.stage[i] ?? "",
    });
  }
  return out;
}

export function impactDilutionMarkers(result: BrinefieldResult, system: UnitSystem): MethodMarker[] {
  const out: MethodMarker[] = [];
  for (const m of result.nearField) {
    if (m.impactDistance !== null && m.impactDilution !== null) {
      out.push({ method: m.method, label: "impact", distance: len(m.impactDistance, system), value: m.impactDilution });
    }
    if (m.nearFieldDistance !== null && m.nearFieldDilution !== null) {
      out.push({
        method: m.method,
        label: "end of near field",
        distance: len(m.nearFieldDistance, system),
        value: m.nearFieldDilution,
      });
    }
  }
  return out;
}

/**
 * The salinity increase over background at which the series meets the salinity limit, g/kg, read from the
 * result's verdict: the increase left after the dilution the limit requires (core's
 * `concentrationFromDilution`), so the line crosses the curve exactly where the edge verdict changes.
 * Null without a salinity limit, or when the limit is met undiluted or can never be met.
 */
export function salinityIncreaseLimit(result: BrinefieldResult): number | null {
  const salinity = result.mixingZone.constituents.find((c) => c.constituent === "salinity");
  const required = result.compliance.constituents
    .filter((c) => c.constituent.toLowerCase() === "salinity")
    .reduce((max, c) => Math.max(max, c.requiredDilution), 0);
  if (!salinity || !Number.isFinite(required) || required <= 1) return null;
  return concentrationFromDilution(salinity.discharge, salinity.background, required) - salinity.background;
}
