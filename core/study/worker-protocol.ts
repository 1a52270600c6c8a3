/**
 * The one study worker protocol, shared by the command line's worker threads (core/cli/workers/) and the
 * app's Web Workers (renderer/study/study-worker.ts): the task and reply messages (plain,
 * structured-cloneable data) and the handler both kinds of worker run. Every task is a loop around the one
 * pipeline (`evaluateScenario`); progress is posted every few runs so the caller can draw a bar.
 */
import type { Scenario } from "../scenario/types";
import { parseScenario } from "../scenario/parse";
import { evaluateScenario } from "./evaluate";
import { evaluatePoints, type PointEvaluation } from "./evaluate-point";
import { runMonteCarloChunk, type MonteCarloChunk, type MonteCarloPlan } from "./montecarlo";
import { compareVariant, studyVariants, type CompareRow } from "./compare";
import { parseStudy } from "./study-file";
import type { Overrides } from "./overrides";
import { runRecordSteps } from "../record/run";
import type { StepOutcome } from "../record/summary";

export interface VariantSpec {
  readonly name: string;
  /** Overrides written like scenario fields: SI numbers or strings with units. */
  readonly overrides: Readonly<Record<string, unknown>>;
}

export type StudyTask =
  | { readonly kind: "prepare"; readonly file: unknown }
  | { readonly kind: "compare"; readonly file: unknown; readonly variants: readonly VariantSpec[] }
  | { readonly kind: "points"; readonly scenario: Scenario; readonly overrides: readonly Overrides[] }
  | {
      readonly kind: "monte-carlo";
      readonly scenario: Scenario;
      readonly plan: MonteCarloPlan;
      readonly start: number;
      readonly end: number;
    }
  /** These steps (indices) of the scenario's ambient record. */
  | { readonly kind: "record-steps"; readonly scenario: Scenario; readonly indices: readonly number[] }
  /** Pure arithmetic with no memory traffic: the benchmark's control for the worker speed-up. */
  | { readonly kind: "control"; readonly iterations: number };

export type StudyRequest = StudyTask & { readonly id: number };

export type StudyReply =
  | { readonly id: number; readonly kind: "progress"; readonly done: number }
  | { readonly id: number; readonly kind: "prepared"; readonly scenario: Scenario }
  | { readonly id: number; readonly kind: "compared"; readonly rows: readonly CompareRow[] }
  | { readonly id: number; readonly kind: "points"; readonly points: readonly PointEvaluation[] }
  | { readonly id: number; readonly kind: "monte-carlo"; readonly chunk: MonteCarloChunk }
  | { readonly id: number; readonly kind: "record-steps"; readonly outcomes: readonly StepOutcome[] }
  | { readonly id: number; readonly kind: "control"; readonly value: number }
  | { readonly id: number; readonly kind: "error"; readonly message: string };

/** A reply that finishes a task (not progress, not an error). */
export type StudyDone = Exclude<StudyReply, { kind: "progress" } | { kind: "error" }>;

/** How much work a task is, in the units its progress replies count (runs, points, variants, steps). */
export function studyTaskSize(task: StudyTask): number {
  switch (task.kind) {
    case "monte-carlo":
      return task.end - task.start;
    case "points":
      return task.overrides.length;
    case "compare":
      return task.variants.length;
    case "record-steps":
      return task.indices.length;
    case "prepare":
    case "control":
      return 1;
  }
}

/** Posts a reply, moving the listed buffers instead of copying them. */
export type PostReply = (reply: StudyReply, transfer: ArrayBuffer[]) => void;

/** Runs one task and posts its replies; failures come back as an "error" reply, never as a throw. */
export function handleStudyRequest(req: StudyRequest, post: PostReply, progressEvery: number): void {
  try {
    runTask(req, post, progressEvery);
  } catch (err) {
    post({ id: req.id, kind: "error", message: err instanceof Error ? err.message : String(err) }, []);
  }
}

function runTask(req: StudyRequest, post: PostReply, progressEvery: number): void {
  const progress = (done: number) => {
    if (done % progressEvery === 0) post({ id: req.id, kind: "progress", done }, []);
  };
  switch (req.kind) {
    case "prepare": {
      const r = parseScenario(req.file);
      if (!r.ok) post({ id: req.id, kind: "error", message: r.issues.map((i) => i.message).join("\n") }, []);
      else post({ id: req.id, kind: "prepared", scenario: r.scenario }, []);
      return;
    }
    case "compare":
      runCompare(req, post);
      return;
    case "points": {
      const points = evaluatePoints(req.scenario, req.overrides, evaluateScenario, progress);
      post({ id: req.id, kind: "points", points }, []);
      return;
    }
    case "record-steps": {
      const outcomes = runRecordSteps(req.scenario, evaluateScenario, req.indices, progress);
      post({ id: req.id, kind: "record-steps", outcomes }, []);
      return;
    }
    case "monte-carlo": {
      const { scenario, plan, start, end } = req;
      const chunk = runMonteCarloChunk(scenario, plan, start, end, evaluateScenario, progress);
      const arrays = [...chunk.edgeDilution, ...chunk.margin, ...(chunk.requiredDilution ?? []), ...chunk.pass];
      post(
        { id: req.id, kind: "monte-carlo", chunk },
        arrays.map((a) => a.buffer as ArrayBuffer),
      );
      return;
    }
    case "control":
      post({ id: req.id, kind: "control", value: controlLoop(req.iterations) }, []);
      return;
  }
}

/** The Study panel's variant comparison: the variants parsed like a study file, each run and compared. */
function runCompare(req: Extract<StudyRequest, { kind: "compare" }>, post: PostReply): void {
  const st = parseStudy({
    format: "brinefield-study",
    version: 1,
    name: "Study panel",
    base: req.file,
    variants: req.variants,
  });
  if (!st.ok) {
    post({ id: req.id, kind: "error", message: st.issues.map((i) => i.message).join("\n") }, []);
    return;
  }
  const v = studyVariants(st.study, req.file, parseScenario);
  if (!v.ok) {
    post({ id: req.id, kind: "error", message: v.issues.map((i) => i.message).join("\n") }, []);
    return;
  }
  const rows = v.variants.flatMap((x, i) => {
    const r = compareVariant(x, evaluateScenario);
    post({ id: req.id, kind: "progress", done: i + 1 }, []);
    return r;
  });
  post({ id: req.id, kind: "compared", rows }, []);
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
