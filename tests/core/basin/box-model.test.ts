/**
 * Background build-up in an enclosed basin: the well-mixed box model against a calculation by hand and
 * its effect on the verdict through the whole pipeline.
 *
 * The balance V·dΔ/dt = Q_d·(C_d − C_n) − Q_e·Δ is the continuously stirred tank (box) model of
 * Officer (1976), Physical Oceanography of Estuaries, ch. 5, and Fischer et al. (1979), Mixing in Inland
 * and Coastal Waters, ch. 7 (from memory); the numbers below are worked by hand from it.
 */
import { describe, it, expect } from "vitest";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";
import {
  backgroundIncreaseAtTime,
  backgroundIncreaseFromLoad,
  exchangeFlowFromBasin,
  requiredDilutionWithRaisedBackground,
  timeTo95PercentFromBasin,
} from "../../../core/basin/box-model";

function scenarioOf(raw: unknown) {
  const r = parseScenario(raw);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.scenario;
}

/** A deep single-port brine outfall whose jet stays submerged (so the verdict is meets/exceeds). */
function lagoon(basin?: Record<string, unknown>, maxIncrease: number | string = 2) {
  return {
    format: "brinefield-scenario",
    version: 1,
    name: "Invented lagoon",
    discharge: { flow: 0.5, salinity: 70, temperature: 22 },
    ambient: { depth: 30, salinity: 38, temperature: 22, ...(basin ? { basin } : {}) },
    diffuser: { portCount: 1, portDiameter: 0.35, portAngle: 60, portHeight: 1 },
    mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxIncrease }] },
    options: { addSlackWater: false },
  };
}

describe("box model by hand", () => {
  // Hand calculation: V = 5e7 m³, T_f = 10 days = 864,000 s → Q_e = V/T_f = 57.870 m³/s.
  // Load Q_d·(C_d − C_n) = 0.5 × (70 − 38) = 16 (g/kg)·m³/s → Δ = 16/57.870 = 0.27648 g/kg.
  // t95 = T_f·ln 20 = 864,000 × 2.995732 = 2,588,313 s (29.96 days).
  const b = { volume: 5e7, flushingTime: 864000 };
  it("gives the exchange flow, the steady increase and the time to 95 %", () => {
    expect(exchangeFlowFromBasin(b)).toBeCloseTo(57.8704, 3);
    expect(backgroundIncreaseFromLoad(0.5, 70, 38, exchangeFlowFromBasin(b))).toBeCloseTo(0.27648, 5);
    expect(timeTo95PercentFromBasin(b) / 86400).toBeCloseTo(29.957, 2);
    expect(backgroundIncreaseAtTime(1, b, timeTo95PercentFromBasin(b))).toBeCloseTo(0.95, 12);
  });
  it("takes an exchange flow instead of the flushing time", () => {
    expect(exchangeFlowFromBasin({ volume: 5e7, exchangeFlow: 20 })).toBe(20);
    // t95 = V/Q_e·ln 20 = 2.5e6 × 2.995732 s
    expect(timeTo95PercentFromBasin({ volume: 5e7, exchangeFlow: 20 })).toBeCloseTo(2.5e6 * Math.log(20), 3);
  });
  it("required dilution with a raised background: (C_d − C_r)/(C_n + allowed − C_r)", () => {
    // (70 − 38.27648)/(38 + 2 − 38.27648) = 31.72352/1.72352 = 18.4062
    expect(requiredDilutionWithRaisedBackground(70, 38.27648, 40)).toBeCloseTo(18.4062, 3);
    expect(requiredDilutionWithRaisedBackground(70, 40.5, 40), "the build-up alone uses the allowance").toBe(Infinity);
    expect(requiredDilutionWithRaisedBackground(39, 38.5, 40), "met undiluted").toBe(1);
  });
});

