/**
 * The ambient record in the app: progress of a long record on the study workers with Cancel, the
 * record's figures over time (the report's own SVG, so app and report draw the same), and the intake.
 */
import type { BrinefieldResult } from "../../core/result/contract";
import { formatNumber } from "../../core/units";
import { recordDilutionSvg, recordDurationSvg, recordIncreaseSvg } from "../../core/record/charts";
import { recordLines, intakeLines } from "../../core/record/text";
import type { RecordRun } from "./use-record-run";

export function RecordStatus({ run, steps }: { run: RecordRun; steps: number }) {
  if (steps === 0) return null;
  if (run.running)
    return (
      <div className="record-status" role="status" data-role="record-status" data-state="running">
        Ambient record: computing {run.done} of {run.total} distinct steps on worker threads…
        <progress max={Math.max(1, run.total)} value={run.done} />
        <button type="button" onClick={run.cancel} data-command="record-cancel">
          Cancel
        </button>
      </div>
    );
  if (run.cancelled || run.error)
    return (
      <div
        className="record-status"
        role="status"
        data-role="record-status"
        data-state={run.cancelled ? "cancelled" : "error"}
      >
        {run.cancelled
          ? "Ambient record cancelled: no verdict over the record."
          : `Ambient record failed: ${run.error}`}{" "}
        <button type="button" onClick={run.restart} data-command="record-restart">
          Run the record
        </button>
      </div>
    );
  return run.seconds !== null ? (
    <div className="record-status" role="status" data-role="record-status" data-state="done">
      Ambient record: {steps} steps computed in {formatNumber(run.seconds, 3)} s.
    </div>
  ) : null;
}

/** Plain-text summary of the record and the intake (the command line's own lines). */
export function RecordSummary({ result }: { result: BrinefieldResult }) {
  const lines = [...recordLines(result), ...intakeLines(result)].filter((l) => l.trim() !== "");
  if (lines.length === 0) return null;
  return (
    <div className="record-summary" data-role="record-summary">
      {lines.map((l, i) => (
        <p key={i}>{l.trim()}</p>
      ))}
    </div>
  );
}

export function RecordChart({ result, kind }: { result: BrinefieldResult; kind: "time" | "duration" }) {
  const rec = result.record;
  if (!rec) return <div className="placeholder">The record has not been computed yet.</div>;
  const svg = kind === "time" ? recordDilutionSvg(rec) + recordIncreaseSvg(rec) : recordDurationSvg(rec);
  return (
    <div className="chart record-chart" data-role={`record-${kind}-chart`} dangerouslySetInnerHTML={{ __html: svg }} />
  );
}

/** The record's series as a table: one row per step, the numbers the time chart draws. */
export function RecordTable({ result }: { result: BrinefieldResult }) {
  const rec = result.record;
  if (!rec) return <div className="placeholder">The record has not been computed yet.</div>;
  const s = rec.series;
  const num = (v: number | null | undefined, digits = 4) =>
    v === null || v === undefined ? "—" : formatNumber(v, digits);
  return (
    <div className="chart-table" data-role="record-table">
      <table>
        <caption>Ambient record, one row per step (time from the first step)</caption>
        <thead>
          <tr>
            <th scope="col">Time (h)</th>
            <th scope="col">Edge dilution (×)</th>
            <th scope="col">Required dilution (×)</th>
            <th scope="col">Salinity increase at the edge (g/kg)</th>
            <th className="text" scope="col">
              Verdict
            </th>
          </tr>
        </thead>
        <tbody>
          {s.time.map((t, i) => (
            <tr key={i}>
              <td>{formatNumber(t / 3600, 4)}</td>
              <td>{num(s.edgeDilution[i])}</td>
              <td>{num(s.requiredDilution[i])}</td>
              <td>{num(s.salinityIncrease[i], 3)}</td>
              <td className="text">{s.verdict[i]}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
