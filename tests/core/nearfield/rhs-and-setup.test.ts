/**
 * The integral model's building blocks, checked one by one against the flux equations written out here
 * independently: profile interpolation, the right-hand side, the cross-section geometry (radius, vertical
 * half-extent, slope of the upper edge), the entrainment switch, the parameters and the state at the port,
 * the centreline dilution, the event functions and the path buffer.
 *
 * The flux identities (Q = πb²V, M = QV, B = Q·g′, dM_z/ds = −πb²·g′, dB/ds = ε·dQ/ds, dC/ds = ΔS_a·dQ/ds)
 * are physics (conservation of volume, momentum, density excess and salt for a top-hat round jet; Fischer
 * et al. 1979, Mixing in Inland and Coastal Waters, ch. 9). The entrainment closure itself is checked in
 * the correlation suites; here it is called as the reference.
 */
import { describe, expect, it } from "vitest";
import {
  IB,
  IC,
  IMX,
  IMY,
  IMZ,
  INTEGRAL_DIM,
  IQ,
  IX,
  IY,
  IZ,
  entrainmentSwitch,
  integralJetRhs,
  profileAt,
  radiusFromState,
  upperEdgeSlope,
  verticalHalfExtent,
  type IntegralParams,
} from "../../../core/nearfield/integral-rhs";
import {
  CENTRELINE_PROFILE_FACTOR,
  EV_ENTRAINMENT_SWITCH,
  EV_IMPACT,
  EV_MAX_RISE,
  EV_NEUTRAL,
  EV_RETURN,
  EV_SEABED_EDGE,
  EV_SURFACE_CENTRE,
  EV_SURFACE_EDGE,
  EV_TOP,
  centrelineDilution,
  integralInitialState,
  integralParamsFrom,
} from "../../../core/nearfield/integral-setup";
import { integralEventsFor } from "../../../core/nearfield/integral-events";
import { IntegralPathBuffer, PATH_POINTS } from "../../../core/nearfield/integral-path";
import { FLUX_AVERAGING_FACTOR, fluxAveragedFromCentreline } from "../../../core/nearfield/flux-averaging";
import {
  entrainmentLeeCheung1990Alpha,
  entrainmentLeeCheung1990Rate,
} from "../../../core/correlations/lee-cheung-1990-entrainment";
import { denseJet, uniformColumn } from "../../helpers/jets";
import type { AmbientColumn } from "../../../core/nearfield/types";

const G = 9.80665; // standard gravity, m/s²

/** A state vector from named parts. */
function state(p: {
  x?: number;
  y?: number;
  z: number;
  q: number;
  m: [number, number, number];
  b: number;
  c?: number;
}) {
  const y = new Float64Array(INTEGRAL_DIM);
  y[IX] = p.x ?? 0;
  y[IY] = p.y ?? 0;
  y[IZ] = p.z;
  y[IQ] = p.q;
  y[IMX] = p.m[0];
  y[IMY] = p.m[1];
  y[IMZ] = p.m[2];
  y[IB] = p.b;
  y[IC] = p.c ?? 0;
  return y;
}

/** A stratified column with salinity varying too, and a current toward 60° (east-north-east). */
const stratColumn: AmbientColumn = {
  depth: 20,
  depths: [0, 5, 12, 20],
  densities: [1020, 1022, 1024.5, 1026],
  salinities: [33, 34, 35.5, 36],
  temperatures: [22, 21, 20, 19],
  currentSpeed: 0.15,
  currentDirection: 60,
};

/** Top-hat geometry of a state, written out from the definitions Q = πb²V, |M| = QV. */
function geometry(y: Float64Array) {
  const m = Math.hypot(y[IMX], y[IMY], y[IMZ]);
  const v = m / y[IQ];
  const b = Math.sqrt(y[IQ] / (Math.PI * v));
  return { m, v, b, t: [y[IMX] / m, y[IMY] / m, y[IMZ] / m] as const };
}

