/**
 * Reading the discharge: given directly, or computed from the plant by the trade's mass balance (volumes
 * add; brine flow Qb = Qp(1 − r)/r; brine salinity Sb = (Sf − r·Sp)/(1 − r) with Sp = (1 − R)·Sf; blending
 * by flow-weighted means — salt and water conservation, common practice, no source), and the listed
 * constituents. The default salt rejection 0.997 of seawater RO membranes is a convention (common
 * practice, no source). TDS to Absolute Salinity divides by the density of the solution: 70 g/kg at
 * 20 °C has ρ = 1051.830 kg/m³ by Sharqawy, Lienhard & Zubair (2010), Desalination and Water Treatment
 * 16:354–380, eq. (8) (value evaluated from the published coefficients).
 */
import { describe, it, expect } from "vitest";
import { DEFAULT_SALT_REJECTION } from "../../../core/scenario/normalise";
import { blendingAtRatio } from "../../../core/scenario/plant";
import { accepted, edited, refusedMessages, type Raw } from "./rule-fixtures";

/** 0.5 m³/s of product at 50 % recovery from 36 g/kg feed at 20 °C (invented example). */
function plantRaw(plant: Raw = {}, discharge?: Raw): Raw {
  return edited((r) => {
    delete r.discharge;
    if (discharge) r.discharge = discharge;
    r.diffuser.portDiameter = 0.3;
    r.plant = { productFlow: 0.5, recovery: 0.5, feedSalinity: 36, feedTemperature: 20, ...plant };
  });
}

describe("discharge given directly", () => {
  it("needs flow, salinity and temperature, each named", () => {
    expect(refusedMessages(edited((r) => (r.discharge = {})))).toEqual([
      'discharge.flow: is missing; expected the total brine flow (m³/s, e.g. 0.5 or "12 MGD"), or a plant section',
      "discharge.salinity: is missing; expected the brine salinity (g/kg), or a plant section",
      "discharge.temperature: is missing; expected the brine temperature (°C)",
    ]);
    expect(refusedMessages(edited((r) => delete r.discharge.temperature))).toEqual([
      "discharge.temperature: is missing; expected the brine temperature (°C)",
    ]);
    expect(refusedMessages(edited((r) => delete r.discharge.flow))).toHaveLength(1);
    expect(refusedMessages(edited((r) => delete r.discharge.salinity))).toHaveLength(1);
  });

  it("keeps the values given, with no plant", () => {
    const s = accepted(edited(() => {}));
    expect(s.discharge).toEqual({ flow: 0.25, salinity: 65, temperature: 22, constituents: [] });
    expect(s.plant).toBeUndefined();
  });

  it("converts TDS through the density of the brine at its temperature, and says so", () => {
    const tds = 70 * 1051.8301; // mg/L of a 70 g/kg brine at 20 °C (Sharqawy et al. 2010, eq. 8)
    const s = accepted(edited((r) => Object.assign(r.discharge, { salinity: `${tds} mg/L`, temperature: 20 })));
    expect(s.discharge.salinity).toBeCloseTo(70, 4);
    expect(s.conversions).toContain(
      `discharge.salinity: ${tds} mg/L total dissolved solids → 70 g/kg (divided by the solution's density at 20 °C, atmospheric pressure)`,
    );
  });
});

