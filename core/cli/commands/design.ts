/** `brinefield design`: search port count, diameter, angle and spacing for designs that meet every limit. */
import { CAUTION } from "../../result/contract";
import { CliError, type CliCommand, type CliIO } from "../command";
import { readArgs } from "../args";
import { loadJsonFile, formatIssues, pathIssueLines } from "../load";
import { printJsonAnswer, printTextAnswer } from "../output";
import type { Scenario } from "../../scenario/types";
import { parseScenario } from "../../scenario/parse";
import { describeCases, expandCases, type CaseSpec } from "../../cases";
import {
  candidateOverrides,
  designConstraintsFrom,
  planDesignSearch,
  DESIGN_MAX_CANDIDATES,
  DESIGN_MAX_RUNS,
  type DesignConstraints,
} from "../../study/design";
import { designOutcome, type DesignOutcome } from "../../study/design-rank";
import { textTable } from "../../study/table";
import { formatNumber } from "../../units";
import { EXIT_CANCELLED, pointsOnWorkers, workersOption, withProgress } from "../workers/run-study";

const NAME = "design";

const HELP = `Usage: brinefield design <scenario.json> [constraints] [--json] [--workers K]

Searches port count, port diameter, port angle and port spacing (within a maximum diffuser length) for
line or single-port diffusers that meet every limit at the mixing-zone edge under ALL ambient cases —
plus a slack-water case (zero current) unless the scenario sets options.addSlackWater to false or
--no-slack-water is given. Returns a ranked short list, not one answer. Ranking: fewest ports, then
the shortest diffuser, then the exit velocity nearest the middle of the allowed band, then the larger
worst-case margin, then the smaller diameter. Each design carries a "diffuser" block that can be pasted
into the scenario as it is. When no design passes, the nearest miss is shown with what would close the
gap; that is an answer, exit code 0. Searches over ${DESIGN_MAX_CANDIDATES} candidates or
${DESIGN_MAX_RUNS} runs (candidates × ambient cases) are refused (exit 2) naming the fields to narrow.

Constraints come from the scenario's "design" block and these flags (flags win). Quantities are SI
numbers or values with units, e.g. "design": { "maxExitVelocity": "5 m/s", "maxLength": "60 m" }.
  --min-velocity V       Least port exit velocity (default 3 m/s).          design.minExitVelocity
  --max-velocity V       Greatest port exit velocity (default 6 m/s).       design.maxExitVelocity
                         (3–6 m/s is the typical range, Bleninger & Jirka 2008)
  --max-length L         Longest diffuser (default: the scenario's diffuser length, or 50 m for a
                         single port).                                      design.maxLength
  --max-ports N          Try 1 … N ports (default 12).                      design.maxPorts
                         (or design.portCounts, a list such as [2, 4, 6, 8])
  --angles A,B,…         Port angles above horizontal (default 30,45,60).   design.portAngles
  --port-heights H,…     Port heights above the seabed (default: the scenario's). design.portHeights
  --diameter-steps N     Diameters tried per port count (default 5).        design.diameterSteps
  --min-diameter D       Smallest port diameter (default 0.05 m).           design.minPortDiameter
  --max-diameter D       Largest port diameter (default 0.5 m).             design.maxPortDiameter
                         (0.05–0.5 m is common practice for such ports, no source)
  --nominal-sizes        Keep diameters to nominal pipe sizes (ISO 6708 DN series, from memory; DN
                         taken as the bore in mm).                          design.nominalSizes
  --spacing-steps N      Spacings tried per port count (default 4).         design.spacingSteps
  --min-margin M         Least margin (edge ÷ required dilution) in every case (default 1).
                                                                            design.minMargin
  --surface-clearance C  Least gap between the jet's upper edge and the surface (default 0: the jet
                         must not reach the surface).                       design.surfaceClearance
  --max-designs N        Length of the short list (default 8).              design.maxDesigns
  --no-slack-water       Leave out the added slack-water case.
  --json                 Print JSON: "designs" (each with a pasteable "diffuser" block and portCount,
                         portDiameter, portAngle, portSpacing, portHeight, length, layout,
                         exitVelocity, worstMargin, governingCase, bestFor), "rankingRule",
                         "nearestMiss" (null unless nothing passes) and "caution".
  --workers K            Worker threads (default: all cores).
  -h, --help             Show this help.

Exit codes: 0 an answer (designs, or none with the nearest miss); 2 bad input or constraints, or a
search over the cap; 130 cancelled.`;

const OPTIONS = {
  "min-velocity": { type: "string" },
  "max-velocity": { type: "string" },
  "max-length": { type: "string" },
  "max-ports": { type: "string" },
  angles: { type: "string" },
  "port-heights": { type: "string" },
  "diameter-steps": { type: "string" },
  "min-diameter": { type: "string" },
  "max-diameter": { type: "string" },
  "nominal-sizes": { type: "boolean" },
  "spacing-steps": { type: "string" },
  "min-margin": { type: "string" },
  "surface-clearance": { type: "string" },
  "max-designs": { type: "string" },
  "no-slack-water": { type: "boolean" },
  json: { type: "boolean" },
  workers: { type: "string" },
} as const;

