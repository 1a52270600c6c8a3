/**
 * farFieldStage() rules with hand-built near-field results (fixtures.ts names their published sources:
 * Roberts, Ferrier & Daviero 1997 and Lai & Lee 2012, from memory where marked there): which chain and
 * which far-field method govern the edge, what the stage reports (method names, warnings with their code,
 * severity, parameter and numbers, series, methods list) and the thin-layer checks against the depth.
 * The selection rules (lower dilution governs, ties keep the first method, the edge inside the near field
 * uses the jet's own dilution, layer thicker than half the depth is rough) are conventions of this
 * project: common practice, no source.
 */
import { describe, expect, it } from "vitest";
import {
  BASIN_NOT_MODELLED,
  farFieldStage,
  NOT_MODELLED,
  notModelledFor,
  type FarFieldOutput,
} from "../../../core/farfield/stage";
import { chainsFromNearField, farContextFromInput, farRange, farSeries } from "../../../core/farfield/chains";
import { SPREADING_LAYER_SOURCE } from "../../../core/farfield/gravity-current";
import { TURNER_1986_SOURCE } from "../../../core/farfield/turner-1986-entrainment";
import { KATO_PHILLIPS_1969_SOURCE } from "../../../core/farfield/kato-phillips-1969-entrainment";
import { BROOKS_1960_SOURCE } from "../../../core/farfield/brooks-1960-diffusion";
import { interpolateLinear } from "../../../core/interpolate";
import type { NearFieldMethodResult } from "../../../core/nearfield/types";
import type { AmbientColumn } from "../../../core/nearfield/types";
import type { DensitiesResult } from "../../../core/result/contract";
import {
  columnFixture,
  densitiesFixture,
  DF,
  F,
  integralFixture,
  lengthScaleFixture,
  scenarioFixture,
} from "./fixtures";

type Over = Parameters<typeof scenarioFixture>[0];
const BOTH = () => [lengthScaleFixture(), integralFixture()];
const SPREADING = "spreading dense layer E(Ri)";
const BROOKS = "Brooks (1960) passive diffusion";

function run(
  over: Over = {},
  nearField: NearFieldMethodResult[] = BOTH(),
  opts: { detail?: "full" | "edge"; column?: AmbientColumn; densities?: DensitiesResult } = {},
): FarFieldOutput {
  const scenario = scenarioFixture(over);
  return farFieldStage({
    scenario,
    column: opts.column ?? columnFixture(scenario),
    densities: opts.densities ?? densitiesFixture(),
    nearField,
    detail: opts.detail,
  });
}

/** A 0.05 m/s current and a 600 m mixing zone: passive diffusion gives less dilution than the layer here. */
const DRIFT: Over = { ambient: { currentSpeed: 0.05 }, mixingZone: { radius: 600, limits: [] } };

const codes = (o: FarFieldOutput) => o.warnings.map((w) => w.code);
const alt = (o: FarFieldOutput, method: string) => o.mixingZone.alternatives.find((a) => a.method === method)!.dilution;

