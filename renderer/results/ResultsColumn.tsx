/** The Design tab's results: the caution, the engine's status, the record run, the results and the claim. */
import { CAUTION } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";
import type { EngineState } from "../engine/use-engine";
import { RecordStatus, RecordSummary } from "../record/RecordPanel";
import type { RecordRun } from "../record/use-record-run";
import { ClaimPanel } from "./ClaimPanel";
import { ResultsPanel } from "./ResultsPanel";

function EngineStatus({ engine }: { engine: EngineState }) {
  return (
    <div
      className={`engine-status${engine.error ? " error" : ""}`}
      role="status"
      data-role="engine-status"
      data-engine={engine.inWorker ? "worker" : "in-thread"}
    >
      {engine.error ? (
        <>
          <b>{engine.result ? "Showing the last good results." : "No results."}</b> {engine.error}
        </>
      ) : engine.running ? (
        "Calculating…"
      ) : engine.ms !== null ? (
        `Up to date · ${engine.ms.toFixed(0)} ms`
      ) : null}
    </div>
  );
}

interface ResultsColumnProps {
  readonly engine: EngineState;
  readonly recordRun: RecordRun;
  /** The scenario as core read it, or null while the inputs have errors. */
  readonly normalised: Scenario | null;
  readonly unitSystem: UnitSystem;
}

export function ResultsColumn({ engine, recordRun, normalised, unitSystem }: ResultsColumnProps) {
  const result = engine.result;
  return (
    <aside className="results-column" aria-label="Results">
      <p className="caution" data-role="caution">
        {CAUTION}
      </p>
      <EngineStatus engine={engine} />
      <RecordStatus run={recordRun} steps={engine.scenario?.ambient.record?.time.length ?? 0} />
      <div className={engine.stale ? "stale" : undefined}>
        {result ? <ResultsPanel result={result} unitSystem={unitSystem} /> : null}
        {result ? <RecordSummary result={result} /> : null}
        <ClaimPanel scenario={normalised} />
      </div>
    </aside>
  );
}
