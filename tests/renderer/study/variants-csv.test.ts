/** The exported variant comparison: the caution first, then core's rows with SI units in the column names. */
import { describe, expect, it } from "vitest";
import { csvParseRows } from "d3-dsv";
import { CAUTION } from "../../../core/result/contract";
import type { FlatRow } from "../../../core/study/compare";
import { csvColumnName, variantsCsv } from "../../../renderer/study/variants-csv";

const rows: FlatRow[] = [
  {
    variant: "base",
    case: "worst case",
    edgeDilution: 40.5,
    integralMaxRise: 6.25,
    integralImpactDistance: 10.2,
    integralImpactDilution: 43.3,
    verdict: "pass",
  },
  {
    variant: "more ports",
    case: "worst case",
    edgeDilution: null,
    integralMaxRise: 5.5,
    integralImpactDistance: null,
    integralImpactDilution: 30,
    verdict: "error",
  },
];

describe("variantsCsv()", () => {
  it('opens with the caution, beginning "Caution", in its first cell, and names the study', () => {
    expect(csvParseRows(variantsCsv(rows))[0], "the caution row").toEqual([CAUTION]);
    const table = csvParseRows(variantsCsv(rows, undefined, "Cove options"));
    expect(table[0], "the caution row with the study").toEqual([CAUTION, "study: Cove options"]);
    expect(table[0][0].startsWith("Caution"), "begins with the word Caution").toBe(true);
  });
  it("names the unit of every number column, '-' for dilutions, as every Brinefield CSV does", () => {
    const header = csvParseRows(variantsCsv(rows))[1];
    expect(header, "header row").toEqual([
      "variant",
      "case",
      "edgeDilution (-)",
      "integralMaxRise (m)",
      "integralImpactDistance (m)",
      "integralImpactDilution (-)",
      "verdict",
    ]);
    expect(csvColumnName("lengthScaleMaxRise"), "any method's rise").toBe("lengthScaleMaxRise (m)");
  });
  it("writes the numbers as core gave them (metres) and empty cells for missing values", () => {
    const table = csvParseRows(variantsCsv(rows));
    expect(table[2], "first row").toEqual(["base", "worst case", "40.5", "6.25", "10.2", "43.3", "pass"]);
    expect(table[3][2], 'a missing edge dilution is an empty cell, not "null"').toBe("");
  });
});
