/** Building blocks of the report's sections: a section, a key–value table, a row read from the result. */
import type { BrinefieldResult } from "../result/contract";
import { html, join, raw, reportValue, type RawHtml } from "./format";
import { valueAtPath } from "./inputs";

/** A result number, printed through `reportNumber`, tagged with the result path it came from. */
export function resultCell(result: BrinefieldResult, path: string, extraClass = ""): RawHtml {
  const v = valueAtPath(result, path);
  const text = typeof v === "number" ? reportValue(path, v) : "—";
  return html`<td class="num${raw(extraClass ? ` ${extraClass}` : "")}" data-path="${path}">${text}</td>`;
}

export function resultRow(result: BrinefieldResult, label: string, path: string, unit: string): RawHtml {
  return html`<tr><td>${label}</td>${resultCell(result, path)}<td>${unit}</td></tr>`;
}

export function keyValueTable(caption: string, rows: readonly RawHtml[]): RawHtml {
  return html`<table class="kv"><caption>${caption}</caption><thead><tr><th>Quantity</th><th class="num">Value</th><th>Unit</th></tr></thead><tbody>${join(rows)}</tbody></table>`;
}

export function section(id: string, title: string, body: RawHtml, extraClass = ""): RawHtml {
  return html`<section id="${id}"${raw(extraClass ? ` class="${extraClass}"` : "")}><h2>${title}</h2>${body}</section>`;
}
