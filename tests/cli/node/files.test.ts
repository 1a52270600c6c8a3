/** The one reader and the one writer of every Brinefield file (core/cli/node/): what they refuse and keep. */
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import {
  chmodSync,
  lstatSync,
  mkdtempSync,
  readFileSync,
  readdirSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { readInputFile, readInputFileSync, writeFileAtomic } from "../../../core/cli/node";

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), "brinefield-nodeio-"));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe("readInputFileSync() and readInputFile()", () => {
  it("read a regular UTF-8 file with its byte-order mark removed, both ways alike", async () => {
    writeFileSync(join(dir, "a.json"), "\ufeff{}");
    const sync = readInputFileSync(join(dir, "a.json"));
    const async_ = await readInputFile(join(dir, "a.json"));
    expect(sync.ok && sync.text, "sync").toBe("{}");
    expect(async_.ok && async_.text, "async").toBe("{}");
  });
  it("refuse a FIFO and a device without blocking, and a folder", async () => {
    const fifo = join(dir, "p");
    if (spawnSync("mkfifo", [fifo]).status === 0) {
      const r = readInputFileSync(fifo);
      expect(!r.ok && r.message, "FIFO").toMatch(/is a pipe/);
      const a = await readInputFile(fifo);
      expect(!a.ok && a.message, "FIFO async").toMatch(/is a pipe/);
    }
    expect(((r) => !r.ok && r.message)(readInputFileSync("/dev/zero")), "/dev/zero").toMatch(/is a device/);
    expect(((r) => !r.ok && r.message)(readInputFileSync(dir)), "folder").toMatch(/is a folder/);
  });
  it("checks the size cap before reading", () => {
    writeFileSync(join(dir, "big.json"), "x".repeat(2048));
    const r = readInputFileSync(join(dir, "big.json"), { maxBytes: 1024 });
    expect(!r.ok && r.message, "too large").toMatch(/is 2 kB, larger than the 1 kB Brinefield reads; refused unread/);
  });
});

describe("writeFileAtomic()", () => {
  it("refuses to replace a device node, a folder or a link to nothing, leaving nothing behind", async () => {
    await expect(writeFileAtomic("/dev/null", "x"), "device").rejects.toThrow(/is a device/);
    expect(statSync("/dev/null").isCharacterDevice(), "still a device").toBe(true);
    await expect(writeFileAtomic(dir, "x"), "folder").rejects.toThrow(/is a folder/);
    symlinkSync(join(dir, "nowhere"), join(dir, "dangling"));
    await expect(writeFileAtomic(join(dir, "dangling"), "x"), "dangling link").rejects.toThrow(
      /symbolic link to a missing file/,
    );
    expect(lstatSync(join(dir, "dangling")).isSymbolicLink(), "link left as it was").toBe(true);
    expect(readdirSync(dir), "no temporary file").toEqual(["dangling"]);
  });
  it("refuses an output that is one of the inputs, by device and inode (another spelling of the path too)", async () => {
    const input = join(dir, "mine.json");
    writeFileSync(input, "scenario");
    const read = readInputFileSync(input);
    if (!read.ok) throw new Error(read.message);
    await expect(
      writeFileAtomic(join(dir, ".", "mine.json"), "html", { notOneOf: [read.identity] }),
      "same file",
    ).rejects.toThrow(/one of this command's input files/);
    expect(readFileSync(input, "utf8"), "input untouched").toBe("scenario");
  });
  it("keeps the exact permission bits of the file it replaces, whatever the umask", async () => {
    const target = join(dir, "shared.csv");
    writeFileSync(target, "old");
    chmodSync(target, 0o664);
    await writeFileAtomic(target, "new");
    expect(statSync(target).mode & 0o777, "0664 kept").toBe(0o664);
    chmodSync(target, 0o600);
    await writeFileAtomic(target, "newer");
    expect(statSync(target).mode & 0o777, "0600 kept").toBe(0o600);
  });
  it("writes through a link to a regular file, keeping the link", async () => {
    writeFileSync(join(dir, "real.html"), "old");
    symlinkSync(join(dir, "real.html"), join(dir, "link.html"));
    await writeFileAtomic(join(dir, "link.html"), "new");
    expect(readFileSync(join(dir, "real.html"), "utf8"), "target written").toBe("new");
    expect(lstatSync(join(dir, "link.html")).isSymbolicLink(), "link kept").toBe(true);
  });
});
