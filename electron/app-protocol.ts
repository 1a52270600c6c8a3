/**
 * The app's own privileged scheme: the window loads `brinefield://app/index.html` instead of a file://
 * URL, so the file-protocol fuse can be off and every response carries our headers. Wired in main.ts
 * (scheme registered before `ready`, handler installed on the default session after it); tested in
 * tests/electron/app-protocol.test.ts without Electron.
 *
 * The handler serves GET and HEAD of regular files inside the packaged renderer folder only: the path is
 * resolved with the static web server's rules (`resolveRequestPath`: no "..", encoded or raw, no
 * backslash, NUL or drive letter), re-checked after symlinks, typed by extension, and every response —
 * errors included — carries the Content-Security-Policy and nosniff. The file lookup is the static web
 * server's (`locateServedFile`), so both refuse the same paths.
 */
import * as fsp from "node:fs/promises";
import { STATUS_TEXT, locateServedFile, mimeTypeFor, securityHeaders } from "./web-server";

export const APP_SCHEME = "brinefield";
export const APP_HOST = "app";
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
/** The one page the window shows; IPC is accepted only from a top frame showing it. */
export const APP_INDEX_URL = `${APP_ORIGIN}/index.html`;

/**
 * Privileges of the scheme: standard (relative URLs, web storage, same-origin module workers) and
 * secure; fetch and CORS-mode requests (module scripts) supported; never `bypassCSP`, no service workers.
 */
export const APP_SCHEME_PRIVILEGES = {
  standard: true,
  secure: true,
  supportFetchAPI: true,
  corsEnabled: true,
  codeCache: true,
} as const;

/** The argument of `protocol.registerSchemesAsPrivileged` (before the app is ready). */
export function appSchemeRegistration(): { scheme: string; privileges: typeof APP_SCHEME_PRIVILEGES }[] {
  return [{ scheme: APP_SCHEME, privileges: APP_SCHEME_PRIVILEGES }];
}

/** True for a URL of our scheme and host (no user, password or port); false for anything else. */
export function isAppUrl(url: string): boolean {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return false;
  }
  return (
    parsed.protocol === `${APP_SCHEME}:` && parsed.host === APP_HOST && parsed.username === "" && parsed.password === ""
  );
}

/** The part of a protocol request the handler reads (Electron passes a fetch `Request`). */
export interface AppProtocolRequest {
  readonly url: string;
  readonly method: string;
}

function plain(status: number, extra: Record<string, string> = {}): Response {
  return new Response(STATUS_TEXT[status] ?? "Error", {
    status,
    headers: { ...securityHeaders(), "Content-Type": "text/plain; charset=utf-8", ...extra },
  });
}

/**
 * Handler for `protocol.handle(APP_SCHEME, …)`.
 * @param rendererDir the packaged renderer folder (dist/renderer inside the app archive)
 */
export function createAppProtocolHandler(rendererDir: string) {
  let realRoot: string | null = null;
  return async function handle(request: AppProtocolRequest): Promise<Response> {
    const head = request.method === "HEAD";
    try {
      if (request.method !== "GET" && !head) return plain(405, { Allow: "GET, HEAD" });
      if (!isAppUrl(request.url)) return plain(421);
      const url = new URL(request.url);
      if (url.port !== "") return plain(421);
      realRoot ??= await fsp.realpath(rendererDir);
      const located = await locateServedFile(rendererDir, realRoot, url.pathname);
      if (!located.ok) return plain(located.status);
      const body = head ? null : await fsp.readFile(located.file);
      return new Response(body, {
        status: 200,
        headers: {
          ...securityHeaders(),
          "Content-Type": mimeTypeFor(located.file),
          "Content-Length": String(located.size),
        },
      });
    } catch {
      return plain(500);
    }
  };
}
