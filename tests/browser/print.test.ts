/**
 * Print / PDF in the web build: the report opens in a tab of its own with the browser's print dialog on
 * it (where "Save as PDF" is one of the printers), as the desktop app's Print to PDF prints.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { join, resolve, dirname } from "node:path";
import { fileURLToPath } from "node:url";
import { existsSync } from "node:fs";
import { launchChromium } from "../../core/cli/node/headless/chromium";
import { serveDirectory, type StaticServer } from "../renderer/support/static-server";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const dist = join(root, "dist/renderer");

let server: StaticServer;
let browser: Browser;

beforeAll(async () => {
  if (!existsSync(join(dist, "index.html"))) throw new Error("build the renderer first (npm run build)");
  server = await serveDirectory(dist);
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe("Print / PDF in the web build", () => {
  it("opens the report with the caution in a new tab and asks the browser to print it", async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 720 } });
    const page = await context.newPage();
    await page.goto(server.url);
    await page.locator("[data-role=headline-table]").waitFor({ timeout: 60_000 });
    // Count print() calls in the report's tab: the print dialog itself cannot be seen headless.
    await context.addInitScript(() => {
      (window as unknown as { __printed: number }).__printed = 0;
      window.print = () => {
        (window as unknown as { __printed: number }).__printed++;
      };
    });
    const [report] = await Promise.all([context.waitForEvent("page"), page.click("[data-command=print-pdf]")]);
    await report.waitForLoadState("load");
    expect(await report.locator("h1").first().textContent(), "the report's title").toMatch(
      /Brine outfall screening report/,
    );
    expect(await report.textContent("body"), "the caution").toContain("Caution: screening estimate only");
    await expect
      .poll(() => report.evaluate(() => (window as unknown as { __printed?: number }).__printed ?? 0), {
        message: "print() called",
      })
      .toBeGreaterThan(0);
    expect(await page.locator("[data-role=notice]").textContent(), "the app says what happened").toMatch(/Save as PDF/);
    await context.close();
  });
});
