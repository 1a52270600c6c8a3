/**
 * Printing the HTML report to PDF with headless Chromium. The document is self-contained (inline CSS,
 * SVG and data-URI images), so it is loaded with setContent and no network is involved. Page size and
 * margins come from the report's own @page rule.
 */
import { writeFileAtomic } from "../atomic-write";
import { withChromium } from "./chromium";

/** The options every Brinefield PDF is printed with: tagged (accessible, ISO 14289 structure) and with an outline. */
export const PDF_OPTIONS = {
  printBackground: true,
  preferCSSPageSize: true,
  format: "A4",
  tagged: true,
  outline: true,
} as const;

/** Renders `html` to PDF bytes (A4 from the document's @page rule, backgrounds printed, tagged, with an outline). */
export async function pdfFromHtml(html: string): Promise<Uint8Array> {
  return withChromium(async (browser) => {
    const page = await browser.newPage();
    await page.setContent(html, { waitUntil: "load", timeout: 30_000 });
    await page.emulateMedia({ media: "print" });
    const pdf = await page.pdf({ ...PDF_OPTIONS });
    return new Uint8Array(pdf);
  });
}

/**
 * Renders `html` to a PDF file at `outPath` with Brinefield's one atomic writer (core/cli/node/atomic-write.ts:
 * random exclusive temporary file, fsync, rename; a folder, device or link to nothing is refused);
 * returns the bytes written.
 */
export async function printPdf(html: string, outPath: string): Promise<Uint8Array> {
  const bytes = await pdfFromHtml(html);
  await writeFileAtomic(outPath, bytes);
  return bytes;
}
