/** `brinefield uncertainty`: seeded, reproducible Monte Carlo over uncertain inputs, on all cores. */
import { CliError, type CliCommand, type CliIO } from "../command";
import { readArgs } from "../args";
import { loadScenarioFile, pathIssueLines } from "../load";
import { printJsonAnswer, printTextAnswer } from "../output";
import { refuseOverWorkCap } from "../work-cap";
import type { Scenario } from "../../scenario/types";
import {
  MAX_RUNS,
  planMonteCarlo,
  summariseMonteCarlo,
  type MonteCarloPlan,
  type MonteCarloStats,
  type MonteCarloSummary,
} from "../../study/montecarlo";
import { describeCases, expandCases, keptValueNotes } from "../../cases";
import { CAUTION } from "../../result/contract";
import { seedFromText } from "../../study/random";
import { textTable } from "../../study/table";
import { formatNumber } from "../../units";
import {
  UNCERTAINTY_EXPLANATIONS,
  clampedSentences,
  headlineSentence,
  percentText,
  verdictCountsSentence,
} from "../../study/uncertainty-words";
import { EXIT_CANCELLED, monteCarloOnWorkers, workersOption, withProgress } from "../workers/run-study";

const NAME = "uncertainty";
const DEFAULT_RUNS = 1000;
const DEFAULT_SEED = 1;

const HELP = `Usage: brinefield uncertainty <scenario.json> [--runs N] [--seed S] [--workers K] [--json]

Monte Carlo over uncertain inputs: each run draws the inputs, runs the same screening pipeline under
every ambient case — the stated conditions, each listed case and slack water unless
options.addSlackWater is false, as \`run\` does — and records the dilution at the mixing-zone edge and
the verdict (meets, exceeds, outside-scope; refused for a draw that breaks a scenario rule, with the
rule's message). Reports P5, P50 and P95 of the edge dilution, the probability of not meeting the limit
(every run without "meets") and the runs per verdict, per ambient case and overall (per run, the
verdict over every case, as \`run\`'s "overall").

Inputs come from the scenario's "uncertainty.inputs" (normal, uniform, lognormal, triangular; SI
values; a missing mean/median/mode is the scenario's own value). When the scenario states none, these
default spreads are used and the output says so (screening judgement, no source):
  current speed   lognormal, geometric sd 1.5 about the stated speed (fixed when it is zero)
  ambient salinity normal, sd 0.5 g/kg      ambient temperature normal, sd 1.5 °C
  brine salinity   normal, sd 2 %            brine flow          normal, sd 5 %
A distribution on an ambient.* input describes the stated ambient; each draw applies to the stated
conditions and to every case that does not set that field itself (slack water keeps zero current).

Options:
  --runs N       Number of runs (default ${DEFAULT_RUNS}).
  --seed S       Seed, a whole number 0 … 4294967295 (default ${DEFAULT_SEED}). The same seed gives the same
                 results whatever the number of workers: run i always draws from stream i of the seed.
  --workers K    Worker threads (default: all cores).
  --json         Print the results as JSON (keys p5, p50, p95, probabilityOfExceedance;
                 timings end in Seconds). Probabilities in JSON are fractions from 0 to 1
                 (0.05 = 5 %); the text output shows them as percentages.
                 clampedByInput counts the clamped draws per input path.
  -h, --help     Show this help.

A progress bar is drawn on stderr when it is a terminal. Ctrl-C cancels cleanly (exit code 130).`;

function statsJson(s: MonteCarloStats) {
  return {
    name: s.name,
    edgeDilution: s.edgeDilution,
    margin: s.margin,
    requiredDilution: s.requiredDilution,
    probabilityOfExceedance: s.probabilityOfExceedance,
    verdicts: s.verdicts,
    meetingRuns: s.meetingRuns,
    exceedingRuns: s.exceedingRuns,
    failedRuns: s.failedRuns,
  };
}

async function run(argv: readonly string[], io: CliIO): Promise<number> {
  const { values, positionals } = readArgs(
    argv,
    {
      runs: { type: "string" },
      seed: { type: "string" },
      workers: { type: "string" },
      json: { type: "boolean" },
    },
    NAME,
  );
  if (positionals.length !== 1) throw new CliError(`brinefield ${NAME}: give one scenario file.\n\n${HELP}`);
  const { runs, seed } = runsAndSeed(values.runs, values.seed);
  const workers = Math.min(workersOption(values.workers, io, NAME), runs);
  const scenario = loadScenarioFile(positionals[0]!, io);
  refuseOverWorkCap(NAME, `--runs ${runs}`, runs, scenario);
  const planned = planMonteCarlo(scenario, runs, seed);
  if (!planned.ok) {
    throw new CliError(`${positionals[0]}: the uncertainty inputs cannot be used:\n${pathIssueLines(planned.issues)}`);
  }
  const plan = planned.plan;
  const done = await withProgress(io, "Monte Carlo", runs, (onProgress) =>
    monteCarloOnWorkers(scenario, plan, workers, onProgress),
  );
  if (!done) return EXIT_CANCELLED;
  const { value: chunks, elapsedSeconds } = done;
  const summary = summariseMonteCarlo(plan, chunks);
  const casesNote = [
    describeCases(expandCases(scenario), scenario),
    ...keptValueNotes(
      scenario,
      plan.distributions.map((d) => d.path),
    ),
  ].join(" ");
  const answer: UncertaintyAnswer = { scenario, plan, summary, casesNote, workers, elapsedSeconds };
  if (values.json) printJsonAnswer(io, uncertaintyJson(answer));
  else printTextAnswer(io, uncertaintyTextLines(answer));
  return 0;
}

