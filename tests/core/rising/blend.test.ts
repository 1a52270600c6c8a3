/**
 * Blends whose mixture changes the sign of its buoyancy: the blend ratio at which it changes, checked
 * against the densities themselves (the same equation of state), and a sweep of the blend ratio with a
 * verdict on both sides. Mass balance of blending: flow-weighted means (common practice, no source).
 */
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parseScenario } from "../../../core/scenario/parse";
import { blendSignChange } from "../../../core/rising/blend";
import { scenarioWithBlendRatio, blendRatioOfPlant, brineFlowFromPlant } from "../../../core/scenario/plant";
import { propertiesFromScenario } from "../../../core/properties";
import { readPath, withOverrides } from "../../../core/study/overrides";
import { runScenario } from "../../../core/pipeline";

const demo = JSON.parse(readFileSync(join(__dirname, "../../../demo-scenarios/power-station-blend.json"), "utf8"));
function scenarioOf(raw: unknown) {
  const r = parseScenario(raw);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.scenario;
}

describe("blend ratio", () => {
  const s = scenarioOf(demo);
  it("is the total blending flow over the brine flow, and plant.blendRatio rescales the streams by mass balance", () => {
    const qb = brineFlowFromPlant(50000 / 86400, 0.45); // Q_p·(1 − r)/r
    expect(blendRatioOfPlant(s.plant!)).toBeCloseTo(6 / qb, 9);
    const r2 = scenarioWithBlendRatio(s, 2);
    expect(r2.discharge.flow).toBeCloseTo(3 * qb, 9);
    // Salinity of the blend: (Q_b·S_b + 2·Q_b·37)/(3·Q_b) with S_b from the unblended plant.
    const r0 = scenarioWithBlendRatio(s, 0);
    expect(r2.discharge.salinity).toBeCloseTo((r0.discharge.salinity + 2 * 37) / 3, 9);
    expect(r2.discharge.temperature).toBeCloseTo((r0.discharge.temperature + 2 * 30) / 3, 9);
    expect(r0.discharge.temperature).toBeCloseTo(21, 9); // the brine at the feed temperature
    expect(readPath(withOverrides(s, { "plant.blendRatio": 2 }), "plant.blendRatio")).toBeCloseTo(2, 9);
    const written = scenarioOf({ ...demo, plant: { ...demo.plant, blendRatio: 2 } });
    expect(written.discharge.salinity).toBeCloseTo(r2.discharge.salinity, 9);
  });

  it("finds the ratio where the buoyancy changes sign: the reduced gravity changes sign across it", () => {
    const b = blendSignChange(s)!;
    expect(b.buoyancy).toBe("rises");
    expect(b.signChanges.length).toBe(1);
    const r = b.signChangeRatio!;
    expect(r).toBeGreaterThan(1);
    expect(r).toBeLessThan(blendRatioOfPlant(s.plant!));
    const g = (x: number) => propertiesFromScenario(scenarioWithBlendRatio(s, x)).reducedGravity;
    expect(g(r * 0.995)).toBeGreaterThan(0);
    expect(g(r * 1.005)).toBeLessThan(0);
    expect(b.note).toMatch(/changes to rising/);
  });

  it("a sweep of the blend ratio shows the sign change and a verdict on both sides", () => {
    const b = blendSignChange(s)!;
    const below = runScenario(withOverrides(s, { "plant.blendRatio": 0 }));
    const above = runScenario(withOverrides(s, { "plant.blendRatio": b.signChangeRatio! * 1.5 }));
    expect(below.densities.reducedGravity).toBeGreaterThan(0);
    expect(above.densities.reducedGravity).toBeLessThan(0);
    for (const r of [below, above]) expect(["meets", "exceeds"]).toContain(r.overall.verdict);
    expect(above.nearField.every((m) => m.risingField !== undefined)).toBe(true);
    expect(below.nearField.every((m) => m.risingField === undefined)).toBe(true);
  });

  it("refuses plant.blendRatio without a blending stream, naming the field", () => {
    const r = parseScenario({ ...demo, plant: { ...demo.plant, blending: [], blendRatio: 2 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => i.message).join("\n")).toMatch(/^plant\.blendRatio: /m);
  });
});
