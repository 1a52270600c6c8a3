import { request } from "node:http";
import { mkdir, mkdtemp, rm, symlink, writeFile } from "node:fs/promises";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CONTENT_SECURITY_POLICY } from "../../electron/csp";
import {
  DEFAULT_WEB_PORT,
  mimeTypeFor,
  portFromArgs,
  resolveRequestPath,
  startWebServer,
  type StartedWebServer,
} from "../../electron/web-server";

let base: string;
let root: string;
let server: StartedWebServer;

interface RawResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: string;
}

/** Send the path exactly as written (fetch() would normalise "../" away before sending). */
function raw(path: string, options: { method?: string; host?: string } = {}): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    const req = request(
      {
        host: "127.0.0.1",
        port: server.port,
        path,
        method: options.method ?? "GET",
        headers: { host: options.host ?? `127.0.0.1:${server.port}` },
      },
      (res) => {
        let body = "";
        res.setEncoding("utf8");
        res.on("data", (c: string) => (body += c));
        res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
      },
    );
    req.on("error", reject);
    req.end();
  });
}

beforeAll(async () => {
  base = await mkdtemp(join(tmpdir(), "brinefield-web-"));
  root = join(base, "renderer");
  await mkdir(join(root, "assets"), { recursive: true });
  await writeFile(join(root, "index.html"), "<!doctype html><title>Brinefield</title>");
  await writeFile(join(root, "assets", "app.js"), "console.log(1)");
  await writeFile(join(root, "assets", "core.wasm"), Buffer.from([0, 97, 115, 109]));
  await writeFile(join(base, "secret.json"), '{"token":"outside the root"}');
  await symlink(join(base, "secret.json"), join(root, "link.json")).catch(() => undefined);
  server = await startWebServer({ root, port: 0 });
});

afterAll(async () => {
  await server?.close();
  await rm(base, { recursive: true, force: true });
});

describe("startWebServer()", () => {
  it("listens on 127.0.0.1 and reports its URL", () => {
    expect(server.url, "loopback URL with the bound port").toBe(`http://127.0.0.1:${server.port}/`);
    expect(server.port, "a real port").toBeGreaterThan(0);
  });

  it("serves index.html at / with the app's CSP, nosniff and the HTML type", async () => {
    const res = await raw("/");
    expect(res.status, "200").toBe(200);
    expect(res.body, "index content").toContain("<title>Brinefield</title>");
    expect(res.headers["content-security-policy"], "CSP header").toBe(CONTENT_SECURITY_POLICY);
    expect(res.headers["x-content-type-options"], "nosniff").toBe("nosniff");
    expect(res.headers["content-type"], "html type").toBe("text/html; charset=utf-8");
  });

  it("serves assets with their MIME types, ignoring the query string", async () => {
    const js = await raw("/assets/app.js?v=3");
    expect(js.status, "js found").toBe(200);
    expect(js.headers["content-type"], "js type").toBe("text/javascript; charset=utf-8");
    const wasm = await raw("/assets/core.wasm");
    expect(wasm.headers["content-type"], "wasm type (needed by WebAssembly.instantiateStreaming)").toBe(
      "application/wasm",
    );
  });

  it("refuses ../ traversal in raw and percent-encoded forms", async () => {
    const attempts = [
      "/../secret.json",
      "/assets/../../secret.json",
      "/%2e%2e/secret.json",
      "/..%2fsecret.json",
      "/..%5csecret.json",
    ];
    for (const path of attempts) {
      const res = await raw(path);
      expect([400, 403], `${path} refused (status ${res.status})`).toContain(res.status);
      expect(res.body, `${path} leaks nothing`).not.toContain("token");
    }
  });

  it.skipIf(process.platform === "win32")("refuses a symlink that points outside the root", async () => {
    const res = await raw("/link.json");
    expect(res.status, "forbidden").toBe(403);
    expect(res.body, "no content").not.toContain("token");
  });

  it("returns 404 for missing files and for folders (no listing)", async () => {
    expect((await raw("/missing.js")).status, "missing file").toBe(404);
    const folder = await raw("/assets/");
    expect(folder.status, "folder").toBe(404);
    expect(folder.body, "no listing").not.toContain("app.js");
    expect(folder.headers["content-security-policy"], "errors carry the CSP too").toBe(CONTENT_SECURITY_POLICY);
  });

  it("answers only GET and HEAD", async () => {
    const post = await raw("/index.html", { method: "POST" });
    expect(post.status, "POST").toBe(405);
    const head = await raw("/index.html", { method: "HEAD" });
    expect(head.status, "HEAD").toBe(200);
    expect(head.body, "HEAD has no body").toBe("");
  });

  it("refuses requests addressed to another host name (DNS rebinding)", async () => {
    const res = await raw("/", { host: `evil.example:${server.port}` });
    expect(res.status, "misdirected").toBe(421);
    expect((await raw("/", { host: `localhost:${server.port}` })).status, "localhost accepted").toBe(200);
  });

  it("falls back to a free port when the preferred one is taken", async () => {
    const blocker = createServer();
    await new Promise<void>((r) => blocker.listen(0, "127.0.0.1", () => r()));
    const taken = (blocker.address() as { port: number }).port;
    const other = await startWebServer({ root, port: taken });
    try {
      expect(other.port, "different port").not.toBe(taken);
      const strict = startWebServer({ root, port: taken, fallbackToFreePort: false });
      await expect(strict, "no fallback → error").rejects.toMatchObject({ code: "EADDRINUSE" });
    } finally {
      await other.close();
      await new Promise<void>((r) => blocker.close(() => r()));
    }
  });
});

