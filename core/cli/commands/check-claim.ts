/** `brinefield check-claim <scenario> --claimed-dilution D [--at L] [--json]` */
import { jsonText } from "../../result/json";
import { CliError, type CliCommand, type CliIO } from "../command";
import { readArgs, numberOption } from "../args";
import { loadScenarioFile } from "../load";
import { checkClaimOnScenario } from "../../compliance/claim-run";
import { CAUTION } from "../../result/contract";
import { inputsHash } from "../../scenario/hash";
import { textTable } from "../../study/table";

const NAME = "check-claim";

const HELP = `Usage: brinefield check-claim <scenario.json> --claimed-dilution D [--at L] [--json]

Checks a claimed dilution at a plan distance against Brinefield's method chains (each near-field
method carried on by the spreading dense layer or, with a current, by passive diffusion), evaluated at
that distance in every ambient case the overall verdict covers: the stated conditions, every listed
case and slack water (unless options.addSlackWater is false).

Verdicts:
  supported       the claim is at or below the conservative value (the lowest edge dilution at that
                  distance over the cases), within 0.1 %
  plausible       above the conservative value, but at or below what at least one chain gives (its
                  central value or the top of its method's stated scatter); those chains are named,
                  with the assumptions they rest on
  not-supported   above every chain, scatter included

Options:
  --claimed-dilution D   the claimed dilution (a number of at least 1), required
  --at L                 plan distance from the diffuser in metres (default: the mixing-zone radius);
                         at most the end of the computed dilution series (no extrapolation)
  --json                 print the check as JSON (verdict, conservativeDilution, ratioToConservative,
                         chains, cases, caution)
  -h, --help             show this help

Exit codes: 0 whatever the verdict; 2 for usage or scenario errors, a claimed dilution below 1 or a
distance beyond the computed series.`;

function fmt(v: number): string {
  return Number.isFinite(v) ? (Math.abs(v) >= 100 ? v.toFixed(0) : String(Number(v.toPrecision(3)))) : String(v);
}

export const command: CliCommand = {
  name: NAME,
  summary: "Check a claimed dilution against Brinefield's method chains: supported, plausible or not supported",
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
    const claimed = numberOption(values["claimed-dilution"], "claimed-dilution", NAME, (v) =>
      v >= 1 ? null : "is not possible: a dilution is at least 1 (1 is the undiluted brine at the port)",
    );
    if (claimed === undefined) throw new CliError(`brinefield ${NAME}: --claimed-dilution is required.`);
    const at = numberOption(values.at, "at", NAME, (v) =>
      v > 0 ? null : "must be a distance in metres greater than 0",
    );
    const scenario = loadScenarioFile(positionals[0], io);
    const outcome = checkClaimOnScenario(scenario, claimed, at);
    if (!outcome.ok) {
      const flag = outcome.field === "at" ? "--at" : "--claimed-dilution";
      throw new CliError(`brinefield ${NAME}: ${flag}: ${outcome.message}`);
    }
    const check = outcome.check;
    if (values.json) {
      io.stdout(
        jsonText({
          format: "brinefield-claim-check",
          version: 1,
          scenarioName: scenario.name,
          inputsHash: inputsHash(scenario),
          ...check,
          seriesEnd: outcome.seriesEnd,
          caution: CAUTION,
        }),
      );
      return 0;
    }
    const lines = [
      `Claim check: ${check.verdict}. ${check.summary}`,
      `Scenario: ${scenario.name}`,
      `Conservative value ${fmt(check.conservativeDilution)} (case "${check.conservativeCase}"); claim ÷ conservative = ${check.ratioToConservative.toFixed(3)}.`,
      "",
      `Method chains at ${fmt(check.distance)} m (dilution; low–high with the near-field method's stated scatter):`,
      textTable(
        ["case", "chain", "dilution", "low", "high", "gives the claim"],
        check.chains.map((c) => [
          c.case,
          c.method,
          c.dilution,
          c.low,
          c.high,
          c.reproducesClaim ? (c.onlyWithinScatter ? "within scatter" : "yes") : "no",
        ]),
      ),
    ];
    if (check.assumptionsNeeded.length)
      lines.push("What the claim rests on:", ...check.assumptionsNeeded.map((a) => `  - ${a}`));
    lines.push("", CAUTION);
    io.stdout(lines.join("\n") + "\n");
    return 0;
  },
};
