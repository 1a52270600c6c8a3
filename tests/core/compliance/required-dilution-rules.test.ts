/**
 * The compliance rules of core/compliance/required-dilution.ts, exactly: the required dilution
 * S_req = (C_d − C_b)/(C_limit − C_b) and the edge concentration C = C_b + (C_d − C_b)/S follow from the
 * definition of dilution (trade convention, no source needed); the limit text, the margins and the
 * warnings are the project's own wording, pinned here because users and permit writers read them.
 */
import { describe, expect, it } from "vitest";
import {
  complianceFromEdgeDilution,
  concentrationFromDilution,
  constituentSources,
  requiredDilutionFromLimit,
} from "../../../core/compliance/required-dilution";
import { scenarioFixture } from "../farfield/fixtures";
import type { LimitInput } from "../../../core/scenario/types";

const withLimits = (
  limits: LimitInput[],
  constituents: { name: string; concentration: number; unit: string; background: number }[] = [],
) => scenarioFixture({ discharge: { constituents }, mixingZone: { radius: 100, limits } });

describe("required dilution and edge concentration — arithmetic from the definition", () => {
  it("computes C = C_b + (C_d − C_b)/S and S_req = (C_d − C_b)/(C_limit − C_b) for worked numbers", () => {
    expect(concentrationFromDilution(70, 33.5, 10), "33.5 + 36.5/10").toBeCloseTo(37.15, 12);
    expect(concentrationFromDilution(4, 0.5, 7), "0.5 + 3.5/7").toBeCloseTo(1, 12);
    expect(requiredDilutionFromLimit(70, 33.5, 34.5), "36.5/1").toBeCloseTo(36.5, 12);
    expect(requiredDilutionFromLimit(4, 1, 1.5), "3/0.5").toBeCloseTo(6, 12);
    expect(requiredDilutionFromLimit(30, 36, 35), "a discharge below the limit needs nothing").toBe(1);
    expect(requiredDilutionFromLimit(70, 36, 36), "a limit at background can never be met").toBe(Infinity);
  });

  it("lists salinity (g/kg), temperature (degC) and each constituent with its discharge and background", () => {
    const s = withLimits([], [{ name: "copper", concentration: 12, unit: "ug/L", background: 0.4 }]);
    expect(constituentSources(s, 36.2, 18.5)).toEqual([
      { name: "salinity", unit: "g/kg", discharge: 70, background: 36.2 },
      { name: "temperature", unit: "degC", discharge: 20, background: 18.5 },
      { name: "copper", unit: "ug/L", discharge: 12, background: 0.4 },
    ]);
  });
});

