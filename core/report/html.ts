/**
 * The screening report: one self-contained, printable HTML document a permit file can hold. Every
 * number comes from the `BrinefieldResult` (or, for inputs, from the scenario as read) and is printed by
 * `reportNumber`. Result cells carry `data-path` naming the result field they print, so tests and
 * reviewers can trace each figure back to `brinefield run --json`.
 */
import type { BrinefieldResult } from "../result/contract";
import { CAUTION } from "../result/contract";
import { parseScenario } from "../scenario/parse";
import type { Scenario } from "../scenario/types";
import { html, join, type RawHtml } from "./format";
import { inputsHtml, rawInputsHtml } from "./inputs";
import { dilutionChartSvg, sideViewSvg } from "./figures";
import { uncertaintyHtml } from "./uncertainty";
import { validationAppendixHtml } from "./validation";
import { claimHtml } from "./claim";
import { intakeHtml, recordHtml } from "./record";
import { basinHtml } from "./basin";
import type { ClaimCheck } from "../compliance/claim";
import { documentHtml } from "./document";
import { methodsAndReferences } from "./provenance";
import { section } from "./section-parts";
import { verdictHtml, jobHtml, derivedHtml } from "./verdict-sections";
import {
  nearFieldHtml,
  risingNoteHtml,
  multiportHtml,
  mixingZoneHtml,
  complianceHtml,
  warningsHtml,
} from "./result-sections";

export { verdictStyle } from "./verdict-sections";

export { documentHtml } from "./document";

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
