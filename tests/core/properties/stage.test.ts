/**
 * propertiesFromScenario(): the stage the pipeline calls for densities and reduced gravity.
 */
import { describe, expect, it } from "vitest";
import {
  densityTeos10,
  densitySharqawyNayar,
  pressureFromDepth,
  profileAtDepth,
  propertiesFromScenario,
} from "../../../core/properties";
import { DENSITY_INVERSION_TOLERANCE, densityOnce, staticInstability } from "../../../core/properties/stage";
import { equationOfStateTeos10 } from "../../../core/properties/equation-of-state";
import type { ProfilePoint, Scenario } from "../../../core/scenario/types";

function scenario(options: {
  salinity?: number;
  temperature?: number;
  depth?: number;
  portHeight?: number;
  profile?: ProfilePoint[];
}): Scenario {
  const depth = options.depth ?? 20;
  const profile = options.profile ?? [
    { depth: 0, salinity: 35, temperature: 20 },
    { depth, salinity: 35, temperature: 20 },
  ];
  return {
    format: "brinefield-scenario",
    version: 1,
    name: "properties test",
    discharge: {
      flow: 1,
      salinity: options.salinity ?? 70,
      temperature: options.temperature ?? 22,
      constituents: [],
    },
    ambient: {
      depth,
      profile,
      uniform: options.profile === undefined,
      currentSpeed: 0.1,
      currentDirection: 90,
      bedSlope: 0,
      bedSlopeAzimuth: 0,
    },
    ambientCases: [],
    diffuser: {
      layout: "single",
      portCount: 1,
      portDiameter: 0.2,
      portDiameterNominal: 0.2,
      contraction: 1,
      portAngle: 60,
      portHeight: options.portHeight ?? 1,
      portSpacing: 0,
      portAzimuth: 0,
      diffuserAzimuth: 90,
      length: 0,
      flowSplit: [1],
    },
    mixingZone: { radius: 100, limits: [] },
    options: { nearFieldForEdge: "length-scale", farField: "conservative", addSlackWater: true },
    conversions: [],
  };
}