/** --runs and --seed, checked, with their defaults. */
function runsAndSeed(runsText: string | undefined, seedText: string | undefined): { runs: number; seed: number } {
  const runs = runsText === undefined ? DEFAULT_RUNS : Number(runsText);
  if (!Number.isInteger(runs) || runs < 1 || runs > MAX_RUNS) {
    throw new CliError(`brinefield ${NAME}: --runs ${runsText} must be a whole number from 1 to ${MAX_RUNS}`);
  }
  const seed = seedText === undefined ? DEFAULT_SEED : seedFromText(seedText);
  if (seed === null) {
    const problem = "must be a whole number from 0 to 4294967295";
    throw new CliError(`brinefield ${NAME}: --seed ${seedText} ${problem}`);
  }
  return { runs, seed };
}

/** A finished Monte Carlo, for the JSON or the text output. */
interface UncertaintyAnswer {
  readonly scenario: Scenario;
  readonly plan: MonteCarloPlan;
  readonly summary: MonteCarloSummary;
  /** The ambient cases and the inputs they keep, one sentence each. */
  readonly casesNote: string;
  readonly workers: number;
  readonly elapsedSeconds: number;
}

function uncertaintyJson(answer: UncertaintyAnswer): unknown {
  const { summary } = answer;
  return {
    format: "brinefield-uncertainty",
    version: 1,
    caution: CAUTION,
    scenarioName: answer.scenario.name,
    runs: summary.runs,
    seed: summary.seed,
    usedDefaultSpreads: summary.usedDefaultSpreads,
    inputs: answer.plan.distributions,
    notes: [...summary.notes, answer.casesNote],
    cases: summary.cases.map(statsJson),
    worstCase: statsJson(summary.worstCase),
    noRunMeets: summary.worstCase.meetingRuns === 0,
    clampedSamples: summary.clampedSamples,
    clampedByInput: summary.clampedByInput,
    firstError: summary.firstError,
    workers: answer.workers,
    elapsedSeconds: answer.elapsedSeconds,
  };
}

function uncertaintyTextLines(answer: UncertaintyAnswer): string[] {
  const { summary, workers } = answer;
  const out: string[] = [];
  const w = summary.worstCase;
  const counts = verdictCountsSentence(w, summary.runs);
  if (w.meetingRuns === 0) out.push(`NO RUN MEETS EVERY LIMIT: ${counts}`);
  out.push(`Monte Carlo: ${answer.scenario.name}`);
  out.push(headlineSentence(w, w.requiredDilution.p50));
  if (w.meetingRuns > 0) out.push(counts);
  const plural = workers === 1 ? "" : "s";
  const took = formatNumber(answer.elapsedSeconds);
  out.push(`${summary.runs} runs, seed ${summary.seed}, ${workers} worker${plural}, ${took} s`);
  if (summary.usedDefaultSpreads) {
    out.push("NOTE: the scenario states no uncertain inputs; default spreads were used (see below).");
  }
  out.push("Inputs (spreads in SI units):");
  for (const n of summary.notes) out.push(`  ${n}`);
  out.push(answer.casesNote, "");
  out.push(...percentileTableLines(summary));
  out.push("", "What these mean:");
  for (const e of UNCERTAINTY_EXPLANATIONS) out.push(`  ${e}`);
  const clamped = clampedSentences(summary);
  if (clamped.length > 0) {
    out.push("", "Clamped inputs (a drawn value outside the field's physical bounds is set to the nearest bound):");
    for (const c of clamped) out.push(`  ${c}`);
  }
  if (summary.firstError)
    out.push(`Some draws were refused (they break a scenario rule); first: ${summary.firstError}`);
  return out;
}

/** Percentiles of the edge dilution, chance of not meeting the limit and runs per verdict, per case and overall. */
function percentileTableLines(summary: MonteCarloSummary): string[] {
  const rows = [...summary.cases, summary.worstCase].map((s) => [
    s.name === "overall" ? "overall (per-run worst case)" : s.name,
    s.edgeDilution.p5,
    s.edgeDilution.p50,
    s.edgeDilution.p95,
    s.margin.p5,
    percentText(s.probabilityOfExceedance),
    s.verdicts.meets,
    s.verdicts.exceeds,
    s.verdicts["outside-scope"],
    s.verdicts.refused,
  ]);
  return [
    "Dilution at the mixing-zone edge (× — parts of mixed water per part of brine):",
    textTable(
      [
        "case",
        "P5",
        "P50",
        "P95",
        "margin P5",
        "chance not meeting limit",
        "meets",
        "exceeds",
        "outside-scope",
        "refused",
      ],
      rows,
    ),
  ];
}

export const command: CliCommand = {
  name: NAME,
  summary: "Monte Carlo over uncertain inputs: P5/P50/P95 edge dilution, chance of not meeting the limit",
  help: HELP,
  run,
};
