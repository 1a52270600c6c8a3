/**
 * A still-water 60° single port in deep water with a 100 m mixing zone: the edge dilution must lie where the
 * published 60° laboratory data put the near field's end — between the confirmed impact dilution
 * S_i = 1.06 F (Lai & Lee 2012) and a few times it — and the near-field methods' chains must agree within a
 * factor of 2, since both reach the edge on the same footing (volume flux handed over, mixing between
 * impact and the end of the near field on the Roberts et al. 1997 growth).
 */
import { describe, expect, it } from "vitest";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";

function run(flow: number, angle = 60) {
  const p = parseScenario({
    format: "brinefield-scenario",
    version: 1,
    name: "still water single port",
    discharge: { flow: `${flow} m^3/s`, salinity: "70 g/kg", temperature: "20 degC" },
    ambient: { depth: "60 m", salinity: "35 g/kg", temperature: "20 degC", currentSpeed: 0, bedSlope: 0 },
    diffuser: { layout: "single", portDiameter: "0.2 m", portAngle: angle, portHeight: "1 m", portAzimuth: 90 },
    mixingZone: { radius: "100 m", limits: [{ constituent: "salinity", maxIncrease: "2 g/kg" }] },
  });
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
  return runScenario(p.scenario);
}

describe("still-water 60° single port, deep water, 100 m mixing zone", () => {
  for (const flow of [0.145, 0.18, 0.21]) {
    it(`flow ${flow} m³/s: default edge dilution between 1.0 F and 4.0 F, chains within a factor 2`, () => {
      const r = run(flow);
      const F = r.port.froude;
      expect(F, "the case lies in F = 20–30").toBeGreaterThanOrEqual(20);
      expect(F, "the case lies in F = 20–30").toBeLessThanOrEqual(30);
      const s = r.mixingZone.dilution;
      expect(s / F, `edge ${s.toFixed(1)} = ${(s / F).toFixed(2)} F ≥ 1.0 F`).toBeGreaterThanOrEqual(1.0);
      expect(s / F, `edge ${s.toFixed(1)} = ${(s / F).toFixed(2)} F ≤ 4.0 F`).toBeLessThanOrEqual(4.0);
      const d = r.mixingZone.alternatives.map((a) => a.dilution);
      expect(d.length, "both near-field methods reach the edge").toBeGreaterThanOrEqual(2);
      expect(
        Math.max(...d) / Math.min(...d),
        r.mixingZone.alternatives.map((a) => `${a.method} ${a.dilution.toFixed(1)}`).join("; "),
      ).toBeLessThanOrEqual(2);
    });
  }

  for (const angle of [75, 90]) {
    it(`${angle}°: the length-scale method is not available and no length-scale number equals its 60° value`, () => {
      const steep = run(0.18, angle).nearField.find((m) => m.method === "length-scale")!;
      const at60 = run(0.18, 60).nearField.find((m) => m.method === "length-scale")!;
      expect(steep.available, "not available").toBe(false);
      for (const f of [
        "maxRiseHeight",
        "returnDistance",
        "impactDistance",
        "impactDilution",
        "nearFieldDistance",
        "nearFieldDilution",
      ] as const) {
        expect(steep[f], `${f} at ${angle}° is not the 60° value ${String(at60[f])}`).not.toEqual(at60[f]);
      }
    });
  }
});
