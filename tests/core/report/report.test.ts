/**
 * reportHtml() — the screening report of each demo scenario: every section and the caution are there,
 * every number in the results is the one `brinefield run --json` gives for the same file (formatted the
 * same way), the inputs hash follows the inputs, and the document is self-contained and printable.
 */
import { describe, expect, it, beforeAll } from "vitest";
import { readFileSync } from "node:fs";
import { basename } from "node:path";
import {
  reportHtml,
  REPORT_SECTIONS,
  reportNumber,
  reportValue,
  escapeHtml,
  referencesFromSources,
  resultSources,
  secondaryQuotationsFor,
} from "../../../core/report";
import { CAUTION, type BrinefieldResult } from "../../../core/result/contract";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";
import { planMonteCarlo, runMonteCarloChunk, summariseMonteCarlo, evaluateScenario } from "../../../core/study";
import { at, demoScenarioPaths, runJson, tableById, tracedNumbers } from "./helpers";

const GENERATED_AT = "2026-12-02T06:00:00Z";
const demos = demoScenarioPaths();

interface Rendered {
  readonly name: string;
  readonly text: string;
  readonly json: BrinefieldResult;
  readonly html: string;
}

const rendered: Rendered[] = [];

beforeAll(async () => {
  for (const path of demos) {
    const text = readFileSync(path, "utf8");
    const json = await runJson(path);
    rendered.push({
      name: basename(path),
      text,
      json,
      html: reportHtml(json, { scenarioFile: JSON.parse(text), scenarioText: text }, { generatedAt: GENERATED_AT }),
    });
  }
});

/** Removes every traced element so what is left can be checked for untraced numbers. */
function withoutTraced(html: string): string {
  return html.replace(/<(td|span|strong)[^>]*\sdata-path="[^"]+"[^>]*>[^<]*<\/\1>/g, "");
}

