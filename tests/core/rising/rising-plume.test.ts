/**
 * Rising plumes (discharges lighter than the receiving water) against published plume and buoyant-jet laws.
 *
 * - Pure-plume limit: centreline dilution S = B^(1/3)·z^(5/3)/(11·Q), from the plume's centreline buoyancy
 *   g′_m = 11·B^(2/3)·z^(−5/3) — Fischer, List, Koh, Imberger & Brooks (1979), Mixing in Inland and Coastal
 *   Waters, ch. 9, table 9.1 (from memory); the z^(5/3) similarity law of Morton, Taylor & Turner (1956).
 * - Pure-jet limit: S = M^(1/2)·z/(5.64·Q) (= z/(5.0·d)) — Fischer et al. (1979), table 9.1 (from memory).
 * - Trap height in linear stratification: z_max = 3.8·(B/N³)^(1/4) — Morton, Taylor & Turner (1956), Proc.
 *   R. Soc. Lond. A 234:1–23 (the classical dimensionless result; often written 5.0·(F/N³)^(1/4) with
 *   F = B/π; from memory). The constant scales as α^(−1/2) with the plume entrainment coefficient, whose
 *   published values spread by about ±20 % (Fischer et al. 1979 give α = 0.0833 ± 0.0042 for Gaussian
 *   profiles, other experiments up to about 0.1; from memory), i.e. about ±10 % on the constant: the band
 *   checked is 3.8 ± 10 %.
 */
import { describe, it, expect } from "vitest";
import { risingIntegral } from "../../../core/rising/integral";
import { risingLengthScale } from "../../../core/rising/length-scale";
import {
  roundJetDilution,
  roundPlumeDilution,
  roundSourceFluxes,
  trapHeightFromStratification,
} from "../../../core/rising/plume-laws";
import type { AmbientColumn, JetSource, PathPoint } from "../../../core/nearfield/types";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";

const G = 9.80665;

/** A linearly stratified (or uniform, N = 0) column of the given depth. */
function column(depth: number, n: number, currentSpeed = 0): AmbientColumn {
  const depths: number[] = [];
  const densities: number[] = [];
  for (let i = 0; i <= 400; i++) {
    const d = (depth * i) / 400;
    depths.push(d);
    densities.push(1025 * (1 + (n * n * (d - depth)) / G));
  }
  return {
    depth,
    depths,
    densities,
    salinities: depths.map(() => 35),
    temperatures: depths.map(() => 20),
    currentSpeed,
    currentDirection: 0,
  };
}

function verticalJet(d: number, u: number, gPrime: number, portHeight = 0.5): JetSource {
  const q = (u * Math.PI * d * d) / 4;
  return {
    diameter: d,
    flow: q,
    velocity: u,
    density: 1025 * (1 + gPrime / G),
    salinity: 35,
    temperature: 20,
    angle: 90,
    azimuth: 0,
    portHeight,
    reducedGravity: gPrime,
    froude: u / Math.sqrt(Math.abs(gPrime) * d),
  };
}

/** Centreline dilution where the path reaches height z (linear between path points). */
function dilutionAtHeight(path: readonly PathPoint[], z: number): number {
  for (let i = 1; i < path.length; i++) {
    if (path[i]!.z >= z) {
      const a = path[i - 1]!;
      const b = path[i]!;
      return a.dilution + ((z - a.z) / (b.z - a.z)) * (b.dilution - a.dilution);
    }
  }
  return Number.NaN;
}

describe("published laws, by hand", () => {
  it("round plume: B = 0.01 m⁴/s³, Q = 0.05 m³/s, z = 10 m → S = 0.01^(1/3)·10^(5/3)/(11·0.05) = 18.18", () => {
    const f = { q: 0.05, m: 0.05, b: 0.01, lM: 1 };
    expect(roundPlumeDilution(f, 10)).toBeCloseTo(18.18, 1);
  });
  it("round jet: d = 0.1 m, z = 5 m → S = z/(5.0·d) = 10.0", () => {
    const u = 3;
    const q = (u * Math.PI * 0.01) / 4;
    expect(roundJetDilution(roundSourceFluxes(q, u, 0), 5)).toBeCloseTo(5 / (5.0 * 0.1), 0);
  });
  it("trap height: B = 0.01 m⁴/s³, N = 0.02 s⁻¹ → 3.8·(0.01/8e-6)^(1/4) = 22.6 m", () => {
    expect(trapHeightFromStratification(0.01, 0.02 * 0.02)).toBeCloseTo(3.8 * Math.pow(1250, 0.25), 6);
    expect(trapHeightFromStratification(0.01, 0.0004)).toBeCloseTo(22.6, 1);
    expect(trapHeightFromStratification(0.01, 0)).toBe(Infinity);
  });
});

