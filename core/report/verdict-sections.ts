/** The report's opening sections: the question asked, the verdict (per ambient case), the job and the derived inputs. */
import { overallOf, scopeReasonsOf, type BrinefieldResult, type Verdict } from "../result/contract";
import type { Scenario } from "../scenario/types";
import { escapeHtml, html, join, raw, reportNumber, type RawHtml } from "./format";
import { resultRow, keyValueTable } from "./section-parts";

/** The question the run answers, in words, from the limits and radius. */
export function questionAsked(result: BrinefieldResult): string {
  const limits = result.compliance.constituents.map((c) => c.limit).filter((l) => l.trim() !== "");
  const edge = `${reportNumber(result.mixingZone.radius)} m from the diffuser`;
  if (limits.length === 0) return `What is the dilution of the brine at the mixing-zone edge, ${edge}?`;
  return `Does the discharge meet ${limits.join("; ")} at the mixing-zone edge, ${edge}?`;
}

/** CSS class and badge words of a verdict: outside-scope is never shown in the colour of a pass. */
export function verdictStyle(v: Verdict | "refused"): { cls: string; badge: string } {
  if (v === "meets") return { cls: "pass", badge: "MEETS LIMIT" };
  if (v === "exceeds") return { cls: "fail", badge: "EXCEEDS LIMIT" };
  if (v === "outside-scope") return { cls: "scope", badge: "OUTSIDE SCOPE" };
  return { cls: "refused", badge: "REFUSED" };
}

function casesHtml(result: BrinefieldResult): RawHtml {
  const cases = result.cases ?? [];
  if (cases.length === 0 || result.record) return html``;
  const rows = cases.map(
    (k) =>
      html`<tr><td>${k.name}${k.name === result.overall.governingCase ? " (governing)" : ""}</td><td class="num">${reportNumber(k.edgeDilution)}</td><td class="num">${reportNumber(k.margin)}</td><td class="${verdictStyle(k.verdict).cls}">${k.verdict}</td></tr>`,
  );
  return html`<table id="cases-table"><caption>Verdict per ambient case (the stated conditions, each listed case, slack water); the overall verdict is "exceeds" if any case exceeds, else "outside-scope" if any case is, else "meets"</caption><thead><tr><th>Case</th><th class="num">Edge dilution</th><th class="num">Margin</th><th>Verdict</th></tr></thead><tbody>${join(rows)}</tbody></table>`;
}

export function verdictHtml(result: BrinefieldResult): RawHtml {
  const c = result.compliance;
  const o = overallOf(result);
  const style = verdictStyle(o.verdict);
  const reasons = scopeReasonsOf(result);
  return html`<div class="verdict ${style.cls}" id="verdict" data-verdict="${o.verdict}">
<div class="badge">${style.badge}</div>
<div>Overall verdict over every ambient case: <strong>${o.verdict}</strong>; governing case: <strong>${o.governingCase}</strong>, margin <strong data-path="overall.margin">${reportNumber(o.margin)}</strong></div>
${o.verdict === "outside-scope" ? html`<div class="scope-reasons">Outside the screening methods' scope: ${reasons.join(" ")} The numbers below are kept for reading; they support no verdict.</div>` : html``}
<div>Under the stated conditions — governing constituent: <strong>${c.governingConstituent}</strong>; verdict <strong>${c.verdict}</strong></div>
<div>Dilution at the mixing-zone edge (${raw(`<span data-path="mixingZone.radius">${escapeHtml(reportNumber(result.mixingZone.radius))}</span>`)} m): <strong data-path="mixingZone.dilution">${reportNumber(result.mixingZone.dilution)}</strong>; required: <strong data-path="compliance.requiredDilution">${reportNumber(c.requiredDilution)}</strong></div>
<div>Margin (edge dilution ÷ required dilution): <strong data-path="compliance.margin">${reportNumber(c.margin)}</strong> ${c.margin >= 1 ? "(≥ 1 meets the limit)" : "(< 1 does not meet the limit)"}</div>
<div class="note">Screening verdict under the methods listed in this report; see the caution above.</div>
</div>${casesHtml(result)}`;
}

export function jobHtml(result: BrinefieldResult, scenario: Scenario | null): RawHtml {
  const description = scenario?.description;
  return join([
    html`<p><strong>Scenario:</strong> ${result.scenarioName}</p>`,
    description ? html`<p><strong>Description:</strong> ${description}</p>` : html``,
    html`<p><strong>Question asked:</strong> ${questionAsked(result)}</p>`,
    html`<p class="note">Near-field dilution carried to the edge: ${scenario?.options.nearFieldForEdge ?? "—"}; method beyond the near field: ${scenario?.options.farField ?? "—"}.</p>`,
  ]);
}

export function derivedHtml(result: BrinefieldResult): RawHtml {
  const eos = result.densities.equationOfState;
  const discharge = keyValueTable("Discharge as run", [
    resultRow(result, "Total brine flow", "discharge.flow", "m³/s"),
    resultRow(result, "Brine salinity", "discharge.salinity", "g/kg"),
    resultRow(result, "Brine temperature", "discharge.temperature", "°C"),
    html`<tr><td>Derived from the plant inputs</td><td class="num">${result.discharge.fromPlant ? "yes" : "no"}</td><td></td></tr>`,
  ]);
  const densities = keyValueTable("Densities", [
    resultRow(result, "Brine density at the port (in situ)", "densities.discharge", "kg/m³"),
    resultRow(result, "Ambient density at the port depth", "densities.ambient", "kg/m³"),
    resultRow(result, "Ambient density at the surface", "densities.ambientSurface", "kg/m³"),
    resultRow(result, "Ambient density at the seabed", "densities.ambientBottom", "kg/m³"),
    resultRow(result, "Reduced gravity g′ = g(ρ₀ − ρₐ)/ρₐ", "densities.reducedGravity", "m/s²"),
  ]);
  const eosHtml = html`<p><strong>Equation of state:</strong> ${eos.name}. ${eos.reason} <span class="note">Source: ${eos.source}.</span></p>`;
  const p = result.port;
  const iMin = p.flows.indexOf(Math.min(...p.flows));
  const iMax = p.flows.indexOf(Math.max(...p.flows));
  const flows =
    p.flows.length > 1
      ? html`<tr><td>Port flows (smallest – largest)</td><td class="num"><span data-path="port.flows.${String(iMin)}">${reportNumber(p.flows[iMin])}</span> – <span data-path="port.flows.${String(iMax)}">${reportNumber(p.flows[iMax])}</span></td><td>m³/s</td></tr>`
      : html``;
  const port = keyValueTable("Ports (mean port of the diffuser)", [
    resultRow(result, "Number of ports", "port.count", "–"),
    resultRow(result, "Effective port diameter", "port.diameter", "m"),
    resultRow(result, "Flow per port", "port.flow", "m³/s"),
    flows,
    resultRow(result, "Exit velocity", "port.velocity", "m/s"),
    resultRow(result, "Densimetric Froude number F = U/√(g′d)", "port.froude", "–"),
    resultRow(result, "Reynolds number", "port.reynolds", "–"),
    resultRow(result, "Exit head loss", "port.headLoss", "m"),
  ]);
  return join([discharge, densities, eosHtml, port]);
}
