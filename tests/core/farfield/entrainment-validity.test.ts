/**
 * The range checks of the spreading layer's two entrainment laws reach the far-field stage's warnings and
 * the result: one warning per code over the layer's march up to the mixing-zone edge, at the value
 * farthest outside the law's range, the same in edge-only and full runs.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { farFieldStage } from "../../../core/farfield/stage";
import { KATO_PHILLIPS_RI_STAR_MIN } from "../../../core/farfield/kato-phillips-1969-entrainment";
import { spreadingLayerValidityIssues } from "../../../core/farfield/gravity-current";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";
import { beyondInputFixture, scenarioFixture } from "./fixtures";

const CODE = "bed-entrainment-weakly-stratified";

function stageWith(currentSpeed: number, detail: "full" | "edge" = "full") {
  const input = beyondInputFixture(scenarioFixture({ ambient: { currentSpeed } }));
  return farFieldStage({ ...input, detail });
}

// Ri* ≥ 10: the bed-stirred law u_e/u* = 2.5/Ri* of Kato & Phillips (1969), J. Fluid Mech. 37:643–655, is
// held below Ri* = 10 (a guard, judgement: the laboratory runs covered Ri* of tens to hundreds, from memory).
describe("bed-stirred entrainment below its range (Kato & Phillips 1969, Ri* ≥ 10 guard)", () => {
  it("warns once through the far-field stage in a strong current, at the lowest Ri* up to the edge", () => {
    const found = stageWith(0.5).warnings.filter((w) => w.code === CODE);
    expect(found.length, "one warning however many steps fall below the range").toBe(1);
    expect(found[0]!.value! < KATO_PHILLIPS_RI_STAR_MIN, `Ri* ${found[0]!.value} below 10`).toBe(true);
    expect(found[0]!.stage, "raised by the far field").toBe("far-field");
  });
  it("gives the same warning in an edge-only run", () => {
    const full = stageWith(0.5).warnings.find((w) => w.code === CODE);
    const edge = stageWith(0.5, "edge").warnings.find((w) => w.code === CODE);
    expect(edge, "edge-only runs read the same leading points").toEqual(full);
  });
  it("stays quiet in still water and in a weak current", () => {
    expect(
      stageWith(0).warnings.map((w) => w.code),
      "no current, no bed stirring",
    ).not.toContain(CODE);
    expect(
      stageWith(0.02).warnings.map((w) => w.code),
      "a 2 cm/s current stirs weakly",
    ).not.toContain(CODE);
  });
  it("reaches runScenario's warnings for a 0.5 m/s current and not for the demo's 0.15 knot", () => {
    const raw = JSON.parse(readFileSync(join(__dirname, "../../../demo-scenarios/island-cove.json"), "utf8"));
    delete raw.ambientCases;
    const run = (speed: string) => {
      const parsed = parseScenario({ ...raw, ambient: { ...raw.ambient, currentSpeed: speed } });
      if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
      return runScenario(parsed.scenario).warnings.map((w) => w.code);
    };
    expect(run("0.5 m/s"), "strong current").toContain(CODE);
    expect(run("0.15 knot"), "the demo's weak current").not.toContain(CODE);
  });
});

describe("spreadingLayerValidityIssues()", () => {
  const series = {
    distance: [10, 20, 30, 40],
    richardson: [0.5, 0.5, 0.5, 0.5],
    bedRichardson: [40, 12, 8, 2],
  };
  it("reads the points up to the first at or past the edge, at the lowest Ri* there", () => {
    const at25 = spreadingLayerValidityIssues(series, 25);
    expect(
      at25.map((w) => [w.code, w.value]),
      "points at 10, 20 and 30 m",
    ).toEqual([[CODE, 8]]);
    expect(spreadingLayerValidityIssues(series, 15), "points at 10 and 20 m are inside the range").toEqual([]);
  });
  it("passes the shear law's Richardson number to its check (Turner 1986: negative Ri is outside the fit)", () => {
    const unstable = spreadingLayerValidityIssues({ ...series, richardson: [-0.2, 0.5, 0.5, 0.5] }, 40);
    expect(
      unstable.map((w) => w.code),
      "negative Ri",
    ).toContain("entrainment-richardson-negative");
  });
});
