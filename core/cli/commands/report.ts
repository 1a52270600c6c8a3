/**
 * `brinefield report`: the screening report of a scenario or a study as a printable HTML document, with
 * optional PDF (headless Chromium), CSV and JSON exports. The 3D view is captured from the built
 * renderer when possible; when not, the report says why. Browser-driving code lives in
 * core/cli/node/headless/ and is imported only when a PDF or the 3D image is asked for.
 */
import { jsonText } from "../../result/json";
import { basename, dirname, extname, resolve } from "node:path";
import type { CliCommand, CliIO } from "../command";
import { CliError } from "../command";
import { readArgs, numberOption } from "../args";
import { formatIssues, loadJsonFile, loadJsonTextFile, pathIssueLines } from "../load";
import { printTextAnswer } from "../output";
import { refuseOverWorkCap } from "../work-cap";
import { parseScenario } from "../../scenario/parse";
import type { Scenario } from "../../scenario/types";
import { runScenario } from "../../pipeline";
import type { BrinefieldResult } from "../../result/contract";
import { reportHtml, resultCsv, seriesCsv, studyReportHtml, studyResultCsv, studySeriesCsv } from "../../report";
import { aboutResult, csvWithCaution, type CsvAbout } from "../../report/csv";
import type { StudyReportVariant } from "../../report";
import { checkClaimOnScenario } from "../../compliance/claim-run";
import type { ClaimCheck } from "../../compliance/claim";
import {
  parseStudy,
  withRawOverride,
  planMonteCarlo,
  runMonteCarloChunk,
  summariseMonteCarlo,
  evaluateScenario,
  mergeMonteCarloChunks,
  histogram,
} from "../../study";
import type { ReportUncertainty } from "../../report/uncertainty";

const HELP = `Usage: brinefield report <scenario-or-study.json> [--out report.html] [--pdf report.pdf]
                         [--csv results.csv] [--series-csv series.csv] [--json result.json]
                         [--no-3d] [--uncertainty <runs>] [--seed <n>]
                         [--claimed-dilution <N> [--at <D>]]

Writes the screening report: a self-contained, printable HTML document with the permitting caution,
the job and question, every input (as entered and in SI), derived quantities, each near-field method's
results with its source and known bias, the multiport regime, dilution and concentration at the
mixing-zone edge, verdict and margin, warnings, figures and the full references. A study file
("format": "brinefield-study") gives one section per variant and a comparison table.

Options:
  --out <file>          HTML report (default: <input name>-report.html in the current folder).
  --pdf <file>          Also print the report to PDF with headless Chromium (/usr/bin/chromium).
  --csv <file>          Key results as CSV: one row per near-field method and per constituent
                        (studies: one block per variant, with a "variant" column).
  --series-csv <file>   Dilution, salinity increase and layer thickness against distance, as CSV.
  --json <file>         The result exactly as \`brinefield run --json\` prints it (studies: a list of
                        {variant, result}).
  --no-3d               Leave out the rendered 3D view (it needs the renderer built and Chromium).
  --uncertainty <runs>  Run a Monte Carlo of that many runs on the scenario's uncertain inputs (or
                        default spreads) and add the uncertainty section to the report: percentiles
                        in words, a histogram with the required dilution, chances as percentages
                        (scenarios only).
  --seed <n>            Seed of the Monte Carlo (default 1), for repeatable numbers.
  --claimed-dilution <N>  Check a claimed dilution and add a claim section (verdict supported,
                        plausible or not-supported, each method chain's value, a range bar), as
                        \`brinefield check-claim\` does (scenarios only).
  --at <D>              Distance of the claim in metres (default: the mixing-zone radius).
  -h, --help            Show this help.

Exit codes: 0 report written; 2 the input or the options are invalid; 3 the PDF could not be printed
(the HTML and other files are still written); 70 an internal error.`;

interface Written {
  readonly path: string;
  readonly what: string;
}

function defaultOut(input: string): string {
  const name = basename(input, extname(input));
  return `${name}-report.html`;
}

async function tryCapture3d(text: string, io: CliIO): Promise<{ png?: string; note?: string }> {
  try {
    const { capture3dView } = await import("../node/headless/capture-3d");
    return { png: await capture3dView(text) };
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    io.stderr(`brinefield report: 3D view left out: ${reason}\n`);
    return { note: `the 3D view could not be rendered (${reason})` };
  }
}

function readScenarioRaw(raw: unknown, where: string): Scenario {
  const parsed = parseScenario(raw);
  if (!parsed.ok) throw new CliError(formatIssues(where, parsed.issues));
  return parsed.scenario;
}

