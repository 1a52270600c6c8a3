/**
 * The screening report: one self-contained, printable HTML document a permit file can hold. Every
 * number comes from the `BrinefieldResult` (or, for inputs, from the scenario as read) and is printed by
 * `reportNumber`. Result cells carry `data-path` naming the result field they print, so tests and
 * reviewers can trace each figure back to `brinefield run --json`.
 */
import type { BrinefieldResult, Verdict } from "../result/contract";
import { CAUTION } from "../result/contract";
import type { NearFieldMethodResult } from "../nearfield/types";
import { parseScenario } from "../scenario/parse";
import type { Scenario } from "../scenario/types";
import { escapeHtml, html, join, raw, reportNumber, reportValue, type RawHtml } from "./format";
import { inputsHtml, rawInputsHtml, valueAtPath } from "./inputs";
import { dilutionChartSvg, multiportSketchSvg, sideViewSvg } from "./figures";
import { referencesFromSources, secondaryQuotationsFor, type Reference } from "./references";
import { REPORT_CSS } from "./style";
import { uncertaintyHtml } from "./uncertainty";
import { validationAppendixHtml } from "./validation";
import { claimHtml } from "./claim";
import { intakeHtml, recordHtml } from "./record";
import { basinHtml } from "./basin";
import type { ClaimCheck } from "../compliance/claim";

export interface ReportInput {
  /** The scenario file as parsed JSON (raw: units as the user wrote them). */
  readonly scenarioFile: unknown;
  /** The file's text, printed in the appendix so the run can be repeated. */
  readonly scenarioText?: string;
}

export interface ReportOptions {
  /** Rendered 3D view as a PNG data URI. */
  readonly view3dPng?: string;
  /** Why there is no 3D image (printed in its place), e.g. "the renderer could not be built". */
  readonly view3dNote?: string;
  /** Monte Carlo results (shape owned by the study code; read structurally). */
  readonly uncertainty?: unknown;
  /** A claimed dilution checked at a distance (`report --claimed-dilution N --at D`). */
  readonly claim?: ClaimCheck;
  /** ISO date-time of generation; defaults to now. Fix it for reproducible output. */
  readonly generatedAt?: string;
}

/** Section ids, in order; tests check that each is present. */
export const REPORT_SECTIONS = [
  "summary",
  "job",
  "inputs",
  "derived",
  "near-field",
  "multiport",
  "mixing-zone",
  "compliance",
  "warnings",
  "claim",
  "uncertainty",
  "view-3d",
  "methods",
  "references",
  "scenario-file",
  "validation",
] as const;

/** A result number, printed through `reportNumber`, tagged with the result path it came from. */
export function resultCell(result: BrinefieldResult, path: string, extraClass = ""): RawHtml {
  const v = valueAtPath(result, path);
  const text = typeof v === "number" ? reportValue(path, v) : "—";
  return html`<td class="num${raw(extraClass ? ` ${extraClass}` : "")}" data-path="${path}">${text}</td>`;
}

function resultRow(result: BrinefieldResult, label: string, path: string, unit: string): RawHtml {
  return html`<tr><td>${label}</td>${resultCell(result, path)}<td>${unit}</td></tr>`;
}

function keyValueTable(caption: string, rows: readonly RawHtml[]): RawHtml {
  return html`<table class="kv"><caption>${caption}</caption><thead><tr><th>Quantity</th><th class="num">Value</th><th>Unit</th></tr></thead><tbody>${join(rows)}</tbody></table>`;
}

function section(id: string, title: string, body: RawHtml, extraClass = ""): RawHtml {
  return html`<section id="${id}"${raw(extraClass ? ` class="${extraClass}"` : "")}><h2>${title}</h2>${body}</section>`;
}

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

