/**
 * Benchmark of the integral jet model (near-field Method 2): median microseconds per solve of the
 * exact `nearFieldIntegral` code path the app uses (default tolerances, path included), timed in
 * alternating batches with a minimal hand-written solver of the same equations (./minimal-solver), so
 * both see the same machine load; the accuracy study behind the default tolerance; and mathjs
 * `solveODE` on the same right-hand side at equal accuracy.
 *
 * Typical case: 60° port, d = 0.2 m, U = 4 m/s, g′ = 0.25 m/s² (F ≈ 17.9), depth 20 m, port 1 m
 * above the seabed, stagnant uniform ambient. Targets: ≤ 40 µs per solve, ≤ 1.3× the minimal solver.
 *
 * Equal accuracy: every solver's error is measured against a tight solve of the same equations
 * (rtol 1e-12) at the same arc length (ours: impact; mathjs: to that arc length, no events, which
 * favours it). mathjs bounds the max-norm of its local error absolutely, so its tolerance is searched
 * on a grid and the setting whose error is nearest ours (on a log scale) is timed.
 */
import {
  create,
  // @ts-expect-error: mathjs ships solveODE and its dependency list, but its type declarations omit them.
  solveODEDependencies,
} from "mathjs";
import {
  INTEGRAL_DEFAULT_ABS_TOL,
  INTEGRAL_DEFAULT_REL_TOL,
  integralInitialState,
  integralParamsFrom,
  nearFieldIntegral,
} from "../../nearfield/integral";
import { IB, IC, IMX, IMY, IMZ, INTEGRAL_DIM, IQ, IX, IY, IZ, integralJetRhs } from "../../nearfield/integral-rhs";
import { CENTRELINE_PROFILE_FACTOR } from "../../nearfield/integral-setup";
import { integrateAdaptive } from "../../ode/adaptive";
import { stepperDormandPrince45 } from "../../ode/dormand-prince-45";
import type { AmbientColumn, JetSource, NearFieldMethodResult } from "../../nearfield/types";
import { minimalImpactSolve } from "./minimal-solver";
import { STANDARD_GRAVITY } from "../../constants";

type SolveODE = (
  f: (t: number, y: number[]) => number[],
  tspan: [number, number],
  y0: number[],
  options: { tol: number; firstStep: number; maxIter: number },
) => { t: number[]; y: number[][] };

/**
 * mathjs `solveODE` (Dormand–Prince RK45), from an instance holding only it and its dependencies, made on
 * first use: the whole default mathjs instance would be built at import time by every command and every
 * study worker thread of the bundle.
 */
let solveODEInstance: SolveODE | null = null;
function solveODE(...args: Parameters<SolveODE>): ReturnType<SolveODE> {
  if (!solveODEInstance) {
    const factories = solveODEDependencies as Parameters<typeof create>[0];
    solveODEInstance = (create(factories) as unknown as { solveODE: SolveODE }).solveODE;
  }
  return solveODEInstance(...args);
}

const G = STANDARD_GRAVITY;

export const BENCH_JET: JetSource = {
  diameter: 0.2,
  flow: (4 * Math.PI * 0.2 * 0.2) / 4,
  velocity: 4,
  density: 1025 * (1 + 0.25 / G),
  salinity: 70,
  temperature: 20,
  angle: 60,
  azimuth: 90,
  portHeight: 1,
  reducedGravity: 0.25,
  froude: 4 / Math.sqrt(0.25 * 0.2),
};

export const BENCH_COLUMN: AmbientColumn = {
  depth: 20,
  depths: [0, 20],
  densities: [1025, 1025],
  salinities: [35, 35],
  temperatures: [20, 20],
  currentSpeed: 0,
  currentDirection: 0,
};

function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
}

/** Variants of the bench case for the accuracy study: the case itself, with a cross-current, stratified. */
function studyCases(): { name: string; jet: JetSource; column: AmbientColumn }[] {
  return [
    { name: "bench case", jet: BENCH_JET, column: BENCH_COLUMN },
    {
      name: "0.2 m/s cross-current",
      jet: BENCH_JET,
      column: { ...BENCH_COLUMN, currentSpeed: 0.2, currentDirection: 0 },
    },
    {
      name: "stratified (1 kg/m³ over 20 m)",
      jet: BENCH_JET,
      column: {
        ...BENCH_COLUMN,
        depths: [0, 8, 12, 20],
        densities: [1024.4, 1024.6, 1025.2, 1025.4],
        salinities: [34.3, 34.5, 35.2, 35.4],
        temperatures: [20, 20, 20, 20],
      },
    },
  ];
}

