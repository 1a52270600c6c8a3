import { jsonText } from "../../result/json";
import type { CliCommand } from "../command";
import { readArgs } from "../args";
import { loadScenarioFile } from "../load";
import { runScenario } from "../../pipeline";
import { summaryText } from "../summary";
import { CliError } from "../command";

export const command: CliCommand = {
  name: "run",
  summary: "Screen one scenario: densities, near field by two methods, mixing-zone edge, compliance.",
  help: `Usage: brinefield run <scenario.json> [--json] [--no-path]

Runs the screening chain for the scenario's stated ambient and prints a readable summary under the
permitting caution.

Options:
  --json       Print the machine-readable result (format "brinefield-result", version 1; see README).
  --no-path    Leave the integral model's centreline path out of --json output (smaller output).
  -h, --help   Show this help.

Exit codes: 0 results printed; 2 the scenario or the options are invalid (each problem is named with
its path); 70 an internal error.`,
  async run(argv, io) {
    const { values, positionals } = readArgs(argv, { json: { type: "boolean" }, "no-path": { type: "boolean" } }, "run");
    if (positionals.length !== 1) throw new CliError("brinefield run: give exactly one scenario file, e.g. `brinefield run demo-scenarios/island-cove.json`");
    const scenario = loadScenarioFile(positionals[0]!, io);
    const result = runScenario(scenario, { includePath: !values["no-path"] });
    io.stdout(values.json ? jsonText(result) : summaryText(scenario, result));
    return 0;
  },
};
