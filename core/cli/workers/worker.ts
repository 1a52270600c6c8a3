/**
 * The body of a study worker thread. The bundled CLI starts workers on its own file
 * (`new Worker(new URL(import.meta.url))`); core/cli/main.ts calls `runWorkerThread()` when
 * `!isMainThread`. Each task is a loop around the one pipeline (`evaluateScenario`); progress is
 * posted every few runs so the main thread can draw a bar.
 */
import { parentPort, workerData } from "node:worker_threads";
import { evaluateScenario } from "../../study/evaluate";
import { evaluatePoints } from "../../study/evaluate-point";
import { runMonteCarloChunk } from "../../study/montecarlo";
import { runRecordSteps } from "../../record/run";
import { STUDY_WORKER_TAG, type WorkerReply, type WorkerTask } from "./protocol";

const PROGRESS_EVERY = 25;

export function isStudyWorker(): boolean {
  return (workerData as { tag?: unknown } | null)?.tag === STUDY_WORKER_TAG;
}

/** Serves tasks until the main thread terminates the worker. Returns false when not a study worker. */
export function runWorkerThread(): boolean {
  const port = parentPort;
  if (!port || !isStudyWorker()) return false;
  port.on("message", (task: WorkerTask) => {
    const post = (m: WorkerReply, transfer?: ArrayBuffer[]) => port.postMessage(m, transfer);
    try {
      if (task.kind === "monte-carlo") {
        const progress = (done: number) => {
          if (done % PROGRESS_EVERY === 0) post({ kind: "progress", id: task.id, done });
        };
        const { scenario, plan, start, end } = task;
        const chunk = runMonteCarloChunk(scenario, plan, start, end, evaluateScenario, progress);
        const arrays = [...chunk.edgeDilution, ...chunk.margin, ...(chunk.requiredDilution ?? []), ...chunk.pass];
        const buffers = arrays.map((a) => a.buffer as ArrayBuffer);
        post({ kind: "monte-carlo-done", id: task.id, chunk }, buffers);
      } else if (task.kind === "control") {
        post({ kind: "control-done", id: task.id, value: controlLoop(task.iterations) });
      } else if (task.kind === "record-steps") {
        const outcomes = runRecordSteps(task.scenario, evaluateScenario, task.indices, (done) => {
          if (done % PROGRESS_EVERY === 0) post({ kind: "progress", id: task.id, done });
        });
        post({ kind: "record-steps-done", id: task.id, outcomes });
      } else {
        const points = evaluatePoints(task.scenario, task.overrides, evaluateScenario, (done) => {
          if (done % PROGRESS_EVERY === 0) post({ kind: "progress", id: task.id, done });
        });
        post({ kind: "points-done", id: task.id, points });
      }
    } catch (err) {
      post({ kind: "error", id: task.id, message: err instanceof Error ? err.message : String(err) });
    }
  });
  return true;
}

/** A compute-only loop (a few registers, no allocation, no memory traffic): scales with cores if anything does. */
export function controlLoop(iterations: number): number {
  let x = 0.5;
  let acc = 0;
  for (let i = 0; i < iterations; i++) {
    x = 3.9 * x * (1 - x); // logistic map: chaotic, so the loop cannot be folded away
    acc += x;
  }
  return acc;
}
