/**
 * Compliance over an ambient record. The checks are against arithmetic done here by hand: a record of
 * identical steps is the steady result, a record alternating two states is the mixture of the two steady
 * results, the share of time meeting the limit is a count of the steps (durations: the time until the
 * next step). Percentiles of time without interpolation (the smallest value not exceeded for X % of the
 * time) are a definition (common practice, no source).
 */
import { describe, it, expect } from "vitest";
import { runScenario } from "../../../core/pipeline";
import { evaluateCases } from "../../../core/study/summary";
import { evaluateScenario } from "../../../core/study/evaluate";
import { evaluatePoint } from "../../../core/study/evaluate-point";
import { withOverrides } from "../../../core/study/overrides";
import { expandCases } from "../../../core/cases";
import { planMonteCarlo, runMonteCarloChunk, VERDICT_CODE } from "../../../core/study/montecarlo";
import { stepDurations } from "../../../core/record/steps";
import { weightedQuantile, valueExceededFor } from "../../../core/record/summary";
import { recordFromCsv } from "../../../core/record/csv";
import { parseTime } from "../../../core/record/time";
import { scenarioWith, parseIssues } from "./fixtures";

const hours = (n: number) => Array.from({ length: n }, (_, i) => `${i} h`);

function steady(currentSpeed: number, currentDirection = 90, mixingZone?: Record<string, unknown>) {
  return runScenario(
    scenarioWith({ ambient: { currentSpeed, currentDirection }, ...(mixingZone ? { mixingZone } : {}) }),
    { includePath: false },
  );
}

