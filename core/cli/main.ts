/**
 * The command-line adapter: `brinefield <command> [options]`. This is the one part of core/ that
 * touches Node (process, fs, worker_threads); nothing else in core/ imports it.
 */
import { resolve } from "node:path";
import { availableParallelism } from "node:os";
import { isMainThread } from "node:worker_threads";
import { COMMANDS } from "./commands/index";
import { runWorkerThread } from "./workers/worker";
import { CliError, type CliIO } from "./command";
import { ScenarioError } from "../scenario/parse";
import { BRINEFIELD_VERSION } from "../version";
import { CAUTION } from "../result/contract";
import { readInputFileSync, writeFileAtomic, fsErrorReason, OutputRefusedError, type FileIdentity } from "./node";
import { terminalSafeChunk } from "./terminal";
import { BENCH_SCENARIO_INPUT } from "./bench/study";

/** The process's file system and terminal. Every file read is remembered so no output overwrites it. */
export function nodeIO(): CliIO {
  const cwd = process.cwd();
  const inputs: FileIdentity[] = [];
  return {
    cwd,
    isTTY: Boolean(process.stderr.isTTY),
    progressLines: process.env.BRINEFIELD_PROGRESS === "lines",
    cores: availableParallelism(),
    stdout: (t) => void process.stdout.write(t),
    stderr: (t) => void process.stderr.write(t),
    readFile(path) {
      const read = readInputFileSync(resolve(cwd, path));
      if (!read.ok) throw new CliError(`${path}: ${read.message}`);
      inputs.push(read.identity);
      return read.text;
    },
    async writeFile(path, data) {
      try {
        await writeFileAtomic(resolve(cwd, path), data, { notOneOf: inputs });
      } catch (err) {
        const why = err instanceof OutputRefusedError ? err.message : `cannot be written (${fsErrorReason(err)})`;
        throw new CliError(`${path}: ${why}`);
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

export async function cliMain(argv: readonly string[], rawIo: CliIO = nodeIO()): Promise<number> {
  // Everything printed passes through terminalSafe: user text (names, quoted values) may hold
  // control characters or escape sequences that would drive the terminal.
  const io: CliIO = {
    ...rawIo,
    readFile: (p) => rawIo.readFile(p),
    writeFile: (p, d) => rawIo.writeFile(p, d),
    stdout: (t) => rawIo.stdout(terminalSafeChunk(t)),
    stderr: (t) => rawIo.stderr(terminalSafeChunk(t)),
  };
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
      io.stderr(
        `brinefield: internal error: ${msg}\nPlease report it with the scenario file.${process.env.BRINEFIELD_DEBUG ? `\n${(err as Error)?.stack}` : ""}\n`,
      );
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
  if (!cmd)
    throw new CliError(
      `brinefield: unknown command "${name}". Commands: ${COMMANDS.map((c) => c.name).join(", ")}. See \`brinefield --help\`.`,
    );
  if (rest.includes("-h") || rest.includes("--help")) {
    io.stdout(cmd.help.endsWith("\n") ? cmd.help : cmd.help + "\n");
    return 0;
  }
  return cmd.run(rest, io);
}

/**
 * Runs `run --json` on the invented benchmark scenario with nothing printed, so the code cache the
 * launcher saves after it holds the compiled scenario reader and pipeline (core/cli/launcher.mjs).
 */
export async function warmUpForCodeCache(): Promise<void> {
  const text = JSON.stringify(BENCH_SCENARIO_INPUT);
  const silent: CliIO = {
    cwd: process.cwd(),
    isTTY: false,
    cores: 1,
    stdout: () => undefined,
    stderr: () => undefined,
    readFile: () => text,
    writeFile: () => Promise.reject(new Error("the warm-up writes no file")),
  };
  await cliMain(["run", "warm-up.json", "--json"], silent);
}

// Worker threads of studies and Monte Carlo start on this same bundle (core/cli/workers/pool.ts).
if (!isMainThread) runWorkerThread();
