/**
 * Salinity (g/kg) from total dissolved solids as a mass concentration (mg/L).
 *
 * TDS in mg/L is grams of salt per m³ of solution, salinity is grams of salt per kg of solution, so
 * S = TDS/ρ(S, t, p) with ρ in kg/m³. The density depends on S, so the relation is solved by fixed-point
 * iteration (DERIVED from the definitions; it converges because dρ/dS·S/ρ ≈ 0.03 ≪ 1).
 * Assumes all dissolved solids are sea salt of reference composition (common practice, no source).
 */
import { warning, type ResultWarning } from "../warnings";
import { densitySharqawyNayar } from "./nayar-2016-pressure-correction";

/** Density function used for the conversion: salinity g/kg, temperature °C, sea pressure dbar → kg/m³. */
export type DensityFunction = (salinity: number, temperature: number, pressureDbar: number) => number;

/**
 * Salinity from TDS by iterating S = TDS/ρ(S).
 * @param tdsMgPerL total dissolved solids, mg/L (= g/m³)
 * @param temperature t, °C, at which the TDS was measured
 * @param pressure sea pressure, dbar, at which the TDS refers (0 for a laboratory sample)
 * @param density density function; default Sharqawy (2010) + Nayar (2016), valid 0–120 g/kg
 * @returns salinity S, g/kg
 * Accuracy: iteration converged to 1e-12 g/kg; overall accuracy is that of the density (±0.1–0.2 %).
 */
export function salinityFromTds(
  tdsMgPerL: number,
  temperature: number,
  pressure = 0,
  density: DensityFunction = densitySharqawyNayar,
): number {
  let s = tdsMgPerL / 1000; // first guess with ρ = 1000 kg/m³
  for (let iteration = 0; iteration < 50; iteration++) {
    const next = tdsMgPerL / density(s, temperature, pressure);
    if (Math.abs(next - s) < 1e-12) return next;
    s = next;
  }
  return s;
}

/**
 * TDS (mg/L) from salinity, the inverse of {@link salinityFromTds}: TDS = S·ρ(S, t, p).
 * @param salinity S, g/kg
 * @param temperature t, °C
 * @param pressure sea pressure, dbar
 * @param density density function (default Sharqawy 2010 + Nayar 2016)
 * @returns TDS, mg/L
 */
export function tdsFromSalinity(
  salinity: number,
  temperature: number,
  pressure = 0,
  density: DensityFunction = densitySharqawyNayar,
): number {
  return salinity * density(salinity, temperature, pressure);
}

/**
 * Range checks for {@link salinityFromTds}. Never throws.
 * @param tdsMgPerL TDS, mg/L
 */
export function salinityFromTdsValidityIssues(tdsMgPerL: number): ResultWarning[] {
  // 120 g/kg × ~1090 kg/m³ ≈ 131 000 mg/L: top of the density correlation's range.
  if (Number.isFinite(tdsMgPerL) && tdsMgPerL >= 0 && tdsMgPerL <= 131000) return [];
  return [
    warning(
      "tds-out-of-range",
      "warning",
      `TDS ${tdsMgPerL} mg/L is outside 0–131 000 mg/L (0–120 g/kg), ` + "the range of the density used to convert it.",
      {
        parameter: "tds",
        value: tdsMgPerL,
        range: [0, 131000],
        source: "Nayar et al. (2016) range 0–120 g/kg",
        stage: "properties",
      },
    ),
  ];
}
