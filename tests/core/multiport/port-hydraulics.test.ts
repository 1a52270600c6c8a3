import { describe, expect, it } from "vitest";
import { GRAVITY, portCountFromDiffuser, portFlowsAndHydraulics } from "../../../core/multiport/port-hydraulics";
import { scenarioFixture } from "../farfield/fixtures";

const densities = { dischargeDensity: 1052, ambientDensity: 1023.5 };

describe("portFlowsAndHydraulics() — flow split, exit velocity, Froude number, orifice head loss", () => {
  it("splits the flow equally by default: U = (Q/n)/(πd²/4) (continuity)", () => {
    const scenario = scenarioFixture({
      discharge: { flow: 0.8 },
      diffuser: { layout: "line", portCount: 4, portSpacing: 5, length: 15, flowSplit: [0.25, 0.25, 0.25, 0.25] },
    });
    const h = portFlowsAndHydraulics({ scenario, ...densities });
    const area = (Math.PI * 0.2 * 0.2) / 4;
    expect(h.port.count, "four ports").toBe(4);
    for (const p of h.ports) expect(p.velocity, `port ${p.index}`).toBeCloseTo(0.2 / area, 12);
    const gp = (GRAVITY * (1052 - 1023.5)) / 1023.5;
    expect(h.port.froude, "F = U/√(g′d), the usual definition").toBeCloseTo(0.2 / area / Math.sqrt(gp * 0.2), 12);
  });

  it("gives each port its share when the split is unequal, and warns outside the usual 2–6 m/s", () => {
    const scenario = scenarioFixture({
      discharge: { flow: 0.4 },
      diffuser: { layout: "line", portCount: 2, portSpacing: 5, length: 5, flowSplit: [0.8, 0.2] },
    });
    const h = portFlowsAndHydraulics({ scenario, ...densities });
    expect(h.ports[0].flow, "80 %").toBeCloseTo(0.32, 12);
    expect(h.ports[1].flow, "20 %").toBeCloseTo(0.08, 12);
    // 0.32/0.0314 = 10.2 m/s and 0.08/0.0314 = 2.5 m/s: only the first is outside 2–6 m/s (common practice, no source).
    const flagged = h.warnings.filter((w) => w.code === "port-velocity-unusual").map((w) => w.parameter);
    expect(flagged, "only port 1 is flagged").toEqual(["port[0].velocity"]);
  });

  it("estimates the exit head loss h = (q/(C_d·A))²/(2g) when a discharge coefficient is given (standard orifice hydraulics)", () => {
    const scenario = scenarioFixture({ discharge: { flow: 0.1 }, diffuser: { dischargeCoefficient: 0.8 } });
    const h = portFlowsAndHydraulics({ scenario, ...densities });
    const a = (Math.PI * 0.2 * 0.2) / 4;
    expect(h.port.headLoss, "single port, q = 0.1 m³/s").toBeCloseTo(Math.pow(0.1 / (0.8 * a), 2) / (2 * 9.80665), 12);
    const none = portFlowsAndHydraulics({ scenario: scenarioFixture(), ...densities });
    expect(none.port.headLoss, "no coefficient, no estimate").toBeNull();
  });

  it("falls back to an equal split, with a warning, when the split does not match the ports", () => {
    const scenario = scenarioFixture({
      diffuser: { layout: "line", portCount: 3, portSpacing: 4, length: 8, flowSplit: [0.5, 0.5] },
    });
    const h = portFlowsAndHydraulics({ scenario, ...densities });
    expect(
      h.ports.map((p) => p.flow / scenario.discharge.flow),
      "equal thirds",
    ).toEqual([1 / 3, 1 / 3, 1 / 3]);
    expect(
      h.warnings.map((w) => w.code),
      "the user is told",
    ).toContain("flow-split-ignored");
  });

  it("counts rosette ports as risers × ports per riser", () => {
    const scenario = scenarioFixture({
      diffuser: {
        layout: "rosette",
        portCount: 8,
        risers: { count: 2, portsPerRiser: 4, spacing: 20, portAzimuths: [0, 90, 180, 270] },
      },
    });
    expect(portCountFromDiffuser(scenario), "2 × 4").toBe(8);
  });

  it("gives a lighter discharge its Froude number on |g′| and a neutral one an infinite Froude number, never NaN", () => {
    const light = portFlowsAndHydraulics({
      scenario: scenarioFixture(),
      dischargeDensity: 1020,
      ambientDensity: 1023.5,
    });
    const dense = portFlowsAndHydraulics({
      scenario: scenarioFixture(),
      dischargeDensity: 1027,
      ambientDensity: 1023.5,
    });
    // Same |Δρ| = 3.5 kg/m³ either way; g′ differs only through the reference density (ambient in both).
    expect(light.port.froude, "rising: U/√(|g′|·d)").toBeCloseTo(dense.port.froude, 9);
    const neutral = portFlowsAndHydraulics({
      scenario: scenarioFixture(),
      dischargeDensity: 1023.5,
      ambientDensity: 1023.5,
    });
    expect(neutral.port.froude, "no densimetric Froude number").toBe(Infinity);
  });
});
