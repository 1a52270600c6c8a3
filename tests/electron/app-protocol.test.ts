/**
 * The app's own scheme (electron/app-protocol.ts): registered as standard and secure without CSP bypass,
 * serving GET/HEAD of regular files inside the renderer folder only, with the right MIME types and the
 * CSP + nosniff headers on every response, errors included.
 */
import { mkdir, mkdtemp, rm, symlink, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  APP_INDEX_URL,
  APP_ORIGIN,
  APP_SCHEME,
  appSchemeRegistration,
  createAppProtocolHandler,
  isAppUrl,
} from "../../electron/app-protocol";
import { CONTENT_SECURITY_POLICY } from "../../electron/csp";

let dir: string;
let rendererDir: string;
let handle: ReturnType<typeof createAppProtocolHandler>;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), "brinefield-scheme-"));
  rendererDir = join(dir, "renderer");
  await mkdir(join(rendererDir, "assets"), { recursive: true });
  await writeFile(join(rendererDir, "index.html"), "<!doctype html><title>Brinefield</title>");
  await writeFile(join(rendererDir, "assets", "app-1a2b.js"), "export const x = 1;");
  await writeFile(join(rendererDir, "assets", "worker-3c4d.js"), "self.onmessage = () => {};");
  await writeFile(join(rendererDir, "assets", "style.css"), "body{}");
  await writeFile(join(rendererDir, "assets", "logo.svg"), "<svg xmlns='http://www.w3.org/2000/svg'/>");
  await writeFile(join(rendererDir, "assets", "blob.bin"), "raw");
  await writeFile(join(dir, "secret.json"), '{"secret":true}');
  await writeFile(join(dir, "renderer-evil.html"), "evil");
  await symlink(join(dir, "secret.json"), join(rendererDir, "assets", "link-out.json"));
  handle = createAppProtocolHandler(rendererDir);
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const get = (url: string, method = "GET") => handle({ url, method });

function expectSecurityHeaders(response: Response, what: string): void {
  expect(response.headers.get("content-security-policy"), `${what}: CSP`).toBe(CONTENT_SECURITY_POLICY);
  expect(response.headers.get("x-content-type-options"), `${what}: nosniff`).toBe("nosniff");
}

describe("the brinefield:// scheme", () => {
  it("is registered as standard and secure, with fetch, and never bypasses the CSP", () => {
    const [entry, ...rest] = appSchemeRegistration();
    expect(rest, "one scheme").toEqual([]);
    expect(entry.scheme, "scheme name").toBe(APP_SCHEME);
    expect(entry.privileges, "privileges").toMatchObject({ standard: true, secure: true, supportFetchAPI: true });
    expect("bypassCSP" in entry.privileges, "no CSP bypass").toBe(false);
    expect("allowServiceWorkers" in entry.privileges, "no service workers").toBe(false);
    expect(APP_INDEX_URL, "the page the window loads").toBe(`${APP_ORIGIN}/index.html`);
    expect(APP_ORIGIN, "origin").toBe("brinefield://app");
  });

  it("recognises only its own host, without credentials or port", () => {
    expect(isAppUrl("brinefield://app/index.html"), "index").toBe(true);
    for (const url of [
      "brinefield://other/index.html",
      "brinefield://app:1/x",
      "brinefield://u@app/x",
      "file:///x",
      "https://app/x",
      "nonsense",
    ]) {
      expect(isAppUrl(url), url).toBe(false);
    }
  });
});

describe("createAppProtocolHandler()", () => {
  it("serves the renderer's files with their MIME types and the security headers", async () => {
    const cases: [string, string, string][] = [
      [APP_INDEX_URL, "text/html; charset=utf-8", "<!doctype html><title>Brinefield</title>"],
      [`${APP_ORIGIN}/`, "text/html; charset=utf-8", "<!doctype html><title>Brinefield</title>"],
      [`${APP_ORIGIN}/assets/app-1a2b.js`, "text/javascript; charset=utf-8", "export const x = 1;"],
      [`${APP_ORIGIN}/assets/worker-3c4d.js?v=2#x`, "text/javascript; charset=utf-8", "self.onmessage = () => {};"],
      [`${APP_ORIGIN}/assets/style.css`, "text/css; charset=utf-8", "body{}"],
      [`${APP_ORIGIN}/assets/logo.svg`, "image/svg+xml", "<svg xmlns='http://www.w3.org/2000/svg'/>"],
      [`${APP_ORIGIN}/assets/blob.bin`, "application/octet-stream", "raw"],
    ];
    for (const [url, type, body] of cases) {
      const response = await get(url);
      expect(response.status, `${url}: status`).toBe(200);
      expect(response.headers.get("content-type"), `${url}: type`).toBe(type);
      expect(await response.text(), `${url}: body`).toBe(body);
      expectSecurityHeaders(response, url);
    }
  });

  it("answers HEAD without a body and refuses other methods", async () => {
    const head = await get(APP_INDEX_URL, "HEAD");
    expect(head.status, "HEAD ok").toBe(200);
    expect(await head.text(), "no body").toBe("");
    const post = await get(APP_INDEX_URL, "POST");
    expect(post.status, "POST refused").toBe(405);
    expect(post.headers.get("allow"), "Allow header").toBe("GET, HEAD");
    expectSecurityHeaders(post, "405");
  });

  it("refuses traversal, encoded or raw, symlinks leading out, folders and missing files", async () => {
    const refused: [string, number[]][] = [
      [`${APP_ORIGIN}/..%2Fsecret.json`, [403]],
      [`${APP_ORIGIN}/%2e%2e%2fsecret.json`, [403]],
      [`${APP_ORIGIN}/assets/..%2F..%2Fsecret.json`, [403]],
      [`${APP_ORIGIN}/..%5Csecret.json`, [400]],
      [`${APP_ORIGIN}/index.html%00.js`, [400]],
      [`${APP_ORIGIN}/C:%2Fwindows%2Fwin.ini`, [403]],
      [`${APP_ORIGIN}/%E0%A4%A`, [400]],
      [`${APP_ORIGIN}/assets/link-out.json`, [403]],
      [`${APP_ORIGIN}/assets`, [404]],
      [`${APP_ORIGIN}/missing.js`, [404]],
      [`${APP_ORIGIN}/../renderer-evil.html`, [404]],
    ];
    for (const [url, statuses] of refused) {
      const response = await get(url);
      expect(statuses, `${url}: status ${response.status}`).toContain(response.status);
      const text = await response.text();
      expect(text, `${url}: no file content`).not.toMatch(/secret|evil/);
      expectSecurityHeaders(response, url);
    }
  });

  it("refuses other hosts and ports of the scheme and other schemes", async () => {
    for (const url of [
      "brinefield://evil/index.html",
      "brinefield://app:8080/index.html",
      "file:///etc/passwd",
      "https://app/index.html",
    ]) {
      const response = await get(url);
      expect(response.status, url).toBe(421);
      expectSecurityHeaders(response, url);
    }
  });
});