describe("integral model, rising: the same equations meet the classical limits", () => {
  it("pure-plume limit: dilution within 10 % of B^(1/3)·z^(5/3)/(11·Q) far above l_M (Fischer et al. 1979)", () => {
    const jet = verticalJet(0.5, 0.05, -0.2); // l_M ≈ 0.07 m
    const r = risingIntegral(jet, column(100, 0));
    const f = roundSourceFluxes(jet.flow, jet.velocity, jet.reducedGravity);
    expect(f.lM).toBeLessThan(0.1);
    for (const z of [20, 40, 80]) {
      const ratio = dilutionAtHeight(r.path!, z) / roundPlumeDilution(f, z);
      expect(ratio, `z = ${z} m`).toBeGreaterThan(0.9);
      expect(ratio, `z = ${z} m`).toBeLessThan(1.1);
    }
  });

  it("pure-jet limit: dilution within 10 % of M^(1/2)·z/(5.64·Q) for negligible buoyancy (Fischer et al. 1979)", () => {
    const jet = verticalJet(0.1, 3, -1e-7);
    const r = risingIntegral(jet, column(100, 0));
    const f = roundSourceFluxes(jet.flow, jet.velocity, jet.reducedGravity);
    for (const z of [5, 10, 20]) {
      const ratio = dilutionAtHeight(r.path!, z) / roundJetDilution(f, z);
      expect(ratio, `z = ${z} m`).toBeGreaterThan(0.9);
      expect(ratio, `z = ${z} m`).toBeLessThan(1.1);
    }
  });

  it("reaches the surface in unstratified water: a surface field, upper edge at the surface", () => {
    const jet = verticalJet(0.5, 0.05, -0.2);
    const r = risingIntegral(jet, column(30, 0));
    expect(r.risingField.kind).toBe("surface");
    expect(r.maxRiseHeight).toBeCloseTo(30 - 0.5, 6);
    expect(r.events!.some((e) => e.kind === "surface-contact")).toBe(true);
    expect(r.nearFieldDilution).toBeGreaterThan(1);
    expect(r.impactDilution).toBeNull();
  });

  it.each([0.01, 0.02])(
    "traps below the surface in linear stratification N = %s s⁻¹ at 3.8·(B/N³)^(1/4) ± 10 % (Morton, Taylor & Turner 1956)",
    (n) => {
      const jet = verticalJet(0.5, 0.05, -0.2);
      const r = risingIntegral(jet, column(200, n));
      const b = Math.abs(jet.reducedGravity) * jet.flow;
      const ratio = r.maxRiseHeight! / Math.pow(b / n ** 3, 0.25);
      expect(r.risingField.kind).toBe("trapped");
      expect(ratio).toBeGreaterThan(3.8 * 0.9);
      expect(ratio).toBeLessThan(3.8 * 1.1);
      // The trap level (buoyancy vanishes) lies below the maximum rise, at roughly three-quarters of it.
      const trap = r.risingField.trapHeight!;
      expect(r.events!.some((e) => e.kind === "neutral-buoyancy")).toBe(true);
      expect(trap / r.maxRiseHeight!).toBeGreaterThan(0.6);
      expect(trap / r.maxRiseHeight!).toBeLessThan(0.85);
    },
  );

  it("the length-scale method gives the same trap height law and agrees with the integral model within 15 %", () => {
    const jet = verticalJet(0.5, 0.05, -0.2);
    const ls = risingLengthScale(jet, column(200, 0.02));
    const ig = risingIntegral(jet, column(200, 0.02));
    const b = Math.abs(jet.reducedGravity) * jet.flow;
    expect(ls.risingField.kind).toBe("trapped");
    expect(ls.maxRiseHeight! / (3.8 * Math.pow(b / 0.02 ** 3, 0.25))).toBeCloseTo(1, 4);
    expect(Math.abs(ls.maxRiseHeight! / ig.maxRiseHeight! - 1)).toBeLessThan(0.15);
  });
});

