/**
 * The far-field chains: what the chains share (current, buoyancy, diffuser extent), how each near-field
 * result becomes a chain, how the spreading layer is started, when passive diffusion takes over and how
 * the series are cut and shown. Rules that are conventions of this project are marked "common practice,
 * no source" in the module; the published pieces are Brooks (1960) 4/3-law diffusion (as reproduced in
 * Fischer et al. 1979 ch. 9, from memory) and the flux-averaged ÷ centreline factor (1 + λ²)/λ² with
 * λ = 1.2 (Fischer et al. 1979 ch. 9, from memory).
 */
import { describe, expect, it } from "vitest";
import {
  chainsFromNearField,
  edgeDilutionOf,
  farContextFromInput,
  farRange,
  farSeries,
  seriesFromChain,
  STAGNANT_CURRENT,
  truncateSeries,
  type FarSeries,
} from "../../../core/farfield/chains";
import { spreadingLayerFromNearFieldEnd } from "../../../core/farfield/gravity-current";
import {
  brooksDilutionFromDistance,
  brooksWidthFromDistance,
  FOUR_THIRDS_LAW_COEFFICIENT,
} from "../../../core/farfield/brooks-1960-diffusion";
import { jetProfileFromNearField } from "../../../core/farfield/jet-series";
import type { NearFieldMethodResult } from "../../../core/nearfield/types";
import type { DensitiesResult } from "../../../core/result/contract";
import {
  columnFixture,
  densitiesFixture,
  DF,
  F,
  G_PRIME,
  integralFixture,
  lengthScaleFixture,
  scenarioFixture,
} from "./fixtures";

type Over = Parameters<typeof scenarioFixture>[0];
const line = { layout: "line" as const, portCount: 3, portSpacing: 5, length: 10, diffuserAzimuth: 0, flowSplit: [] };

function ctxOf(over: Over = {}, detail?: "full" | "edge", densities: DensitiesResult = densitiesFixture()) {
  const scenario = scenarioFixture(over);
  return farContextFromInput({ scenario, column: columnFixture(scenario), densities, detail });
}

/** A near-field result with no jet geometry (no widths), ending at `end` m with dilution `dilution`. */
function bareResult(over: Partial<NearFieldMethodResult>): NearFieldMethodResult {
  return { ...lengthScaleFixture(), maxRiseHeight: null, path: undefined, ...over };
}

const FLUX_FACTOR = (1 + 1.2 ** 2) / 1.2 ** 2; // Fischer et al. (1979) ch. 9, λ = 1.2, from memory

