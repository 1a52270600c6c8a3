/** The report's dilution chart along the distance from the diffuser and the multiport regime sketches (inline SVG). */
import type { MixingZoneResult } from "../result/contract";
import { escapeHtml, reportNumber } from "./format";
import {
  FONT,
  STAGE_COLOURS,
  linearTicks,
  logTicks,
  FRAME,
  plotWidth,
  plotHeight,
  n,
  polyline,
  axisTicks,
  gridLines,
  svgWrap,
} from "./figures";

export interface DilutionChartInput {
  readonly mixingZone: MixingZoneResult;
  /** Dilution the governing limit requires at the edge (null when no limit was set). */
  readonly requiredDilution: number | null;
}

/** Centreline dilution against plan distance (log axis when it spans more than a decade), edge and limit marked. */
export function dilutionChartSvg(input: DilutionChartInput): string {
  const f = FRAME;
  const { series, radius, dilution } = input.mixingZone;
  const pts: { x: number; y: number; stage: string }[] = [];
  for (let i = 0; i < series.distance.length; i++) {
    const x = series.distance[i]!;
    const y = series.dilution[i]!;
    // Dilution below 1 is unphysical and cannot sit on a log axis; such points are left out of the drawing.
    if (Number.isFinite(x) && Number.isFinite(y) && y >= 1) pts.push({ x, y, stage: series.stage[i] ?? "" });
  }
  const xMax = Math.max(radius, ...pts.map((p) => p.x), 1) * 1.05;
  const ys = [
    ...pts.map((p) => p.y),
    dilution,
    ...(input.requiredDilution !== null ? [input.requiredDilution] : []),
  ].filter((v) => Number.isFinite(v) && v >= 1);
  const yLo = Math.max(1, Math.min(...ys, 10) / 1.3);
  const yHi = Math.max(...ys, 2) * 1.3;
  const useLog = yHi / yLo > 10;
  const sx = (x: number) => f.left + (x / xMax) * plotWidth(f);
  const sy = useLog
    ? (y: number) => f.top + plotHeight(f) * (1 - (Math.log(y) - Math.log(yLo)) / (Math.log(yHi) - Math.log(yLo)))
    : (y: number) => f.top + plotHeight(f) * (1 - (y - 0) / yHi);
  const yTicks = useLog ? logTicks(yLo, yHi) : linearTicks(0, yHi, 5);
  const xTicks = linearTicks(0, xMax);
  const parts: string[] = [];
  parts.push(...gridLines(xTicks, sx, f, "x"), ...gridLines(yTicks, sy, f, "y"));
  parts.push(
    `<rect x="${f.left}" y="${f.top}" width="${plotWidth(f)}" height="${plotHeight(f)}" fill="none" stroke="#94a3b8"/>`,
  );
  parts.push(...axisTicks(xTicks, sx, f.top + plotHeight(f), "x"), ...axisTicks(yTicks, sy, f.left, "y"));
  parts.push(
    `<text x="${n(f.left + plotWidth(f) / 2)}" y="${f.height - 6}" text-anchor="middle" font-size="11" ${FONT}>plan distance from the diffuser (m)</text>`,
  );
  parts.push(
    `<text transform="translate(14 ${n(f.top + plotHeight(f) / 2)}) rotate(-90)" text-anchor="middle" font-size="11" ${FONT}>centreline dilution${useLog ? " (log scale)" : ""}</text>`,
  );
  // Required dilution and the mixing-zone edge.
  if (input.requiredDilution !== null && Number.isFinite(input.requiredDilution) && input.requiredDilution >= 1) {
    const y = sy(input.requiredDilution);
    parts.push(
      `<line x1="${f.left}" y1="${n(y)}" x2="${f.left + plotWidth(f)}" y2="${n(y)}" stroke="#b91c1c" stroke-width="1.4" stroke-dasharray="7 4"/>`,
    );
    parts.push(
      `<text x="${f.left + plotWidth(f) - 4}" y="${n(y - 4)}" text-anchor="end" font-size="10" fill="#b91c1c" ${FONT}>required dilution ${escapeHtml(reportNumber(input.requiredDilution))}</text>`,
    );
  }
  const ex = sx(radius);
  parts.push(
    `<line x1="${n(ex)}" y1="${f.top}" x2="${n(ex)}" y2="${f.top + plotHeight(f)}" stroke="#0f172a" stroke-width="1.2" stroke-dasharray="3 3"/>`,
  );
  parts.push(
    `<text x="${n(ex + 4)}" y="${f.top + 12}" font-size="10" ${FONT}>mixing-zone edge ${escapeHtml(reportNumber(radius))} m</text>`,
  );
  // The series, coloured by stage.
  let run: { x: number; y: number }[] = [];
  let stage = pts[0]?.stage ?? "";
  const flush = () => {
    if (run.length > 1) {
      parts.push(
        `<path d="${polyline(run.map((p) => [sx(p.x), sy(p.y)] as const))}" fill="none" stroke="${STAGE_COLOURS[stage] ?? "#475569"}" stroke-width="2"/>`,
      );
    }
  };
  for (const p of pts) {
    if (p.stage !== stage) {
      const last = run[run.length - 1];
      flush();
      run = last ? [last] : [];
      stage = p.stage;
    }
    run.push(p);
  }
  flush();
  if (Number.isFinite(dilution) && dilution >= 1) {
    parts.push(`<circle cx="${n(ex)}" cy="${n(sy(dilution))}" r="4" fill="#0f172a"/>`);
    parts.push(
      `<text x="${n(ex + 6)}" y="${n(sy(dilution) + 14)}" font-size="10" ${FONT}>S = ${escapeHtml(reportNumber(dilution))} at the edge</text>`,
    );
  }
  const stages = [...new Set(pts.map((p) => p.stage))];
  stages.forEach((s, i) => {
    const y = f.top + plotHeight(f) - 12 - (stages.length - 1 - i) * 14;
    parts.push(
      `<line x1="${f.left + plotWidth(f) - 150}" y1="${y}" x2="${f.left + plotWidth(f) - 126}" y2="${y}" stroke="${STAGE_COLOURS[s] ?? "#475569"}" stroke-width="2"/>`,
    );
    parts.push(
      `<text x="${f.left + plotWidth(f) - 120}" y="${y + 3.5}" font-size="10" ${FONT}>${escapeHtml(s)}</text>`,
    );
  });
  return svgWrap(parts, "Centreline dilution against distance from the diffuser");
}

