/**
 * The equation-of-state chooser: one density function for the discharge and the ambient alike, so that
 * the density difference that drives the jet is not an artefact of mixing two formulations.
 *
 * Rule: TEOS-10 (in situ, with pressure) when every salinity lies in its 0–42 g/kg range; otherwise
 * Sharqawy et al. (2010) + Nayar et al. (2016) for both fluids.
 * Units: salinity g/kg, temperature °C (ITS-90), sea pressure dbar, density kg/m³.
 */
import type { EquationOfStateInfo } from "../result/contract";
import type { ResultWarning } from "../warnings";
import {
  densitySharqawyNayar,
  densitySharqawyNayarValidityIssues,
  NAYAR_2016_SOURCE,
} from "./nayar-2016-pressure-correction";
import { SHARQAWY_2010_SOURCE } from "./sharqawy-2010-density";
import { densityTeos10, densityTeos10ValidityIssues, TEOS10_SALINITY_RANGE, TEOS10_SOURCE } from "./teos10-density";

export interface EquationOfState {
  readonly info: EquationOfStateInfo;
  /** In-situ density, kg/m³, from salinity (g/kg), temperature (°C) and sea pressure (dbar). */
  density(salinity: number, temperature: number, pressureDbar: number): number;
  /** Range checks for one evaluation; `what` names the water ("discharge", "ambient at 12 m"). */
  validityIssues(salinity: number, temperature: number, pressureDbar: number, what: string): ResultWarning[];
}

export const EOS_NAME_TEOS10 = "TEOS-10";
export const EOS_NAME_BRINE = "Sharqawy 2010 + Nayar 2016";

/** TEOS-10 in-situ density from the Gibbs function. */
export function equationOfStateTeos10(reason: string): EquationOfState {
  return {
    info: { name: EOS_NAME_TEOS10, source: TEOS10_SOURCE, reason },
    density: densityTeos10,
    validityIssues: densityTeos10ValidityIssues,
  };
}

/** Sharqawy et al. (2010) atmospheric density with the Nayar et al. (2016) pressure factor. */
export function equationOfStateBrine(reason: string): EquationOfState {
  return {
    info: { name: EOS_NAME_BRINE, source: `${SHARQAWY_2010_SOURCE}; ${NAYAR_2016_SOURCE}`, reason },
    density: densitySharqawyNayar,
    validityIssues: densitySharqawyNayarValidityIssues,
  };
}

/**
 * Choose the equation of state for a set of waters (discharge and ambient).
 * @param salinities every salinity involved, g/kg
 * @param temperatures every temperature involved, °C (reported in the reason when outside TEOS-10's range)
 * @returns TEOS-10 if all salinities are within 0–42 g/kg, else Sharqawy 2010 + Nayar 2016
 */
export function equationOfStateFor(salinities: readonly number[], temperatures: readonly number[]): EquationOfState {
  const [low, high] = TEOS10_SALINITY_RANGE;
  const outside = salinities.filter((s) => !(s >= low && s <= high));
  if (outside.length === 0) {
    const maxS = salinities.length > 0 ? Math.max(...salinities) : 0;
    const hot = temperatures.filter((t) => t > 40 || t < -2);
    const note =
      hot.length > 0
        ? ` (temperatures up to ${Math.max(...hot)} °C are outside its −2–40 °C range and are flagged)`
        : "";
    return equationOfStateTeos10(
      `All salinities (max ${round(maxS)} g/kg) are within TEOS-10's 0–42 g/kg range, ` +
        `so TEOS-10 in-situ density is used for every water${note}.`,
    );
  }
  const worst = outside.reduce((a, b) => (Math.abs(b - 21) > Math.abs(a - 21) ? b : a));
  return equationOfStateBrine(
    `Salinity ${round(worst)} g/kg is outside TEOS-10's 0–42 g/kg range, so the brine correlation of ` +
      "Sharqawy (2010) with the Nayar (2016) pressure correction is used for the discharge and the ambient alike.",
  );
}

function round(x: number): number {
  return Math.round(x * 100) / 100;
}
