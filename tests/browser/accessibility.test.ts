/**
 * Accessibility of the built app in Chromium: every piece of rendered text meets the WCAG 2.1 AA contrast
 * ratio (success criterion 1.4.3: 4.5:1, or 3:1 for large text of at least 24 px, or 18.66 px bold), computed
 * from the computed styles with the WCAG 2.1 relative-luminance formula; tabs follow the WAI-ARIA
 * Authoring Practices tabs pattern (tablist/tab/tabpanel, arrow keys, Home/End); every chart has a table;
 * and at 1440×900 and 1280×720 no two pieces of text or controls overlap. Screenshots go to test-artifacts/.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { mkdirSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { launchChromium } from "../../core/cli/node/headless/chromium";
import { serveDirectory, type StaticServer } from "../renderer/support/static-server";
import { ensureWebBuilt, WEB_DIST } from "./support/web-build";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const dist = WEB_DIST;
const artifacts = join(root, "test-artifacts");

interface ContrastProblem {
  readonly text: string;
  readonly where: string;
  readonly ratio: number;
  readonly needed: number;
  readonly colours: string;
}

/**
 * Contrast of every visible text node against the background it sits on. The background is composited
 * from the element's ancestors' background colours over white (over black inside the 3D view, whose
 * picture can be dark: the worst case). Disabled controls are exempt (WCAG 2.1, 1.4.3, "incidental").
 */
async function contrastProblems(page: Page): Promise<ContrastProblem[]> {
  return page.evaluate(() => {
    type Rgba = [number, number, number, number];
    const parse = (text: string): Rgba | null => {
      const m = /rgba?\(([^)]+)\)/.exec(text);
      if (!m) return null;
      const parts = m[1]!
        .split(/[\s,/]+/)
        .filter(Boolean)
        .map(Number);
      return [parts[0]!, parts[1]!, parts[2]!, parts.length > 3 ? parts[3]! : 1];
    };
    const over = (top: Rgba, under: Rgba): Rgba => {
      const a = top[3] + under[3] * (1 - top[3]);
      if (a === 0) return [0, 0, 0, 0];
      const mix = (i: number) => (top[i]! * top[3] + under[i]! * under[3] * (1 - top[3])) / a;
      return [mix(0), mix(1), mix(2), a];
    };
    // WCAG 2.1 relative luminance and contrast ratio.
    const lum = (c: Rgba) => {
      const ch = (v: number) => {
        const s = v / 255;
        return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
      };
      return 0.2126 * ch(c[0]) + 0.7152 * ch(c[1]) + 0.0722 * ch(c[2]);
    };
    const ratio = (a: Rgba, b: Rgba) => {
      const [hi, lo] = [lum(a), lum(b)].sort((x, y) => y - x) as [number, number];
      return (hi + 0.05) / (lo + 0.05);
    };
    const describe = (el: Element) => {
      const parts: string[] = [];
      for (let e: Element | null = el; e && parts.length < 3; e = e.parentElement) {
        const cls =
          typeof e.className === "string" && e.className ? `.${e.className.trim().split(/\s+/).join(".")}` : "";
        parts.unshift(`${e.tagName.toLowerCase()}${cls}`);
      }
      return parts.join(" > ");
    };
    const problems: { text: string; where: string; ratio: number; needed: number; colours: string }[] = [];
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    const seen = new Set<Element>();
    for (let node = walker.nextNode(); node; node = walker.nextNode()) {
      const text = node.textContent?.trim() ?? "";
      const el = node.parentElement;
      if (!text || !el || seen.has(el)) continue;
      seen.add(el);
      if (el.closest("script, style, title, option, [hidden]")) continue;
      if (el.closest(":disabled, [aria-disabled=true]")) continue;
      const rects = el.getClientRects();
      if (rects.length === 0) continue;
      const style = getComputedStyle(el);
      if (style.visibility !== "visible" || style.display === "none") continue;
      // Visible on screen only (scrolled-out text is checked when it is shown).
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0 || r.bottom < 0 || r.right < 0 || r.top > innerHeight || r.left > innerWidth)
        continue;
      let opacity = 1;
      for (let e: Element | null = el; e; e = e.parentElement) opacity *= Number(getComputedStyle(e).opacity);
      if (opacity < 0.05) continue;
      const isSvg = el instanceof SVGElement;
      const fg = parse(isSvg ? style.fill : style.color);
      if (!fg) continue;
      const layers: Rgba[] = [];
      let base: Rgba = [255, 255, 255, 1];
      for (let e: Element | null = el; e; e = e.parentElement) {
        if (e.classList.contains("plume-view")) {
          base = [0, 0, 0, 1];
          break;
        }
        const bg = parse(getComputedStyle(e).backgroundColor);
        if (bg && bg[3] > 0) {
          layers.push(bg);
          if (bg[3] >= 1) break;
        }
      }
      let back = base;
      for (let i = layers.length - 1; i >= 0; i--) back = over(layers[i]!, back);
      const front = over([fg[0], fg[1], fg[2], fg[3] * opacity], back);
      const size = parseFloat(style.fontSize);
      const bold = Number(style.fontWeight) >= 700;
      const needed = size >= 24 || (bold && size >= 18.66) ? 3 : 4.5;
      const value = ratio(front, back);
      if (value < needed - 0.005) {
        const hex = (c: Rgba) =>
          `#${c
            .slice(0, 3)
            .map((v) => Math.round(v).toString(16).padStart(2, "0"))
            .join("")}`;
        problems.push({
          text: text.slice(0, 40),
          where: describe(el),
          ratio: Math.round(value * 100) / 100,
          needed,
          colours: `${hex(front)} on ${hex(back)}`,
        });
      }
    }
    return problems;
  });
}

