/**
 * What main does for each `HostRequest`, with every Electron API injected so the logic runs in unit
 * tests (tests/electron/handlers.test.ts). `handle()` never throws: a bad sender, a malformed payload
 * or a failed file operation all become `{ kind: "error", message }`.
 *
 * Path policy: main reads or overwrites only files the user chose in a native dialog during this
 * session or that are on the recent-files list. A renderer that asks for any other path gets an error
 * (open) or a Save dialog (save), so a compromised page cannot read or clobber arbitrary files.
 */
import { dirname, extname, isAbsolute, join, resolve } from "node:path";
import { isReplyTo, type FileFilter, type HostRequest, type HostRequestOf, type HostResponse } from "./contract";
import {
  MAX_SCENARIO_BYTES,
  type AutosaveStore,
  type RecentFilesStore,
  describeFileError,
  readJsonTextFile,
  samePath,
  writeFileAtomic,
} from "./file-store";
import { parseHostRequest } from "./request-schema";
import { isAppUrl } from "./app-protocol";

/** Who sent an IPC message, reduced to plain values by main.ts. */
export interface IpcSender {
  /** `event.sender.id`. */
  readonly webContentsId: number;
  /** `event.senderFrame.url` (empty when the frame is gone). */
  readonly frameUrl: string;
  /** Whether the sending frame is the top-level frame of its page. */
  readonly isMainFrame: boolean;
}

export interface TrustedRenderer {
  /** The main window's `webContents.id`, or null before the window exists. */
  readonly webContentsId: number | null;
  /** URL of the page the window shows, `brinefield://app/index.html` (APP_INDEX_URL). */
  readonly indexUrl: string;
}

/** Accept only the main window's top frame showing our own index.html on the app's scheme. */
export function isTrustedSender(sender: IpcSender, trusted: TrustedRenderer): boolean {
  if (trusted.webContentsId === null || sender.webContentsId !== trusted.webContentsId) return false;
  if (!sender.isMainFrame) return false;
  if (!isAppUrl(sender.frameUrl) || !isAppUrl(trusted.indexUrl)) return false;
  const actual = new URL(sender.frameUrl);
  const expected = new URL(trusted.indexUrl);
  // Query and hash are the renderer's own state; scheme, host, port and path must match exactly.
  try {
    return (
      actual.port === "" &&
      expected.port === "" &&
      decodeURIComponent(actual.pathname) === decodeURIComponent(expected.pathname)
    );
  } catch {
    return false; // malformed percent-escape
  }
}

export interface SaveDialogOptions {
  readonly title: string;
  readonly defaultPath: string;
  readonly filters: readonly FileFilter[];
}

export interface HostHandlerDeps {
  trustedRenderer(): TrustedRenderer;
  /** Native Open dialog for scenarios; resolves to the chosen path or null when cancelled. */
  showOpenDialog(options: {
    title: string;
    defaultPath: string;
    filters: readonly FileFilter[];
  }): Promise<string | null>;
  /** Native Save dialog; resolves to the chosen path or null when cancelled. */
  showSaveDialog(options: SaveDialogOptions): Promise<string | null>;
  /** `webContents.printToPDF` of the main window. */
  printToPdf(): Promise<Uint8Array>;
  readonly recent: RecentFilesStore;
  readonly autosave: AutosaveStore;
  /** Folder dialogs start in before the user has picked one (the Documents folder). */
  readonly documentsDir: string;
  setDocumentState(state: { dirty: boolean; title: string }): void;
  /** Called after the recent list changed (main rebuilds the Open Recent menu). */
  onRecentChanged?(paths: readonly string[]): void;
  /** Called with the result of every save-file request (the close guard listens). */
  onSaveResult?(response: HostResponse): void;
  /** Diagnostics for rejected requests; defaults to nothing. */
  log?(message: string): void;
  readonly platform?: NodeJS.Platform;
}

export interface HostHandlers {
  handle(sender: IpcSender, payload: unknown): Promise<HostResponse>;
  /** Allow main to read/write `path` (the user picked it, e.g. from the Open Recent menu). */
  grantPath(path: string): void;
  isGranted(path: string): Promise<boolean>;
}

export const SCENARIO_FILTERS: readonly FileFilter[] = [
  { name: "Brinefield scenario", extensions: ["json"] },
  { name: "All files", extensions: ["*"] },
];

/**
 * Linux save dialogs do not add the filter's extension; add it when the chosen name has none and the
 * first filter names exactly one concrete extension.
 */