describe("reportHtml() on the demo scenarios", () => {
  it("has demo scenarios to report on (the lead's three at least)", () => {
    expect(demos.length, "demo-scenarios/*.json holds scenarios").toBeGreaterThanOrEqual(3);
  });

  it("contains every section, each once, in the documented order", () => {
    for (const r of rendered) {
      let last = -1;
      for (const id of REPORT_SECTIONS) {
        const marker = `<section id="${id}"`;
        const idx = r.html.indexOf(marker);
        expect(idx, `${r.name}: section "${id}" present`).toBeGreaterThan(-1);
        expect(r.html.indexOf(marker, idx + 1), `${r.name}: section "${id}" only once`).toBe(-1);
        expect(idx, `${r.name}: section "${id}" after the one before it`).toBeGreaterThan(last);
        last = idx;
      }
    }
  });

  it("prints the permitting caution on the first page (before any result) and in the footer repeated on every page", () => {
    for (const r of rendered) {
      // A record adds its quasi-steady sentence after the contract's caution.
      expect(
        r.json.caution.startsWith(CAUTION) &&
          (r.json.record ? r.json.caution.length > CAUTION.length : r.json.caution === CAUTION),
        "the result carries the contract's caution",
      ).toBe(true);
      const caution = escapeHtml(CAUTION);
      const first = r.html.indexOf(
        `<div class="caution" id="caution">${r.json.record ? escapeHtml(r.json.caution) : caution}</div>`,
      );
      expect(first, `${r.name}: caution block present`).toBeGreaterThan(-1);
      expect(first, `${r.name}: caution before the summary`).toBeLessThan(r.html.indexOf('<section id="summary"'));
      expect(r.html, `${r.name}: fixed footer with the caution`).toContain(
        `<div class="print-footer" id="print-footer">${caution}`,
      );
      expect(r.html, `${r.name}: the footer is fixed in print so Chromium repeats it per page`).toMatch(
        /\.print-footer \{[^}]*position: fixed/,
      );
    }
  });

  it("states title, date, program version and inputs hash", () => {
    for (const r of rendered) {
      expect(r.html, `${r.name}: title`).toContain("<h1>Brine outfall screening report</h1>");
      expect(r.html, `${r.name}: scenario name as subtitle`).toContain(
        `<p class="subtitle">${escapeHtml(r.json.scenarioName)}</p>`,
      );
      expect(r.html, `${r.name}: date`).toContain('<dd id="generated-at">2026-12-02 06:00:00 UTC</dd>');
      expect(r.html, `${r.name}: version`).toContain(`<span id="program-version">${r.json.program.version}</span>`);
      expect(r.html, `${r.name}: inputs hash`).toContain(
        `<span class="hash" id="inputs-hash">${r.json.inputsHash}</span>`,
      );
    }
  });

  it("prints every traced number exactly as run --json gives it, formatted with reportValue (densities to 0.01 kg/m³)", () => {
    for (const r of rendered) {
      const cells = tracedNumbers(r.html);
      expect(cells.length, `${r.name}: the results tables trace their numbers`).toBeGreaterThan(40);
      for (const { path, text } of cells) {
        const v = at(r.json, path);
        const expected = typeof v === "number" ? reportValue(path, v) : "—";
        expect(text, `${r.name}: ${path}`).toBe(expected);
      }
    }
  });

  it("traces every number in the results tables (no untraced number in a results cell)", () => {
    for (const r of rendered) {
      const ids = ["near-field-table", "constituents-table", "compliance-table"];
      const tables = ids.map((id) => tableById(r.html, id));
      tables.forEach((t, i) => expect(t, `${r.name}: table ${ids[i]} present`).not.toBeNull());
      const kv = [...r.html.matchAll(/<table class="kv">[\s\S]*?<\/table>/g)].map((m) => m[0]);
      expect(kv.length, `${r.name}: derived, multiport and edge tables present`).toBeGreaterThanOrEqual(5);
      for (const table of [...(tables as string[]), ...kv]) {
        for (const m of withoutTraced(table).matchAll(/<td class="num"[^>]*>([^<]*)<\/td>/g)) {
          expect(m[1], `${r.name}: a number cell without a data-path: "${m[1]}"`).not.toMatch(/\d/);
        }
      }
    }
  });

  it("shows one results column per near-field method, with its source and known bias", () => {
    for (const r of rendered) {
      const table = tableById(r.html, "near-field-table")!;
      for (const m of r.json.nearField) {
        expect(table, `${r.name}: column for ${m.method}`).toContain(`<th class="num">${m.method}</th>`);
        expect(r.html, `${r.name}: source of ${m.method}`).toContain(escapeHtml(m.source));
        expect(r.html, `${r.name}: known bias of ${m.method}`).toContain(escapeHtml(m.bias));
      }
    }
  });

  it("reports the equation of state, the multiport regime, each constituent at the edge and the verdict", () => {
    for (const r of rendered) {
      expect(r.html, `${r.name}: equation of state`).toContain(escapeHtml(r.json.densities.equationOfState.name));
      expect(r.html, `${r.name}: multiport regime`).toContain(
        `<strong>Regime:</strong> ${escapeHtml(r.json.multiport.regime)}`,
      );
      const constituents = tableById(r.html, "constituents-table")!;
      r.json.mixingZone.constituents.forEach((c, i) => {
        expect(constituents, `${r.name}: row for ${c.constituent}`).toContain(`<td>${escapeHtml(c.constituent)}</td>`);
        expect(constituents, `${r.name}: concentration at the edge of ${c.constituent}`).toContain(
          `data-path="mixingZone.constituents.${i}.concentration"`,
        );
      });
      const badge = r.json.compliance.pass ? "MEETS LIMIT" : "EXCEEDS LIMIT";
      expect(r.html, `${r.name}: verdict badge agrees with compliance.pass`).toContain(
        `<div class="badge">${badge}</div>`,
      );
    }
  });

  it("lists every warning of the run", () => {
    for (const r of rendered) {
      const all = [...r.json.warnings, ...r.json.nearField.flatMap((m) => m.warnings)];
      for (const w of all) expect(r.html, `${r.name}: warning ${w.code}`).toContain(escapeHtml(w.message));
    }
  });

  it("draws both figures as inline SVG and gives full references for the methods used", () => {
    for (const r of rendered) {
      expect(r.html, `${r.name}: side view`).toMatch(
        /<figure id="figure-side-view"><svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/,
      );
      expect(r.html, `${r.name}: dilution chart`).toMatch(/<figure id="figure-dilution"><svg /);
      expect(r.html, `${r.name}: edge marked in the chart`).toContain(
        `mixing-zone edge ${reportNumber(r.json.mixingZone.radius)} m`,
      );
      const { references } = referencesFromSources(resultSources(r.json));
      expect(references.length, `${r.name}: the methods cite tabled works`).toBeGreaterThan(3);
      for (const ref of references)
        expect(r.html, `${r.name}: citation ${ref.key}`).toContain(escapeHtml(ref.citation));
    }
  });

  it("says once, in plain words, which cited coefficients come from secondary quotations", () => {
    for (const r of rendered) {
      const { references } = referencesFromSources(resultSources(r.json));
      const quoted = secondaryQuotationsFor(references);
      expect(quoted.length, `${r.name}: a demo cites Roberts et al. (1997) or Turner (1986)`).toBeGreaterThan(0);
      expect(r.html.split('id="secondary-quotations"').length - 1, `${r.name}: one statement`).toBe(1);
      const statement = r.html.slice(r.html.indexOf('id="secondary-quotations"'));
      for (const q of quoted) expect(statement, `${r.name}: names ${q.reference}`).toContain(escapeHtml(q.what));
    }
  });

  it("carries no provenance tags in result strings or report text", () => {
    const tag =
      /from memory|secondary source|\bSECONDARY\b|\bCONFIRMED\b|FROM MEMORY|reference\s+sheet|low confidence/i;
    for (const r of rendered) {
      const withoutStatement = r.html.replace(/<p id="secondary-quotations">[\s\S]*?<\/p>/, "");
      expect(withoutStatement, `${r.name}: report text`).not.toMatch(tag);
      expect(JSON.stringify(r.json), `${r.name}: run --json`).not.toMatch(tag);
    }
  });

  it("is self-contained: no scripts, no external links or images, inline CSS with A4 @page rules", () => {
    for (const r of rendered) {
      expect(r.html, `${r.name}: no script`).not.toMatch(/<script/i);
      expect(r.html, `${r.name}: no stylesheet link`).not.toMatch(/<link/i);
      expect(r.html, `${r.name}: no remote src/href`).not.toMatch(/(src|href)="(https?:)?\/\//i);
      expect(r.html, `${r.name}: @page rule`).toMatch(/@page \{\s*size: A4;/);
      expect(r.html, `${r.name}: doctype`).toMatch(/^<!DOCTYPE html>/);
    }
  });

  it("includes the scenario text in the appendix and says the 3D view was not supplied", () => {
    for (const r of rendered) {
      expect(r.html, `${r.name}: scenario text`).toContain(escapeHtml(r.text));
      expect(r.html, `${r.name}: reason for no 3D image`).toContain('id="no-3d"');
    }
  });
});

describe("reportHtml() options", () => {
  const path = demos[0]!;
  const text = readFileSync(path, "utf8");
  const raw = JSON.parse(text);

  it("embeds a supplied 3D view PNG and refuses anything that is not a PNG data URI", () => {
    const parsed = parseScenario(raw);
    if (!parsed.ok) throw new Error("demo scenario must read");
    const result = runScenario(parsed.scenario);
    // A 1×1 transparent PNG (the smallest valid file), base64.
    const png =
      "data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==";
    const withImage = reportHtml(result, { scenarioFile: raw }, { view3dPng: png, generatedAt: GENERATED_AT });
    expect(withImage, "image embedded").toContain(
      `<img alt="Rendered 3D view of the diffuser and plume" src="${png}">`,
    );
    const remote = reportHtml(
      result,
      { scenarioFile: raw },
      { view3dPng: "https://example.org/x.png", generatedAt: GENERATED_AT },
    );
    expect(remote, "remote image refused").not.toContain("example.org");
    const noted = reportHtml(
      result,
      { scenarioFile: raw },
      { view3dNote: "the renderer could not be built", generatedAt: GENERATED_AT },
    );
    expect(noted, "reason printed").toContain("No 3D view is included: the renderer could not be built.");
  });

  it("prints Monte Carlo percentiles when an uncertainty result is given", () => {
    const parsed = parseScenario(raw);
    if (!parsed.ok) throw new Error("demo scenario must read");
    const planned = planMonteCarlo(parsed.scenario, 12, 7);
    if (!planned.ok) throw new Error("plan must succeed");
    const summary = summariseMonteCarlo(planned.plan, [
      runMonteCarloChunk(parsed.scenario, planned.plan, 0, 12, evaluateScenario),
    ]);
    const html = reportHtml(
      runScenario(parsed.scenario),
      { scenarioFile: raw },
      { uncertainty: summary, generatedAt: GENERATED_AT },
    );
    const section = /<section id="uncertainty">[\s\S]*?<\/section>/.exec(html)![0];
    expect(section, "the per-run worst-case row").toContain("overall (per-run worst case)");
    for (const k of ["p5", "p50", "p95"] as const) {
      expect(section, `worst-case ${k}`).toContain(
        `<td class="num">${reportNumber(summary.worstCase.edgeDilution[k])}</td>`,
      );
    }
    expect(section, "run count").toContain(
      `<td class="num">${reportNumber(summary.worstCase.edgeDilution.count)}</td>`,
    );
  });

  it("still reports the result when the file cannot be read back as a scenario (inputs as entered only)", () => {
    const parsed = parseScenario(raw);
    if (!parsed.ok) throw new Error("demo scenario must read");
    const result = runScenario(parsed.scenario);
    const html = reportHtml(
      result,
      { scenarioFile: { ...raw, format: "something-else" } },
      { generatedAt: GENERATED_AT },
    );
    expect(html, "fallback inputs table").toContain("the file could not be re-read, so SI values are not shown");
    expect(tracedNumbers(html).length, "results still traced").toBeGreaterThan(40);
  });
});

describe("the inputs hash in the report", () => {
  const raw = JSON.parse(readFileSync(demos[0]!, "utf8")) as Record<string, any>;

  function hashOf(file: unknown): { hash: string; html: string } {
    const parsed = parseScenario(file);
    if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
    const result = runScenario(parsed.scenario);
    return { hash: result.inputsHash, html: reportHtml(result, { scenarioFile: file }, { generatedAt: GENERATED_AT }) };
  }

  it("is the result's inputsHash, a short hexadecimal identifier", () => {
    const { hash, html } = hashOf(raw);
    expect(hash, "12 hex digits").toMatch(/^[0-9a-f]{12}$/);
    expect(html, "printed").toContain(`id="inputs-hash">${hash}<`);
  });

  it("does not change when only the name, description or key order change, or a unit is written out", () => {
    const base = hashOf(raw).hash;
    const renamed = { ...raw, name: "Another title", description: "Other words" };
    expect(hashOf(renamed).hash, "name and description do not count").toBe(base);
    const reordered = Object.fromEntries(Object.entries(raw).reverse());
    expect(hashOf(reordered).hash, "key order does not count").toBe(base);
    const depth = raw.ambient.depth;
    const depthM = typeof depth === "string" ? Number.parseFloat(depth) : depth;
    const numeric = { ...raw, ambient: { ...raw.ambient, depth: depthM } };
    expect(hashOf(numeric).hash, `"${depth}" and ${depthM} are the same input`).toBe(base);
  });

  it("changes when any physical input changes", () => {
    const base = hashOf(raw).hash;
    const depth = typeof raw.ambient.depth === "string" ? Number.parseFloat(raw.ambient.depth) : raw.ambient.depth;
    const deeper = { ...raw, ambient: { ...raw.ambient, depth: depth + 1 } };
    const angled = { ...raw, diffuser: { ...raw.diffuser, portAngle: 45 } };
    const radius = { ...raw, mixingZone: { ...raw.mixingZone, radius: 321 } };
    const hashes = [base, hashOf(deeper).hash, hashOf(angled).hash, hashOf(radius).hash];
    expect(new Set(hashes).size, "four different inputs give four hashes").toBe(4);
    expect(hashOf(deeper).html, "the report prints the new hash").toContain(`id="inputs-hash">${hashes[1]}<`);
  });
});

describe("report appendix: how the methods compare with published experiments", () => {
  it("prints the validation table with sources, ratios and bands, the same numbers as brinefield validate", async () => {
    const { validationTable } = await import("../../../core/validation");
    const html = reportHtml(
      runScenario((parseScenario(JSON.parse(readFileSync(demos[0]!, "utf8"))) as any).scenario),
      { scenarioFile: JSON.parse(readFileSync(demos[0]!, "utf8")) },
      { generatedAt: GENERATED_AT },
    );
    expect(html, "appendix title").toContain("Appendix: How the methods compare with published experiments");
    const table = validationTable();
    const rows = html.split('<table id="validation-table">')[1]!.split("</table>")[0]!.match(/<tr>/g)!.length - 1;
    expect(rows, "one row per comparison").toBe(table.points.length);
    expect(html, "names Lai & Lee (2012)").toContain("Lai &amp; Lee (2012)");
    expect(html, "prints a ratio of the table").toContain(`<td class="num">${table.points[0]!.ratio.toFixed(2)}</td>`);
  });
});

describe("densities", () => {
  it("are printed to 0.01 kg/m³ by the report and by run, so the brine's excess density shows", async () => {
    const { densityNumber } = await import("../../../core/report");
    expect(densityNumber(1025.3127), "six significant figures here").toBe("1025.31");
    for (const r of rendered) {
      expect(r.html, `${r.name}: brine density`).toContain(
        `data-path="densities.discharge">${r.json.densities.discharge.toFixed(2)}</td>`,
      );
    }
  });
});
