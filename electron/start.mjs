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
const { runStart } = await import(pathToFileURL(join(ROOT, "dist", "electron", "launcher.mjs")).href);
process.exitCode = await runStart({ root: ROOT, argv: process.argv.slice(2), env: process.env });
