/**
 * The far-field and footprint stages for a rising plume (core/pipeline.ts calls them after the rising
 * multiport stage, ./merging.ts): the surface or trapped field carried to the mixing-zone edge by passive
 * lateral diffusion in the current (Brooks 1960, 4/3 law); compliance there is the same stage as for dense
 * discharges (core/compliance).
 *
 * Chain: the field dilution S_f where the plume reaches the surface or its trap level, then
 * S(x) = S_f × S_Brooks(x − x_f) (multiplicative, Fischer et al. 1979, from memory), the field's start
 * width being the plume's width there plus the diffuser's length across the current. The field travels
 * at the current speed, or at its own spreading speed where that is faster — c = √(g′_f·h) for a surface
 * field and c = N·h for a trapped one, with g′_f the field's reduced gravity, h the plume's half-width where
 * the field starts and N the buoyancy frequency (the scales of a gravity-current front and of an intrusion
 * in stratified water; judgement, no source) — so the result is continuous as the current goes to zero.
 * The field's own buoyant mixing is not counted (cautious). An edge inside the plume reads the plume's own
 * dilution. The near-field
 * method carried to the edge is the one giving the lower edge dilution unless `options.nearFieldForEdge`
 * names one. The background of every constituent is the ambient at the field's level.
 */
import type { Scenario } from "../scenario/types";
import type { AmbientColumn, JetSource } from "../nearfield/types";
import type { FootprintResult, SeriesResult, SeriesStage } from "../result/contract";
import { warning, type ResultWarning } from "../warnings";
import { dilutionFromProfile, jetProfileFromNearField } from "../farfield/jet-series";
import {
  BROOKS_1960_SOURCE,
  brooksDilutionFromDistanceValidityIssues,
  brooksDilutionInField,
  brooksFieldFromInput,
} from "../farfield/brooks-1960-diffusion";
import { notModelledFor, type FarFieldMixingZone } from "../farfield/stage";
import { STAGNANT_CURRENT } from "../farfield/chains";
import { portCountFromDiffuser } from "../multiport/port-hydraulics";
import type { RisingMethod } from "./merging";
import { interpolateLinear as interpolate } from "../interpolate";

export interface RisingFarFieldInput {
  readonly scenario: Scenario;
  readonly jet: JetSource;
  readonly column: AmbientColumn;
  /** The rising multiport stage's methods (after merging). */
  readonly methods: readonly RisingMethod[];
  readonly detail?: "full" | "edge";
}

export interface RisingFarFieldOutput {
  readonly mixingZone: FarFieldMixingZone;
  /** Background salinity (g/kg) and temperature (°C) at the level where the field spreads. */
  readonly background: { readonly salinity: number; readonly temperature: number };
  readonly warnings: ResultWarning[];
  readonly methods: { stage: string; name: string; source: string }[];
}

const degToRad = (d: number) => (d * Math.PI) / 180;

/** What every method's chain of one scenario shares: the edge, the current and the diffuser's extent. */
interface RisingContext {
  readonly radius: number;
  readonly u: number;
  readonly crossLength: number;
  readonly diffuserLength: number;
  readonly reducedGravity: number;
}

const speedOf = (ctx: RisingContext, m: RisingMethod) => Math.max(ctx.u, fieldSpreadingSpeed(m, ctx.reducedGravity));

// Carried by the current, the field is as wide as the diffuser seen across the current; spreading on its
// own, it spreads from the whole diffuser length.
const widthOf = (ctx: RisingContext, m: RisingMethod) =>
  2 * m.field.halfWidth + (ctx.u >= fieldSpreadingSpeed(m, ctx.reducedGravity) ? ctx.crossLength : ctx.diffuserLength);

function edgeDilutionOf(ctx: RisingContext, m: RisingMethod): number {
  if (ctx.radius <= m.field.distance) return dilutionFromProfile(jetProfileFromNearField(m.nf), ctx.radius);
  const field = brooksFieldFromInput({ initialWidth: widthOf(ctx, m), currentSpeed: speedOf(ctx, m) });
  return m.field.dilution * brooksDilutionInField(field, ctx.radius - m.field.distance);
}

