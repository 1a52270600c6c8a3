/**
 * The command-line adapter's plug-in shape. Each subcommand lives in core/cli/commands/<name>.ts and
 * exports `command: CliCommand`. The adapter is the one part of core/ that touches Node; it reaches
 * the file system and the terminal only through `CliIO`, so commands are unit-testable.
 */
export interface CliIO {
  readonly cwd: string;
  stdout(text: string): void;
  stderr(text: string): void;
  /**
   * Reads an input file as text (regular files only, size-capped, UTF-8 with the byte-order mark
   * removed); throws CliError with a readable message on failure. Remembers the file as an input, so
   * `writeFile` refuses to overwrite it.
   */
  readFile(path: string): string;
  /** Writes atomically (see core/cli/node/atomic-write.ts); throws CliError when the output is refused or fails. */
  writeFile(path: string, data: string | Uint8Array): Promise<void> | void;
  /** True when stderr is an interactive terminal (progress bars only then). */
  readonly isTTY: boolean;
  /**
   * Progress of long runs as plain lines on stderr when it is not a terminal (BRINEFIELD_PROGRESS=lines:
   * for logs of unattended runs and for programs that drive the command line).
   */
  readonly progressLines?: boolean;
  /** Number of logical cores available for worker threads. */
  readonly cores: number;
}

export interface CliCommand {
  readonly name: string;
  /** One line for the top-level help. */
  readonly summary: string;
  /** Full help text for `brinefield <name> --help`, every option explained. */
  readonly help: string;
  /** Returns the process exit code. Throws CliError for user errors (message only, no stack). */
  run(argv: readonly string[], io: CliIO): Promise<number>;
}

/** An error whose message is shown to the user as-is, without a stack trace. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode = 2,
  ) {
    super(message);
    this.name = "CliError";
  }
}