type DesignValues = ReturnType<typeof readArgs<typeof OPTIONS>>["values"];

function list(v: string | undefined): string[] | undefined {
  return v === undefined
    ? undefined
    : v
        .split(",")
        .map((x) => x.trim())
        .filter((x) => x !== "");
}

function int(v: string | undefined, flag: string): number | undefined {
  if (v === undefined) return undefined;
  const n = Number(v);
  if (!Number.isInteger(n)) throw new CliError(`brinefield ${NAME}: --${flag} ${v} must be a whole number`);
  return n;
}

async function run(argv: readonly string[], io: CliIO): Promise<number> {
  const { values, positionals } = readArgs(argv, OPTIONS, NAME);
  if (positionals.length !== 1) throw new CliError(`brinefield ${NAME}: give one scenario file.\n\n${HELP}`);
  const path = positionals[0]!;
  const workers = workersOption(values.workers, io, NAME);
  const raw = loadJsonFile(path, io);
  const parsed = parseScenario(raw);
  if (!parsed.ok) throw new CliError(formatIssues(path, parsed.issues));
  let scenario = parsed.scenario;
  if (values["no-slack-water"]) {
    scenario = { ...scenario, options: { ...scenario.options, addSlackWater: false } };
  }
  const block = (raw as { design?: unknown }).design;
  const cons = designConstraintsFrom(scenario, block, constraintFlags(values));
  if (!cons.ok) throw new CliError(`${path}: design constraints:\n${pathIssueLines(cons.issues)}`);
  const c = cons.constraints;
  const cases = expandCases(scenario);
  const plan = planDesignSearch(scenario, c, cases.length);
  if (!plan.ok) throw new CliError(`brinefield ${NAME}: ${plan.message}`);
  const candidates = plan.candidates;
  if (candidates.length === 0) {
    printNoCandidates(io, { scenario, constraints: c, json: values.json === true });
    return 0;
  }
  const overrides = candidates.map(candidateOverrides);
  const done = await withProgress(io, "Design search", candidates.length, (onProgress) =>
    pointsOnWorkers(scenario, overrides, workers, onProgress),
  );
  if (!done) return EXIT_CANCELLED;
  const { value: points, elapsedSeconds } = done;
  const rawDiffuser = (raw as { diffuser?: unknown }).diffuser;
  const outcome = designOutcome(scenario, c, candidates, points, rawDiffuser);
  const answer: DesignAnswer = { scenario, constraints: c, cases, outcome, elapsedSeconds };
  if (values.json) printJsonAnswer(io, designJson(answer));
  else printTextAnswer(io, designTextLines(answer));
  return 0;
}

/** The constraint flags given on the command line. Plain numbers are SI; anything else (e.g. "5 m/s") is read with its unit by the constraint schema. */
function constraintFlags(values: DesignValues): Record<string, unknown> {
  const num = (v: string | undefined) => (v === undefined ? undefined : Number.isFinite(Number(v)) ? Number(v) : v);
  return Object.fromEntries(
    Object.entries({
      minExitVelocity: num(values["min-velocity"]),
      maxExitVelocity: num(values["max-velocity"]),
      maxLength: num(values["max-length"]),
      maxPorts: int(values["max-ports"], "max-ports"),
      portAngles: list(values.angles)?.map(num),
      portHeights: list(values["port-heights"])?.map(num),
      diameterSteps: int(values["diameter-steps"], "diameter-steps"),
      minPortDiameter: num(values["min-diameter"]),
      maxPortDiameter: num(values["max-diameter"]),
      nominalSizes: values["nominal-sizes"] ? true : undefined,
      spacingSteps: int(values["spacing-steps"], "spacing-steps"),
      minMargin: values["min-margin"] === undefined ? undefined : Number(values["min-margin"]),
      surfaceClearance: num(values["surface-clearance"]),
      maxDesigns: int(values["max-designs"], "max-designs"),
    }).filter(([, v]) => v !== undefined),
  );
}

/** The constraints in one line of the text output. */
function constraintsLine(c: DesignConstraints): string {
  return (
    `Constraints: exit velocity ${c.minExitVelocity}–${c.maxExitVelocity} m/s, port diameter ` +
    `${formatNumber(c.minPortDiameter)}–${formatNumber(c.maxPortDiameter)} m${c.nominalSizes ? " (nominal sizes)" : ""}, ` +
    `diffuser length ≤ ${formatNumber(c.maxLength)} m, ports ${Math.min(...c.portCounts)}–${Math.max(...c.portCounts)}, ` +
    `angles ${c.portAngles.join(", ")}°, port height ${c.portHeights.map((h) => formatNumber(h)).join(", ")} m, ` +
    `margin ≥ ${c.minMargin}, jet's upper edge ≥ ${c.surfaceClearance} m below the surface.`
  );
}

