import { mkdir, mkdtemp, rm, utimes, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import {
  decideLaunch,
  fallbackAfterExit,
  isRendererStale,
  newestSourceMtime,
  nodeAtLeast,
  planLaunch,
  probeElectron,
  summariseDownloadError,
  type ElectronProbe,
  type LaunchInputs,
} from "../../electron/launcher";

const PACKAGE = "/app/node_modules/electron";
const installed: ElectronProbe = {
  packageDir: PACKAGE,
  binaryPath: `${PACKAGE}/dist/electron`,
  binaryExists: true,
};
const notDownloaded: ElectronProbe = { packageDir: PACKAGE, binaryPath: null, binaryExists: false };

function inputs(overrides: Partial<LaunchInputs> = {}): LaunchInputs {
  return {
    forceWeb: false,
    electron: installed,
    nodeVersion: "22.12.0",
    platform: "linux",
    env: { DISPLAY: ":0" },
    ...overrides,
  };
}

describe("decideLaunch()", () => {
  it("starts Electron when its binary is present and there is a display", () => {
    expect(decideLaunch(inputs()), "electron").toEqual({ kind: "electron", binary: installed.binaryPath });
    expect(decideLaunch(inputs({ platform: "win32", env: {} })), "Windows needs no DISPLAY").toMatchObject({
      kind: "electron",
    });
    expect(decideLaunch(inputs({ env: { WAYLAND_DISPLAY: "wayland-0" } })), "Wayland counts").toMatchObject({
      kind: "electron",
    });
  });

  it("falls back to the browser when the binary is missing and Node is too old to fetch it", () => {
    const plan = decideLaunch(inputs({ electron: notDownloaded, nodeVersion: "20.20.2" }));
    expect(plan.kind, "web fallback").toBe("web");
    expect(plan.kind === "web" && plan.reason, "reason names this Node version").toMatch(
      /Node \(20\.20\.2\) is too old/,
    );
    expect(plan.kind === "web" && plan.hint, "hint: Node ≥ 22.12 with internet fetches it").toMatch(
      /Node ≥ 22\.12 and an internet/,
    );
  });

  it("asks for a download when the binary is missing on a recent Node, and falls back once it failed", () => {
    expect(decideLaunch(inputs({ electron: notDownloaded, nodeVersion: "24.1.0" })), "download").toEqual({
      kind: "download",
      packageDir: notDownloaded.packageDir,
    });
    const downloadFailure = "getaddrinfo ENOTFOUND github.com";
    const failed = decideLaunch(inputs({ electron: notDownloaded, downloadFailure }));
    expect(failed.kind === "web" && failed.reason, "failure reason shown").toMatch(
      /could not be downloaded \(getaddrinfo/,
    );
  });

  it("falls back for --web, a missing electron package and a headless Linux session", () => {
    expect(decideLaunch(inputs({ forceWeb: true })).kind, "--web").toBe("web");
    expect(
      decideLaunch(inputs({ electron: { packageDir: null, binaryPath: null, binaryExists: false } })).kind,
      "no package",
    ).toBe("web");
    const headless = decideLaunch(inputs({ env: {} }));
    expect(headless.kind === "web" && headless.reason, "no display").toMatch(/no graphical display/);
    const headlessMissing = decideLaunch(inputs({ env: {}, electron: notDownloaded, nodeVersion: "24.0.0" }));
    expect(headlessMissing.kind, "no download for a headless session").toBe("web");
  });

  it("explains the missing binary before the missing display", () => {
    const plan = decideLaunch(inputs({ env: {}, electron: notDownloaded, nodeVersion: "20.20.2" }));
    expect(plan.kind === "web" && plan.reason, "binary reason first").toMatch(/not downloaded yet/);
  });
});

describe("planLaunch()", () => {
  it("serves in the browser when the first-start download fails", async () => {
    let downloads = 0;
    const plan = await planLaunch(
      inputs({ electron: notDownloaded, nodeVersion: "22.12.0" }),
      async () => {
        downloads++;
        return "RequestError: getaddrinfo EAI_AGAIN github.com";
      },
      () => notDownloaded,
    );
    expect(downloads, "tried once").toBe(1);
    expect(plan.kind === "web" && plan.reason, "web with the download error").toMatch(/EAI_AGAIN/);
  });

  it("starts Electron after a successful download", async () => {
    const plan = await planLaunch(
      inputs({ electron: notDownloaded }),
      async () => null,
      () => installed,
    );
    expect(plan, "electron").toEqual({ kind: "electron", binary: installed.binaryPath });
  });

  it("does not loop when the download reports success but no binary appears", async () => {
    const plan = await planLaunch(
      inputs({ electron: notDownloaded }),
      async () => null,
      () => notDownloaded,
    );
    expect(plan.kind, "web").toBe("web");
  });
});

describe("probeElectron()", () => {
  let dir: string;
  beforeEach(async () => {
    dir = await mkdtemp(join(tmpdir(), "brinefield-probe-"));
  });
  afterEach(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it("reads path.txt like the electron package does, without downloading", async () => {
    expect(probeElectron(dir, {}), "no path.txt yet").toEqual({
      packageDir: dir,
      binaryPath: null,
      binaryExists: false,
    });
    await writeFile(join(dir, "path.txt"), "electron");
    expect(probeElectron(dir, {}).binaryExists, "path.txt but no dist").toBe(false);
    await mkdir(join(dir, "dist"));
    await writeFile(join(dir, "dist", "electron"), "");
    expect(probeElectron(dir, {}), "installed").toEqual({
      packageDir: dir,
      binaryPath: join(dir, "dist", "electron"),
      binaryExists: true,
    });
  });

  it("honours ELECTRON_OVERRIDE_DIST_PATH and reports a missing package", () => {
    const env = { ELECTRON_OVERRIDE_DIST_PATH: "/opt/electron" };
    const probe = probeElectron(
      dir,
      env,
      () => true,
      () => null,
    );
    expect(probe.binaryPath, "override").toBe(join("/opt/electron", "electron"));
    expect(probeElectron(null, {}).packageDir, "not installed").toBeNull();
  });
});

describe("helpers", () => {
  it("nodeAtLeast() compares versions numerically", () => {
    expect(nodeAtLeast("22.12.0", [22, 12, 0]), "equal").toBe(true);
    expect(nodeAtLeast("v22.9.1", [22, 12, 0]), "22.9 < 22.12").toBe(false);
    expect(nodeAtLeast("23.0.0", [22, 12, 0]), "major above").toBe(true);
    expect(nodeAtLeast("20.20.2", [22, 12, 0]), "older major").toBe(false);
  });

  it("summariseDownloadError() keeps the first message line and drops stack frames", () => {
    const stderr =
      "\nRequestError: getaddrinfo ENOTFOUND github.com\n" +
      "    at ClientRequest.<anonymous> (/x/y.js:1:2)\n    at emit\n";
    expect(summariseDownloadError(stderr), "one line").toBe("RequestError: getaddrinfo ENOTFOUND github.com");
    expect(summariseDownloadError(""), "empty").toBe("no details");
    expect(summariseDownloadError("x".repeat(500)).length, "capped").toBeLessThanOrEqual(160);
  });

  it("fallbackAfterExit() falls back only for an early failure", () => {
    expect(fallbackAfterExit({ code: 127, signal: null, elapsedMs: 300 }), "missing libraries at start").toBe(true);
    expect(fallbackAfterExit({ code: null, signal: null, elapsedMs: 10 }), "spawn error").toBe(true);
    expect(fallbackAfterExit({ code: 0, signal: null, elapsedMs: 300 }), "clean quit").toBe(false);
    expect(fallbackAfterExit({ code: 1, signal: null, elapsedMs: 60_000 }), "late crash is not a start failure").toBe(
      false,
    );
    expect(fallbackAfterExit({ code: null, signal: "SIGINT", elapsedMs: 300 }), "Ctrl+C").toBe(false);
  });

  it("isRendererStale() rebuilds when there is no build or a source is newer", async () => {
    expect(isRendererStale(null, 0), "no build").toBe(true);
    expect(isRendererStale(2000, 1000), "build newer").toBe(false);
    expect(isRendererStale(1000, 2000), "source newer").toBe(true);
    const dir = await mkdtemp(join(tmpdir(), "brinefield-mtime-"));
    try {
      await mkdir(join(dir, "src", "node_modules"), { recursive: true });
      await writeFile(join(dir, "src", "a.ts"), "");
      await writeFile(join(dir, "src", "node_modules", "b.js"), "");
      await utimes(join(dir, "src", "a.ts"), 1000, 1000);
      await utimes(join(dir, "src", "node_modules", "b.js"), 5000, 5000);
      expect(await newestSourceMtime([join(dir, "src"), join(dir, "absent")]), "node_modules skipped").toBe(1_000_000);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
