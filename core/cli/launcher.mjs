#!/usr/bin/env node
// Entry point of `npx brinefield`. Bundles core/cli/main.ts with esbuild into dist/cli/brinefield.cjs
// when that bundle is missing or older than any source under core/ (a few milliseconds to check), so
// there is no separate build step and a cold start stays well under a second.
//
// Most of a start is V8 compiling the 1.5 MB bundle. Node 20 has no module compile cache, so the bundle
// is a CommonJS script run through vm.Script with V8's code cache: the first run after a build writes
// the cache (the bytecode of everything that run compiled) beside the bundle, and later runs start from it.
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync, statSync, renameSync, mkdirSync, writeFileSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import vm from "node:vm";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const out = join(root, "dist/cli/brinefield.cjs");

function newestMtime(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestMtime(p));
    else if (/\.(ts|mjs|json)$/.test(entry.name)) newest = Math.max(newest, statSync(p).mtimeMs);
  }
  return newest;
}

function sourcesNewerThan(mtime) {
  const dirs = [join(root, "core")];
  return dirs.some((d) => newestMtime(d) > mtime) || statSync(join(root, "package.json")).mtimeMs > mtime;
}

// zod re-exports every message locale (64 languages, ~350 KiB) as `z.locales`; the command line speaks
// English only, so its bundle gets a locales module with just the English one (the one zod installs).
const zodEnglishOnly = {
  name: "zod-english-only",
  setup(build) {
    build.onResolve({ filter: /^\.\.\/locales\/index\.js$/ }, (args) =>
      /[\\/]zod[\\/]/.test(args.importer)
        ? { path: join(dirname(args.importer), "../locales/en.js"), namespace: "zod-locales" }
        : undefined,
    );
    build.onLoad({ filter: /.*/, namespace: "zod-locales" }, (args) => ({
      contents: `export { default as en } from ${JSON.stringify(args.path)};`,
      resolveDir: dirname(args.path),
      loader: "js",
    }));
  },
};

async function ensureBundle() {
  const fresh = existsSync(out) && !sourcesNewerThan(statSync(out).mtimeMs);
  if (fresh) return;
  let esbuild;
  try {
    esbuild = await import("esbuild");
  } catch {
    process.stderr.write(
      "brinefield: the command-line bundle is missing and esbuild is not installed; run `npm install` first.\n",
    );
    process.exit(2);
  }
  mkdirSync(dirname(out), { recursive: true });
  const tmp = `${out}.${process.pid}.tmp`;
  try {
    await esbuild.build({
      entryPoints: [join(root, "core/cli/main.ts")],
      bundle: true,
      platform: "node",
      format: "cjs",
      target: "node20",
      outfile: tmp,
      external: ["playwright-core", "esbuild", "vite"],
      logLevel: "error",
      plugins: [zodEnglishOnly],
      // The sources locate the bundle (worker threads start on it) through import.meta.url.
      define: { "import.meta.url": "__brinefieldBundleUrl" },
      // A script run through vm.Script cannot import() on Node 20 (without an experimental flag), so the
      // packages kept outside the bundle (playwright-core, CommonJS) are loaded with require() instead.
      supported: { "dynamic-import": false },
      banner: { js: "var __brinefieldBundleUrl = require('node:url').pathToFileURL(__filename).href;" },
    });
  } catch (err) {
    process.stderr.write(`brinefield: could not build the command-line bundle:\n${err?.message ?? err}\n`);
    process.exit(70);
  }
  renameSync(tmp, out); // atomic: concurrent launches never see a half-written bundle
}

/**
 * Runs the bundle as a CommonJS module compiled with V8's code cache when one matches it. The cache's
 * name carries a hash of the bundle's text, so a rebuilt bundle never meets the bytecode of an older one
 * (V8's own check compares only the source's length).
 */
function loadBundle() {
  const source = readFileSync(out, "utf8");
  const key = createHash("sha256").update(source).digest("hex").slice(0, 16);
  const cacheFile = `${out}.${key}.cache`;
  let cachedData;
  try {
    cachedData = readFileSync(cacheFile);
  } catch {
    cachedData = undefined; // no cache yet: this run writes it
  }
  const wrapper = `(function (exports, require, module, __filename, __dirname) {${source}\n})`;
  const script = new vm.Script(wrapper, { filename: out, cachedData });
  const module = { exports: {} };
  script.runInThisContext()(module.exports, createRequire(out), module, out, dirname(out));
  const needsCache = cachedData === undefined || script.cachedDataRejected === true;
  return {
    main: module.exports,
    writeCache: async () => needsCache && (await writeCodeCache(module.exports, script, cacheFile)),
  };
}

/**
 * Saves the code cache after the command and a silent `run` of an invented scenario, so it holds the
 * bytecode of the scenario reader and the pipeline whichever command came first; older caches are removed.
 */
async function writeCodeCache(main, script, cacheFile) {
  const tmp = `${cacheFile}.${process.pid}.tmp`;
  try {
    await main.warmUpForCodeCache();
    for (const f of readdirSync(dirname(out)))
      if (f.startsWith("brinefield.cjs.") && f.endsWith(".cache")) rmSync(join(dirname(out), f), { force: true });
    writeFileSync(tmp, script.createCachedData());
    renameSync(tmp, cacheFile); // atomic: a concurrent start reads a whole cache or none
  } catch {
    // The cache only saves start-up time: a read-only install runs without it, every time the same way.
    rmSync(tmp, { force: true });
  }
}

await ensureBundle();
const { main, writeCache } = loadBundle();
process.exitCode = await main.cliMain(process.argv.slice(2));
await writeCache();
