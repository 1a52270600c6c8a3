/**
 * Pure policy functions for the Electron window (wired up in main.ts, tested in
 * tests/electron/security.test.ts): which URLs the renderer may load, and the webPreferences every
 * window gets.
 */
import { pathToFileURL } from "node:url";
import { sep } from "node:path";
import { CONTENT_SECURITY_POLICY } from "./csp";

/**
 * May the renderer fetch this URL? Only files inside the built renderer folder, plus data:/blob: URLs
 * the page made itself and the built-in devtools pages. Everything remote (http, https, ws, ftp, ...)
 * is cancelled: Brinefield shows no remote content.
 */
export function isAllowedRequestUrl(
  url: string,
  rendererDir: string,
  platform: NodeJS.Platform = process.platform,
): boolean {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return false;
  }
  switch (parsed.protocol) {
    case "data:":
    case "blob:":
    case "devtools:":
      return true;
    case "file:": {
      const root = pathToFileURL(rendererDir.endsWith(sep) ? rendererDir : rendererDir + sep).href;
      // The URL parser has already resolved "..", "%2e%2e" and friends, so a prefix test on the
      // normalised href cannot be escaped. Windows paths compare case-insensitively.
      const fold = (s: string) => (platform === "win32" ? s.toLowerCase() : s);
      return parsed.host === "" && fold(parsed.href).startsWith(fold(root));
    }
    default:
      return false;
  }
}

/** Response headers with our CSP (and nosniff) forced on, replacing whatever was there. */
export function withSecurityHeaders(
  headers: Record<string, string | string[]> | undefined,
): Record<string, string | string[]> {
  const out: Record<string, string | string[]> = {};
  for (const [key, value] of Object.entries(headers ?? {})) {
    const lower = key.toLowerCase();
    if (lower === "content-security-policy" || lower === "x-content-type-options") continue;
    out[key] = value;
  }
  out["Content-Security-Policy"] = [CONTENT_SECURITY_POLICY];
  out["X-Content-Type-Options"] = ["nosniff"];
  return out;
}

/** The webPreferences of the Brinefield window (sandboxed, isolated, no Node in the page). */
export function secureWebPreferences(preloadPath: string, isDev: boolean) {
  return {
    preload: preloadPath,
    contextIsolation: true,
    sandbox: true,
    nodeIntegration: false,
    nodeIntegrationInWorker: false,
    nodeIntegrationInSubFrames: false,
    webSecurity: true,
    allowRunningInsecureContent: false,
    experimentalFeatures: false,
    webviewTag: false,
    navigateOnDragDrop: false,
    spellcheck: false,
    devTools: isDev,
  } as const;
}
