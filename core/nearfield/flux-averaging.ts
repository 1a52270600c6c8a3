/**
 * Flux-averaged dilution from the centreline (minimum) dilution, one basis for both near-field methods.
 *
 * For Gaussian velocity and tracer profiles with tracer-to-velocity width ratio λ the flux-averaged
 * concentration is c̄ = ∫u·c dA / ∫u dA = c_c·λ²/(1 + λ²), so the flux-averaged dilution is
 * S_flux = S_c·(1 + λ²)/λ² (DERIVED). λ = 1.2 from the Gaussian jet and plume widths of Fischer, List, Koh,
 * Imberger & Brooks, *Mixing in Inland and Coastal Waters* (1979), ch. 9 (from memory): factor 1.694.
 * The integral model's top-hat dilution Q/Q₀ is its flux-averaged dilution and its centreline dilution is
 * Q/Q₀ divided by the same factor, so both methods hand the spreading layer the same quantity.
 *
 * @param centreline centreline (minimum) dilution, dimensionless (≥ 1)
 * @returns flux-averaged dilution, dimensionless, or null for null input
 * Validity: self-similar round jets and plumes; not the undiluted core of the first few diameters.
 */
import { CENTRELINE_PROFILE_FACTOR } from "./integral-setup";

/** Flux-averaged ÷ centreline dilution, (1 + λ²)/λ² with λ = 1.2 (DERIVED from Fischer et al. 1979). */
export const FLUX_AVERAGING_FACTOR = 1 / CENTRELINE_PROFILE_FACTOR;

export function fluxAveragedFromCentreline(centreline: number | null): number | null {
  return centreline === null ? null : centreline * FLUX_AVERAGING_FACTOR;
}
