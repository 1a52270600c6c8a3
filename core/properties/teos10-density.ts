/**
 * TEOS-10 in-situ density of seawater from the Gibbs function: ρ = 1/(∂g/∂p).
 *
 * Conventions for this module: SA is Absolute Salinity in g/kg, t is in-situ temperature in °C (ITS-90),
 * p is sea pressure in dbar (absolute pressure minus 10.1325 dbar), density in kg/m³.
 */
import { formatNumber } from "../units";
import { warning, type ResultWarning } from "../warnings";
import {
  TEOS10_GIBBS_SALINE_PRESSURE_TERMS,
  TEOS10_GIBBS_WATER_PRESSURE_TERMS,
  TEOS10_PRESSURE_UNIT_PA,
  TEOS10_SALINITY_UNIT,
  TEOS10_TEMPERATURE_UNIT,
} from "./teos10-gibbs-coefficients";

export const TEOS10_SOURCE =
  "IOC, SCOR & IAPSO (2010) TEOS-10 Manual (IOC Manuals and Guides 56); Gibbs function of IAPWS R13-08 " +
  "(Feistel 2008, saline part) and IAPWS SR7-09 (Feistel 2003, pure water)";

/** Oceanographic range of the TEOS-10 (GSW) functions. */
export const TEOS10_SALINITY_RANGE: readonly [number, number] = [0, 42];
export const TEOS10_TEMPERATURE_RANGE: readonly [number, number] = [-2, 40];
export const TEOS10_PRESSURE_RANGE: readonly [number, number] = [0, 10000];

const ALL_TERMS = [...TEOS10_GIBBS_WATER_PRESSURE_TERMS, ...TEOS10_GIBBS_SALINE_PRESSURE_TERMS];
const DBAR_TO_PA = 1e4;

// The terms as flat typed arrays, and module-scope tables of x^i, y^j, z^k filled once per call: the sums
// below then multiply table entries instead of calling pow three times per term (same values, same order).
const TERM_I = Int32Array.from(ALL_TERMS, (t) => t[0]);
const TERM_J = Int32Array.from(ALL_TERMS, (t) => t[1]);
const TERM_K = Int32Array.from(ALL_TERMS, (t) => t[2]);
const TERM_G = Float64Array.from(ALL_TERMS, (t) => t[3]);
const xPow = new Float64Array(Math.max(...TERM_I) + 1);
const yPow = new Float64Array(Math.max(...TERM_J) + 1);
const zPow = new Float64Array(Math.max(...TERM_K) + 1);

/** Fills the power tables with the reduced variables' powers. */
function fillPowers(sa: number, t: number, p: number): void {
  // The Gibbs function needs √SA; a slightly negative salinity (round-off upstream) is read as zero.
  const x = Math.sqrt(Math.max(sa, 0) / TEOS10_SALINITY_UNIT);
  const y = t / TEOS10_TEMPERATURE_UNIT;
  const z = (p * DBAR_TO_PA) / TEOS10_PRESSURE_UNIT_PA;
  for (let i = 0; i < xPow.length; i++) xPow[i] = x ** i;
  for (let j = 0; j < yPow.length; j++) yPow[j] = y ** j;
  for (let k = 0; k < zPow.length; k++) zPow[k] = z ** k;
}

/**
 * Specific volume of seawater, v = ∂g/∂p, from the TEOS-10 Gibbs function.
 *
 * Source: IOC, SCOR & IAPSO (2010), TEOS-10 Manual, Table 2.6 property v = g_P (from memory: table number);
 * coefficients in ./teos10-gibbs-coefficients (IAPWS R13-08 and SR7-09).
 * @param sa Absolute Salinity SA, g/kg
 * @param t in-situ temperature t, °C (ITS-90)
 * @param p sea pressure p, dbar
 * @returns specific volume, m³/kg
 * Validity: SA 0–42 g/kg, t −2–40 °C, p 0–10 000 dbar (oceanographic range of the GSW functions).
 * Accuracy: the Gibbs function reproduces density measurements to a few ppm in this range (from memory).
 */
