import { describe, it, expect } from "vitest";
import {
  planMonteCarlo,
  runMonteCarloChunk,
  splitRuns,
  summariseMonteCarlo,
  type MonteCarloPlan,
} from "../../../core/study/montecarlo";
import { evaluateScenario } from "../../../core/study/evaluate";
import { expandCases } from "../../../core/cases";
import type { Scenario } from "../../../core/scenario/types";
import type { Evaluator } from "../../../core/study/summary";
import { fourPortRaw, identityEvaluator, scenarioFrom } from "./fixtures";
import { assertInDelta } from "../../helpers/assert";

function plan(s: Scenario, runs: number, seed: number): MonteCarloPlan {
  const p = planMonteCarlo(s, runs, seed);
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
  return p.plan;
}

function run(s: Scenario, pl: MonteCarloPlan, evaluate: Evaluator, parts: number) {
  return summariseMonteCarlo(
    pl,
    splitRuns(pl.runs, parts).map((c) => runMonteCarloChunk(s, pl, c.start, c.end, evaluate)),
  );
}

function withUncertainty(extra: Record<string, unknown>, inputs: unknown[]): Scenario {
  return scenarioFrom({ ...fourPortRaw(), ...extra, uncertainty: { inputs } });
}

describe("Monte Carlo — closed-form cases (identity-like output)", () => {
  it("a uniform current U(0.1, 0.5) through an identity output has P5/P50/P95 = 0.12/0.30/0.48", () => {
    // Closed form: the p-quantile of U(a, b) is a + p(b − a). Tolerance ~4 standard errors of a sample
    // quantile for N = 20 000: √(p(1−p)/N)·(b − a) ≈ 6e-4 at p = 0.05, 1.4e-3 at the median.
    const s = withUncertainty({ options: { addSlackWater: false } }, [
      { path: "ambient.currentSpeed", distribution: "uniform", min: 0.1, max: 0.5 },
    ]);
    const pl = plan(s, 20_000, 11);
    const r = run(
      s,
      pl,
      identityEvaluator(0.2, (x) => x.ambient.currentSpeed),
      1,
    );
    assertInDelta(
      [r.cases[0]!.edgeDilution.p5, r.cases[0]!.edgeDilution.p50, r.cases[0]!.edgeDilution.p95],
      [0.12, 0.3, 0.48],
      0.006,
      "percentiles of a uniform input",
    );
    // P(U < 0.2) = (0.2 − 0.1)/(0.5 − 0.1) = 0.25: the required "dilution" 0.2 is not met a quarter of
    // the time.
    const pe = r.cases[0]!.probabilityOfExceedance;
    assertInDelta(pe, 0.25, 0.012, "exceedance probability of a uniform input");
  });

  it("a normal brine salinity N(65, 1.5) through an identity output has P5/P95 = 65 ∓ 1.6449·1.5", () => {
    // z(0.95) = 1.644854 (Python 3 statistics.NormalDist().inv_cdf(0.95)); P5 = 62.5327, P95 = 67.4673.
    const s = withUncertainty({ options: { addSlackWater: false } }, [
      { path: "discharge.salinity", distribution: "normal", mean: 65, sd: 1.5 },
    ]);
    const pl = plan(s, 20_000, 3);
    const r = run(
      s,
      pl,
      identityEvaluator(66, (x) => x.discharge.salinity),
      1,
    );
    const e = r.cases[0]!.edgeDilution;
    assertInDelta([e.p5, e.p50, e.p95], [62.5327, 65, 67.4673], 0.05, "percentiles of a normal input");
    // P(X < 66) = Φ((66 − 65)/1.5) = Φ(0.6667) = 0.7475 (NormalDist().cdf).
    const pe = r.cases[0]!.probabilityOfExceedance;
    assertInDelta(pe, 0.7475, 0.012, "exceedance probability of a normal input");
  });

  it("a lognormal current with median 0.1 and gsd 2 has P95 = 0.1·2^1.6449 = 0.3127", () => {
    // ln X ~ N(ln 0.1, ln 2): P95 = 0.1·exp(1.644854·ln 2) = 0.31268, P5 = 0.031981 (closed form).
    const s = withUncertainty({ options: { addSlackWater: false } }, [
      { path: "ambient.currentSpeed", distribution: "lognormal", median: 0.1, gsd: 2 },
    ]);
    const r = run(
      s,
      plan(s, 20_000, 5),
      identityEvaluator(1, (x) => x.ambient.currentSpeed),
      1,
    );
    const e = r.cases[0]!.edgeDilution;
    assertInDelta([e.p5, e.p50, e.p95], [0.031981, 0.1, 0.31268], 0.0045, "percentiles of a lognormal input");
  });

  it("a triangular flow (0.2, 0.25, 0.3) has median 0.25 and P5 = 0.2 + √(0.05)·0.1·… (closed form)", () => {
    // Symmetric triangular on [a, b]: F⁻¹(p) = a + (b − a)·√(p/2) for p ≤ ½
    // → P5 = 0.2 + 0.1·√0.025 = 0.215811.
    const s = withUncertainty({ options: { addSlackWater: false } }, [
      { path: "discharge.flow", distribution: "triangular", min: 0.2, mode: 0.25, max: 0.3 },
    ]);
    const r = run(
      s,
      plan(s, 20_000, 8),
      identityEvaluator(1, (x) => x.discharge.flow),
      1,
    );
    const e = r.cases[0]!.edgeDilution;
    const expected = [0.215811, 0.25, 0.284189];
    assertInDelta([e.p5, e.p50, e.p95], expected, 0.0012, "percentiles of a triangular input");
  });
});

