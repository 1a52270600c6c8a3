/**
 * The far-field chains of the far-field stage (stage.ts): one per near-field method that reached an end
 * point, each carried from the near-field end to the mixing-zone edge and beyond by the spreading dense
 * layer (gravity-current.ts) or, with a current, the same layer handed over to Brooks (1960) passive
 * diffusion. Series are integrated once per chain and method and memoised on the chain.
 */
import type { Scenario } from "../scenario/types";
import type { AmbientColumn, NearFieldMethodResult } from "../nearfield/types";
import type { DensitiesResult, SeriesResult, SeriesStage } from "../result/contract";
import { STANDARD_GRAVITY } from "../constants";
import { interpolateLinear } from "../interpolate";
import { warning, type ResultWarning } from "../warnings";
import { portCountFromDiffuser } from "../multiport/port-hydraulics";
import { jetWidthsFromNearField } from "../multiport/merging";
import { dilutionFromProfile, jetProfileFromNearField, nearFieldEndFromResult, type JetProfile } from "./jet-series";
import { spreadingLayerFromNearFieldEnd } from "./gravity-current";
import {
  brooksDilutionInField,
  brooksFieldFromInput,
  brooksWidthInField,
  FOUR_THIRDS_LAW_COEFFICIENT,
} from "./brooks-1960-diffusion";
import { FLUX_AVERAGING_FACTOR } from "../nearfield/flux-averaging";

export type FarMethod = "gravity-current" | "passive-diffusion";

export interface FarSeries {
  distance: number[];
  dilution: number[];
  thickness: number[];
  width: number[];
  /** Where the layer started drifting with the current (null if it never did). */
  switchDistance: number | null;
  /** Passive chain only: where passive diffusion took over from the drifting layer (null if it never did). */
  handOverDistance?: number | null;
  /** Ri handed to E(Ri) and Ri* handed to the bed-stirred law at each point (Infinity where neither is used). */
  richardson: number[];
  bedRichardson: number[];
}

export interface Chain {
  nf: NearFieldMethodResult;
  /** The jet's dilution along plan distance, built on first read (edge-only runs mostly never read it). */
  readonly profile: JetProfile;
  end: { distance: number; dilution: number };
  impactDistance: number;
  layerRadius: number;
  /** Flux-averaged ÷ centreline dilution of this near-field method (the factor at the hand-over). */
  fluxFactor: number;
  /** Far-field series of this chain, computed on first use (see `farSeries`). */
  far: Partial<Record<FarMethod, FarSeries>>;
}

/** Current speed below which the far field is treated as stagnant, m/s (see farContextFromInput). */
export const STAGNANT_CURRENT = 1e-3;

/** Steps of the far-field integration (fourth-order Runge–Kutta; see farSeries). */
const FAR_STEPS = 200;

const degToRad = (d: number) => (d * Math.PI) / 180;

/** What every chain of one scenario shares: the current, the layer's buoyancy and the diffuser's extent. */
export interface FarContext {
  readonly scenario: Scenario;
  readonly radius: number;
  /** Current speed carried by the far field, m/s (0 below STAGNANT_CURRENT). */
  readonly u: number;
  /** Reduced gravity of the undiluted discharge against the seabed water, m/s². */
  readonly gBottom: number;
  readonly diffuserLength: number;
  readonly crossLength: number;
  readonly bedSlope: number;
  /** "edge" runs stop each series at the first point at or past the edge. */
  readonly full: boolean;
}

export interface FarContextInput {
  readonly scenario: Scenario;
  readonly column: AmbientColumn;
  readonly densities: DensitiesResult;
  readonly detail?: "full" | "edge";
}

export function farContextFromInput(input: FarContextInput): FarContext {
  const { scenario, column, densities } = input;
  // Currents below 1 mm/s are below what current meters resolve and cannot carry a layer anywhere within a
  // mixing zone (common practice, no source): treated as stagnant, so the advected closures never divide by
  // a vanishing speed.
  const u = column.currentSpeed < STAGNANT_CURRENT ? 0 : column.currentSpeed;
  const diffuser = scenario.diffuser;
  const nPorts = portCountFromDiffuser(scenario);
  const diffuserLength = nPorts > 1 ? Math.max(diffuser.length, 0) : 0;
  return {
    scenario,
    radius: scenario.mixingZone.radius,
    u,
    gBottom: (STANDARD_GRAVITY * (densities.discharge - densities.ambientBottom)) / densities.ambientBottom,
    diffuserLength,
    crossLength:
      u > 0
        ? diffuserLength * Math.abs(Math.sin(degToRad(diffuser.diffuserAzimuth - column.currentDirection)))
        : diffuserLength,
    // Bed slope magnitude: gravity drives the layer downslope relative to the water above whatever the current.
    bedSlope: scenario.ambient.bedSlope > 0 ? scenario.ambient.bedSlope : 0,
    full: input.detail !== "edge",
  };
}

