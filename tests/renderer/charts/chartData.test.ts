/** Chart series are core's arrays in display units; nothing is recomputed. */
import { describe, expect, it } from "vitest";
import { distanceSeries, riseMarkers, salinityIncreaseLimit, trajectorySeries } from "../../../renderer/charts/chartData";
import { seriesCsv } from "../../../renderer/exports";
import { runFile } from "../../../renderer/engine/runFile";
import { blankScenario } from "../../../renderer/state/scenarioState";

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
    expect(impacts.every((m) => m.value === 0), "impact is on the bed").toBe(true);
  });
});

describe("distanceSeries() and seriesCsv()", () => {
  it("carries the mixing-zone series point for point", () => {
    const s = distanceSeries(result, "si");
    expect(s.length, "same length as core's series").toBe(result.mixingZone.series.distance.filter((_, i) => result.mixingZone.series.dilution[i] > 0).length);
  });
  it("writes CSV with the units in the header", () => {
    const csv = seriesCsv(result, "us");
    expect(csv.split("\n")[0], "header").toBe("distance (ft),dilution,salinity increase (g/kg),layer thickness (ft),stage");
    expect(csv.trim().split("\n").length, "a row per point").toBe(result.mixingZone.series.distance.length + 1);
  });
});

describe("salinityIncreaseLimit()", () => {
  it("reads the allowed increase of a salinity limit", () => {
    expect(salinityIncreaseLimit(scenario), "blank scenario allows 2 g/kg").toBe(2);
  });
  it("is null when there is no salinity limit", () => {
    expect(salinityIncreaseLimit({ ...scenario, mixingZone: { ...scenario.mixingZone, limits: [] } }), "no limit").toBeNull();
  });
});