/** The rising plume's far-field stage. Never throws for out-of-range physics; returns warnings instead. */
export function risingFarFieldStage(input: RisingFarFieldInput): RisingFarFieldOutput {
  const { scenario, jet, column } = input;
  const warnings: ResultWarning[] = [];
  const radius = scenario.mixingZone.radius;
  const u = column.currentSpeed < STAGNANT_CURRENT ? 0 : column.currentSpeed;
  const d = scenario.diffuser;
  const n = portCountFromDiffuser(scenario);
  const diffuserLength = n > 1 ? Math.max(d.length, 0) : 0;
  const crossLength =
    u > 0 ? diffuserLength * Math.abs(Math.sin(degToRad(d.diffuserAzimuth - column.currentDirection))) : diffuserLength;
  const ctx: RisingContext = { radius, u, crossLength, diffuserLength, reducedGravity: jet.reducedGravity };
  if (scenario.options.farField === "gravity-current") {
    warnings.push(
      warning(
        "rising-no-dense-layer",
        "info",
        "The discharge rises: there is no spreading dense layer; the field at the surface or trap level was carried by passive diffusion.",
        { parameter: "options.farField", stage: "far-field" },
      ),
    );
  }

  const usable = input.methods.filter((m) => m.nf.available && m.field.kind !== "none");
  const chosen = governingMethod(ctx, scenario, usable, warnings);
  const full = input.detail !== "edge";
  const alternatives = full
    ? usable.map((m) => ({
        method:
          radius <= m.field.distance
            ? `${m.nf.method} (plume crosses the edge)`
            : `${m.nf.method} ${m.field.kind} field + passive-diffusion`,
        dilution: edgeDilutionOf(ctx, m),
      }))
    : [];

  // Background at the level where the field spreads (surface or trap level).
  const fieldDepth = chosen ? Math.max(0, column.depth - d.portHeight - chosen.field.height) : column.depth;
  const background = {
    salinity: interpolate(column.depths, column.salinities, fieldDepth),
    temperature: interpolate(column.depths, column.temperatures, fieldDepth),
  };
  let edgeDilution = 1;
  let edgeInside = false;
  let series: SeriesResult = {
    distance: [0],
    dilution: [1],
    salinityIncrease: [scenario.discharge.salinity - background.salinity],
    layerThickness: [null],
    stage: ["jet"],
  };
  if (!chosen) {
    warnings.push(
      warning(
        "edge-dilution-undiluted",
        "serious",
        "No near-field method reached the surface or a trap level; the edge dilution is taken as 1 (undiluted).",
        { stage: "far-field" },
      ),
    );
  } else {
    edgeDilution = edgeDilutionOf(ctx, chosen);
    edgeInside = radius <= chosen.field.distance;
    warnings.push(...chosenFieldWarnings(ctx, chosen, edgeInside));
    if (full)
      series = risingSeries(
        chosen,
        Math.max(2 * radius, 1.2 * chosen.field.distance, 1),
        scenario.discharge.salinity - background.salinity,
        speedOf(ctx, chosen),
        widthOf(ctx, chosen),
      );
  }

  const nfName = chosen ? chosen.nf.method : "none";
  const fieldLabel = chosen?.field.kind === "trapped" ? "trapped field" : "surface field";
  const mixingZone: FarFieldMixingZone = {
    radius,
    dilution: edgeDilution,
    method: edgeInside
      ? `${nfName} rising plume (edge inside the near field)`
      : `${nfName} rising plume → ${fieldLabel} × Brooks (1960) passive diffusion`,
    nearFieldMethod: nfName,
    edgeInsideNearField: edgeInside,
    alternatives,
    layerThickness: null,
    series,
    notModelled: [
      ...notModelledFor(scenario).filter((t) => !/dense layer|stratification beyond/i.test(t)),
      "The buoyant spreading of the surface or trapped field adds mixing that is not counted; it only sets how fast the field moves out in slack water.",
      "Ambient stratification beyond the near field is not modelled; a trapped field is carried at its trap level.",
    ],
  };
  const methods = [
    {
      stage: "far-field",
      name: "passive lateral diffusion of the surface or trapped field",
      source: `${BROOKS_1960_SOURCE}; carried by the current or by the field's own spreading speed, whichever is faster (judgement, no source)`,
    },
  ];
  return { mixingZone, background, warnings, methods };
}

/**
 * The method carried to the edge: the one `options.nearFieldForEdge` names, or the one giving the lower
 * edge dilution (also when the named one gave no result, with a warning).
 */
function governingMethod(
  ctx: RisingContext,
  scenario: Scenario,
  usable: readonly RisingMethod[],
  warnings: ResultWarning[],
): RisingMethod | undefined {
  const opts = scenario.options;
  let chosen: RisingMethod | undefined;
  if (opts.nearFieldForEdge !== "conservative") {
    chosen = usable.find((m) => m.nf.method === opts.nearFieldForEdge);
    if (!chosen && usable.length) {
      warnings.push(
        warning(
          "near-field-choice-unavailable",
          "warning",
          `Near-field method "${opts.nearFieldForEdge}" gave no result; the more conservative available method was used.`,
          { parameter: "options.nearFieldForEdge", stage: "far-field" },
        ),
      );
    }
  }
  return (chosen ??= usable.reduce<RisingMethod | undefined>(
    (lo, m) => (lo === undefined || edgeDilutionOf(ctx, m) < edgeDilutionOf(ctx, lo) ? m : lo),
    undefined,
  ));
}

