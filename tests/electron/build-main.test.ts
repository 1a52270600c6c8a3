import { builtinModules } from "node:module";
import { mkdtemp, readFile, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildElectron } from "../../electron/build-main.mjs";

let outDir: string;
const requires = (code: string) => [...code.matchAll(/\brequire\("([^"]+)"\)/g)].map((m) => m[1]);
const builtins = new Set([...builtinModules, ...builtinModules.map((m) => `node:${m}`)]);

beforeAll(async () => {
  outDir = await mkdtemp(join(tmpdir(), "brinefield-build-"));
  await buildElectron({ outDir });
}, 60_000);

afterAll(async () => {
  await rm(outDir, { recursive: true, force: true });
});

describe("electron/build-main.mjs", () => {
  it("bundles the preload into one file that requires only electron (sandbox rule)", async () => {
    const code = await readFile(join(outDir, "preload.cjs"), "utf8");
    expect(new Set(requires(code)), "only electron").toEqual(new Set(["electron"]));
    expect(code, "exposes the bridge").toContain('exposeInMainWorld("brinefieldHost"');
  });

  it("bundles main as CommonJS needing only electron and Node built-ins", async () => {
    const code = await readFile(join(outDir, "main.cjs"), "utf8");
    const external = requires(code).filter((m) => m !== "electron" && !builtins.has(m));
    expect(external, "no node_modules at run time").toEqual([]);
    expect(code, "registers the invoke channel").toContain("brinefield:invoke");
  });

  it("emits the launcher as an ES module", async () => {
    const code = await readFile(join(outDir, "launcher.mjs"), "utf8");
    expect(code, "exports runStart").toMatch(/export\s*\{[^}]*runStart/);
  });
});