/** Largest relative change of the key outputs (impact dilution and distance, maximum rise). */
function keyOutputError(r: NearFieldMethodResult, ref: NearFieldMethodResult): number {
  let worst = 0;
  for (const k of ["impactDilution", "impactDistance", "maxRiseHeight"] as const) {
    const a = r[k];
    const b = ref[k];
    if (a === null || b === null) return Number.POSITIVE_INFINITY;
    worst = Math.max(worst, Math.abs(a / b - 1));
  }
  return worst;
}

export interface AccuracyRow {
  readonly relTol: number;
  /** Largest relative error of the key outputs over the study cases, against rtol 1e-12. */
  readonly maxRelativeError: number;
  /** Right-hand-side evaluations on the bench case. */
  readonly evaluations: number;
}

/** Budget for the default tolerance: a third of the 1e-6 relative change the demo regression record allows. */
export const ACCURACY_BUDGET = 3e-7;
const STUDY_TOLERANCES = [1e-5, 1e-6, 3e-7, 1e-7, 3e-8, 1e-8];

/** Error of the key outputs against a tight solve, per tolerance (absolute tolerance 1/100 of it, as the default). */
export function integralAccuracyStudy(): AccuracyRow[] {
  const cases = studyCases().map((c) => ({
    ...c,
    ref: nearFieldIntegral(c.jet, c.column, { relTol: 1e-12, absTol: 1e-14, includePath: false }),
  }));
  return STUDY_TOLERANCES.map((relTol) => {
    let worst = 0;
    let evaluations = 0;
    for (const c of cases) {
      const r = nearFieldIntegral(c.jet, c.column, { relTol, absTol: relTol / 100, includePath: false });
      worst = Math.max(worst, keyOutputError(r, c.ref));
      if (c.name === "bench case") evaluations = evaluationsOf(r);
    }
    return { relTol, maxRelativeError: worst, evaluations };
  });
}

function evaluationsOf(r: NearFieldMethodResult): number {
  const note = r.notes?.find((n) => n.startsWith("Integration:")) ?? "";
  const m = / (\d+) evaluations/.exec(note);
  return m ? Number(m[1]) : Number.NaN;
}

/** Absolute tolerances of the model for the bench jet, as `nearFieldIntegral` sets them. */
function benchAtol(y0: Float64Array, absTol: number): Float64Array {
  const atol = new Float64Array(INTEGRAL_DIM);
  const q0 = y0[IQ];
  const m0 = q0 * BENCH_JET.velocity;
  atol[IX] = atol[IY] = atol[IZ] = absTol * BENCH_JET.diameter;
  atol[IQ] = absTol * q0;
  atol[IMX] = atol[IMY] = atol[IMZ] = absTol * m0;
  atol[IB] = absTol * (Math.abs(y0[IB]) > 0 ? Math.abs(y0[IB]) : q0 * 1e-3);
  atol[IC] = absTol * (Math.abs(y0[IC]) > 0 ? Math.abs(y0[IC]) : q0);
  return atol;
}

export interface IntegralBench {
  readonly integralSolveMicros: number;
  readonly minimalSolverMicros: number;
  /** Median over paired batches of (ours ÷ minimal). */
  readonly minimalSolverRatio: number;
  /** Largest relative difference of impact dilution and distance between ours and the minimal solver. */
  readonly minimalSolverDifference: number;
  readonly referenceSolveMicros: number;
  readonly referenceRatio: number;
  readonly referenceErrorRatio: number;
  readonly referenceTolerance: number;
  readonly integralError: number;
  readonly referenceError: number;
  readonly accuracyStudy: readonly AccuracyRow[];
}

