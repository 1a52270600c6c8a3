import { describe, it, expect } from "vitest";
import { parseSweepAxis, axisValues, sweepGrid, sweepRows, eosCrossings } from "../../../core/study/sweep";
import { evaluatePoints } from "../../../core/study/evaluate-point";
import { evaluateScenario } from "../../../core/study/evaluate";
import { fourPortRaw, identityEvaluator, scenarioFrom } from "./fixtures";
import type { Evaluator } from "../../../core/study/summary";

describe("parseSweepAxis()", () => {
  it("reads path=from:to:steps with SI numbers or units", () => {
    const a = parseSweepAxis("ambient.currentSpeed=0:1 knot:5");
    expect(a.ok, "a valid axis").toBe(true);
    // 1 knot = 1852 m / 3600 s exactly (international nautical mile).
    const expected = { path: "ambient.currentSpeed", from: 0, to: 1852 / 3600, steps: 5 };
    if (a.ok) expect(a.axis, "to converted to m/s").toEqual(expected);
  });

  it("names the problem: unknown path, bad steps, wrong unit, out of range", () => {
    const msg = (t: string) => {
      const r = parseSweepAxis(t);
      return r.ok ? "" : r.message;
    };
    expect(msg("ambient.colour=0:1:3"), "unknown path").toMatch(/^ambient\.colour: is not a path/);
    expect(msg("ambient.depth=5:20:0"), "zero steps").toMatch(/steps must be/);
    expect(msg("ambient.depth=5 m/s:20:3"), "wrong unit").toMatch(/"from"/);
    expect(msg("ambient.currentSpeed=0:9:3"), "above the 5 m/s bound, in the file reader's words").toMatch(
      /9 must be a current speed from 0 to 5 m\/s/,
    );
    for (const key of ["constructor", "__proto__", "toString", "hasOwnProperty"]) {
      expect(msg(`${key}=-100:-1:2`), `${key} is refused, named`).toMatch(
        new RegExp(`^${key}: is not a path that can be varied`),
      );
    }
    expect(msg("ambient.depth"), "no values").toMatch(/path=from:to:steps/);
  });
});

describe("sweepGrid()", () => {
  it("spaces values evenly, inclusive, whole numbers for port counts, first axis slowest", () => {
    expect(axisValues({ path: "ambient.depth", from: 10, to: 20, steps: 3 }), "three depths").toEqual([10, 15, 20]);
    expect(axisValues({ path: "diffuser.portCount", from: 2, to: 6, steps: 3 }), "port counts").toEqual([2, 4, 6]);
    const g = sweepGrid([
      { path: "ambient.depth", from: 10, to: 20, steps: 2 },
      { path: "diffuser.portCount", from: 2, to: 3, steps: 2 },
    ]);
    expect(
      g.map((p) => p.index),
      "row-major grid",
    ).toEqual([
      [0, 0],
      [0, 1],
      [1, 0],
      [1, 1],
    ]);
    expect(g[1]!.overrides, "second point").toEqual({ "ambient.depth": 10, "diffuser.portCount": 3 });
  });
});

describe("sweepRows() and eosCrossings()", () => {
  it("reports the governing case per point and where the equation of state changes", () => {
    const s = scenarioFrom(fourPortRaw());
    const base = identityEvaluator(50, (x) => 100 * x.ambient.currentSpeed);
    // A fake evaluator that switches equation of state above 30 °C brine temperature.
    const fake: Evaluator = (x) => ({
      ...base(x),
      equationOfState: x.discharge.temperature > 30 ? "B" : "A",
    });
    const axes = [{ path: "discharge.temperature", from: 20, to: 40, steps: 5 }];
    const grid = sweepGrid(axes);
    const rows = sweepRows(
      grid,
      evaluatePoints(
        s,
        grid.map((g) => g.overrides),
        fake,
      ),
    );
    expect(
      rows.map((r) => r.governingCase),
      "slack water (zero current) governs with this output",
    ).toEqual(new Array(5).fill("slack water"));
    expect(
      rows.every((r) => r.pass === false),
      "slack water gives 0 < 50: fails",
    ).toBe(true);
    const x = eosCrossings(axes, rows);
    expect(x.length, "one crossing").toBe(1);
    expect(
      x[0]!.between.map((o) => o["discharge.temperature"]),
      "between 30 and 35 °C",
    ).toEqual([30, 35]);
    expect([x[0]!.from, x[0]!.to], "from A to B").toEqual(["A", "B"]);
  });

  it("runs the pipeline at every point; in this example 4 ports dilute more than 2 merged ports", () => {
    const s = scenarioFrom({ ...fourPortRaw(), options: { addSlackWater: false } });
    const axes = [{ path: "diffuser.portCount", from: 2, to: 8, steps: 4 }];
    const grid = sweepGrid(axes);
    const rows = sweepRows(
      grid,
      evaluatePoints(
        s,
        grid.map((g) => g.overrides),
        evaluateScenario,
      ),
    );
    expect(
      rows.every((r) => r.error === undefined && Number.isFinite(r.edgeDilution)),
      "every point ran",
    ).toBe(true);
    expect(
      rows.every((r) => r.equationOfState.length > 0),
      "the equation of state is named",
    ).toBe(true);
    // Same total flow: two large jets 5 m apart merge into a line source and lose dilution, four smaller
    // ones only partly merge (common practice, no source). Beyond that, smaller jets have a lower F and
    // their near-field dilution (∝ F) falls, so the edge dilution need not keep rising with port count.
    expect(rows[0]!.edgeDilution, "the 2-port point is the merged one").toBeGreaterThan(0);
    expect(rows[1]!.edgeDilution, "4 ports dilute more than 2").toBeGreaterThan(rows[0]!.edgeDilution);
  });
});
