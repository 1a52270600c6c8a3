/**
 * The printed report: headless Chromium prints the HTML report of a demo scenario to PDF, Debian's
 * pdftoppm/pdftotext (poppler-utils) turn the pages into grey images and text, and the test checks that
 * no page is blank, that the caution footer is on every page, and that the rendered 3D view is in the
 * report whenever the renderer builds (otherwise the report must say why it is missing).
 */
import { describe, expect, it, beforeAll, afterAll } from "vitest";
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { parseScenarioText } from "../../core/scenario/parse";
import { runScenario } from "../../core/pipeline";
import { reportHtml } from "../../core/report";
import { pdfFromHtml } from "../../core/cli/node/headless/print-pdf";
import { capture3dView } from "../../core/cli/node/headless/capture-3d";

const ROOT = fileURLToPath(new URL("../../", import.meta.url));
const SCENARIO = join(ROOT, "demo-scenarios/island-cove.json");

interface Page {
  readonly width: number;
  readonly height: number;
  readonly pixels: Uint8Array;
}

/** Reads a binary PGM (P5, 8-bit) as written by `pdftoppm -gray`. */
function readPgm(path: string): Page {
  const buf = readFileSync(path);
  const header: string[] = [];
  let i = 0;
  while (header.length < 4) {
    while (i < buf.length && /\s/.test(String.fromCharCode(buf[i]!))) i++;
    let token = "";
    while (i < buf.length && !/\s/.test(String.fromCharCode(buf[i]!))) token += String.fromCharCode(buf[i++]!);
    header.push(token);
  }
  i++; // the single whitespace byte after maxval
  if (header[0] !== "P5" || header[3] !== "255") throw new Error(`${path}: not an 8-bit binary PGM`);
  const width = Number(header[1]);
  const height = Number(header[2]);
  return { width, height, pixels: new Uint8Array(buf.subarray(i, i + width * height)) };
}

/** Fraction of pixels darker than `threshold` in rows [fromRow, toRow). */
function inkFraction(p: Page, threshold: number, fromRow = 0, toRow = p.height): number {
  let ink = 0;
  for (let y = fromRow; y < toRow; y++)
    for (let x = 0; x < p.width; x++) if (p.pixels[y * p.width + x]! < threshold) ink++;
  return ink / ((toRow - fromRow) * p.width);
}

let dir = "";
let pdf: Uint8Array = new Uint8Array();
let pages: Page[] = [];
let pageTexts: string[] = [];
let png: string | null = null;
let captureProblem = "";
let html = "";

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), "brinefield-report-"));
  const text = readFileSync(SCENARIO, "utf8");
  const parsed = parseScenarioText(text);
  if (!parsed.ok) throw new Error("the demo scenario must read");
  const result = runScenario(parsed.scenario);
  try {
    png = await capture3dView(text, { readyTimeoutMs: 20_000 });
  } catch (err) {
    captureProblem = err instanceof Error ? err.message : String(err);
  }
  html = reportHtml(
    result,
    { scenarioFile: JSON.parse(text), scenarioText: text },
    {
      generatedAt: "2026-12-02T06:00:00Z",
      ...(png ? { view3dPng: png } : { view3dNote: `the 3D view could not be rendered (${captureProblem})` }),
    },
  );
  pdf = await pdfFromHtml(html);
  writeFileSync(join(dir, "report.pdf"), pdf);
  execFileSync("pdftoppm", ["-gray", "-r", "40", join(dir, "report.pdf"), join(dir, "page")]);
  const files = readdirSync(dir)
    .filter((f) => f.endsWith(".pgm"))
    .sort();
  pages = files.map((f) => readPgm(join(dir, f)));
  pageTexts = pages.map((_, i) =>
    execFileSync("pdftotext", ["-f", String(i + 1), "-l", String(i + 1), "-layout", join(dir, "report.pdf"), "-"], {
      encoding: "utf8",
    }),
  );
}, 150_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe("the report printed to PDF", () => {
  it("is a PDF of several A4 pages", () => {
    expect(Buffer.from(pdf.subarray(0, 5)).toString("latin1"), "PDF signature").toBe("%PDF-");
    expect(pages.length, "a full report runs to several pages").toBeGreaterThanOrEqual(5);
    for (const p of pages) {
      // A4 is 210 × 297 mm; at 40 dpi that is about 331 × 468 pixels.
      expect(p.height / p.width, "portrait A4 proportions").toBeCloseTo(297 / 210, 1);
    }
  });

  it("is a tagged PDF with a document outline (structure for screen readers, bookmarks per section)", () => {
    // pdfinfo (poppler-utils) reports "Tagged: yes" when the document has a structure tree (ISO 32000-1, 14.8).
    const info = execFileSync("pdfinfo", [join(dir, "report.pdf")], { encoding: "utf8" });
    expect(info, "tagged").toMatch(/^Tagged:\s+yes$/m);
    const outline = execFileSync("pdfinfo", ["-dests", join(dir, "report.pdf")], { encoding: "utf8" });
    expect(Buffer.from(pdf).toString("latin1"), "an outline dictionary").toMatch(/\/Outlines\s+\d+\s+0\s+R/);
    expect(outline.length, "named destinations listed").toBeGreaterThan(0);
  });

  it("has no blank page: every page carries text or figures, none is solid ink", () => {
    pages.forEach((p, i) => {
      const ink = inkFraction(p, 200);
      expect(ink, `page ${i + 1}: some ink (${ink.toFixed(4)})`).toBeGreaterThan(0.004);
      expect(ink, `page ${i + 1}: not a solid block (${ink.toFixed(4)})`).toBeLessThan(0.6);
    });
  });

  it("prints the caution in the footer of every page, below the page's content", () => {
    pageTexts.forEach((t, i) => expect(t, `page ${i + 1}: caution text`).toContain("screening estimate only"));
    pages.forEach((p, i) => {
      const footer = inkFraction(p, 200, Math.round(p.height * 0.9), Math.round(p.height * 0.97));
      expect(footer, `page ${i + 1}: ink in the footer band`).toBeGreaterThan(0.005);
    });
    expect(pageTexts[0], "caution block on page 1 too").toContain("Caution: screening estimate only.");
  });

  it("carries the title, the inputs hash and the figures on their pages", () => {
    expect(pageTexts[0], "title on page 1").toContain("Brine outfall screening report");
    const all = pageTexts.join("\n");
    for (const label of ["Figure 1.", "Figure 2.", "References", "Compliance: verdict and margin"]) {
      expect(all, `${label} printed`).toContain(label);
    }
  });

  it("includes the rendered 3D view whenever the renderer builds, and otherwise says why not", () => {
    const built = existsSync(join(ROOT, "dist/renderer/index.html"));
    if (built) {
      expect(png, `the renderer is built, so the capture must succeed (problem: ${captureProblem})`).not.toBeNull();
    }
    if (png) {
      const bytes = Buffer.from(png.replace(/^data:image\/png;base64,/, ""), "base64");
      expect(bytes.subarray(1, 4).toString("latin1"), "PNG signature").toBe("PNG");
      expect(bytes.length, "a real picture, not an empty canvas").toBeGreaterThan(20_000);
      const page = pageTexts.findIndex((t) => t.includes("Figure 3."));
      expect(page, "Figure 3 printed").toBeGreaterThan(-1);
      const covered = inkFraction(pages[page]!, 245);
      expect(covered, `page ${page + 1} is largely covered by the picture`).toBeGreaterThan(0.2);
    } else {
      expect(html, "the report states the reason").toContain(
        "No 3D view is included: the 3D view could not be rendered (",
      );
    }
  });
});
