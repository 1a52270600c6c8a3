/**
 * Conservation equations of a round buoyant jet in 3-D, in flux form along the centreline arc
 * length s, with the Lee & Cheung (1990) entrainment closure (core/correlations/
 * lee-cheung-1990-entrainment.ts). Top-hat profiles, Boussinesq, steady, ambient current uniform
 * with depth, ambient density and salinity varying with depth.
 *
 * Frame: origin at the port centre, x east, y north, z up (m above the port). The ambient current
 * flows toward the horizontal unit vector (currentX, currentY) at currentSpeed.
 *
 * State y (Float64Array, DIM = 9):
 *   0–2  x, y, z            centreline position, m
 *   3    Q = π b² V         volume flux, m³/s (b top-hat radius, V absolute top-hat speed)
 *   4–6  M⃗ = Q·V⃗           kinematic momentum flux vector, m⁴/s²; the axis is M⃗/|M⃗|
 *   7    B = Q·g(ρ − ρa0)/ρa0   density-excess flux relative to the ambient at port level, m⁴/s³
 *                          (positive for a dense jet; conserved in a uniform ambient)
 *   8    C = Q·(S − Sa0)    salinity-excess flux relative to the port-level ambient, m³/s·g/kg
 *
 * Equations (E = dQ/ds, the entrainment per unit length; ε(z) = g(ρa(z) − ρa0)/ρa0):
 *   dx⃗/ds = t̂ = M⃗/|M⃗|
 *   dQ/ds = E
 *   dM⃗/ds = E·u_a·â − π b²·g′(z)·ẑ,   g′(z) = B/Q − ε(z) (local reduced gravity, dense positive)
 *   dB/ds = ε(z)·E
 *   dC/ds = (Sa(z) − Sa0)·E
 * The momentum equation is the Eulerian form of the Lagrangian element balance of Lee & Cheung
 * (1990): entrained fluid brings the ambient momentum u_a·â; the buoyancy force per unit length
 * is π b² g′ (top-hat). Standard for integral jet models (e.g. Fischer et al. 1979, ch. 9).
 */
import {
  entrainmentLeeCheung1990Alpha,
  entrainmentLeeCheung1990Rate,
} from "../correlations/lee-cheung-1990-entrainment";

export const IX = 0;
export const IY = 1;
export const IZ = 2;
export const IQ = 3;
export const IMX = 4;
export const IMY = 5;
export const IMZ = 6;
export const IB = 7;
export const IC = 8;
export const INTEGRAL_DIM = 9;

export interface IntegralParams {
  /** Depth of the port centre below the surface, m (= the surface's height above the port). */
  readonly portDepth: number;
  /** Height of the port centre above the seabed, m. */
  readonly portHeight: number;
  /** Ambient salinity at port level, g/kg (0 when the column has no salinity profile). */
  readonly portSalinity: number;
  /** Ambient profile depths below the surface, m, ascending. */
  readonly depths: Float64Array;
  /** ε = g(ρa − ρa0)/ρa0 at each profile depth, m/s² (ρa0 = ambient density at the port). */
  readonly epsilon: Float64Array;
  /** Sa − Sa0 at each profile depth, g/kg. */
  readonly salinityExcess: Float64Array;
  /** False when the profile is uniform: skips the interpolation. */
  readonly stratified: boolean;
  readonly currentSpeed: number; // m/s, ≥ 0
  readonly currentX: number; // unit vector east component
  readonly currentY: number; // unit vector north component
}

/** Linear interpolation of `values` at depth d (clamped to the profile ends). */
export function profileAt(depths: Float64Array, values: Float64Array, d: number): number {
  const n = depths.length;
  if (d <= depths[0]) return values[0];
  if (d >= depths[n - 1]) return values[n - 1];
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (depths[mid] <= d) lo = mid;
    else hi = mid;
  }
  const span = depths[hi] - depths[lo];
  // Repeated depths (a step in the profile): take the deeper value rather than divide by zero.
  if (!(span > 0)) return values[hi];
  const w = (d - depths[lo]) / span;
  return values[lo] + w * (values[hi] - values[lo]);
}

/** Smallest |M⃗| used for the axis direction: at a fountain top |M⃗| → 0 and the axis is undefined. */
const TINY_MOMENTUM = 1e-300;

/**
 * Right-hand side of the jet equations: writes dy/ds into `out`. Pure: depends only on its
 * arguments, allocates nothing.
 */