/** Pairs of visible text boxes or controls that overlap (neither containing the other). */
async function overlaps(page: Page, scope: string): Promise<string[]> {
  return page.evaluate((selector: string) => {
    const scopeEl = document.querySelector(selector);
    if (!scopeEl) return [`no ${selector}`];
    const items: { el: Element; r: DOMRect; name: string }[] = [];
    // The three columns too: a column whose content grows past its edge runs into its neighbour.
    const candidates = scopeEl.querySelectorAll(
      "aside.inputs, section.centre, aside.results-column, button, input, select, label, text, .legend-ticks span, .chart-key > span, .compass-label, .legend-key > span, .legend-title, h2, .unit, .field-hint, .field-error",
    );
    for (const el of Array.from(candidates)) {
      const r = el.getBoundingClientRect();
      if (r.width < 1 || r.height < 1) continue;
      if (getComputedStyle(el).visibility !== "visible") continue;
      if (el.closest(".chart-table, [hidden]")) continue;
      // Only what is on screen inside its scrolling container.
      let clipped = false;
      for (let p = el.parentElement; p; p = p.parentElement) {
        const s = getComputedStyle(p);
        if (/(auto|scroll|hidden)/.test(s.overflowY) || /(auto|scroll|hidden)/.test(s.overflowX)) {
          const c = p.getBoundingClientRect();
          if (r.bottom <= c.top + 1 || r.top >= c.bottom - 1 || r.right <= c.left + 1 || r.left >= c.right - 1)
            clipped = true;
        }
      }
      if (clipped || r.bottom < 0 || r.top > innerHeight) continue;
      items.push({
        el,
        r,
        name: `${el.tagName.toLowerCase()}${el.className && typeof el.className === "string" ? "." + el.className.split(" ")[0] : ""} "${(el.textContent || (el as HTMLInputElement).value || "").trim().slice(0, 24)}"`,
      });
    }
    const out: string[] = [];
    for (let i = 0; i < items.length; i++) {
      for (let j = i + 1; j < items.length; j++) {
        const a = items[i]!;
        const b = items[j]!;
        if (a.el.contains(b.el) || b.el.contains(a.el)) continue;
        // A label and its own control may touch (1.5 px for borders that meet); two bare numbers or words
        // side by side on one line (axis ticks, scale labels) need a gap of 2 px or they read as one.
        const w = Math.min(a.r.right, b.r.right) - Math.max(a.r.left, b.r.left);
        const h = Math.min(a.r.bottom, b.r.bottom) - Math.max(a.r.top, b.r.top);
        const bare = (e: Element) => e.tagName.toLowerCase() === "text" || e.matches(".legend-ticks span");
        const minGap = bare(a.el) && bare(b.el) ? -2 : 1.5;
        if (w > minGap && h > 1.5) out.push(`${a.name} × ${b.name}`);
      }
    }
    return out;
  }, scope);
}

