/**
 * Salinity scales (SP ↔ SA for reference composition) and salinity from TDS.
 */
import { describe, expect, it } from "vitest";
import {
  absoluteSalinityFromPractical,
  absoluteSalinityFromPracticalValidityIssues,
  densitySharqawyNayar,
  densityTeos10,
  practicalSalinityFromAbsolute,
  REFERENCE_COMPOSITION_FACTOR,
  salinityFromTds,
  salinityFromTdsValidityIssues,
  tdsFromSalinity,
} from "../../../core/properties";
import grid from "../../reference/teos10-grid.json";

describe("absoluteSalinityFromPractical()", () => {
  it("matches gsw.SR_from_SP (python3-gsw, recorded in tests/reference/teos10-grid.json) to 1e-12 g/kg", () => {
    for (const [sp, sr] of grid.salinity.rows as number[][]) {
      expect(Math.abs(absoluteSalinityFromPractical(sp) - sr), `SP ${sp}`).toBeLessThan(1e-12);
    }
  });
  it("uses the reference-composition factor 35.16504/35 (TEOS-10 definition)", () => {
    expect(REFERENCE_COMPOSITION_FACTOR, "uPS").toBe(35.16504 / 35);
  });
  it("round-trips with practicalSalinityFromAbsolute()", () => {
    for (const sp of [0, 2, 33.5, 35, 42, 80]) {
      expect(practicalSalinityFromAbsolute(absoluteSalinityFromPractical(sp)), `SP ${sp}`).toBeCloseTo(sp, 12);
    }
  });
  it("notes Practical Salinity outside the PSS-78 range 2–42", () => {
    expect(absoluteSalinityFromPracticalValidityIssues(35), "in range").toEqual([]);
    expect(absoluteSalinityFromPracticalValidityIssues(70)[0]?.code, "brine given as SP").toBe(
      "practical-salinity-out-of-range",
    );
  });
});

describe("salinityFromTds()", () => {
  it("solves S = TDS/ρ(S): the result reproduces the TDS it came from (DERIVED)", () => {
    for (const tds of [0, 1000, 36000, 72000, 125000]) {
      const s = salinityFromTds(tds, 25, 0);
      expect(s * densitySharqawyNayar(s, 25, 0), `TDS ${tds} mg/L`).toBeCloseTo(tds, 6);
    }
  });
  it("is the inverse of tdsFromSalinity(), also under pressure and with another density function", () => {
    for (const s of [0, 10, 35.16504, 70, 110]) {
      expect(salinityFromTds(tdsFromSalinity(s, 18, 30), 18, 30), `S ${s}`).toBeCloseTo(s, 9);
    }
    const s = 35;
    expect(
      salinityFromTds(tdsFromSalinity(s, 10, 0, densityTeos10), 10, 0, densityTeos10),
      "TEOS-10 density",
    ).toBeCloseTo(s, 9);
  });
  it("gives about 35.2 g/kg for standard seawater's ≈ 36 000 mg/L at 25 °C", () => {
    // 35.16504 g/kg × 1023.3 kg/m³ ≈ 35 985 mg/L (DERIVED from the EOS-80 check value 1023.34306 kg/m³).
    expect(salinityFromTds(35985, 25, 0), "standard seawater").toBeCloseTo(35.165, 1);
  });
  it("flags TDS beyond the density correlation's range", () => {
    expect(salinityFromTdsValidityIssues(72000), "typical brine").toEqual([]);
    expect(salinityFromTdsValidityIssues(200000)[0]?.code, "too salty").toBe("tds-out-of-range");
  });
});
