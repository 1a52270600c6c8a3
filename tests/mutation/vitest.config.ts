/**
 * The vitest set for one mutation run (`npm run mutate`): only the folder's own unit tests and the
 * property test at a reduced count, so each mutant is judged in seconds. The set comes from
 * BRINEFIELD_MUTATE_TESTS (comma-separated globs), written by tests/mutation/mutate.mjs.
 */
import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";
import { dirname, resolve } from "node:path";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const include = (process.env.BRINEFIELD_MUTATE_TESTS ?? "").split(",").filter(Boolean);
if (include.length === 0) throw new Error("BRINEFIELD_MUTATE_TESTS is empty: run through `npm run mutate`");

export default defineConfig({
  root,
  // isolate: false keeps the imported modules (mathjs, zod, the whole core) between mutant runs: importing
  // them again for every mutant cost seconds each.
  test: {
    root,
    include,
    // Files that replace a module with vi.mock are left out: without isolation the stand-in could stay in
    // the shared module cache and fail other files' tests, which would count mutants as detected.
    exclude: [
      "tests/browser/**",
      "tests/fuzz/**",
      "node_modules/**",
      "tests/core/farfield/turner-1986-stage-wiring.test.ts",
    ],
    testTimeout: 60_000,
    isolate: false,
  },
});
