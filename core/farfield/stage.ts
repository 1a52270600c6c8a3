/**
 * The far-field stage: from the end of the near field to the mixing-zone edge, for the near-field
 * results after multiport merging (core/multiport). Returns the edge dilution and the far-field part of
 * `mixingZone`; compliance (core/compliance) and the footprint (footprint.ts) are the next stages.
 *
 * Chain: near-field dilution S_n (the lower method by default, `options.nearFieldForEdge`), then the
 * spreading layer (gravity-current.ts: radial, then drifting with the current) or, with a current, the same
 * layer handed over to Brooks (1960) passive diffusion once its buoyant sideways spreading has slowed to the
 * diffusive spreading; total dilution is multiplicative S(x) = S_n × S_ff (Fischer et al. 1979, from memory).
 * The lower far-field dilution governs by default (`options.farField`). If the edge lies inside the
 * near field, the jet's own dilution where it crosses the edge is used.
 */
import type { Scenario } from "../scenario/types";
import type { AmbientColumn, NearFieldMethodResult } from "../nearfield/types";
import type { DensitiesResult, MixingZoneResult, SeriesResult } from "../result/contract";
import { warning, type ResultWarning } from "../warnings";
import { interpolateLinear } from "../interpolate";
import { SPREADING_LAYER_SOURCE, spreadingLayerValidityIssues } from "./gravity-current";
import { BROOKS_1960_SOURCE, brooksDilutionFromDistanceValidityIssues } from "./brooks-1960-diffusion";
import { TURNER_1986_SOURCE } from "./turner-1986-entrainment";
import { KATO_PHILLIPS_1969_SOURCE } from "./kato-phillips-1969-entrainment";
import {
  chainsFromNearField,
  edgeDilutionOf,
  farContextFromInput,
  farRange,
  farSeries,
  seriesFromChain,
  truncateSeries,
  type Chain,
  type FarContext,
  type FarMethod,
  type FarSeries,
} from "./chains";
import type { JetProfile } from "./jet-series";

export { STAGNANT_CURRENT } from "./chains";

export interface FarFieldInput {
  readonly scenario: Scenario;
  readonly column: AmbientColumn;
  readonly densities: DensitiesResult;
  /** The near-field results after multiport merging (the multiport stage's `nearField`). */
  readonly nearField: readonly NearFieldMethodResult[];
  /**
   * "full" (default) or "edge": only what the edge verdict needs — `alternatives` and `series` are left
   * empty. For loops (Monte Carlo, sweeps, design) that read the edge numbers only.
   */
  readonly detail?: "full" | "edge";
}

/** The governing chain's jet and layer, as the footprint stage needs them. */
export interface GoverningLayer {
  readonly profile: JetProfile;
  readonly impactDistance: number;
  readonly nearFieldEnd: number;
  /** The far-field series of the governing method over the whole computed range. */
  readonly layer: FarSeries;
  /** End of the computed range, m. */
  readonly range: number;
}

/** The far-field stage's part of `mixingZone`: everything but the constituents and the footprint. */
export type FarFieldMixingZone = Omit<MixingZoneResult, "constituents" | "footprint">;

export interface FarFieldOutput {
  readonly mixingZone: FarFieldMixingZone;
  /** The governing chain (null when no near-field method reached an end point). */
  readonly governing: GoverningLayer | null;
  /** Background salinity (g/kg) and temperature (°C) at the seabed, where the layer runs. */
  readonly seabed: { readonly salinity: number; readonly temperature: number };
  readonly warnings: ResultWarning[];
  readonly methods: { stage: string; name: string; source: string }[];
}

/** What the result leaves out; with `ambient.basin` the build-up is modelled by the box model instead. */
export function notModelledFor(scenario: Scenario): readonly string[] {
  if (!scenario.ambient.basin) return NOT_MODELLED;
  return [BASIN_NOT_MODELLED, ...NOT_MODELLED.slice(1)];
}

export const BASIN_NOT_MODELLED =
  "Background build-up in the enclosed basin is a well-mixed box-model estimate (no stratification, complete mixing); uneven build-up within the basin is not modelled.";

export const NOT_MODELLED: readonly string[] = [
  "Background build-up of salinity in enclosed or poorly flushed water is not modelled; the background is taken as constant.",
  "Tidal reversal and re-entrainment of previously discharged brine are not modelled.",
  "Brine reaching a seawater intake (recirculation into the plant) is not modelled.",
  "Ambient density stratification beyond the near field and bed roughness features are not modelled.",
];