/** Candidate chains, one per near-field method that reached an end point (warnings for the others). */
export function chainsFromNearField(
  nearField: readonly NearFieldMethodResult[],
  portHeight: number,
): { chains: Chain[]; warnings: ResultWarning[] } {
  const chains: Chain[] = [];
  const warnings: ResultWarning[] = [];
  for (const nf of nearField) {
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
    const halfAtImpact = (jetWidthsFromNearField(nf, portHeight)?.widthAtImpact ?? 0) / 2;
    const layerRadius = Math.max(end.distance - xi, halfAtImpact, 0.5);
    let profile: JetProfile | undefined;
    chains.push({
      nf,
      get profile() {
        return (profile ??= jetProfileFromNearField(nf));
      },
      end,
      impactDistance: Math.min(xi, end.distance),
      layerRadius,
      fluxFactor: nf.fluxAveragingFactor ?? FLUX_AVERAGING_FACTOR,
      far: {},
    });
  }
  return { chains, warnings };
}

/** The range of one chain's far-field series: ten mixing-zone radii, or twice the near field. */
export const farRange = (ctx: FarContext, c: Chain): number => Math.max(10 * ctx.radius, 2 * c.end.distance);

/**
 * One integration per chain and method, over the whole range the edge, the series and the footprint need,
 * memoised: the edge value is interpolated from it (200 RK4 steps over ten radii: steps of radius/20).
 * Edge-only runs stop each series at the first point at or past the edge: the same leading points, and all
 * the edge reads (interpolation at the edge; a passive layer's thickness is constant along its series).
 */
export function farSeries(ctx: FarContext, c: Chain, method: FarMethod): FarSeries {
  return (c.far[method] ??= integrateFar(
    ctx,
    c,
    method,
    farRange(ctx, c),
    FAR_STEPS,
    ctx.full ? Infinity : ctx.radius,
  ));
}

/** Dilution at the mixing-zone edge of one chain and far-field method (the jet's own inside the near field). */
export function edgeDilutionOf(ctx: FarContext, c: Chain, m: FarMethod): number {
  if (ctx.radius <= c.end.distance) return dilutionFromProfile(c.profile, ctx.radius);
  const s = farSeries(ctx, c, m);
  return interpolateLinear(s.distance, s.dilution, ctx.radius);
}

// Integrates over [end of the near field, xEnd] in `steps` steps, stopping after the first step past xStop.
function integrateFar(
  ctx: FarContext,
  c: Chain,
  method: FarMethod,
  xEnd: number,
  steps: number,
  xStop: number,
): FarSeries {
  // Passive diffusion reuses the spreading layer's distances and start thickness (memoised in farSeries).
  if (method === "passive-diffusion" && ctx.u > 0)
    return passiveFromLayer(ctx, c, farSeries(ctx, c, "gravity-current"));
  // Like with like: the layer is handed the volume flux (flux-averaged dilution) and its dilution is
  // reported back on the centreline (minimum) basis with the same factor, so the series is continuous at
  // the hand-over and the edge value keeps the near-bed meaning the verdict needs.
  const k = c.fluxFactor;
  const gc = spreadingLayerFromNearFieldEnd({
    startDistance: c.end.distance,
    endDistance: Math.max(xEnd, c.end.distance),
    startDilution: c.end.dilution * k,
    dischargeFlow: ctx.scenario.discharge.flow,
    reducedGravity: ctx.gBottom,
    initialWidth: 2 * Math.PI * c.layerRadius,
    perimeterOffset: 2 * ctx.diffuserLength,
    crossCurrentLength: ctx.crossLength,
    currentSpeed: ctx.u,
    bedSlope: ctx.bedSlope,
    steps,
    stopDistance: xStop,
  });
  return {
    distance: gc.distance,
    dilution: gc.dilution.map((sd) => sd / k),
    thickness: gc.thickness,
    width: gc.width,
    switchDistance: gc.switchDistance,
    richardson: gc.richardson,
    bedRichardson: gc.bedRichardson,
  };
}

