/**
 * Running study work on worker threads from the command line: deterministic chunking, a progress bar
 * on stderr (only when it is a terminal) and clean cancellation on Ctrl-C.
 */
import { CliError, type CliIO } from "../command";
import type { Scenario } from "../../scenario/types";
import { splitRuns, type MonteCarloChunk, type MonteCarloPlan } from "../../study/montecarlo";
import type { PointEvaluation } from "../../study/evaluate-point";
import type { Overrides } from "../../study/overrides";
import type { StepOutcome } from "../../record/summary";
import { distinctStepIndices, outcomesFromDistinct } from "../../record/run";
import { CancelledError, StudyPool } from "./pool";

export { CancelledError } from "./pool";

/** Exit code after Ctrl-C (128 + SIGINT), the shell convention. */
export const EXIT_CANCELLED = 130;

export interface ProgressBar {
  update(done: number): void;
  finish(): void;
}

/**
 * A one-line progress bar on stderr, redrawn at most ten times a second; when stderr is not a terminal,
 * plain lines at each tenth done if asked for (`io.progressLines`), otherwise silent.
 */
export function progressBar(io: CliIO, label: string, total: number): ProgressBar {
  if (total <= 0) return { update() {}, finish() {} };
  if (!io.isTTY) return io.progressLines ? progressLines(io, label, total) : { update() {}, finish() {} };
  let last = 0;
  const width = 30;
  const draw = (done: number) => {
    const f = Math.min(1, done / total);
    const filled = Math.round(f * width);
    const bar = "#".repeat(filled) + " ".repeat(width - filled);
    io.stderr(`\r${label} [${bar}] ${(f * 100).toFixed(0).padStart(3)}% (${done}/${total})`);
  };
  return {
    update(done) {
      const now = Date.now();
      if (now - last < 100 && done < total) return;
      last = now;
      draw(done);
    },
    finish() {
      io.stderr(`\r${" ".repeat(label.length + width + 30)}\r`);
    },
  };
}

/** "Record steps: 0 % (0/7902)" when the work starts, then a line at each further tenth done. */
function progressLines(io: CliIO, label: string, total: number): ProgressBar {
  let shown = -1;
  const line = (done: number) => {
    const tenth = Math.floor((10 * Math.min(done, total)) / total);
    if (tenth <= shown) return;
    shown = tenth;
    io.stderr(`${label}: ${tenth * 10} % (${Math.min(done, total)}/${total})\n`);
  };
  line(0);
  return { update: line, finish() {} };
}

/** Runs `work` with a pool; Ctrl-C cancels the pool and the promise rejects with CancelledError. */
export async function withPool<T>(workers: number, work: (pool: StudyPool) => Promise<T>): Promise<T> {
  const pool = new StudyPool(workers);
  const onSigint = () => pool.cancel();
  process.once("SIGINT", onSigint);
  try {
    return await work(pool);
  } finally {
    process.removeListener("SIGINT", onSigint);
    await pool.close();
  }
}

/** Chunks per worker: enough for load balancing and smooth progress, few enough to keep overhead low. */
const CHUNKS_PER_WORKER = 4;

export async function monteCarloOnWorkers(
  scenario: Scenario,
  plan: MonteCarloPlan,
  workers: number,
  onProgress?: (done: number) => void,
): Promise<MonteCarloChunk[]> {
  return withPool(workers, (pool) => monteCarloOnPool(pool, scenario, plan, onProgress));
}

/** Monte Carlo on a pool the caller keeps (warm workers: no start-up or compiler warm-up per study). */
export async function monteCarloOnPool(
  pool: StudyPool,
  scenario: Scenario,
  plan: MonteCarloPlan,
  onProgress?: (done: number) => void,
): Promise<MonteCarloChunk[]> {
  const chunks = splitRuns(plan.runs, pool.size * CHUNKS_PER_WORKER);
  const replies = await pool.run(
    chunks.map((c) => ({ kind: "monte-carlo" as const, scenario, plan, start: c.start, end: c.end })),
    onProgress,
  );
  return replies.map((r) => {
    if (r.kind !== "monte-carlo") throw new Error("unexpected worker reply");
    return r.chunk;
  });
}

export async function pointsOnWorkers(
  scenario: Scenario,
  list: readonly Overrides[],
  workers: number,
  onProgress?: (done: number) => void,
): Promise<PointEvaluation[]> {
  if (list.length === 0) return [];
  return withPool(Math.min(workers, list.length), async (pool) => {
    const chunks = splitRuns(list.length, Math.min(workers, list.length) * CHUNKS_PER_WORKER);
    const replies = await pool.run(
      chunks.map((c) => ({ kind: "points" as const, scenario, overrides: list.slice(c.start, c.end) })),
      onProgress,
    );
    return replies.flatMap((r) => {
      if (r.kind !== "points") throw new Error("unexpected worker reply");
      return r.points;
    });
  });
}

/**
 * Every step of the scenario's ambient record, in step order: the distinct steps (new water, not refused)
 * run on worker threads, repeated water reuses them. `onProgress` counts distinct steps computed; the
 * total is `distinctStepIndices(scenario).length`.
 */
export async function recordStepsOnWorkers(
  scenario: Scenario,
  workers: number,
  onProgress?: (done: number) => void,
): Promise<StepOutcome[]> {
  const distinct = distinctStepIndices(scenario);
  const computed = new Map<number, StepOutcome>();
  if (distinct.length > 0) {
    const n = Math.min(workers, distinct.length);
    const replies = await withPool(n, (pool) => {
      const chunks = splitRuns(distinct.length, n * CHUNKS_PER_WORKER);
      return pool.run(
        chunks.map((c) => ({ kind: "record-steps" as const, scenario, indices: distinct.slice(c.start, c.end) })),
        onProgress,
      );
    });
    let k = 0;
    for (const r of replies) {
      if (r.kind !== "record-steps") throw new Error("unexpected worker reply");
      for (const o of r.outcomes) computed.set(distinct[k++]!, o);
    }
  }
  return outcomesFromDistinct(scenario, computed);
}

/** Reads --workers: default all cores; must be a whole number from 1 to 256. */
export function workersOption(value: string | undefined, io: CliIO, command: string): number {
  if (value === undefined) return Math.max(1, io.cores);
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 256) {
    throw new CliError(`brinefield ${command}: --workers ${value} must be a whole number from 1 to 256`);
  }
  return n;
}

export function isCancelled(err: unknown): boolean {
  return err instanceof CancelledError;
}

/**
 * Runs a long task with a progress bar on stderr; on Ctrl-C prints "Cancelled: no results." and returns
 * null (the caller exits with EXIT_CANCELLED). Other errors propagate.
 */
export async function withProgress<T>(
  io: CliIO,
  label: string,
  total: number,
  work: (onProgress: (done: number) => void) => Promise<T>,
): Promise<{ value: T; elapsedSeconds: number } | null> {
  const bar = progressBar(io, label, total);
  const t0 = performance.now();
  try {
    const value = await work((d) => bar.update(d));
    return { value, elapsedSeconds: (performance.now() - t0) / 1000 };
  } catch (err) {
    if (isCancelled(err)) {
      bar.finish();
      io.stderr("Cancelled: no results.\n");
      return null;
    }
    throw err;
  } finally {
    bar.finish();
  }
}
