/**
 * Brooks (1960) 4/3-law passive diffusion: closed-form values and guards. The reference numbers are the
 * centreline solution c_max/c₀ = erf√((3/2)/((1 + (2/3)βx/b)³ − 1)), β = 12·α_ε·b^{4/3}/(u·b), and the
 * width b(x) = b·(1 + (2/3)βx/b)^{3/2} (Brooks, N.H. 1960, "Diffusion of sewage effluent in an ocean
 * current", Proc. 1st Int. Conf. Waste Disposal in the Marine Environment, pp 246–267; reproduced in
 * Fischer et al. 1979, Mixing in Inland and Coastal Waters, ch. 9 — formula from memory), evaluated with
 * the C library's erf (/usr/bin/python3 math.erf) and α_ε = 0.01 cm^{2/3}/s (Fischer et al. 1979 ch. 9,
 * from memory). The guards (no transport, no width, no diffusion) are conventions, common practice, no source.
 */
import { describe, expect, it } from "vitest";
import {
  BROOKS_1960_SOURCE,
  brooksDilutionFromDistance,
  brooksDilutionFromDistanceValidityIssues,
  brooksDilutionInField,
  brooksFieldFromInput,
  brooksWidthFromDistance,
  brooksWidthInField,
  FOUR_THIRDS_LAW_COEFFICIENT,
} from "../../../core/farfield/brooks-1960-diffusion";

/** (x m, b m, u m/s, S_ff, b(x) m): closed form evaluated outside the project (see header). */
const CLOSED_FORM: [number, number, number, number, number][] = [
  [100, 10, 0.1, 1.75662810008, 24.149534157],
  [1000, 10, 0.1, 19.5372393947, 270],
  [500, 50, 0.2, 1.59416855361, 109.264583127],
  [2000, 30, 0.05, 47.9876012251, 1989.53224102],
];

/** α_ε = 0.002 cm^{2/3}/s in m^{2/3}/s, the low end of the typical range (Fischer et al. 1979 ch. 9, from memory). */
const ALPHA_LOW = 0.002 * Math.pow(0.01, 2 / 3);

describe("brooksDilutionFromDistance() and brooksWidthFromDistance() — closed-form values", () => {
  it.each(CLOSED_FORM)("x = %s m, b = %s m, u = %s m/s: S_ff = %s, width %s m", (x, b, u, s, w) => {
    const input = { distance: x, initialWidth: b, currentSpeed: u };
    // S = 1/erf(z): the erf bound 1.5e-7 (A&S 1964 eq. 7.1.26, from memory) allows |ΔS| ≤ S²·1.5e-7.
    const allowed = s * s * 1.5e-7 + 1e-9 * s;
    expect(Math.abs(brooksDilutionFromDistance(input) - s), "dilution").toBeLessThanOrEqual(allowed);
    expect(brooksWidthFromDistance(input) / w, "width, relative").toBeCloseTo(1, 9);
  });

  it("scales the growth rate with α_ε: five times α_ε at x equals the default at 5x (β ∝ α_ε)", () => {
    const at = (distance: number, alpha?: number) =>
      brooksDilutionFromDistance({ distance, initialWidth: 20, currentSpeed: 0.1, alpha });
    expect(at(200, 5 * ALPHA_LOW) / at(200), "5 × 0.002 = 0.01 cm^(2/3)/s is the default").toBeCloseTo(1, 12);
    expect(at(200, ALPHA_LOW) / at(40), "α/5 at x is the default at x/5").toBeCloseTo(1, 9);
    const w = (distance: number, alpha?: number) =>
      brooksWidthFromDistance({ distance, initialWidth: 20, currentSpeed: 0.1, alpha });
    expect(w(200, ALPHA_LOW) / w(40), "width: α/5 at x is the default at x/5").toBeCloseTo(1, 9);
  });

  it("gives the field constants (2/3)β for dilution and width alike", () => {
    const f = brooksFieldFromInput({ initialWidth: 10, currentSpeed: 0.1 });
    const beta = (12 * FOUR_THIRDS_LAW_COEFFICIENT * Math.pow(10, 4 / 3)) / (0.1 * 10);
    expect(f.dilutionRate / ((2 / 3) * beta), "(2/3)β, dilution").toBeCloseTo(1, 12);
    expect(f.widthRate / ((2 / 3) * beta), "(2/3)β, width").toBeCloseTo(1, 12);
    expect([f.b, f.u, f.alpha], "inputs kept").toEqual([10, 0.1, FOUR_THIRDS_LAW_COEFFICIENT]);
    expect(brooksDilutionInField(f, 1000), "field form equals the single-distance form").toBe(
      brooksDilutionFromDistance({ distance: 1000, initialWidth: 10, currentSpeed: 0.1 }),
    );
    expect(brooksWidthInField(f, 1000), "field form equals the single-distance form").toBe(
      brooksWidthFromDistance({ distance: 1000, initialWidth: 10, currentSpeed: 0.1 }),
    );
  });
});

