/**
 * The one static file server: the built renderer (dist/renderer) on 127.0.0.1 for `npm run web`, for
 * `npm start` when Electron cannot run (both through electron/web-server.ts, which adds the app's
 * Content-Security-Policy), and for the headless 3D capture of the report (headless/capture-3d.ts).
 * Read-only: GET and HEAD of regular files inside the root, nosniff, no directory listings and no path
 * traversal. Its MIME table and path rules also serve the app's brinefield:// scheme (electron/app-protocol.ts).
 * Tested in tests/electron/web-server.test.ts.
 */
import { createReadStream } from "node:fs";
import * as fsp from "node:fs/promises";
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { extname, isAbsolute, relative, resolve, sep } from "node:path";

export const DEFAULT_WEB_PORT = 5178;
export const WEB_HOST = "127.0.0.1";

export const MIME_TYPES: Readonly<Record<string, string>> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".mjs": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".json": "application/json; charset=utf-8",
  ".map": "application/json; charset=utf-8",
  ".svg": "image/svg+xml",
  ".png": "image/png",
  ".jpg": "image/jpeg",
  ".jpeg": "image/jpeg",
  ".gif": "image/gif",
  ".webp": "image/webp",
  ".ico": "image/x-icon",
  ".wasm": "application/wasm",
  ".woff": "font/woff",
  ".woff2": "font/woff2",
  ".ttf": "font/ttf",
  ".txt": "text/plain; charset=utf-8",
  ".csv": "text/csv; charset=utf-8",
};

export function mimeTypeFor(path: string): string {
  return MIME_TYPES[extname(path).toLowerCase()] ?? "application/octet-stream";
}

/** Headers sent with every response, errors included (with the page's Content-Security-Policy when given). */
export function securityHeaders(contentSecurityPolicy?: string): Record<string, string> {
  return {
    ...(contentSecurityPolicy === undefined ? {} : { "Content-Security-Policy": contentSecurityPolicy }),
    "X-Content-Type-Options": "nosniff",
    "X-Frame-Options": "DENY",
    "Referrer-Policy": "no-referrer",
    "Cross-Origin-Opener-Policy": "same-origin",
    "Cross-Origin-Resource-Policy": "same-origin",
    "Cache-Control": "no-cache",
  };
}

export type ResolvedRequest =
  { readonly ok: true; readonly file: string } | { readonly ok: false; readonly status: 400 | 403 | 404 };

/**
 * Map a request target ("/assets/app.js?x=1") to a file under `root`, refusing anything that could
 * leave it: encoded or raw "..", backslashes, NUL, drive letters, absolute paths. "/" maps to
 * index.html. Pure (no file-system access); `serveFile` re-checks the real path after symlinks.
 */