describe("farFieldStage() — which chain governs", () => {
  it("keeps the lower edge dilution by default and names the chain: integral 1.06 F beats length-scale 2.6 F", () => {
    const o = run();
    expect(o.mixingZone.method, "method").toBe(`integral near field × ${SPREADING}`);
    expect(o.mixingZone.nearFieldMethod, "near field").toBe("integral");
    expect(o.mixingZone.edgeInsideNearField, "edge at 100 m").toBe(false);
    // Flat bed, still water: no entrainment beyond the near field (Ri = 1 > 0.8, Ellison & Turner 1959).
    expect(o.mixingZone.dilution, "S_i = 1.06 F").toBeCloseTo(1.06 * F, 9);
    expect(
      o.mixingZone.alternatives.map((a) => a.method),
      "one per chain in still water",
    ).toEqual(["length-scale + gravity-current", "integral + gravity-current"]);
    expect(alt(o, "length-scale + gravity-current"), "S_n = 2.6 F").toBeCloseTo(2.6 * F, 9);
    expect(o.warnings, "nothing to warn about").toEqual([]);
    expect(o.mixingZone.radius, "radius").toBe(100);
  });

  it("keeps the first of two chains with the same edge dilution", () => {
    const twin = { ...lengthScaleFixture(), method: "integral" as const };
    expect(run({}, [lengthScaleFixture(), twin]).mixingZone.nearFieldMethod, "first listed").toBe("length-scale");
    expect(run({}, [twin, lengthScaleFixture()]).mixingZone.nearFieldMethod, "first listed").toBe("integral");
  });

  it("uses the requested near-field method even when it dilutes more", () => {
    const o = run({ options: { nearFieldForEdge: "length-scale" } });
    expect(o.mixingZone.nearFieldMethod, "as requested").toBe("length-scale");
    expect(o.mixingZone.dilution, "S_n = 2.6 F").toBeCloseTo(2.6 * F, 9);
    expect(codes(o), "no warning").toEqual([]);
  });

  it("falls back to the more conservative method, with a warning, when the requested one gave nothing", () => {
    const o = run({ options: { nearFieldForEdge: "integral" } }, [lengthScaleFixture()]);
    expect(o.mixingZone.nearFieldMethod, "the available one").toBe("length-scale");
    expect(o.warnings, "one warning").toEqual([
      {
        code: "near-field-choice-unavailable",
        severity: "warning",
        message: 'Near-field method "integral" gave no result; the more conservative available method was used.',
        parameter: "options.nearFieldForEdge",
        stage: "far-field",
      },
    ]);
    const none = run({ options: { nearFieldForEdge: "integral" } }, []);
    expect(codes(none), "no chain at all: only the undiluted warning").toEqual(["edge-dilution-undiluted"]);
  });
});

describe("farFieldStage() — which far-field method governs in a current", () => {
  it("keeps passive diffusion where it gives the lower dilution, and reports both methods per chain", () => {
    const o = run(DRIFT);
    expect(
      o.mixingZone.alternatives.map((a) => a.method),
      "two methods per chain",
    ).toEqual([
      "length-scale + gravity-current",
      "length-scale + passive-diffusion",
      "integral + gravity-current",
      "integral + passive-diffusion",
    ]);
    const passive = alt(o, "integral + passive-diffusion");
    expect(passive, "passive diffusion is lower here").toBeLessThan(alt(o, "integral + gravity-current"));
    expect(o.mixingZone.method, "method").toBe(`integral near field × ${BROOKS}`);
    expect(o.mixingZone.dilution, "the lowest of all").toBe(passive);
    expect(o.mixingZone.dilution, "the lowest of all").toBe(
      Math.min(...o.mixingZone.alternatives.map((a) => a.dilution)),
    );
  });

  it("keeps the spreading layer when asked, even where passive diffusion dilutes less", () => {
    const o = run({ ...DRIFT, options: { farField: "gravity-current" } });
    expect(o.mixingZone.method, "method").toBe(`integral near field × ${SPREADING}`);
    expect(o.mixingZone.dilution, "the layer's dilution").toBe(alt(o, "integral + gravity-current"));
  });

  it("uses passive diffusion when asked in a current, and the layer with a warning in stagnant water", () => {
    const asked = run({ ...DRIFT, options: { farField: "passive-diffusion" } });
    expect(asked.mixingZone.method, "Brooks").toBe(`integral near field × ${BROOKS}`);
    expect(codes(asked), "no warning in a current").toEqual([]);
    const still = run({ options: { farField: "passive-diffusion" } });
    expect(still.mixingZone.method, "spreading layer").toBe(`integral near field × ${SPREADING}`);
    expect(still.warnings, "one warning").toEqual([
      {
        code: "passive-diffusion-no-current",
        severity: "warning",
        message: "Passive diffusion was requested but the water is stagnant; the spreading layer was used.",
        parameter: "options.farField",
        stage: "far-field",
      },
    ]);
    const slow = run({ ambient: { currentSpeed: 0.0009 }, options: { farField: "passive-diffusion" } });
    expect(codes(slow), "below 1 mm/s is stagnant").toEqual(["passive-diffusion-no-current"]);
  });

  it("keeps the spreading layer when both methods give the same dilution (a current too slow to carry the layer)", () => {
    const o = run({ ambient: { currentSpeed: 0.002 } });
    expect(alt(o, "integral + passive-diffusion"), "no hand-over: equal").toBe(alt(o, "integral + gravity-current"));
    expect(o.mixingZone.method, "the layer").toBe(`integral near field × ${SPREADING}`);
  });
});

