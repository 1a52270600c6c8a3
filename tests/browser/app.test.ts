/**
 * The app in a real browser (Debian chromium, software WebGL): the built renderer served from
 * dist/renderer with the app's Content-Security-Policy, driven as a user would. Screenshots of the main
 * screens go to test-artifacts/ for review.
 */
import { launchChromium } from "../../core/cli/node/headless/chromium";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { mkdirSync, readFileSync, readdirSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { serveDirectory, type StaticServer } from "../renderer/support/static-server";
import { ensureWebBuilt, WEB_DIST } from "./support/web-build";
import { CAUTION } from "../../core/result/contract";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const dist = WEB_DIST;
const artifacts = join(root, "test-artifacts");

interface CanvasSample {
  readonly width: number;
  readonly height: number;
  /** Share of pixels that differ clearly from the view's clear colour (#eef3f7, set in PlumeView.tsx). */
  readonly contentFraction: number;
  readonly distinctColours: number;
  /** Coarse grid of grey levels, for comparing two frames. */
  readonly grid: number[];
}

/** Reads the 3D canvas (its drawing buffer is preserved) through a 2D canvas. */
async function sampleCanvas(page: Page): Promise<CanvasSample> {
  return page.evaluate(() => {
    const source = document.querySelector<HTMLCanvasElement>("canvas[data-role=plume-canvas]");
    if (!source) throw new Error("no 3D canvas");
    const w = 160;
    const h = Math.max(1, Math.round((source.height / source.width) * w));
    const copy = document.createElement("canvas");
    copy.width = w;
    copy.height = h;
    const ctx = copy.getContext("2d", { willReadFrequently: true })!;
    ctx.drawImage(source, 0, 0, w, h);
    const data = ctx.getImageData(0, 0, w, h).data;
    const counts = new Map<number, number>();
    const grid: number[] = [];
    for (let i = 0; i < data.length; i += 4) {
      const key = ((data[i] >> 3) << 10) | ((data[i + 1] >> 3) << 5) | (data[i + 2] >> 3);
      counts.set(key, (counts.get(key) ?? 0) + 1);
      grid.push((data[i] + data[i + 1] + data[i + 2]) / 3);
    }
    const [br, bg, bb] = [0xee, 0xf3, 0xf7];
    let content = 0;
    for (let i = 0; i < data.length; i += 4) {
      if (Math.abs(data[i] - br) + Math.abs(data[i + 1] - bg) + Math.abs(data[i + 2] - bb) > 40) content++;
    }
    return {
      width: source.width,
      height: source.height,
      contentFraction: content / (w * h),
      distinctColours: counts.size,
      grid,
    };
  });
}

function meanDifference(a: CanvasSample, b: CanvasSample): number {
  const n = Math.min(a.grid.length, b.grid.length);
  let sum = 0;
  for (let i = 0; i < n; i++) sum += Math.abs(a.grid[i] - b.grid[i]);
  return sum / n;
}

const demoFiles = () =>
  readdirSync(join(root, "demo-scenarios"))
    .filter((f) => f.endsWith(".json"))
    .sort();

const cell = (page: Page, name: string) => page.locator(`[data-cell="${name}"]`);

let server: StaticServer;
let browser: Browser;
let page: Page;
const consoleProblems: string[] = [];

beforeAll(async () => {
  ensureWebBuilt();
  mkdirSync(artifacts, { recursive: true });
  server = await serveDirectory(dist);
  browser = await launchChromium(); // Debian's /usr/bin/chromium, software WebGL (core/cli/node/headless)
  const context = await browser.newContext({ viewport: { width: 1600, height: 950 }, acceptDownloads: true });
  page = await context.newPage();
  page.on("console", (m) => {
    if (m.type() === "error" || /Content Security Policy/i.test(m.text())) consoleProblems.push(m.text());
  });
  page.on("pageerror", (e) => consoleProblems.push(e.message));
  await page.goto(server.url);
  await page.locator("[data-role=headline-table]").waitFor({ timeout: 60_000 });
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe("the built app", () => {
  it("carries the Content-Security-Policy as a meta tag and runs under it without violations", async () => {
    const html = readFileSync(join(dist, "index.html"), "utf8");
    expect(html, "index.html has the CSP meta tag").toMatch(
      /<meta http-equiv="Content-Security-Policy" content="default-src &#39;self&#39;|<meta http-equiv="Content-Security-Policy" content="default-src 'self'/,
    );
    expect(html, "no inline scripts").not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>/);
    const head = /<head[^>]*>\s*(<[^>]*>)/i.exec(html)?.[1] ?? "";
    expect(head, "the policy is the first tag of the head, before any script").toMatch(
      /^<meta http-equiv="Content-Security-Policy"/,
    );
    expect(html.indexOf("Content-Security-Policy"), "policy before the first script").toBeLessThan(
      html.indexOf("<script"),
    );
    expect(consoleProblems, "no console errors or CSP violations while loading").toEqual([]);
  });

  it("sends the first document to the core worker once, before the app renders", async () => {
    // The page's entry posts the first run before React loads; the engine hook takes it over rather
    // than posting the same file again after the first render.
    const context = await browser.newContext({ viewport: { width: 1600, height: 950 } });
    await context.addInitScript(() => {
      const log: string[] = [];
      (window as unknown as { __engineLog: string[] }).__engineLog = log;
      const post = Worker.prototype.postMessage;
      Worker.prototype.postMessage = function (this: Worker, ...args: Parameters<Worker["postMessage"]>) {
        log.push("request");
        return post.apply(this, args);
      } as Worker["postMessage"];
      new MutationObserver(() => {
        if (!log.includes("render") && document.getElementById("root")?.firstChild) log.push("render");
        if (!log.includes("results") && document.querySelector("[data-role=headline-table]")) log.push("results");
      }).observe(document, { childList: true, subtree: true });
    });
    const fresh = await context.newPage();
    try {
      await fresh.goto(server.url);
      await fresh.locator("[data-role=headline-table]").waitFor({ timeout: 60_000 });
      const log = await fresh.evaluate(() => (window as unknown as { __engineLog: string[] }).__engineLog);
      expect(log.slice(0, 3), "one request, sent before the first render, then the results").toEqual([
        "request",
        "render",
        "results",
      ]);
      expect(
        await fresh.locator("[data-role=engine-status]").getAttribute("data-engine"),
        "core runs in the Web Worker",
      ).toBe("worker");
    } finally {
      await context.close();
    }
  });

  it("opens on the first demo scenario with results, the 3D view and the caution on screen", async () => {
    const caution = page.locator("[data-role=caution]");
    await expect.poll(() => caution.isVisible(), { message: "caution visible" }).toBe(true);
    expect(await caution.textContent(), "the caution text from the result contract").toBe(CAUTION);
    expect(CAUTION.startsWith("Caution"), "the caution begins with the word Caution").toBe(true);
    expect(await page.locator("[data-role=verdict]").isVisible(), "verdict visible").toBe(true);
    expect(
      await page.locator("[data-role=engine-status]").getAttribute("data-engine"),
      "core runs in the Web Worker",
    ).toBe("worker");
    expect(
      await page.locator("[data-role=headline-table] thead th").count(),
      "a column per near-field method plus labels",
    ).toBeGreaterThanOrEqual(3);
    await page.waitForTimeout(500);
    await page.screenshot({ path: join(artifacts, "app-main.png") });
  });

  it("draws a 3D view that is not blank", async () => {
    const sample = await sampleCanvas(page);
    expect(sample.width, "canvas has a size").toBeGreaterThan(200);
    expect(sample.contentFraction, "more than a third of the canvas differs from the clear colour").toBeGreaterThan(
      0.33,
    );
    expect(sample.distinctColours, "shaded geometry, not a flat fill").toBeGreaterThan(50);
  });

  it("updates the results and the 3D view when the port angle changes", async () => {
    const riseCell = cell(page, "integral:Max rise above port (upper edge)");
    const riseBefore = await riseCell.textContent();
    const before = await sampleCanvas(page);
    const angle = page.locator('input[data-path="diffuser.portAngle"]');
    await angle.fill("30");
    await expect
      .poll(() => riseCell.textContent(), { message: "integral max rise changes", timeout: 15_000 })
      .not.toBe(riseBefore);
    await page.waitForTimeout(400);
    const after = await sampleCanvas(page);
    expect(meanDifference(before, after), "mean grey-level change across the 3D view").toBeGreaterThan(1);
    expect(await page.locator(".doc-title .dirty-dot").count(), "the document is marked unsaved").toBe(1);
    await page.screenshot({ path: join(artifacts, "app-port-angle-30.png") });
  });

  it("shows a clear inline error for a bad value and keeps the last good results", async () => {
    const riseCell = cell(page, "integral:Max rise above port (upper edge)");
    const good = await riseCell.textContent();
    const angle = page.locator('input[data-path="diffuser.portAngle"]');
    await angle.fill("120");
    const error = page.locator(".field.has-error .field-error").first();
    await error.waitFor({ timeout: 15_000 });
    expect(await error.textContent(), "the message names the allowed range").toMatch(/0 to 90/);
    expect(
      await page.locator("[data-role=engine-status]").textContent(),
      "status says the results shown are the last good ones",
    ).toMatch(/last good results/);
    expect(await riseCell.textContent(), "results still shown").toBe(good);
    expect(
      await page.locator("[data-command=export-report]").isDisabled(),
      "no report pairing old results with new inputs",
    ).toBe(true);
    expect(await page.locator("[data-command=export-csv]").isDisabled(), "nor a CSV").toBe(true);
    await angle.scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(artifacts, "app-inline-error.png") });
    await angle.fill("30");
    await expect
      .poll(() => page.locator(".field.has-error").count(), { message: "error clears", timeout: 15_000 })
      .toBe(0);
    await expect
      .poll(() => page.locator("[data-command=export-report]").isDisabled(), { message: "export is offered again" })
      .toBe(false);
  });

  it("saves the scenario as a download and opens it again by upload", async () => {
    const saved = join(artifacts, "app-saved-scenario.json");
    // Ctrl+S from inside a field: the shortcut works while typing.
    await page.locator('input[data-path="diffuser.portAngle"]').focus();
    const [download] = await Promise.all([page.waitForEvent("download"), page.keyboard.press("Control+s")]);
    await download.saveAs(saved);
    const file = JSON.parse(readFileSync(saved, "utf8")) as { diffuser: { portAngle: unknown }; format: string };
    expect(file.format, "a scenario file").toBe("brinefield-scenario");
    expect(file.diffuser.portAngle, "the edited port angle was saved").toBe(30);
    expect(await page.locator(".doc-title .dirty-dot").count(), "saved documents are clean").toBe(0);

    // Change it again, then open the saved file: the unsaved change is offered for discarding first.
    await page.locator('input[data-path="diffuser.portAngle"]').fill("45");
    await page.click("[data-command=open]");
    const [chooser] = await Promise.all([
      page.waitForEvent("filechooser"),
      page.getByRole("button", { name: "Discard changes" }).click(),
    ]);
    await chooser.setFiles(saved);
    await expect
      .poll(() => page.locator('input[data-path="diffuser.portAngle"]').inputValue(), {
        message: "the saved angle is back",
        timeout: 15_000,
      })
      .toBe("30");
    expect(await page.locator(".doc-title .dirty-dot").count(), "a freshly opened file is clean").toBe(0);
  });

  it("undoes and redoes edits from the keyboard, and undoing to the saved text makes the document clean", async () => {
    const angle = page.locator('input[data-path="diffuser.portAngle"]');
    await angle.fill("50");
    await expect.poll(() => page.locator(".doc-title .dirty-dot").count(), { message: "edited" }).toBe(1);
    await page.keyboard.press("Control+z");
    await expect.poll(() => angle.inputValue(), { message: "undo restores 30" }).toBe("30");
    expect(await page.locator(".doc-title .dirty-dot").count(), "back at the opened file: clean").toBe(0);
    await page.keyboard.press("Control+Shift+z");
    await expect.poll(() => angle.inputValue(), { message: "redo restores 50" }).toBe("50");
    await page.keyboard.press("Control+z");
    await expect.poll(() => angle.inputValue(), { message: "undo again" }).toBe("30");
  });

  it("takes a receiving-water profile pasted from a spreadsheet", async () => {
    await page.getByRole("radio", { name: "Profile" }).click();
    await page.getByRole("button", { name: "Paste from spreadsheet…" }).click();
    await page
      .locator("#profile-paste")
      .fill("Depth (m)\tSalinity (g/kg)\tTemperature (degC)\n0\t38.0\t24\n6\t38.3\t22\n18\t38.6\t19");
    await page.getByRole("button", { name: "Use these rows" }).click();
    expect(await page.locator(".profile-table tbody tr").count(), "three rows").toBe(3);
    await expect
      .poll(() => page.locator("[data-role=engine-status]").textContent(), {
        message: "runs with the profile",
        timeout: 15_000,
      })
      .toMatch(/Up to date/);
    await page.locator(".profile-table").scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(artifacts, "app-profile.png") });
    await page.keyboard.press("Control+z");
    await page.keyboard.press("Control+z");
    await expect.poll(() => page.locator(".profile-table").count(), { message: "undo back to uniform water" }).toBe(0);
  });

  it("exports an HTML report with the caution and the 3D view embedded", async () => {
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: "Export report" }).click(),
    ]);
    const path = join(artifacts, "app-report.html");
    await download.saveAs(path);
    const html = readFileSync(path, "utf8");
    expect(html, "a complete HTML document").toMatch(/<html/i);
    expect(html, "the caution is printed").toContain("Caution: screening estimate only");
    expect(html, "the 3D view is embedded as a PNG").toContain("data:image/png;base64,");
  });

  it("switches the whole app to US customary units", async () => {
    await page.click("[data-units=us]");
    const depthUnit = page.locator('input[data-path="ambient.depth"] + .unit');
    expect(await depthUnit.textContent(), "depth in feet").toBe("ft");
    await expect
      .poll(() => cell(page, "integral:Impact distance").textContent(), { message: "results in feet" })
      .toMatch(/ft$/);
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(artifacts, "app-us-units.png") });
    await page.click("[data-units=si]");
  });

  it("shows the charts and the start view", async () => {
    await page.getByRole("tab", { name: "Dilution vs distance" }).click();
    await page.locator("[data-role=dilution-chart] .limit-line").waitFor();
    await page.screenshot({ path: join(artifacts, "app-dilution-chart.png") });
    await page.click("[data-command=start]");
    await page.locator("[data-role=start-view]").waitFor();
    expect(await page.locator("[data-demo]").count(), "every bundled demo is offered").toBe(demoFiles().length);
    await page.screenshot({ path: join(artifacts, "app-start-view.png") });
    await page.keyboard.press("Escape");
    await expect
      .poll(() => page.locator("[data-role=start-view]").count(), { message: "Escape closes the start view" })
      .toBe(0);
  });

  it("keeps keyboard focus inside the start view and its question, and Escape closes only the front one", async () => {
    await page.click("[data-command=start]");
    await page.locator("[data-role=start-view]").waitFor();
    const insideStart = () =>
      page.evaluate(() => document.querySelector("[data-role=start-view]")?.contains(document.activeElement) ?? false);
    expect(await insideStart(), "focus moves into the start view when it opens").toBe(true);
    for (let i = 0; i < 25; i++) await page.keyboard.press("Tab");
    expect(await insideStart(), "Tab cycles within the start view, not the page behind it").toBe(true);
    await page.keyboard.press("Shift+Tab");
    expect(await insideStart(), "Shift+Tab too").toBe(true);
    // An edit makes the document dirty, so "New blank scenario" asks first.
    await page.keyboard.press("Escape");
    await page.locator('input[data-path="description"]').fill("edited before the question");
    await page.click("[data-command=start]");
    await page.getByRole("button", { name: /New blank scenario/ }).click();
    const question = page.locator('[role="dialog"][aria-labelledby="confirm-title"]');
    await question.waitFor();
    expect(await page.evaluate(() => document.activeElement?.textContent), "the safe choice has focus").toBe("Cancel");
    for (let i = 0; i < 7; i++) await page.keyboard.press("Tab");
    expect(await question.evaluate((el) => el.contains(document.activeElement)), "Tab stays in the question").toBe(
      true,
    );
    await page.keyboard.press("Escape");
    expect(await question.count(), "Escape closes the question").toBe(0);
    expect(await page.locator("[data-role=start-view]").count(), "the start view behind it stays open").toBe(1);
    await page.keyboard.press("Escape");
    await expect
      .poll(() => page.locator("[data-role=start-view]").count(), { message: "a second Escape closes the start view" })
      .toBe(0);
    expect(await page.locator('input[data-path="description"]').inputValue(), "the edit is kept").toBe(
      "edited before the question",
    );
    await page.keyboard.press("Control+z");
    await expect
      .poll(() => page.locator(".doc-title .dirty-dot").count(), { message: "undone: the document is clean again" })
      .toBe(0);
  });

  it("opens a scenario file dropped on the window", async () => {
    const text = readFileSync(join(root, "demo-scenarios", demoFiles()[0]), "utf8").replace(
      /"name":\s*"[^"]*"/,
      '"name": "Dropped scenario"',
    );
    await page.evaluate((content: string) => {
      const transfer = new DataTransfer();
      transfer.items.add(new File([content], "dropped.json", { type: "application/json" }));
      window.dispatchEvent(new DragEvent("dragover", { dataTransfer: transfer, cancelable: true, bubbles: true }));
      window.dispatchEvent(new DragEvent("drop", { dataTransfer: transfer, cancelable: true, bubbles: true }));
    }, text);
    await expect
      .poll(() => page.locator(".doc-title").textContent(), {
        message: "the dropped file is the document",
        timeout: 10_000,
      })
      .toMatch(/Dropped scenario/);
    await page.locator("[data-role=headline-table]").waitFor();
  });

  it("refuses a dropped file that is not a scenario without asking to discard edits or replacing the document", async () => {
    await page.locator('input[data-path="name"]').fill("Edited before the drop");
    await page.locator('input[data-path="name"]').blur();
    const dropNamed = (name: string, content: string) =>
      page.evaluate(
        ({ name, content }: { name: string; content: string }) => {
          const transfer = new DataTransfer();
          transfer.items.add(new File([content], name));
          window.dispatchEvent(new DragEvent("dragover", { dataTransfer: transfer, cancelable: true, bubbles: true }));
          window.dispatchEvent(new DragEvent("drop", { dataTransfer: transfer, cancelable: true, bubbles: true }));
        },
        { name, content },
      );
    await dropNamed("photo.png", "\u0089PNG\r\n\u001a\nnot a scenario");
    await expect
      .poll(() => page.locator("[data-role=notice]").textContent(), { message: "the refusal is explained" })
      .toMatch(/photo\.png: .*not valid JSON/);
    expect(
      await page.locator('[role="dialog"], [role="alertdialog"]').count(),
      "no unsaved-changes prompt for a file that cannot open",
    ).toBe(0);
    expect(await page.locator('input[data-path="name"]').inputValue(), "the edited document stays").toBe(
      "Edited before the drop",
    );
    await dropNamed("study.json", JSON.stringify({ format: "brinefield-study", version: 1 }));
    await expect
      .poll(() => page.locator("[data-role=notice]").textContent(), { message: "another Brinefield format is named" })
      .toMatch(/study\.json: .*brinefield-study/);
    expect(await page.locator(".doc-title .dirty-dot").count(), "the edits are still unsaved").toBe(1);
    const textDropCancelled = await page.evaluate(() => {
      const transfer = new DataTransfer();
      transfer.setData("text/plain", "38.5");
      const drop = new DragEvent("drop", { dataTransfer: transfer, cancelable: true, bubbles: true });
      document.querySelector('input[data-path="name"]')!.dispatchEvent(drop);
      return drop.defaultPrevented;
    });
    expect(textDropCancelled, "text dragged into a field is left to the field").toBe(false);
  });

  it("autosaves unsaved work and offers to recover it on the next start", async () => {
    page.on("dialog", (dialog) => void dialog.accept());
    await page.locator('input[data-path="name"]').fill("Autosaved edit");
    await page.waitForTimeout(5_600); // one autosave interval (AUTOSAVE_INTERVAL_MS = 5 s) and a little
    await page.reload();
    const recover = page.getByRole("button", { name: "Recover it" });
    await recover.waitFor({ timeout: 30_000 });
    await recover.click();
    await expect
      .poll(() => page.locator('input[data-path="name"]').inputValue(), { message: "recovered name" })
      .toBe("Autosaved edit");
    expect(await page.locator(".doc-title .dirty-dot").count(), "recovered work is still unsaved").toBe(1);
    // Recovered work is unsaved work: it stays autosaved, so a crash right after recovering loses nothing.
    await page.reload();
    await page.getByRole("button", { name: "Recover it" }).waitFor({ timeout: 30_000 });
    await page.getByRole("button", { name: "Discard" }).click();
    expect(await page.getByRole("button", { name: "Recover it" }).count(), "discarded").toBe(0);
  });

  it("mounts the study panel in the Study tab", async () => {
    await page.click("[data-command=study]");
    await expect
      .poll(() => page.locator(".study-workspace").evaluate((el) => el.textContent ?? ""), {
        message: "study panel loaded",
        timeout: 20_000,
      })
      .not.toMatch(/Loading study tools/);
    expect(
      await page.locator(".study-workspace [data-role=caution]").isVisible(),
      "caution stays visible on the Study tab",
    ).toBe(true);
    await page.waitForTimeout(500);
    await page.screenshot({ path: join(artifacts, "app-study-tab.png") });
    await page.click("[data-command=design]");
    await page.locator("[data-role=headline-table]").waitFor();
  });

  it("checks a claimed dilution beside the results and refuses a dilution below 1", async () => {
    await page.click("[data-command=design]");
    await page.locator("[data-role=headline-table]").waitFor();
    const panel = page.locator("[data-role=claim-panel]");
    await panel.locator("summary").click();
    await page.fill("[data-field=claim-dilution]", "1.5");
    await page.click("[data-command=check-claim]");
    await panel.locator("[data-claim-verdict]").waitFor({ timeout: 30_000 });
    expect(
      await panel.locator("[data-claim-verdict]").getAttribute("data-claim-verdict"),
      "1.5 is below every case's edge dilution",
    ).toBe("supported");
    expect(await panel.locator("svg[data-figure=claim-range-bar]").count(), "the range bar").toBe(1);
    expect(await panel.textContent(), "the caution").toContain("screening estimate");
    await panel.screenshot({ path: join(artifacts, "app-claim-panel.png") });
    await page.fill("[data-field=claim-dilution]", "0.5");
    await page.click("[data-command=check-claim]");
    expect(await panel.locator("[role=alert]").textContent(), "refused with a plain message").toMatch(/at least 1/);
  });

  it("applies a design from the design search to the document as one undoable step", async () => {
    const diameter = () => page.locator('input[data-path="diffuser.portDiameter"]').inputValue();
    const before = await diameter();
    await page.click("[data-command=study]");
    await page.click("[data-study=design]", { timeout: 20_000 });
    await expect
      .poll(() => page.locator("[data-command=study-design]").isDisabled(), {
        message: "scenario read",
        timeout: 30_000,
      })
      .toBe(false);
    await page.locator(".study-form label", { hasText: "max ports" }).locator("input").fill("2");
    await page.click("[data-command=study-design]");
    await page.locator("[data-role=design-headline]").waitFor({ timeout: 120_000 });
    expect(await page.locator("[data-role=design-rule]").textContent(), "the ranking rule is shown").toMatch(
      /fewest ports/,
    );
    expect(
      await page.locator("[data-command=apply-design]").count(),
      "the island-cove demo has passing designs with two ports",
    ).toBeGreaterThan(0);
    await page.locator("[data-command=apply-design]").first().click();
    await page.click("[data-command=design]");
    await page.locator("[data-role=headline-table]").waitFor();
    await expect.poll(diameter, { message: "the design's diameter is in the document" }).not.toBe(before);
    await page.click("[data-command=undo]");
    await expect.poll(diameter, { message: "undo restores the previous diffuser" }).toBe(before);
  });

  it("renders only the 3D view on the capture route and reports ready", async () => {
    const text = readFileSync(join(root, "demo-scenarios", demoFiles()[1]), "utf8");
    const context = await browser.newContext({ viewport: { width: 1000, height: 600 } });
    await context.addInitScript((scenarioText: string) => {
      (window as unknown as { __brinefieldCapture: string }).__brinefieldCapture = scenarioText;
    }, text);
    const capture = await context.newPage();
    capture.on("console", (m) => {
      if (m.type() === "error" || /Content Security Policy/i.test(m.text()))
        consoleProblems.push(`capture: ${m.text()}`);
    });
    await capture.goto(`${server.url}?capture=3d`);
    await capture.waitForFunction(() => document.body.dataset.ready === "true", undefined, { timeout: 60_000 });
    expect(
      await capture.locator(".inputs, [data-role=results]").count(),
      "no inputs or results on the capture route",
    ).toBe(0);
    const sample = await sampleCanvas(capture);
    expect(sample.width, "canvas fills the window width").toBeGreaterThanOrEqual(1000);
    expect(sample.contentFraction, "capture is not blank").toBeGreaterThan(0.33);
    await capture.screenshot({ path: join(artifacts, "app-capture-3d.png") });
    await context.close();
  });

  it("logged no console errors or Content-Security-Policy violations during the whole session", () => {
    expect(consoleProblems, "console errors, page errors and CSP reports").toEqual([]);
  });
});
