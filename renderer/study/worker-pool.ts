/**
 * A pool of Study Web Workers. Tasks go to free workers in order; replies come back by task index, so
 * merged results do not depend on scheduling (Monte Carlo runs draw from per-run streams anyway).
 * `cancel()` terminates the workers at once; the pool starts fresh ones for the next job. Between jobs the
 * workers stay alive (`sharedStudyPool`), so later studies run on warm workers.
 */
import type { StudyDone, StudyReply, StudyTask } from "../../core/study/worker-protocol";

export class StudyCancelled extends Error {
  constructor() {
    super("cancelled");
    this.name = "StudyCancelled";
  }
}

export class StudyWorkerPool {
  private workers: Worker[] = [];
  private abort: ((e: Error) => void) | null = null;

  constructor(readonly size: number) {}

  private ensure(n: number): Worker[] {
    while (this.workers.length < n) {
      this.workers.push(new Worker(new URL("./study-worker.ts", import.meta.url), { type: "module" }));
    }
    return this.workers.slice(0, n);
  }

  /** Runs tasks on up to `size` workers; `onProgress` gets the summed progress of every task. */
  run(tasks: readonly StudyTask[], onProgress?: (done: number) => void, maxWorkers = this.size): Promise<StudyDone[]> {
    const workers = this.ensure(Math.max(1, Math.min(maxWorkers, this.size, tasks.length)));
    return new Promise<StudyDone[]>((resolve, reject) => {
      const results: StudyDone[] = new Array(tasks.length);
      const progress = new Array<number>(tasks.length).fill(0);
      let next = 0;
      let finished = 0;
      let settled = false;
      const finish = (e?: Error) => {
        if (settled) return;
        settled = true;
        this.abort = null;
        for (const w of workers) w.onmessage = null;
        if (e) reject(e);
        else resolve(results);
      };
      this.abort = finish;
      const feed = (w: Worker) => {
        if (next < tasks.length) {
          const id = next++;
          w.postMessage({ ...tasks[id]!, id });
        }
      };
      for (const w of workers) {
        w.onmessage = (ev: MessageEvent<StudyReply>) => {
          const m = ev.data;
          if (m.kind === "progress") {
            progress[m.id] = m.done;
            onProgress?.(progress.reduce((a, b) => a + b, 0));
            return;
          }
          if (m.kind === "error") {
            finish(new Error(m.message));
            return;
          }
          results[m.id] = m;
          finished++;
          if (finished === tasks.length) finish();
          else feed(w);
        };
        w.onerror = (ev) => finish(new Error(ev.message || "study worker failed"));
      }
      if (tasks.length === 0) finish();
      for (const w of workers) feed(w);
    });
  }

  /** Stops all running work now. */
  cancel(): void {
    for (const w of this.workers) w.terminate();
    this.workers = [];
    this.abort?.(new StudyCancelled());
  }

  dispose(): void {
    this.cancel();
  }

  /** Cancels the running job, if any (its workers are replaced); idle, warm workers are kept. */
  stopIfRunning(): void {
    if (this.abort) this.cancel();
  }
}

const kept = new Map<"study" | "record" | "reader", StudyWorkerPool>();

/** The page's pool for one kind of job, created on first use and kept for the page's life. */
function keptPool(kind: "study" | "record" | "reader", size: number): StudyWorkerPool {
  let pool = kept.get(kind);
  if (!pool) kept.set(kind, (pool = new StudyWorkerPool(size)));
  return pool;
}

/**
 * The page's study pool, kept alive between studies and tab switches: warm workers skip the start-up and
 * the compiler's warm-up that a fresh worker spends on its first thousands of cases.
 */
export function sharedStudyPool(): StudyWorkerPool {
  return keptPool("study", defaultWorkerCount());
}

/**
 * The pool for long ambient records, kept between runs like the study pool. A pool runs one job at a time,
 * so a record on the Design tab and a study on the Study tab each have their own.
 */
export function sharedRecordPool(): StudyWorkerPool {
  return keptPool("record", defaultWorkerCount());
}

/** One kept worker that reads the document for the Study tab (each edit is read again). */
export function sharedReaderPool(): StudyWorkerPool {
  return keptPool("reader", 1);
}

export function defaultWorkerCount(): number {
  const n = typeof navigator !== "undefined" ? navigator.hardwareConcurrency : 2;
  return Math.max(1, Math.min(8, n || 2));
}
