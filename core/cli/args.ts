/** Minimal argument reading with errors that name the option (node:util parseArgs underneath). */
import { parseArgs, type ParseArgsConfig } from "node:util";
import { CliError } from "./command";

export function readArgs<T extends NonNullable<ParseArgsConfig["options"]>>(
  argv: readonly string[],
  options: T,
  command: string,
) {
  try {
    return parseArgs({ args: [...argv], options, allowPositionals: true, strict: true });
  } catch (err) {
    const msg = err instanceof Error ? err.message : String(err);
    throw new CliError(
      `brinefield ${command}: ${msg.replace(/^TypeError \[[A-Z_]+\]: /, "")}\nSee \`brinefield ${command} --help\`.`,
    );
  }
}

export function numberOption(
  value: string | undefined,
  name: string,
  command: string,
  check?: (v: number) => string | null,
): number | undefined {
  if (value === undefined) return undefined;
  const v = Number(value);
  if (!Number.isFinite(v)) throw new CliError(`brinefield ${command}: --${name} "${value}" must be a number`);
  const problem = check?.(v);
  if (problem) throw new CliError(`brinefield ${command}: --${name} ${value} ${problem}`);
  return v;
}