describe("resolveRequestPath()", () => {
  it("maps / to index.html and refuses NUL, backslashes, drive letters and bad escapes", () => {
    expect(resolveRequestPath("/srv/r", "/"), "root").toEqual({ ok: true, file: join("/srv/r", "index.html") });
    expect(resolveRequestPath("/srv/r", "/a%00.js"), "NUL").toEqual({ ok: false, status: 400 });
    expect(resolveRequestPath("/srv/r", "/a\\..\\b"), "backslash").toEqual({ ok: false, status: 400 });
    expect(resolveRequestPath("/srv/r", "/C:/Windows/win.ini"), "drive").toEqual({ ok: false, status: 403 });
    expect(resolveRequestPath("/srv/r", "/%E0%A4%A"), "malformed escape").toEqual({ ok: false, status: 400 });
    expect(resolveRequestPath("/srv/r", "http://evil/x"), "absolute-form target").toEqual({ ok: false, status: 400 });
  });
});

describe("mimeTypeFor()", () => {
  it("knows the types the renderer build emits", () => {
    const table: [string, string][] = [
      ["a.js", "text/javascript; charset=utf-8"],
      ["a.mjs", "text/javascript; charset=utf-8"],
      ["a.css", "text/css; charset=utf-8"],
      ["a.html", "text/html; charset=utf-8"],
      ["a.json", "application/json; charset=utf-8"],
      ["a.svg", "image/svg+xml"],
      ["a.PNG", "image/png"],
      ["a.wasm", "application/wasm"],
      ["a.unknown", "application/octet-stream"],
    ];
    for (const [file, type] of table) expect(mimeTypeFor(file), file).toBe(type);
  });
});

describe("portFromArgs()", () => {
  it("takes --port, then PORT, then the default", () => {
    expect(portFromArgs(["--port", "8080"], { PORT: "9000" }), "--port N").toEqual({ ok: true, port: 8080 });
    expect(portFromArgs(["--port=8081"], {}), "--port=N").toEqual({ ok: true, port: 8081 });
    expect(portFromArgs([], { PORT: "9000" }), "PORT").toEqual({ ok: true, port: 9000 });
    expect(portFromArgs([], {}), "default").toEqual({ ok: true, port: DEFAULT_WEB_PORT });
  });

  it("rejects a port that is not a number from 0 to 65535", () => {
    expect(portFromArgs(["--port", "http"], {}).ok, "word").toBe(false);
    expect(portFromArgs([], { PORT: "70000" }).ok, "too big").toBe(false);
  });
});