describe("farContextFromInput() — what every chain shares", () => {
  it("treats currents below 1 mm/s as stagnant and keeps 1 mm/s and above (common practice, no source)", () => {
    expect(STAGNANT_CURRENT, "1 mm/s").toBe(1e-3);
    expect(ctxOf({ ambient: { currentSpeed: 0.000999 } }).u, "0.999 mm/s").toBe(0);
    expect(ctxOf({ ambient: { currentSpeed: 0.001 } }).u, "1 mm/s").toBe(0.001);
    expect(ctxOf({ ambient: { currentSpeed: 0.2 } }).u, "0.2 m/s").toBe(0.2);
  });

  it("takes the reduced gravity against the seabed water: g·(ρ_d − ρ_bottom)/ρ_bottom", () => {
    expect(ctxOf().gBottom, "fixture densities").toBeCloseTo(G_PRIME, 14);
    const layered = { ...densitiesFixture(), ambient: 1020, ambientSurface: 1018, ambientBottom: 1025 };
    expect(ctxOf({}, undefined, layered).gBottom, "bottom, not mean or surface").toBeCloseTo(
      (9.80665 * (1052 - 1025)) / 1025,
      14,
    );
  });

  it("counts the diffuser's length only with more than one port, and never a negative length", () => {
    expect(ctxOf({ diffuser: { length: 50 } }).diffuserLength, "single port").toBe(0);
    expect(ctxOf({ diffuser: line }).diffuserLength, "three ports").toBe(10);
    expect(ctxOf({ diffuser: { ...line, portCount: 1 } }).diffuserLength, "a line of one port").toBe(0);
    expect(ctxOf({ diffuser: { ...line, length: -5 } }).diffuserLength, "negative length").toBe(0);
  });

  it("projects the diffuser across the current: L·|sin(azimuth − current direction)|, the whole length in still water", () => {
    const cross = (currentSpeed: number, currentDirection: number) =>
      ctxOf({ diffuser: line, ambient: { currentSpeed, currentDirection } }).crossLength;
    expect(cross(0.1, 90), "current across the diffuser").toBeCloseTo(10, 12);
    expect(cross(0.1, 0), "current along it").toBeCloseTo(0, 12);
    expect(cross(0.1, 30), "30°").toBeCloseTo(5, 12);
    expect(cross(0.1, 330), "−30°: magnitude").toBeCloseTo(5, 12);
    expect(cross(0.1, 210), "opposite direction").toBeCloseTo(5, 12);
    expect(cross(0, 0), "stagnant: the whole length").toBe(10);
    expect(cross(0.0005, 0), "below 1 mm/s: stagnant").toBe(10);
  });

  it("keeps a positive bed slope, treats zero or negative as flat, and reads radius and detail", () => {
    expect(ctxOf({ ambient: { bedSlope: 0.05 } }).bedSlope, "0.05").toBe(0.05);
    expect(ctxOf({ ambient: { bedSlope: -0.05 } }).bedSlope, "negative").toBe(0);
    expect(ctxOf({ mixingZone: { radius: 250, limits: [] } }).radius, "radius").toBe(250);
    expect(ctxOf().full, "full by default").toBe(true);
    expect(ctxOf({}, "full").full, "full").toBe(true);
    expect(ctxOf({}, "edge").full, "edge").toBe(false);
  });
});

describe("chainsFromNearField() — one chain per near-field method with an end point", () => {
  it("warns for a method with no end and carries the others in order", () => {
    const broken = bareResult({
      method: "integral",
      nearFieldDistance: null,
      impactDistance: null,
      returnDistance: null,
    });
    const { chains, warnings } = chainsFromNearField([broken, lengthScaleFixture()], 1);
    expect(
      chains.map((c) => c.nf.method),
      "only the method with an end",
    ).toEqual(["length-scale"]);
    expect(warnings, "one warning").toEqual([
      {
        code: "near-field-no-end",
        severity: "warning",
        message: 'Near-field method "integral" gave no near-field end; not carried to the edge.',
        stage: "far-field",
      },
    ]);
    const both = chainsFromNearField([lengthScaleFixture(), integralFixture()], 1);
    expect(
      both.chains.map((c) => c.nf.method),
      "input order",
    ).toEqual(["length-scale", "integral"]);
    expect(both.warnings, "no warnings").toEqual([]);
  });

  it("starts from the near-field end, with the layer's radius its spread since impact", () => {
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    expect(c.end, "x_n = 9 dF, S_n = 2.6 F (Roberts et al. 1997, from memory)").toEqual({
      distance: 9 * DF,
      dilution: 2.6 * F,
    });
    expect(c.impactDistance, "x_i = 2.4 dF").toBe(2.4 * DF);
    expect(c.layerRadius, "x_n − x_i").toBeCloseTo(6.6 * DF, 12);
    expect(c.profile, "the jet profile").toEqual(jetProfileFromNearField(lengthScaleFixture()));
    expect(c.far, "nothing computed yet").toEqual({});
  });

  it("uses the return point when there is no impact point, else the end itself; floors the radius at 0.5 m", () => {
    const ret = chainsFromNearField([bareResult({ impactDistance: null, returnDistance: 8, nearFieldDistance: 20 })], 1)
      .chains[0]!;
    expect([ret.impactDistance, ret.layerRadius], "return point at 8 m").toEqual([8, 12]);
    const none = chainsFromNearField(
      [bareResult({ impactDistance: null, returnDistance: null, nearFieldDistance: 20 })],
      1,
    ).chains[0]!;
    expect([none.impactDistance, none.layerRadius], "no impact or return point").toEqual([20, 0.5]);
    const close = chainsFromNearField([bareResult({ impactDistance: 10, nearFieldDistance: 10.2 })], 1).chains[0]!;
    expect(close.layerRadius, "0.2 m of spread: the 0.5 m floor").toBe(0.5);
    const beyond = chainsFromNearField([bareResult({ impactDistance: 50, nearFieldDistance: 36 })], 1).chains[0]!;
    expect(beyond.impactDistance, "impact never beyond the near-field end").toBe(36);
    expect(beyond.layerRadius, "floor").toBe(0.5);
  });

  it("takes at least the jet's half-width at impact as the layer radius", () => {
    const path = [
      { s: 0, x: 0, y: 0, z: 0, halfWidth: 0.1, dilution: 1 },
      { s: 6, x: 5, y: 0, z: 3, halfWidth: 1, dilution: 10 },
      { s: 12, x: 10, y: 0, z: -1, halfWidth: 4, dilution: 20 },
    ];
    const nf = bareResult({ method: "integral", path, impactDistance: 10, nearFieldDistance: 12 });
    expect(chainsFromNearField([nf], 1).chains[0]!.layerRadius, "half of the 8 m width at impact").toBe(4);
  });

  it("uses the method's flux-averaging factor, else (1 + λ²)/λ² with λ = 1.2", () => {
    const own = chainsFromNearField([{ ...lengthScaleFixture(), fluxAveragingFactor: 1.3 }], 1).chains[0]!;
    expect(own.fluxFactor, "given").toBe(1.3);
    const dflt = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    expect(dflt.fluxFactor, "default").toBeCloseTo(FLUX_FACTOR, 12);
  });
});