export function integralJetRhs(_s: number, y: Float64Array, out: Float64Array, p: IntegralParams): void {
  const q = y[IQ];
  const mx = y[IMX];
  const my = y[IMY];
  const mz = y[IMZ];
  let m = Math.sqrt(mx * mx + my * my + mz * mz);
  if (!(m > TINY_MOMENTUM)) m = TINY_MOMENTUM;
  const tx = mx / m;
  const ty = my / m;
  const tz = mz / m;
  const speed = m / q;
  const radius = q / Math.sqrt(Math.PI * m);
  const area = q / speed; // π b²
  let eps = 0;
  let salEx = 0;
  if (p.stratified) {
    const depth = p.portDepth - y[IZ];
    eps = profileAt(p.depths, p.epsilon, depth);
    salEx = profileAt(p.depths, p.salinityExcess, depth);
  }
  const gDense = y[IB] / q - eps;
  const gAbs = gDense >= 0 ? gDense : -gDense;
  // Cosine between the axis and the buoyancy force: downward for a dense jet, upward for a light one.
  const align = gDense > 0 ? -tz : gDense < 0 ? tz : 0;
  const ua = p.currentSpeed;
  const cosAxisCurrent = p.currentX * tx + p.currentY * ty;
  const e = entrainmentLeeCheung1990Rate(speed, radius, ua, cosAxisCurrent, align, gAbs);
  out[IX] = tx;
  out[IY] = ty;
  out[IZ] = tz;
  out[IQ] = e;
  out[IMX] = e * ua * p.currentX;
  out[IMY] = e * ua * p.currentY;
  out[IMZ] = -area * gDense;
  out[IB] = eps * e;
  out[IC] = salEx * e;
}

/** Top-hat radius b = Q/√(π|M⃗|), m. */
export function radiusFromState(y: Float64Array): number {
  const m = Math.sqrt(y[IMX] * y[IMX] + y[IMY] * y[IMY] + y[IMZ] * y[IMZ]);
  return y[IQ] / Math.sqrt(Math.PI * (m > TINY_MOMENTUM ? m : TINY_MOMENTUM));
}

/**
 * Vertical half-extent of the jet cross-section: a disc of radius b normal to the axis reaches
 * b·√(1 − t_z²) above and below the centreline.
 */
export function verticalHalfExtent(y: Float64Array): number {
  const m = Math.sqrt(y[IMX] * y[IMX] + y[IMY] * y[IMY] + y[IMZ] * y[IMZ]);
  const safe = m > TINY_MOMENTUM ? m : TINY_MOMENTUM;
  const tz = y[IMZ] / safe;
  const c2 = 1 - tz * tz;
  return (y[IQ] / Math.sqrt(Math.PI * safe)) * Math.sqrt(c2 > 0 ? c2 : 0);
}

/**
 * d/ds of the upper-edge elevation z + b·√(1 − t_z²), given the state and its derivative.
 * Used to locate the maximum rise of the upper edge as a root.
 */
export function upperEdgeSlope(y: Float64Array, dy: Float64Array): number {
  const mx = y[IMX];
  const my = y[IMY];
  const mz = y[IMZ];
  let m = Math.sqrt(mx * mx + my * my + mz * mz);
  if (!(m > TINY_MOMENTUM)) m = TINY_MOMENTUM;
  const q = y[IQ];
  const tz = mz / m;
  const b = q / Math.sqrt(Math.PI * m);
  const dm = (mx * dy[IMX] + my * dy[IMY] + mz * dy[IMZ]) / m;
  const db = b * (dy[IQ] / q - (0.5 * dm) / m);
  const dtz = (dy[IMZ] - tz * dm) / m;
  const c2 = 1 - tz * tz;
  const c = Math.sqrt(c2 > 0 ? c2 : 0);
  // At a vertical axis c = 0 and the √ has an infinite slope; the edge is then the centreline.
  const dc = c > 1e-9 ? (-tz * dtz) / c : 0;
  return dy[IZ] + db * c + b * dc;
}

/**
 * Shear minus forced entrainment (Lee & Cheung 1990 closure, as in `integralJetRhs`): the rate is the
 * larger of the two, so the RHS has a kink where this crosses zero. Used to restart the integration
 * there. Allocates nothing.
 */
export function entrainmentSwitch(y: Float64Array, p: IntegralParams): number {
  const q = y[IQ];
  const mx = y[IMX];
  const my = y[IMY];
  const mz = y[IMZ];
  let m = Math.sqrt(mx * mx + my * my + mz * mz);
  if (!(m > TINY_MOMENTUM)) m = TINY_MOMENTUM;
  const tz = mz / m;
  const speed = m / q;
  const radius = q / Math.sqrt(Math.PI * m);
  let eps = 0;
  if (p.stratified) eps = profileAt(p.depths, p.epsilon, p.portDepth - y[IZ]);
  const gDense = y[IB] / q - eps;
  const gAbs = gDense >= 0 ? gDense : -gDense;
  const align = gDense > 0 ? -tz : gDense < 0 ? tz : 0;
  const ua = p.currentSpeed;
  const cosAxisCurrent = (p.currentX * mx + p.currentY * my) / m;
  const us = ua * cosAxisCurrent;
  const deltaU = speed - us;
  const alpha = entrainmentLeeCheung1990Alpha(deltaU, us, align, gAbs, radius);
  const shear = deltaU > 0 ? 2 * Math.PI * radius * alpha * deltaU : 0;
  const sin2 = 1 - cosAxisCurrent * cosAxisCurrent;
  const forced = 2 * radius * ua * Math.sqrt(sin2 > 0 ? sin2 : 0);
  return shear - forced;
}
