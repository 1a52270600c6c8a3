/**
 * Layering rules of the project (see DEVELOPERS.md): core/ imports only core/ (and packages);
 * nothing imports renderer/ except renderer/; electron/ imports the contract, the CSP and core types only;
 * nodeio/ (the shared Node-side reader and writer) uses only Node and core's pure text rules, and only the
 * Node-side parts (core/cli, electron, renderer/headless) import it.
 * Checked as a test so CI fails on a violation, not as a wish.
 */
import { describe, it, expect } from "vitest";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, resolve, dirname } from "node:path";

const root = join(__dirname, "../..");

function files(dir: string): string[] {
  const out: string[] = [];
  for (const e of readdirSync(dir)) {
    const p = join(dir, e);
    if (statSync(p).isDirectory()) out.push(...files(p));
    else if (/\.(ts|tsx|mjs)$/.test(e)) out.push(p);
  }
  return out;
}

function imports(file: string): { spec: string; target: string | null; typeOnly: boolean }[] {
  const text = readFileSync(file, "utf8");
  const re = /^\s*(import|export)\s+(type\s+)?[^'"]*?from\s+["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/gm;
  const out: { spec: string; target: string | null; typeOnly: boolean }[] = [];
  for (const m of text.matchAll(re)) {
    const spec = (m[3] ?? m[4])!;
    out.push({ spec, typeOnly: Boolean(m[2]), target: spec.startsWith(".") ? relative(root, resolve(dirname(file), spec)) : null });
  }
  return out;
}

const NODE_BUILTINS = /^(node:|fs$|path$|os$|child_process$|worker_threads$|http$|crypto$)/;

describe("layering", () => {
  it("core/ (outside core/cli/) imports only core/ and pure packages — no Node, DOM, renderer or electron", () => {
    const bad: string[] = [];
    for (const f of files(join(root, "core")).filter((f) => !relative(root, f).startsWith("core/cli/"))) {
      for (const i of imports(f)) {
        if (i.target && !i.target.startsWith("core/")) bad.push(`${relative(root, f)} → ${i.spec}`);
        if (i.target?.startsWith("core/cli")) bad.push(`${relative(root, f)} → ${i.spec} (core/cli is an adapter)`);
        if (!i.target && (NODE_BUILTINS.test(i.spec) || /^(three|d3$|react|electron|playwright)/.test(i.spec))) bad.push(`${relative(root, f)} → ${i.spec}`);
      }
    }
    expect(bad, "core must stay pure").toEqual([]);
  });

  it("nothing outside renderer/ imports renderer/ (except the command line's headless printer)", () => {
    const bad: string[] = [];
    for (const dir of ["core", "electron", "nodeio"]) {
      for (const f of files(join(root, dir))) {
        for (const i of imports(f)) {
          if (i.target?.startsWith("renderer/") && !(relative(root, f).startsWith("core/cli/") && i.target.startsWith("renderer/headless"))) {
            bad.push(`${relative(root, f)} → ${i.spec}`);
          }
        }
      }
    }
    expect(bad, "renderer is imported by nobody").toEqual([]);
  });

  it("electron/ imports core only for types", () => {
    const bad: string[] = [];
    for (const f of files(join(root, "electron"))) {
      for (const i of imports(f)) if (i.target?.startsWith("core/") && !i.typeOnly) bad.push(`${relative(root, f)} → ${i.spec}`);
    }
    expect(bad, "electron main stays thin").toEqual([]);
  });

  it("nodeio/ imports only Node built-ins and core's pure text rules (core/scenario/jsonText.ts)", () => {
    const bad: string[] = [];
    for (const f of files(join(root, "nodeio"))) {
      for (const i of imports(f)) {
        if (i.target && !i.target.startsWith("nodeio/") && i.target !== "core/scenario/jsonText") bad.push(`${relative(root, f)} → ${i.spec}`);
        if (!i.target && !NODE_BUILTINS.test(i.spec)) bad.push(`${relative(root, f)} → ${i.spec}`);
      }
    }
    expect(bad, "nodeio stays a thin Node layer").toEqual([]);
  });

  it("only the Node-side parts (core/cli, electron, renderer/headless) import nodeio/", () => {
    const bad: string[] = [];
    for (const dir of ["core", "renderer", "electron"]) {
      for (const f of files(join(root, dir))) {
        const rel = relative(root, f);
        const nodeSide = rel.startsWith("core/cli/") || rel.startsWith("electron/") || rel.startsWith("renderer/headless/");
        for (const i of imports(f)) if (i.target?.startsWith("nodeio") && !nodeSide) bad.push(`${rel} → ${i.spec}`);
      }
    }
    expect(bad, "the browser side and pure core never reach Node I/O").toEqual([]);
  });

  it("keeps core/version.ts equal to package.json's version", async () => {
    const { BRINEFIELD_VERSION } = await import("../../core/version");
    const pkg = JSON.parse(readFileSync(join(root, "package.json"), "utf8"));
    expect(BRINEFIELD_VERSION, "version constant").toBe(pkg.version);
  });
});