describe("farRange() and farSeries() — the spreading layer started from the chain", () => {
  it("integrates over ten mixing-zone radii, or twice the near field when that is longer", () => {
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    expect(farRange(ctxOf(), c), "10 × 100 m").toBe(1000);
    expect(farRange(ctxOf({ mixingZone: { radius: 3, limits: [] } }), c), "2 × 36 m").toBe(72);
  });

  it("hands the layer the flux-averaged dilution, the chain's perimeter, twice the diffuser length and the cross-current length", () => {
    const over: Over = {
      diffuser: line,
      ambient: { currentSpeed: 0.05, currentDirection: 30, bedSlope: 0.02 },
    };
    const ctx = ctxOf(over);
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    const s = farSeries(ctx, c, "gravity-current");
    const k = c.fluxFactor;
    const ref = spreadingLayerFromNearFieldEnd({
      startDistance: 36,
      endDistance: 1000,
      startDilution: 2.6 * F * k,
      dischargeFlow: ctx.scenario.discharge.flow,
      reducedGravity: G_PRIME,
      initialWidth: 2 * Math.PI * c.layerRadius,
      perimeterOffset: 20,
      crossCurrentLength: 5,
      currentSpeed: 0.05,
      bedSlope: 0.02,
      steps: 200,
    });
    expect(s.distance, "200 steps over the range").toEqual(ref.distance);
    expect(s.thickness, "thickness").toEqual(ref.thickness);
    expect(s.width, "width").toEqual(ref.width);
    expect(s.switchDistance, "switch").toBe(ref.switchDistance);
    s.dilution.forEach((d, i) => expect(d, `centreline dilution at point ${i}`).toBeCloseTo(ref.dilution[i]! / k, 9));
    expect(s.dilution[0], "starts at S_n").toBeCloseTo(2.6 * F, 12);
    expect(farSeries(ctx, c, "gravity-current"), "memoised on the chain").toBe(s);
  });

  it("stops an edge-detail series at the first point at or past the edge", () => {
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    const s = farSeries(ctxOf({}, "edge"), c, "gravity-current");
    const n = s.distance.length;
    expect(s.distance[n - 1], "last point past the edge").toBeGreaterThanOrEqual(100);
    expect(s.distance[n - 2], "the one before is inside").toBeLessThan(100);
  });

  it("gives the spreading layer for passive diffusion in stagnant water", () => {
    const ctx = ctxOf({ ambient: { bedSlope: 0.05 } });
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    const passive = farSeries(ctx, c, "passive-diffusion");
    const layer = farSeries(ctx, c, "gravity-current");
    expect(passive.dilution, "same dilutions").toEqual(layer.dilution);
    expect(passive.handOverDistance ?? null, "no hand-over").toBeNull();
  });
});

