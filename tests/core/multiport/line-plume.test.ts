import { describe, expect, it } from "vitest";
import {
  linePlumeDilutionFromFlux,
  linePlumeDilutionFromFluxValidityIssues,
  LINE_PLUME_MIN_COEFFICIENT,
} from "../../../core/multiport/line-plume";

describe("linePlumeDilutionFromFlux() — S_m = 0.27 b^{1/3} z/q (Fischer et al. 1979; Roberts et al. 1989, from memory)", () => {
  it("scales as z · g′^{1/3} · q^{−2/3}, the line-plume similarity law", () => {
    const s0 = linePlumeDilutionFromFlux(0.05, 0.3, 10);
    expect(linePlumeDilutionFromFlux(0.05, 0.3, 20) / s0, "doubling the height doubles S").toBeCloseTo(2, 12);
    expect(linePlumeDilutionFromFlux(0.05, 2.4, 10) / s0, "8 × g′ → 2 × S").toBeCloseTo(2, 12);
    expect(linePlumeDilutionFromFlux(0.4, 0.3, 10) / s0, "8 × q → S / 4").toBeCloseTo(0.25, 12);
  });

  it("uses the minimum-dilution coefficient 0.27 (Fischer et al. 1979, from memory, low confidence on 0.27 vs 0.38)", () => {
    expect(LINE_PLUME_MIN_COEFFICIENT, "minimum, not average").toBe(0.27);
  });

  it("never returns less than 1 and handles zero flux or height (degenerate inputs)", () => {
    expect(linePlumeDilutionFromFlux(0, 0.3, 10), "no flow").toBe(1);
    expect(linePlumeDilutionFromFlux(0.05, 0.3, 0), "no height").toBe(1);
    expect(linePlumeDilutionFromFlux(10, 0.01, 0.1), "very short fall").toBe(1);
  });

  it("flags heights within five source lengths q^{2/3}/b^{1/3}", () => {
    expect(
      linePlumeDilutionFromFluxValidityIssues(1, 0.1, 0.5).map((w) => w.code),
      "close to the source",
    ).toContain("line-plume-near-source");
    expect(linePlumeDilutionFromFluxValidityIssues(0.01, 0.3, 20), "far from the source").toEqual([]);
  });

  it("puts the near-source limit at exactly five source lengths, l_q = q^{2/3}/b^{1/3} with b = |g′|·q (dimensional analysis)", () => {
    // q = 0.2 m²/s, g′ = 0.5 m/s²: b = 0.1 m³/s³, l_q = 0.2^{2/3}/0.1^{1/3} = 0.73681 m, 5·l_q = 3.6840 m.
    const fiveLq = (5 * Math.pow(0.2, 2 / 3)) / Math.cbrt(0.1);
    expect(fiveLq).toBeCloseTo(3.684, 3);
    const below = linePlumeDilutionFromFluxValidityIssues(0.2, 0.5, fiveLq * 0.99);
    expect(below, "just inside five source lengths").toHaveLength(1);
    expect(linePlumeDilutionFromFluxValidityIssues(0.2, 0.5, fiveLq * 1.01), "just beyond").toEqual([]);
    expect(
      linePlumeDilutionFromFluxValidityIssues(0.2, -0.5, fiveLq * 0.99),
      "the sign of g′ does not matter",
    ).toHaveLength(1);
    const w = below[0]!;
    expect(w.severity, "a rough estimate, not a refusal").toBe("info");
    expect(w.parameter).toBe("height");
    expect(w.value).toBeCloseTo(fiveLq * 0.99, 12);
    expect(w.range?.[0], "the range starts at 5·l_q").toBeCloseTo(fiveLq, 12);
    expect(w.range?.[1]).toBe(Infinity);
    expect(w.stage).toBe("multiport");
    expect(w.source).toMatch(/Fischer et al\. \(1979\)/);
    expect(w.message, "names the height and the limit in metres").toContain(
      "3.65 m is under five source lengths (3.68 m)",
    );
  });

  it("gives no near-source warning when the flux or the buoyancy is zero (nothing to scale by)", () => {
    expect(linePlumeDilutionFromFluxValidityIssues(0.2, 0, 0.01), "no buoyancy").toEqual([]);
    expect(linePlumeDilutionFromFluxValidityIssues(0, 0.5, 0.01), "no flow").toEqual([]);
    expect(linePlumeDilutionFromFluxValidityIssues(-0.2, 0.5, 0.01), "negative flow").toEqual([]);
  });

  it("returns the formula's value, S = 0.27·(g′q)^{1/3}·z/q, for a worked case (Fischer et al. 1979, coefficient from memory)", () => {
    // q = 0.05 m²/s, g′ = 0.3 m/s², z = 10 m: b = 0.015, b^{1/3} = 0.246621, S = 0.27·0.246621·10/0.05 = 13.3175.
    expect(linePlumeDilutionFromFlux(0.05, 0.3, 10)).toBeCloseTo(13.3175, 3);
    expect(linePlumeDilutionFromFlux(0.05, -0.3, 10), "dense or buoyant: same magnitude").toBeCloseTo(13.3175, 3);
    expect(linePlumeDilutionFromFlux(0.05, 0.3, 10, 0.38), "the mean coefficient").toBeCloseTo(18.7431, 3);
    expect(linePlumeDilutionFromFlux(0.05, 0.3, -10), "negative height").toBe(1);
    expect(linePlumeDilutionFromFlux(0.05, 0, 10), "no buoyancy").toBe(1);
  });
});
