/**
 * Study tab, design search: candidate port layouts ranked by the stated rule (computed in core), the
 * nearest miss when none passes, and a button that applies a listed design to the document (undoable).
 */
import { useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { candidateOverrides, designConstraintsFrom, planDesignSearch } from "../../core/study/design";
import { designOutcome, type DesignOutcome } from "../../core/study/design-rank";
import { expandCases } from "../../core/cases";
import type { RunPoints } from "./sections";
import { isPlainObject, scenarioName, type ScenarioFile } from "../state/scenario-state";

export function DesignSection({
  scenario,
  scenarioFile,
  unitSystem,
  busy,
  runPoints,
  onApply,
  onOpenAsScenario,
}: {
  scenario: Scenario | null;
  scenarioFile: unknown;
  unitSystem: UnitSystem;
  busy: boolean;
  runPoints: RunPoints;
  onApply?: (diffuser: Record<string, unknown>) => void;
  /** Opens the base scenario with this design's diffuser as a new scenario document. */
  onOpenAsScenario?: (file: ScenarioFile) => void;
}) {
  const [form, setForm] = useState<DesignFormValues>(INITIAL_FORM);
  const [outcome, setOutcome] = useState<DesignOutcome | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [applied, setApplied] = useState<number | null>(null);

  const run = async () => {
    if (!scenario) return;
    const flags: Record<string, unknown> = {
      minExitVelocity: form.minExitVelocity,
      maxExitVelocity: form.maxExitVelocity,
      ...(form.maxLength.trim() ? { maxLength: form.maxLength } : {}),
      maxPorts: Number(form.maxPorts),
      minPortDiameter: form.minPortDiameter,
      maxPortDiameter: form.maxPortDiameter,
      nominalSizes: form.nominalSizes,
    };
    const block = (scenarioFile as { design?: unknown } | null)?.design;
    const c = designConstraintsFrom(scenario, block, flags);
    if (!c.ok) {
      setProblem(c.issues.map((i) => `${i.path}: ${i.message}`).join("\n"));
      return;
    }
    const plan = planDesignSearch(scenario, c.constraints, expandCases(scenario).length);
    if (!plan.ok) {
      setProblem(plan.message);
      return;
    }
    setProblem(null);
    setApplied(null);
    if (plan.candidates.length === 0) {
      setProblem(
        "No design: no port diameter gives an exit velocity within the range inside the diameter limits; widen them.",
      );
      return;
    }
    const points = await runPoints("Design search", scenario, plan.candidates.map(candidateOverrides));
    if (!points) return;
    const rawDiffuser = (scenarioFile as { diffuser?: unknown } | null)?.diffuser;
    setOutcome(designOutcome(scenario, c.constraints, plan.candidates, points, rawDiffuser));
  };

  return (
    <section data-role="study-design">
      <h3>Design search</h3>
      <p className="study-note">
        Port count, diameter, angle (30°, 45°, 60°) and spacing within the maximum length; every design must meet every
        limit at the mixing-zone edge under all ambient cases, keep the jet below the surface and stay within the
        velocity and diameter ranges (0.05–0.5 m by default, common practice). The scenario's “design” block supplies
        further constraints.
      </p>
      <DesignForm form={form} setForm={setForm} disabled={busy || !scenario} onSearch={() => void run()} />
      {problem ? <div className="study-error">{problem}</div> : null}
      {outcome ? (
        <>
          <p data-role="design-headline">
            <b>{outcome.headline}</b>
          </p>
          <p className="study-note" data-role="design-rule">
            {outcome.rankingRule}
          </p>
          {outcome.notes.slice(1).map((n) => (
            <p key={n} className="study-note">
              {n}
            </p>
          ))}
        </>
      ) : null}
      {outcome?.nearestMiss ? <NearestMiss miss={outcome.nearestMiss} unitSystem={unitSystem} /> : null}
      {outcome && outcome.designs.length > 0 ? (
        <DesignTable
          designs={outcome.designs}
          unitSystem={unitSystem}
          scenarioFile={scenarioFile}
          applied={applied}
          onApplied={setApplied}
          onApply={onApply}
          onOpenAsScenario={onOpenAsScenario}
        />
      ) : null}
      {applied !== null ? (
        <p className="study-note" role="status">
          Design #{applied} is now the scenario's diffuser; Undo (Ctrl+Z) restores the previous one. Check it with the
          full results and warnings.
        </p>
      ) : null}
    </section>
  );
}

type DesignFormValues = typeof INITIAL_FORM;

const INITIAL_FORM = {
  minExitVelocity: "3 m/s",
  maxExitVelocity: "6 m/s",
  maxLength: "",
  maxPorts: "12",
  minPortDiameter: "0.05 m",
  maxPortDiameter: "0.5 m",
  nominalSizes: false,
};

function show(v: number, kind: "length" | "smallLength" | "speed", unitSystem: UnitSystem): string {
  const d = siToDisplay(v, kind, unitSystem);
  return `${formatNumber(d.value)} ${d.unit}`;
}

const FORM_TEXTS = [
  ["minExitVelocity", "min exit velocity"],
  ["maxExitVelocity", "max exit velocity"],
  ["maxLength", "max diffuser length (blank: scenario's)"],
  ["maxPorts", "max ports"],
  ["minPortDiameter", "smallest port diameter"],
  ["maxPortDiameter", "largest port diameter"],
] as const;

/** The search's constraints as text fields (units allowed) and the nominal-sizes switch, with the Search button. */
function DesignForm(props: {
  form: DesignFormValues;
  setForm: (form: DesignFormValues) => void;
  disabled: boolean;
  onSearch: () => void;
}) {
  const { form, setForm, disabled, onSearch } = props;
  return (
    <div className="study-form">
      {FORM_TEXTS.map(([k, label]) => (
        <label key={k}>
          {label}
          <input className="narrow" value={form[k]} onChange={(e) => setForm({ ...form, [k]: e.target.value })} />
        </label>
      ))}
      <label>
        nominal pipe sizes (ISO 6708 DN)
        <input
          type="checkbox"
          checked={form.nominalSizes}
          onChange={(e) => setForm({ ...form, nominalSizes: e.target.checked })}
        />
      </label>
      <button type="button" disabled={disabled} onClick={onSearch} data-command="study-design">
        Search
      </button>
    </div>
  );
}

/** The design that came closest when none passes, why it fails and what would close the gap. */
function NearestMiss({
  miss,
  unitSystem,
}: {
  miss: NonNullable<DesignOutcome["nearestMiss"]>;
  unitSystem: UnitSystem;
}) {
  return (
    <div data-role="design-nearest-miss">
      <h4>Nearest miss</h4>
      <p>
        {miss.design.portCount} port(s) of {show(miss.design.portDiameter, "smallLength", unitSystem)} at{" "}
        {miss.design.portAngle}°, length {show(miss.design.length, "length", unitSystem)}, exit velocity{" "}
        {show(miss.design.exitVelocity, "speed", unitSystem)}: worst margin {formatNumber(miss.design.worstMargin)}× in
        “{miss.design.governingCase}”.
      </p>
      <ul>
        {miss.reasons.map((r) => (
          <li key={r}>{r}</li>
        ))}
      </ul>
      <p>What would close the gap:</p>
      <ul>
        {miss.toClose.map((t) => (
          <li key={t.field + t.message}>
            {t.field ? <code>{t.field}</code> : null} {t.message}
          </li>
        ))}
      </ul>
    </div>
  );
}

/** The ranked designs, each with buttons to apply it to the document or open it as a new scenario. */
function DesignTable(props: {
  designs: DesignOutcome["designs"];
  unitSystem: UnitSystem;
  scenarioFile: unknown;
  applied: number | null;
  onApplied: (rank: number) => void;
  onApply?: (diffuser: Record<string, unknown>) => void;
  onOpenAsScenario?: (file: ScenarioFile) => void;
}) {
  const { designs, unitSystem, scenarioFile, applied, onApplied, onApply, onOpenAsScenario } = props;
  return (
    <table data-role="study-design-table">
      <thead>
        <tr>
          {DESIGN_HEADERS.map((h) => (
            <th key={h} className={h === "governing case" || h === "best for" || h === "" ? "text" : ""}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {designs.map((d) => (
          <tr key={d.rank}>
            <td>{d.rank}</td>
            <td>{d.portCount}</td>
            <td>{show(d.portDiameter, "smallLength", unitSystem)}</td>
            <td>{d.portAngle}°</td>
            <td>{d.portSpacing !== null ? show(d.portSpacing, "length", unitSystem) : "—"}</td>
            <td>{show(d.length, "length", unitSystem)}</td>
            <td>{show(d.exitVelocity, "speed", unitSystem)}</td>
            <td>{formatNumber(d.worstMargin)}×</td>
            <td className="text">{d.governingCase}</td>
            <td className="text">{d.bestFor.join(", ")}</td>
            <td className="text">
              {onApply ? (
                <button
                  type="button"
                  data-command="apply-design"
                  title="Put this design's diffuser block into the scenario (Undo restores the previous one)"
                  onClick={() => {
                    onApply(d.diffuser);
                    onApplied(d.rank);
                  }}
                >
                  {applied === d.rank ? "Applied" : "Apply"}
                </button>
              ) : null}
              {onOpenAsScenario && isPlainObject(scenarioFile) ? (
                <button
                  type="button"
                  data-command="design-open-as-scenario"
                  title="Open the scenario with this design's diffuser as a new, unsaved scenario"
                  onClick={() =>
                    onOpenAsScenario({
                      ...scenarioFile,
                      name: `${scenarioName(scenarioFile)} — design #${d.rank}`,
                      diffuser: { ...d.diffuser },
                    })
                  }
                >
                  Open as scenario
                </button>
              ) : null}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

const DESIGN_HEADERS = [
  ...["#", "ports", "diameter", "angle", "spacing", "length"],
  ...["exit velocity", "worst margin (edge ÷ required dilution)", "governing case", "best for", ""],
];
