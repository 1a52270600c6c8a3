/**
 * Structured warnings shared by every stage of the pipeline. Stages never throw for
 * out-of-range physics; they return warnings that the CLI, the app and the report show
 * next to the numbers they qualify.
 */
export type WarningSeverity = "info" | "warning" | "serious";

export interface ResultWarning {
  /** Stable machine-readable code, kebab-case, e.g. "jet-reaches-surface". */
  readonly code: string;
  readonly severity: WarningSeverity;
  /** One readable sentence with the numbers and units that triggered it. */
  readonly message: string;
  /** Input or derived quantity concerned, as a scenario path or result key. */
  readonly parameter?: string;
  readonly value?: number;
  /** Range of validity [low, high] in SI units, where the warning is a range check. */
  readonly range?: readonly [number, number];
  /** Publication or practice the range comes from. */
  readonly source?: string;
  /** Which stage or method raised it ("properties", "length-scale", "integral", ...). */
  readonly stage?: string;
}

export function warning(
  code: string,
  severity: WarningSeverity,
  message: string,
  extra: Omit<ResultWarning, "code" | "severity" | "message"> = {},
): ResultWarning {
  return { code, severity, message, ...extra };
}
