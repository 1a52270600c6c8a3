/**
 * Density of seawater and brine at atmospheric pressure: Sharqawy, Lienhard & Zubair (2010), Eq. (8).
 *
 * Convention: salinity S in g/kg (reference-composition salinity, the same as Absolute Salinity for
 * standard seawater), temperature t in °C (ITS-90), density in kg/m³. The equation itself uses the mass
 * fraction s = S/1000 kg/kg.
 */
import { formatNumber } from "../units";
import { warning, type ResultWarning } from "../warnings";

export const SHARQAWY_2010_SOURCE =
  "Sharqawy, M.H., Lienhard V, J.H., Zubair, S.M. (2010), Thermophysical properties of seawater: a review of " +
  "existing correlations and data, Desalination and Water Treatment 16:354–380, Eq. (8)";

/**
 * Coefficients of Eq. (8), full precision as distributed in the authors' seawater property library
 * (SeawaterLab v3.1.2, Nayar et al. 2016, function SW_Density). The paper prints them rounded to four
 * significant figures (a1 = 9.999e2, a2 = 2.034e-2, a3 = −6.162e-3, a4 = 2.261e-5, a5 = −4.657e-8,
 * b1 = 8.020e2, b2 = −2.001, b3 = 1.677e-2, b4 = −3.060e-5, b5 = −1.613e-5); the rounded values change
 * ρ by at most about 0.03 kg/m³ over 0–40 °C.
 * Provenance: the full-precision set as distributed in the authors' library; the rounded set is the one
 * printed with the paper's Eq. (8).
 */
export const SHARQAWY_2010_DENSITY_COEFFICIENTS = {
  a: [9.9992293295e2, 2.0341179217e-2, -6.1624591598e-3, 2.2614664708e-5, -4.6570659168e-8],
  b: [8.0200240891e2, -2.0005183488, 1.6771024982e-2, -3.0600536746e-5, -1.6132224742e-5],
} as const;

/** Stated validity of Eq. (8): 0–180 °C, 0–160 g/kg (paper, Table 2; also stated in the header of the authors' library). */
export const SHARQAWY_2010_TEMPERATURE_RANGE: readonly [number, number] = [0, 180];
export const SHARQAWY_2010_SALINITY_RANGE: readonly [number, number] = [0, 160];
/** Stated accuracy of Eq. (8): ±0.1 % (paper). */
export const SHARQAWY_2010_RELATIVE_ACCURACY = 0.001;

/**
 * Seawater/brine density at atmospheric pressure (0.101325 MPa).
 *
 * ρ = a1 + a2·t + a3·t² + a4·t³ + a5·t⁴ + b1·s + b2·s·t + b3·s·t² + b4·s·t³ + b5·s²·t²,  s = S/1000.
 * Source: Sharqawy, Lienhard & Zubair (2010), Eq. (8); best fit to Isdale & Morris (1972) and
 * Millero & Poisson (1981); pure-water part fitted to IAPWS-95.
 * @param salinity S, g/kg
 * @param temperature t, °C (ITS-90)
 * @returns density at atmospheric pressure, kg/m³
 * Validity: 0 ≤ t ≤ 180 °C, 0 ≤ S ≤ 160 g/kg (above 100 °C the value is at the saturation pressure).
 * Accuracy: ±0.1 %.
 */
export function densitySharqawy2010(salinity: number, temperature: number): number {
  const [a1, a2, a3, a4, a5] = SHARQAWY_2010_DENSITY_COEFFICIENTS.a;
  const [b1, b2, b3, b4, b5] = SHARQAWY_2010_DENSITY_COEFFICIENTS.b;
  const t = temperature;
  const s = salinity / 1000;
  const water = a1 + t * (a2 + t * (a3 + t * (a4 + t * a5)));
  return water + s * (b1 + t * (b2 + t * (b3 + t * b4))) + b5 * s * s * t * t;
}

/**
 * Range checks for {@link densitySharqawy2010}. Never throws.
 * @param salinity S, g/kg
 * @param temperature t, °C
 * @param what label of the water concerned
 */
export function densitySharqawy2010ValidityIssues(
  salinity: number,
  temperature: number,
  what = "water",
): ResultWarning[] {
  const out: ResultWarning[] = [];
  const source = "Sharqawy, Lienhard & Zubair (2010), Eq. (8) validity";
  if (
    !Number.isFinite(salinity) ||
    salinity < SHARQAWY_2010_SALINITY_RANGE[0] ||
    salinity > SHARQAWY_2010_SALINITY_RANGE[1]
  ) {
    out.push(
      warning(
        "sharqawy-2010-salinity-out-of-range",
        "serious",
        `${what}: salinity ${formatNumber(salinity)} g/kg is outside the 0–160 g/kg range of the Sharqawy (2010) ` +
          "density fit.",
        {
          parameter: `${what}.salinity`,
          value: salinity,
          range: SHARQAWY_2010_SALINITY_RANGE,
          source,
          stage: "properties",
        },
      ),
    );
  }
  if (
    !Number.isFinite(temperature) ||
    temperature < SHARQAWY_2010_TEMPERATURE_RANGE[0] ||
    temperature > SHARQAWY_2010_TEMPERATURE_RANGE[1]
  ) {
    out.push(
      warning(
        "sharqawy-2010-temperature-out-of-range",
        "serious",
        `${what}: temperature ${formatNumber(temperature)} °C is outside the 0–180 °C range of the Sharqawy (2010) ` +
          "density fit.",
        {
          parameter: `${what}.temperature`,
          value: temperature,
          range: SHARQAWY_2010_TEMPERATURE_RANGE,
          source,
          stage: "properties",
        },
      ),
    );
  }
  return out;
}
