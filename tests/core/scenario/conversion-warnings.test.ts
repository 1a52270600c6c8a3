/**
 * Range warnings of the salinity conversions, collected while reading a file: Practical Salinity outside
 * 2–42, the range of the Practical Salinity Scale 1978 (UNESCO 1981, Technical Papers in Marine Science
 * 36; range quoted from memory), and TDS above 131 000 mg/L, past the 0–120 g/kg range of the brine
 * density used to convert it (Nayar, Sharqawy, Banchik & Lienhard 2016, Desalination 390:1–24). One
 * warning per code and field, the value farthest outside the range kept; the hash ignores them.
 */
import { describe, it, expect } from "vitest";
import { addConversionWarnings, type NormaliseContext } from "../../../core/scenario/issue";
import { inputsHash } from "../../../core/scenario/hash";
import type { ResultWarning } from "../../../core/warnings";
import { accepted, baseRaw, edited, type Raw } from "./rule-fixtures";

const withRecordSalinity = (salinity: unknown[]) =>
  edited(
    (r: Raw) =>
      (r.ambient.record = {
        time: salinity.map((_, i) => i * 600),
        currentSpeed: salinity.map(() => 0.1),
        currentDirection: salinity.map(() => 90),
        salinity,
      }),
  );

describe("conversion warnings of a read scenario", () => {
  it("are absent when no conversion leaves its range", () => {
    expect("conversionWarnings" in accepted(baseRaw())).toBe(false);
    expect("conversionWarnings" in accepted(edited((r) => (r.ambient.salinity = "35 psu")))).toBe(false);
    expect("conversionWarnings" in accepted(edited((r) => (r.ambient.salinity = "42 psu")))).toBe(false);
    expect("conversionWarnings" in accepted(edited((r) => (r.ambient.salinity = "2 psu")))).toBe(false);
  });

  it("name the field of a practical salinity outside 2–42", () => {
    const s = accepted(
      edited((r) => {
        r.ambient.salinity = "1.5 psu";
        r.discharge.salinity = "70 psu";
      }),
    );
    expect(s.conversionWarnings!.map((w) => [w.code, w.parameter, w.value, w.range])).toEqual([
      ["practical-salinity-out-of-range", "discharge.salinity", 70, [2, 42]],
      ["practical-salinity-out-of-range", "ambient.salinity", 1.5, [2, 42]],
    ]);
    expect(s.conversionWarnings![1]!.message).toBe(
      "ambient.salinity: Practical Salinity 1.5 is outside 2–42, the range of PSS-78; brines are better given as g/kg.",
    );
  });

  it("name the field of a TDS past the density's range", () => {
    const s = accepted(edited((r) => (r.discharge.salinity = "140000 mg/L")));
    expect(s.conversionWarnings!.map((w) => [w.code, w.parameter, w.value])).toEqual([
      ["tds-out-of-range", "discharge.salinity", 140000],
    ]);
    expect("conversionWarnings" in accepted(edited((r) => (r.discharge.salinity = "131000 mg/L")))).toBe(false);
  });

  it("keep one warning for a record column, the value farthest outside the range, above or below it", () => {
    const above = accepted(withRecordSalinity(["45 psu", "60 psu", "50 psu", 36]));
    expect(above.conversionWarnings!.map((w) => [w.parameter, w.value])).toEqual([["ambient.record.salinity", 60]]);
    const below = accepted(withRecordSalinity(["1 psu", "0.5 psu", "1.5 psu"]));
    expect(below.conversionWarnings!.map((w) => [w.parameter, w.value])).toEqual([["ambient.record.salinity", 0.5]]);
  });

  it("do not change the inputs hash", () => {
    const s = accepted(edited((r) => (r.discharge.salinity = "70 psu")));
    const { conversionWarnings: _w, ...without } = s;
    expect(inputsHash(without)).toBe(inputsHash(s));
  });
});

describe("addConversionWarnings", () => {
  const w = (value: number | undefined, range?: [number, number]): ResultWarning => ({
    code: "c",
    severity: "info",
    message: `value ${value}`,
    ...(value !== undefined ? { value } : {}),
    ...(range ? { range } : {}),
  });

  it("does nothing for a context that collects no warnings", () => {
    const ctx: NormaliseContext = { issues: [], conversions: [] };
    addConversionWarnings(ctx, "p", [w(50, [2, 42])]);
    expect(ctx).toEqual({ issues: [], conversions: [] });
  });

  it("names the field in the parameter and the message, one per code and field", () => {
    const ctx: NormaliseContext = { issues: [], conversions: [], warnings: [] };
    addConversionWarnings(ctx, "p", [w(undefined)]);
    addConversionWarnings(ctx, "q", [w(1, [2, 42])]);
    expect(ctx.warnings).toEqual([
      { code: "c", severity: "info", message: "p: value undefined", parameter: "p" },
      { code: "c", severity: "info", message: "q: value 1", parameter: "q", value: 1, range: [2, 42] },
    ]);
    // Farther outside replaces; a warning with no value or no range counts as 0 outside.
    addConversionWarnings(ctx, "p", [w(43, [2, 42])]);
    expect(ctx.warnings![0]!.value).toBe(43);
    addConversionWarnings(ctx, "p", [w(99)]);
    expect(ctx.warnings![0]!.value).toBe(43);
    addConversionWarnings(ctx, "q", [w(1.5, [2, 42])]);
    expect(ctx.warnings![1]!.value).toBe(1);
    addConversionWarnings(ctx, "q", [w(0, [2, 42])]);
    expect(ctx.warnings![1]!.value).toBe(0);
    expect(ctx.warnings).toHaveLength(2);
  });

  it("keeps warnings of different codes on one field apart, and the first of two equally far outside", () => {
    const ctx: NormaliseContext = { issues: [], conversions: [], warnings: [] };
    addConversionWarnings(ctx, "p", [w(43, [2, 42])]);
    addConversionWarnings(ctx, "p", [{ ...w(50, [2, 42]), code: "d" }]);
    expect(ctx.warnings!.map((x) => [x.code, x.value])).toEqual([
      ["c", 43],
      ["d", 50],
    ]);
    addConversionWarnings(ctx, "p", [w(1, [2, 42])]);
    expect(ctx.warnings!.map((x) => [x.code, x.value])).toEqual([
      ["c", 43],
      ["d", 50],
    ]);
  });
});
