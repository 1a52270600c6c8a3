/**
 * Specification of core/ode/dormand-prince-45.ts: a 5th-order step with a 4th-order error
 * estimate and a 4th-order dense output. Checked on problems with closed-form solutions
 * (exact solutions: DERIVED); the orders are those stated by Dormand & Prince (1980) and
 * Hairer, Nørsett & Wanner (1993, §II.5–II.6).
 */
import { describe, expect, it } from "vitest";
import { stepperDormandPrince45 } from "../../../core/ode/dormand-prince-45";

type P = { k: number };
// y' = k·y, exact y = e^{k t}
const expRhs = (_t: number, y: Float64Array, out: Float64Array, p: P) => {
  out[0] = p.k * y[0];
};
// harmonic oscillator y0' = y1, y1' = −y0, exact (sin t, cos t) from (0, 1)
const oscRhs = (_t: number, y: Float64Array, out: Float64Array) => {
  out[0] = y[1];
  out[1] = -y[0];
};

function fixedStepError(h: number): number {
  const st = stepperDormandPrince45(oscRhs, 2);
  st.reset(0, Float64Array.of(0, 1), {});
  const yOut = new Float64Array(2);
  const atol = Float64Array.of(1, 1);
  const n = Math.round(1 / h);
  for (let i = 0; i < n; i++) {
    st.attempt(h, yOut, atol, 0);
    st.accept();
  }
  return Math.abs(st.y[0] - Math.sin(1));
}

describe("stepperDormandPrince45()", () => {
  it("converges with global order 5 on the harmonic oscillator", () => {
    const e1 = fixedStepError(0.1);
    const e2 = fixedStepError(0.05);
    const order = Math.log2(e1 / e2);
    expect(order, "observed order from halving h (Dormand & Prince 1980: order 5)").toBeGreaterThan(4.6);
    expect(order, "observed order must not exceed ~5 by much (a wrong tableau often shows order 1–4)").toBeLessThan(
      5.6,
    );
    expect(e2, "absolute error at t = 1 with h = 0.05").toBeLessThan(1e-8);
  });

  it("returns an error norm that shrinks like h^5 (embedded 4th-order estimate)", () => {
    const norms = [0.2, 0.1].map((h) => {
      const st = stepperDormandPrince45(expRhs, 1);
      st.reset(0, Float64Array.of(1), { k: 1 });
      return st.attempt(h, new Float64Array(1), Float64Array.of(1), 0);
    });
    const ratio = Math.log2(norms[0] / norms[1]);
    expect(ratio, "local error estimate of a 4th-order embedded pair scales as h^5").toBeGreaterThan(4.5);
    expect(ratio, "local error estimate scaling").toBeLessThan(5.5);
  });

  it("dense output is 4th-order accurate inside a step and exact at both ends", () => {
    const errAt = (h: number) => {
      const st = stepperDormandPrince45(expRhs, 1);
      st.reset(0, Float64Array.of(1), { k: 1 });
      st.attempt(h, new Float64Array(1), Float64Array.of(1), 0);
      st.accept();
      const out = new Float64Array(1);
      st.interpolate(0, out);
      expect(out[0], "theta = 0 reproduces the step start").toBe(1);
      st.interpolate(1, out);
      expect(out[0], "theta = 1 reproduces the accepted step end").toBeCloseTo(st.y[0], 14);
      st.interpolate(0.4, out);
      return Math.abs(out[0] - Math.exp(0.4 * h));
    };
    const e1 = errAt(0.4);
    const e2 = errAt(0.2);
    expect(Math.log2(e1 / e2), "dense output local error ~ h^5 (continuous extension of order 4)").toBeGreaterThan(4.3);
    expect(e2, "dense output error at h = 0.2").toBeLessThan(1e-7);
  });

  it("counts right-hand-side evaluations: 1 at reset, 6 per attempt (first same as last)", () => {
    const st = stepperDormandPrince45(expRhs, 1);
    st.reset(0, Float64Array.of(1), { k: -1 });
    st.attempt(0.1, new Float64Array(1), Float64Array.of(1e-6), 1e-6);
    st.accept();
    st.attempt(0.1, new Float64Array(1), Float64Array.of(1e-6), 1e-6);
    expect(st.evaluations, "FSAL: 1 + 6 + 6").toBe(13);
  });

  it("reports a non-finite step as an infinite error (reject), never as accept", () => {
    const blow = (_t: number, y: Float64Array, out: Float64Array) => {
      out[0] = y[0] > 1.5 ? NaN : y[0] * y[0];
    };
    const st = stepperDormandPrince45(blow, 1);
    st.reset(0, Float64Array.of(1), {});
    const err = st.attempt(0.9, new Float64Array(1), Float64Array.of(1e-6), 1e-6);
    expect(err, "NaN inside the step must read as an infinite error norm").toBe(Infinity);
  });
});
