/**
 * The command-line adapter: `brinefield <command> [options]`. This is the one part of core/ that
 * touches Node (process, fs, worker_threads); nothing else in core/ imports it.
 */
import { readFileSync, writeFileSync, renameSync, statSync, openSync, fsyncSync, closeSync } from "node:fs";
import { resolve, dirname, basename, join } from "node:path";
import { availableParallelism } from "node:os";
import { isMainThread } from "node:worker_threads";
import { COMMANDS } from "./commands/index";
import { runWorkerThread } from "./workers/worker";
import { CliError, type CliIO } from "./command";
import { ScenarioError } from "../scenario/parse";
import { BRINEFIELD_VERSION } from "../version";
import { CAUTION } from "../result/contract";

const MAX_INPUT_BYTES = 20_000_000;

export function nodeIO(): CliIO {
  const cwd = process.cwd();
  return {
    cwd,
    isTTY: Boolean(process.stderr.isTTY),
    cores: availableParallelism(),
    stdout: (t) => void process.stdout.write(t),
    stderr: (t) => void process.stderr.write(t),
    readFile(path) {
      const p = resolve(cwd, path);
      let size: number;
      try {
        const st = statSync(p);
        if (st.isDirectory()) throw new CliError(`${path}: is a folder, not a file`);
        size = st.size;
      } catch (err) {
        if (err instanceof CliError) throw err;
        throw new CliError(`${path}: cannot be read (${(err as NodeJS.ErrnoException).code === "ENOENT" ? "no such file" : (err as Error).message})`);
      }
      if (size > MAX_INPUT_BYTES) throw new CliError(`${path}: is ${Math.round(size / 1e6)} MB, over the ${MAX_INPUT_BYTES / 1e6} MB Brinefield reads; refused unread`);
      return readFileSync(p, "utf8");
    },
    writeFile(path, data) {
      const p = resolve(cwd, path);
      const tmp = join(dirname(p), `.${basename(p)}.${process.pid}.tmp`);
      try {
        writeFileSync(tmp, data);
        const fd = openSync(tmp, "r");
        fsyncSync(fd);
        closeSync(fd);
        renameSync(tmp, p);
      } catch (err) {
        throw new CliError(`${path}: cannot be written (${(err as Error).message})`);
      }
    },
  };
}

function topHelp(): string {
  const width = Math.max(...COMMANDS.map((c) => c.name.length));
  return `Brinefield ${BRINEFIELD_VERSION} — screening of seabed diffusers for desalination brine outfalls.

Usage: brinefield <command> [options]     (brinefield <command> --help for each command's options)

Commands:
${COMMANDS.map((c) => `  ${c.name.padEnd(width)}   ${c.summary}`).join("\n")}

Options:
  -h, --help      Show this help.
  -v, --version   Print the version.

${CAUTION}
`;
}

export async function cliMain(argv: readonly string[], io: CliIO = nodeIO()): Promise<number> {
  let code: number;
  try {
    code = await dispatch(argv, io);
  } catch (err) {
    if (err instanceof CliError) {
      io.stderr(err.message.endsWith("\n") ? err.message : err.message + "\n");
      code = err.exitCode;
    } else if (err instanceof ScenarioError) {
      io.stderr(`The scenario cannot be screened:\n${err.issues.map((i) => `  - ${i.message}`).join("\n")}\n`);
      code = 2;
    } else {
      const msg = err instanceof Error ? err.message : String(err);
      io.stderr(`brinefield: internal error: ${msg}\nPlease report it with the scenario file.${process.env.BRINEFIELD_DEBUG ? `\n${(err as Error)?.stack}` : ""}\n`);
      code = 70;
    }
  }
  return code;
}

async function dispatch(argv: readonly string[], io: CliIO): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === "-h" || name === "--help" || name === "help") {
    io.stdout(topHelp());
    return name === undefined ? 2 : 0;
  }
  if (name === "-v" || name === "--version") {
    io.stdout(`${BRINEFIELD_VERSION}\n`);
    return 0;
  }
  const cmd = COMMANDS.find((c) => c.name === name);
  if (!cmd) throw new CliError(`brinefield: unknown command "${name}". Commands: ${COMMANDS.map((c) => c.name).join(", ")}. See \`brinefield --help\`.`);
  if (rest.includes("-h") || rest.includes("--help")) {
    io.stdout(cmd.help.endsWith("\n") ? cmd.help : cmd.help + "\n");
    return 0;
  }
  return cmd.run(rest, io);
}

// Worker threads of studies and Monte Carlo start on this same bundle (core/cli/workers/pool.ts).
if (!isMainThread) runWorkerThread();
