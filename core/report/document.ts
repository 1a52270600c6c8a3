/** The printable document around a report body: title block, caution on page one, footer on every page. */
import { html, raw, type RawHtml } from "./format";
import { REPORT_CSS } from "./style";

export interface DocumentHead {
  readonly title: string;
  readonly subtitle: string;
  readonly version: string;
  readonly inputsHash: string;
  readonly generatedAt: string;
  readonly caution: string;
}

/** CSS string literal (for the running page header), escaped so no text can end the string or the rule. */
function cssString(text: string): string {
  return `"${text
    .replace(/[\\"]/g, "\\$&")
    .replace(/[\n\r]+/g, " ")
    .replace(/</g, "\\3c ")}"`;
}

function runningHeaderCss(text: string): string {
  const short = text.length > 110 ? `${text.slice(0, 107)}…` : text;
  return `\n@page { @top-left { content: ${cssString(short)}; font: 8pt Helvetica, Arial, sans-serif; color: #475569; } }\n@page :first { @top-left { content: none; } }\n`;
}

/** Wraps a body in the printable document: title block, caution on page one, footer on every page. */
export function documentHtml(head: DocumentHead, body: RawHtml, appendix: RawHtml): string {
  const date = head.generatedAt
    .replace("T", " ")
    .replace(/\.\d+Z$/, " UTC")
    .replace(/Z$/, " UTC");
  const doc = html`<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="Brinefield ${head.version}">
<title>${head.title} — ${head.subtitle}</title>
<style>${raw(REPORT_CSS)}${raw(runningHeaderCss(`${head.title} · ${head.subtitle} · inputs ${head.inputsHash}`))}</style>
</head>
<body>
<div class="print-footer" id="print-footer">${head.caution}<br>Brinefield ${head.version} · inputs ${head.inputsHash} · ${date}</div>
<table class="layout"><tfoot><tr><td><div class="footer-space"></div></td></tr></tfoot><tbody><tr><td>
<main>
<header id="title">
<h1>${head.title}</h1>
<p class="subtitle">${head.subtitle}</p>
<dl class="meta">
<dt>Date</dt><dd id="generated-at">${date}</dd>
<dt>Program</dt><dd>Brinefield <span id="program-version">${head.version}</span></dd>
<dt>Inputs hash</dt><dd><span class="hash" id="inputs-hash">${head.inputsHash}</span> (equal inputs give equal hashes)</dd>
</dl>
<div class="caution" id="caution">${head.caution}</div>
</header>
${body}
${appendix}
</main>
</td></tr></tbody></table>
</body>
</html>
`;
  return doc.__html;
}