/** The answer when no candidate geometry fits the constraints at all: nothing was run. */
function printNoCandidates(
  io: CliIO,
  input: { readonly scenario: Scenario; readonly constraints: DesignConstraints; readonly json: boolean },
): void {
  const { scenario, constraints: c } = input;
  const headline =
    `No design meets every limit in every ambient case: no candidate geometry fits the constraints ` +
    `(no diameter gives an exit velocity of ${c.minExitVelocity}–${c.maxExitVelocity} m/s within ` +
    `${formatNumber(c.minPortDiameter)}–${formatNumber(c.maxPortDiameter)} m for ${Math.min(...c.portCounts)}–${Math.max(...c.portCounts)} ports); ` +
    "widen design.minPortDiameter/maxPortDiameter, the velocity range or the port counts.";
  if (input.json) {
    printJsonAnswer(io, {
      format: "brinefield-design",
      version: 1,
      scenarioName: scenario.name,
      headline,
      constraints: c,
      candidatesTried: 0,
      candidatesPassing: 0,
      designs: [],
      nearestMiss: null,
      caution: CAUTION,
    });
  } else {
    printTextAnswer(io, [headline, constraintsLine(c)]);
  }
}

/** What a finished search answers, for the JSON or the text output. */
interface DesignAnswer {
  readonly scenario: Scenario;
  readonly constraints: DesignConstraints;
  readonly cases: readonly CaseSpec[];
  readonly outcome: DesignOutcome;
  readonly elapsedSeconds: number;
}

function designJson(answer: DesignAnswer): unknown {
  const { scenario, cases, outcome } = answer;
  return {
    format: "brinefield-design",
    version: 1,
    scenarioName: scenario.name,
    headline: outcome.headline,
    rankingRule: outcome.rankingRule,
    constraints: answer.constraints,
    ambientCases: cases.map((k) => k.name),
    slackWaterAdded: cases.some((k) => k.addedSlackWater),
    candidatesTried: outcome.candidatesTried,
    candidatesPassing: outcome.candidatesPassing,
    candidatesRefused: outcome.candidatesRefused,
    designs: outcome.designs,
    nearestMiss: outcome.nearestMiss,
    notes: [describeCases(cases, scenario), ...outcome.notes],
    elapsedSeconds: answer.elapsedSeconds,
    caution: outcome.caution,
  };
}

function designTextLines(answer: DesignAnswer): string[] {
  const { scenario, outcome } = answer;
  const out = [
    outcome.headline,
    `Design search: ${scenario.name} (${formatNumber(answer.elapsedSeconds)} s).`,
    describeCases(answer.cases, scenario),
    constraintsLine(answer.constraints),
    `Ranking: ${outcome.rankingRule}`,
    ...outcome.notes.slice(1),
    "",
  ];
  if (outcome.nearestMiss) out.push(...nearestMissLines(outcome.nearestMiss));
  else if (outcome.designs.length > 0) out.push(...rankedDesignLines(outcome));
  return out;
}

/** The candidate that came closest, why it fails and what would close the gap. */
function nearestMissLines(m: NonNullable<DesignOutcome["nearestMiss"]>): string[] {
  return [
    `Nearest miss: ${m.design.portCount} port(s), diameter ${m.design.portDiameter} m, angle ${m.design.portAngle}°` +
      (m.design.portCount > 1
        ? `, spacing ${m.design.portSpacing} m (length ${formatNumber(m.design.length)} m)`
        : "") +
      `, exit velocity ${formatNumber(m.design.exitVelocity)} m/s; worst margin ${m.design.worstMargin.toFixed(2)} in case "${m.design.governingCase}".`,
    "Why it fails:",
    ...m.reasons.map((r) => `  - ${r}`),
    "What would close the gap:",
    ...m.toClose.map((t) => `  - ${t.field ? `${t.field}: ` : ""}${t.message}`),
    "",
    "Its diffuser block:",
    JSON.stringify(m.design.diffuser),
  ];
}

/** The ranked short list as a table, and the first design's pasteable diffuser block. */
function rankedDesignLines(outcome: DesignOutcome): string[] {
  return [
    textTable(
      [
        ...["#", "ports", "diameter (m)", "angle (°)", "spacing (m)", "length (m)", "height (m)"],
        ...["exit vel. (m/s)", "worst margin", "governing case", "best for"],
      ],
      outcome.ranked.map((d) => [
        d.rank,
        d.candidate.portCount,
        d.candidate.portDiameter,
        d.candidate.portAngle,
        d.candidate.portCount > 1 ? d.candidate.portSpacing : null,
        d.candidate.length,
        d.candidate.portHeight,
        d.candidate.exitVelocity,
        d.worstMargin,
        d.governingCase,
        d.bestFor.join(", "),
      ]),
    ),
    "Diffuser block of #1 (paste into the scenario's \"diffuser\"; --json lists every design's block):",
    JSON.stringify(outcome.designs[0]!.diffuser),
    "Screening only: check the chosen design with the full `brinefield run` output and its warnings.",
  ];
}

export const command: CliCommand = {
  name: NAME,
  summary: "Search port count, diameter, angle and spacing for designs meeting every limit in every case",
  help: HELP,
  run,
};
