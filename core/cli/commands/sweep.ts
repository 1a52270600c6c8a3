/** `brinefield sweep`: vary one or two inputs over a range and tabulate the verdict at each point. */
import { dirname, isAbsolute, join } from "node:path";
import { sweepPointsIssue } from "../../study/budget";
import { csvWithCaution, flatRowsCsv } from "../../report/csv";
import { inputsHash } from "../../scenario/hash";
import { CliError, type CliCommand, type CliIO } from "../command";
import { readArgs } from "../args";
import { formatIssues, loadJsonFile } from "../load";
import { printJsonAnswer, printTextAnswer } from "../output";
import { refuseOverWorkCap } from "../work-cap";
import { parseScenario } from "../../scenario/parse";
import { blendSignChange } from "../../rising/blend";
import type { Scenario } from "../../scenario/types";
import { describeCases, expandCases, keptValueNotes } from "../../cases";
import { CAUTION } from "../../result/contract";
import { parseStudy } from "../../study/study-file";
import {
  axisFromParts,
  eosCrossings,
  buoyancyCrossings,
  parseSweepAxis,
  sweepGrid,
  sweepRows,
  sweepRecords,
  type SweepAxis,
} from "../../study/sweep";
import { textTable } from "../../study/table";
import { formatNumber } from "../../units";
import { EXIT_CANCELLED, pointsOnWorkers, workersOption, withProgress } from "../workers/run-study";

const NAME = "sweep";

const HELP = `Usage: brinefield sweep <scenario.json | study.json> --vary path=from:to:steps
                       [--vary path2=from:to:steps] [--json] [--csv out.csv] [--workers K]

Runs the screening pipeline over a grid of one or two inputs and reports, per point, the dilution at the
mixing-zone edge, the margin (edge ÷ required dilution), the verdict, the governing ambient case and the
equation of state used; it says where neighbouring points cross from one equation of state to the other
and where the discharge changes from sinking to rising (with plant.blendRatio, the exact blend ratio).
Every point is run under every ambient case — the stated conditions ("stated"), each listed case and
slack water unless options.addSlackWater is false, as \`run\` does — and judged by the verdict over them
(\`run\`'s "overall"): meets, exceeds or outside-scope; a point whose inputs break a scenario rule is
refused with the same message \`run\` gives. An ambient.* input applies to the stated conditions and to
every case that does not set that field itself (the notes name the cases that keep their own value).

  --vary path=from:to:steps   Input and range, e.g. ambient.currentSpeed=0:0.5:11 or
                              diffuser.portDiameter=4 in:10 in:7. Bounds are SI numbers or values with
                              units; steps ≥ 1. Paths: ambient.depth, ambient.salinity, ambient.temperature,
                              ambient.currentSpeed, ambient.currentDirection, discharge.flow,
                              discharge.salinity, discharge.temperature, diffuser.portCount,
                              diffuser.portDiameter, diffuser.portAngle, diffuser.portHeight,
                              diffuser.portSpacing, diffuser.length, mixingZone.radius, …
                              A study file with a "sweep" block needs no --vary.
  --json                      Print the points as JSON.
  --csv FILE                  Also write the points as CSV.
  --workers K                 Worker threads (default: all cores).
  -h, --help                  Show this help.`;

function loadTarget(path: string, io: CliIO): { scenario: Scenario; studyAxes: SweepAxis[] } {
  const raw = loadJsonFile(path, io);
  const isStudy = (raw as { format?: unknown } | null)?.format === "brinefield-study";
  if (!isStudy) {
    const r = parseScenario(raw);
    if (!r.ok) throw new CliError(formatIssues(path, r.issues));
    return { scenario: r.scenario, studyAxes: [] };
  }
  const st = parseStudy(raw);
  if (!st.ok) {
    const list = st.issues.map((i) => `  - ${i.message}`).join("\n");
    throw new CliError(`${path}: ${st.issues.length} problem(s) in the study:\n${list}`);
  }
  const base = st.study.base;
  const basePath = typeof base === "string" ? (isAbsolute(base) ? base : join(dirname(path), base)) : null;
  const baseRaw = basePath ? loadJsonFile(basePath, io) : base;
  const r = parseScenario(baseRaw);
  if (!r.ok) throw new CliError(formatIssues(basePath ?? `${path} (base)`, r.issues));
  const axes = (st.study.sweep?.vary ?? []).map((v, i) => {
    const a = axisFromParts(v.path, v.from, v.to, v.steps);
    if (!a.ok) throw new CliError(`${path}: sweep.vary.${i}: ${a.message}`);
    return a.axis;
  });
  return { scenario: r.scenario, studyAxes: axes };
}

