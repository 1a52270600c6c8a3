/** Node-only helpers that drive a headless browser: PDF printing and 3D-view capture for the report. */
export { printPdf, pdfFromHtml } from "./print-pdf";
export { capture3dView, Capture3dError, buildRenderer, rendererBuildIsStale, serveStatic } from "./capture-3d";
export type { Capture3dOptions } from "./capture-3d";
export { launchChromium, withChromium, ChromiumMissingError, CHROMIUM_PATH, CHROMIUM_ARGS } from "./chromium";