describe("propertiesFromScenario()", () => {
  it("uses the brine correlation for a 70 g/kg discharge, for both fluids, at the port's depth", () => {
    const stage = propertiesFromScenario(scenario({}));
    const pPort = pressureFromDepth(19);
    expect(stage.eos.info.name, "brine beyond 42 g/kg").toBe("Sharqawy 2010 + Nayar 2016");
    expect(stage.dischargeDensity, "discharge in situ at 19 m").toBe(densitySharqawyNayar(70, 22, pPort));
    expect(stage.ambientDensityAtPort, "ambient at 19 m, same EOS").toBe(densitySharqawyNayar(35, 20, pPort));
    expect(stage.densities.equationOfState, "contract carries the EOS info").toEqual(stage.eos.info);
  });

  it("computes g′ = g(ρ0 − ρa)/ρa with g = 9.80665 m/s² (standard gravity)", () => {
    const stage = propertiesFromScenario(scenario({}));
    const expected = (9.80665 * (stage.dischargeDensity - stage.ambientDensityAtPort)) / stage.ambientDensityAtPort;
    expect(stage.reducedGravity, "definition of reduced gravity").toBeCloseTo(expected, 14);
    expect(stage.densities.reducedGravity, "same in the result").toBe(stage.reducedGravity);
    // 70 vs 35 g/kg at ~20 °C: Δρ ≈ 27 kg/m³ → g′ ≈ 0.26 m/s² (order of magnitude, DERIVED).
    expect(stage.reducedGravity, "brine g′ order of magnitude").toBeGreaterThan(0.2);
    expect(stage.reducedGravity, "brine g′ order of magnitude").toBeLessThan(0.3);
  });

  it("uses TEOS-10 when discharge and ambient are within 0–42 g/kg", () => {
    const stage = propertiesFromScenario(scenario({ salinity: 40, temperature: 15 }));
    expect(stage.eos.info.name, "TEOS-10").toBe("TEOS-10");
    expect(stage.dischargeDensity, "TEOS-10 in situ").toBe(densityTeos10(40, 15, pressureFromDepth(19)));
  });

  it("keeps the profile's own depths plus the port depth and the seabed, ascending", () => {
    const profile: ProfilePoint[] = [
      { depth: 0, salinity: 34, temperature: 24 },
      { depth: 10, salinity: 35, temperature: 18 },
      { depth: 30, salinity: 35.5, temperature: 14 },
    ];
    const stage = propertiesFromScenario(scenario({ depth: 25, portHeight: 2, profile }));
    expect(stage.column.depths, "profile points inside the column, port at 23 m, seabed at 25 m").toEqual([
      0, 10, 23, 25,
    ]);
    expect(stage.column.depth, "water depth").toBe(25);
    expect(stage.column.currentSpeed, "current passed through").toBe(0.1);
    expect(stage.column.densities.length, "one density per depth").toBe(4);
  });

  it("interpolates the profile linearly in depth", () => {
    const profile: ProfilePoint[] = [
      { depth: 0, salinity: 34, temperature: 24 },
      { depth: 10, salinity: 35, temperature: 18 },
      { depth: 30, salinity: 35.5, temperature: 14 },
    ];
    const at = profileAtDepth(profile, 20);
    expect(at.salinity, "halfway between 35 and 35.5").toBeCloseTo(35.25, 12);
    expect(at.temperature, "halfway between 18 and 14").toBeCloseTo(16, 12);
    expect(profileAtDepth(profile, 50), "held constant below the last point").toEqual({
      salinity: 35.5,
      temperature: 14,
    });
    const stage = propertiesFromScenario(scenario({ depth: 25, portHeight: 2, profile }));
    const i = stage.column.depths.indexOf(23);
    expect(stage.column.salinities[i], "port-depth salinity").toBeCloseTo(35 + (13 / 20) * 0.5, 12);
    expect(stage.ambientDensityAtPort, "port-depth density equals the column's").toBe(stage.column.densities[i]);
  });

  it("gives denser water at the seabed than at the surface in a stable profile", () => {
    const profile: ProfilePoint[] = [
      { depth: 0, salinity: 34, temperature: 24 },
      { depth: 25, salinity: 35, temperature: 15 },
    ];
    const stage = propertiesFromScenario(scenario({ depth: 25, profile }));
    expect(stage.densities.ambientBottom, "stable stratification").toBeGreaterThan(stage.densities.ambientSurface);
  });

  it("does not reject a discharge lighter than the ambient: it returns a negative g′", () => {
    const stage = propertiesFromScenario(scenario({ salinity: 36, temperature: 35 }));
    expect(stage.reducedGravity, "buoyant discharge").toBeLessThan(0);
  });

  it("collects validity warnings for the discharge and once per code for the ambient", () => {
    const stage = propertiesFromScenario(scenario({ salinity: 130, temperature: 25 }));
    const codes = stage.warnings.map((w) => w.code);
    expect(codes, "130 g/kg discharge flagged").toContain("nayar-2016-salinity-out-of-range");
    expect(
      stage.warnings.every((w) => w.stage === "properties"),
      "stage tag",
    ).toBe(true);
    const hot = propertiesFromScenario(scenario({ salinity: 40, temperature: 95 }));
    expect(
      hot.warnings.map((w) => w.code),
      "95 °C under TEOS-10",
    ).toContain("teos10-temperature-out-of-range");
    const calm = propertiesFromScenario(scenario({ salinity: 40, temperature: 25 }));
    expect(calm.warnings, "nothing to say in range").toEqual([]);
  });

  it("clamps a port placed above the water surface and warns", () => {
    const stage = propertiesFromScenario(scenario({ depth: 5, portHeight: 8 }));
    expect(
      stage.warnings.map((w) => w.code),
      "port outside the column",
    ).toContain("port-outside-water-column");
    expect(stage.column.depths[0], "port clamped to the surface").toBe(0);
  });
});