describe("Brooks (1960) guards — no transport, no width or no diffusion credit nothing", () => {
  const ok = { distance: 300, initialWidth: 10, currentSpeed: 0.1 };
  it.each([
    ["distance 0", { ...ok, distance: 0 }],
    ["negative distance", { ...ok, distance: -50 }],
    ["zero width", { ...ok, initialWidth: 0 }],
    ["negative width", { ...ok, initialWidth: -10 }],
    ["no current", { ...ok, currentSpeed: 0 }],
    ["reverse current", { ...ok, currentSpeed: -0.1 }],
    ["α_ε = 0", { ...ok, alpha: 0 }],
    ["negative α_ε", { ...ok, alpha: -1e-4 }],
    ["NaN distance", { ...ok, distance: NaN }],
  ])("dilution is exactly 1 (%s)", (_name, input) => {
    expect(brooksDilutionFromDistance(input), "no passive dilution").toBe(1);
  });

  it.each([
    ["distance 0", { ...ok, distance: 0 }, 10],
    ["negative distance", { ...ok, distance: -50 }, 10],
    ["no current", { ...ok, currentSpeed: 0 }, 10],
    ["reverse current", { ...ok, currentSpeed: -0.1 }, 10],
    ["α_ε = 0", { ...ok, alpha: 0 }, 10],
    ["negative α_ε", { ...ok, alpha: -1e-4 }, 10],
    ["zero width", { ...ok, initialWidth: 0 }, 0],
    ["negative width", { ...ok, initialWidth: -10 }, 0],
  ])("width stays at its initial value, never negative (%s)", (_name, input, width) => {
    expect(brooksWidthFromDistance(input), "no widening").toBe(width);
  });
});

describe("brooksDilutionFromDistanceValidityIssues() — α_ε range 0.002–0.01 cm^(2/3)/s (Fischer et al. 1979 ch. 9, from memory)", () => {
  const at = (alpha: number | undefined, currentSpeed = 0.1) =>
    brooksDilutionFromDistanceValidityIssues({ distance: 100, initialWidth: 10, currentSpeed, alpha });

  it("is silent for the default and for α_ε at either end of the range (0.1 % tolerance)", () => {
    expect(at(undefined), "default α_ε").toEqual([]);
    expect(at(ALPHA_LOW), "0.002 cm^(2/3)/s").toEqual([]);
    expect(at(FOUR_THIRDS_LAW_COEFFICIENT), "0.01 cm^(2/3)/s").toEqual([]);
    expect(at(ALPHA_LOW * 0.999), "exactly 0.1 % below the low end").toEqual([]);
    expect(at(ALPHA_LOW * 0.9995), "inside the tolerance").toEqual([]);
    expect(at(FOUR_THIRDS_LAW_COEFFICIENT * 1.0005), "inside the tolerance above").toEqual([]);
    expect(at(FOUR_THIRDS_LAW_COEFFICIENT * 1.001), "exactly 0.1 % above the high end").toEqual([]);
  });

  it("flags α_ε outside the range as info, naming the parameter, value, range and source", () => {
    for (const alpha of [ALPHA_LOW * 0.998, FOUR_THIRDS_LAW_COEFFICIENT * 1.002]) {
      const w = at(alpha);
      expect(w.length, `α_ε = ${alpha}`).toBe(1);
      expect(w[0], `α_ε = ${alpha}`).toMatchObject({
        code: "brooks-alpha-outside-typical",
        severity: "info",
        parameter: "alpha",
        value: alpha,
        source: BROOKS_1960_SOURCE,
        stage: "far-field",
      });
      expect(w[0]!.range![0] / ALPHA_LOW, "low end").toBeCloseTo(1, 12);
      expect(w[0]!.range![1], "high end").toBe(FOUR_THIRDS_LAW_COEFFICIENT);
      expect(w[0]!.message, "the value in m^(2/3)/s and the range in cm^(2/3)/s").toContain(
        `${alpha.toExponential(2)} m^(2/3)/s is outside the typical 0.002–0.01 cm^(2/3)/s`,
      );
    }
  });

  it("flags a missing current as info, naming the speed; a current of any size is not flagged", () => {
    for (const u of [0, -0.2]) {
      const w = at(undefined, u);
      expect(w.length, `u = ${u}`).toBe(1);
      expect(w[0], `u = ${u}`).toMatchObject({
        code: "brooks-no-current",
        severity: "info",
        parameter: "ambient.currentSpeed",
        value: u,
        source: BROOKS_1960_SOURCE,
        stage: "far-field",
      });
      expect(w[0]!.message, "says no passive dilution is credited").toContain("no passive dilution is credited");
    }
    expect(at(undefined, 1e-6), "a tiny current").toEqual([]);
  });
});
