/**
 * What `npm start` and `npm run web` do, bundled to dist/electron/launcher.mjs by build-main.mjs and
 * called from the two tiny scripts electron/start.mjs and electron/serve-web.mjs. Decisions are pure
 * functions (tests/electron/launcher.test.ts); the run functions only wire them to processes.
 *
 * `npm start`: build the renderer when its output is missing or older than its sources, then start
 * Electron. The electron package fetches its binary on first start; when that binary is missing and
 * cannot be fetched (no internet, Node older than the package needs, no display), the same renderer is
 * served at a localhost URL instead, with a one-line reason and never a stack trace.
 */
import { spawn } from "node:child_process";
import { existsSync, readFileSync, statSync } from "node:fs";
import * as fsp from "node:fs/promises";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { portFromArgs, startWebServer, type StartedWebServer } from "./web-server";

/** The electron 45 package (and its downloader) require this Node version. */
export const ELECTRON_MIN_NODE: readonly [number, number, number] = [22, 12, 0];

export function nodeAtLeast(version: string, min: readonly [number, number, number]): boolean {
  const parts = version
    .replace(/^v/, "")
    .split(".")
    .map((p) => Number.parseInt(p, 10) || 0);
  for (let i = 0; i < 3; i++) {
    const have = parts[i] ?? 0;
    if (have !== min[i]) return have > min[i];
  }
  return true;
}

export interface ElectronProbe {
  /** Folder of the installed `electron` package, or null when it is not installed. */
  readonly packageDir: string | null;
  /** The executable the package would run, or null when it has not been downloaded yet. */
  readonly binaryPath: string | null;
  readonly binaryExists: boolean;
}

/**
 * Locate the Electron executable the way the electron package's index.js does (path.txt inside the
 * package, or ELECTRON_OVERRIDE_DIST_PATH), without triggering its automatic download.
 */
export function probeElectron(
  packageDir: string | null,
  env: Readonly<Record<string, string | undefined>>,
  exists: (path: string) => boolean = existsSync,
  readText: (path: string) => string | null = (path) => {
    try {
      return readFileSync(path, "utf8");
    } catch {
      return null;
    }
  },
): ElectronProbe {
  if (packageDir === null) return { packageDir: null, binaryPath: null, binaryExists: false };
  const executable = readText(join(packageDir, "path.txt"))?.trim() || null;
  const override = env.ELECTRON_OVERRIDE_DIST_PATH;
  let binaryPath: string | null = null;
  if (override) binaryPath = join(override, executable ?? "electron");
  else if (executable) binaryPath = join(packageDir, "dist", executable);
  return { packageDir, binaryPath, binaryExists: binaryPath !== null && exists(binaryPath) };
}

export interface LaunchInputs {
  /** `--web` flag or BRINEFIELD_WEB=1. */
  readonly forceWeb: boolean;
  readonly electron: ElectronProbe;
  /** `process.versions.node`. */
  readonly nodeVersion: string;
  readonly platform: NodeJS.Platform;
  readonly env: Readonly<Record<string, string | undefined>>;
  /** Set after a download attempt failed: a one-line summary of why. */
  readonly downloadFailure?: string | null;
}

export type LaunchPlan =
  | { readonly kind: "electron"; readonly binary: string }
  | { readonly kind: "download"; readonly packageDir: string }
  | { readonly kind: "web"; readonly reason: string; readonly hint: string };

const INTERNET_HINT =
  "With Node ≥ 22.12 and an internet connection, `npm start` fetches Electron once " + "and opens the desktop app.";

