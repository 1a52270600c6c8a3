/**
 * Safe file I/O for the main process: atomic writes, size-limited UTF-8 JSON reads, the recent-files
 * list and the autosave slot. Plain Node (fs/promises); no Electron import, so every function here is
 * unit-tested without an Electron binary (tests/electron/fileStore.test.ts).
 *
 * Atomic write: the new bytes go to a temporary file in the same folder, are flushed with fsync, and
 * then renamed over the target. A rename within one folder replaces the directory entry in one step
 * on POSIX and on NTFS, so a crash at any point leaves either the old file or the new one, never half
 * of each (common practice, no source).
 */
import { randomBytes } from "node:crypto";
import { constants as fsConstants } from "node:fs";
import * as fsp from "node:fs/promises";
import { basename, dirname, isAbsolute, join, resolve } from "node:path";

/** Largest scenario file Brinefield opens, saves or autosaves. A scenario is a few kB of JSON. */
export const MAX_SCENARIO_BYTES = 5 * 1024 * 1024;
/** Largest export (report HTML, CSV, PDF) written through the host. */
export const MAX_EXPORT_BYTES = 25 * 1024 * 1024;
/** Length of the recent-files list. */
export const MAX_RECENT_FILES = 10;

export type ReadTextResult =
  | { readonly ok: true; readonly text: string }
  | { readonly ok: false; readonly message: string };

