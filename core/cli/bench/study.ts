/**
 * Benchmark of the study loops around the pipeline: 10,000 Monte Carlo cases of a 4-port line diffuser
 * (both near-field methods run in every case, default input spreads, one ambient case) on one worker
 * thread and on all cores, and a 30 × 30 sweep (current speed × port diameter) on all cores.
 * Worker start-up is included: it is what a user waits for. Targets (printed, not asserted):
 * ≤ 2 s for the Monte Carlo on one core, near-linear speed-up on two cores, sweep ≤ 1 s.
 */
import { availableParallelism } from "node:os";
import { parseScenario } from "../../scenario/parse";
import type { Scenario } from "../../scenario/types";
import { planMonteCarlo, summariseMonteCarlo } from "../../study/montecarlo";
import { sweepGrid } from "../../study/sweep";
import { monteCarloOnWorkers, pointsOnWorkers } from "../workers/run-study";

export const STUDY_BENCH_TARGETS = {
  monteCarloOneCoreSeconds: 2,
  sweepSeconds: 1,
} as const;

const MC_RUNS = 10_000;
const SEED = 20_240_601;

/** Invented 4-port example: 0.25 m³/s of 65 g/kg brine, 15 m of water, weak current. */
export function benchScenario(): Scenario {
  const r = parseScenario({
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
  });
  if (!r.ok) throw new Error(`benchmark scenario: ${r.issues.map((i) => i.message).join("; ")}`);
  return r.scenario;
}

async function timeMonteCarlo(s: Scenario, workers: number): Promise<number> {
  const p = planMonteCarlo(s, MC_RUNS, SEED);
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
  const t0 = performance.now();
  const chunks = await monteCarloOnWorkers(s, p.plan, workers);
  const seconds = (performance.now() - t0) / 1000;
  const summary = summariseMonteCarlo(p.plan, chunks);
  if (summary.runs !== MC_RUNS) throw new Error(`benchmark ran ${summary.runs} of ${MC_RUNS} cases`);
  return seconds;
}

export async function benchStudy(): Promise<{
  monteCarloCasesPerSecond: number;
  monteCarloSpeedup: number;
  sweepSeconds: number;
  monteCarloOneCoreSeconds: number;
}> {
  const s = benchScenario();
  const cores = Math.max(1, availableParallelism());
  const monteCarloOneCoreSeconds = await timeMonteCarlo(s, 1);
  const allCoresSeconds = cores > 1 ? await timeMonteCarlo(s, cores) : monteCarloOneCoreSeconds;
  const grid = sweepGrid([
    { path: "ambient.currentSpeed", from: 0, to: 0.6, steps: 30 },
    { path: "diffuser.portDiameter", from: 0.08, to: 0.2, steps: 30 },
  ]);
  const t0 = performance.now();
  const points = await pointsOnWorkers(s, grid.map((g) => g.overrides), cores);
  const sweepSeconds = (performance.now() - t0) / 1000;
  if (points.length !== 900) throw new Error(`sweep ran ${points.length} of 900 points`);
  return {
    monteCarloCasesPerSecond: MC_RUNS / allCoresSeconds,
    monteCarloSpeedup: monteCarloOneCoreSeconds / allCoresSeconds,
    sweepSeconds,
    monteCarloOneCoreSeconds,
  };
}

/** Lines for the benchmark report, each with its target. */
export function describeStudyBench(
  r: Awaited<ReturnType<typeof benchStudy>>,
  cores = availableParallelism(),
): string {
  const t = STUDY_BENCH_TARGETS;
  return [
    `Monte Carlo, ${MC_RUNS} cases, one core: ${r.monteCarloOneCoreSeconds.toFixed(2)} s ` +
      `(target ≤ ${t.monteCarloOneCoreSeconds} s)`,
    `Monte Carlo on ${cores} cores: ${Math.round(r.monteCarloCasesPerSecond)} cases/s, ` +
      `speed-up ×${r.monteCarloSpeedup.toFixed(2)} (target: near-linear, ×${cores})`,
    `Sweep 30 × 30: ${r.sweepSeconds.toFixed(2)} s (target ≤ ${STUDY_BENCH_TARGETS.sweepSeconds} s)`,
  ].join("\n");
}
