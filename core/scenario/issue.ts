/** A problem with a scenario, naming the path, the value given and what is expected. */
export interface ScenarioIssue {
  /** Dotted path in the scenario file, e.g. "diffuser.portDiameter" or "ambient.profile.2.depth". */
  readonly path: string;
  /** Full readable message: `path: "value" what is expected`. */
  readonly message: string;
  readonly value?: unknown;
}

export function issue(path: string, value: unknown, expectation: string): ScenarioIssue {
  const shown =
    value === undefined
      ? "is missing;"
      : typeof value === "number" && !Number.isFinite(value)
        ? String(value)
        : `${(JSON.stringify(value) ?? String(value)).slice(0, 80)}`;
  return { path, value, message: `${path || "(file)"}: ${shown} ${expectation}` };
}
