/**
 * Dynamic viscosity of seawater and brine, Sharqawy, Lienhard & Zubair (2010), Desalination and Water
 * Treatment 16:354–380, eqs. (22)–(23) (pure-water part and the salinity correction, as reproduced in
 * that review). Coefficients FROM MEMORY, checked against the pure-water value 1.002 mPa·s at 20 °C
 * (a handbook value, common practice) in tests/core/correlations/sharqawy-2010-viscosity.test.ts.
 *
 * @param salinity S — salinity, g/kg
 * @param temperature t — temperature, °C
 * @returns μ — dynamic viscosity, Pa·s
 * Validity (as stated for the fit): 0–180 °C, 0–150 g/kg; accuracy about ±1.5 %.
 */
import { warning, type ResultWarning } from "../warnings";

export const SHARQAWY_2010_VISCOSITY_SOURCE =
  "Sharqawy, Lienhard & Zubair (2010), Desalination and Water Treatment 16:354–380, eqs. 22–23";

export function viscosityFromST(salinity: number, temperature: number): number {
  const t = temperature;
  const s = salinity / 1000; // kg/kg
  const muW = 4.2844e-5 + 1 / (0.157 * (t + 64.993) * (t + 64.993) - 91.296);
  const a = 1.541 + 1.998e-2 * t - 9.52e-5 * t * t;
  const b = 7.974 - 7.561e-2 * t + 4.724e-4 * t * t;
  return muW * (1 + a * s + b * s * s);
}

export function viscosityFromSTValidityIssues(salinity: number, temperature: number): ResultWarning[] {
  const out: ResultWarning[] = [];
  if (salinity < 0 || salinity > 150)
    out.push(
      warning(
        "viscosity-salinity-range",
        "info",
        `Viscosity correlation used at ${salinity.toFixed(1)} g/kg, outside its 0–150 g/kg fit.`,
        {
          parameter: "salinity",
          value: salinity,
          range: [0, 150],
          source: SHARQAWY_2010_VISCOSITY_SOURCE,
        },
      ),
    );
  if (temperature < 0 || temperature > 180)
    out.push(
      warning(
        "viscosity-temperature-range",
        "info",
        `Viscosity correlation used at ${temperature.toFixed(1)} °C, outside its 0–180 °C fit.`,
        {
          parameter: "temperature",
          value: temperature,
          range: [0, 180],
          source: SHARQAWY_2010_VISCOSITY_SOURCE,
        },
      ),
    );
  return out;
}