describe("farFieldStage() — the edge inside the near field", () => {
  it("uses the jet's own dilution at the edge, says so, and counts an edge exactly at the near-field end as inside", () => {
    for (const radius of [20, 9 * DF]) {
      const o = run({
        mixingZone: { radius, limits: [] },
        options: { nearFieldForEdge: "length-scale" },
        ambient: { currentSpeed: 0.2 },
      });
      const t = (radius - 2.4 * DF) / (6.6 * DF);
      expect(o.mixingZone.edgeInsideNearField, `edge at ${radius} m`).toBe(true);
      expect(o.mixingZone.method, "named as the jet").toBe("length-scale jet (edge inside the near field)");
      expect(o.mixingZone.dilution, "Roberts et al. (1997) points, linear").toBeCloseTo(1.6 * F + t * F, 9);
      expect(o.mixingZone.layerThickness, "no layer at the edge").toBeNull();
      expect(
        o.warnings.find((w) => w.code === "edge-inside-near-field"),
        "a readable note",
      ).toEqual({
        code: "edge-inside-near-field",
        severity: "info",
        message: `The mixing-zone edge (${radius} m) lies inside the near field (ends at 36.0 m); the jet's own dilution where it crosses the edge is used.`,
        parameter: "mixingZone.radius",
        value: radius,
        stage: "far-field",
      });
      expect(
        o.mixingZone.alternatives.map((a) => a.method),
        "the jet for the chain that reaches the edge",
      ).toEqual(["length-scale (jet crosses the edge)", "integral + gravity-current", "integral + passive-diffusion"]);
      expect(alt(o, "length-scale (jet crosses the edge)"), "the jet's dilution").toBe(o.mixingZone.dilution);
    }
  });

  it("does not call an edge just past the near-field end inside", () => {
    const o = run({ mixingZone: { radius: 36.01, limits: [] }, options: { nearFieldForEdge: "length-scale" } });
    expect(o.mixingZone.edgeInsideNearField, "36.01 m").toBe(false);
    expect(codes(o), "no note").not.toContain("edge-inside-near-field");
  });
});

describe("farFieldStage() — nothing reached the seabed", () => {
  it("reports an undiluted edge with a serious warning and no governing chain", () => {
    const o = run({}, []);
    expect(o.governing, "no chain").toBeNull();
    expect(o.mixingZone, "the whole far-field part").toEqual({
      radius: 100,
      dilution: 1,
      method: `none near field × ${SPREADING}`,
      nearFieldMethod: "none",
      edgeInsideNearField: false,
      alternatives: [],
      layerThickness: null,
      series: { distance: [0], dilution: [1], salinityIncrease: [70 - 33.5], layerThickness: [null], stage: ["jet"] },
      notModelled: NOT_MODELLED,
    });
    expect(o.warnings, "serious").toEqual([
      {
        code: "edge-dilution-undiluted",
        severity: "serious",
        message: "No near-field result reached the seabed; the edge dilution is taken as 1 (undiluted).",
        stage: "far-field",
      },
    ]);
  });
});

