/**
 * Build of the renderer: root renderer/, output dist/renderer with relative paths (loaded from brinefield://app/
 * in Electron and from the web server), ES-module workers, and the shared Content-Security-Policy
 * injected as a <meta http-equiv> tag, first in the head of the built index.html.
 */
import { defineConfig, type Plugin } from "vite";
import react from "@vitejs/plugin-react";
import { fileURLToPath } from "node:url";
import { dirname, resolve } from "node:path";
import { withCspMetaFirst } from "../electron/csp";

const here = dirname(fileURLToPath(import.meta.url));

function contentSecurityPolicy(): Plugin {
  return {
    name: "brinefield-csp-meta",
    // Only the built page: the dev server injects inline scripts the policy forbids.
    apply: "build",
    // "post": after Vite has put the module script and preloads into the head, so the policy goes first.
    transformIndexHtml: { order: "post", handler: (html) => withCspMetaFirst(html) },
  };
}

export default defineConfig({
  root: here,
  base: "./",
  plugins: [react(), contentSecurityPolicy()],
  worker: { format: "es" },
  server: { fs: { allow: [resolve(here, "..")] } },
  build: {
    outDir: resolve(here, "../dist/renderer"),
    emptyOutDir: true,
    chunkSizeWarningLimit: 2000,
    sourcemap: false,
  },
});
