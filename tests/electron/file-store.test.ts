import { chmod, lstat, mkdtemp, readFile, readdir, rm, stat, symlink, writeFile } from "node:fs/promises";
import { spawnSync } from "node:child_process";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import {
  MAX_RECENT_FILES,
  createAutosaveStore,
  createRecentFilesStore,
  formatBytes,
  readJsonTextFile,
  writeFileAtomic,
} from "../../electron/file-store";

let dir: string;

beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), "brinefield-filestore-"));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe("writeFileAtomic()", () => {
  it("creates a new file with exactly the given text and leaves no temporary file behind", async () => {
    const target = join(dir, "scenario.json");
    await writeFileAtomic(target, '{"a":1}');
    expect(await readFile(target, "utf8"), "file content").toBe('{"a":1}');
    expect(await readdir(dir), "only the target remains in the folder").toEqual(["scenario.json"]);
  });

  it("replaces an existing file", async () => {
    const target = join(dir, "scenario.json");
    await writeFile(target, "old");
    await writeFileAtomic(target, "new");
    expect(await readFile(target, "utf8"), "new content replaced the old").toBe("new");
  });

  it("keeps the previous file intact when the process dies between write and rename", async () => {
    const target = join(dir, "scenario.json");
    await writeFile(target, '{"version":"previous"}');
    let tempSeen = "";
    const crash = writeFileAtomic(target, '{"version":"next"}', {
      beforeRename: async (temp) => {
        // At the moment of the crash the new bytes are complete and flushed in the temporary file...
        tempSeen = await readFile(temp, "utf8");
        throw new Error("simulated crash");
      },
    });
    await expect(crash, "the simulated crash propagates").rejects.toThrow("simulated crash");
    expect(tempSeen, "temporary file held the full new text before the rename").toBe('{"version":"next"}');
    // ...and the target still holds the previous version, byte for byte.
    expect(await readFile(target, "utf8"), "previous file untouched").toBe('{"version":"previous"}');
    expect(await readdir(dir), "the failed attempt cleans its temporary file").toEqual(["scenario.json"]);
  });

  it.skipIf(process.platform === "win32")(
    "keeps the previous file when the saving process is killed outright before the rename",
    async () => {
      const target = join(dir, "scenario.json");
      await writeFile(target, '{"version":"previous"}');
      const moduleUrl = pathToFileURL(join(process.cwd(), "electron", "file-store.ts")).href;
      const script = [
        `import { writeFileAtomic } from ${JSON.stringify(moduleUrl)};`,
        `await writeFileAtomic(${JSON.stringify(target)}, '{"version":"next"}', {`,
        `  beforeRename: () => process.kill(process.pid, "SIGKILL"),`,
        `});`,
      ].join("\n");
      const child = spawnSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", script], {
        encoding: "utf8",
        timeout: 20_000,
      });
      expect(child.signal, `child was killed (stderr: ${child.stderr})`).toBe("SIGKILL");
      const after = await readFile(target, "utf8");
      expect(after, "previous file intact after the kill").toBe('{"version":"previous"}');
      const leftovers = (await readdir(dir)).filter((f) => f.endsWith(".tmp"));
      expect(leftovers.length, "the killed save left its complete temporary file, nothing else").toBe(1);
      const temp = await readFile(join(dir, leftovers[0]), "utf8");
      expect(temp, "temp file complete").toBe('{"version":"next"}');
    },
  );

  it("writes the temporary file next to the target (a rename across disks is not atomic)", async () => {
    const target = join(dir, "sub-target.json");
    let tempDir = "";
    await writeFileAtomic(target, "x", {
      beforeRename: (temp) => {
        tempDir = join(temp, "..");
      },
    });
    expect(tempDir, "temporary file lives next to the target").toBe(dir);
  });

  it.skipIf(process.platform === "win32")("keeps the permission bits of the file it replaces", async () => {
    const target = join(dir, "private.json");
    await writeFile(target, "old");
    await chmod(target, 0o600);
    await writeFileAtomic(target, "new");
    expect((await stat(target)).mode & 0o777, "mode preserved").toBe(0o600);
  });

  it.skipIf(process.platform === "win32")("writes through a symlink to the file it points to", async () => {
    const real = join(dir, "real.json");
    const link = join(dir, "link.json");
    await writeFile(real, "old");
    await symlink(real, link);
    await writeFileAtomic(link, "new");
    expect(await readFile(real, "utf8"), "target updated").toBe("new");
    expect((await lstat(link)).isSymbolicLink(), "link kept").toBe(true);
  });

  it("fails with the fs error when the folder does not exist, without creating anything", async () => {
    const target = join(dir, "missing", "scenario.json");
    await expect(writeFileAtomic(target, "x"), "ENOENT surfaces").rejects.toMatchObject({ code: "ENOENT" });
    expect(await readdir(dir), "nothing created").toEqual([]);
  });
});