function monteCarlo(scenario: Scenario, runs: number, seed: number, io: CliIO): unknown {
  refuseOverWorkCap("report", `--uncertainty ${runs}`, runs, scenario);
  const planned = planMonteCarlo(scenario, runs, seed);
  if (!planned.ok)
    throw new CliError(`brinefield report: the uncertainty run cannot start:\n${pathIssueLines(planned.issues)}`);
  io.stderr(`brinefield report: running ${runs} Monte Carlo runs (seed ${seed})…\n`);
  const chunk = runMonteCarloChunk(scenario, planned.plan, 0, runs, evaluateScenario);
  const merged = mergeMonteCarloChunks(planned.plan, [chunk]);
  const uncertainty: ReportUncertainty = {
    summary: summariseMonteCarlo(planned.plan, [chunk]),
    histogram: histogram(merged.worstEdgeDilution, 30),
  };
  return uncertainty;
}

const OPTIONS = {
  out: { type: "string" },
  pdf: { type: "string" },
  csv: { type: "string" },
  "series-csv": { type: "string" },
  json: { type: "string" },
  "no-3d": { type: "boolean" },
  uncertainty: { type: "string" },
  seed: { type: "string" },
  "claimed-dilution": { type: "string" },
  at: { type: "string" },
} as const;

type ReportValues = ReturnType<typeof readArgs<typeof OPTIONS>>["values"];

/** The numeric options, checked, and the output files, each named once. */
interface ReportOptions {
  /** Monte Carlo runs (--uncertainty), when asked for. */
  readonly runs: number | undefined;
  readonly seed: number;
  /** Claimed dilution (--claimed-dilution) and its distance in metres (--at), when asked for. */
  readonly claimed: number | undefined;
  readonly at: number | undefined;
}

function reportOptions(values: ReportValues, inputPath: string, io: CliIO): ReportOptions {
  const outputs = [
    values.out ?? defaultOut(inputPath),
    values.pdf,
    values.csv,
    values["series-csv"],
    values.json,
  ].filter((p): p is string => p !== undefined);
  const clash = outputs.find((p, i) => outputs.findIndex((q) => resolve(io.cwd, q) === resolve(io.cwd, p)) !== i);
  if (clash !== undefined)
    throw new CliError(`brinefield report: ${clash} is named for two outputs; give each output its own file`);
  const runs = numberOption(values.uncertainty, "uncertainty", "report", (v) =>
    Number.isInteger(v) && v >= 1 && v <= 100_000 ? null : "must be a whole number from 1 to 100000",
  );
  const seed =
    numberOption(values.seed, "seed", "report", (v) =>
      Number.isInteger(v) && v >= 0 && v <= 0xffffffff ? null : "must be a whole number from 0 to 4294967295",
    ) ?? 1;
  const claimed = numberOption(values["claimed-dilution"], "claimed-dilution", "report", (v) =>
    v >= 1 ? null : "is not possible: a dilution is at least 1 (1 is the undiluted brine at the port)",
  );
  const at = numberOption(values.at, "at", "report", (v) =>
    v > 0 ? null : "must be a distance in metres greater than 0",
  );
  if (at !== undefined && claimed === undefined)
    throw new CliError("brinefield report: --at needs --claimed-dilution N.");
  return { runs, seed, claimed, at };
}

/** The report and its exports, before any is written. */
interface ReportDocuments {
  readonly html: string;
  readonly csv: string;
  readonly series: string;
  readonly json: string;
  readonly about: CsvAbout;
}

/** What the report is made from: the input file (text and value) and the options. */
interface ReportSource {
  readonly inputPath: string;
  readonly text: string;
  readonly file: unknown;
  readonly options: ReportOptions;
  readonly want3d: boolean;
  readonly generatedAt: string;
}

/** A study's report: one section per variant (base first) and a comparison table. */
async function studyReport(source: ReportSource, io: CliIO): Promise<ReportDocuments> {
  const { inputPath, text, file, options, want3d, generatedAt } = source;
  const parsed = parseStudy(file);
  if (!parsed.ok) throw new CliError(formatIssues(inputPath, parsed.issues));
  const study = parsed.study;
  const baseRaw =
    typeof study.base === "string" ? loadJsonFile(resolve(io.cwd, dirname(inputPath), study.base), io) : study.base;
  const list = [
    { name: "base", description: undefined as string | undefined, overrides: {} as Record<string, unknown> },
    ...(study.variants ?? []),
  ];
  const variants: StudyReportVariant[] = list.map((v, i) => {
    const where = i === 0 ? `${inputPath} (base)` : `${inputPath} variants.${i - 1} (${v.name})`;
    let raw: unknown = baseRaw;
    try {
      for (const [path, value] of Object.entries(v.overrides)) raw = withRawOverride(raw, path, value);
    } catch (err) {
      throw new CliError(`${where}: ${err instanceof Error ? err.message : String(err)}`);
    }
    const scenario = readScenarioRaw(raw, where);
    return {
      name: v.name,
      description: v.description,
      overrides: v.overrides,
      scenarioFile: raw,
      result: runScenario(scenario),
    };
  });
  if (options.runs !== undefined)
    io.stderr(
      "brinefield report: --uncertainty applies to scenarios only; run it per scenario for a study's variants.\n",
    );
  if (options.claimed !== undefined)
    throw new CliError(
      "brinefield report: --claimed-dilution applies to scenarios only; report the variant's scenario to check a claim.",
    );
  let pngs: (string | undefined)[] | undefined;
  let note: string | undefined = want3d ? undefined : "it was turned off (--no-3d)";
  if (want3d) {
    pngs = [];
    for (const v of variants) {
      const shot = await tryCapture3d(JSON.stringify(v.scenarioFile), io);
      pngs.push(shot.png);
      note ??= shot.note;
      if (!shot.png) break; // the same reason would repeat for every variant
    }
  }
  return {
    html: studyReportHtml(
      { name: study.name, description: study.description, studyText: text, variants },
      { view3dPngs: pngs, view3dNote: note, generatedAt },
    ),
    about: { study: study.name },
    csv: studyResultCsv(variants),
    series: studySeriesCsv(variants),
    json: jsonText(variants.map((v) => ({ variant: v.name, result: v.result }))),
  };
}

