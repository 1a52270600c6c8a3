/**
 * The fast table of common units against mathjs, which stays the reference: every pair of listed units is
 * converted both ways and must agree (to 1e-12 relative), and pairs of different dimensions must be
 * refused by both. Anchors: the international foot, inch and yard (International Yard and Pound
 * Agreement, 1959), the knot of 1852 m/h and the litre and SI prefixes (BIPM SI Brochure, 9th ed., 2019),
 * kelvin/Celsius/Fahrenheit (NIST Special Publication 811, 2008, appendix B.8).
 */
import { describe, it, expect } from "vitest";
import { COMMON_UNIT_NAMES, convertCommonUnit } from "../../../core/units/common-units";
import { convertUnit, convertUnitWithMathjs, quantityToSI, siToDisplay, displayToSI } from "../../../core/units/units";

const VALUES = [1, 37.5, -4.25];

function mathjs(value: number, from: string, to: string): number | null {
  try {
    return convertUnitWithMathjs(value, from, to);
  } catch {
    return null;
  }
}

describe("common units without building mathjs", () => {
  it("agree with mathjs for every pair of listed units, and refuse the pairs mathjs refuses", () => {
    let compared = 0;
    for (const from of COMMON_UNIT_NAMES)
      for (const to of COMMON_UNIT_NAMES) {
        if (mathjs(1, from, to) === null) {
          expect(convertCommonUnit(1, from, to), `${from} → ${to}`).toBeNull();
          continue;
        }
        for (const v of VALUES) {
          const expected = mathjs(v, from, to)!;
          const got = convertCommonUnit(v, from, to);
          compared++;
          expect(typeof got, `${v} ${from} → ${to}`).toBe("number");
          expect(
            Math.abs((got as number) - expected),
            `${v} ${from} → ${to}: ${got} vs ${expected}`,
          ).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(expected)));
        }
      }
    expect(compared).toBeGreaterThan(1000);
  });

  it("hold the defined factors: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 knot = 1852/3600 m/s, 1 MGD = 3785.411784 m³/day", () => {
    expect(convertCommonUnit(1, "ft", "m")).toBe(0.3048);
    expect(convertCommonUnit(1, "in", "m")).toBe(0.0254);
    expect(convertCommonUnit(1, "knot", "m/s")).toBeCloseTo(1852 / 3600, 15);
    expect(convertCommonUnit(1, "MGD", "m^3/day")).toBeCloseTo(3785.411784, 9);
    expect(convertCommonUnit(212, "degF", "degC")).toBeCloseTo(100, 12);
    expect(convertCommonUnit(0, "degC", "K")).toBeCloseTo(273.15, 12);
  });

  it("leave units outside the list to mathjs: prefixes, products and unknown names", () => {
    expect(convertCommonUnit(1, "dm", "m")).toBeUndefined();
    expect(convertUnit(1, "dm", "m")).toBeCloseTo(0.1, 15);
    expect(quantityToSI("3 dm", "length")).toMatchObject({ ok: true, value: expect.closeTo(0.3, 15) });
    expect(quantityToSI("3 parsec", "length")).toMatchObject({ ok: false });
  });

  it("read a written quantity the same way as mathjs, with the same refusal for a unit of another kind", () => {
    expect(quantityToSI("8 in", "smallLength")).toMatchObject({ ok: true, value: expect.closeTo(0.2032, 15) });
    expect(quantityToSI("8in", "smallLength")).toMatchObject({ ok: true, value: expect.closeTo(0.2032, 15) });
    expect(quantityToSI("68 °F", "temperature")).toMatchObject({ ok: true, value: expect.closeTo(20, 12) });
    expect(quantityToSI("1.2e-1 m3/d", "flow")).toMatchObject({ ok: true, value: expect.closeTo(0.12 / 86400, 18) });
    const wrongKind = quantityToSI("8 in", "flow");
    expect(wrongKind).toMatchObject({ ok: false, message: "is not a flow (expected a unit convertible to m³/s)" });
  });

  it("display in US units and back through the same table", () => {
    expect(siToDisplay(1, "length", "us").value).toBeCloseTo(1 / 0.3048, 12);
    expect(displayToSI(10, "flow", "us")).toBeCloseTo((10 * 3785.411784) / 86400, 12);
    expect(siToDisplay(20, "temperature", "us").value).toBeCloseTo(68, 12);
  });
});
