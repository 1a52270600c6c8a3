/** Study tab, design search: candidate port layouts ranked by their worst margin over the ambient cases. */
import { useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import {
  candidateOverrides,
  designCandidates,
  designConstraintsFrom,
  judgeDesign,
  shortList,
  type RankedDesign,
} from "../../core/study/design";
import type { RunPoints } from "./sections";

export function DesignSection({
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
