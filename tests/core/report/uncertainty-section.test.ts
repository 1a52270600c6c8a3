/**
 * The report's uncertainty and claim sections: the explanation sentences, the figures and the numbers.
 * Uncertainty numbers are checked against closed forms (a uniform input through an identity-like output):
 * for U(a, b), P(X < x) = (x − a)/(b − a).
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { reportHtml, escapeHtml, reportNumber } from "../../../core/report";
import { uncertaintyHistogramSvg, type ReportUncertainty } from "../../../core/report/uncertainty";
import { CLAIM_VERDICT_TEXT } from "../../../core/report/claim";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";
import { checkClaimOnScenario } from "../../../core/compliance/claim-run";
import {
  histogram,
  mergeMonteCarloChunks,
  planMonteCarlo,
  runMonteCarloChunk,
  summariseMonteCarlo,
} from "../../../core/study";
import {
  MARGIN_MEANING,
  OUTSIDE_SCOPE_MEANING,
  PERCENTILE_MEANING,
  PROBABILITY_MEANING,
  REFUSED_MEANING,
  WORST_CASE_MEANING,
  clampedSentences,
  percentText,
} from "../../../core/study/uncertainty-words";
import { fourPortRaw, identityEvaluator, scenarioFrom } from "../study/fixtures";
import { DEMO_DIR } from "./helpers";

const GENERATED_AT = "2026-12-03T08:00:00Z";

function sectionOf(html: string, id: string): string {
  const start = html.indexOf(`<section id="${id}"`);
  return html.slice(start, html.indexOf("</section>", start));
}

/** A uniform current U(−0.1, 0.3) m/s read as the "edge dilution", required 0.1: closed-form answers. */
function uniformCurrentStudy(runs: number): ReportUncertainty {
  const s = scenarioFrom({
    ...fourPortRaw(),
    options: { addSlackWater: false },
    uncertainty: { inputs: [{ path: "ambient.currentSpeed", distribution: "uniform", min: -0.1, max: 0.3 }] },
  });
  const planned = planMonteCarlo(s, runs, 17);
  if (!planned.ok) throw new Error("plan");
  const chunk = runMonteCarloChunk(
    s,
    planned.plan,
    0,
    runs,
    identityEvaluator(0.1, (x) => x.ambient.currentSpeed),
  );
  const merged = mergeMonteCarloChunks(planned.plan, [chunk]);
  return { summary: summariseMonteCarlo(planned.plan, [chunk]), histogram: histogram(merged.worstEdgeDilution, 20) };
}

