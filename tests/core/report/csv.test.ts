/**
 * resultCsv() and seriesCsv() — CSV exports parse back (d3-dsv csvParse) to the result's numbers at the
 * CSV precision (6 significant figures): one row per near-field method and per constituent at the edge,
 * and one row per series point. Column names carry their unit: "impactDistance (m)".
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

/** The value as a CSV writes it: 6 significant figures (CSV_SIGNIFICANT). */
function at6(value: number | null | undefined): number | null {
  return value === null || value === undefined || !Number.isFinite(value) ? null : Number(value.toPrecision(6));
}

describe("resultCsv()", () => {
  it("has the documented columns, one row per near-field method, per constituent, per ambient case and the overall verdict", () => {
    for (const { name, json } of results) {
      const rows = csvParse(resultCsv(json));
      expect(rows.columns, `${name}: columns`).toEqual([...RESULT_CSV_COLUMNS]);
      expect(rows.length, `${name}: row count`).toBe(
        json.nearField.length + json.mixingZone.constituents.length + json.cases.length + 1,
      );
      const overall = rows.find((r) => r.section === "overall")!;
      expect(overall.verdict, `${name}: overall verdict as run --json`).toBe(json.overall.verdict);
      expect(back(overall["margin (-)"]), `${name}: overall margin as run --json`).toBe(at6(json.overall.margin));
      for (const r of rows.filter((x) => x.verdict)) {
        expect(["meets", "exceeds", "outside-scope"], `${name}: verdict word`).toContain(r.verdict);
        expect(r.pass, `${name}: pass only for meets`).toBe(String(r.verdict === "meets"));
      }
    }
  });

  it("parses back to the near-field numbers of run --json at 6 significant figures", () => {
    for (const { name, json } of results) {
      const rows = csvParse(resultCsv(json)).filter((r) => r.section === "near-field");
      json.nearField.forEach((m, i) => {
        const row = rows[i]!;
        expect(row.name, `${name}: method order`).toBe(m.method);
        expect(row.source, `${name}: source text kept`).toBe(m.source);
        expect(back(row["maxRiseHeight (m)"]), `${name} ${m.method}: max rise`).toBe(at6(m.maxRiseHeight));
        expect(back(row["returnDistance (m)"]), `${name} ${m.method}: return distance`).toBe(at6(m.returnDistance));
        expect(back(row["impactDistance (m)"]), `${name} ${m.method}: impact distance`).toBe(at6(m.impactDistance));
        expect(back(row["impactDilution (-)"]), `${name} ${m.method}: impact dilution`).toBe(at6(m.impactDilution));
        expect(back(row["impactDilutionLow (-)"]), `${name} ${m.method}: range low`).toBe(
          at6(m.dilutionRange?.[0] ?? null),
        );
        expect(back(row["impactDilutionHigh (-)"]), `${name} ${m.method}: range high`).toBe(
          at6(m.dilutionRange?.[1] ?? null),
        );
        expect(back(row["nearFieldDilution (-)"]), `${name} ${m.method}: near-field dilution`).toBe(
          at6(m.nearFieldDilution),
        );
        expect(back(row["entrainedFlow (m3/s)"]), `${name} ${m.method}: entrained flow`).toBe(at6(m.entrainedFlow));
      });
    }
  });

  it("parses back to the edge concentrations and margins at 6 significant figures", () => {
    for (const { name, json } of results) {
      const rows = csvParse(resultCsv(json)).filter((r) => r.section === "mixing-zone-edge");
      json.mixingZone.constituents.forEach((c, i) => {
        const row = rows[i]!;
        const check = json.compliance.constituents.find((k) => k.constituent === c.constituent);
        expect(row.name, `${name}: constituent order`).toBe(c.constituent);
        expect(back(row["edgeDilution (-)"]), `${name} ${c.constituent}: edge dilution`).toBe(
          at6(json.mixingZone.dilution),
        );
        expect(back(row["edgeConcentration (see unit)"]), `${name} ${c.constituent}: concentration`).toBe(
          at6(c.concentration),
        );
        expect(back(row["edgeIncrease (see unit)"]), `${name} ${c.constituent}: increase`).toBe(at6(c.increase));
        expect(back(row["requiredDilution (-)"]), `${name} ${c.constituent}: required dilution`).toBe(
          at6(check?.requiredDilution ?? null),
        );
        expect(back(row["margin (-)"]), `${name} ${c.constituent}: margin`).toBe(at6(check?.margin ?? null));
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
  it("parses back to the dilution series at 6 significant figures, point by point", () => {
    for (const { name, json } of results) {
      const s = json.mixingZone.series;
      const rows = csvParse(seriesCsv(json));
      expect(rows.columns, `${name}: columns`).toEqual([...SERIES_CSV_COLUMNS]);
      expect(rows.length, `${name}: one row per point`).toBe(s.distance.length);
      rows.forEach((row, i) => {
        expect(back(row["distance (m)"]), `${name}: distance ${i}`).toBe(at6(s.distance[i]));
        expect(back(row["dilution (-)"]), `${name}: dilution ${i}`).toBe(at6(s.dilution[i]));
        expect(back(row["salinityIncrease (g/kg)"]), `${name}: salinity increase ${i}`).toBe(
          at6(s.salinityIncrease[i]),
        );
        expect(back(row["layerThickness (m)"]), `${name}: layer thickness ${i}`).toBe(at6(s.layerThickness[i] ?? null));
        expect(row.stage, `${name}: stage ${i}`).toBe(s.stage[i]);
      });
    }
  });
});

describe("studyResultCsv()", () => {
  it("puts each variant's rows under its name, numbers as in its own CSV", () => {
    const variants = results.map((r) => ({ name: r.name, result: r.json }));
    const rows = csvParse(studyResultCsv(variants));
    expect(rows.columns[0], "variant first").toBe("variant");
    for (const v of variants) {
      const mine = rows.filter((r) => r.variant === v.name && r.section === "near-field");
      expect(mine.length, `${v.name}: one row per method`).toBe(v.result.nearField.length);
      mine.forEach((row, i) =>
        expect(back(row["impactDilution (-)"]), `${v.name}: impact dilution`).toBe(
          at6(v.result.nearField[i]!.impactDilution),
        ),
      );
    }
  });
});

describe("CSV cells are never run as spreadsheet formulas", () => {
  // Neutralising with a leading single quote: common practice for CSV meant for spreadsheets, no source.
  it("puts a quote before text starting with =, +, -, @, tab or carriage return", async () => {
    const { csvSafeCell } = await import("../../../core/report/csv");
    for (const text of ["=1+2", "+SUM(A1)", "-2+3", "@cmd", "\tx", "\rx", '=HYPERLINK("http://x")']) {
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

describe("one CSV convention for every export", () => {
  it("writes numbers to 6 significant figures, without exponent for ordinary magnitudes", async () => {
    const { csvNumber } = await import("../../../core/report/csv");
    expect(csvNumber(0.05787037037037037), "m³/s of 5000 m³/d").toBe("0.0578704");
    expect(csvNumber(237.41234567), "a dilution").toBe("237.412");
    expect(csvNumber(150000), "a whole number").toBe("150000");
    expect(csvNumber(1.234567e-7), "a tiny number").toBe("1.23457e-7");
    expect(csvNumber(Number.NaN), "not a number is an empty cell").toBe("");
  });
  it("names the unit of numbers in the header by the column's key", async () => {
    const { unitOfKey } = await import("../../../core/report/csv");
    expect(unitOfKey("ambient.depth"), "a scenario path takes its field's SI unit").toBe("m");
    expect(unitOfKey("discharge.flow"), "flow").toBe("m3/s");
    expect(unitOfKey("edgeDilution"), "dimensionless").toBe("-");
    expect(unitOfKey("lengthScaleMaxRise"), "a method's rise").toBe("m");
    expect(unitOfKey("verdict"), "text has no unit").toBeUndefined();
  });
  it("puts the scenario name and inputs hash beside the caution on the first row", async () => {
    const { csvWithCaution, aboutResult } = await import("../../../core/report/csv");
    const { csvParseRows } = await import("d3-dsv");
    const { json } = results[0]!;
    const first = csvParseRows(csvWithCaution(seriesCsv(json), json.caution, aboutResult(json)))[0]!;
    expect(first[0]!.startsWith("Caution"), "caution first").toBe(true);
    expect(first.slice(1), "what it was computed from").toEqual([
      `scenario: ${json.scenarioName}`,
      `inputsHash: ${json.inputsHash}`,
    ]);
  });
});
