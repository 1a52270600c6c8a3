/** Export commands: the HTML report (core/report/html.ts) and the distance series as CSV. */
import { CAUTION, type BrinefieldResult } from "../core/result/contract";
import { formatNumber, siToDisplay, type UnitSystem } from "../core/units";
import { exportFile } from "./platform/host";
import { csvFormatRowsSafe, csvWithCaution } from "../core/report/csv";

export { csvWithCaution };
import { serialiseScenario, suggestedFileName, type ScenarioFile } from "./state/scenarioState";

/** The 3D view as drawn now (the canvas keeps its drawing buffer), as a PNG data URI. */
function currentViewPng(): string | undefined {
  const canvas = document.querySelector<HTMLCanvasElement>("canvas[data-role=plume-canvas]");
  if (!canvas || canvas.width === 0) return undefined;
  try {
    return canvas.toDataURL("image/png");
  } catch {
    return undefined; // a lost WebGL context cannot be read; the report says so instead
  }
}

export async function exportReport(result: BrinefieldResult, file: ScenarioFile): Promise<string> {
  const { reportHtml } = await import("../core/report/html");
  const png = currentViewPng();
  const html = reportHtml(
    result,
    { scenarioFile: file, scenarioText: serialiseScenario(file) },
    png ? { view3dPng: png } : { view3dNote: "the 3D view was not open when the report was exported" },
  );
  const name = suggestedFileName(file, "report.html");
  const done = await exportFile(name, html, [{ name: "HTML report", extensions: ["html"] }]);
  return done ? `Report exported: ${name}` : "Export cancelled.";
}

/** The mixing-zone series as CSV, in the chosen units, with a header naming every unit. */
export function seriesCsv(result: BrinefieldResult, unitSystem: UnitSystem): string {
  const s = result.mixingZone.series;
  const lengthUnit = siToDisplay(1, "length", unitSystem).unit;
  const rows: string[][] = [[`distance (${lengthUnit})`, "dilution", "salinity increase (g/kg)", `layer thickness (${lengthUnit})`, "stage"]];
  for (let i = 0; i < s.distance.length; i++) {
    const thickness = s.layerThickness[i];
    rows.push([
      formatNumber(siToDisplay(s.distance[i], "length", unitSystem).value, 6),
      formatNumber(s.dilution[i], 6),
      formatNumber(s.salinityIncrease[i], 6),
      thickness === null ? "" : formatNumber(siToDisplay(thickness, "length", unitSystem).value, 6),
      s.stage[i] ?? "",
    ]);
  }
  return csvFormatRowsSafe(rows) + "\n";
}

/**
 * An exported CSV with the caution in its first row (one quoted cell, so a spreadsheet shows it whole in
 * the first cell and no reader splits it), then the table. Readers of the data skip one row.
 */

export async function exportSeriesCsv(result: BrinefieldResult, file: ScenarioFile, unitSystem: UnitSystem): Promise<string> {
  const name = suggestedFileName(file, "series.csv");
  const done = await exportFile(name, csvWithCaution(seriesCsv(result, unitSystem), result.caution), [{ name: "CSV", extensions: ["csv"] }]);
  return done ? `Series exported: ${name}` : "Export cancelled.";
}
