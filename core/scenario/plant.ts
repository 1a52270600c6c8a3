/**
 * Plant-to-brine mass balance, the trade's screening convention (common practice, no source):
 * volumes add; brine flow Qb = Qp·(1 − r)/r; product salinity Sp = (1 − rejection)·Sf;
 * brine salinity Sb = (Sf − r·Sp)/(1 − r); blending streams mix in by flow-weighted averages of
 * salinity and temperature. With full rejection Sb/Sf = 1/(1 − r): 1.67 at r = 0.40, 2 at r = 0.5.
 */
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
