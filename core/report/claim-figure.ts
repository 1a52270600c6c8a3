/**
 * The claim check's range bar as an inline SVG string (report and app): one row per method chain and
 * ambient case — its stated scatter as a light bar, its value as a dot — on a dilution axis, with the
 * conservative value and the claim marked. Built by hand like figures.ts (no chart library in core).
 */
import type { ClaimCheck } from "../compliance/claim";
import { escapeHtml, reportNumber } from "./format";
import { linearTicks, logTicks } from "./figures";

const FONT = `font-family="Helvetica, Arial, sans-serif"`;
const ROW = 18;
const WIDTH = 680;
const LEFT = 268;
const RIGHT = 18;
const TOP = 30;
const BOTTOM = 40;

const n = (v: number) => (Math.round(v * 10) / 10).toString();

/** Range bar of the chains at the claim's distance, claim and conservative value marked. */
export function claimRangeBarSvg(check: ClaimCheck): string {
  const rows = check.chains;
  const height = TOP + rows.length * ROW + BOTTOM;
  const values = [
    check.claimedDilution,
    check.conservativeDilution,
    ...rows.flatMap((c) => [c.low, c.high, c.dilution]),
  ].filter((v) => Number.isFinite(v) && v >= 1);
  const lo = Math.max(1, Math.min(...values) / 1.25);
  const hi = Math.max(...values) * 1.25;
  const useLog = hi / lo > 10;
  const plotW = WIDTH - LEFT - RIGHT;
  const sx = useLog
    ? (v: number) => LEFT + (plotW * (Math.log(v) - Math.log(lo))) / (Math.log(hi) - Math.log(lo))
    : (v: number) => LEFT + (plotW * (v - lo)) / (hi - lo);
  const ticks = useLog ? logTicks(lo, hi) : linearTicks(lo, hi, 6);
  const bottom = TOP + rows.length * ROW;
  const parts: string[] = [];
  for (const t of ticks) {
    const x = n(sx(t));
    parts.push(`<line x1="${x}" y1="${TOP}" x2="${x}" y2="${bottom}" stroke="#e2e8f0"/>`);
    parts.push(
      `<text x="${x}" y="${bottom + 14}" text-anchor="middle" font-size="10" ${FONT}>${escapeHtml(reportNumber(t))}</text>`,
    );
  }
  parts.push(
    `<rect x="${LEFT}" y="${TOP}" width="${plotW}" height="${rows.length * ROW}" fill="none" stroke="#94a3b8"/>`,
  );
  parts.push(
    `<text x="${n(LEFT + plotW / 2)}" y="${height - 6}" text-anchor="middle" font-size="11" ${FONT}>centreline dilution at ${escapeHtml(reportNumber(check.distance))} m${useLog ? " (log scale)" : ""}</text>`,
  );
  rows.forEach((c, i) => {
    const y = TOP + i * ROW + ROW / 2;
    const colour = c.reproducesClaim ? "#1d4ed8" : "#64748b";
    const label = `${c.case === "stated" ? "stated" : c.case} · ${c.method}`;
    parts.push(
      `<text x="${LEFT - 6}" y="${n(y + 3.5)}" text-anchor="end" font-size="10" ${FONT}>${escapeHtml(label.length > 44 ? label.slice(0, 43) + "…" : label)}</text>`,
    );
    parts.push(
      `<line x1="${n(sx(c.low))}" y1="${n(y)}" x2="${n(sx(c.high))}" y2="${n(y)}" stroke="${colour}" stroke-opacity="0.35" stroke-width="7" stroke-linecap="round"/>`,
    );
    parts.push(
      `<circle cx="${n(sx(c.dilution))}" cy="${n(y)}" r="3.5" fill="${colour}"><title>${escapeHtml(`${label}: ${reportNumber(c.dilution)} (${reportNumber(c.low)}–${reportNumber(c.high)})`)}</title></circle>`,
    );
  });
  const cx = sx(check.conservativeDilution);
  parts.push(
    `<line x1="${n(cx)}" y1="${TOP - 4}" x2="${n(cx)}" y2="${bottom}" stroke="#0f172a" stroke-width="1.2" stroke-dasharray="3 3"/>`,
  );
  parts.push(
    `<text x="${n(cx)}" y="${TOP - 8}" text-anchor="middle" font-size="10" ${FONT}>conservative ${escapeHtml(reportNumber(check.conservativeDilution))}</text>`,
  );
  const kx = sx(check.claimedDilution);
  parts.push(`<line x1="${n(kx)}" y1="${TOP - 4}" x2="${n(kx)}" y2="${bottom}" stroke="#b91c1c" stroke-width="2"/>`);
  parts.push(
    `<text x="${n(kx)}" y="${TOP - 20}" text-anchor="middle" font-size="10" font-weight="700" fill="#b91c1c" ${FONT}>claim ${escapeHtml(reportNumber(check.claimedDilution))}</text>`,
  );
  const title = `Claimed dilution ${reportNumber(check.claimedDilution)} against each method chain at ${reportNumber(check.distance)} m: ${check.verdict}`;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 -12 ${WIDTH} ${height + 12}" width="100%" role="img" aria-label="${escapeHtml(title)}" data-figure="claim-range-bar">` +
    `<title>${escapeHtml(title)}</title>${parts.join("")}</svg>`
  );
}
