/**
 * Specification of core/nearfield/integral.ts (near-field Method 2, the integral jet model) and
 * its right-hand side core/nearfield/integral-rhs.ts. Every check value names its source; the
 * published laboratory bands live in tests/check-values/entrainment-lee-cheung-1990.json.
 */
import { describe, expect, it, beforeEach } from "vitest";
import { uniformColumn } from "../../helpers/jets";
import * as mathjs from "mathjs";
import checkValues from "../../check-values/entrainment-lee-cheung-1990.json";
import {
  CENTRELINE_PROFILE_FACTOR,
  integralInitialState,
  integralParamsFrom,
  nearFieldIntegral,
} from "../../../core/nearfield/integral";
import { IB, IC, INTEGRAL_DIM, IMX, IMY, IQ, IX, IY, IZ, integralJetRhs } from "../../../core/nearfield/integral-rhs";
import { integrateAdaptive } from "../../../core/ode/adaptive";
import { stepperDormandPrince45 } from "../../../core/ode/dormand-prince-45";
import type {
  AmbientColumn,
  JetSource,
  NearFieldEvent,
  NearFieldMethodResult,
  PathSink,
} from "../../../core/nearfield/types";

/** mathjs ships `solveODE` (Dormand–Prince RK45) but its type declarations omit it. */
const solveODE = (
  mathjs as unknown as {
    solveODE: (
      f: (t: number, y: number[]) => number[],
      tspan: [number, number],
      y0: number[],
      options: { tol: number; firstStep: number; maxIter: number },
    ) => { t: number[]; y: number[][] };
  }
).solveODE;

const G = 9.80665;

function jetFor(over: Partial<JetSource> & { froude?: number } = {}): JetSource {
  const d = over.diameter ?? 0.2;
  const u = over.velocity ?? 4;
  const froude = over.froude ?? u / Math.sqrt(0.25 * d);
  const gp = over.reducedGravity ?? (Number.isFinite(froude) ? (u / froude) ** 2 / d : 0);
  return {
    diameter: d,
    flow: (u * Math.PI * d * d) / 4,
    velocity: u,
    density: 1025 * (1 + gp / G),
    salinity: 70,
    temperature: 20,
    angle: 60,
    azimuth: 90,
    portHeight: 1,
    reducedGravity: gp,
    froude,
    ...over,
  };
}

/** Collects every sample the model emits. */
function collectingSink() {
  const rows: number[][] = [];
  const sink: PathSink & { rows: number[][]; begun: number; ended: number } = {
    rows,
    begun: 0,
    ended: 0,
    begin() {
      this.begun++;
    },
    sample(s, x, y, z, b, dil) {
      rows.push([s, x, y, z, b, dil]);
    },
    end() {
      this.ended++;
    },
  };
  return sink;
}

