/**
 * Runs the current scenario file in the core worker, debounced, and keeps the last good result on screen
 * while the file has errors. Stale responses (an older edit finishing late) are dropped.
 */
import { useEffect, useRef, useState } from "react";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { EngineIssue, EngineRequest, EngineResponse } from "./messages";

export const ENGINE_DEBOUNCE_MS = 150;

export interface EngineState {
  /** Last successful run (kept while later edits fail). */
  readonly result: BrinefieldResult | null;
  readonly scenario: Scenario | null;
  /** Issues of the latest run; empty when it succeeded. */
  readonly issues: readonly EngineIssue[];
  /** Message of the latest failed run, null when it succeeded. */
  readonly error: string | null;
  /** True when the shown result is older than the document (an edit failed or is running). */
  readonly stale: boolean;
  readonly running: boolean;
  readonly ms: number | null;
}

const INITIAL: EngineState = { result: null, scenario: null, issues: [], error: null, stale: false, running: false, ms: null };

export function useEngine(file: unknown): EngineState {
  const [state, setState] = useState<EngineState>(INITIAL);
  const workerRef = useRef<Worker | null>(null);
  const latestId = useRef(0);

  useEffect(() => {
    const worker = new Worker(new URL("../worker.ts", import.meta.url), { type: "module" });
    workerRef.current = worker;
    worker.addEventListener("message", (event: MessageEvent<EngineResponse>) => {
      const response = event.data;
      if (response.id !== latestId.current) return;
      setState((previous) =>
        response.ok
          ? { result: response.result, scenario: response.scenario, issues: [], error: null, stale: false, running: false, ms: response.ms }
          : { ...previous, issues: response.issues, error: response.message, stale: previous.result !== null, running: false },
      );
    });
    worker.addEventListener("error", (event) => {
      setState((previous) => ({ ...previous, error: `Calculation worker failed: ${event.message}`, running: false, stale: true }));
    });
    return () => {
      worker.terminate();
      workerRef.current = null;
    };
  }, []);

  useEffect(() => {
    const id = ++latestId.current;
    setState((previous) => (previous.running ? previous : { ...previous, running: true }));
    const timer = setTimeout(() => {
      const request: EngineRequest = { id, file };
      workerRef.current?.postMessage(request);
    }, ENGINE_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [file]);

  return state;
}

/** Issues grouped by scenario path, for inline field errors. */
export function issuesByPath(issues: readonly EngineIssue[]): ReadonlyMap<string, string[]> {
  const map = new Map<string, string[]>();
  for (const issue of issues) {
    const list = map.get(issue.path) ?? [];
    list.push(issue.message);
    map.set(issue.path, list);
  }
  return map;
}
