#!/usr/bin/env node
/**
 * Bundle the Electron side with esbuild (`npm run build:electron`):
 *   electron/main.ts     → dist/electron/main.cjs      (CommonJS, Node, `electron` external)
 *   electron/preload.ts  → dist/electron/preload.cjs   (CommonJS, one file: sandboxed preloads cannot
 *                                                       require local modules)
 *   electron/launcher.ts → dist/electron/launcher.mjs  (ES module used by start.mjs and serve-web.mjs)
 */
import { build } from "esbuild";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "..");

/** Build all three bundles into `outDir` (default `<root>/dist/electron`). Throws on esbuild errors. */
export async function buildElectron({ root = ROOT, outDir = join(root, "dist", "electron"), minify = false } = {}) {
  const common = {
    bundle: true,
    platform: "node",
    external: ["electron"],
    logLevel: "error",
    legalComments: "none",
    minify,
    sourcemap: false,
    absWorkingDir: root,
  };
  await Promise.all([
    build({
      ...common,
      entryPoints: [join(root, "electron", "main.ts")],
      outfile: join(outDir, "main.cjs"),
      format: "cjs",
      target: "node22",
    }),
    build({
      ...common,
      entryPoints: [join(root, "electron", "preload.ts")],
      outfile: join(outDir, "preload.cjs"),
      format: "cjs",
      target: "node22",
    }),
    build({
      ...common,
      entryPoints: [join(root, "electron", "launcher.ts")],
      outfile: join(outDir, "launcher.mjs"),
      format: "esm",
      target: "node20",
    }),
  ]);
  return outDir;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  try {
    const outDir = await buildElectron();
    console.log(`Electron main, preload and launcher built in ${outDir}`);
  } catch {
    // esbuild has already printed the errors with file and line.
    console.error("The Electron build failed (see the errors above).");
    process.exitCode = 1;
  }
}