describe("farFieldStage() — series, seabed and governing layer", () => {
  it("takes the seabed background from the bottom of the column and the excess against it", () => {
    const scenario = scenarioFixture();
    const column = { ...columnFixture(scenario), salinities: [30, 36], temperatures: [25, 12] };
    const o = run({}, BOTH(), { column });
    expect(o.seabed, "bottom values").toEqual({ salinity: 36, temperature: 12 });
    const s = o.mixingZone.series;
    s.dilution.forEach((d, i) => expect(s.salinityIncrease[i], `ΔS at ${i}`).toBeCloseTo((70 - 36) / d, 12));
  });

  it("shows the series to twice the radius, or 1.2 near fields, or 1 m, whichever is longest", () => {
    const last = (o: FarFieldOutput) => o.mixingZone.series.distance.at(-1);
    expect(last(run()), "2 × 100 m").toBeCloseTo(200, 9);
    const inside = run({ mixingZone: { radius: 20, limits: [] }, options: { nearFieldForEdge: "length-scale" } });
    expect(last(inside), "1.2 × 36 m").toBeCloseTo(43.2, 9);
    const tiny: NearFieldMethodResult = {
      ...lengthScaleFixture(),
      maxRiseHeight: null,
      returnDistance: 0.3,
      impactDistance: 0.3,
      impactDilution: 2,
      nearFieldDistance: 0.5,
      nearFieldDilution: 3,
    };
    expect(last(run({ mixingZone: { radius: 0.2, limits: [] } }, [tiny])), "1 m").toBeCloseTo(1, 9);
    expect(run().mixingZone.series.stage.filter((st) => st === "jet").length, "40 jet points").toBe(40);
  });

  it("hands the footprint the governing chain's jet and its layer over the whole computed range", () => {
    const over: Over = { ambient: { bedSlope: 0.05 } };
    const o = run(over);
    const scenario = scenarioFixture(over);
    const ctx = farContextFromInput({ scenario, column: columnFixture(scenario), densities: densitiesFixture() });
    const chain = chainsFromNearField([integralFixture()], 1).chains[0]!;
    const g = o.governing!;
    expect(g.profile, "jet profile").toEqual(chain.profile);
    expect(g.impactDistance, "impact").toBe(2.4 * DF);
    expect(g.nearFieldEnd, "the integral method ends at impact").toBe(2.4 * DF);
    expect(g.range, "ten radii").toBe(farRange(ctx, chain));
    expect(g.layer, "the layer series").toEqual(farSeries(ctx, chain, "gravity-current"));
    expect(g.layer.distance.at(-1), "to the end of the range").toBeCloseTo(1000, 9);
    expect(o.mixingZone.layerThickness, "thickness at the edge").toBeCloseTo(
      interpolateLinear(g.layer.distance, g.layer.thickness, 100),
      12,
    );
  });

  it("gives the same edge numbers in edge detail, without alternatives or series", () => {
    const full = run(DRIFT);
    const edge = run(DRIFT, BOTH(), { detail: "edge" });
    expect(edge.mixingZone.dilution, "same edge dilution").toBe(full.mixingZone.dilution);
    expect(edge.mixingZone.method, "same method").toBe(full.mixingZone.method);
    expect(edge.mixingZone.alternatives, "no alternatives").toEqual([]);
    expect(edge.mixingZone.series, "a placeholder series").toEqual({
      distance: [0],
      dilution: [1],
      salinityIncrease: [70 - 33.5],
      layerThickness: [null],
      stage: ["jet"],
    });
  });

  it("reports no layer thickness at the edge for a neutral discharge (no gravity-driven thickness)", () => {
    const neutral = { ...densitiesFixture(), discharge: 1023.5 };
    const o = run({}, BOTH(), { densities: neutral });
    expect(o.mixingZone.layerThickness, "null, not Infinity").toBeNull();
    expect(codes(o), "no thin-layer warning for an undefined thickness").toEqual([]);
  });
});