describe("readJsonTextFile()", () => {
  it("returns the text of a UTF-8 JSON file, without a byte-order mark", async () => {
    const path = join(dir, "s.json");
    await writeFile(path, '\ufeff{"name":"Outfall A, 12 m ±"}', "utf8");
    const result = await readJsonTextFile(path);
    expect(result, "read succeeds").toEqual({ ok: true, text: '{"name":"Outfall A, 12 m ±"}' });
  });

  it("refuses a file over the size limit with a message that states both sizes", async () => {
    const path = join(dir, "big.json");
    await writeFile(path, `"${"x".repeat(2048)}"`);
    const result = await readJsonTextFile(path, { maxBytes: 1024 });
    expect(result.ok, "refused").toBe(false);
    expect(!result.ok && result.message, "message names actual and allowed size").toMatch(/2 kB.*at most 1 kB/);
  });

  it("accepts a file exactly at the size limit", async () => {
    const path = join(dir, "edge.json");
    const text = `"${"y".repeat(1022)}"`;
    await writeFile(path, text);
    expect((await readJsonTextFile(path, { maxBytes: 1024 })).ok, "1024 bytes with a 1024-byte limit").toBe(true);
  });

  it("reports a file that is not UTF-8 instead of crashing", async () => {
    const path = join(dir, "latin1.json");
    // 0xE9 alone is "é" in Latin-1 and an invalid byte sequence in UTF-8.
    await writeFile(path, Buffer.from([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xe9, 0x22, 0x7d]));
    const result = await readJsonTextFile(path);
    expect(result.ok, "refused").toBe(false);
    expect(!result.ok && result.message, "message says why").toMatch(/not UTF-8/);
  });

  it("reports text that is not JSON", async () => {
    const path = join(dir, "notes.json");
    await writeFile(path, "depth: 12 m\n");
    const result = await readJsonTextFile(path);
    expect(!result.ok && result.message, "message says not valid JSON").toMatch(/not valid JSON/);
  });

  it("reports an empty file, a folder and a missing file with plain messages", async () => {
    await writeFile(join(dir, "empty.json"), "  \n");
    const empty = await readJsonTextFile(join(dir, "empty.json"));
    const folder = await readJsonTextFile(dir);
    const missing = await readJsonTextFile(join(dir, "nope.json"));
    expect(!empty.ok && empty.message, "empty").toMatch(/is empty/);
    expect(!folder.ok && folder.message, "folder").toMatch(/not a regular file|folder/);
    expect(!missing.ok && missing.message, "missing").toMatch(/does not exist/);
  });
});

describe("formatBytes()", () => {
  it("uses bytes, kB and MB", () => {
    expect(formatBytes(512), "bytes").toBe("512 bytes");
    expect(formatBytes(2048), "kB").toBe("2 kB");
    expect(formatBytes(5 * 1024 * 1024), "whole MB has no decimals").toBe("5 MB");
    expect(formatBytes(7.3 * 1024 * 1024), "one decimal otherwise").toBe("7.3 MB");
  });
});

