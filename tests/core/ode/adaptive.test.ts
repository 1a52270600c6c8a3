/**
 * Specification of core/ode/adaptive.ts: error-controlled integration, event location on the
 * dense output, and guards that always return. Exact solutions are DERIVED (closed form).
 */
import { describe, expect, it } from "vitest";
import { integrateAdaptive, type OdeEvent } from "../../../core/ode/adaptive";
import { stepperDormandPrince45 } from "../../../core/ode/dormand-prince-45";

const osc = (_t: number, y: Float64Array, out: Float64Array) => {
  out[0] = y[1];
  out[1] = -y[0];
};
const opts = (over: Partial<Parameters<typeof integrateAdaptive>[5]> = {}) => ({
  rtol: 1e-9,
  atol: Float64Array.of(1e-12, 1e-12),
  h0: 0.01,
  hMin: 1e-14,
  hMax: 1,
  maxSteps: 100000,
  tMax: 10 * Math.PI,
  ...over,
});

describe("integrateAdaptive()", () => {
  it("integrates the harmonic oscillator over five periods to the requested accuracy", () => {
    const st = stepperDormandPrince45(osc, 2);
    const r = integrateAdaptive(st, osc, {}, 0, Float64Array.of(0, 1), opts());
    expect(r.reason, "runs to tMax").toBe("t-max");
    expect(r.t, "final t equals tMax").toBeCloseTo(10 * Math.PI, 12);
    expect(Math.abs(r.y[0] - Math.sin(10 * Math.PI)), "sin(10π) = 0 (exact)").toBeLessThan(1e-7);
    expect(Math.abs(r.y[1] - 1), "cos(10π) = 1 (exact)").toBeLessThan(1e-7);
    expect(r.steps, "adaptive: far fewer steps than a fixed 1e-3 grid").toBeLessThan(3000);
  });

  it("locates a descending zero crossing (sin t = 0 at t = π) and stops there when terminal", () => {
    const st = stepperDormandPrince45(osc, 2);
    const events: OdeEvent<object>[] = [{ fn: (_t, y) => y[0], direction: -1, terminal: true }];
    const r = integrateAdaptive(st, osc, {}, 0, Float64Array.of(0, 1), opts(), events);
    expect(r.reason, "terminal event stops the run").toBe("event");
    expect(Math.abs(r.t - Math.PI), "root of sin at π (exact)").toBeLessThan(1e-9);
    expect(Math.abs(r.y[0]), "state at the event lies on the event surface").toBeLessThan(1e-9);
  });

  it("records every non-terminal crossing in order, respecting the direction filter", () => {
    const st = stepperDormandPrince45(osc, 2);
    const events: OdeEvent<object>[] = [
      { fn: (_t, y) => y[0], direction: 1, terminal: false }, // upward crossings at 2π, 4π, …
      { fn: (_t, y) => y[1], direction: 0, terminal: false }, // cos zero both ways: π/2, 3π/2, …
    ];
    const r = integrateAdaptive(st, osc, {}, 0, Float64Array.of(0, 1), opts({ tMax: 4.25 * Math.PI }), events);
    const up = r.events.filter((e) => e.index === 0).map((e) => e.t);
    const both = r.events.filter((e) => e.index === 1).map((e) => e.t);
    expect(
      up.length,
      "upward sin crossings in (0, 4.25π]: 2π and 4π (t = 0 starts on the surface, not a crossing)",
    ).toBe(2);
    expect(Math.abs(up[0] - 2 * Math.PI), "first upward crossing at 2π").toBeLessThan(1e-8);
    expect(both.length, "cos crossings at π/2, 3π/2, 5π/2, 7π/2").toBe(4);
    for (let i = 1; i < r.events.length; i++) {
      expect(r.events[i].t, "events reported in order of t").toBeGreaterThanOrEqual(r.events[i - 1].t);
    }
  });

  it("returns 'max-steps' instead of running on when the step budget is exhausted", () => {
    const st = stepperDormandPrince45(osc, 2);
    const r = integrateAdaptive(st, osc, {}, 0, Float64Array.of(0, 1), opts({ maxSteps: 5 }));
    expect(r.reason, "step guard").toBe("max-steps");
    expect(r.steps, "exactly the budget").toBe(5);
  });

  it("returns 'step-underflow' at a finite-time blow-up (y' = y², y(0) = 1, singular at t = 1)", () => {
    const blow = (_t: number, y: Float64Array, out: Float64Array) => {
      out[0] = y[0] * y[0];
    };
    const st = stepperDormandPrince45(blow, 1);
    const r = integrateAdaptive(st, blow, {}, 0, Float64Array.of(1), {
      rtol: 1e-8,
      atol: Float64Array.of(1e-10),
      h0: 0.01,
      hMin: 1e-10,
      hMax: 1,
      maxSteps: 100000,
      tMax: 2,
    });
    expect(r.reason, "the step-size guard fires near the singularity").toBe("step-underflow");
    expect(r.t, "stops just before t = 1 (exact blow-up time)").toBeLessThan(1);
    expect(r.t, "and close to it").toBeGreaterThan(0.99);
  });

  it("lets the step callback stop the run", () => {
    const st = stepperDormandPrince45(osc, 2);
    let calls = 0;
    const r = integrateAdaptive(st, osc, {}, 0, Float64Array.of(0, 1), opts(), [], () => ++calls < 3);
    expect(r.reason, "callback returned false").toBe("callback");
    expect(calls, "called once per accepted step").toBe(3);
  });
});

