import { describe, it, expect } from "vitest";
import {
  designConstraintsFrom,
  designCandidates,
  diametersForPortCount,
  planDesignSearch,
  candidateOverrides,
  exitVelocity,
  designKey,
  DESIGN_MAX_CANDIDATES,
  type DesignCandidate,
  type DesignConstraints,
} from "../../../core/study/design";
import {
  designOutcome,
  designDiffuserBlock,
  judgeDesign,
  shortList,
  compareDesigns,
} from "../../../core/study/design-rank";
import { NOMINAL_SIZES_DN } from "../../../core/study/nominal-sizes";
import { evaluatePoint } from "../../../core/study/evaluate-point";
import { evaluateScenario } from "../../../core/study/evaluate";
import { expandCases } from "../../../core/cases";
import { runScenario } from "../../../core/pipeline";
import { parseScenario } from "../../../core/scenario/parse";
import type { Scenario } from "../../../core/scenario/types";
import { fourPortRaw, scenarioFrom } from "./fixtures";

function constraints(s: Scenario, block: unknown): DesignConstraints {
  const r = designConstraintsFrom(s, block);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.constraints;
}

describe("designCandidates()", () => {
  const s = scenarioFrom(fourPortRaw());

  it("keeps every candidate inside the velocity range, the diameter limits and the maximum length", () => {
    const c = constraints(s, {
      minExitVelocity: "3 m/s",
      maxExitVelocity: 5,
      maxLength: 40,
      maxPorts: 8,
      minPortDiameter: 0.1,
      maxPortDiameter: "250 mm",
    });
    const list = designCandidates(s, c);
    expect(list.length, "some candidates").toBeGreaterThan(20);
    for (const d of list) {
      // Exit velocity of the mean port: Q/(n·πd²/4) (continuity).
      const v = s.discharge.flow / d.portCount / ((Math.PI * d.portDiameter ** 2) / 4);
      expect(exitVelocity(s.discharge.flow, d.portCount, d.portDiameter, 1), "continuity").toBeCloseTo(v, 12);
      expect(v >= 3 - 1e-9 && v <= 5 + 1e-9, `velocity ${v} within 3–5 m/s`).toBe(true);
      expect(d.portDiameter >= 0.1 && d.portDiameter <= 0.25, `diameter ${d.portDiameter} within 0.1–0.25 m`).toBe(
        true,
      );
      expect(d.length <= 40, `length ${d.length} ≤ 40 m`).toBe(true);
      if (d.portCount > 1) expect(d.portSpacing, "ports do not overlap").toBeGreaterThan(d.portDiameter);
    }
  });

  it("defaults to port diameters of 0.05–0.5 m", () => {
    const c = constraints(s, {});
    expect([c.minPortDiameter, c.maxPortDiameter], "common practice, no source").toEqual([0.05, 0.5]);
  });

  it("spans the diameters a hand calculation gives for the velocity band: d = √(4Q/(nπv))", () => {
    // Q = 0.25 m³/s, 2 ports, 3–6 m/s: d from √(4·0.25/(2π·6)) = 0.1629 m to √(4·0.25/(2π·3)) = 0.2303 m.
    const c = constraints(s, { diameterSteps: 3 });
    const ds = diametersForPortCount(s, c, 2);
    expect(ds[0], "at 6 m/s, rounded up to the millimetre inside the band").toBeCloseTo(0.163, 3);
    expect(ds[ds.length - 1], "at 3 m/s").toBeCloseTo(0.23, 3);
  });

  it("keeps diameters to nominal sizes when asked (ISO 6708 DN series)", () => {
    const c = constraints(s, { nominalSizes: true, maxPorts: 12 });
    const list = designCandidates(s, c);
    expect(list.length, "some candidates").toBeGreaterThan(0);
    for (const d of list) {
      expect(NOMINAL_SIZES_DN, `${d.portDiameter} m is a DN size`).toContain(Math.round(d.portDiameter * 1000));
    }
    // 2 ports, 3–6 m/s: 163–230 mm holds DN 200 only.
    expect(diametersForPortCount(s, c, 2), "DN 200 only").toEqual([0.2]);
  });

  it("lists no design twice, even with repeated angles and heights", () => {
    const c = constraints(s, { portAngles: [45, 45, 60], portHeights: [1, 1], maxPorts: 6, spacingSteps: 6 });
    const list = designCandidates(s, c);
    const keys = list.map((d) => designKey(d.portCount, d.portDiameter, d.portAngle, d.portSpacing, d.portHeight));
    expect(new Set(keys).size, "unique geometries").toBe(keys.length);
    expect(new Set(list.map((d) => d.portAngle)), "angles once each").toEqual(new Set([45, 60]));
  });

  it("refuses a grid over the cap before building it, naming the fields", () => {
    const c = constraints(s, {
      portCounts: Array.from({ length: 200 }, (_, i) => i + 1),
      diameterSteps: 50,
      portAngles: [10, 20, 30, 40, 50, 60, 70, 80],
      spacingSteps: 20,
      minPortDiameter: 0.005,
      maxPortDiameter: 3,
      minExitVelocity: 0.1,
      maxExitVelocity: 30,
      maxLength: 5000,
    });
    const plan = planDesignSearch(s, c, 3);
    expect(plan.ok, "refused").toBe(false);
    if (plan.ok) return;
    expect(plan.count, "far over the cap").toBeGreaterThan(DESIGN_MAX_CANDIDATES);
    for (const f of [
      "design.maxPorts",
      "design.diameterSteps",
      "design.spacingSteps",
      "design.portAngles",
      "design.portHeights",
    ]) {
      expect(plan.message, `names ${f}`).toContain(f);
    }
    const small = planDesignSearch(s, constraints(s, { maxPorts: 4 }), 3);
    expect(small.ok, "the defaults stay under the cap").toBe(true);
  });

  it("rejects a bad design block naming the field", () => {
    const r = designConstraintsFrom(s, { minExitVelocity: "fast" });
    expect(r.ok, "not a speed").toBe(false);
    expect(r.ok ? "" : r.issues[0]!.path, "the path names the field").toBe("design.minExitVelocity");
    expect(designConstraintsFrom(s, { minExitVelocity: 6, maxExitVelocity: 3 }).ok, "min above max").toBe(false);
    const d = designConstraintsFrom(s, { minPortDiameter: 0.4, maxPortDiameter: 0.1 });
    expect(d.ok ? "" : d.issues[0]!.path, "diameter limits swapped").toBe("design.minPortDiameter");
  });
});