describe("farFieldStage() — the layer against the depth inside the mixing zone", () => {
  // On a 5 % slope the integral chain's layer thins, then thickens again well beyond the edge.
  const SLOPE: Over = { ambient: { bedSlope: 0.05 } };
  const thickestInside = () => {
    const g = run(SLOPE).governing!.layer;
    let h = 0;
    for (let i = 0; i < g.distance.length && g.distance[i]! <= 100; i++) h = Math.max(h, g.thickness[i]!);
    return Math.max(h, interpolateLinear(g.distance, g.thickness, 100));
  };
  const at = (depth: number) => run({ ambient: { bedSlope: 0.05, depth } });

  it("reads only the layer inside the mixing zone (it is thicker beyond)", () => {
    const g = run(SLOPE).governing!.layer;
    expect(Math.max(...g.thickness), "thicker beyond the edge").toBeGreaterThan(2 * thickestInside());
    const depth = 1.5 * thickestInside();
    expect(codes(at(depth)), "only the part inside counts").toEqual(["layer-thick-for-depth"]);
  });

  it("says the layer reaches the surface when it is as thick as the water is deep", () => {
    const h = thickestInside();
    const o = at(h);
    expect(o.warnings, "serious").toEqual([
      {
        code: "layer-reaches-surface",
        severity: "serious",
        message: `Inside the mixing zone the dense layer reaches ${h.toFixed(1)} m thick in ${h.toFixed(1)} m of water: it fills the water column up to the surface, where the spreading-layer and diffusion methods do not apply.`,
        parameter: "ambient.depth",
        value: h,
        stage: "far-field",
      },
    ]);
  });

  it("says the thin-layer assumptions fail above half the depth, and is silent at exactly half", () => {
    const h = thickestInside();
    const just = at(h * (1 + 1e-9));
    expect(just.warnings, "just deeper than the layer").toEqual([
      {
        code: "layer-thick-for-depth",
        severity: "warning",
        message: `Inside the mixing zone the spreading layer reaches ${h.toFixed(1)} m thick in ${(h * (1 + 1e-9)).toFixed(1)} m of water: the thin-layer assumptions behind the far-field dilution do not hold; treat the edge dilution as rough.`,
        parameter: "ambient.depth",
        value: h * (1 + 1e-9),
        stage: "far-field",
      },
    ]);
    expect(codes(at(2 * h * (1 - 1e-9))), "just under twice the layer").toEqual(["layer-thick-for-depth"]);
    expect(codes(at(2 * h)), "exactly twice the layer").toEqual([]);
  });

  it("counts the interpolated thickness at the edge where it is the thickest inside", () => {
    // A layer started thin over a wide perimeter thickens downslope (5 % slope), so its edge value,
    // between two computed points, is the thickest inside the 101 m mixing zone.
    const thin: NearFieldMethodResult = {
      ...lengthScaleFixture(),
      maxRiseHeight: null,
      returnDistance: 1,
      impactDistance: 1,
      impactDilution: 2,
      nearFieldDistance: 40,
      nearFieldDilution: 3,
    };
    const over = (depth: number): Over => ({
      ambient: { bedSlope: 0.05, depth },
      mixingZone: { radius: 101, limits: [] },
    });
    const g = run(over(15), [thin]).governing!.layer;
    const edge = interpolateLinear(g.distance, g.thickness, 101);
    const before = Math.max(...g.thickness.filter((_, i) => g.distance[i]! <= 101));
    expect(edge, "thicker at the edge than at any computed point inside").toBeGreaterThan(before);
    const depth = (edge + before) / 2;
    const o = run(over(depth), [thin]);
    expect(codes(o), "the edge value reaches the depth").toEqual(["layer-reaches-surface"]);
    expect(o.warnings[0]!.message, "names the edge thickness").toContain(`reaches ${edge.toFixed(1)} m thick`);
  });
});

describe("farFieldStage() — methods and what is not modelled", () => {
  it("lists the spreading layer and E(Ri) in still water, and bed stirring and passive diffusion in a current", () => {
    const layer = [
      { stage: "far-field", name: "spreading dense layer", source: SPREADING_LAYER_SOURCE },
      { stage: "far-field", name: "entrainment law E(Ri)", source: TURNER_1986_SOURCE },
    ];
    expect(run().methods, "still water").toEqual(layer);
    expect(run({ ambient: { currentSpeed: 0.0009 } }).methods, "below 1 mm/s").toEqual(layer);
    expect(run({ ambient: { currentSpeed: 0.001 } }).methods, "1 mm/s").toEqual([
      ...layer,
      { stage: "far-field", name: "bed-stirred entrainment", source: KATO_PHILLIPS_1969_SOURCE },
      {
        stage: "far-field",
        name: "passive lateral diffusion",
        source: `${BROOKS_1960_SOURCE}; takes over from the drifting layer where its buoyant sideways spreading has slowed to the diffusive spreading (common practice, no source)`,
      },
    ]);
  });

  it("does not flag a missing current for passive diffusion in still water (it is not used there)", () => {
    expect(codes(run()), "still water").not.toContain("brooks-no-current");
  });

  it("replaces the constant-background note with the box model's when a basin is given", () => {
    const open = scenarioFixture();
    expect(notModelledFor(open), "open water").toEqual(NOT_MODELLED);
    expect(NOT_MODELLED.length, "four notes").toBe(4);
    const basin = scenarioFixture({ ambient: { basin: { volume: 1e7, flushingTime: 86400 } } });
    expect(notModelledFor(basin), "basin").toEqual([BASIN_NOT_MODELLED, ...NOT_MODELLED.slice(1)]);
    expect(
      run({ ambient: { basin: { volume: 1e7, flushingTime: 86400 } } }).mixingZone.notModelled,
      "in the result",
    ).toEqual([BASIN_NOT_MODELLED, ...NOT_MODELLED.slice(1)]);
  });
});
