/** Messages between the app and the core worker. Plain, structured-cloneable data. */
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";

export interface EngineIssue {
  readonly path: string;
  readonly message: string;
  readonly value?: unknown;
  /** Other fields a cross-field rule involves; the app shows the message on the one just changed. */
  readonly related?: readonly string[];
}

export interface EngineRequest {
  readonly id: number;
  readonly file: unknown;
}

export type EngineResponse =
  | {
      readonly id: number;
      readonly ok: true;
      readonly scenario: Scenario;
      readonly result: BrinefieldResult;
      readonly ms: number;
    }
  | { readonly id: number; readonly ok: false; readonly issues: readonly EngineIssue[]; readonly message: string };