let server: StaticServer;
let browser: Browser;

beforeAll(async () => {
  ensureWebBuilt();
  mkdirSync(artifacts, { recursive: true });
  server = await serveDirectory(dist);
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function openApp(width: number, height: number): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height } });
  const page = await context.newPage();
  await page.goto(server.url);
  await page.locator("[data-role=headline-table]").waitFor({ timeout: 60_000 });
  await page.waitForTimeout(600);
  return page;
}

describe.each([
  [1440, 900],
  [1280, 720],
])("at %i×%i", (width, height) => {
  let page: Page;
  beforeAll(async () => {
    page = await openApp(width, height);
  });
  afterAll(async () => {
    await page?.context().close();
  });

  it("has WCAG AA contrast for all text on the Design tab, in SI and US units, with every chart and its table", async () => {
    const found: ContrastProblem[] = [];
    found.push(...(await contrastProblems(page)));
    await page.screenshot({ path: join(artifacts, `a11y-design-${width}.png`) });
    for (const tab of ["Dilution vs distance", "Salinity increase vs distance", "Side view"]) {
      await page.getByRole("tab", { name: tab }).click();
      found.push(...(await contrastProblems(page)));
    }
    await page.click("[data-command=chart-as-table]");
    found.push(...(await contrastProblems(page)));
    await page.click("[data-command=chart-as-table]");
    await page.click("[data-units=us]");
    await page.waitForTimeout(400);
    found.push(...(await contrastProblems(page)));
    await page.click("[data-units=si]");
    expect(found, "text below the WCAG AA contrast ratio").toEqual([]);
  });

  it("shows an inline error with enough contrast", async () => {
    const depth = page.locator('input[data-path="ambient.depth"]');
    await depth.fill("0.5");
    await page.locator('.field.has-error [data-path="ambient.depth"]').waitFor({ timeout: 15_000 });
    const problems = await contrastProblems(page);
    await page.screenshot({ path: join(artifacts, `a11y-error-${width}.png`) });
    await depth.fill("18");
    await expect.poll(() => page.locator(".field.has-error").count(), { timeout: 15_000 }).toBe(0);
    expect(problems, "error text below the WCAG AA contrast ratio").toEqual([]);
  });

  it("has WCAG AA contrast on the Study tab and the start view", async () => {
    await page.click("[data-command=study]");
    await expect
      .poll(() => page.locator(".study-workspace").textContent(), { timeout: 20_000 })
      .not.toMatch(/Loading study tools/);
    await page.waitForTimeout(300);
    const study = await contrastProblems(page);
    await page.screenshot({ path: join(artifacts, `a11y-study-${width}.png`) });
    await page.click("[data-command=design]");
    await page.click("[data-command=start]");
    await page.locator("[data-role=start-view]").waitFor();
    const start = await contrastProblems(page);
    await page.keyboard.press("Escape");
    expect([...study, ...start], "text below the WCAG AA contrast ratio").toEqual([]);
  });

  it("lays out the Design tab without overlapping text or controls, in every 3D view and chart", async () => {
    await page.locator("[data-role=headline-table]").waitFor();
    const found: string[] = [];
    for (const view of ["Reset", "Side", "Plan", "Mixing zone"]) {
      await page.locator(".plume-toolbar button", { hasText: view }).click();
      await page.waitForTimeout(200);
      found.push(...(await overlaps(page, ".app")).map((o) => `${view}: ${o}`));
    }
    for (const tab of ["Dilution vs distance", "Salinity increase vs distance", "Side view"]) {
      await page.getByRole("tab", { name: tab }).click();
      found.push(...(await overlaps(page, ".chart-panel")).map((o) => `${tab}: ${o}`));
    }
    await page.screenshot({ path: join(artifacts, `layout-design-${width}.png`) });
    expect(found, "overlapping text or controls").toEqual([]);
  });
});

