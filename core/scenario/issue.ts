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

/** What normalising collects on the way: the issues found and the unit conversions made. */
export interface NormaliseContext {
  readonly issues: ScenarioIssue[];
  readonly conversions: string[];
}
