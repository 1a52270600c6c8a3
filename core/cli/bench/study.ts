/**
 * Benchmark of the study loops around the pipeline: 10,000 Monte Carlo cases of a 4-port line diffuser
 * (both near-field methods run in every case, default input spreads, one ambient case) on one worker
 * thread and on all cores, and a 30 × 30 sweep (current speed × port diameter) on all cores.
 *
 * Warm-up and steady state are reported apart: the first study on a fresh pool includes starting the
 * workers and the compiler's warm-up; the app and a long session keep their pool alive, so later
 * studies run on warm workers (the steady state, which the targets apply to). A pure-compute loop run
 * on the same pools in the same window is the control: it shows what speed-up the machine itself
 * gives two threads at that moment (shared or throttled cores show up there, not only in ours).
 * Targets (printed, not asserted): ≥ 5,000 cases/s on one core, ≥ 1.6× on two, sweep ≤ 1 s.
 */
import { availableParallelism } from "node:os";
import { parseScenario } from "../../scenario/parse";
import type { Scenario } from "../../scenario/types";
import { planMonteCarlo, summariseMonteCarlo, type MonteCarloPlan } from "../../study/montecarlo";
import { sweepGrid } from "../../study/sweep";
import { StudyPool } from "../workers/pool";
import { monteCarloOnPool, pointsOnWorkers } from "../workers/run-study";

export const STUDY_BENCH_TARGETS = {
  monteCarloOneCoreSeconds: 2,
  monteCarloOneCoreCasesPerSecond: 5000,
  monteCarloSpeedup: 1.6,
  sweepSeconds: 1,
} as const;

/** Iterations of the control loop per task (about 0.1 s of arithmetic on one core). */
const CONTROL_ITERATIONS = 40_000_000;

const MC_RUNS = 10_000;
const SEED = 20_240_601;

/** Invented 4-port example: 0.25 m³/s of 65 g/kg brine, 15 m of water, weak current (the scenario file's text). */
export const BENCH_SCENARIO_INPUT = {
  format: "brinefield-scenario",
  version: 1,
  name: "Study benchmark: four-port diffuser",
  discharge: { flow: 0.25, salinity: 65, temperature: 22 },
  ambient: { depth: 15, salinity: 36, temperature: 20, currentSpeed: 0.1, currentDirection: 90 },
  diffuser: {
    layout: "line",
    portCount: 4,
    portDiameter: 0.12,
    portAngle: 60,
    portHeight: 1,
    portSpacing: 5,
    portAzimuth: 0,
    diffuserAzimuth: 90,
  },
  mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxIncrease: 2 }] },
  options: { addSlackWater: false },
} as const;

export function benchScenario(): Scenario {
  const r = parseScenario(BENCH_SCENARIO_INPUT);
  if (!r.ok) throw new Error(`benchmark scenario: ${r.issues.map((i) => i.message).join("; ")}`);
  return r.scenario;
}

async function timeMonteCarlo(pool: StudyPool, s: Scenario, plan: MonteCarloPlan): Promise<number> {
  const t0 = performance.now();
  const chunks = await monteCarloOnPool(pool, s, plan);
  const seconds = (performance.now() - t0) / 1000;
  const summary = summariseMonteCarlo(plan, chunks);
  if (summary.runs !== MC_RUNS) throw new Error(`benchmark ran ${summary.runs} of ${MC_RUNS} cases`);
  return seconds;
}

/** Seconds for `tasks` control tasks on the pool (each worker takes tasks as it frees up). */
async function timeControl(pool: StudyPool, tasks: number): Promise<number> {
  const t0 = performance.now();
  await pool.run(Array.from({ length: tasks }, () => ({ kind: "control" as const, iterations: CONTROL_ITERATIONS })));
  return (performance.now() - t0) / 1000;
}

