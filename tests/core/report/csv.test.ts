/**
 * resultCsv() and seriesCsv() — CSV exports parse back (d3-dsv csvParse) to exactly the result's numbers:
 * one row per near-field method and per constituent at the edge, and one row per series point.
 */
import { describe, expect, it, beforeAll } from "vitest";
import { csvParse } from "d3-dsv";
import { basename } from "node:path";
import { resultCsv, seriesCsv, studyResultCsv, RESULT_CSV_COLUMNS, SERIES_CSV_COLUMNS } from "../../../core/report";
import type { BrinefieldResult } from "../../../core/result/contract";
import { demoScenarioPaths, runJson } from "./helpers";

const results: { name: string; json: BrinefieldResult }[] = [];

beforeAll(async () => {
  for (const p of demoScenarioPaths()) results.push({ name: basename(p), json: await runJson(p) });
});

/** A CSV cell back to a number, or null for an empty cell. */
function back(cell: string | undefined): number | null {
  return cell === undefined || cell === "" ? null : Number(cell);
}

describe("resultCsv()", () => {
  it("has the documented columns, one row per near-field method, per constituent, per ambient case and the overall verdict", () => {
    for (const { name, json } of results) {
      const rows = csvParse(resultCsv(json));
      expect(rows.columns, `${name}: columns`).toEqual([...RESULT_CSV_COLUMNS]);
      expect(rows.length, `${name}: row count`).toBe(json.nearField.length + json.mixingZone.constituents.length + json.cases.length + 1);
      const overall = rows.find((r) => r.section === "overall")!;
      expect(overall.verdict, `${name}: overall verdict as run --json`).toBe(json.overall.verdict);
      expect(back(overall.margin), `${name}: overall margin as run --json`).toBe(json.overall.margin);
      for (const r of rows.filter((x) => x.verdict)) {
        expect(["meets", "exceeds", "outside-scope"], `${name}: verdict word`).toContain(r.verdict);
        expect(r.pass, `${name}: pass only for meets`).toBe(String(r.verdict === "meets"));
      }
    }
  });

  it("parses back to exactly the near-field numbers of run --json", () => {
    for (const { name, json } of results) {
      const rows = csvParse(resultCsv(json)).filter((r) => r.section === "near-field");
      json.nearField.forEach((m, i) => {
        const row = rows[i]!;
        expect(row.name, `${name}: method order`).toBe(m.method);
        expect(row.source, `${name}: source text kept`).toBe(m.source);
        expect(back(row.max_rise_height_m), `${name} ${m.method}: max rise`).toBe(m.maxRiseHeight);
        expect(back(row.return_distance_m), `${name} ${m.method}: return distance`).toBe(m.returnDistance);
        expect(back(row.impact_distance_m), `${name} ${m.method}: impact distance`).toBe(m.impactDistance);
        expect(back(row.impact_dilution), `${name} ${m.method}: impact dilution`).toBe(m.impactDilution);
        expect(back(row.impact_dilution_low), `${name} ${m.method}: range low`).toBe(m.dilutionRange?.[0] ?? null);
        expect(back(row.impact_dilution_high), `${name} ${m.method}: range high`).toBe(m.dilutionRange?.[1] ?? null);
        expect(back(row.near_field_dilution), `${name} ${m.method}: near-field dilution`).toBe(m.nearFieldDilution);
        expect(back(row.entrained_flow_m3_s), `${name} ${m.method}: entrained flow`).toBe(m.entrainedFlow);
      });
    }
  });

  it("parses back to exactly the edge concentrations and margins", () => {
    for (const { name, json } of results) {
      const rows = csvParse(resultCsv(json)).filter((r) => r.section === "mixing-zone-edge");
      json.mixingZone.constituents.forEach((c, i) => {
        const row = rows[i]!;
        const check = json.compliance.constituents.find((k) => k.constituent === c.constituent);
        expect(row.name, `${name}: constituent order`).toBe(c.constituent);
        expect(back(row.edge_dilution), `${name} ${c.constituent}: edge dilution`).toBe(json.mixingZone.dilution);
        expect(back(row.edge_concentration), `${name} ${c.constituent}: concentration`).toBe(c.concentration);
        expect(back(row.edge_increase), `${name} ${c.constituent}: increase`).toBe(c.increase);
        expect(back(row.required_dilution), `${name} ${c.constituent}: required dilution`).toBe(check?.requiredDilution ?? null);
        expect(back(row.margin), `${name} ${c.constituent}: margin`).toBe(check?.margin ?? null);
        expect(row.pass, `${name} ${c.constituent}: verdict`).toBe(check ? String(check.pass) : "");
      });
    }
  });

  it("quotes text containing commas and quotes so the columns stay aligned", () => {
    const { json } = results[0]!;
    const tricky = { ...json, scenarioName: 'Bay, "north" site' };
    const rows = csvParse(resultCsv(tricky));
    expect(rows[0]!.scenario, "name with comma and quotes survives").toBe('Bay, "north" site');
  });
});

