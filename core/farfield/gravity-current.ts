/**
 * Dense bottom layer spreading beyond the near field. Conservation of volume and buoyancy in a uniform
 * ambient:
 *   dQ/dr = w_e·w,   g′(r)·Q(r) = g′₀·Q₀   (so dilution S = Q/Q₀ and g′ = g′₀/S)
 * with layer thickness h, width w (Q = V·h·w for a layer moving at V) and entrainment velocity w_e across
 * its top. Q is the layer's VOLUME flux: the near field hands over its flux-averaged dilution.
 *
 * Entrainment w_e has two parts, each with its source:
 * - shear across the layer's top, w_e = E(Ri)·V_own, where V_own is the layer's OWN gravity-driven speed
 *   relative to the water above it and Ri = g′h·cosβ/V_own² (Ellison & Turner 1959; E(Ri) of Turner 1986,
 *   see turner-1986-entrainment.ts). A layer carried by the current moves with the water above it, so the
 *   current itself is not a velocity difference across the top and does not enter Ri.
 * - turbulence generated at the bed by the ambient current, w_e = u*·K/Ri* with u* = √C_D·u and
 *   Ri* = g′h·cosβ/u*² (Kato & Phillips 1969, see kato-phillips-1969-entrainment.ts). It vanishes as the
 *   current goes to zero, so the result is continuous there.
 *
 * The layer's own speed and thickness (closures are engineering judgement unless cited): on a slope the layer
 * Richardson number is the normal-flow equilibrium of the Ellison & Turner (1959) layer momentum balance,
 * g′h·sinβ = (C_D + E)·V², i.e. Ri = (C_D + E(Ri))/tanβ (balance from memory); on a flat bed, or where
 * that Ri exceeds 1, the thickness is taken at critical flow Ri = 1 (the thinnest subcritical layer). Above
 * Ri = 0.8 shear entrains nothing (Ellison & Turner 1959). Bed drag C_D = 0.0025 (common practice, no
 * source). The slope used is the full bed slope: gravity drives the layer downslope relative to the water
 * above whatever the current's direction.
 *
 * Two phases:
 * - "radial": the layer spreads over a widening perimeter w(r) = w₀ + 2π(r − r₀) at its own speed
 *   V = Q/(h·w).
 * - "drifting" (a current u > 0): once the radial layer's own speed has fallen to the current speed it is
 *   carried off with the current: h = Q/(u·w), its own speed V_own = √(g′h·cosβ/Ri) (same Ri as above, so
 *   speed and thickness are continuous at the switch), starting from the cross-current
 *   width of the radial layer (perimeter/π plus the diffuser's cross-current length, or wider where needed
 *   to keep the layer's thickness continuous at the switch), widening sideways as a gravity current,
 *   dw/dx = 2·√(g′h)/u (front Froude number 1, judgement). Because the switch needs the layer's own speed to
 *   fall to u, a vanishing current never switches within reach and the result tends to the stagnant one.
 */
import type { ResultWarning } from "../warnings";
import {
  entrainmentFromRichardson,
  entrainmentFromRichardsonValidityIssues,
  TURNER_1986_SOURCE,
} from "./turner-1986-entrainment";
import {
  bedEntrainmentFromRichardson,
  bedEntrainmentFromRichardsonValidityIssues,
  KATO_PHILLIPS_1969_SOURCE,
} from "./kato-phillips-1969-entrainment";

export const DEFAULT_BED_DRAG = 0.0025; // common practice, no source
export const SPREADING_LAYER_SOURCE =
  `Dense spreading layer: shear entrainment from the layer's own speed: ${TURNER_1986_SOURCE}; ` +
  `bed-stirred entrainment in a current: ${KATO_PHILLIPS_1969_SOURCE}; geometry closures are engineering judgement`;