describe("tabs", () => {
  let page: Page;
  beforeAll(async () => {
    page = await openApp(1440, 900);
  });
  afterAll(async () => {
    await page?.context().close();
  });

  it("mark up the chart tabs as a tablist whose selected tab labels the tab panel", async () => {
    const list = page.getByRole("tablist", { name: "Chart" });
    expect(await list.getByRole("tab").count(), "three chart tabs").toBe(3);
    const selected = list.locator('[role=tab][aria-selected="true"]');
    const panelId = await selected.getAttribute("aria-controls");
    expect(panelId, "the selected tab names its panel").toBeTruthy();
    const panel = page.locator(`#${panelId}`);
    expect(await panel.getAttribute("role"), "a tabpanel").toBe("tabpanel");
    expect(await panel.getAttribute("aria-labelledby"), "labelled by the selected tab").toBe(
      await selected.getAttribute("id"),
    );
    expect(await list.locator('[role=tab][tabindex="0"]').count(), "only the selected tab is in the Tab order").toBe(1);
  });

  it("move between chart tabs with the arrow keys, Home and End, wrapping at the ends", async () => {
    const focusedName = () =>
      page.evaluate(() =>
        document.activeElement?.getAttribute("role") === "tab" ? document.activeElement.textContent : null,
      );
    const selectedName = () =>
      page.getByRole("tablist", { name: "Chart" }).locator('[aria-selected="true"]').textContent();
    await page.getByRole("tab", { name: "Side view" }).focus();
    await page.keyboard.press("ArrowRight");
    expect(await focusedName(), "focus moves right").toBe("Dilution vs distance");
    expect(await selectedName(), "and selects").toBe("Dilution vs distance");
    await page.locator("[data-role=dilution-chart]").waitFor();
    await page.keyboard.press("End");
    expect(await selectedName(), "End selects the last").toBe("Salinity increase vs distance");
    await page.keyboard.press("ArrowRight");
    expect(await selectedName(), "right from the last wraps to the first").toBe("Side view");
    await page.keyboard.press("ArrowLeft");
    expect(await selectedName(), "left from the first wraps to the last").toBe("Salinity increase vs distance");
    await page.keyboard.press("Home");
    expect(await focusedName(), "Home focuses the first").toBe("Side view");
  });

  it("switch between Design and Study from the keyboard, each in its tab panel", async () => {
    await page.getByRole("tab", { name: "Design" }).focus();
    await page.keyboard.press("ArrowRight");
    const study = page.getByRole("tab", { name: "Study" });
    expect(await study.getAttribute("aria-selected"), "Study selected").toBe("true");
    const panel = page.locator('[role=tabpanel][aria-labelledby="view-tab-study"]');
    await panel.waitFor();
    expect(await panel.locator("[data-role=caution]").count(), "the caution is in the Study panel").toBe(1);
    await page.keyboard.press("ArrowLeft");
    expect(await page.getByRole("tab", { name: "Design" }).getAttribute("aria-selected"), "back to Design").toBe(
      "true",
    );
    await page.locator('[role=tabpanel][aria-labelledby="view-tab-design"] [data-role=headline-table]').waitFor();
  });

  it("offer every chart as a table of its numbers", async () => {
    for (const [tab, table] of [
      ["Side view", "trajectory-table"],
      ["Dilution vs distance", "dilution-table"],
      ["Salinity increase vs distance", "increase-table"],
    ] as const) {
      await page.getByRole("tab", { name: tab }).click();
      await page.click("[data-command=chart-as-table]");
      const rows = page.locator(`[data-role=${table}] tbody tr`);
      expect(await rows.count(), `${tab}: rows of numbers`).toBeGreaterThan(3);
      expect(
        await page.locator(`[data-role=${table}] th`).first().textContent(),
        `${tab}: units in the header`,
      ).toMatch(/\((m|ft)\)/);
      await page.click("[data-command=chart-as-table]");
    }
  });
});
