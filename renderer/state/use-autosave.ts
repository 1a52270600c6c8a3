/**
 * Autosave: unsaved work is written every few seconds while it changes, an autosave left by an earlier
 * session is offered for recovery on start, and the browser asks before a page with unsaved work closes.
 * A failed autosave reaches the user's status line: their unsaved work is not backed up.
 */
import { useCallback, useEffect, useState, type MutableRefObject } from "react";
import * as host from "../platform/host";
import { errorText, logFailure } from "../platform/log-failure";
import type { DocumentState } from "./scenario-state";
import { serialiseDocument } from "./study-document";

export const AUTOSAVE_INTERVAL_MS = 5000;

export function useAutosave(docRef: MutableRefObject<DocumentState>, flash: (message: string) => void) {
  const [recovery, setRecovery] = useState<host.AutosaveRecord | null>(null);

  /** Autosave failures reach the user: their unsaved work is not backed up. */
  const autosaveFailed = useCallback(
    (error: unknown) =>
      flash(`Autosave failed (${errorText(error)}): unsaved work is not backed up until you save it.`),
    [flash],
  );

  // Offer recovery on start.
  useEffect(() => {
    void host
      .autosaveRead()
      .then((record) => {
        if (record && record.text.trim() !== "") setRecovery(record);
      })
      .catch(logFailure("reading the autosave"));
  }, []);
  // Autosave while dirty.
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
  }, [docRef, autosaveFailed]);
  useEffect(() => {
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      if (docRef.current.dirty && !host.isDesktop()) event.preventDefault();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => window.removeEventListener("beforeunload", onBeforeUnload);
  }, [docRef]);

  /** Drops the autosave the user chose not to recover. */
  const discardRecovery = useCallback(() => {
    void host.autosaveClear().catch(logFailure("clearing the autosave"));
    setRecovery(null);
  }, []);

  return { recovery, setRecovery, discardRecovery, autosaveFailed };
}
