/**
 * The report's hand-built SVG figures: tick generation, the side view (computed path or reported key
 * points only) and the dilution chart with the edge and the required dilution marked. Degenerate inputs
 * (no methods, an empty series) still give a valid figure.
 */
import { describe, expect, it } from "vitest";
import {
  linearTicks,
  logTicks,
  sideViewSvg,
  sideViewKeyPoints,
  sideViewPath,
  dilutionChartSvg,
} from "../../../core/report";
import { sideViewScales } from "../../../core/report/figures";
import type { NearFieldMethodResult } from "../../../core/nearfield/types";
import type { MixingZoneResult } from "../../../core/result/contract";

const lengthScale: NearFieldMethodResult = {
  method: "length-scale",
  source: "test",
  available: true,
  notAvailableReason: null,
  maxRiseHeight: 4,
  maxRiseDistance: null,
  returnDistance: 5,
  impactDistance: 6,
  impactDilution: 30,
  nearFieldDistance: 20,
  nearFieldDilution: 50,
  dilutionRange: [25, 40],
  entrainedFlow: 1,
  bias: "test",
  warnings: [],
};

const integral: NearFieldMethodResult = {
  ...lengthScale,
  method: "integral",
  maxRiseDistance: 2,
  path: [
    { s: 0, x: 0, y: 0, z: 0, halfWidth: 0.1, dilution: 1 },
    { s: 3, x: 1.5, y: 2, z: 3, halfWidth: 0.5, dilution: 10 },
    { s: 7, x: 3, y: 4, z: -1, halfWidth: 1, dilution: 30 },
  ],
};

function mz(over: Partial<MixingZoneResult> = {}): MixingZoneResult {
  return {
    radius: 100,
    dilution: 80,
    method: "m",
    nearFieldMethod: "integral",
    edgeInsideNearField: false,
    alternatives: [],
    constituents: [],
    layerThickness: 1,
    footprint: { area: 0, furthestExtent: 0 },
    series: {
      distance: [0, 10, 50, 100, 150],
      dilution: [1, 20, 50, 80, 100],
      salinityIncrease: [30, 1.5, 0.6, 0.4, 0.3],
      layerThickness: [null, 2, 1.5, 1, 0.9],
      stage: ["jet", "jet", "spreading-layer", "spreading-layer", "passive-diffusion"],
    },
    notModelled: [],
    ...over,
  };
}

describe("linearTicks() and logTicks()", () => {
  it("gives 1-2-5 steps covering the range", () => {
    expect(linearTicks(0, 10, 5), "0..10 in steps of 2").toEqual([0, 2, 4, 6, 8, 10]);
    expect(linearTicks(0, 0.9, 5), "step 0.18 rounds up to 0.2; decimal steps without float noise").toEqual([
      0, 0.2, 0.4, 0.6, 0.8,
    ]);
    expect(logTicks(1, 120), "1-2-5 per decade").toEqual([1, 2, 5, 10, 20, 50, 100]);
  });

  it("degenerates to one tick for an empty range", () => {
    expect(linearTicks(3, 3), "single tick").toEqual([3]);
  });
});