describe("ambient record: steps as quasi-steady states", () => {
  it("a record whose every step is identical gives the steady result", () => {
    const s = steady(0.2, 45);
    const r = runScenario(
      scenarioWith({
        ambient: {
          record: { time: hours(5), currentSpeed: [0.2, 0.2, 0.2, 0.2, 0.2], currentDirection: [45, 45, 45, 45, 45] },
        },
      }),
      { includePath: false },
    );
    const rec = r.record!;
    expect(rec.steps).toBe(5);
    for (const k of ["min", "p5", "p50", "p95"] as const) expect(rec.edgeDilution[k], k).toBe(s.mixingZone.dilution);
    expect(r.overall.verdict, "verdict").toBe(s.compliance.verdict);
    expect(r.overall.margin, "margin").toBe(s.compliance.margin);
    expect(rec.meetsPercent).toBe(s.compliance.verdict === "meets" ? 100 : 0);
    expect(r.cases.length, "the steps are the cases").toBe(5);
    expect(r.cases.every((c) => c.kind === "record" && c.edgeDilution === s.mixingZone.dilution)).toBe(true);
  });

  it("a record alternating two states gives the mixture of the two steady results", () => {
    const slow = steady(0);
    const fast = steady(0.5);
    const [lo, hi] = [slow.mixingZone.dilution, fast.mixingZone.dilution].sort((a, b) => a - b);
    expect(hi / lo, "the two states differ").toBeGreaterThan(1.2);
    // A limit whose required dilution lies between the two: one state meets, the other exceeds.
    const required = Math.sqrt(lo! * hi!);
    const maxIncrease = (65 - 36) / required;
    const speeds = [0, 0.5, 0, 0.5, 0, 0.5];
    const run = (percentOfTime?: number) =>
      runScenario(
        scenarioWith({
          ambient: { record: { time: hours(6), currentSpeed: speeds, currentDirection: speeds.map(() => 90) } },
          mixingZone: {
            limits: [{ constituent: "salinity", maxIncrease }],
            ...(percentOfTime ? { timeCompliance: { percentOfTime } } : {}),
          },
        }),
        { includePath: false },
      );
    const r = run();
    const rec = r.record!;
    expect(rec.edgeDilution.min).toBe(lo);
    expect(rec.edgeDilution.p5).toBe(lo);
    expect(rec.edgeDilution.p50, "half the time at or below the lower value").toBe(lo);
    expect(rec.edgeDilution.p95).toBe(hi);
    expect(rec.meetsPercent, "half the time meets").toBeCloseTo(50, 12);
    expect(rec.exceedsPercent).toBeCloseTo(50, 12);
    expect(rec.longestExceedanceHours, "exceedances last one hourly step each").toBe(1);
    expect(rec.worstStep.edgeDilution).toBe(lo);
    expect(r.overall.verdict, "no time share: any exceeding step decides").toBe("exceeds");
    const half = run(50);
    expect(half.overall.verdict, "met 50 % of the time meets a 50 % rule").toBe("meets");
    expect(half.overall.margin, "margin: dilution exceeded 50 % of the time ÷ required").toBeCloseTo(hi! / required, 6);
    const most = run(60);
    expect(most.overall.verdict, "met 50 % of the time fails a 60 % rule").toBe("exceeds");
    expect(most.overall.margin).toBeCloseTo(lo! / required, 6);
  });

  it("meetsPercent equals a hand count of the steps' own verdicts, weighting each by the time until the next step", () => {
    const speeds = [0, 0.05, 0.1, 0.2, 0.3, 0.5, 0.8, 0.02, 0.15, 0.4];
    const times = [0, 1, 2, 4, 5, 6, 9, 10, 11, 12].map((h) => h * 3600);
    const durations = [1, 1, 2, 1, 1, 3, 1, 1, 1, 1];
    expect(
      stepDurations(times).map((s) => s / 3600),
      "durations: until the next step; the last repeats the one before",
    ).toEqual(durations);
    const limits = [{ constituent: "salinity", maxIncrease: 0.45 }];
    const verdicts = speeds.map((u) => steady(u, 90, { limits }).compliance.verdict);
    expect(new Set(verdicts).size, "the record mixes verdicts").toBeGreaterThan(1);
    const hand =
      (100 * durations.reduce((a, d, i) => a + (verdicts[i] === "meets" ? d : 0), 0)) /
      durations.reduce((a, b) => a + b, 0);
    const r = runScenario(
      scenarioWith({
        ambient: { record: { time: times, currentSpeed: speeds, currentDirection: speeds.map(() => 90) } },
        mixingZone: { limits },
      }),
      { includePath: false },
    );
    expect(r.record!.meetsPercent).toBeCloseTo(hand, 10);
    expect(r.record!.series.verdict).toEqual(verdicts);
  });

  it("a step whose water breaks a rule is refused, counted as not meeting and reported apart", () => {
    const r = runScenario(
      scenarioWith({
        ambient: {
          record: {
            time: hours(4),
            currentSpeed: [0.2, 0.2, 0.2, 0.2],
            currentDirection: [90, 90, 90, 90],
            depth: [15, 15, 1.05, 15],
          },
        },
      }),
      { includePath: false },
    );
    const rec = r.record!;
    expect(rec.counts.refused).toBe(1);
    expect(rec.refusedPercent).toBeCloseTo(25, 12);
    expect(rec.meetsPercent + rec.exceedsPercent + rec.outsideScopePercent + rec.refusedPercent).toBeCloseTo(100, 10);
    expect(rec.meetsPercent).toBeLessThanOrEqual(75);
    expect(rec.refusals[0]).toMatch(/ambient\.record\.depth\.2/);
    expect(rec.worstStep.verdict, "nothing could be computed for the refused step: it is the worst").toBe("refused");
    expect(rec.longestExceedanceHours, "a refused hour is an hour not meeting").toBeGreaterThanOrEqual(1);
    expect(r.overall.verdict, "a refused step allows no 'meets' without a time share").not.toBe("meets");
  });

  it("the study path gives the same verdict and margin as run", () => {
    const speeds = [0, 0.1, 0.3, 0.6, 0.05, 0.2];
    const s = scenarioWith({
      ambient: { record: { time: hours(6), currentSpeed: speeds, currentDirection: [90, 270, 90, 270, 90, 0] } },
      mixingZone: { limits: [{ constituent: "salinity", maxIncrease: 0.5 }], timeCompliance: { percentOfTime: 80 } },
    });
    const run = runScenario(s, { includePath: false });
    const study = evaluateCases(s, evaluateScenario);
    expect(study.overall).toEqual(run.overall);
  });

  it("a sweep point uses the record's time-share verdict, and the record's steps are the cases of every path", () => {
    const speeds = [0, 0.1, 0.3, 0.6, 0.05, 0.2];
    const s = scenarioWith({
      ambient: { record: { time: hours(6), currentSpeed: speeds, currentDirection: [90, 270, 90, 270, 90, 0] } },
      mixingZone: { limits: [{ constituent: "salinity", maxIncrease: 0.5 }], timeCompliance: { percentOfTime: 80 } },
    });
    expect(expandCases(s).map((c) => c.kind)).toEqual(speeds.map(() => "record"));
    const overrides = { "diffuser.portDiameter": 0.1, "ambient.salinity": 37 };
    const point = evaluatePoint(s, overrides, evaluateScenario);
    const run = runScenario(withOverrides(s, overrides), { includePath: false });
    expect(point.overall).toEqual(run.overall);
    expect(run.record!.percentOfTime).toBe(80);
  });

  it("times may be seconds, durations with a unit or ISO 8601 date-times, with the same result", () => {
    const speeds = [0.1, 0.3, 0.2];
    const forms = [
      [0, 1800, 7200],
      ["0 min", "30 min", "2 h"],
      ["2031-03-01T00:00:00Z", "2031-03-01T00:30:00Z", "2031-03-01T04:00+02:00"],
    ];
    const recs = forms.map(
      (time) =>
        runScenario(
          scenarioWith({ ambient: { record: { time, currentSpeed: speeds, currentDirection: [90, 90, 90] } } }),
          { includePath: false },
        ).record!,
    );
    for (const r of recs) {
      expect(r.series.time).toEqual([0, 1800, 7200]);
      expect(r.edgeDilution).toEqual(recs[0]!.edgeDilution);
    }
    expect(recs[2]!.start).toBe("2031-03-01T00:00:00Z");
    expect(parseTime("1.5 d")).toEqual({ ok: true, kind: "seconds", value: 129600 });
    expect(parseTime("2031-03-01T00:00").ok, "a date-time without a zone is refused").toBe(false);
  });

  it("names the field for a bad record", () => {
    expect(
      parseIssues({
        ambient: { record: { time: [0, 3600, 3600], currentSpeed: [0.1, 0.1, 0.1], currentDirection: [0, 0, 0] } },
      }).join(),
    ).toMatch(/ambient\.record\.time\.2.*strictly increasing/);
    expect(
      parseIssues({ ambient: { record: { time: [0, 3600], currentSpeed: [0.1], currentDirection: [0, 0] } } }).join(),
    ).toMatch(/ambient\.record\.currentSpeed.*one value per time/);
    expect(
      parseIssues({
        ambient: { record: { time: [0, "1 h"], currentSpeed: [0.1, 9], currentDirection: [0, 0] } },
      }).join(),
    ).toMatch(/ambient\.record\.currentSpeed\.1/);
    expect(
      parseIssues({
        ambient: { record: { time: [0, "2031-03-01T00:00Z"], currentSpeed: [0.1, 0.1], currentDirection: [0, 0] } },
      }).join(),
    ).toMatch(/ambient\.record\.time\.1.*same way/);
    expect(parseIssues({ mixingZone: { timeCompliance: { percentOfTime: 0 } } }).join()).toMatch(
      /mixingZone\.timeCompliance\.percentOfTime/,
    );
  });

  it("time-weighted percentiles without interpolation", () => {
    expect(weightedQuantile([3, 1, 2], [1, 1, 2], 0.25)).toBe(1);
    expect(weightedQuantile([3, 1, 2], [1, 1, 2], 0.5)).toBe(2);
    expect(weightedQuantile([3, 1, 2], [1, 1, 2], 0.95)).toBe(3);
    expect(valueExceededFor([3, 1, 2], [1, 1, 2], 0.75)).toBe(2);
    expect(valueExceededFor([3, Number.NaN, 2], [1, 1, 2], 1)).toBeNaN();
  });
});

