/** A vanishing current is stagnant water for the far field (regression of a fuzz counterexample). */
import { describe, it, expect } from "vitest";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";

const raw = (currentSpeed: number) => ({
  format: "brinefield-scenario",
  version: 1,
  name: "vanishing current",
  discharge: { flow: 0.001, salinity: 26.2, temperature: 33 },
  ambient: { depth: 11.65, salinity: 25.7, temperature: 32, currentSpeed, currentDirection: 0, bedSlope: 0 },
  diffuser: { portCount: 1, portDiameter: 0.02, portAngle: 0, portHeight: 4.66, portAzimuth: 0 },
  mixingZone: { radius: 5, limits: [{ constituent: "salinity", maxIncrease: 0.1 }] },
});

function run(u: number) {
  const p = parseScenario(raw(u));
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
  return runScenario(p.scenario);
}

describe("stagesAfterNearField() with a vanishing current", () => {
  it("gives the stagnant result for a current of 5e-324 m/s, with dilution never falling along the series", () => {
    const still = run(0);
    const tiny = run(5e-324);
    expect(tiny.mixingZone.dilution, "edge dilution as in stagnant water").toBe(still.mixingZone.dilution);
    const d = tiny.mixingZone.series.dilution;
    for (let i = 1; i < d.length; i++)
      expect(d[i]! >= d[i - 1]! * (1 - 1e-9), `non-decreasing at point ${i}`).toBe(true);
  });
});
