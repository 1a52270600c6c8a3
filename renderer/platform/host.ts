/**
 * The renderer's only door to the platform. In Electron it calls `window.brinefieldHost` (the typed IPC
 * contract in electron/contract.ts); in a plain browser it falls back to a file-input upload, download
 * links and localStorage. Components call these functions and never look at `window.brinefieldHost`.
 */
import { decodeInputBytes, MAX_INPUT_BYTES, tooLargeMessage } from "../../core/scenario/json-text";
import {
  isReplyTo,
  type BrinefieldHost,
  type FileFilter,
  type HostReplyTo,
  type HostRequestKind,
  type HostRequestOf,
  type HostResponse,
  type MenuCommand,
} from "../../electron/contract";

export type { MenuCommand };

export const SCENARIO_FILTERS: readonly FileFilter[] = [{ name: "Brinefield scenario", extensions: ["json"] }];

export interface OpenedFile {
  readonly path: string;
  readonly text: string;
}

export interface AutosaveRecord {
  readonly text: string;
  readonly savedAt: string | null;
}

const WEB_RECENT_KEY = "brinefield.recent";
const WEB_AUTOSAVE_KEY = "brinefield.autosave";
const WEB_RECENT_LIMIT = 8;

function electronHost(): BrinefieldHost | null {
  const candidate = (globalThis as { brinefieldHost?: BrinefieldHost }).brinefieldHost;
  return candidate && typeof candidate.invoke === "function" ? candidate : null;
}

export function isDesktop(): boolean {
  return electronHost() !== null;
}

/** Sends one request; resolves with one of the replies its kind can get, and throws on "error". */
async function invoke<K extends HostRequestKind>(
  request: HostRequestOf<K>,
): Promise<Exclude<HostReplyTo<K>, { kind: "error" }>> {
  const host = electronHost();
  if (!host) throw new Error("No desktop host");
  const response: HostResponse = await host.invoke(request);
  if (response.kind === "error") throw new Error(response.message);
  // The preload checks the pairing too; a reply of another kind is a broken contract, not a cancellation.
  if (!isReplyTo(request.kind, response)) throw new Error(`Unexpected reply “${response.kind}” to “${request.kind}”.`);
  return response as Exclude<HostReplyTo<K>, { kind: "error" }>;
}

// ---- web fallbacks -------------------------------------------------------------------------------

function storage(): Storage | null {
  try {
    return globalThis.localStorage ?? null;
  } catch {
    return null; // storage can be disabled (privacy mode); the app still works without it
  }
}

interface WebRecent {
  readonly name: string;
  readonly text: string;
}

function webRecentList(): WebRecent[] {
  const raw = storage()?.getItem(WEB_RECENT_KEY);
  if (!raw) return [];
  try {
    const parsed: unknown = JSON.parse(raw);
    return Array.isArray(parsed)
      ? parsed.filter((r): r is WebRecent => typeof r?.name === "string" && typeof r?.text === "string")
      : [];
  } catch {
    return [];
  }
}

function rememberWebRecent(name: string, text: string): void {
  const list = [{ name, text }, ...webRecentList().filter((r) => r.name !== name)].slice(0, WEB_RECENT_LIMIT);
  try {
    storage()?.setItem(WEB_RECENT_KEY, JSON.stringify(list));
  } catch {
    // quota exceeded: recent files are a convenience, losing them is harmless
  }
}

/** Largest file read from a drop or the browser's file picker, in bytes: core's one input cap. */
export const MAX_DROPPED_FILE_BYTES = MAX_INPUT_BYTES;

/**
 * Reads a File chosen by the user or dropped on the window by the same rules as the desktop host and
 * the command line: the size cap checked before reading, UTF-8 only (byte-order mark accepted, UTF-16
 * refused with "save as UTF-8"). Nothing is remembered here: the caller calls `rememberOpened` once the
 * text proved to be a scenario, so a stray picture never joins the recent list.
 */
export async function readDroppedFile(file: File): Promise<OpenedFile> {
  if (file.size > MAX_DROPPED_FILE_BYTES) throw new Error(`the file ${tooLargeMessage(file.size)}`);
  const decoded = decodeInputBytes(new Uint8Array(await file.arrayBuffer()));
  if (!decoded.ok) throw new Error(`the file ${decoded.message}`);
  return { path: file.name, text: decoded.value };
}

/**
 * Records a scenario that opened successfully in the browser's recent list. The desktop host keeps its
 * own list of files picked in its dialogs, so there is nothing to do there.
 */
export function rememberOpened(opened: OpenedFile): void {
  if (!isDesktop()) rememberWebRecent(opened.path, opened.text);
}