export interface SpreadingLayerInput {
  /** Plan distance from the diffuser where the layer starts (end of the near field), m. */
  readonly startDistance: number;
  /** Plan distance to integrate to, m. */
  readonly endDistance: number;
  /** Dilution at the start (near-field dilution). */
  readonly startDilution: number;
  /** Total discharge flow Q₀, m³/s. */
  readonly dischargeFlow: number;
  /** Reduced gravity of the undiluted discharge against the bottom water, m/s² (positive = dense). */
  readonly reducedGravity: number;
  /** Perimeter of the radial layer at the start (without `perimeterOffset`), m. */
  readonly initialWidth: number;
  /** Extra straight length added to the radial perimeter (e.g. 2 × diffuser length), m. */
  readonly perimeterOffset?: number;
  /** Diffuser length seen across the current, added to the advected width at the switch, m. */
  readonly crossCurrentLength?: number;
  /** Current speed, m/s (0 = stagnant, radial spreading). */
  readonly currentSpeed: number;
  /** Bed slope tanβ (magnitude: the layer's own flow runs downslope). */
  readonly bedSlope: number;
  readonly dragCoefficient?: number;
  /** Number of integration steps (default 400). */
  readonly steps?: number;
  /**
   * Stop after the first step that reaches this distance, m (default: integrate to `endDistance`). The steps
   * are those of the whole range, so the points computed are exactly the leading points of the full series.
   */
  readonly stopDistance?: number;
}

export interface SpreadingLayerSeries {
  readonly geometry: "radial" | "advected";
  /** Distance where the radial layer slowed to the current speed and became advected (null if never). */
  readonly switchDistance: number | null;
  readonly distance: number[];
  readonly dilution: number[];
  readonly thickness: number[];
  /** Perimeter while radial, width once advected, m: either way ∫ width dr is the seabed area covered. */
  readonly width: number[];
  /** Layer volume flux Q, m³/s. */
  readonly flux: number[];
  readonly velocity: number[];
  readonly richardson: number[];
  /** Shear entrainment coefficient E(Ri) of the layer's own flow. */
  readonly entrainment: number[];
  /** Total entrainment velocity across the layer's top (shear + bed-stirred), m/s. */
  readonly entrainmentVelocity: number[];
  /** Stirring Richardson number Ri* the bed-stirred entrainment was evaluated at (Infinity where none). */
  readonly bedRichardson: number[];
}

/** Normal-flow Richardson number of a layer on a slope: root of Ri = (C_D + E(Ri))/tanβ (Infinity if flat). */
export function equilibriumRichardsonFromSlope(slope: number, drag = DEFAULT_BED_DRAG): number {
  if (!(slope > 0)) return Infinity;
  const f = (ri: number) => ri - (drag + entrainmentFromRichardson(ri)) / slope;
  let lo = 0;
  let hi = (drag + 0.08) / slope + 1; // f(hi) > 0 since E ≤ 0.08
  if (f(lo) >= 0) return 0;
  for (let i = 0; i < 100; i++) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) > 0) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

/** Constants of one integration, read by {@link layerStateInto}. */
interface LayerParams {
  /** g′₀·Q₀, the conserved buoyancy flux, m⁴/s³. */
  buoyancyFlux: number;
  /** Current speed u, m/s. */
  u: number;
  /** Friction velocity of the current over the bed, √C_D·u, m/s, and its square. */
  ustar: number;
  ustar2: number;
  cosb: number;
  /** Richardson number of the layer's own flow (slope equilibrium, at most 1) and its E(Ri). */
  riOwn: number;
  eOwn: number;
}

interface LayerState {
  h: number;
  /** Speed the layer travels over the bed along the integration coordinate, m/s. */
  v: number;
  /** The layer's own speed relative to the water above it, m/s. */
  vOwn: number;
  ri: number;
  e: number;
  /** Total entrainment velocity across the top (shear + bed-stirred), m/s. */
  we: number;
  /** Ri* of the bed-stirred entrainment (Infinity where there is none). */
  riBed: number;
}

// Module-scope scratch for the integration (the function is not re-entrant across threads' shared memory,
// and JavaScript runs it to completion, so one set serves every call).
const scratchState: LayerState = { h: 0, v: 0, vOwn: 0, ri: 0, e: 0, we: 0, riBed: Infinity };
const scratchParams: LayerParams = {
  buoyancyFlux: 0,
  u: 0,
  ustar: 0,
  ustar2: 0,
  cosb: 1,
  riOwn: 1,
  eOwn: 0,
};

