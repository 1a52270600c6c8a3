/**
 * Pressure correction of seawater/brine density: Nayar, Sharqawy, Banchik & Lienhard (2016).
 *
 * ρ(S, t, P) = ρ(S, t, P0) · F_P, with
 *   F_P = exp[ (P − P0)·(c1 + c2·t + c3·t² + c4·t³ + c5·t⁴ + c6·t⁵ + S·(d1 + d2·t + d3·t²))
 *            + ½(P² − P0²)·(c7 + c8·t + c9·t³ + d4·S) ]
 * where P is absolute pressure in MPa, P0 = 0.101325 MPa (for t < 100 °C), S in g/kg, t in °C, fitted to the
 * isothermal compressibility data of Safarov et al. (2012). The atmospheric density ρ(S, t, P0) is
 * Sharqawy et al. (2010), Eq. (8) (./sharqawy-2010-density).
 *
 * Convention at this module's edge: sea pressure in dbar (0 at the surface), converted to absolute MPa.
 */
import { formatNumber } from "../units";
import { warning, type ResultWarning } from "../warnings";
import { densitySharqawy2010, densitySharqawy2010ValidityIssues } from "./sharqawy-2010-density";

export const NAYAR_2016_SOURCE =
  "Nayar, K.G., Sharqawy, M.H., Banchik, L.D., Lienhard V, J.H. (2016), Thermophysical properties of seawater: " +
  "a review and new correlations that include pressure dependence, Desalination 390:1–24 (density pressure " +
  "correction F_P)";

/**
 * c1…c9 and d1…d4 of F_P.
 * Provenance: as distributed in the authors' seawater property library accompanying Nayar et al. (2016)
 * (SeawaterLab v3.1.2, function SW_Density, which cites Nayar et al. 2016 for this term).
 * Equation number in the paper: from memory not reliable, not given.
 */
export const NAYAR_2016_PRESSURE_COEFFICIENTS = {
  c: [5.0792e-4, -3.4168e-6, 5.6931e-8, -3.7263e-10, 1.4465e-12, -1.7058e-15, -1.3389e-6, 4.8603e-9, -6.8039e-13],
  d: [-1.1077e-6, 5.5584e-9, -4.2539e-11, 8.3702e-9],
} as const;

/** Atmospheric pressure P0, MPa. */
export const ATMOSPHERIC_PRESSURE_MPA = 0.101325;
/** Upper pressure limit of the correlation, MPa absolute (library header: P_sat < P < 12 MPa). */
export const NAYAR_2016_MAX_PRESSURE_MPA = 12;
/**
 * Stated validity and accuracy (header of the authors' library): 0–56 g/kg ±0.14 %; 56–180 g/kg ±0.21 %
 * (extrapolation).
 */
export const NAYAR_2016_FITTED_SALINITY_MAX = 56;
/**
 * Range of the authors' property tables and library: 0–120 °C, 0–120 g/kg, 0–12 MPa
 * (as stated by the authors for their property tables accompanying Nayar et al. 2016).
 */
export const NAYAR_2016_SALINITY_RANGE: readonly [number, number] = [0, 120];
export const NAYAR_2016_TEMPERATURE_RANGE: readonly [number, number] = [0, 120];

/** Sea pressure in dbar → absolute pressure in MPa. */
export function absolutePressureMpaFromSeaPressure(pressureDbar: number): number {
  return ATMOSPHERIC_PRESSURE_MPA + pressureDbar * 0.01;
}

/**
 * Pressure factor F_P = ρ(S, t, P)/ρ(S, t, P0).
 * Source: Nayar, Sharqawy, Banchik & Lienhard (2016), density pressure correction.
 * @param salinity S, g/kg
 * @param temperature t, °C (ITS-90)
 * @param pressureDbar sea pressure, dbar (P = 0.101325 MPa + 0.01·p)
 * @returns F_P, dimensionless (1 at the surface)
 * Validity: t 0–100 °C here (P0 = 0.101325 MPa; above 100 °C the paper takes P0 as the saturation pressure,
 * which this implementation does not model), S 0–120 g/kg (fitted to 56 g/kg), P up to 12 MPa.
 * Accuracy: ±0.14 % for 0–56 g/kg, ±0.21 % for 56–180 g/kg (extrapolation), on the density.
 */
