#!/usr/bin/env node
/**
 * `npm run mutate [-- core/scenario core/farfield …]`: Stryker over core/, one folder at a time, each
 * with its own fast test set (folders.mjs) and the property test at BRINEFIELD_PROPERTY_RUNS (default
 * 10 here instead of 1,000, no shrinking). Incremental: results of unchanged code and tests are reused from
 * tests/mutation/.incremental/. Prints one score line per folder at the end.
 */
import { spawnSync } from "node:child_process";
import { readFileSync, existsSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { dirname, resolve, join } from "node:path";
import { FOLDERS } from "./folders.mjs";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const asked = process.argv.slice(2).map((a) => a.replace(/\/+$/, ""));
const folders = asked.length > 0 ? asked : Object.keys(FOLDERS);
for (const f of folders)
  if (!(f in FOLDERS)) {
    console.error(`unknown folder ${f}; known: ${Object.keys(FOLDERS).join(", ")}`);
    process.exit(2);
  }

const stryker = join(root, "node_modules/@stryker-mutator/core/bin/stryker.js");
const lines = [];
let failed = false;
for (const folder of folders) {
  const env = {
    ...process.env,
    BRINEFIELD_MUTATE_FOLDER: folder,
    BRINEFIELD_MUTATE_TESTS: FOLDERS[folder].join(","),
    BRINEFIELD_PROPERTY_RUNS: process.env.BRINEFIELD_PROPERTY_RUNS ?? "10",
    BRINEFIELD_PROPERTY_SHRINK: "0",
  };
  console.log(`\n=== ${folder} ===`);
  const r = spawnSync(process.execPath, [stryker, "run", "tests/mutation/stryker.config.mjs"], {
    cwd: root,
    env,
    stdio: "inherit",
  });
  if (r.status !== 0) {
    failed = true;
    lines.push(`${folder}: stryker exited ${r.status}`);
    continue;
  }
  lines.push(
    `mutation score ${folder}: ${score(join(root, "tests/mutation/.reports", `${folder.replace(/\//g, "-")}.json`))}`,
  );
}
console.log("\n" + lines.join("\n"));
process.exit(failed ? 1 : 0);

/** Mutation score as Stryker defines it: detected (killed + timeout) / valid (detected + survived + no coverage). */
function score(file) {
  if (!existsSync(file)) return "no report";
  const report = JSON.parse(readFileSync(file, "utf8"));
  const n = { detected: 0, undetected: 0 };
  for (const f of Object.values(report.files))
    for (const m of f.mutants) {
      if (m.status === "Killed" || m.status === "Timeout") n.detected++;
      else if (m.status === "Survived" || m.status === "NoCoverage") n.undetected++;
    }
  const total = n.detected + n.undetected;
  return total === 0 ? "no mutants" : `${Math.floor((100 * n.detected) / total)} % (${n.detected}/${total} mutants)`;
}
