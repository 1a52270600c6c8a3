/**
 * The report for a `brinefield-study`: the base scenario and each variant run for its stated ambient,
 * a comparison table up front, then one full report section per variant (same content as a scenario
 * report). Numbers in the comparison table carry `data-path` relative to that variant's result,
 * prefixed by the variant index: `variants.<i>.<result path>`.
 */
import type { BrinefieldResult } from "../result/contract";
import { CAUTION } from "../result/contract";
import { hashText } from "../scenario/hash";
import { valueAtPath } from "./inputs";
import { appendixHtml, documentHtml, reportBody, verdictStyle, type ReportOptions } from "./html";
import { validationAppendixHtml } from "./validation";
import { html, join, reportNumber, type RawHtml } from "./format";

export interface StudyReportVariant {
  /** "base" or the variant's name from the study file. */
  readonly name: string;
  readonly description?: string;
  /** The variant's overrides as written in the study file (shown in the comparison). */
  readonly overrides: Readonly<Record<string, unknown>>;
  /** The patched raw scenario (units as entered) the variant was read from. */
  readonly scenarioFile: unknown;
  readonly result: BrinefieldResult;
}

export interface StudyReportInput {
  readonly name: string;
  readonly description?: string;
  readonly studyText?: string;
  readonly variants: readonly StudyReportVariant[];
}

function cell(v: StudyReportVariant, i: number, path: string): RawHtml {
  const value = valueAtPath(v.result, path);
  return html`<td class="num" data-path="variants.${String(i)}.${path}">${typeof value === "number" ? reportNumber(value) : "—"}</td>`;
}

/** Side-by-side comparison of every variant's key results. */
export function studyComparisonHtml(variants: readonly StudyReportVariant[]): RawHtml {
  const methods = [...new Set(variants.flatMap((v) => v.result.nearField.map((m) => m.method)))];
  const head = html`<tr><th>Variant</th><th>Changes from the base</th>${join(
    methods.map((m) => html`<th class="num">S impact (${m})</th><th class="num">Max rise (${m}), m</th>`),
  )}<th class="num">S at edge</th><th class="num">S required</th><th class="num">Margin</th><th>Verdict</th></tr>`;
  const rows = variants.map((v, i) => {
    const changes = Object.entries(v.overrides)
      .map(([k, val]) => `${k} = ${typeof val === "string" ? val : JSON.stringify(val)}`)
      .join("; ");
    const perMethod = methods.map((m) => {
      const j = v.result.nearField.findIndex((x) => x.method === m);
      return j < 0
        ? html`<td class="num">—</td><td class="num">—</td>`
        : join([cell(v, i, `nearField.${j}.impactDilution`), cell(v, i, `nearField.${j}.maxRiseHeight`)]);
    });
    const o = v.result.overall;
    return html`<tr><td><a href="#v${String(i)}-summary">${v.name}</a></td><td class="path">${changes || "—"}</td>${join(perMethod)}${cell(v, i, "mixingZone.dilution")}${cell(v, i, "compliance.requiredDilution")}${cell(v, i, "compliance.margin")}<td class="${verdictStyle(o.verdict).cls}">${o.verdict} (${o.governingCase}, margin ${reportNumber(o.margin)})</td></tr>`;
  });
  return html`<table id="comparison-table"><caption>Comparison of the variants: numbers for the stated conditions; verdict over every ambient case (governing case, margin)</caption><thead>${head}</thead><tbody>${join(rows)}</tbody></table>`;
}

/** Complete printable report for a study: comparison, then one section per variant. */
export function studyReportHtml(
  study: StudyReportInput,
  options: Omit<ReportOptions, "view3dPng"> & { readonly view3dPngs?: readonly (string | undefined)[] } = {},
): string {
  if (study.variants.length === 0) throw new Error("A study report needs at least the base scenario");
  const base = study.variants[0]!;
  // One identifier for the whole study: the variants' input hashes in order.
  const studyHash = hashText(study.variants.map((v) => `${v.name}:${v.result.inputsHash}`).join("|")).slice(0, 12);
  const sections: RawHtml[] = [
    html`<section id="study"><h2>The study</h2><p><strong>Study:</strong> ${study.name}</p>${study.description ? html`<p>${study.description}</p>` : html``}<p>${String(study.variants.length)} scenario${study.variants.length === 1 ? "" : "s"}: the base and its variants, each run for its stated ambient. Inputs hash per variant: ${join(
      study.variants.map(
        (v, i) => html`${i > 0 ? ", " : ""}${v.name} <span class="hash">${v.result.inputsHash}</span>`,
      ),
    )}.</p>${studyComparisonHtml(study.variants)}</section>`,
  ];
  study.variants.forEach((v, i) => {
    const prefix = `v${i}-`;
    const body = reportBody(
      v.result,
      { scenarioFile: v.scenarioFile },
      { ...options, view3dPng: options.view3dPngs?.[i], view3dNote: options.view3dNote },
      prefix,
    );
    sections.push(
      html`<section class="variant page-break" id="variant-${String(i)}"><h2 class="variant-title">Variant ${String(i + 1)} of ${String(study.variants.length)}: ${v.name}</h2>${v.description ? html`<p>${v.description}</p>` : html``}${body}</section>`,
    );
  });
  const scenarioAppendix = appendixHtml(
    base.result,
    { scenarioFile: base.scenarioFile, scenarioText: study.studyText ?? JSON.stringify(base.scenarioFile, null, 2) },
    "",
    "Appendix: the study file as read",
  );
  const appendix = join([scenarioAppendix, validationAppendixHtml()]);
  return documentHtml(
    {
      title: "Brine outfall screening report — study",
      subtitle: study.name,
      version: base.result.program.version,
      inputsHash: studyHash,
      generatedAt: options.generatedAt ?? new Date().toISOString(),
      caution: base.result.caution || CAUTION,
    },
    join(sections),
    appendix,
  );
}
