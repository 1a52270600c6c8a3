/** Chart series are core's arrays in display units; nothing is recomputed. */
import { describe, expect, it } from "vitest";
import {
  distanceSeries,
  riseMarkers,
  salinityIncreaseLimit,
  trajectorySeries,
} from "../../../renderer/charts/chart-data";
import { csvParseRows } from "d3-dsv";
import { CAUTION } from "../../../core/result/contract";
import { csvWithCaution, seriesCsv } from "../../../renderer/exports";
import { runFile } from "../../../renderer/engine/run-file";
import { blankScenario } from "../../../renderer/state/scenario-state";

const response = runFile(1, blankScenario());
if (!response.ok) throw new Error(response.message);
const { result, scenario } = response;
const path = result.nearField.find((m) => m.method === "integral")?.path ?? [];

describe("trajectorySeries()", () => {
  it("measures height from the seabed: port height plus the path's rise above the port", () => {
    const series = trajectorySeries(result, scenario, "si");
    expect(series.length, "one point per path point").toBe(path.length);
    expect(series[0].height, "starts at the port height").toBeCloseTo(scenario.diffuser.portHeight + path[0].z, 12);
    expect(series[3].upper - series[3].height, "band is the half-width above").toBeCloseTo(path[3].halfWidth, 12);
  });
  it("converts to feet in US units (1 ft = 0.3048 m exactly, NIST SP 811)", () => {
    const si = trajectorySeries(result, scenario, "si");
    const us = trajectorySeries(result, scenario, "us");
    expect(us[5].distance * 0.3048, "distance in feet").toBeCloseTo(si[5].distance, 9);
    expect(us[5].dilution, "dilution has no unit").toBe(si[5].dilution);
  });
});

describe("riseMarkers()", () => {
  it("marks each method's impact on the seabed", () => {
    const impacts = riseMarkers(result, scenario, "si").filter((m) => m.label === "impact");
    const expected = result.nearField.filter((m) => m.impactDistance !== null).length;
    expect(impacts.length, "an impact marker per method that gives one").toBe(expected);
    expect(
      impacts.every((m) => m.value === 0),
      "impact is on the bed",
    ).toBe(true);
  });
});

describe("distanceSeries() and seriesCsv()", () => {
  it("carries the mixing-zone series point for point", () => {
    const s = distanceSeries(result, "si");
    expect(s.length, "same length as core's series").toBe(
      result.mixingZone.series.distance.filter((_, i) => result.mixingZone.series.dilution[i] > 0).length,
    );
  });
  it("writes CSV with the same column keys as the CLI and the units in the header", () => {
    const csv = seriesCsv(result, "us");
    expect(csv.split("\n")[0], "header").toBe(
      "distance (ft),dilution (-),salinityIncrease (g/kg),layerThickness (ft),stage",
    );
    expect(csv.trim().split("\n").length, "a row per point").toBe(result.mixingZone.series.distance.length + 1);
  });
});

/** Runs the blank scenario with other mixing-zone limits. */
function resultWithLimits(limits: unknown[]) {
  const blank = blankScenario();
  const r = runFile(2, { ...blank, mixingZone: { ...(blank.mixingZone as object), limits } });
  if (!r.ok) throw new Error(r.message);
  return r.result;
}

describe("salinityIncreaseLimit()", () => {
  it("reads the allowed increase of a salinity limit", () => {
    expect(salinityIncreaseLimit(result), "blank scenario allows 2 g/kg").toBe(2);
  });
  it("is null when there is no salinity limit", () => {
    expect(
      salinityIncreaseLimit({ ...result, compliance: { ...result.compliance, constituents: [] } }),
      "no limit",
    ).toBeNull();
  });
  it("follows the stricter of two salinity limits, as the verdict does", () => {
    // Blank scenario: discharge 70 g/kg into 38 g/kg water. "at most 2 above background" and "at most 39"
    // together allow 1 g/kg, so the required dilution is (70 − 38)/1 = 32 (definition of dilution,
    // S = ΔC_d/ΔC, core/compliance/required-dilution.ts).
    const both = resultWithLimits([
      { constituent: "salinity", maxIncrease: 2, unit: "g/kg" },
      { constituent: "salinity", maxConcentration: 39, unit: "g/kg" },
    ]);
    expect(both.compliance.requiredDilution, "core requires the stricter limit's dilution").toBeCloseTo(32, 9);
    expect(salinityIncreaseLimit(both), "the line sits at the stricter 1 g/kg").toBeCloseTo(1, 9);
  });
  it("places an absolute limit without a stated background against the ambient salinity", () => {
    const absolute = resultWithLimits([{ constituent: "salinity", maxConcentration: 41, unit: "g/kg" }]);
    expect(salinityIncreaseLimit(absolute), "41 g/kg in 38 g/kg water allows 3 g/kg").toBeCloseTo(3, 9);
  });
  it("is null when the undiluted discharge already meets the limit", () => {
    const lax = resultWithLimits([{ constituent: "salinity", maxConcentration: 80, unit: "g/kg" }]);
    expect(salinityIncreaseLimit(lax), "no line for a limit dilution never has to meet").toBeNull();
  });
});

describe("csvWithCaution()", () => {
  it('puts the result\'s caution, beginning "Caution", in the first row as one cell before the table', () => {
    const text = csvWithCaution(seriesCsv(result, "si"), result.caution);
    const rows = csvParseRows(text);
    expect(rows[0], "one cell holding the whole caution").toEqual([result.caution]);
    expect(rows[0][0].startsWith("Caution"), "the caution opens the file").toBe(true);
    expect(rows[1][0], "the table's header follows").toBe("distance (m)");
    expect(rows.length, "caution row, header and a row per point").toBe(result.mixingZone.series.distance.length + 2);
  });
  it("falls back to the contract's caution when the result carries none", () => {
    expect(csvParseRows(csvWithCaution("a,b\n1,2\n", ""))[0], "contract caution").toEqual([CAUTION]);
  });
});
