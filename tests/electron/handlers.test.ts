import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import type { HostResponse } from "../../electron/contract";
import { MAX_SCENARIO_BYTES, createAutosaveStore, createRecentFilesStore } from "../../electron/file-store";
import {
  createHostHandlers,
  ensureExtension,
  isTrustedSender,
  type HostHandlerDeps,
  type IpcSender,
  type SaveDialogOptions,
} from "../../electron/handlers";
import { parseHostRequest } from "../../electron/request-schema";
import { APP_INDEX_URL } from "../../electron/app-protocol";

let dir: string;
const WINDOW_ID = 7;
let indexUrl: string;
let good: IpcSender;

beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), "brinefield-handlers-"));
  indexUrl = APP_INDEX_URL;
  good = { webContentsId: WINDOW_ID, frameUrl: indexUrl, isMainFrame: true };
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

interface Harness {
  deps: HostHandlerDeps;
  openAnswers: (string | null)[];
  saveAnswers: (string | null)[];
  saveDialogs: SaveDialogOptions[];
  documentStates: { dirty: boolean; title: string }[];
  saveResults: HostResponse[];
  recentChanges: (readonly string[])[];
  pdf: Uint8Array;
}

function harness(): Harness {
  const h: Harness = {
    openAnswers: [],
    saveAnswers: [],
    saveDialogs: [],
    documentStates: [],
    saveResults: [],
    recentChanges: [],
    pdf: new TextEncoder().encode("%PDF-1.7 test"),
    deps: undefined as unknown as HostHandlerDeps,
  };
  h.deps = {
    trustedRenderer: () => ({ webContentsId: WINDOW_ID, indexUrl }),
    showOpenDialog: async () => h.openAnswers.shift() ?? null,
    showSaveDialog: async (options) => {
      h.saveDialogs.push(options);
      return h.saveAnswers.shift() ?? null;
    },
    printToPdf: async () => h.pdf,
    recent: createRecentFilesStore({ file: join(dir, "userData", "recent.json") }),
    autosave: createAutosaveStore({ file: join(dir, "userData", "autosave"), now: () => new Date(0) }),
    documentsDir: join(dir, "Documents"),
    setDocumentState: (state) => h.documentStates.push(state),
    onRecentChanged: (paths) => h.recentChanges.push(paths),
    onSaveResult: (response) => h.saveResults.push(response),
  };
  return h;
}

describe("isTrustedSender()", () => {
  const trusted = () => ({ webContentsId: WINDOW_ID, indexUrl });

  it("accepts the main window's top frame on our index.html, whatever its hash or query", () => {
    expect(indexUrl, "the page is served from the app's own scheme").toBe("brinefield://app/index.html");
    expect(isTrustedSender(good, trusted()), "exact URL").toBe(true);
    expect(isTrustedSender({ ...good, frameUrl: `${indexUrl}?case=2` }, trusted()), "with query").toBe(true);
    expect(isTrustedSender({ ...good, frameUrl: `${indexUrl}#/results` }, trusted()), "with hash").toBe(true);
  });

  it("rejects another window, a subframe, a web page and another local file", () => {
    expect(isTrustedSender({ ...good, webContentsId: 8 }, trusted()), "other webContents").toBe(false);
    expect(isTrustedSender({ ...good, isMainFrame: false }, trusted()), "subframe").toBe(false);
    expect(isTrustedSender({ ...good, frameUrl: "https://example.com/index.html" }, trusted()), "https").toBe(false);
    const other = pathToFileURL(join(dir, "Downloads", "index.html")).href;
    expect(isTrustedSender({ ...good, frameUrl: other }, trusted()), "a local file").toBe(false);
    const oldIndex = pathToFileURL(join(dir, "app", "dist", "renderer", "index.html")).href;
    expect(isTrustedSender({ ...good, frameUrl: oldIndex }, trusted()), "the renderer over file://").toBe(false);
    for (const url of [
      "brinefield://app/other.html",
      "brinefield://evil/index.html",
      "brinefield://app.evil/index.html",
      "brinefield://app:8080/index.html",
      "brinefield://user@app/index.html",
      "brinefield://app/assets/../index.html/x",
      "https://app/index.html",
    ]) {
      expect(isTrustedSender({ ...good, frameUrl: url }, trusted()), url).toBe(false);
    }
    expect(
      isTrustedSender(good, { webContentsId: WINDOW_ID, indexUrl: oldIndex }),
      "a file:// index is never trusted",
    ).toBe(false);
    expect(isTrustedSender({ ...good, frameUrl: "" }, trusted()), "destroyed frame").toBe(false);
    const malformed = indexUrl.replace("index.html", "%E0%A4%A/index.html");
    expect(isTrustedSender({ ...good, frameUrl: malformed }, trusted()), "bad escape, no throw").toBe(false);
    expect(isTrustedSender(good, { webContentsId: null, indexUrl }), "no window yet").toBe(false);
  });
});