async function run(argv: readonly string[], io: CliIO): Promise<number> {
  const { values, positionals } = readArgs(
    argv,
    {
      vary: { type: "string", multiple: true },
      json: { type: "boolean" },
      csv: { type: "string" },
      workers: { type: "string" },
    },
    NAME,
  );
  if (positionals.length !== 1) {
    throw new CliError(`brinefield ${NAME}: give one scenario or study file.\n\n${HELP}`);
  }
  const workers = workersOption(values.workers, io, NAME);
  const { scenario, studyAxes } = loadTarget(positionals[0]!, io);
  const axes = sweepAxes(values.vary, studyAxes);
  const pointCount = axes.reduce((n, a) => n * a.steps, 1);
  const tooManyPoints = sweepPointsIssue(pointCount);
  if (tooManyPoints) throw new CliError(`brinefield ${NAME}: ${tooManyPoints}`);
  refuseOverWorkCap(NAME, `a sweep of ${pointCount} points`, pointCount, scenario);
  const grid = sweepGrid(axes);
  const done = await withProgress(io, "Sweep", grid.length, (onProgress) =>
    pointsOnWorkers(
      scenario,
      grid.map((g) => g.overrides),
      workers,
      onProgress,
    ),
  );
  if (!done) return EXIT_CANCELLED;
  const { value: points, elapsedSeconds } = done;
  const rows = sweepRows(grid, points);
  const answer = sweepAnswer(scenario, axes, rows);
  const { columns: cols, records: flat } = sweepRecords(axes, rows);
  if (values.csv) {
    await io.writeFile(
      values.csv,
      csvWithCaution(flatRowsCsv(flat as Record<string, unknown>[], cols), undefined, {
        scenario: scenario.name,
        inputsHash: inputsHash(scenario),
      }),
    );
  }
  if (values.json) {
    printJsonAnswer(io, {
      format: "brinefield-sweep",
      version: 1,
      caution: CAUTION,
      scenarioName: scenario.name,
      tally: answer.tally,
      axes,
      points: flat,
      equationOfStateCrossings: answer.crossings,
      buoyancySignChanges: answer.signChanges,
      ...(answer.blend
        ? { blendSignChangeRatio: answer.blend.signChangeRatio, blendSignChanges: answer.blend.signChanges }
        : {}),
      counts: answer.counts,
      noPointMeets: answer.counts.meets === 0,
      notes: [answer.casesNote, ...answer.keptNotes, ...answer.crossingText, ...answer.signText],
      elapsedSeconds,
    });
    return 0;
  }
  printTextAnswer(io, sweepTextLines({ scenario, axes, rows, answer, pointCount: grid.length, elapsedSeconds }));
  return 0;
}

/** The axes from --vary options, or else from the study file's "sweep" block: one or two, no path twice. */
function sweepAxes(vary: readonly string[] | undefined, studyAxes: SweepAxis[]): SweepAxis[] {
  const axes =
    vary && vary.length > 0
      ? vary.map((t) => {
          const a = parseSweepAxis(t);
          if (!a.ok) throw new CliError(`brinefield ${NAME}: --vary ${a.message}`);
          return a.axis;
        })
      : studyAxes;
  if (axes.length < 1 || axes.length > 2) {
    throw new CliError(`brinefield ${NAME}: give one or two --vary options.\n\n${HELP}`);
  }
  if (axes.length === 2 && axes[0]!.path === axes[1]!.path) {
    throw new CliError(`brinefield ${NAME}: ${axes[0]!.path} is varied twice`);
  }
  return axes;
}

type SweepRow = ReturnType<typeof sweepRows>[number];

