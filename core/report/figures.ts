/**
 * The report's two figures as inline SVG strings built by hand (no chart library in core):
 * the side view of the jet(s) and dilution against distance. Coordinates: x = plan distance from the
 * port along the discharge, m; y = elevation above the seabed, m. SVG y grows downward, so every
 * vertical value passes through `sy()`.
 */
import type { NearFieldMethodResult } from "../nearfield/types";
import { escapeHtml, reportNumber } from "./format";

export { dilutionChartSvg, multiportSketchSvg } from "./figure-charts";

export const FONT = `font-family="Helvetica, Arial, sans-serif"`;
const METHOD_COLOURS: Readonly<Record<string, string>> = {
  "length-scale": "#b45309",
  integral: "#1d4ed8",
};
export const STAGE_COLOURS: Readonly<Record<string, string>> = {
  jet: "#1d4ed8",
  "spreading-layer": "#0f766e",
  "passive-diffusion": "#7c3aed",
};

/** "Nice" linear ticks covering [min, max] (1, 2, 5 × 10ⁿ steps). */
export function linearTicks(min: number, max: number, count = 6): number[] {
  if (!(max > min)) return [min];
  const raw = (max - min) / count;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const ticks: number[] = [];
  // Round to the step's decimals so 0.30000000000000004 prints as 0.3.
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  for (let t = Math.ceil(min / step) * step; t <= max + step * 1e-9; t += step) ticks.push(Number(t.toFixed(decimals)));
  return ticks;
}

/** Ticks at 1, 2, 5 × 10ⁿ between min and max (both > 0). */
export function logTicks(min: number, max: number): number[] {
  const ticks: number[] = [];
  for (let p = Math.floor(Math.log10(min)); p <= Math.ceil(Math.log10(max)); p++) {
    for (const m of [1, 2, 5]) {
      const t = m * Math.pow(10, p);
      if (t >= min * (1 - 1e-9) && t <= max * (1 + 1e-9)) ticks.push(t);
    }
  }
  return ticks;
}

