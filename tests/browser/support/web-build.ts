/**
 * The production web build the browser tests drive: built with vite unless dist/renderer is newer than
 * every renderer, core and demo source.
 */
import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../../..");
/** Where the web build lands. */
export const WEB_DIST = join(root, "dist/renderer");

function newestSource(dir: string): number {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestSource(p) : statSync(p).mtimeMs);
  }
  return newest;
}

/** Builds the renderer unless dist/renderer is newer than every renderer, core and demo source. */
export function ensureWebBuilt(): void {
  const index = join(WEB_DIST, "index.html");
  const sources = Math.max(
    newestSource(join(root, "renderer")),
    newestSource(join(root, "core")),
    newestSource(join(root, "demo-scenarios")),
  );
  if (existsSync(index) && statSync(index).mtimeMs > sources) return;
  const run = spawnSync(
    process.execPath,
    [
      join(root, "node_modules/vite/bin/vite.js"),
      "build",
      "--config",
      "renderer/vite.config.ts",
      "--logLevel",
      "error",
    ],
    // The production build, as users get it: vitest's NODE_ENV ("test") would give React's development build.
    { cwd: root, encoding: "utf8", timeout: 240_000, env: { ...process.env, NODE_ENV: "production" } },
  );
  if (run.status !== 0) throw new Error(`renderer build failed: ${run.stderr || run.stdout}`);
}
