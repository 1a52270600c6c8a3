// @ts-check
/**
 * Stryker configuration for one core folder at a time (`npm run mutate`, driven by
 * tests/mutation/mutate.mjs, which sets BRINEFIELD_MUTATE_FOLDER and BRINEFIELD_MUTATE_TESTS).
 * Not run in CI: a folder takes minutes to tens of minutes on two cores.
 */
import { FOLDERS } from "./folders.mjs";

const folder = process.env.BRINEFIELD_MUTATE_FOLDER ?? "";
if (!(folder in FOLDERS)) throw new Error(`BRINEFIELD_MUTATE_FOLDER must be one of ${Object.keys(FOLDERS).join(", ")}`);
const slug = folder.replace(/\//g, "-");

/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: "vitest",
  vitest: { configFile: "tests/mutation/vitest.config.ts", related: false },
  plugins: ["@stryker-mutator/vitest-runner", "./tests/mutation/live-reporter.mjs"],
  // BRINEFIELD_MUTATE_FILES (comma-separated, inside the folder) narrows a run to some files of the folder.
  mutate: process.env.BRINEFIELD_MUTATE_FILES
    ? process.env.BRINEFIELD_MUTATE_FILES.split(",").map((f) => f.trim())
    : [`${folder}/**/*.ts`, `!${folder}/index.ts`],
  // Static mutants (module-level constants and tables) need every module imported afresh per mutant,
  // which costs seconds each here; they are reported as ignored and left out of the score.
  ignoreStatic: true,
  coverageAnalysis: "perTest",
  // Two cores shared with other work: at most two test processes.
  concurrency: Number(process.env.BRINEFIELD_MUTATE_CONCURRENCY ?? 2),
  incremental: true,
  incrementalFile: `tests/mutation/.incremental/${slug}.json`,
  tempDirName: "tests/mutation/.stryker-tmp",
  cleanTempDir: "always",
  ignorePatterns: [
    "dist",
    "release",
    "test-artifacts",
    "renderer",
    "electron",
    "tests/browser",
    "tests/renderer",
    "tests/electron",
    "tests/mutation/.incremental",
    "tests/mutation/.reports",
  ],
  reporters: ["clear-text", "progress", "json", "live"],
  jsonReporter: { fileName: `tests/mutation/.reports/${slug}.json` },
  clearTextReporter: {
    allowEmojis: false,
    logTests: false,
    reportScoreTable: true,
    reportMutants: false,
  },
  // Generous: on a shared, loaded machine a shorter timeout counts slow runs as "timed out" (detected).
  // BRINEFIELD_MUTATE_TIMEOUT_MS shortens it on a quiet machine, where mutants that never end the
  // integration loop otherwise hold a test runner for the whole allowance and its restart.
  timeoutMS: Number(process.env.BRINEFIELD_MUTATE_TIMEOUT_MS ?? 15_000),
  timeoutFactor: 1.5,
  thresholds: { high: 85, low: 75, break: null },
};