/** Run the stage. Never throws for out-of-range physics; returns warnings instead. */
export function farFieldStage(input: FarFieldInput): FarFieldOutput {
  const { scenario, column } = input;
  const ctx = farContextFromInput(input);
  const { radius, u, full } = ctx;
  const { chains, warnings } = chainsFromNearField(input.nearField, scenario.diffuser.portHeight);
  const last = column.salinities.length - 1;
  const seabed = { salinity: column.salinities[last], temperature: column.temperatures[last] };

  const alternatives = full ? edgeAlternatives(ctx, chains) : [];
  const choice = governingChain(ctx, chains, warnings);
  const chain = choice?.chain;
  const farMethod: FarMethod = choice?.farMethod ?? "gravity-current";

  const xEnd = Math.max(2 * radius, chain ? 1.2 * chain.end.distance : 0, 1);
  let edgeDilution = 1;
  let edgeInside = false;
  let layerAtEdge: number | null = null;
  const excess = scenario.discharge.salinity - seabed.salinity;
  let series: SeriesResult = {
    distance: [0],
    dilution: [1],
    salinityIncrease: [excess],
    layerThickness: [null],
    stage: ["jet"],
  };

  if (!chain) {
    warnings.push(
      warning(
        "edge-dilution-undiluted",
        "serious",
        "No near-field result reached the seabed; the edge dilution is taken as 1 (undiluted).",
        {
          stage: "far-field",
        },
      ),
    );
  } else {
    edgeInside = radius <= chain.end.distance;
    edgeDilution = edgeDilutionOf(ctx, chain, farMethod);
    if (edgeInside) {
      warnings.push(
        warning(
          "edge-inside-near-field",
          "info",
          `The mixing-zone edge (${radius} m) lies inside the near field (ends at ${chain.end.distance.toFixed(1)} m); the jet's own dilution where it crosses the edge is used.`,
          {
            parameter: "mixingZone.radius",
            value: radius,
            stage: "far-field",
          },
        ),
      );
    }
    const far = farSeries(ctx, chain, farMethod);
    if (!edgeInside) {
      const h = interpolateLinear(far.distance, far.thickness, radius);
      // Where the method gives no thickness at the edge (the layer has become passive), say so with null.
      layerAtEdge = Number.isFinite(h) ? h : null;
      warnings.push(...thinLayerWarnings(far, radius, layerAtEdge, scenario.ambient.depth));
      warnings.push(...spreadingLayerValidityIssues(far, radius));
    }
    if (full) series = seriesFromChain(chain, truncateSeries(far, xEnd), farMethod, excess);
  }
  if (u > 0)
    warnings.push(...brooksDilutionFromDistanceValidityIssues({ distance: radius, initialWidth: 1, currentSpeed: u }));

  const nfName = chain ? chain.nf.method : "none";
  const farLabel =
    farMethod === "passive-diffusion" ? "Brooks (1960) passive diffusion" : "spreading dense layer E(Ri)";
  const mixingZone: FarFieldMixingZone = {
    radius,
    dilution: edgeDilution,
    method: edgeInside ? `${nfName} jet (edge inside the near field)` : `${nfName} near field × ${farLabel}`,
    nearFieldMethod: nfName,
    edgeInsideNearField: edgeInside,
    alternatives,
    layerThickness: layerAtEdge,
    series,
    notModelled: notModelledFor(scenario),
  };
  const governing: GoverningLayer | null = chain
    ? {
        // Read through the chain: built only if the footprint (full detail) asks for it.
        get profile() {
          return chain.profile;
        },
        impactDistance: chain.impactDistance,
        nearFieldEnd: chain.end.distance,
        layer: farSeries(ctx, chain, farMethod),
        range: farRange(ctx, chain),
      }
    : null;
  return { mixingZone, governing, seabed, warnings, methods: farFieldMethods(u) };
}

/** Alternatives at the edge, for every near-field method and every applicable far-field method. */
function edgeAlternatives(ctx: FarContext, chains: readonly Chain[]): { method: string; dilution: number }[] {
  const farMethods: FarMethod[] = ctx.u > 0 ? ["gravity-current", "passive-diffusion"] : ["gravity-current"];
  const alternatives: { method: string; dilution: number }[] = [];
  for (const c of chains) {
    if (ctx.radius <= c.end.distance)
      alternatives.push({
        method: `${c.nf.method} (jet crosses the edge)`,
        dilution: edgeDilutionOf(ctx, c, "gravity-current"),
      });
    else
      for (const m of farMethods)
        alternatives.push({ method: `${c.nf.method} + ${m}`, dilution: edgeDilutionOf(ctx, c, m) });
  }
  return alternatives;
}