export function ensureExtension(path: string, filters: readonly FileFilter[]): string {
  if (extname(path) !== "") return path;
  const first = filters[0]?.extensions;
  if (!first || first.length !== 1 || first[0] === "*") return path;
  return `${path}.${first[0]}`;
}

/** What the per-request handlers share: the dependencies, the granted paths and the last folder used. */
interface HandlerSession {
  readonly deps: HostHandlerDeps;
  grantPath(path: string): void;
  isGranted(path: string): Promise<boolean>;
  rememberRecent(path: string): Promise<void>;
  /** Folder the next dialog starts in. */
  startDir(): string;
  setLastDir(dir: string): void;
  openPath(path: string): Promise<HostResponse>;
  writeTo(path: string, data: string | Uint8Array): Promise<HostResponse>;
}

function firstLine(error: unknown): string {
  return error instanceof Error ? error.message.split("\n")[0] : String(error);
}

async function openScenario(s: HandlerSession): Promise<HostResponse> {
  const path = await s.deps.showOpenDialog({
    title: "Open scenario",
    defaultPath: s.startDir(),
    filters: SCENARIO_FILTERS,
  });
  return path === null ? { kind: "cancelled" } : s.openPath(path);
}

async function openGrantedPath(s: HandlerSession, request: HostRequestOf<"open-path">): Promise<HostResponse> {
  if (!(await s.isGranted(request.path))) {
    const message = "That file was not chosen in an Open dialog or from the recent files.";
    return { kind: "error", message };
  }
  const response = await s.openPath(request.path);
  if (response.kind === "error") {
    // A recent entry that no longer opens is dropped from the list.
    try {
      s.deps.onRecentChanged?.(await s.deps.recent.list());
    } catch {
      // Listing is best effort here.
    }
  }
  return response;
}

async function saveFile(s: HandlerSession, request: HostRequestOf<"save-file">): Promise<HostResponse> {
  const known = request.path !== null && isAbsolute(request.path) && (await s.isGranted(request.path));
  let target = known && request.path !== null ? resolve(request.path) : null;
  if (target === null) {
    // Unknown or bare-name paths only suggest a name; the user picks the folder.
    const bare = request.path !== null && !isAbsolute(request.path);
    const name = bare && request.path !== null ? request.path : request.suggestedName;
    const filters = request.filters.length > 0 ? request.filters : SCENARIO_FILTERS;
    const chosen = await s.deps.showSaveDialog({
      title: "Save scenario",
      defaultPath: join(s.startDir(), name),
      filters,
    });
    if (chosen === null) return { kind: "cancelled" };
    target = ensureExtension(resolve(chosen), filters);
  }
  const response = await s.writeTo(target, request.text);
  if (response.kind === "saved") {
    s.grantPath(target);
    await s.rememberRecent(target);
  }
  return response;
}

async function exportFile(s: HandlerSession, request: HostRequestOf<"export-file">): Promise<HostResponse> {
  const chosen = await s.deps.showSaveDialog({
    title: "Export",
    defaultPath: join(s.startDir(), request.suggestedName),
    filters: request.filters,
  });
  if (chosen === null) return { kind: "cancelled" };
  const target = ensureExtension(resolve(chosen), request.filters);
  const response = await s.writeTo(target, request.text);
  if (response.kind === "saved") s.setLastDir(dirname(target));
  return response;
}

async function printPdf(s: HandlerSession, request: HostRequestOf<"print-pdf">): Promise<HostResponse> {
  const pdfFilters: FileFilter[] = [{ name: "PDF document", extensions: ["pdf"] }];
  const suggested = request.suggestedName;
  const name = extname(suggested).toLowerCase() === ".pdf" ? suggested : `${suggested}.pdf`;
  const chosen = await s.deps.showSaveDialog({
    title: "Print to PDF",
    defaultPath: join(s.startDir(), name),
    filters: pdfFilters,
  });
  if (chosen === null) return { kind: "cancelled" };
  const target = ensureExtension(resolve(chosen), pdfFilters);
  let pdf: Uint8Array;
  try {
    pdf = await s.deps.printToPdf();
  } catch (error) {
    return { kind: "error", message: `Could not print to PDF: ${firstLine(error)}` };
  }
  const response = await s.writeTo(target, pdf);
  if (response.kind === "saved") s.setLastDir(dirname(target));
  return response;
}

