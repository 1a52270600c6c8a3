/**
 * nearFieldLengthScale(): the published-dataset (Method 1) near field of one round dense jet.
 * Expected numbers are the papers' coefficients times d·F or F; the coefficient sources are given beside
 * each check.
 */
import { describe, expect, it } from "vitest";
import { denseJet, type JetOptions } from "../../helpers/jets";
import fc from "fast-check";
import { nearFieldLengthScale } from "../../../core/nearfield/lengthScale";
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

  it("uses Roberts, Ferrier & Daviero (1997) as the primary dataset and says why", () => {
    expect(r.method, "method name").toBe("length-scale");
    expect(r.source, "primary named").toMatch(/Roberts, Ferrier & Daviero \(1997\)/);
    expect(r.source, "reason given").toMatch(/primary because/);
    expect(r.source, "no provenance tag in a result string").not.toMatch(/from memory|secondary|confirmed/i);
  });

  it("gives the Roberts et al. (1997) lengths and dilutions (2.2, 2.4, 1.6, 9.0, 2.6; from memory)", () => {
    expect(r.maxRiseHeight, "y_t = 2.2 dF").toBeCloseTo(2.2 * dF, 10);
    expect(r.returnDistance, "x_i = 2.4 dF").toBeCloseTo(2.4 * dF, 10);
    expect(r.impactDistance, "port on the bed: impact = return").toBeCloseTo(2.4 * dF, 10);
    expect(r.impactDilution, "S_i = 1.6 F").toBeCloseTo(1.6 * 25, 10);
    expect(r.nearFieldDistance, "x_n = 9.0 dF").toBeCloseTo(9.0 * dF, 10);
    expect(r.nearFieldDilution, "S_n = 2.6 F").toBeCloseTo(2.6 * 25, 10);
  });

  // Bands: rise 2.08 dF (Lai & Lee 2012, abstract) to 2.2 dF (Roberts et al. 1997, from memory) ±10 %;
  // impact dilution 1.06 F (Lai & Lee 2012, abstract) to 1.6 F (Roberts et al. 1997, from memory).
  it("lies inside the published 60° bands for rise and impact dilution", () => {
    expect(r.maxRiseHeight! / dF, "rise 1.9–2.4 dF").toBeGreaterThanOrEqual(1.9);
    expect(r.maxRiseHeight! / dF, "rise 1.9–2.4 dF").toBeLessThanOrEqual(2.4);
    expect(r.impactDilution! / 25, "S_i/F 1.0–1.7").toBeGreaterThanOrEqual(1.0);
    expect(r.impactDilution! / 25, "S_i/F 1.0–1.7").toBeLessThanOrEqual(1.7);
  });

  it("shows Lai & Lee (2012) as a variant and spans both in the dilution range", () => {
    expect(r.variants?.length, "one variant").toBe(1);
    const v = r.variants![0];
    expect(v.source, "variant named").toMatch(/Lai & Lee \(2012\)/);
    expect(v.maxRiseHeight, "Z_max = 2.08 dF (Lai & Lee 2012, abstract)").toBeCloseTo(2.08 * dF, 10);
    expect(v.impactDilution, "S_i = 1.06 F (Lai & Lee 2012, abstract)").toBeCloseTo(1.06 * 25, 10);
    expect(r.dilutionRange, "[1.06 F, 1.6 F]").toEqual([1.06 * 25, 1.6 * 25]);
  });

  it("fills the dilution at maximum rise from Lai & Lee (S_t = 0.45 F, abstract) and notes it", () => {
    expect(r.maxRiseDilution, "S_t = 0.45 F").toBeCloseTo(0.45 * 25, 10);
    expect(r.notes?.join(" "), "fill is declared").toMatch(/maxRiseDilution taken from Lai & Lee \(2012\)/);
    expect(r.maxRiseDistance, "no dataset gives x_m").toBeNull();
  });

  it("reports entrained flow Q0·(S_i − 1), centreline-based", () => {
    expect(r.entrainedFlow, "Q0 × (40 − 1)").toBeCloseTo(jet.flow * (1.6 * 25 - 1), 12);
    expect(r.notes?.join(" "), "says it is centreline-based").toMatch(/centreline/);
  });

  it("raises no warnings for an in-range, stagnant, unstratified case", () => {
    expect(r.warnings, "clean case").toEqual([]);
    expect(r.bias, "states the known disagreement").toMatch(/1\.06·F/);
  });
});

describe("nearFieldLengthScale() between and outside tabulated angles", () => {
  it("at 45° uses Lai & Lee (2012), interpolated between 15° and 60°, and says so", () => {
    const r = nearFieldLengthScale(makeJet({ angle: 45, d: 0.1, F: 30 }), makeColumn());
    const expected = 0.44 + ((45 - 15) / 45) * (2.08 - 0.44); // linear between the end points of the abstract
    expect(r.source, "primary").toMatch(/^Lai & Lee \(2012\)/);
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

  it("warns, with numbers, for a 75° port and uses the 60° values (no silent extrapolation)", () => {
    const r = nearFieldLengthScale(makeJet({ angle: 75 }), makeColumn());
    const w = r.warnings.find((x) => x.code === "angle-outside-studied-range");
    expect(w?.severity, "15° outside the range is serious").toBe("serious");
    expect(w?.message, "quotes the angle and the range").toMatch(/75\.0°.*15°–60°/);
    expect(r.maxRiseHeight, "60° rise used").toBeCloseTo(2.2 * 5, 10);
    expect(r.notes?.join(" "), "notes say so").toMatch(/nearest studied angle/);
  });

  it("warns for a 10° port and gives no dilution (Lai & Lee give none below 38°)", () => {
    const r = nearFieldLengthScale(makeJet({ angle: 10 }), makeColumn());
    expect(r.warnings.map((w) => w.code), "angle warning").toContain("angle-outside-studied-range");
    expect(r.maxRiseHeight, "15° rise, 0.44 dF (Lai & Lee 2012, abstract)").toBeCloseTo(0.44 * 5, 10);
    expect(r.impactDilution, "no dilution below 38°").toBeNull();
    expect(r.entrainedFlow, "no entrainment without a dilution").toBeNull();
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
    expect(weak.warnings.map((w) => w.code), "info only").toEqual(["ambient-stratified"]);
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
      expect(r.source, `primary source at ${angle}°`).toMatch(/\(\d{4}\)/);
      for (const v of r.variants ?? []) expect(v.source, `variant source at ${angle}°`).toMatch(/\(\d{4}\)/);
    }
  });
});
