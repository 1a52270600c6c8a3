/**
 * Entrainment laws at fixed points. E(Ri) = (0.08 − 0.1·Ri)/(1 + 5·Ri) for Ri < 0.8, else 0 (Turner, J.S.
 * 1986, J. Fluid Mech. 173:431–471 — formula from memory; cut-off Ri = 0.8 from Ellison, T.H. & Turner, J.S.
 * 1959, J. Fluid Mech. 6:423–448, p. 423). Bed-stirred entrainment u_e/u* = 2.5/Ri* (Kato, H. & Phillips,
 * O.M. 1969, J. Fluid Mech. 37:643–655 — K = 2.5 from memory), held at its Ri* = 10 value below 10
 * (a guard, judgement). The expected values are the formulas worked by hand.
 */
import { describe, expect, it } from "vitest";
import { entrainmentFromRichardson } from "../../../core/farfield/turner-1986-entrainment";
import { bedEntrainmentFromRichardson } from "../../../core/farfield/kato-phillips-1969-entrainment";

describe("entrainmentFromRichardson() — Turner (1986) values (from memory)", () => {
  it.each([
    [0.1, 0.07 / 1.5],
    [0.2, 0.06 / 2],
    [0.4, 0.04 / 3],
    [0.6, 0.02 / 4],
    [0.79, 0.001 / 4.95],
  ])("E(%s) = %s", (ri, e) => {
    expect(entrainmentFromRichardson(ri), `E(${ri})`).toBeCloseTo(e, 14);
  });

  it("is zero from the cut-off on, for an undefined Ri, and E(0) for any negative Ri", () => {
    expect(entrainmentFromRichardson(0.80001), "just past the cut-off").toBe(0);
    expect(entrainmentFromRichardson(1), "critical flow Ri = 1").toBe(0);
    expect(entrainmentFromRichardson(NaN), "undefined Ri: nothing entrained").toBe(0);
    expect(entrainmentFromRichardson(-2), "clamped to Ri = 0").toBe(0.08);
    expect(entrainmentFromRichardson(0), "E(0) exactly").toBe(0.08);
  });
});

describe("bedEntrainmentFromRichardson() — Kato & Phillips (1969) u_e/u* = 2.5/Ri* (from memory)", () => {
  it.each([
    [10, 0.25],
    [12.5, 0.2],
    [100, 0.025],
    [9.99, 0.25],
    [-5, 0.25],
  ])("u_e/u*(Ri* = %s) = %s", (ri, ratio) => {
    expect(bedEntrainmentFromRichardson(ri), `Ri* = ${ri}`).toBeCloseTo(ratio, 14);
  });

  it("holds a strongly negative Ri* at the guard value rather than returning zero", () => {
    expect(bedEntrainmentFromRichardson(-Infinity), "guard, not the no-stirring zero").toBe(0.25);
  });
});