describe("profileAt(): linear interpolation held at the profile ends", () => {
  const depths = Float64Array.from([0, 2, 5, 9, 14]);
  const values = Float64Array.from([10, 12, 18, 10, 0]);
  it("holds the end values outside the profile and at its ends", () => {
    expect(profileAt(depths, values, -3), "above the top").toBe(10);
    expect(profileAt(depths, values, 0), "at the top").toBe(10);
    expect(profileAt(depths, values, 14), "at the bottom").toBe(0);
    expect(profileAt(depths, values, 30), "below the bottom").toBe(0);
  });
  it("hits every node exactly and interpolates linearly between nodes", () => {
    expect(profileAt(depths, values, 2), "node 2 m").toBe(12);
    expect(profileAt(depths, values, 5), "node 5 m").toBe(18);
    expect(profileAt(depths, values, 9), "node 9 m").toBe(10);
    expect(profileAt(depths, values, 1), "0–2 m").toBeCloseTo(11, 12);
    expect(profileAt(depths, values, 3.5), "2–5 m: 12 + 0.5·6").toBeCloseTo(15, 12);
    expect(profileAt(depths, values, 6), "5–9 m: 18 − 0.25·8").toBeCloseTo(16, 12);
    expect(profileAt(depths, values, 13), "9–14 m: 10 − 0.8·10").toBeCloseTo(2, 12);
  });
  it("takes the deeper value at a repeated depth (a step in the profile) instead of dividing by zero", () => {
    const d = Float64Array.from([0, 4, 4, 8]);
    const v = Float64Array.from([1, 2, 7, 9]);
    expect(profileAt(d, v, 4), "at the step").toBe(7);
    expect(profileAt(d, v, 2), "above the step").toBeCloseTo(1.5, 12);
    expect(profileAt(d, v, 6), "below the step").toBeCloseTo(8, 12);
  });
});

describe("integralParamsFrom(): the ambient as the right-hand side sees it", () => {
  const jet = denseJet({ portHeight: 2 });
  const p = integralParamsFrom(jet, stratColumn);
  it("puts the port 18 m below the surface and reads the ambient there by linear interpolation", () => {
    expect(p.portDepth, "depth − port height").toBe(18);
    expect(p.portHeight, "port height").toBe(2);
    expect(p.portSalinity, "35.5 + (6/8)·0.5 g/kg").toBeCloseTo(35.875, 12);
    const rho0 = 1024.5 + (6 / 8) * 1.5;
    for (let i = 0; i < 4; i++) {
      expect(p.epsilon[i], `ε = g(ρ − ρ0)/ρ0 at ${stratColumn.depths[i]} m`).toBeCloseTo(
        (G * (stratColumn.densities[i] - rho0)) / rho0,
        14,
      );
      expect(p.salinityExcess[i], `S − S0 at ${stratColumn.depths[i]} m`).toBeCloseTo(
        stratColumn.salinities[i] - 35.875,
        12,
      );
    }
    expect(p.stratified, "density varies").toBe(true);
  });
  it("resolves the current into east and north components (azimuth clockwise from north)", () => {
    expect(p.currentSpeed, "speed kept").toBe(0.15);
    expect(p.currentX, "sin 60°").toBeCloseTo(Math.sin(Math.PI / 3), 14);
    expect(p.currentY, "cos 60°").toBeCloseTo(0.5, 14);
  });
  it("treats a negative or missing current speed as stagnant water", () => {
    expect(integralParamsFrom(jet, { ...stratColumn, currentSpeed: -0.3 }).currentSpeed, "negative").toBe(0);
    expect(integralParamsFrom(jet, { ...stratColumn, currentSpeed: Number.NaN }).currentSpeed, "NaN").toBe(0);
  });
  it("is not stratified in a uniform column, and is when only the salinity varies", () => {
    expect(integralParamsFrom(jet, uniformColumn(20)).stratified, "uniform").toBe(false);
    const salty = { ...uniformColumn(20), salinities: [34, 36] };
    const ps = integralParamsFrom(jet, salty);
    expect(ps.stratified, "salinity varies").toBe(true);
    expect(Array.from(ps.epsilon), "no density difference").toEqual([0, 0]);
  });
  it("counts a missing salinity profile as zero salinity everywhere", () => {
    const ps = integralParamsFrom(jet, { ...uniformColumn(20), salinities: [] });
    expect(ps.portSalinity, "no profile").toBe(0);
    expect(Array.from(ps.salinityExcess), "no excess").toEqual([0, 0]);
  });
});