export function resolveRequestPath(root: string, target: string): ResolvedRequest {
  const rawPath = target.split(/[?#]/, 1)[0] ?? "";
  if (!rawPath.startsWith("/")) return { ok: false, status: 400 };
  let decoded: string;
  try {
    decoded = decodeURIComponent(rawPath);
  } catch {
    return { ok: false, status: 400 };
  }
  if (decoded.includes("\0") || decoded.includes("\\")) return { ok: false, status: 400 };
  const segments = decoded.split("/").filter((s) => s.length > 0);
  // ".." climbs, ":" would name a drive or a Windows alternate data stream.
  if (segments.some((s) => s === ".." || s === "." || s.includes(":"))) return { ok: false, status: 403 };
  if (segments.length === 0) segments.push("index.html");
  const base = resolve(root);
  const file = resolve(base, ...segments);
  const rel = relative(base, file);
  if (rel === "" || rel.startsWith("..") || isAbsolute(rel)) return { ok: false, status: 403 };
  return { ok: true, file };
}

function send(res: ServerResponse, status: number, body: string, head: boolean, csp: string | undefined): void {
  res.writeHead(status, {
    ...securityHeaders(csp),
    "Content-Type": "text/plain; charset=utf-8",
    "Content-Length": Buffer.byteLength(body),
  });
  res.end(head ? undefined : body);
}

export const STATUS_TEXT: Readonly<Record<number, string>> = {
  400: "Bad request",
  403: "Forbidden",
  404: "Not found",
  405: "Method not allowed",
  421: "Misdirected request",
  500: "Internal error",
};

/** Only requests addressed to the loopback name we listen on (blocks DNS-rebinding pages). */
export function isAllowedHost(hostHeader: string | undefined, port: number): boolean {
  if (!hostHeader) return false;
  const allowed = [`127.0.0.1:${port}`, `localhost:${port}`, `[::1]:${port}`];
  return allowed.includes(hostHeader.toLowerCase());
}

export type LocatedFile =
  | { readonly ok: true; readonly file: string; readonly size: number }
  | { readonly ok: false; readonly status: 400 | 403 | 404 };

/**
 * The regular file a request path names inside `realRoot` (the real path of the served folder):
 * `resolveRequestPath`'s rules, then the real path after symlinks must still be inside, and folders are
 * never served. Shared by this server and the app's brinefield:// scheme.
 */
export async function locateServedFile(root: string, realRoot: string, target: string): Promise<LocatedFile> {
  const resolved = resolveRequestPath(root, target);
  if (!resolved.ok) return resolved;
  let real: string;
  try {
    real = await fsp.realpath(resolved.file);
  } catch {
    return { ok: false, status: 404 };
  }
  // A symlink inside the root must not lead outside it.
  if (real !== realRoot && !real.startsWith(realRoot.endsWith(sep) ? realRoot : realRoot + sep)) {
    return { ok: false, status: 403 };
  }
  const info = await fsp.stat(real);
  if (!info.isFile()) return { ok: false, status: 404 }; // folders are never listed
  return { ok: true, file: real, size: info.size };
}

export interface StaticHandlerOptions {
  readonly root: string;
  /** Port the server listens on, for the Host header check; 0 disables that check. */
  readonly port: () => number;
  /** Content-Security-Policy sent with every response (none when omitted). */
  readonly contentSecurityPolicy?: string;
}

export function createStaticHandler(options: StaticHandlerOptions) {
  const root = resolve(options.root);
  const csp = options.contentSecurityPolicy;
  let realRoot: string | null = null;

  return async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const head = req.method === "HEAD";
    try {
      if (req.method !== "GET" && !head) {
        res.setHeader("Allow", "GET, HEAD");
        send(res, 405, STATUS_TEXT[405], head, csp);
        return;
      }
      const port = options.port();
      if (port !== 0 && !isAllowedHost(req.headers.host, port)) {
        send(res, 421, STATUS_TEXT[421], head, csp);
        return;
      }
      realRoot ??= await fsp.realpath(root);
      const located = await locateServedFile(root, realRoot, req.url ?? "/");
      if (!located.ok) {
        send(res, located.status, STATUS_TEXT[located.status], head, csp);
        return;
      }
      const real = located.file;
      res.writeHead(200, {
        ...securityHeaders(csp),
        "Content-Type": mimeTypeFor(real),
        "Content-Length": located.size,
      });
      if (head) {
        res.end();
        return;
      }
      const stream = createReadStream(real);
      stream.on("error", () => res.destroy());
      stream.pipe(res);
    } catch {
      if (!res.headersSent) send(res, 500, STATUS_TEXT[500], head, csp);
      else res.destroy();
    }
  };
}

export interface StartedWebServer {
  readonly server: Server;
  readonly port: number;
  readonly url: string;
  close(): Promise<void>;
}

export interface StartWebServerOptions {
  readonly root: string;
  /** Preferred port; 0 picks a free one. */
  readonly port: number;
  /** When the preferred port is taken, use a free one instead of failing (default true). */
  readonly fallbackToFreePort?: boolean;
  /** Content-Security-Policy sent with every response (none when omitted). */
  readonly contentSecurityPolicy?: string;
}

function listen(server: Server, port: number): Promise<number> {
  return new Promise((resolvePort, reject) => {
    const onError = (error: Error) => {
      server.off("listening", onListening);
      reject(error);
    };
    const onListening = () => {
      server.off("error", onError);
      resolvePort((server.address() as AddressInfo).port);
    };
    server.once("error", onError);
    server.once("listening", onListening);
    server.listen(port, WEB_HOST);
  });
}

export async function startStaticServer(options: StartWebServerOptions): Promise<StartedWebServer> {
  let boundPort = 0;
  const handler = createStaticHandler({
    root: options.root,
    port: () => boundPort,
    contentSecurityPolicy: options.contentSecurityPolicy,
  });
  const server = createServer((req, res) => void handler(req, res));
  try {
    boundPort = await listen(server, options.port);
  } catch (error) {
    const code = (error as { code?: string }).code;
    const canFallBack = options.fallbackToFreePort !== false && options.port !== 0;
    if (!canFallBack || (code !== "EADDRINUSE" && code !== "EACCES")) throw error;
    boundPort = await listen(server, 0);
  }
  return {
    server,
    port: boundPort,
    url: `http://${WEB_HOST}:${boundPort}/`,
    close: () =>
      new Promise<void>((done) => {
        server.close(() => done());
        server.closeAllConnections?.();
      }),
  };
}

export type PortChoice =
  { readonly ok: true; readonly port: number } | { readonly ok: false; readonly message: string };

/** Port from `--port N` / `--port=N`, else the PORT environment variable, else 5178. */
export function portFromArgs(argv: readonly string[], env: Readonly<Record<string, string | undefined>>): PortChoice {
  let raw: string | undefined;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === "--port") raw = argv[i + 1] ?? "";
    else if (arg.startsWith("--port=")) raw = arg.slice("--port=".length);
  }
  raw ??= env.PORT;
  if (raw === undefined || raw === "") return { ok: true, port: DEFAULT_WEB_PORT };
  if (!/^\d{1,5}$/.test(raw) || Number(raw) > 65535) {
    return { ok: false, message: `Port “${raw.slice(0, 20)}” is not a number from 0 to 65535.` };
  }
  return { ok: true, port: Number(raw) };
}
