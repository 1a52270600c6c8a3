/**
 * The open document and its undo history: edits through actions, undo and redo, study changes, and the
 * file as last opened or saved (undoing back to it makes the document clean again). The title and the
 * dirty flag go to the host when they change.
 */
import { useCallback, useEffect, useRef, useState, type MutableRefObject } from "react";
import { DEMO_SCENARIOS } from "../demos";
import { logFailure } from "../platform/log-failure";
import * as host from "../platform/host";
import type { Action } from "./actions";
import { historyPush, historyRedo, historyReplace, historyStart, historyUndo, type History } from "./history";
import { blankScenario, documentFromFile, type DocumentState, type ScenarioFile } from "./scenario-state";
import { documentName, type StudyPart } from "./study-document";

/** The file and study part as on disk, or null when nothing of the document is on disk. */
export type SavedFile = { file: ScenarioFile; study: StudyPart | null } | null;

function initialDocument(): DocumentState {
  const first = DEMO_SCENARIOS[0];
  return first ? documentFromFile(first.file, null) : documentFromFile(blankScenario(), null);
}

export interface DocumentHistory {
  readonly history: History;
  readonly doc: DocumentState;
  /** The document of the latest render, for callbacks that must not change with every edit. */
  readonly docRef: MutableRefObject<DocumentState>;
  /** The file (and study part) as last opened or saved. */
  readonly savedFile: MutableRefObject<SavedFile>;
  readonly setHistory: (update: History | ((h: History) => History)) => void;
  /** Changes the present document without an undo step. */
  readonly setDoc: (update: (d: DocumentState) => DocumentState) => void;
  readonly perform: <I>(action: Action<I>, input: I) => void;
  readonly step: (direction: "undo" | "redo") => void;
  readonly changeStudy: (next: StudyPart | null, key: string) => void;
  /** The field changed last: a cross-field problem is shown there (see issuesByPath). */
  readonly lastEdited: string | null;
  readonly title: string;
}

export function useDocumentHistory(): DocumentHistory {
  const [history, setHistory] = useState<History>(() => historyStart(initialDocument()));
  const doc = history.present;
  const savedFile = useRef<SavedFile>({ file: doc.file, study: null });
  const setDoc = useCallback(
    (update: (d: DocumentState) => DocumentState) => setHistory((h) => historyReplace(h, update(h.present))),
    [],
  );
  const docRef = useRef(doc);
  docRef.current = doc;

  const [lastEdited, setLastEdited] = useState<string | null>(null);
  const perform = useCallback(<I>(action: Action<I>, input: I) => {
    const path =
      typeof input === "object" && input !== null && "path" in input ? String((input as { path: unknown }).path) : "";
    setLastEdited(path || null);
    setHistory((h) => historyPush(h, action.perform(h.present, input), `${action.name}:${path}`, Date.now()));
  }, []);
  const step = useCallback((direction: "undo" | "redo") => {
    // A field being edited keeps its own text; let go of it so it shows the restored value.
    const active = document.activeElement;
    if (active instanceof HTMLInputElement || active instanceof HTMLTextAreaElement) active.blur();
    const isSaved = (d: DocumentState) =>
      savedFile.current !== null && d.file === savedFile.current.file && (d.study ?? null) === savedFile.current.study;
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

  // Title and dirty flag to the host (only when they change, not on every keystroke).
  const title = documentName(doc);
  useEffect(() => {
    void host.setDocumentState(doc.dirty, title).catch(logFailure("telling the host the document state"));
  }, [doc.dirty, title]);

  return { history, doc, docRef, savedFile, setHistory, setDoc, perform, step, changeStudy, lastEdited, title };
}
