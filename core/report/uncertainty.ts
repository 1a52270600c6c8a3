/**
 * The uncertainty section. The Monte Carlo result's shape belongs to the study code; the report reads it
 * structurally so it keeps working as that shape grows: every object carrying percentile fields
 * (p5/p50/p95, optionally mean/min/max/count) becomes a row named by its path, plain numbers and
 * short strings are listed as facts, and long numeric arrays (raw samples) are summarised by count only.
 */
import { html, join, reportNumber, type RawHtml } from "./format";

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
    .map((part) => (/^[a-z][A-Za-z0-9]*$/.test(part) ? part.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase() : part))
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
          const named = item !== null && typeof item === "object" && typeof (item as { name?: unknown }).name === "string";
          const key = named ? (item as { name: string }).name : String(i);
          walk(item, path ? `${path}.${key}` : key, depth + 1);
        });
    } else if (v !== null && typeof v === "object") {
      const o = v as Record<string, unknown>;
      if (isSummary(o)) {
        const values: Record<string, number> = {};
        for (const k of ["p5", "p50", "p95", "mean", "min", "max", "count"]) if (typeof o[k] === "number") values[k] = o[k] as number;
        summaries.push({ path: humanPath(path), values });
        return;
      }
      for (const [k, child] of Object.entries(o)) if (k !== "name") walk(child, path ? `${path}.${k}` : k, depth + 1);
    }
  };
  walk(value, "", 0);
  return { summaries, facts };
}

export function uncertaintyHtml(value: unknown): RawHtml {
  const { summaries, facts } = flattenUncertainty(value);
  const parts: RawHtml[] = [];
  if (summaries.length > 0) {
    const rows = summaries.map(
      (s) =>
        html`<tr><td>${s.path}</td>${join(
          ["p5", "p50", "p95", "mean", "min", "max", "count"].map((k) => html`<td class="num">${reportNumber(s.values[k])}</td>`),
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
  if (parts.length === 0) parts.push(html`<p class="note">The uncertainty result given to the report held no numbers.</p>`);
  return join(parts);
}