async function autosaveWrite(s: HandlerSession, request: HostRequestOf<"autosave-write">): Promise<HostResponse> {
  try {
    await s.deps.autosave.write(request.text);
    return { kind: "ok" };
  } catch (error) {
    return { kind: "error", message: `Autosave failed: ${firstLine(error)}` };
  }
}

async function dispatch(s: HandlerSession, request: HostRequest): Promise<HostResponse> {
  const { deps } = s;
  switch (request.kind) {
    case "open-scenario":
      return openScenario(s);
    case "open-path":
      return openGrantedPath(s, request);
    case "save-file":
      return saveFile(s, request);
    case "export-file":
      return exportFile(s, request);
    case "print-pdf":
      return printPdf(s, request);
    case "recent-files":
      return { kind: "recent", paths: await deps.recent.list() };
    case "autosave-write":
      return autosaveWrite(s, request);
    case "autosave-read": {
      const entry = await deps.autosave.read();
      return { kind: "autosave", text: entry?.text ?? null, savedAt: entry?.savedAt ?? null };
    }
    case "autosave-clear":
      await deps.autosave.clear();
      return { kind: "ok" };
    case "set-document-state":
      deps.setDocumentState({ dirty: request.dirty, title: request.title });
      return { kind: "ok" };
  }
}

function createSession(
  deps: HostHandlerDeps,
  platform: NodeJS.Platform,
  log: (message: string) => void,
): HandlerSession {
  const granted: string[] = [];
  let lastDir: string | null = null;

  const grantPath = (path: string) => {
    const full = resolve(path);
    if (!granted.some((p) => samePath(p, full, platform))) granted.push(full);
    lastDir = dirname(full);
  };

  async function isGranted(path: string): Promise<boolean> {
    if (granted.some((p) => samePath(p, path, platform))) return true;
    const recent = await deps.recent.list();
    return recent.some((p) => samePath(p, path, platform));
  }

  async function rememberRecent(path: string): Promise<void> {
    try {
      const paths = await deps.recent.add(path);
      deps.onRecentChanged?.(paths);
    } catch (error) {
      // The file itself is fine; a broken recent list must not turn a good open/save into an error.
      log(`recent-files update failed: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  async function openPath(path: string): Promise<HostResponse> {
    const read = await readJsonTextFile(path, { maxBytes: MAX_SCENARIO_BYTES, label: "scenario" });
    if (!read.ok) return { kind: "error", message: read.message };
    grantPath(path);
    await rememberRecent(path);
    return { kind: "opened", path: resolve(path), text: read.text };
  }

  async function writeTo(path: string, data: string | Uint8Array): Promise<HostResponse> {
    try {
      await writeFileAtomic(path, data, { platform });
      return { kind: "saved", path };
    } catch (error) {
      return { kind: "error", message: describeFileError(error, path, "save") };
    }
  }

  return {
    deps,
    grantPath,
    isGranted,
    rememberRecent,
    startDir: () => lastDir ?? deps.documentsDir,
    setLastDir: (dir) => {
      lastDir = dir;
    },
    openPath,
    writeTo,
  };
}

export function createHostHandlers(deps: HostHandlerDeps): HostHandlers {
  const platform = deps.platform ?? process.platform;
  const log = deps.log ?? (() => undefined);
  const session = createSession(deps, platform, log);

  return {
    grantPath: session.grantPath,
    isGranted: session.isGranted,
    async handle(sender, payload) {
      if (!isTrustedSender(sender, deps.trustedRenderer())) {
        log(`rejected IPC from untrusted sender ${sender.frameUrl.slice(0, 200)}`);
        const message = "Rejected host request: it did not come from the Brinefield window.";
        return { kind: "error", message };
      }
      const parsed = parseHostRequest(payload);
      if (!parsed.ok) {
        log(parsed.message);
        return { kind: "error", message: parsed.message };
      }
      let response: HostResponse;
      try {
        response = await dispatch(session, parsed.request);
      } catch (error) {
        const message = `The app could not complete “${parsed.request.kind}”: ${firstLine(error)}`;
        response = { kind: "error", message };
      }
      const replyKind: string = response.kind;
      if (!isReplyTo(parsed.request.kind, response)) {
        log(`reply "${replyKind}" does not answer "${parsed.request.kind}"`);
        response = { kind: "error", message: `The app gave no valid reply to “${parsed.request.kind}”.` };
      }
      if (parsed.request.kind === "save-file") deps.onSaveResult?.(response);
      return response;
    },
  };
}
