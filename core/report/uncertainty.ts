/**
 * The uncertainty section. A Monte Carlo summary (core/study/montecarlo) becomes a proper section: the
 * headline in words, the histogram of the per-run worst-case edge dilution with the required dilution
 * marked, a table per ambient case with probabilities as percentages, the input spreads with their units,
 * which inputs were clamped and how often, and the sentences that say what each number means (shared with
 * the app and the command line, core/study/uncertainty-words). Any other shape falls back to a plain
 * listing of its percentile summaries and facts.
 */
import { escapeHtml, html, join, raw, reportNumber, type RawHtml } from "./format";
import type { MonteCarloStats, MonteCarloSummary } from "../study/montecarlo";
import {
  MARGIN_MEANING,
  UNCERTAINTY_EXPLANATIONS,
  clampedSentences,
  headlineSentence,
  percentText,
  verdictCountsSentence,
} from "../study/uncertainty-words";
import { linearTicks } from "./figures";

const PERCENTILE_KEYS = ["p5", "p50", "p95"] as const;
const MAX_ROWS = 200;

interface Summary {
  readonly path: string;
  readonly values: Readonly<Record<string, number>>;
}

function isSummary(v: Record<string, unknown>): boolean {
  return PERCENTILE_KEYS.every((k) => typeof v[k] === "number");
}

/** "cases.Winter storm.edgeDilution" → "cases · Winter storm · edge dilution". */
function humanPath(path: string): string {
  if (path === "") return "(value)";
  return path
    .split(".")
    .map((part) =>
      /^[a-z][A-Za-z0-9]*$/.test(part) ? part.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase() : part,
    )
    .map((part) => (/^\d+$/.test(part) ? String(Number(part) + 1) : part))
    .join(" · ");
}

/** Collects percentile summaries, scalar facts and sample counts from an uncertainty result. */
export function flattenUncertainty(value: unknown): { summaries: Summary[]; facts: [string, string][] } {
  const summaries: Summary[] = [];
  const facts: [string, string][] = [];
  const walk = (v: unknown, path: string, depth: number) => {
    if (summaries.length + facts.length >= MAX_ROWS || depth > 6) return;
    if (typeof v === "number") facts.push([humanPath(path), reportNumber(v)]);
    else if (typeof v === "string") facts.push([humanPath(path), v.length > 300 ? `${v.slice(0, 300)}…` : v]);
    else if (typeof v === "boolean") facts.push([humanPath(path), String(v)]);
    else if (Array.isArray(v) || ArrayBuffer.isView(v)) {
      const arr = v as ArrayLike<unknown>;
      if (arr.length > 0 && typeof arr[0] === "number") facts.push([humanPath(path), `${arr.length} values`]);
      else
        Array.from(arr).forEach((item, i) => {
          // Items that carry a name (ambient cases, variants) are labelled by it rather than by index.
          const named =
            item !== null && typeof item === "object" && typeof (item as { name?: unknown }).name === "string";
          const key = named ? (item as { name: string }).name : String(i);
          walk(item, path ? `${path}.${key}` : key, depth + 1);
        });
    } else if (v !== null && typeof v === "object") {
      const o = v as Record<string, unknown>;
      if (isSummary(o)) {
        const values: Record<string, number> = {};
        for (const k of ["p5", "p50", "p95", "mean", "min", "max", "count"])
          if (typeof o[k] === "number") values[k] = o[k] as number;
        summaries.push({ path: humanPath(path), values });
        return;
      }
      for (const [k, child] of Object.entries(o)) if (k !== "name") walk(child, path ? `${path}.${k}` : k, depth + 1);
    }
  };
  walk(value, "", 0);
  return { summaries, facts };
}

function rawListingHtml(value: unknown): RawHtml {
  const { summaries, facts } = flattenUncertainty(value);
  const parts: RawHtml[] = [];
  if (summaries.length > 0) {
    const rows = summaries.map(
      (s) =>
        html`<tr><td>${s.path}</td>${join(
          ["p5", "p50", "p95", "mean", "min", "max", "count"].map(
            (k) => html`<td class="num">${reportNumber(s.values[k])}</td>`,
          ),
        )}</tr>`,
    );
    parts.push(
      html`<table><caption>Percentiles of the outputs</caption><thead><tr><th>Output</th><th class="num">P5</th><th class="num">P50</th><th class="num">P95</th><th class="num">Mean</th><th class="num">Min</th><th class="num">Max</th><th class="num">Runs</th></tr></thead><tbody>${join(rows)}</tbody></table>`,
    );
  }
  if (facts.length > 0) {
    parts.push(
      html`<table><caption>Run facts</caption><tbody>${join(facts.map(([k, v]) => html`<tr><td>${k}</td><td>${v}</td></tr>`))}</tbody></table>`,
    );
  }
  if (parts.length === 0)
    parts.push(html`<p class="note">The uncertainty result given to the report held no numbers.</p>`);
  return join(parts);
}