describe("the report's uncertainty section", () => {
  const demo = JSON.parse(readFileSync(join(DEMO_DIR, "island-cove.json"), "utf8")) as Record<string, unknown>;
  const parsed = parseScenario(demo);
  if (!parsed.ok) throw new Error("demo must read");
  const result = runScenario(parsed.scenario);
  const u = uniformCurrentStudy(4000);
  const html = reportHtml(result, { scenarioFile: demo }, { uncertainty: u, generatedAt: GENERATED_AT });
  const section = sectionOf(html, "uncertainty");

  it("explains in words what P5/P50/P95, the per-run worst case, the chance, outside-scope and refused runs mean", () => {
    for (const sentence of [
      PERCENTILE_MEANING,
      WORST_CASE_MEANING,
      PROBABILITY_MEANING,
      OUTSIDE_SCOPE_MEANING,
      REFUSED_MEANING,
      MARGIN_MEANING,
    ]) {
      expect(section, sentence.slice(0, 40)).toContain(escapeHtml(sentence));
    }
    expect(section, "no raw dump of flattened keys").not.toMatch(/ · edge dilution|worst case · /);
  });

  it("gives the chance of not meeting the limit as a percentage, matching the closed form", () => {
    // P(X < 0.1) for U(−0.1, 0.3) = 0.2/0.4 = 0.5 (clamped draws sit at 0, below 0.1, so they count).
    const w = u.summary.worstCase;
    expect(Math.abs(w.probabilityOfExceedance - 0.5), "closed form 50 %").toBeLessThan(0.03);
    expect(section, "the percentage").toContain(`>${percentText(w.probabilityOfExceedance)}<`);
    expect(percentText(w.probabilityOfExceedance), "written as percent").toMatch(/^\d+(\.\d+)? %$/);
    expect(section, "the fraction stays a data attribute only").toContain(
      `data-probability="${w.probabilityOfExceedance}"`,
    );
  });

  it("says which input was clamped and how often (closed form: a quarter of the draws are below 0)", () => {
    const n = u.summary.clampedByInput["ambient.currentSpeed"] ?? 0;
    expect(Math.abs(n / u.summary.runs - 0.25), "P(X < 0) = 0.1/0.4").toBeLessThan(0.03);
    const sentences = clampedSentences(u.summary);
    expect(sentences, "one sentence for the one clamped input").toHaveLength(1);
    expect(sentences[0], "names the input in words, the count and the bounds with units").toMatch(
      new RegExp(
        `^current speed \\(ambient\\.currentSpeed\\): ${n} of 4000 draws \\(\\d+(\\.\\d+)? %\\) fell outside 0–5 m/s`,
      ),
    );
    expect(section, "in the report").toContain(escapeHtml(sentences[0]!));
  });

  it("lists the spreads with their units", () => {
    expect(section, "uniform spread in m/s").toContain(
      "current speed (ambient.currentSpeed): uniform from -0.1 m/s to 0.3 m/s",
    );
  });

  it("draws the histogram with labelled axes and the required-dilution line where it belongs", () => {
    expect(section, "the figure").toContain('data-figure="uncertainty-histogram"');
    expect(section, "x axis title").toContain("dilution at the mixing-zone edge, per-run worst case (×)");
    expect(section, "y axis title").toContain("number of runs");
    const svg = uncertaintyHistogramSvg(
      [
        { x0: 10, x1: 20, count: 5 },
        { x0: 20, x1: 30, count: 10 },
        { x0: 30, x1: 40, count: 5 },
      ],
      {
        edgeDilution: { p5: 12, p50: 25, p95: 38, mean: 25, min: 10, max: 40, count: 20 },
        requiredDilution: { p5: 25, p50: 25, p95: 25, mean: 25, min: 25, max: 25, count: 20 },
      },
    );
    // The required line (red, 2 px) sits at 25, halfway between the bins' ends 10 and 40 → at the middle
    // of the plot (left 58, plot width 680 − 58 − 18 = 604, padded by 4 % each side: same middle).
    const x = Number(/<line x1="([\d.]+)"[^>]*stroke="#b91c1c" stroke-width="2"/.exec(svg)![1]);
    expect(Math.abs(x - (58 + 604 / 2)), "required line in the middle").toBeLessThan(1);
    expect(svg, "labelled").toContain("required 25×");
    // The tallest bar reaches the top of the plot (count 10 of 10).
    expect(svg, "P5/P50/P95 marked").toMatch(/>P5<[\s\S]*>P50<[\s\S]*>P95</);
  });

  it("marks a required dilution far from the runs at the plot's edge instead of squashing the runs", () => {
    const svg = uncertaintyHistogramSvg([{ x0: 190, x1: 210, count: 4 }], {
      edgeDilution: { p5: 191, p50: 200, p95: 209, mean: 200, min: 190, max: 210, count: 4 },
      requiredDilution: { p5: 14, p50: 14, p95: 14, mean: 14, min: 14, max: 14, count: 4 },
    });
    expect(svg).toContain("required 14× — off the scale to the left");
  });

  it("keeps the explanation when the report is given the summary alone", () => {
    const alone = sectionOf(
      reportHtml(result, { scenarioFile: demo }, { uncertainty: u.summary, generatedAt: GENERATED_AT }),
      "uncertainty",
    );
    expect(alone).toContain(escapeHtml(PERCENTILE_MEANING));
    expect(alone, "worst-case P5").toContain(
      `<td class="num">${reportNumber(u.summary.worstCase.edgeDilution.p5)}</td>`,
    );
  });
});

describe("the report's claim section", () => {
  const demo = JSON.parse(readFileSync(join(DEMO_DIR, "sandy-shelf.json"), "utf8")) as Record<string, unknown>;
  const parsed = parseScenario(demo);
  if (!parsed.ok) throw new Error("demo must read");
  const outcome = checkClaimOnScenario(parsed.scenario, 60, 150);
  if (!outcome.ok) throw new Error(outcome.message);
  const section = sectionOf(
    reportHtml(
      runScenario(parsed.scenario),
      { scenarioFile: demo },
      { claim: outcome.check, generatedAt: GENERATED_AT },
    ),
    "claim",
  );

  it("exists with its verdict in words, the explanation of the verdicts and the range bar", () => {
    expect(section, "verdict sentence").toContain(escapeHtml(CLAIM_VERDICT_TEXT[outcome.check.verdict]));
    expect(section, "the check's own summary").toContain(escapeHtml(outcome.check.summary));
    expect(section, "what each verdict means").toContain(
      "Verdicts: supported — at or below the conservative value (within 0.1 %); plausible",
    );
    expect(section, "the figure's caption explains dots, bars and lines").toContain("Each method chain's dilution at");
    expect(section, "range bar").toContain('data-figure="claim-range-bar"');
  });
});
