/** Running study work on the worker pool: the job in progress (for the progress bar) and the last error. */
import { useCallback, useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import type { Overrides } from "../../core/study/overrides";
import { splitRuns } from "../../core/study/montecarlo";
import type { PointEvaluation } from "../../core/study/evaluate-point";
import type { StudyTask } from "../../core/study/worker-protocol";
import { StudyCancelled, type StudyWorkerPool } from "./worker-pool";
import type { Replies } from "./sections";

export interface StudyJob {
  readonly label: string;
  readonly total: number;
  readonly done: number;
}

export function useStudyJobs(pool: StudyWorkerPool) {
  const [job, setJob] = useState<StudyJob | null>(null);
  const [error, setError] = useState<string | null>(null);

  /** Runs tasks on the pool with a progress bar; returns null when cancelled or failed. */
  const runJob = useCallback(
    async <T>(label: string, total: number, tasks: readonly StudyTask[], finish: (r: Replies) => T) => {
      setError(null);
      setJob({ label, total, done: 0 });
      try {
        const replies = await pool.run(tasks, (done) => setJob({ label, total, done }));
        return finish(replies);
      } catch (e) {
        if (!(e instanceof StudyCancelled)) setError(e instanceof Error ? e.message : String(e));
        return null;
      } finally {
        setJob(null);
      }
    },
    [pool],
  );

  const runPoints = useCallback(
    async (label: string, s: Scenario, list: readonly Overrides[]): Promise<PointEvaluation[] | null> => {
      const chunks = splitRuns(list.length, pool.size * 4);
      return runJob(
        label,
        list.length,
        chunks.map((c) => ({ kind: "points" as const, scenario: s, overrides: list.slice(c.start, c.end) })),
        (replies) => replies.flatMap((r) => (r.kind === "points" ? r.points : [])),
      );
    },
    [pool, runJob],
  );

  return { job, error, runJob, runPoints };
}
