/**
 * The plant-to-brine mass balance and the blend ratio, the trade's screening convention (common
 * practice, no source): water and salt are conserved, so Qb = Qp(1 − r)/r, Sp = (1 − R)·Sf and
 * Sb = (Sf − r·Sp)/(1 − r); with full rejection Sb/Sf = 1/(1 − r). Blending streams mix in by
 * flow-weighted means of salinity and temperature. Changing the blend ratio of a read scenario gives
 * the same discharge as writing that ratio in the file.
 */
import { describe, it, expect } from "vitest";
import {
  blendRatioOfPlant,
  blendingAtRatio,
  brineFlowFromPlant,
  brineFromPlant,
  scenarioWithBlendRatio,
} from "../../../core/scenario/plant";
import { accepted, baseRaw, edited, type Raw } from "./rule-fixtures";

const noBlend = { productFlow: 1, recovery: 0.5, feedSalinity: 35, saltRejection: 1, brineTemperature: 25 };

describe("brineFromPlant", () => {
  it("concentrates the feed by 1/(1 − r) with full rejection: 1.667 at r = 0.40, 2 at r = 0.5", () => {
    const at40 = brineFromPlant({ ...noBlend, recovery: 0.4, blending: [] });
    expect(at40.concentrationFactor).toBeCloseTo(1 / 0.6, 12);
    expect(at40.brineFlow).toBeCloseTo(1.5, 12);
    expect(at40.productSalinity).toBe(0);
    const at50 = brineFromPlant({ ...noBlend, blending: [] });
    expect(at50).toEqual({
      brineFlow: 1,
      brineSalinity: 70,
      productSalinity: 0,
      concentrationFactor: 2,
      dischargeFlow: 1,
      dischargeSalinity: 70,
      dischargeTemperature: 25,
    });
  });

  it("keeps the salt that passes the membrane in the product", () => {
    const b = brineFromPlant({ ...noBlend, recovery: 0.45, feedSalinity: 36, saltRejection: 0.99, blending: [] });
    expect(b.productSalinity).toBeCloseTo(0.36, 12);
    expect(b.brineSalinity).toBeCloseTo((36 - 0.45 * 0.36) / 0.55, 12);
    expect(b.brineFlow).toBeCloseTo((1 * 0.55) / 0.45, 12);
  });

  it("mixes blending streams by flow-weighted means", () => {
    const b = brineFromPlant({ ...noBlend, blending: [{ flow: 1, salinity: 36, temperature: 15 }] });
    expect(b.dischargeFlow).toBe(2);
    expect(b.dischargeSalinity).toBe(53);
    expect(b.dischargeTemperature).toBe(20);
    expect(b.brineSalinity).toBe(70);
  });

  it("has no concentration factor for a fresh feed", () => {
    expect(brineFromPlant({ ...noBlend, feedSalinity: 0, blending: [] }).concentrationFactor).toBeNaN();
  });
});

describe("blend ratio", () => {
  it("is the blending flow over the brine flow, 0 without streams", () => {
    expect(brineFlowFromPlant(0.5, 0.5)).toBe(0.5);
    expect(brineFlowFromPlant(1, 0.4)).toBeCloseTo(1.5, 12);
    expect(blendRatioOfPlant({ productFlow: 1, recovery: 0.5, blending: [{ flow: 0.5 }, { flow: 1.5 }] })).toBe(2);
    expect(blendRatioOfPlant({ productFlow: 1, recovery: 0.5, blending: [] })).toBe(0);
  });

  it("scales streams together, keeping their shares", () => {
    expect(blendingAtRatio([{ flow: 1 }, { flow: 3 }], 1, 2).map((b) => b.flow)).toEqual([0.5, 1.5]);
  });
});

describe("scenarioWithBlendRatio", () => {
  const plantRaw = (extra: Raw = {}) =>
    edited((r) => {
      r.discharge = { temperature: 24, constituents: [{ name: "Antiscalant", concentration: 5, unit: "mg/L" }] };
      r.diffuser.portDiameter = 0.4;
      r.plant = {
        productFlow: 0.5,
        recovery: 0.45,
        feedSalinity: 36,
        feedTemperature: 20,
        blending: [
          { name: "seawater", flow: 0.2, salinity: 36, temperature: 18 },
          { name: "cooling water", flow: 0.6, salinity: 36.5, temperature: 30 },
        ],
        ...extra,
      };
    });

  it("gives the discharge the file reader gives for the same ratio", () => {
    const read = accepted(plantRaw());
    for (const ratio of [0, 0.5, 3]) {
      const changed = scenarioWithBlendRatio(read, ratio);
      const direct = accepted(plantRaw({ blendRatio: ratio }));
      expect(changed.discharge.flow, `flow at ratio ${ratio}`).toBeCloseTo(direct.discharge.flow, 12);
      expect(changed.discharge.salinity, `salinity at ratio ${ratio}`).toBeCloseTo(direct.discharge.salinity, 10);
      expect(changed.discharge.temperature, `temperature at ratio ${ratio}`).toBeCloseTo(
        direct.discharge.temperature,
        10,
      );
      expect(changed.plant!.blending.map((b) => b.flow)).toEqual(direct.plant!.blending.map((b) => b.flow));
      expect(changed.discharge.constituents).toBe(read.discharge.constituents);
      expect(blendRatioOfPlant(changed.plant!)).toBeCloseTo(ratio, 12);
    }
  });

  it("at the scenario's own ratio changes nothing", () => {
    const read = accepted(plantRaw());
    const same = scenarioWithBlendRatio(read, blendRatioOfPlant(read.plant!));
    expect(same.discharge.flow).toBeCloseTo(read.discharge.flow, 12);
    expect(same.discharge.salinity).toBeCloseTo(read.discharge.salinity, 12);
    expect(same.discharge.temperature).toBeCloseTo(read.discharge.temperature, 12);
  });

  it("returns a scenario without a plant or without blending streams unchanged", () => {
    const direct = accepted(baseRaw());
    expect(scenarioWithBlendRatio(direct, 2)).toBe(direct);
    const bare = accepted(plantRaw({ blending: [] }));
    expect(scenarioWithBlendRatio(bare, 2)).toBe(bare);
  });
});
