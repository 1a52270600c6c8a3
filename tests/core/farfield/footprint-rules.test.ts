/**
 * Seabed footprint geometry: the area where the dilution is below the required value, integrated with the
 * trapezoidal rule over the jet's footprint (impact to near-field end, width growing linearly from zero —
 * judgement) and the layer series, cut where the dilution crosses the required value. The expected values
 * are areas of triangles and trapezoids worked by hand (geometry, no published source); the trapezoidal
 * rule is exact for widths linear in distance.
 */
import { describe, expect, it } from "vitest";
import { footprintFromLayer, footprintStage } from "../../../core/farfield/footprint";
import type { GoverningLayer } from "../../../core/farfield/stage";

const noJet = { profile: { distance: [0], dilution: [1], basis: "path" as const }, impactDistance: 0, nearFieldEnd: 0 };

describe("footprintFromLayer() — layer part", () => {
  it("cuts a widening strip where the dilution reaches the required value (width = x: area x²/2)", () => {
    const distance = Array.from({ length: 101 }, (_, i) => i);
    const layer = { distance, dilution: distance.map((x) => 10 + x), width: distance.map((x) => x) };
    const f = footprintFromLayer(noJet, layer, 60.5);
    expect(f.furthestExtent, "crossing at 50.5 m").toBeCloseTo(50.5, 9);
    expect(f.area, "∫₀^50.5 x dx").toBeCloseTo(50.5 ** 2 / 2, 9);
  });

  it("starts the area where a falling dilution drops below the required value", () => {
    const layer = { distance: [0, 10, 20], dilution: [20, 10, 10], width: [2, 4, 4] };
    const f = footprintFromLayer(noJet, layer, 15);
    // Crossing at 5 m (width 3 m): trapezoid 5–10 m (3 → 4 m) plus strip 10–20 m (4 m).
    expect(f.area, "17.5 + 40 m²").toBeCloseTo(17.5 + 40, 9);
    expect(f.furthestExtent, "exceeded to the end").toBe(20);
  });

  it("counts a segment wholly below, skips segments wholly above, and keeps the furthest extent", () => {
    const layer = { distance: [0, 10, 20, 30, 40], dilution: [5, 5, 30, 30, 5], width: [1, 1, 1, 1, 1] };
    const f = footprintFromLayer(noJet, layer, 10);
    // Below over 0–10, to the crossing at 12 m, and again from the crossing at 38 m to 40 m.
    expect(f.area, "10 + 2 + 2 m²").toBeCloseTo(14, 9);
    expect(f.furthestExtent, "last exceedance").toBe(40);
    const ends = footprintFromLayer(noJet, { ...layer, dilution: [5, 5, 30, 30, 30] }, 10);
    expect(ends.furthestExtent, "exceedance ends at the crossing, 12 m").toBeCloseTo(12, 9);
    expect(ends.area, "10 + 2 m²").toBeCloseTo(12, 9);
  });

  it("reports the first point as the extent of a one-point series below the required value", () => {
    const f = footprintFromLayer(noJet, { distance: [30], dilution: [2], width: [5] }, 10);
    expect(f, "no area, extent at the point").toEqual({ area: 0, furthestExtent: 30 });
    const above = footprintFromLayer(noJet, { distance: [30], dilution: [20], width: [5] }, 10);
    expect(above, "nothing exceeded").toEqual({ area: 0, furthestExtent: 0 });
  });

  it("needs a required dilution above 1", () => {
    const layer = { distance: [0, 10], dilution: [0.5, 0.8], width: [1, 1] };
    expect(footprintFromLayer(noJet, layer, 1), "required 1").toEqual({ area: 0, furthestExtent: 0 });
    expect(footprintFromLayer(noJet, layer, NaN), "undefined").toEqual({ area: 0, furthestExtent: 0 });
    expect(footprintFromLayer(noJet, layer, 1.5).area, "required 1.5: the whole strip").toBeCloseTo(10, 12);
  });
});

