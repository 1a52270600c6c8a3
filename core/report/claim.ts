/** The report's claim section: the claim check's verdict, numbers, chains, assumptions and range bar. */
import type { ClaimCheck } from "../compliance/claim";
import { html, join, raw, reportNumber, type RawHtml } from "./format";
import { claimRangeBarSvg } from "./claim-figure";

export const CLAIM_VERDICT_TEXT: Readonly<Record<ClaimCheck["verdict"], string>> = {
  supported: "SUPPORTED — at or below the conservative value",
  plausible: "PLAUSIBLE — only some method chains give it",
  "not-supported": "NOT SUPPORTED — above every method chain",
};

export function claimHtml(check: ClaimCheck): RawHtml {
  const rows = check.chains.map(
    (c) =>
      html`<tr><td>${c.case}</td><td>${c.method}</td><td class="num">${reportNumber(c.dilution)}</td><td class="num">${reportNumber(c.low)}–${reportNumber(c.high)}</td><td>${c.reproducesClaim ? (c.onlyWithinScatter ? "within scatter" : "yes") : "no"}</td></tr>`,
  );
  return html`<div class="claim-verdict" data-claim-verdict="${check.verdict}">
<p><b>${CLAIM_VERDICT_TEXT[check.verdict]}.</b> ${check.summary}</p>
<table class="kv"><tbody>
<tr><td>Claimed dilution</td><td class="num" data-claim="claimedDilution">${reportNumber(check.claimedDilution)}</td><td>at ${reportNumber(check.distance)} m</td></tr>
<tr><td>Conservative value (lowest edge dilution at that distance over the cases)</td><td class="num" data-claim="conservativeDilution">${reportNumber(check.conservativeDilution)}</td><td>case ${check.conservativeCase}</td></tr>
<tr><td>Claim ÷ conservative value</td><td class="num" data-claim="ratioToConservative">${reportNumber(check.ratioToConservative)}</td><td></td></tr>
</tbody></table></div>
<figure>${raw(claimRangeBarSvg(check))}<figcaption>Each method chain's dilution at ${reportNumber(check.distance)} m (dot) with its near-field method's stated scatter (bar), in every ambient case; the claim in red, the conservative value dashed. Blue rows give at least the claimed dilution.</figcaption></figure>
<table><caption>Method chains at ${reportNumber(check.distance)} m</caption><thead><tr><th>Case</th><th>Chain</th><th class="num">Dilution</th><th class="num">Stated scatter</th><th>Gives the claim</th></tr></thead><tbody>${join(rows)}</tbody></table>
${check.assumptionsNeeded.length ? html`<p>What the claim rests on:</p><ul>${join(check.assumptionsNeeded.map((a) => html`<li>${a}</li>`))}</ul>` : html``}
<p class="note">Verdicts: supported — at or below the conservative value (within 0.1 %); plausible — above it but at or below what at least one method chain gives; not supported — above every chain, scatter included.</p>`;
}
