/**
 * The one writer for every file Brinefield writes (the desktop app's saves and exports, the command
 * line's reports, CSV, JSON and PDF).
 *
 * Atomic write: the new bytes go to a temporary file in the same folder, created exclusively under a
 * random name (O_CREAT | O_EXCL, so a planted file or symlink of that name makes the write fail instead
 * of being followed), flushed with fsync, given the permission bits of the file they replace, and then
 * renamed over the target. A rename within one folder replaces the directory entry in one step on POSIX
 * and on NTFS, so a crash at any point leaves either the old file or the new one, never half of each
 * (common practice, no source). A failed write removes its temporary file.
 *
 * Refused outputs: anything that exists and is not a regular file (a folder, a device such as /dev/full,
 * a pipe) — a device node is never replaced; a file that is one of the command's inputs (same device and
 * inode, so hard links and other spellings of the path count too); a symbolic link to a missing file.
 * A symbolic link to a regular file is written through: the file it points to gets the new bytes and the
 * link itself stays a link.
 */
import { randomBytes } from "node:crypto";
import { constants as fsConstants, type Stats } from "node:fs";
import * as fsp from "node:fs/promises";
import { basename, dirname, join, resolve } from "node:path";
import { notRegularFileReason, type FileIdentity } from "./read-input";

export interface AtomicWriteOptions {
  /**
   * Called after the temporary file is written and flushed, just before the rename. Tests use it to
   * simulate a crash at the most dangerous moment; production code leaves it unset.
   */
  readonly beforeRename?: (tempPath: string) => void | Promise<void>;
  /** Platform whose rules apply (directory fsync is skipped on Windows). Defaults to the host's. */
  readonly platform?: NodeJS.Platform;
  /** Files that must not be overwritten (the inputs of the command that writes). */
  readonly notOneOf?: readonly FileIdentity[];
}

/** A write refused before anything was touched; `message` reads after the file's name. */
export class OutputRefusedError extends Error {
  readonly code = "EBRINEFIELD_REFUSED";
  constructor(message: string) {
    super(message);
    this.name = "OutputRefusedError";
  }
}

/** Temporary sibling used by `writeFileAtomic`: hidden, random, same folder as the target. */
export function tempPathFor(targetPath: string): string {
  return join(dirname(targetPath), `.${basename(targetPath)}.${randomBytes(8).toString("hex")}.tmp`);
}

function isMissing(err: unknown): boolean {
  return typeof err === "object" && err !== null && (err as { code?: unknown }).code === "ENOENT";
}

/** The file the bytes will land in, and what is there now (null: nothing yet). Throws when refused. */
async function resolveTarget(
  targetPath: string,
  notOneOf: readonly FileIdentity[],
): Promise<{ target: string; existing: Stats | null }> {
  const requested = resolve(targetPath);
  let target = requested;
  let link: Stats | null = null;
  try {
    link = await fsp.lstat(requested);
  } catch (err) {
    if (!isMissing(err)) throw err;
  }
  if (link?.isSymbolicLink()) {
    try {
      target = await fsp.realpath(requested);
    } catch {
      throw new OutputRefusedError("is a symbolic link to a missing file; give the file itself");
    }
  }
  let existing: Stats | null = null;
  try {
    existing = await fsp.stat(target);
  } catch (err) {
    if (!isMissing(err)) throw err;
  }
  if (existing) {
    const reason = notRegularFileReason(existing);
    if (reason) throw new OutputRefusedError(`${reason}; Brinefield writes regular files only`);
    if (notOneOf.some((id) => id.dev === existing!.dev && id.ino === existing!.ino)) {
      throw new OutputRefusedError("is one of this command's input files; choose another output file");
    }
  }
  return { target, existing };
}

/**
 * Write `data` to `targetPath` atomically (see the module comment). Keeps the permission bits of an
 * existing target. Throws the underlying fs error or an `OutputRefusedError`; leaves nothing behind
 * when it fails in this process.
 */
export async function writeFileAtomic(
  targetPath: string,
  data: string | Uint8Array,
  options: AtomicWriteOptions = {},
): Promise<void> {
  const platform = options.platform ?? process.platform;
  const { target, existing } = await resolveTarget(targetPath, options.notOneOf ?? []);
  const temp = tempPathFor(target);
  let handle: fsp.FileHandle | undefined;
  let created = false;
  let renamed = false;
  try {
    // 0o666 less the umask for a new file, as any program creates files; an existing file's bits are
    // set exactly below (the umask would otherwise narrow them).
    handle = await fsp.open(
      temp,
      fsConstants.O_CREAT | fsConstants.O_EXCL | fsConstants.O_WRONLY,
      existing ? 0o600 : 0o666,
    );
    created = true;
    await handle.writeFile(data);
    if (existing && platform !== "win32") await handle.chmod(existing.mode & 0o777);
    await handle.sync();
    await handle.close();
    handle = undefined;
    if (options.beforeRename) await options.beforeRename(temp);
    await fsp.rename(temp, target);
    renamed = true;
  } finally {
    if (handle) await handle.close().catch(() => undefined);
    if (created && !renamed) await fsp.rm(temp, { force: true }).catch(() => undefined);
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
