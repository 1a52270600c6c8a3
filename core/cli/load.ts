/**
 * Reading input files for the command line: every command reads through here, so every file gets the
 * same checks (io.readFile: regular file, size cap, UTF-8; parseJsonText: nesting depth, syntax,
 * duplicate keys). File errors and scenario issues become CliErrors (exit code 2).
 */
import { parseScenario } from "../scenario/parse";
import { parseJsonText } from "../scenario/json-text";
import type { Scenario } from "../scenario/types";
import { CliError, type CliIO } from "./command";

export function formatIssues(path: string, issues: readonly { message: string }[]): string {
  const n = issues.length;
  return `${path}: ${n} problem${n === 1 ? "" : "s"} in the scenario:\n${issues.map((i) => `  - ${i.message}`).join("\n")}`;
}

/** Issues with a field path, one "  - path: message" line each. */
export function pathIssueLines(issues: readonly { path: string; message: string }[]): string {
  return issues.map((i) => `  - ${i.path}: ${i.message}`).join("\n");
}

/** Reads a JSON file of any kind (scenario, study) and returns its text and value. */
export function loadJsonTextFile(path: string, io: CliIO): { text: string; value: unknown } {
  const text = io.readFile(path);
  const json = parseJsonText(text);
  if (!json.ok) throw new CliError(`${path}: ${json.message}`);
  return { text, value: json.value };
}

/** Reads a JSON file of any kind (studies), with a readable error. */
export function loadJsonFile(path: string, io: CliIO): unknown {
  return loadJsonTextFile(path, io).value;
}

export function loadScenarioFile(path: string, io: CliIO): Scenario {
  const parsed = parseScenario(loadJsonFile(path, io));
  if (!parsed.ok) throw new CliError(formatIssues(path, parsed.issues));
  return parsed.scenario;
}
