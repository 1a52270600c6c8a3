/**
 * Plant-to-brine mass balance, the trade's screening convention (common practice, no source):
 * volumes add; brine flow Qb = Qp·(1 − r)/r; product salinity Sp = (1 − rejection)·Sf;
 * brine salinity Sb = (Sf − r·Sp)/(1 − r); blending streams mix in by flow-weighted averages of
 * salinity and temperature. With full rejection Sb/Sf = 1/(1 − r): 1.67 at r = 0.40, 2 at r = 0.5.
 */
import type { Scenario } from "./types";
export interface PlantBalanceInput {
  readonly productFlow: number; // m³/s
  readonly recovery: number; // 0–1
  readonly feedSalinity: number; // g/kg
  readonly saltRejection: number; // 0–1
  readonly brineTemperature: number; // °C
  readonly blending: readonly { readonly flow: number; readonly salinity: number; readonly temperature: number }[];
}

export interface PlantBalance {
  readonly brineFlow: number; // m³/s before blending
  readonly brineSalinity: number; // g/kg before blending
  readonly productSalinity: number; // g/kg
  readonly concentrationFactor: number; // brine/feed salinity
  readonly dischargeFlow: number; // m³/s after blending
  readonly dischargeSalinity: number; // g/kg after blending
  readonly dischargeTemperature: number; // °C after blending
}

/** The plant's blend ratio: total blending flow ÷ brine flow (0 without blending streams). */
export function blendRatioOfPlant(p: {
  readonly productFlow: number;
  readonly recovery: number;
  readonly blending: readonly { readonly flow: number }[];
}): number {
  return p.blending.reduce((a, b) => a + b.flow, 0) / brineFlowFromPlant(p.productFlow, p.recovery);
}

/** Brine flow before blending, Q_b = Q_p·(1 − r)/r, m³/s. */
export function brineFlowFromPlant(productFlow: number, recovery: number): number {
  return (productFlow * (1 - recovery)) / recovery;
}

/**
 * The blending streams scaled together so that their total flow is `ratio` × the brine flow (the blend
 * ratio); each keeps its share of the blending flow (equal shares when every stream is at zero flow).
 */
export function blendingAtRatio<T extends { readonly flow: number }>(
  blending: readonly T[],
  brineFlow: number,
  ratio: number,
): T[] {
  const total = blending.reduce((s, b) => s + b.flow, 0);
  const target = ratio * brineFlow;
  return blending.map((b) => ({ ...b, flow: total > 0 ? (b.flow / total) * target : target / blending.length }));
}

export function brineFromPlant(p: PlantBalanceInput): PlantBalance {
  const r = p.recovery;
  const brineFlow = (p.productFlow * (1 - r)) / r;
  const productSalinity = (1 - p.saltRejection) * p.feedSalinity;
  const brineSalinity = (p.feedSalinity - r * productSalinity) / (1 - r);
  let q = brineFlow;
  let qs = brineFlow * brineSalinity;
  let qt = brineFlow * p.brineTemperature;
  for (const b of p.blending) {
    q += b.flow;
    qs += b.flow * b.salinity;
    qt += b.flow * b.temperature;
  }
  return {
    brineFlow,
    brineSalinity,
    productSalinity,
    concentrationFactor: p.feedSalinity > 0 ? brineSalinity / p.feedSalinity : Number.NaN,
    dischargeFlow: q,
    dischargeSalinity: qs / q,
    dischargeTemperature: qt / q,
  };
}

/**
 * The scenario with its plant's blending streams scaled together to `ratio` × the brine flow and the
 * discharge recomputed from the plant balance — the rule the file reader applies to `plant.blendRatio`,
 * shared by sweeps and the blend-ratio search. Listed constituents keep their stated concentrations.
 * A scenario without a plant or without blending streams is returned unchanged.
 */
export function scenarioWithBlendRatio(s: Scenario, ratio: number): Scenario {
  const p = s.plant;
  if (!p || p.blending.length === 0) return s;
  const brineFlow = brineFlowFromPlant(p.productFlow, p.recovery);
  const blending = blendingAtRatio(p.blending, brineFlow, ratio);
  // The brine's own temperature, recovered from the blended discharge temperature (flow-weighted mean).
  const q = brineFlow + p.blending.reduce((a, b) => a + b.flow, 0);
  const brineTemperature =
    (q * s.discharge.temperature - p.blending.reduce((a, b) => a + b.flow * b.temperature, 0)) / brineFlow;
  const bal = brineFromPlant({
    productFlow: p.productFlow,
    recovery: p.recovery,
    feedSalinity: p.feedSalinity,
    saltRejection: p.saltRejection,
    brineTemperature,
    blending,
  });
  return {
    ...s,
    plant: { ...p, blending },
    discharge: {
      ...s.discharge,
      flow: bal.dischargeFlow,
      salinity: bal.dischargeSalinity,
      temperature: bal.dischargeTemperature,
    },
  };
}