describe("sideViewSvg()", () => {
  it("uses the computed path in plan distance (√(x² + y²)) and height above the seabed", () => {
    const pts = sideViewPath(integral, 1.5)!;
    expect(pts[1], "plan distance 2.5 m (3-4-5 triangle halved), height 1.5 + 3 m").toEqual([2.5, 4.5]);
    expect(sideViewPath(lengthScale, 1.5), "length-scale methods have no path").toBeNull();
  });

  it("draws only the key points a length-scale method reports (no invented maximum location)", () => {
    const keys = sideViewKeyPoints(lengthScale, 1);
    expect(
      keys.map((k) => k.kind),
      "return and impact only: max-rise distance is unknown",
    ).toEqual(["return", "impact"]);
    const svg = sideViewSvg({ nearField: [lengthScale], depth: 10, portHeight: 1, portAngle: 60 });
    expect(svg, "level line for the rise").toContain('stroke-dasharray="2 3"');
    expect(svg, "legend explains it").toContain("dotted level = maximum rise of the upper edge");
  });

  it("marks the surface with the depth and gives a valid figure with no methods", () => {
    const svg = sideViewSvg({ nearField: [], depth: 12.5, portHeight: 1, portAngle: 60 });
    expect(svg, "svg element").toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"[\s\S]*<\/svg>$/);
    expect(svg, "surface label").toContain("water surface (depth 12.5 m)");
    expect(svg, "no NaN coordinates").not.toContain("NaN");
  });

  it("keeps the jet's proportions: true scale when it fits, never squashed below half nor stretched beyond ×2", () => {
    // Plotting convention, common practice, no source: a side view at true scale shows the jet's true
    // angles; the figure states any exaggeration it uses.
    const square = sideViewScales(14, 15);
    expect(square.exaggeration, "a 14 m reach in 15 m of water: true scale").toBeCloseTo(1, 6);
    const deep = sideViewScales(11, 20);
    expect(deep.exaggeration, "short jet in deep water: narrowed, not squashed").toBeGreaterThanOrEqual(0.5);
    expect(deep.exaggeration, "and not stretched").toBeLessThanOrEqual(1);
    const shallow = sideViewScales(60, 4);
    expect(shallow.exaggeration, "long jet in shallow water: stretched at most ×2").toBeLessThanOrEqual(2 + 1e-9);
    expect(shallow.height, "and its plot made lower").toBeLessThan(300);
    const svg = sideViewSvg({ nearField: [lengthScale, integral], depth: 10, portHeight: 1, portAngle: 60 });
    expect(svg, "the figure says its scale").toMatch(/true scale|vertical exaggeration ×/);
  });

  it("puts its legend below the plot, not over the water", () => {
    const svg = sideViewSvg({ nearField: [lengthScale, integral], depth: 10, portHeight: 1, portAngle: 60 });
    const seabedY = Number(/<line x1="[\d.]+" y1="([\d.]+)" x2="[\d.]+" y2="[\d.]+" stroke="#7c6a3c"/.exec(svg)?.[1]);
    const legendY = Number(/<text x="[\d.]+" y="([\d.]+)"[^>]*>integral: computed centreline/.exec(svg)?.[1]);
    expect(Number.isFinite(seabedY) && Number.isFinite(legendY), "both found").toBe(true);
    expect(legendY, "legend below the seabed line and the axis").toBeGreaterThan(seabedY + 30);
  });

  it("draws both methods side by side", () => {
    const svg = sideViewSvg({ nearField: [lengthScale, integral], depth: 10, portHeight: 1, portAngle: 60 });
    expect(svg, "integral legend").toContain("integral: computed centreline");
    expect(svg, "length-scale legend").toContain("length-scale: reported points");
    expect(svg, "no NaN coordinates").not.toContain("NaN");
  });
});

describe("dilutionChartSvg()", () => {
  it("marks the edge, the dilution there and the required dilution", () => {
    const svg = dilutionChartSvg({ mixingZone: mz(), requiredDilution: 17.5 });
    expect(svg, "edge").toContain("mixing-zone edge 100 m");
    expect(svg, "edge dilution").toContain("S = 80 at the edge");
    expect(svg, "limit").toContain("required dilution 17.5");
    expect(svg, "log axis for two decades").toContain("(log scale)");
    expect(svg, "one legend entry per stage").toContain(">passive-diffusion</text>");
  });

  it("uses a linear axis for a narrow range and survives an empty series", () => {
    const narrow = dilutionChartSvg({
      mixingZone: mz({
        dilution: 3,
        series: {
          distance: [0, 100],
          dilution: [2, 3],
          salinityIncrease: [1, 1],
          layerThickness: [null, null],
          stage: ["jet", "jet"],
        },
      }),
      requiredDilution: null,
    });
    expect(narrow, "linear").not.toContain("(log scale)");
    const empty = dilutionChartSvg({
      mixingZone: mz({ series: { distance: [], dilution: [], salinityIncrease: [], layerThickness: [], stage: [] } }),
      requiredDilution: 10,
    });
    expect(empty, "valid svg").toMatch(/<\/svg>$/);
    expect(empty, "no NaN coordinates").not.toContain("NaN");
  });
});

describe("multiportSketchSvg()", () => {
  it("draws the three regimes and marks the result's own in words, not by colour alone", async () => {
    const { multiportSketchSvg } = await import("../../../core/report/figures");
    for (const regime of ["independent", "partially-merged", "merged-line-source"]) {
      const svg = multiportSketchSvg(regime);
      expect((svg.match(/— this design/g) ?? []).length, `${regime}: exactly one panel says "this design"`).toBe(1);
      expect(svg, `${regime}: its panel is the one named`).toContain(`${regime.replace(/-/g, " ")} — this design`);
      expect(svg, "no NaN coordinates").not.toContain("NaN");
    }
  });
});
