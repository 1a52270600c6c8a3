/**
 * Safe file I/O for the main process: atomic writes, size-limited UTF-8 JSON reads, the recent-files
 * list and the autosave slot. Plain Node (fs/promises); no Electron import, so every function here is
 * unit-tested without an Electron binary (tests/electron/file-store.test.ts).
 *
 * The reader and the atomic writer are the shared ones of core/cli/node/ (also used by the command line), so
 * the app and the command line accept, refuse and write files by the same rules.
 */
import * as fsp from "node:fs/promises";
import { basename, dirname, isAbsolute, resolve } from "node:path";
import { formatByteSize, MAX_INPUT_BYTES, parseJsonText, readInputFile, writeFileAtomic } from "../core/cli/node";

export { writeFileAtomic, tempPathFor, OutputRefusedError } from "../core/cli/node";
export type { AtomicWriteOptions } from "../core/cli/node";

/** Largest scenario file Brinefield opens, saves or autosaves: the one input cap of every reader. */
export const MAX_SCENARIO_BYTES = MAX_INPUT_BYTES;
/** Largest export (report HTML, CSV, PDF) written through the host. */
export const MAX_EXPORT_BYTES = 25 * 1024 * 1024;
/** Length of the recent-files list. */
export const MAX_RECENT_FILES = 10;

export type ReadTextResult =
  { readonly ok: true; readonly text: string } | { readonly ok: false; readonly message: string };

/** "812 kB", "5 MB", "7.3 MB" — decimal-free when whole, for messages. */
export const formatBytes = formatByteSize;

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
  const read = await readInputFile(path, { maxBytes });
  if (!read.ok) {
    if (/^cannot be read \(no such file\)/.test(read.message)) {
      return { ok: false, message: `Could not open “${name}”: the file or its folder does not exist.` };
    }
    return {
      ok: false,
      message: `“${name}” ${read.message} (a ${label} file is UTF-8 JSON of at most ${formatBytes(maxBytes)}).`,
    };
  }
  if (read.text.trim() === "") return { ok: false, message: `“${name}” is empty.` };
  const json = parseJsonText(read.text, maxBytes);
  if (!json.ok) return { ok: false, message: `“${name}” ${json.message}.` };
  return { ok: true, text: read.text };
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
        const usable = typeof p === "string" && p.length > 0 && p.length <= 4096 && !p.includes("\0") && isAbsolute(p);
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