/**
 * Which near-field method feeds the edge, and which far-field method governs it: the requested ones, or
 * by default the more conservative — the chain and method giving the lower dilution at the mixing-zone
 * edge (compared at the same place, since the methods' near fields end at different distances).
 */
function governingChain(
  ctx: FarContext,
  chains: readonly Chain[],
  warnings: ResultWarning[],
): { chain: Chain; farMethod: FarMethod } | undefined {
  const { u, radius } = ctx;
  const opts = ctx.scenario.options;
  const farMethodFor = (c: Chain): FarMethod => {
    if (opts.farField === "passive-diffusion") return u > 0 ? "passive-diffusion" : "gravity-current";
    if (opts.farField === "conservative" && u > 0 && radius > c.end.distance)
      return edgeDilutionOf(ctx, c, "passive-diffusion") < edgeDilutionOf(ctx, c, "gravity-current")
        ? "passive-diffusion"
        : "gravity-current";
    return "gravity-current";
  };
  if (opts.farField === "passive-diffusion" && !(u > 0)) {
    warnings.push(
      warning(
        "passive-diffusion-no-current",
        "warning",
        "Passive diffusion was requested but the water is stagnant; the spreading layer was used.",
        {
          parameter: "options.farField",
          stage: "far-field",
        },
      ),
    );
  }
  let chain: Chain | undefined;
  if (opts.nearFieldForEdge !== "conservative") {
    chain = chains.find((c) => c.nf.method === opts.nearFieldForEdge);
    if (!chain && chains.length) {
      warnings.push(
        warning(
          "near-field-choice-unavailable",
          "warning",
          `Near-field method "${opts.nearFieldForEdge}" gave no result; the more conservative available method was used.`,
          {
            parameter: "options.nearFieldForEdge",
            stage: "far-field",
          },
        ),
      );
    }
  }
  const edgeOf = (c: Chain) => edgeDilutionOf(ctx, c, farMethodFor(c));
  chain ??= chains.reduce<Chain | undefined>(
    (lo, c) => (lo === undefined || edgeOf(c) < edgeOf(lo) ? c : lo),
    undefined,
  );
  return chain ? { chain, farMethod: farMethodFor(chain) } : undefined;
}

/** Thin-layer check over the layer inside the mixing zone, the part the edge dilution rests on. */
function thinLayerWarnings(far: FarSeries, radius: number, atEdge: number | null, depth: number): ResultWarning[] {
  let thickest = 0;
  for (let i = 0; i < far.distance.length && far.distance[i]! <= radius; i++) {
    const h = far.thickness[i]!;
    if (Number.isFinite(h) && h > thickest) thickest = h;
  }
  // The edge lies between two computed points: its interpolated thickness counts too.
  if (atEdge !== null && atEdge > thickest) thickest = atEdge;
  if (thickest >= depth) {
    // A layer as thick as the water is deep is no longer a thin bottom layer: outside the screening methods.
    return [
      warning(
        "layer-reaches-surface",
        "serious",
        `Inside the mixing zone the dense layer reaches ${thickest.toFixed(1)} m thick in ${depth.toFixed(1)} m of water: it fills the water column up to the surface, where the spreading-layer and diffusion methods do not apply.`,
        { parameter: "ambient.depth", value: depth, stage: "far-field" },
      ),
    ];
  }
  if (thickest > 0.5 * depth) {
    return [
      warning(
        "layer-thick-for-depth",
        "warning",
        `Inside the mixing zone the spreading layer reaches ${thickest.toFixed(1)} m thick in ${depth.toFixed(1)} m of water: the thin-layer assumptions behind the far-field dilution do not hold; treat the edge dilution as rough.`,
        { parameter: "ambient.depth", value: depth, stage: "far-field" },
      ),
    ];
  }
  return [];
}

function farFieldMethods(u: number): { stage: string; name: string; source: string }[] {
  return [
    { stage: "far-field", name: "spreading dense layer", source: SPREADING_LAYER_SOURCE },
    { stage: "far-field", name: "entrainment law E(Ri)", source: TURNER_1986_SOURCE },
    ...(u > 0 ? [{ stage: "far-field", name: "bed-stirred entrainment", source: KATO_PHILLIPS_1969_SOURCE }] : []),
    ...(u > 0
      ? [
          {
            stage: "far-field",
            name: "passive lateral diffusion",
            source: `${BROOKS_1960_SOURCE}; takes over from the drifting layer where its buoyant sideways spreading has slowed to the diffusive spreading (common practice, no source)`,
          },
        ]
      : []),
  ];
}
