import { describe, it, expect } from "vitest";
import { withOverrides, withRawOverride, readPath, OverrideError } from "../../../core/study/overrides";
import { fourPortRaw, scenarioFrom } from "./fixtures";

describe("withOverrides()", () => {
  const base = scenarioFrom(fourPortRaw());

  it("gives the same scenario as re-reading the file with the same change (uniform ambient)", () => {
    const raw = fourPortRaw();
    (raw.ambient as Record<string, unknown>).salinity = 37.5;
    (raw.ambient as Record<string, unknown>).depth = 20;
    (raw.diffuser as Record<string, unknown>).portCount = 6;
    const reread = scenarioFrom(raw);
    const patched = withOverrides(base, {
      "ambient.salinity": 37.5,
      "ambient.depth": 20,
      "diffuser.portCount": 6,
    });
    expect(patched.ambient, "ambient and its two-point profile follow the overrides").toEqual(reread.ambient);
    expect(patched.diffuser.flowSplit, "equal split over the new port count").toEqual(reread.diffuser.flowSplit);
    expect(patched.diffuser.length, "length follows port count × spacing").toBeCloseTo(reread.diffuser.length, 12);
  });

  it("keeps nominal and effective diameters consistent through the contraction coefficient", () => {
    const raw = fourPortRaw();
    (raw.diffuser as Record<string, unknown>).contraction = 0.81;
    const s = scenarioFrom(raw);
    const p = withOverrides(s, { "diffuser.portDiameter": 0.2 });
    expect(p.diffuser.portDiameterNominal, "the override is the diameter as entered").toBe(0.2);
    expect(p.diffuser.portDiameter, "effective diameter = nominal × √0.81").toBeCloseTo(0.18, 12);
    expect(readPath(p, "diffuser.portDiameter"), "readPath returns the diameter as entered").toBe(0.2);
  });

  it("moves spacing and length together and switches layout with the port count", () => {
    const byLength = withOverrides(base, { "diffuser.length": 30 });
    expect(byLength.diffuser.portSpacing, "4 ports over 30 m are 10 m apart").toBe(10);
    const single = withOverrides(base, { "diffuser.portCount": 1, "diffuser.length": 0 });
    expect(single.diffuser.layout, "one port is a single-port layout").toBe("single");
    expect(single.diffuser.flowSplit, "one port carries all the flow").toEqual([1]);
  });

  it("shifts a stratified profile as a whole so its seabed value is the override", () => {
    const raw = fourPortRaw();
    const amb = raw.ambient as Record<string, unknown>;
    delete amb.salinity;
    delete amb.temperature;
    amb.profile = [
      { depth: 0, salinity: 35, temperature: 24 },
      { depth: 15, salinity: 36, temperature: 18 },
    ];
    const s = scenarioFrom(raw);
    const p = withOverrides(s, { "ambient.salinity": 37, "ambient.temperature": 17 });
    expect(
      p.ambient.profile.map((q) => q.salinity),
      "salinity shifted by +1 g/kg at every depth",
    ).toEqual([36, 37]);
    expect(
      p.ambient.profile.map((q) => q.temperature),
      "temperature shifted by −1 °C at every depth",
    ).toEqual([23, 17]);
    const shallower = withOverrides(s, { "ambient.depth": 7.5 });
    expect(shallower.ambient.profile.at(-1), "profile cut at the new seabed, interpolated").toEqual({
      depth: 7.5,
      salinity: 35.5,
      temperature: 21,
    });
  });

  it("applies an ambient override to the stated ambient and every case that does not set the field, leaving the input untouched", () => {
    const raw = fourPortRaw();
    raw.ambientCases = [
      { name: "spring", currentSpeed: 0.3 },
      { name: "neap", currentSpeed: 0.05 },
      { name: "deep", depth: 30 },
    ];
    const s = scenarioFrom(raw);
    const p = withOverrides(s, { "ambient.currentSpeed": 0.2, "ambient.depth": 12 });
    expect(p.ambient.currentSpeed, "the stated conditions take the override").toBe(0.2);
    expect(
      p.ambientCases.map((c) => c.currentSpeed),
      "cases that set their current keep it; the others follow",
    ).toEqual([0.3, 0.05, 0.2]);
    expect(
      p.ambientCases.map((c) => c.depth),
      "only the case that sets its depth keeps it",
    ).toEqual([12, 12, 30]);
    expect(
      s.ambientCases.map((c) => c.currentSpeed),
      "the original is unchanged",
    ).toEqual([0.3, 0.05, s.ambient.currentSpeed]);
    expect(Object.isFrozen(p.diffuser), "the result is frozen like a parsed scenario").toBe(true);
  });

  it("drops the plant block when the discharge is overridden (its mass balance no longer applies)", () => {
    const raw = fourPortRaw();
    delete raw.discharge;
    raw.plant = {
      productFlow: 0.2,
      recovery: 0.45,
      feedSalinity: 36,
      saltRejection: 0.996,
      feedTemperature: 22,
    };
    const s = scenarioFrom(raw);
    expect(s.plant, "the parsed scenario has a plant").toBeDefined();
    const p = withOverrides(s, { "discharge.salinity": 60 });
    expect(p.plant, "plant removed").toBeUndefined();
    expect(p.discharge.salinity, "discharge overridden").toBe(60);
    expect(p.discharge.flow, "other discharge fields kept from the plant balance").toBe(s.discharge.flow);
    expect(withOverrides(s, { "ambient.depth": 20 }).plant, "other overrides keep the plant").toBeDefined();
  });

  it("rejects unknown paths and out-of-range or fractional values, naming the path", () => {
    expect(() => withOverrides(base, { "ambient.colour": 1 }), "unknown path").toThrow(/ambient\.colour/);
    expect(
      () => withOverrides(base, { "diffuser.portCount": 2.5 }),
      "fractional count, in the file reader's words",
    ).toThrow("diffuser.portCount: 2.5 must be a whole number of ports from 1 to 1000");
    for (const key of ["constructor", "__proto__", "toString", "hasOwnProperty"]) {
      expect(() => withOverrides(base, { [key]: -100 }), `${key} is not a path`).toThrow(OverrideError);
      expect(() => withOverrides(base, { [key]: -100 }), `${key} is named`).toThrow(
        `${key}: is not a path that can be varied`,
      );
    }
    expect(() => withOverrides(base, { "ambient.currentSpeed": -1 }), "negative current").toThrow(
      /ambient\.currentSpeed/,
    );
  });
});

describe("withRawOverride()", () => {
  it("sets nested and indexed paths on a deep copy", () => {
    const raw = fourPortRaw();
    raw.ambientCases = [{ name: "a" }];
    const deeper = withRawOverride(raw, "ambient.depth", "12 m");
    const p = withRawOverride(deeper, "ambientCases.0.currentSpeed", 0.4) as typeof raw;
    expect((p.ambient as Record<string, unknown>).depth, "unit string kept for the parser").toBe("12 m");
    expect((p.ambientCases as Record<string, unknown>[])[0]!.currentSpeed, "array index path").toBe(0.4);
    expect((raw.ambient as Record<string, unknown>).depth, "input unchanged").toBe(15);
  });

  it("refuses prototype paths", () => {
    expect(() => withRawOverride({}, "__proto__.polluted", 1), "prototype pollution").toThrow(OverrideError);
  });
});
