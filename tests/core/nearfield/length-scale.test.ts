/**
 * nearFieldLengthScale(): the published-dataset (Method 1) near field of one round dense jet.
 * Expected numbers are the papers' coefficients times d·F or F; the coefficient sources are given beside
 * each check.
 */
import { describe, expect, it } from "vitest";
import { denseJet, type JetOptions } from "../../helpers/jets";
import fc from "fast-check";
import { nearFieldLengthScale } from "../../../core/nearfield/length-scale";
import type { AmbientColumn, JetSource } from "../../../core/nearfield/types";

/** A jet with the given d, F and angle; U = 4 m/s unless given, ambient 1025 kg/m³, port at the bed. */
const makeJet = (p: JetOptions = {}): JetSource => denseJet({ azimuth: 90, portHeight: 0, ...p });

interface ColumnOptions {
  depth?: number;
  current?: number;
  direction?: number;
  densities?: number[];
}

function makeColumn(p: ColumnOptions = {}): AmbientColumn {
  const depth = p.depth ?? 30;
  const densities = p.densities ?? [1025, 1025];
  return {
    depth,
    depths: densities.map((_, i) => (i * depth) / (densities.length - 1)),
    densities,
    salinities: densities.map(() => 35),
    temperatures: densities.map(() => 20),
    currentSpeed: p.current ?? 0,
    currentDirection: p.direction ?? 0,
  };
}

describe("nearFieldLengthScale() at 60° in stagnant water", () => {
  const jet = makeJet({ d: 0.2, F: 25 });
  const r = nearFieldLengthScale(jet, makeColumn());
  const dF = 0.2 * 25;

  it("uses both datasets that cover 60° and says the headline is the less favourable value of each", () => {
    expect(r.method, "method name").toBe("length-scale");
    expect(r.available, "available at 60°").toBe(true);
    expect(r.notAvailableReason, "no reason when available").toBeNull();
    expect(r.source, "Lai & Lee named").toMatch(/Lai & Lee \(2012\)/);
    expect(r.source, "Roberts et al. named").toMatch(/Roberts, Ferrier & Daviero \(1997\)/);
    expect(r.source, "rule stated").toMatch(/less favourable/);
    expect(r.source, "no provenance tag in a result string").not.toMatch(/from memory|secondary|confirmed/i);
  });

  it("headlines the conservative 60° values: S_i = 1.06 F (Lai & Lee 2012), rise 2.2 dF (Roberts et al. 1997, higher)", () => {
    expect(r.impactDilution, "S_i = 1.06 F, the lower of 1.06 F and 1.6 F").toBeCloseTo(1.06 * 25, 10);
    expect(r.maxRiseHeight, "y_t = 2.2 dF, the higher of 2.08 and 2.2").toBeCloseTo(2.2 * dF, 10);
    expect(r.returnDistance, "x_i = 2.4 dF, the only traced return distance (Roberts et al. 1997)").toBeCloseTo(
      2.4 * dF,
      10,
    );
    expect(r.impactDistance, "port on the bed: impact = return").toBeCloseTo(2.4 * dF, 10);
    expect(r.nearFieldDistance, "x_n = 9.0 dF (Roberts et al. 1997)").toBeCloseTo(9.0 * dF, 10);
    expect(r.nearFieldDilution, "S_n = 1.06 F × 2.6/1.6, below Roberts' own 2.6 F").toBeCloseTo(
      1.06 * 25 * (2.6 / 1.6),
      10,
    );
  });

  it("lies inside the 60° oracle bands (rise 1.9–2.4 dF: Lai & Lee 2012, Roberts et al. 1997; S_i/F 1.0–1.7)", () => {
    expect(r.maxRiseHeight! / dF, "rise 1.9–2.4 dF").toBeGreaterThanOrEqual(1.9);
    expect(r.maxRiseHeight! / dF, "rise 1.9–2.4 dF").toBeLessThanOrEqual(2.4);
    expect(r.impactDilution! / 25, "S_i/F 1.0–1.7").toBeGreaterThanOrEqual(1.0);
    expect(r.impactDilution! / 25, "S_i/F 1.0–1.7").toBeLessThanOrEqual(1.7);
  });

  it("keeps each dataset's own values as variants and spans both in the dilution range, up to 1.6 F", () => {
    expect(r.variants?.length, "two datasets").toBe(2);
    const lai = r.variants!.find((v) => /Lai & Lee \(2012\)/.test(v.source))!;
    const rob = r.variants!.find((v) => /Roberts, Ferrier & Daviero \(1997\)/.test(v.source))!;
    expect(lai.maxRiseHeight, "Z_max = 2.08 dF (Lai & Lee 2012)").toBeCloseTo(2.08 * dF, 10);
    expect(lai.impactDilution, "S_i = 1.06 F (Lai & Lee 2012)").toBeCloseTo(1.06 * 25, 10);
    expect(rob.impactDilution, "S_i = 1.6 F (Roberts et al. 1997)").toBeCloseTo(1.6 * 25, 10);
    expect(rob.nearFieldDilution, "S_n = 2.6 F (Roberts et al. 1997)").toBeCloseTo(2.6 * 25, 10);
    expect(r.dilutionRange, "[1.06 F, 1.6 F]").toEqual([1.06 * 25, 1.6 * 25]);
  });

  it("gives the dilution at maximum rise from Lai & Lee (S_t = 0.45 F) and names where each headline came from", () => {
    expect(r.maxRiseDilution, "S_t = 0.45 F").toBeCloseTo(0.45 * 25, 10);
    expect(r.notes?.join(" "), "origin of each headline declared").toMatch(/maxRiseDilution from Lai & Lee \(2012\)/);
    expect(r.maxRiseDistance, "no dataset gives x_m").toBeNull();
  });

  it("reports flux-averaged dilutions beside the centreline ones, with the factor, and entrained flow on that basis", () => {
    const k = 1.44 / (1 + 1.44); // λ²/(1 + λ²), λ = 1.2 (Fischer et al. 1979)
    expect(r.fluxAveragingFactor, "factor (1 + λ²)/λ²").toBeCloseTo(1 / k, 12);
    expect(r.impactDilutionFluxAveraged, "1.06 F × factor").toBeCloseTo((1.06 * 25) / k, 10);
    expect(r.nearFieldDilutionFluxAveraged, "S_n × factor").toBeCloseTo((r.nearFieldDilution as number) / k, 10);
    expect(r.entrainedFlow, "Q0 × (flux-averaged S_i − 1)").toBeCloseTo(jet.flow * ((1.06 * 25) / k - 1), 12);
  });

  it("raises no warnings for an in-range, stagnant, unstratified case", () => {
    expect(r.warnings, "clean case").toEqual([]);
    expect(r.bias, "states the known disagreement").toMatch(/1\.06·F/);
  });
});