describe("complianceFromEdgeDilution() — one verdict per limit, the smallest margin governs", () => {
  it("takes the stricter of an allowed increase and an absolute limit, and says both with the basis", () => {
    const s = withLimits([
      { constituent: "salinity", maxIncrease: 2, maxConcentration: 35, unit: "g/kg", basis: "permit condition 4" },
    ]);
    const a = complianceFromEdgeDilution(s, 20, 33.5, 20);
    const c = a.compliance.constituents[0]!;
    expect(c.requiredDilution, "(70 − 33.5)/(35 − 33.5): the absolute limit is stricter").toBeCloseTo(36.5 / 1.5, 12);
    expect(c.limit).toBe("salinity at most 2 g/kg above background 33.5 g/kg and at most 35 g/kg (permit condition 4)");
    expect(c.edgeDilution).toBe(20);
    expect(c.margin).toBeCloseTo(20 / (36.5 / 1.5), 12);
    expect(c.pass).toBe(false);
    expect(a.compliance.verdict).toBe("exceeds");
    const inc = complianceFromEdgeDilution(
      withLimits([{ constituent: "salinity", maxIncrease: 2, maxConcentration: 40, unit: "g/kg" }]),
      30,
      33.5,
      20,
    );
    expect(inc.compliance.requiredDilution, "the increase is stricter here").toBeCloseTo(18.25, 12);
    expect(inc.compliance.constituents[0]!.limit).toBe(
      "salinity at most 2 g/kg above background 33.5 g/kg and at most 40 g/kg",
    );
  });

  it("meets at exactly the required dilution (margin 1) and exceeds just below it", () => {
    const s = withLimits([{ constituent: "salinity", maxIncrease: 2, unit: "g/kg" }]);
    const at = complianceFromEdgeDilution(s, 18.25, 33.5, 20);
    expect(at.compliance.pass).toBe(true);
    expect(at.compliance.verdict).toBe("meets");
    expect(at.compliance.margin).toBeCloseTo(1, 12);
    const below = complianceFromEdgeDilution(s, 18.249, 33.5, 20);
    expect(below.compliance.pass).toBe(false);
    expect(below.compliance.verdict).toBe("exceeds");
  });

  it("says a limit is met by the undiluted discharge, with required dilution 1 and margin = edge dilution", () => {
    const s = withLimits([{ constituent: "temperature", maxConcentration: 25, unit: "degC" }]);
    const a = complianceFromEdgeDilution(s, 12, 33.5, 20);
    expect(a.compliance.constituents[0]!.limit).toBe("temperature at most 25 °C: met by the undiluted discharge");
    expect(a.compliance.requiredDilution).toBe(1);
    expect(a.compliance.margin).toBe(12);
    expect(a.compliance.pass).toBe(true);
  });

  it("matches constituent names without regard to case, and governs by the smallest margin whatever the order", () => {
    const constituents = [{ name: "Antiscalant", concentration: 4, unit: "mg/L", background: 0 }];
    const limits: LimitInput[] = [
      { constituent: "antiscalant", maxConcentration: 0.1, unit: "mg/L" },
      { constituent: "SALINITY", maxIncrease: 2, unit: "g/kg" },
    ];
    for (const order of [limits, [...limits].reverse()]) {
      const a = complianceFromEdgeDilution(withLimits(order, constituents), 30, 33.5, 20);
      expect(a.compliance.constituents.map((c) => c.constituent).sort()).toEqual(["Antiscalant", "salinity"]);
      expect(a.compliance.governingConstituent, "30/40 < 30/18.25").toBe("Antiscalant");
      expect(a.compliance.requiredDilution).toBeCloseTo(40, 12);
      expect(a.compliance.pass, "one fails").toBe(false);
    }
    const both = complianceFromEdgeDilution(withLimits(limits, constituents), 45, 33.5, 20);
    expect(both.compliance.pass, "every limit met").toBe(true);
    expect(both.compliance.verdict).toBe("meets");
    expect(both.compliance.margin).toBeCloseTo(45 / 40, 12);
  });

  it("warns, seriously, about a limit at or below background, with margin 0 and the numbers in the text", () => {
    const s = withLimits([{ constituent: "salinity", maxConcentration: 33, unit: "g/kg" }]);
    const a = complianceFromEdgeDilution(s, 1000, 33.5, 20);
    const c = a.compliance.constituents[0]!;
    expect(c.margin).toBe(0);
    expect(c.requiredDilution).toBe(Infinity);
    expect(c.limit).toBe(
      "salinity at most 33 g/kg: can never be met — the limit 33 g/kg is at or below the background 33.5 g/kg",
    );
    const w = a.warnings.find((x) => x.code === "limit-below-background")!;
    expect(w.severity).toBe("serious");
    expect(w.message).toBe("The salinity limit (33 g/kg) is at or below background (33.5 g/kg); no dilution meets it.");
    expect(w.parameter).toBe("mixingZone.limits");
    expect(w.value).toBe(33);
    expect(w.stage).toBe("compliance");
  });

  it("checks against a limit's own background, and reports each constituent's edge concentration and increase", () => {
    const s = withLimits([{ constituent: "salinity", maxIncrease: 2, unit: "g/kg", background: 35 }]);
    const a = complianceFromEdgeDilution(s, 20, 33.5, 20);
    expect(a.compliance.constituents[0]!.limit).toBe("salinity at most 2 g/kg above background 35 g/kg");
    expect(a.compliance.requiredDilution).toBeCloseTo(17.5, 12);
    const sal = a.constituents[0]!;
    expect(sal).toMatchObject({ constituent: "salinity", unit: "g/kg", discharge: 70, background: 33.5 });
    expect(sal.concentration).toBeCloseTo(33.5 + 36.5 / 20, 12);
    expect(sal.increase).toBeCloseTo(36.5 / 20, 12);
    expect("naturalBackground" in sal, "only with a basin").toBe(false);
    expect(a.basin).toBeUndefined();
    expect(a.warnings).toEqual([]);
  });

  it("with no limit, meets with margin = edge dilution and an info warning saying nothing was assessed", () => {
    const a = complianceFromEdgeDilution(withLimits([]), 5, 33.5, 20);
    expect(a.compliance).toEqual({
      governingConstituent: "none",
      requiredDilution: 1,
      pass: true,
      verdict: "meets",
      scopeReasons: [],
      margin: 5,
      constituents: [],
    });
    expect(a.warnings.map((w) => [w.code, w.severity, w.stage, w.message])).toEqual([
      ["no-limits", "info", "compliance", "No concentration limits given; compliance was not assessed."],
    ]);
  });

  it("skips, with a serious warning, a limit naming no constituent (the scenario rules refuse it before this)", () => {
    const a = complianceFromEdgeDilution(
      withLimits([
        { constituent: "copper", maxIncrease: 1, unit: "ug/L" },
        { constituent: "salinity", maxIncrease: 2, unit: "g/kg" },
      ]),
      30,
      33.5,
      20,
    );
    expect(a.compliance.constituents.map((c) => c.constituent)).toEqual(["salinity"]);
    const w = a.warnings.find((x) => x.code === "limit-constituent-unknown")!;
    expect(w.severity).toBe("serious");
    expect(w.message).toBe('Limit on "copper" names no known constituent; it was not checked.');
    expect(w.parameter).toBe("mixingZone.limits");
  });
});

