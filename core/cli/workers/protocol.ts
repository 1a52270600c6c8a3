/** Messages between the command-line adapter and its study worker threads (structured-clone data only). */
import type { Scenario } from "../../scenario/types";
import type { MonteCarloChunk, MonteCarloPlan } from "../../study/montecarlo";
import type { PointEvaluation } from "../../study/evaluate-point";
import type { Overrides } from "../../study/overrides";
import type { StepOutcome } from "../../record/summary";

/** Marks workerData so `runWorkerThread` knows the thread is a study worker. */
export const STUDY_WORKER_TAG = "brinefield-study-worker";

export type WorkerTask =
  | {
      readonly kind: "monte-carlo";
      readonly id: number;
      readonly scenario: Scenario;
      readonly plan: MonteCarloPlan;
      readonly start: number;
      readonly end: number;
    }
  | {
      readonly kind: "points";
      readonly id: number;
      readonly scenario: Scenario;
      readonly overrides: readonly Overrides[];
    }
  | {
      /** Pure arithmetic with no memory traffic: the benchmark's control for the worker speed-up. */
      readonly kind: "control";
      readonly id: number;
      readonly iterations: number;
    }
  | {
      /** These steps (indices) of the scenario's ambient record. */
      readonly kind: "record-steps";
      readonly id: number;
      readonly scenario: Scenario;
      readonly indices: readonly number[];
    };

export type WorkerReply =
  | { readonly kind: "progress"; readonly id: number; readonly done: number }
  | { readonly kind: "monte-carlo-done"; readonly id: number; readonly chunk: MonteCarloChunk }
  | { readonly kind: "points-done"; readonly id: number; readonly points: readonly PointEvaluation[] }
  | { readonly kind: "control-done"; readonly id: number; readonly value: number }
  | { readonly kind: "record-steps-done"; readonly id: number; readonly outcomes: readonly StepOutcome[] }
  | { readonly kind: "error"; readonly id: number; readonly message: string };
