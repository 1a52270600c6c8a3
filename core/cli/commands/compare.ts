/** `brinefield compare`: a study's variants side by side, per ambient case and worst case. */
import { jsonText } from "../../result/json";
import { dirname, isAbsolute, join } from "node:path";
import { caseWorkUnits, workIssue } from "../../study/budget";
import { csvWithCaution, flatRowsCsv } from "../../report/csv";
import { CliError, type CliCommand, type CliIO } from "../command";
import { readArgs } from "../args";
import { loadJsonFile } from "../load";
import { parseScenario } from "../../scenario/parse";
import { parseStudy } from "../../study/study-file";
import { columnsOf, compareVariant, flattenRow, sortRows, studyVariants, type FlatRow } from "../../study/compare";
import { describeCases, expandCases } from "../../cases";
import { CAUTION } from "../../result/contract";
import { withCaution } from "../../result/caution";
import { evaluateScenario } from "../../study/evaluate";
import { textTable } from "../../study/table";

const NAME = "compare";

const HELP = `Usage: brinefield compare <study.json> [--json] [--csv out.csv] [--sort column]

Runs the base scenario of a study and each of its variants under every ambient case — the stated
conditions ("stated"), each listed case and slack water unless options.addSlackWater is false, exactly
as \`run\` does — and tabulates one row per variant and case, plus each variant's "overall" row (the
verdict over every case, as \`run\`'s "overall"): dilution at the mixing-zone edge, required dilution,
margin (edge ÷ required), verdict (meets, exceeds, outside-scope; refused for a variant that breaks a
scenario rule, with the rule's message), number of warnings, equation of state, and for each near-field
method the maximum rise of the jet's upper edge (m), the impact distance (m) and the impact dilution.
An ambient.* override applies to the stated conditions and to every case that does not set that field
itself; the notes say where a case keeps its own value.

A study file (format "brinefield-study", version 1; JSON Schema in core/study/study.schema.json):
  { "format": "brinefield-study", "version": 1, "name": "…",
    "base": "site.json"  (a path relative to the study file, or the scenario object itself),
    "variants": [ { "name": "deeper", "overrides": { "ambient.depth": "25 m", "diffuser.portCount": 6 } } ] }
Overrides are written like scenario fields (numbers in SI or strings with units) and the patched
scenario is read again, so every scenario rule applies.

Options:
  --json          Print the rows as JSON.
  --csv FILE      Also write the rows as CSV.
  --sort COLUMN   Sort rows by a column (e.g. margin, edgeDilution, integralImpactDistance); prefix
                  with "-" for descending (e.g. --sort=-margin).
  -h, --help      Show this help.`;

