import { describe, expect, it } from "vitest";
import { STANDARD_GRAVITY } from "../../../core/constants";
import {
  flowFractionsFromScenario,
  portCountFromDiffuser,
  portFlowsAndHydraulics,
} from "../../../core/multiport/port-hydraulics";
import type { Scenario } from "../../../core/scenario/types";
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
    const gp = (STANDARD_GRAVITY * (1052 - 1023.5)) / 1023.5;
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

describe("port counts and flow splits — the rules exactly (continuity; common practice, no source)", () => {
  const area = (Math.PI * 0.2 * 0.2) / 4; // d = 0.2 m in the fixture
  const lineOf = (n: number, flowSplit: number[], flow = 0.1) =>
    scenarioFixture({
      discharge: { flow },
      diffuser: { layout: "line", portCount: n, portSpacing: 5, length: 5 * (n - 1), flowSplit },
    });

  it("counts one port for a single port whatever portCount says, the ports of a line, risers × ports of a rosette", () => {
    expect(portCountFromDiffuser(scenarioFixture({ diffuser: { layout: "single", portCount: 5 } })), "single").toBe(1);
    expect(portCountFromDiffuser(lineOf(6, [])), "line").toBe(6);
    expect(portCountFromDiffuser(lineOf(0, [])), "at least one").toBe(1);
    const rosette = (risers?: Scenario["diffuser"]["risers"]) =>
      scenarioFixture({ diffuser: { layout: "rosette", portCount: 7, risers } });
    expect(
      portCountFromDiffuser(rosette({ count: 3, portsPerRiser: 2, spacing: 10, portAzimuths: [0, 180] })),
      "3 × 2",
    ).toBe(6);
    expect(portCountFromDiffuser(rosette(undefined)), "a rosette without risers falls back to portCount").toBe(7);
    expect(
      portCountFromDiffuser(
        scenarioFixture({
          diffuser: {
            layout: "line",
            portCount: 4,
            risers: { count: 3, portsPerRiser: 2, spacing: 10, portAzimuths: [0, 180] },
          },
        }),
      ),
      "risers only count on a rosette",
    ).toBe(4);
  });

  it("uses a split only when it has one positive entry per port and sums to 1 within 1e-6", () => {
    expect(flowFractionsFromScenario(lineOf(2, [0.7, 0.3])), "valid").toEqual({ fractions: [0.7, 0.3], warnings: [] });
    expect(flowFractionsFromScenario(lineOf(2, [0.7, 0.3 + 5e-7])).fractions, "within 1e-6").toEqual([0.7, 0.3 + 5e-7]);
    for (const [split, why] of [
      [[0.7, 0.3 + 2e-6], "sums to 1 + 2e-6"],
      [[1, 0], "a port with no flow"],
      [[1.2, -0.2], "a negative share"],
      [[0.5, 0.25, 0.25], "three entries for two ports"],
    ] as const) {
      const f = flowFractionsFromScenario(lineOf(2, [...split]));
      expect(f.fractions, why).toEqual([0.5, 0.5]);
      expect(f.warnings, why).toHaveLength(1);
      const w = f.warnings[0]!;
      expect(w.code).toBe("flow-split-ignored");
      expect(w.severity).toBe("warning");
      expect(w.parameter).toBe("diffuser.flowSplit");
      expect(w.value).toBe(split.length);
      expect(w.stage).toBe("multiport");
      expect(w.message).toMatch(
        new RegExp(
          `^Flow split has ${split.length} entries summing to \\d\\.\\d{4} for 2 ports; an equal split was used\\.$`,
        ),
      );
    }
    expect(flowFractionsFromScenario(lineOf(3, [0.5, 0.5])).warnings[0]!.message).toContain(
      "2 entries summing to 1.0000 for 3 ports",
    );
    expect(flowFractionsFromScenario(lineOf(2, [])), "no split stated: equal, silently").toEqual({
      fractions: [0.5, 0.5],
      warnings: [],
    });
    expect(
      flowFractionsFromScenario(scenarioFixture({ diffuser: { flowSplit: [1] } })).warnings,
      "one port, [1]",
    ).toEqual([]);
    expect(
      flowFractionsFromScenario(scenarioFixture({ diffuser: { flowSplit: [0.5] } })),
      "one port carries all the flow whatever its one entry says",
    ).toEqual({ fractions: [1], warnings: [] });
    expect(flowFractionsFromScenario(lineOf(2, [1])).warnings, "one entry for two ports").toHaveLength(1);
  });

  it("gives every port's flow and the Reynolds number U·d/ν with the stated or the default viscosity", () => {
    const s = lineOf(2, [0.75, 0.25], 0.4);
    const h = portFlowsAndHydraulics({ scenario: s, ...densities });
    expect(h.port.flows[0]).toBeCloseTo(0.3, 15);
    expect(h.port.flows[1]).toBeCloseTo(0.1, 15);
    expect(h.port.flow, "mean port flow").toBeCloseTo(0.2, 15);
    expect(h.port.velocity).toBeCloseTo(0.2 / area, 12);
    expect(h.port.reynolds, "default ν = 1.05e-6 m²/s").toBeCloseTo(((0.2 / area) * 0.2) / 1.05e-6, 6);
    const v = portFlowsAndHydraulics({ scenario: s, ...densities, kinematicViscosity: 2e-6 });
    expect(v.port.reynolds, "stated ν").toBeCloseTo(((0.2 / area) * 0.2) / 2e-6, 6);
  });

  it("reports the largest port head loss, and none for a missing, zero or negative coefficient", () => {
    const s = (cd?: number) =>
      scenarioFixture({
        discharge: { flow: 0.4 },
        diffuser: {
          layout: "line",
          portCount: 2,
          portSpacing: 5,
          length: 5,
          flowSplit: [0.75, 0.25],
          dischargeCoefficient: cd,
        },
      });
    const h = portFlowsAndHydraulics({ scenario: s(0.8), ...densities });
    const loss = (q: number) => Math.pow(q / (0.8 * area), 2) / (2 * STANDARD_GRAVITY);
    expect(h.ports[0]!.headLoss).toBeCloseTo(loss(0.3), 12);
    expect(h.ports[1]!.headLoss).toBeCloseTo(loss(0.1), 12);
    expect(h.port.headLoss, "the worst port").toBeCloseTo(loss(0.3), 12);
    for (const cd of [undefined, 0, -0.5]) {
      const none = portFlowsAndHydraulics({ scenario: s(cd), ...densities });
      expect(none.port.headLoss, `C_d = ${cd}`).toBeNull();
      expect(none.ports[0]!.headLoss, `C_d = ${cd}`).toBeNull();
    }
  });

  it("warns once for exit velocities outside 2–6 m/s, naming the ports, the span and the worst value", () => {
    const velocityWarnings = (flow: number, split: number[]) =>
      portFlowsAndHydraulics({ scenario: lineOf(split.length, split, flow), ...densities }).warnings.filter(
        (w) => w.code === "port-velocity-unusual",
      );
    // Flows chosen for exact velocities: q = U·A.
    const single = portFlowsAndHydraulics({
      scenario: scenarioFixture({ discharge: { flow: 1.5 * area } }),
      ...densities,
    }).warnings.filter((w) => w.code === "port-velocity-unusual");
    expect(single).toHaveLength(1);
    expect(single[0]!.message).toBe("The port: exit velocity 1.50 m/s, outside the usual 2–6 m/s.");
    expect(single[0]!.parameter).toBe("port[0].velocity");
    expect(single[0]!.value).toBeCloseTo(1.5, 12);
    expect(single[0]!.severity).toBe("warning");
    expect(single[0]!.stage).toBe("multiport");
    expect(single[0]!.range).toEqual([2, 6]);

    const allFast = velocityWarnings(3 * 7 * area, [1 / 3, 1 / 3, 1 / 3]);
    expect(allFast).toHaveLength(1);
    expect(allFast[0]!.message).toBe("All 3 ports: exit velocity 7.00 m/s, outside the usual 2–6 m/s.");
    expect(allFast[0]!.parameter).toBe("port.velocity");

    // Three ports at 1, 4 and 8.5 m/s: ports 1 and 3 flagged; 8.5 is further from the band's middle (4) than 1.
    const mixed = velocityWarnings(13.5 * area, [1 / 13.5, 4 / 13.5, 8.5 / 13.5]);
    expect(mixed).toHaveLength(1);
    expect(mixed[0]!.message).toBe("Ports 1, 3: exit velocity 1.00–8.50 m/s, outside the usual 2–6 m/s.");
    expect(mixed[0]!.value).toBeCloseTo(8.5, 12);
    // 0.5 and 6.5 m/s: 0.5 is further from 4.
    const low = velocityWarnings(7 * area, [0.5 / 7, 6.5 / 7]);
    expect(low[0]!.value).toBeCloseTo(0.5, 12);
    expect(low[0]!.message).toContain("All 2 ports: exit velocity 0.50–6.50 m/s");

    expect(velocityWarnings(8 * area, [2 / 8, 6 / 8]), "2 and 6 m/s are inside the band").toEqual([]);
    expect(velocityWarnings(8 * area, [0.5, 0.5]), "4 m/s").toEqual([]);
  });
});