describe("complianceFromEdgeDilution() in an enclosed basin — the edge dilutes toward the raised background", () => {
  // Well-mixed box (Officer 1976 ch. 5; Fischer et al. 1979 ch. 7, from memory): Δ = Q_d·(C_d − C_n)/Q_e.
  // Q_d = 0.1 m³/s, C_d = 70, C_n = 33.5 g/kg, Q_e = 10 m³/s → Δ = 0.365 g/kg, raised background 33.865 g/kg.
  const basinScenario = (limits: LimitInput[]) =>
    scenarioFixture({
      ambient: { basin: { volume: 1e6, exchangeFlow: 10 } },
      mixingZone: { radius: 100, limits },
    });

  it("requires (C_d − C_raised)/(C_natural + allowed − C_raised) and reports both backgrounds", () => {
    const a = complianceFromEdgeDilution(
      basinScenario([{ constituent: "salinity", maxIncrease: 2, unit: "g/kg" }]),
      30,
      33.5,
      20,
    );
    const required = (70 - 33.865) / (33.5 + 2 - 33.865);
    expect(a.compliance.requiredDilution).toBeCloseTo(required, 9);
    expect(a.compliance.margin).toBeCloseTo(30 / required, 9);
    expect(a.compliance.pass).toBe(true);
    expect(a.compliance.constituents[0]!.limit).toBe(
      "salinity at most 2 g/kg above background 33.5 g/kg; background raised by the basin build-up to 33.87 g/kg",
    );
    const sal = a.constituents[0]!;
    expect(sal.background, "the water around the outfall").toBeCloseTo(33.865, 9);
    expect(sal.naturalBackground).toBe(33.5);
    expect(sal.concentration).toBeCloseTo(33.865 + (70 - 33.865) / 30, 9);
    expect(sal.increase, "above the natural background").toBeCloseTo(33.865 + (70 - 33.865) / 30 - 33.5, 9);
    const t = a.constituents[1]!;
    expect(t.background, "no temperature excess, no build-up").toBe(20);
    expect(a.basin).toMatchObject({ exchangeFlow: 10, volume: 1e6, flushingTime: 1e5, naturalBackground: 33.5 });
    expect(a.basin!.backgroundIncrease).toBeCloseTo(0.365, 12);
    expect(a.basin!.raisedBackground).toBeCloseTo(33.865, 12);
    expect(a.basin!.timeTo95Percent, "(V/Q_e)·ln 20").toBeCloseTo(1e5 * Math.log(20), 6);
    expect(a.basin!.constituents.map((c) => c.constituent)).toEqual(["salinity", "temperature"]);
    const w = a.warnings.find((x) => x.code === "basin-background-raised")!;
    expect(w.severity).toBe("info");
    expect(w.parameter).toBe("ambient.basin");
    expect(w.value).toBeCloseTo(0.365, 12);
    expect(w.message).toMatch(
      /^Enclosed basin: a well-mixed box model raises the salinity background by 0\.365 g\/kg \(to 33\.87 g\/kg; 95 % of it within 3\.47 days; exchange flow 10 m³\/s\)\. /,
    );
    expect(w.message).toContain(
      "required dilution = (C_discharge − C_raised)/(C_natural + allowed increase − C_raised)",
    );
  });

  it("can never meet a limit between the natural and the raised background, and says the basin is why", () => {
    const a = complianceFromEdgeDilution(
      basinScenario([{ constituent: "salinity", maxConcentration: 33.8, unit: "g/kg" }]),
      1e4,
      33.5,
      20,
    );
    expect(a.compliance.pass).toBe(false);
    expect(a.compliance.requiredDilution).toBe(Infinity);
    expect(a.compliance.constituents[0]!.limit).toBe(
      "salinity at most 33.8 g/kg: can never be met — the limit 33.8 g/kg is at or below the background 33.87 g/kg raised by the basin build-up",
    );
    const w = a.warnings.find((x) => x.code === "limit-below-background")!;
    expect(w.message).toBe(
      "The salinity limit (33.8 g/kg) is at or below the background raised by the basin build-up (33.87 g/kg); no dilution meets it.",
    );
    expect(w.parameter).toBe("ambient.basin");
    const open = complianceFromEdgeDilution(
      withLimits([{ constituent: "salinity", maxConcentration: 33.8, unit: "g/kg" }]),
      1e4,
      33.5,
      20,
    );
    expect(open.compliance.pass, "the same limit in open water is met").toBe(true);
  });

  it("builds up from a limit's own natural background when it gives one", () => {
    const a = complianceFromEdgeDilution(
      basinScenario([{ constituent: "salinity", maxIncrease: 2, unit: "g/kg", background: 35 }]),
      30,
      33.5,
      20,
    );
    // Δ = 0.1·(70 − 35)/10 = 0.35 → raised 35.35; S_req = (70 − 35.35)/(35 + 2 − 35.35).
    expect(a.basin!.backgroundIncrease).toBeCloseTo(0.35, 12);
    expect(a.compliance.requiredDilution).toBeCloseTo((70 - 35.35) / (37 - 35.35), 9);
  });
});
