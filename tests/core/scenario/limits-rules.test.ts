/**
 * Mixing-zone limits: numbers or strings with units, converted to the constituent's unit and put through
 * the same finite, sign and range checks however they were written. Unit facts: practical salinity to
 * Absolute Salinity by the reference-composition factor 35.16504/35 (IOC, SCOR & IAPSO 2010, TEOS-10
 * manual, eq. 2.4.1); a temperature difference of 1 °F is 5/9 K and 32 °F is 0 °C (definition of the
 * Fahrenheit scale, NIST SP 811, 2008, appendix B.9); 1 g/L = 1000 mg/L (SI prefixes, BIPM 2019 SI
 * Brochure). The temperature range -2 to 60 °C for water and up to 100 °C for a limit is the scenario's
 * own convention (common practice, no source), as is the 1e9 size cap.
 */
import { describe, it, expect } from "vitest";
import type { LimitInput } from "../../../core/scenario/types";
import { accepted, edited, refusedMessages, type Raw } from "./rule-fixtures";

const SR_FACTOR = 35.16504 / 35;

function withLimit(limit: Raw, constituents?: Raw[]): Raw {
  return edited((r) => {
    r.mixingZone.limits = [limit];
    if (constituents) r.discharge.constituents = constituents;
  });
}

const antiscalant = [{ name: "Antiscalant", concentration: 5, unit: "mg/L" }];

function limitOf(limit: Raw, constituents?: Raw[]): LimitInput {
  return accepted(withLimit(limit, constituents)).mixingZone.limits[0]!;
}

function refusal(limit: Raw, constituents?: Raw[]): string {
  const m = refusedMessages(withLimit(limit, constituents));
  expect(m).toHaveLength(1);
  return m[0]!;
}

describe("salinity limits written with a unit", () => {
  it("converts psu and pss (any case) by the TEOS-10 reference-composition factor, without a note", () => {
    expect(limitOf({ constituent: "salinity", maxIncrease: "2 psu" }).maxIncrease).toBeCloseTo(2 * SR_FACTOR, 12);
    expect(limitOf({ constituent: "salinity", maxIncrease: "2 PSS" }).maxIncrease).toBeCloseTo(2 * SR_FACTOR, 12);
    const s = accepted(withLimit({ constituent: "Salinity", maxConcentration: "38 psu" }));
    expect(s.mixingZone.limits[0]).toEqual({ constituent: "salinity", unit: "g/kg", maxConcentration: 38 * SR_FACTOR });
    expect(s.conversions.some((c) => c.startsWith("mixingZone"))).toBe(false);
  });

  it("takes g/kg, ppt and ‰ as they are (parts per thousand by mass)", () => {
    expect(limitOf({ constituent: "salinity", maxIncrease: "2 g/kg" }).maxIncrease).toBe(2);
    expect(limitOf({ constituent: "salinity", maxIncrease: "2.5 ppt" }).maxIncrease).toBe(2.5);
    expect(limitOf({ constituent: "salinity", maxIncrease: "2.5 ‰" }).maxIncrease).toBe(2.5);
    expect(limitOf({ constituent: "salinity", maxIncrease: "3" }).maxIncrease).toBe(3);
    expect(limitOf({ constituent: "salinity", maxIncrease: ".5" }).maxIncrease).toBe(0.5);
    expect(limitOf({ constituent: "salinity", maxIncrease: " 2e0 g/kg " }).maxIncrease).toBe(2);
    const s = accepted(withLimit({ constituent: "salinity", maxIncrease: "2.5 ppt" }));
    expect(s.conversions.some((c) => c.startsWith("mixingZone"))).toBe(false);
  });

  it("refuses salinity units with anything before or after the unit word, or a temperature unit", () => {
    for (const v of ["2 psux", "2 xpsu", "2 pptx", "2 xppt", "2 degF"])
      expect(refusal({ constituent: "salinity", maxIncrease: v })).toBe(
        `mixingZone.limits.0.maxIncrease: ${JSON.stringify(v)} has a unit that cannot be converted to the constituent's unit (g/kg)`,
      );
  });

  it("refuses number-like text that is not a decimal number", () => {
    for (const v of ["0x1E", "0b101", "-0o7", " +0X1f"])
      expect(refusal({ constituent: "salinity", maxIncrease: v })).toBe(
        `mixingZone.limits.0.maxIncrease: ${JSON.stringify(v)} must be a decimal number with an optional unit (in g/kg); hex, octal and binary forms are not accepted`,
      );
    expect(refusal({ constituent: "salinity", maxIncrease: "two" })).toBe(
      'mixingZone.limits.0.maxIncrease: "two" must be a number with an optional unit (in g/kg)',
    );
  });
});