describe("Monte Carlo — reproducibility", () => {
  const s = withUncertainty({}, [
    { path: "ambient.currentSpeed", distribution: "lognormal", gsd: 1.5 },
    { path: "discharge.flow", distribution: "normal", sd: 0.01 },
  ]);
  const fake = identityEvaluator(0.1, (x) => x.ambient.currentSpeed * 100 + x.discharge.flow);

  it("repeats exactly with the same seed, whatever the number of chunks (workers)", () => {
    const pl = plan(s, 1000, 12345);
    const one = run(s, pl, fake, 1);
    for (const parts of [2, 3, 7, 1000]) {
      expect(run(s, pl, fake, parts), `split into ${parts} chunks gives identical results`).toEqual(one);
    }
    const other = run(s, plan(s, 1000, 12346), fake, 1);
    expect(other.cases[0]!.edgeDilution.p50, "another seed gives another sample").not.toBe(
      one.cases[0]!.edgeDilution.p50,
    );
  });

  it("splits runs into contiguous chunks covering every run once", () => {
    const chunks = splitRuns(10, 3);
    expect(chunks, "3 chunks of 10 runs").toEqual([
      { start: 0, end: 3 },
      { start: 3, end: 6 },
      { start: 6, end: 10 },
    ]);
    expect(splitRuns(2, 8).length, "never more chunks than runs").toBe(2);
  });

  it("keeps the slack-water case at zero current while the current varies", () => {
    const pl = plan(s, 200, 1);
    const seen: number[] = [];
    runMonteCarloChunk(s, pl, 0, 200, (x) => {
      seen.push(x.ambient.currentSpeed);
      return fake(x);
    });
    expect(pl.caseNames, "the stated conditions and the added slack-water case").toEqual(["stated", "slack water"]);
    expect(seen.filter((v) => v === 0).length, "one zero-current evaluation per run (slack water)").toBe(200);
  });
});

