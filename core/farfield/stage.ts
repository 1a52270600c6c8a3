/**
 * Stage "beyond the near field": multiport merging, the spreading dense layer and passive diffusion
 * from the end of the near field to the mixing-zone edge, and compliance there.
 *
 * Chain: near-field dilution S_n (the lower method by default, `options.nearFieldForEdge`), then the
 * spreading layer (gravity-current.ts: radial, then drifting with the current) or, with a current, the same
 * layer handed over to Brooks (1960) passive diffusion once its buoyant sideways spreading has slowed to the
 * diffusive spreading; total dilution is multiplicative S(x) = S_n × S_ff (Fischer et al. 1979, from memory).
 * The lower far-field dilution governs by default (`options.farField`). If the edge lies inside the
 * near field, the jet's own dilution where it crosses the edge is used.
 */
import type { Scenario } from "../scenario/types";
import type { AmbientColumn, JetSource, NearFieldMethodResult } from "../nearfield/types";
import type {
  BasinResult,
  ComplianceResult,
  DensitiesResult,
  MixingZoneResult,
  MultiportResult,
  PortResult,
  SeriesResult,
} from "../result/contract";
import { warning, type ResultWarning } from "../warnings";
import { GRAVITY, multiportFromNearField, MERGING_SOURCE, portCountFromDiffuser } from "../multiport";
import { complianceFromEdgeDilution } from "../compliance/required-dilution";
import { jetWidthsFromNearField } from "../multiport/merging";
import { dilutionFromProfile, jetProfileFromNearField, nearFieldEndFromResult, type JetProfile } from "./jet-series";
import { spreadingLayerFromNearFieldEnd, SPREADING_LAYER_SOURCE } from "./gravity-current";
import {
  BROOKS_1960_SOURCE,
  brooksDilutionFromDistanceValidityIssues,
  brooksDilutionInField,
  brooksFieldFromInput,
  brooksWidthInField,
  FOUR_THIRDS_LAW_COEFFICIENT,
} from "./brooks-1960-diffusion";
import { TURNER_1986_SOURCE } from "./turner-1986-entrainment";
import { KATO_PHILLIPS_1969_SOURCE } from "./kato-phillips-1969-entrainment";
import { footprintFromLayer } from "./footprint";
import { FLUX_AVERAGING_FACTOR } from "../nearfield/fluxAveraging";

export interface BeyondInput {
  readonly scenario: Scenario;
  readonly jet: JetSource;
  readonly column: AmbientColumn;
  readonly nearField: readonly NearFieldMethodResult[];
  readonly densities: DensitiesResult;
  readonly port: PortResult;
  /**
   * "full" (default) or "edge": only what the edge verdict needs — `alternatives`, `series` and
   * `footprint` are left empty. For loops (Monte Carlo, sweeps, design) that read the edge numbers only.
   */
  readonly detail?: "full" | "edge";
}