/** Independent reference: mathjs solveODE (RK45, its own step control) on the same RHS. */
function mathjsState(jet: JetSource, column: AmbientColumn, sEnd: number): number[] {
  const p = integralParamsFrom(jet, column);
  const y0 = Array.from(integralInitialState(jet, column));
  const yy = new Float64Array(INTEGRAL_DIM);
  const out = new Float64Array(INTEGRAL_DIM);
  const f = (s: number, y: number[]) => {
    for (let i = 0; i < INTEGRAL_DIM; i++) yy[i] = y[i];
    integralJetRhs(s, yy, out, p);
    return Array.from(out);
  };
  const sol = solveODE(f, [0, sEnd], y0, { tol: 1e-10, firstStep: 1e-3, maxIter: 200000 });
  return sol.y[sol.y.length - 1];
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("nearFieldIntegral(): agreement with an independent integration of the same equations", () => {
  const jet = jetFor({ angle: 60 });
  const column = uniformColumn(20, { currentSpeed: 0.1, currentDirection: 0 });
  let r: NearFieldMethodResult;
  let impact: NearFieldEvent;
  let maxRise: NearFieldEvent;
  beforeEach(() => {
    r = nearFieldIntegral(jet, column);
    impact = r.events!.find((e) => e.kind === "centreline-impact")!;
    maxRise = r.events!.find((e) => e.kind === "max-rise")!;
  });

  it("matches mathjs solveODE at the max-rise and impact points to 1e-4 (relative)", () => {
    expect(impact, "the typical 60° case reaches the seabed").toBeDefined();
    for (const ev of [maxRise, impact]) {
      const ref = mathjsState(jet, column, ev.s);
      expect(rel(ev.x, ref[IX]), `x at ${ev.kind} vs mathjs solveODE`).toBeLessThan(1e-4);
      expect(rel(ev.y, ref[IY]), `y (drift with the current) at ${ev.kind} vs mathjs`).toBeLessThan(1e-4);
      expect(Math.abs(ev.z - ref[IZ]), `z at ${ev.kind} vs mathjs (absolute, 1e-4 × 1 m scale)`).toBeLessThan(1e-4);
      const refDilution = Math.max(1, (ref[IQ] / jet.flow) * CENTRELINE_PROFILE_FACTOR);
      expect(rel(ev.dilution, refDilution), `dilution at ${ev.kind} vs mathjs`).toBeLessThan(1e-4);
    }
  });

  it("lands the impact event on z = −portHeight and the return event on z = 0 to 1e-6 m", () => {
    const ret = r.events!.find((e) => e.kind === "return-to-port-level")!;
    expect(Math.abs(impact.z + jet.portHeight), "impact event on the seabed plane").toBeLessThan(1e-6);
    expect(Math.abs(ret.z), "return event on the port-level plane").toBeLessThan(1e-6);
    expect(r.returnDistance!, "return comes before impact").toBeLessThan(r.impactDistance!);
  });
});

describe("integralJetRhs(): conservation properties (DERIVED from the flux equations)", () => {
  const run = (jet: JetSource, column: AmbientColumn, sEnd: number) => {
    const p = integralParamsFrom(jet, column);
    const y0 = integralInitialState(jet, column);
    const st = stepperDormandPrince45(integralJetRhs, INTEGRAL_DIM);
    const atol = new Float64Array(INTEGRAL_DIM).fill(1e-12);
    const res = integrateAdaptive(st, integralJetRhs, p, 0, y0, {
      rtol: 1e-9,
      atol,
      h0: 0.01,
      hMin: 1e-12,
      hMax: 1,
      maxSteps: 100000,
      tMax: sEnd,
    });
    return { y0, y: res.y };
  };

  it("conserves the buoyancy flux and the salinity-excess flux in a uniform ambient", () => {
    const { y0, y } = run(jetFor(), uniformColumn(1000), 10);
    expect(y[IQ] / y0[IQ], "the jet has entrained (otherwise the test proves nothing)").toBeGreaterThan(5);
    expect(rel(y[IB], y0[IB]), "B = Q·g′ constant without stratification").toBeLessThan(1e-12);
    expect(rel(y[IC], y0[IC]), "salinity-excess flux constant without stratification").toBeLessThan(1e-12);
  });

  it("conserves horizontal momentum flux in stagnant water", () => {
    const { y0, y } = run(jetFor({ angle: 45, azimuth: 30 }), uniformColumn(1000), 10);
    expect(rel(y[IMX], y0[IMX]), "east momentum flux constant (no horizontal force)").toBeLessThan(1e-12);
    expect(rel(y[IMY], y0[IMY]), "north momentum flux constant").toBeLessThan(1e-12);
  });

  it("adds exactly u_a·(Q − Q0) of momentum flux in the current direction (entrained ambient momentum)", () => {
    const ua = 0.3;
    const col = uniformColumn(1000, { currentSpeed: ua, currentDirection: 90 }); // current toward east
    const { y0, y } = run(jetFor({ angle: 60, azimuth: 0 }), col, 10);
    expect(rel(y[IMX] - y0[IMX], ua * (y[IQ] - y0[IQ])), "ΔM_east = u_a·ΔQ").toBeLessThan(1e-9);
    expect(rel(y[IMY], y0[IMY]), "no momentum change across the current").toBeLessThan(1e-12);
  });

  it("changes the density-excess flux by ∫ε dQ in a stratified ambient (it does not stay constant)", () => {
    const col: AmbientColumn = {
      ...uniformColumn(1000),
      depths: [0, 1000],
      densities: [1020, 1030],
    };
    const { y0, y } = run(jetFor({ angle: 90, reducedGravity: -0.05, froude: 4 / Math.sqrt(0.05 * 0.2) }), col, 5);
    // Rising through a stable profile it entrains water lighter than at the port: B (dense positive) falls.
    expect(y[IB], "density-excess flux relative to port-level water decreases").toBeLessThan(y0[IB] - 1e-6);
    expect(y[IC], "salinity-excess flux unchanged: this profile varies in density only").toBe(y0[IC]);
  });
});

describe("nearFieldIntegral(): classical limits", () => {
  it("pure-jet limit: u_c/U ≈ 6.2 d/x and c_c/c0 ≈ 5.0 d/x (Fischer et al. 1979; Chen & Rodi 1980 — from memory)", () => {
    const cv = checkValues.pureJet;
    const d = 0.1;
    const jet = jetFor({ diameter: d, reducedGravity: 0, froude: Infinity, angle: 0 });
    const sink = collectingSink();
    nearFieldIntegral(jet, uniformColumn(1000, {}), { sink, maxLength: 110 * d, relTol: 1e-9 });
    for (const xd of cv.xOverD) {
      // nearest sample at or beyond x/d
      const row = sink.rows.find((r) => r[1] >= xd * d)!;
      const x = row[1];
      // top-hat u_T = √(M0/π)/b and Gaussian centreline u_c = 2·u_T → u_c/U = d/b
      const ucU = d / row[4];
      expect(rel(ucU * (x / d), cv.velocityConstant), `velocity decay constant at x/d = ${xd} (±10 %)`).toBeLessThan(
        cv.relTol,
      );
      expect(
        rel((1 / row[5]) * (x / d), cv.concentrationConstant),
        `concentration constant at x/d = ${xd}`,
      ).toBeLessThan(cv.relTol);
    }
  });

  it("pure-plume limit: μ = 0.15 B^{1/3} z^{5/3} and g′_c = 11 B^{2/3} z^{−5/3} (Fischer et al. 1979 — from memory, ±15 %)", () => {
    const cv = checkValues.purePlume;
    // A lazy light source pointing up: F ≈ 0.3, so z ≫ l_M within metres.
    const jet = jetFor({
      diameter: 0.2,
      velocity: 0.1,
      reducedGravity: -0.5,
      froude: 0.1 / Math.sqrt(0.5 * 0.2),
      angle: 90,
    });
    const sink = collectingSink();
    const r = nearFieldIntegral(jet, uniformColumn(1000), { sink, maxLength: 160, relTol: 1e-9 });
    const B = jet.flow * 0.5;
    for (const z of cv.heights) {
      const row = sink.rows.find((rr) => rr[3] >= z)!;
      const zz = row[3];
      const q = (row[5] / CENTRELINE_PROFILE_FACTOR) * jet.flow;
      expect(
        rel(q, cv.volumeFluxConstant * B ** (1 / 3) * zz ** (5 / 3)),
        `plume volume flux at z = ${z} m`,
      ).toBeLessThan(cv.relTol);
      const gc = 0.5 / row[5];
      expect(
        rel(gc, cv.centrelineBuoyancyConstant * B ** (2 / 3) * zz ** (-5 / 3)),
        `plume centreline reduced gravity at z = ${z} m`,
      ).toBeLessThan(cv.relTol);
    }
    expect(
      r.warnings.some((w) => w.code === "integral-positively-buoyant"),
      "a light discharge is flagged",
    ).toBe(true);
  });
});

describe("nearFieldIntegral(): inclined dense jets in stagnant water vs laboratory data", () => {
  const inp = checkValues.stagnant.inputs;
  for (const c of checkValues.stagnant.cases) {
    it(`${c.angle}°: ${c.quantity} within [${c.low}, ${c.high}] (${c.source.split(":")[0]})`, () => {
      const jet = jetFor({
        diameter: inp.diameter,
        velocity: inp.velocity,
        froude: inp.froude,
        angle: c.angle,
        portHeight: inp.portHeight,
      });
      const r = nearFieldIntegral(jet, uniformColumn(inp.depth));
      const dF = inp.diameter * inp.froude;
      const value =
        c.quantity === "maxRiseHeight/(dF)"
          ? r.maxRiseHeight! / dF
          : c.quantity === "returnDistance/(dF)"
            ? r.returnDistance! / dF
            : c.quantity === "maxRiseDilution/F"
              ? r.maxRiseDilution! / inp.froude
              : r.impactDilution! / inp.froude;
      expect(value, `${c.quantity} at ${c.angle}° (${c.tolerance})`).toBeGreaterThanOrEqual(c.low);
      expect(value, `${c.quantity} at ${c.angle}° (${c.tolerance})`).toBeLessThanOrEqual(c.high);
    });
  }

  it("rise height increases with angle from 15° to 60° (Lai & Lee 2012: 0.44 → 2.08, CONFIRMED)", () => {
    const h = [15, 30, 45, 60].map(
      (a) => nearFieldIntegral(jetFor({ angle: a, froude: 30 }), uniformColumn(200)).maxRiseHeight!,
    );
    for (let i = 1; i < h.length; i++) expect(h[i], "monotonic in angle").toBeGreaterThan(h[i - 1]);
  });

  it("states the documented bias and gives a dilution range without altering the main number", () => {
    const r = nearFieldIntegral(jetFor(), uniformColumn(20));
    expect(r.bias, "bias names the source of the under-prediction").toMatch(/Lai & Lee.*2012/);
    expect(r.available, "available").toBe(true);
    expect(r.dilutionRange![0], "low end is the computed value, uncorrected").toBe(r.impactDilution);
    expect(r.dilutionRange![1], "high end at or above the computed value").toBeGreaterThanOrEqual(r.impactDilution!);
    expect(r.entrainedFlow!, "entrained flow = Q_impact − Q0 > 0").toBeGreaterThan(0);
    expect(r.method, "method name").toBe("integral");
  });

  it("states its impact-dilution bias by angle against Lai & Lee's (2012) 1.06 F over 38°–60°, and widens the range by it", () => {
    const r = nearFieldIntegral(jetFor({ angle: 45, froude: 30 }), uniformColumn(200));
    for (const a of [38, 45, 52, 60])
      expect(r.bias, `bias quotes ${a}°`).toMatch(new RegExp(`${a}°: \\d\\.\\d\\d·F \\(ratio \\d\\.\\d\\d\\)`));
    const ratios = [...r.bias.matchAll(/ratio (\d\.\d\d)\)/g)].map((m) => Number(m[1]));
    expect(ratios.length, "four laboratory angles").toBe(4);
    expect(ratios[0], "the model under-predicts more at 38° than at 60° (confirmed comparison)").toBeLessThan(
      ratios[3],
    );
    const high = r.dilutionRange![1] / r.impactDilution!;
    expect(high, "high end = computed ÷ the ratio at 45°").toBeCloseTo(1 / ratios[1], 1);
  });

  it("carries the impact dilution to the end of the near field with the Roberts et al. (1997) growth, 2.6/1.6 over 6.6 dF", () => {
    const jet = jetFor({ angle: 60, froude: 25 });
    const r = nearFieldIntegral(jet, uniformColumn(20));
    expect(r.nearFieldDilution, "S_n = S_i × 2.6/1.6").toBeCloseTo(r.impactDilution! * (2.6 / 1.6), 10);
    expect(r.nearFieldDistance, "x_n = x_i + (9.0 − 2.4)·d·F").toBeCloseTo(
      r.impactDistance! + 6.6 * jet.diameter * jet.froude,
      10,
    );
    expect(r.impactDilutionFluxAveraged! / r.impactDilution!, "flux-averaged ÷ centreline = (1 + λ²)/λ²").toBeCloseTo(
      2.44 / 1.44,
      6,
    );
    expect(r.fluxAveragingFactor, "the factor is stated").toBeCloseTo(2.44 / 1.44, 12);
    expect(r.entrainedFlow, "entrained flow on the flux-averaged basis").toBeCloseTo(
      jet.flow * (r.impactDilutionFluxAveraged! - 1),
      9,
    );
  });
});

