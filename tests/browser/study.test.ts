/**
 * A study as a document in the built app (Debian chromium): open a study file, edit a variant with the
 * Design tab's fields, switch tabs and find the edit kept, undo it, export the study and read it back
 * with core's compare (the same code as `brinefield compare`), compare in the app (margin chart,
 * governing case and chain), open a variant as a scenario. Screenshots at 1440×900 and 1280×720 go to
 * test-artifacts/ for review.
 */
import { launchChromium } from "../../core/cli/node/headless/chromium";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { serveDirectory, type StaticServer } from "../renderer/support/static-server";
import { ensureWebBuilt, WEB_DIST } from "./support/web-build";
import { parseStudy } from "../../core/study/study-file";
import { compareVariant, studyVariants } from "../../core/study/compare";
import { parseScenario } from "../../core/scenario/parse";
import { evaluateScenario } from "../../core/study/evaluate";
import { PERCENTILE_MEANING, REFUSED_MEANING } from "../../core/study/uncertainty-words";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const dist = WEB_DIST;
const artifacts = join(root, "test-artifacts");

let server: StaticServer;
let browser: Browser;
let page: Page;
const problems: string[] = [];
const base = JSON.parse(readFileSync(join(root, "demo-scenarios/island-cove.json"), "utf8")) as Record<string, unknown>;
const studyPath = join(artifacts, "study-input.brinefield-study.json");

/** Reads a study file as `brinefield compare` does and returns the overall row of each variant. */
function compareStudyText(text: string) {
  const st = parseStudy(JSON.parse(text));
  if (!st.ok) throw new Error(st.issues.map((i) => i.message).join("; "));
  const v = studyVariants(st.study, st.study.base, parseScenario);
  if (!v.ok) throw new Error(v.issues.map((i) => i.message).join("; "));
  const rows = v.variants.flatMap((x) => compareVariant(x, evaluateScenario));
  return { study: st.study, variants: v.variants, overall: rows.filter((r) => r.case === "overall") };
}

beforeAll(async () => {
  ensureWebBuilt();
  mkdirSync(artifacts, { recursive: true });
  writeFileSync(
    studyPath,
    JSON.stringify(
      {
        format: "brinefield-study",
        version: 1,
        name: "Island cove options",
        base,
        variants: [
          { name: "deeper", overrides: { "ambient.depth": "25 m" } },
          { name: "stronger current", overrides: { "ambient.currentSpeed": "0.3 m/s" } },
        ],
      },
      null,
      2,
    ),
  );
  server = await serveDirectory(dist);
  browser = await launchChromium();
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, acceptDownloads: true });
  page = await context.newPage();
  page.on("console", (m) => {
    if (m.type() === "error" || /Content Security Policy/i.test(m.text())) problems.push(m.text());
  });
  page.on("pageerror", (e) => problems.push(e.message));
  await page.goto(server.url);
  await page.locator("[data-role=headline-table]").waitFor({ timeout: 60_000 });
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

const portCount = () => page.locator('.variant-fields input[data-path="diffuser.portCount"]');