interface Frame {
  readonly width: number;
  readonly height: number;
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

export const FRAME: Frame = { width: 680, height: 300, left: 58, right: 18, top: 22, bottom: 44 };

export function plotWidth(f: Frame): number {
  return f.width - f.left - f.right;
}
export function plotHeight(f: Frame): number {
  return f.height - f.top - f.bottom;
}

export function n(value: number): string {
  return (Math.round(value * 10) / 10).toString();
}

/** Catmull–Rom spline through the points as SVG cubic Bézier segments (smooth line through key points). */
function smoothPath(points: readonly (readonly [number, number])[]): string {
  if (points.length === 0) return "";
  const [first] = points;
  let d = `M${n(first![0])},${n(first![1])}`;
  for (let i = 0; i < points.length - 1; i++) {
    const p0 = points[Math.max(0, i - 1)]!;
    const p1 = points[i]!;
    const p2 = points[i + 1]!;
    const p3 = points[Math.min(points.length - 1, i + 2)]!;
    const c1 = [p1[0] + (p2[0] - p0[0]) / 6, p1[1] + (p2[1] - p0[1]) / 6];
    const c2 = [p2[0] - (p3[0] - p1[0]) / 6, p2[1] - (p3[1] - p1[1]) / 6];
    d += ` C${n(c1[0]!)},${n(c1[1]!)} ${n(c2[0]!)},${n(c2[1]!)} ${n(p2[0])},${n(p2[1])}`;
  }
  return d;
}

export function polyline(points: readonly (readonly [number, number])[]): string {
  return points.map(([x, y], i) => `${i === 0 ? "M" : "L"}${n(x)},${n(y)}`).join(" ");
}

export interface SideViewInput {
  readonly nearField: readonly NearFieldMethodResult[];
  /** Water depth at the diffuser, m (null when the scenario could not be read). */
  readonly depth: number | null;
  /** Port height above the seabed, m. */
  readonly portHeight: number | null;
  /** Port angle above horizontal, degrees. */
  readonly portAngle: number | null;
}

/** A method's centreline as computed (integral methods give a path; length-scale laws give none). */
export function sideViewPath(method: NearFieldMethodResult, portHeight: number): [number, number][] | null {
  if (!method.path || method.path.length < 2) return null;
  return method.path.map((p) => [Math.hypot(p.x, p.y), portHeight + p.z]);
}

/** Key points a method reports, as (plan distance, elevation above seabed); only those it gives. */
export function sideViewKeyPoints(method: NearFieldMethodResult, portHeight: number) {
  const points: { kind: "max-rise" | "return" | "impact"; x: number; y: number }[] = [];
  if (method.maxRiseDistance !== null && method.maxRiseHeight !== null) {
    points.push({ kind: "max-rise", x: method.maxRiseDistance, y: portHeight + method.maxRiseHeight });
  }
  if (method.returnDistance !== null) points.push({ kind: "return", x: method.returnDistance, y: portHeight });
  if (method.impactDistance !== null) points.push({ kind: "impact", x: method.impactDistance, y: 0 });
  return points;
}

/** Largest vertical exaggeration the side view uses: a jet's rise keeps its true proportions within ×2. */
export const SIDE_VIEW_MAX_EXAGGERATION = 2;
/** Narrowest plot of the side view, px: below it the figure would be a sliver. */
const SIDE_VIEW_MIN_PLOT = { width: 220 } as const;
const SIDE_VIEW_MAX_PLOT = { width: 604, height: 300 } as const;

/**
 * Scales of the side view, px per metre on each axis. True scale (×1) when it fits; a deep, short jet
 * gets a narrower plot rather than a squashed one, and a long, shallow one is stretched vertically by at
 * most SIDE_VIEW_MAX_EXAGGERATION, its plot made lower instead. Exaggeration = (px/m vertical)/(px/m horizontal).
 */
export function sideViewScales(
  xMax: number,
  yMax: number,
): { kx: number; ky: number; width: number; height: number; exaggeration: number } {
  let kx = SIDE_VIEW_MAX_PLOT.width / xMax;
  let ky = SIDE_VIEW_MAX_PLOT.height / yMax;
  if (ky < kx) kx = Math.max(ky, SIDE_VIEW_MIN_PLOT.width / xMax); // deep water: narrow the plot toward true scale
  if (ky > kx * SIDE_VIEW_MAX_EXAGGERATION) ky = kx * SIDE_VIEW_MAX_EXAGGERATION;
  return { kx, ky, width: xMax * kx, height: yMax * ky, exaggeration: ky / kx };
}

/** Side view: seabed, surface, port, each method's centreline or key points, maximum rise and impact. */
/** One near-field method as drawn in the side view: its computed path (if any) and its reported points. */
interface SideViewLine {
  readonly method: NearFieldMethodResult;
  readonly path: [number, number][] | null;
  readonly keys: ReturnType<typeof sideViewKeyPoints>;
}

/** The side view's frame and data-to-picture mappings, shared by the parts of the drawing. */
interface SideViewPlot {
  readonly f: Frame;
  readonly sx: (x: number) => number;
  readonly sy: (y: number) => number;
  /** Plan distance at the right edge of the plot, m. */
  readonly xMax: number;
  /** Highest height drawn (the surface or the highest jet point), m above the seabed. */
  readonly yTop: number;
  /** Port height above the seabed, m. */
  readonly hp: number;
}

export function sideViewSvg(input: SideViewInput): string {
  const hp = input.portHeight ?? 0;
  const lines: SideViewLine[] = input.nearField.map((m) => ({
    method: m,
    path: sideViewPath(m, hp),
    keys: sideViewKeyPoints(m, hp),
  }));
  const { xMax, yTop } = sideViewExtent(lines, hp, input.depth);
  // A little headroom above the surface for its label; the legend sits below the plot, never on it.
  const yMax = yTop * 1.1;
  const scale = sideViewScales(xMax, yMax);
  const legendRows = lines.length + 1;
  const f: Frame = {
    width: FRAME.width,
    left: FRAME.left,
    right: FRAME.width - FRAME.left - scale.width,
    top: 14,
    bottom: 44 + legendRows * 14 + 6,
    height: 14 + scale.height + 44 + legendRows * 14 + 6,
  };
  const sx = (x: number) => f.left + x * scale.kx;
  const sy = (y: number) => f.top + scale.height - y * scale.ky;
  const plot: SideViewPlot = { f, sx, sy, xMax, yTop, hp };
  const axisY = f.top + scale.height + 6 + 30;
  const legendTop = axisY + 8;
  const parts = [
    ...waterAndSeabedParts(plot, input.depth),
    ...sideViewAxesParts(plot, scale, axisY),
    ...lines.flatMap((line, i) => methodParts(plot, line, legendTop + i * 14)),
  ];
  const ve = scale.exaggeration;
  const veText =
    Math.abs(ve - 1) > 0.05
      ? `vertical exaggeration ×${reportNumber(Number(ve.toPrecision(2)))}`
      : "true scale (no vertical exaggeration)";
  parts.push(
    `<text x="${f.left}" y="${n(legendTop + lines.length * 14 + 3.5)}" font-size="10" fill="#475569" ${FONT}>● seabed impact · □ return to port level · ${escapeHtml(veText)}</text>`,
  );
  return svgWrap(parts, "Side view of the jet centrelines above the seabed", f);
}

/** The plan distance (with 8 % room) and the height the side view must show, m. */
function sideViewExtent(
  lines: readonly SideViewLine[],
  hp: number,
  depth: number | null,
): { xMax: number; yTop: number } {
  let xMax = 1;
  let yTop = depth ?? hp + 1;
  for (const { method, path, keys } of lines) {
    for (const [x, y] of path ?? []) {
      xMax = Math.max(xMax, x);
      yTop = Math.max(yTop, y);
    }
    for (const k of keys) xMax = Math.max(xMax, k.x);
    if (method.maxRiseHeight !== null) yTop = Math.max(yTop, hp + method.maxRiseHeight);
  }
  return { xMax: xMax * 1.08, yTop };
}

/** Water, surface (with its depth) and seabed. */
function waterAndSeabedParts(plot: SideViewPlot, depth: number | null): string[] {
  const { f, sx, sy, xMax } = plot;
  const parts: string[] = [];
  if (depth !== null) {
    parts.push(
      `<rect x="${n(sx(0))}" y="${n(sy(depth))}" width="${n(plotWidth(f))}" height="${n(sy(0) - sy(depth))}" fill="#eef6fb"/>`,
    );
    parts.push(
      `<line x1="${n(sx(0))}" y1="${n(sy(depth))}" x2="${n(sx(xMax))}" y2="${n(sy(depth))}" stroke="#0369a1" stroke-width="1.2"/>`,
    );
    parts.push(
      `<text x="${n(sx(xMax))}" y="${n(sy(depth) - 4)}" text-anchor="end" font-size="10" fill="#075985" ${FONT}>water surface (depth ${escapeHtml(reportNumber(depth))} m)</text>`,
    );
  }
  parts.push(`<rect x="${n(sx(0))}" y="${n(sy(0))}" width="${n(plotWidth(f))}" height="6" fill="#d6c7a1"/>`);
  parts.push(
    `<line x1="${n(sx(0))}" y1="${n(sy(0))}" x2="${n(sx(xMax))}" y2="${n(sy(0))}" stroke="#7c6a3c" stroke-width="1.4"/>`,
  );
  return parts;
}

/** Axes with ticks and titles, and the riser with its port. */
function sideViewAxesParts(plot: SideViewPlot, scale: { width: number; height: number }, axisY: number): string[] {
  const { f, sx, sy, xMax, yTop, hp } = plot;
  const parts: string[] = [];
  // Axes and ticks (fewer on a narrow plot so the labels never touch).
  const xTickCount = Math.max(2, Math.min(6, Math.floor(scale.width / 70)));
  parts.push(...axisTicks(linearTicks(0, xMax, xTickCount), (t) => sx(t), sy(0) + 6, "x"));
  parts.push(
    ...axisTicks(
      linearTicks(0, yTop, Math.max(2, Math.min(5, Math.floor(scale.height / 40)))),
      (t) => sy(t),
      sx(0),
      "y",
    ),
  );
  parts.push(`<line x1="${n(sx(0))}" y1="${n(sy(0))}" x2="${n(sx(0))}" y2="${n(sy(yTop))}" stroke="#334155"/>`);
  parts.push(
    `<text x="${n(f.left)}" y="${n(axisY)}" font-size="11" ${FONT}>plan distance from the port along the discharge (m)</text>`,
  );
  parts.push(
    `<text transform="translate(14 ${n(sy(yTop / 2))}) rotate(-90)" text-anchor="middle" font-size="11" ${FONT}>height above seabed (m)</text>`,
  );
  // Riser and port.
  parts.push(
    `<line x1="${n(sx(0))}" y1="${n(sy(0))}" x2="${n(sx(0))}" y2="${n(sy(hp))}" stroke="#334155" stroke-width="3"/>`,
  );
  parts.push(`<circle cx="${n(sx(0))}" cy="${n(sy(hp))}" r="3" fill="#334155"/>`);
  return parts;
}

/** One method's marks: its centreline or joined points, impact and return, maximum rise, rising field, legend row at `ly`. */
function methodParts(plot: SideViewPlot, line: SideViewLine, ly: number): string[] {
  const { f, sx, sy, hp } = plot;
  const { method, path, keys } = line;
  const colour = METHOD_COLOURS[method.method] ?? "#475569";
  const parts: string[] = [];
  if (path) {
    parts.push(
      `<path d="${polyline(path.map(([x, y]) => [sx(x), sy(y)] as const))}" fill="none" stroke="${colour}" stroke-width="2"/>`,
    );
  } else if (keys.some((k) => k.kind === "max-rise")) {
    // A line through the reported points only (port, max rise, return, impact): no shape is invented between them.
    const pts: [number, number][] = [[sx(0), sy(hp)], ...keys.map((k) => [sx(k.x), sy(k.y)] as [number, number])];
    parts.push(
      `<path d="${smoothPath(pts)}" fill="none" stroke="${colour}" stroke-width="1.6" stroke-dasharray="6 3"/>`,
    );
  }
  for (const k of keys) {
    if (k.kind === "impact") parts.push(`<circle cx="${n(sx(k.x))}" cy="${n(sy(0))}" r="4" fill="${colour}"/>`);
    if (k.kind === "return")
      parts.push(
        `<rect x="${n(sx(k.x) - 3.5)}" y="${n(sy(k.y) - 3.5)}" width="7" height="7" fill="none" stroke="${colour}" stroke-width="1.5"/>`,
      );
  }
  parts.push(...maxRiseParts(plot, line, colour), ...risingFieldParts(plot, method, colour));
  const label = path
    ? `${method.method}: computed centreline; bar = upper edge at maximum rise`
    : method.maxRiseDistance !== null
      ? `${method.method}: reported points joined; bar = upper edge at maximum rise`
      : `${method.method}: reported points; dotted level = maximum rise of the upper edge`;
  parts.push(
    `<line x1="${f.left}" y1="${n(ly)}" x2="${f.left + 24}" y2="${n(ly)}" stroke="${colour}" stroke-width="2"${path ? "" : ` stroke-dasharray="6 3"`}/>`,
  );
  parts.push(`<text x="${f.left + 30}" y="${n(ly + 3.5)}" font-size="10" ${FONT}>${escapeHtml(label)}</text>`);
  return parts;
}

/** The maximum rise of the upper edge: a bar where it is located, otherwise a dotted level. */
function maxRiseParts(plot: SideViewPlot, line: SideViewLine, colour: string): string[] {
  const { sx, sy, xMax, hp } = plot;
  const { method, keys } = line;
  if (method.maxRiseHeight === null) return [];
  const y = sy(hp + method.maxRiseHeight);
  if (method.maxRiseDistance !== null) {
    const x = sx(method.maxRiseDistance);
    return [`<line x1="${n(x - 7)}" y1="${n(y)}" x2="${n(x + 7)}" y2="${n(y)}" stroke="${colour}" stroke-width="2"/>`];
  }
  // Location of the maximum not reported: the height is drawn as a level across the rising jet.
  // Without a return point the level runs across the whole plot: it states a height, not a place.
  const xEnd = sx(keys.find((k) => k.kind === "return")?.x ?? xMax);
  return [
    `<line x1="${n(sx(0))}" y1="${n(y)}" x2="${n(xEnd)}" y2="${n(y)}" stroke="${colour}" stroke-width="1.2" stroke-dasharray="2 3"/>`,
  ];
}

/** A rising plume's field: where it spreads (the surface or the trap level), from where it starts. */
function risingFieldParts(plot: SideViewPlot, method: NearFieldMethodResult, colour: string): string[] {
  const { sx, sy, xMax, hp } = plot;
  const field = method.risingField;
  if (!field || field.kind === "none") return [];
  const y = sy(hp + field.height);
  return [
    `<line x1="${n(sx(Math.max(0, field.distance - 2 * field.halfWidth)))}" y1="${n(y)}" x2="${n(sx(Math.min(xMax, field.distance + 0.25 * xMax)))}" y2="${n(y)}" stroke="${colour}" stroke-width="4" stroke-opacity="0.45"/>`,
    `<text x="${n(sx(Math.min(xMax * 0.97, field.distance + 0.02 * xMax)))}" y="${n(y + 12)}" font-size="9" fill="${colour}" ${FONT}>${escapeHtml(`${method.method}: ${field.kind === "trapped" ? "trapped field (trap level)" : "surface field"}, S = ${reportNumber(field.dilution)}`)}</text>`,
  ];
}

export function axisTicks(
  ticks: readonly number[],
  pos: (t: number) => number,
  base: number,
  axis: "x" | "y",
): string[] {
  return ticks.map((t) => {
    const p = pos(t);
    const label = escapeHtml(reportNumber(t));
    return axis === "x"
      ? `<line x1="${n(p)}" y1="${n(base)}" x2="${n(p)}" y2="${n(base + 4)}" stroke="#334155"/><text x="${n(p)}" y="${n(base + 15)}" text-anchor="middle" font-size="10" ${FONT}>${label}</text>`
      : `<line x1="${n(base - 4)}" y1="${n(p)}" x2="${n(base)}" y2="${n(p)}" stroke="#334155"/><text x="${n(base - 6)}" y="${n(p + 3.5)}" text-anchor="end" font-size="10" ${FONT}>${label}</text>`;
  });
}

export function gridLines(ticks: readonly number[], pos: (t: number) => number, f: Frame, axis: "x" | "y"): string[] {
  return ticks.map((t) =>
    axis === "x"
      ? `<line x1="${n(pos(t))}" y1="${f.top}" x2="${n(pos(t))}" y2="${f.top + plotHeight(f)}" stroke="#e2e8f0"/>`
      : `<line x1="${f.left}" y1="${n(pos(t))}" x2="${f.left + plotWidth(f)}" y2="${n(pos(t))}" stroke="#e2e8f0"/>`,
  );
}

export function svgWrap(parts: readonly string[], title: string, f: Frame = FRAME): string {
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${f.width} ${f.height}" width="100%" role="img" aria-label="${escapeHtml(title)}">` +
    `<title>${escapeHtml(title)}</title>${parts.join("")}</svg>`
  );
}
