/** Study tab, sweep: one input (line chart) or two (heat map of the margin with the limit contour). */
import { sweepPointsIssue, workIssue } from "../../core/study/budget";
import { expandCases } from "../../core/cases";
import { useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { OVERRIDE_PATHS } from "../../core/study/overrides";
import {
  axisFromParts,
  eosCrossings,
  sweepGrid,
  sweepRecords,
  sweepRows,
  type SweepAxis,
  type SweepRow,
} from "../../core/study/sweep";
import { flatRowsCsv } from "../../core/report/csv";
import { inputsHash } from "../../core/scenario/hash";
import { exportFile } from "../platform/host";
import { csvWithCaution } from "../exports";
import { SweepLineChart } from "./charts";
import { SweepHeatmap } from "./SweepHeatmap";
import { PATHS, axisDisplay, patchAt, pathTitle, type RunPoints } from "./sections";

interface AxisForm {
  path: string;
  from: string;
  to: string;
  steps: string;
}

export function SweepSection({
  scenario,
  unitSystem,
  busy,
  runPoints,
}: {
  scenario: Scenario | null;
  unitSystem: UnitSystem;
  busy: boolean;
  runPoints: RunPoints;
}) {
  const [forms, setForms] = useState<AxisForm[]>([{ path: "ambient.currentSpeed", from: "0", to: "0.5", steps: "11" }]);
  const [result, setResult] = useState<{ axes: SweepAxis[]; rows: SweepRow[] } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [view, setView] = useState<"chart" | "table">("chart");

  const run = async () => {
    if (!scenario) return;
    const axes: SweepAxis[] = [];
    for (const f of forms) {
      const a = axisFromParts(f.path, f.from, f.to, f.steps);
      if (!a.ok) {
        setProblem(a.message);
        return;
      }
      axes.push(a.axis);
    }
    if (axes.length === 2 && axes[0]!.path === axes[1]!.path) {
      setProblem(`${axes[0]!.path} is varied twice`);
      return;
    }
    // The same caps as the command line (core/study/budget.ts).
    const pointCount = axes.reduce((n, a) => n * a.steps, 1);
    const caseCount = expandCases(scenario).length;
    const tooMuch =
      sweepPointsIssue(pointCount) ??
      workIssue(`A sweep of ${pointCount} points × ${caseCount} ambient cases`, pointCount * caseCount, scenario);
    if (tooMuch) {
      setProblem(tooMuch);
      return;
    }
    setProblem(null);
    const grid = sweepGrid(axes);
    const points = await runPoints(
      "Sweep",
      scenario,
      grid.map((g) => g.overrides),
    );
    if (points) setResult({ axes, rows: sweepRows(grid, points) });
  };

  return (
    <section>
      <h3>Sweep</h3>
      <p className="study-note">
        Bounds are values with units (e.g. “0.5 knot”, “8 in”); a plain number is read in SI whichever units the app
        shows. One input draws a line chart; two draw a heat map of the margin with the limit contour.
      </p>
      {forms.map((f, i) => (
        <SweepAxisRow
          key={i}
          form={f}
          index={i}
          onChange={(patch) => setForms(patchAt(forms, i, patch))}
          onRemove={() => setForms(forms.slice(0, 1))}
        />
      ))}
      <div className="button-row">
        {forms.length === 1 ? (
          <button
            type="button"
            onClick={() => setForms([...forms, { path: "diffuser.portDiameter", from: "0.1", to: "0.3", steps: "11" }])}
          >
            Add second input
          </button>
        ) : null}
        <button type="button" disabled={busy || !scenario} onClick={() => void run()} data-command="study-sweep">
          Run sweep
        </button>
      </div>
      {problem ? <div className="study-error">{problem}</div> : null}
      {result ? (
        <SweepViewSwitch view={view} onView={setView} onExport={() => exportSweepCsv(result, scenario, setProblem)} />
      ) : null}
      {result && view === "table" ? <SweepTable result={result} unitSystem={unitSystem} /> : null}
      {result && view === "chart" && result.axes.length === 1 ? (
        <SweepLineChart
          rows={result.rows}
          axis={{ ...axisDisplay(result.axes[0]!.path, unitSystem), path: result.axes[0]!.path }}
        />
      ) : null}
      {result && view === "chart" && result.axes.length === 2 ? (
        <SweepHeatmap
          rows={result.rows}
          axes={[heatAxis(result.axes[0]!, unitSystem), heatAxis(result.axes[1]!, unitSystem)]}
        />
      ) : null}
      {result ? <SweepNotes result={result} /> : null}
    </section>
  );
}

/** One varied input: which input, its bounds (values with units) and the number of steps. */
function SweepAxisRow(props: {
  form: AxisForm;
  index: number;
  onChange: (patch: Partial<AxisForm>) => void;
  onRemove: () => void;
}) {
  const { form, index, onChange, onRemove } = props;
  return (
    <div className="study-form">
      <label>
        input {index + 1}
        <select value={form.path} onChange={(e) => onChange({ path: e.target.value })}>
          {PATHS.map((p) => (
            <option key={p} value={p}>
              {pathTitle(p)}
            </option>
          ))}
        </select>
      </label>
      {(["from", "to", "steps"] as const).map((k) => (
        <label key={k}>
          {k}
          <input className="narrow" value={form[k]} onChange={(e) => onChange({ [k]: e.target.value })} />
        </label>
      ))}
      {index === 1 ? (
        <button type="button" onClick={onRemove}>
          Remove
        </button>
      ) : null}
    </div>
  );
}

/** Chart or table, and the CSV export. */
function SweepViewSwitch(props: {
  view: "chart" | "table";
  onView: (view: "chart" | "table") => void;
  onExport: () => void;
}) {
  const { view, onView, onExport } = props;
  return (
    <div className="button-row sweep-view" role="group" aria-label="Show the sweep as">
      <button type="button" aria-pressed={view === "chart"} onClick={() => onView("chart")} data-command="sweep-chart">
        Chart
      </button>
      <button type="button" aria-pressed={view === "table"} onClick={() => onView("table")} data-command="sweep-table">
        Table
      </button>
      <button type="button" onClick={onExport} data-command="sweep-csv">
        Export CSV
      </button>
    </div>
  );
}

/** The count of points per verdict (with the first refusals) and where the equation of state changes. */
function SweepNotes({ result }: { result: { axes: SweepAxis[]; rows: SweepRow[] } }) {
  const crossings = eosCrossings(result.axes, result.rows);
  return (
    <>
      <p className="study-note" data-role="study-tally">
        {`Points: ${result.rows.length} — ` +
          (["meets", "exceeds", "outside-scope", "refused"] as const)
            .map((v) => `${v} ${result.rows.filter((r) => r.verdict === v).length}`)
            .join(", ") +
          ". "}
        {result.rows
          .filter((r) => r.verdict === "refused")
          .slice(0, 3)
          .map((r) => `Refused: ${r.error ?? ""}`)
          .join(" ")}
      </p>
      <p className="study-note" data-role="study-eos">
        {crossings.length === 0
          ? `Equation of state at every point: ${result.rows[0]?.equationOfState ?? "—"}.`
          : crossings
              .map(
                (c) =>
                  `Equation of state changes from ${c.from} to ${c.to} between ${c.path} = ` +
                  `${siText(c.path, c.between[0][c.path]!)} and ${siText(c.path, c.between[1][c.path]!)}.`,
              )
              .join(" ")}
      </p>
    </>
  );
}

/** An SI value of an override path with its SI unit ("0.25 m/s"). */
function siText(path: string, value: number): string {
  const kind = OVERRIDE_PATHS[path]?.kind;
  const unit = kind ? siToDisplay(value, kind, "si").unit : "";
  return unit ? `${formatNumber(value)} ${unit}` : formatNumber(value);
}

function heatAxis(a: SweepAxis, unitSystem: UnitSystem) {
  return { ...axisDisplay(a.path, unitSystem), path: a.path, steps: a.steps };
}

/** The sweep as CSV, the same columns as `brinefield sweep --csv` (varied inputs in SI), opened by the caution. */
function exportSweepCsv(
  result: { axes: SweepAxis[]; rows: SweepRow[] },
  scenario: Scenario | null,
  onProblem: (m: string | null) => void,
) {
  const { columns, records } = sweepRecords(result.axes, result.rows);
  const about = scenario ? { scenario: scenario.name, inputsHash: inputsHash(scenario) } : {};
  void exportFile("brinefield-sweep.csv", csvWithCaution(flatRowsCsv(records, columns), undefined, about), [
    { name: "CSV", extensions: ["csv"] },
  ]).catch((error: unknown) =>
    onProblem(`Could not export: ${error instanceof Error ? error.message : String(error)}`),
  );
}

/** Every point of the sweep as a table: the varied inputs in the display units, then the results. */
function SweepTable({
  result,
  unitSystem,
}: {
  result: { axes: SweepAxis[]; rows: SweepRow[] };
  unitSystem: UnitSystem;
}) {
  const axes = result.axes.map((a) => ({ path: a.path, ...axisDisplay(a.path, unitSystem) }));
  return (
    <div className="study-table-wrap sweep-table" data-role="sweep-table">
      <table>
        <caption className="visually-hidden">Sweep points and their results</caption>
        <thead>
          <tr>
            {axes.map((a) => (
              <th key={a.path} scope="col">
                {a.label}
              </th>
            ))}
            <th scope="col" className="text">
              governing case
            </th>
            <th scope="col">edge dilution (×)</th>
            <th scope="col">required dilution (×)</th>
            <th scope="col">margin</th>
            <th scope="col" className="text">
              verdict
            </th>
          </tr>
        </thead>
        <tbody>
          {result.rows.map((r, i) => (
            <tr key={i}>
              {axes.map((a) => (
                <td key={a.path}>{formatNumber(a.toDisplay(r.values[a.path]!))}</td>
              ))}
              <td className="text">{r.governingCase ?? "—"}</td>
              <td>{formatNumber(r.edgeDilution)}</td>
              <td>{formatNumber(r.requiredDilution)}</td>
              <td>{formatNumber(r.margin)}</td>
              <td
                className={`text ${r.verdict === "meets" ? "pass" : r.verdict === "exceeds" ? "fail" : r.verdict === "outside-scope" ? "scope" : "refused"}`}
                title={r.error ?? undefined}
              >
                {r.verdict}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
