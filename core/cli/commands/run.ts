import { jsonText } from "../../result/json";
import type { CliCommand } from "../command";
import { readArgs } from "../args";
import { formatIssues, loadJsonTextFile } from "../load";
import { runAmbientCase, runScenario } from "../../pipeline";
import { summaryText } from "../summary";
import { CliError } from "../command";
import { parseScenario } from "../../scenario/parse";
import { recordFromCsv } from "../../record/csv";
import { withRecord } from "../../record/result";
import { distinctStepIndices } from "../../record/run";
import { EXIT_CANCELLED, recordStepsOnWorkers, withProgress, workersOption } from "../workers/run-study";

/** Records with at least this many distinct steps run on worker threads with progress and Ctrl-C (shorter ones finish before workers start). */
export const RECORD_STEPS_FOR_WORKERS = 200;

export const command: CliCommand = {
  name: "run",
  summary: "Screen one scenario: densities, near field by two methods, mixing-zone edge, compliance.",
  help: `Usage: brinefield run <scenario.json> [--json] [--no-path] [--record <file.csv>] [--workers <n>]

Runs the screening chain for the scenario's stated ambient and prints a readable summary under the
permitting caution.

Options:
  --json              Print the machine-readable result (format "brinefield-result", version 1; see README).
  --no-path           Leave the integral model's centreline path out of --json output (smaller output).
  --record <file.csv> Use this ambient record (replaces any ambient.record in the scenario). The header names
                      the columns by their scenario fields, each optionally with its unit in parentheses:
                      time (h),currentSpeed (m/s),currentDirection (deg)[,depth (m)][,salinity (g/kg)]
                      [,temperature (degC)]. Times may also be ISO 8601 date-times with a zone.
                      Each step is screened as a quasi-steady state.
  --workers <n>       Worker threads for long records (default: all cores). Ctrl-C cancels.
  -h, --help          Show this help.

Exit codes: 0 results printed; 2 the scenario or the options are invalid (each problem is named with
its path); 70 an internal error; 130 cancelled.`,
  async run(argv, io) {
    const { values, positionals } = readArgs(
      argv,
      {
        json: { type: "boolean" },
        "no-path": { type: "boolean" },
        record: { type: "string" },
        workers: { type: "string" },
      },
      "run",
    );
    if (positionals.length !== 1)
      throw new CliError(
        "brinefield run: give exactly one scenario file, e.g. `brinefield run demo-scenarios/island-cove.json`",
      );
    const path = positionals[0]!;
    const workers = workersOption(values.workers, io, "run");
    // Ctrl-C before the worker threads start (reading a long record, the stated conditions) also cancels.
    let cancelled = false;
    const onSigint = () => void (cancelled = true);
    process.once("SIGINT", onSigint);
    try {
      return await runCommand();
    } finally {
      process.removeListener("SIGINT", onSigint);
    }
    async function runCommand(): Promise<number> {
      let raw = loadJsonTextFile(path, io).value;
      if (values.record !== undefined) {
        const csv = recordFromCsv(io.readFile(values.record), values.record);
        if (!csv.ok) throw new CliError(csv.message);
        if (raw === null || typeof raw !== "object" || Array.isArray(raw))
          throw new CliError(`${path}: must hold a scenario object`);
        const r = raw as Record<string, unknown>;
        const ambient =
          r.ambient && typeof r.ambient === "object" && !Array.isArray(r.ambient)
            ? (r.ambient as Record<string, unknown>)
            : {};
        raw = { ...r, ambient: { ...ambient, record: csv.record } };
      }
      const parsed = parseScenario(raw);
      if (!parsed.ok)
        throw new CliError(
          formatIssues(values.record !== undefined ? `${path} with ${values.record}` : path, parsed.issues),
        );
      const scenario = parsed.scenario;
      const includePath = !values["no-path"];
      // Distinct steps (new water) are what costs time: repeated water is computed once.
      const distinctSteps = scenario.ambient.record ? distinctStepIndices(scenario).length : 0;
      let result;
      if (distinctSteps >= RECORD_STEPS_FOR_WORKERS) {
        const top = runAmbientCase(scenario, { includePath });
        await new Promise((r) => setImmediate(r)); // let a pending Ctrl-C arrive
        if (cancelled) {
          io.stderr("Cancelled: no results.\n");
          return EXIT_CANCELLED;
        }
        const done = await withProgress(io, "Record steps", distinctSteps, (onProgress) =>
          recordStepsOnWorkers(scenario, workers, onProgress),
        );
        if (!done) return EXIT_CANCELLED;
        result = withRecord(scenario, top, done.value);
      } else result = runScenario(scenario, { includePath });
      if (cancelled) {
        io.stderr("Cancelled: no results.\n");
        return EXIT_CANCELLED;
      }
      io.stdout(values.json ? jsonText(result) : summaryText(scenario, result));
      return 0;
    }
  },
};
