#!/usr/bin/env node
/**
 * `npm start`: build the Electron bundles (and the renderer when it is out of date), then open the
 * desktop app, or serve it in the browser when Electron cannot run here. See electron/launcher.ts.
 */
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { ROOT, buildElectron } from "./build-main.mjs";

try {
  await buildElectron({ root: ROOT });
} catch {
  console.error("The Electron build failed (see the errors above).");
  process.exit(1);
}
try {
  const launcherUrl = pathToFileURL(join(ROOT, "dist", "electron", "launcher.mjs")).href;
  const { runStart } = await import(launcherUrl);
  process.exitCode = await runStart({ root: ROOT, argv: process.argv.slice(2), env: process.env });
} catch (error) {
  // One readable line, never a stack trace.
  const detail = error instanceof Error ? error.message.split("\n")[0] : String(error);
  console.error(`Brinefield could not start: ${detail}`);
  process.exitCode = 1;
}
