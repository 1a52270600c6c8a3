/**
 * The main window: file commands, inputs, results with the caution, the 3D view and the charts, and the
 * Study tab. The document is the raw scenario file; it changes only through actions.
 */
import { Suspense, lazy, useCallback, useEffect, useMemo, useRef, useState } from "react";
import { CAUTION, type BrinefieldResult } from "../core/result/contract";
import type { UnitSystem } from "../core/units";
import { DEMO_SCENARIOS, type DemoScenario } from "./demos";
import { exportBlocked, issuesByPath, useEngine } from "./engine/useEngine";
import { AmbientSection } from "./inputs/AmbientSection";
import { DiffuserSection } from "./inputs/DiffuserSection";
import { DischargeSection } from "./inputs/DischargeSection";
import { EditorContext, type Editor } from "./inputs/EditorContext";
import { MixingZoneSection } from "./inputs/MixingZoneSection";
import { TextField } from "./inputs/fields";
import * as host from "./platform/host";
import { ResultsPanel } from "./results/ResultsPanel";
import { useRecordRun } from "./record/useRecordRun";
import { RecordIntakeSection } from "./inputs/RecordIntakeSection";
import { RecordChart, RecordStatus, RecordSummary, RecordTable } from "./record/RecordPanel";
import { ClaimPanel } from "./results/ClaimPanel";
import { applyDesign, type Action } from "./state/actions";
import {
  blankScenario,
  documentFromFile,
  suggestedFileName,
  type DocumentState,
  type ScenarioFile,
} from "./state/scenarioState";
import {
  documentFromText,
  documentName,
  serialiseDocument,
  suggestedDocumentName,
  type StudyPart,
} from "./state/studyDocument";
import { StartView } from "./start/StartView";
import { historyPush, historyRedo, historyReplace, historyStart, historyUndo, type History } from "./state/history";
import { ConfirmDialog, type ConfirmRequest } from "./ui/ConfirmDialog";
import { useFileDrop } from "./ui/useFileDrop";
import { TrajectoryChart } from "./charts/TrajectoryChart";
import { DistanceChart } from "./charts/DistanceCharts";
import { DistanceTable, TrajectoryTable } from "./charts/ChartTables";
import { useTabs } from "./ui/Tabs";
import { exportSeriesCsv, exportReport, printReportInBrowser } from "./exports";

export const AUTOSAVE_INTERVAL_MS = 5000;
const VIEW_TABS = ["design", "study"] as const;
const CHART_TABS = ["trajectory", "dilution", "increase"] as const;
type ChartTab = (typeof CHART_TABS)[number] | "record" | "duration";
const RECORD_CHART_TABS: readonly ChartTab[] = [...CHART_TABS, "record", "duration"];
const UNITS_KEY = "brinefield.units";

// three.js and the 3D view load after the first screen (the inputs and results do not wait for them).
const PlumeView = lazy(() => import("./view3d/PlumeView").then((m) => ({ default: m.PlumeView })));
// The Study tab loads on first use (its own workers and charts stay out of the first screen).
const StudyPanel = lazy(() => import("./study/StudyPanel").then((m) => ({ default: m.StudyPanel })));

function initialUnits(): UnitSystem {
  try {
    return localStorage.getItem(UNITS_KEY) === "us" ? "us" : "si";
  } catch {
    return "si";
  }
}

/** Logs a failed host call the user need not act on (the console is the app's log). */
function logFailure(what: string): (error: unknown) => void {
  return (error) => console.warn(`Brinefield: ${what} failed:`, error);
}

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

function initialDocument(): DocumentState {
  const first = DEMO_SCENARIOS[0];
  return first ? documentFromFile(first.file, null) : documentFromFile(blankScenario(), null);
}