export interface BeyondOutput {
  readonly multiport: MultiportResult;
  /** Near-field results adjusted for merging (each carries a note when changed). */
  readonly nearField: NearFieldMethodResult[];
  readonly mixingZone: MixingZoneResult;
  readonly compliance: ComplianceResult;
  readonly warnings: ResultWarning[];
  readonly methods: { stage: string; name: string; source: string }[];
  /** Present only with `ambient.basin`: the background build-up used in the compliance. */
  readonly basin?: BasinResult;
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

type FarMethod = "gravity-current" | "passive-diffusion";

interface FarSeries {
  distance: number[];
  dilution: number[];
  thickness: number[];
  width: number[];
  /** Where the layer started drifting with the current (null if it never did). */
  switchDistance: number | null;
  /** Passive chain only: where passive diffusion took over from the drifting layer (null if it never did). */
  handOverDistance?: number | null;
}

interface Chain {
  nf: NearFieldMethodResult;
  profile: JetProfile;
  end: { distance: number; dilution: number };
  impactDistance: number;
  layerRadius: number;
  /** Flux-averaged ÷ centreline dilution of this near-field method (the factor at the hand-over). */
  fluxFactor: number;
  /** Far-field series of this chain, computed on first use (see `farSeries`). */
  far: Partial<Record<FarMethod, FarSeries>>;
}

const degToRad = (d: number) => (d * Math.PI) / 180;

/** Run the stage. Never throws for out-of-range physics; returns warnings instead. */
export function beyondNearField(input: BeyondInput): BeyondOutput {
  const { scenario, jet, column, densities } = input;
  const warnings: ResultWarning[] = [];
  const mp = multiportFromNearField({ scenario, jet, nearField: input.nearField });
  warnings.push(...mp.warnings);
  const radius = scenario.mixingZone.radius;
  // Currents below 1 mm/s are below what current meters resolve and cannot carry a layer anywhere within a
  // mixing zone (common practice, no source): treated as stagnant, so the advected closures never divide by
  // a vanishing speed.
  const u = column.currentSpeed < STAGNANT_CURRENT ? 0 : column.currentSpeed;
  const last = column.salinities.length - 1;
  const seabedSalinity = column.salinities[last];
  const seabedTemperature = column.temperatures[last];
  const gBottom = (GRAVITY * (densities.discharge - densities.ambientBottom)) / densities.ambientBottom;
  const diffuser = scenario.diffuser;
  const nPorts = portCountFromDiffuser(scenario);
  const diffuserLength = nPorts > 1 ? Math.max(diffuser.length, 0) : 0;

  // Candidate chains, one per near-field method that reached an end point.
  const chains: Chain[] = [];
  for (const nf of mp.nearField) {
    const end = nearFieldEndFromResult(nf);
    if (!end) {
      warnings.push(
        warning(
          "near-field-no-end",
          "warning",
          `Near-field method "${nf.method}" gave no near-field end; not carried to the edge.`,
          {
            stage: "far-field",
          },
        ),
      );
      continue;
    }
    const xi = nf.impactDistance ?? nf.returnDistance ?? end.distance;
    // Radius of the layer around the impact point at the near-field end: its spread since impact, and at
    // least the jet's half-width at impact (judgement); 0.5 m floor keeps the geometry finite.
    const halfAtImpact = (jetWidthsFromNearField(nf, diffuser.portHeight)?.widthAtImpact ?? 0) / 2;
    const layerRadius = Math.max(end.distance - xi, halfAtImpact, 0.5);
    chains.push({
      nf,
      profile: jetProfileFromNearField(nf),
      end,
      impactDistance: Math.min(xi, end.distance),
      layerRadius,
      fluxFactor: nf.fluxAveragingFactor ?? FLUX_AVERAGING_FACTOR,
      far: {},
    });
  }

  // Bed slope magnitude: gravity drives the layer downslope relative to the water above whatever the current.
  const bedSlope = (): number => (scenario.ambient.bedSlope > 0 ? scenario.ambient.bedSlope : 0);
  const crossLength = (): number =>
    u > 0
      ? diffuserLength * Math.abs(Math.sin(degToRad(diffuser.diffuserAzimuth - column.currentDirection)))
      : diffuserLength;

  // Integrates over [end of the near field, xEnd] in `steps` steps, stopping after the first step past xStop.
  const integrateFar = (c: Chain, method: FarMethod, xEnd: number, steps: number, xStop: number): FarSeries => {
    // Passive diffusion reuses the spreading layer's distances and start thickness (memoised below).
    if (method === "passive-diffusion" && u > 0) return passiveFromLayer(c, farSeries(c, "gravity-current"));
    // Like with like: the layer is handed the volume flux (flux-averaged dilution) and its dilution is
    // reported back on the centreline (minimum) basis with the same factor, so the series is continuous at
    // the hand-over and the edge value keeps the near-bed meaning the verdict needs.
    const k = c.fluxFactor;
    const gc = spreadingLayerFromNearFieldEnd({
      startDistance: c.end.distance,
      endDistance: Math.max(xEnd, c.end.distance),
      startDilution: c.end.dilution * k,
      dischargeFlow: scenario.discharge.flow,
      reducedGravity: gBottom,
      initialWidth: 2 * Math.PI * c.layerRadius,
      perimeterOffset: 2 * diffuserLength,
      crossCurrentLength: crossLength(),
      currentSpeed: u,
      bedSlope: bedSlope(),
      steps,
      stopDistance: xStop,
    });
    return {
      distance: gc.distance,
      dilution: gc.dilution.map((sd) => sd / k),
      thickness: gc.thickness,
      width: gc.width,
      switchDistance: gc.switchDistance,
    };
  };
  // Passive diffusion takes over from the drifting layer where the layer's buoyant sideways spreading,
  // dw/dx = 2·√(g′h)/u, has slowed to the spreading Brooks (1960) diffusion gives a field of the same width,
  // db/dx = 12·α_ε·b^{1/3}/u (both divided by u, so the rule compares 2·√(g′h) with 12·α_ε·b^{1/3}) —
  // the usual hand-over from buoyant spreading to passive diffusion (common practice, no source). Up to the
  // hand-over the passive chain is the layer itself; a layer that never drifts (vanishing current) never
  // hands over, so the passive chain tends to the layer as the current goes to zero.
  const passiveFromLayer = (c: Chain, gc: FarSeries): FarSeries => {
    const k = passiveHandOverIndex(gc, gBottom / c.fluxFactor);
    if (k < 0) return { ...gc, handOverDistance: null };
    const field = brooksFieldFromInput({ initialWidth: gc.width[k], currentSpeed: u });
    const out: FarSeries = {
      distance: [],
      dilution: [],
      thickness: [],
      width: [],
      switchDistance: gc.switchDistance,
      handOverDistance: gc.distance[k],
    };
    for (let i = 0; i < gc.distance.length; i++) {
      const r = gc.distance[i];
      out.distance.push(r);
      if (i <= k) {
        out.dilution.push(gc.dilution[i]);
        out.thickness.push(gc.thickness[i]);
        out.width.push(gc.width[i]);
        continue;
      }
      const x = r - gc.distance[k];
      out.dilution.push(gc.dilution[k] * brooksDilutionInField(field, x));
      out.thickness.push(gc.thickness[k]); // Brooks (1960) assumes no vertical mixing: thickness stays at its start value
      out.width.push(brooksWidthInField(field, x));
    }
    return out;
  };
  // One integration per chain and method, over the whole range the edge, the series and the footprint need,
  // memoised: the edge value is interpolated from it (200 RK4 steps over ten radii: steps of radius/20).
  // Edge-only runs stop each series at the first point at or past the edge: the same leading points, and all
  // the edge reads (interpolation at the edge; a passive layer's thickness is constant along its series).
  const full = input.detail !== "edge";
  const farRange = (c: Chain) => Math.max(10 * radius, 2 * c.end.distance);
  const farSeries = (c: Chain, method: FarMethod): FarSeries =>
    (c.far[method] ??= integrateFar(c, method, farRange(c), FAR_STEPS, full ? Infinity : radius));
  const atRadius = (s: FarSeries) => interpolate(s.distance, s.dilution, radius);

  // Alternatives at the edge, for every near-field method and every applicable far-field method.
  const farMethods: FarMethod[] = u > 0 ? ["gravity-current", "passive-diffusion"] : ["gravity-current"];
  const alternatives: { method: string; dilution: number }[] = [];
  const edgeOf = (c: Chain, m: FarMethod): number =>
    radius <= c.end.distance ? dilutionFromProfile(c.profile, radius) : atRadius(farSeries(c, m));
  for (const c of full ? chains : []) {
    if (radius <= c.end.distance)
      alternatives.push({ method: `${c.nf.method} (jet crosses the edge)`, dilution: edgeOf(c, "gravity-current") });
    else for (const m of farMethods) alternatives.push({ method: `${c.nf.method} + ${m}`, dilution: edgeOf(c, m) });
  }

  // Which far-field method governs one chain: the requested one, or the lower edge dilution of the two.
  const opts = scenario.options;
  const farMethodFor = (c: Chain): FarMethod => {
    if (opts.farField === "passive-diffusion") return u > 0 ? "passive-diffusion" : "gravity-current";
    if (opts.farField === "conservative" && u > 0 && radius > c.end.distance)
      return edgeOf(c, "passive-diffusion") < edgeOf(c, "gravity-current") ? "passive-diffusion" : "gravity-current";
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

  // Which near-field method feeds the edge: the requested one, or by default the more conservative — the
  // one whose chain gives the lower dilution at the mixing-zone edge (compared at the same place, since the
  // methods' near fields end at different distances).
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
  chain ??= chains.reduce<Chain | undefined>(
    (lo, c) => (lo === undefined || edgeOf(c, farMethodFor(c)) < edgeOf(lo, farMethodFor(lo)) ? c : lo),
    undefined,
  );
  const farMethod: FarMethod = chain ? farMethodFor(chain) : "gravity-current";

  const xEnd = Math.max(2 * radius, chain ? 1.2 * chain.end.distance : 0, 1);
  let edgeDilution = 1;
  let edgeInside = false;
  let layerAtEdge: number | null = null;
  let series: SeriesResult = {
    distance: [0],
    dilution: [1],
    salinityIncrease: [scenario.discharge.salinity - seabedSalinity],
    layerThickness: [null],
    stage: ["jet"],
  };
  let footprint = { area: 0, furthestExtent: 0 };
  const excess = scenario.discharge.salinity - seabedSalinity;

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
    edgeDilution = edgeOf(chain, farMethod);
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
    const far = farSeries(chain, farMethod);
    if (!edgeInside) {
      const h = interpolate(far.distance, far.thickness, radius);
      // Where the method gives no thickness at the edge (the layer has become passive), say so with null.
      layerAtEdge = Number.isFinite(h) ? h : null;
    }
    // Thin-layer check over the layer inside the mixing zone, the part the edge dilution rests on.
    const depth = scenario.ambient.depth;
    let thickest = 0;
    for (let i = 0; i < far.distance.length && far.distance[i]! <= radius; i++) {
      const h = far.thickness[i]!;
      if (Number.isFinite(h) && h > thickest) thickest = h;
    }
    // The edge lies between two computed points: its interpolated thickness counts too.
    if (layerAtEdge !== null && layerAtEdge > thickest) thickest = layerAtEdge;
    if (!edgeInside && thickest >= depth) {
      // A layer as thick as the water is deep is no longer a thin bottom layer: outside the screening methods.
      warnings.push(
        warning(
          "layer-reaches-surface",
          "serious",
          `Inside the mixing zone the dense layer reaches ${thickest.toFixed(1)} m thick in ${depth.toFixed(1)} m of water: it fills the water column up to the surface, where the spreading-layer and diffusion methods do not apply.`,
          { parameter: "ambient.depth", value: depth, stage: "far-field" },
        ),
      );
    } else if (!edgeInside && thickest > 0.5 * depth) {
      warnings.push(
        warning(
          "layer-thick-for-depth",
          "warning",
          `Inside the mixing zone the spreading layer reaches ${thickest.toFixed(1)} m thick in ${depth.toFixed(1)} m of water: the thin-layer assumptions behind the far-field dilution do not hold; treat the edge dilution as rough.`,
          { parameter: "ambient.depth", value: depth, stage: "far-field" },
        ),
      );
    }
    if (full) series = buildSeries(chain, truncateSeries(far, xEnd), farMethod, excess);
  }

  const assessment = complianceFromEdgeDilution(scenario, edgeDilution, seabedSalinity, seabedTemperature);
  warnings.push(...assessment.warnings);
  if (chain && full) {
    footprint = footprintFromLayer(
      { profile: chain.profile, impactDistance: chain.impactDistance, nearFieldEnd: chain.end.distance },
      farSeries(chain, farMethod),
      assessment.compliance.requiredDilution,
    );
    if (footprint.furthestExtent >= farRange(chain) * 0.999) {
      warnings.push(
        warning(
          "footprint-beyond-range",
          "warning",
          `The governing limit is still exceeded at ${footprint.furthestExtent.toFixed(0)} m, the end of the computed range; the footprint is larger than reported.`,
          {
            stage: "far-field",
          },
        ),
      );
    }
  }
  if (u > 0)
    warnings.push(...brooksDilutionFromDistanceValidityIssues({ distance: radius, initialWidth: 1, currentSpeed: u }));

  const nfName = chain ? chain.nf.method : "none";
  const farLabel =
    farMethod === "passive-diffusion" ? "Brooks (1960) passive diffusion" : "spreading dense layer E(Ri)";
  const mixingZone: MixingZoneResult = {
    radius,
    dilution: edgeDilution,
    method: edgeInside ? `${nfName} jet (edge inside the near field)` : `${nfName} near field × ${farLabel}`,
    nearFieldMethod: nfName,
    edgeInsideNearField: edgeInside,
    alternatives,
    constituents: assessment.constituents,
    layerThickness: layerAtEdge,
    footprint,
    series,
    notModelled: notModelledFor(scenario),
  };
  const methods = [
    { stage: "multiport", name: "jet merging and line-plume limit", source: MERGING_SOURCE },
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
    {
      stage: "compliance",
      name: "required dilution",
      source: "S_req = (C_d − C_b)/(C_limit − C_b), from the definition of dilution",
    },
    ...(assessment.basin
      ? [{ stage: "background", name: assessment.basin.method, source: assessment.basin.source }]
      : []),
  ];
  return {
    multiport: mp.multiport,
    nearField: mp.nearField,
    mixingZone,
    compliance: assessment.compliance,
    warnings,
    methods,
    ...(assessment.basin ? { basin: assessment.basin } : {}),
  };
}

/** Current speed below which the far field is treated as stagnant, m/s (see beyondNearField). */
export const STAGNANT_CURRENT = 1e-3;

/** Steps of the far-field integration (fourth-order Runge–Kutta; see farSeries above). */
const FAR_STEPS = 200;

/**
 * Index of the first point of a layer series where passive diffusion takes over (see passiveFromLayer in
 * beyondNearField): the layer drifts with the current and 2·√(g′h) ≤ 12·α_ε·b^{1/3}; −1 if none.
 */
function passiveHandOverIndex(gc: FarSeries, gBottom: number): number {
  if (gc.switchDistance === null) return -1;
  for (let i = 0; i < gc.distance.length; i++) {
    if (gc.distance[i] < gc.switchDistance) continue;
    const gp = gBottom / gc.dilution[i];
    const h = gc.thickness[i];
    const b = gc.width[i];
    if (!(b > 0) || !Number.isFinite(h)) continue;
    if (2 * Math.sqrt(Math.max(0, gp * h)) <= 12 * FOUR_THIRDS_LAW_COEFFICIENT * Math.cbrt(b)) return i;
  }
  return -1;
}

/** The part of a far-field series up to `xEnd` (the displayed range), ending exactly at `xEnd`. */
function truncateSeries(f: FarSeries, xEnd: number): FarSeries {
  const out: FarSeries = {
    distance: [],
    dilution: [],
    thickness: [],
    width: [],
    switchDistance: f.switchDistance,
    handOverDistance: f.handOverDistance,
  };
  for (let i = 0; i < f.distance.length; i++) {
    if (f.distance[i] > xEnd) {
      if (i > 0) {
        out.distance.push(xEnd);
        out.dilution.push(interpolate(f.distance, f.dilution, xEnd));
        out.thickness.push(interpolate(f.distance, f.thickness, xEnd));
        out.width.push(interpolate(f.distance, f.width, xEnd));
      }
      break;
    }
    out.distance.push(f.distance[i]);
    out.dilution.push(f.dilution[i]);
    out.thickness.push(f.thickness[i]);
    out.width.push(f.width[i]);
  }
  return out;
}

function interpolate(xs: readonly number[], ys: readonly number[], x: number): number {
  if (x <= xs[0]) return ys[0];
  for (let i = 1; i < xs.length; i++) {
    if (x <= xs[i]) {
      const t = (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
      return ys[i - 1] + t * (ys[i] - ys[i - 1]);
    }
  }
  return ys[ys.length - 1];
}

function buildSeries(chain: Chain, far: FarSeries, method: FarMethod, excess: number): SeriesResult {
  const distance: number[] = [];
  const dilution: number[] = [];
  const layerThickness: (number | null)[] = [];
  const stage: string[] = [];
  const n = 40;
  for (let i = 0; i < n; i++) {
    const r = (chain.end.distance * i) / n;
    distance.push(r);
    dilution.push(dilutionFromProfile(chain.profile, r));
    layerThickness.push(null);
    stage.push("jet");
  }
  const label = method === "passive-diffusion" ? "passive-diffusion" : "spreading-layer";
  for (let i = 0; i < far.distance.length; i++) {
    distance.push(far.distance[i]);
    dilution.push(far.dilution[i]);
    layerThickness.push(Number.isFinite(far.thickness[i]) ? far.thickness[i] : null);
    stage.push(i === 0 ? "spreading-layer" : label);
  }
  return { distance, dilution, salinityIncrease: dilution.map((s) => excess / s), layerThickness, stage };
}