/** Electron, a first-start download, or the browser fallback — and why. */
export function decideLaunch(inputs: LaunchInputs): LaunchPlan {
  if (inputs.forceWeb) {
    return {
      kind: "web",
      reason: "browser mode was requested (--web)",
      hint: "Run `npm start` without --web for the desktop app.",
    };
  }
  const { electron } = inputs;
  if (electron.packageDir === null) {
    return {
      kind: "web",
      reason: "the electron package is not installed",
      hint: "Run `npm install`, then `npm start`.",
    };
  }
  const hasDisplay = inputs.platform !== "linux" || Boolean(inputs.env.DISPLAY) || Boolean(inputs.env.WAYLAND_DISPLAY);
  const noDisplay: LaunchPlan = {
    kind: "web",
    reason: "there is no graphical display (DISPLAY and WAYLAND_DISPLAY are unset)",
    hint: "Run `npm start` in a desktop session for the app window.",
  };
  if (electron.binaryExists && electron.binaryPath !== null) {
    return hasDisplay ? { kind: "electron", binary: electron.binaryPath } : noDisplay;
  }
  // The binary is missing: explain that first, since a display alone would not help.
  if (!nodeAtLeast(inputs.nodeVersion, ELECTRON_MIN_NODE)) {
    return {
      kind: "web",
      reason:
        "the Electron runtime is not downloaded yet, " + `and this Node (${inputs.nodeVersion}) is too old to fetch it`,
      hint: INTERNET_HINT,
    };
  }
  if (inputs.downloadFailure != null) {
    return {
      kind: "web",
      reason: `the Electron runtime could not be downloaded (${inputs.downloadFailure})`,
      hint: INTERNET_HINT,
    };
  }
  // No point fetching a window toolkit for a session that cannot show a window.
  if (!hasDisplay) return noDisplay;
  return { kind: "download", packageDir: electron.packageDir };
}

/**
 * Decide with at most one download attempt. `download` fetches the binary and resolves to null on
 * success or a one-line failure; `reprobe` looks for the binary again afterwards.
 */
export async function planLaunch(
  inputs: LaunchInputs,
  download: (packageDir: string) => Promise<string | null>,
  reprobe: () => ElectronProbe,
): Promise<LaunchPlan> {
  const first = decideLaunch(inputs);
  if (first.kind !== "download") return first;
  const failure = await download(first.packageDir);
  const electron = reprobe();
  const downloadFailure =
    failure ?? (electron.binaryExists ? null : "the download finished but no executable was found");
  const second = decideLaunch({ ...inputs, electron, downloadFailure });
  // Never loop: a second "download" verdict means the binary is still missing.
  return second.kind === "download"
    ? { kind: "web", reason: "the Electron runtime is missing", hint: INTERNET_HINT }
    : second;
}

/** First meaningful line of the downloader's error output (no stack frames), at most 160 characters. */
export function summariseDownloadError(stderr: string): string {
  const line = stderr
    .split(/\r?\n/)
    .map((l) => l.trim())
    .find((l) => l.length > 0 && !l.startsWith("at ") && !/^[{}]$/.test(l));
  const text = line ?? "no details";
  return text.length > 160 ? `${text.slice(0, 157)}…` : text;
}

/** After Electron exits: a quick failure (before a window could matter) falls back to the browser. */
export interface ElectronExit {
  readonly code: number | null;
  readonly signal: string | null;
  readonly elapsedMs: number;
}

export function fallbackAfterExit(exit: ElectronExit): boolean {
  const failed = exit.code !== 0 || exit.signal !== null;
  return failed && exit.elapsedMs < 5000 && exit.signal !== "SIGINT" && exit.signal !== "SIGTERM";
}

/** Newest modification time (ms) of any file under `dirs`, skipping node_modules and dot-folders. */
export async function newestSourceMtime(dirs: readonly string[]): Promise<number> {
  let newest = 0;
  async function walk(dir: string): Promise<void> {
    let entries;
    try {
      entries = await fsp.readdir(dir, { withFileTypes: true });
    } catch {
      return;
    }
    for (const entry of entries) {
      if (entry.name.startsWith(".") || entry.name === "node_modules") continue;
      const full = join(dir, entry.name);
      if (entry.isDirectory()) await walk(full);
      else if (entry.isFile()) newest = Math.max(newest, (await fsp.stat(full)).mtimeMs);
    }
  }
  for (const dir of dirs) await walk(dir);
  return newest;
}

