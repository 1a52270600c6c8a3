/** Export commands: the HTML report (core/report/html.ts) and the distance series as CSV. */
import type { BrinefieldResult } from "../core/result/contract";
import { siToDisplay, type UnitSystem } from "../core/units";
import { exportFile } from "./platform/host";
import { aboutResult, csvTable, csvWithCaution } from "../core/report/csv";

export { csvWithCaution };
import { serialiseScenario, suggestedFileName, type ScenarioFile } from "./state/scenario-state";

/**
 * The view's compass lives over the canvas, not in it: the exported picture gets a north arrow drawn in
 * its lower-left corner, turned as the compass was (the view writes the bearing on the canvas).
 */
function withNorthArrow(source: HTMLCanvasElement): HTMLCanvasElement {
  const bearing = Number(source.dataset.northBearing);
  if (!Number.isFinite(bearing)) return source;
  const copy = document.createElement("canvas");
  copy.width = source.width;
  copy.height = source.height;
  const ctx = copy.getContext("2d");
  if (!ctx) return source;
  ctx.drawImage(source, 0, 0);
  const size = Math.max(24, Math.round(Math.min(copy.width, copy.height) * 0.06));
  ctx.save();
  ctx.translate(size * 1.4, copy.height - size * 1.4);
  ctx.fillStyle = "rgba(255,255,255,0.9)";
  ctx.beginPath();
  ctx.arc(0, 0, size * 1.15, 0, 2 * Math.PI);
  ctx.fill();
  ctx.rotate((bearing * Math.PI) / 180);
  ctx.fillStyle = "#1d2833";
  ctx.beginPath();
  ctx.moveTo(0, -size * 0.8);
  ctx.lineTo(size * 0.25, size * 0.1);
  ctx.lineTo(0, -size * 0.1);
  ctx.lineTo(-size * 0.25, size * 0.1);
  ctx.closePath();
  ctx.fill();
  ctx.font = `700 ${Math.round(size * 0.45)}px sans-serif`;
  ctx.textAlign = "center";
  ctx.fillText("N", 0, size * 0.6);
  ctx.restore();
  return copy;
}

/** The 3D view as drawn now (the canvas keeps its drawing buffer), as a PNG data URI. */
function currentViewPng(): string | undefined {
  const canvas = document.querySelector<HTMLCanvasElement>("canvas[data-role=plume-canvas]");
  if (!canvas || canvas.width === 0) return undefined;
  try {
    return withNorthArrow(canvas).toDataURL("image/png");
  } catch {
    return undefined; // a lost WebGL context cannot be read; the report says so instead
  }
}

async function reportFor(result: BrinefieldResult, file: ScenarioFile): Promise<string> {
  const { reportHtml } = await import("../core/report/html");
  const png = currentViewPng();
  return reportHtml(
    result,
    { scenarioFile: file, scenarioText: serialiseScenario(file) },
    png ? { view3dPng: png } : { view3dNote: "the 3D view was not open when the report was exported" },
  );
}

/**
 * Print or save as PDF in a browser: the report opens in a tab of its own and the browser's print
 * dialog comes up on it ("Save as PDF" is one of its printers). The desktop app prints through its host.
 */
export async function printReportInBrowser(result: BrinefieldResult, file: ScenarioFile): Promise<string> {
  const html = await reportFor(result, file);
  const url = URL.createObjectURL(new Blob([html], { type: "text/html" }));
  const tab = window.open(url, "_blank");
  if (!tab) {
    URL.revokeObjectURL(url);
    return "The browser blocked the report's tab: allow pop-ups for this page, or use Export report and print the HTML file.";
  }
  tab.addEventListener("load", () => {
    tab.focus();
    tab.print();
  });
  window.setTimeout(() => URL.revokeObjectURL(url), 60_000);
  return "The report opened in a new tab with the print dialog: choose a printer or “Save as PDF”.";
}

export async function exportReport(result: BrinefieldResult, file: ScenarioFile): Promise<string> {
  const html = await reportFor(result, file);
  const name = suggestedFileName(file, "report.html");
  const done = await exportFile(name, html, [{ name: "HTML report", extensions: ["html"] }]);
  return done ? `Report exported: ${name}` : "Export cancelled.";
}

/**
 * The mixing-zone series as CSV in the chosen units, in the one CSV convention (core/report/csv.ts): the
 * same column keys as `brinefield report --series-csv`, with the unit written in each header.
 */
export function seriesCsv(result: BrinefieldResult, unitSystem: UnitSystem): string {
  const s = result.mixingZone.series;
  const lengthUnit = unitSystem === "us" ? "ft" : "m";
  const length = (v: number) => siToDisplay(v, "length", unitSystem).value;
  const rows = s.distance.map((d, i) => {
    const thickness = s.layerThickness[i];
    return {
      distance: length(d),
      dilution: s.dilution[i],
      salinityIncrease: s.salinityIncrease[i],
      layerThickness: thickness === null || thickness === undefined ? null : length(thickness),
      stage: s.stage[i] ?? "",
    };
  });
  return (
    csvTable(rows, [
      { key: "distance", unit: lengthUnit },
      { key: "dilution", unit: "-" },
      { key: "salinityIncrease", unit: "g/kg" },
      { key: "layerThickness", unit: lengthUnit },
      { key: "stage" },
    ]) + "\n"
  );
}

/**
 * An exported CSV with the caution in its first row (one quoted cell, so a spreadsheet shows it whole in
 * the first cell and no reader splits it), then the table. Readers of the data skip one row.
 */

export async function exportSeriesCsv(
  result: BrinefieldResult,
  file: ScenarioFile,
  unitSystem: UnitSystem,
): Promise<string> {
  const name = suggestedFileName(file, "series.csv");
  const done = await exportFile(
    name,
    csvWithCaution(seriesCsv(result, unitSystem), result.caution, aboutResult(result)),
    [{ name: "CSV", extensions: ["csv"] }],
  );
  return done ? `Series exported: ${name}` : "Export cancelled.";
}