describe("parseHostRequest()", () => {
  it("accepts every well-formed request kind", () => {
    const abs = join(dir, "x.json");
    const json = { name: "JSON", extensions: ["json"] };
    const requests = [
      { kind: "open-scenario" },
      { kind: "open-path", path: abs },
      { kind: "save-file", path: null, text: "{}", suggestedName: "x.json", filters: [json] },
      { kind: "export-file", suggestedName: "r.csv", text: "a,b", filters: [] },
      { kind: "print-pdf", suggestedName: "report" },
      { kind: "recent-files" },
      { kind: "autosave-write", text: "{}" },
      { kind: "autosave-read" },
      { kind: "autosave-clear" },
      { kind: "set-document-state", dirty: true, title: "Outfall A" },
    ];
    for (const r of requests) expect(parseHostRequest(r).ok, `kind ${r.kind}`).toBe(true);
  });

  it("rejects unknown kinds, extra keys, wrong types, relative paths and names with folders", () => {
    const cases: [unknown, RegExp][] = [
      [{ kind: "delete-everything" }, /unknown request kind/],
      [{ kind: "recent-files", path: "/etc/passwd" }, /unexpected field/],
      [{ kind: "open-path", path: "relative.json" }, /absolute/],
      [{ kind: "save-file", path: "../up.json", text: "", suggestedName: "a", filters: [] }, /absolute or a bare/],
      [{ kind: "open-path", path: 42 }, /path/],
      [{ kind: "open-path", path: `${join(dir, "a")}\0.json` }, /NUL/],
      [{ kind: "print-pdf", suggestedName: "../../evil" }, /folder/],
      [{ kind: "set-document-state", dirty: "yes", title: "" }, /dirty/],
      [
        { kind: "export-file", suggestedName: "a", text: "", filters: [{ name: "x", extensions: ["c;r"] }] },
        /extension/,
      ],
      [null, /Rejected/],
      ["open-scenario", /Rejected/],
    ];
    for (const [payload, pattern] of cases) {
      const parsed = parseHostRequest(payload);
      expect(parsed.ok, `rejects ${JSON.stringify(payload)}`).toBe(false);
      expect(!parsed.ok && parsed.message, `message for ${JSON.stringify(payload)}`).toMatch(pattern);
    }
  });

  it("rejects text over the scenario size limit, counting UTF-8 bytes, without echoing it", () => {
    const huge = "x".repeat(MAX_SCENARIO_BYTES + 1);
    const parsed = parseHostRequest({ kind: "autosave-write", text: huge });
    expect(parsed.ok, "too long").toBe(false);
    expect(!parsed.ok && parsed.message.length, "short message").toBeLessThan(300);
    // 2-byte characters: under the limit in UTF-16 units, over it in bytes.
    const wide = "é".repeat(MAX_SCENARIO_BYTES / 2 + 1);
    expect(parseHostRequest({ kind: "autosave-write", text: wide }).ok, "byte count, not length").toBe(false);
  });
});

