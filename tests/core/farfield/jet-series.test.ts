/**
 * Near-field dilution along plan distance from one method's result: which points enter the profile and
 * where the near field is taken to end. Piecewise-linear interpolation through the published points is
 * engineering judgement (common practice, no source); the numbers below are the geometry of the inputs.
 */
import { describe, expect, it } from "vitest";
import {
  dilutionFromProfile,
  jetProfileFromNearField,
  nearFieldEndFromResult,
} from "../../../core/farfield/jet-series";
import type { NearFieldMethodResult, PathPoint } from "../../../core/nearfield/types";
import { DF, F, lengthScaleFixture } from "./fixtures";

const point = (x: number, y: number, dilution: number): PathPoint => ({
  s: Math.hypot(x, y),
  x,
  y,
  z: 0,
  halfWidth: 0.1,
  dilution,
});

const withPath = (path: PathPoint[], over: Partial<NearFieldMethodResult> = {}): NearFieldMethodResult => ({
  ...lengthScaleFixture(),
  method: "integral",
  nearFieldDistance: null,
  nearFieldDilution: null,
  ...over,
  path,
});

describe("jetProfileFromNearField() — with an integral path", () => {
  it("uses plan distance √(x² + y²) of every point that moves outward with no loss of dilution", () => {
    const p = jetProfileFromNearField(withPath([point(0, 0, 1), point(3, 4, 10), point(6, 8, 10), point(9, 12, 30)]));
    expect(p.basis, "path basis").toBe("path");
    expect(p.distance, "0, 5, 10, 15 m").toEqual([0, 5, 10, 15]);
    expect(p.dilution, "equal dilution is kept").toEqual([1, 10, 10, 30]);
  });

  it("drops points that do not move outward or whose dilution falls", () => {
    const p = jetProfileFromNearField(
      withPath([point(0, 0, 1), point(5, 0, 10), point(5, 0, 12), point(4, 0, 15), point(8, 0, 9), point(9, 0, 20)]),
    );
    expect(p.distance, "kept distances").toEqual([0, 5, 9]);
    expect(p.dilution, "kept dilutions").toEqual([1, 10, 20]);
  });

  it("takes a two-point path as a path", () => {
    const p = jetProfileFromNearField(withPath([point(0, 0, 1), point(10, 0, 20)]));
    expect(p.basis, "two points are a path").toBe("path");
    expect(p.distance, "distances").toEqual([0, 10]);
  });

  it("appends the near-field end beyond the path only if it lies further out with no less dilution", () => {
    const path = [point(0, 0, 1), point(10, 0, 20)];
    const beyond = jetProfileFromNearField(withPath(path, { nearFieldDistance: 30, nearFieldDilution: 20 }));
    expect(beyond.distance, "end appended").toEqual([0, 10, 30]);
    expect(beyond.dilution, "end appended").toEqual([1, 20, 20]);
    const same = jetProfileFromNearField(withPath(path, { nearFieldDistance: 10, nearFieldDilution: 40 }));
    expect(same.distance, "not beyond the last point").toEqual([0, 10]);
    const lower = jetProfileFromNearField(withPath(path, { nearFieldDistance: 30, nearFieldDilution: 19 }));
    expect(lower.distance, "lower dilution").toEqual([0, 10]);
    const noDilution = jetProfileFromNearField(withPath(path, { nearFieldDistance: 30, nearFieldDilution: null }));
    expect(noDilution.distance, "no dilution given").toEqual([0, 10]);
    const noDistance = jetProfileFromNearField(withPath(path, { nearFieldDistance: null, nearFieldDilution: 40 }));
    expect(noDistance.distance, "no distance given").toEqual([0, 10]);
  });
});