describe("integralInitialState(): top-hat jet of diameter d and speed U along the port axis", () => {
  const jet = { ...denseJet({ angle: 40, azimuth: 30, d: 0.25, U: 3.2 }), flow: 0.17 };
  const col = uniformColumn(20);
  const y0 = integralInitialState(jet, col);
  it("starts at the port with Q0 = flow and M0 = Q0·U split by angle and azimuth", () => {
    const th = (40 * Math.PI) / 180;
    const az = (30 * Math.PI) / 180;
    expect([y0[IX], y0[IY], y0[IZ]], "at the port").toEqual([0, 0, 0]);
    expect(y0[IQ], "Q0").toBe(0.17);
    expect(y0[IMX], "east").toBeCloseTo(0.17 * 3.2 * Math.cos(th) * Math.sin(az), 14);
    expect(y0[IMY], "north").toBeCloseTo(0.17 * 3.2 * Math.cos(th) * Math.cos(az), 14);
    expect(y0[IMZ], "up").toBeCloseTo(0.17 * 3.2 * Math.sin(th), 14);
    expect(y0[IB], "B0 = Q0·g′").toBeCloseTo(0.17 * jet.reducedGravity, 14);
    expect(y0[IC], "C0 = Q0·(S0 − Sa)").toBeCloseTo(0.17 * (68 - 35), 12);
  });
  it("takes Q0 = U·πd²/4 when the flow is not given (zero or negative)", () => {
    const area = (Math.PI * 0.25 * 0.25) / 4;
    expect(integralInitialState({ ...jet, flow: 0 }, col)[IQ], "zero flow").toBeCloseTo(3.2 * area, 14);
    expect(integralInitialState({ ...jet, flow: -1 }, col)[IQ], "negative flow").toBeCloseTo(3.2 * area, 14);
  });
  it("gives the same state with or without the parameters passed in", () => {
    const strat = integralInitialState(jet, stratColumn, integralParamsFrom(jet, stratColumn));
    expect(Array.from(integralInitialState(jet, stratColumn)), "same").toEqual(Array.from(strat));
  });
});

describe("centrelineDilution() and the flux-averaging factor (Gaussian profiles, λ = 1.2, Fischer et al. 1979)", () => {
  it("is Q/Q0·λ²/(1 + λ²), never below 1 (the undiluted core)", () => {
    expect(CENTRELINE_PROFILE_FACTOR, "1.44/2.44").toBeCloseTo(1.44 / 2.44, 14);
    expect(centrelineDilution(10, 2), "5 × 0.590").toBeCloseTo(5 * (1.44 / 2.44), 14);
    expect(centrelineDilution(1.5, 1), "1.5 × 0.590 < 1").toBe(1);
    expect(centrelineDilution(1, 1), "at the port").toBe(1);
  });
  it("turns a centreline dilution into the flux-averaged one by (1 + λ²)/λ², and null into null", () => {
    expect(FLUX_AVERAGING_FACTOR, "2.44/1.44").toBeCloseTo(2.44 / 1.44, 14);
    expect(fluxAveragedFromCentreline(30), "30 × 1.694").toBeCloseTo((30 * 2.44) / 1.44, 12);
    expect(fluxAveragedFromCentreline(null), "null stays null").toBeNull();
  });
});

