/**
 * The Study tab: variants compared side by side (sortable, CSV export), a sweep over one or two inputs
 * (line chart, or heat map with the limit contour), design search results, and Monte Carlo (histogram
 * with P5/P50/P95 and the probability of not meeting the limit). All work runs in Web Workers that call
 * the core pipeline; this component only plans with core helpers, shows progress and draws results.
 * Each section lives in its own file; this one holds the worker pool, the progress bar and the tabs.
 */
import { useCallback, useEffect, useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";
import type { Overrides } from "../../core/study/overrides";
import { splitRuns } from "../../core/study/montecarlo";
import { describeCases, expandCases } from "../../core/cases";
import type { PointEvaluation } from "../../core/study/evaluate-point";
import type { StudyTask } from "../../core/study/worker-protocol";
import { StudyCancelled, StudyWorkerPool, sharedStudyPool } from "./workerPool";
import type { Replies } from "./sections";
import { VariantsSection } from "./VariantsSection";
import { SweepSection } from "./SweepSection";
import { DesignSection } from "./DesignSection";
import { MonteCarloSection } from "./MonteCarloSection";
import type { ScenarioFile } from "../state/scenarioState";
import type { StudyPart } from "../state/studyDocument";
import "./study.css";

type Section = "variants" | "sweep" | "design" | "monte-carlo";

interface Job {
  readonly label: string;
  readonly total: number;
  readonly done: number;
}

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
  const [scenario, setScenario] = useState<Scenario | null>(null);
  const [scenarioError, setScenarioError] = useState<string | null>(null);
  const [job, setJob] = useState<Job | null>(null);
  const [error, setError] = useState<string | null>(null);
  const busy = job !== null;

  // Read the document in a worker whenever it changes (debounced: typing should not queue work).
  useEffect(() => {
    if (!active) return; // read again when the tab is shown
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
  }, [scenarioFile, active]);

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
        {error ? (
          <span className="study-error" role="alert">
            {error}
          </span>
        ) : null}
      </div>
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