// Passive diffusion takes over from the drifting layer where the layer's buoyant sideways spreading,
// dw/dx = 2·√(g′h)/u, has slowed to the spreading Brooks (1960) diffusion gives a field of the same width,
// db/dx = 12·α_ε·b^{1/3}/u (both divided by u, so the rule compares 2·√(g′h) with 12·α_ε·b^{1/3}) —
// the usual hand-over from buoyant spreading to passive diffusion (common practice, no source). Up to the
// hand-over the passive chain is the layer itself; a layer that never drifts (vanishing current) never
// hands over, so the passive chain tends to the layer as the current goes to zero.
function passiveFromLayer(ctx: FarContext, c: Chain, gc: FarSeries): FarSeries {
  const k = passiveHandOverIndex(gc, ctx.gBottom / c.fluxFactor);
  if (k < 0) return { ...gc, handOverDistance: null };
  const field = brooksFieldFromInput({ initialWidth: gc.width[k], currentSpeed: ctx.u });
  const out: FarSeries = {
    distance: [],
    dilution: [],
    thickness: [],
    width: [],
    switchDistance: gc.switchDistance,
    handOverDistance: gc.distance[k],
    richardson: [],
    bedRichardson: [],
  };
  for (let i = 0; i < gc.distance.length; i++) {
    const r = gc.distance[i];
    out.distance.push(r);
    if (i <= k) {
      out.dilution.push(gc.dilution[i]);
      out.thickness.push(gc.thickness[i]);
      out.width.push(gc.width[i]);
      out.richardson.push(gc.richardson[i]);
      out.bedRichardson.push(gc.bedRichardson[i]);
      continue;
    }
    // Past the hand-over neither entrainment law is used.
    out.richardson.push(Infinity);
    out.bedRichardson.push(Infinity);
    const x = r - gc.distance[k];
    out.dilution.push(gc.dilution[k] * brooksDilutionInField(field, x));
    out.thickness.push(gc.thickness[k]); // Brooks (1960) assumes no vertical mixing: thickness stays at its start value
    out.width.push(brooksWidthInField(field, x));
  }
  return out;
}

/**
 * Index of the first point of a layer series where passive diffusion takes over (see passiveFromLayer):
 * the layer drifts with the current and 2·√(g′h) ≤ 12·α_ε·b^{1/3}; −1 if none.
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
export function truncateSeries(f: FarSeries, xEnd: number): FarSeries {
  const out: FarSeries = {
    distance: [],
    dilution: [],
    thickness: [],
    width: [],
    switchDistance: f.switchDistance,
    handOverDistance: f.handOverDistance,
    richardson: [],
    bedRichardson: [],
  };
  for (let i = 0; i < f.distance.length; i++) {
    if (f.distance[i] > xEnd) {
      if (i > 0) {
        out.distance.push(xEnd);
        out.dilution.push(interpolateLinear(f.distance, f.dilution, xEnd));
        out.thickness.push(interpolateLinear(f.distance, f.thickness, xEnd));
        out.width.push(interpolateLinear(f.distance, f.width, xEnd));
        out.richardson.push(f.richardson[i]);
        out.bedRichardson.push(f.bedRichardson[i]);
      }
      break;
    }
    out.distance.push(f.distance[i]);
    out.dilution.push(f.dilution[i]);
    out.thickness.push(f.thickness[i]);
    out.width.push(f.width[i]);
    out.richardson.push(f.richardson[i]);
    out.bedRichardson.push(f.bedRichardson[i]);
  }
  return out;
}

/** The displayed dilution series: 40 points along the jet, then the far-field series. */
export function seriesFromChain(chain: Chain, far: FarSeries, method: FarMethod, excess: number): SeriesResult {
  const distance: number[] = [];
  const dilution: number[] = [];
  const layerThickness: (number | null)[] = [];
  const stage: SeriesStage[] = [];
  const n = 40;
  for (let i = 0; i < n; i++) {
    const r = (chain.end.distance * i) / n;
    distance.push(r);
    dilution.push(dilutionFromProfile(chain.profile, r));
    layerThickness.push(null);
    stage.push("jet");
  }
  const label: SeriesStage = method === "passive-diffusion" ? "passive-diffusion" : "spreading-layer";
  for (let i = 0; i < far.distance.length; i++) {
    distance.push(far.distance[i]);
    dilution.push(far.dilution[i]);
    layerThickness.push(Number.isFinite(far.thickness[i]) ? far.thickness[i] : null);
    stage.push(i === 0 ? "spreading-layer" : label);
  }
  return { distance, dilution, salinityIncrease: dilution.map((s) => excess / s), layerThickness, stage };
}