/** What the report's uncertainty section is given: the summary and the histogram of the per-run worst case. */
export interface ReportUncertainty {
  readonly summary: MonteCarloSummary;
  /** Equal-width bins of the per-run worst-case edge dilution (core/study/montecarlo `histogram`). */
  readonly histogram: readonly { readonly x0: number; readonly x1: number; readonly count: number }[];
}

function isReportUncertainty(v: unknown): v is ReportUncertainty {
  if (v === null || typeof v !== "object") return false;
  const o = v as Record<string, unknown>;
  const s = o["summary"] as Record<string, unknown> | undefined;
  return (
    Array.isArray(o["histogram"]) &&
    s !== undefined &&
    s !== null &&
    typeof s === "object" &&
    typeof s["worstCase"] === "object"
  );
}

function isSummaryOnly(v: unknown): v is MonteCarloSummary {
  if (v === null || typeof v !== "object") return false;
  const o = v as Record<string, unknown>;
  return typeof o["worstCase"] === "object" && Array.isArray(o["cases"]) && typeof o["runs"] === "number";
}

const FONT = `font-family="Helvetica, Arial, sans-serif"`;
const r1 = (v: number) => (Math.round(v * 10) / 10).toString();

/**
 * Histogram of the per-run worst-case edge dilution as an inline SVG string (report and app): bars of run
 * counts, the required dilution as a red line (its P5–P95 band shaded when the drawn salinities move it),
 * P5/P50/P95 as dashed lines, both axes labelled.
 */
