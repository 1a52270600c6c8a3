#!/usr/bin/env node
// Entry point of `npx brinefield`. Bundles core/cli/main.ts with esbuild into dist/cli/brinefield.mjs
// when that bundle is missing or older than any source under core/ (a few milliseconds to check), so
// there is no separate build step and a cold start stays well under a second.
import { existsSync, readdirSync, statSync, renameSync, mkdirSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const out = join(root, "dist/cli/brinefield.mjs");

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
      format: "esm",
      target: "node20",
      outfile: tmp,
      external: ["playwright-core", "esbuild", "vite"],
      logLevel: "error",
      plugins: [zodEnglishOnly],
      banner: {
        js: "import { createRequire as __brinefieldRequire } from 'node:module'; const require = __brinefieldRequire(import.meta.url);",
      },
    });
  } catch (err) {
    process.stderr.write(`brinefield: could not build the command-line bundle:\n${err?.message ?? err}\n`);
    process.exit(70);
  }
  renameSync(tmp, out); // atomic: concurrent launches never see a half-written bundle
}

await ensureBundle();
const main = await import(pathToFileURL(out).href);
process.exitCode = await main.cliMain(process.argv.slice(2));
