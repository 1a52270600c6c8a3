/**
 * stagesAfterNearField() with hand-built near-field results (see fixtures.ts for their published sources).
 */
import { describe, expect, it } from "vitest";
import { stagesAfterNearField } from "../../../core/pipeline";
import { beyondInputFixture, DF, F, integralFixture, lengthScaleFixture, scenarioFixture } from "./fixtures";

describe("stagesAfterNearField() — from the near field to the mixing-zone edge", () => {
  it("carries the more conservative (lower) near-field dilution to the edge by default and says which", () => {
    const out = stagesAfterNearField(beyondInputFixture(scenarioFixture()));
    expect(out.mixingZone.nearFieldMethod, "integral: S_i = 1.06 F < length-scale S_n = 2.6 F").toBe("integral");
    expect(out.mixingZone.edgeInsideNearField, "edge at 100 m is beyond 9 dF = 36 m").toBe(false);
    expect(
      out.mixingZone.alternatives.map((a) => a.method),
      "both chains reported",
    ).toEqual(["length-scale + gravity-current", "integral + gravity-current"]);
  });

  it("uses the requested near-field method when options.nearFieldForEdge names it", () => {
    const out = stagesAfterNearField(
      beyondInputFixture(scenarioFixture({ options: { nearFieldForEdge: "length-scale" } })),
    );
    expect(out.mixingZone.nearFieldMethod, "as requested").toBe("length-scale");
    // Flat bed, still water: the layer beyond 9 dF entrains nothing (Ri ≥ 0.8, Ellison & Turner 1959),
    // so the edge dilution is the Roberts et al. (1997) near-field dilution 2.6 F (from memory).
    expect(out.mixingZone.dilution, "S(100 m) = S_n on a flat bed in still water").toBeCloseTo(2.6 * F, 6);
  });

  it("uses the jet's own dilution where the edge lies inside the near field, and says so", () => {
    const out = stagesAfterNearField(
      beyondInputFixture(
        scenarioFixture({ mixingZone: { radius: 20, limits: [] }, options: { nearFieldForEdge: "length-scale" } }),
      ),
    );
    expect(out.mixingZone.edgeInsideNearField, "20 m < x_n = 36 m").toBe(true);
    // Interpolated between impact (2.4 dF, 1.6 F) and near-field end (9 dF, 2.6 F): Roberts et al. 1997 (from memory).
    const t = (20 - 2.4 * DF) / (9 * DF - 2.4 * DF);
    expect(out.mixingZone.dilution, "linear between the published points").toBeCloseTo(
      1.6 * F + t * (2.6 * F - 1.6 * F),
      6,
    );
    expect(
      out.warnings.map((w) => w.code),
      "a readable note",
    ).toContain("edge-inside-near-field");
  });

  it("reports gravity current and Brooks (1960) passive diffusion in a current and keeps the lower by default", () => {
    const out = stagesAfterNearField(
      beyondInputFixture(scenarioFixture({ ambient: { currentSpeed: 0.2, currentDirection: 90 } })),
    );
    const alts = out.mixingZone.alternatives.filter((a) => a.method.startsWith(out.mixingZone.nearFieldMethod));
    expect(alts.length, "two far-field methods for the chosen near field").toBe(2);
    expect(out.mixingZone.dilution, "conservative: the lower of the two").toBeCloseTo(
      Math.min(...alts.map((a) => a.dilution)),
      9,
    );
    expect(
      out.methods.map((m) => m.name),
      "Brooks is listed among the methods",
    ).toContain("passive lateral diffusion");
  });

  it("follows options.farField when the user asks for passive diffusion", () => {
    const out = stagesAfterNearField(
      beyondInputFixture(
        scenarioFixture({ ambient: { currentSpeed: 0.2 }, options: { farField: "passive-diffusion" } }),
      ),
    );
    expect(out.mixingZone.method, "the chain names Brooks").toContain("Brooks (1960)");
  });

  it("multiplies near-field and far-field dilutions: S(x) = S_n × S_ff (Fischer et al. 1979 ch. 9, from memory)", () => {
    const out = stagesAfterNearField(
      beyondInputFixture(
        scenarioFixture({
          ambient: { currentSpeed: 0.2 },
          options: { farField: "passive-diffusion", nearFieldForEdge: "length-scale" },
        }),
      ),
    );
    const series = out.mixingZone.series;
    const iStart = series.stage.indexOf("spreading-layer");
    expect(series.dilution[iStart], "the far field starts from S_n").toBeCloseTo(2.6 * F, 9);
    expect(out.mixingZone.dilution, "and only grows from there").toBeGreaterThan(2.6 * F);
  });

  it("produces a consistent series: distances ascending, salinity increase = discharge excess ÷ dilution", () => {
    const out = stagesAfterNearField(beyondInputFixture(scenarioFixture()));
    const s = out.mixingZone.series;
    for (let i = 1; i < s.distance.length; i++)
      expect(s.distance[i], `distance ${i}`).toBeGreaterThanOrEqual(s.distance[i - 1]);
    for (let i = 0; i < s.distance.length; i++) {
      expect(s.salinityIncrease[i] * s.dilution[i], `ΔS·S at ${s.distance[i]} m`).toBeCloseTo(70 - 33.5, 9);
      if (s.stage[i] === "jet") expect(s.layerThickness[i], "no layer inside the jet").toBeNull();
    }
    expect(out.mixingZone.layerThickness, "layer thickness at the edge").toBeGreaterThan(0);
  });

  it("checks salinity against 2 ppt over 33.5 g/kg: required dilution 18.25 ((70 − 33.5)/2, arithmetic)", () => {
    const out = stagesAfterNearField(beyondInputFixture(scenarioFixture()));
    expect(out.compliance.requiredDilution, "(70 − 33.5)/2").toBeCloseTo(18.25, 12);
    expect(out.compliance.pass, "1.06 F = 21.2 ≥ 18.25").toBe(true);
    const salinity = out.mixingZone.constituents.find((c) => c.constituent === "salinity")!;
    expect(salinity.increase, "ΔS at the edge").toBeCloseTo(36.5 / out.mixingZone.dilution, 9);
  });

  it("maps the seabed footprint where the governing limit is exceeded", () => {
    const tight = stagesAfterNearField(
      beyondInputFixture(
        scenarioFixture({
          mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxIncrease: 1, unit: "g/kg" }] },
        }),
      ),
    );
    expect(tight.compliance.pass, "needs 36.5, gets 21.2").toBe(false);
    expect(tight.mixingZone.footprint.furthestExtent, "exceeded past the edge").toBeGreaterThan(100);
    expect(tight.mixingZone.footprint.area, "a non-zero area").toBeGreaterThan(0);
    const loose = stagesAfterNearField(beyondInputFixture(scenarioFixture()));
    expect(loose.mixingZone.footprint.furthestExtent, "exceedance ends before the edge").toBeLessThan(100);
  });

  it("states what is not modelled", () => {
    const out = stagesAfterNearField(beyondInputFixture(scenarioFixture()));
    const text = out.mixingZone.notModelled.join(" ");
    for (const word of ["build-up", "Tidal reversal", "intake"]) expect(text, `mentions ${word}`).toContain(word);
  });

  it("falls back to an undiluted edge with a serious warning when no near-field method reached an end point", () => {
    const broken = { ...integralFixture(), impactDistance: null, returnDistance: null, impactDilution: null };
    const out = stagesAfterNearField(beyondInputFixture(scenarioFixture(), [broken]));
    expect(out.mixingZone.dilution, "undiluted").toBe(1);
    expect(
      out.warnings.map((w) => w.code),
      "serious warning",
    ).toContain("edge-dilution-undiluted");
  });

  it("leaves a single port's near field unchanged", () => {
    const out = stagesAfterNearField(beyondInputFixture(scenarioFixture()));
    expect(out.multiport.regime, "single port").toBe("single-port");
    expect(out.nearField[0], "same object, no adjustment").toEqual(lengthScaleFixture());
  });
});
