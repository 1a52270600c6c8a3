/**
 * Global set-up of the unit project: builds the command-line bundle once, before any test file starts.
 * Without it, on a clean clone every CLI test file that starts first would race to build the same bundle,
 * and a test that times a signal against a child process would count the build in its wait.
 */
import { spawnSync } from "node:child_process";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

export default function setup(): void {
  const root = join(dirname(fileURLToPath(import.meta.url)), "../..");
  const r = spawnSync(process.execPath, [join(root, "core/cli/launcher.mjs"), "--version"], {
    cwd: root,
    encoding: "utf8",
  });
  if (r.status !== 0) throw new Error(`building the command-line bundle failed:\n${r.stderr}`);
}
