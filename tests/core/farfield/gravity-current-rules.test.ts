/**
 * The spreading dense layer against closed-form solutions of its own equations. Volume and buoyancy
 * conservation dQ/dr = w_e·w, g′Q = g′₀Q₀ = B make every entrainment velocity independent of Q, so the
 * layer's dilution integrates in closed form:
 * - radial layer, shear entrainment only (still water, slope tanβ, Ri from the normal-flow balance):
 *   h = (Ri·Q²/(g′w²cosβ))^{1/3}, w_e = E(Ri)·V, dQ/dr = E·(B·cosβ/Ri)^{1/3}·w^{2/3}, w = w₀ + 2π(r − r₀);
 * - radial layer on a flat bed in a current (Ri = 1, E = 0), bed-stirred only: g′h = (B/w)^{2/3},
 *   Ri* = g′h/u*², dQ/dr = K·u*³·w^{5/3}/B^{2/3} while Ri* ≥ 10;
 * - drifting layer on a flat bed: h = Q/(u·w), dw/dx = 2√(B/(u·w))/u, so w^{3/2} = w_s^{3/2} + (3/u)√(B/u)·x,
 *   and dQ/dx = K·u*³·u·w²/B while Ri* = B/(u·w·u*²) ≥ 10.
 * E(Ri) = (0.08 − 0.1Ri)/(1 + 5Ri) (Turner 1986, J. Fluid Mech. 173:431–471, from memory); u_e/u* = K/Ri*,
 * K = 2.5 (Kato & Phillips 1969, J. Fluid Mech. 37:643–655, from memory); u* = √C_D·u with C_D = 0.0025
 * (common practice, no source); the layer closures (critical flow on a flat bed, switch where the layer
 * slows to the current, front Froude number 1) are the module's documented engineering judgement. The
 * integration is fourth-order Runge–Kutta, so the closed forms are met to about 1e-8.
 */
import { describe, expect, it } from "vitest";
import {
  DEFAULT_BED_DRAG,
  equilibriumRichardsonFromSlope,
  spreadingLayerFromNearFieldEnd,
  type SpreadingLayerInput,
} from "../../../core/farfield/gravity-current";

const K = 2.5; // Kato & Phillips (1969), from memory
const turnerE = (ri: number) => (ri >= 0.8 ? 0 : (0.08 - 0.1 * ri) / (1 + 5 * ri)); // Turner (1986), from memory

const base: SpreadingLayerInput = {
  startDistance: 36,
  endDistance: 236,
  startDilution: 50,
  dischargeFlow: 0.5,
  reducedGravity: 0.27,
  initialWidth: 2 * Math.PI * 20,
  perimeterOffset: 10,
  currentSpeed: 0,
  bedSlope: 0,
  steps: 100,
};
const B = 0.27 * 0.5; // buoyancy flux g′₀Q₀, m⁴/s³
const W0 = 2 * Math.PI * 20 + 10; // start perimeter with the offset, m
const Q0 = 0.5 * 50; // start volume flux, m³/s

function rel(got: number, want: number): number {
  return Math.abs(got / want - 1);
}

describe("equilibriumRichardsonFromSlope() — Ri = (C_D + E(Ri))/tanβ (balance from memory, Ellison & Turner 1959)", () => {
  it.each([
    [0.01, 0.0025, 0.637645342287],
    [0.05, 0.0025, 0.361886960143],
    [0.1, 0.0025, 0.259888254204],
    [0.2, 0.0025, 0.177441628938],
    [0.05, 0.01, 0.432455532034],
    [0.1, 0.01, 0.3],
    [0.2, 0.01, 0.2],
    [0.01, 0.01, 1],
  ])("slope %s, C_D = %s: Ri = %s (root found by independent bisection)", (slope, drag, ri) => {
    expect(equilibriumRichardsonFromSlope(slope, drag), "root").toBeCloseTo(ri, 10);
  });

  it("uses C_D = 0.0025 by default and no normal flow on a flat, reversed or undefined slope", () => {
    expect(DEFAULT_BED_DRAG, "C_D (common practice, no source)").toBe(0.0025);
    expect(equilibriumRichardsonFromSlope(0.1), "default drag").toBe(equilibriumRichardsonFromSlope(0.1, 0.0025));
    for (const s of [0, -0.1, NaN]) expect(equilibriumRichardsonFromSlope(s), `slope ${s}`).toBe(Infinity);
  });

  it("gives Ri = 0 when the drag term is not positive at Ri = 0 (guard)", () => {
    expect(equilibriumRichardsonFromSlope(0.1, -0.08), "C_D + E(0) = 0").toBe(0);
    expect(equilibriumRichardsonFromSlope(0.1, -0.1), "C_D + E(0) < 0").toBe(0);
  });
});