describe("a statically unstable ambient column", () => {
  // Densities from Debian's python3-gsw (TEOS-10; IOC, SCOR & IAPSO 2010) at 35 g/kg and the port's
  // pressure (19.5 m): 1026.915 kg/m³ at 10 °C, 1024.726 kg/m³ at 20 °C, 1026.906 kg/m³ at 10.05 °C.
  const column = (bottomT: number) => [
    { depth: 0, salinity: 35, temperature: 10 },
    { depth: 20, salinity: 35, temperature: bottomT },
  ];

  it("is a serious properties warning with the density drop when warm water lies under cold", () => {
    const r = propertiesFromScenario(scenario({ profile: column(20), portHeight: 0.5, salinity: 40 }));
    expect(r.eos.info.name, "TEOS-10 chosen for these salinities").toBe("TEOS-10");
    const w = r.warnings.find((x) => x.code === "ambient-statically-unstable");
    expect(w, "warning raised").toBeDefined();
    expect(w!.severity, "serious, not info: it makes the case outside-scope").toBe("serious");
    expect(w!.stage, "properties stage").toBe("properties");
    expect(w!.value!, "drop ≈ 1026.915 − 1024.726 = 2.189 kg/m³ (python3-gsw)").toBeCloseTo(2.189, 2);
    expect(w!.message, "names the depths").toMatch(/20 m depth .* 0 m above/);
  });

  it("is not raised for a stable column or an inversion within profiler noise", () => {
    for (const bottomT of [10, 5, 10.05]) {
      // 10.05 °C under 10 °C: 0.009 kg/m³ lighter (python3-gsw), under the 0.02 kg/m³ tolerance.
      const r = propertiesFromScenario(scenario({ profile: column(bottomT) }));
      expect(
        r.warnings.some((x) => x.code === "ambient-statically-unstable"),
        `bottom at ${bottomT} °C`,
      ).toBe(false);
    }
  });

  it("counts an inversion spread over several small steps against the densest water above", () => {
    expect(
      staticInstability([0, 10, 20, 30], [1026, 1025.99, 1025.98, 1025.97]),
      "three 0.01 steps = 0.03 kg/m³",
    ).toEqual({ drop: expect.closeTo(0.03, 9), upperDepth: 0, lowerDepth: 30 });
    expect(staticInstability([0, 10, 20], [1025, 1026, 1027]), "density rising with depth is stable").toBeNull();
    expect(staticInstability([0, 10, 20], [1025, 1025.5, 1025.47]), "0.03 kg/m³ below the 10 m water").toEqual({
      drop: expect.closeTo(0.03, 9),
      upperDepth: 10,
      lowerDepth: 20,
    });
    expect(DENSITY_INVERSION_TOLERANCE, "tolerance").toBe(0.02);
  });
});

describe("densityOnce()", () => {
  it("evaluates the equation of state once per distinct water and returns its own values", () => {
    const eos = equationOfStateTeos10("test");
    let calls = 0;
    const counted = { ...eos, density: (s: number, t: number, p: number) => (calls++, eos.density(s, t, p)) };
    const rho = densityOnce(counted);
    const a = rho(35, 20, 10);
    expect(rho(35, 20, 10), "the same water again: the same value").toBe(a);
    expect(calls, "evaluated once").toBe(1);
    expect(a, "TEOS-10's own value").toBe(eos.density(35, 20, 10));
    expect(rho(35, 20, 0), "another pressure: its own value").toBe(eos.density(35, 20, 0));
    expect(rho(36, 20, 10), "another salinity: its own value").toBe(eos.density(36, 20, 10));
    expect(rho(35, 21, 10), "another temperature: its own value").toBe(eos.density(35, 21, 10));
    expect(calls, "one evaluation per distinct water").toBe(4);
  });
});
