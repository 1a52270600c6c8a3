/**
 * Launching Debian's Chromium through playwright-core for headless printing and screenshots. Node only:
 * browser-driving code stays outside core/. Fails with a message that says what to install.
 */
import { existsSync } from "node:fs";
import type { Browser } from "playwright-core";

/** Where Debian's chromium package puts the browser; BRINEFIELD_CHROMIUM overrides it. */
export const CHROMIUM_PATH = process.env.BRINEFIELD_CHROMIUM ?? "/usr/bin/chromium";

/** Flags for a quiet, sandbox-free headless run (containers, CI) with software WebGL. */
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--enable-unsafe-swiftshader",
  "--disable-background-networking",
  "--disable-component-update",
  "--no-first-run",
  "--disable-sync",
] as const;

export class ChromiumMissingError extends Error {
  constructor(path: string) {
    super(
      `Chromium was not found at ${path}. Printing a PDF or capturing the 3D view needs a Chromium browser: ` +
        `install Debian's "chromium" package (apt-get install chromium) or set BRINEFIELD_CHROMIUM to the browser's path. ` +
        `The HTML report does not need it.`,
    );
    this.name = "ChromiumMissingError";
  }
}

/** Launches headless Chromium; throws ChromiumMissingError when the executable is absent. */
export async function launchChromium(): Promise<Browser> {
  if (!existsSync(CHROMIUM_PATH)) throw new ChromiumMissingError(CHROMIUM_PATH);
  const { chromium } = await import("playwright-core");
  try {
    return await chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: [...CHROMIUM_ARGS] });
  } catch (err) {
    const msg = err instanceof Error ? err.message.split("\n")[0] : String(err);
    throw new Error(`Chromium at ${CHROMIUM_PATH} could not be started: ${msg}`);
  }
}

/** Runs `fn` with a fresh browser and always closes it. */
export async function withChromium<T>(fn: (browser: Browser) => Promise<T>): Promise<T> {
  const browser = await launchChromium();
  try {
    return await fn(browser);
  } finally {
    await browser.close().catch(() => undefined);
  }
}
