#!/usr/bin/env node
/**
 * `npm run web`: serve the built renderer (dist/renderer) on http://127.0.0.1:5178/ (or --port N /
 * PORT; a free port when that one is taken). See electron/web-server.ts.
 */
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { ROOT, buildElectron } from "./build-main.mjs";

try {
  await buildElectron({ root: ROOT });
} catch {
  console.error("The launcher build failed (see the errors above).");
  process.exit(1);
}
try {
  const launcherUrl = pathToFileURL(join(ROOT, "dist", "electron", "launcher.mjs")).href;
  const { runServeWeb } = await import(launcherUrl);
  process.exitCode = await runServeWeb({ root: ROOT, argv: process.argv.slice(2), env: process.env });
} catch (error) {
  // One readable line, never a stack trace.
  const detail = error instanceof Error ? error.message.split("\n")[0] : String(error);
  console.error(`Brinefield could not start: ${detail}`);
  process.exitCode = 1;
}
