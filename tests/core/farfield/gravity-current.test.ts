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
        expect(
          rel,
          `salt flux at ${s.distance[i].toFixed(1)} m (slope ${input.bedSlope}, current ${input.currentSpeed})`,
        ).toBeLessThan(1e-3);
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
    for (let i = 1; i < s.dilution.length; i++)
      expect(s.dilution[i], `step ${i}`).toBeGreaterThanOrEqual(s.dilution[i - 1]);
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

describe("spreadingLayerFromNearFieldEnd() — entrainment from the layer's own speed and the bed, not the carrying current", () => {
  const last = (a: number[]) => a[a.length - 1];
  const near = (a: number[], d: number[], x: number) => a[d.findIndex((r) => r >= x)];

  it("does not entrain by shear on a flat bed when drifting: the water above moves with the layer (Ellison & Turner 1959)", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: 0.3 });
    const i = s.distance.findIndex((d) => d > (s.switchDistance ?? Infinity));
    expect(i, "the layer drifts").toBeGreaterThan(0);
    expect(s.entrainment[i], "E(Ri) of the layer's own flow is zero at critical flow Ri = 1").toBe(0);
    expect(s.entrainmentVelocity[i], "only bed-stirred entrainment is left").toBeGreaterThan(0);
  });

  it("bed-stirred entrainment is u*·2.5/Ri* with u* = √C_D·u (Kato & Phillips 1969, from memory)", () => {
    const s = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: 0.3 });
    const i = s.distance.findIndex((d) => d > (s.switchDistance ?? Infinity)) + 10;
    const ustar = Math.sqrt(DEFAULT_BED_DRAG) * 0.3;
    const gp = (0.27 * 0.5) / s.flux[i];
    const riStar = (gp * s.thickness[i]) / (ustar * ustar);
    expect(riStar, "strongly stratified stirring: the law, not its guard, applies").toBeGreaterThan(10);
    expect(s.entrainmentVelocity[i], "u_e = u*·2.5/Ri*").toBeCloseTo((ustar * 2.5) / riStar, 12);
  });

  it("in a 0.3 m/s current the layer's dilution does not grow tenfold within 100 m of the near-field end", () => {
    for (const bedSlope of [0, 0.02, 0.1]) {
      const s = spreadingLayerFromNearFieldEnd({ ...base, currentSpeed: 0.3, bedSlope });
      const growth = near(s.dilution, s.distance, base.startDistance + 100) / s.dilution[0];
      expect(growth, `growth over 100 m, slope ${bedSlope}`).toBeLessThan(10);
      expect(growth, `but some entrainment, slope ${bedSlope}`).toBeGreaterThan(1);
    }
  });

  it("is continuous as the current goes to zero: 0 and 2 mm/s differ by less than 1 % anywhere, flat or sloping", () => {
    for (const bedSlope of [0, 0.02, 0.1]) {
      const still = spreadingLayerFromNearFieldEnd({ ...base, bedSlope });
      const slow = spreadingLayerFromNearFieldEnd({ ...base, bedSlope, currentSpeed: 0.002 });
      expect(
        slow.switchDistance,
        `a 2 mm/s current cannot carry the layer off within range (slope ${bedSlope})`,
      ).toBeNull();
      const rel = Math.abs(last(slow.dilution) / last(still.dilution) - 1);
      expect(rel, `edge of the range, slope ${bedSlope}`).toBeLessThan(0.01);
    }
  });
});