describe("the number in a limit string", () => {
  it("reads signs, decimals and exponents in either case", () => {
    const read = (v: string) => limitOf({ constituent: "salinity", maxIncrease: v }).maxIncrease;
    expect(read("+2")).toBe(2);
    expect(read("2.")).toBe(2);
    expect(read("1E1")).toBe(10);
    expect(read("2e-1 g/kg")).toBe(0.2);
    expect(read("2e+1g/kg")).toBe(20);
    expect(read("\t0.25\tg/kg")).toBe(0.25);
    expect(read("12.5 g/kg")).toBe(12.5);
    expect(read(".25")).toBe(0.25);
    expect(read("2psu")).toBeCloseTo(2 * SR_FACTOR, 12);
  });

  it("refuses text before the number and a second line after the unit", () => {
    for (const v of ["x2 g/kg", "2 g/kg\nx"])
      expect(refusal({ constituent: "salinity", maxIncrease: v })).toBe(
        `mixingZone.limits.0.maxIncrease: ${JSON.stringify(v)} must be a number with an optional unit (in g/kg)`,
      );
  });

  it("adds no conversion note when the value is already in the constituent's unit", () => {
    const inUnit = accepted(withLimit({ constituent: "salinity", maxIncrease: "2 g/kg ", background: "36 ppt " }));
    expect(inUnit.mixingZone.limits[0]).toMatchObject({ maxIncrease: 2, background: 36 });
    expect(inUnit.conversions.some((c) => c.startsWith("mixingZone"))).toBe(false);
    const listed = accepted(withLimit({ constituent: "Antiscalant", maxConcentration: "3 mg/L" }, antiscalant));
    expect(listed.mixingZone.limits[0]!.maxConcentration).toBe(3);
    expect(listed.conversions.some((c) => c.startsWith("mixingZone"))).toBe(false);
  });

  it("checks the size of a negative value before its sign", () => {
    expect(refusal({ constituent: "salinity", maxIncrease: 2, background: -2e9 })).toBe(
      "mixingZone.limits.0.background: -2000000000 must be a finite number (in g/kg) of at most 1e9 in size",
    );
  });
});

describe("temperature limits", () => {
  it("reads an increase in °F as a difference (×5/9) and in K or °C as it is", () => {
    for (const v of ["9 degF", "9 °F", "9 F", "9 degf"])
      expect(limitOf({ constituent: "temperature", maxIncrease: v }).maxIncrease, v).toBeCloseTo(5, 12);
    for (const v of ["1.5 K", "1.5 °C", "1.5 C", "1.5 degC", "1.5 k"])
      expect(limitOf({ constituent: "temperature", maxIncrease: v }).maxIncrease, v).toBe(1.5);
  });

  it("refuses temperature-increase units with extra letters", () => {
    for (const v of ["9 xdegF", "9 degFx", "1.5 xK", "1.5 Kx"])
      expect(refusal({ constituent: "temperature", maxIncrease: v })).toMatch(
        /^mixingZone\.limits\.0\.maxIncrease: ".*" has a unit that cannot be converted to the constituent's unit \(degC\)$/,
      );
  });

  it("reads an allowed temperature in °F as a temperature (32 °F = 0 °C) and notes the conversion", () => {
    const s = accepted(withLimit({ constituent: "temperature", maxConcentration: "50 degF" }));
    expect(s.mixingZone.limits[0]!.maxConcentration).toBeCloseTo(10, 12);
    expect(s.mixingZone.limits[0]!.unit).toBe("degC");
    expect(s.conversions).toContain("mixingZone.limits.0.maxConcentration: 50 degF → 10 degC");
  });

  it("accepts an allowed temperature from -2 to 100 °C, both ends included, and refuses just outside", () => {
    for (const v of [-2, 0, 1.9, 35, 100])
      expect(limitOf({ constituent: "temperature", maxConcentration: v }).maxConcentration).toBe(v);
    for (const v of [-2.001, 100.001])
      expect(refusal({ constituent: "temperature", maxConcentration: v })).toBe(
        `mixingZone.limits.0.maxConcentration: ${v} must be a temperature from -2 to 100 °C`,
      );
  });

  it("accepts a background temperature from -2 to 60 °C, both ends included, and refuses just outside", () => {
    for (const v of [-2, 0, 60])
      expect(limitOf({ constituent: "temperature", maxIncrease: 1, background: v }).background).toBe(v);
    for (const v of [-2.001, 60.001, 100])
      expect(refusal({ constituent: "temperature", maxIncrease: 1, background: v })).toBe(
        `mixingZone.limits.0.background: ${v} must be a temperature from -2 to 60 °C`,
      );
  });
});