const REGIMES = [
  { id: "independent", title: "independent", note: "jets stay apart" },
  { id: "partially-merged", title: "partially merged", note: "jets touch before impact" },
  { id: "merged-line-source", title: "merged line source", note: "jets join into one sheet" },
] as const;

/**
 * A small sketch of the multiport regimes, looking along the diffuser at three neighbouring ports: jets
 * apart, touching, joined. The regime of this result is drawn in colour with a heavy frame and the words
 * "this design"; the others in grey. A picture of what the words mean, not a computed drawing.
 */
export function multiportSketchSvg(regime: string): string {
  const panelW = 200;
  const panelH = 118;
  const width = panelW * REGIMES.length + 20;
  const height = panelH + 10;
  const parts: string[] = [];
  REGIMES.forEach((r, i) => {
    const x0 = 10 + i * panelW;
    const active = r.id === regime;
    const ink = active ? "#1d4ed8" : "#94a3b8";
    const fill = active ? "rgba(29,78,216,0.22)" : "rgba(148,163,184,0.18)";
    parts.push(
      `<rect x="${x0 + 4}" y="4" width="${panelW - 8}" height="${panelH - 4}" rx="4" fill="#ffffff" stroke="${active ? "#0f172a" : "#cbd5e1"}" stroke-width="${active ? 2 : 1}"/>`,
    );
    const bed = 84;
    const top = 24;
    const spacing = 46;
    const spread = [14, 26, 40][i]!; // half-width at the top of the rise: apart, touching, overlapping
    parts.push(
      `<line x1="${x0 + 14}" y1="${bed}" x2="${x0 + panelW - 14}" y2="${bed}" stroke="#7c6a3c" stroke-width="2"/>`,
    );
    if (i === 2) {
      // One sheet over all three ports.
      const cx = x0 + panelW / 2;
      parts.push(
        `<path d="M${cx - spacing - 3},${bed - 6} L${cx - spacing - spread},${top} L${cx + spacing + spread},${top} L${cx + spacing + 3},${bed - 6} Z" fill="${fill}" stroke="${ink}" stroke-width="1.2"/>`,
      );
    }
    for (let k = -1; k <= 1; k++) {
      const cx = x0 + panelW / 2 + k * spacing;
      if (i !== 2)
        parts.push(
          `<path d="M${cx - 3},${bed - 6} L${cx - spread},${top} L${cx + spread},${top} L${cx + 3},${bed - 6} Z" fill="${fill}" stroke="${ink}" stroke-width="1.2"/>`,
        );
      parts.push(`<rect x="${cx - 3}" y="${bed - 6}" width="6" height="6" fill="#334155"/>`);
    }
    parts.push(
      `<text x="${x0 + panelW / 2}" y="${bed + 16}" text-anchor="middle" font-size="11" font-weight="${active ? 700 : 400}" fill="${active ? "#0f172a" : "#475569"}" ${FONT}>${escapeHtml(r.title)}${active ? " — this design" : ""}</text>`,
    );
    parts.push(
      `<text x="${x0 + panelW / 2}" y="${bed + 29}" text-anchor="middle" font-size="9.5" fill="#475569" ${FONT}>${escapeHtml(r.note)}</text>`,
    );
  });
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="100%" role="img" aria-label="${escapeHtml(`Multiport regimes: independent, partially merged, merged line source; this design: ${regime}`)}">` +
    `<title>Multiport regimes seen along the diffuser</title>${parts.join("")}</svg>`
  );
}
