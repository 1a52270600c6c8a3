/**
 * The core worker, started once per page as early as possible: renderer/boot.ts starts it and sends it the
 * first document's file before React and the rest of the app load, so the worker loads, compiles and runs
 * the first scenario while the page renders. The engine hook (use-engine.ts) takes that first run over
 * instead of sending the same file again.
 */
import type { EngineRequest, EngineResponse } from "./messages";

/** Id of the run sent before the app mounts; the engine hook's own requests count from 1. */
export const FIRST_RUN_ID = 0;

let worker: Worker | null = null;
let failed = false;

interface FirstRun {
  readonly file: unknown;
  response: EngineResponse | null;
  /** Where the response goes once it is there (the hook that took the run over), if anywhere. */
  taker: ((response: EngineResponse) => void) | null;
  /** True once the response has gone to a taker. */
  done: boolean;
}
let firstRun: FirstRun | null = null;

/** Hands the first run's response to its taker when both are there. */
function settle(run: FirstRun): void {
  const { response, taker } = run;
  if (!response || !taker || run.done) return;
  run.done = true;
  run.taker = null;
  taker(response);
}

/** Starts the engine worker if it is not running yet; null when this platform cannot start one. */
export function startEngineWorker(): Worker | null {
  if (worker || failed) return worker;
  try {
    worker = new Worker(new URL("../worker.ts", import.meta.url), { type: "module" });
  } catch {
    failed = true;
    worker = null;
    return null;
  }
  const started = worker;
  started.addEventListener("message", (event: MessageEvent<EngineResponse>) => {
    const run = firstRun;
    if (event.data.id !== FIRST_RUN_ID || !run || run.response) return;
    run.response = event.data;
    settle(run);
  });
  // A worker that fails before the engine hook listens (its script did not load) is not used: the hook
  // then runs core on the UI thread. Later failures reach the hook's own listener too.
  started.addEventListener("error", () => {
    if (worker === started) dropEngineWorker();
  });
  return worker;
}

/** Starts the worker and sends it `file` at once, before the app has rendered (see takeFirstRun). */
export function sendFirstRun(file: unknown): void {
  const started = startEngineWorker();
  if (!started || firstRun) return;
  firstRun = { file, response: null, taker: null, done: false };
  const request: EngineRequest = { id: FIRST_RUN_ID, file };
  started.postMessage(request);
}

/**
 * Takes over the run sent by sendFirstRun when `file` is that very file (same object) and no one holds it:
 * `deliver` gets its response, on a later microtask when it has already arrived. False otherwise (the
 * caller sends its own request).
 */
export function takeFirstRun(file: unknown, deliver: (response: EngineResponse) => void): boolean {
  const run = firstRun;
  if (!run || run.done || run.taker || run.file !== file || !worker) return false;
  run.taker = deliver;
  if (run.response) queueMicrotask(() => settle(run));
  return true;
}

/**
 * The hook that took the first run over unmounted before its response came: the response waits for the
 * next taker (a remount takes the run over again).
 */
export function releaseFirstRun(): void {
  if (firstRun && !firstRun.done) firstRun.taker = null;
}

/** Forgets the worker (after it crashed): the next `startEngineWorker` call does not retry. */
export function dropEngineWorker(): void {
  worker?.terminate();
  worker = null;
  failed = true;
  releaseFirstRun();
}
