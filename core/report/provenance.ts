/** The report's methods table and reference list, from the sources the result cites. */
import type { BrinefieldResult } from "../result/contract";
import { html, join, type RawHtml } from "./format";
import { referencesFromSources, secondaryQuotationsFor } from "./reference-lookup";
import type { Reference } from "./reference-entry";

/** Every source string the result cites, for the reference list. */
export function resultSources(result: BrinefieldResult): string[] {
  return [
    result.densities.equationOfState.source,
    ...result.methods.map((m) => m.source),
    ...result.nearField.flatMap((m) => [
      m.source,
      ...(m.variants ?? []).map((v) => v.source),
      ...m.warnings.flatMap((w) => (w.source ? [w.source] : [])),
    ]),
    result.multiport.source,
    ...result.warnings.flatMap((w) => (w.source ? [w.source] : [])),
  ];
}

/**
 * Says once, in plain words, which coefficients of the cited works come from secondary quotations rather
 * than the original papers, and whose volume and page details were not checked.
 */
function provenanceHtml(references: readonly Reference[]): RawHtml {
  const quoted = secondaryQuotationsFor(references);
  const unchecked = references.filter((r) => !r.detailsChecked);
  return join([
    quoted.length > 0
      ? html`<p id="secondary-quotations"><strong>Coefficients not checked against the original papers.</strong> Brinefield takes the following from secondary quotations (textbooks, reviews and later papers that quote them) rather than from the original papers: ${quoted.map((q) => q.what).join("; ")}. They are quoted consistently, but confirm them in the originals before relying on a result that depends on them.</p>`
      : html``,
    unchecked.length > 0
      ? html`<p class="note">Volume and page details not checked against a published listing: ${unchecked.map((r) => r.key).join("; ")}.</p>`
      : html``,
  ]);
}

export function methodsAndReferences(result: BrinefieldResult): { methods: RawHtml; references: RawHtml } {
  const methods = html`<table id="methods-table"><thead><tr><th>Stage</th><th>Method</th><th>Source</th></tr></thead><tbody>${join(
    result.methods.map((m) => html`<tr><td>${m.stage}</td><td>${m.name}</td><td>${m.source}</td></tr>`),
  )}</tbody></table>`;
  const { references, uncited } = referencesFromSources(resultSources(result));
  const list = html`<ol class="refs">${join(
    references.map((r) => html`<li data-key="${r.key}">${r.citation}</li>`),
  )}</ol>`;
  const other =
    uncited.length > 0
      ? html`<p><strong>Other bases stated by the methods</strong> (no published work in the citation table):</p><ul class="refs">${join(uncited.map((u) => html`<li>${u}</li>`))}</ul>`
      : html``;
  return {
    methods,
    references: join([list, other, provenanceHtml(references)]),
  };
}
