/**
 * The document's files: replacing the document (open, new, demo, recovered work), reading a scenario or
 * study text, saving, the recent-files list, and the question before unsaved work is dropped. Every
 * failure reaches the status line or the log.
 */
import { useCallback, useEffect, useState } from "react";
import * as host from "../platform/host";
import { errorText, logFailure } from "../platform/log-failure";
import type { ConfirmRequest } from "../ui/ConfirmDialog";
import { historyStart } from "./history";
import { documentFromFile, type DocumentState } from "./scenario-state";
import { documentFromText, documentName, serialiseDocument, suggestedDocumentName } from "./study-document";
import type { DocumentHistory } from "./use-document-history";

/** What the files touch of the window: the start view and the main tab. */
export interface FileView {
  readonly setShowStart: (show: boolean) => void;
  readonly setTab: (tab: "design" | "study") => void;
}

export function useDocumentFiles(
  { docRef, savedFile, setHistory, setDoc }: DocumentHistory,
  view: FileView,
  flash: (message: string) => void,
  autosaveFailed: (error: unknown) => void,
) {
  const { setShowStart, setTab } = view;
  const [recent, setRecent] = useState<readonly string[]>([]);
  const [confirm, setConfirm] = useState<ConfirmRequest | null>(null);
  const [documentKey, setDocumentKey] = useState(0);
  const refreshRecent = useCallback(
    () => void host.recentFiles().then(setRecent).catch(logFailure("reading the recent files")),
    [],
  );
  useEffect(() => refreshRecent(), [refreshRecent]);

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
    [savedFile, setHistory, autosaveFailed],
  );

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
      refreshRecent();
    },
    [flash, loadDocument, setShowStart, setTab, refreshRecent],
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
        refreshRecent();
        flash(`Saved ${path.replace(/^.*[\\/]/, "")}`);
        return true;
      } catch (error) {
        flash(`Could not save: ${errorText(error)}`);
        return false;
      }
    },
    [docRef, savedFile, flash, setDoc, refreshRecent],
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
    [docRef, saveAs],
  );

  const closeConfirm = useCallback(() => setConfirm(null), []);
  return { recent, confirm, closeConfirm, documentKey, loadDocument, loadText, saveAs, guardUnsaved };
}