/** Layer state (thickness h, speeds, Richardson number, entrainment) at flux q and width w, into `st`. */
function layerStateInto(st: LayerState, p: LayerParams, advected: boolean, q: number, w: number): void {
  const gp = p.buoyancyFlux / q; // buoyancy flux conserved
  // A neutral layer (g′ = 0) has no gravity-driven thickness; keep a finite, non-entraining state.
  if (!(gp > 0)) {
    st.h = advected ? q / (p.u * w) : Infinity;
    st.v = advected ? p.u : 0;
    st.vOwn = 0;
    st.ri = Infinity;
    st.e = 0;
    st.we = 0;
    st.riBed = Infinity;
    return;
  }
  if (advected) {
    st.h = q / (p.u * w);
    st.v = p.u;
    st.vOwn = Math.sqrt((gp * st.h * p.cosb) / p.riOwn);
  } else {
    st.h = Math.cbrt((p.riOwn * q * q) / (gp * w * w * p.cosb));
    st.v = q / (st.h * w);
    st.vOwn = st.v;
  }
  st.ri = p.riOwn;
  st.e = p.eOwn;
  // Bed-stirred part: zero without a current (u* = 0), so the stagnant limit is continuous.
  st.riBed = p.ustar > 0 ? (gp * st.h * p.cosb) / p.ustar2 : Infinity;
  const bed = p.ustar > 0 ? p.ustar * bedEntrainmentFromRichardson(st.riBed) : 0;
  st.we = st.e * st.vOwn + bed;
}