describe("spreadingLayerFromNearFieldEnd() — radial layer on a slope in still water", () => {
  for (const [slope, drag] of [
    [0.1, undefined],
    [0.05, 0.01],
  ] as const) {
    it(`slope ${slope}, C_D ${drag ?? "default"}: every point matches the closed form`, () => {
      const s = spreadingLayerFromNearFieldEnd({ ...base, bedSlope: slope, dragCoefficient: drag });
      const ri = equilibriumRichardsonFromSlope(slope, drag ?? 0.0025);
      const e = turnerE(ri);
      const cosb = 1 / Math.sqrt(1 + slope * slope);
      const c = e * Math.cbrt((B * cosb) / ri);
      expect(s.geometry, "no current").toBe("radial");
      expect(s.switchDistance, "never drifts").toBeNull();
      expect(s.distance.length, "100 steps").toBe(101);
      for (let i = 0; i <= 100; i += 10) {
        const r = 36 + 2 * i;
        const w = W0 + 2 * Math.PI * (r - 36);
        const q = Q0 + (c * 0.6 * (Math.pow(w, 5 / 3) - Math.pow(W0, 5 / 3))) / (2 * Math.PI);
        const h = Math.cbrt((ri * q * q * q) / (B * w * w * cosb));
        const v = q / (h * w);
        expect(s.distance[i], `distance ${i}`).toBeCloseTo(r, 10);
        expect(s.width[i], `perimeter at ${r} m`).toBeCloseTo(w, 9);
        expect(rel(s.flux[i]!, q), `flux at ${r} m`).toBeLessThan(1e-8);
        expect(rel(s.dilution[i]!, q / 0.5), `dilution at ${r} m`).toBeLessThan(1e-8);
        expect(rel(s.thickness[i]!, h), `thickness at ${r} m`).toBeLessThan(1e-8);
        expect(rel(s.velocity[i]!, v), `speed at ${r} m`).toBeLessThan(1e-8);
        expect(s.richardson[i], `Ri at ${r} m`).toBe(ri);
        expect(s.entrainment[i], `E at ${r} m`).toBeCloseTo(e, 15);
        expect(rel(s.entrainmentVelocity[i]!, e * v), `w_e at ${r} m`).toBeLessThan(1e-8);
      }
    });
  }

  it("treats a downward and an upward slope of the same size alike (magnitude)", () => {
    const down = spreadingLayerFromNearFieldEnd({ ...base, bedSlope: 0.1 });
    const up = spreadingLayerFromNearFieldEnd({ ...base, bedSlope: -0.1 });
    expect(up.dilution, "same series").toEqual(down.dilution);
  });

  it("takes the thickness at critical flow Ri = 1 on a gentle slope whose normal-flow Ri exceeds 1", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, bedSlope: 0.001 });
    expect(equilibriumRichardsonFromSlope(0.001), "normal flow is strongly subcritical").toBeGreaterThan(1);
    expect(
      s.richardson.every((r) => r === 1),
      "Ri held at 1",
    ).toBe(true);
    expect(s.dilution[100], "no shear entrainment at Ri = 1").toBe(50);
  });
});

