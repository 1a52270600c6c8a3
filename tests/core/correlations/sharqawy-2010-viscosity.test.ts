/**
 * Seawater viscosity (Sharqawy, Lienhard & Zubair 2010, eqs. 22–23, coefficients from memory), used only
 * for the port Reynolds number.
 */
import { describe, it, expect } from "vitest";
import { viscosityFromST, viscosityFromSTValidityIssues } from "../../../core/correlations/sharqawy-2010-viscosity";
import { assertRelative } from "../../helpers/assert";

describe("viscosityFromST()", () => {
  it("gives pure water's viscosity at 20 °C and 40 °C", () => {
    // Pure water: 1.0016 mPa·s at 20 °C and 0.6527 mPa·s at 40 °C (IAPWS 2008 viscosity formulation, as
    // tabulated in handbooks; values from memory). The fit's stated accuracy is about ±1.5 %.
    assertRelative(viscosityFromST(0, 20), 1.0016e-3, 0.015, "μ_w(20 °C)");
    assertRelative(viscosityFromST(0, 40), 0.6527e-3, 0.015, "μ_w(40 °C)");
  });

  it("rises with salinity: seawater at 35 g/kg and 20 °C is about 7–8 % more viscous than pure water", () => {
    // Seawater 35 g/kg, 20 °C: about 1.08 mPa·s (Sharqawy et al. 2010 review tables; from memory, ±3 %).
    assertRelative(viscosityFromST(35, 20), 1.08e-3, 0.03, "μ_sw(35 g/kg, 20 °C)");
    expect(viscosityFromST(70, 20) > viscosityFromST(35, 20), "brine more viscous than seawater").toBe(true);
  });

  it("falls as temperature rises at any salinity", () => {
    for (const s of [0, 35, 70, 120]) {
      expect(viscosityFromST(s, 30) < viscosityFromST(s, 10), `monotone in temperature at ${s} g/kg`).toBe(true);
    }
  });

  it("warns outside its fitted range and not inside it", () => {
    expect(viscosityFromSTValidityIssues(60, 20), "inside: no warning").toEqual([]);
    expect(
      viscosityFromSTValidityIssues(170, 20).map((w) => w.code),
      "salinity above 150 g/kg",
    ).toEqual(["viscosity-salinity-range"]);
    expect(
      viscosityFromSTValidityIssues(35, -3).map((w) => w.code),
      "temperature below 0 °C",
    ).toEqual(["viscosity-temperature-range"]);
  });
});
