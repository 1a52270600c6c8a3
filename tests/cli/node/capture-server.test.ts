/** The report's 3D-capture server: a malformed request never ends the process; foreign hosts are refused. */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { request } from "node:http";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Server } from "node:http";
import { serveStatic } from "../../../core/cli/node/headless/capture-3d";

let dir: string;
let server: Server;
let port: number;

function get(path: string, host?: string, method = "GET"): Promise<number> {
  return new Promise((resolve, reject) => {
    const req = request(
      { host: "127.0.0.1", port, path, method, headers: { Host: host ?? `127.0.0.1:${port}` } },
      (res) => {
        res.resume();
        res.on("end", () => resolve(res.statusCode ?? 0));
      },
    );
    req.on("error", reject);
    req.end();
  });
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), "brinefield-capture-"));
  writeFileSync(join(dir, "index.html"), "<p>ok</p>");
  const started = await serveStatic(dir);
  server = started.server;
  port = Number(new URL(started.url).port);
});
afterAll(() => {
  server.close();
  rmSync(dir, { recursive: true, force: true });
});

describe("serveStatic()", () => {
  it("serves the folder's files to its own host", async () => {
    expect(await get("/"), "index").toBe(200);
    expect(await get("/index.html", `localhost:${port}`), "localhost name").toBe(200);
  });
  it("answers a malformed percent escape with 400 and keeps serving", async () => {
    expect(await get("/%zz"), "bad escape").toBe(400);
    expect(await get("/%E0%A4%A"), "truncated UTF-8 escape").toBe(400);
    expect(await get("/"), "still alive").toBe(200);
  });
  it("refuses a foreign Host header (DNS rebinding), other methods, NUL and traversal", async () => {
    expect(await get("/", "evil.example:80"), "foreign host").toBe(421);
    expect(await get("/", "127.0.0.1:1"), "other port").toBe(421);
    expect(await get("/", undefined, "POST"), "POST").toBe(405);
    expect(await get("/%00"), "NUL").toBe(400);
    expect(await get("/%2e%2e/%2e%2e/etc/passwd"), "traversal").not.toBe(200);
  });
});