describe("jetProfileFromNearField() — length-scale points", () => {
  it("runs through (0, 1), impact and near-field end of Roberts, Ferrier & Daviero (1997) (from memory)", () => {
    const p = jetProfileFromNearField(lengthScaleFixture());
    expect(p.basis, "no path").toBe("length-scale points");
    expect(p.distance, "0, x_i = 2.4 dF, x_n = 9 dF").toEqual([0, 2.4 * DF, 9 * DF]);
    expect(p.dilution, "1, S_i = 1.6 F, S_n = 2.6 F").toEqual([1, 1.6 * F, 2.6 * F]);
  });

  it("puts the maximum-rise point first when given, and treats a one-point path as no path", () => {
    const p = jetProfileFromNearField({
      ...lengthScaleFixture(),
      maxRiseDistance: 4,
      maxRiseDilution: 10,
      path: [point(1, 0, 5)],
    });
    expect(p.basis, "one point is not a path").toBe("length-scale points");
    expect(p.distance, "max rise, impact, end").toEqual([0, 4, 2.4 * DF, 9 * DF]);
    expect(p.dilution, "max rise, impact, end").toEqual([1, 10, 1.6 * F, 2.6 * F]);
  });

  it("skips missing points and points that go back or lose dilution, keeps equal dilution", () => {
    const p = jetProfileFromNearField({
      ...lengthScaleFixture(),
      maxRiseDistance: 12,
      maxRiseDilution: 40,
      impactDistance: 10,
      impactDilution: 50,
      nearFieldDistance: 30,
      nearFieldDilution: 40,
    });
    expect(p.distance, "impact behind the max rise, end equal in dilution").toEqual([0, 12, 30]);
    expect(p.dilution, "impact behind the max rise, end equal in dilution").toEqual([1, 40, 40]);
    const missing = jetProfileFromNearField({
      ...lengthScaleFixture(),
      maxRiseDistance: 5,
      maxRiseDilution: null,
      impactDistance: null,
      nearFieldDilution: 60,
      nearFieldDistance: 30,
    });
    expect(missing.distance, "only the end").toEqual([0, 30]);
    const lower = jetProfileFromNearField({ ...lengthScaleFixture(), nearFieldDilution: 1.5 * F });
    expect(lower.distance, "end with less dilution than impact is dropped").toEqual([0, 2.4 * DF]);
  });
});

describe("dilutionFromProfile()", () => {
  it("interpolates linearly and holds the end values outside", () => {
    const p = jetProfileFromNearField(lengthScaleFixture());
    expect(dilutionFromProfile(p, 1.2 * DF), "half way to impact").toBeCloseTo((1 + 1.6 * F) / 2, 12);
    expect(dilutionFromProfile(p, 100), "beyond the end").toBe(2.6 * F);
    expect(dilutionFromProfile(p, -1), "behind the port").toBe(1);
  });
});

describe("nearFieldEndFromResult() — near-field end, else impact, else return point", () => {
  it("prefers the near-field end", () => {
    expect(nearFieldEndFromResult(lengthScaleFixture()), "x_n, S_n").toEqual({ distance: 9 * DF, dilution: 2.6 * F });
  });
  it("falls back to the impact point, then to the return point, with the impact dilution", () => {
    const noEnd = { ...lengthScaleFixture(), nearFieldDistance: null, nearFieldDilution: null };
    expect(nearFieldEndFromResult(noEnd), "impact").toEqual({ distance: 2.4 * DF, dilution: 1.6 * F });
    const noImpact = { ...noEnd, impactDistance: null, returnDistance: 11 };
    expect(nearFieldEndFromResult(noImpact), "return point").toEqual({ distance: 11, dilution: 1.6 * F });
    const mixed = { ...lengthScaleFixture(), nearFieldDilution: null };
    expect(nearFieldEndFromResult(mixed), "end distance, impact dilution").toEqual({
      distance: 9 * DF,
      dilution: 1.6 * F,
    });
  });
  it("gives no end without a distance or without a dilution", () => {
    const base = { ...lengthScaleFixture(), nearFieldDistance: null, nearFieldDilution: null };
    expect(nearFieldEndFromResult({ ...base, impactDistance: null, returnDistance: null }), "no distance").toBeNull();
    expect(nearFieldEndFromResult({ ...base, impactDilution: null }), "no dilution").toBeNull();
  });
});