describe("nearFieldIntegral(): currents, geometry and output plumbing", () => {
  it("sweeps the jet downstream: a current toward north moves the impact point north", () => {
    const r = nearFieldIntegral(jetFor({ azimuth: 90 }), uniformColumn(20, { currentSpeed: 0.2, currentDirection: 0 }));
    const impact = r.events!.find((e) => e.kind === "centreline-impact")!;
    expect(impact.y, "drift along the current").toBeGreaterThan(0.5);
    expect(impact.x, "still discharged toward east").toBeGreaterThan(0);
  });

  it("is invariant under rotating both the port azimuth and the current direction (DERIVED)", () => {
    const a = nearFieldIntegral(
      jetFor({ azimuth: 90 }),
      uniformColumn(20, { currentSpeed: 0.15, currentDirection: 30 }),
    );
    const b = nearFieldIntegral(
      jetFor({ azimuth: 200 }),
      uniformColumn(20, { currentSpeed: 0.15, currentDirection: 140 }),
    );
    // Equal to the integration tolerance (round-off in sin/cos changes the step sequence).
    expect(rel(b.impactDistance!, a.impactDistance!), "same plan distance").toBeLessThan(1e-6);
    expect(rel(b.impactDilution!, a.impactDilution!), "same dilution").toBeLessThan(1e-6);
    expect(rel(b.maxRiseHeight!, a.maxRiseHeight!), "same rise").toBeLessThan(1e-6);
  });

  it("sends every accepted step to the sink but returns at most ~200 path points", () => {
    const sink = collectingSink();
    const r = nearFieldIntegral(jetFor(), uniformColumn(20), { sink, relTol: 1e-13, absTol: 1e-14 });
    expect(sink.begun, "begin called once").toBe(1);
    expect(sink.ended, "end called once").toBe(1);
    expect(sink.rows.length, "tight tolerance produces many steps").toBeGreaterThan(200);
    expect(r.path!.length, "decimated path").toBeLessThanOrEqual(200);
    expect(r.path![0].s, "path starts at the port").toBe(0);
    expect(r.path![r.path!.length - 1].z, "path ends at the seabed").toBeCloseTo(-1, 6);
    const noPath = nearFieldIntegral(jetFor(), uniformColumn(20), { includePath: false });
    expect(noPath.path, "includePath: false omits the path").toBeUndefined();
  });

  it("warns when the jet reaches the surface in shallow water", () => {
    const r = nearFieldIntegral(jetFor(), uniformColumn(3));
    expect(
      r.warnings.map((w) => w.code),
      "surface warning",
    ).toContain("jet-reaches-surface");
    expect(
      r.events!.some((e) => e.kind === "surface-contact"),
      "surface event",
    ).toBe(true);
  });

  it("reports lower-edge seabed contact before centreline impact", () => {
    const r = nearFieldIntegral(jetFor(), uniformColumn(20));
    const kinds = r.events!.map((e) => e.kind);
    expect(kinds.indexOf("seabed-contact"), "edge touches first").toBeLessThan(kinds.indexOf("centreline-impact"));
  });

  it("stops a jet trapped by stratification with a warning", () => {
    // Light discharge into strongly stratified water: rises, overshoots its neutral level, is trapped.
    const col: AmbientColumn = {
      ...uniformColumn(100),
      depths: [0, 100],
      densities: [1015, 1030],
      salinities: [30, 38],
    };
    const jet = jetFor({ angle: 90, velocity: 1, reducedGravity: -0.02, froude: 1 / Math.sqrt(0.02 * 0.2) });
    const r = nearFieldIntegral(jet, col);
    expect(
      r.warnings.map((w) => w.code),
      "trap warning",
    ).toContain("jet-trapped");
    expect(
      r.events!.some((e) => e.kind === "trapped"),
      "trapped event",
    ).toBe(true);
    expect(r.impactDistance, "no seabed impact").toBeNull();
  });
});

