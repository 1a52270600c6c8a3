/**
 * Capturing the app's 3D view as a PNG for the report. The built renderer (dist/renderer) is served on
 * 127.0.0.1 by the shared static server (../static-server.ts); Chromium opens `?capture=3d` with the scenario text placed in
 * `window.__brinefieldCapture` by an init script, waits until the renderer sets
 * `document.body.dataset.ready = "true"`, and takes a screenshot. Builds the renderer first when the
 * build is missing or older than its sources. Throws `Capture3dError` with a readable reason otherwise,
 * so callers can leave the image out and say why.
 */
import type { Server } from "node:http";
import { existsSync, readdirSync, statSync } from "node:fs";
import { join, sep, dirname } from "node:path";
import { fileURLToPath } from "node:url";
import { spawn } from "node:child_process";
import { withChromium } from "./chromium";
import { startStaticServer } from "../static-server";

export class Capture3dError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "Capture3dError";
  }
}

/**
 * Repository root: the nearest folder above this file holding the project's package.json and renderer/
 * (this file is core/cli/node/headless/… in the sources and dist/cli/… in the command-line bundle).
 */
export function repositoryRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    if (existsSync(join(dir, "package.json")) && existsSync(join(dir, "renderer"))) return dir;
    const up = dirname(dir);
    if (up === dir) return process.cwd();
    dir = up;
  }
}

export interface Capture3dOptions {
  /** Repository root holding renderer/ and dist/renderer (default: found from this file). */
  readonly root?: string;
  /** Milliseconds to wait for the view to report ready (default 20 000). */
  readonly readyTimeoutMs?: number;
  /** Milliseconds allowed for building the renderer when needed (default 120 000). */
  readonly buildTimeoutMs?: number;
  /** Screenshot size in CSS pixels (default 1200 × 700) and device scale (default 1.5). */
  readonly width?: number;
  readonly height?: number;
  readonly deviceScaleFactor?: number;
}

function newestMtime(dir: string, skip: (p: string) => boolean): number {
  let newest = 0;
  if (!existsSync(dir)) return newest;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, entry.name);
    if (skip(p)) continue;
    if (entry.isDirectory()) newest = Math.max(newest, newestMtime(p, skip));
    else newest = Math.max(newest, statSync(p).mtimeMs);
  }
  return newest;
}

/** True when dist/renderer/index.html is missing or older than any renderer or core source. */
export function rendererBuildIsStale(root: string): boolean {
  const index = join(root, "dist/renderer/index.html");
  if (!existsSync(index)) return true;
  const built = statSync(index).mtimeMs;
  const skip = (p: string) => p.includes(`${sep}node_modules`) || p.includes(`${sep}headless`);
  return newestMtime(join(root, "renderer"), skip) > built || newestMtime(join(root, "core"), skip) > built;
}

/** Builds the renderer with vite (the project's `npm run build`), with a time limit. */
export function buildRenderer(root: string, timeoutMs = 120_000): Promise<void> {
  const config = join(root, "renderer/vite.config.ts");
  if (!existsSync(config))
    return Promise.reject(
      new Capture3dError("the renderer has no vite configuration (renderer/vite.config.ts), so it cannot be built"),
    );
  const vite = join(root, "node_modules/vite/bin/vite.js");
  return new Promise((resolvePromise, reject) => {
    const child = spawn(process.execPath, [vite, "build", "--config", config, "--logLevel", "error"], {
      cwd: root,
      // Always the production build (React's development build is several times slower), whatever
      // NODE_ENV the caller runs under (vitest sets "test").
      env: { ...process.env, NODE_ENV: "production" },
      stdio: ["ignore", "ignore", "pipe"],
    });
    let stderr = "";
    child.stderr.on("data", (d: Buffer) => {
      stderr = (stderr + d.toString()).slice(-4000);
    });
    const timer = setTimeout(() => {
      child.kill("SIGTERM");
      reject(new Capture3dError(`building the renderer took longer than ${Math.round(timeoutMs / 1000)} s`));
    }, timeoutMs);
    child.on("error", (err) => {
      clearTimeout(timer);
      reject(new Capture3dError(`the renderer build could not start: ${err.message}`));
    });
    child.on("exit", (code) => {
      clearTimeout(timer);
      if (code === 0 && existsSync(join(root, "dist/renderer/index.html"))) resolvePromise();
      else
        reject(
          new Capture3dError(
            `the renderer build failed${stderr ? `: ${stderr.trim().split("\n").slice(-3).join(" ")}` : ""}`,
          ),
        );
    });
  });
}

/**
 * Serves `dir` read-only on 127.0.0.1 at a free port, for the headless browser only, with the shared
 * static server (../static-server.ts): GET and HEAD, the Host header must name this server (so a page
 * elsewhere cannot reach it by DNS rebinding), malformed paths, NUL, backslash or anything outside the
 * folder refused, and no request can throw inside the handler.
 */
export async function serveStatic(dir: string): Promise<{ server: Server; url: string }> {
  const started = await startStaticServer({ root: dir, port: 0, fallbackToFreePort: false });
  return { server: started.server, url: started.url };
}

/**
 * Renders the scenario in the app's 3D view and returns a PNG data URI.
 * Throws Capture3dError (renderer cannot be built, route never ready) or ChromiumMissingError.
 */
export async function capture3dView(scenarioText: string, options: Capture3dOptions = {}): Promise<string> {
  const root = options.root ?? repositoryRoot();
  if (rendererBuildIsStale(root)) await buildRenderer(root, options.buildTimeoutMs);
  const { server, url } = await serveStatic(join(root, "dist/renderer"));
  try {
    return await withChromium(async (browser) => {
      const page = await browser.newPage({
        viewport: { width: options.width ?? 1200, height: options.height ?? 700 },
        deviceScaleFactor: options.deviceScaleFactor ?? 1.5,
      });
      const pageErrors: string[] = [];
      page.on("pageerror", (err) => pageErrors.push(err.message));
      await page.addInitScript((text: string) => {
        (window as unknown as { __brinefieldCapture: string }).__brinefieldCapture = text;
      }, scenarioText);
      await page.goto(`${url}?capture=3d`, { waitUntil: "load", timeout: 15_000 });
      const timeout = options.readyTimeoutMs ?? 20_000;
      try {
        await page.waitForFunction(() => document.body?.dataset.ready === "true", undefined, { timeout, polling: 100 });
      } catch {
        const why = pageErrors.length > 0 ? `; page error: ${pageErrors[0]}` : "";
        throw new Capture3dError(`the 3D view did not report ready within ${Math.round(timeout / 1000)} s${why}`);
      }
      const png = await page.screenshot({ type: "png", fullPage: false });
      return `data:image/png;base64,${Buffer.from(png).toString("base64")}`;
    });
  } finally {
    await new Promise<void>((r) => server.close(() => r()));
  }
}