export function benchIntegral(): IntegralBench {
  const accuracyStudy = integralAccuracyStudy();

  // Ours and the minimal solver, warmed up, then timed in alternating batches (same load for both).
  const params = integralParamsFrom(BENCH_JET, BENCH_COLUMN);
  const y0 = integralInitialState(BENCH_JET, BENCH_COLUMN, params);
  const atol = benchAtol(y0, INTEGRAL_DEFAULT_ABS_TOL);
  const minimalInput = {
    params,
    y0,
    portHeight: BENCH_JET.portHeight,
    rtol: INTEGRAL_DEFAULT_REL_TOL,
    atol,
    h0: 0.1 * BENCH_JET.diameter,
    hMax: 100,
  };
  const minimal = () => minimalImpactSolve(minimalInput);
  const ours = () => nearFieldIntegral(BENCH_JET, BENCH_COLUMN);
  let sink = 0;
  for (let i = 0; i < 3000; i++) sink += (ours().impactDistance ?? 0) + minimal().s;
  const batch = 50;
  const oursMicros: number[] = [];
  const minimalMicros: number[] = [];
  const ratios: number[] = [];
  for (let k = 0; k < 101; k++) {
    let t0 = performance.now();
    for (let i = 0; i < batch; i++) sink += minimal().s;
    const m = ((performance.now() - t0) * 1000) / batch;
    t0 = performance.now();
    for (let i = 0; i < batch; i++) sink += ours().impactDistance ?? 0;
    const o = ((performance.now() - t0) * 1000) / batch;
    minimalMicros.push(m);
    oursMicros.push(o);
    ratios.push(o / m);
  }
  const result = ours();
  const min = minimal();
  const minimalSolverDifference = Math.max(
    Math.abs((min.fluxRatio * CENTRELINE_PROFILE_FACTOR) / (result.impactDilution ?? Number.NaN) - 1),
    Math.abs(Math.hypot(min.x, min.yNorth) / (result.impactDistance ?? Number.NaN) - 1),
  );

  // Equal accuracy against mathjs: errors of Q and the horizontal distance at the impact arc length.
  const impact = result.events?.find((e) => e.kind === "centreline-impact");
  const sEnd = impact ? impact.s : 10;
  const tight = integrateAdaptive(stepperDormandPrince45(integralJetRhs, INTEGRAL_DIM), integralJetRhs, params, 0, y0, {
    rtol: 1e-12,
    atol: benchAtol(y0, 1e-14),
    h0: 0.1 * BENCH_JET.diameter,
    hMin: 1e-14,
    hMax: 100,
    maxSteps: 1e6,
    tMax: sEnd,
  });
  const errorOf = (q: number, x: number) => Math.max(Math.abs(q / tight.y[IQ] - 1), Math.abs(x / tight.y[IX] - 1));
  const integralError = errorOf(
    ((result.impactDilution ?? Number.NaN) / CENTRELINE_PROFILE_FACTOR) * y0[IQ],
    result.impactDistance ?? Number.NaN,
  );

  const yy = new Float64Array(INTEGRAL_DIM);
  const out = new Float64Array(INTEGRAL_DIM);
  const f = (s: number, y: number[]) => {
    for (let i = 0; i < INTEGRAL_DIM; i++) yy[i] = y[i];
    integralJetRhs(s, yy, out, params);
    return Array.from(out);
  };
  const y0List = Array.from(y0);
  const solveRef = (tol: number) =>
    solveODE(f, [0, sEnd], y0List, { tol, firstStep: 0.1 * BENCH_JET.diameter, maxIter: 1e6 });
  const refErrorAt = (tol: number) => {
    const r = solveRef(tol);
    const last = r.y[r.y.length - 1]!;
    return errorOf(last[IQ]!, last[IX]!);
  };
  // Tolerance grid, three per decade; the setting with the error nearest ours (log scale) is timed.
  let referenceTolerance = 1e-6;
  let referenceError = Number.POSITIVE_INFINITY;
  let best = Number.POSITIVE_INFINITY;
  for (let e = 3; e <= 33; e++) {
    const tol = 10 ** (-e / 3);
    const err = refErrorAt(tol);
    const distance = Math.abs(Math.log(err / integralError));
    if (distance < best) {
      best = distance;
      referenceTolerance = tol;
      referenceError = err;
    }
    if (err < integralError / 10) break;
  }
  for (let i = 0; i < 3; i++) sink += solveRef(referenceTolerance).t.length;
  const ref: number[] = [];
  const tRef = performance.now();
  while (ref.length < 15 || (ref.length < 101 && performance.now() - tRef < 2000)) {
    const t0 = performance.now();
    sink += solveRef(referenceTolerance).t.length;
    ref.push((performance.now() - t0) * 1000);
  }
  if (sink === -1) throw new Error("unreachable: keeps the timed work observable");

  const integralSolveMicros = median(oursMicros);
  const referenceSolveMicros = median(ref);
  return {
    integralSolveMicros,
    minimalSolverMicros: median(minimalMicros),
    minimalSolverRatio: median(ratios),
    minimalSolverDifference,
    referenceSolveMicros,
    referenceRatio: referenceSolveMicros / integralSolveMicros,
    referenceErrorRatio: integralError / referenceError,
    referenceTolerance,
    integralError,
    referenceError,
    accuracyStudy,
  };
}
