/**
 * A small pool of study worker threads. Tasks are handed out in order to whichever worker is free;
 * results come back by task index, so the merged output does not depend on scheduling. `cancel()`
 * terminates every worker (Ctrl-C), and pending runs reject with `CancelledError`.
 */
import { Worker } from "node:worker_threads";
import { studyTaskSize, type StudyReply, type StudyRequest, type StudyTask } from "../../study/worker-protocol";
import { STUDY_WORKER_TAG } from "./worker";

export class CancelledError extends Error {
  constructor() {
    super("cancelled");
    this.name = "CancelledError";
  }
}

/** Where a worker starts: the bundle itself, or the source entry through tsx. */
function workerSource(): { url: URL; execArgv?: string[] } {
  const here = import.meta.url;
  if (/\.(ts|mts)$/.test(new URL(here).pathname)) {
    return { url: new URL("./source-entry.mjs", here) };
  }
  return { url: new URL(here) };
}

export class StudyPool {
  private readonly workers: Worker[] = [];
  private cancelled = false;
  private rejectAll: ((e: Error) => void)[] = [];

  constructor(readonly size: number) {
    const src = workerSource();
    for (let i = 0; i < Math.max(1, size); i++) {
      const w = new Worker(src.url, { workerData: { tag: STUDY_WORKER_TAG }, execArgv: src.execArgv });
      w.unref();
      this.workers.push(w);
    }
  }

  /**
   * Runs every task; `onProgress(totalDone)` sums the progress of all tasks (in the tasks' own units).
   * Resolves with the replies in task order.
   */
  run(tasks: readonly StudyTask[], onProgress?: (done: number) => void): Promise<StudyReply[]> {
    if (this.cancelled) return Promise.reject(new CancelledError());
    return new Promise((resolve, reject) => {
      const results: StudyReply[] = new Array(tasks.length);
      const progress = new Array<number>(tasks.length).fill(0);
      let next = 0;
      let finished = 0;
      let failed = false;
      const fail = (e: Error) => {
        if (failed) return;
        failed = true;
        reject(e);
      };
      this.rejectAll.push(fail);
      const report = () => onProgress?.(progress.reduce((a, b) => a + b, 0));
      const feed = (w: Worker) => {
        if (failed) return;
        if (next >= tasks.length) return;
        const id = next++;
        w.postMessage({ ...tasks[id]!, id } satisfies StudyRequest);
      };
      for (const w of this.workers) {
        w.removeAllListeners("message");
        w.removeAllListeners("error");
        w.on("message", (m: StudyReply) => {
          if (m.kind === "progress") {
            progress[m.id] = m.done;
            report();
            return;
          }
          if (m.kind === "error") {
            fail(new Error(m.message));
            return;
          }
          results[m.id] = m;
          progress[m.id] = studyTaskSize(tasks[m.id]!);
          report();
          finished++;
          if (finished === tasks.length) resolve(results);
          else feed(w);
        });
        w.on("error", (e) => fail(e));
      }
      if (tasks.length === 0) resolve([]);
      for (const w of this.workers) feed(w);
    });
  }

  /** Stops every worker now; running tasks are abandoned. */
  cancel(): void {
    this.cancelled = true;
    for (const r of this.rejectAll) r(new CancelledError());
    void this.close();
  }

  async close(): Promise<void> {
    await Promise.all(this.workers.map((w) => w.terminate()));
  }
}
