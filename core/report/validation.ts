/**
 * Report appendix "How the methods compare with published experiments": the live validation table
 * (core/validation), both near-field methods against every published laboratory point held, with the
 * ratio and whether it lies in the method's stated bias band. Same numbers as `brinefield validate`.
 */
import { validationTable } from "../validation";
import { html, join, reportNumber, type RawHtml } from "./format";

export const VALIDATION_SECTION_ID = "validation";

export function validationAppendixHtml(idPrefix = ""): RawHtml {
  const table = validationTable();
  const inBand = table.points.filter((p) => p.withinBand).length;
  const rows = table.points.map(
    (p) =>
      html`<tr><td>${p.method}</td><td>${p.quantity} (÷ ${p.unit})</td><td class="num">${String(p.angle)}°</td><td class="num">${reportNumber(p.published)}</td><td class="num">${reportNumber(p.model)}</td><td class="num">${p.ratio.toFixed(2)}</td><td class="num">${p.band[0].toFixed(2)}–${p.band[1].toFixed(2)}</td><td class="${p.withinBand ? "pass" : "fail"}">${p.withinBand ? "yes" : "no"}</td><td>${p.mark}</td><td>${p.source}</td></tr>`,
  );
  return html`<section id="${idPrefix}${VALIDATION_SECTION_ID}" class="page-break"><h2>Appendix: How the methods compare with published experiments</h2><p>Both near-field methods run on every published laboratory point for inclined dense jets that Brinefield holds, in the laboratory configuration: ${table.configuration}. Lengths are in units of d·F, dilutions of F. The ratio is model ÷ published; the band is the method's stated bias (the integral model under-predicts rise and dilution, as Lai &amp; Lee (2012) found for integral models; the length-scale headline is the less favourable of the datasets). "Original" values were read in the cited paper; "quoted" values are as quoted by another published source. ${String(inBand)} of ${String(table.points.length)} comparisons lie in their band. The same table is printed by <code>brinefield validate</code>.</p><table id="${idPrefix}validation-table"><caption>Model against published laboratory values</caption><thead><tr><th>Method</th><th>Quantity</th><th class="num">Angle</th><th class="num">Published</th><th class="num">Model</th><th class="num">Ratio</th><th class="num">Band</th><th>In band</th><th>Mark</th><th>Source</th></tr></thead><tbody>${join(rows)}</tbody></table></section>`;
}