function pickWebFile(): Promise<OpenedFile | null> {
  return new Promise((resolve) => {
    const input = document.createElement("input");
    input.type = "file";
    input.accept = ".json,application/json";
    input.style.display = "none";
    input.dataset.role = "open-scenario-input";
    input.addEventListener("change", () => {
      const file = input.files?.[0];
      input.remove();
      if (!file) resolve(null);
      else readDroppedFile(file).then(resolve, () => resolve(null));
    });
    input.addEventListener("cancel", () => {
      input.remove();
      resolve(null);
    });
    document.body.appendChild(input);
    input.click();
  });
}

function downloadText(name: string, text: string, mime: string): void {
  const blob = new Blob([text], { type: mime });
  const url = URL.createObjectURL(blob);
  const link = document.createElement("a");
  link.href = url;
  link.download = name;
  link.style.display = "none";
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

// ---- facade --------------------------------------------------------------------------------------

/** Asks the user for a scenario file. Null when they cancel. */
export async function openScenario(): Promise<OpenedFile | null> {
  if (!isDesktop()) return pickWebFile();
  const response = await invoke({ kind: "open-scenario" });
  return response.kind === "opened" ? { path: response.path, text: response.text } : null;
}

/** Opens a recent file by path (desktop) or by name from the browser's recent list. */
export async function openRecent(path: string): Promise<OpenedFile | null> {
  if (!isDesktop()) {
    const hit = webRecentList().find((r) => r.name === path);
    return hit ? { path: hit.name, text: hit.text } : null;
  }
  const response = await invoke({ kind: "open-path", path });
  return response.kind === "opened" ? { path: response.path, text: response.text } : null;
}

/**
 * Saves text to `path`, or asks where when `path` is null (Save As). Returns the saved path, or null when
 * the user cancels. In a browser the file is downloaded under `suggestedName`.
 */
export async function saveScenario(path: string | null, text: string, suggestedName: string): Promise<string | null> {
  if (!isDesktop()) {
    const name = path ?? suggestedName;
    downloadText(name, text, "application/json");
    rememberWebRecent(name, text);
    return name;
  }
  const response = await invoke({ kind: "save-file", path, text, suggestedName, filters: SCENARIO_FILTERS });
  return response.kind === "saved" ? response.path : null;
}

/** Exports a derived file (report HTML, CSV). Returns false when cancelled. */
export async function exportFile(
  suggestedName: string,
  text: string,
  filters: readonly FileFilter[],
): Promise<boolean> {
  if (!isDesktop()) {
    const mime = suggestedName.endsWith(".html")
      ? "text/html"
      : suggestedName.endsWith(".csv")
        ? "text/csv"
        : "text/plain";
    downloadText(suggestedName, text, mime);
    return true;
  }
  const response = await invoke({ kind: "export-file", suggestedName, text, filters });
  return response.kind === "saved";
}

export async function printPdf(suggestedName: string): Promise<void> {
  if (!isDesktop()) {
    window.print();
    return;
  }
  await invoke({ kind: "print-pdf", suggestedName });
}

export async function recentFiles(): Promise<readonly string[]> {
  if (!isDesktop()) return webRecentList().map((r) => r.name);
  const response = await invoke({ kind: "recent-files" });
  return response.kind === "recent" ? response.paths : [];
}

export async function autosaveWrite(text: string): Promise<void> {
  if (!isDesktop()) {
    try {
      storage()?.setItem(WEB_AUTOSAVE_KEY, JSON.stringify({ text, savedAt: new Date().toISOString() }));
    } catch {
      // quota exceeded: autosave is best effort
    }
    return;
  }
  await invoke({ kind: "autosave-write", text });
}

export async function autosaveRead(): Promise<AutosaveRecord | null> {
  if (!isDesktop()) {
    const raw = storage()?.getItem(WEB_AUTOSAVE_KEY);
    if (!raw) return null;
    try {
      const parsed = JSON.parse(raw) as { text?: unknown; savedAt?: unknown };
      return typeof parsed.text === "string"
        ? { text: parsed.text, savedAt: typeof parsed.savedAt === "string" ? parsed.savedAt : null }
        : null;
    } catch {
      return null;
    }
  }
  const response = await invoke({ kind: "autosave-read" });
  return response.kind === "autosave" && response.text !== null
    ? { text: response.text, savedAt: response.savedAt }
    : null;
}

export async function autosaveClear(): Promise<void> {
  if (!isDesktop()) {
    storage()?.removeItem(WEB_AUTOSAVE_KEY);
    return;
  }
  await invoke({ kind: "autosave-clear" });
}

/** Tells the host the title and dirty flag (window title, close prompt). Also sets document.title. */
export async function setDocumentState(dirty: boolean, title: string): Promise<void> {
  document.title = `${dirty ? "• " : ""}${title} — Brinefield`;
  if (isDesktop()) await invoke({ kind: "set-document-state", dirty, title });
}

/** Subscribes to menu commands from the desktop host. Returns an unsubscribe function. */
export function onMenuCommand(listener: (command: MenuCommand, path?: string) => void): () => void {
  const host = electronHost();
  return host ? host.onMenu(listener) : () => {};
}
