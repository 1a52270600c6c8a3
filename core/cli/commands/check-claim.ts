/** `brinefield check-claim <scenario> --claimed-dilution D [--at L] [--json]` */
import { CliError, type CliCommand, type CliIO } from "../command";
import { readArgs, numberOption } from "../args";
import { loadScenarioFile } from "../load";
import { runScenario } from "../../pipeline";
import { checkClaim } from "../../compliance/claim";

const NAME = "check-claim";

const HELP = `Usage: brinefield check-claim <scenario.json> --claimed-dilution D [--at L] [--json]

Compares a claimed dilution with Brinefield's independent range at a distance. The range runs from the
lowest to the highest dilution over the method chains (near field × spreading layer or passive diffusion)
and over each near-field method's stated uncertainty.

Options:
  --claimed-dilution D   the claimed dilution (a number greater than 0), required
  --at L                 plan distance from the diffuser in metres (default: the mixing-zone radius)
  --json                 print the check as JSON (verdict, range, distance, methods, assumptions)
  -h, --help             show this help

Verdicts: "above" (the claim is higher than any method gives), "within", "below" (more conservative
than every method). The exit code is 0 whatever the verdict; 2 for usage or scenario errors.`;

function fmt(v: number): string {
  return Number.isFinite(v) ? (Math.abs(v) >= 100 ? v.toFixed(0) : String(Number(v.toPrecision(3)))) : String(v);
}

export const command: CliCommand = {
  name: NAME,
  summary: "Check a claimed dilution against Brinefield's independent range",
  help: HELP,
  async run(argv: readonly string[], io: CliIO): Promise<number> {
    const { values, positionals } = readArgs(
      argv,
      {
        "claimed-dilution": { type: "string" },
        at: { type: "string" },
        json: { type: "boolean", default: false },
        help: { type: "boolean", short: "h", default: false },
      },
      NAME,
    );
    if (values.help) {
      io.stdout(HELP + "\n");
      return 0;
    }
    if (positionals.length !== 1) throw new CliError(`brinefield ${NAME}: give exactly one scenario file.\n${HELP}`);
    const claimed = numberOption(values["claimed-dilution"], "claimed-dilution", NAME, (v) => (v > 0 ? null : "must be greater than 0"));
    if (claimed === undefined) throw new CliError(`brinefield ${NAME}: --claimed-dilution is required.`);
    const at = numberOption(values.at, "at", NAME, (v) => (v >= 0 ? null : "must be 0 or more metres"));
    const scenario = loadScenarioFile(positionals[0], io);
    const result = runScenario(scenario, { includePath: true });
    const check = checkClaim(result, claimed, at);
    if (values.json) {
      io.stdout(JSON.stringify({ format: "brinefield-claim-check", version: 1, scenarioName: result.scenarioName, inputsHash: result.inputsHash, ...check, caution: result.caution }, null, 2) + "\n");
      return 0;
    }
    const lines = [
      `Scenario: ${result.scenarioName}`,
      `Claimed dilution ${fmt(check.claimedDilution)} at ${fmt(check.distance)} m: ${check.verdict.toUpperCase()} Brinefield's range ${fmt(check.range[0])}–${fmt(check.range[1])}` +
        (check.verdict === "within" ? "." : ` (×${check.byHowMuch.toFixed(2)} the nearest end).`),
      "",
      "Methods at that distance (dilution, low–high with stated uncertainty):",
      ...check.methods.map((m) => `  ${m.method}: ${fmt(m.dilution)} (${fmt(m.low)}–${fmt(m.high)})`),
    ];
    if (check.assumptionsNeeded.length) lines.push("", "Assumptions:", ...check.assumptionsNeeded.map((a) => `  - ${a}`));
    lines.push("", result.caution);
    io.stdout(lines.join("\n") + "\n");
    return 0;
  },
};
