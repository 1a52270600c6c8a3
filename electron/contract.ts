/**
 * The one IPC contract between the renderer and the main process. Each call is one request and one
 * response, both discriminated unions on `kind`. The preload exposes exactly `BrinefieldHost` on
 * `window.brinefieldHost`; the renderer reaches it only through renderer/platform/host.ts.
 * Main validates every request (sender and payload) before acting. No `any` crosses this boundary.
 */
export const IPC_INVOKE = "brinefield:invoke" as const;
export const IPC_MENU = "brinefield:menu" as const;

export type FileFilter = { readonly name: string; readonly extensions: readonly string[] };

export type HostRequest =
  | { readonly kind: "open-scenario" }
  | { readonly kind: "open-path"; readonly path: string }
  | {
      readonly kind: "save-file";
      readonly path: string | null;
      readonly text: string;
      readonly suggestedName: string;
      readonly filters: readonly FileFilter[];
    }
  | {
      readonly kind: "export-file";
      readonly suggestedName: string;
      readonly text: string;
      readonly filters: readonly FileFilter[];
    }
  | { readonly kind: "print-pdf"; readonly suggestedName: string }
  | { readonly kind: "recent-files" }
  | { readonly kind: "autosave-write"; readonly text: string }
  | { readonly kind: "autosave-read" }
  | { readonly kind: "autosave-clear" }
  | { readonly kind: "set-document-state"; readonly dirty: boolean; readonly title: string };

export type HostResponse =
  | { readonly kind: "opened"; readonly path: string; readonly text: string }
  | { readonly kind: "saved"; readonly path: string }
  | { readonly kind: "cancelled" }
  | { readonly kind: "recent"; readonly paths: readonly string[] }
  | { readonly kind: "autosave"; readonly text: string | null; readonly savedAt: string | null }
  | { readonly kind: "ok" }
  | { readonly kind: "error"; readonly message: string };

/** Menu commands main sends to the renderer (accelerators live in the menu). */
export type MenuCommand =
  | "new"
  | "open"
  /** Sent with the chosen path as the second argument; the renderer answers with `open-path`. */
  | "open-recent"
  | "save"
  | "save-as"
  | "export-report"
  | "export-csv"
  | "print-pdf"
  | "start-view"
  | "reset-view"
  | "units-si"
  | "units-us";

export interface BrinefieldHost {
  invoke(request: HostRequest): Promise<HostResponse>;
  /** `path` is set only for "open-recent" (additive: listeners may ignore it). */
  onMenu(listener: (command: MenuCommand, path?: string) => void): () => void;
  readonly platform: string;
}