describe("ambient record from CSV", () => {
  it("reads the header's field names and units into the scenario's own value forms", () => {
    const r = recordFromCsv("time (h),currentSpeed (knot),currentDirection (deg)\n0,0.5,90\n1.5,1,270\n");
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.record).toEqual({
      time: ["0 h", "1.5 h"],
      currentSpeed: ["0.5 knot", "1 knot"],
      currentDirection: ["90 deg", "270 deg"],
    });
    expect(r.rows).toBe(2);
  });
  it("refuses an unknown column or a short row, naming it", () => {
    const a = recordFromCsv("time (h),speed (m/s),currentDirection\n0,1,2\n");
    expect(!a.ok && a.message).toMatch(/column 2 "speed \(m\/s\)"/);
    const b = recordFromCsv("time,currentSpeed,currentDirection\n0,1\n");
    expect(!b.ok && b.message).toMatch(/line 2 has 2 cells/);
  });
});

describe("Monte Carlo over a record with a refused step", () => {
  it("keeps each step's numbers under its own name: the refused step is refused in every run, the others unchanged", () => {
    const record = (depth: number[]) =>
      scenarioWith({
        ambient: {
          record: { time: hours(4), currentSpeed: [0.1, 0.2, 0.2, 0.3], currentDirection: [90, 90, 90, 90], depth },
        },
      });
    const withRefused = record([15, 15, 1.05, 15]);
    const allValid = record([15, 15, 15, 15]);
    const chunk = (s: ReturnType<typeof record>) => {
      const p = planMonteCarlo(s, 3, 7);
      if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
      expect(p.plan.caseNames, "one case per step").toHaveLength(4);
      return runMonteCarloChunk(s, p.plan, 0, 3, evaluateScenario);
    };
    const a = chunk(withRefused);
    const b = chunk(allValid);
    for (let k = 0; k < 3; k++) {
      expect(a.pass[2]![k], `run ${k}: the 1.05 m step is refused`).toBe(VERDICT_CODE.refused);
      expect(a.edgeDilution[2]![k]).toBeNaN();
      for (const step of [0, 1, 3]) {
        expect(a.edgeDilution[step]![k], `run ${k}, step ${step}: its own dilution`).toBe(b.edgeDilution[step]![k]);
        expect(a.pass[step]![k]).toBe(b.pass[step]![k]);
      }
    }
  });
});