/** Integrates the spreading layer from `startDistance` to `endDistance`; never throws. */
export function spreadingLayerFromNearFieldEnd(input: SpreadingLayerInput): SpreadingLayerSeries {
  const drag = input.dragCoefficient ?? DEFAULT_BED_DRAG;
  const steps = Math.max(1, Math.round(input.steps ?? 400));
  const u = Math.max(0, input.currentSpeed);
  const q0 = input.dischargeFlow;
  const g0 = Math.max(input.reducedGravity, 0);
  const slope = Math.abs(input.bedSlope);
  const riSlope = equilibriumRichardsonFromSlope(slope, drag);
  const p = scratchParams;
  p.buoyancyFlux = g0 * q0;
  p.u = u;
  p.ustar = Math.sqrt(drag) * u;
  p.ustar2 = p.ustar * p.ustar;
  p.cosb = 1 / Math.sqrt(1 + slope * slope);
  p.riOwn = Math.min(riSlope, 1);
  p.eOwn = entrainmentFromRichardson(p.riOwn);
  const offset = input.perimeterOffset ?? 0;
  const r0 = input.startDistance;
  // The radial perimeter at r is w0 + 2π(r − r0); the advected width is integrated instead.
  const w0 = input.initialWidth + offset;
  const st = scratchState;
  let advected = false;
  let wAdv = 0;

  const out = {
    geometry: (u > 0 ? "advected" : "radial") as "radial" | "advected",
    switchDistance: null as number | null,
    distance: [] as number[],
    dilution: [] as number[],
    thickness: [] as number[],
    width: [] as number[],
    flux: [] as number[],
    velocity: [] as number[],
    richardson: [] as number[],
    entrainment: [] as number[],
    entrainmentVelocity: [] as number[],
    bedRichardson: [] as number[],
  };
  // Records the layer at (r, q), first switching it to advected if the radial layer has slowed to the
  // current. Returns the width there; `st` is left holding the recorded state.
  const record = (r: number, q: number): number => {
    let w = advected ? wAdv : w0 + 2 * Math.PI * (r - r0);
    layerStateInto(st, p, advected, q, w);
    if (!advected && u > 0 && st.v <= u) {
      // The radial layer has slowed to the current: it is carried off with its cross-current width, but not
      // narrower than keeps its thickness continuous (Q = u·h·w), so the layer does not jump in thickness
      // where it starts to drift (judgement: a sudden pile-up of several metres is not observed in the
      // thin dense layers this model is for).
      const hSwitch = st.h;
      advected = true;
      out.switchDistance = r;
      const crossWidth = (w - offset) / Math.PI + (input.crossCurrentLength ?? 0);
      wAdv = Number.isFinite(hSwitch) && hSwitch > 0 ? Math.max(crossWidth, q / (u * hSwitch)) : crossWidth;
      w = wAdv;
      layerStateInto(st, p, advected, q, w);
    }
    out.distance.push(r);
    out.dilution.push(q / q0);
    out.thickness.push(st.h);
    out.width.push(w);
    out.flux.push(q);
    out.velocity.push(st.v);
    out.richardson.push(st.ri);
    out.entrainment.push(st.e);
    out.entrainmentVelocity.push(st.we);
    out.bedRichardson.push(st.riBed);
    return w;
  };
  let r = r0;
  let q = q0 * input.startDilution;
  let w = record(r, q);
  const span = Math.max(0, input.endDistance - input.startDistance);
  if (span === 0 || !(q0 > 0)) return out;
  const dr = span / steps;
  const half = dr / 2;
  // dQ/dr = w_e·w (entrainment over the bed area w·dr); dw/dr = 2·√(g′h)/u once advected (0 while radial);
  // both read the state last put in `st`.
  const dq = (w: number) => st.we * w;
  const dw = (q: number) => (advected ? (2 * Math.sqrt(Math.max(0, (p.buoyancyFlux / q) * st.h))) / u : 0);
  const stop = input.stopDistance ?? Infinity;
  for (let i = 0; i < steps && !(r >= stop); i++) {
    const wa = wAdv;
    // Classical fourth-order Runge–Kutta on (Q, w); the first stage is the point just recorded.
    const k1q = dq(w);
    const k1w = dw(q);
    const r2 = r + half;
    const q2 = q + half * k1q;
    const w2 = advected ? wa + half * k1w : w0 + 2 * Math.PI * (r2 - r0);
    layerStateInto(st, p, advected, q2, w2);
    const k2q = dq(w2);
    const k2w = dw(q2);
    const q3 = q + half * k2q;
    const w3 = advected ? wa + half * k2w : w2;
    layerStateInto(st, p, advected, q3, w3);
    const k3q = dq(w3);
    const k3w = dw(q3);
    const r4 = r + dr;
    const q4 = q + dr * k3q;
    const w4 = advected ? wa + dr * k3w : w0 + 2 * Math.PI * (r4 - r0);
    layerStateInto(st, p, advected, q4, w4);
    const k4q = dq(w4);
    const k4w = dw(q4);
    q += (dr / 6) * (k1q + 2 * k2q + 2 * k3q + k4q);
    wAdv = wa + (dr / 6) * (k1w + 2 * k2w + 2 * k3w + k4w);
    r = r0 + (i + 1) * dr;
    w = record(r, q);
  }
  return out;
}

/** The part of a spreading-layer series a result reads: Ri handed to E(Ri) and Ri* handed to the bed law. */
export interface SpreadingLayerRichardson {
  readonly distance: readonly number[];
  readonly richardson: readonly number[];
  readonly bedRichardson: readonly number[];
}

/**
 * Range checks of the two entrainment laws over the points of a layer series up to and including the
 * first at or past `edgeDistance` (the points the edge value is read from, the same in edge-only and
 * full runs): one warning per code, at the value farthest outside the law's range. Never throws.
 */
export function spreadingLayerValidityIssues(series: SpreadingLayerRichardson, edgeDistance: number): ResultWarning[] {
  let ri = Infinity;
  let riBed = Infinity;
  for (let i = 0; i < series.distance.length; i++) {
    ri = Math.min(ri, series.richardson[i]);
    riBed = Math.min(riBed, series.bedRichardson[i]);
    if (series.distance[i] >= edgeDistance) break;
  }
  return [...entrainmentFromRichardsonValidityIssues(ri), ...bedEntrainmentFromRichardsonValidityIssues(riBed)];
}
