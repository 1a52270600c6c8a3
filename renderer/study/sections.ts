/** Pieces the Study tab's sections share: the job runners' types, form helpers, axis display. */
import type { Scenario } from "../../core/scenario/types";
import { siToDisplay, type UnitSystem } from "../../core/units";
import { OVERRIDE_PATHS, type Overrides } from "../../core/study/overrides";
import type { PointEvaluation } from "../../core/study/evaluate-point";
import type { StudyTask } from "../../core/study/worker-protocol";
import type { StudyWorkerPool } from "./worker-pool";
import type { AxisDisplay } from "./charts";

export type Replies = Awaited<ReturnType<StudyWorkerPool["run"]>>;

/** Replaces item i of a list with a patched copy (form rows). */
export function patchAt<T>(list: readonly T[], i: number, patch: Partial<T>): T[] {
  return list.map((x, k) => (k === i ? { ...x, ...patch } : x));
}

/** Paths a sweep may vary. */
export const PATHS = Object.keys(OVERRIDE_PATHS);

/** The words for a path that can be varied, capitalised: "Current speed" for ambient.currentSpeed. */
export function pathTitle(path: string): string {
  const words = OVERRIDE_PATHS[path]?.label ?? path;
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** Axis title in words with the display unit ("Current speed (m/s)") and the SI → display conversion. */
export function axisDisplay(path: string, unitSystem: UnitSystem): AxisDisplay {
  const info = OVERRIDE_PATHS[path]!;
  const unit = siToDisplay(1, info.kind, unitSystem).unit;
  return {
    label: unit ? `${pathTitle(path)} (${unit})` : pathTitle(path),
    toDisplay: (v) => siToDisplay(v, info.kind, unitSystem).value,
  };
}

export type RunJob = <T>(
  label: string,
  total: number,
  tasks: readonly StudyTask[],
  finish: (r: Replies) => T,
) => Promise<T | null>;

export type RunPoints = (label: string, s: Scenario, list: readonly Overrides[]) => Promise<PointEvaluation[] | null>;
