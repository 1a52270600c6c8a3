/**
 * Build of the renderer: root renderer/, output dist/renderer with relative paths (loaded from file://
 * in Electron and from the web server), ES-module workers, and the shared Content-Security-Policy
 * injected as a <meta http-equiv> tag into the built index.html.
 */
import { defineConfig, type Plugin } from "vite";
import react from "@vitejs/plugin-react";
import { fileURLToPath } from "node:url";
import { dirname, resolve } from "node:path";
import { CONTENT_SECURITY_POLICY } from "../electron/csp";

const here = dirname(fileURLToPath(import.meta.url));

function contentSecurityPolicy(): Plugin {
  return {
    name: "brinefield-csp-meta",
    // Only the built page: the dev server injects inline scripts the policy forbids.
    apply: "build",
    transformIndexHtml() {
      return [
        { tag: "meta", attrs: { "http-equiv": "Content-Security-Policy", content: CONTENT_SECURITY_POLICY }, injectTo: "head" },
      ];
    },
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
