/**
 * pressureFromDepth() against python3-gsw p_from_z (tests/reference/teos10-grid.json).
 */
import { describe, expect, it } from "vitest";
import {
  depthFromPressure,
  gravityFromLatitude,
  pressureFromDepth,
  pressureFromDepthValidityIssues,
} from "../../../core/properties";
import grid from "../../reference/teos10-grid.json";

describe("pressureFromDepth()", () => {
  it("agrees with gsw.p_from_z to 0.05 dbar for 0–1000 m at latitudes 0–90° (source: python3-gsw)", () => {
    for (const [depth, latitude, p] of grid.pressure.rows as number[][]) {
      expect(Math.abs(pressureFromDepth(depth, latitude) - p), `depth ${depth} m, latitude ${latitude}°`).toBeLessThan(
        0.05,
      );
    }
  });

  it("uses 45° when no latitude is given", () => {
    expect(pressureFromDepth(80), "default latitude").toBe(pressureFromDepth(80, 45));
  });

  it("is zero at the surface and a little more than 1 dbar per metre near the surface", () => {
    expect(pressureFromDepth(0), "surface").toBe(0);
    // ρg/10⁴ ≈ 1028 × 9.8 / 10⁴ ≈ 1.007 dbar/m (common practice, no source).
    const perMetre = pressureFromDepth(10) / 10;
    expect(perMetre, "dbar per metre").toBeGreaterThan(1.0);
    expect(perMetre, "dbar per metre").toBeLessThan(1.02);
  });

  it("round-trips with depthFromPressure()", () => {
    for (const d of [0.5, 10, 75, 400, 2000]) {
      expect(depthFromPressure(pressureFromDepth(d, 30), 30), `depth ${d} m`).toBeCloseTo(d, 8);
    }
  });

  it("gravity rises from equator to pole (GRS80: 9.780327 → ≈ 9.832 m/s²)", () => {
    expect(gravityFromLatitude(0), "equator, from memory").toBeCloseTo(9.780327, 6);
    expect(gravityFromLatitude(90), "pole, from memory").toBeCloseTo(9.8322, 3);
  });

  it("warns for a negative depth or an impossible latitude", () => {
    expect(
      pressureFromDepthValidityIssues(-5).map((w) => w.code),
      "negative depth",
    ).toEqual(["depth-out-of-range"]);
    expect(
      pressureFromDepthValidityIssues(10, 120).map((w) => w.code),
      "latitude",
    ).toEqual(["latitude-out-of-range"]);
    expect(pressureFromDepthValidityIssues(10, 30), "in range").toEqual([]);
  });
});
