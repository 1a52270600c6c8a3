/** Reading a scenario file for the command line: file errors and scenario issues become CliErrors. */
import { parseScenarioText } from "../scenario/parse";
import type { Scenario } from "../scenario/types";
import { CliError, type CliIO } from "./command";

export function formatIssues(path: string, issues: readonly { message: string }[]): string {
  const n = issues.length;
  return `${path}: ${n} problem${n === 1 ? "" : "s"} in the scenario:\n${issues.map((i) => `  - ${i.message}`).join("\n")}`;
}

export function loadScenarioFile(path: string, io: CliIO): Scenario {
  const text = io.readFile(path);
  const parsed = parseScenarioText(text);
  if (!parsed.ok) throw new CliError(formatIssues(path, parsed.issues));
  return parsed.scenario;
}

/** Reads a JSON file of any kind (studies), with a readable error. */
export function loadJsonFile(path: string, io: CliIO): unknown {
  const text = io.readFile(path);
  try {
    return JSON.parse(text);
  } catch (err) {
    throw new CliError(`${path}: is not valid JSON: ${err instanceof Error ? err.message : String(err)}`);
  }
}