describe("limit signs, sizes and the limit's shape", () => {
  it("refuses a zero or negative increase with the unit, and a negative background", () => {
    expect(refusal({ constituent: "salinity", maxIncrease: 0 })).toBe(
      "mixingZone.limits.0.maxIncrease: 0 must be a positive increase (a zero increase can never be met)",
    );
    expect(refusal({ constituent: "temperature", maxIncrease: -1 })).toBe(
      "mixingZone.limits.0.maxIncrease: -1 must be a positive increase (in degC)",
    );
    expect(refusal({ constituent: "salinity", maxIncrease: 2, background: -0.1 })).toBe(
      "mixingZone.limits.0.background: -0.1 must not be negative (a background concentration, in g/kg)",
    );
    expect(limitOf({ constituent: "salinity", maxIncrease: 2, background: 0 }).background).toBe(0);
  });

  it("refuses an absolute limit of zero or less and accepts a small positive one", () => {
    expect(refusal({ constituent: "salinity", maxConcentration: 0 })).toBe(
      "mixingZone.limits.0.maxConcentration: 0 must be a positive concentration (in g/kg); a limit of zero or less can never be met",
    );
    expect(limitOf({ constituent: "salinity", maxConcentration: 1e-6 }).maxConcentration).toBe(1e-6);
  });

  it("accepts values up to 1e9 in size and refuses larger ones", () => {
    expect(limitOf({ constituent: "Antiscalant", maxConcentration: 1e9 }, antiscalant).maxConcentration).toBe(1e9);
    expect(refusal({ constituent: "Antiscalant", maxConcentration: 1.000001e9 }, antiscalant)).toBe(
      "mixingZone.limits.0.maxConcentration: 1000001000 must be a finite number (in mg/L) of at most 1e9 in size",
    );
  });

  it("converts a listed constituent's limit to its unit, matching its name in any case, and notes it", () => {
    const s = accepted(withLimit({ constituent: "ANTISCALANT", maxConcentration: "0.5 g/L" }, antiscalant));
    expect(s.mixingZone.limits[0]).toEqual({ constituent: "Antiscalant", unit: "mg/L", maxConcentration: 500 });
    expect(s.conversions).toContain("mixingZone.limits.0.maxConcentration: 0.5 g/L → 500 mg/L");
    // A conversion that overflows is refused as unconvertible, not read as an infinite limit.
    expect(refusal({ constituent: "Antiscalant", maxConcentration: "1e308 g/L" }, antiscalant)).toBe(
      `mixingZone.limits.0.maxConcentration: "1e308 g/L" has a unit that cannot be converted to the constituent's unit (mg/L)`,
    );
    expect(refusal({ constituent: "Antiscalant", maxConcentration: "2 kg" }, antiscalant)).toBe(
      `mixingZone.limits.0.maxConcentration: "2 kg" has a unit that cannot be converted to the constituent's unit (mg/L)`,
    );
  });

  it("refuses a constituent that is not salinity, temperature or listed, naming the constituent field", () => {
    expect(refusal({ constituent: "boron", maxConcentration: 1 }, antiscalant)).toBe(
      'mixingZone.limits.0.constituent: "boron" must be "salinity", "temperature" or a name listed under discharge.constituents',
    );
  });

  it("wants exactly one of maxIncrease and maxConcentration", () => {
    const msg = 'mixingZone.limits.0: "salinity" must give exactly one of maxIncrease or maxConcentration';
    expect(refusal({ constituent: "salinity", maxIncrease: 2, maxConcentration: 40 })).toBe(msg);
    expect(refusal({ constituent: "salinity", background: 36 })).toBe(msg);
  });

  it("keeps the basis and the background, and adds no background when none is given", () => {
    expect(limitOf({ constituent: "salinity", maxIncrease: 2, background: "36 g/kg", basis: "permit" })).toEqual({
      constituent: "salinity",
      unit: "g/kg",
      maxIncrease: 2,
      background: 36,
      basis: "permit",
    });
    expect(Object.keys(limitOf({ constituent: "salinity", maxIncrease: 2 }))).toEqual([
      "constituent",
      "unit",
      "maxIncrease",
    ]);
  });
});
