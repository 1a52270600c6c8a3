import { describe, it, expect } from "vitest";
import {
  designConstraintsFrom,
  designCandidates,
  candidateOverrides,
  judgeDesign,
  shortList,
  exitVelocity,
  type DesignCandidate,
  type DesignConstraints,
} from "../../../core/study/design";
import { evaluatePoint } from "../../../core/study/evaluate-point";
import { evaluateScenario } from "../../../core/study/evaluate";
import { withOverrides } from "../../../core/study/overrides";
import { expandCases } from "../../../core/study/cases";
import { runScenario } from "../../../core/pipeline";
import type { Scenario } from "../../../core/scenario/types";
import { fourPortRaw, scenarioFrom } from "./fixtures";

function constraints(s: Scenario, block: unknown): DesignConstraints {
  const r = designConstraintsFrom(s, block);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.constraints;
}

describe("designCandidates()", () => {
  const s = scenarioFrom(fourPortRaw());

  it("keeps every candidate inside the velocity range and the maximum length", () => {
    const c = constraints(s, { minExitVelocity: "3 m/s", maxExitVelocity: 5, maxLength: 40, maxPorts: 8 });
    const list = designCandidates(s, c);
    expect(list.length, "some candidates").toBeGreaterThan(20);
    for (const d of list) {
      // Exit velocity of the mean port: Q/(n·πd²/4) (continuity).
      const v = exitVelocity(s.discharge.flow, d.portCount, d.portDiameter, 1);
      expect(v >= 3 - 1e-9 && v <= 5 + 1e-9, `velocity ${v} within 3–5 m/s`).toBe(true);
      expect(d.length <= 40, `length ${d.length} ≤ 40 m`).toBe(true);
      expect([30, 45, 60], "default angles").toContain(d.portAngle);
    }
  });

  it("rejects a bad design block naming the field", () => {
    const r = designConstraintsFrom(s, { minExitVelocity: "fast" });
    expect(r.ok, "not a speed").toBe(false);
    expect(r.ok ? "" : r.issues[0]!.path, "the path names the field").toBe("design.minExitVelocity");
    const swap = designConstraintsFrom(s, { minExitVelocity: 6, maxExitVelocity: 3 });
    expect(swap.ok, "min above max").toBe(false);
  });
});

describe("design search (against the pipeline)", () => {
  const raw = fourPortRaw();
  raw.ambientCases = [{ name: "spring tide", currentSpeed: 0.35 }, { name: "neap tide", currentSpeed: 0.05 }];
  const s = scenarioFrom(raw);
  const c = constraints(s, { maxPorts: 6, maxLength: 30, diameterSteps: 3 });
  const judge = (d: DesignCandidate) =>
    judgeDesign(d, evaluatePoint(s, candidateOverrides(d), evaluateScenario), c);
  const verdicts = designCandidates(s, c).map(judge);
  const list = shortList(verdicts, c.maxDesigns);

  it("returns a short list with trade-offs, not one answer", () => {
    expect(list.length, "more than one design passes in this example").toBeGreaterThan(1);
    const labels = list.flatMap((d) => d.bestFor);
    for (const k of ["fewest ports", "lowest exit velocity", "largest margin"]) {
      expect(labels, `a design is best for ${k}`).toContain(k);
    }
    const fewest = list.find((d) => d.bestFor.includes("fewest ports"))!;
    const passing = verdicts.filter((v) => v.ok);
    expect(fewest.candidate.portCount, "fewest ports is the minimum over passing designs").toBe(
      Math.min(...passing.map((v) => v.candidate.portCount)),
    );
    const largest = list.find((d) => d.bestFor.includes("largest margin"))!;
    const best = Math.max(...passing.map((v) => v.worstMargin));
    expect(largest.worstMargin, "largest margin is the maximum").toBe(best);
  });

  it("every returned design re-checks as passing with runScenario in all cases, slack water included", () => {
    for (const d of list) {
      const patched = withOverrides(s, candidateOverrides(d.candidate));
      const cases = expandCases(patched);
      expect(cases.map((k) => k.name), "the stated conditions, spring, neap and slack water").toEqual(
        ["stated", "spring tide", "neap tide", "slack water"],
      );
      for (const k of cases) {
        const r = runScenario(k.scenario);
        expect(
          r.compliance.pass,
          `design #${d.rank} passes in ${k.name} (margin ${r.compliance.margin})`,
        ).toBe(true);
        expect(r.port.velocity, `design #${d.rank} exit velocity in range`).toBeGreaterThanOrEqual(3 - 1e-9);
        expect(r.port.velocity, `design #${d.rank} exit velocity in range`).toBeLessThanOrEqual(6 + 1e-9);
        for (const m of r.nearField) {
          if (m.maxRiseHeight === null) continue;
          const top = k.scenario.diffuser.portHeight + m.maxRiseHeight;
          expect(top, `${m.method}: jet stays below the surface`).toBeLessThan(k.scenario.ambient.depth);
        }
      }
    }
  });

  it("lists nothing when no design can meet the limit", () => {
    const strict = scenarioFrom({
      ...fourPortRaw(),
      mixingZone: { radius: 1, limits: [{ constituent: "salinity", maxIncrease: 0.01 }] },
    });
    const cs = constraints(strict, { maxPorts: 2, diameterSteps: 2 });
    const v = designCandidates(strict, cs).map((d) =>
      judgeDesign(d, evaluatePoint(strict, candidateOverrides(d), evaluateScenario), cs),
    );
    expect(shortList(v, 8), "a 0.01 g/kg rise 1 m from the ports cannot be met").toEqual([]);
  });
});
