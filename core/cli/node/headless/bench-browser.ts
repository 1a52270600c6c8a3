/**
 * Browser-side speed figures for `brinefield bench`: the production web build (dist/renderer, rebuilt
 * when older than its sources) served on 127.0.0.1 and driven in headless Chromium.
 *
 *  - page load → first result: `performance.now()` (from navigation start) when the results table, which
 *    is only rendered with a result's numbers in it, first appears in the page; median of several loads,
 *    each in a fresh browser context (no cache, storage or renderer process carried over);
 *  - typing → new numbers: an edit of the port angle made inside the page (the input's value set and an
 *    `input` event dispatched, as a keystroke does), timed until the results table shows other numbers,
 *    median of several edits. Timed in the page itself, so the driver's round trips are not counted.
 */
import { rendererBuildIsStale, buildRenderer, serveStatic, repositoryRoot } from "./capture-3d";
import { withChromium } from "./chromium";

export interface BrowserBench {
  /** Median ms from navigation start to the first results on screen. */
  readonly loadToFirstResultMs: number;
  /** Median ms from an input change to new numbers on screen. */
  readonly typingToNumbersMs: number;
  readonly loads: readonly number[];
  readonly edits: readonly number[];
}

const LOADS = 5;
const ANGLES = ["50", "55", "45", "58", "42", "52", "47", "60"];

function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
}

/** Records, in the page, when the results table first appears (installed before any page script runs). */
const FIRST_RESULT_PROBE = `(() => {
  const mark = () => {
    if (window.__firstResultMs === undefined && document.querySelector('[data-role="headline-table"]')) {
      window.__firstResultMs = performance.now();
    }
  };
  new MutationObserver(mark).observe(document, { childList: true, subtree: true });
})();`;

/**
 * In-page edit of the port angle, resolving with the ms until the results table shows other numbers.
 * Plain source text (not a compiled function), so no build-tool helpers end up in the page.
 */
const EDIT_AND_WAIT = `(value) => new Promise((resolve, reject) => {
  const input = document.querySelector('input[data-path="diffuser.portAngle"]');
  const table = document.querySelector('[data-role="headline-table"]');
  if (!input || !table) { reject(new Error("port angle input or results table not found")); return; }
  const before = table.textContent;
  let observer = null;
  const timer = setTimeout(() => { if (observer) observer.disconnect(); reject(new Error("no new numbers within 10 s")); }, 10000);
  const t0 = performance.now();
  observer = new MutationObserver(() => {
    const now = document.querySelector('[data-role="headline-table"]');
    if (now && now.textContent !== before) {
      observer.disconnect();
      clearTimeout(timer);
      resolve(performance.now() - t0);
    }
  });
  observer.observe(document.body, { childList: true, subtree: true, characterData: true });
  const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value").set;
  setter.call(input, value);
  input.dispatchEvent(new Event("input", { bubbles: true }));
})`;

export async function benchBrowser(root = repositoryRoot()): Promise<BrowserBench> {
  if (rendererBuildIsStale(root)) await buildRenderer(root, 240_000);
  const { server, url } = await serveStatic(`${root}/dist/renderer`);
  try {
    return await withChromium(async (browser) => {
      // bypassCSP lets the probes below run as page scripts; it does not change what the app loads or runs.
      const freshContext = async () => {
        const context = await browser.newContext({ viewport: { width: 1400, height: 900 }, bypassCSP: true });
        await context.addInitScript(FIRST_RESULT_PROBE);
        return context;
      };
      const loads: number[] = [];
      let context = await freshContext();
      let page = await context.newPage();
      for (let i = 0; i < LOADS; i++) {
        if (i > 0) {
          // A fresh context each time: every load starts cold, as the app does when it is opened.
          await context.close();
          context = await freshContext();
          page = await context.newPage();
        }
        await page.goto(url);
        await page.waitForFunction("window.__firstResultMs !== undefined", null, { timeout: 30_000 });
        loads.push((await page.evaluate("window.__firstResultMs")) as number);
      }
      // Let the first screen settle (3D view, charts) before timing edits.
      await page.waitForFunction(
        `/Up to date/.test(document.querySelector('[data-role="engine-status"]')?.textContent ?? "")`,
        null,
        {
          timeout: 30_000,
        },
      );
      await page.waitForTimeout(500);
      const edits: number[] = [];
      for (const angle of ANGLES) {
        const ms = (await page.evaluate(`(${EDIT_AND_WAIT})(${JSON.stringify(angle)})`)) as number;
        edits.push(ms);
        await page.waitForTimeout(300);
      }
      await context.close();
      return { loadToFirstResultMs: median(loads), typingToNumbersMs: median(edits), loads, edits };
    });
  } finally {
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