describe("integralJetRhs(): the flux equations at one state", () => {
  const jet = denseJet({ portHeight: 2 });
  const p = integralParamsFrom(jet, stratColumn);
  const out = new Float64Array(INTEGRAL_DIM);

  /** Expected derivatives from the header's equations, with the closure of Lee & Cheung (1990). */
  function expected(y: Float64Array, prm: IntegralParams) {
    const { b, v, t } = geometry(y);
    const depth = prm.portDepth - y[IZ];
    const eps = prm.stratified ? profileAt(prm.depths, prm.epsilon, depth) : 0;
    const sal = prm.stratified ? profileAt(prm.depths, prm.salinityExcess, depth) : 0;
    const g = y[IB] / y[IQ] - eps;
    const align = g > 0 ? -t[2] : g < 0 ? t[2] : 0;
    const cos = prm.currentX * t[0] + prm.currentY * t[1];
    const e = entrainmentLeeCheung1990Rate(v, b, prm.currentSpeed, cos, align, Math.abs(g));
    return [
      t[0],
      t[1],
      t[2],
      e,
      e * prm.currentSpeed * prm.currentX,
      e * prm.currentSpeed * prm.currentY,
      -Math.PI * b * b * g,
      eps * e,
      sal * e,
    ];
  }

  const cases: [string, Float64Array][] = [
    ["dense, descending", state({ z: 3, q: 0.5, m: [0.6, 0.2, -0.9], b: 0.02, c: 4 })],
    ["dense, rising", state({ z: 1, q: 0.3, m: [0.5, -0.1, 0.7], b: 0.02 })],
    ["lighter than the water around it", state({ z: 4, q: 0.4, m: [0.2, 0.3, 0.6], b: -0.03 })],
  ];
  for (const [name, y] of cases) {
    it(`matches the flux equations component by component (${name})`, () => {
      integralJetRhs(0, y, out, p);
      const want = expected(y, p);
      for (let i = 0; i < INTEGRAL_DIM; i++) {
        expect(out[i], `component ${i}`).toBeCloseTo(want[i], 12);
      }
      expect(out[IQ], "the jet entrains").toBeGreaterThan(0);
    });
  }

  it("has no buoyancy force at the neutral level and no plume term there", () => {
    // B/Q equal to ε at the jet's depth: g′ = 0.
    const y = state({ z: 3, q: 0.5, m: [0.6, 0.2, -0.9], b: 0 });
    y[IB] = y[IQ] * profileAt(p.depths, p.epsilon, p.portDepth - 3);
    integralJetRhs(0, y, out, p);
    expect(out[IMZ], "no vertical force").toBeCloseTo(0, 15);
    const { b, v, t } = geometry(y);
    const cos = p.currentX * t[0] + p.currentY * t[1];
    expect(out[IQ], "pure-jet entrainment").toBeCloseTo(entrainmentLeeCheung1990Rate(v, b, 0.15, cos, 0, 0), 12);
  });

  it("skips the profile in a uniform column: no change of B or C with entrainment", () => {
    const pu = integralParamsFrom(jet, uniformColumn(20, { currentSpeed: 0.2, currentDirection: 90 }));
    const y = state({ z: 3, q: 0.5, m: [0.6, 0.2, -0.9], b: 0.02, c: 4 });
    integralJetRhs(0, y, out, pu);
    expect(out[IB], "dB/ds").toBe(0);
    expect(out[IC], "dC/ds").toBe(0);
    expect(out[IMX], "entrained momentum toward east").toBeCloseTo(out[IQ] * 0.2, 14);
    expect(out[IMY], "none toward north").toBeCloseTo(0, 14);
    expect(out[IMZ], "−πb²·B/Q").toBeCloseTo(-Math.PI * geometry(y).b ** 2 * 0.04, 12);
  });

  it("stays finite at zero momentum flux (a fountain top): no axis direction", () => {
    const y = state({ z: 3, q: 0.5, m: [0, 0, 0], b: 0.02 });
    integralJetRhs(0, y, out, integralParamsFrom(jet, uniformColumn(20)));
    expect([out[IX], out[IY], out[IZ]], "no direction").toEqual([0, 0, 0]);
    for (let i = 0; i < INTEGRAL_DIM; i++) expect(Number.isNaN(out[i]), `component ${i} not NaN`).toBe(false);
    expect(Number.isFinite(radiusFromState(y)), "radius finite").toBe(true);
    expect(verticalHalfExtent(y), "no axis: the whole (finite) radius counts as vertical extent").toBe(
      radiusFromState(y),
    );
  });
});

