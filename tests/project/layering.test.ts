/**
 * Layering rules of the project (see DEVELOPERS.md): core/ imports only core/ (and packages);
 * nothing imports renderer/ except renderer/; electron/ imports the contract, the CSP and core types only;
 * core/cli/node/ (the shared Node-side reader, writer and headless-browser helpers) uses only Node,
 * playwright-core and core's pure text rules, and only the Node-side parts (core/cli, electron) import it.
 * The same rules are enforced by ESLint (eslint.config.js, `no-restricted-imports` per folder).
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
    out.push({
      spec,
      typeOnly: Boolean(m[2]),
      target: spec.startsWith(".") ? relative(root, resolve(dirname(file), spec)) : null,
    });
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
        if (!i.target && (NODE_BUILTINS.test(i.spec) || /^(three|d3$|react|electron|playwright)/.test(i.spec)))
          bad.push(`${relative(root, f)} → ${i.spec}`);
      }
    }
    expect(bad, "core must stay pure").toEqual([]);
  });

  it("nothing outside renderer/ imports renderer/", () => {
    const bad: string[] = [];
    for (const dir of ["core", "electron"]) {
      for (const f of files(join(root, dir))) {
        for (const i of imports(f)) if (i.target?.startsWith("renderer/")) bad.push(`${relative(root, f)} → ${i.spec}`);
      }
    }
    expect(bad, "renderer is imported by nobody").toEqual([]);
  });

  it("electron/ imports core only for types, apart from the shared Node-side file I/O (core/cli/node/)", () => {
    const bad: string[] = [];
    for (const f of files(join(root, "electron"))) {
      for (const i of imports(f)) {
        if (i.target?.startsWith("core/") && !i.typeOnly && !i.target.startsWith("core/cli/node"))
          bad.push(`${relative(root, f)} → ${i.spec}`);
      }
    }
    expect(bad, "electron main stays thin").toEqual([]);
  });

  it("core/cli/node/ imports only Node built-ins, playwright-core and core's pure text rules (core/scenario/json-text.ts)", () => {
    const bad: string[] = [];
    for (const f of files(join(root, "core/cli/node"))) {
      for (const i of imports(f)) {
        if (i.target && !i.target.startsWith("core/cli/node/") && i.target !== "core/scenario/json-text")
          bad.push(`${relative(root, f)} → ${i.spec}`);
        if (!i.target && !NODE_BUILTINS.test(i.spec) && i.spec !== "playwright-core")
          bad.push(`${relative(root, f)} → ${i.spec}`);
      }
    }
    expect(bad, "core/cli/node stays a thin Node layer").toEqual([]);
  });

  it("only the Node-side parts (core/cli, electron) import core/cli/node/", () => {
    const bad: string[] = [];
    for (const dir of ["core", "renderer", "electron"]) {
      for (const f of files(join(root, dir))) {
        const rel = relative(root, f);
        const nodeSide = rel.startsWith("core/cli/") || rel.startsWith("electron/");
        for (const i of imports(f))
          if (i.target?.startsWith("core/cli/node") && !nodeSide) bad.push(`${rel} → ${i.spec}`);
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