async function run(argv: readonly string[], io: CliIO): Promise<number> {
  const { values, positionals } = readArgs(
    argv,
    { json: { type: "boolean" }, csv: { type: "string" }, sort: { type: "string" } },
    NAME,
  );
  if (positionals.length !== 1) throw new CliError(`brinefield ${NAME}: give one study file.\n\n${HELP}`);
  const path = positionals[0]!;
  const st = parseStudy(loadJsonFile(path, io));
  if (!st.ok) {
    throw new CliError(`${path}: ${st.issues.length} problem(s) in the study:\n${bullets(st.issues)}`);
  }
  const base = st.study.base;
  const basePath = typeof base === "string" ? (isAbsolute(base) ? base : join(dirname(path), base)) : null;
  const baseRaw = basePath ? loadJsonFile(basePath, io) : st.study.base;
  const v = studyVariants(st.study, baseRaw, parseScenario);
  if (!v.ok) {
    const n = v.issues.length;
    const where = basePath ?? path;
    throw new CliError(`${where}: ${n} problem(s) in the study's scenarios:\n${bullets(v.issues)}`);
  }
  const runnable = v.variants.flatMap((x) => (x.scenario ? [x.scenario] : []));
  if (runnable.length > 0) {
    const evaluations = runnable.reduce((n, sc) => n + expandCases(sc).length, 0);
    const heaviest = runnable.reduce((a, b) => (caseWorkUnits(b) > caseWorkUnits(a) ? b : a));
    const tooMuch = workIssue(
      `a study of ${v.variants.length} variants with ${evaluations} ambient cases in all`,
      evaluations,
      heaviest,
    );
    if (tooMuch) throw new CliError(`${path}: ${tooMuch}`);
  }
  const rows = v.variants.flatMap((x) => compareVariant(x, evaluateScenario));
  let flat: FlatRow[] = rows.map(flattenRow);
  if (values.sort) {
    const sorted = sortRows(flat, values.sort);
    if (!sorted) {
      const cols = columnsOf(flat).join(", ");
      throw new CliError(`brinefield ${NAME}: --sort ${values.sort}: no such column; columns: ${cols}`);
    }
    flat = sorted;
  }
  const columns = columnsOf(flat);
  if (values.csv)
    await io.writeFile(values.csv, csvWithCaution(flatRowsCsv(flat, columns), undefined, { study: st.study.name }));
  const notes = v.variants.map((x) =>
    x.scenario
      ? `${x.name}: ${describeCases(expandCases(x.scenario), x.scenario)}`
      : `${x.name}: refused — ${(x.refused ?? []).join("; ")}`,
  );
  for (const r of rows) if (r.notes) notes.push(...r.notes.map((n) => `${r.variant}: ${n}`));
  const overallRows = rows.filter((r) => r.worstCase);
  const count = (w: string) => overallRows.filter((r) => r.verdict === w).length;
  const tally = `Variants: ${overallRows.length} — meets ${count("meets")}, exceeds ${count("exceeds")}, outside-scope ${count("outside-scope")}, refused ${count("refused")}.`;
  if (values.json) {
    const study = st.study.name;
    const json = {
      format: "brinefield-compare",
      version: 1,
      caution: CAUTION,
      study,
      columns,
      rows: flat,
      notes,
      tally,
    };
    io.stdout(jsonText(json));
    return 0;
  }
  const methodCols = columns.filter((c) => /(MaxRise|ImpactDistance|ImpactDilution)$/.test(c));
  const headers = [
    ...["variant", "case", "edge dilution", "required", "margin", "verdict", "warnings"],
    ...methodCols.map(label),
  ];
  const body = flat.map((r) => [
    r.variant as string,
    r.case === "overall" ? (r.governingCase ? `overall (${r.governingCase})` : "overall") : (r.case as string),
    r.edgeDilution as number | null,
    r.requiredDilution as number | null,
    r.margin as number | null,
    r.verdict as string,
    r.warnings as number | null,
    ...methodCols.map((c) => (r[c] ?? null) as number | null),
  ]);
  const refusals = flat
    .filter((r) => r.verdict === "refused")
    .map((r) => `Refused: ${String(r.variant)}: ${String(r.error)}`);
  const scope = flat
    .filter((r) => r.verdict === "outside-scope" && r.case === "overall")
    .map((r) => `Outside scope: ${String(r.variant)} (${String(r.governingCase)}): ${String(r.scopeReasons)}`);
  io.stdout(
    withCaution(
      `Study: ${st.study.name}\n${tally}\n\n${textTable(headers, body)}\n${[...notes, ...scope, ...refusals].join("\n")}\n`,
    ),
  );
  return 0;
}

/** "lengthScaleMaxRise" → "length-scale max rise (m)". */
function label(col: string): string {
  const m = /^(.*?)(MaxRise|ImpactDistance|ImpactDilution)$/.exec(col)!;
  const method = m[1]!.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
  const names = {
    MaxRise: "max rise (m)",
    ImpactDistance: "impact dist. (m)",
    ImpactDilution: "impact dilution",
  };
  const what = names[m[2] as keyof typeof names];
  return `${method} ${what}`;
}

function bullets(issues: readonly { message: string }[]): string {
  return issues.map((i) => `  - ${i.message}`).join("\n");
}

export const command: CliCommand = {
  name: NAME,
  summary: "Compare a study's variants (options, sites) per ambient case and overall; CSV export",
  help: HELP,
  run,
};