describe("cross-section geometry: radius, vertical half-extent and the slope of the upper edge", () => {
  const y = state({ z: 2, q: 0.5, m: [0.6, 0.2, 0.9], b: 0.02 });
  const { b, t } = geometry(y);
  it("gives b = Q/√(π|M|) and a vertical half-extent b·√(1 − t_z²)", () => {
    expect(radiusFromState(y), "radius").toBeCloseTo(b, 14);
    expect(verticalHalfExtent(y), "half-extent").toBeCloseTo(b * Math.sqrt(1 - t[2] * t[2]), 14);
    const vertical = state({ z: 2, q: 0.5, m: [0, 0, 0.9], b: 0.02 });
    expect(verticalHalfExtent(vertical), "vertical axis: the edge is the centreline").toBe(0);
  });

  it("gives d/ds of z + b·√(1 − t_z²) equal to its central difference along the derivative", () => {
    const dy = Float64Array.from([0.5, 0.1, 0.8, 0.07, 0.01, -0.02, -0.05, 0.001, 0.002]);
    const h = 1e-6;
    const edge = (sign: number) => {
      const yy = y.map((v, i) => v + sign * h * dy[i]);
      return yy[IZ] + verticalHalfExtent(yy);
    };
    const fd = (edge(1) - edge(-1)) / (2 * h);
    expect(upperEdgeSlope(y, dy), "analytic = finite difference").toBeCloseTo(fd, 7);
  });

  it("uses dz/ds + db/ds·1 + 0 on a vertical axis (the √ has an infinite slope there)", () => {
    const vertical = state({ z: 2, q: 0.5, m: [0, 0, 0.9], b: 0.02 });
    const dy = Float64Array.from([0, 0, 1, 0.07, 0, 0, -0.05, 0, 0]);
    expect(upperEdgeSlope(vertical, dy), "edge moves with the centreline").toBeCloseTo(1, 14);
    const stalled = state({ z: 2, q: 0.5, m: [0, 0, 0], b: 0.02 });
    expect(Number.isFinite(upperEdgeSlope(stalled, dy)), "finite at zero momentum").toBe(true);
  });
});

describe("entrainmentSwitch(): shear minus forced entrainment (Lee & Cheung 1990 maximum hypothesis)", () => {
  const jet = denseJet({ portHeight: 2 });
  const p = integralParamsFrom(jet, stratColumn);
  it("equals 2πbαΔU − 2b·u_a·|sin| from the closure, at a descending dense state in a current", () => {
    const y = state({ z: 3, q: 0.5, m: [0.6, 0.2, -0.9], b: 0.02 });
    const { b, v, t } = geometry(y);
    const eps = profileAt(p.depths, p.epsilon, p.portDepth - 3);
    const g = y[IB] / y[IQ] - eps;
    const cos = p.currentX * t[0] + p.currentY * t[1];
    const us = 0.15 * cos;
    const alpha = entrainmentLeeCheung1990Alpha(v - us, us, g > 0 ? -t[2] : t[2], Math.abs(g), b);
    const shear = 2 * Math.PI * b * alpha * (v - us);
    const forced = 2 * b * 0.15 * Math.sqrt(1 - cos * cos);
    expect(entrainmentSwitch(y, p), "shear − forced").toBeCloseTo(shear - forced, 12);
    // The rate is the larger of the two: the switch's sign says which one the RHS used.
    const out = new Float64Array(INTEGRAL_DIM);
    integralJetRhs(0, y, out, p);
    expect(out[IQ], "RHS takes the larger").toBeCloseTo(Math.max(shear, forced), 12);
  });

  it("is negative when a slow jet crosses a strong current (forced entrainment wins)", () => {
    const fast = integralParamsFrom(jet, { ...stratColumn, currentSpeed: 2 });
    const y = state({ z: 3, q: 0.5, m: [-0.05, 0.05, -0.01], b: 0.002 });
    expect(entrainmentSwitch(y, fast), "forced dominates").toBeLessThan(0);
  });

  it("stays a number at zero momentum flux (a fountain top)", () => {
    const stalled = state({ z: 3, q: 0.5, m: [0, 0, 0], b: 0.02 });
    expect(Number.isNaN(entrainmentSwitch(stalled, p)), "no 0/0").toBe(false);
  });

  it("has no shear entrainment when the jet is slower than the current along its axis", () => {
    const fast = integralParamsFrom(jet, { ...uniformColumn(20), currentSpeed: 3, currentDirection: 90 });
    const y = state({ z: 3, q: 1, m: [0.5, 0, 0.01], b: 0.02 });
    const { b, t } = geometry(y);
    const forced = 2 * b * 3 * Math.sqrt(1 - t[0] * t[0]);
    expect(entrainmentSwitch(y, fast), "−forced only").toBeCloseTo(-forced, 12);
  });
});