export interface StudyBench {
  /** Cases per second on all cores, steady state. */
  readonly monteCarloCasesPerSecond: number;
  /** One core ÷ all cores, steady state (warm workers on both). */
  readonly monteCarloSpeedup: number;
  readonly sweepSeconds: number;
  /** 10,000 cases on one warm worker. */
  readonly monteCarloOneCoreSeconds: number;
  readonly monteCarloOneCoreCasesPerSecond: number;
  /** The first 10,000 cases on a fresh one-worker pool: worker start and compiler warm-up included. */
  readonly monteCarloOneCoreFirstRunSeconds: number;
  /** The first run on a fresh all-core pool. */
  readonly monteCarloAllCoresFirstRunSeconds: number;
  /** The pure-compute control's speed-up on the same pools, measured between the Monte Carlo runs. */
  readonly parallelControlSpeedup: number;
}

export async function benchStudy(): Promise<StudyBench> {
  const s = benchScenario();
  const cores = Math.max(1, availableParallelism());
  const p = planMonteCarlo(s, MC_RUNS, SEED);
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
  const one = new StudyPool(1);
  const all = cores > 1 ? new StudyPool(cores) : one;
  try {
    const monteCarloOneCoreFirstRunSeconds = await timeMonteCarlo(one, s, p.plan);
    const monteCarloAllCoresFirstRunSeconds =
      all === one ? monteCarloOneCoreFirstRunSeconds : await timeMonteCarlo(all, s, p.plan);
    // Steady state, interleaved with the control so that both see the same load.
    const controlOne = await timeControl(one, cores);
    const oneCore = await timeMonteCarlo(one, s, p.plan);
    const allCores = all === one ? oneCore : await timeMonteCarlo(all, s, p.plan);
    const controlAll = all === one ? controlOne : await timeControl(all, cores);
    const grid = sweepGrid([
      { path: "ambient.currentSpeed", from: 0, to: 0.6, steps: 30 },
      { path: "diffuser.portDiameter", from: 0.08, to: 0.2, steps: 30 },
    ]);
    const t0 = performance.now();
    const points = await pointsOnWorkers(
      s,
      grid.map((g) => g.overrides),
      cores,
    );
    const sweepSeconds = (performance.now() - t0) / 1000;
    if (points.length !== 900) throw new Error(`sweep ran ${points.length} of 900 points`);
    return {
      monteCarloCasesPerSecond: MC_RUNS / allCores,
      monteCarloSpeedup: oneCore / allCores,
      sweepSeconds,
      monteCarloOneCoreSeconds: oneCore,
      monteCarloOneCoreCasesPerSecond: MC_RUNS / oneCore,
      monteCarloOneCoreFirstRunSeconds,
      monteCarloAllCoresFirstRunSeconds,
      parallelControlSpeedup: controlOne / controlAll,
    };
  } finally {
    await one.close();
    if (all !== one) await all.close();
  }
}

/** Lines for the benchmark report, each with its target. */
export function describeStudyBench(r: StudyBench, cores = availableParallelism()): string {
  const t = STUDY_BENCH_TARGETS;
  return [
    `Monte Carlo, ${MC_RUNS} cases, one warm worker: ${r.monteCarloOneCoreSeconds.toFixed(2)} s, ` +
      `${Math.round(r.monteCarloOneCoreCasesPerSecond)} cases/s (target ≥ ${t.monteCarloOneCoreCasesPerSecond}); ` +
      `first run on a fresh worker (start and warm-up): ${r.monteCarloOneCoreFirstRunSeconds.toFixed(2)} s`,
    `Monte Carlo on ${cores} warm workers: ${Math.round(r.monteCarloCasesPerSecond)} cases/s, ` +
      `speed-up ×${r.monteCarloSpeedup.toFixed(2)} (target ≥ ×${t.monteCarloSpeedup}); first run on fresh workers: ` +
      `${r.monteCarloAllCoresFirstRunSeconds.toFixed(2)} s`,
    `Control (pure arithmetic on the same workers, same window): speed-up ×${r.parallelControlSpeedup.toFixed(2)} ` +
      "— what the machine gave two threads at that moment",
    `Sweep 30 × 30: ${r.sweepSeconds.toFixed(2)} s (target ≤ ${t.sweepSeconds} s)`,
  ].join("\n");
}