/** "812 kB", "5 MB", "7.3 MB" — decimal-free when whole, for messages. */
export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} kB`;
  const mb = bytes / (1024 * 1024);
  return `${Number.isInteger(mb) ? mb.toFixed(0) : mb.toFixed(1)} MB`;
}

function errorCode(error: unknown): string | undefined {
  return typeof error === "object" && error !== null && "code" in error
    ? String((error as { code: unknown }).code)
    : undefined;
}

/** A one-sentence message for a failed file operation; never a stack trace. */
export function describeFileError(error: unknown, path: string, action: string): string {
  const name = basename(path);
  switch (errorCode(error)) {
    case "ENOENT":
      return `Could not ${action} “${name}”: the file or its folder does not exist.`;
    case "EACCES":
    case "EPERM":
      return `Could not ${action} “${name}”: permission denied.`;
    case "EISDIR":
      return `Could not ${action} “${name}”: it is a folder, not a file.`;
    case "ENOSPC":
      return `Could not ${action} “${name}”: the disk is full.`;
    case "EROFS":
      return `Could not ${action} “${name}”: the disk is read-only.`;
    case "EBUSY":
      return `Could not ${action} “${name}”: the file is in use by another program.`;
    default: {
      const detail = error instanceof Error ? error.message.split("\n")[0] : String(error);
      return `Could not ${action} “${name}”: ${detail}`;
    }
  }
}

export interface AtomicWriteOptions {
  /**
   * Called after the temporary file is written and flushed, just before the rename. Tests use it to
   * simulate a crash at the most dangerous moment; production code leaves it unset.
   */
  readonly beforeRename?: (tempPath: string) => void | Promise<void>;
  /** Platform whose rules apply (directory fsync is skipped on Windows). Defaults to the host's. */
  readonly platform?: NodeJS.Platform;
}

/** Temporary sibling used by `writeFileAtomic`: hidden, unique, same folder as the target. */
export function tempPathFor(targetPath: string): string {
  return join(dirname(targetPath), `.${basename(targetPath)}.${randomBytes(6).toString("hex")}.tmp`);
}

/**
 * Write `data` to `targetPath` atomically (temp file in the same folder → fsync → rename → fsync of
 * the folder). Keeps the permission bits of an existing target. Throws the underlying fs error; the
 * temporary file is removed when the write fails in this process.
 */
export async function writeFileAtomic(
  targetPath: string,
  data: string | Uint8Array,
  options: AtomicWriteOptions = {},
): Promise<void> {
  const platform = options.platform ?? process.platform;
  // Saving through a symlink updates the file it points to rather than replacing the link.
  const target = await fsp.realpath(resolve(targetPath)).catch(() => resolve(targetPath));
  let mode = 0o644;
  try {
    mode = (await fsp.stat(target)).mode & 0o777;
  } catch {
    // No previous file: the default mode applies.
  }
  const temp = tempPathFor(target);
  let handle: fsp.FileHandle | undefined;
  let renamed = false;
  try {
    handle = await fsp.open(temp, fsConstants.O_CREAT | fsConstants.O_EXCL | fsConstants.O_WRONLY, mode);
    await handle.writeFile(data);
    await handle.sync();
    await handle.close();
    handle = undefined;
    if (options.beforeRename) await options.beforeRename(temp);
    await fsp.rename(temp, target);
    renamed = true;
  } finally {
    if (handle) await handle.close().catch(() => undefined);
    if (!renamed) await fsp.rm(temp, { force: true }).catch(() => undefined);
  }
  if (platform !== "win32") {
    // Flush the directory entry too, so the rename itself survives a power cut (POSIX only; Windows
    // cannot open a folder for fsync).
    try {
      const dir = await fsp.open(dirname(target), "r");
      try {
        await dir.sync();
      } finally {
        await dir.close();
      }
    } catch {
      // Some file systems refuse fsync on directories; the data itself is already flushed.
    }
  }
}

export interface ReadJsonOptions {
  readonly maxBytes?: number;
  /** Word used in messages, e.g. "scenario". */
  readonly label?: string;
}

/**
 * Read a UTF-8 JSON text file with a size limit. Returns the text (BOM removed) when it decodes as
 * UTF-8 and parses as JSON; otherwise a readable message. Never throws.
 */
export async function readJsonTextFile(path: string, options: ReadJsonOptions = {}): Promise<ReadTextResult> {
  const maxBytes = options.maxBytes ?? MAX_SCENARIO_BYTES;
  const label = options.label ?? "scenario";
  const name = basename(path);
  let handle: fsp.FileHandle | undefined;
  try {
    handle = await fsp.open(path, "r");
    const info = await handle.stat();
    if (!info.isFile()) return { ok: false, message: `“${name}” is not a regular file.` };
    if (info.size > maxBytes) {
      const limit = formatBytes(maxBytes);
      const message = `“${name}” is ${formatBytes(info.size)}; a ${label} file may be at most ${limit}.`;
      return { ok: false, message };
    }
    // Read at most one byte past the limit, in case the file grows between stat and read.
    const buffer = Buffer.alloc(Math.min(info.size, maxBytes) + 1);
    let length = 0;
    while (length < buffer.length) {
      const { bytesRead } = await handle.read(buffer, length, buffer.length - length, length);
      if (bytesRead === 0) break;
      length += bytesRead;
    }
    if (length > maxBytes) {
      const message = `“${name}” is larger than ${formatBytes(maxBytes)}; it cannot be opened.`;
      return { ok: false, message };
    }
    let text: string;
    try {
      text = new TextDecoder("utf-8", { fatal: true }).decode(buffer.subarray(0, length));
    } catch {
      return { ok: false, message: `“${name}” is not UTF-8 text, so it cannot be a ${label} file.` };
    }
    if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    if (text.trim() === "") return { ok: false, message: `“${name}” is empty.` };
    try {
      JSON.parse(text);
    } catch (error) {
      const detail = error instanceof Error ? error.message.split("\n")[0] : "syntax error";
      return { ok: false, message: `“${name}” is not valid JSON (${detail}).` };
    }
    return { ok: true, text };
  } catch (error) {
    return { ok: false, message: describeFileError(error, path, "open") };
  } finally {
    if (handle) await handle.close().catch(() => undefined);
  }
}

async function pathIsFile(path: string): Promise<boolean> {
  try {
    return (await fsp.stat(path)).isFile();
  } catch {
    return false;
  }
}

/** Same file path? Case-insensitive on Windows and macOS default volumes. */
export function samePath(a: string, b: string, platform: NodeJS.Platform = process.platform): boolean {
  const ra = resolve(a);
  const rb = resolve(b);
  return platform === "win32" || platform === "darwin" ? ra.toLowerCase() === rb.toLowerCase() : ra === rb;
}

export interface RecentFilesStore {
  /** Current list, most recent first; entries whose file no longer exists are pruned (and persisted). */
  list(): Promise<string[]>;
  /** Put `path` at the front (deduplicated, capped) and persist. Returns the new list. */
  add(path: string): Promise<string[]>;
  /** Drop `path` from the list. Returns the new list. */
  remove(path: string): Promise<string[]>;
  clear(): Promise<string[]>;
}

export interface RecentFilesOptions {
  /** JSON file in the app's userData folder. */
  readonly file: string;
  readonly max?: number;
  /** Whether an entry still exists; defaults to "is a regular file". */
  readonly exists?: (path: string) => Promise<boolean>;
  readonly platform?: NodeJS.Platform;
}

/** The recent-files list, persisted as `{ "version": 1, "paths": [...] }`. */
export function createRecentFilesStore(options: RecentFilesOptions): RecentFilesStore {
  const max = options.max ?? MAX_RECENT_FILES;
  const exists = options.exists ?? pathIsFile;
  const platform = options.platform ?? process.platform;
  // Serialise read-modify-write cycles so two quick saves cannot lose an entry.
  let queue: Promise<unknown> = Promise.resolve();
  const serial = <T>(task: () => Promise<T>): Promise<T> => {
    const next = queue.then(task, task);
    queue = next.catch(() => undefined);
    return next;
  };

  async function load(): Promise<string[]> {
    try {
      const parsed: unknown = JSON.parse(await fsp.readFile(options.file, "utf8"));
      const paths = (parsed as { paths?: unknown })?.paths;
      if (!Array.isArray(paths)) return [];
      const clean: string[] = [];
      for (const p of paths) {
        const usable =
          typeof p === "string" && p.length > 0 && p.length <= 4096 && !p.includes("\0") && isAbsolute(p);
        if (!usable) continue;
        if (!clean.some((q) => samePath(q, p, platform))) clean.push(p);
      }
      return clean.slice(0, max);
    } catch {
      // Missing or corrupt list: start empty rather than fail the app.
      return [];
    }
  }

  async function save(paths: string[]): Promise<void> {
    await fsp.mkdir(dirname(options.file), { recursive: true });
    await writeFileAtomic(options.file, `${JSON.stringify({ version: 1, paths }, null, 2)}\n`, { platform });
  }

  async function prune(paths: string[]): Promise<string[]> {
    const checks = await Promise.all(paths.map((p) => exists(p)));
    return paths.filter((_, i) => checks[i]);
  }

  return {
    list: () =>
      serial(async () => {
        const stored = await load();
        const kept = await prune(stored);
        if (kept.length !== stored.length) await save(kept);
        return kept;
      }),
    add: (path) =>
      serial(async () => {
        const full = resolve(path);
        const next = [full, ...(await load()).filter((p) => !samePath(p, full, platform))].slice(0, max);
        await save(next);
        return next;
      }),
    remove: (path) =>
      serial(async () => {
        const next = (await load()).filter((p) => !samePath(p, path, platform));
        await save(next);
        return next;
      }),
    clear: () =>
      serial(async () => {
        await save([]);
        return [];
      }),
  };
}

export interface AutosaveEntry {
  readonly text: string;
  /** ISO 8601 time of the write. */
  readonly savedAt: string;
}

export interface AutosaveStore {
  write(text: string): Promise<AutosaveEntry>;
  /** The stored entry, or null when there is none or it is unreadable. */
  read(): Promise<AutosaveEntry | null>;
  clear(): Promise<void>;
}

export interface AutosaveOptions {
  /** File in the app's userData folder. */
  readonly file: string;
  readonly now?: () => Date;
  readonly maxBytes?: number;
  readonly platform?: NodeJS.Platform;
}

const AUTOSAVE_MAGIC = "BRINEFIELD-AUTOSAVE 1";

/**
 * The autosave slot: one file holding a header line (`BRINEFIELD-AUTOSAVE 1 <ISO time>`) and then the
 * unsaved scenario text verbatim, written atomically so a crash mid-autosave keeps the previous one.
 */
export function createAutosaveStore(options: AutosaveOptions): AutosaveStore {
  const now = options.now ?? (() => new Date());
  const maxBytes = options.maxBytes ?? MAX_SCENARIO_BYTES;
  return {
    async write(text) {
      const bytes = Buffer.byteLength(text, "utf8");
      if (bytes > maxBytes) {
        const limit = formatBytes(maxBytes);
        throw new Error(`Unsaved work is ${formatBytes(bytes)}; autosave keeps at most ${limit}.`);
      }
      const savedAt = now().toISOString();
      await fsp.mkdir(dirname(options.file), { recursive: true });
      const content = `${AUTOSAVE_MAGIC} ${savedAt}\n${text}`;
      await writeFileAtomic(options.file, content, { platform: options.platform });
      return { text, savedAt };
    },
    async read() {
      let raw: Buffer;
      try {
        const info = await fsp.stat(options.file);
        if (!info.isFile() || info.size > maxBytes + 256) return null;
        raw = await fsp.readFile(options.file);
      } catch {
        return null;
      }
      let content: string;
      try {
        content = new TextDecoder("utf-8", { fatal: true }).decode(raw);
      } catch {
        return null;
      }
      const newline = content.indexOf("\n");
      if (newline < 0) return null;
      const header = content.slice(0, newline);
      const match = /^BRINEFIELD-AUTOSAVE 1 (\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(?:\.\d+)?Z)$/.exec(header);
      if (!match || Number.isNaN(Date.parse(match[1]))) return null;
      return { text: content.slice(newline + 1), savedAt: match[1] };
    },
    async clear() {
      await fsp.rm(options.file, { force: true });
    },
  };
}
