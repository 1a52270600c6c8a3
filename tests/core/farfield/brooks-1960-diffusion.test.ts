import { describe, expect, it } from "vitest";
import {
  brooksDilutionFromDistance,
  brooksDilutionFromDistanceValidityIssues,
  brooksWidthFromDistance,
  FOUR_THIRDS_LAW_COEFFICIENT,
} from "../../../core/farfield/brooks-1960-diffusion";
import { erf } from "../../../core/farfield/erf";

describe("brooksDilutionFromDistance() — Brooks (1960) 4/3-law centreline dilution (as reproduced in Fischer et al. 1979 ch. 9, from memory)", () => {
  it("reduces to 1 at small distance (closed form: erf(∞) = 1)", () => {
    expect(brooksDilutionFromDistance({ distance: 0, initialWidth: 20, currentSpeed: 0.1 }), "x = 0").toBe(1);
    expect(brooksDilutionFromDistance({ distance: 1e-3, initialWidth: 20, currentSpeed: 0.1 }), "x → 0").toBeCloseTo(
      1,
      9,
    );
  });

  it("grows with distance and approaches the published large-x form S ≈ (√π/2)·√(((1+2βx/3b)³−1)/1.5)", () => {
    const b = 10;
    const u = 0.1;
    const beta = (12 * FOUR_THIRDS_LAW_COEFFICIENT * Math.pow(b, 4 / 3)) / (u * b);
    const x = 50_000;
    const grow = Math.pow(1 + ((2 / 3) * beta * x) / b, 3) - 1;
    // erf(z) ≈ 2z/√π for small z (Abramowitz & Stegun 7.1.5, first term, from memory).
    const asymptote = (Math.sqrt(Math.PI) / 2) * Math.sqrt(grow / 1.5);
    const got = brooksDilutionFromDistance({ distance: x, initialWidth: b, currentSpeed: u });
    expect(Math.abs(got / asymptote - 1), "large-x limit of the closed form").toBeLessThan(1e-3);
    let previous = 1;
    for (const d of [10, 100, 1000, 10_000]) {
      const s = brooksDilutionFromDistance({ distance: d, initialWidth: b, currentSpeed: u });
      expect(s, `dilution at ${d} m exceeds that nearer the source`).toBeGreaterThan(previous);
      previous = s;
    }
  });

  it("dilutes less in a faster current at the same distance (less time to diffuse)", () => {
    const slow = brooksDilutionFromDistance({ distance: 500, initialWidth: 10, currentSpeed: 0.05 });
    const fast = brooksDilutionFromDistance({ distance: 500, initialWidth: 10, currentSpeed: 0.5 });
    expect(fast, "travel time x/u is shorter in the faster current").toBeLessThan(slow);
  });

  it("credits no dilution and warns when there is no current (degenerate input)", () => {
    expect(brooksDilutionFromDistance({ distance: 100, initialWidth: 10, currentSpeed: 0 }), "no transport").toBe(1);
    const codes = brooksDilutionFromDistanceValidityIssues({ distance: 100, initialWidth: 10, currentSpeed: 0 }).map(
      (w) => w.code,
    );
    expect(codes, "the stagnant case is flagged").toContain("brooks-no-current");
  });

  it("widens the field as (1 + 2βx/3b)^{3/2}, starting from its initial width", () => {
    expect(brooksWidthFromDistance({ distance: 0, initialWidth: 12, currentSpeed: 0.1 }), "b(0) = b").toBe(12);
    expect(
      brooksWidthFromDistance({ distance: 300, initialWidth: 12, currentSpeed: 0.1 }),
      "wider downstream",
    ).toBeGreaterThan(12);
  });

  it("uses α_ε = 0.01 cm^(2/3)/s by default (Fischer et al. 1979 ch. 9, from memory)", () => {
    expect(FOUR_THIRDS_LAW_COEFFICIENT, "4.64e-4 m^(2/3)/s").toBeCloseTo(4.6416e-4, 7);
  });
});

describe("erf() — Abramowitz & Stegun 7.1.26", () => {
  it("matches tabulated values erf(0.5) = 0.5204999, erf(1) = 0.8427008, erf(2) = 0.9953223 (A&S Table 7.1, from memory)", () => {
    expect(Math.abs(erf(0.5) - 0.5204999), "erf(0.5)").toBeLessThan(2e-7);
    expect(Math.abs(erf(1) - 0.8427008), "erf(1)").toBeLessThan(2e-7);
    expect(Math.abs(erf(2) - 0.9953223), "erf(2)").toBeLessThan(2e-7);
    expect(erf(-1), "odd function").toBeCloseTo(-erf(1), 12);
    expect(erf(0), "erf(0) = 0").toBeCloseTo(0, 8);
  });
});
