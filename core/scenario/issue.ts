import type { ResultWarning } from "../warnings";

/** A problem with a scenario, naming the path, the value given and what is expected. */
export interface ScenarioIssue {
  /** Dotted path in the scenario file, e.g. "diffuser.portDiameter" or "ambient.profile.2.depth". */
  readonly path: string;
  /** Full readable message: `path: "value" what is expected`. */
  readonly message: string;
  readonly value?: unknown;
  /**
   * Other fields that take part in a cross-field rule (e.g. the water depth for "the port must stay below
   * the surface"). The app shows the message on whichever of them the user just changed.
   */
  readonly related?: readonly string[];
}

export function issue(path: string, value: unknown, expectation: string, related?: readonly string[]): ScenarioIssue {
  const shown =
    value === undefined
      ? "is missing;"
      : typeof value === "number" && !Number.isFinite(value)
        ? String(value)
        : `${(JSON.stringify(value) ?? String(value)).slice(0, 80)}`;
  return {
    path,
    value,
    message: `${path || "(file)"}: ${shown} ${expectation}`,
    ...(related && related.length ? { related } : {}),
  };
}

/**
 * What normalising collects on the way: the issues found, the unit conversions made and the range
 * warnings of the conversion formulas used (one per code and field, the value farthest outside its range).
 */
export interface NormaliseContext {
  readonly issues: ScenarioIssue[];
  readonly conversions: string[];
  readonly warnings?: ResultWarning[];
}

/** Adds a conversion's range warnings for the field at `path`, keeping the worst value per code and field. */
export function addConversionWarnings(ctx: NormaliseContext, path: string, found: readonly ResultWarning[]): void {
  if (!ctx.warnings) return;
  for (const w of found) {
    const named: ResultWarning = { ...w, parameter: path, message: `${path}: ${w.message}` };
    const at = ctx.warnings.findIndex((o) => o.code === w.code && o.parameter === path);
    if (at < 0) ctx.warnings.push(named);
    else if (distanceOutside(named) > distanceOutside(ctx.warnings[at]!)) ctx.warnings[at] = named;
  }
}

function distanceOutside(w: ResultWarning): number {
  if (w.value === undefined || !w.range) return 0;
  return Math.max(w.range[0] - w.value, w.value - w.range[1]);
}
