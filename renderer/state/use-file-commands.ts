/**
 * The File commands (new, open, recent, demo, save, exports, print), recovering autosaved work, opening
 * a variant or design as a scenario, and a scenario file dropped on the window. Each asks before unsaved
 * work is dropped; each failure reaches the status line.
 */
import { useCallback, useMemo } from "react";
import type { BrinefieldResult } from "../../core/result/contract";
import type { UnitSystem } from "../../core/units";
import type { DemoScenario } from "../demos";
import { exportReport, exportSeriesCsv, printReportInBrowser } from "../exports";
import * as host from "../platform/host";
import { logFailure } from "../platform/log-failure";
import { useFileDrop } from "../ui/use-file-drop";
import { blankScenario, documentFromFile, suggestedFileName, type ScenarioFile } from "./scenario-state";
import { documentFromText } from "./study-document";
import type { FileView, useDocumentFiles } from "./use-document-files";
import type { DocumentHistory } from "./use-document-history";

type DocumentFiles = ReturnType<typeof useDocumentFiles>;

export interface FileCommandsInput {
  readonly docHistory: DocumentHistory;
  readonly files: DocumentFiles;
  readonly view: FileView;
  readonly flash: (message: string) => void;
  readonly whenResultsCurrent: (run: (result: BrinefieldResult) => Promise<string>) => void;
  readonly unitSystem: UnitSystem;
}

export type FileCommands = ReturnType<typeof useFileCommands>;

export function useFileCommands({ docHistory, files, view, flash, whenResultsCurrent, unitSystem }: FileCommandsInput) {
  const { docRef } = docHistory;
  const { guardUnsaved, loadText, loadDocument, saveAs } = files;
  const { setShowStart, setTab } = view;
  return useMemo(
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
    [guardUnsaved, loadText, loadDocument, saveAs, flash, whenResultsCurrent, unitSystem, docRef, setShowStart, setTab],
  );
}

/**
 * Recovering autosaved work as an unsaved document, and opening a variant's or a design's full scenario
 * as a new, unsaved scenario document.
 */
export function useUnsavedOpeners(
  { savedFile }: DocumentHistory,
  { guardUnsaved, loadDocument }: DocumentFiles,
  { setShowStart, setTab }: FileView,
  flash: (message: string) => void,
  setRecovery: (record: host.AutosaveRecord | null) => void,
) {
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
    [flash, guardUnsaved, loadDocument, savedFile, setRecovery, setShowStart, setTab],
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
    [guardUnsaved, loadDocument, flash, savedFile, setShowStart, setTab],
  );
  return { recover, openAsScenario };
}

/**
 * A scenario file dropped anywhere on the window. It is read and checked first: a picture or any other
 * file must not cost the user their unsaved work, nor replace the document. True while a file is dragged.
 */
export function useScenarioDrop({ guardUnsaved, loadText }: DocumentFiles, flash: (message: string) => void): boolean {
  return useFileDrop((file) => {
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
}