describe("event functions of the integral model", () => {
  const jet = denseJet({ portHeight: 2 });
  const p = integralParamsFrom(jet, stratColumn);
  const y = state({ z: 3, q: 0.5, m: [0.6, 0.2, -0.9], b: 0.02 });
  const half = verticalHalfExtent(y);

  it("watches return, seabed and surface planes, the upper edge's turning point and the axis top", () => {
    const ev = integralEventsFor(0.1, p);
    const out = new Float64Array(ev.specs.length);
    const dy = new Float64Array(INTEGRAL_DIM);
    integralJetRhs(0, y, dy, p);
    ev.values(0, y, p, undefined, out);
    expect(out[EV_RETURN], "height above port level").toBe(3);
    expect(out[EV_SEABED_EDGE], "lower edge above the bed").toBeCloseTo(3 - half + 2, 14);
    expect(out[EV_IMPACT], "centreline above the bed").toBe(5);
    expect(out[EV_SURFACE_EDGE], "upper edge below the surface").toBeCloseTo(18 - (3 + half), 14);
    expect(out[EV_SURFACE_CENTRE], "centreline below the surface").toBe(15);
    expect(out[EV_MAX_RISE], "slope of the upper edge").toBeCloseTo(upperEdgeSlope(y, dy), 14);
    expect(out[EV_TOP], "vertical momentum").toBe(-0.9);
    expect(out[EV_ENTRAINMENT_SWITCH], "shear − forced").toBeCloseTo(entrainmentSwitch(y, p), 14);
  });

  it("uses the derivative it is given for the turning point", () => {
    const ev = integralEventsFor(0.1, p);
    const out = new Float64Array(ev.specs.length);
    const dy = Float64Array.from([0.5, 0.1, 0.8, 0.07, 0.01, -0.02, -0.05, 0.001, 0.002]);
    ev.values(0, y, p, dy, out);
    expect(out[EV_MAX_RISE], "given derivative").toBeCloseTo(upperEdgeSlope(y, dy), 14);
  });

  it("computes one event alone during a root search", () => {
    const ev = integralEventsFor(-0.1, p);
    const single = (k: number) => {
      const out = new Float64Array(ev.specs.length).fill(123);
      ev.values(0, y, p, undefined, out, k);
      return out;
    };
    expect(single(EV_RETURN)[EV_RETURN], "return").toBe(3);
    expect(single(EV_IMPACT)[EV_IMPACT], "impact").toBe(5);
    expect(single(EV_SURFACE_CENTRE)[EV_SURFACE_CENTRE], "surface").toBe(15);
    expect(single(EV_TOP)[EV_TOP], "top").toBe(-0.9);
    const eps = profileAt(p.depths, p.epsilon, 15);
    expect(single(EV_NEUTRAL)[EV_NEUTRAL], "B/Q − ε").toBeCloseTo(0.04 - eps, 14);
    expect(single(EV_ENTRAINMENT_SWITCH)[EV_ENTRAINMENT_SWITCH], "switch").toBeCloseTo(entrainmentSwitch(y, p), 14);
    const dy = new Float64Array(INTEGRAL_DIM);
    integralJetRhs(0, y, dy, p);
    expect(single(EV_MAX_RISE)[EV_MAX_RISE], "turning point of the upper edge").toBeCloseTo(upperEdgeSlope(y, dy), 14);
    expect(single(EV_SURFACE_EDGE)[EV_SURFACE_EDGE], "upper edge below the surface").toBeCloseTo(18 - (3 + half), 14);
    const ret = single(EV_RETURN);
    expect(ret[EV_IMPACT], "other values untouched").toBe(123);
    const edge = single(EV_SEABED_EDGE);
    expect(edge[EV_SEABED_EDGE], "edge events need the full set").toBeCloseTo(3 - half + 2, 14);
  });

  it("gives the top's rate from dM_z/ds and no rate for the switch and the neutral level", () => {
    const ev = integralEventsFor(-0.1, p);
    const out = new Float64Array(ev.specs.length);
    const dy = Float64Array.from([0, 0, 0, 0, 0, 0, -0.25, 0, 0]);
    ev.rates!(0, y, p, dy, out);
    expect(out[EV_TOP], "dM_z/ds").toBe(-0.25);
    expect(Number.isNaN(out[EV_ENTRAINMENT_SWITCH]), "switch located after the fact").toBe(true);
    expect(Number.isNaN(out[EV_NEUTRAL]), "neutral level located after the fact").toBe(true);
  });

  it("chooses the event set: trap level only for a rising discharge in stratified water, switch only with a current", () => {
    const uniform = integralParamsFrom(jet, uniformColumn(20));
    const current = integralParamsFrom(jet, uniformColumn(20, { currentSpeed: 0.1 }));
    const stratStill = integralParamsFrom(jet, { ...stratColumn, currentSpeed: 0 });
    expect(integralEventsFor(0.1, uniform).specs.length, "dense, still, uniform").toBe(EV_TOP + 1);
    expect(integralEventsFor(-0.1, uniform).specs.length, "light, uniform: no trap level").toBe(EV_TOP + 1);
    expect(integralEventsFor(0.1, current).specs.length, "with a current").toBe(EV_ENTRAINMENT_SWITCH + 1);
    expect(integralEventsFor(0.1, stratStill).specs.length, "dense in stratified water").toBe(EV_TOP + 1);
    expect(integralEventsFor(-0.1, stratStill).specs.length, "light in stratified water").toBe(EV_NEUTRAL + 1);
    expect(integralEventsFor(0, stratStill).specs.length, "neutral in stratified water").toBe(EV_NEUTRAL + 1);
    const rising = integralEventsFor(-0.1, stratStill).specs;
    expect(rising[EV_NEUTRAL], "trap level: both directions, not terminal").toEqual({
      direction: 0,
      terminal: false,
    });
    expect(rising[EV_IMPACT].terminal, "impact ends the run").toBe(true);
    expect(rising[EV_SURFACE_CENTRE].terminal, "centreline at the surface ends the run").toBe(true);
    expect(rising[EV_SEABED_EDGE].terminal, "edge contact does not").toBe(false);
  });

  it("writes no value past the set it watches", () => {
    const ev = integralEventsFor(0.1, integralParamsFrom(jet, uniformColumn(20)));
    const out = new Float64Array(ev.specs.length);
    ev.values(0, y, integralParamsFrom(jet, uniformColumn(20)), undefined, out);
    expect(out.length, "seven events").toBe(7);
    const rates = new Float64Array(EV_TOP + 1);
    ev.rates!(0, y, p, new Float64Array(INTEGRAL_DIM), rates);
    expect(rates.length, "no rate written past the set").toBe(7);
  });
});

