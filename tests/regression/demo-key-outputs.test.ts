/** Regression record of the demo scenarios' key outputs (see demo-key-outputs.ts for how to update it). */
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { demoKeyOutputs, RECORD_FILE } from "./demo-key-outputs";

const recorded = JSON.parse(readFileSync(RECORD_FILE, "utf8")) as Record<string, Record<string, unknown>>;
const current = demoKeyOutputs();

describe("demo scenarios, key outputs", () => {
  it("covers every demo scenario", () => {
    expect(Object.keys(current).sort(), "one record per demo").toEqual(Object.keys(recorded).sort());
  });
  for (const [file, row] of Object.entries(recorded)) {
    it(`${file} keeps its recorded key outputs (relative change ≤ 1e-6)`, () => {
      for (const [key, want] of Object.entries(row)) {
        const got = current[file]?.[key];
        const msg = `${file} ${key}: recorded ${String(want)}, now ${String(got)} — if intended, regenerate with npx tsx tests/regression/update-demo-key-outputs.ts`;
        if (typeof want === "number" && typeof got === "number")
          expect(Math.abs(got - want) <= 1e-6 * Math.abs(want), msg).toBe(true);
        else expect(got, msg).toEqual(want);
      }
    });
  }
});
