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

type Reply<K extends HostResponse["kind"]> = Extract<HostResponse, { kind: K }>;

/**
 * Each request kind paired with the replies main sends to it. Any request may also be answered with
 * `{kind: "error"}`; any other reply is a broken contract, reported as an error on both sides (never
 * read as "cancelled").
 */
export const HOST_REPLY_KINDS = {
  "open-scenario": ["opened", "cancelled"],
  "open-path": ["opened"],
  "save-file": ["saved", "cancelled"],
  "export-file": ["saved", "cancelled"],
  "print-pdf": ["saved", "cancelled"],
  "recent-files": ["recent"],
  "autosave-write": ["ok"],
  "autosave-read": ["autosave"],
  "autosave-clear": ["ok"],
  "set-document-state": ["ok"],
} as const satisfies { readonly [K in HostRequest["kind"]]: readonly HostResponse["kind"][] };

export type HostRequestKind = HostRequest["kind"];
/** The request of one kind. */
export type HostRequestOf<K extends HostRequestKind> = Extract<HostRequest, { kind: K }>;
/** The replies a request of kind K can get, "error" included. */
export type HostReplyTo<K extends HostRequestKind> = Reply<(typeof HOST_REPLY_KINDS)[K][number]> | Reply<"error">;

/** True when `response` is one of the replies a request of kind `kind` can get. */
export function isReplyTo<K extends HostRequestKind>(kind: K, response: HostResponse): response is HostReplyTo<K> {
  return response.kind === "error" || (HOST_REPLY_KINDS[kind] as readonly string[]).includes(response.kind);
}

export interface BrinefieldHost {
  invoke<K extends HostRequestKind>(request: HostRequestOf<K>): Promise<HostReplyTo<K>>;
  /** `path` is set only for "open-recent" (additive: listeners may ignore it). */
  onMenu(listener: (command: MenuCommand, path?: string) => void): () => void;
  readonly platform: string;
}