/** A scenario's report, with the Monte Carlo and claim sections when asked for. */
async function scenarioReport(source: ReportSource, io: CliIO): Promise<ReportDocuments> {
  const { inputPath, text, file, options, want3d, generatedAt } = source;
  const scenario = readScenarioRaw(file, inputPath);
  const result: BrinefieldResult = runScenario(scenario);
  const uncertainty = options.runs !== undefined ? monteCarlo(scenario, options.runs, options.seed, io) : undefined;
  let claim: ClaimCheck | undefined;
  if (options.claimed !== undefined) {
    const outcome = checkClaimOnScenario(scenario, options.claimed, options.at);
    if (!outcome.ok)
      throw new CliError(
        `brinefield report: ${outcome.field === "at" ? "--at" : "--claimed-dilution"}: ${outcome.message}`,
      );
    claim = outcome.check;
  }
  const shot = want3d ? await tryCapture3d(text, io) : { note: "it was turned off (--no-3d)" };
  return {
    html: reportHtml(
      result,
      { scenarioFile: file, scenarioText: text },
      { view3dPng: shot.png, view3dNote: shot.note, uncertainty, claim, generatedAt },
    ),
    about: aboutResult(result),
    csv: resultCsv(result),
    series: seriesCsv(result),
    json: jsonText(result),
  };
}

/**
 * Writes the HTML and every export asked for, then prints the PDF (a printing failure leaves the other
 * files written and gives exit code 3). Returns what was written and the exit code.
 */
async function writeReportFiles(
  values: ReportValues,
  inputPath: string,
  docs: ReportDocuments,
  io: CliIO,
): Promise<{ written: Written[]; code: number }> {
  const written: Written[] = [];
  const out = values.out ?? defaultOut(inputPath);
  await io.writeFile(out, docs.html);
  written.push({ path: out, what: "HTML report" });
  if (values.csv) {
    await io.writeFile(values.csv, csvWithCaution(docs.csv, undefined, docs.about));
    written.push({ path: values.csv, what: "key results CSV" });
  }
  if (values["series-csv"]) {
    await io.writeFile(values["series-csv"], csvWithCaution(docs.series, undefined, docs.about));
    written.push({ path: values["series-csv"], what: "dilution series CSV" });
  }
  if (values.json) {
    await io.writeFile(values.json, docs.json);
    written.push({ path: values.json, what: "result JSON" });
  }
  let code = 0;
  if (values.pdf) {
    let pdf: Uint8Array | undefined;
    try {
      const { pdfFromHtml } = await import("../node/headless/print-pdf");
      pdf = await pdfFromHtml(docs.html);
    } catch (err) {
      io.stderr(`brinefield report: the PDF was not written: ${err instanceof Error ? err.message : String(err)}\n`);
      code = 3;
    }
    // A refused or failed write of the PDF file is a file error (exit 2), not a printing failure.
    if (pdf) {
      await io.writeFile(values.pdf, pdf);
      written.push({ path: values.pdf, what: "PDF report" });
    }
  }
  return { written, code };
}

export const command: CliCommand = {
  name: "report",
  summary: "Write the screening report (HTML; optional PDF, CSV, JSON) for a scenario or a study.",
  help: HELP,
  async run(argv, io) {
    const { values, positionals } = readArgs(argv, OPTIONS, "report");
    if (positionals.length !== 1) {
      throw new CliError(
        "brinefield report: give exactly one scenario or study file, e.g. `brinefield report demo-scenarios/island-cove.json --pdf report.pdf`",
      );
    }
    const inputPath = positionals[0]!;
    const options = reportOptions(values, inputPath, io);
    const { text, value: file } = loadJsonTextFile(inputPath, io);
    const format = file !== null && typeof file === "object" ? (file as { format?: unknown }).format : undefined;
    const source: ReportSource = {
      inputPath,
      text,
      file,
      options,
      want3d: !values["no-3d"],
      generatedAt: new Date().toISOString(),
    };
    const docs = format === "brinefield-study" ? await studyReport(source, io) : await scenarioReport(source, io);
    const { written, code } = await writeReportFiles(values, inputPath, docs, io);
    printTextAnswer(
      io,
      written.map((w) => `wrote ${w.what}: ${w.path}`),
    );
    return code;
  },
};
