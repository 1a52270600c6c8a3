/**
 * The two-input sweep as a heat map of the margin (log colour scale centred on margin = 1), points not
 * meeting the limit hatched, the limit contour drawn and a colour legend beside it.
 */
import { contours, geoPath, interpolateRdYlGn, scaleSequential, type ContourMultiPolygon } from "d3";
import type { SweepRow } from "../../core/study/sweep";
import { formatNumber } from "../../core/units";
import { useSize } from "../ui/use-size";
import { M, XLabel, YLabel, readableLogTicks, type GridAxis } from "./charts";

export function SweepHeatmap({ rows, axes }: { rows: readonly SweepRow[]; axes: readonly [GridAxis, GridAxis] }) {
  const [ref, size] = useSize<HTMLDivElement>();
  const w = Math.max(260, size.width);
  const h = Math.max(220, size.height);
  const [a, b] = axes;
  const nx = a.steps;
  const ny = b.steps;
  const grid = new Array<number>(nx * ny).fill(Number.NaN);
  for (const r of rows) grid[r.index[1]! * nx + r.index[0]!] = r.margin;
  const xv = rows
    .filter((r) => r.index[1] === 0)
    .sort((p, q) => p.index[0]! - q.index[0]!)
    .map((r) => a.toDisplay(r.values[a.path]!));
  const yv = rows
    .filter((r) => r.index[0] === 0)
    .sort((p, q) => p.index[1]! - q.index[1]!)
    .map((r) => b.toDisplay(r.values[b.path]!));
  const legendW = 116; // colour legend on the right
  const cw = (w - M.left - M.right - legendW) / nx;
  const ch = (h - M.top - M.bottom) / ny;
  const finite = grid.filter((v) => Number.isFinite(v) && v > 0);
  const lo = Math.log10(Math.min(...finite, 0.5));
  const hi = Math.log10(Math.max(...finite, 2));
  // Symmetric in log(margin) so that margin = 1 is the scale's middle colour.
  const span = Math.max(Math.abs(lo), Math.abs(hi));
  const colour = scaleSequential(interpolateRdYlGn).domain([-span, span]);
  const limit = limitContour(grid, nx, ny);
  // d3-contour places value (i, j) at (i + 0.5, j + 0.5) in grid units: scaling by the cell size maps
  // the contour onto the cell centres of the heat map (after removing the one-cell padding).
  const project = geoPath(null);
  const clipId = `study-heatmap-clip-${nx}-${ny}`;
  return (
    <div className="chart study-chart" ref={ref} data-role="sweep-heatmap">
      <svg width={w} height={h} role="img" aria-label={`Margin over ${a.label} and ${b.label}, limit contour marked`}>
        <HeatmapDefs
          clipId={clipId}
          width={w - M.left - M.right - legendW}
          height={h - M.top - M.bottom}
          colour={colour}
          span={span}
        />
        <g transform={`translate(${M.left},${h - M.bottom}) scale(1,-1)`} clipPath={`url(#${clipId})`}>
          {grid.map((v, k) => (
            <rect
              key={k}
              x={(k % nx) * cw}
              y={Math.floor(k / nx) * ch}
              width={cw + 0.5}
              height={ch + 0.5}
              fill={Number.isFinite(v) && v > 0 ? colour(Math.log10(v)) : "#ccc"}
              data-margin={Number.isFinite(v) ? v : undefined}
            >
              <title>
                {`${a.label} ${formatNumber(xv[k % nx] ?? Number.NaN)}, ` +
                  `${b.label} ${formatNumber(yv[Math.floor(k / nx)] ?? Number.NaN)}: ` +
                  `margin ${formatNumber(v)}`}
              </title>
            </rect>
          ))}
          {grid.map((v, k) =>
            !(Number.isFinite(v) && v >= 1) ? (
              <rect
                key={`h${k}`}
                x={(k % nx) * cw}
                y={Math.floor(k / nx) * ch}
                width={cw + 0.5}
                height={ch + 0.5}
                fill={`url(#${clipId}-hatch)`}
                pointerEvents="none"
              />
            ) : null,
          )}
          {limit ? (
            <g transform={`scale(${cw},${ch}) translate(-1,-1)`}>
              <path d={project(limit) ?? ""} className="study-contour" vectorEffect="non-scaling-stroke" />
            </g>
          ) : null}
        </g>
        <HeatmapTicks xv={xv} yv={yv} nx={nx} ny={ny} cw={cw} ch={ch} h={h} />
        <XLabel w={w - legendW} h={h} text={a.label} />
        <YLabel h={h} text={b.label} />
        <HeatLegend
          x={w - M.right - legendW + 12}
          top={M.top}
          height={h - M.top - M.bottom}
          span={span}
          gradient={`${clipId}-legend`}
          hatch={`${clipId}-hatch`}
        />
      </svg>
    </div>
  );
}

/**
 * The limit contour: margin = 1 (edge dilution equals the required dilution), or null when the grid does not
 * cross it. d3-contour closes every ring along the grid's border, which would draw the plot's frame as if it
 * were the limit; the grid is therefore padded by one replicated cell on each side and the padding is
 * clipped away.
 */
