import { describe, expect, it } from "vitest";
import {
  complianceFromEdgeDilution,
  concentrationFromDilution,
  requiredDilutionFromLimit,
} from "../../../core/compliance/required-dilution";
import { scenarioFixture } from "../farfield/fixtures";

describe("requiredDilutionFromLimit() — S_req = (C_d − C_b)/(C_limit − C_b) (definition of dilution)", () => {
  it("gives 18.25 for 70 g/kg brine, 33.5 g/kg sea and a 2 ppt limit ((70 − 33.5)/2 = 18.25, arithmetic)", () => {
    expect(requiredDilutionFromLimit(70, 33.5, 35.5), "California-style arithmetic").toBeCloseTo(18.25, 12);
  });

  it("needs dilution 1 when the discharge is already at or below the limit", () => {
    expect(requiredDilutionFromLimit(0.1, 0, 0.2), "below the limit").toBe(1);
    expect(requiredDilutionFromLimit(0.2, 0, 0.2), "at the limit").toBe(1);
  });

  it("can never be met when the limit is at or below background", () => {
    expect(requiredDilutionFromLimit(70, 36, 35), "limit below background").toBe(Infinity);
  });

  it("inverts the trade convention: the concentration at the required dilution equals the limit", () => {
    const s = requiredDilutionFromLimit(66, 35.6, 38.1);
    expect(concentrationFromDilution(66, 35.6, s), "C = C_b + (C_d − C_b)/S").toBeCloseTo(38.1, 12);
  });
});

describe("complianceFromEdgeDilution() — verdict per constituent and governing constituent", () => {
  const scenario = scenarioFixture({
    discharge: { constituents: [{ name: "antiscalant", concentration: 4, unit: "mg/L", background: 0 }] },
    mixingZone: {
      radius: 100,
      limits: [
        { constituent: "salinity", maxIncrease: 2, unit: "g/kg" },
        { constituent: "antiscalant", maxConcentration: 0.1, unit: "mg/L" },
      ],
    },
  });

  it("takes the salinity background from the seabed ambient and picks the smallest margin as governing", () => {
    const a = complianceFromEdgeDilution(scenario, 30, 33.5, 20);
    const salinity = a.compliance.constituents.find((c) => c.constituent === "salinity")!;
    expect(salinity.requiredDilution, "(70 − 33.5)/2").toBeCloseTo(18.25, 12);
    const antiscalant = a.compliance.constituents.find((c) => c.constituent === "antiscalant")!;
    expect(antiscalant.requiredDilution, "(4 − 0)/(0.1 − 0)").toBeCloseTo(40, 12);
    expect(a.compliance.governingConstituent, "antiscalant has the smaller margin 30/40").toBe("antiscalant");
    expect(a.compliance.margin, "edge ÷ required").toBeCloseTo(0.75, 12);
    expect(a.compliance.pass, "one limit fails").toBe(false);
  });

  it("reports concentrations at the edge for salinity, temperature and listed constituents", () => {
    const a = complianceFromEdgeDilution(scenario, 20, 33.5, 20);
    const names = a.constituents.map((c) => c.constituent);
    expect(names, "all three").toEqual(["salinity", "temperature", "antiscalant"]);
    expect(a.constituents[0].increase, "36.5 / 20").toBeCloseTo(1.825, 12);
  });

  it("fails with a clear reason when a limit is at or below background", () => {
    const bad = scenarioFixture({
      mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxConcentration: 33, unit: "g/kg" }] },
    });
    const a = complianceFromEdgeDilution(bad, 1000, 33.5, 20);
    expect(a.compliance.pass, "no dilution can meet it").toBe(false);
    expect(a.compliance.constituents[0].limit, "explained").toContain("can never be met");
    expect(
      a.warnings.map((w) => w.code),
      "serious warning",
    ).toContain("limit-below-background");
  });

  it("uses a limit's own background when given", () => {
    const own = scenarioFixture({
      mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxIncrease: 2, unit: "g/kg", background: 35 }] },
    });
    const a = complianceFromEdgeDilution(own, 20, 33.5, 20);
    expect(a.compliance.requiredDilution, "(70 − 35)/2 = 17.5, from the definition").toBeCloseTo(17.5, 12);
  });

  it("passes trivially, with an info warning, when there are no limits", () => {
    const none = scenarioFixture({ mixingZone: { radius: 100, limits: [] } });
    const a = complianceFromEdgeDilution(none, 5, 33.5, 20);
    expect(a.compliance.governingConstituent, "nothing to govern").toBe("none");
    expect(
      a.warnings.map((w) => w.code),
      "said so",
    ).toContain("no-limits");
  });
});