describe("Monte Carlo — against the pipeline", () => {
  it("with zero spread equals the deterministic run in every case", () => {
    const raw = fourPortRaw();
    raw.ambientCases = [
      { name: "spring tide", currentSpeed: 0.3 },
      { name: "neap tide", currentSpeed: 0.05, temperature: 24 },
    ];
    const s = scenarioFrom({
      ...raw,
      uncertainty: {
        inputs: [
          { path: "ambient.currentSpeed", distribution: "normal", sd: 0 },
          { path: "ambient.salinity", distribution: "normal", sd: 0 },
          { path: "ambient.temperature", distribution: "normal", sd: 0 },
          { path: "discharge.salinity", distribution: "normal", sd: 0 },
          { path: "discharge.flow", distribution: "lognormal", gsd: 1 },
        ],
      },
    });
    const pl = plan(s, 5, 77);
    const r = run(s, pl, evaluateScenario, 2);
    const cases = expandCases(s);
    expect(
      r.cases.map((c) => c.name),
      "cases in order, slack water added",
    ).toEqual(cases.map((c) => c.name));
    cases.forEach((c, i) => {
      const det = evaluateScenario(c.scenario);
      const e = r.cases[i]!.edgeDilution;
      const d = det.edgeDilution;
      expect([e.p5, e.p50, e.p95], `${c.name}: every run equals the deterministic run`).toEqual([d, d, d]);
      expect(r.cases[i]!.probabilityOfExceedance, `case ${c.name}: exceedance is 0 or 1`).toBe(det.pass ? 0 : 1);
    });
  });

  it("uses the documented default spreads when the scenario states none, and says so", () => {
    const s = scenarioFrom(fourPortRaw());
    const pl = plan(s, 3, 1);
    expect(pl.usedDefaultSpreads, "defaults used").toBe(true);
    expect(pl.notes[0], "the note says defaults were used").toMatch(/default spreads/);
    expect(
      pl.distributions.map((d) => d.path),
      "the five default inputs",
    ).toEqual([
      "ambient.currentSpeed",
      "ambient.salinity",
      "ambient.temperature",
      "discharge.salinity",
      "discharge.flow",
    ]);
  });

  it("wraps a sampled current direction around north instead of clamping it", () => {
    const s = withUncertainty({ options: { addSlackWater: false } }, [
      { path: "ambient.currentDirection", distribution: "uniform", min: 340, max: 380 },
    ]);
    const seen: number[] = [];
    runMonteCarloChunk(s, plan(s, 400, 2), 0, 400, (x) => {
      seen.push(x.ambient.currentDirection);
      return identityEvaluator(1, () => 1)(x);
    });
    expect(
      seen.every((d) => d >= 0 && d < 360),
      "directions stay in [0, 360)",
    ).toBe(true);
    // Half of U(340, 380) lies past 360° and wraps to [0, 20): about 200 of 400 draws (binomial sd 10).
    const wrapped = seen.filter((d) => d < 20).length;
    expect(Math.abs(wrapped - 200), `wrapped draws ${wrapped}`).toBeLessThan(50);
  });

  it("rejects an impossible distribution naming the input", () => {
    const s = withUncertainty({}, [{ path: "discharge.flow", distribution: "uniform", min: 0.3, max: 0.2 }]);
    const p = planMonteCarlo(s, 10, 1);
    expect(p.ok, "min above max is rejected").toBe(false);
    expect(p.ok ? "" : p.issues[0]!.path, "the issue names the input").toBe("uncertainty.inputs.0");
  });
});

describe("Monte Carlo — equation of state", () => {
  it("says when runs cross from TEOS-10 to the brine correlation (brine salinity straddling 42 g/kg)", () => {
    // TEOS-10 holds to 42 g/kg Absolute Salinity (IOC, SCOR & IAPSO 2010); a brine drawn around 42 g/kg must
    // use TEOS-10 in some runs and the brine correlation in others, and the summary must say so.
    const s = withUncertainty({ options: { addSlackWater: false } }, [
      { path: "discharge.salinity", distribution: "uniform", min: 40, max: 44 },
    ]);
    const pl = plan(s, 40, 5);
    const summary = run(s, pl, evaluateScenario, 2);
    const names = Object.keys(summary.equationsOfState).sort();
    expect(names, "both equations of state were used").toEqual(["Sharqawy 2010 + Nayar 2016", "TEOS-10"]);
    expect(
      summary.notes.some((n) => /equation of state changes between runs/.test(n)),
      "a note says so",
    ).toBe(true);
  });

  it("adds no note when every run uses one equation of state", () => {
    const s = withUncertainty({ options: { addSlackWater: false } }, [
      { path: "ambient.currentSpeed", distribution: "uniform", min: 0.05, max: 0.2 },
    ]);
    const summary = run(s, plan(s, 10, 5), evaluateScenario, 1);
    expect(Object.keys(summary.equationsOfState).length, "one equation").toBe(1);
    expect(
      summary.notes.some((n) => /equation of state changes/.test(n)),
      "no crossing note",
    ).toBe(false);
  });
});