/** The governing method's warnings: edge inside the plume, the field's own spreading, Brooks's range. */
function chosenFieldWarnings(ctx: RisingContext, chosen: RisingMethod, edgeInside: boolean): ResultWarning[] {
  const { radius, u } = ctx;
  const warnings: ResultWarning[] = [];
  if (edgeInside) {
    warnings.push(
      warning(
        "edge-inside-near-field",
        "info",
        `The mixing-zone edge (${radius} m) lies inside the rising plume's near field (ends at ${chosen.field.distance.toFixed(1)} m); the plume's own dilution there is used.`,
        { parameter: "mixingZone.radius", value: radius, stage: "far-field" },
      ),
    );
  }
  const c = fieldSpreadingSpeed(chosen, ctx.reducedGravity);
  if (c > u && !edgeInside) {
    warnings.push(
      warning(
        "rising-field-own-spreading",
        "info",
        `The ${chosen.field.kind === "surface" ? "surface" : "trapped"} field spreads faster (${c.toPrecision(2)} m/s, ${chosen.field.kind === "surface" ? "√(g′h)" : "N·h"}) than the current carries it (${u.toPrecision(2)} m/s): passive diffusion is taken over the time it needs to spread to the edge at that speed (judgement, no source).`,
        { stage: "far-field" },
      ),
    );
  }
  warnings.push(
    ...brooksDilutionFromDistanceValidityIssues({
      distance: radius,
      initialWidth: widthOf(ctx, chosen),
      currentSpeed: speedOf(ctx, chosen),
    }),
  );
  return warnings;
}

/**
 * The rising plume's footprint stage: where the governing limit is exceeded — up to the furthest series
 * point below the required dilution; the area is that of a circle of that radius (an upper bound for a
 * field drifting with the current). "edge" runs leave it empty.
 */
export function risingFootprintStage(input: {
  readonly series: SeriesResult;
  readonly requiredDilution: number;
  readonly detail?: "full" | "edge";
}): { footprint: FootprintResult; warnings: ResultWarning[] } {
  if (input.detail === "edge") return { footprint: { area: 0, furthestExtent: 0 }, warnings: [] };
  const { series, requiredDilution: req } = input;
  let furthest = 0;
  for (let i = 0; i < series.distance.length; i++)
    if (series.dilution[i]! < req) furthest = Math.max(furthest, series.distance[i]!);
  return { footprint: { area: Math.PI * furthest * furthest, furthestExtent: furthest }, warnings: [] };
}

function risingSeries(m: RisingMethod, xEnd: number, excess: number, u: number, width: number): SeriesResult {
  const distance: number[] = [];
  const dilution: number[] = [];
  const stage: SeriesStage[] = [];
  const profile = jetProfileFromNearField(m.nf);
  const n = 40;
  for (let i = 0; i < n; i++) {
    const r = (m.field.distance * i) / n;
    distance.push(r);
    dilution.push(dilutionFromProfile(profile, r));
    stage.push("jet");
  }
  const field = brooksFieldFromInput({ initialWidth: width, currentSpeed: u });
  const steps = 200;
  for (let i = 0; i <= steps; i++) {
    const r = m.field.distance + ((xEnd - m.field.distance) * i) / steps;
    if (r > xEnd) break;
    distance.push(r);
    dilution.push(m.field.dilution * brooksDilutionInField(field, r - m.field.distance));
    stage.push("passive-diffusion");
  }

  return {
    distance,
    dilution,
    salinityIncrease: dilution.map((s) => excess / s),
    layerThickness: distance.map(() => null),
    stage,
  };
}

/**
 * The field's own spreading speed, m/s: √(g′_f·h) for a surface field (g′_f = |g′₀|/S_f) and N·h for a
 * trapped one, with h the plume's half-width where the field starts (judgement, no source).
 */
function fieldSpreadingSpeed(m: RisingMethod, reducedGravity: number): number {
  const h = Math.max(m.field.halfWidth, 0.1);
  if (m.field.kind === "trapped" && m.field.buoyancyFrequency > 0) return m.field.buoyancyFrequency * h;
  return Math.sqrt((Math.abs(reducedGravity) / Math.max(m.field.dilution, 1)) * h);
}