describe("passive diffusion takes over where 2·√(g′h) ≤ 12·α_ε·b^{1/3} on the drifting layer (common practice, no source)", () => {
  it("follows the layer up to the hand-over, then Brooks (1960) from the layer's width there", () => {
    const u = 0.05;
    const ctx = ctxOf({ ambient: { currentSpeed: u }, mixingZone: { radius: 300, limits: [] } });
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    const gc = farSeries(ctx, c, "gravity-current");
    const p = farSeries(ctx, c, "passive-diffusion");
    const rule = (i: number) =>
      2 * Math.sqrt((G_PRIME / c.fluxFactor / gc.dilution[i]!) * gc.thickness[i]!) <=
      12 * FOUR_THIRDS_LAW_COEFFICIENT * Math.cbrt(gc.width[i]!);
    const sw = gc.switchDistance!;
    expect(sw, "the layer drifts").not.toBeNull();
    const k = gc.distance.findIndex((d, i) => d >= sw && rule(i));
    expect(gc.distance[0], "the layer starts radial").toBeLessThan(sw);
    expect(k, "the hand-over lies in range").toBeGreaterThan(0);
    expect(rule(k - 1), "not yet at the point before").toBe(false);
    expect(p.handOverDistance, "first drifting point that meets the rule").toBe(gc.distance[k]);
    expect(p.switchDistance, "same drift").toBe(sw);
    expect(p.distance, "same distances").toEqual(gc.distance);
    expect(p.dilution.slice(0, k + 1), "the layer itself up to the hand-over").toEqual(gc.dilution.slice(0, k + 1));
    expect(p.width.slice(0, k + 1), "widths up to the hand-over").toEqual(gc.width.slice(0, k + 1));
    for (let i = k + 1; i < p.distance.length; i += 17) {
      const x = p.distance[i]! - p.distance[k]!;
      const input = { distance: x, initialWidth: gc.width[k]!, currentSpeed: u };
      expect(p.dilution[i] / (gc.dilution[k]! * brooksDilutionFromDistance(input)), `dilution at ${i}`).toBeCloseTo(
        1,
        12,
      );
      expect(p.width[i] / brooksWidthFromDistance(input), `width at ${i}`).toBeCloseTo(1, 12);
      expect(p.thickness[i], "no vertical mixing: thickness held").toBe(gc.thickness[k]);
    }
  });

  it("does not hand over while the layer still spreads radially, even where the rule already holds", () => {
    const ctx = ctxOf({ ambient: { currentSpeed: 0.02 } });
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    const gc = farSeries(ctx, c, "gravity-current");
    const rule = (i: number) =>
      2 * Math.sqrt((G_PRIME / c.fluxFactor / gc.dilution[i]!) * gc.thickness[i]!) <=
      12 * FOUR_THIRDS_LAW_COEFFICIENT * Math.cbrt(gc.width[i]!);
    const early = gc.distance.findIndex((_, i) => rule(i));
    expect(gc.distance[early], "the rule holds on the radial layer").toBeLessThan(gc.switchDistance!);
    expect(farSeries(ctx, c, "passive-diffusion").handOverDistance, "at the switch, not before").toBe(
      gc.switchDistance,
    );
  });

  it("never hands over a layer that does not drift within range", () => {
    const ctx = ctxOf({ ambient: { currentSpeed: 0.002 } });
    const c = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    const gc = farSeries(ctx, c, "gravity-current");
    const p = farSeries(ctx, c, "passive-diffusion");
    expect(gc.switchDistance, "no drift at 2 mm/s").toBeNull();
    expect(p.handOverDistance, "no hand-over").toBeNull();
    expect(p.dilution, "the layer itself").toEqual(gc.dilution);
  });
});

