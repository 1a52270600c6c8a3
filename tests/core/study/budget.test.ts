/** Work caps: no command runs for more than about a minute on two cores (caps are counts, never timed). */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parseScenario } from "../../../core/scenario/parse";
import {
  caseWorkUnits,
  MAX_SWEEP_POINTS,
  MAX_WORK_UNITS,
  sweepPointsIssue,
  workIssue,
} from "../../../core/study/budget";
import { MAX_RUNS, planMonteCarlo } from "../../../core/study/montecarlo";

const raw = () => JSON.parse(readFileSync(join(__dirname, "../../../demo-scenarios/island-cove.json"), "utf8"));
function scenario(mutate: (r: any) => void = () => undefined) {
  const r = raw();
  mutate(r);
  const p = parseScenario(r);
  if (!p.ok) throw new Error(p.issues[0]!.message);
  return p.scenario;
}

describe("work caps", () => {
  it("refuses a 500 × 500 sweep by its point count", () => {
    expect(sweepPointsIssue(500 * 500), "250,000 points").toMatch(/250000 points is more than the 40,000/);
    expect(sweepPointsIssue(MAX_SWEEP_POINTS), "exactly at the cap").toBeNull();
  });

  it("weighs a profile and more ports: a 500-point profile with 12 ports costs far more than uniform water", () => {
    const plain = scenario();
    const heavy = scenario((r) => {
      delete r.ambient.salinity;
      delete r.ambient.temperature;
      r.ambient.profile = Array.from({ length: 500 }, (_, i) => ({
        depth: (18 * i) / 499,
        salinity: 38.5,
        temperature: 24 - 0.01 * i,
      }));
      r.diffuser.portCount = 12;
    });
    expect(caseWorkUnits(heavy) / caseWorkUnits(plain), "heavy/plain").toBeGreaterThan(20);
    expect(workIssue("x", 1000 * 51, heavy), "1,000 runs × 51 cases of the heavy scenario").toMatch(/over the 60,000/);
    expect(workIssue("x", 10_000 * 2, plain), "the 10,000-run Monte Carlo of the bench stays allowed").toBeNull();
    expect(workIssue("x", Math.floor(MAX_WORK_UNITS / caseWorkUnits(plain)), plain), "just under the cap").toBeNull();
  });

  it("caps Monte Carlo runs at one million", () => {
    expect(MAX_RUNS, "cap").toBe(1_000_000);
    const p = planMonteCarlo(scenario(), MAX_RUNS + 1, 1);
    expect(p.ok, "one over the cap is refused").toBe(false);
  });
});