export function uncertaintyHistogramSvg(
  bins: ReportUncertainty["histogram"],
  worst: Pick<MonteCarloStats, "edgeDilution" | "requiredDilution">,
  width = 680,
): string {
  const height = 280;
  const left = 58;
  const right = 18;
  const top = 34;
  const bottom = 46;
  const pw = width - left - right;
  const ph = height - top - bottom;
  const req = worst.requiredDilution;
  if (bins.length === 0) return "";
  const runLo = bins[0]!.x0;
  const runHi = bins[bins.length - 1]!.x1;
  const runSpan = runHi - runLo > 0 ? runHi - runLo : Math.max(1, Math.abs(runLo) * 0.1);
  // The required dilution joins the axis when it lies near the runs; far off, it is marked at the edge of
  // the plot with an arrow, so the runs' spread stays readable.
  const reqValue = req && Number.isFinite(req.p50) ? req.p50 : null;
  const reqNear = reqValue !== null && reqValue >= runLo - 1.5 * runSpan && reqValue <= runHi + 1.5 * runSpan;
  const xs = [runLo, runHi, ...(reqNear && req ? [req.p5, req.p95].filter((v) => Number.isFinite(v)) : [])];
  let lo = Math.min(...xs);
  let hi = Math.max(...xs);
  if (!(hi > lo)) {
    lo -= 1;
    hi += 1;
  }
  const pad = (hi - lo) * 0.04;
  lo = Math.max(0, lo - pad);
  hi += pad;
  const offScale: "left" | "right" | null = reqValue === null || reqNear ? null : reqValue < lo ? "left" : "right";
  const maxCount = Math.max(1, ...bins.map((b) => b.count));
  const sx = (v: number) => left + (pw * (Math.min(hi, Math.max(lo, v)) - lo)) / (hi - lo);
  const sy = (c: number) => top + ph - (ph * c) / maxCount;
  const parts: string[] = [];
  const yTicks = linearTicks(0, maxCount, 5).filter((t) => Number.isInteger(t));
  for (const t of yTicks) {
    parts.push(`<line x1="${left}" y1="${r1(sy(t))}" x2="${left + pw}" y2="${r1(sy(t))}" stroke="#e2e8f0"/>`);
    parts.push(`<text x="${left - 6}" y="${r1(sy(t) + 3.5)}" text-anchor="end" font-size="10" ${FONT}>${t}</text>`);
  }
  const xTicks: number[] = [];
  for (const t of linearTicks(lo, hi, 7))
    if (xTicks.length === 0 || sx(t) - sx(xTicks[xTicks.length - 1]!) >= 40) xTicks.push(t);
  for (const t of xTicks) {
    parts.push(
      `<text x="${r1(sx(t))}" y="${top + ph + 14}" text-anchor="middle" font-size="10" ${FONT}>${escapeHtml(reportNumber(t))}</text>`,
    );
  }
  if (!offScale && req && Number.isFinite(req.p5) && Number.isFinite(req.p95) && req.p95 > req.p5) {
    parts.push(
      `<rect x="${r1(sx(req.p5))}" y="${top}" width="${r1(sx(req.p95) - sx(req.p5))}" height="${ph}" fill="#b91c1c" fill-opacity="0.12"/>`,
    );
  }
  for (const b of bins) {
    const x0 = sx(b.x0);
    const x1 = sx(b.x1);
    parts.push(
      `<rect x="${r1(x0 + 0.5)}" y="${r1(sy(b.count))}" width="${r1(Math.max(0.5, x1 - x0 - 1))}" height="${r1(top + ph - sy(b.count))}" fill="#3b82f6"><title>${escapeHtml(`${reportNumber(b.x0)}–${reportNumber(b.x1)}×: ${b.count} runs`)}</title></rect>`,
    );
  }
  parts.push(`<rect x="${left}" y="${top}" width="${pw}" height="${ph}" fill="none" stroke="#94a3b8"/>`);
  const d = worst.edgeDilution;
  const marks: [string, number][] = [
    ["P5", d.p5],
    ["P50", d.p50],
    ["P95", d.p95],
  ];
  marks.forEach(([label, v], i) => {
    if (!Number.isFinite(v)) return;
    parts.push(
      `<line x1="${r1(sx(v))}" y1="${top}" x2="${r1(sx(v))}" y2="${top + ph}" stroke="#0f172a" stroke-dasharray="3 3"/>`,
    );
    parts.push(
      `<text x="${r1(sx(v))}" y="${top - 4 - (i % 2) * 11}" text-anchor="middle" font-size="10" ${FONT}>${label}</text>`,
    );
  });
  if (reqValue !== null && !offScale) {
    const x = sx(reqValue);
    const anchor = x > left + pw * 0.7 ? "end" : "start";
    parts.push(`<line x1="${r1(x)}" y1="${top}" x2="${r1(x)}" y2="${top + ph}" stroke="#b91c1c" stroke-width="2"/>`);
    parts.push(
      `<text x="${r1(x + (anchor === "start" ? 4 : -4))}" y="${top + 12}" text-anchor="${anchor}" font-size="10" font-weight="700" fill="#b91c1c" paint-order="stroke" stroke="#fff" stroke-width="3" ${FONT}>required ${escapeHtml(reportNumber(reqValue))}×</text>`,
    );
  } else if (reqValue !== null && offScale) {
    const x = offScale === "left" ? left + 2 : left + pw - 2;
    const arrow =
      offScale === "left"
        ? `M${x + 10},${top + 8} L${x},${top + 14} L${x + 10},${top + 20} Z`
        : `M${x - 10},${top + 8} L${x},${top + 14} L${x - 10},${top + 20} Z`;
    parts.push(
      `<line x1="${r1(x)}" y1="${top}" x2="${r1(x)}" y2="${top + ph}" stroke="#b91c1c" stroke-width="2" stroke-dasharray="6 3"/>`,
    );
    parts.push(`<path d="${arrow}" fill="#b91c1c"/>`);
    const words =
      offScale === "left"
        ? `required ${reportNumber(reqValue)}× — off the scale to the left`
        : `required ${reportNumber(reqValue)}× — off the scale to the right`;
    parts.push(
      `<text x="${r1(offScale === "left" ? x + 14 : x - 14)}" y="${top + 18}" text-anchor="${offScale === "left" ? "start" : "end"}" font-size="10" font-weight="700" fill="#b91c1c" paint-order="stroke" stroke="#fff" stroke-width="3" ${FONT}>${escapeHtml(words)}</text>`,
    );
  }
  parts.push(
    `<text x="${r1(left + pw / 2)}" y="${height - 8}" text-anchor="middle" font-size="11" ${FONT}>dilution at the mixing-zone edge, per-run worst case (×)</text>`,
  );
  parts.push(
    `<text transform="translate(14 ${r1(top + ph / 2)}) rotate(-90)" text-anchor="middle" font-size="11" ${FONT}>number of runs</text>`,
  );
  const title = `Histogram of the per-run worst-case dilution at the mixing-zone edge; required dilution ${reportNumber(req?.p50 ?? Number.NaN)}`;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="100%" role="img" aria-label="${escapeHtml(title)}" data-figure="uncertainty-histogram">` +
    `<title>${escapeHtml(title)}</title>${parts.join("")}</svg>`
  );
}

function statsRow(s: MonteCarloStats): RawHtml {
  const name = s.name === "overall" ? "overall (per-run worst case)" : s.name;
  return html`<tr><td>${name}</td><td class="num">${reportNumber(s.edgeDilution.p5)}</td><td class="num">${reportNumber(s.edgeDilution.p50)}</td><td class="num">${reportNumber(s.edgeDilution.p95)}</td><td class="num">${reportNumber(s.margin.p5)}</td><td class="num" data-probability="${String(s.probabilityOfExceedance)}">${percentText(s.probabilityOfExceedance)}</td><td class="num">${String(s.verdicts.meets)}</td><td class="num">${String(s.verdicts.exceeds)}</td><td class="num">${String(s.verdicts["outside-scope"])}</td><td class="num">${String(s.verdicts.refused)}</td></tr>`;
}

function summaryHtml(summary: MonteCarloSummary, bins: ReportUncertainty["histogram"] | null): RawHtml {
  const w = summary.worstCase;
  const clamped = clampedSentences(summary);
  const svg = bins ? uncertaintyHistogramSvg(bins, w) : "";
  const reqVaries = w.requiredDilution && w.requiredDilution.p95 > w.requiredDilution.p5;
  return html`<p data-role="uncertainty-headline"><b>${headlineSentence(w, w.requiredDilution?.p50 ?? null)}</b> ${verdictCountsSentence(w, summary.runs)}</p>
<p class="note">${String(summary.runs)} runs, seed ${String(summary.seed)} (the same seed gives the same numbers on any machine).</p>
${svg ? html`<figure>${raw(svg)}<figcaption>Dilution at the mixing-zone edge in each run's worst case (bars: number of runs), with P5, P50 and P95 dashed and the required dilution in red${reqVaries ? html` (the shaded band is its P5–P95 range: it follows the drawn salinities; each run is judged against its own)` : html``}. Runs to the right of the red line meet the limit.</figcaption></figure>` : html``}
<table><caption>Dilution at the mixing-zone edge per ambient case (×); chance of not meeting the limit as a percentage</caption><thead><tr><th>Case</th><th class="num">P5</th><th class="num">P50</th><th class="num">P95</th><th class="num">Margin P5</th><th class="num">Chance not meeting limit</th><th class="num">Meets</th><th class="num">Exceeds</th><th class="num">Outside scope</th><th class="num">Refused</th></tr></thead><tbody>${join([...summary.cases, w].map(statsRow))}</tbody></table>
<h3>What these numbers mean</h3>
<ul data-role="uncertainty-explanations">${join([...UNCERTAINTY_EXPLANATIONS, MARGIN_MEANING].map((e) => html`<li>${e}</li>`))}</ul>
<h3>Uncertain inputs</h3>
<ul>${join(summary.notes.map((n) => html`<li>${n}</li>`))}</ul>
${clamped.length > 0 ? html`<h3>Clamped inputs</h3><p>A drawn value outside a field's physical bounds is set to the nearest bound; many clamped draws mean the spread is wider than the field allows.</p><ul data-role="uncertainty-clamped">${join(clamped.map((c) => html`<li>${c}</li>`))}</ul>` : html`<p class="note">No drawn value fell outside its field's physical bounds.</p>`}
${summary.firstError ? html`<p class="note">First refused draw: ${summary.firstError}</p>` : html``}
<p class="note">The JSON output of \`brinefield uncertainty --json\` keeps probabilities as fractions from 0 to 1.</p>`;
}

export function uncertaintyHtml(value: unknown): RawHtml {
  if (isReportUncertainty(value)) return summaryHtml(value.summary, value.histogram);
  if (isSummaryOnly(value)) return summaryHtml(value, null);
  return rawListingHtml(value);
}