export function specificVolumeTeos10(sa: number, t: number, p: number): number {
  fillPowers(sa, t, p);
  let sum = 0;
  for (let n = 0; n < TERM_G.length; n++) {
    const k = TERM_K[n];
    sum += k * TERM_G[n] * xPow[TERM_I[n]] * yPow[TERM_J[n]] * zPow[k - 1];
  }
  return sum / TEOS10_PRESSURE_UNIT_PA;
}

/**
 * In-situ density of seawater from the TEOS-10 Gibbs function, ρ = 1/g_p.
 *
 * Source: IOC, SCOR & IAPSO (2010), TEOS-10 Manual (density as the reciprocal of the pressure derivative
 * of the Gibbs function); the equivalent GSW function is `rho_t_exact`.
 * @param sa Absolute Salinity SA, g/kg
 * @param t in-situ temperature t, °C (ITS-90)
 * @param p sea pressure p, dbar (0 at the sea surface)
 * @returns in-situ density ρ, kg/m³
 * Validity: SA 0–42 g/kg, t −2–40 °C, p 0–10 000 dbar; see {@link densityTeos10ValidityIssues}.
 * Accuracy: matches python3-gsw `rho_t_exact` to < 1e-9 kg/m³ (tests/core/properties/teos10-density.test.ts).
 */
export function densityTeos10(sa: number, t: number, p: number): number {
  return 1 / specificVolumeTeos10(sa, t, p);
}

/**
 * g(SA, t, p) − g(SA, t, 0) = ∫₀^p v dp′ at constant SA and t, J/kg. Used for depth ↔ pressure.
 * @param sa Absolute Salinity, g/kg
 * @param t in-situ temperature, °C
 * @param p sea pressure, dbar
 */
export function gibbsPressureIntegralTeos10(sa: number, t: number, p: number): number {
  fillPowers(sa, t, p);
  let sum = 0;
  for (let n = 0; n < TERM_G.length; n++) {
    sum += TERM_G[n] * xPow[TERM_I[n]] * yPow[TERM_J[n]] * zPow[TERM_K[n]];
  }
  return sum;
}

/**
 * Range checks for {@link densityTeos10}. Never throws.
 * @param sa Absolute Salinity, g/kg
 * @param t in-situ temperature, °C
 * @param p sea pressure, dbar
 * @param what label of the water concerned, e.g. "discharge"
 */
export function densityTeos10ValidityIssues(sa: number, t: number, p: number, what = "water"): ResultWarning[] {
  const out: ResultWarning[] = [];
  const source = "TEOS-10 oceanographic range (IOC, SCOR & IAPSO 2010; GSW functions 0–42 g/kg)";
  const check = (name: string, value: number, range: readonly [number, number], unit: string) => {
    if (!Number.isFinite(value)) {
      out.push(
        warning("properties-input-not-finite", "serious", `${what}: ${name} is not a finite number.`, {
          parameter: `${what}.${name}`,
          stage: "properties",
        }),
      );
    } else if (value < range[0] || value > range[1]) {
      out.push(
        warning(
          `teos10-${name}-out-of-range`,
          "warning",
          `${what}: ${name} ${formatNumber(value)} ${unit} is outside the TEOS-10 range ` +
            `${range[0]}–${range[1]} ${unit}; ` +
            "the density is an extrapolation.",
          { parameter: `${what}.${name}`, value, range, source, stage: "properties" },
        ),
      );
    }
  };
  check("salinity", sa, TEOS10_SALINITY_RANGE, "g/kg");
  check("temperature", t, TEOS10_TEMPERATURE_RANGE, "°C");
  check("pressure", p, TEOS10_PRESSURE_RANGE, "dbar");
  return out;
}