function limitContour(grid: readonly number[], nx: number, ny: number): ContourMultiPolygon | null {
  const px = nx + 2;
  const py = ny + 2;
  const field = new Array<number>(px * py);
  for (let j = 0; j < py; j++) {
    for (let i = 0; i < px; i++) {
      const v = grid[Math.min(ny - 1, Math.max(0, j - 1)) * nx + Math.min(nx - 1, Math.max(0, i - 1))]!;
      field[j * px + i] = Number.isFinite(v) ? v : 0; // a point that could not run counts as failing
    }
  }
  const hasPass = field.some((v) => v >= 1);
  const hasFail = field.some((v) => v < 1);
  return nx > 1 && ny > 1 && hasPass && hasFail ? (contours().size([px, py]).thresholds([1])(field)[0] ?? null) : null;
}

/** The heat map's clip rectangle, the hatch that marks points not meeting the limit and the legend's gradient. */
function HeatmapDefs(props: {
  clipId: string;
  width: number;
  height: number;
  colour: (v: number) => string;
  span: number;
}) {
  const { clipId, width, height, colour, span } = props;
  return (
    <defs>
      <clipPath id={clipId}>
        {/* In the heat map's own (translated, y-up) coordinates. */}
        <rect x={0} y={0} width={width} height={height} />
      </clipPath>
      <pattern id={`${clipId}-hatch`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <line x1="0" y1="0" x2="0" y2="6" stroke="#1d2833" strokeOpacity="0.35" strokeWidth="1.2" />
      </pattern>
      <linearGradient id={`${clipId}-legend`} x1="0" y1="1" x2="0" y2="0">
        {[0, 0.25, 0.5, 0.75, 1].map((f) => (
          <stop key={f} offset={f} stopColor={colour(-span + 2 * span * f)} />
        ))}
      </linearGradient>
    </defs>
  );
}

/** Tick labels at cell centres, thinned so they do not overprint. */
function HeatmapTicks(props: {
  xv: readonly number[];
  yv: readonly number[];
  nx: number;
  ny: number;
  cw: number;
  ch: number;
  h: number;
}) {
  const { xv, yv, nx, ny, cw, ch, h } = props;
  return (
    <>
      {xv.map((t, i) =>
        i % Math.ceil(nx / Math.max(2, Math.floor((nx * cw) / 64))) === 0 ? (
          <text key={`x${i}`} className="tick" x={M.left + (i + 0.5) * cw} y={h - M.bottom + 14} textAnchor="middle">
            {formatNumber(t)}
          </text>
        ) : null,
      )}
      {yv.map((t, j) =>
        j % Math.ceil(ny / Math.max(2, Math.floor((ny * ch) / 20))) === 0 ? (
          <text
            key={`y${j}`}
            className="tick"
            x={M.left - 6}
            y={h - M.bottom - (j + 0.5) * ch}
            dy="0.32em"
            textAnchor="end"
          >
            {formatNumber(t)}
          </text>
        ) : null,
      )}
    </>
  );
}

/** The heat map's colour legend: margin on a log scale, margin = 1 marked as the black limit line, hatching for not meeting. */
function HeatLegend({
  x,
  top,
  height,
  span,
  gradient,
  hatch,
}: {
  x: number;
  top: number;
  height: number;
  span: number;
  gradient: string;
  hatch: string;
}) {
  const barH = Math.max(60, height - 54);
  const sy = (logMargin: number) => top + 14 + barH * (1 - (logMargin + span) / (2 * span));
  const lo = Math.pow(10, -span);
  const hi = Math.pow(10, span);
  const ticks = readableLogTicks(lo, hi, (v) => sy(Math.log10(v)), 16);
  if (!ticks.some((t) => Math.abs(t - 1) < 1e-9)) ticks.push(1);
  return (
    <g data-role="heatmap-legend" fontSize={10.5}>
      <text x={x - 4} y={top + 4} className="axis-label">
        margin
      </text>
      <rect x={x} y={top + 14} width={14} height={barH} fill={`url(#${gradient})`} stroke="#94a3b8" />
      <rect x={x} y={sy(0)} width={14} height={top + 14 + barH - sy(0)} fill={`url(#${hatch})`} />
      {ticks.map((t) => (
        <g key={t}>
          <line x1={x + 14} x2={x + 18} y1={sy(Math.log10(t))} y2={sy(Math.log10(t))} stroke="#334155" />
          <text x={x + 21} y={sy(Math.log10(t))} dy="0.32em" className="tick" textAnchor="start">
            {formatNumber(t, 2)}
          </text>
        </g>
      ))}
      <line x1={x - 4} x2={x + 18} y1={sy(0)} y2={sy(0)} className="study-contour" />
      <text x={x - 4} y={top + 14 + barH + 14} className="tick">
        black line:
      </text>
      <text x={x - 4} y={top + 14 + barH + 26} className="tick">
        margin = 1 (limit)
      </text>
      <text x={x - 4} y={top + 14 + barH + 38} className="tick">
        hatched: not met
      </text>
    </g>
  );
}