describe("ambient.basin through the pipeline", () => {
  it("raises the background by the box-model amount and uses it at the edge", () => {
    const open = runScenario(scenarioOf(lagoon()));
    const r = runScenario(scenarioOf(lagoon({ volume: "5e7 m^3", flushingTime: "10 days" })));
    expect(open.basin, "no basin block for open water").toBeUndefined();
    expect(r.basin!.backgroundIncrease).toBeCloseTo(0.27648, 5);
    expect(r.basin!.exchangeFlow).toBeCloseTo(57.8704, 3);
    expect(r.basin!.timeTo95Percent).toBeCloseTo(864000 * Math.log(20), 3);
    expect(r.basin!.method).toMatch(/box model/);
    expect(r.basin!.limits).toMatch(/no stratification/);
    expect(r.basin!.limits).toMatch(/complete mixing/);
    // Same near field and edge dilution: the build-up changes the background, not the mixing.
    expect(r.mixingZone.dilution).toBeCloseTo(open.mixingZone.dilution, 9);
    expect(r.compliance.requiredDilution).toBeCloseTo((70 - 38.27648) / (40 - 38.27648), 4);
    expect(open.compliance.requiredDilution).toBeCloseTo((70 - 38) / 2, 9);
    const sal = r.mixingZone.constituents.find((c) => c.constituent === "salinity")!;
    expect(sal.background).toBeCloseTo(38.27648, 5);
    expect(sal.naturalBackground).toBe(38);
    // C_edge = C_r + (C_d − C_r)/S; the increase is measured from the natural background.
    expect(sal.concentration).toBeCloseTo(38.27648 + (70 - 38.27648) / r.mixingZone.dilution, 6);
    expect(sal.increase).toBeCloseTo(sal.concentration - 38, 9);
    expect(r.warnings.some((w) => w.code === "basin-background-raised")).toBe(true);
    expect(r.methods.some((m) => m.stage === "background")).toBe(true);
  });

  it("turns a verdict: meets in open water, exceeds when the basin is poorly flushed", () => {
    const open = runScenario(scenarioOf(lagoon()));
    expect(open.compliance.verdict).toBe("meets");
    expect(open.compliance.requiredDilution).toBeCloseTo(16, 9);
    // Exchange 12 m³/s: Δ = 0.5 × 32/12 = 1.3333 g/kg → required = (70 − 39.3333)/(40 − 39.3333) = 46.0,
    // more than the edge dilution this outfall gives (about 30): exceeds.
    const mid = runScenario(scenarioOf(lagoon({ volume: 1e7, exchangeFlow: 12 })));
    expect(mid.basin!.backgroundIncrease).toBeCloseTo(4 / 3, 9);
    expect(mid.compliance.requiredDilution).toBeCloseTo(46, 6);
    expect(open.mixingZone.dilution).toBeGreaterThan(16);
    expect(open.mixingZone.dilution).toBeLessThan(46);
    expect(mid.compliance.verdict).toBe("exceeds");
    // Exchange 8 m³/s: Δ = 2 g/kg, the whole allowance: no dilution can meet the limit.
    const shut = runScenario(scenarioOf(lagoon({ volume: 1e7, exchangeFlow: 8 })));
    expect(shut.basin!.backgroundIncrease).toBeCloseTo(2, 9);
    expect(shut.compliance.requiredDilution).toBe(Infinity);
    expect(shut.compliance.verdict).toBe("exceeds");
  });

  it("refuses a basin without exactly one of flushingTime and exchangeFlow, naming the field", () => {
    const both = parseScenario(lagoon({ volume: 1e7, flushingTime: 86400, exchangeFlow: 3 }));
    expect(both.ok).toBe(false);
    if (!both.ok)
      expect(both.issues.map((i) => i.message).join("\n")).toMatch(/^ambient\.basin: .*exactly one of flushingTime/m);
    const bad = parseScenario(lagoon({ volume: "-3 m^3", flushingTime: "2 days" }));
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues.map((i) => i.message).join("\n")).toMatch(/ambient\.basin\.volume/);
  });
});

describe("the report names the box-model assumption", () => {
  it("has a basin section stating no stratification and complete mixing, and the required-dilution rule", async () => {
    const { reportHtml } = await import("../../../core/report");
    const raw = lagoon({ volume: 1e7, exchangeFlow: 40 });
    const r = runScenario(scenarioOf(raw));
    const text = reportHtml(r, { scenarioFile: raw }, { generatedAt: "2026-12-03T00:00:00Z" });
    expect(text).toMatch(/id="basin"/);
    expect(text).toMatch(/well-mixed box/);
    expect(text).toMatch(/no stratification/);
    expect(text).toMatch(/complete mixing/);
    expect(text).toMatch(/C<sub>natural<\/sub> \+ allowed increase − C<sub>raised<\/sub>/);
    const open = reportHtml(
      runScenario(scenarioOf(lagoon())),
      { scenarioFile: lagoon() },
      { generatedAt: "2026-12-03T00:00:00Z" },
    );
    expect(open).not.toMatch(/id="basin"/);
  });
});
