/**
 * The main window: file commands, inputs, results with the caution, the 3D view and the charts, and the
 * Study tab. The document is the raw scenario file; it changes only through actions. The window's state
 * lives in hooks (document and history, autosave, engine, files and commands, shortcuts); its parts are
 * their own components.
 */
import { useCallback, useEffect, useMemo, useState } from "react";
import { DEMO_SCENARIOS } from "./demos";
import { DesignWorkspace } from "./DesignWorkspace";
import { useChartChoice } from "./charts/use-chart-choice";
import { useAppEngine } from "./engine/use-app-engine";
import { useWhenResultsCurrent } from "./engine/use-results-current";
import { issuesByPath } from "./engine/use-engine";
import { EditorContext, type Editor } from "./inputs/EditorContext";
import { StartView } from "./start/StartView";
import { applyDesign } from "./state/actions";
import { useAutosave } from "./state/use-autosave";
import { useDocumentFiles } from "./state/use-document-files";
import { useDocumentHistory } from "./state/use-document-history";
import { useFileCommands, useScenarioDrop, useUnsavedOpeners } from "./state/use-file-commands";
import { useUnitSystem } from "./state/use-unit-system";
import { StudyWorkspace } from "./study/StudyWorkspace";
import { NoticeBanner, RecoveryBanner } from "./ui/Banners";
import { ConfirmDialog } from "./ui/ConfirmDialog";
import { useTabs } from "./ui/Tabs";
import { TopBar } from "./ui/TopBar";
import { useNotice } from "./ui/use-notice";
import { useShortcuts } from "./ui/use-shortcuts";

export { AUTOSAVE_INTERVAL_MS } from "./state/use-autosave";
const VIEW_TABS = ["design", "study"] as const;

export function App() {
  const docHistory = useDocumentHistory();
  const { history, doc, docRef, perform, step, changeStudy, lastEdited } = docHistory;
  const [unitSystem, setUnitSystem] = useUnitSystem();
  const [tab, setTab] = useState<"design" | "study">("design");
  // The Study tab stays mounted once opened, so its results and choices survive a tab switch.
  const [studyMounted, setStudyMounted] = useState(false);
  useEffect(() => {
    if (tab === "study") setStudyMounted(true);
  }, [tab]);
  const [showStart, setShowStart] = useState(false);
  const [resetSignal, setResetSignal] = useState(0);
  const resetView = useCallback(() => setResetSignal((n) => n + 1), []);
  const mainTabs = useTabs("view", VIEW_TABS, tab, setTab);
  const { engine, recordRun } = useAppEngine(doc.file);
  const chart = useChartChoice(Boolean(engine.scenario?.ambient.record));
  const { notice, flash } = useNotice();
  const { recovery, setRecovery, discardRecovery, autosaveFailed } = useAutosave(docRef, flash);
  const view = { setShowStart, setTab };
  const files = useDocumentFiles(docHistory, view, flash, autosaveFailed);
  const whenResultsCurrent = useWhenResultsCurrent(engine, flash);
  const commands = useFileCommands({ docHistory, files, view, flash, whenResultsCurrent, unitSystem });
  const { recover, openAsScenario } = useUnsavedOpeners(docHistory, files, view, flash, setRecovery);
  useShortcuts(commands, { step, showStart: setShowStart, resetView, setUnitSystem });
  const dragging = useScenarioDrop(files, flash);

  const issues = useMemo(() => issuesByPath(engine.issues, lastEdited), [engine.issues, lastEdited]);
  const normalised = engine.error === null ? engine.scenario : null;
  const editor: Editor = useMemo(
    () => ({ file: doc.file, unitSystem, issues, perform, normalised }),
    [doc.file, unitSystem, issues, perform, normalised],
  );
  const onApplyDesign = useCallback(
    (diffuser: Record<string, unknown>) => perform(applyDesign, { diffuser }),
    [perform],
  );

  return (
    <EditorContext.Provider value={editor}>
      <div className="app" data-dirty={doc.dirty}>
        <TopBar
          doc={doc}
          title={docHistory.title}
          mainTabs={mainTabs}
          unitSystem={unitSystem}
          onUnits={setUnitSystem}
          commands={commands}
          onStart={() => setShowStart(true)}
          step={step}
          canUndo={history.past.length > 0}
          canRedo={history.future.length > 0}
          exportsDisabled={!engine.result || engine.error !== null}
        />
        {recovery ? <RecoveryBanner recovery={recovery} onRecover={recover} onDiscard={discardRecovery} /> : null}
        {notice ? <NoticeBanner notice={notice} /> : null}

        {tab === "design" ? (
          <DesignWorkspace
            panel={mainTabs.panel}
            engine={engine}
            recordRun={recordRun}
            normalised={normalised}
            unitSystem={unitSystem}
            chart={chart}
            resetSignal={resetSignal}
            documentKey={files.documentKey}
          />
        ) : null}
        {studyMounted || tab === "study" ? (
          <StudyWorkspace
            active={tab === "study"}
            panel={tab === "study" ? mainTabs.panel : {}}
            scenarioFile={doc.file}
            study={doc.study ?? null}
            unitSystem={unitSystem}
            onStudyChange={changeStudy}
            onOpenAsScenario={openAsScenario}
            onApplyDesign={onApplyDesign}
            onNotice={flash}
          />
        ) : null}

        {showStart ? (
          <StartView
            demos={DEMO_SCENARIOS}
            recent={files.recent}
            onDemo={commands.openDemo}
            onRecent={commands.openRecent}
            onNew={commands.newScenario}
            onOpen={commands.open}
            onClose={() => setShowStart(false)}
          />
        ) : null}
        {files.confirm ? <ConfirmDialog request={files.confirm} onClose={files.closeConfirm} /> : null}
        {dragging ? <div className="drop-overlay">Drop a scenario file to open it</div> : null}
      </div>
    </EditorContext.Provider>
  );
}
