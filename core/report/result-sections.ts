/** The report's result sections: near field, multiport, mixing-zone edge, compliance and warnings. */
import type { BrinefieldResult } from "../result/contract";
import type { NearFieldMethodResult } from "../nearfield/types";
import { escapeHtml, html, join, raw, reportNumber, type RawHtml } from "./format";
import { valueAtPath } from "./inputs";
import { multiportSketchSvg } from "./figures";
import { resultCell, resultRow, keyValueTable } from "./section-parts";

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

export function nearFieldHtml(result: BrinefieldResult, figure: string): RawHtml {
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
export function risingNoteHtml(result: BrinefieldResult): RawHtml {
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

export function multiportHtml(result: BrinefieldResult): RawHtml {
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

export function mixingZoneHtml(result: BrinefieldResult, figure: string): RawHtml {
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

export function complianceHtml(result: BrinefieldResult): RawHtml {
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

export function warningsHtml(result: BrinefieldResult): RawHtml {
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
