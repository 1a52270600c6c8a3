/**
 * densityTeos10() against Debian's python3-gsw over the reference grid (tests/reference/teos10-grid.json,
 * written by tests/reference/make-teos10-grid.py; library name and version are inside the file).
 */
import { describe, expect, it } from "vitest";
import { densityTeos10, densityTeos10ValidityIssues, specificVolumeTeos10 } from "../../../core/properties";
import grid from "../../reference/teos10-grid.json";

const rows = grid.density.rows as number[][];

describe("densityTeos10()", () => {
  it("the reference grid records the library that produced it and spans 0–42 g/kg × 0–35 °C × 0–100 m", () => {
    expect(grid.library.name, "generator must record the library").toContain("gsw");
    expect(grid.library.version, "generator must record the version").toMatch(/^\d+\.\d+/);
    const sa = rows.map((r) => r[0]);
    const t = rows.map((r) => r[1]);
    const depth = rows.map((r) => r[2]);
    expect([Math.min(...sa), Math.max(...sa)], "salinity span").toEqual([0, 42]);
    expect([Math.min(...t), Math.max(...t)], "temperature span").toEqual([0, 35]);
    expect([Math.min(...depth), Math.max(...depth)], "depth span").toEqual([0, 100]);
  });

  it("matches gsw.rho_t_exact to 0.01 kg/m³ at every grid point (source: python3-gsw, recorded in the grid)", () => {
    let worst = 0;
    for (const [sa, t, , p, rhoExact] of rows) {
      worst = Math.max(worst, Math.abs(densityTeos10(sa, t, p) - rhoExact));
    }
    expect(worst, "required agreement with gsw").toBeLessThan(0.01);
    // Same Gibbs function, so round-off agreement is expected; a coefficient typo would show here first.
    expect(worst, "agreement expected for an exact transcription of the Gibbs function").toBeLessThan(1e-8);
  });

  it("matches gsw.rho(SA, CT_from_t(SA, t, p), p), the 75-term expression, to 0.01 kg/m³ (python3-gsw)", () => {
    let worst = 0;
    for (const [sa, t, , p, , rho75] of rows) worst = Math.max(worst, Math.abs(densityTeos10(sa, t, p) - rho75));
    expect(worst, "75-term expression differs from the Gibbs function by its fit error only").toBeLessThan(0.01);
  });

  it("is the reciprocal of the specific volume", () => {
    expect(densityTeos10(35, 10, 50) * specificVolumeTeos10(35, 10, 50), "ρ·v = 1").toBeCloseTo(1, 14);
  });

  it("treats a round-off negative salinity as zero rather than returning NaN", () => {
    expect(densityTeos10(-1e-12, 10, 0), "√SA guard").toBeCloseTo(densityTeos10(0, 10, 0), 9);
  });
});

describe("densityTeos10ValidityIssues()", () => {
  it("is silent inside 0–42 g/kg, −2–40 °C, 0–10 000 dbar", () => {
    expect(densityTeos10ValidityIssues(35, 15, 50, "ambient"), "no warnings in range").toEqual([]);
  });
  it("warns at 70 g/kg and at 95 °C, naming the water, the value and the range", () => {
    const salty = densityTeos10ValidityIssues(70, 20, 0, "discharge");
    expect(
      salty.map((w) => w.code),
      "salinity warning",
    ).toEqual(["teos10-salinity-out-of-range"]);
    expect(salty[0].range, "range carried").toEqual([0, 42]);
    expect(salty[0].parameter, "parameter path").toBe("discharge.salinity");
    const hot = densityTeos10ValidityIssues(35, 95, 0, "discharge");
    expect(
      hot.map((w) => w.code),
      "temperature warning",
    ).toEqual(["teos10-temperature-out-of-range"]);
    expect(hot[0].value, "value carried").toBe(95);
  });
  it("reports non-finite inputs instead of throwing", () => {
    const issues = densityTeos10ValidityIssues(Number.NaN, 10, 0, "ambient");
    expect(issues[0]?.code, "NaN salinity").toBe("properties-input-not-finite");
    expect(issues[0]?.severity, "NaN is serious").toBe("serious");
  });
});
