// @ts-check
/**
 * A Stryker reporter that appends every undetected mutant (survived or not covered) to a text file as
 * soon as it is judged, so work on the missing tests can start before a long run ends. One line each:
 * status, file:line:column, mutator, replacement. The file is BRINEFIELD_MUTATE_LIVE_FILE, default
 * tests/mutation/.reports/<folder>.live.txt.
 */
import { appendFileSync, mkdirSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";
import { declareClassPlugin, PluginKind } from "@stryker-mutator/api/plugin";

const folder = (process.env.BRINEFIELD_MUTATE_FOLDER ?? "core").replace(/\//g, "-");
const file = process.env.BRINEFIELD_MUTATE_LIVE_FILE ?? `tests/mutation/.reports/${folder}.live.txt`;

class LiveReporter {
  constructor() {
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, "");
  }
  /** @param {import("@stryker-mutator/api/core").MutantResult} m */
  onMutantTested(m) {
    if (m.status !== "Survived" && m.status !== "NoCoverage") return;
    const where = `${m.fileName}:${m.location.start.line}:${m.location.start.column}`;
    const text = (m.replacement ?? "").replace(/\s+/g, " ").slice(0, 100);
    appendFileSync(file, `${m.status}\t${where}\t${m.mutatorName}\t${text}\n`);
  }
}

export const strykerPlugins = [declareClassPlugin(PluginKind.Reporter, "live", LiveReporter)];
