/**
 * Benchmark of the integral jet model (near-field Method 2): median microseconds per solve of the
 * exact `nearFieldIntegral` code path the app uses (default tolerances, path included), and the
 * same right-hand side solved by mathjs `solveODE` (RK45) over the same arc length as a reference.
 *
 * Typical case: 60° port, d = 0.2 m, U = 4 m/s, g′ = 0.25 m/s² (F ≈ 17.9), depth 20 m, port 1 m
 * above the seabed, stagnant uniform ambient. Target: ≤ 100 µs per solve.
 *
 * Tolerance parity: mathjs bounds the max-norm of the local error estimate absolutely; it is given
 * tol = INTEGRAL_DEFAULT_REL_TOL, which with state magnitudes of order 0.1–100 is no stricter than
 * our mixed rtol/atol control (the reference does no event location, so the comparison favours it).
 */
import {
  create,
  // @ts-expect-error: mathjs ships solveODE and its dependency list, but its type declarations omit them.
  solveODEDependencies,
} from "mathjs";
import {
  INTEGRAL_DEFAULT_REL_TOL,
  integralInitialState,
  integralParamsFrom,
  nearFieldIntegral,
} from "../../nearfield/integral";
import { INTEGRAL_DIM, integralJetRhs } from "../../nearfield/integralRhs";
import type { AmbientColumn, JetSource } from "../../nearfield/types";

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

const G = 9.80665;

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

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
}

export function benchIntegral(): { integralSolveMicros: number; referenceSolveMicros: number; referenceRatio: number } {
  // Ours: warm up the JIT, then time batches and take the median per-solve time.
  let sink = 0;
  for (let i = 0; i < 500; i++) sink += nearFieldIntegral(BENCH_JET, BENCH_COLUMN).impactDistance ?? 0;
  const batch = 100;
  const ours: number[] = [];
  for (let k = 0; k < 31; k++) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink += nearFieldIntegral(BENCH_JET, BENCH_COLUMN).impactDistance ?? 0;
    ours.push(((performance.now() - t0) * 1000) / batch);
  }
  const result = nearFieldIntegral(BENCH_JET, BENCH_COLUMN);
  const impact = result.events?.find((e) => e.kind === "centreline-impact");
  const sEnd = impact ? impact.s : 10;

  // Reference: mathjs solveODE on the same RHS, same start, same arc length.
  const params = integralParamsFrom(BENCH_JET, BENCH_COLUMN);
  const y0 = Array.from(integralInitialState(BENCH_JET, BENCH_COLUMN));
  const yy = new Float64Array(INTEGRAL_DIM);
  const out = new Float64Array(INTEGRAL_DIM);
  const f = (s: number, y: number[]) => {
    for (let i = 0; i < INTEGRAL_DIM; i++) yy[i] = y[i];
    integralJetRhs(s, yy, out, params);
    return Array.from(out);
  };
  const solveRef = () =>
    solveODE(f, [0, sEnd], y0, { tol: INTEGRAL_DEFAULT_REL_TOL, firstStep: 0.1, maxIter: 1e6 });
  for (let i = 0; i < 3; i++) sink += solveRef().t.length;
  const ref: number[] = [];
  for (let k = 0; k < 9; k++) {
    const t0 = performance.now();
    sink += solveRef().t.length;
    ref.push((performance.now() - t0) * 1000);
  }
  if (sink === -1) throw new Error("unreachable: keeps the timed work observable");

  const integralSolveMicros = median(ours);
  const referenceSolveMicros = median(ref);
  return { integralSolveMicros, referenceSolveMicros, referenceRatio: referenceSolveMicros / integralSolveMicros };
}