describe("spreadingLayerFromNearFieldEnd() — flat bed in a current: radial, then drifting", () => {
  const u = 0.05;
  const ustar = Math.sqrt(0.0025) * u;
  const expected = (crossLength: number) => {
    // Radial part: bed-stirred entrainment only; speed (B/w)^{1/3} independent of Q.
    const radialQ = (w: number) =>
      Q0 +
      (((K * ustar ** 3) / Math.pow(B, 2 / 3)) * ((3 / 8) * (Math.pow(w, 8 / 3) - Math.pow(W0, 8 / 3)))) /
        (2 * Math.PI);
    let iSwitch = -1;
    for (let i = 0; i <= 100 && iSwitch < 0; i++) if (Math.cbrt(B / (W0 + 2 * Math.PI * 2 * i)) <= u) iSwitch = i;
    const wS = W0 + 2 * Math.PI * 2 * iSwitch;
    const qS = radialQ(wS);
    const hS = Math.cbrt((qS * qS * qS) / (B * wS * wS));
    const wAdv = Math.max((wS - 10) / Math.PI + crossLength, qS / (u * hS));
    const a = Math.pow(wAdv, 1.5);
    const b = (3 / u) * Math.sqrt(B / u);
    const drift = (x: number) => {
      const w = Math.pow(a + b * x, 2 / 3);
      const q = qS + ((K * ustar ** 3 * u) / B) * (3 / (7 * b)) * (Math.pow(a + b * x, 7 / 3) - Math.pow(a, 7 / 3));
      return { w, q };
    };
    return { radialQ, iSwitch, wS, qS, hS, wAdv, drift };
  };

  for (const crossLength of [0, 2000]) {
    it(`matches the closed forms before and after the switch (cross-current diffuser length ${crossLength} m)`, () => {
      const s = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: u, crossCurrentLength: crossLength });
      const x = expected(crossLength);
      expect(x.iSwitch, "the switch lies inside the range, away from its ends").toBeGreaterThan(5);
      expect(x.iSwitch, "the switch lies inside the range, away from its ends").toBeLessThan(95);
      expect(s.geometry, "current").toBe("advected");
      expect(s.switchDistance, "first point where the layer has slowed to the current").toBeCloseTo(
        36 + 2 * x.iSwitch,
        10,
      );
      for (let i = 0; i < x.iSwitch; i += 5) {
        const w = W0 + 2 * Math.PI * 2 * i;
        const q = x.radialQ(w);
        const gh = Math.pow(B / w, 2 / 3);
        expect(gh / (ustar * ustar), "Ri* ≥ 10: the law, not its guard").toBeGreaterThan(10);
        expect(rel(s.flux[i]!, q), `radial flux at point ${i}`).toBeLessThan(1e-8);
        expect(s.width[i], `perimeter at point ${i}`).toBeCloseTo(w, 9);
        expect(s.richardson[i], "critical flow on a flat bed").toBe(1);
        expect(s.entrainment[i], "no shear entrainment at Ri = 1").toBe(0);
        expect(rel(s.entrainmentVelocity[i]!, (ustar * K * ustar * ustar) / gh), `u*·K/Ri* at ${i}`).toBeLessThan(1e-8);
        expect(rel(s.velocity[i]!, Math.cbrt(B / w)), `own speed at ${i}`).toBeLessThan(1e-8);
      }
      const iS = x.iSwitch;
      expect(rel(s.width[iS]!, x.wAdv), "drifting width at the switch").toBeLessThan(1e-12);
      expect(rel(s.thickness[iS]!, x.qS / (u * x.wAdv)), "thickness at the switch: Q/(u·w)").toBeLessThan(1e-8);
      if (crossLength === 0)
        expect(rel(s.thickness[iS]!, x.hS), "thickness continuous at the switch").toBeLessThan(1e-8);
      else expect(s.thickness[iS], "a wide diffuser spreads the layer thinner").toBeLessThan(x.hS);
      for (let i = iS; i <= 100; i += 3) {
        const { w, q } = x.drift(2 * (i - iS));
        expect(rel(s.width[i]!, w), `drifting width at point ${i}`).toBeLessThan(1e-8);
        expect(rel(s.flux[i]!, q), `drifting flux at point ${i}`).toBeLessThan(1e-8);
        expect(rel(s.thickness[i]!, q / (u * w)), `drifting thickness at point ${i}`).toBeLessThan(1e-8);
        expect(s.velocity[i], "carried at the current speed").toBe(u);
        expect(rel(s.entrainmentVelocity[i]!, (K * ustar ** 3 * u * w) / B), `w_e at ${i}`).toBeLessThan(1e-8);
      }
    });
  }

  it("uses the given bed drag for the friction velocity: C_D = 0.01 doubles u* and gives 8× the bed entrainment", () => {
    const first = (dragCoefficient?: number) =>
      spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: u, dragCoefficient }).entrainmentVelocity[0]!;
    expect(first(0.0025), "explicit default").toBe(first());
    expect(first(0.01) / first(), "w_e = K·u*³/(g′h) ∝ C_D^{3/2}").toBeCloseTo(8, 9);
  });

  it("treats a reversed current as still water", () => {
    const back = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: -0.05, bedSlope: 0.05 });
    const still = spreadingLayerFromNearFieldEnd({ ...base, bedSlope: 0.05 });
    expect(back.geometry, "radial").toBe("radial");
    expect(back.dilution, "same as still water").toEqual(still.dilution);
  });

  it("calls a layer in a current 'advected' even where it never slows to the current within range", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: 0.002 });
    expect(s.geometry, "a current is given").toBe("advected");
    expect(s.switchDistance, "but no switch within 200 m").toBeNull();
  });
});