describe("discharge computed from the plant", () => {
  it("refuses a plant beside a stated discharge flow or salinity", () => {
    const msg =
      'plant: "(plant and discharge.flow/salinity)" give either plant (to compute the brine) or discharge.flow and discharge.salinity, not both';
    expect(refusedMessages(plantRaw({}, { flow: 0.5 }))).toEqual([msg]);
    expect(refusedMessages(plantRaw({}, { salinity: 70 }))).toEqual([msg]);
  });

  it("needs a brine or feed temperature", () => {
    expect(refusedMessages(plantRaw({ feedTemperature: undefined }))).toEqual([
      "discharge.temperature: is missing; expected the brine temperature (°C), or plant.feedTemperature",
    ]);
  });

  it("balances flow and salt: full rejection at 50 % recovery doubles the feed salinity", () => {
    const s = accepted(plantRaw({ saltRejection: 1 }));
    expect(s.discharge.flow).toBeCloseTo(0.5, 15);
    expect(s.discharge.salinity).toBeCloseTo(72, 12);
    expect(s.discharge.temperature).toBe(20);
    expect(s.plant).toEqual({
      productFlow: 0.5,
      recovery: 0.5,
      feedSalinity: 36,
      saltRejection: 1,
      feedTemperature: 20,
      blending: [],
    });
    expect(s.conversions).toEqual([
      "plant: product 0.5 m³/s at recovery 0.5 and salt rejection 1 → brine 0.5 m³/s at 72 g/kg (2× the feed)",
    ]);
  });

  it(`uses a salt rejection of ${DEFAULT_SALT_REJECTION} when none is given, and says it is the default`, () => {
    expect(DEFAULT_SALT_REJECTION).toBe(0.997);
    const s = accepted(plantRaw());
    // Sp = 0.003 × 36 = 0.108 g/kg; Sb = (36 − 0.5 × 0.108)/0.5 = 71.892 g/kg.
    expect(s.discharge.salinity).toBeCloseTo(71.892, 12);
    expect(s.plant!.saltRejection).toBe(0.997);
    expect(s.conversions[0]).toBe(
      "plant: product 0.5 m³/s at recovery 0.5 and salt rejection 0.997 (default) → brine 0.5 m³/s at 71.89 g/kg (2× the feed)",
    );
  });

  it("takes the brine temperature from the discharge section over the feed temperature", () => {
    expect(accepted(plantRaw({}, { temperature: 30 })).discharge.temperature).toBe(30);
    expect(accepted(plantRaw({ feedTemperature: undefined }, { temperature: 30 })).discharge.temperature).toBe(30);
  });

  it("reads a feed salinity in mg/L at the feed temperature, else at the brine temperature", () => {
    const direct = (t: number) =>
      accepted(edited((r) => Object.assign(r.discharge, { salinity: "37000 mg/L", temperature: t }))).discharge
        .salinity;
    const at20 = accepted(plantRaw({ feedSalinity: "37000 mg/L" }, { temperature: 30 })).plant!.feedSalinity;
    expect(at20).toBe(direct(20));
    const noFeedT = plantRaw({ feedSalinity: "37000 mg/L", feedTemperature: undefined }, { temperature: 30 });
    expect(accepted(noFeedT).plant!.feedSalinity).toBe(direct(30));
    expect(direct(30)).not.toBe(direct(20));
  });

  it("mixes blending streams in by flow-weighted means and notes the result", () => {
    const s = accepted(
      plantRaw({ saltRejection: 1, blending: [{ name: "seawater", flow: 1, salinity: 36, temperature: 23 }] }),
    );
    expect(s.discharge.flow).toBeCloseTo(1.5, 15);
    expect(s.discharge.salinity).toBeCloseTo((0.5 * 72 + 36) / 1.5, 12);
    expect(s.discharge.temperature).toBeCloseTo((0.5 * 20 + 23) / 1.5, 12);
    expect(s.conversions[0]).toBe(
      "plant: product 0.5 m³/s at recovery 0.5 and salt rejection 1 → brine 0.5 m³/s at 72 g/kg (2× the feed); after blending 1 stream(s): 1.5 m³/s at 48 g/kg, 22 °C",
    );
  });

  it("notes practical-salinity conversions of the feed and of each blending stream by their fields", () => {
    const s = accepted(
      plantRaw({
        feedSalinity: "35 psu",
        blending: [{ name: "seawater", flow: 0.1, salinity: "35 psu", temperature: 20 }],
      }),
    );
    expect(s.plant!.feedSalinity).toBeCloseTo(35.16504, 12);
    expect(s.plant!.blending[0]!.salinity).toBeCloseTo(35.16504, 12);
    const note = (path: string) =>
      `${path}: 35 psu practical salinity → 35.17 g/kg Absolute Salinity (TEOS-10 reference-composition factor 35.16504/35)`;
    expect(s.conversions).toContain(note("plant.feedSalinity"));
    expect(s.conversions).toContain(note("plant.blending.0.salinity"));
  });

  it("scales the blending streams together to the blend ratio × the brine flow", () => {
    const blending = [
      { name: "a", flow: 1, salinity: 36, temperature: 20 },
      { name: "b", flow: 3, salinity: 30, temperature: 20 },
    ];
    const s = accepted(plantRaw({ saltRejection: 1, blending, blendRatio: 2 }));
    expect(s.plant!.blending.map((b) => b.flow)).toEqual([0.25, 0.75]);
    expect(s.discharge.flow).toBeCloseTo(1.5, 15);
    expect(s.conversions).toContain("plant.blendRatio: blending streams scaled together to 2 × the brine flow");
  });

  it("refuses a blend ratio with no stream to scale", () => {
    expect(refusedMessages(plantRaw({ blendRatio: 2 }))).toEqual([
      "plant.blendRatio: 2 needs at least one stream under plant.blending to scale",
    ]);
  });

  it("shares the target flow equally among streams that all stand at zero", () => {
    const zero = [
      { name: "a", flow: 0 },
      { name: "b", flow: 0 },
    ];
    expect(blendingAtRatio(zero, 0.5, 1).map((b) => b.flow)).toEqual([0.25, 0.25]);
    expect(blendingAtRatio([{ flow: 1 }, { flow: 3 }], 2, 0.5).map((b) => b.flow)).toEqual([0.25, 0.75]);
  });
});

describe("listed constituents", () => {
  const withConstituents = (c: Raw[]) => edited((r) => (r.discharge.constituents = c));

  it("keeps name, concentration and unit, with a background of 0 by default", () => {
    const s = accepted(
      withConstituents([
        { name: "Antiscalant", concentration: 5, unit: "mg/L" },
        { name: "Copper", concentration: 0.02, unit: "mg/L", background: 0.001 },
      ]),
    );
    expect(s.discharge.constituents).toEqual([
      { name: "Antiscalant", concentration: 5, unit: "mg/L", background: 0 },
      { name: "Copper", concentration: 0.02, unit: "mg/L", background: 0.001 },
    ]);
  });

  it("refuses salinity and temperature as names, in any case", () => {
    const m = refusedMessages(
      withConstituents([
        { name: "Salinity", concentration: 5, unit: "g/kg" },
        { name: "TEMPERATURE", concentration: 5, unit: "degC" },
      ]),
    );
    expect(m).toEqual([
      'discharge.constituents.0.name: "Salinity" is implicit: salinity and temperature come from the discharge and ambient; use another name',
      'discharge.constituents.1.name: "TEMPERATURE" is implicit: salinity and temperature come from the discharge and ambient; use another name',
    ]);
  });

  it("refuses a name listed twice, in any case", () => {
    const m = refusedMessages(
      withConstituents([
        { name: "Boron", concentration: 5, unit: "mg/L" },
        { name: "boron", concentration: 4, unit: "mg/L" },
      ]),
    );
    expect(m).toEqual(['discharge.constituents.1.name: "boron" is listed twice']);
  });
});
