/**
 * A tiny static file server for the built renderer, on 127.0.0.1, sending the app's Content-Security-Policy
 * as a header (as the web server and Electron do), so browser tests run under the same policy.
 */
import { createServer, type Server } from "node:http";
import { readFile, stat } from "node:fs/promises";
import { extname, join, normalize, resolve } from "node:path";
import { CONTENT_SECURITY_POLICY } from "../../../electron/csp";

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".mjs": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".json": "application/json",
  ".svg": "image/svg+xml",
  ".png": "image/png",
  ".wasm": "application/wasm",
};

export interface StaticServer {
  readonly url: string;
  close(): Promise<void>;
}

export async function serveDirectory(directory: string): Promise<StaticServer> {
  const root = resolve(directory);
  const server: Server = createServer((request, response) => {
    void (async () => {
      const pathname = decodeURIComponent(new URL(request.url ?? "/", "http://x").pathname);
      const target = normalize(join(root, pathname === "/" ? "index.html" : pathname));
      if (!target.startsWith(root)) {
        response.writeHead(403).end();
        return;
      }
      try {
        const info = await stat(target);
        const file = info.isDirectory() ? join(target, "index.html") : target;
        const body = await readFile(file);
        response.writeHead(200, {
          "Content-Type": TYPES[extname(file)] ?? "application/octet-stream",
          "Content-Security-Policy": CONTENT_SECURITY_POLICY,
          "Cache-Control": "no-store",
        });
        response.end(body);
      } catch {
        response.writeHead(404, { "Content-Type": "text/plain" }).end("not found");
      }
    })();
  });
  await new Promise<void>((done) => server.listen(0, "127.0.0.1", done));
  const address = server.address();
  const port = typeof address === "object" && address ? address.port : 0;
  return {
    url: `http://127.0.0.1:${port}/`,
    close: () => new Promise<void>((done) => server.close(() => done())),
  };
}
