/**
 * Runs a long ambient record on the study Web Workers (one per core) with progress and Cancel, and joins
 * the outcomes with the stated conditions' result exactly as the command line does (core/record/result).
 */
import { useCallback, useEffect, useRef, useState } from "react";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { StepOutcome } from "../../core/record/summary";
import { distinctStepIndices, outcomesFromDistinct } from "../../core/record/run";
import { withRecord } from "../../core/record/result";
import { StudyCancelled, sharedRecordPool, type StudyWorkerPool } from "../study/worker-pool";
import { isRecordPending } from "./pending";

export interface RecordRun {
  /** The full result once the record has run (null while running, cancelled or not needed). */
  readonly result: BrinefieldResult | null;
  readonly running: boolean;
  readonly done: number;
  readonly total: number;
  readonly cancelled: boolean;
  readonly error: string | null;
  readonly seconds: number | null;
  cancel(): void;
  restart(): void;
}

const CHUNKS_PER_WORKER = 4;

export function useRecordRun(scenario: Scenario | null, pendingResult: BrinefieldResult | null): RecordRun {
  const [state, setState] = useState({
    result: null as BrinefieldResult | null,
    running: false,
    done: 0,
    total: 0,
    cancelled: false,
    error: null as string | null,
    seconds: null as number | null,
  });
  const poolRef = useRef<StudyWorkerPool | null>(null);
  const [attempt, setAttempt] = useState(0);
  const pending = isRecordPending(pendingResult);

  useEffect(() => {
    if (!pending || !scenario || !pendingResult) {
      // Nothing to run on the workers (no record, or one short enough for the engine): clear every trace
      // of an earlier run, so a cancelled or failed long record does not speak for the new one.
      setState((s) =>
        s.result || s.running || s.cancelled || s.error !== null || s.seconds !== null
          ? { result: null, running: false, done: 0, total: 0, cancelled: false, error: null, seconds: null }
          : s,
      );
      return;
    }
    // The page's record pool: its workers stay warm between runs; a run still going is stopped first.
    const pool = sharedRecordPool();
    pool.stopIfRunning();
    const cores = pool.size;
    poolRef.current = pool;
    const distinct = distinctStepIndices(scenario);
    const chunks: number[][] = [];
    const parts = Math.max(1, Math.min(distinct.length, cores * CHUNKS_PER_WORKER));
    for (let i = 0; i < parts; i++)
      chunks.push(
        distinct.slice(Math.floor((distinct.length * i) / parts), Math.floor((distinct.length * (i + 1)) / parts)),
      );
    let live = true;
    const t0 = performance.now();
    setState({
      result: null,
      running: true,
      done: 0,
      total: distinct.length,
      cancelled: false,
      error: null,
      seconds: null,
    });
    pool
      .run(
        chunks.filter((c) => c.length > 0).map((indices) => ({ kind: "record-steps" as const, scenario, indices })),
        (done) => live && setState((s) => ({ ...s, done })),
      )
      .then(
        (replies) => {
          if (!live) return;
          const computed = new Map<number, StepOutcome>();
          let k = 0;
          const flat = chunks.filter((c) => c.length > 0).flat();
          for (const r of replies) {
            if (r.kind !== "record-steps") throw new Error("unexpected reply");
            for (const o of r.outcomes) computed.set(flat[k++]!, o);
          }
          const result = withRecord(
            scenario,
            {
              ...pendingResult,
              caution: pendingResult.caution.replace(/ Each step of the record.*$/, ""),
              warnings: pendingResult.warnings.filter((w) => w.code !== "record-pending"),
            },
            outcomesFromDistinct(scenario, computed),
          );
          setState({
            result,
            running: false,
            done: distinct.length,
            total: distinct.length,
            cancelled: false,
            error: null,
            seconds: (performance.now() - t0) / 1000,
          });
        },
        (err: unknown) => {
          if (!live) return;
          setState((s) => ({
            ...s,
            running: false,
            cancelled: err instanceof StudyCancelled,
            error: err instanceof StudyCancelled ? null : err instanceof Error ? err.message : String(err),
          }));
        },
      );
    return () => {
      live = false;
      pool.stopIfRunning();
      poolRef.current = null;
    };
  }, [scenario, pendingResult, pending, attempt]);

  const cancel = useCallback(() => poolRef.current?.cancel(), []);
  const restart = useCallback(() => setAttempt((a) => a + 1), []);
  return { ...state, cancel, restart };
}