describe("seriesCsv()", () => {
  it("parses back to exactly the dilution series, point by point", () => {
    for (const { name, json } of results) {
      const s = json.mixingZone.series;
      const rows = csvParse(seriesCsv(json));
      expect(rows.columns, `${name}: columns`).toEqual([...SERIES_CSV_COLUMNS]);
      expect(rows.length, `${name}: one row per point`).toBe(s.distance.length);
      rows.forEach((row, i) => {
        expect(back(row.distance_m), `${name}: distance ${i}`).toBe(s.distance[i]);
        expect(back(row.dilution), `${name}: dilution ${i}`).toBe(s.dilution[i]);
        expect(back(row.salinity_increase_g_kg), `${name}: salinity increase ${i}`).toBe(s.salinityIncrease[i]);
        expect(back(row.layer_thickness_m), `${name}: layer thickness ${i}`).toBe(s.layerThickness[i] ?? null);
        expect(row.stage, `${name}: stage ${i}`).toBe(s.stage[i]);
      });
    }
  });
});

describe("studyResultCsv()", () => {
  it("puts each variant's rows under its name, numbers unchanged", () => {
    const variants = results.map((r) => ({ name: r.name, result: r.json }));
    const rows = csvParse(studyResultCsv(variants));
    expect(rows.columns[0], "variant first").toBe("variant");
    for (const v of variants) {
      const mine = rows.filter((r) => r.variant === v.name && r.section === "near-field");
      expect(mine.length, `${v.name}: one row per method`).toBe(v.result.nearField.length);
      mine.forEach((row, i) => expect(back(row.impact_dilution), `${v.name}: impact dilution`).toBe(v.result.nearField[i]!.impactDilution));
    }
  });
});

describe("CSV cells are never run as spreadsheet formulas", () => {
  // Neutralising with a leading single quote: common practice for CSV meant for spreadsheets, no source.
  it("puts a quote before text starting with =, +, -, @, tab or carriage return", async () => {
    const { csvSafeCell } = await import("../../../core/report/csv");
    for (const text of ["=1+2", "+SUM(A1)", "-2+3", "@cmd", "\tx", "\rx", "=HYPERLINK(\"http://x\")"]) {
      expect(csvSafeCell(text), `neutralised: ${JSON.stringify(text)}`).toBe(`'${text}`);
    }
  });
  it("leaves numbers, negative numbers and ordinary text as they are", async () => {
    const { csvSafeCell } = await import("../../../core/report/csv");
    expect(csvSafeCell(-2.5), "negative number").toBe("-2.5");
    expect(csvSafeCell("-2.5"), "negative number as text").toBe("-2.5");
    expect(csvSafeCell("-1e-3"), "exponent form").toBe("-1e-3");
    expect(csvSafeCell("+4"), "signed number").toBe("+4");
    expect(csvSafeCell("Outfall A"), "text").toBe("Outfall A");
    expect(csvSafeCell(null), "missing").toBe("");
  });
  it("neutralises a hostile scenario name in the key-results CSV while numbers stay numeric", async () => {
    const { csvSafeCell, csvFormatSafe } = await import("../../../core/report/csv");
    const csv = csvFormatSafe([{ name: "=cmd|' /C calc'!A0", margin: -0.25 }], ["name", "margin"]);
    expect(csv.split("\n")[1], "row").toBe("'=cmd|' /C calc'!A0,-0.25");
    expect(csvSafeCell(csvSafeCell("=x")), "neutralising twice changes nothing more").toBe("'=x");
  });
});
