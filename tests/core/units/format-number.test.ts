/**
 * formatNumber(): the compact engineering number of messages and verdict texts — four significant figures
 * by default, no trailing zeros after the decimal point, no bare point, an exponent only outside
 * 1e-3…1e7 (common practice, no source; expected strings written out by hand).
 */
import { describe, expect, it } from "vitest";
import { formatNumber } from "../../../core/units";

describe("formatNumber()", () => {
  const cases: [number, number | undefined, string][] = [
    [2, undefined, "2"],
    [2.5, undefined, "2.5"],
    [36.1234, undefined, "36.12"],
    [36.1, undefined, "36.1"],
    [100, undefined, "100"],
    [1200, undefined, "1200"],
    [12345.6, undefined, "12346"],
    [0.0012, undefined, "0.0012"],
    [0.001, undefined, "0.001"],
    [-3.5, undefined, "-3.5"],
    [-0.25, undefined, "-0.25"],
    [1.0004, undefined, "1"],
    [9.99999, undefined, "10"],
    [0.5, 3, "0.5"],
    [2.345, 3, "2.35"],
    [0, undefined, "0"],
    [1e-4, undefined, "1.000e-4"],
    [2.5e7, undefined, "2.500e+7"],
    [Number.POSITIVE_INFINITY, undefined, "Infinity"],
    [Number.NaN, undefined, "NaN"],
  ];
  it.each(cases)("formats %d (%s significant) as %s", (value, significant, expected) => {
    expect(formatNumber(value, significant)).toBe(expected);
  });
});
