/**
 * The ambient record in the app (Debian chromium): the record demo runs its steps on worker threads
 * with progress, shows the record's verdict, figures over time and the duration curve; Cancel stops a
 * record and leaves no verdict; a record pasted into the inputs is saved in the scenario and run.
 */
import { launchChromium } from "../../core/cli/node/headless/chromium";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { mkdirSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { serveDirectory, type StaticServer } from "../renderer/support/static-server";
import { ensureWebBuilt, WEB_DIST } from "./support/web-build";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const dist = WEB_DIST;
const artifacts = join(root, "test-artifacts");

let server: StaticServer;
let browser: Browser;
let page: Page;
const problems: string[] = [];

beforeAll(async () => {
  ensureWebBuilt();
  mkdirSync(artifacts, { recursive: true });
  server = await serveDirectory(dist);
  browser = await launchChromium();
  page = await (await browser.newContext({ viewport: { width: 1600, height: 1000 } })).newPage();
  page.on("pageerror", (e) => problems.push(e.message));
  page.on("console", (m) => m.type() === "error" && problems.push(m.text()));
  // Counts the Web Workers the page starts and the record tasks it posts to them, to check the record's
  // workers are kept warm between runs.
  await page.addInitScript(() => {
    const counts = { workers: 0, recordTasks: 0 };
    (window as unknown as { __brinefieldWorkerCounts: typeof counts }).__brinefieldWorkerCounts = counts;
    const Base = window.Worker;
    window.Worker = class extends Base {
      constructor(url: string | URL, options?: WorkerOptions) {
        super(url, options);
        counts.workers++;
      }
      override postMessage(message: unknown, transfer?: unknown) {
        if ((message as { kind?: string } | null)?.kind === "record-steps") counts.recordTasks++;
        super.postMessage(message, transfer as Transferable[]);
      }
    };
  });
  await page.goto(server.url);
  await page.locator("[data-role=headline-table]").waitFor({ timeout: 60_000 });
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe("ambient record in the app", () => {
  it("runs the record demo on worker threads, then shows its verdict, figures and intake", async () => {
    await page.locator("[data-command=start]").click();
    await page.locator("[data-demo=tern-point]").click();
    await page.locator("[data-role=record-status][data-state=running]").waitFor({ timeout: 60_000 });
    await page.locator("[data-role=record-status][data-state=done]").waitFor({ timeout: 240_000 });
    const summary = await page.locator("[data-role=record-summary]").textContent();
    expect(summary).toMatch(/Ambient record: 720 steps/);
    expect(summary).toMatch(/Plant intake 350 m/);
    expect(await page.locator("[data-role=verdict]").textContent()).toMatch(/record of 720 steps/);
    await page.locator("[data-command=chart-record]").click();
    expect(
      await page.locator("[data-role=record-time-chart] svg").count(),
      "edge dilution and salinity increase against time",
    ).toBe(2);
    await page.locator("[data-command=chart-duration]").click();
    expect(await page.locator("[data-role=record-duration-chart] #record-duration-chart").count()).toBe(1);
    await page.screenshot({ path: join(artifacts, "app-record.png") });
    expect(problems).toEqual([]);
  }, 300_000);

  it("runs the record again after an edit on the same, warm workers", async () => {
    type Counts = { workers: number; recordTasks: number };
    const counts = () =>
      page.evaluate(() => ({
        ...(window as unknown as { __brinefieldWorkerCounts: Counts }).__brinefieldWorkerCounts,
      }));
    const before = await counts();
    expect(before.recordTasks, "the first run posted its tasks").toBeGreaterThan(0);
    const depth = page.getByLabel("Water depth at diffuser");
    await depth.fill("17");
    await depth.press("Enter");
    await page.waitForFunction(
      (n) =>
        (window as unknown as { __brinefieldWorkerCounts: Counts }).__brinefieldWorkerCounts.recordTasks > n &&
        document.querySelector("[data-role=record-status][data-state=done]") !== null,
      before.recordTasks,
      { timeout: 240_000 },
    );
    const after = await counts();
    expect(after.workers, "no worker started for the second run").toBe(before.workers);
    expect(problems).toEqual([]);
  }, 300_000);

  it("Cancel stops the record and leaves no verdict over it", async () => {
    await page.locator("[data-command=record-restart], [data-command=record-remove]").first().waitFor();
    // Any edit re-runs the record; cancel it while it runs. A fast machine finishes the 720 steps in a few
    // seconds, so the click is made in the page the moment the Cancel button appears.
    await page.evaluate(() => {
      const observer = new MutationObserver(() => {
        const cancel = document.querySelector<HTMLButtonElement>("[data-command=record-cancel]");
        if (cancel) {
          observer.disconnect();
          cancel.click();
        }
      });
      observer.observe(document.body, { subtree: true, childList: true });
    });
    const depth = page.getByLabel("Water depth at diffuser");
    await depth.fill("16.5");
    await depth.press("Enter");
    await page.locator("[data-role=record-status][data-state=cancelled]").waitFor({ timeout: 30_000 });
    expect(
      await page.locator("[data-role=verdict]").getAttribute("data-verdict"),
      "no verdict without the record",
    ).toBe("outside-scope");
  }, 120_000);

  it("a pasted record is saved in the scenario and run", async () => {
    await page.locator("[data-command=record-paste]").click();
    await page
      .locator("[data-role=record-paste-text]")
      .fill("time (h),currentSpeed (m/s),currentDirection (deg)\n0,0.1,40\n1,0.3,220\n2,0.05,40\n");
    await page.locator("[data-command=record-use-paste]").click();
    await page.screenshot({ path: join(artifacts, "app-record-paste.png") });
    await expect
      .poll(() => page.locator("[data-role=record-steps]").textContent(), { timeout: 30_000 })
      .toMatch(/3 steps/);
    await expect
      .poll(() => page.locator("[data-role=record-summary]").textContent(), { timeout: 60_000 })
      .toMatch(/Ambient record: 3 steps/);
    expect(
      await page.locator("[data-role=record-status]").count(),
      "the cancelled long record's status does not stay beside the short record's verdict",
    ).toBe(0);
  }, 120_000);

  it("shows the record as a table, one row per step, and removing it takes its chart tabs away", async () => {
    await page.locator("[data-command=chart-record]").click();
    await page.locator("[data-command=chart-as-table]").click();
    await expect.poll(() => page.locator("[data-role=record-table] tbody tr").count(), { timeout: 30_000 }).toBe(3);
    expect(await page.locator("[data-role=record-table] th").first().textContent()).toBe("Time (h)");
    expect(await page.locator("[data-role=record-table] tbody tr").nth(1).locator("td").first().textContent()).toBe(
      "1",
    );
    await page.locator("[data-role=record-table]").scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(artifacts, "app-record-table.png") });
    await page.locator("[data-command=chart-as-table]").click();
    await page.locator("[data-command=chart-duration]").click();
    await page.locator("[data-command=record-remove]").click();
    await expect.poll(() => page.locator("[data-command=chart-duration]").count(), { timeout: 30_000 }).toBe(0);
    expect(await page.locator("[data-role=record-duration-chart]").count(), "no record chart left").toBe(0);
    expect(
      await page.locator("[role=tablist][aria-label=Chart] [aria-selected=true]").textContent(),
      "the side view (trajectory) tab is selected",
    ).toBe("Side view");
  }, 60_000);
});
