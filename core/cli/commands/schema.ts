import type { CliCommand } from "../command";
import { readArgs } from "../args";
import { scenarioJsonSchema } from "../../scenario/schema";

export const command: CliCommand = {
  name: "schema",
  summary: "Print the JSON Schema of the scenario file format.",
  help: `Usage: brinefield schema [--out file.json]

Prints the JSON Schema (draft 2020-12) of the "brinefield-scenario" format, version 1, as a user writes
it (quantities as SI numbers or strings with units). The same schema is kept in the repository at
core/scenario/scenario.schema.json.

Options:
  --out <file>   Write to a file instead of standard output.
  -h, --help     Show this help.`,
  async run(argv, io) {
    const { values } = readArgs(argv, { out: { type: "string" } }, "schema");
    const text = JSON.stringify(scenarioJsonSchema(), null, 2) + "\n";
    if (values.out) await io.writeFile(values.out, text);
    else io.stdout(text);
    return 0;
  },
};