describe("nearFieldLengthScale() between and outside tabulated angles", () => {
  it("at 45° uses Lai & Lee (2012), interpolated between 15° and 60°, and says so", () => {
    const r = nearFieldLengthScale(makeJet({ angle: 45, d: 0.1, F: 30 }), makeColumn());
    const expected = 0.44 + ((45 - 15) / 45) * (2.08 - 0.44); // linear between the end points of Lai & Lee (2012)
    expect(r.source, "the only dataset").toMatch(/^Lai & Lee \(2012\).*only dataset/);
    expect(r.maxRiseHeight, "interpolated rise").toBeCloseTo(expected * 0.1 * 30, 10);
    expect(r.impactDilution, "S_i = 1.06 F over 38–60° (Lai & Lee 2012, abstract)").toBeCloseTo(1.06 * 30, 10);
    expect(r.returnDistance, "no traced return distance at 45°").toBeNull();
    expect(r.impactDistance, "so no impact distance").toBeNull();
    expect(r.dilutionRange, "one dataset, no traced scatter").toBeNull();
    expect(r.notes?.join(" "), "interpolation declared").toMatch(/interpolated linearly between 15° and 60°/);
  });

  it("is continuous in angle while one dataset is primary (15°–57.9°)", () => {
    fc.assert(
      fc.property(fc.double({ min: 15, max: 57.8, noNaN: true }), (angle) => {
        const a = nearFieldLengthScale(makeJet({ angle }), makeColumn()).maxRiseHeight!;
        const b = nearFieldLengthScale(makeJet({ angle: angle + 0.01 }), makeColumn()).maxRiseHeight!;
        // slope (2.08 − 0.44)/45 per degree × dF = 5 m
        const allowed = ((2.08 - 0.44) / 45) * 5 * 0.01 + 1e-9;
        expect(Math.abs(b - a), `rise jump at ${angle}°`).toBeLessThanOrEqual(allowed);
      }),
      { numRuns: 50 },
    );
  });

  for (const angle of [75, 90]) {
    it(`is not available at ${angle}° (no cited dataset), with the reason, and returns no 60° number`, () => {
      const jet = makeJet({ angle });
      const r = nearFieldLengthScale(jet, makeColumn());
      const at60 = nearFieldLengthScale(makeJet({ angle: 60 }), makeColumn());
      expect(r.available, "not available").toBe(false);
      expect(r.notAvailableReason, "reason names the covered angles").toMatch(/15°–60°/);
      const w = r.warnings.find((x) => x.code === "angle-outside-studied-range");
      expect(w?.message, "quotes the angle and the range").toMatch(new RegExp(`${angle}\\.0°.*15°–60°`));
      for (const f of [
        "maxRiseHeight",
        "maxRiseDistance",
        "returnDistance",
        "impactDistance",
        "impactDilution",
        "nearFieldDistance",
        "nearFieldDilution",
        "maxRiseDilution",
        "entrainedFlow",
        "dilutionRange",
        "impactDilutionFluxAveraged",
      ] as const) {
        expect(r[f] ?? null, `${f} is null at ${angle}°`).toBeNull();
        if (at60[f] !== null && at60[f] !== undefined)
          expect(r[f], `${f} differs from its 60° value`).not.toEqual(at60[f]);
      }
      expect(r.notes?.join(" "), "notes say why").toMatch(/Not available/);
    });
  }

  it("is not available below 15° either (Lai & Lee 2012 studied 15°–60°)", () => {
    const r = nearFieldLengthScale(makeJet({ angle: 10 }), makeColumn());
    expect(r.available, "not available").toBe(false);
    expect(r.maxRiseHeight, "no rise taken from 15°").toBeNull();
    expect(r.impactDilution, "no dilution").toBeNull();
    expect(r.entrainedFlow, "no entrainment without a dilution").toBeNull();
  });

  it("gives the 15° rise, 0.44 dF (Lai & Lee 2012), and no dilution there (none stated below 38°)", () => {
    const r = nearFieldLengthScale(makeJet({ angle: 15 }), makeColumn());
    expect(r.available, "available").toBe(true);
    expect(r.maxRiseHeight, "0.44 dF").toBeCloseTo(0.44 * 5, 10);
    expect(r.impactDilution, "no dilution below 38°").toBeNull();
  });

  it("returns nothing, with a serious warning, for a downward or buoyant discharge", () => {
    const down = nearFieldLengthScale(makeJet({ angle: -10 }), makeColumn());
    expect(down.maxRiseHeight, "no estimate").toBeNull();
    expect(down.warnings[0].severity, "serious").toBe("serious");
    const buoyant = nearFieldLengthScale({ ...makeJet(), reducedGravity: -0.1 }, makeColumn());
    expect(buoyant.impactDilution, "no estimate").toBeNull();
    expect(buoyant.warnings[0].code, "code").toBe("not-a-dense-jet");
  });
});

