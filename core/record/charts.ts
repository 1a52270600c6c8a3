/**
 * The record's figures as SVG strings (no chart library in core; the app shows the same strings as the
 * report): edge dilution and salinity increase against time with the limit line and the periods not
 * meeting the limit shaded, and the duration curve (edge dilution against the percentage of time it is
 * exceeded).
 */
import type { RecordResult } from "./summary";
import { escapeHtml, reportNumber } from "../report/format";
import { linearTicks, logTicks } from "../report/figures";

const FONT = `font-family="Helvetica, Arial, sans-serif"`;
const W = 680;
const H = 230;
const L = 62;
const R = 16;
const T = 20;
const B = 40;

/** Grid lines with their numbers: vertical at `xs` (labelled by `xText`), horizontal at `ys`. */
function gridSvg(
  xs: readonly number[],
  sx: (x: number) => number,
  xText: (x: number) => string,
  ys: readonly number[],
  sy: (y: number) => number,
): string {
  const xt = xs
    .map(
      (x) =>
        `<g><line x1="${sx(x)}" x2="${sx(x)}" y1="${T}" y2="${H - B}" stroke="#e5e7eb"/><text x="${sx(x)}" y="${H - B + 14}" font-size="10" text-anchor="middle">${xText(x)}</text></g>`,
    )
    .join("");
  const yt = ys
    .map(
      (y) =>
        `<g><line x1="${L}" x2="${W - R}" y1="${sy(y)}" y2="${sy(y)}" stroke="#f3f4f6"/><text x="${L - 5}" y="${sy(y) + 3}" font-size="10" text-anchor="end">${escapeHtml(reportNumber(y))}</text></g>`,
    )
    .join("");
  return xt + yt;
}

/** Periods (seconds) whose steps do not meet the limit: each step stands until the next. */
export function periodsNotMeeting(rec: RecordResult): { from: number; to: number }[] {
  const t = rec.series.time;
  const out: { from: number; to: number }[] = [];
  for (let i = 0; i < t.length; i++) {
    if (rec.series.verdict[i] === "meets") continue;
    const from = t[i]!;
    const to = i + 1 < t.length ? t[i + 1]! : t.length > 1 ? t[i]! + (t[i]! - t[i - 1]!) : t[i]! + 1;
    const last = out[out.length - 1];
    if (last && Math.abs(last.to - from) < 1e-9) last.to = to;
    else out.push({ from, to });
  }
  return out;
}

/** Edge dilution against the percentage of the record's time it is equalled or exceeded (time-weighted). */
export function durationCurve(rec: RecordResult): { percent: number; dilution: number }[] {
  const t = rec.series.time;
  const d = t.map((x, i) => (i + 1 < t.length ? t[i + 1]! - x : t.length > 1 ? x - t[i - 1]! : 1));
  const pts = rec.series.edgeDilution
    .map((v, i) => ({ v, w: d[i]! }))
    .filter((p): p is { v: number; w: number } => p.v !== null && Number.isFinite(p.v));
  pts.sort((a, b) => b.v - a.v);
  const total = d.reduce((a, b) => a + b, 0);
  let acc = 0;
  return pts.map((p) => {
    acc += p.w;
    return { percent: (100 * acc) / total, dilution: p.v };
  });
}

/** Log-axis ticks, or nice linear ticks inside the range when fewer than three decades' marks fall in it. */
function yTicks(lo: number, hi: number): number[] {
  const t = logTicks(lo, hi);
  return t.length >= 3 ? t : linearTicks(lo, hi, 4).filter((v) => v > 0 && v >= lo && v <= hi);
}

function timeScale(rec: RecordResult): { unit: string; f: number } {
  const span = rec.series.time[rec.series.time.length - 1]! - rec.series.time[0]!;
  return span >= 4 * 86400 ? { unit: "d", f: 86400 } : { unit: "h", f: 3600 };
}

function panel(
  rec: RecordResult,
  values: readonly (number | null)[],
  limit: readonly (number | null)[],
  label: string,
  limitLabel: string,
  id: string,
): string {
  const { unit, f } = timeScale(rec);
  const t = rec.series.time.map((s) => s / f);
  const t0 = t[0]!;
  const t1 = Math.max(t[t.length - 1]!, t0 + 1e-9);
  const finite = [...values, ...limit].filter((v): v is number => v !== null && Number.isFinite(v) && v > 0);
  const lo = finite.length ? Math.min(...finite) * 0.85 : 0.1;
  const hi = finite.length ? Math.max(...finite) * 1.15 : 10;
  const sx = (x: number) => L + ((x - t0) / (t1 - t0)) * (W - L - R);
  const sy = (y: number) => T + (1 - (Math.log(y) - Math.log(lo)) / (Math.log(hi) - Math.log(lo))) * (H - T - B);
  const shade = periodsNotMeeting(rec)
    .map(
      (p) =>
        `<rect x="${sx(p.from / f).toFixed(1)}" y="${T}" width="${Math.max(0.8, sx(p.to / f) - sx(p.from / f)).toFixed(1)}" height="${H - T - B}" fill="#fecaca" opacity="0.7"/>`,
    )
    .join("");
  const path = (vs: readonly (number | null)[]) => {
    let d = "";
    let pen = false;
    vs.forEach((v, i) => {
      if (v === null || !Number.isFinite(v) || v <= 0) {
        pen = false;
        return;
      }
      d += `${pen ? "L" : "M"}${sx(t[i]!).toFixed(1)},${sy(Math.min(hi, Math.max(lo, v))).toFixed(1)}`;
      pen = true;
    });
    return d;
  };
  const grid = gridSvg(linearTicks(t0, t1, 8), sx, (x) => escapeHtml(reportNumber(x)), yTicks(lo, hi), sy);
  return `<svg xmlns="http://www.w3.org/2000/svg" id="${id}" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" role="img" aria-label="${escapeHtml(label)} against time" ${FONT}>
${shade}${grid}
<line x1="${L}" x2="${L}" y1="${T}" y2="${H - B}" stroke="#111"/><line x1="${L}" x2="${W - R}" y1="${H - B}" y2="${H - B}" stroke="#111"/>
<path d="${path(limit)}" fill="none" stroke="#b91c1c" stroke-width="1.4" stroke-dasharray="6 3"/>
<path d="${path(values)}" fill="none" stroke="#1d4ed8" stroke-width="1.2"/>
<text x="${W - R}" y="${T - 6}" font-size="10" text-anchor="end" fill="#b91c1c">${escapeHtml(limitLabel)}; shaded: steps not meeting the limit</text>
<text x="${(L + W - R) / 2}" y="${H - 6}" font-size="11" text-anchor="middle">time from the start of the record (${unit})</text>
<text transform="translate(13,${(T + H - B) / 2}) rotate(-90)" font-size="11" text-anchor="middle">${escapeHtml(label)}</text>
</svg>`;
}

