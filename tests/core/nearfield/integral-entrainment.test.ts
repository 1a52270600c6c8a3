/**
 * Specification of the entrainment closure used by the integral jet model,
 * core/correlations/lee-cheung-1990-entrainment.ts (Lee & Cheung 1990, top-hat form).
 */
import { describe, expect, it } from "vitest";
import {
  ENTRAINMENT_LEE_CHEUNG_1990,
  entrainmentLeeCheung1990Alpha,
  entrainmentLeeCheung1990Rate,
  entrainmentLeeCheung1990ValidityIssues,
} from "../../../core/correlations/lee-cheung-1990-entrainment";
import { nearFieldIntegral } from "../../../core/nearfield/integral";

describe("entrainmentLeeCheung1990Alpha()", () => {
  it("gives the pure-jet top-hat value √2·0.057 without buoyancy or current", () => {
    const a = entrainmentLeeCheung1990Alpha(1, 0, 1, 0, 0.1);
    // 0.057 Gaussian jet value (Lee & Cheung 1990, from memory); Fischer et al. 1979 give 0.0535 ± 0.0025.
    expect(a / Math.SQRT2, "Gaussian-equivalent jet coefficient").toBeCloseTo(0.057, 12);
  });

  it("has a pure-plume fixed point at the Gaussian plume coefficient 0.0833 ± 0.0042 (Fischer et al. 1979, from memory)", () => {
    // Top-hat plume with entrainment α_T has local Froude number F_T² = 5/(8 α_T) (DERIVED from the
    // top-hat plume equations). Iterate α ← closure(F_T²) to its fixed point.
    let alpha = 0.1;
    for (let i = 0; i < 200; i++) {
      const fT2 = 5 / (8 * alpha);
      // closure in terms of ΔU, g′, b: choose b = 1, g′ = 1, ΔU = √F_T²
      alpha = entrainmentLeeCheung1990Alpha(Math.sqrt(fT2), 0, 1, 1, 1);
    }
    expect(Math.abs(alpha / Math.SQRT2 - 0.0833), "plume coefficient within Fischer et al.'s ±0.0042").toBeLessThan(
      0.0042,
    );
  });

  it("adds no plume term when buoyancy opposes the motion (rising limb of a dense jet)", () => {
    const rising = entrainmentLeeCheung1990Alpha(1, 0, -0.8, 0.5, 0.3);
    expect(rising, "opposing buoyancy: jet value").toBeCloseTo(ENTRAINMENT_LEE_CHEUNG_1990.topHat * 0.057, 12);
    const falling = entrainmentLeeCheung1990Alpha(1, 0, 0.8, 0.5, 0.3);
    expect(falling, "aiding buoyancy raises α").toBeGreaterThan(rising);
  });

  it("damps shear entrainment in co-flow but never amplifies it in counter-flow", () => {
    const still = entrainmentLeeCheung1990Alpha(1, 0, 0, 0, 0.1);
    expect(entrainmentLeeCheung1990Alpha(1, 0.2, 0, 0, 0.1), "co-flow: divided by 1 + 5·0.2 = 2").toBeCloseTo(
      still / 2,
      12,
    );
    expect(entrainmentLeeCheung1990Alpha(1, -0.2, 0, 0, 0.1), "counter-flow: unchanged").toBeCloseTo(still, 12);
  });
});

describe("entrainmentLeeCheung1990Rate()", () => {
  it("uses the projected-area forced entrainment 2·b·u_a for a jet across the current when it dominates", () => {
    // slow jet (V = 0.01 m/s) across a 0.5 m/s current: forced term 2·1·0.5 = 1 m²/s ≫ shear term
    expect(entrainmentLeeCheung1990Rate(0.01, 1, 0.5, 0, 0, 0), "forced term").toBeCloseTo(1, 12);
  });

  it("uses the shear term 2π·b·α·ΔU when it dominates (maximum hypothesis)", () => {
    const b = 0.1;
    const expected = 2 * Math.PI * b * Math.SQRT2 * 0.057 * 4;
    expect(entrainmentLeeCheung1990Rate(4, b, 0, 0, 0, 0), "stagnant pure jet").toBeCloseTo(expected, 12);
  });

  it("has no forced entrainment for a jet aligned with the current", () => {
    const aligned = entrainmentLeeCheung1990Rate(1, 0.1, 0.5, 1, 0, 0);
    const shearOnly = 2 * Math.PI * 0.1 * ((Math.SQRT2 * 0.057) / (1 + (5 * 0.5) / 0.5)) * 0.5;
    expect(aligned, "co-flowing jet: damped shear entrainment only").toBeCloseTo(shearOnly, 12);
  });
});

describe("entrainmentLeeCheung1990ValidityIssues()", () => {
  it("is silent inside the validated range (60°, F = 20, no current)", () => {
    expect(
      entrainmentLeeCheung1990ValidityIssues({ froude: 20, angle: 60, currentSpeed: 0, velocity: 4 }),
      "no issues",
    ).toEqual([]);
  });

  it("flags Froude number, angle and weak crossflow with ranges and sources", () => {
    const codes = entrainmentLeeCheung1990ValidityIssues({ froude: 60, angle: 90, currentSpeed: 0.01, velocity: 4 });
    expect(codes.map((w) => w.code).sort(), "three issues").toEqual([
      "integral-angle-outside-validation",
      "integral-froude-outside-validation",
      "integral-weak-crossflow",
    ]);
    for (const w of codes) {
      expect(w.source, `${w.code} names its source`).toBeTruthy();
      expect(w.stage, `${w.code} belongs to the integral stage`).toBe("integral");
    }
  });
});

describe("nearFieldIntegral(): maximum-rise event", () => {
  it("locates the maximum of the upper edge (no sampled edge lies above it)", () => {
    const jet = {
      diameter: 0.2,
      flow: (4 * Math.PI * 0.04) / 4,
      velocity: 4,
      density: 1050,
      salinity: 70,
      temperature: 20,
      angle: 45,
      azimuth: 0,
      portHeight: 1,
      reducedGravity: 0.25,
      froude: 4 / Math.sqrt(0.05),
    };
    const column = {
      depth: 30,
      depths: [0, 30],
      densities: [1025, 1025],
      salinities: [35, 35],
      temperatures: [20, 20],
      currentSpeed: 0,
      currentDirection: 0,
    };
    const rows: number[][] = [];
    const r = nearFieldIntegral(jet, column, {
      relTol: 1e-12,
      absTol: 1e-13,
      sink: { begin() {}, end() {}, sample: (s, x, y, z, b) => rows.push([s, x, y, z, b]) },
    });
    let best = -Infinity;
    for (let i = 1; i < rows.length - 1; i++) {
      // axis direction from neighbouring samples (central difference): edge = z + b·√(1 − t_z²)
      const ds = rows[i + 1][0] - rows[i - 1][0];
      const tz = (rows[i + 1][3] - rows[i - 1][3]) / ds;
      best = Math.max(best, rows[i][3] + rows[i][4] * Math.sqrt(Math.max(0, 1 - tz * tz)));
    }
    expect(r.maxRiseHeight!, "event edge ≥ every sampled edge (to finite-difference accuracy)").toBeGreaterThan(
      best - 1e-4,
    );
    expect(r.maxRiseHeight! - best, "and sampled edges come close to it").toBeLessThan(5e-3);
  });
});
