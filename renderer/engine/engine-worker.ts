/**
 * The core worker, started once per page as early as possible (renderer/main.tsx calls `startEngineWorker`
 * before the first render), so its script loads and compiles while React mounts instead of after.
 */
let worker: Worker | null = null;
let failed = false;

/** Starts the engine worker if it is not running yet; null when this platform cannot start one. */
export function startEngineWorker(): Worker | null {
  if (worker || failed) return worker;
  try {
    worker = new Worker(new URL("../worker.ts", import.meta.url), { type: "module" });
  } catch {
    failed = true;
    worker = null;
  }
  return worker;
}

/** Forgets the worker (after it crashed): the next `startEngineWorker` call does not retry. */
export function dropEngineWorker(): void {
  worker?.terminate();
  worker = null;
  failed = true;
}
