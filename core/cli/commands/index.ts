/** Every subcommand of the command-line adapter, in the order `brinefield --help` lists them. */
import type { CliCommand } from "../command";
import { command as run } from "./run";
import { command as checkClaim } from "./check-claim";
import { command as schema } from "./schema";

export const COMMANDS: readonly CliCommand[] = [run, checkClaim, schema];