export function pressureFactorNayar2016(salinity: number, temperature: number, pressureDbar: number): number {
  const [c1, c2, c3, c4, c5, c6, c7, c8, c9] = NAYAR_2016_PRESSURE_COEFFICIENTS.c;
  const [d1, d2, d3, d4] = NAYAR_2016_PRESSURE_COEFFICIENTS.d;
  const t = temperature;
  const S = salinity;
  const P = absolutePressureMpaFromSeaPressure(pressureDbar);
  const P0 = ATMOSPHERIC_PRESSURE_MPA;
  const linear = c1 + t * (c2 + t * (c3 + t * (c4 + t * (c5 + t * c6)))) + S * (d1 + t * (d2 + t * d3));
  const quadratic = c7 + c8 * t + c9 * t * t * t + d4 * S;
  return Math.exp((P - P0) * linear + 0.5 * (P * P - P0 * P0) * quadratic);
}

/**
 * In-situ density of seawater or brine: Sharqawy et al. (2010) Eq. (8) × Nayar et al. (2016) F_P.
 * @param salinity S, g/kg
 * @param temperature t, °C (ITS-90)
 * @param pressureDbar sea pressure, dbar
 * @returns in-situ density, kg/m³
 * Validity: 0–120 g/kg, 0–100 °C, 0–1190 dbar (12 MPa absolute). Accuracy: ±0.14 % (≤ 56 g/kg),
 * ±0.21 % above.
 */
export function densitySharqawyNayar(salinity: number, temperature: number, pressureDbar: number): number {
  const atmospheric = densitySharqawy2010(salinity, temperature);
  return atmospheric * pressureFactorNayar2016(salinity, temperature, pressureDbar);
}

/**
 * Range checks for {@link densitySharqawyNayar} (both the atmospheric fit and the pressure factor).
 * Never throws.
 * @param salinity S, g/kg
 * @param temperature t, °C
 * @param pressureDbar sea pressure, dbar
 * @param what label of the water concerned
 */
export function densitySharqawyNayarValidityIssues(
  salinity: number,
  temperature: number,
  pressureDbar: number,
  what = "water",
): ResultWarning[] {
  const out = densitySharqawy2010ValidityIssues(salinity, temperature, what);
  const source =
    "Nayar, Sharqawy, Banchik & Lienhard (2016) and the authors' property library (0–120 g/kg, 0–120 °C, 0–12 MPa)";
  const maxSeaPressure = (NAYAR_2016_MAX_PRESSURE_MPA - ATMOSPHERIC_PRESSURE_MPA) * 100;
  if (Number.isFinite(salinity) && salinity > NAYAR_2016_SALINITY_RANGE[1] && salinity <= 160) {
    out.push(
      warning(
        "nayar-2016-salinity-out-of-range",
        "warning",
        `${what}: salinity ${formatNumber(salinity)} g/kg is above the 120 g/kg range of the Nayar (2016) seawater ` +
          "correlations; " +
          "the pressure correction is extrapolated.",
        {
          parameter: `${what}.salinity`,
          value: salinity,
          range: NAYAR_2016_SALINITY_RANGE,
          source,
          stage: "properties",
        },
      ),
    );
  } else if (
    Number.isFinite(salinity) &&
    salinity > NAYAR_2016_FITTED_SALINITY_MAX &&
    salinity <= 120 &&
    pressureDbar > 0
  ) {
    out.push(
      warning(
        "nayar-2016-pressure-extrapolated",
        "info",
        `${what}: salinity ${formatNumber(salinity)} g/kg is above the 56 g/kg of the compressibility data; ` +
          "the density's stated accuracy is ±0.21 % instead of ±0.14 %.",
        {
          parameter: `${what}.salinity`,
          value: salinity,
          range: [0, NAYAR_2016_FITTED_SALINITY_MAX],
          source,
          stage: "properties",
        },
      ),
    );
  }
  if (Number.isFinite(temperature) && temperature > 100 && temperature <= 180) {
    out.push(
      warning(
        "nayar-2016-temperature-above-boiling",
        "serious",
        `${what}: temperature ${formatNumber(temperature)} °C is above 100 °C, where the correlation refers to the ` +
          "saturation pressure, which is not modelled here.",
        {
          parameter: `${what}.temperature`,
          value: temperature,
          range: [0, 100],
          source,
          stage: "properties",
        },
      ),
    );
  }
  const pMpa = absolutePressureMpaFromSeaPressure(pressureDbar);
  if (!Number.isFinite(pressureDbar) || pressureDbar < 0 || pMpa > NAYAR_2016_MAX_PRESSURE_MPA) {
    out.push(
      warning(
        "nayar-2016-pressure-out-of-range",
        "warning",
        `${what}: sea pressure ${formatNumber(pressureDbar)} dbar is outside 0–${Math.round(maxSeaPressure)} dbar ` +
          "(12 MPa absolute).",
        {
          parameter: `${what}.pressure`,
          value: pressureDbar,
          range: [0, maxSeaPressure],
          source,
          stage: "properties",
        },
      ),
    );
  }
  return out;
}