describe("design search (against the pipeline)", () => {
  const raw = fourPortRaw();
  raw.ambientCases = [
    { name: "spring tide", currentSpeed: 0.35 },
    { name: "neap tide", currentSpeed: 0.05 },
  ];
  const s = scenarioFrom(raw);
  const c = constraints(s, { maxPorts: 6, maxLength: 30, diameterSteps: 3, spacingSteps: 2 });
  const candidates = designCandidates(s, c);
  const points = candidates.map((d) => evaluatePoint(s, candidateOverrides(d), evaluateScenario));
  const outcome = designOutcome(s, c, candidates, points, raw.diffuser);
  const verdicts = candidates.map((d, i) => judgeDesign(d, points[i]!, c));

  it("orders the short list by the stated rule: fewest ports, shortest, velocity nearest mid-band, margin", () => {
    expect(outcome.designs.length, "more than one design passes in this example").toBeGreaterThan(1);
    expect(outcome.rankingRule, "the rule is stated").toMatch(
      /fewest ports.*shortest diffuser.*middle of the allowed band/,
    );
    const order = compareDesigns(c);
    for (let i = 1; i < outcome.ranked.length; i++) {
      expect(order(outcome.ranked[i - 1]!, outcome.ranked[i]!), `#${i} before #${i + 1}`).toBeLessThanOrEqual(0);
    }
    const passing = verdicts.filter((v) => v.ok);
    expect(outcome.ranked[0]!.candidate.portCount, "#1 has the fewest ports of all passing designs").toBe(
      Math.min(...passing.map((v) => v.candidate.portCount)),
    );
    expect(outcome.caution, "caution").toContain("screening estimate");
  });

  it("never lists a longer copy of a listed design that gains no margin", () => {
    const list = shortList(verdicts, { ...c, maxDesigns: 100 });
    for (const a of list) {
      for (const b of list) {
        if (a === b) continue;
        const same =
          a.candidate.portCount === b.candidate.portCount &&
          a.candidate.portDiameter === b.candidate.portDiameter &&
          a.candidate.portAngle === b.candidate.portAngle;
        if (same && a.rank < b.rank)
          expect(b.worstMargin, `#${b.rank} is a longer #${a.rank} with more margin`).toBeGreaterThan(a.worstMargin);
      }
    }
  });

  it("each design's diffuser block, pasted into the scenario as it is, reads and passes in every case", () => {
    for (const d of outcome.designs) {
      const parsed = parseScenario({ ...raw, diffuser: d.diffuser });
      if (!parsed.ok) throw new Error(`design #${d.rank}: ${parsed.issues.map((i) => i.message).join("; ")}`);
      const cases = expandCases(parsed.scenario);
      expect(
        cases.map((k) => k.name),
        "the stated conditions, spring, neap and slack water",
      ).toEqual(["stated", "spring tide", "neap tide", "slack water"]);
      let worst = Infinity;
      for (const k of cases) {
        const r = runScenario(k.scenario);
        expect(r.compliance.pass, `design #${d.rank} passes in ${k.name} (margin ${r.compliance.margin})`).toBe(true);
        worst = Math.min(worst, r.compliance.margin);
      }
      expect(worst, `design #${d.rank}: the pasted block gives the listed margin`).toBeCloseTo(d.worstMargin, 9);
    }
  });

  it("a single-port design's block has no spacing and round-trips through the scenario format", () => {
    const single: DesignCandidate = {
      portCount: 1,
      portDiameter: 0.2,
      portAngle: 60,
      portSpacing: 0,
      portHeight: 1,
      length: 0,
      exitVelocity: exitVelocity(0.25, 1, 0.2, 1),
    };
    const block = designDiffuserBlock(single, s, raw.diffuser);
    expect(block.layout, "single layout").toBe("single");
    expect("portSpacing" in block, "no portSpacing for one port").toBe(false);
    const parsed = parseScenario({ ...raw, diffuser: block });
    expect(parsed.ok, "the format accepts it").toBe(true);
    if (!parsed.ok) return;
    const viaOverride = evaluatePoint(s, candidateOverrides(single), evaluateScenario);
    const viaBlock = expandCases(parsed.scenario).map((k) => runScenario(k.scenario).compliance.margin);
    expect(viaBlock, "same margins as the search computed").toEqual(viaOverride.cases.map((k) => k.summary.margin));
  });

  it("gives no design but the nearest miss, with what would close it, when nothing can meet the limit", () => {
    const strictRaw: Record<string, unknown> = {
      ...fourPortRaw(),
      mixingZone: { radius: 5, limits: [{ constituent: "salinity", maxIncrease: 0.05 }] },
    };
    const strict = scenarioFrom(strictRaw);
    const cs = constraints(strict, { maxPorts: 3, diameterSteps: 2 });
    const cands = designCandidates(strict, cs);
    const pts = cands.map((d) => evaluatePoint(strict, candidateOverrides(d), evaluateScenario));
    const o = designOutcome(strict, cs, cands, pts, strictRaw.diffuser);
    expect(o.designs, "a 0.05 g/kg rise 5 m from the ports cannot be met").toEqual([]);
    expect(o.headline, "says so first").toMatch(/^No design meets every limit/);
    const m = o.nearestMiss!;
    expect(m, "a nearest miss").not.toBeNull();
    const best = Math.max(...pts.map((p) => p.cases[p.worst]!.summary.margin));
    expect(m.design.worstMargin, "the highest margin of all candidates").toBe(best);
    expect(m.dilutionShortfall, "shortfall = required margin ÷ margin").toBeCloseTo(1 / best, 12);
    expect(
      m.toClose.map((t) => t.field),
      "at the port-count bound",
    ).toContain("design.maxPorts");
  });
});