/** A warm blend of brine and cooling water: saltier than the sea but lighter (invented). */
function warmBlend(over: { ports?: number; spacing?: number; profile?: boolean } = {}) {
  return {
    format: "brinefield-scenario",
    version: 1,
    name: "Warm blend",
    discharge: { flow: 1.2, salinity: 41, temperature: 33 },
    ambient: over.profile
      ? {
          depth: 40,
          profile: [
            { depth: 0, salinity: 37, temperature: 27 },
            { depth: 40, salinity: 38.5, temperature: 14 },
          ],
          currentSpeed: 0.15,
        }
      : { depth: 20, salinity: 37, temperature: 20, currentSpeed: 0.15 },
    diffuser: over.ports
      ? { portCount: over.ports, portDiameter: 0.3, portAngle: 90, portHeight: 1, portSpacing: over.spacing ?? 5 }
      : { portCount: 1, portDiameter: 0.5, portAngle: 90, portHeight: 1 },
    mixingZone: {
      radius: 100,
      limits: [
        { constituent: "salinity", maxIncrease: 1 },
        { constituent: "temperature", maxIncrease: 2 },
      ],
    },
  };
}
function scenarioOf(raw: unknown) {
  const r = parseScenario(raw);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.scenario;
}

describe("the pipeline computes a discharge lighter than the sea", () => {
  it("runs with both methods side by side and gives a verdict (not a refusal)", () => {
    const r = runScenario(scenarioOf(warmBlend()));
    expect(r.densities.reducedGravity).toBeLessThan(0);
    expect(r.nearField.map((m) => m.method)).toEqual(["length-scale", "integral"]);
    for (const m of r.nearField) {
      expect(m.available, m.method).toBe(true);
      expect(m.risingField?.kind, m.method).toBe("surface");
      expect(m.maxRiseHeight, m.method).toBeCloseTo(19, 6);
      expect(m.nearFieldDilution!, m.method).toBeGreaterThan(1);
    }
    expect(["meets", "exceeds"]).toContain(r.compliance.verdict);
    expect(r.compliance.scopeReasons).toEqual([]);
    expect(Number.isFinite(r.port.froude)).toBe(true);
    // Beyond the plume the surface field is carried by passive diffusion in the current.
    expect(r.mixingZone.dilution).toBeGreaterThan(Math.min(...r.nearField.map((m) => m.nearFieldDilution!)));
    expect(r.mixingZone.series.stage).toContain("passive-diffusion");
  });

  it("traps in a stratified profile: trapped field, background taken at the trap level", () => {
    const r = runScenario(scenarioOf(warmBlend({ profile: true })));
    const integral = r.nearField.find((m) => m.method === "integral")!;
    expect(integral.risingField!.kind).toBe("trapped");
    expect(integral.maxRiseHeight!).toBeLessThan(39);
    const sal = r.mixingZone.constituents.find((c) => c.constituent === "salinity")!;
    expect(sal.background).toBeGreaterThan(37);
    expect(sal.background).toBeLessThan(38.5);
  });

  it("multiport: closely spaced rising plumes merge into a line plume and dilute less; widely spaced ones do not", () => {
    const close = runScenario(scenarioOf(warmBlend({ ports: 6, spacing: 1.5 })));
    const apart = runScenario(scenarioOf(warmBlend({ ports: 6, spacing: 40 })));
    expect(close.multiport.regime).toBe("merged-line-source");
    expect(close.multiport.dilutionFactor).toBeLessThan(1);
    expect(apart.multiport.regime).toBe("independent");
    expect(apart.multiport.dilutionFactor).toBe(1);
    expect(close.mixingZone.dilution).toBeLessThan(apart.mixingZone.dilution);
  });
});

describe("the report draws a rising plume", () => {
  it("titles the near field as a rising plume, states where it spreads and marks the field in the side view", async () => {
    const { reportHtml } = await import("../../../core/report");
    const raw = warmBlend({ profile: true });
    const r = runScenario(scenarioOf(raw));
    const text = reportHtml(r, { scenarioFile: raw }, { generatedAt: "2026-12-03T00:00:00Z" });
    expect(text).toMatch(/Near field: rising plume from the mean port/);
    expect(text).toMatch(/id="rising-plume"/);
    expect(text).toMatch(/trapped field \(trap level\)/);
  });
});
