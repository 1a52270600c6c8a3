/**
 * Background build-up in enclosed or poorly flushed water: a well-mixed box model.
 *
 * A basin of volume V exchanges water with the open sea at the exchange flow Q_e = V/T_f (T_f the
 * flushing time). A discharge of flow Q_d and concentration C_d into water of natural background C_n
 * adds the excess load L = Q_d·(C_d − C_n). With the basin completely mixed, the mass balance
 *   V·dΔ/dt = L − Q_e·Δ
 * gives the steady background increase Δ = L/Q_e (the salt load over the exchange flow) reached as
 *   Δ(t) = Δ·(1 − e^(−t·Q_e/V)),
 * so 95 % of it after t95 = (V/Q_e)·ln 20 ≈ 3.0 flushing times. This is the continuously stirred
 * tank (box) balance of Officer (1976), "Physical Oceanography of Estuaries (and Associated Coastal
 * Waters)", Wiley, ch. 5 (flushing-time methods), and Fischer et al. (1979), "Mixing in Inland and
 * Coastal Waters", Academic Press, ch. 7 (both from memory). The balance leaves out the discharge's own
 * contribution to the outflow (Q_e + Q_d); with Q_d ≪ Q_e the difference is small and leaving it out
 * gives the larger, more cautious increase.
 *
 * Limits, stated wherever the result is shown: no stratification (the whole basin is one mixed box),
 * complete mixing, a steady discharge and exchange, a conservative substance (no decay, no surface
 * heat exchange for temperature — which over-states a temperature build-up), the exchanged water at
 * natural background (no return of discharged water on the flood tide beyond what the exchange flow
 * already nets out).
 */

export interface BasinInput {
  /** Basin volume, m³. */
  readonly volume: number;
  /** Flushing time V/Q_e, s (one of flushingTime or exchangeFlow is given). */
  readonly flushingTime?: number;
  /** Exchange flow with the open sea, m³/s. */
  readonly exchangeFlow?: number;
}

/** ln 20: the number of e-folding times to reach 95 % of a first-order approach to steady state. */
export const LN_20 = Math.log(20);

export const BASIN_METHOD = "well-mixed box model (steady increase = excess load / exchange flow)";

export const BASIN_SOURCE =
  "Well-mixed box (continuously stirred tank) balance V·dΔ/dt = Q_d·(C_d − C_n) − Q_e·Δ: Officer (1976), " +
  "Physical Oceanography of Estuaries (and Associated Coastal Waters), Wiley, ch. 5; Fischer et al. (1979), " +
  "Mixing in Inland and Coastal Waters, Academic Press, ch. 7";

export const BASIN_LIMITS =
  "Assumes no stratification and complete mixing of the whole basin, steady discharge and exchange, a " +
  "conservative substance (no decay; for temperature no heat loss to the air, which over-states its build-up) " +
  "and exchanged water at natural background. A stratified or partly mixed basin can hold a larger increase " +
  "near the bed (dense brine) or at the surface (a rising blend) than the basin average given here.";

/** Exchange flow Q_e, m³/s, from the basin input (given directly, or V/T_f). */
export function exchangeFlowFromBasin(b: BasinInput): number {
  if (b.exchangeFlow !== undefined) return b.exchangeFlow;
  if (b.flushingTime !== undefined) return b.volume / b.flushingTime;
  return Number.NaN;
}

/** Flushing time V/Q_e, s. */
export function flushingTimeFromBasin(b: BasinInput): number {
  return b.flushingTime ?? b.volume / exchangeFlowFromBasin(b);
}

/**
 * Steady background increase Δ = Q_d·(C_d − C_n)/Q_e, in the concentration's unit.
 * @param dischargeFlow Q_d, m³/s
 * @param discharge C_d
 * @param naturalBackground C_n
 * @param exchangeFlow Q_e, m³/s
 */
export function backgroundIncreaseFromLoad(
  dischargeFlow: number,
  discharge: number,
  naturalBackground: number,
  exchangeFlow: number,
): number {
  return (dischargeFlow * (discharge - naturalBackground)) / exchangeFlow;
}

/** Time to reach 95 % of the steady increase, t95 = (V/Q_e)·ln 20, s. */
export function timeTo95PercentFromBasin(b: BasinInput): number {
  return (b.volume / exchangeFlowFromBasin(b)) * LN_20;
}

/** Increase at time t after the discharge starts, Δ(t) = Δ·(1 − e^(−t·Q_e/V)). */
export function backgroundIncreaseAtTime(steadyIncrease: number, b: BasinInput, t: number): number {
  return steadyIncrease * (1 - Math.exp((-t * exchangeFlowFromBasin(b)) / b.volume));
}

/**
 * Dilution needed at the edge when the background is raised but the limit stays relative to the
 * natural background: S_req = (C_d − C_r)/(C_n + allowed increase − C_r), with C_r = C_n + Δ.
 * Follows from C_edge = C_r + (C_d − C_r)/S ≤ C_n + allowed. Infinity when the raised background alone
 * uses up the allowance; 1 when the undiluted discharge already meets it.
 */
export function requiredDilutionWithRaisedBackground(
  discharge: number,
  raised: number,
  limitConcentration: number,
): number {
  if (discharge <= limitConcentration) return 1;
  if (limitConcentration <= raised) return Infinity;
  return Math.max(1, (discharge - raised) / (limitConcentration - raised));
}
