import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { describe, expect, it } from "vitest";
import { CONTENT_SECURITY_POLICY } from "../../electron/csp";
import {
  EXTERNAL_LINK_ALLOW_LIST,
  isAllowedExternalUrl,
  isAllowedRequestUrl,
  secureWebPreferences,
  withSecurityHeaders,
} from "../../electron/security";

const rendererDir = join("/opt", "Brinefield", "resources", "app.asar", "dist", "renderer");
const fileUrl = (p: string) => pathToFileURL(p).href;

describe("isAllowedRequestUrl()", () => {
  it("allows our own scheme and page-made data/blob URLs", () => {
    expect(isAllowedRequestUrl("brinefield://app/index.html"), "index").toBe(true);
    expect(isAllowedRequestUrl("brinefield://app/assets/app.js"), "asset").toBe(true);
    expect(isAllowedRequestUrl("data:image/png;base64,AAAA"), "data").toBe(true);
    expect(isAllowedRequestUrl("blob:brinefield://app/1234"), "blob").toBe(true);
  });

  it("cancels remote content, every file:// URL and other hosts of our scheme", () => {
    const denied = [
      "https://example.com/a.js",
      "http://127.0.0.1:5178/",
      "wss://example.com/socket",
      "ftp://example.com/x",
      fileUrl("/etc/passwd"),
      fileUrl(join(rendererDir, "index.html")),
      "file://remote-host/share/index.html",
      "brinefield://evil/index.html",
      "brinefield://app:81/index.html",
      "brinefield://user@app/index.html",
      "not a url",
    ];
    for (const url of denied) expect(isAllowedRequestUrl(url), url).toBe(false);
  });
});

describe("isAllowedExternalUrl()", () => {
  it("refuses every web address with the shipped (empty) allow-list", () => {
    expect(EXTERNAL_LINK_ALLOW_LIST, "no web page is linked from the app").toEqual([]);
    for (const url of ["https://example.com/", "https://brinefield.invalid/docs", "http://example.com/"]) {
      expect(isAllowedExternalUrl(url), url).toBe(false);
    }
  });

  it("opens only https addresses under an allow-listed prefix", () => {
    const list = ["https://docs.example.org/brinefield/", "https://example.net/licence.html"];
    const allowed = [
      "https://docs.example.org/brinefield/",
      "https://docs.example.org/brinefield/methods.html#near-field",
      "https://example.net/licence.html",
    ];
    for (const url of allowed) expect(isAllowedExternalUrl(url, list), url).toBe(true);
    const denied = [
      "http://docs.example.org/brinefield/",
      "https://docs.example.org/brinefieldx/",
      "https://docs.example.org/other/",
      "https://docs.example.org.evil.com/brinefield/",
      "https://evil.com/https://docs.example.org/brinefield/",
      "https://user:pw@docs.example.org/brinefield/",
      "https://docs.example.org:8443/brinefield/",
      "https://example.net/licence.html/extra",
      "javascript:alert(1)",
      "file:///etc/passwd",
      "brinefield://app/index.html",
      "not a url",
    ];
    for (const url of denied) expect(isAllowedExternalUrl(url, list), url).toBe(false);
  });
});

describe("withSecurityHeaders()", () => {
  it("forces our CSP and nosniff, replacing any CSP a response brought", () => {
    const out = withSecurityHeaders({
      "content-security-policy": ["default-src *"],
      "Content-Type": ["text/html"],
    });
    expect(out["Content-Security-Policy"], "our policy").toEqual([CONTENT_SECURITY_POLICY]);
    expect(out["content-security-policy"], "old policy removed").toBeUndefined();
    expect(out["X-Content-Type-Options"], "nosniff").toEqual(["nosniff"]);
    expect(out["Content-Type"], "other headers kept").toEqual(["text/html"]);
    expect(withSecurityHeaders(undefined)["Content-Security-Policy"], "no headers at all").toEqual([
      CONTENT_SECURITY_POLICY,
    ]);
  });
});

describe("secureWebPreferences()", () => {
  it("isolates and sandboxes the renderer, with no Node integration anywhere", () => {
    const prefs = secureWebPreferences("/app/dist/electron/preload.cjs", false);
    expect(prefs, "hardened preferences").toMatchObject({
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      devTools: false,
      preload: "/app/dist/electron/preload.cjs",
    });
    expect(secureWebPreferences("/p", true).devTools, "devtools in development only").toBe(true);
  });
});
