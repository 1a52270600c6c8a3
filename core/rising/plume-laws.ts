/**
 * Published asymptotic laws of round jets, round plumes and line plumes in stagnant water, for
 * discharges lighter than the receiving water. All in SI; dilutions are centreline (minimum) values.
 *
 * Fluxes of a round source (DERIVED from the definitions): volume Q, kinematic momentum M = U·Q,
 * buoyancy B = |g′|·Q; jet-to-plume length l_M = M^(3/4)/B^(1/2).
 *
 * - Pure jet (z ≪ l_M): centreline concentration c_m = 5.64·Q/(M^(1/2)·z), so S = M^(1/2)·z/(5.64·Q)
 *   (= z/(5.0·d) for a round port) — Fischer, List, Koh, Imberger & Brooks (1979), Mixing in Inland and
 *   Coastal Waters, Academic Press, ch. 9, table 9.1 (from memory).
 * - Pure plume (z ≫ l_M): centreline buoyancy g′_m = 11·B^(2/3)·z^(−5/3), so S = B^(1/3)·z^(5/3)/(11·Q) —
 *   Fischer et al. (1979), table 9.1 (from memory); the z^(5/3) law is the similarity solution of Morton,
 *   Taylor & Turner (1956), Proc. R. Soc. Lond. A 234:1–23.
 * - Buoyant jet: the larger of the two asymptotes. A forced plume dilutes at least as fast as the pure
 *   jet with its momentum and as the pure plume with its buoyancy, so the larger asymptote is a lower
 *   bound near z ≈ l_M and tends to each law far from it (Wright, S.J. 1984, J. Hydraulic Engineering
 *   110, on the asymptotic regimes of buoyant jets in stratified crossflow; from memory, issue and pages
 *   not checked).
 * - Trap height in a linear stratification N² = −(g/ρ)·dρ/dz: the plume's maximum rise
 *   z_max = 3.8·(B/N³)^(1/4) — Morton, Taylor & Turner (1956), the classical dimensionless result; the
 *   coefficient 3.8 is the value for B the total buoyancy flux (the same law is often written
 *   5.0·(F/N³)^(1/4) with F = B/π; from memory). The plume's buoyancy vanishes (it spreads) at about
 *   three-quarters of the maximum height (Morton et al. 1956, from memory).
 * - Line plume (merged multiport): S = 0.27·b^(1/3)·z/q (core/multiport/line-plume.ts).
 */

import { STANDARD_GRAVITY } from "../constants";
import { interpolateLinear } from "../interpolate";

export const ROUND_JET_CONCENTRATION_COEFFICIENT = 5.64;
export const ROUND_PLUME_BUOYANCY_COEFFICIENT = 11;
export const TRAP_HEIGHT_COEFFICIENT = 3.8;
/** Height of vanishing buoyancy ÷ maximum height of a plume in linear stratification. */
export const SPREADING_HEIGHT_FRACTION = 0.75;
/** Gaussian 1/e tracer half-width of a round plume, b_g/z (Fischer et al. 1979, from memory). */
export const ROUND_PLUME_TRACER_SPREAD = 0.12;

export const ROUND_JET_SOURCE = "Round jet S = M^(1/2)·z/(5.64·Q): Fischer et al. (1979) ch. 9, table 9.1";
export const ROUND_PLUME_SOURCE =
  "Round plume S = B^(1/3)·z^(5/3)/(11·Q): Fischer et al. (1979) ch. 9, table 9.1; similarity solution of Morton, Taylor & Turner (1956)";
export const TRAP_HEIGHT_SOURCE =
  "Plume trap height in linear stratification z_max = 3.8·(B/N³)^(1/4), buoyancy vanishing at about 0.75·z_max: Morton, Taylor & Turner (1956)";
export const BUOYANT_JET_SOURCE =
  "Buoyant-jet asymptotic regimes (jet-like below l_M, plume-like above): Wright (1984)";

export interface RoundSourceFluxes {
  readonly q: number; // m³/s
  readonly m: number; // m⁴/s²
  readonly b: number; // m⁴/s³, |g′|·Q
  readonly lM: number; // m, jet-to-plume length (∞ for no buoyancy)
}

export function roundSourceFluxes(flow: number, velocity: number, reducedGravity: number): RoundSourceFluxes {
  const q = flow;
  const m = velocity * flow;
  const b = Math.abs(reducedGravity) * flow;
  return { q, m, b, lM: b > 0 ? Math.pow(m, 0.75) / Math.sqrt(b) : Infinity };
}

/** Centreline dilution of a pure round jet at distance z from its source (at least 1). */
export function roundJetDilution(f: RoundSourceFluxes, z: number): number {
  if (!(z > 0)) return 1;
  return Math.max(1, (Math.sqrt(f.m) * z) / (ROUND_JET_CONCENTRATION_COEFFICIENT * f.q));
}

/** Centreline dilution of a pure round plume at height z above its source (at least 1). */
export function roundPlumeDilution(f: RoundSourceFluxes, z: number): number {
  if (!(z > 0) || !(f.b > 0)) return 1;
  return Math.max(1, (Math.cbrt(f.b) * Math.pow(z, 5 / 3)) / (ROUND_PLUME_BUOYANCY_COEFFICIENT * f.q));
}

/** Centreline dilution of a round buoyant jet at height z: the larger asymptote (see above). */
export function buoyantJetDilution(f: RoundSourceFluxes, z: number): { dilution: number; regime: "jet" | "plume" } {
  const sj = roundJetDilution(f, z);
  const sp = roundPlumeDilution(f, z);
  return sp >= sj ? { dilution: sp, regime: "plume" } : { dilution: sj, regime: "jet" };
}

/** Maximum rise of a round plume in linear stratification, z_max = 3.8·(B/N³)^(1/4), m. */
export function trapHeightFromStratification(b: number, n2: number): number {
  if (!(n2 > 0) || !(b > 0)) return Infinity;
  return TRAP_HEIGHT_COEFFICIENT * Math.pow(b / Math.pow(n2, 1.5), 0.25);
}

/**
 * Bulk buoyancy frequency squared over the water between the port and the surface, s⁻²:
 * N² = g·(ρ_port − ρ_surface)/(ρ_port·H) from the column's densities (positive when stable).
 */
export function bulkBuoyancyFrequencySquared(
  column: { readonly depth: number; readonly depths: readonly number[]; readonly densities: readonly number[] },
  portHeight: number,
): number {
  const h = column.depth - portHeight;
  if (!(h > 0)) return 0;
  const rhoPort = interpolateLinear(column.depths, column.densities, h);
  const rhoTop = interpolateLinear(column.depths, column.densities, 0);
  return (STANDARD_GRAVITY * (rhoPort - rhoTop)) / (rhoPort * h);
}