describe("createHostHandlers().handle()", () => {
  it("answers a bad sender with an error response and does not act", async () => {
    const h = harness();
    const handlers = createHostHandlers(h.deps);
    const response = await handlers.handle(
      { ...good, frameUrl: "https://evil.example/" },
      { kind: "set-document-state", dirty: true, title: "x" },
    );
    expect(response.kind, "error response").toBe("error");
    expect(h.documentStates, "nothing done").toEqual([]);
  });

  it("answers malformed payloads with error responses instead of throwing", async () => {
    const handlers = createHostHandlers(harness().deps);
    const payloads: unknown[] = [
      undefined,
      { kind: "nope" },
      { kind: "autosave-read", extra: 1 },
      { kind: "autosave-write", text: "y".repeat(MAX_SCENARIO_BYTES + 10) },
      { kind: "set-document-state", dirty: false, title: "t".repeat(10_000) },
    ];
    for (const payload of payloads) {
      const response = await handlers.handle(good, payload);
      expect(response.kind, `error for ${JSON.stringify(payload)?.slice(0, 60)}`).toBe("error");
    }
  });

  it("opens a scenario chosen in the dialog, remembers it as recent and may reopen it by path", async () => {
    const h = harness();
    const handlers = createHostHandlers(h.deps);
    const path = join(dir, "outfall.json");
    await writeFile(path, '{"name":"Outfall A"}');
    h.openAnswers.push(path);
    const opened = await handlers.handle(good, { kind: "open-scenario" });
    expect(opened, "opened response").toEqual({ kind: "opened", path, text: '{"name":"Outfall A"}' });
    expect(await handlers.handle(good, { kind: "recent-files" }), "recent list").toEqual({
      kind: "recent",
      paths: [path],
    });
    expect(h.recentChanges.at(-1), "menu told about the new list").toEqual([path]);
    const again = await handlers.handle(good, { kind: "open-path", path });
    expect(again.kind, "granted path reopens").toBe("opened");
  });

  it("refuses open-path for a file the user never chose", async () => {
    const h = harness();
    const secret = join(dir, "secret.json");
    await writeFile(secret, '{"token":"x"}');
    const response = await createHostHandlers(h.deps).handle(good, { kind: "open-path", path: secret });
    expect(response.kind, "error").toBe("error");
    expect(JSON.stringify(response), "file content not leaked").not.toContain("token");
  });

  it("reports a non-JSON file as an error response", async () => {
    const h = harness();
    const path = join(dir, "photo.json");
    await writeFile(path, Buffer.from([0xff, 0xd8, 0xff, 0xe0]));
    h.openAnswers.push(path);
    const response = await createHostHandlers(h.deps).handle(good, { kind: "open-scenario" });
    expect(response.kind, "error").toBe("error");
    expect(response.kind === "error" && response.message, "says not UTF-8").toMatch(/UTF-8/);
  });

  it("returns cancelled when a dialog is dismissed", async () => {
    const handlers = createHostHandlers(harness().deps);
    expect(await handlers.handle(good, { kind: "open-scenario" }), "open").toEqual({ kind: "cancelled" });
    const save = { kind: "save-file", path: null, text: "{}", suggestedName: "a.json", filters: [] };
    expect(await handlers.handle(good, save), "save").toEqual({ kind: "cancelled" });
  });

  it("saves via the dialog, adds the extension, then saves to the same path without asking", async () => {
    const h = harness();
    const handlers = createHostHandlers(h.deps);
    const chosen = join(dir, "new-outfall");
    h.saveAnswers.push(chosen);
    const filters = [{ name: "Brinefield scenario", extensions: ["json"] }];
    const save = (path: string | null, text: string) =>
      handlers.handle(good, { kind: "save-file", path, text, suggestedName: "Outfall.json", filters });
    const first = await save(null, '{"v":1}');
    expect(first, "saved with .json added").toEqual({ kind: "saved", path: `${chosen}.json` });
    expect(h.saveDialogs[0].defaultPath, "dialog starts in Documents with the suggested name").toBe(
      join(dir, "Documents", "Outfall.json"),
    );
    const second = await save(`${chosen}.json`, '{"v":2}');
    expect(second.kind, "saved").toBe("saved");
    expect(h.saveDialogs.length, "no second dialog for a granted path").toBe(1);
    expect(await readFile(`${chosen}.json`, "utf8"), "new content").toBe('{"v":2}');
    expect(
      h.saveResults.map((r) => r.kind),
      "close guard told of both saves",
    ).toEqual(["saved", "saved"]);
  });

  it("asks where to save a dropped file that only has a name", async () => {
    const h = harness();
    h.saveAnswers.push(join(dir, "dropped.json"));
    const response = await createHostHandlers(h.deps).handle(good, {
      kind: "save-file",
      path: "dropped.json",
      text: "{}",
      suggestedName: "Untitled.json",
      filters: [],
    });
    const saved = { kind: "saved", path: join(dir, "dropped.json") };
    expect(response, "saved where the user chose").toEqual(saved);
    expect(h.saveDialogs[0].defaultPath, "dialog suggests the dropped name").toBe(
      join(dir, "Documents", "dropped.json"),
    );
  });

  it("asks with a dialog instead of overwriting a path the user never chose", async () => {
    const h = harness();
    const victim = join(dir, "victim.txt");
    await writeFile(victim, "keep me");
    const response = await createHostHandlers(h.deps).handle(good, {
      kind: "save-file",
      path: victim,
      text: "{}",
      suggestedName: "a.json",
      filters: [],
    });
    expect(response.kind, "dialog dismissed → cancelled").toBe("cancelled");
    expect(h.saveDialogs.length, "a dialog was shown").toBe(1);
    expect(await readFile(victim, "utf8"), "file untouched").toBe("keep me");
  });

  it("exports text and prints a PDF to the chosen files", async () => {
    const h = harness();
    const handlers = createHostHandlers(h.deps);
    h.saveAnswers.push(join(dir, "table.csv"), join(dir, "report"));
    const csv = await handlers.handle(good, {
      kind: "export-file",
      suggestedName: "table.csv",
      text: "x,S\n0,1\n",
      filters: [{ name: "CSV", extensions: ["csv"] }],
    });
    expect(csv, "csv saved").toEqual({ kind: "saved", path: join(dir, "table.csv") });
    const pdf = await handlers.handle(good, { kind: "print-pdf", suggestedName: "report" });
    expect(pdf, "pdf saved with extension").toEqual({ kind: "saved", path: join(dir, "report.pdf") });
    expect(h.saveDialogs[1].defaultPath.endsWith("report.pdf"), "suggested .pdf name").toBe(true);
    expect(await readFile(join(dir, "report.pdf"), "utf8"), "pdf bytes").toBe("%PDF-1.7 test");
  });

  it("turns a save into a folder that vanished into an error response", async () => {
    const h = harness();
    h.saveAnswers.push(join(dir, "gone", "x.csv"));
    const response = await createHostHandlers(h.deps).handle(good, {
      kind: "export-file",
      suggestedName: "x.csv",
      text: "a",
      filters: [],
    });
    expect(response.kind, "error").toBe("error");
    expect(response.kind === "error" && response.message, "plain message").toMatch(/does not exist/);
  });

  it("writes, reads and clears the autosave slot", async () => {
    const handlers = createHostHandlers(harness().deps);
    expect(await handlers.handle(good, { kind: "autosave-read" }), "empty").toEqual({
      kind: "autosave",
      text: null,
      savedAt: null,
    });
    expect(await handlers.handle(good, { kind: "autosave-write", text: '{"u":1}' }), "write").toEqual({ kind: "ok" });
    expect(await handlers.handle(good, { kind: "autosave-read" }), "read back").toEqual({
      kind: "autosave",
      text: '{"u":1}',
      savedAt: "1970-01-01T00:00:00.000Z",
    });
    expect(await handlers.handle(good, { kind: "autosave-clear" }), "clear").toEqual({ kind: "ok" });
    expect(await handlers.handle(good, { kind: "autosave-read" }), "gone").toEqual({
      kind: "autosave",
      text: null,
      savedAt: null,
    });
  });

  it("passes document state to main and a failing dependency becomes an error response", async () => {
    const h = harness();
    const handlers = createHostHandlers({
      ...h.deps,
      printToPdf: async () => {
        throw new Error("renderer crashed");
      },
    });
    h.saveAnswers.push(join(dir, "r.pdf"));
    expect(await handlers.handle(good, { kind: "set-document-state", dirty: true, title: "Outfall A" }), "ok").toEqual({
      kind: "ok",
    });
    expect(h.documentStates, "state forwarded").toEqual([{ dirty: true, title: "Outfall A" }]);
    const pdf = await handlers.handle(good, { kind: "print-pdf", suggestedName: "r.pdf" });
    expect(pdf.kind === "error" && pdf.message, "error response").toMatch(/renderer crashed/);
  });
});

describe("ensureExtension()", () => {
  it("adds the single extension of the first filter only when the name has none", () => {
    const json = [{ name: "JSON", extensions: ["json"] }];
    expect(ensureExtension("/a/b", json), "added").toBe("/a/b.json");
    expect(ensureExtension("/a/b.txt", json), "kept").toBe("/a/b.txt");
    expect(ensureExtension("/a/b", [{ name: "All", extensions: ["*"] }]), "wildcard").toBe("/a/b");
    expect(ensureExtension("/a/b", []), "no filters").toBe("/a/b");
  });
});