/** Edge dilution against time, with the required dilution. */
export function recordDilutionSvg(rec: RecordResult): string {
  return panel(
    rec,
    rec.series.edgeDilution,
    rec.series.requiredDilution,
    "edge dilution (×, log)",
    "dashed: required dilution",
    "record-dilution-chart",
  );
}

/** Salinity increase at the edge against time, with the allowed increase (the governing limit). */
export function recordIncreaseSvg(rec: RecordResult): string {
  const allowed = rec.series.salinityIncrease.map((inc, i) => {
    const d = rec.series.edgeDilution[i];
    const req = rec.series.requiredDilution[i];
    return inc !== null && d !== null && req !== null && req > 0 ? (inc * d) / req : null;
  });
  return panel(
    rec,
    rec.series.salinityIncrease,
    allowed,
    "increase at edge (g/kg, log)",
    "dashed: allowed increase",
    "record-increase-chart",
  );
}

/** The duration curve: edge dilution against the percentage of time it is equalled or exceeded. */
export function recordDurationSvg(rec: RecordResult): string {
  const pts = durationCurve(rec);
  const req = rec.series.requiredDilution.filter((v): v is number => v !== null && Number.isFinite(v));
  const required = req.length ? Math.max(...req) : null;
  const vals = [...pts.map((p) => p.dilution), ...(required ? [required] : [])].filter((v) => v > 0);
  const lo = vals.length ? Math.min(...vals) * 0.85 : 0.1;
  const hi = vals.length ? Math.max(...vals) * 1.15 : 10;
  const sx = (p: number) => L + (p / 100) * (W - L - R);
  const sy = (y: number) => T + (1 - (Math.log(y) - Math.log(lo)) / (Math.log(hi) - Math.log(lo))) * (H - T - B);
  let d = "";
  let prev = 0;
  for (const p of pts) {
    d += `${d ? "L" : "M"}${sx(prev).toFixed(1)},${sy(p.dilution).toFixed(1)}L${sx(p.percent).toFixed(1)},${sy(p.dilution).toFixed(1)}`;
    prev = p.percent;
  }
  const rule =
    rec.percentOfTime !== null
      ? `<line x1="${sx(rec.percentOfTime)}" x2="${sx(rec.percentOfTime)}" y1="${T}" y2="${H - B}" stroke="#6b7280" stroke-dasharray="3 3"/><text x="${sx(rec.percentOfTime) - 4}" y="${T + 12}" font-size="10" text-anchor="end">${escapeHtml(reportNumber(rec.percentOfTime))} % of the time</text>`
      : "";
  const grid = gridSvg([0, 20, 40, 60, 80, 100], sx, String, yTicks(lo, hi), sy);
  return `<svg xmlns="http://www.w3.org/2000/svg" id="record-duration-chart" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" role="img" aria-label="duration curve of the edge dilution" ${FONT}>
${grid}
<line x1="${L}" x2="${L}" y1="${T}" y2="${H - B}" stroke="#111"/><line x1="${L}" x2="${W - R}" y1="${H - B}" y2="${H - B}" stroke="#111"/>
${required ? `<line x1="${L}" x2="${W - R}" y1="${sy(required)}" y2="${sy(required)}" stroke="#b91c1c" stroke-dasharray="6 3"/><text x="${W - R}" y="${sy(required) - 4}" font-size="10" text-anchor="end" fill="#b91c1c">required dilution ${escapeHtml(reportNumber(required))}</text>` : ""}
${rule}
<path d="${d}" fill="none" stroke="#1d4ed8" stroke-width="1.4"/>
<text x="${(L + W - R) / 2}" y="${H - 6}" font-size="11" text-anchor="middle">percentage of the record's time the edge dilution is equalled or exceeded (%)</text>
<text transform="translate(13,${(T + H - B) / 2}) rotate(-90)" font-size="11" text-anchor="middle">edge dilution (×, log)</text>
</svg>`;
}