describe("integrateAdaptive() at a kink of the right-hand side and with slope events", () => {
  // y' = cos t + 3·max(0, t − 1): the derivative of f jumps at t = 1. Exact: y(3) = sin 3 + 1.5·(3 − 1)² (DERIVED).
  const kink = (t: number, _y: Float64Array, out: Float64Array) => {
    out[0] = Math.cos(t) + (t > 1 ? 3 * (t - 1) : 0);
  };
  const exact = Math.sin(3) + 6;
  const kinkOpts = {
    rtol: 1e-6,
    atol: Float64Array.of(1e-6),
    h0: 0.37,
    hMin: 1e-14,
    hMax: 0.7,
    maxSteps: 10000,
    tMax: 3,
  };

  it("ends a step at a restart event's predicted crossing and restarts there: accurate, no rejected step", () => {
    const restart: OdeEvent<object>[] = [
      { fn: (t) => t - 1, direction: 1, terminal: false, restart: true, rate: () => 1 },
    ];
    const withRestart = integrateAdaptive(
      stepperDormandPrince45(kink, 1),
      kink,
      {},
      0,
      Float64Array.of(0),
      kinkOpts,
      restart,
    );
    const plain = integrateAdaptive(stepperDormandPrince45(kink, 1), kink, {}, 0, Float64Array.of(0), kinkOpts);
    expect(Math.abs(withRestart.y[0] - exact), "y(3) to the requested accuracy").toBeLessThan(2e-6);
    expect(withRestart.rejected, "no rejected step with the restart at t = 1").toBe(0);
    expect(Math.abs(plain.y[0] - exact), "without the restart the kink spoils the accuracy").toBeGreaterThan(1e-5);
    expect(plain.rejected, "and steps straddling it are rejected").toBeGreaterThan(0);
    expect(withRestart.events, "the kink is reported once").toHaveLength(1);
    expect(Math.abs(withRestart.events[0]!.t - 1), "at t = 1").toBeLessThan(1e-9);
  });

  it("passes the dense output's derivative to slope events inside a step (maximum of sin at π/2)", () => {
    const calls: number[] = [];
    const oscCounted = (t: number, y: Float64Array, out: Float64Array) => {
      calls.push(t);
      osc(t, y, out);
    };
    const st = stepperDormandPrince45(oscCounted, 2);
    // d/dt sin t = y[1] in the state, but the event reads the slope only from dy.
    const events: OdeEvent<object>[] = [{ fn: (_t, _y, _p, dy) => dy![0], direction: -1, terminal: true, slope: true }];
    const r = integrateAdaptive(st, oscCounted, {}, 0, Float64Array.of(0, 1), opts(), events);
    expect(Math.abs(r.t - Math.PI / 2), "maximum of sin at π/2 (exact)").toBeLessThan(1e-8);
    expect(calls.length, "the root search adds no right-hand-side evaluations").toBe(st.evaluations);
  });

  it("searches each crossing on its own event only: a slope event always gets dy, a plain one's search skips it", () => {
    const st = stepperDormandPrince45(osc, 2);
    let slopeWithoutDy = 0;
    let inPlainSearch = false; // the plain event was last called inside a step (dy undefined)
    let slopeCallsInPlainSearch = 0;
    // sin t crosses zero downward at π (plain event); its maximum at π/2 is the slope event.
    const events: OdeEvent<object>[] = [
      {
        fn: (_t, y, _p, dy) => {
          inPlainSearch = dy === undefined;
          return y[0];
        },
        direction: -1,
        terminal: true,
      },
      {
        fn: (_t, _y, _p, dy) => {
          if (inPlainSearch) slopeCallsInPlainSearch++;
          if (!dy) slopeWithoutDy++;
          return dy ? dy[0] : Number.NaN;
        },
        direction: -1,
        terminal: false,
        slope: true,
      },
    ];
    const r = integrateAdaptive(st, osc, {}, 0, Float64Array.of(0, 1), opts(), events);
    expect(Math.abs(r.t - Math.PI), "stops where sin t returns to zero at π (exact)").toBeLessThan(1e-8);
    expect(Math.abs(r.events[0]!.t - Math.PI / 2), "maximum of sin at π/2 (exact)").toBeLessThan(1e-8);
    expect(slopeWithoutDy, "the slope event is never called without dy").toBe(0);
    expect(slopeCallsInPlainSearch, "the plain event's root search does not evaluate the slope event").toBe(0);
  });
});

describe("Dormand–Prince dense output derivative", () => {
  it("matches the exact derivative of the harmonic oscillator inside a step (cos t, −sin t)", () => {
    const st = stepperDormandPrince45(osc, 2);
    st.reset(0, Float64Array.of(0, 1), {});
    const y = new Float64Array(2);
    expect(st.attempt(0.1, y, Float64Array.of(1e-12, 1e-12), 1e-9), "step accepted").toBeLessThan(1e6);
    st.accept();
    const dy = new Float64Array(2);
    for (const theta of [0, 0.3, 0.7, 1]) {
      st.interpolateDerivative(theta, dy);
      const t = 0.1 * theta;
      expect(Math.abs(dy[0] - Math.cos(t)), `d/dt sin at t = ${t} (exact cos t)`).toBeLessThan(1e-6);
      expect(Math.abs(dy[1] + Math.sin(t)), `d/dt cos at t = ${t} (exact −sin t)`).toBeLessThan(1e-6);
    }
  });
});
