/**
 * The brine correlation: Sharqawy, Lienhard & Zubair (2010) Eq. (8) at atmospheric pressure with the
 * Nayar, Sharqawy, Banchik & Lienhard (2016) pressure factor.
 *
 * No printed table value from either paper was found (see tests/check-values/sharqawy-2010-density.json);
 * the correlation is therefore checked against published EOS-80 values (check-values.test.ts) and against
 * TEOS-10 (python3-gsw) inside 0–42 g/kg at the papers' stated accuracy, as stated in each test.
 */
import { describe, expect, it } from "vitest";
import {
  densitySharqawy2010,
  densitySharqawyNayar,
  densitySharqawyNayarValidityIssues,
  pressureFactorNayar2016,
  SHARQAWY_2010_RELATIVE_ACCURACY,
} from "../../../core/properties";
import grid from "../../reference/teos10-grid.json";

const rows = grid.density.rows as number[][];

describe("densitySharqawy2010()", () => {
  it("agrees with TEOS-10 (gsw.rho_t_exact, p = 0) within its stated ±0.1 % over 0–42 g/kg, 0–35 °C", () => {
    // Accuracy ±0.1 %: Sharqawy et al. (2010), Table 2 (CONFIRMED via the authors' library header).
    for (const [sa, t, depth, , rho] of rows) {
      if (depth !== 0) continue;
      const rel = Math.abs(densitySharqawy2010(sa, t) / rho - 1);
      expect(rel, `S ${sa} g/kg, t ${t} °C`).toBeLessThan(SHARQAWY_2010_RELATIVE_ACCURACY);
    }
  });

  it("grows with salinity and, above 4 °C, falls with temperature", () => {
    expect(densitySharqawy2010(70, 20), "saltier is denser").toBeGreaterThan(densitySharqawy2010(35, 20));
    expect(densitySharqawy2010(70, 30), "warmer is lighter").toBeLessThan(densitySharqawy2010(70, 20));
  });

  it("cross-check beyond 42 g/kg: within ±0.21 % of the TEOS-10 Gibbs function's high-salinity extension to 120 g/kg", () => {
    // Not an oracle: both are fits. ±0.21 % is the accuracy stated for the brine range (56–180 g/kg) in the
    // authors' library header (CONFIRMED); Feistel (2008) extends the saline Gibbs function to 120 g/kg at
    // atmospheric pressure (Deep-Sea Research I 55:1639–1671). Values: python3-gsw rho_t_exact.
    for (const [sa, t, , rho] of grid.brine.rows as number[][]) {
      const rel = Math.abs(densitySharqawy2010(sa, t) / rho - 1);
      expect(rel, `S ${sa} g/kg, t ${t} °C`).toBeLessThan(0.0021);
    }
  });
});

describe("densitySharqawyNayar()", () => {
  it("equals the atmospheric density at zero sea pressure (F_P = 1 at P = P0)", () => {
    expect(pressureFactorNayar2016(70, 25, 0), "no correction at the surface").toBe(1);
    expect(densitySharqawyNayar(70, 25, 0), "same as Eq. (8)").toBe(densitySharqawy2010(70, 25));
  });

  it("agrees with TEOS-10 in situ (python3-gsw) within its stated ±0.14 % over the 0–100 m grid", () => {
    // ±0.14 % for 0–56 g/kg, P up to 12 MPa: authors' library header for Nayar et al. (2016) (CONFIRMED).
    for (const [sa, t, , p, rho] of rows) {
      const rel = Math.abs(densitySharqawyNayar(sa, t, p) / rho - 1);
      expect(rel, `S ${sa}, t ${t}, p ${p}`).toBeLessThan(0.0014);
    }
  });

  it("gives the TEOS-10 compression between the surface and 100 m to within 10 %", () => {
    // Compression Δρ over 0–100 dbar is ≈ 0.45 kg/m³ for seawater (python3-gsw grid); the correlation's
    // compressibility is fitted to Safarov et al. (2012) data, so the increments should agree closely.
    const surface = rows.find((r) => r[0] === 35 && r[1] === 15 && r[2] === 0)!;
    const deep = rows.find((r) => r[0] === 35 && r[1] === 15 && r[2] === 100)!;
    const gswIncrement = deep[4] - surface[4];
    const increment = densitySharqawyNayar(35, 15, deep[3]) - densitySharqawyNayar(35, 15, 0);
    expect(Math.abs(increment / gswIncrement - 1), `Δρ ${increment} vs ${gswIncrement}`).toBeLessThan(0.1);
  });

  it("makes brine at 70 g/kg denser with depth, and denser than 35 g/kg seawater at the same depth", () => {
    expect(densitySharqawyNayar(70, 25, 100), "compression").toBeGreaterThan(densitySharqawyNayar(70, 25, 0));
    expect(densitySharqawyNayar(70, 25, 50), "brine is dense").toBeGreaterThan(densitySharqawyNayar(35, 25, 50) + 20);
  });
});

describe("densitySharqawyNayarValidityIssues()", () => {
  it("is silent for a typical brine (70 g/kg, 25 °C, surface)", () => {
    expect(densitySharqawyNayarValidityIssues(70, 25, 0, "discharge"), "in range").toEqual([]);
  });
  it("notes the wider accuracy band for brine above 56 g/kg under pressure", () => {
    const issues = densitySharqawyNayarValidityIssues(70, 25, 50, "discharge");
    expect(
      issues.map((w) => w.code),
      "info on extrapolated compressibility",
    ).toEqual(["nayar-2016-pressure-extrapolated"]);
    expect(issues[0].severity, "informational").toBe("info");
  });
  it("warns at 130 g/kg (above the 120 g/kg of Nayar 2016) and seriously at 170 g/kg (above 160 g/kg of Sharqawy 2010)", () => {
    expect(
      densitySharqawyNayarValidityIssues(130, 25, 0, "discharge").map((w) => w.code),
      "130 g/kg",
    ).toEqual(["nayar-2016-salinity-out-of-range"]);
    const issues = densitySharqawyNayarValidityIssues(170, 25, 0, "discharge");
    expect(
      issues.map((w) => w.code),
      "170 g/kg",
    ).toContain("sharqawy-2010-salinity-out-of-range");
    expect(issues.find((w) => w.code === "sharqawy-2010-salinity-out-of-range")?.severity, "serious").toBe("serious");
  });
  it("accepts 95 °C (inside 0–100 °C) but flags 130 °C, where P0 would be the saturation pressure", () => {
    expect(densitySharqawyNayarValidityIssues(35, 95, 0, "discharge"), "95 °C in range").toEqual([]);
    expect(
      densitySharqawyNayarValidityIssues(35, 130, 0, "discharge").map((w) => w.code),
      "130 °C",
    ).toEqual(["nayar-2016-temperature-above-boiling"]);
  });
  it("warns beyond 12 MPa and for negative pressure", () => {
    expect(
      densitySharqawyNayarValidityIssues(35, 10, 1500, "ambient").map((w) => w.code),
      "deep",
    ).toEqual(["nayar-2016-pressure-out-of-range"]);
    expect(
      densitySharqawyNayarValidityIssues(35, 10, -1, "ambient").map((w) => w.code),
      "negative",
    ).toEqual(["nayar-2016-pressure-out-of-range"]);
  });
});