/** What the points say as a whole: counts, crossings of the equation of state and of the buoyancy sign, notes. */
function sweepAnswer(scenario: Scenario, axes: readonly SweepAxis[], rows: readonly SweepRow[]) {
  const crossings = eosCrossings(axes, rows);
  const signChanges = buoyancyCrossings(axes, rows);
  // Where the blend ratio is swept, the blend ratio at which the buoyancy changes sign, located exactly.
  const blend = axes.some((a) => a.path === "plant.blendRatio") ? blendSignChange(scenario) : null;
  const counts = sweepCounts(rows);
  const casesNote = describeCases(expandCases(scenario), scenario);
  const keptNotes = keptValueNotes(
    scenario,
    axes.map((a) => a.path),
  );
  const tally = `Points: ${rows.length} — meets ${counts.meets}, exceeds ${counts.exceeds}, outside-scope ${counts["outside-scope"]}, refused ${counts.refused}.`;
  const crossingText = crossings.map((c) => {
    const [a, b] = c.between;
    const other = axes.find((x) => x.path !== c.path)?.path;
    return (
      `Equation of state changes from ${c.from} to ${c.to} between ` +
      `${c.path} = ${formatNumber(a[c.path]!)} and ${formatNumber(b[c.path]!)}` +
      (other ? ` (${other} = ${formatNumber(a[other]!)})` : "")
    );
  });
  const signText = signChanges.map((c) => {
    const [a, b] = c.between;
    const other = axes.find((x) => x.path !== c.path)?.path;
    return (
      `The discharge changes from ${c.from === "sinks" ? "sinking" : "rising"} to ${c.to === "sinks" ? "sinking" : "rising"} between ` +
      `${c.path} = ${formatNumber(a[c.path]!)} (${c.verdicts[0]}) and ${formatNumber(b[c.path]!)} (${c.verdicts[1]})` +
      (other ? ` (${other} = ${formatNumber(a[other]!)})` : "")
    );
  });
  if (blend && blend.signChanges.length > 0) signText.push(`Blend: ${blend.note}`);
  return { crossings, signChanges, blend, counts, casesNote, keptNotes, tally, crossingText, signText };
}

/** The text output: tally, the table of points, refused and out-of-scope points, crossings. */
function sweepTextLines(input: {
  readonly scenario: Scenario;
  readonly axes: readonly SweepAxis[];
  readonly rows: readonly SweepRow[];
  readonly answer: ReturnType<typeof sweepAnswer>;
  readonly pointCount: number;
  readonly elapsedSeconds: number;
}): string[] {
  const { axes, rows, answer } = input;
  const out: string[] = [];
  if (answer.counts.meets === 0) out.push(`NO POINT MEETS EVERY LIMIT. ${answer.tally}`);
  out.push(`Sweep: ${input.scenario.name} — ${input.pointCount} points, ${formatNumber(input.elapsedSeconds)} s`);
  out.push(answer.tally, answer.casesNote, ...answer.keptNotes, "");
  out.push(
    textTable(
      [
        ...axes.map((a) => a.path),
        ...["governing case", "edge dilution", "required", "margin", "verdict", "discharge", "equation of state"],
      ],
      rows.map((r) => [
        ...axes.map((a) => r.values[a.path]!),
        r.governingCase ?? "(refused, see below)",
        r.edgeDilution,
        r.requiredDilution,
        r.margin,
        r.verdict,
        r.buoyancy,
        r.equationOfState,
      ]),
    ),
  );
  const failed = rows.filter((r) => r.error !== undefined);
  for (const r of failed.slice(0, 5)) {
    const at = axes.map((a) => `${a.path} = ${formatNumber(r.values[a.path]!)}`).join(", ");
    out.push(`Refused at ${at}: ${r.error}`);
  }
  if (failed.length > 5) out.push(`… and ${failed.length - 5} more points refused.`);
  const outside = rows.filter((r) => r.verdict === "outside-scope");
  for (const r of outside.slice(0, 5)) {
    const at = axes.map((a) => `${a.path} = ${formatNumber(r.values[a.path]!)}`).join(", ");
    out.push(`Outside scope at ${at} (${r.governingCase}): ${r.scopeReasons.join(" ")}`);
  }
  if (outside.length > 5) out.push(`… and ${outside.length - 5} more points outside the methods' scope.`);
  if (answer.crossingText.length > 0) out.push(...answer.crossingText);
  else out.push("The equation of state is the same at every point.");
  out.push(...answer.signText);
  return out;
}

/** Points per verdict; "refused" points broke a scenario rule and were not computed. */
function sweepCounts(
  rows: readonly { verdict: string }[],
): Record<"meets" | "exceeds" | "outside-scope" | "refused", number> {
  const count = (v: string) => rows.filter((r) => r.verdict === v).length;
  return {
    meets: count("meets"),
    exceeds: count("exceeds"),
    "outside-scope": count("outside-scope"),
    refused: count("refused"),
  };
}

export const command: CliCommand = {
  name: NAME,
  summary: "Vary one or two inputs over a range: edge dilution, margin and verdict at each point",
  help: HELP,
  run,
};
