/**
 * erf() against tabulated values. Reference values: Abramowitz, M., Stegun, I.A., Handbook of Mathematical
 * Functions, NBS Applied Mathematics Series 55 (1964), Table 7.1 (ten-figure values, from memory; the same
 * digits are given by the C library's erf through /usr/bin/python3 math.erf). The implementation is the
 * rational approximation of A&S eq. 7.1.26, whose published error bound is |ε(x)| ≤ 1.5×10⁻⁷ for x ≥ 0
 * (A&S 1964 eq. 7.1.26, from memory).
 */
import { describe, expect, it } from "vitest";
import { erf } from "../../../core/farfield/erf";

/** A&S 1964 eq. 7.1.26 error bound (from memory). */
const BOUND = 1.5e-7;

/** (x, erf x) from A&S 1964 Table 7.1 (from memory), ten decimals. */
const TABLE: [number, number][] = [
  [0.05, 0.0563719778],
  [0.1, 0.112462916],
  [0.2, 0.2227025892],
  [0.3, 0.3286267595],
  [0.5, 0.5204998778],
  [0.75, 0.7111556337],
  [1.0, 0.8427007929],
  [1.25, 0.9229001283],
  [1.5, 0.9661051465],
  [2.0, 0.995322265],
  [2.5, 0.999593048],
  [3.0, 0.9999779095],
];

describe("erf() — Abramowitz & Stegun (1964) eq. 7.1.26", () => {
  it.each(TABLE)("erf(%s) matches A&S Table 7.1 within the 1.5e-7 bound of eq. 7.1.26", (x, value) => {
    expect(Math.abs(erf(x) - value), `erf(${x}) = ${erf(x)}`).toBeLessThanOrEqual(BOUND);
  });

  it.each(TABLE)("is odd: erf(−%s) = −erf(x) within the same bound of the table value", (x, value) => {
    expect(erf(-x), `erf(−${x}) is minus erf(${x})`).toBe(-erf(x));
    expect(Math.abs(erf(-x) + value), `erf(−${x}) against −${value}`).toBeLessThanOrEqual(BOUND);
  });

  it("is 0 at 0 to within the bound, never negative there, and ±1 at ±∞", () => {
    expect(erf(0), "erf(0) ≥ 0").toBeGreaterThanOrEqual(0);
    expect(erf(0), "erf(0) = 0 within the bound").toBeLessThanOrEqual(BOUND);
    expect(erf(Infinity), "erf(∞) = 1").toBe(1);
    expect(erf(-Infinity), "erf(−∞) = −1").toBe(-1);
  });

  it("follows the small-argument series erf(x) ≈ 2x/√π (A&S 1964 eq. 7.1.5, first term, from memory)", () => {
    for (const x of [1e-3, 1e-2]) {
      const series = (2 / Math.sqrt(Math.PI)) * (x - x ** 3 / 3);
      expect(Math.abs(erf(x) - series), `erf(${x})`).toBeLessThanOrEqual(BOUND);
    }
  });

  it("stays within [−1, 1] and rises monotonically over 0–6 (sampled every 0.01)", () => {
    let previous = -Infinity;
    for (let i = 0; i <= 600; i++) {
      const e = erf(i / 100);
      expect(e, `erf(${i / 100}) ≤ 1`).toBeLessThanOrEqual(1);
      expect(e, `erf(${i / 100}) not below erf at a smaller x`).toBeGreaterThanOrEqual(previous);
      previous = e;
    }
    expect(Math.abs(erf(4) - 1), "erf(4) = 1 − 1.5e-8 (A&S Table 7.1, from memory)").toBeLessThanOrEqual(BOUND);
  });
});