describe("IntegralPathBuffer: recording and decimation of the centreline path", () => {
  it("derives radius, centreline dilution and upper edge from each recorded state", () => {
    const buf = new IntegralPathBuffer();
    buf.q0 = 0.25;
    const y = state({ x: 1, y: 2, z: 3, q: 2.5, m: [0.6, 0.2, 0.9], b: 0.02 });
    expect(buf.pushState(4, y), "first index").toBe(0);
    expect(buf.pushState(5, y), "second index").toBe(1);
    expect([buf.s[0], buf.x[0], buf.y[0], buf.z[0]], "position").toEqual([4, 1, 2, 3]);
    expect(buf.b[0], "top-hat radius").toBeCloseTo(radiusFromState(y), 14);
    expect(buf.dilution[0], "10 × λ²/(1 + λ²)").toBeCloseTo(10 * CENTRELINE_PROFILE_FACTOR, 14);
    expect(buf.edge[0], "z + vertical half-extent").toBeCloseTo(3 + verticalHalfExtent(y), 14);
    buf.reset();
    expect(buf.length, "reset empties it").toBe(0);
  });

  it("grows past its first 512 recorded states without losing any", () => {
    const buf = new IntegralPathBuffer();
    buf.q0 = 1;
    for (let i = 0; i < 600; i++) buf.pushState(i, state({ x: i, z: -i, q: 4, m: [1, 0, 0], b: 0 }));
    expect(buf.length, "all states").toBe(600);
    for (const i of [511, 512, 513, 599]) expect([buf.s[i], buf.x[i], buf.z[i]], `state ${i}`).toEqual([i, i, -i]);
    expect(buf.dilution[599], "4 × λ²/(1 + λ²)").toBeCloseTo(4 * CENTRELINE_PROFILE_FACTOR, 14);
  });

  it("grows past its first 512 rows without losing any", () => {
    const buf = new IntegralPathBuffer();
    for (let i = 0; i < 1300; i++) buf.push(i, i + 1, i + 2, i + 3, i + 4, i + 5, i + 6);
    expect(buf.length, "all rows").toBe(1300);
    for (const i of [0, 511, 512, 1023, 1024, 1299]) {
      expect([buf.s[i], buf.x[i], buf.y[i], buf.z[i], buf.b[i], buf.dilution[i], buf.edge[i]], `row ${i}`).toEqual([
        i,
        i + 1,
        i + 2,
        i + 3,
        i + 4,
        i + 5,
        i + 6,
      ]);
    }
  });

  it("keeps every point up to 200 and otherwise 200 evenly spaced ones, first and last included", () => {
    const buf = new IntegralPathBuffer();
    for (let i = 0; i < PATH_POINTS; i++) buf.push(i, 0, 0, 0, 1, 1, 0);
    const all = buf.decimate();
    expect(all.length, "200 kept").toBe(PATH_POINTS);
    expect(all[0], "point shape").toEqual({ s: 0, x: 0, y: 0, z: 0, halfWidth: 1, dilution: 1 });
    buf.push(PATH_POINTS, 0, 0, 0, 1, 1, 0);
    const few = buf.decimate();
    expect(few.length, "201 → 200").toBe(PATH_POINTS);
    expect(few[0].s, "first").toBe(0);
    expect(few[PATH_POINTS - 1].s, "last").toBe(PATH_POINTS);
    buf.reset();
    for (let i = 0; i < 1000; i++) buf.push(i, 2 * i, 3 * i, 4 * i, 5, 6, 7);
    const dec = buf.decimate();
    expect(dec.length, "1000 → 200").toBe(PATH_POINTS);
    expect(dec[0], "first kept").toEqual({ s: 0, x: 0, y: 0, z: 0, halfWidth: 5, dilution: 6 });
    expect(dec[PATH_POINTS - 1].s, "last kept").toBe(999);
    expect(dec[1].s, "stride 999/199 rounded").toBe(5);
    expect(dec[100].s, "middle").toBe(Math.round((100 * 999) / 199));
    for (let k = 1; k < dec.length; k++) expect(dec[k].s, "increasing").toBeGreaterThan(dec[k - 1].s);
  });
});