describe("a study as a document in the app", () => {
  it("opens a study file: the Study tab shows its variants and the title says it is a study", async () => {
    const [chooser] = await Promise.all([page.waitForEvent("filechooser"), page.click("[data-command=open]")]);
    await chooser.setFiles(studyPath);
    await page.locator("[data-role=variant-editor]").waitFor({ timeout: 30_000 });
    expect(await page.locator("[data-role=doc-kind]").textContent(), "the title marks a study").toBe("Study");
    expect(await page.locator(".doc-title").textContent(), "the study's name").toContain("Island cove options");
    expect(
      await page.locator("[data-variant]").evaluateAll((els) => els.map((e) => e.getAttribute("data-variant"))),
    ).toEqual(["deeper", "stronger current"]);
    // The override is listed in words with its base value, not as a raw path.
    const changes = page.locator("[data-role=variant-changes]");
    expect(await changes.textContent(), "the change in words").toMatch(/water depth: 25 m \(base 18 m\)/);
    expect(
      await page.locator('.variant-fields input[data-path="ambient.depth"]').inputValue(),
      "the Design tab's field shows the variant's value",
    ).toBe("25");
    expect(await page.locator(".doc-title .dirty-dot").count(), "a freshly opened study is clean").toBe(0);
  });

  it("edits a variant with the Design tab's fields and keeps the edit across tab switches; undo takes it back", async () => {
    await portCount().fill("4");
    await portCount().press("Tab");
    await page.locator('[data-change="diffuser.portCount"]').waitFor();
    expect(await page.locator('[data-change="diffuser.portCount"]').textContent(), "named in words").toMatch(
      /ports: 4 \(base 2\)/,
    );
    await page.click("[data-command=design]");
    await page.locator("[data-role=headline-table]").waitFor();
    expect(
      await page.locator('input[data-path="diffuser.portCount"]').inputValue(),
      "the base scenario keeps its two ports",
    ).toBe("2");
    await page.click("[data-command=study]");
    await page.locator("[data-role=variant-editor]").waitFor();
    expect(await portCount().inputValue(), "the variant's edit survived the tab switch").toBe("4");
    expect(await page.locator('[data-change="diffuser.portCount"]').count(), "still listed").toBe(1);
    expect(await page.locator(".doc-title .dirty-dot").count(), "the edit made the study unsaved").toBe(1);

    await page.click("[data-command=undo]");
    await expect
      .poll(() => page.locator('[data-change="diffuser.portCount"]').count(), { message: "undo removes the edit" })
      .toBe(0);
    expect(await page.locator(".doc-title .dirty-dot").count(), "undoing to the opened study is clean").toBe(0);
    await page.click("[data-command=redo]");
    await expect.poll(() => portCount().inputValue(), { message: "redo brings it back" }).toBe("4");
  });

  it("exports the study file, and core's compare reads it back with the edited variant", async () => {
    const [download] = await Promise.all([page.waitForEvent("download"), page.click("[data-command=study-export]")]);
    const path = join(artifacts, "study-exported.brinefield-study.json");
    await download.saveAs(path);
    const text = readFileSync(path, "utf8");
    const { study, variants, overall } = compareStudyText(text);
    expect(study.format).toBe("brinefield-study");
    expect(
      study.variants?.map((v) => v.name),
      "both variants",
    ).toEqual(["deeper", "stronger current"]);
    expect(study.variants?.[0]?.overrides, "the edit is an override of the base").toEqual({
      "ambient.depth": "25 m",
      "diffuser.portCount": 4,
    });
    const deeper = variants.find((v) => v.name === "deeper")!;
    expect(deeper.scenario?.diffuser.portCount, "compare reads four ports").toBe(4);
    expect(deeper.scenario?.ambient.depth, "and 25 m of water").toBe(25);
    expect(
      overall.map((r) => r.variant),
      "one overall row per variant and the base",
    ).toEqual(["base", "deeper", "stronger current"]);
    for (const r of overall) expect(["meets", "exceeds", "outside-scope"], `${r.variant} runs`).toContain(r.verdict);
  });

  it("saves the document as a study file (Ctrl+S) that compare reads, and is clean afterwards", async () => {
    const [download] = await Promise.all([page.waitForEvent("download"), page.keyboard.press("Control+s")]);
    const path = join(artifacts, "study-saved.brinefield-study.json");
    await download.saveAs(path);
    expect(download.suggestedFilename(), "a study file name").toMatch(/\.brinefield-study\.json$/);
    const { variants } = compareStudyText(readFileSync(path, "utf8"));
    expect(variants.find((v) => v.name === "deeper")?.scenario?.diffuser.portCount).toBe(4);
    expect(await page.locator(".doc-title .dirty-dot").count(), "saved").toBe(0);
  });

  it("compares the variants: margin chart, governing case and method chain, a table of chosen columns", async () => {
    await page.click("[data-command=study-compare]");
    await page.locator("svg[data-figure=compare-margins]").waitFor({ timeout: 120_000 });
    const governing = page.locator("[data-role=compare-governing] li");
    expect(await governing.count(), "one line per variant and the base").toBe(3);
    const chains = await page.locator("[data-role=governing-chain]").allTextContents();
    expect(
      chains.every((c) => /near field/.test(c)),
      `each names its method chain: ${chains.join(" | ")}`,
    ).toBe(true);
    expect(await page.locator("svg[data-figure=compare-margins]").textContent(), "margin 1 marked").toMatch(
      /margin 1 = limit just met/,
    );
    const headers = await page.locator("[data-role=study-variants-table] th").allTextContents();
    expect(headers.length, "a chosen set of columns, not all of them").toBeLessThanOrEqual(8);
    expect(headers.join("|")).toMatch(/method chain to the edge/);
    // Every column is still there on demand.
    await page.locator(".compare-columns summary").click();
    await page.locator('[data-column="integralImpactDistance"]').check();
    expect((await page.locator("[data-role=study-variants-table] th").allTextContents()).join("|")).toMatch(
      /integral impact distance \(m\)/,
    );
    await page.locator('[data-column="integralImpactDistance"]').uncheck();
    // The table fits the screen: no horizontal overflow of the page.
    const overflow = await page.locator(".study-panel").evaluate((el) => el.scrollWidth - el.clientWidth);
    expect(overflow, "the study panel does not scroll sideways").toBeLessThanOrEqual(1);
    await page.locator("svg[data-figure=compare-margins]").scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(artifacts, "study-compare-1440x900.png") });
    await page.setViewportSize({ width: 1280, height: 720 });
    await page.waitForTimeout(400);
    await page.screenshot({ path: join(artifacts, "study-compare-1280x720.png") });
    const overflowSmall = await page.locator(".study-panel").evaluate((el) => el.scrollWidth - el.clientWidth);
    expect(overflowSmall, "nor at 1280×720").toBeLessThanOrEqual(1);
    const [csvDownload] = await Promise.all([
      page.waitForEvent("download"),
      page.click("[data-command=study-compare-csv]"),
    ]);
    const comparePath = join(artifacts, "study-compare.csv");
    await csvDownload.saveAs(comparePath);
    const first = readFileSync(comparePath, "utf8").split(/\r?\n/)[0]!;
    expect(first, "the caution, then the study's name, as compare --csv writes it").toMatch(/^"?Caution:.*,study: \S/);
    await page.locator("[data-role=variant-editor]").scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(artifacts, "study-variant-1280x720.png") });
    await page.setViewportSize({ width: 1440, height: 900 });
  });

  it("opens a variant as a scenario (after asking about nothing: the study is saved)", async () => {
    await page.locator('[data-variant="deeper"]').click();
    await page.click("[data-command=variant-open-as-scenario]");
    await page.locator("[data-role=headline-table]").waitFor({ timeout: 30_000 });
    expect(await page.locator("[data-role=doc-kind]").count(), "a scenario now").toBe(0);
    expect(await page.locator('input[data-path="diffuser.portCount"]').inputValue(), "the variant's four ports").toBe(
      "4",
    );
    expect(await page.locator('input[data-path="ambient.depth"]').inputValue(), "in 25 m of water").toBe("25");
    expect(await page.locator(".doc-title").textContent(), "named after the variant").toContain("deeper");
  });

  it("refuses a study whose base scenario is a separate file, with a message that says what to do", async () => {
    const path = join(artifacts, "study-base-by-path.json");
    writeFileSync(
      path,
      JSON.stringify({ format: "brinefield-study", version: 1, name: "by path", base: "site.json", variants: [] }),
    );
    await page.click("[data-command=open]");
    const [chooser] = await Promise.all([
      page.waitForEvent("filechooser"),
      page.getByRole("button", { name: "Discard changes" }).click(),
    ]);
    await chooser.setFiles(path);
    await expect
      .poll(() => page.locator("[data-role=notice]").textContent(), { message: "the notice" })
      .toMatch(/base scenario by file \("site\.json"\).*brinefield compare/);
  });

  it("draws a sweep with axis titles in words and units, readable ticks, a legend, a table and a CSV", async () => {
    await page.click("[data-command=study]");
    await page.click("[data-study=sweep]");
    await expect
      .poll(() => page.locator("[data-command=study-sweep]").isDisabled(), {
        message: "scenario read",
        timeout: 30_000,
      })
      .toBe(false);
    const steps = page.locator(".study-form").first().locator("label", { hasText: "steps" }).locator("input");
    await steps.fill("6");
    await page.click("[data-command=study-sweep]");
    const chart = page.locator("[data-role=sweep-line-chart]");
    await chart.waitFor({ timeout: 120_000 });
    const words = await chart.textContent();
    expect(words, "x axis title in words with its unit").toContain("Current speed (m/s)");
    expect(words, "no raw paths on the chart").not.toMatch(/ambient\.currentSpeed/);
    // No two tick labels overprint.
    const boxes = await chart
      .locator("text.tick")
      .evaluateAll((els) =>
        els.map((e) => e.getBoundingClientRect()).map((r) => ({ x: r.x, y: r.y, w: r.width, h: r.height })),
      );
    for (let i = 0; i < boxes.length; i++) {
      for (let k = i + 1; k < boxes.length; k++) {
        const a = boxes[i]!;
        const b = boxes[k]!;
        const overlap = a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
        expect(overlap, `tick labels ${i} and ${k} overprint`).toBe(false);
      }
    }
    expect(await page.locator(".chart-legend").textContent(), "legend").toMatch(
      /required dilution.*meets.*exceeds.*outside scope/,
    );
    await page.screenshot({ path: join(artifacts, "study-sweep-1440x900.png") });
    await page.click("[data-command=sweep-table]");
    expect(await page.locator("[data-role=sweep-table] tbody tr").count(), "one row per point").toBe(6);
    expect(await page.locator("[data-role=sweep-table] th").first().textContent()).toBe("Current speed (m/s)");
    const [download] = await Promise.all([page.waitForEvent("download"), page.click("[data-command=sweep-csv]")]);
    const csvPath = join(artifacts, "study-sweep.csv");
    await download.saveAs(csvPath);
    const lines = readFileSync(csvPath, "utf8").split(/\r?\n/);
    expect(lines[0], "the caution first").toMatch(/^"?Caution:/);
    expect(
      lines.find((l) => l.startsWith("ambient.currentSpeed")),
      "the columns of sweep --csv",
    ).toMatch(
      /^ambient\.currentSpeed \(m\/s\),governingCase,edgeDilution \(-\),requiredDilution \(-\),margin \(-\),verdict/,
    );
    await page.click("[data-command=sweep-chart]");
    await page.getByRole("button", { name: "Add second input" }).click();
    await page.locator(".study-form").nth(1).locator("label", { hasText: "steps" }).locator("input").fill("4");
    await steps.fill("4");
    await page.click("[data-command=study-sweep]");
    await page.locator("[data-role=sweep-heatmap]").waitFor({ timeout: 120_000 });
    const legend = await page.locator("[data-role=heatmap-legend]").textContent();
    expect(legend, "colour legend with the limit line").toMatch(/margin[\s\S]*margin = 1 \(limit\)/);
    await page.setViewportSize({ width: 1280, height: 720 });
    await page.locator("[data-role=sweep-heatmap]").scrollIntoViewIfNeeded();
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(artifacts, "study-sweep-1280x720.png") });
    await page.setViewportSize({ width: 1440, height: 900 });
  });

  it("explains a Monte Carlo run in words, with percentages and the histogram's required line and axes", async () => {
    await page.click("[data-study=monte-carlo]");
    await page.locator(".study-form label", { hasText: "runs" }).locator("input").fill("120");
    await expect
      .poll(() => page.locator("[data-command=study-monte-carlo]").isDisabled(), { timeout: 30_000 })
      .toBe(false);
    await page.click("[data-command=study-monte-carlo]");
    const figure = page.locator("[data-role=monte-carlo-histogram] svg[data-figure=uncertainty-histogram]");
    await figure.waitFor({ timeout: 180_000 });
    const text = await figure.textContent();
    expect(text, "y axis").toContain("number of runs");
    expect(text, "x axis").toContain("dilution at the mixing-zone edge, per-run worst case (×)");
    expect(text, "the required dilution is marked").toMatch(/required [\d.]+×/);
    const explained = await page.locator("[data-role=monte-carlo-explanations]").textContent();
    expect(explained).toContain(PERCENTILE_MEANING);
    expect(explained).toContain(REFUSED_MEANING);
    expect(await page.locator("[data-role=study-exceedance]").textContent(), "chance as a percentage").toMatch(
      /chance of not meeting the limit (\d+(\.\d+)?|< 0\.1|> 99\.9) %/,
    );
    await figure.scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(artifacts, "study-monte-carlo-1440x900.png") });
    await page.setViewportSize({ width: 1280, height: 720 });
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(artifacts, "study-monte-carlo-1280x720.png") });
    await page.setViewportSize({ width: 1440, height: 900 });
  });

  it("opens a design-search row as a scenario", async () => {
    await page.click("[data-study=design]");
    await expect
      .poll(() => page.locator("[data-command=study-design]").isDisabled(), {
        message: "scenario read",
        timeout: 30_000,
      })
      .toBe(false);
    await page.locator(".study-form label", { hasText: "max ports" }).locator("input").fill("2");
    await page.click("[data-command=study-design]");
    await page.locator("[data-role=design-headline]").waitFor({ timeout: 120_000 });
    expect(
      await page.locator("[data-command=design-open-as-scenario]").count(),
      "every listed design can be opened",
    ).toBeGreaterThan(0);
    await page.locator("[data-command=design-open-as-scenario]").first().click();
    // The open document (the variant opened earlier) has unsaved changes: asked first.
    await page.getByRole("button", { name: "Discard changes" }).click();
    await page.locator("[data-role=headline-table]").waitFor({ timeout: 30_000 });
    expect(await page.locator(".doc-title").textContent(), "named after the design").toMatch(/design #1/);
    const ports = page.locator('input[data-path="diffuser.portCount"]');
    // A single-port design has no port-count field; a line of ports shows its count.
    if ((await ports.count()) > 0) expect(await ports.inputValue(), "at most two ports").toMatch(/^[12]$/);
    expect(await page.locator(".doc-title .dirty-dot").count(), "a new, unsaved scenario").toBe(1);
  });

  it("logged no console errors or Content-Security-Policy violations", () => {
    expect(problems).toEqual([]);
  });
});
