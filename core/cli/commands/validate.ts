/** `brinefield validate [--json]`: both near-field methods against every published laboratory point held. */
import { jsonText } from "../../result/json";
import type { CliCommand, CliIO } from "../command";
import { readArgs } from "../args";
import { validationTable, type ValidationPoint } from "../../validation";
import { CAUTION } from "../../result/contract";

const NAME = "validate";

const HELP = `Usage: brinefield validate [--json]

Runs both near-field methods (length-scale correlations and the integral jet model) on every published
laboratory point for inclined dense jets that Brinefield holds, in the laboratory configuration (one round
port on the bed, stagnant unstratified deep water, F = 30), and prints model against published with the
ratio and whether it lies in the method's stated bias band. Lengths are in units of d·F, dilutions of F.
Each point names its published source and whether the value was read in the paper ("original") or is a
quotation by another source ("quoted").

Options:
  --json       print { format: "brinefield-validation", version: 1, points: [...] }; each point has
               quantity, angle, froude, published, model, ratio, method, source, mark, unit, band, withinBand
  -h, --help   show this help

Exit code 0 whether or not every point lies in its band (the table reports it); 2 for usage errors.`;

function row(p: ValidationPoint): string {
  const q = `${p.quantity} (÷ ${p.unit})`.padEnd(30);
  const band = `${p.band[0].toFixed(2)}–${p.band[1].toFixed(2)}`;
  return (
    `${p.method.padEnd(13)}${q}${`${p.angle}°`.padStart(4)}  ${p.published.toFixed(2).padStart(6)}  ${p.model.toFixed(2).padStart(6)}  ` +
    `${p.ratio.toFixed(2).padStart(5)}  ${band.padEnd(10)} ${p.withinBand ? "yes" : "NO "}  ${p.mark.padEnd(9)}  ${p.source}`
  );
}

export const command: CliCommand = {
  name: NAME,
  summary: "Compare both near-field methods with every published laboratory point held",
  help: HELP,
  async run(argv: readonly string[], io: CliIO): Promise<number> {
    const { values } = readArgs(
      argv,
      { json: { type: "boolean", default: false }, help: { type: "boolean", short: "h", default: false } },
      NAME,
    );
    if (values.help) {
      io.stdout(HELP + "\n");
      return 0;
    }
    const table = validationTable();
    if (values.json) {
      io.stdout(jsonText({ ...table, caution: CAUTION }));
      return 0;
    }
    const inBand = table.points.filter((p) => p.withinBand).length;
    const lines = [
      CAUTION,
      "",
      `How the methods compare with published experiments. Laboratory configuration: ${table.configuration}.`,
      `${table.points.length} comparisons, ${inBand} within the method's stated bias band.`,
      "",
      `${"method".padEnd(13)}${"quantity".padEnd(30)}angle  publ.   model  ratio  band       in   mark       source`,
      ...table.points.map(row),
      "",
    ];
    io.stdout(lines.join("\n"));
    return 0;
  },
};