describe("nearFieldLengthScale() scaling", () => {
  it("doubling d at fixed F doubles every length and leaves every dilution unchanged", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 15, max: 75, noNaN: true }),
        fc.double({ min: 20, max: 60, noNaN: true }),
        fc.double({ min: 0.05, max: 0.5, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        (angle, F, d, portHeight) => {
          const col = makeColumn({ depth: 1000 });
          const a = nearFieldLengthScale(makeJet({ angle, F, d, portHeight }), col);
          const b = nearFieldLengthScale(makeJet({ angle, F, d: 2 * d, portHeight: 2 * portHeight }), col);
          const lengths = ["maxRiseHeight", "returnDistance", "impactDistance", "nearFieldDistance"] as const;
          for (const k of lengths) {
            if (a[k] === null) expect(b[k], `${k} null in both`).toBeNull();
            else expect(b[k]! / a[k]!, `${k} scales with d`).toBeCloseTo(2, 9);
          }
          for (const k of ["impactDilution", "nearFieldDilution", "maxRiseDilution"] as const) {
            expect(b[k], `${k} independent of d`).toEqual(a[k]);
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it("extends the descent to a raised port's seabed by portHeight/tan θ", () => {
    const r = nearFieldLengthScale(makeJet({ portHeight: 1.5 }), makeColumn());
    expect(r.impactDistance! - r.returnDistance!, "1.5/tan 60°").toBeCloseTo(1.5 / Math.tan(Math.PI / 3), 10);
    expect(r.notes?.join(" "), "method declared").toMatch(/straight line at the discharge angle/);
  });
});

describe("nearFieldLengthScale() ambient checks", () => {
  it("says plainly, with numbers, when the current is too strong for the stagnant-water correlations", () => {
    // U = 4 m/s, F = 25, u_a = 0.2 m/s: F_c = 0.05 × 25 = 1.25 ≥ 0.8 (Lai & Lee 2013)
    const r = nearFieldLengthScale(makeJet(), makeColumn({ current: 0.2, direction: 90 }));
    const w = r.warnings.find((x) => x.code === "current-bends-jet");
    expect(w, "strong-current warning").toBeDefined();
    expect(w!.severity, "serious").toBe("serious");
    expect(w!.message, "quotes F_c").toMatch(/1\.25/);
    expect(w!.message, "says the current is co-flowing").toMatch(/co-flowing/);
    expect(w!.stage, "stage").toBe("length-scale");
  });

  it("gives only the strong-current warning for 0.8 ≤ F_c < 1, not also the weak-current caveat", () => {
    // u_a = 0.144 m/s: F_c = 0.036 × 25 = 0.9
    const r = nearFieldLengthScale(makeJet(), makeColumn({ current: 0.144 }));
    const codes = r.warnings.map((x) => x.code);
    expect(codes, "strong-current warning").toContain("current-bends-jet");
    expect(codes, "no contradictory weak-current caveat").not.toContain("weak-current-lower-dilution");
  });

  it("notes the jet-dominated regime and warns of weak-current dilution loss (U_r·F < 1)", () => {
    const r = nearFieldLengthScale(makeJet(), makeColumn({ current: 0.08, direction: 270 }));
    const codes = r.warnings.map((w) => w.code);
    expect(codes, "no strong-current warning at F_c = 0.5").not.toContain("current-bends-jet");
    expect(codes, "weak-current warning").toContain("weak-current-lower-dilution");
    expect(r.notes?.join(" "), "regime named").toMatch(/F_c = .* = 0\.50: jet-dominated/);
    expect(r.notes?.join(" "), "direction named").toMatch(/counter-flowing/);
  });

  it("flags stratification, and warns when it is strong across the rise", () => {
    const weak = nearFieldLengthScale(makeJet(), makeColumn({ densities: [1024.9, 1025] }));
    expect(
      weak.warnings.map((w) => w.code),
      "info only",
    ).toEqual(["ambient-stratified"]);
    const strong = nearFieldLengthScale(makeJet(), makeColumn({ densities: [1020, 1025] }));
    const w = strong.warnings.find((x) => x.code === "stratification-affects-jet");
    expect(w, "strong stratification warned").toBeDefined();
    expect(w!.message, "quotes the density change").toMatch(/kg\/m³/);
  });

  it("warns when F is below the asymptotic range", () => {
    const r = nearFieldLengthScale(makeJet({ F: 15 }), makeColumn());
    const codes = r.warnings.map((w) => w.code);
    expect(codes, "Roberts F check").toContain("roberts-1997-froude-below-asymptotic");
    expect(codes, "Lai & Lee F check").toContain("lai-lee-2012-froude-not-asymptotic");
  });
});

describe("nearFieldLengthScale() provenance", () => {
  it("names a source for the primary and every variant at every angle", () => {
    for (let angle = 5; angle <= 90; angle += 5) {
      const r = nearFieldLengthScale(makeJet({ angle }), makeColumn());
      if (!r.available) {
        expect(r.notAvailableReason, `reason at ${angle}°`).toMatch(/no published laboratory dataset/);
        continue;
      }
      expect(r.source, `source at ${angle}°`).toMatch(/\(\d{4}\)/);
      for (const v of r.variants ?? []) expect(v.source, `variant source at ${angle}°`).toMatch(/\(\d{4}\)/);
    }
  });
});
