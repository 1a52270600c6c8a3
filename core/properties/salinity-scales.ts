/**
 * Practical Salinity (PSS-78, unitless) ↔ Absolute Salinity (g/kg) for seawater of reference composition.
 *
 * SA ≈ SR = uPS · SP with uPS = 35.16504/35 g/kg (TEOS-10 Manual, IOC, SCOR & IAPSO 2010, Eqn (2.4.1) —
 * equation number from memory; the factor is CONFIRMED against python3-gsw `SR_from_SP`). The Absolute
 * Salinity Anomaly δSA (composition differences, up to ~0.025 g/kg in the open ocean) is not modelled: the
 * app has no location, so it takes SA = SR.
 */
import { warning, type ResultWarning } from "../warnings";

/** uPS, g/kg: the reference-composition factor 35.16504/35. */
export const REFERENCE_COMPOSITION_FACTOR = 35.16504 / 35;

/**
 * Absolute Salinity from Practical Salinity, reference composition (SA = SR = uPS·SP).
 * @param sp Practical Salinity SP (PSS-78), unitless
 * @returns Absolute Salinity SA, g/kg
 * Validity: SP 2–42 is the range of PSS-78 (from memory); the linear factor itself holds for any SP.
 */
export function absoluteSalinityFromPractical(sp: number): number {
  return sp * REFERENCE_COMPOSITION_FACTOR;
}

/**
 * Practical Salinity from Absolute Salinity, reference composition (SP = SA/uPS).
 * @param sa Absolute Salinity SA, g/kg
 * @returns Practical Salinity SP, unitless
 */
export function practicalSalinityFromAbsolute(sa: number): number {
  return sa / REFERENCE_COMPOSITION_FACTOR;
}

/**
 * Range checks for {@link absoluteSalinityFromPractical}. Never throws.
 * @param sp Practical Salinity, unitless
 */
export function absoluteSalinityFromPracticalValidityIssues(sp: number): ResultWarning[] {
  if (Number.isFinite(sp) && sp >= 2 && sp <= 42) return [];
  return [
    warning(
      "practical-salinity-out-of-range",
      "info",
      `Practical Salinity ${sp} is outside 2–42, the range of PSS-78; brines are better given as g/kg.`,
      {
        parameter: "salinity",
        value: sp,
        range: [2, 42],
        source: "PSS-78 range (UNESCO 1981)", // range from memory
        stage: "properties",
      },
    ),
  ];
}