describe("createRecentFilesStore()", () => {
  async function touch(name: string): Promise<string> {
    const path = join(dir, name);
    await writeFile(path, "{}");
    return path;
  }

  it("puts the latest file first, without duplicates, and persists the list", async () => {
    const file = join(dir, "userData", "recent-files.json");
    const store = createRecentFilesStore({ file });
    const a = await touch("a.json");
    const b = await touch("b.json");
    await store.add(a);
    await store.add(b);
    await store.add(a);
    expect(await store.list(), "a moved to the front, b kept once").toEqual([a, b]);
    const reopened = createRecentFilesStore({ file });
    expect(await reopened.list(), "list survives a restart").toEqual([a, b]);
  });

  it(`keeps at most ${MAX_RECENT_FILES} entries`, async () => {
    const store = createRecentFilesStore({ file: join(dir, "recent.json") });
    const paths: string[] = [];
    for (let i = 0; i < MAX_RECENT_FILES + 3; i++) {
      paths.push(await touch(`s${i}.json`));
      await store.add(paths[i]);
    }
    const list = await store.list();
    expect(list.length, "capped").toBe(MAX_RECENT_FILES);
    expect(list[0], "newest first").toBe(paths[paths.length - 1]);
    expect(list.includes(paths[0]), "oldest dropped").toBe(false);
  });

  it("prunes entries whose file was deleted, and saves the pruned list", async () => {
    const file = join(dir, "recent.json");
    const store = createRecentFilesStore({ file });
    const keep = await touch("keep.json");
    const gone = await touch("gone.json");
    await store.add(keep);
    await store.add(gone);
    await rm(gone);
    expect(await store.list(), "missing entry pruned").toEqual([keep]);
    const saved = JSON.parse(await readFile(file, "utf8")) as { paths: string[] };
    expect(saved.paths, "pruned list persisted").toEqual([keep]);
  });

  it("treats a corrupt list as empty and ignores relative or non-string entries", async () => {
    const file = join(dir, "recent.json");
    const store = createRecentFilesStore({ file, exists: async () => true });
    await writeFile(file, "{not json");
    expect(await store.list(), "corrupt file → empty list").toEqual([]);
    const paths = ["relative/x.json", 42, "/abs/ok.json", "/a\0b"];
    await writeFile(file, JSON.stringify({ version: 1, paths }));
    expect(await store.list(), "only absolute, NUL-free strings survive").toEqual(["/abs/ok.json"]);
  });

  it("serialises concurrent additions so none is lost", async () => {
    const store = createRecentFilesStore({ file: join(dir, "recent.json") });
    const paths = await Promise.all([0, 1, 2, 3].map((i) => touch(`c${i}.json`)));
    await Promise.all(paths.map((p) => store.add(p)));
    expect((await store.list()).sort(), "all four recorded").toEqual([...paths].sort());
  });
});

describe("createAutosaveStore()", () => {
  it("round-trips text and the time it was saved", async () => {
    const when = new Date("2026-03-04T05:06:07.890Z");
    const store = createAutosaveStore({ file: join(dir, "userData", "autosave"), now: () => when });
    const text = '{\n  "name": "unsaved ±, with a\\nnewline"\n}\n';
    const written = await store.write(text);
    expect(written.savedAt, "write reports the timestamp").toBe("2026-03-04T05:06:07.890Z");
    const fresh = createAutosaveStore({ file: join(dir, "userData", "autosave") });
    expect(await fresh.read(), "next start reads the same text and time").toEqual({
      text,
      savedAt: "2026-03-04T05:06:07.890Z",
    });
  });

  it("reads null when there is nothing saved, after clear, and for a foreign file", async () => {
    const file = join(dir, "autosave");
    const store = createAutosaveStore({ file });
    expect(await store.read(), "nothing yet").toBeNull();
    await store.write("{}");
    await store.clear();
    expect(await store.read(), "cleared").toBeNull();
    await store.clear();
    await writeFile(file, "some other program's file\n{}");
    expect(await store.read(), "unknown header").toBeNull();
  });

  it("refuses unsaved work over the size limit and keeps the previous autosave", async () => {
    const store = createAutosaveStore({ file: join(dir, "autosave"), maxBytes: 100 });
    await store.write("{}");
    await expect(store.write("x".repeat(101)), "too large").rejects.toThrow(/at most 100 bytes/);
    expect((await store.read())?.text, "previous autosave kept").toBe("{}");
  });

  it("ignores an autosave file that grew beyond the limit on disk", async () => {
    const file = join(dir, "autosave");
    const store = createAutosaveStore({ file, maxBytes: 100 });
    await writeFile(file, `BRINEFIELD-AUTOSAVE 1 2026-01-01T00:00:00.000Z\n${"x".repeat(1000)}`);
    expect(await store.read(), "oversized slot is not loaded").toBeNull();
  });
});
