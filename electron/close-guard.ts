/**
 * The unsaved-changes prompt on window close, as a small state machine with the dialog and the window
 * injected (tests/electron/close-guard.test.ts). The renderer reports dirtiness through the
 * `set-document-state` request; main asks before closing a dirty window:
 *   Save → the renderer is told to save; the window closes once that save succeeds (stays open if the
 *          save is cancelled or fails);
 *   Don't Save → the autosave slot is cleared and the window closes;
 *   Cancel → nothing happens.
 */
import type { HostResponse } from "./contract";

export type CloseChoice = "save" | "discard" | "cancel";

export interface CloseGuardDeps {
  /** Show the three-button question; `title` is the document's title. */
  confirm(title: string): Promise<CloseChoice>;
  /** Ask the renderer to save (sends the "save" menu command). */
  requestSave(): void;
  /** Close the window for real (main defers it to the next tick). */
  closeWindow(): void;
  /** Run when the user discards changes (clears the autosave slot). */
  onDiscard?(): void | Promise<void>;
}

export interface CloseGuard {
  setDocumentState(state: { dirty: boolean; title: string }): void;
  /** Call from the window's "close" event: true lets it close, false means preventDefault(). */
  onCloseRequested(): boolean;
  onSaveResult(response: HostResponse): void;
  /** Forget everything (a new window was opened, e.g. on macOS after the last one closed). */
  reset(): void;
  readonly dirty: boolean;
}

export function createCloseGuard(deps: CloseGuardDeps): CloseGuard {
  let dirty = false;
  let title = "";
  let prompting = false;
  let closeAfterSave = false;
  let closing = false;

  const closeNow = () => {
    closing = true;
    deps.closeWindow();
  };

  return {
    get dirty() {
      return dirty;
    },
    setDocumentState(state) {
      dirty = state.dirty;
      title = state.title;
    },
    onCloseRequested() {
      if (closing || !dirty) return true;
      if (prompting) return false;
      prompting = true;
      deps
        .confirm(title)
        .catch((): CloseChoice => "cancel")
        .then(async (choice) => {
          prompting = false;
          if (choice === "save") {
            closeAfterSave = true;
            deps.requestSave();
          } else if (choice === "discard") {
            try {
              await deps.onDiscard?.();
            } finally {
              closeNow();
            }
          }
        });
      return false;
    },
    reset() {
      dirty = false;
      title = "";
      prompting = false;
      closeAfterSave = false;
      closing = false;
    },
    onSaveResult(response) {
      if (!closeAfterSave) return;
      closeAfterSave = false;
      if (response.kind === "saved") closeNow();
    },
  };
}
