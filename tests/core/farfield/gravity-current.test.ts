import { describe, expect, it } from "vitest";
import {
  DEFAULT_BED_DRAG,
  equilibriumRichardsonFromSlope,
  spreadingLayerFromNearFieldEnd,
  type SpreadingLayerInput,
} from "../../../core/farfield/gravity-current";
import { entrainmentFromRichardson } from "../../../core/farfield/turner-1986-entrainment";

const base: SpreadingLayerInput = {
  startDistance: 36,
  endDistance: 200,
  startDilution: 52,
  dischargeFlow: 0.5,
  reducedGravity: 0.27,
  initialWidth: 2 * Math.PI * 20,
  currentSpeed: 0,
  bedSlope: 0,
};

describe("spreadingLayerFromNearFieldEnd() — dense layer beyond the near field", () => {
  it("conserves salt: V·h·w·(ΔS₀/S) equals the discharge salt-excess flux at every cross-section to 0.1 %", () => {
    const excess = 36.5; // g/kg, discharge minus ambient
    for (const input of [
      base,
      { ...base, bedSlope: 0.05 },
      { ...base, currentSpeed: 0.15 },
      { ...base, currentSpeed: 0.3, bedSlope: 0.02 },
    ]) {
      const s = spreadingLayerFromNearFieldEnd(input);
      for (let i = 0; i < s.distance.length; i += 25) {
        const flux = s.velocity[i] * s.thickness[i] * s.width[i] * (excess / s.dilution[i]);
        const rel = Math.abs(flux / (input.dischargeFlow * excess) - 1);
        expect(rel, `salt flux at ${s.distance[i].toFixed(1)} m (slope ${input.bedSlope}, current ${input.currentSpeed})`).toBeLessThan(1e-3);
      }
    }
  });

  it("entrains nothing on a flat bed in still water: the layer is subcritical (Ri ≥ 0.8, Ellison & Turner 1959)", () => {
    const s = spreadingLayerFromNearFieldEnd(base);
    expect(s.dilution[s.dilution.length - 1], "dilution unchanged from the near-field end").toBeCloseTo(52, 9);
    expect(s.geometry, "no current: radial spreading").toBe("radial");
    expect(s.thickness[s.thickness.length - 1], "the layer thins as it spreads").toBeLessThan(s.thickness[0]);
  });

  it("entrains on a slope, more on a steeper one, because the normal-flow Ri falls with slope", () => {
    const gentle = spreadingLayerFromNearFieldEnd({ ...base, bedSlope: 0.02 });
    const steep = spreadingLayerFromNearFieldEnd({ ...base, bedSlope: 0.1 });
    const last = (a: number[]) => a[a.length - 1];
    expect(last(gentle.dilution), "a 2 % slope adds some dilution").toBeGreaterThan(52);
    expect(last(steep.dilution), "a 10 % slope adds more").toBeGreaterThan(last(gentle.dilution));
    for (const r of steep.richardson) expect(r, "Ri stays in the entraining range on a steep slope").toBeLessThan(0.8);
  });

  it("is carried off by a current once its own speed falls to the current speed", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: 0.2 });
    expect(s.switchDistance, "switch point found").not.toBeNull();
    const i = s.distance.findIndex((d) => d > (s.switchDistance ?? Infinity));
    expect(s.velocity[i], "after the switch the layer moves at the current speed").toBeCloseTo(0.2, 12);
    expect(s.width[s.width.length - 1], "it widens sideways downstream").toBeGreaterThan(s.width[i]);
  });

  it("never loses dilution along the way (entrainment only adds water)", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: 0.3, bedSlope: 0.03 });
    for (let i = 1; i < s.dilution.length; i++) expect(s.dilution[i], `step ${i}`).toBeGreaterThanOrEqual(s.dilution[i - 1]);
  });

  it("handles a neutral discharge (g′ = 0) and zero span without NaN", () => {
    const neutral = spreadingLayerFromNearFieldEnd({ ...base, reducedGravity: 0 });
    expect(neutral.dilution.every(Number.isFinite), "finite dilutions").toBe(true);
    const none = spreadingLayerFromNearFieldEnd({ ...base, endDistance: base.startDistance });
    expect(none.distance, "only the start point").toEqual([36]);
  });
});

describe("equilibriumRichardsonFromSlope() — normal flow g′h sinβ = (C_D + E)V² (Ellison & Turner 1959, from memory)", () => {
  it("satisfies Ri = (C_D + E(Ri))/tanβ and is infinite on a flat bed", () => {
    for (const slope of [0.01, 0.05, 0.2]) {
      const ri = equilibriumRichardsonFromSlope(slope);
      const rhs = (DEFAULT_BED_DRAG + entrainmentFromRichardson(ri)) / slope;
      expect(Math.abs(ri - rhs), `root at slope ${slope}`).toBeLessThan(1e-9);
    }
    expect(equilibriumRichardsonFromSlope(0), "flat bed: no normal flow").toBe(Infinity);
  });
});
