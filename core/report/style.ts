/**
 * Inline stylesheet of the report: A4 pages, a caution footer repeated on every printed page (a
 * `position: fixed` element, which Chromium paints on each page), page numbers in the page margin,
 * tables that do not split rows across pages, and a plain on-screen layout for reading in a browser.
 */
export const REPORT_CSS = `
@page {
  size: A4;
  margin: 14mm 15mm 12mm 15mm;
  @top-right { content: "Page " counter(page) " of " counter(pages); font: 8pt Helvetica, Arial, sans-serif; color: #475569; }
}
:root { --ink: #0f172a; --muted: #475569; --rule: #cbd5e1; --pass: #166534; --fail: #b91c1c; --scope: #6d28d9; --accent: #0c4a6e; }
* { box-sizing: border-box; }
html { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
body { margin: 0; color: var(--ink); font: 9.5pt/1.38 Helvetica, Arial, sans-serif; }
main { max-width: 190mm; margin: 0 auto; padding: 8mm 0 20mm; }
h1 { font-size: 19pt; margin: 0 0 1mm; color: var(--accent); letter-spacing: -0.01em; }
h2 { font-size: 13pt; margin: 7mm 0 2mm; padding-bottom: 1mm; border-bottom: 1.5px solid var(--accent); color: var(--accent); break-after: avoid; }
h3 { font-size: 10.5pt; margin: 4mm 0 1.5mm; break-after: avoid; }
p { margin: 1.5mm 0; }
.subtitle { font-size: 12pt; color: var(--muted); margin: 0 0 3mm; }
.meta { display: grid; grid-template-columns: max-content 1fr; gap: 0.5mm 5mm; margin: 3mm 0; font-size: 9pt; }
.meta dt { color: var(--muted); }
.meta dd { margin: 0; }
code, .path, .hash { font-family: "DejaVu Sans Mono", Menlo, Consolas, monospace; font-size: 8.2pt; }
.caution { border: 2px solid #b45309; background: #fffbeb; padding: 3mm 4mm; margin: 4mm 0; font-weight: 600; break-inside: avoid; }
.verdict { display: grid; grid-template-columns: max-content 1fr; gap: 1mm 6mm; align-items: baseline; border: 1.5px solid var(--rule); padding: 3mm 4mm; margin: 3mm 0; break-inside: avoid; }
.verdict .badge { grid-row: span 4; font-size: 15pt; font-weight: 700; padding: 2mm 4mm; border-radius: 2mm; color: #fff; align-self: center; }
.verdict.pass .badge { background: var(--pass); }
.verdict.fail .badge { background: var(--fail); }
.verdict.scope { border: 2px dashed var(--scope); }
.verdict.scope .badge { background: var(--scope); }
.verdict.refused .badge { background: var(--muted); }
.scope-reasons { grid-column: 2; color: var(--scope); font-weight: 600; }
.claim-verdict { border: 1.5px solid var(--rule); border-left: 5px solid var(--accent); padding: 2mm 4mm; margin: 3mm 0; break-inside: avoid; }
table { border-collapse: collapse; width: 100%; margin: 2mm 0 3mm; font-size: 8.6pt; }
table:not(.inputs):not(.layout):not(#warnings-table):not(#methods-table) { break-inside: avoid; }
caption { text-align: left; font-weight: 700; padding: 1mm 0; caption-side: top; }
th, td { border-bottom: 0.6px solid var(--rule); padding: 0.8mm 1.6mm; text-align: left; vertical-align: top; }
thead th { border-bottom: 1.2px solid var(--ink); background: #f1f5f9; }
tr { break-inside: avoid; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
tr.default td { color: var(--muted); }
td.entered { white-space: nowrap; }
td.pass { color: var(--pass); font-weight: 700; }
td.fail { color: var(--fail); font-weight: 700; }
td.scope { color: var(--scope); font-weight: 700; font-style: italic; }
td.refused { color: var(--muted); font-weight: 700; }
.sev-serious { color: var(--fail); font-weight: 700; }
.sev-warning { color: #b45309; font-weight: 700; }
.sev-info { color: var(--muted); }
figure { margin: 3mm 0; break-inside: avoid; }
figure svg, figure img { display: block; width: 100%; height: auto; border: 0.6px solid var(--rule); }
figcaption { font-size: 8.5pt; color: var(--muted); margin-top: 1mm; }
.note { color: var(--muted); font-size: 8.6pt; }
.bias { font-size: 8.6pt; }
ol.refs { padding-left: 6mm; font-size: 8.6pt; }
ol.refs li { margin-bottom: 1mm; break-inside: avoid; }
pre.scenario { font-size: 7.4pt; white-space: pre-wrap; word-break: break-word; border: 0.6px solid var(--rule); padding: 2mm; background: #f8fafc; }
.page-break { break-before: page; }
#comparison-table { font-size: 7.8pt; table-layout: fixed; }
#comparison-table th, #comparison-table td { white-space: normal; overflow-wrap: anywhere; padding: 0.8mm 1mm; }
#comparison-table th:nth-child(2), #comparison-table td:nth-child(2) { width: 24%; }
td.path { overflow-wrap: anywhere; }
h2.variant-title { font-size: 16pt; border-bottom-width: 3px; }
.variant section h2 { font-size: 12pt; }
section { break-inside: auto; }
.print-footer { display: none; }
table.layout, table.layout > * > tr > td { border: 0; padding: 0; margin: 0; background: none; }
table.layout > tbody > tr { break-inside: auto; }
.footer-space { display: none; }
@media print {
  main { padding: 0; max-width: none; }
  /* Chromium paints a fixed element on every printed page; the layout table's footer row (repeated on
     every page) keeps the same height free so the caution never covers text. */
  .footer-space { display: block; height: 15mm; }
  .print-footer {
    display: block; position: fixed; left: 0; right: 0; bottom: 0; height: 12mm; background: #fff;
    font-size: 7.2pt; line-height: 1.3; color: var(--muted); border-top: 0.6px solid var(--rule); padding: 1.2mm 0 0 0;
  }
}
@media screen {
  body { background: #e2e8f0; }
  main { background: #fff; padding: 12mm 14mm 16mm; margin: 6mm auto; box-shadow: 0 1px 6px rgba(15, 23, 42, 0.25); }
}
`;
