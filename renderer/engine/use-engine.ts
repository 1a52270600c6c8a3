/**
 * Runs the current scenario file in the core worker and keeps the last good result on screen while the
 * file has errors. The first edit is sent at once (no debounce); edits made while a run is in flight are
 * coalesced into one run of the latest file, sent when the reply arrives. Stale responses (an older edit
 * finishing late) are dropped. The first document's run was already sent before the first render
 * (renderer/boot.ts); the hook takes it over rather than sending the same file again.
 */
import { fieldBounds } from "../../core/scenario/bounds";
import { formatNumber, siLabel } from "../../core/units";
import { useEffect, useRef, useState } from "react";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { EngineIssue, EngineRequest, EngineResponse } from "./messages";
import { runFile } from "./run-file";
import { dropEngineWorker, FIRST_RUN_ID, releaseFirstRun, startEngineWorker, takeFirstRun } from "./engine-worker";

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
  /** False once core had to run on the UI thread because no worker could start. */
  readonly inWorker: boolean;
}

const INITIAL: EngineState = {
  result: null,
  scenario: null,
  issues: [],
  error: null,
  stale: false,
  running: false,
  ms: null,
  inWorker: true,
};

/** Next engine state for a response: success replaces everything; failure keeps the last good result. */
export function applyResponse(previous: EngineState, response: EngineResponse): EngineState {
  return response.ok
    ? {
        ...previous,
        result: response.result,
        scenario: response.scenario,
        issues: [],
        error: null,
        stale: false,
        running: false,
        ms: response.ms,
      }
    : {
        ...previous,
        issues: response.issues,
        error: response.message,
        stale: previous.result !== null,
        running: false,
      };
}

/**
 * Which request to send next: none while a run is in flight (the newest file waits and is sent when the
 * reply comes), else the newest file if it has not been sent. Pure, for tests.
 */
export function nextRequest(inFlight: boolean, latestId: number, sentId: number): number | null {
  return !inFlight && latestId > sentId ? latestId : null;
}

export function useEngine(file: unknown): EngineState {
  const [state, setState] = useState<EngineState>(INITIAL);
  const workerRef = useRef<Worker | null>(null);
  const latestId = useRef(0);
  const latestFile = useRef<unknown>(file);
  latestFile.current = file;
  const sentId = useRef(0);
  const inFlight = useRef(false);
  // Set when no worker can run (e.g. a platform that refuses module workers): core then runs here.
  const inThread = useRef(false);
  // What a reply from the worker does (set once the worker is listened to).
  const onReply = useRef<(response: EngineResponse) => void>(() => {});

  const pump = useRef<() => void>(() => {});
  pump.current = () => {
    const id = nextRequest(inFlight.current, latestId.current, sentId.current);
    if (id === null) return;
    sentId.current = id;
    const request: EngineRequest = { id, file: latestFile.current };
    if (workerRef.current) {
      inFlight.current = true;
      // The first document's run may already be running in the worker since before the first render.
      const taken = takeFirstRun(request.file, (response) => onReply.current({ ...response, id }));
      if (!taken) workerRef.current.postMessage(request);
    } else if (inThread.current) {
      const response = runFile(id, request.file);
      if (response.id === latestId.current) setState((previous) => applyResponse(previous, response));
    }
  };

  useEffect(() => {
    const accept = (response: EngineResponse) => {
      if (response.id !== latestId.current) return;
      setState((previous) => applyResponse(previous, response));
    };
    const runHere = () => {
      inThread.current = true;
      inFlight.current = false;
      setState((previous) => ({ ...previous, inWorker: false }));
      sentId.current = latestId.current;
      accept(runFile(latestId.current, latestFile.current));
    };
    const worker = startEngineWorker();
    if (!worker) {
      runHere();
      return;
    }
    workerRef.current = worker;
    onReply.current = (response: EngineResponse) => {
      inFlight.current = false;
      accept(response);
      pump.current(); // edits made during the run: one request with the newest file
    };
    const onMessage = (event: MessageEvent<EngineResponse>) => {
      // The run sent before the first render reaches the hook through takeFirstRun.
      if (event.data.id !== FIRST_RUN_ID) onReply.current(event.data);
    };
    const onError = (event: ErrorEvent) => {
      // The worker could not load or crashed: keep working on this thread rather than stop.
      event.preventDefault();
      dropEngineWorker();
      workerRef.current = null;
      runHere();
    };
    worker.addEventListener("message", onMessage);
    worker.addEventListener("error", onError);
    pump.current(); // the file of the first render
    return () => {
      // The worker belongs to the page (started before the first render) and stays for the next mount.
      worker.removeEventListener("message", onMessage);
      worker.removeEventListener("error", onError);
      releaseFirstRun();
      onReply.current = () => {};
      workerRef.current = null;
      inFlight.current = false;
      sentId.current = 0;
    };
  }, []);

  useEffect(() => {
    ++latestId.current;
    setState((previous) => (previous.running ? previous : { ...previous, running: true }));
    pump.current();
  }, [file]);

  return state;
}

/**
 * Why the results on screen may not be exported now, or null when they may. An export pairs the results
 * with the document's inputs, so it waits until the results are those of the inputs as they stand.
 */
export function exportBlocked(engine: Pick<EngineState, "result" | "error" | "running">): string | null {
  if (!engine.result) return "No results to export yet.";
  if (engine.error !== null) {
    return "The inputs have errors, so the results on screen belong to an earlier version of the scenario. Fix the inputs marked in red, then export.";
  }
  if (engine.running) return "Still calculating the latest edit: export again in a moment.";
  return null;
}

/**
 * A cross-field message shown on another field than its own: it names its own field in words, with the
 * value and unit ("port height above the seabed 1 m: must leave the port below the surface …").
 */
export function movedMessage(issue: EngineIssue): string {
  const bounds = fieldBounds(issue.path);
  const what = bounds?.what ?? issue.path;
  const unit = bounds && bounds.form === "quantity" ? siLabel(bounds.kind) : "";
  const valueText = typeof issue.value === "number" ? `${formatNumber(issue.value)}${unit ? ` ${unit}` : ""}` : "";
  const shownValue = issue.value === undefined ? "" : (JSON.stringify(issue.value) ?? "");
  const rest =
    shownValue && issue.message.startsWith(`${shownValue} `)
      ? issue.message.slice(shownValue.length + 1)
      : issue.message;
  return `${what}${valueText ? ` ${valueText}` : ""}: ${rest}`;
}

/**
 * Issues grouped by scenario path, for inline field errors. A cross-field rule (the port must stay below
 * the surface; the port jet is too fast) is shown on the field the user just changed when that field is
 * one it involves, so typing a shallow depth marks the depth, not the port height.
 */
export function issuesByPath(
  issues: readonly EngineIssue[],
  lastEdited: string | null = null,
): ReadonlyMap<string, string[]> {
  const map = new Map<string, string[]>();
  for (const issue of issues) {
    const involvesEdit =
      lastEdited !== null &&
      lastEdited !== issue.path &&
      (issue.related ?? []).some((p) => lastEdited === p || lastEdited.startsWith(`${p}.`));
    const path = involvesEdit ? lastEdited : issue.path;
    const list = map.get(path) ?? [];
    list.push(involvesEdit ? movedMessage(issue) : issue.message);
    map.set(path, list);
  }
  return map;
}
