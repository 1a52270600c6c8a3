import { describe, expect, it } from "vitest";
import { footprintFromLayer } from "../../../core/farfield/footprint";

const jet = { profile: { distance: [0], dilution: [1], basis: "path" as const }, impactDistance: 0, nearFieldEnd: 0 };

describe("footprintFromLayer() — seabed area below the required dilution (geometry, derived)", () => {
  it("cuts a strip of constant width where the dilution reaches the required value", () => {
    // Width 10 m, dilution rising linearly 10 → 110 over 0–100 m: reaches 60 at 50 m → area 10 × 50.
    const distance = Array.from({ length: 101 }, (_, i) => i);
    const layer = { distance, dilution: distance.map((x) => 10 + x), width: distance.map(() => 10) };
    const f = footprintFromLayer(jet, layer, 60);
    expect(f.furthestExtent, "crossing at 50 m").toBeCloseTo(50, 9);
    expect(f.area, "10 m × 50 m").toBeCloseTo(500, 9);
  });

  it("gives the area of a disc when widths are perimeters 2πr (radial spreading)", () => {
    const distance = Array.from({ length: 2001 }, (_, i) => i * 0.05);
    const layer = { distance, dilution: distance.map((x) => 1 + x), width: distance.map((r) => 2 * Math.PI * r) };
    const f = footprintFromLayer(jet, layer, 51);
    expect(f.area / (Math.PI * 50 * 50), "π r² with r = 50 m").toBeCloseTo(1, 6);
  });

  it("is empty when no dilution is needed", () => {
    const layer = { distance: [0, 10], dilution: [5, 6], width: [1, 1] };
    expect(footprintFromLayer(jet, layer, 1), "required dilution 1").toEqual({ area: 0, furthestExtent: 0 });
  });
});