function verdictHtml(result: BrinefieldResult): RawHtml {
  const c = result.compliance;
  const o = result.overall ?? {
    verdict: c.verdict,
    governingCase: "stated",
    margin: c.margin,
    edgeDilution: result.mixingZone.dilution,
  };
  const style = verdictStyle(o.verdict);
  const reasons = [
    ...new Set(
      (result.cases ?? []).flatMap((k) => k.scopeReasons.map((r) => (k.name === "stated" ? r : `${k.name}: ${r}`))),
    ),
  ];
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

function jobHtml(result: BrinefieldResult, scenario: Scenario | null): RawHtml {
  const description = scenario?.description;
  return join([
    html`<p><strong>Scenario:</strong> ${result.scenarioName}</p>`,
    description ? html`<p><strong>Description:</strong> ${description}</p>` : html``,
    html`<p><strong>Question asked:</strong> ${questionAsked(result)}</p>`,
    html`<p class="note">Near-field dilution carried to the edge: ${scenario?.options.nearFieldForEdge ?? "—"}; method beyond the near field: ${scenario?.options.farField ?? "—"}.</p>`,
  ]);
}

function derivedHtml(result: BrinefieldResult): RawHtml {
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

const NEAR_FIELD_ROWS: readonly (readonly [label: string, key: string, unit: string])[] = [
  ["Maximum rise of the upper edge above the port", "maxRiseHeight", "m"],
  ["Plan distance to maximum rise", "maxRiseDistance", "m"],
  ["Centreline dilution at maximum rise", "maxRiseDilution", "–"],
  ["Return to port level, plan distance", "returnDistance", "m"],
  ["Seabed impact, plan distance", "impactDistance", "m"],
  ["Centreline dilution at impact", "impactDilution", "–"],
  ["Impact dilution, low end of published scatter", "dilutionRange.0", "–"],
  ["Impact dilution, high end of published scatter", "dilutionRange.1", "–"],
  ["End of the near field, plan distance", "nearFieldDistance", "m"],
  ["Dilution at the end of the near field", "nearFieldDilution", "–"],
  ["Entrained seawater flow at impact", "entrainedFlow", "m³/s"],
];

function nearFieldHtml(result: BrinefieldResult, figure: string): RawHtml {
  const methods = result.nearField;
  if (methods.length === 0) return html`<p>No near-field method produced a result.</p>`;
  const head = html`<tr><th>Quantity</th>${join(methods.map((m) => html`<th class="num">${m.method}</th>`))}<th>Unit</th></tr>`;
  const rows = NEAR_FIELD_ROWS.filter(([, key]) => methods.some((m) => typeof valueAtPath(m, key) === "number")).map(
    ([label, key, unit]) =>
      html`<tr><td>${label}</td>${join(methods.map((_, i) => resultCell(result, `nearField.${i}.${key}`)))}<td>${unit}</td></tr>`,
  );
  const table = html`<table id="near-field-table"><caption>Near-field results, side by side</caption><thead>${head}</thead><tbody>${join(rows)}</tbody></table>`;
  const perMethod = methods.map((m, i) => methodDetail(result, m, i));
  return join([
    table,
    join(perMethod),
    html`<figure id="figure-side-view">${raw(figure)}<figcaption>Figure 1. Side view of the jet from the mean port: centreline of each method, maximum rise and seabed impact. Distances are along the discharge direction.</figcaption></figure>`,
  ]);
}

function methodDetail(result: BrinefieldResult, m: NearFieldMethodResult, i: number): RawHtml {
  const parts: RawHtml[] = [html`<h3>${m.method}</h3>`, html`<p class="bias"><strong>Source:</strong> ${m.source}</p>`];
  parts.push(html`<p class="bias"><strong>Known bias:</strong> ${m.bias}</p>`);
  for (const note of m.notes ?? []) parts.push(html`<p class="note">${note}</p>`);
  if (m.variants && m.variants.length > 0) {
    const rows = m.variants.map(
      (v, j) =>
        html`<tr><td>${v.source}${v.note ? html`<br><span class="note">${v.note}</span>` : html``}</td>${join(
          [
            "maxRiseHeight",
            "returnDistance",
            "impactDistance",
            "impactDilution",
            "nearFieldDistance",
            "nearFieldDilution",
          ].map((k) => resultCell(result, `nearField.${i}.variants.${j}.${k}`)),
        )}</tr>`,
    );
    parts.push(
      html`<table class="variants"><caption>${m.method}: published coefficient sets</caption><thead><tr><th>Coefficients from</th><th class="num">Max rise (m)</th><th class="num">Return (m)</th><th class="num">Impact (m)</th><th class="num">S impact</th><th class="num">Near-field end (m)</th><th class="num">S near field</th></tr></thead><tbody>${join(rows)}</tbody></table>`,
    );
  }
  return join(parts);
}

/** Regimes the sketch draws (a single port has no neighbours to draw). */
const REGIME_SKETCHED = new Set(["independent", "partially-merged", "merged-line-source"]);
/** For a discharge lighter than the sea: what rises, where it spreads and how the blend behaves. */
function risingNoteHtml(result: BrinefieldResult): RawHtml {
  const parts: RawHtml[] = [];
  if (!(result.densities.reducedGravity > 0)) {
    const fields = result.nearField
      .filter((m) => m.risingField && m.risingField.kind !== "none")
      .map((m) => {
        const f = m.risingField!;
        return `${m.method}: ${f.kind === "trapped" ? `trapped ${reportNumber(f.trapHeight ?? f.height)} m above the port` : "reaches the surface"}, dilution ${reportNumber(f.dilution)} where the field starts ${reportNumber(f.distance)} m from the port`;
      });
    parts.push(
      html`<p id="rising-plume"><strong>Rising plume.</strong> The discharge is lighter than the receiving water at the port (g′ = ${reportNumber(result.densities.reducedGravity)} m/s²): it rises as a buoyant plume instead of falling to the seabed. ${fields.join("; ")}. Beyond the plume the field at the surface or trap level is carried by passive diffusion; the maximum rise is the highest point of the plume's upper edge.</p>`,
    );
  }
  if (result.blend) parts.push(html`<p id="blend-sign"><strong>Blend.</strong> ${result.blend.note}</p>`);
  return join(parts);
}

function multiportHtml(result: BrinefieldResult): RawHtml {
  const mp = result.multiport;
  return join([
    html`<p><strong>Regime:</strong> ${mp.regime}${mp.merged ? " (adjacent jets merge)" : ""}. ${mp.reason}</p>`,
    REGIME_SKETCHED.has(mp.regime)
      ? html`<figure class="regime-sketch">${raw(multiportSketchSvg(mp.regime))}<figcaption>Neighbouring jets seen along the diffuser in each regime; this design's regime is framed.</figcaption></figure>`
      : raw(""),
    keyValueTable("Multiport interaction", [
      resultRow(result, "Ports used", "multiport.portsUsed", "–"),
      resultRow(result, "Spacing ratio s/(dF)", "multiport.spacingRatio", "–"),
      resultRow(result, "Factor applied to single-jet dilutions", "multiport.dilutionFactor", "–"),
    ]),
    html`<p class="note">Source: ${mp.source}</p>`,
  ]);
}

function mixingZoneHtml(result: BrinefieldResult, figure: string): RawHtml {
  const mz = result.mixingZone;
  const kv = keyValueTable("At the mixing-zone edge", [
    resultRow(result, "Mixing-zone radius", "mixingZone.radius", "m"),
    resultRow(result, "Centreline dilution at the edge", "mixingZone.dilution", "–"),
    resultRow(result, "Dense-layer thickness at the edge", "mixingZone.layerThickness", "m"),
    resultRow(result, "Seabed area above the governing limit", "mixingZone.footprint.area", "m²"),
    resultRow(result, "Furthest extent above the limit", "mixingZone.footprint.furthestExtent", "m"),
  ]);
  const method = html`<p><strong>Method to the edge:</strong> ${mz.method} (near-field input: ${mz.nearFieldMethod}).${mz.edgeInsideNearField ? " The edge lies inside the near field." : ""}</p>`;
  const alternatives =
    mz.alternatives.length > 0
      ? html`<table><caption>Edge dilution by the other methods</caption><thead><tr><th>Method</th><th class="num">Dilution at the edge</th></tr></thead><tbody>${join(
          mz.alternatives.map(
            (a, i) => html`<tr><td>${a.method}</td>${resultCell(result, `mixingZone.alternatives.${i}.dilution`)}</tr>`,
          ),
        )}</tbody></table>`
      : html``;
  const constituents = html`<table id="constituents-table"><caption>Dilution and concentration at the edge, per constituent</caption><thead><tr><th>Constituent</th><th>Unit</th><th class="num">In the discharge</th><th class="num">Background</th><th class="num">At the edge</th><th class="num">Increase over background</th></tr></thead><tbody>${join(
    mz.constituents.map(
      (c, i) =>
        html`<tr><td>${c.constituent}</td><td>${c.unit}</td>${resultCell(result, `mixingZone.constituents.${i}.discharge`)}${resultCell(result, `mixingZone.constituents.${i}.background`)}${resultCell(result, `mixingZone.constituents.${i}.concentration`)}${resultCell(result, `mixingZone.constituents.${i}.increase`)}</tr>`,
    ),
  )}</tbody></table>`;
  const notModelled =
    mz.notModelled.length > 0
      ? html`<p><strong>Not modelled:</strong></p><ul>${join(mz.notModelled.map((t) => html`<li>${t}</li>`))}</ul>`
      : html``;
  return join([
    method,
    kv,
    alternatives,
    constituents,
    html`<figure id="figure-dilution">${raw(figure)}<figcaption>Figure 2. Minimum (centreline) dilution against plan distance from the diffuser, coloured by stage, with the mixing-zone edge and the dilution the governing limit requires.</figcaption></figure>`,
    notModelled,
  ]);
}

function complianceHtml(result: BrinefieldResult): RawHtml {
  const c = result.compliance;
  const rows = c.constituents.map(
    (k, i) =>
      html`<tr><td>${k.constituent}</td><td>${k.limit}</td>${resultCell(result, `compliance.constituents.${i}.requiredDilution`)}${resultCell(result, `compliance.constituents.${i}.edgeDilution`)}${resultCell(result, `compliance.constituents.${i}.margin`)}<td class="${c.verdict === "outside-scope" ? "scope" : k.pass ? "pass" : "fail"}">${c.verdict === "outside-scope" ? "outside-scope" : k.pass ? "meets" : "exceeds"}</td></tr>`,
  );
  return join([
    html`<p>Under the stated conditions: <strong>${c.verdict === "outside-scope" ? "outside the screening methods' scope (see the reasons above)" : c.pass ? "the discharge meets every limit at the mixing-zone edge" : "the discharge does not meet every limit at the mixing-zone edge"}</strong>; governing constituent ${c.governingConstituent}, margin ${raw(`<span data-path="compliance.margin">${escapeHtml(reportNumber(c.margin))}</span>`)}.</p>`,
    html`<table id="compliance-table"><caption>Verdict and margin per limit (margin = edge dilution ÷ required dilution)</caption><thead><tr><th>Constituent</th><th>Limit</th><th class="num">Required dilution</th><th class="num">Edge dilution</th><th class="num">Margin</th><th>Verdict</th></tr></thead><tbody>${join(rows)}</tbody></table>`,
  ]);
}

function warningsHtml(result: BrinefieldResult): RawHtml {
  const all = [
    ...result.warnings.map((w) => ({ w, where: w.stage ?? "" })),
    ...result.nearField.flatMap((m) => m.warnings.map((w) => ({ w, where: w.stage ?? m.method }))),
  ];
  const seen = new Set<string>();
  const unique = all.filter(({ w }) => {
    const k = `${w.code}|${w.message}`;
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
  if (unique.length === 0) return html`<p>No warnings were raised.</p>`;
  const order = { serious: 0, warning: 1, info: 2 } as const;
  unique.sort((a, b) => order[a.w.severity] - order[b.w.severity]);
  const rows = unique.map(
    ({ w, where }) =>
      html`<tr><td class="sev-${w.severity}">${w.severity}</td><td>${where}</td><td>${w.message}${w.source ? html`<br><span class="note">Range from: ${w.source}</span>` : html``}</td></tr>`,
  );
  return html`<table id="warnings-table"><thead><tr><th>Severity</th><th>Stage</th><th>Warning</th></tr></thead><tbody>${join(rows)}</tbody></table>`;
}

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

function methodsAndReferences(result: BrinefieldResult): { methods: RawHtml; references: RawHtml } {
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

function view3dHtml(options: ReportOptions): RawHtml {
  if (options.view3dPng && /^data:image\/png;base64,/.test(options.view3dPng)) {
    return html`<figure id="figure-3d"><img alt="Rendered 3D view of the diffuser and plume" src="${options.view3dPng}"><figcaption>Figure 3. Rendered 3D view of the diffuser, the jets and the spreading layer (illustration; the numbers are in the tables).</figcaption></figure>`;
  }
  return html`<p class="note" id="no-3d">No 3D view is included: ${options.view3dNote ?? "none was supplied when the report was made"}.</p>`;
}

/** Reads the scenario back from the raw file so inputs can be shown in SI; null when it cannot be read. */
function readScenario(file: unknown): Scenario | null {
  try {
    const outcome = parseScenario(file);
    return outcome.ok ? outcome.scenario : null;
  } catch {
    // The report must still be produced from the result when the file is not a readable scenario.
    return null;
  }
}

/** The report document body (without <html>), reused by study reports for each variant. */
export function reportBody(
  result: BrinefieldResult,
  input: ReportInput,
  options: ReportOptions = {},
  idPrefix = "",
): RawHtml {
  const scenario = readScenario(input.scenarioFile);
  const hp = scenario?.diffuser.portHeight ?? null;
  const side = sideViewSvg({
    nearField: result.nearField,
    depth: scenario?.ambient.depth ?? null,
    portHeight: hp,
    portAngle: scenario?.diffuser.portAngle ?? null,
  });
  const chart = dilutionChartSvg({
    mixingZone: result.mixingZone,
    requiredDilution: Number.isFinite(result.compliance.requiredDilution) ? result.compliance.requiredDilution : null,
  });
  const { methods, references } = methodsAndReferences(result);
  const id = (s: string) => `${idPrefix}${s}`;
  return join([
    section(id("summary"), "Summary", verdictHtml(result)),
    section(id("job"), "The job and the question asked", jobHtml(result, scenario)),
    section(
      id("inputs"),
      "Inputs",
      scenario ? inputsHtml(input.scenarioFile, scenario) : rawInputsHtml(input.scenarioFile),
    ),
    section(id("derived"), "Derived quantities", derivedHtml(result)),
    section(
      id("near-field"),
      result.densities.reducedGravity > 0
        ? "Near field: dense jet from the mean port"
        : "Near field: rising plume from the mean port",
      join([risingNoteHtml(result), nearFieldHtml(result, side)]),
    ),
    section(id("multiport"), "Multiport regime", multiportHtml(result)),
    section(id("mixing-zone"), "Mixing-zone edge", mixingZoneHtml(result, chart)),
    ...(result.basin
      ? [section(id("basin"), "Background build-up in the enclosed basin", basinHtml(result.basin))]
      : []),
    section(id("compliance"), "Compliance: verdict and margin", complianceHtml(result)),
    ...(result.record ? [section(id("record"), "Ambient record: compliance over time", recordHtml(result))] : []),
    ...(result.intake ? [section(id("intake"), "The plant's intake", intakeHtml(result))] : []),
    section(id("warnings"), "Warnings", warningsHtml(result)),
    options.claim !== undefined
      ? section(id("claim"), "Claimed dilution check", claimHtml(options.claim))
      : section(
          id("claim"),
          "Claimed dilution check",
          html`<p class="note">No claimed dilution was checked for this report (report --claimed-dilution N --at D adds the check).</p>`,
        ),
    options.uncertainty !== undefined
      ? section(id("uncertainty"), "Uncertainty", uncertaintyHtml(options.uncertainty))
      : section(
          id("uncertainty"),
          "Uncertainty",
          html`<p class="note">No uncertainty analysis was run for this report.</p>`,
        ),
    section(id("view-3d"), "3D view", view3dHtml(options)),
    section(id("methods"), "Methods used", methods),
    section(id("references"), "References", references),
  ]);
}

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

function appendixHtml(
  result: BrinefieldResult,
  input: ReportInput,
  idPrefix = "",
  title = "Appendix: the scenario file as read",
): RawHtml {
  const conversions =
    result.conversions.length > 0
      ? html`<p><strong>Conversions made while reading the inputs:</strong></p><ul>${join(result.conversions.map((c) => html`<li>${c}</li>`))}</ul>`
      : html``;
  const text = input.scenarioText ?? JSON.stringify(input.scenarioFile, null, 2);
  return section(
    `${idPrefix}scenario-file`,
    title,
    join([
      conversions,
      html`<p class="note">Run it again with <code>brinefield run</code> to reproduce this report; the inputs hash must match.</p>`,
      html`<pre class="scenario">${text}</pre>`,
    ]),
    "page-break",
  );
}

/**
 * The complete, self-contained, printable HTML report for one scenario's result.
 * Pure: no DOM, no I/O; `generatedAt` defaults to the current time.
 */
export function reportHtml(result: BrinefieldResult, input: ReportInput, options: ReportOptions = {}): string {
  return documentHtml(
    {
      title: "Brine outfall screening report",
      subtitle: result.scenarioName,
      version: result.program.version,
      inputsHash: result.inputsHash,
      generatedAt: options.generatedAt ?? new Date().toISOString(),
      caution: result.caution || CAUTION,
    },
    reportBody(result, input, options),
    join([appendixHtml(result, input), validationAppendixHtml()]),
  );
}

export { appendixHtml };
