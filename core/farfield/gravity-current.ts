/**
 * Dense bottom layer spreading beyond the near field, with entrainment E(Ri) (see
 * turner-1986-entrainment.ts). Conservation of volume and buoyancy in a uniform ambient:
 *   dQ/dr = E(Ri)·V·w,   g′(r)·Q(r) = g′₀·Q₀   (so dilution S = Q/Q₀ and g′ = g′₀/S)
 * with layer velocity V, thickness h and width w (Q = V·h·w).
 *
 * Two geometries (closures are engineering judgement unless cited):
 * - "radial" (no current): the layer spreads over a widening perimeter w(r) = w₀ + 2π(r − r₀). On a slope
 *   the layer Richardson number is the normal-flow equilibrium of the Ellison & Turner (1959) layer
 *   momentum balance, g′h·sinβ = (C_D + E)·V², i.e. Ri = (C_D + E(Ri))/tanβ (balance from memory); on a
 *   flat bed, or where that Ri exceeds 1, the thickness is taken at critical flow Ri = 1 (the thinnest
 *   subcritical layer). Above Ri = 0.8 the layer entrains nothing (Ellison & Turner 1959, confirmed).
 *   Bed drag C_D = 0.0025 (common practice, no source).
 * - "advected" (current u): the layer first spreads radially as above; once its own velocity falls to the
 *   current speed it moves with the current, V = u, h = Q/(u·w), Ri = g′h·cosβ/u², starting from the
 *   cross-current width of the radial layer (perimeter/π plus the diffuser's cross-current length, or
 *   wider where needed to keep the layer's thickness continuous at the switch), and widens sideways as a gravity current, dw/dx = 2·√(g′h)/u (front Froude number 1, judgement).
 */
import { entrainmentFromRichardson, TURNER_1986_SOURCE } from "./turner-1986-entrainment";

export const DEFAULT_BED_DRAG = 0.0025; // common practice, no source
export const SPREADING_LAYER_SOURCE =
  `Dense spreading layer with entrainment law ${TURNER_1986_SOURCE}; geometry closures are engineering judgement`;

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
  /** Bed slope tanβ along the spreading direction, downslope positive. */
  readonly bedSlope: number;
  readonly dragCoefficient?: number;
  /** Number of integration steps (default 400). */
  readonly steps?: number;
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
  readonly entrainment: number[];
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

interface LayerState {
  h: number;
  v: number;
  ri: number;
  e: number;
}

// Module-scope scratch for the integration (the function is not re-entrant across threads' shared memory,
// and JavaScript runs it to completion, so one set serves every call).
const scratchState: LayerState = { h: 0, v: 0, ri: 0, e: 0 };
const scratchK = [new Float64Array(2), new Float64Array(2), new Float64Array(2), new Float64Array(2)];

/** Integrates the spreading layer from `startDistance` to `endDistance`; never throws. */
export function spreadingLayerFromNearFieldEnd(input: SpreadingLayerInput): SpreadingLayerSeries {
  const drag = input.dragCoefficient ?? DEFAULT_BED_DRAG;
  const steps = Math.max(1, Math.round(input.steps ?? 400));
  const u = Math.max(0, input.currentSpeed);
  const cosb = 1 / Math.sqrt(1 + input.bedSlope * input.bedSlope);
  const q0 = input.dischargeFlow;
  const g0 = Math.max(input.reducedGravity, 0);
  const riSlope = equilibriumRichardsonFromSlope(input.bedSlope, drag);
  const riRadial = Math.min(riSlope, 1);
  const offset = input.perimeterOffset ?? 0;
  let advected = false;

  // Layer state for flux q and width w, written into module-scope scratch (no allocation per call).
  const state = (q: number, w: number): LayerState => {
    const gp = (g0 * q0) / q; // buoyancy flux conserved
    const st = scratchState;
    if (advected) {
      st.h = q / (u * w);
      st.v = u;
      st.ri = gp > 0 ? (gp * st.h * cosb) / (u * u) : 0;
      st.e = entrainmentFromRichardson(st.ri);
      return st;
    }
    // A neutral layer (g′ = 0) has no gravity-driven thickness; keep a finite, non-entraining state.
    if (!(gp > 0)) {
      st.h = Infinity;
      st.v = 0;
      st.ri = Infinity;
      st.e = 0;
      return st;
    }
    st.h = Math.cbrt((riRadial * q * q) / (gp * w * w * cosb));
    st.v = q / (st.h * w);
    st.ri = riSlope;
    st.e = eSlope;
    return st;
  };
  const eSlope = entrainmentFromRichardson(riSlope);
  let wAdv = 0;
  const width = (r: number, wa: number) =>
    advected ? wa : input.initialWidth + offset + 2 * Math.PI * (r - input.startDistance);
  // Derivatives of (Q, advected width) with respect to distance, into `k[0]`, `k[1]`.
  const deriv = (r: number, q: number, wa: number, k: Float64Array): void => {
    const w = width(r, wa);
    const st = state(q, w);
    k[0] = st.e * st.v * w;
    k[1] = advected ? (2 * Math.sqrt(Math.max(0, ((g0 * q0) / q) * st.h))) / u : 0;
  };

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
  };
  const maybeSwitch = (r: number, q: number) => {
    if (advected || !(u > 0)) return;
    const w = width(r, 0);
    const st = state(q, w);
    if (st.v <= u) {
      // The radial layer has slowed to the current: it is carried off with its cross-current width, but not
      // narrower than keeps its thickness continuous (Q = u·h·w), so the layer does not jump in thickness
      // where it starts to drift (judgement: a sudden pile-up of several metres is not observed in the
      // thin dense layers this model is for).
      const hSwitch = st.h;
      advected = true;
      out.switchDistance = r;
      const crossWidth = (w - offset) / Math.PI + (input.crossCurrentLength ?? 0);
      wAdv = Number.isFinite(hSwitch) && hSwitch > 0 ? Math.max(crossWidth, q / (u * hSwitch)) : crossWidth;
    }
  };
  const push = (r: number, q: number, wa: number) => {
    const w = width(r, wa);
    const st = state(q, w);
    out.distance.push(r);
    out.dilution.push(q / q0);
    out.thickness.push(st.h);
    out.width.push(w);
    out.flux.push(q);
    out.velocity.push(st.v);
    out.richardson.push(st.ri);
    out.entrainment.push(st.e);
  };
  let r = input.startDistance;
  let q = q0 * input.startDilution;
  maybeSwitch(r, q);
  push(r, q, wAdv);
  const span = Math.max(0, input.endDistance - input.startDistance);
  if (span === 0 || !(q0 > 0)) return out;
  const dr = span / steps;
  const k1 = scratchK[0];
  const k2 = scratchK[1];
  const k3 = scratchK[2];
  const k4 = scratchK[3];
  for (let i = 0; i < steps; i++) {
    const wa = wAdv;
    // Classical fourth-order Runge–Kutta on (Q, w).
    deriv(r, q, wa, k1);
    deriv(r + dr / 2, q + (dr / 2) * k1[0], wa + (dr / 2) * k1[1], k2);
    deriv(r + dr / 2, q + (dr / 2) * k2[0], wa + (dr / 2) * k2[1], k3);
    deriv(r + dr, q + dr * k3[0], wa + dr * k3[1], k4);
    q += (dr / 6) * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
    wAdv = wa + (dr / 6) * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
    r = input.startDistance + (i + 1) * dr;
    maybeSwitch(r, q);
    push(r, q, wAdv);
  }
  return out;
}
