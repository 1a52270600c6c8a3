/**
 * How a command prints its answer on stdout: the JSON object as it is (it carries its own caution
 * field), or the text lines under the caution.
 */
import { jsonText } from "../result/json";
import { withCaution } from "../result/caution";
import type { CliIO } from "./command";

/** Prints a command's JSON answer. */
export function printJsonAnswer(io: CliIO, value: unknown): void {
  io.stdout(jsonText(value));
}

/** Prints a command's text answer, one entry per line, under the caution. */
export function printTextAnswer(io: CliIO, lines: readonly string[]): void {
  io.stdout(withCaution(lines.join("\n") + "\n"));
}
