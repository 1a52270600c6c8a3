/**
 * Specifications of the dense-jet correlation files: angle interpolation, the datasets' angle windows, their
 * range checks, and the crossflow regime of Lai & Lee (2013).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { interpolateAngleTable, type AngleTablePoint } from "../../../core/correlations/dense-jet-dataset";
import {
  LAI_LEE_2012_RISE,
  laiLee2012CoefficientsAtAngle,
  laiLee2012CoefficientsAtAngleValidityIssues,
} from "../../../core/correlations/lai-lee-2012-inclined-dense-jet";
import {
  roberts1997CoefficientsAtAngle,
  roberts1997CoefficientsAtAngleValidityIssues,
} from "../../../core/correlations/roberts-1997-inclined-dense-jet";
import {
  crossflowFroudeValidityIssues,
  crossflowRegimeFromFroude,
} from "../../../core/correlations/lai-lee-2013-crossflow-regime";
import { weakCurrentValidityIssues } from "../../../core/correlations/abessi-roberts-2016-weak-current";

const table: AngleTablePoint[] = [
  { angle: 15, value: { value: 1, provenance: "test" } },
  { angle: 30, value: { value: 4, provenance: "test" } },
  { angle: 60, value: { value: 2, provenance: "test" } },
];

describe("interpolateAngleTable()", () => {
  it("returns tabulated values exactly at tabulated angles, flagged as not interpolated", () => {
    for (const p of table) {
      const r = interpolateAngleTable(table, p.angle);
      expect(r?.value, `value at ${p.angle}°`).toBe(p.value.value);
      expect(r?.interpolated, `${p.angle}° is tabulated`).toBe(false);
    }
  });

  it("is bracketed by its neighbours and names them", () => {
    fc.assert(
      fc.property(fc.double({ min: 15, max: 60, noNaN: true }), (angle) => {
        const r = interpolateAngleTable(table, angle);
        expect(r, `${angle}° lies inside the table`).not.toBeNull();
        const [lo, hi] = r!.bracket;
        expect(lo <= angle && angle <= hi, `bracket [${lo}, ${hi}] contains ${angle}`).toBe(true);
        const vLo = table.find((p) => p.angle === lo)!.value.value;
        const vHi = table.find((p) => p.angle === hi)!.value.value;
        const [low, high] = [Math.min(vLo, vHi), Math.max(vLo, vHi)];
        expect(r!.value, "not below the smaller neighbour").toBeGreaterThanOrEqual(low - 1e-12);
        expect(r!.value, "not above the larger neighbour").toBeLessThanOrEqual(high + 1e-12);
      }),
    );
  });

  it("is continuous: a small change of angle gives a small change of value", () => {
    fc.assert(
      fc.property(fc.double({ min: 15, max: 59.999, noNaN: true }), (angle) => {
        const a = interpolateAngleTable(table, angle)!.value;
        const b = interpolateAngleTable(table, angle + 1e-3)!.value;
        // Largest slope in the table is 3/15 per degree.
        const jump = Math.abs(b - a);
        expect(jump, `jump between ${angle}° and ${angle + 1e-3}°`).toBeLessThanOrEqual(0.2 * 1e-3 + 1e-12);
      }),
    );
  });

  it("refuses to extrapolate outside the table", () => {
    expect(interpolateAngleTable(table, 14.9), "below the first angle").toBeNull();
    expect(interpolateAngleTable(table, 60.1), "above the last angle").toBeNull();
    expect(interpolateAngleTable(table, Number.NaN), "NaN angle").toBeNull();
    expect(interpolateAngleTable([], 30), "empty table").toBeNull();
  });
});

describe("laiLee2012CoefficientsAtAngle()", () => {
  it("interpolates the rise between the two traced angles (15° and 60°) and says so", () => {
    const c = laiLee2012CoefficientsAtAngle(37.5)!;
    // Midway between 0.44 and 2.08 (Lai & Lee 2012, abstract) is 1.26.
    expect(c.riseEdge, "linear midpoint of 0.44 and 2.08").toBeCloseTo(1.26, 12);
    expect(c.interpolated, "37.5° is not tabulated").toBe(true);
    expect(c.notes.join(" "), "the note names the bracketing angles").toMatch(/between 15° and 60°/);
  });

  it("rise grows with angle over 15°–60°, as the abstract's 0.44 → 2.08 does", () => {
    let previous = -Infinity;
    for (let a = 15; a <= 60; a += 0.5) {
      const r = laiLee2012CoefficientsAtAngle(a)!.riseEdge!;
      expect(r, `rise at ${a}°`).toBeGreaterThan(previous);
      previous = r;
    }
  });

  it("gives the dilutions only on 38°–60° where the paper states them", () => {
    expect(laiLee2012CoefficientsAtAngle(30)!.returnDilution, "no S_i below 38°").toBeNull();
    expect(laiLee2012CoefficientsAtAngle(30)!.maxRiseDilution, "no S_t below 38°").toBeNull();
    const at52 = laiLee2012CoefficientsAtAngle(52)!;
    expect(at52.returnDilution, "S_i/F = 1.06 at 52° (Lai & Lee 2012, abstract: 38°–60°)").toBe(1.06);
  });

  it("returns null outside the studied 15°–60° rather than extrapolating", () => {
    expect(laiLee2012CoefficientsAtAngle(10), "10°").toBeNull();
    expect(laiLee2012CoefficientsAtAngle(75), "75°").toBeNull();
  });

  it("warns with numbers below F = 25 (rise) and 20 (dilution), and below the laboratory F = 10", () => {
    const mid = laiLee2012CoefficientsAtAngleValidityIssues({ angle: 45, froude: 15 });
    const codes = mid.map((w) => w.code);
    expect(codes, "F = 15 is not asymptotic").toContain("lai-lee-2012-froude-not-asymptotic");
    expect(mid[0].message, "message quotes F").toMatch(/15\.0/);
    const low = laiLee2012CoefficientsAtAngleValidityIssues({ angle: 45, froude: 5 });
    expect(low[0].severity, "F = 5 is below anything studied").toBe("serious");
    const fine = laiLee2012CoefficientsAtAngleValidityIssues({ angle: 45, froude: 30 });
    expect(fine, "F = 30 is fine").toEqual([]);
  });

  it("tabulates only traced angles", () => {
    expect(
      LAI_LEE_2012_RISE.map((p) => p.angle),
      "only 15° and 60° were traced",
    ).toEqual([15, 60]);
    for (const p of LAI_LEE_2012_RISE)
      expect(p.value.provenance, "cites the paper").toMatch(/Lai & Lee \(2012\).*abstract/);
  });
});

describe("roberts1997CoefficientsAtAngle()", () => {
  it("applies at 60° ± 2° only", () => {
    expect(roberts1997CoefficientsAtAngle(58)?.riseEdge, "58° is within the build tolerance").toBe(2.2);
    expect(roberts1997CoefficientsAtAngle(57.9), "57.9° is another jet").toBeNull();
    expect(roberts1997CoefficientsAtAngle(45), "45° was not studied").toBeNull();
  });

  it("gives no plan distance or dilution at maximum rise (none traced)", () => {
    const c = roberts1997CoefficientsAtAngle(60)!;
    expect(c.maxRiseDistance, "x_m not traced").toBeNull();
    expect(c.maxRiseDilution, "S at max rise not traced").toBeNull();
  });

  it("warns off-angle and below F = 20", () => {
    const issues = roberts1997CoefficientsAtAngleValidityIssues({ angle: 45, froude: 12 });
    expect(issues.map((w) => w.code).sort(), "both checks fire").toEqual([
      "roberts-1997-angle-not-studied",
      "roberts-1997-froude-below-asymptotic",
    ]);
    expect(roberts1997CoefficientsAtAngleValidityIssues({ angle: 60, froude: 25 }), "in range").toEqual([]);
  });
});

describe("crossflow regime (Lai & Lee 2013)", () => {
  it("switches at F_c = 0.8 and 2", () => {
    expect(crossflowRegimeFromFroude(0), "no current").toBe("stagnant");
    expect(crossflowRegimeFromFroude(0.79), "just below 0.8").toBe("jet-dominated");
    expect(crossflowRegimeFromFroude(0.8), "at 0.8").toBe("bent-over");
    expect(crossflowRegimeFromFroude(1.99), "just below 2").toBe("bent-over");
    expect(crossflowRegimeFromFroude(2), "at 2").toBe("crossflow-dominated");
  });

  it("says plainly, with numbers, when the current is too strong for stagnant-water laws", () => {
    expect(crossflowFroudeValidityIssues(0.5), "jet-dominated: no warning").toEqual([]);
    const [w] = crossflowFroudeValidityIssues(1.25, "across the jet (90° from the jet azimuth)");
    expect(w.severity, "bent-over jets invalidate the stagnant geometry").toBe("serious");
    expect(w.message, "quotes F_c").toMatch(/F_c = U_r·F = 1\.25/);
    expect(w.message, "quotes the threshold").toMatch(/0\.8/);
    expect(w.message, "quotes l_m/l_M = 0.94139/1.25").toMatch(/0\.75 l_M/);
    expect(w.source, "names the paper").toMatch(/Lai & Lee \(2013\)/);
    expect(crossflowFroudeValidityIssues(3)[0].code, "F_c ≥ 2").toBe("current-dominates-jet");
  });

  it("flags weak currents, U_r·F < 1, where Abessi & Roberts (2016) saw lower dilution", () => {
    expect(weakCurrentValidityIssues(0), "no current").toEqual([]);
    expect(weakCurrentValidityIssues(0.4)[0].message, "quotes U_r·F").toMatch(/0\.40 < 1/);
    expect(weakCurrentValidityIssues(1), "at 1 the finding no longer applies").toEqual([]);
  });
});