describe("nearFieldIntegral(): guards and degenerate inputs", () => {
  const finiteOrNull = (v: number | null | undefined) => v === null || v === undefined || Number.isFinite(v);
  const cases: [string, JetSource, AmbientColumn][] = [
    ["zero buoyancy", jetFor({ reducedGravity: 0, froude: Infinity }), uniformColumn(20)],
    ["zero current", jetFor(), uniformColumn(20, { currentSpeed: 0 })],
    ["vertical port", jetFor({ angle: 90 }), uniformColumn(20)],
    ["horizontal port", jetFor({ angle: 0 }), uniformColumn(20)],
    ["very deep water", jetFor(), uniformColumn(2000)],
    ["very shallow water", jetFor(), uniformColumn(1.2)],
    ["strong current", jetFor(), uniformColumn(20, { currentSpeed: 2, currentDirection: 45 })],
    ["near-neutral buoyancy", jetFor({ reducedGravity: 1e-6, froude: 4 / Math.sqrt(1e-6 * 0.2) }), uniformColumn(20)],
  ];
  for (const [name, jet, col] of cases) {
    it(`${name}: returns finite numbers or null, never NaN`, () => {
      const r = nearFieldIntegral(jet, col);
      for (const k of [
        "maxRiseHeight",
        "maxRiseDistance",
        "returnDistance",
        "impactDistance",
        "impactDilution",
        "maxRiseDilution",
        "entrainedFlow",
      ] as const) {
        expect(finiteOrNull(r[k]), `${k} finite or null`).toBe(true);
      }
      for (const p of r.path ?? []) {
        expect(Number.isFinite(p.x) && Number.isFinite(p.z) && Number.isFinite(p.dilution), "finite path").toBe(true);
      }
    });
  }

  it("zero buoyancy is flagged as near-neutral and reports no impact", () => {
    const r = nearFieldIntegral(jetFor({ reducedGravity: 0, froude: Infinity, angle: 0 }), uniformColumn(20), {
      maxLength: 50,
    });
    const codes = r.warnings.map((w) => w.code);
    expect(codes, "near-neutral warning").toContain("integral-near-neutral");
    expect(codes, "no impact warning").toContain("integral-no-impact");
    expect(codes, "length limit warning").toContain("integral-length-limit");
  });

  it("the step limit produces a warning, not a hang", () => {
    const r = nearFieldIntegral(jetFor(), uniformColumn(20), { maxSteps: 3 });
    expect(
      r.warnings.map((w) => w.code),
      "step-limit warning",
    ).toContain("integral-step-limit");
    expect(
      r.events!.some((e) => e.kind === "step-limit"),
      "step-limit event",
    ).toBe(true);
    expect(r.impactDistance, "no impact within 3 steps").toBeNull();
  });

  it("a vertical dense fountain stalls with a warning instead of failing", () => {
    const r = nearFieldIntegral(jetFor({ angle: 90 }), uniformColumn(50));
    expect(r.maxRiseHeight!, "a finite fountain height").toBeGreaterThan(0);
    expect(
      r.warnings.some((w) => w.code === "jet-momentum-exhausted" || w.code === "integral-step-underflow"),
      "stall flagged",
    ).toBe(true);
  });

  it("invalid geometry returns a serious warning instead of throwing", () => {
    const r = nearFieldIntegral(jetFor({ diameter: 0 }), uniformColumn(20));
    expect(r.warnings[0].severity, "serious").toBe("serious");
    const r2 = nearFieldIntegral(jetFor({ portHeight: 30 }), uniformColumn(20));
    expect(r2.warnings[0].code, "port above the surface").toBe("integral-invalid-input");
  });
});
