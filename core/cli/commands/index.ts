/** Every subcommand of the command-line adapter, in the order `brinefield --help` lists them. */
import type { CliCommand } from "../command";
import { command as run } from "./run";
import { command as checkClaim } from "./check-claim";
import { command as compare } from "./compare";
import { command as sweep } from "./sweep";
import { command as design } from "./design";
import { command as uncertainty } from "./uncertainty";
import { command as report } from "./report";
import { command as schema } from "./schema";
import { command as bench } from "./bench";
import { command as validate } from "./validate";

export const COMMANDS: readonly CliCommand[] = [
  run,
  checkClaim,
  compare,
  sweep,
  design,
  uncertainty,
  report,
  validate,
  schema,
  bench,
];
