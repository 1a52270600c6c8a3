/** Reading a receiving-water profile pasted from a spreadsheet or loaded from CSV (d3-dsv). */
import { describe, expect, it } from "vitest";
import { parseProfileText } from "../../../renderer/inputs/profile-text";

describe("parseProfileText()", () => {
  it("reads tab-separated rows pasted from a spreadsheet, with a header giving units", () => {
    const text = "Depth (ft)\tTemperature [degF]\tSalinity\n0\t75\t36.1\n30\t68\t36.4\n";
    const parsed = parseProfileText(text);
    expect(parsed.errors, "no errors").toEqual([]);
    expect(parsed.rows, "columns found by name, units attached").toEqual([
      { depth: "0 ft", salinity: 36.1, temperature: "75 degF" },
      { depth: "30 ft", salinity: 36.4, temperature: "68 degF" },
    ]);
  });
  it("reads headerless CSV as depth, salinity, temperature in SI", () => {
    const parsed = parseProfileText("0,38,24\r\n10,38.5,21\r\n20,39,19");
    expect(parsed.errors, "no errors").toEqual([]);
    expect(parsed.rows[2], "third row").toEqual({ depth: 20, salinity: 39, temperature: 19 });
  });
  it("accepts semicolon-separated rows with decimal commas", () => {
    const parsed = parseProfileText("depth;salinity;temperature\n0;38,2;24,5\n12;38,6;20");
    expect(parsed.errors, "no errors").toEqual([]);
    expect(parsed.rows[0], "decimal comma read").toEqual({ depth: 0, salinity: 38.2, temperature: 24.5 });
  });
  it("names what is wrong: a missing column, a short row, a non-number", () => {
    expect(parseProfileText("depth,salinity\n0,38").errors[0], "missing temperature column").toMatch(
      /no "temperature" column/,
    );
    expect(parseProfileText("0,38,20\n10,38").errors, "short row").toContain("row 2 has 2 columns, expected 3");
    expect(parseProfileText("0,38,20\n10,x,19").errors, "not a number").toContain(
      'row 2: salinity "x" is not a number',
    );
  });
  it("needs at least two rows", () => {
    expect(parseProfileText("0,38,20").errors, "one row").toContain("a profile needs at least two rows");
    expect(parseProfileText("   ").errors, "nothing").toEqual(["no rows found"]);
  });
});
