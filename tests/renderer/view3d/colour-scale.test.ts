/**
 * The dilution colour scale: a computed ramp in OKLab. Checks against the published colour-space
 * definitions (IEC 61966-2-1 sRGB transfer function; Ottosson 2020 OKLab) and the properties a
 * perceptually uniform, greyscale-safe scale must have.
 */
import { describe, expect, it } from "vitest";
import {
  dilutionColour,
  dilutionDomain,
  dilutionTicks,
  dilutionToUnit,
  linearSrgbToOklab,
  oklabToLinearSrgb,
  rampColour,
  rampOklab,
  srgbDecode,
  srgbEncode,
} from "../../../renderer/view3d/colour-scale";

const deltaE = (a: readonly number[], b: readonly number[]) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);

/** WCAG 2 relative luminance of gamma-encoded sRGB (coefficients from ITU-R BT.709 primaries). */
const luminance = (rgb: readonly number[]) =>
  0.2126 * srgbDecode(rgb[0]) + 0.7152 * srgbDecode(rgb[1]) + 0.0722 * srgbDecode(rgb[2]);

describe("sRGB transfer function (IEC 61966-2-1:1999)", () => {
  it("meets at the published breakpoint: linear 0.0031308 encodes to 0.04045", () => {
    expect(srgbEncode(0.0031308), "breakpoint of the piecewise curve, IEC 61966-2-1").toBeCloseTo(0.04045, 4);
  });
  it("decodes mid-grey 0.5 to 0.21404 linear", () => {
    // ((0.5 + 0.055) / 1.055) ^ 2.4 = 0.214041 — the standard's formula evaluated by hand.
    expect(srgbDecode(0.5), "IEC 61966-2-1 decoding of 0.5").toBeCloseTo(0.214041, 5);
  });
  it("round-trips every 8-bit level", () => {
    for (let i = 0; i <= 255; i++) {
      const v = i / 255;
      expect(srgbEncode(srgbDecode(v)), `level ${i} survives decode → encode`).toBeCloseTo(v, 9);
    }
  });
});

describe("OKLab (Ottosson 2020)", () => {
  it("maps sRGB white to L = 1, a = b = 0", () => {
    // OKLab is defined so that D65 white has L = 1 and no chroma (Ottosson 2020, "A perceptual color space").
    const [L, a, b] = linearSrgbToOklab(1, 1, 1);
    expect(L, "lightness of white").toBeCloseTo(1, 4);
    expect(Math.abs(a), "a of white").toBeLessThan(1e-4);
    expect(Math.abs(b), "b of white").toBeLessThan(1e-4);
  });
  it("maps sRGB red to (0.62796, 0.22486, 0.12585)", () => {
    // Reference value from Ottosson's published table of sRGB primaries in OKLab (from memory).
    const [L, a, b] = linearSrgbToOklab(1, 0, 0);
    expect(L, "L of red").toBeCloseTo(0.62796, 3);
    expect(a, "a of red").toBeCloseTo(0.22486, 3);
    expect(b, "b of red").toBeCloseTo(0.12585, 3);
  });
  it("inverts its forward transform to the precision of the published matrices", () => {
    // The published forward and inverse matrices are each rounded to 10 digits from slightly different
    // derivations; inverting one numerically reproduces the other only to about 1e-4 (checked with numpy).
    for (const rgb of [
      [0.2, 0.4, 0.6],
      [0.9, 0.1, 0.3],
      [0.05, 0.05, 0.05],
    ] as const) {
      const [L, a, b] = linearSrgbToOklab(rgb[0], rgb[1], rgb[2]);
      const back = oklabToLinearSrgb(L, a, b);
      back.forEach((c, i) => expect(Math.abs(c - rgb[i]), `channel ${i} of ${rgb.join(",")}`).toBeLessThan(1e-4));
    }
  });
});

describe("rampColour()", () => {
  const steps = 64;
  const labs = Array.from({ length: steps + 1 }, (_, i) => rampOklab(i / steps));
  const rgbs = Array.from({ length: steps + 1 }, (_, i) => rampColour(i / steps));

  it("increases in lightness from end to end, so it reads correctly in greyscale", () => {
    for (let i = 1; i <= steps; i++) {
      expect(labs[i][0], `OKLab lightness at step ${i}`).toBeGreaterThan(labs[i - 1][0]);
      expect(luminance(rgbs[i]), `relative luminance at step ${i}`).toBeGreaterThan(luminance(rgbs[i - 1]));
    }
  });

  it("takes near-equal perceptual steps (largest step under 1.6 × the smallest)", () => {
    const d = labs.slice(1).map((lab, i) => deltaE(lab, labs[i]));
    expect(Math.max(...d) / Math.min(...d), "ratio of largest to smallest OKLab step").toBeLessThan(1.6);
  });

  it("stays inside the sRGB gamut (chroma is reduced rather than clipped)", () => {
    for (let i = 0; i <= steps; i++) {
      const linear = oklabToLinearSrgb(...labs[i]);
      linear.forEach((c, k) => {
        expect(c, `linear channel ${k} at step ${i}`).toBeGreaterThanOrEqual(-1e-5);
        expect(c, `linear channel ${k} at step ${i}`).toBeLessThanOrEqual(1 + 1e-5);
      });
    }
  });

  it("runs from a dark blue-violet to a light yellow", () => {
    const [r0, g0, b0] = rgbs[0];
    const [r1, g1, b1] = rgbs[steps];
    expect(b0, "low end is blue-dominant").toBeGreaterThan(Math.max(r0, g0));
    expect(Math.min(r1, g1), "high end is yellow (red and green above blue)").toBeGreaterThan(b1);
    expect(labs[0][0], "low end is dark").toBeLessThan(0.4);
    expect(labs[steps][0], "high end is light").toBeGreaterThan(0.85);
  });

  it("clamps positions outside [0, 1] to the ends", () => {
    expect(rampColour(-3), "below 0").toEqual(rampColour(0));
    expect(rampColour(7), "above 1").toEqual(rampColour(1));
  });
});

describe("dilution domain and ticks", () => {
  it("widens the data range to round 1-2-5 values and never starts below 1", () => {
    expect(dilutionDomain([1, 43.2, 113]), "1 to 113").toEqual({ low: 1, high: 200 });
    expect(dilutionDomain([3.4, 78]), "3.4 to 78").toEqual({ low: 2, high: 100 });
    expect(dilutionDomain([0.2, 7]).low, "dilutions below 1 are not physical; the scale starts at 1").toBe(1);
  });
  it("gives a flat field a decade of range instead of a zero-width scale", () => {
    const d = dilutionDomain([20, 20]);
    expect(d.high / d.low, "at least a factor of 10").toBeGreaterThanOrEqual(10);
  });
  it("maps dilution on a log axis", () => {
    const d = { low: 1, high: 100 };
    expect(dilutionToUnit(10, d), "10 is half-way between 1 and 100 on a log axis").toBeCloseTo(0.5, 12);
    expect(dilutionToUnit(0, d), "zero or negative maps to the low end").toBe(0);
    expect(dilutionToUnit(1e6, d), "clamped above").toBe(1);
  });
  it("colours higher dilution lighter", () => {
    const d = { low: 1, high: 200 };
    expect(luminance(dilutionColour(150, d)), "150× lighter than 5×").toBeGreaterThan(luminance(dilutionColour(5, d)));
  });
  it("ticks at 1, 2, 5 × 10ⁿ inside the domain", () => {
    expect(dilutionTicks({ low: 1, high: 200 }), "1–200").toEqual([1, 2, 5, 10, 20, 50, 100, 200]);
  });
});
