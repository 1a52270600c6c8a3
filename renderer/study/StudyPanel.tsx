/**
 * The Study tab: variants compared side by side (sortable, CSV export), a sweep over one or two inputs
 * (line chart, or heat map with the limit contour), design search results, and Monte Carlo (histogram
 * with P5/P50/P95 and the probability of not meeting the limit). All work runs in Web Workers that call
 * the core pipeline; this component only plans with core helpers, shows progress and draws results.
 */
import { useCallback, useEffect, useMemo, useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { OVERRIDE_PATHS, type Overrides } from "../../core/study/overrides";
import { columnsOf, flattenRow, sortRows, type FlatRow } from "../../core/study/compare";
import {
  axisFromParts,
  eosCrossings,
  sweepGrid,
  sweepRows,
  type SweepAxis,
  type SweepRow,
} from "../../core/study/sweep";
import {
  candidateOverrides,
  designCandidates,
  designConstraintsFrom,
  judgeDesign,
  shortList,
  type RankedDesign,
} from "../../core/study/design";
import {
  histogram,
  mergeMonteCarloChunks,
  planMonteCarlo,
  splitRuns,
  summariseMonteCarlo,
  type MonteCarloSummary,
} from "../../core/study/montecarlo";
import { describeCases, expandCases } from "../../core/study/cases";
import type { PointEvaluation } from "../../core/study/evaluate-point";
import { exportFile } from "../platform/host";
import type { StudyTask } from "./messages";
import { StudyCancelled, StudyWorkerPool, defaultWorkerCount } from "./workerPool";
import { overridesFromText } from "./overridesText";
import { isLengthColumn, variantsCsv } from "./variantsCsv";
import { MonteCarloHistogram, SweepHeatmap, SweepLineChart, type AxisDisplay } from "./charts";
import "./study.css";

type Section = "variants" | "sweep" | "design" | "monte-carlo";

type Replies = Awaited<ReturnType<StudyWorkerPool["run"]>>;
type Histogram = { x0: number; x1: number; count: number }[];

/** Replaces item i of a list with a patched copy (form rows). */
function patchAt<T>(list: readonly T[], i: number, patch: Partial<T>): T[] {
  return list.map((x, k) => (k === i ? { ...x, ...patch } : x));
}

interface Job {
  readonly label: string;
  readonly total: number;
  readonly done: number;
}

interface Props {
  /** The raw scenario file being edited (the document). */
  readonly scenarioFile: unknown;
  readonly unitSystem: UnitSystem;
}

const PATHS = Object.keys(OVERRIDE_PATHS);

function axisDisplay(path: string, unitSystem: UnitSystem): AxisDisplay {
  const info = OVERRIDE_PATHS[path]!;
  const unit = siToDisplay(1, info.kind, unitSystem).unit;
  return {
    label: unit ? `${path} (${unit})` : path,
    toDisplay: (v) => siToDisplay(v, info.kind, unitSystem).value,
  };
}

export function StudyPanel({ scenarioFile, unitSystem }: Props) {
  const pool = useMemo(() => new StudyWorkerPool(defaultWorkerCount()), []);
  useEffect(() => () => pool.dispose(), [pool]);
  const [section, setSection] = useState<Section>("variants");
  const [scenario, setScenario] = useState<Scenario | null>(null);
  const [scenarioError, setScenarioError] = useState<string | null>(null);
  const [job, setJob] = useState<Job | null>(null);
  const [error, setError] = useState<string | null>(null);
  const busy = job !== null;

  // Read the document in a worker whenever it changes (debounced: typing should not queue work).
  useEffect(() => {
    let live = true;
    let reader: StudyWorkerPool | null = null;
    const t = setTimeout(() => {
      reader = new StudyWorkerPool(1);
      reader
        .run([{ kind: "prepare", file: scenarioFile }])
        .then(([r]) => {
          if (!live || r?.kind !== "prepared") return;
          setScenario(r.scenario);
          setScenarioError(null);
        })
        .catch((e: unknown) => {
          if (!live) return;
          setScenario(null);
          setScenarioError(e instanceof Error ? e.message : String(e));
        })
        .finally(() => reader?.dispose());
    }, 300);
    return () => {
      live = false;
      clearTimeout(t);
      // A newer document or leaving the tab: stop reading the old one rather than let it run on.
      reader?.dispose();
    };
  }, [scenarioFile]);

  /** Runs tasks on the pool with a progress bar; returns null when cancelled or failed. */
  const runJob = useCallback(
    async <T,>(label: string, total: number, tasks: readonly StudyTask[], finish: (r: Replies) => T) => {
      setError(null);
      setJob({ label, total, done: 0 });
      try {
        const replies = await pool.run(tasks, (done) => setJob({ label, total, done }));
        return finish(replies);
      } catch (e) {
        if (!(e instanceof StudyCancelled)) setError(e instanceof Error ? e.message : String(e));
        return null;
      } finally {
        setJob(null);
      }
    },
    [pool],
  );

  const runPoints = useCallback(
    async (label: string, s: Scenario, list: readonly Overrides[]): Promise<PointEvaluation[] | null> => {
      const chunks = splitRuns(list.length, pool.size * 4);
      return runJob(
        label,
        list.length,
        chunks.map((c) => ({ kind: "points" as const, scenario: s, overrides: list.slice(c.start, c.end) })),
        (replies) => replies.flatMap((r) => (r.kind === "points" ? r.points : [])),
      );
    },
    [pool, runJob],
  );

  return (
    <div className="study-panel" data-role="study-panel">
      <div className="tabs small" role="tablist" aria-label="Study">
        {(
          [
            ["variants", "Variants"],
            ["sweep", "Sweep"],
            ["design", "Design search"],
            ["monte-carlo", "Monte Carlo"],
          ] as const
        ).map(([k, label]) => (
          <button
            key={k}
            type="button"
            role="tab"
            aria-selected={section === k}
            onClick={() => setSection(k)}
            data-study={k}
          >
            {label}
          </button>
        ))}
      </div>
      <div className="study-progress" aria-live="polite">
        {job ? (
          <>
            <span>{job.label}</span>
            <progress max={job.total} value={job.done} data-role="study-progress" />
            <span>
              {job.done} / {job.total}
            </span>
            <button type="button" onClick={() => pool.cancel()} data-command="study-cancel">
              Cancel
            </button>
          </>
        ) : scenarioError ? (
          <span className="study-error">
            The scenario has problems; fix them to run studies.{"\n"}
            {scenarioError}
          </span>
        ) : scenario ? (
          <span className="study-note">{describeCases(expandCases(scenario), scenario)}</span>
        ) : (
          <span className="study-note">Reading the scenario…</span>
        )}
        {error ? <span className="study-error" role="alert">{error}</span> : null}
      </div>
      <div>
        {section === "variants" ? (
          <VariantsSection
            scenarioFile={scenarioFile}
            unitSystem={unitSystem}
            busy={busy || !scenario}
            runJob={runJob}
          />
        ) : section === "sweep" ? (
          <SweepSection scenario={scenario} unitSystem={unitSystem} busy={busy} runPoints={runPoints} />
        ) : section === "design" ? (
          <DesignSection
            scenario={scenario}
            scenarioFile={scenarioFile}
            unitSystem={unitSystem}
            busy={busy}
            runPoints={runPoints}
          />
        ) : (
          <MonteCarloSection scenario={scenario} busy={busy} runJob={runJob} poolSize={pool.size} />
        )}
      </div>
    </div>
  );
}

type RunJob = <T>(
  label: string,
  total: number,
  tasks: readonly StudyTask[],
  finish: (r: Replies) => T,
) => Promise<T | null>;

type RunPoints = (
  label: string,
  s: Scenario,
  list: readonly Overrides[],
) => Promise<PointEvaluation[] | null>;

// --- Variants --------------------------------------------------------------------------------------

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


function VariantsSection({ scenarioFile, unitSystem, busy, runJob }: VariantsProps) {
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
        Every variant runs under every ambient case; the worst case is the one with the lowest margin.
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
                <tr key={i} className={r.case === "worst case" ? "worst" : ""}>
                  {columns.map((c) => {
                    const raw = r[c];
                    // Lengths are SI in the rows (and the CSV); the table shows the chosen unit system.
                    const v = typeof raw === "number" && isLengthColumn(c) ? toLength(raw) : raw;
                    const verdict = v === "pass" ? "pass" : "fail";
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

// --- Sweep -----------------------------------------------------------------------------------------

interface AxisForm {
  path: string;
  from: string;
  to: string;
  steps: string;
}

function SweepSection({
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
  const [forms, setForms] = useState<AxisForm[]>([
    { path: "ambient.currentSpeed", from: "0", to: "0.5", steps: "11" },
  ]);
  const [result, setResult] = useState<{ axes: SweepAxis[]; rows: SweepRow[] } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

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
    setProblem(null);
    const grid = sweepGrid(axes);
    const points = await runPoints("Sweep", scenario, grid.map((g) => g.overrides));
    if (points) setResult({ axes, rows: sweepRows(grid, points) });
  };

  const crossings = result ? eosCrossings(result.axes, result.rows) : [];
  return (
    <section>
      <h3>Sweep</h3>
      <p className="study-note">
        Bounds are values with units (e.g. “0.5 knot”, “8 in”); a plain number is read in SI whichever
        units the app shows. One input draws a line chart;
        two draw a heat map of the margin with the limit contour.
      </p>
      {forms.map((f, i) => (
        <div className="study-form" key={i}>
          <label>
            input {i + 1}
            <select value={f.path} onChange={(e) => setForms(patchAt(forms, i, { path: e.target.value }))}>
              {PATHS.map((p) => (
                <option key={p} value={p}>
                  {p}
                </option>
              ))}
            </select>
          </label>
          {(["from", "to", "steps"] as const).map((k) => (
            <label key={k}>
              {k}
              <input
                className="narrow"
                value={f[k]}
                onChange={(e) => setForms(patchAt(forms, i, { [k]: e.target.value }))}
              />
            </label>
          ))}
          {i === 1 ? (
            <button type="button" onClick={() => setForms(forms.slice(0, 1))}>
              Remove
            </button>
          ) : null}
        </div>
      ))}
      <div className="button-row">
        {forms.length === 1 ? (
          <button
            type="button"
            onClick={() =>
              setForms([...forms, { path: "diffuser.portDiameter", from: "0.1", to: "0.3", steps: "11" }])
            }
          >
            Add second input
          </button>
        ) : null}
        <button
          type="button"
          disabled={busy || !scenario}
          onClick={() => void run()}
          data-command="study-sweep"
        >
          Run sweep
        </button>
      </div>
      {problem ? <div className="study-error">{problem}</div> : null}
      {result && result.axes.length === 1 ? (
        <SweepLineChart
          rows={result.rows}
          axis={{ ...axisDisplay(result.axes[0]!.path, unitSystem), path: result.axes[0]!.path }}
        />
      ) : null}
      {result && result.axes.length === 2 ? (
        <SweepHeatmap
          rows={result.rows}
          axes={[heatAxis(result.axes[0]!, unitSystem), heatAxis(result.axes[1]!, unitSystem)]}
        />
      ) : null}
      {result ? (
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
      ) : null}
    </section>
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

// --- Design search ---------------------------------------------------------------------------------

function DesignSection({
  scenario,
  scenarioFile,
  unitSystem,
  busy,
  runPoints,
}: {
  scenario: Scenario | null;
  scenarioFile: unknown;
  unitSystem: UnitSystem;
  busy: boolean;
  runPoints: RunPoints;
}) {
  const [form, setForm] = useState({
    minExitVelocity: "3 m/s",
    maxExitVelocity: "6 m/s",
    maxLength: "",
    maxPorts: "12",
  });
  const [designs, setDesigns] = useState<RankedDesign[] | null>(null);
  const [summary, setSummary] = useState<string>("");
  const [problem, setProblem] = useState<string | null>(null);

  const run = async () => {
    if (!scenario) return;
    const flags: Record<string, unknown> = {
      minExitVelocity: form.minExitVelocity,
      maxExitVelocity: form.maxExitVelocity,
      ...(form.maxLength.trim() ? { maxLength: form.maxLength } : {}),
      maxPorts: Number(form.maxPorts),
    };
    const block = (scenarioFile as { design?: unknown } | null)?.design;
    const c = designConstraintsFrom(scenario, block, flags);
    if (!c.ok) {
      setProblem(c.issues.map((i) => `${i.path}: ${i.message}`).join("\n"));
      return;
    }
    setProblem(null);
    const candidates = designCandidates(scenario, c.constraints);
    if (candidates.length === 0) {
      setProblem("No geometry fits the constraints; widen the velocity range or the length.");
      return;
    }
    const points = await runPoints("Design search", scenario, candidates.map(candidateOverrides));
    if (!points) return;
    const verdicts = candidates.map((d, i) => judgeDesign(d, points[i]!, c.constraints));
    setDesigns(shortList(verdicts, c.constraints.maxDesigns));
    const passing = verdicts.filter((v) => v.ok).length;
    setSummary(`${candidates.length} candidates tried, ${passing} meet every limit under every case.`);
  };

  const len = (v: number) => {
    const d = siToDisplay(v, "length", unitSystem);
    return `${formatNumber(d.value)} ${d.unit}`;
  };
  const dia = (v: number) => {
    const d = siToDisplay(v, "smallLength", unitSystem);
    return `${formatNumber(d.value)} ${d.unit}`;
  };
  const vel = (v: number) => {
    const d = siToDisplay(v, "speed", unitSystem);
    return `${formatNumber(d.value)} ${d.unit}`;
  };

  return (
    <section>
      <h3>Design search</h3>
      <p className="study-note">
        Port count, diameter, angle (30°, 45°, 60°) and spacing within the maximum length; every design must
        meet every limit at the mixing-zone edge under all ambient cases, keep the jet below the surface and
        stay within the velocity range. The scenario's “design” block supplies further constraints.
      </p>
      <div className="study-form">
        {(
          [
            ["minExitVelocity", "min exit velocity"],
            ["maxExitVelocity", "max exit velocity"],
            ["maxLength", "max diffuser length (blank: scenario's)"],
            ["maxPorts", "max ports"],
          ] as const
        ).map(([k, label]) => (
          <label key={k}>
            {label}
            <input
              className="narrow"
              value={form[k]}
              onChange={(e) => setForm({ ...form, [k]: e.target.value })}
            />
          </label>
        ))}
        <button
          type="button"
          disabled={busy || !scenario}
          onClick={() => void run()}
          data-command="study-design"
        >
          Search
        </button>
      </div>
      {problem ? <div className="study-error">{problem}</div> : null}
      {designs ? <p className="study-note">{summary}</p> : null}
      {designs && designs.length === 0 ? <p>No design meets every limit under every case.</p> : null}
      {designs && designs.length > 0 ? (
        <table data-role="study-design-table">
          <thead>
            <tr>
              {DESIGN_HEADERS.map((h) => (
                <th key={h} className={h === "governing case" || h === "best for" ? "text" : ""}>
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {designs.map((d) => (
              <tr key={d.rank}>
                <td>{d.rank}</td>
                <td>{d.candidate.portCount}</td>
                <td>{dia(d.candidate.portDiameter)}</td>
                <td>{d.candidate.portAngle}°</td>
                <td>{d.candidate.portCount > 1 ? len(d.candidate.portSpacing) : "—"}</td>
                <td>{len(d.candidate.length)}</td>
                <td>{vel(d.candidate.exitVelocity)}</td>
                <td>{formatNumber(d.worstMargin)}×</td>
                <td className="text">{d.governingCase}</td>
                <td className="text">{d.bestFor.join(", ") || "balanced"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}

const DESIGN_HEADERS = [
  ...["#", "ports", "diameter", "angle", "spacing", "length"],
  ...["exit velocity", "worst margin (edge ÷ required dilution)", "governing case", "best for"],
];

// --- Monte Carlo -----------------------------------------------------------------------------------

interface MonteCarloProps {
  readonly scenario: Scenario | null;
  readonly busy: boolean;
  readonly runJob: RunJob;
  readonly poolSize: number;
}

function MonteCarloSection({ scenario, busy, runJob, poolSize }: MonteCarloProps) {
  const [runs, setRuns] = useState("1000");
  const [seed, setSeed] = useState("1");
  const [problem, setProblem] = useState<string | null>(null);
  const [out, setOut] = useState<{ summary: MonteCarloSummary; bins: Histogram } | null>(null);

  const run = async () => {
    if (!scenario) return;
    const n = Number(runs);
    const s = Number(seed);
    const planned = planMonteCarlo(scenario, n, s);
    if (!planned.ok) {
      setProblem(planned.issues.map((i) => `${i.path}: ${i.message}`).join("\n"));
      return;
    }
    setProblem(null);
    const plan = planned.plan;
    const chunks = splitRuns(n, poolSize * 4);
    const r = await runJob(
      "Monte Carlo",
      n,
      chunks.map((c) => ({ kind: "monte-carlo" as const, scenario, plan, start: c.start, end: c.end })),
      (replies) => replies.flatMap((x) => (x.kind === "monte-carlo" ? [x.chunk] : [])),
    );
    if (!r) return;
    const merged = mergeMonteCarloChunks(plan, r);
    setOut({ summary: summariseMonteCarlo(plan, r), bins: histogram(merged.worstEdgeDilution, 30) });
  };

  const w = out?.summary.worstCase;
  return (
    <section>
      <h3>Monte Carlo</h3>
      <div className="study-form">
        <label>
          runs
          <input className="narrow" value={runs} onChange={(e) => setRuns(e.target.value)} />
        </label>
        <label>
          seed
          <input className="narrow" value={seed} onChange={(e) => setSeed(e.target.value)} />
        </label>
        <button
          type="button"
          disabled={busy || !scenario}
          onClick={() => void run()}
          data-command="study-monte-carlo"
        >
          Run
        </button>
      </div>
      <p className="study-note">
        The same seed gives the same results on any machine and any number of workers.
      </p>
      {problem ? <div className="study-error">{problem}</div> : null}
      {out && w ? (
        <>
          {out.summary.notes.map((n, i) => (
            <p key={i} className="study-note">
              {n}
            </p>
          ))}
          <p data-role="study-exceedance">
            Worst case, dilution at the mixing-zone edge: P5 {formatNumber(w.edgeDilution.p5)}×, P50{" "}
            {formatNumber(w.edgeDilution.p50)}×, P95 {formatNumber(w.edgeDilution.p95)}×;
            probability of not meeting the limit {formatNumber(100 * w.probabilityOfExceedance, 3)} %.
          </p>
          <MonteCarloHistogram
            bins={out.bins}
            p5={w.edgeDilution.p5}
            p50={w.edgeDilution.p50}
            p95={w.edgeDilution.p95}
            required={null}
          />
          <table>
            <thead>
              <tr>
                {["case", "edge dilution P5", "P50", "P95", "P(not meeting limit)", "failed runs"].map((h) => (
                  <th key={h} className={h === "case" ? "text" : ""}>
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {[...out.summary.cases, w].map((c) => (
                <tr key={c.name} className={c === w ? "worst" : ""}>
                  <td className="text">{c.name}</td>
                  <td>{formatNumber(c.edgeDilution.p5)}×</td>
                  <td>{formatNumber(c.edgeDilution.p50)}×</td>
                  <td>{formatNumber(c.edgeDilution.p95)}×</td>
                  <td>{formatNumber(100 * c.probabilityOfExceedance, 3)} %</td>
                  <td>{c.failedRuns}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      ) : null}
    </section>
  );
}
