/** `brinefield design`: search port count, diameter, angle and spacing for designs that meet every limit. */
import { CAUTION } from "../../result/contract";
import { withCaution } from "../../result/caution";
import { CliError, type CliCommand, type CliIO } from "../command";
import { readArgs } from "../args";
import { loadJsonFile, formatIssues } from "../load";
import { parseScenario } from "../../scenario/parse";
import { describeCases, expandCases } from "../../study/cases";
import {
  candidateOverrides,
  designCandidates,
  designConstraintsFrom,
  designJson,
  judgeDesign,
  shortList,
} from "../../study/design";
import { textTable } from "../../study/table";
import { formatNumber } from "../../units";
import {
  EXIT_CANCELLED,
  pointsOnWorkers,
  workersOption,
  withProgress,
} from "../workers/run-study";

const NAME = "design";

const HELP = `Usage: brinefield design <scenario.json> [constraints] [--json] [--workers K]

Searches port count, port diameter, port angle and port spacing (within a maximum diffuser length) for
line or single-port diffusers that meet every limit at the mixing-zone edge under ALL ambient cases —
plus a slack-water case (zero current) unless the scenario sets options.addSlackWater to false or
--no-slack-water is given. Returns a ranked short list with trade-offs (fewest ports, lowest exit
velocity, largest margin, shortest diffuser, then other designs no other design beats on all four),
not one answer. Diameters are chosen so that exit velocities spread over the allowed range.

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
  --surface-clearance C  Least gap between the jet's upper edge and the surface (default 0: the jet
                         must not reach the surface).                       design.surfaceClearance
  --max-designs N        Length of the short list (default 8).              design.maxDesigns
  --no-slack-water       Leave out the added slack-water case.
  --json                 Print JSON: a "designs" list whose entries use the scenario's diffuser field
                         names (portCount, portDiameter as entered, portAngle, portSpacing, portHeight,
                         length, layout) plus exitVelocity, worstMargin, governingCase, bestFor.
  --workers K            Worker threads (default: all cores).
  -h, --help             Show this help.`;

function list(v: string | undefined): string[] | undefined {
  return v === undefined ? undefined : v.split(",").map((x) => x.trim()).filter((x) => x !== "");
}

function int(v: string | undefined, flag: string): number | undefined {
  if (v === undefined) return undefined;
  const n = Number(v);
  if (!Number.isInteger(n)) throw new CliError(`brinefield ${NAME}: --${flag} ${v} must be a whole number`);
  return n;
}

async function run(argv: readonly string[], io: CliIO): Promise<number> {
  const { values, positionals } = readArgs(
    argv,
    {
      "min-velocity": { type: "string" },
      "max-velocity": { type: "string" },
      "max-length": { type: "string" },
      "max-ports": { type: "string" },
      angles: { type: "string" },
      "port-heights": { type: "string" },
      "diameter-steps": { type: "string" },
      "surface-clearance": { type: "string" },
      "max-designs": { type: "string" },
      "no-slack-water": { type: "boolean" },
      json: { type: "boolean" },
      workers: { type: "string" },
    },
    NAME,
  );
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
  // Plain numbers are SI; anything else (e.g. "5 m/s") is read with its unit by the constraint schema.
  const num = (v: string | undefined) =>
    v === undefined ? undefined : Number.isFinite(Number(v)) ? Number(v) : v;
  const flags = Object.fromEntries(
    Object.entries({
      minExitVelocity: num(values["min-velocity"]),
      maxExitVelocity: num(values["max-velocity"]),
      maxLength: num(values["max-length"]),
      maxPorts: int(values["max-ports"], "max-ports"),
      portAngles: list(values.angles)?.map(num),
      portHeights: list(values["port-heights"])?.map(num),
      diameterSteps: int(values["diameter-steps"], "diameter-steps"),
      surfaceClearance: num(values["surface-clearance"]),
      maxDesigns: int(values["max-designs"], "max-designs"),
    }).filter(([, v]) => v !== undefined),
  );
  const block = (raw as { design?: unknown }).design;
  const cons = designConstraintsFrom(scenario, block, flags);
  if (!cons.ok) {
    const list = cons.issues.map((i) => `  - ${i.path}: ${i.message}`).join("\n");
    throw new CliError(`${path}: design constraints:\n${list}`);
  }
  const c = cons.constraints;
  const candidates = designCandidates(scenario, c);
  if (candidates.length === 0) {
    throw new CliError(
      `brinefield ${NAME}: no candidate geometry fits the constraints (exit velocity ` +
        `${c.minExitVelocity}–${c.maxExitVelocity} m/s, length ≤ ${c.maxLength} m); widen them.`,
      1,
    );
  }
  const overrides = candidates.map(candidateOverrides);
  const done = await withProgress(io, "Design search", candidates.length, (onProgress) =>
    pointsOnWorkers(scenario, overrides, workers, onProgress),
  );
  if (!done) return EXIT_CANCELLED;
  const { value: points, elapsedSeconds } = done;
  const verdicts = candidates.map((d, i) => judgeDesign(d, points[i]!, c));
  const designs = shortList(verdicts, c.maxDesigns);
  const cases = expandCases(scenario);
  const casesNote = describeCases(cases, scenario);
  const passing = verdicts.filter((v) => v.ok).length;
  if (values.json) {
    io.stdout(
      JSON.stringify(
        {
          format: "brinefield-design",
          version: 1,
          caution: CAUTION,
          scenarioName: scenario.name,
          constraints: c,
          ambientCases: cases.map((k) => k.name),
          slackWaterAdded: cases.some((k) => k.addedSlackWater),
          candidatesTried: candidates.length,
          candidatesPassing: passing,
          designs: designs.map(designJson),
          notes: [casesNote],
          elapsedSeconds,
        },
        null,
        2,
      ) + "\n",
    );
    return designs.length > 0 ? 0 : 1;
  }
  const out = [
    `Design search: ${scenario.name}`,
    `${candidates.length} candidates tried, ${passing} meet every limit under every case ` +
      `(${formatNumber(elapsedSeconds)} s).`,
    casesNote,
    `Constraints: exit velocity ${c.minExitVelocity}–${c.maxExitVelocity} m/s, ` +
      `diffuser length ≤ ${formatNumber(c.maxLength)} m, angles ${c.portAngles.join(", ")}°, ` +
      `port height ${c.portHeights.map((h) => formatNumber(h)).join(", ")} m, ` +
      `jet's upper edge ≥ ${c.surfaceClearance} m below the surface.`,
    "",
  ];
  if (designs.length === 0) {
    out.push(
      "No design meets every limit under every case. " +
        "Try more ports, a longer diffuser or a wider velocity range.",
    );
    io.stdout(withCaution(out.join("\n") + "\n"));
    return 1;
  }
  out.push(
    textTable(
      [
        ...["#", "ports", "diameter (m)", "angle (°)", "spacing (m)", "length (m)", "height (m)"],
        ...["exit vel. (m/s)", "worst margin", "governing case", "best for"],
      ],
      designs.map((d) => [
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
        d.bestFor.join(", ") || "balanced (no other design beats it on all four)",
      ]),
    ),
  );
  out.push("Screening only: check the chosen design with the full `brinefield run` output and its warnings.");
  io.stdout(withCaution(out.join("\n") + "\n"));
  return 0;
}

export const command: CliCommand = {
  name: NAME,
  summary: "Search port count, diameter, angle and spacing for designs meeting every limit in every case",
  help: HELP,
  run,
};
