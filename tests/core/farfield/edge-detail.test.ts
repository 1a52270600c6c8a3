/**
 * The lighter "edge" detail of stagesAfterNearField() (used by study loops) stops far-field series just past
 * the mixing-zone edge. These checks pin that it is the same computation, only shorter: the spreading
 * layer's shortened series is the leading part of the full one, and the stage gives the same edge
 * numbers and the same warnings as the full detail (exact equality, no tolerance).
 */
import { describe, expect, it } from "vitest";
import { runAmbientCase, stagesAfterNearField } from "../../../core/pipeline";
import { parseScenario } from "../../../core/scenario/parse";
import { spreadingLayerFromNearFieldEnd, type SpreadingLayerInput } from "../../../core/farfield/gravity-current";
import { beyondInputFixture, scenarioFixture } from "./fixtures";
import { fourPortScenarioRaw } from "../../helpers/four-port-scenario";

const layer: SpreadingLayerInput = {
  startDistance: 36,
  endDistance: 1000,
  startDilution: 52,
  dischargeFlow: 0.5,
  reducedGravity: 0.27,
  initialWidth: 2 * Math.PI * 20,
  currentSpeed: 0.1,
  bedSlope: 0.01,
  steps: 200,
};

describe("spreadingLayerFromNearFieldEnd() with stopDistance", () => {
  it("returns exactly the full series' leading points, up to the first point at or past the stop", () => {
    const full = spreadingLayerFromNearFieldEnd(layer);
    const part = spreadingLayerFromNearFieldEnd({ ...layer, stopDistance: 100 });
    const n = part.distance.length;
    expect(n < full.distance.length, "stopped early").toBe(true);
    const last = part.distance[n - 1]!;
    expect(last >= 100 && part.distance[n - 2]! < 100, "last point is the first past 100 m").toBe(true);
    for (const key of ["distance", "dilution", "thickness", "width", "flux", "velocity"] as const) {
      expect(part[key], `${key}: same leading values`).toEqual(full[key].slice(0, n));
    }
    expect(part.switchDistance, "same switch to the advected layer").toBe(full.switchDistance);
  });

  it("integrates the whole range when the stop lies beyond its end", () => {
    const full = spreadingLayerFromNearFieldEnd(layer);
    const part = spreadingLayerFromNearFieldEnd({ ...layer, stopDistance: 5000 });
    expect(part.dilution, "identical series").toEqual(full.dilution);
  });
});

describe("stagesAfterNearField() in edge detail", () => {
  const variants: [string, Parameters<typeof scenarioFixture>[0]][] = [
    ["still water", {}],
    ["current", { ambient: { currentSpeed: 0.2 } }],
    [
      "current, passive diffusion requested",
      { ambient: { currentSpeed: 0.2 }, options: { farField: "passive-diffusion" } },
    ],
    [
      "current, spreading layer requested",
      { ambient: { currentSpeed: 0.05 }, options: { farField: "gravity-current" } },
    ],
    ["sloping bed", { ambient: { bedSlope: 0.05, bedSlopeAzimuth: 90 } }],
    ["edge inside the near field", { mixingZone: { radius: 20, limits: [] } }],
    ["far edge", { mixingZone: { radius: 2000, limits: [] }, ambient: { currentSpeed: 0.3 } }],
    ["thick layer in shallow water", { ambient: { depth: 2.5, currentSpeed: 0.02 }, discharge: { flow: 2 } }],
  ];

  it.each(variants)("gives the full detail's edge numbers and warnings (%s)", (_name, over) => {
    const input = beyondInputFixture(scenarioFixture(over));
    const full = stagesAfterNearField(input);
    const edge = stagesAfterNearField({ ...input, detail: "edge" });
    const { alternatives: _a, series: _s, footprint: _f, ...fullEdge } = full.mixingZone;
    const { alternatives: _b, series: _t, footprint: _g, ...edgeEdge } = edge.mixingZone;
    expect(edgeEdge, "mixing-zone edge: dilution, method, layer thickness, constituents").toEqual(fullEdge);
    expect(edge.compliance, "compliance").toEqual(full.compliance);
    // The footprint is computed in full detail only, and with it its warning.
    const notFootprint = (w: { code: string }) => w.code !== "footprint-beyond-range";
    expect(edge.warnings, "warnings").toEqual(full.warnings.filter(notFootprint));
  });

  it("covers a layer that is thick for the depth inside the mixing zone", () => {
    const input = beyondInputFixture(scenarioFixture(variants[7]![1]));
    const codes = stagesAfterNearField({ ...input, detail: "edge" }).warnings.map((w) => w.code);
    expect(codes, "shallow water, large flow: layer-thickness warning").toContain("layer-thick-for-depth");
  });
});

describe("an edge inside the integral model's near field", () => {
  // The invented four-port base scenario with a 5 m mixing zone and the integral chain chosen.
  const raw = {
    ...fourPortScenarioRaw("edge inside the jet"),
    mixingZone: { radius: 5, limits: [{ constituent: "salinity", maxIncrease: 2 }] },
    options: { addSlackWater: false, nearFieldForEdge: "integral" },
  };

  it.each(["full", "edge"] as const)("reads the dilution off the jet's path at the edge (%s detail)", (detail) => {
    const parsed = parseScenario(raw);
    if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
    const r = runAmbientCase(parsed.scenario, { detail });
    expect(r.mixingZone.edgeInsideNearField, "the edge lies inside the near field").toBe(true);
    const path = r.nearField.find((m) => m.method === "integral")!.path!;
    // The first path point at or beyond 5 m in plan, and the one before it (dilution rises along the path).
    const k = path.findIndex((p) => Math.hypot(p.x, p.y) >= 5);
    expect(k > 0, "the path crosses the edge").toBe(true);
    const r0 = Math.hypot(path[k - 1]!.x, path[k - 1]!.y);
    const r1 = Math.hypot(path[k]!.x, path[k]!.y);
    const expected = path[k - 1]!.dilution + ((5 - r0) / (r1 - r0)) * (path[k]!.dilution - path[k - 1]!.dilution);
    expect(
      Math.abs(r.mixingZone.dilution / expected - 1),
      "linear between the path points around the edge",
    ).toBeLessThan(1e-9);
  });
});
