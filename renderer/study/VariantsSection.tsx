/** Study tab, variants: each variant under every ambient case, side by side, sortable, exported as CSV. */
import { useState } from "react";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { columnsOf, flattenRow, sortRows, type FlatRow } from "../../core/study/compare";
import { exportFile } from "../platform/host";
import type { StudyTask } from "./messages";
import { overridesFromText } from "./overridesText";
import { patchAt, type RunJob } from "./sections";
import { isLengthColumn, variantsCsv } from "./variantsCsv";

interface VariantsProps {
  readonly scenarioFile: unknown;
  readonly unitSystem: UnitSystem;
  readonly busy: boolean;
  readonly runJob: RunJob;
}

const COLUMN_LABELS: Readonly<Record<string, string>> = {
  governingCase: "governing case",
  edgeDilution: "edge dilution",
  requiredDilution: "required dilution",
  equationOfState: "equation of state",
};

/** Readable header for a comparison column; lengths carry the display unit. */
function columnLabel(c: string, lengthUnit: string): string {
  const m = /^(.*?)(MaxRise|ImpactDistance|ImpactDilution)$/.exec(c);
  if (!m) return COLUMN_LABELS[c] ?? c;
  const method = m[1]!.replace(/[A-Z]/g, (x) => `-${x.toLowerCase()}`);
  const what = { MaxRise: `max rise (${lengthUnit})`, ImpactDistance: `impact distance (${lengthUnit})` }[
    m[2] as "MaxRise" | "ImpactDistance"
  ];
  return `${method} ${what ?? "impact dilution"}`;
}

function cellText(v: FlatRow[string] | undefined): string {
  if (typeof v === "number") return formatNumber(v);
  return v === null || v === undefined ? "—" : String(v);
}


export function VariantsSection({ scenarioFile, unitSystem, busy, runJob }: VariantsProps) {
  const lengthUnit = siToDisplay(1, "length", unitSystem).unit;
  const toLength = (m: number) => siToDisplay(m, "length", unitSystem).value;
  const [variants, setVariants] = useState([
    { name: "deeper water", text: "ambient.depth = 25 m" },
    { name: "more ports", text: "diffuser.portCount = 8" },
  ]);
  const [rows, setRows] = useState<FlatRow[]>([]);
  const [sort, setSort] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const sorted = sort ? (sortRows(rows, sort) ?? rows) : rows;
  const columns = columnsOf(rows).filter((c) => c !== "error");

  const run = async () => {
    const specs = [];
    for (const v of variants) {
      const o = overridesFromText(v.text);
      if (!o.ok) {
        setProblem(`${v.name}: ${o.message}`);
        return;
      }
      specs.push({ name: v.name, overrides: o.overrides });
    }
    setProblem(null);
    const task: StudyTask = { kind: "compare", file: scenarioFile, variants: specs };
    const r = await runJob("Comparing variants", specs.length + 1, [task], (replies) =>
      replies[0]?.kind === "compared" ? replies[0].rows.map(flattenRow) : [],
    );
    if (r) setRows(r);
  };

  const exportCsv = () => {
    const text = variantsCsv(sorted);
    void exportFile("brinefield-variants.csv", text, [{ name: "CSV", extensions: ["csv"] }]).catch((error: unknown) =>
      setProblem(`Could not export: ${error instanceof Error ? error.message : String(error)}`),
    );
  };

  return (
    <section className="study-variants">
      <h3>Variants</h3>
      <p className="study-note">
        Each variant changes the scenario by “path = value” entries, e.g.
        “ambient.depth = 40 ft; diffuser.portCount = 6”. Give the unit: a plain number is read in SI
        (m, m/s, m³/s, g/kg, °C) whichever units the app shows.
        Every variant runs under every ambient case — the stated conditions, each listed case and slack
        water — and its “overall” row gives the verdict over them, as a single run does (meets, exceeds,
        outside-scope; refused when the variant breaks a scenario rule). An ambient change applies to the
        stated conditions and to every case that does not set that field itself.
      </p>
      {variants.map((v, i) => (
        <div className="study-form" key={i}>
          <label>
            name
            <input
              value={v.name}
              onChange={(e) => setVariants(patchAt(variants, i, { name: e.target.value }))}
            />
          </label>
          <label>
            overrides
            <textarea
              value={v.text}
              onChange={(e) => setVariants(patchAt(variants, i, { text: e.target.value }))}
            />
          </label>
          <button type="button" onClick={() => setVariants(variants.filter((_, k) => k !== i))}>
            Remove
          </button>
        </div>
      ))}
      <div className="button-row">
        <button
          type="button"
          onClick={() => setVariants([...variants, { name: `variant ${variants.length + 1}`, text: "" }])}
        >
          Add variant
        </button>
        <button type="button" disabled={busy} onClick={() => void run()} data-command="study-compare">
          Compare
        </button>
        <button
          type="button"
          disabled={rows.length === 0}
          onClick={exportCsv}
          data-command="study-compare-csv"
        >
          Export CSV
        </button>
      </div>
      {problem ? <div className="study-error">{problem}</div> : null}
      {rows.length > 0 ? (
        <div className="study-table-wrap">
          <table data-role="study-variants-table">
            <thead>
              <tr>
                {columns.map((c) => (
                  <th
                    key={c}
                    scope="col"
                    className={typeof rows[0]![c] === "number" ? "" : "text"}
                    aria-sort={sort === c ? "ascending" : sort === `-${c}` ? "descending" : "none"}
                  >
                    <button
                      type="button"
                      className="sort-button"
                      title="Sort by this column"
                      onClick={() => setSort(sort === c ? `-${c}` : c)}
                    >
                      {columnLabel(c, lengthUnit)}
                      {sort === c ? " ▲" : sort === `-${c}` ? " ▼" : ""}
                    </button>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {sorted.map((r, i) => (
                <tr key={i} className={r.case === "overall" ? "worst" : ""}>
                  {columns.map((c) => {
                    const raw = r[c];
                    // Lengths are SI in the rows (and the CSV); the table shows the chosen unit system.
                    const v = typeof raw === "number" && isLengthColumn(c) ? toLength(raw) : raw;
                    const verdict = v === "meets" ? "pass" : v === "exceeds" ? "fail" : v === "outside-scope" ? "scope" : "refused";
                    const cls = c === "verdict" ? verdict : typeof v === "number" ? "" : "text";
                    const shown = cellText(v);
                    return (
                      <td key={c} className={cls}>
                        {shown}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </section>
  );
}