/** Rebuild when there is no build yet or any source is newer than it. */
export function isRendererStale(builtIndexMtimeMs: number | null, newestSourceMtimeMs: number): boolean {
  return builtIndexMtimeMs === null || newestSourceMtimeMs > builtIndexMtimeMs;
}

export interface RunOptions {
  /** Repository (or app) root holding package.json, dist/ and node_modules/. */
  readonly root: string;
  readonly argv: readonly string[];
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly log?: (line: string) => void;
}

function mtimeOrNull(path: string): number | null {
  try {
    return statSync(path).mtimeMs;
  } catch {
    return null;
  }
}

function runProcess(
  command: string,
  args: readonly string[],
  options: { cwd: string; capture: boolean; shell?: boolean; timeoutMs?: number },
): Promise<{ code: number | null; stderr: string }> {
  return new Promise((done) => {
    let stderr = "";
    const child = spawn(command, args, {
      cwd: options.cwd,
      stdio: options.capture ? ["ignore", "ignore", "pipe"] : "inherit",
      shell: options.shell ?? false,
      windowsHide: true,
    });
    child.stderr?.on("data", (chunk: Buffer) => {
      if (stderr.length < 20_000) stderr += chunk.toString("utf8");
    });
    const timer = options.timeoutMs
      ? setTimeout(() => {
          stderr = `timed out after ${Math.round(options.timeoutMs! / 1000)} s\n${stderr}`;
          child.kill();
        }, options.timeoutMs)
      : undefined;
    child.on("error", (error) => {
      if (timer) clearTimeout(timer);
      done({ code: null, stderr: error.message });
    });
    child.on("close", (code) => {
      if (timer) clearTimeout(timer);
      done({ code, stderr });
    });
  });
}

/** `npm run build`, through the npm that launched us when there is one. */
async function buildRenderer(root: string, env: RunOptions["env"]): Promise<boolean> {
  const npmCli = env.npm_execpath;
  const result =
    npmCli && /\.c?js$/.test(npmCli)
      ? await runProcess(process.execPath, [npmCli, "run", "build"], { cwd: root, capture: false })
      : await runProcess("npm", ["run", "build"], {
          cwd: root,
          capture: false,
          shell: process.platform === "win32",
        });
  return result.code === 0;
}

async function ensureRenderer(root: string, env: RunOptions["env"], log: (line: string) => void): Promise<boolean> {
  const index = join(root, "dist", "renderer", "index.html");
  const newest = await newestSourceMtime([join(root, "renderer"), join(root, "core")]);
  if (!isRendererStale(mtimeOrNull(index), newest)) return true;
  log("Building the renderer (dist/renderer)…");
  if (await buildRenderer(root, env)) return true;
  log("The renderer build failed (see the messages above); nothing was started.");
  return false;
}

function electronPackageDir(root: string): string | null {
  try {
    return dirname(createRequire(join(root, "package.json")).resolve("electron/package.json"));
  } catch {
    return null;
  }
}

async function downloadElectron(packageDir: string, log: (line: string) => void): Promise<string | null> {
  log("Downloading the Electron runtime (first start only)…");
  const result = await runProcess(process.execPath, [join(packageDir, "install.js")], {
    cwd: packageDir,
    capture: true,
    timeoutMs: 15 * 60_000,
  });
  return result.code === 0 ? null : summariseDownloadError(result.stderr);
}

