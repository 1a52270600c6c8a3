/**
 * The Content-Security-Policy <meta> tag comes first in the head of the page, before any script,
 * module preload or style (electron/csp.ts `withCspMetaFirst`, applied by the renderer's Vite build as a
 * "post" transform, after Vite has put its script and preload tags into the head).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { Plugin } from "vite";
import { describe, expect, it } from "vitest";
import { CONTENT_SECURITY_POLICY, withCspMetaFirst } from "../../electron/csp";
import viteConfig from "../../renderer/vite.config";

const root = join(__dirname, "..", "..");
const sourceHtml = readFileSync(join(root, "renderer", "index.html"), "utf8");

/** Tags of the head in document order, e.g. ["meta http-equiv=Content-Security-Policy", "meta", "script"]. */
function headTags(html: string): string[] {
  const head = /<head[^>]*>([\s\S]*?)<\/head>/i.exec(html)?.[1] ?? "";
  return [...head.matchAll(/<([a-z]+)([^>]*)>/gi)].map(([, name, attrs]) =>
    /http-equiv=["']?Content-Security-Policy/i.test(attrs) ? "csp" : name.toLowerCase(),
  );
}

/** What Vite's build makes of the page before the post transforms: entry script and preloads in the head. */
const builtLike = sourceHtml
  .replace(/\s*<script type="module" src="\.\/main\.tsx"><\/script>/, "")
  .replace(
    "</head>",
    '  <script type="module" crossorigin src="./assets/index-abc.js"></script>\n' +
      '    <link rel="modulepreload" crossorigin href="./assets/vendor-def.js">\n' +
      '    <link rel="stylesheet" crossorigin href="./assets/index-123.css">\n  </head>',
  );

describe("withCspMetaFirst()", () => {
  it("puts the policy first in the head of the renderer's index.html", () => {
    const tags = headTags(withCspMetaFirst(sourceHtml));
    expect(tags[0], "first tag of the head").toBe("csp");
    expect(tags.filter((t) => t === "csp").length, "one policy").toBe(1);
    expect(withCspMetaFirst(sourceHtml), "the shared policy text").toContain(`content="${CONTENT_SECURITY_POLICY}"`);
  });

  it("places it before the module script, preloads and styles of a built page", () => {
    const tags = headTags(withCspMetaFirst(builtLike));
    expect(tags.includes("script"), "the sample has a script in the head").toBe(true);
    expect(tags[0], "policy first").toBe("csp");
    expect(tags.indexOf("csp"), "before the script").toBeLessThan(tags.indexOf("script"));
    expect(tags.indexOf("csp"), "before the preload").toBeLessThan(tags.indexOf("link"));
  });

  it("replaces a policy tag placed late instead of adding a second one, and is idempotent", () => {
    const late = builtLike.replace(
      "</head>",
      `<meta http-equiv="Content-Security-Policy" content="default-src *"></head>`,
    );
    const once = withCspMetaFirst(late);
    expect(headTags(once).filter((t) => t === "csp").length, "one policy").toBe(1);
    expect(once, "the permissive one is gone").not.toContain("default-src *");
    expect(withCspMetaFirst(once), "applying twice changes nothing").toBe(once);
  });

  it("refuses a page without a head rather than shipping it without a policy", () => {
    expect(() => withCspMetaFirst("<html><body></body></html>"), "no head").toThrow(/no <head>/);
  });
});

describe("the renderer's Vite build", () => {
  it("applies withCspMetaFirst as a post transform of the built index.html only", () => {
    const plugins = (viteConfig.plugins ?? []).flat() as Plugin[];
    const csp = plugins.find((p) => p && p.name === "brinefield-csp-meta");
    expect(csp, "plugin present").toBeDefined();
    expect(csp!.apply, "build only (the dev server injects inline scripts)").toBe("build");
    const hook = csp!.transformIndexHtml as { order: string; handler: (html: string) => string };
    expect(hook.order, "after Vite's own tag injection").toBe("post");
    const out = hook.handler(builtLike);
    expect(headTags(out)[0], "policy first in the built page").toBe("csp");
  });
});
