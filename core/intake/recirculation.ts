/**
 * The plant balance with its own brine drawn back in at the intake. The feed the plant takes in is the
 * stated feed raised by the intake's share of the discharge's salinity excess:
 *   S_f = S_f0 + (S_d(S_f) − S_bg)/D
 * where D is the intake dilution, S_bg the background salinity the excess is counted from, and
 * S_d(S_f) the discharge salinity the plant balance (core/scenario/plant.ts) gives for feed S_f. The balance
 * is linear in the feed, S_d = A·S_f + B, so the steady state is
 *   S_f = (S_f0 + (B − S_bg)/D) / (1 − A/D),
 * a steady state only while A < D (else the brine would keep building up: no steady state, reported as
 * such). Flows are set by the product flow and the recovery, so the brine flow is unchanged; the intake
 * dilution itself is not recomputed for the saltier brine (a small change for a screening estimate).
 */
import { brineFromPlant } from "../scenario/plant";
import type { Scenario } from "../scenario/types";

export interface Recirculation {
  /** Steady feed salinity with the recirculated brine, g/kg (null when no steady state exists). */
  readonly feedSalinity: number | null;
  /** Steady brine salinity before any blending, g/kg. */
  readonly brineSalinity: number | null;
  /** Brine flow, m³/s (set by product flow and recovery). */
  readonly brineFlow: number;
}

export function recirculationFromPlant(
  scenario: Scenario,
  intakeDilution: number | null,
  backgroundSalinity: number,
): Recirculation | null {
  const p = scenario.plant;
  if (!p) return null;
  const brineTemperature = scenario.discharge.temperature;
  const balanceAt = (feed: number) =>
    brineFromPlant({
      productFlow: p.productFlow,
      recovery: p.recovery,
      feedSalinity: feed,
      saltRejection: p.saltRejection,
      brineTemperature,
      blending: p.blending,
    });
  const base = balanceAt(p.feedSalinity);
  if (intakeDilution === null)
    return { feedSalinity: p.feedSalinity, brineSalinity: base.brineSalinity, brineFlow: base.brineFlow };
  const B = balanceAt(0).dischargeSalinity;
  const A = balanceAt(1).dischargeSalinity - B;
  const D = intakeDilution;
  if (!(A < D)) return { feedSalinity: null, brineSalinity: null, brineFlow: base.brineFlow };
  const feed = (p.feedSalinity + (B - backgroundSalinity) / D) / (1 - A / D);
  const bal = balanceAt(feed);
  return { feedSalinity: feed, brineSalinity: bal.brineSalinity, brineFlow: bal.brineFlow };
}