describe("edgeDilutionOf() — at the mixing-zone edge", () => {
  const c = () => chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
  it("reads the jet's own profile inside the near field, including at its end", () => {
    const t = (20 - 2.4 * DF) / (6.6 * DF);
    const inside = ctxOf({ mixingZone: { radius: 20, limits: [] } });
    expect(edgeDilutionOf(inside, c(), "passive-diffusion"), "20 m").toBeCloseTo(1.6 * F + t * F, 12);
    const atEnd = ctxOf({ mixingZone: { radius: 36, limits: [] } });
    expect(edgeDilutionOf(atEnd, c(), "gravity-current"), "at x_n").toBe(2.6 * F);
  });

  it("interpolates the far-field series beyond it", () => {
    const ctx = ctxOf({ mixingZone: { radius: 101, limits: [] }, ambient: { bedSlope: 0.05 } });
    const chain = c();
    const s = farSeries(ctx, chain, "gravity-current");
    const j = s.distance.findIndex((d) => d >= 101);
    const t = (101 - s.distance[j - 1]!) / (s.distance[j]! - s.distance[j - 1]!);
    const want = s.dilution[j - 1]! + t * (s.dilution[j]! - s.dilution[j - 1]!);
    expect(edgeDilutionOf(ctx, chain, "gravity-current"), "linear between series points").toBeCloseTo(want, 12);
    expect(want, "more than S_n on a slope").toBeGreaterThan(2.6 * F);
  });
});

describe("truncateSeries() and seriesFromChain() — the displayed series", () => {
  const f: FarSeries = {
    distance: [0, 10, 20, 30],
    dilution: [1, 2, 3, 4],
    thickness: [5, 6, 7, 8],
    width: [9, 10, 11, 12],
    richardson: [0.1, 0.2, 0.3, 0.4],
    bedRichardson: [1, 2, 3, 4],
    switchDistance: 3,
    handOverDistance: 4,
  };

  it("keeps the points up to the end and adds one interpolated point exactly at it", () => {
    expect(truncateSeries(f, 15), "cut at 15 m").toEqual({
      distance: [0, 10, 15],
      dilution: [1, 2, 2.5],
      thickness: [5, 6, 6.5],
      width: [9, 10, 10.5],
      // At the cut the entrainment laws' inputs are those of the next point (the interval being cut).
      richardson: [0.1, 0.2, 0.3],
      bedRichardson: [1, 2, 3],
      switchDistance: 3,
      handOverDistance: 4,
    });
    expect(truncateSeries(f, 100), "all of it").toEqual(f);
    expect(truncateSeries(f, -1).distance, "nothing before the start").toEqual([]);
    expect(truncateSeries(f, -1).dilution, "nothing before the start").toEqual([]);
  });

  it("shows 40 jet points to the near-field end, then the far-field points with their stage", () => {
    const chain = chainsFromNearField([lengthScaleFixture()], 1).chains[0]!;
    const far: FarSeries = { ...f, distance: [36, 50, 60, 70], dilution: [52, 60, 70, 80] };
    far.thickness = [1, 2, Infinity, NaN];
    const s = seriesFromChain(chain, far, "passive-diffusion", 36.5);
    expect(s.distance.length, "40 + 4").toBe(44);
    expect(s.distance[1], "36 m / 40").toBeCloseTo(0.9, 12);
    expect(s.distance[39], "39/40 of 36 m").toBeCloseTo(35.1, 12);
    expect(s.dilution[0], "undiluted at the port").toBe(1);
    expect(s.dilution[39], "jet profile").toBeCloseTo(1.6 * F + ((35.1 - 2.4 * DF) / (6.6 * DF)) * F, 12);
    expect(s.stage.slice(38), "jet, jet, start of the layer, then passive").toEqual([
      "jet",
      "jet",
      "spreading-layer",
      "passive-diffusion",
      "passive-diffusion",
      "passive-diffusion",
    ]);
    expect(s.layerThickness.slice(39), "null in the jet and where not finite").toEqual([null, 1, 2, null, null]);
    s.dilution.forEach((d, i) => expect(s.salinityIncrease[i], `ΔS at ${i}`).toBeCloseTo(36.5 / d, 12));
    const layer = seriesFromChain(chain, far, "gravity-current", 36.5);
    expect(layer.stage.slice(40), "spreading layer throughout").toEqual([
      "spreading-layer",
      "spreading-layer",
      "spreading-layer",
      "spreading-layer",
    ]);
  });
});
