/** Messages between the Study panel and its Web Workers. Plain, structured-cloneable data. */
import type { Scenario } from "../../core/scenario/types";
import type { MonteCarloChunk, MonteCarloPlan } from "../../core/study/montecarlo";
import type { PointEvaluation } from "../../core/study/evaluate-point";
import type { Overrides } from "../../core/study/overrides";
import type { CompareRow } from "../../core/study/compare";
import type { StepOutcome } from "../../core/record/summary";

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
  | { readonly kind: "record-steps"; readonly scenario: Scenario; readonly indices: readonly number[] };

export type StudyRequest = StudyTask & { readonly id: number };

export type StudyReply =
  | { readonly id: number; readonly kind: "progress"; readonly done: number }
  | { readonly id: number; readonly kind: "prepared"; readonly scenario: Scenario }
  | { readonly id: number; readonly kind: "compared"; readonly rows: readonly CompareRow[] }
  | { readonly id: number; readonly kind: "points"; readonly points: readonly PointEvaluation[] }
  | { readonly id: number; readonly kind: "monte-carlo"; readonly chunk: MonteCarloChunk }
  | { readonly id: number; readonly kind: "record-steps"; readonly outcomes: readonly StepOutcome[] }
  | { readonly id: number; readonly kind: "error"; readonly message: string };
