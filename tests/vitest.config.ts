import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";
import { dirname, resolve } from "node:path";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");

export default defineConfig({
  root,
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          root,
          include: ["tests/**/*.test.ts", "tests/**/*.test.tsx"],
          // tests/mutation/ holds Stryker's sandbox copies of the tests while `npm run mutate` runs.
          exclude: ["tests/browser/**", "tests/fuzz/**", "tests/mutation/**", "node_modules/**"],
          testTimeout: 30_000,
          globalSetup: ["tests/helpers/build-cli-bundle.ts"],
        },
      },
      {
        extends: true,
        test: {
          name: "browser",
          root,
          include: ["tests/browser/**/*.test.ts"],
          testTimeout: 180_000,
          hookTimeout: 300_000,
          fileParallelism: false,
        },
      },
      {
        extends: true,
        test: {
          name: "fuzz",
          root,
          include: ["tests/fuzz/**/*.fuzz.ts"],
          testTimeout: 600_000,
        },
      },
    ],
  },
});