describe("spreadingLayerFromNearFieldEnd() — neutral and degenerate inputs", () => {
  it("keeps a neutral layer (g′ = 0) undiluted, infinitely thick and at rest in still water", () => {
    for (const reducedGravity of [0, -0.1]) {
      // An entraining layer first: nothing of its state may carry over into the next call.
      expect(spreadingLayerFromNearFieldEnd({ ...base, bedSlope: 0.1 }).entrainment[5], "E > 0").toBeGreaterThan(0);
      const s = spreadingLayerFromNearFieldEnd({ ...base, reducedGravity, bedSlope: 0.1 });
      expect(
        s.dilution.every((d) => d === 50),
        `no entrainment, g′ = ${reducedGravity}`,
      ).toBe(true);
      expect(s.thickness[5], "no gravity-driven thickness").toBe(Infinity);
      expect(s.velocity[5], "at rest").toBe(0);
      expect(s.richardson[5], "Ri = ∞").toBe(Infinity);
      expect(s.entrainmentVelocity[5], "w_e = 0").toBe(0);
      expect(s.entrainment[5], "E = 0").toBe(0);
      expect(s.switchDistance, "never carried off in still water").toBeNull();
      expect(s.width[5], "still the radial perimeter").toBeCloseTo(W0 + 2 * Math.PI * 10, 9);
    }
  });

  it("carries a neutral layer off with the current at once, at its cross-current width", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, reducedGravity: 0, currentSpeed: 0.1, crossCurrentLength: 7 });
    const w = (W0 - 10) / Math.PI + 7;
    expect(s.switchDistance, "switches at the start").toBe(36);
    expect(s.width[0], "perimeter/π + cross-current length").toBeCloseTo(w, 12);
    expect(s.width[100], "no buoyant widening").toBeCloseTo(w, 12);
    expect(s.thickness[0], "Q/(u·w)").toBeCloseTo(Q0 / (0.1 * w), 12);
    expect(s.velocity[0], "at the current speed").toBe(0.1);
    expect(s.dilution[100], "undiluted").toBe(50);
  });

  it("returns only the start point for a zero or negative span or no discharge", () => {
    for (const over of [{ endDistance: 36 }, { endDistance: 10 }, { dischargeFlow: 0 }]) {
      const s = spreadingLayerFromNearFieldEnd({ ...base, ...over });
      expect(s.distance, JSON.stringify(over)).toEqual([36]);
    }
  });

  it("takes 400 steps by default, rounds the step count and takes at least one", () => {
    const { steps: _steps, ...noSteps } = base;
    expect(spreadingLayerFromNearFieldEnd(noSteps).distance.length, "default 400").toBe(401);
    expect(spreadingLayerFromNearFieldEnd({ ...base, steps: 2.6 }).distance, "rounded to 3").toEqual([
      36,
      36 + 200 / 3,
      36 + 400 / 3,
      236,
    ]);
    expect(spreadingLayerFromNearFieldEnd({ ...base, steps: 0 }).distance, "at least one").toEqual([36, 236]);
  });

  it("stops at the first point at or past stopDistance", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, stopDistance: 40 });
    expect(s.distance, "36, 38, 40").toEqual([36, 38, 40]);
    const atStart = spreadingLayerFromNearFieldEnd({ ...base, stopDistance: 36 });
    expect(atStart.distance, "already there").toEqual([36]);
  });
});
