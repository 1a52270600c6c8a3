/**
 * The Study tab: variants compared side by side (sortable, CSV export), a sweep over one or two inputs
 * (line chart, or heat map with the limit contour), design search results, and Monte Carlo (histogram
 * with P5/P50/P95 and the probability of not meeting the limit). All work runs in Web Workers that call
 * the core pipeline; this component only plans with core helpers, shows progress and draws results.
 * Each section lives in its own file; this one holds the worker pool, the progress bar and the tabs.
 */
import { useEffect, useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";
import { describeCases, expandCases } from "../../core/cases";
import { sharedStudyPool } from "./worker-pool";
import { useStudyJobs, type StudyJob } from "./use-study-jobs";
import { useStudyScenario } from "./use-study-scenario";
import { VariantsSection } from "./VariantsSection";
import { SweepSection } from "./SweepSection";
import { DesignSection } from "./DesignSection";
import { MonteCarloSection } from "./MonteCarloSection";
import type { ScenarioFile } from "../state/scenario-state";
import type { StudyPart } from "../state/study-document";
import "./study.css";

type Section = "variants" | "sweep" | "design" | "monte-carlo";

interface Props {
  /** False while the Study tab is hidden (the panel stays mounted so nothing is lost on a tab switch). */
  readonly active?: boolean;
  /** The raw scenario file being edited (the document; a study's base scenario). */
  readonly scenarioFile: ScenarioFile;
  /** The document's study part (variants), or null for a scenario document. */
  readonly study?: StudyPart | null;
  readonly unitSystem: UnitSystem;
  /** Changes the document's study part (one undo step per change; `key` merges keystrokes). */
  readonly onStudyChange?: (next: StudyPart | null, key: string) => void;
  /** Opens a full scenario (a variant's or a design's) as a new scenario document. */
  readonly onOpenAsScenario?: (file: ScenarioFile) => void;
  /** Puts a listed design's diffuser block into the document (one undo step). */
  readonly onApplyDesign?: (diffuser: Record<string, unknown>) => void;
  readonly onNotice?: (message: string) => void;
}

export function StudyPanel({
  active = true,
  scenarioFile,
  study = null,
  unitSystem,
  onStudyChange,
  onOpenAsScenario,
  onApplyDesign,
  onNotice,
}: Props) {
  // One pool per page, kept between studies and tab switches (warm workers); unmounting stops a running job.
  const pool = sharedStudyPool();
  useEffect(() => () => pool.stopIfRunning(), [pool]);
  const [section, setSection] = useState<Section>("variants");
  // Sections stay mounted once opened (hidden when not shown), so results survive switching between them.
  const [opened, setOpened] = useState<ReadonlySet<Section>>(() => new Set<Section>(["variants"]));
  useEffect(() => {
    setOpened((o) => (o.has(section) ? o : new Set([...o, section])));
  }, [section]);
  const { scenario, scenarioError } = useStudyScenario(scenarioFile, active);
  const { job, error, runJob, runPoints } = useStudyJobs(pool);
  const busy = job !== null;

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
      <StudyProgress
        job={job}
        error={error}
        scenario={scenario}
        scenarioError={scenarioError}
        onCancel={() => pool.cancel()}
      />
      <div hidden={section !== "variants"} role="tabpanel" aria-label="Variants">
        <VariantsSection
          active={active && section === "variants"}
          scenarioFile={scenarioFile}
          study={study}
          unitSystem={unitSystem}
          busy={busy || !scenario}
          runJob={runJob}
          onStudyChange={onStudyChange}
          onOpenAsScenario={onOpenAsScenario}
          onNotice={onNotice}
        />
      </div>
      {opened.has("sweep") ? (
        <div hidden={section !== "sweep"} role="tabpanel" aria-label="Sweep">
          <SweepSection scenario={scenario} unitSystem={unitSystem} busy={busy} runPoints={runPoints} />
        </div>
      ) : null}
      {opened.has("design") ? (
        <div hidden={section !== "design"} role="tabpanel" aria-label="Design search">
          <DesignSection
            scenario={scenario}
            scenarioFile={scenarioFile}
            unitSystem={unitSystem}
            busy={busy}
            runPoints={runPoints}
            onApply={onApplyDesign}
            onOpenAsScenario={onOpenAsScenario}
          />
        </div>
      ) : null}
      {opened.has("monte-carlo") ? (
        <div hidden={section !== "monte-carlo"} role="tabpanel" aria-label="Monte Carlo">
          <MonteCarloSection scenario={scenario} busy={busy} runJob={runJob} poolSize={pool.size} />
        </div>
      ) : null}
    </div>
  );
}

/** The running job's progress with a Cancel button, or what the scenario's cases are (or why it cannot run). */
function StudyProgress(props: {
  job: StudyJob | null;
  error: string | null;
  scenario: Scenario | null;
  scenarioError: string | null;
  onCancel: () => void;
}) {
  const { job, error, scenario, scenarioError, onCancel } = props;
  return (
    <div className="study-progress" aria-live="polite">
      {job ? (
        <>
          <span>{job.label}</span>
          <progress max={job.total} value={job.done} data-role="study-progress" />
          <span>
            {job.done} / {job.total}
          </span>
          <button type="button" onClick={onCancel} data-command="study-cancel">
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
      {error ? (
        <span className="study-error" role="alert">
          {error}
        </span>
      ) : null}
    </div>
  );
}
