/**
 * The command line's report with its headless-Chromium parts, run as a user would: from another folder,
 * through the launcher and its bundle. The 3D view must be embedded and the PDF written (both need
 * playwright-core, loaded from the bundle, and the repository's renderer, found from the bundle's place).
 */
import { describe, expect, it, beforeAll } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { ensureWebBuilt } from "./support/web-build";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");

beforeAll(() => ensureWebBuilt());

describe("brinefield report from another folder", () => {
  it("embeds the 3D view and writes the PDF", () => {
    const dir = mkdtempSync(join(tmpdir(), "brinefield-cli-report-"));
    const r = spawnSync(
      process.execPath,
      [
        join(root, "core/cli/launcher.mjs"),
        "report",
        join(root, "demo-scenarios/island-cove.json"),
        "--out",
        "r.html",
        "--pdf",
        "r.pdf",
      ],
      { cwd: dir, encoding: "utf8", timeout: 170_000 },
    );
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr, "nothing left out").not.toMatch(/left out|not written/);
    const html = readFileSync(join(dir, "r.html"), "utf8");
    expect(html).toMatch(/<img[^>]+src="data:image\/png;base64,/);
    expect(readFileSync(join(dir, "r.pdf")).subarray(0, 5).toString("latin1")).toBe("%PDF-");
  }, 180_000);
});
