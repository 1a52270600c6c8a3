/**
 * Pure policy functions for the Electron window (wired up in main.ts, tested in
 * tests/electron/security.test.ts): which URLs the renderer may load, which web addresses may open in
 * the system browser, and the webPreferences every window gets.
 */
import { isAppUrl } from "./app-protocol";
import { CONTENT_SECURITY_POLICY } from "./csp";

/**
 * May the renderer fetch this URL? Only our own scheme (`brinefield://app/…`, whose handler serves
 * files of the packaged renderer folder only), plus data:/blob: URLs the page made itself and the
 * built-in devtools pages. Everything else — file://, http, https, ws, ftp, ... — is cancelled:
 * Brinefield shows no remote content and reads no file through the page.
 */
export function isAllowedRequestUrl(url: string): boolean {
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
    default:
      return isAppUrl(url);
  }
}

/**
 * Web addresses the app may hand to the system browser (a `window.open` or a link the page tries to
 * follow). Empty: Brinefield links to no web page, so every external address is refused. An entry is an
 * https URL prefix, e.g. "https://docs.example.org/brinefield/".
 */
export const EXTERNAL_LINK_ALLOW_LIST: readonly string[] = [];

/**
 * True only for an https URL under one entry of `allowList`: same host and port, no user or password,
 * and a path equal to the entry's or inside it (an entry ending in "/" is a folder). Anything that does
 * not parse is refused.
 */
export function isAllowedExternalUrl(url: string, allowList: readonly string[] = EXTERNAL_LINK_ALLOW_LIST): boolean {
  let target: URL;
  try {
    target = new URL(url);
  } catch {
    return false;
  }
  if (target.protocol !== "https:" || target.username !== "" || target.password !== "") return false;
  return allowList.some((entry) => {
    let allowed: URL;
    try {
      allowed = new URL(entry);
    } catch {
      return false;
    }
    if (allowed.protocol !== "https:" || allowed.host !== target.host) return false;
    const base = allowed.pathname;
    return target.pathname === base || (base.endsWith("/") && target.pathname.startsWith(base));
  });
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