/** Serve dist/renderer until Ctrl+C; resolves to the exit code. */
async function serveUntilInterrupted(root: string, port: number, log: (line: string) => void): Promise<number> {
  const rendererDir = join(root, "dist", "renderer");
  if (!existsSync(join(rendererDir, "index.html"))) {
    log("dist/renderer/index.html is missing: run `npm run build` first.");
    return 1;
  }
  let server: StartedWebServer;
  try {
    server = await startWebServer({ root: rendererDir, port });
  } catch (error) {
    const detail = error instanceof Error ? error.message.split("\n")[0] : String(error);
    log(`Could not start the local web server: ${detail}`);
    return 1;
  }
  log(`Brinefield is running at ${server.url}  (open it in your browser; Ctrl+C stops it)`);
  return new Promise((done) => {
    const stop = () => {
      void server.close().then(() => done(0));
    };
    process.once("SIGINT", stop);
    process.once("SIGTERM", stop);
  });
}

function electronBinary(probed: string): string {
  try {
    // The package's own answer; safe now because the binary exists, so it will not download.
    const fromPackage: unknown = createRequire(import.meta.url)("electron");
    return typeof fromPackage === "string" && existsSync(fromPackage) ? fromPackage : probed;
  } catch {
    return probed;
  }
}

function runElectron(binary: string, root: string): Promise<ElectronExit> {
  return new Promise((done) => {
    const started = Date.now();
    const env = { ...process.env };
    delete env.ELECTRON_RUN_AS_NODE; // would turn the binary into plain Node
    const child = spawn(binary, [root], { stdio: "inherit", env, windowsHide: false });
    const forward = (signal: NodeJS.Signals) => () => {
      if (child.exitCode === null) child.kill(signal);
    };
    const onInt = forward("SIGINT");
    const onTerm = forward("SIGTERM");
    process.on("SIGINT", onInt);
    process.on("SIGTERM", onTerm);
    const finish = (code: number | null, signal: string | null) => {
      process.off("SIGINT", onInt);
      process.off("SIGTERM", onTerm);
      done({ code, signal, elapsedMs: Date.now() - started });
    };
    child.on("error", () => finish(null, null));
    child.on("close", (code, signal) => finish(code, signal));
  });
}

const defaultLog = (line: string) => console.log(line);

/** `npm start`. Resolves to the process exit code. */
export async function runStart(options: RunOptions): Promise<number> {
  const log = options.log ?? defaultLog;
  const portChoice = portFromArgs(options.argv, options.env);
  if (!portChoice.ok) {
    log(portChoice.message);
    return 2;
  }
  if (!(await ensureRenderer(options.root, options.env, log))) return 1;

  const packageDir = electronPackageDir(options.root);
  const inputs: LaunchInputs = {
    forceWeb: options.argv.includes("--web") || options.env.BRINEFIELD_WEB === "1",
    electron: probeElectron(packageDir, options.env),
    nodeVersion: process.versions.node,
    platform: process.platform,
    env: options.env,
  };
  const plan = await planLaunch(
    inputs,
    (dir) => downloadElectron(dir, log),
    () => probeElectron(packageDir, options.env),
  );

  if (plan.kind === "electron") {
    const exit = await runElectron(electronBinary(plan.binary), options.root);
    if (!fallbackAfterExit(exit)) return exit.code ?? 0;
    const how = exit.signal ?? `exit code ${String(exit.code)}`;
    log(`Electron stopped at start-up (${how}); serving Brinefield in your browser instead.`);
  } else if (plan.kind === "web") {
    log(`Electron cannot start here: ${plan.reason}.`);
    log(`${plan.hint} Meanwhile the same app runs in your browser:`);
  }
  return serveUntilInterrupted(options.root, portChoice.port, log);
}

/** `npm run web` (after the renderer build). Resolves to the process exit code. */
export async function runServeWeb(options: RunOptions): Promise<number> {
  const log = options.log ?? defaultLog;
  const portChoice = portFromArgs(options.argv, options.env);
  if (!portChoice.ok) {
    log(portChoice.message);
    return 2;
  }
  return serveUntilInterrupted(options.root, portChoice.port, log);
}
