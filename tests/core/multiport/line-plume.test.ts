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
});