describe("footprintFromLayer() — the jet's part between impact and the near-field end", () => {
  const jet = {
    profile: { distance: [0, 10, 20], dilution: [1, 5, 10], basis: "length-scale points" as const },
    impactDistance: 10,
    nearFieldEnd: 20,
  };
  const layer = { distance: [20, 30], dilution: [10, 20], width: [10, 10] };

  it("covers a triangle from impact (width 0) to the near-field end (the layer's start width)", () => {
    // Jet part 10–20 m: triangle ½·10·10 = 50 m²; layer 20–25 m: 5 × 10 = 50 m² (dilution reaches 15 at 25 m).
    const f = footprintFromLayer(jet, layer, 15);
    expect(f.area, "50 + 50 m²").toBeCloseTo(100, 9);
    expect(f.furthestExtent, "25 m").toBeCloseTo(25, 9);
  });

  it("cuts the jet part where the jet's own dilution reaches the required value", () => {
    // Jet dilution 5 → 10 over 10–20 m reaches 7.5 at 15 m, where the width is 5 m: ½·5·5 = 12.5 m².
    const f = footprintFromLayer(jet, layer, 7.5);
    expect(f.area, "12.5 m²").toBeCloseTo(12.5, 9);
    expect(f.furthestExtent, "15 m").toBeCloseTo(15, 9);
  });

  it("adds no jet part when the near field ends at impact", () => {
    const f = footprintFromLayer({ ...jet, impactDistance: 20 }, layer, 15);
    expect(f.area, "layer only").toBeCloseTo(50, 9);
  });
});

describe("footprintStage()", () => {
  const governing = (range: number, end: number): GoverningLayer => ({
    profile: { distance: [0], dilution: [1], basis: "path" },
    impactDistance: 0,
    nearFieldEnd: 0,
    layer: {
      distance: [0, end],
      dilution: [2, 3],
      thickness: [1, 1],
      width: [1, 1],
      richardson: [0, 0],
      bedRichardson: [0, 0],
      switchDistance: null,
    },
    range,
  });

  it("warns when the limit is still exceeded at the end of the computed range (0.1 % tolerance)", () => {
    for (const end of [100, 99.9]) {
      const out = footprintStage({ governing: governing(100, end), requiredDilution: 10 });
      expect(out.footprint.furthestExtent, `extent ${end} m`).toBe(end);
      expect(out.warnings.length, `extent ${end} m of a 100 m range`).toBe(1);
      expect(out.warnings[0], "named, stage far-field").toMatchObject({
        code: "footprint-beyond-range",
        severity: "warning",
        stage: "far-field",
      });
      expect(out.warnings[0]!.message, "names the extent").toContain(`exceeded at ${end.toFixed(0)} m`);
    }
  });

  it("does not warn when the exceedance ends inside the range", () => {
    const out = footprintStage({ governing: governing(100, 99.8), requiredDilution: 10 });
    expect(out.warnings, "99.8 m of 100 m").toEqual([]);
    const met = footprintStage({ governing: governing(100, 100), requiredDilution: 2.5 });
    expect(met.footprint.furthestExtent, "exceeded to 50 m only").toBeCloseTo(50, 9);
    expect(met.warnings, "inside the range").toEqual([]);
  });

  it("is empty without a governing chain or in edge detail", () => {
    const empty = { footprint: { area: 0, furthestExtent: 0 }, warnings: [] };
    expect(footprintStage({ governing: null, requiredDilution: 10 }), "no chain").toEqual(empty);
    expect(footprintStage({ governing: governing(100, 100), requiredDilution: 10, detail: "edge" }), "edge").toEqual(
      empty,
    );
    const full = footprintStage({ governing: governing(100, 100), requiredDilution: 10, detail: "full" });
    expect(full.footprint.area, "full detail computes it: 1 m × 100 m").toBeCloseTo(100, 9);
  });
});
