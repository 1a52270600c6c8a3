/**
 * The body of a study worker thread. The bundled CLI starts workers on its own file
 * (`new Worker(new URL(import.meta.url))`); core/cli/main.ts calls `runWorkerThread()` when
 * `!isMainThread`. It runs the shared study worker protocol (core/study/worker-protocol.ts), the same
 * handler as the app's Web Workers.
 */
import { parentPort, workerData } from "node:worker_threads";
import { handleStudyRequest, type StudyRequest } from "../../study/worker-protocol";

/** Marks workerData so `runWorkerThread` knows the thread is a study worker. */
export const STUDY_WORKER_TAG = "brinefield-study-worker";

const PROGRESS_EVERY = 25;

export function isStudyWorker(): boolean {
  return (workerData as { tag?: unknown } | null)?.tag === STUDY_WORKER_TAG;
}

/** Serves tasks until the main thread terminates the worker. Returns false when not a study worker. */
export function runWorkerThread(): boolean {
  const port = parentPort;
  if (!port || !isStudyWorker()) return false;
  port.on("message", (req: StudyRequest) =>
    handleStudyRequest(req, (reply, transfer) => port.postMessage(reply, transfer), PROGRESS_EVERY),
  );
  return true;
}