export function App() {
  const [history, setHistory] = useState<History>(() => historyStart(initialDocument()));
  const doc = history.present;
  /** The file (and study part) as last opened or saved: undoing back to it makes the document clean again. */
  const savedFile = useRef<{ file: ScenarioFile; study: StudyPart | null } | null>({ file: doc.file, study: null });
  const isSaved = (d: DocumentState) =>
    savedFile.current !== null && d.file === savedFile.current.file && (d.study ?? null) === savedFile.current.study;
  const setDoc = useCallback(
    (update: (d: DocumentState) => DocumentState) => setHistory((h) => historyReplace(h, update(h.present))),
    [],
  );
  const [unitSystem, setUnitSystem] = useState<UnitSystem>(initialUnits);
  const [tab, setTab] = useState<"design" | "study">("design");
  // The Study tab stays mounted once opened, so its results and choices survive a tab switch.
  const [studyMounted, setStudyMounted] = useState(false);
  useEffect(() => {
    if (tab === "study") setStudyMounted(true);
  }, [tab]);
  const [showStart, setShowStart] = useState(false);
  const [recent, setRecent] = useState<readonly string[]>([]);
  const [confirm, setConfirm] = useState<ConfirmRequest | null>(null);
  const [recovery, setRecovery] = useState<host.AutosaveRecord | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [resetSignal, setResetSignal] = useState(0);
  const [documentKey, setDocumentKey] = useState(0);
  const [chart, setChart] = useState<ChartTab>("trajectory");
  const [chartAsTable, setChartAsTable] = useState(false);
  const mainTabs = useTabs("view", VIEW_TABS, tab, setTab);
  const engineRun = useEngine(doc.file);
  // A long ambient record runs on the study workers; its full result then stands for the engine's.
  const recordRun = useRecordRun(engineRun.scenario, engineRun.result);
  const engine = useMemo(
    () =>
      recordRun.result
        ? { ...engineRun, result: recordRun.result }
        : { ...engineRun, running: engineRun.running || recordRun.running },
    [engineRun, recordRun.result, recordRun.running],
  );
  const hasRecord = Boolean(engineRun.scenario?.ambient.record);
  // The record tabs leave with the record: a removed record shows the trajectory again.
  const shownChart: ChartTab = !hasRecord && (chart === "record" || chart === "duration") ? "trajectory" : chart;
  const chartTabs = useTabs<ChartTab>("chart", hasRecord ? RECORD_CHART_TABS : CHART_TABS, shownChart, setChart);
  const docRef = useRef(doc);
  docRef.current = doc;
  const flash = useCallback((message: string) => {
    setNotice(message);
    window.setTimeout(() => setNotice((n) => (n === message ? null : n)), 6000);
  }, []);

  /** Autosave failures reach the user: their unsaved work is not backed up. */
  const autosaveFailed = useCallback(
    (error: unknown) =>
      flash(`Autosave failed (${errorText(error)}): unsaved work is not backed up until you save it.`),
    [flash],
  );

  /** Replaces the document (open, new, demo) and gives the 3D view a fresh camera. */
  const loadDocument = useCallback(
    (next: DocumentState) => {
      savedFile.current = { file: next.file, study: next.study ?? null };
      setHistory(historyStart(next));
      // The user opened something else (after agreeing to drop unsaved work): the autosave is obsolete.
      // Recovered work is the exception: it is unsaved, so it is written back at once (below).
      if (next.dirty) void host.autosaveWrite(serialiseDocument(next)).catch(autosaveFailed);
      else void host.autosaveClear().catch(logFailure("clearing the autosave"));
      setDocumentKey((n) => n + 1);
    },
    [autosaveFailed],
  );
  /** The field changed last: a cross-field problem is shown there (see issuesByPath). */
  const [lastEdited, setLastEdited] = useState<string | null>(null);
  const perform = useCallback(<I,>(action: Action<I>, input: I) => {
    const path =
      typeof input === "object" && input !== null && "path" in input ? String((input as { path: unknown }).path) : "";
    setLastEdited(path || null);
    setHistory((h) => historyPush(h, action.perform(h.present, input), `${action.name}:${path}`, Date.now()));
  }, []);
  const step = useCallback((direction: "undo" | "redo") => {
    // A field being edited keeps its own text; let go of it so it shows the restored value.
    const active = document.activeElement;
    if (active instanceof HTMLInputElement || active instanceof HTMLTextAreaElement) active.blur();
    setHistory((h) => {
      const moved = direction === "undo" ? historyUndo(h) : historyRedo(h);
      return moved === h ? h : historyReplace(moved, { ...moved.present, dirty: !isSaved(moved.present) });
    });
  }, []);
  /**
   * Changes the study part (variants, names) as one undo step. Turning a scenario document into a study
   * forgets its path: the scenario file on disk stays a scenario, the study is saved as its own file.
   */
  const changeStudy = useCallback((next: StudyPart | null, key: string) => {
    setHistory((h) => {
      const present = h.present;
      const becomesStudy = !present.study && next !== null;
      const changed: DocumentState = {
        ...present,
        study: next,
        path: becomesStudy ? null : present.path,
        dirty: true,
        revision: present.revision + 1,
      };
      return historyPush(h, changed, `study:${key}`, Date.now());
    });
  }, []);
  const issues = useMemo(() => issuesByPath(engine.issues, lastEdited), [engine.issues, lastEdited]);
  const normalised = engine.error === null ? engine.scenario : null;
  const editor: Editor = useMemo(
    () => ({ file: doc.file, unitSystem, issues, perform, normalised }),
    [doc.file, unitSystem, issues, perform, normalised],
  );

  // Title and dirty flag to the host (only when they change, not on every keystroke); units remembered.
  const documentTitle = documentName(doc);
  useEffect(() => {
    void host.setDocumentState(doc.dirty, documentTitle).catch(logFailure("telling the host the document state"));
  }, [doc.dirty, documentTitle]);
  useEffect(() => {
    try {
      localStorage.setItem(UNITS_KEY, unitSystem);
    } catch {
      // storage disabled: the choice lasts for the session
    }
  }, [unitSystem]);

  // Autosave while dirty; offer recovery on start.
  useEffect(() => {
    void host
      .autosaveRead()
      .then((record) => {
        if (record && record.text.trim() !== "") setRecovery(record);
      })
      .catch(logFailure("reading the autosave"));
    void host.recentFiles().then(setRecent).catch(logFailure("reading the recent files"));
  }, []);
  useEffect(() => {
    let written: DocumentState | null = null;
    const timer = setInterval(() => {
      const current = docRef.current;
      // Only unsaved work, and only when it changed since the last autosave.
      if (!current.dirty || (written !== null && current.file === written.file && current.study === written.study))
        return;
      written = current;
      void host.autosaveWrite(serialiseDocument(current)).catch(autosaveFailed);
    }, AUTOSAVE_INTERVAL_MS);
    return () => clearInterval(timer);
  }, [autosaveFailed]);
  useEffect(() => {
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      if (docRef.current.dirty && !host.isDesktop()) event.preventDefault();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => window.removeEventListener("beforeunload", onBeforeUnload);
  }, []);

  const loadText = useCallback(
    (text: string, path: string | null) => {
      const read = documentFromText(text);
      if (!read.ok) {
        flash(read.message);
        return;
      }
      loadDocument({ ...documentFromFile(read.file, path), study: read.study });
      setShowStart(false);
      setTab(read.study ? "study" : "design");
      if (path !== null) host.rememberOpened({ path, text });
      void host.recentFiles().then(setRecent).catch(logFailure("reading the recent files"));
    },
    [flash, loadDocument],
  );

  const saveAs = useCallback(
    async (forceDialog: boolean): Promise<boolean> => {
      const current = docRef.current;
      try {
        const path = await host.saveScenario(
          forceDialog ? null : current.path,
          serialiseDocument(current),
          suggestedDocumentName(current),
        );
        if (path === null) return false;
        savedFile.current = { file: current.file, study: current.study ?? null };
        // Clean only if nothing changed while the dialog was open (the file object is replaced on every edit).
        setDoc((d) =>
          d.file === current.file && d.study === current.study ? { ...d, path, dirty: false } : { ...d, path },
        );
        await host.autosaveClear().catch(logFailure("clearing the autosave"));
        void host.recentFiles().then(setRecent).catch(logFailure("reading the recent files"));
        flash(`Saved ${path.replace(/^.*[\\/]/, "")}`);
        return true;
      } catch (error) {
        flash(`Could not save: ${errorText(error)}`);
        return false;
      }
    },
    [flash, setDoc],
  );

  /** Runs `proceed` now, or after the user agrees to lose unsaved changes. */
  const guardUnsaved = useCallback(
    (what: string, proceed: () => void) => {
      if (!docRef.current.dirty) {
        proceed();
        return;
      }
      setConfirm({
        title: "Unsaved changes",
        message: `“${documentName(docRef.current)}” has changes that are not saved. ${what} anyway?`,
        confirmLabel: "Discard changes",
        extraLabel: "Save first",
        onExtra: () => void saveAs(false).then((saved) => saved && proceed()),
        onConfirm: proceed,
      });
    },
    [saveAs],
  );

  // Exports pair the results with the inputs, so they wait for the latest edit's run to finish.
  const engineRef = useRef(engine);
  engineRef.current = engine;
  const pendingExport = useRef<(() => void) | null>(null);
  const whenResultsCurrent = useCallback(
    (run: (result: BrinefieldResult) => Promise<string>) => {
      const attempt = () => {
        const current = engineRef.current;
        if (current.running) {
          pendingExport.current = attempt;
          return;
        }
        const why = exportBlocked(current);
        if (why !== null || !current.result) return flash(why ?? "No results to export yet.");
        void run(current.result).then(
          (message) => message && flash(message),
          (e: unknown) => flash(String(e)),
        );
      };
      attempt();
    },
    [flash],
  );
  useEffect(() => {
    if (engine.running || !pendingExport.current) return;
    const attempt = pendingExport.current;
    pendingExport.current = null;
    attempt();
  }, [engine.running]);

  const commands = useMemo(
    () => ({
      newScenario: () =>
        guardUnsaved("Start a new scenario", () => {
          loadDocument(documentFromFile(blankScenario(), null));
          setShowStart(false);
        }),
      open: () =>
        guardUnsaved("Open another scenario", () => {
          void host
            .openScenario()
            .then((opened) => opened && loadText(opened.text, opened.path))
            .catch((e: unknown) => flash(String(e)));
        }),
      openRecent: (path: string) =>
        guardUnsaved("Open another scenario", () => {
          void host
            .openRecent(path)
            .then((opened) => (opened ? loadText(opened.text, opened.path) : flash(`${path} is no longer available`)))
            .catch((e: unknown) => flash(String(e)));
        }),
      openDemo: (demo: DemoScenario) =>
        guardUnsaved("Open a demo scenario", () => {
          loadDocument(documentFromFile(demo.file, null));
          setShowStart(false);
          setTab("design");
        }),
      save: () => void saveAs(false),
      saveAs: () => void saveAs(true),
      exportReport: () => whenResultsCurrent((r) => exportReport(r, docRef.current.file)),
      exportCsv: () => whenResultsCurrent((r) => exportSeriesCsv(r, docRef.current.file, unitSystem)),
      print: () =>
        whenResultsCurrent((r) =>
          host.isDesktop()
            ? host.printPdf(suggestedFileName(docRef.current.file, "pdf")).then(() => "")
            : printReportInBrowser(r, docRef.current.file),
        ),
    }),
    [guardUnsaved, loadText, loadDocument, saveAs, flash, whenResultsCurrent, unitSystem],
  );

  /**
   * Brings back autosaved work as an unsaved document. Text that is no longer a scenario is dropped with
   * a message; edits made since the start are not thrown away without asking.
   */
  const recover = useCallback(
    (record: host.AutosaveRecord) => {
      setRecovery(null);
      const read = documentFromText(record.text);
      if (!read.ok) {
        flash(`The unsaved work could not be recovered. ${read.message}`);
        void host.autosaveClear().catch(logFailure("clearing the autosave"));
        return;
      }
      guardUnsaved("Recover the earlier unsaved work", () => {
        loadDocument({ ...documentFromFile(read.file, null), study: read.study, dirty: true });
        savedFile.current = null; // nothing of it is on disk: undoing back to it stays dirty
        setShowStart(false);
        setTab("design");
      });
    },
    [flash, guardUnsaved, loadDocument],
  );

  /** Opens a variant's or a design's full scenario as a new, unsaved scenario document. */
  const openAsScenario = useCallback(
    (file: ScenarioFile) => {
      guardUnsaved("Open it as a scenario", () => {
        loadDocument({ ...documentFromFile(file, null), dirty: true });
        savedFile.current = null; // nothing of it is on disk yet
        setShowStart(false);
        setTab("design");
        flash(
          `Opened “${typeof file["name"] === "string" ? file["name"] : "the scenario"}” as a new scenario (not saved yet).`,
        );
      });
    },
    [guardUnsaved, loadDocument, flash],
  );

  // Keyboard shortcuts and host menu commands.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey) return;
      const key = e.key.toLowerCase();
      if (key === "z" && !e.shiftKey) step("undo");
      else if ((key === "z" && e.shiftKey) || key === "y") step("redo");
      // In the desktop app the File menu's accelerators send these as menu commands; handling the keys
      // here as well would open two dialogs for one key press.
      else if (host.isDesktop() && (key === "n" || key === "o" || key === "s")) return;
      else if (key === "n") commands.newScenario();
      else if (key === "o") commands.open();
      else if (key === "s" && e.shiftKey) commands.saveAs();
      else if (key === "s") commands.save();
      else if (key === "p" && !host.isDesktop()) commands.print();
      else return;
      e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    const unsubscribe = host.onMenuCommand((command, path) => {
      switch (command) {
        case "open-recent":
          return path ? commands.openRecent(path) : undefined;
        case "new":
          return commands.newScenario();
        case "open":
          return commands.open();
        case "save":
          return commands.save();
        case "save-as":
          return commands.saveAs();
        case "export-report":
          return commands.exportReport();
        case "export-csv":
          return commands.exportCsv();
        case "print-pdf":
          return commands.print();
        case "start-view":
          return setShowStart(true);
        case "reset-view":
          return setResetSignal((n) => n + 1);
        case "units-si":
          return setUnitSystem("si");
        case "units-us":
          return setUnitSystem("us");
      }
    });
    return () => {
      window.removeEventListener("keydown", onKey);
      unsubscribe();
    };
  }, [commands, step]);

  // A scenario file dropped anywhere on the window. It is read and checked first: a picture or any
  // other file must not cost the user their unsaved work, nor replace the document.
  const dragging = useFileDrop((file) => {
    void host.readDroppedFile(file).then(
      (opened) => {
        const read = documentFromText(opened.text);
        if (!read.ok) return flash(`${file.name}: ${read.message}`);
        guardUnsaved("Open the dropped file", () => loadText(opened.text, opened.path));
      },
      (error: unknown) =>
        flash(`Could not read ${file.name}: ${error instanceof Error ? error.message : String(error)}`),
    );
  });

  const result = engine.result;
  const scenario = engine.scenario;
  const title = documentTitle;

  return (
    <EditorContext.Provider value={editor}>
      <div className="app" data-dirty={doc.dirty}>
        <header className="topbar">
          <div className="brand" aria-hidden="true">
            Brinefield
          </div>
          <nav className="file-commands" aria-label="File">
            <button type="button" onClick={() => setShowStart(true)} data-command="start">
              Start
            </button>
            <button type="button" onClick={commands.newScenario} title="Ctrl+N">
              New
            </button>
            <button type="button" onClick={commands.open} title="Ctrl+O" data-command="open">
              Open…
            </button>
            <button type="button" onClick={commands.save} title="Ctrl+S" data-command="save">
              Save
            </button>
            <button type="button" onClick={commands.saveAs} title="Ctrl+Shift+S">
              Save as…
            </button>
            <button
              type="button"
              onClick={() => step("undo")}
              disabled={history.past.length === 0}
              title="Undo (Ctrl+Z)"
              aria-label="Undo"
              data-command="undo"
            >
              ↶
            </button>
            <button
              type="button"
              onClick={() => step("redo")}
              disabled={history.future.length === 0}
              title="Redo (Ctrl+Shift+Z)"
              aria-label="Redo"
              data-command="redo"
            >
              ↷
            </button>
            <button
              type="button"
              onClick={commands.exportReport}
              disabled={!result || engine.error !== null}
              data-command="export-report"
            >
              Export report
            </button>
            <button
              type="button"
              onClick={commands.exportCsv}
              disabled={!result || engine.error !== null}
              data-command="export-csv"
            >
              Export CSV
            </button>
            <button
              type="button"
              onClick={commands.print}
              disabled={!result || engine.error !== null}
              data-command="print-pdf"
              title="Print the report, or save it as PDF (Ctrl+P)"
            >
              Print / PDF…
            </button>
          </nav>
          <div className="doc-title" title={doc.path ?? "not saved yet"}>
            {doc.dirty ? (
              <span className="dirty-dot" role="img" aria-label="unsaved changes" title="unsaved changes">
                ●
              </span>
            ) : null}
            {doc.study ? (
              <span className="doc-kind" data-role="doc-kind">
                Study
              </span>
            ) : null}
            {title}
            {doc.path ? <span className="doc-path">{doc.path.replace(/^.*[\\/]/, "")}</span> : null}
          </div>
          <div className="tabs" {...mainTabs.list} aria-label="View">
            <button {...mainTabs.tab("design")} data-command="design">
              Design
            </button>
            <button {...mainTabs.tab("study")} data-command="study">
              Study
            </button>
          </div>
          <div className="segmented units" role="radiogroup" aria-label="Units">
            <button
              type="button"
              role="radio"
              aria-checked={unitSystem === "si"}
              onClick={() => setUnitSystem("si")}
              data-units="si"
            >
              SI
            </button>
            <button
              type="button"
              role="radio"
              aria-checked={unitSystem === "us"}
              onClick={() => setUnitSystem("us")}
              data-units="us"
            >
              US
            </button>
          </div>
        </header>

        {recovery ? (
          <div className="banner recovery" role="status">
            Unsaved work from {recovery.savedAt ? new Date(recovery.savedAt).toLocaleString() : "an earlier session"}{" "}
            was kept.
            <button type="button" onClick={() => recover(recovery)}>
              Recover it
            </button>
            <button
              type="button"
              className="link-button"
              onClick={() => {
                void host.autosaveClear().catch(logFailure("clearing the autosave"));
                setRecovery(null);
              }}
            >
              Discard
            </button>
          </div>
        ) : null}
        {notice ? (
          <div className="banner notice" role="status" data-role="notice">
            {notice}
          </div>
        ) : null}

        {tab === "design" ? (
          <main className="workspace" {...mainTabs.panel}>
            <aside className="inputs" aria-label="Scenario inputs">
              <section className="input-section">
                <div className="field-grid">
                  <TextField path="name" label="Scenario name" wide />
                  <TextField path="description" label="Description" wide placeholder="site, case, assumptions" />
                </div>
              </section>
              <DischargeSection />
              <AmbientSection />
              <DiffuserSection />
              <MixingZoneSection />
              <RecordIntakeSection />
            </aside>

            <section className="centre" aria-label="Views">
              <div className="view3d-panel">
                {result && scenario ? (
                  <Suspense fallback={<div className="placeholder">Loading the 3D view…</div>}>
                    <PlumeView
                      scenario={scenario}
                      result={result}
                      unitSystem={unitSystem}
                      resetSignal={resetSignal}
                      documentKey={documentKey}
                    />
                  </Suspense>
                ) : (
                  <div className="placeholder">
                    {engine.error ? "No results: fix the inputs marked in red." : "Calculating…"}
                  </div>
                )}
              </div>
              <div className="chart-panel">
                <div className="chart-tabs">
                  <div className="tabs small" {...chartTabs.list} aria-label="Chart">
                    <button {...chartTabs.tab("trajectory")}>Side view</button>
                    <button {...chartTabs.tab("dilution")}>Dilution vs distance</button>
                    <button {...chartTabs.tab("increase")}>Salinity increase vs distance</button>
                    {scenario?.ambient.record ? (
                      <>
                        <button {...chartTabs.tab("record")} data-command="chart-record">
                          Record over time
                        </button>
                        <button {...chartTabs.tab("duration")} data-command="chart-duration">
                          Duration curve
                        </button>
                      </>
                    ) : null}
                  </div>
                  <button
                    type="button"
                    className="view-as"
                    aria-pressed={chartAsTable}
                    onClick={() => setChartAsTable((t) => !t)}
                    data-command="chart-as-table"
                    title="Show the numbers of the chart as a table"
                  >
                    Table
                  </button>
                </div>
                <div className="chart-body" {...chartTabs.panel}>
                  {result && scenario ? (
                    shownChart === "trajectory" ? (
                      chartAsTable ? (
                        <TrajectoryTable result={result} scenario={scenario} unitSystem={unitSystem} />
                      ) : (
                        <TrajectoryChart result={result} scenario={scenario} unitSystem={unitSystem} />
                      )
                    ) : shownChart === "record" || shownChart === "duration" ? (
                      chartAsTable ? (
                        <RecordTable result={result} />
                      ) : (
                        <RecordChart result={result} kind={shownChart === "record" ? "time" : "duration"} />
                      )
                    ) : chartAsTable ? (
                      <DistanceTable result={result} unitSystem={unitSystem} quantity={shownChart} />
                    ) : (
                      <DistanceChart result={result} unitSystem={unitSystem} quantity={shownChart} />
                    )
                  ) : null}
                </div>
              </div>
            </section>

            <aside className="results-column" aria-label="Results">
              <p className="caution" data-role="caution">
                {CAUTION}
              </p>
              <div
                className={`engine-status${engine.error ? " error" : ""}`}
                role="status"
                data-role="engine-status"
                data-engine={engine.inWorker ? "worker" : "in-thread"}
              >
                {engine.error ? (
                  <>
                    <b>{result ? "Showing the last good results." : "No results."}</b> {engine.error}
                  </>
                ) : engine.running ? (
                  "Calculating…"
                ) : engine.ms !== null ? (
                  `Up to date · ${engine.ms.toFixed(0)} ms`
                ) : null}
              </div>
              <RecordStatus run={recordRun} steps={scenario?.ambient.record?.time.length ?? 0} />
              <div className={engine.stale ? "stale" : undefined}>
                {result ? <ResultsPanel result={result} unitSystem={unitSystem} /> : null}
                {result ? <RecordSummary result={result} /> : null}
                <ClaimPanel scenario={normalised} />
              </div>
            </aside>
          </main>
        ) : null}
        {studyMounted || tab === "study" ? (
          <main className="study-workspace" hidden={tab !== "study"} {...(tab === "study" ? mainTabs.panel : {})}>
            {tab === "study" ? (
              <p className="caution" data-role="caution">
                {CAUTION}
              </p>
            ) : null}
            <Suspense fallback={<div className="placeholder">Loading study tools…</div>}>
              <StudyPanel
                active={tab === "study"}
                scenarioFile={doc.file}
                study={doc.study ?? null}
                unitSystem={unitSystem}
                onStudyChange={changeStudy}
                onOpenAsScenario={openAsScenario}
                onApplyDesign={(diffuser) => perform(applyDesign, { diffuser })}
                onNotice={flash}
              />
            </Suspense>
          </main>
        ) : null}

        {showStart ? (
          <StartView
            demos={DEMO_SCENARIOS}
            recent={recent}
            onDemo={commands.openDemo}
            onRecent={commands.openRecent}
            onNew={commands.newScenario}
            onOpen={commands.open}
            onClose={() => setShowStart(false)}
          />
        ) : null}
        {confirm ? <ConfirmDialog request={confirm} onClose={() => setConfirm(null)} /> : null}
        {dragging ? <div className="drop-overlay">Drop a scenario file to open it</div> : null}
      </div>
    </EditorContext.Provider>
  );
}
