import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { describe, expect, it } from "vitest";
import { CONTENT_SECURITY_POLICY } from "../../electron/csp";
import { isAllowedRequestUrl, secureWebPreferences, withSecurityHeaders } from "../../electron/security";

const rendererDir = join("/opt", "Brinefield", "resources", "app.asar", "dist", "renderer");
const fileUrl = (p: string) => pathToFileURL(p).href;

describe("isAllowedRequestUrl()", () => {
  it("allows files of the built renderer and page-made data/blob URLs", () => {
    expect(isAllowedRequestUrl(fileUrl(join(rendererDir, "index.html")), rendererDir), "index").toBe(true);
    expect(
      isAllowedRequestUrl(fileUrl(join(rendererDir, "assets", "app.js")), rendererDir),
      "asset",
    ).toBe(true);
    expect(isAllowedRequestUrl("data:image/png;base64,AAAA", rendererDir), "data").toBe(true);
    expect(isAllowedRequestUrl("blob:file:///1234", rendererDir), "blob").toBe(true);
  });

  it("cancels remote content and files outside the renderer folder", () => {
    const denied = [
      "https://example.com/a.js",
      "http://127.0.0.1:5178/",
      "wss://example.com/socket",
      "ftp://example.com/x",
      fileUrl("/etc/passwd"),
      `${fileUrl(rendererDir)}/../../secrets.json`,
      `${fileUrl(rendererDir)}/%2e%2e/%2e%2e/secrets.json`,
      fileUrl(`${rendererDir}-evil/index.html`),
      "file://remote-host/share/index.html",
      "not a url",
    ];
    for (const url of denied) expect(isAllowedRequestUrl(url, rendererDir), url).toBe(false);
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
    expect(
      withSecurityHeaders(undefined)["Content-Security-Policy"],
      "no headers at all",
    ).toEqual([CONTENT_SECURITY_POLICY]);
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
