/**
 * Reading an input file on the Node side, the same way for the command line and the desktop app:
 * regular files only (a folder, a pipe, a device such as /dev/zero are refused without being read, so
 * nothing hangs), the size cap checked before reading, a bounded read, then the bytes decoded by core's
 * pure rules (UTF-8 with or without a byte-order mark; UTF-16 refused). JSON parsing is core's too
 * (`parseJsonText`); this module only fetches the text.
 */
import { closeSync, constants as fsConstants, fstatSync, openSync, readSync, statSync, type Stats } from "node:fs";
import * as fsp from "node:fs/promises";
import { decodeInputBytes, MAX_INPUT_BYTES, tooLargeMessage } from "../../scenario/json-text";

export { MAX_INPUT_BYTES };

/** Device and inode of a file: how an output is recognised as one of the inputs. */
export interface FileIdentity {
  readonly dev: number;
  readonly ino: number;
}

export type ReadInputOutcome =
  | { readonly ok: true; readonly text: string; readonly identity: FileIdentity }
  /** `message` starts with a verb phrase ("is a folder, …"); the caller puts the file's name in front. */
  | { readonly ok: false; readonly message: string };

export interface ReadInputOptions {
  readonly maxBytes?: number;
}

/** Why a file that exists is not readable as input, or null for a regular file. */
export function notRegularFileReason(st: Stats): string | null {
  if (st.isFile()) return null;
  if (st.isDirectory()) return "is a folder, not a file";
  if (st.isFIFO()) return "is a pipe, not a regular file; Brinefield reads regular files only";
  if (st.isSocket()) return "is a socket, not a regular file; Brinefield reads regular files only";
  if (st.isCharacterDevice() || st.isBlockDevice())
    return "is a device, not a regular file; Brinefield reads regular files only";
  return "is not a regular file";
}

/** A readable reason for a failed fs call, without the file name (the caller adds it). */
export function fsErrorReason(err: unknown): string {
  const code = typeof err === "object" && err !== null && "code" in err ? String((err as { code: unknown }).code) : "";
  switch (code) {
    case "ENOENT":
      return "no such file";
    case "EACCES":
    case "EPERM":
      return "permission denied";
    case "EISDIR":
      return "is a folder, not a file";
    case "ENOSPC":
      return "the disk is full";
    case "EROFS":
      return "the disk is read-only";
    case "ELOOP":
      return "too many symbolic links";
    case "ENAMETOOLONG":
      return "the name is too long";
    case "ENOTDIR":
      return "a part of the path is not a folder";
    default:
      return err instanceof Error ? err.message.split("\n")[0]! : String(err);
  }
}

// O_NONBLOCK: opening a FIFO with no writer would otherwise wait for ever; on a regular file it changes
// nothing. O_NOCTTY: a terminal device never becomes our controlling terminal.
const OPEN_FLAGS = fsConstants.O_RDONLY | (fsConstants.O_NONBLOCK ?? 0) | (fsConstants.O_NOCTTY ?? 0);

/** The refusal of a file that is not a regular file or is larger than `max` bytes; null when it may be read. */
function refusal(st: Stats, max: number): ReadInputOutcome | null {
  const reason = notRegularFileReason(st);
  if (reason) return { ok: false, message: reason };
  if (st.size > max) return { ok: false, message: tooLargeMessage(st.size, max) };
  return null;
}

function finish(bytes: Uint8Array, st: Stats, max: number): ReadInputOutcome {
  if (bytes.length > max) return { ok: false, message: tooLargeMessage(bytes.length, max) };
  const decoded = decodeInputBytes(bytes, max);
  if (!decoded.ok) return { ok: false, message: decoded.message };
  return { ok: true, text: decoded.value, identity: { dev: st.dev, ino: st.ino } };
}

/** Reads an input file synchronously (the command line). Never throws. */
export function readInputFileSync(path: string, options: ReadInputOptions = {}): ReadInputOutcome {
  const max = options.maxBytes ?? MAX_INPUT_BYTES;
  let fd: number | undefined;
  try {
    // stat first so a FIFO or device is refused before it is even opened.
    const pre = statSync(path);
    const preReason = refusal(pre, max);
    if (preReason) return preReason;
    fd = openSync(path, OPEN_FLAGS);
    const st = fstatSync(fd); // the file actually opened (it may have been swapped since the stat)
    const reason = refusal(st, max);
    if (reason) return reason;
    // Read at most one byte past the cap, in case the file grows while it is read.
    const buffer = Buffer.alloc(Math.min(st.size, max) + 1);
    let length = 0;
    while (length < buffer.length) {
      const n = readSync(fd, buffer, length, buffer.length - length, length);
      if (n === 0) break;
      length += n;
    }
    return finish(buffer.subarray(0, length), st, max);
  } catch (err) {
    return { ok: false, message: `cannot be read (${fsErrorReason(err)})` };
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

/** Reads an input file asynchronously (the desktop app's main process). Never throws. */
export async function readInputFile(path: string, options: ReadInputOptions = {}): Promise<ReadInputOutcome> {
  const max = options.maxBytes ?? MAX_INPUT_BYTES;
  let handle: fsp.FileHandle | undefined;
  try {
    const pre = await fsp.stat(path);
    const preReason = refusal(pre, max);
    if (preReason) return preReason;
    handle = await fsp.open(path, OPEN_FLAGS);
    const st = await handle.stat();
    const reason = refusal(st, max);
    if (reason) return reason;
    const buffer = Buffer.alloc(Math.min(st.size, max) + 1);
    let length = 0;
    while (length < buffer.length) {
      const { bytesRead } = await handle.read(buffer, length, buffer.length - length, length);
      if (bytesRead === 0) break;
      length += bytesRead;
    }
    return finish(buffer.subarray(0, length), st, max);
  } catch (err) {
    return { ok: false, message: `cannot be read (${fsErrorReason(err)})` };
  } finally {
    if (handle) await handle.close().catch(() => undefined);
  }
}
