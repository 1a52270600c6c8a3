/**
 * Study charts drawn with d3 scales into SVG: a line chart for a one-input sweep, a heat map of the
 * margin for a two-input sweep with the limit contour (margin = 1) marked, and a Monte Carlo histogram
 * with P5/P50/P95. No physics here: the charts draw numbers the core computed.
 */
import {
  contours,
  extent,
  geoPath,
  interpolateRdYlGn,
  line,
  scaleLinear,
  scaleLog,
  scaleSequential,
} from "d3";
import type { SweepRow } from "../../core/study/sweep";
import { formatNumber } from "../../core/units";
import { useSize } from "../ui/useSize";

const M = { top: 20, right: 16, bottom: 38, left: 56 };

export interface AxisDisplay {
  readonly label: string;
  /** SI value → display value. */
  readonly toDisplay: (v: number) => number;
}

type PathAxis = AxisDisplay & { readonly path: string };
type GridAxis = PathAxis & { readonly steps: number };

/** A vertical axis title, centred on the plot. */
function YLabel({ h, text }: { h: number; text: string }) {
  const y = (M.top + h - M.bottom) / 2;
  return (
    <text className="axis-label" transform={`translate(14,${y}) rotate(-90)`} textAnchor="middle">
      {text}
    </text>
  );
}

function XLabel({ w, h, text }: { w: number; h: number; text: string }) {
  return (
    <text className="axis-label" x={(M.left + w - M.right) / 2} y={h - 6} textAnchor="middle">
      {text}
    </text>
  );
}

export function SweepLineChart({ rows, axis }: { rows: readonly SweepRow[]; axis: PathAxis }) {
  const [ref, size] = useSize<HTMLDivElement>();
  const w = Math.max(260, size.width);
  const h = Math.max(200, size.height);
  const pts = rows
    .filter((r) => Number.isFinite(r.edgeDilution) && r.edgeDilution > 0)
    .map((r) => ({
      x: axis.toDisplay(r.values[axis.path]!),
      y: r.edgeDilution,
      req: r.requiredDilution,
      pass: r.pass,
      verdict: r.verdict,
    }));
  const xs = extent(pts, (p) => p.x) as [number, number] | [undefined, undefined];
  const ys = [...pts.map((p) => p.y), ...pts.map((p) => p.req)].filter((v) => v > 0);
  const x = scaleLinear()
    .domain(xs[0] === undefined ? [0, 1] : [xs[0], xs[1]!])
    .range([M.left, w - M.right])
    .nice();
  const y = scaleLog()
    .domain([Math.max(1, Math.min(...ys, 10) * 0.8), Math.max(...ys, 10) * 1.25])
    .range([h - M.bottom, M.top])
    .nice();
  const edge = line<{ x: number; y: number }>().x((p) => x(p.x)).y((p) => y(p.y));
  const req = line<{ x: number; req: number }>()
    .x((p) => x(p.x))
    .y((p) => y(Math.max(y.domain()[0]!, p.req)));
  return (
    <div className="chart study-chart" ref={ref} data-role="sweep-line-chart">
      <svg width={w} height={h} role="img" aria-label={`Edge dilution against ${axis.label}`}>
        {x.ticks(6).map((t) => (
          <g key={`x${t}`} transform={`translate(${x(t)},0)`}>
            <line className="gridline" y1={M.top} y2={h - M.bottom} />
            <text className="tick" y={h - M.bottom + 14} textAnchor="middle">{formatNumber(t)}</text>
          </g>
        ))}
        {y.ticks(4).map((t, i) => (
          <g key={`y${i}`} transform={`translate(0,${y(t)})`}>
            <line className="gridline" x1={M.left} x2={w - M.right} />
            <text className="tick" x={M.left - 6} dy="0.32em" textAnchor="end">{formatNumber(t)}</text>
          </g>
        ))}
        <path d={req(pts) ?? ""} className="study-limit" />
        <path d={edge(pts) ?? ""} className="study-line" />
        {pts.map((p, i) => (
          <circle key={i} cx={x(p.x)} cy={y(p.y)} r={3} className={p.verdict === "meets" ? "study-pass" : p.verdict === "outside-scope" ? "study-scope" : "study-fail"}>
            <title>{p.verdict}</title>
          </circle>
        ))}
        <XLabel w={w} h={h} text={axis.label} />
        <YLabel h={h} text="edge dilution, governing case (×) — dashed: required" />
      </svg>
    </div>
  );
}

export function SweepHeatmap({
  rows,
  axes,
}: {
  rows: readonly SweepRow[];
  axes: readonly [GridAxis, GridAxis];
}) {
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
  const cw = (w - M.left - M.right) / nx;
  const ch = (h - M.top - M.bottom) / ny;
  const finite = grid.filter((v) => Number.isFinite(v) && v > 0);
  const lo = Math.log10(Math.min(...finite, 0.5));
  const hi = Math.log10(Math.max(...finite, 2));
  // Symmetric in log(margin) so that margin = 1 is the scale's middle colour.
  const span = Math.max(Math.abs(lo), Math.abs(hi));
  const colour = scaleSequential(interpolateRdYlGn).domain([-span, span]);
  // The limit contour: margin = 1 (edge dilution equals the required dilution). d3-contour closes every
  // ring along the grid's border, which would draw the plot's frame as if it were the limit; the grid is
  // therefore padded by one replicated cell on each side and the padding is clipped away.
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
  const limit =
    nx > 1 && ny > 1 && hasPass && hasFail ? contours().size([px, py]).thresholds([1])(field)[0] : null;
  // d3-contour places value (i, j) at (i + 0.5, j + 0.5) in grid units: scaling by the cell size maps
  // the contour onto the cell centres of the heat map (after removing the one-cell padding).
  const project = geoPath(null);
  const clipId = `study-heatmap-clip-${nx}-${ny}`;
  return (
    <div className="chart study-chart" ref={ref} data-role="sweep-heatmap">
      <svg
        width={w}
        height={h}
        role="img"
        aria-label={`Margin over ${a.label} and ${b.label}, limit contour marked`}
      >
        <defs>
          <clipPath id={clipId}>
            {/* In the heat map's own (translated, y-up) coordinates. */}
            <rect x={0} y={0} width={w - M.left - M.right} height={h - M.top - M.bottom} />
          </clipPath>
        </defs>
        <g transform={`translate(${M.left},${h - M.bottom}) scale(1,-1)`} clipPath={`url(#${clipId})`}>
          {grid.map((v, k) => (
            <rect
              key={k}
              x={(k % nx) * cw}
              y={Math.floor(k / nx) * ch}
              width={cw + 0.5}
              height={ch + 0.5}
              fill={Number.isFinite(v) && v > 0 ? colour(Math.log10(v)) : "#ccc"}
            >
              <title>
                {`${a.label} ${formatNumber(xv[k % nx] ?? Number.NaN)}, ` +
                  `${b.label} ${formatNumber(yv[Math.floor(k / nx)] ?? Number.NaN)}: ` +
                  `margin ${formatNumber(v)}`}
              </title>
            </rect>
          ))}
          {limit ? (
            <g transform={`scale(${cw},${ch}) translate(-1,-1)`}>
              <path d={project(limit) ?? ""} className="study-contour" vectorEffect="non-scaling-stroke" />
            </g>
          ) : null}
        </g>
        {xv.map((t, i) => (i % Math.ceil(nx / 6) === 0 ? (
          <text
            key={`x${i}`}
            className="tick"
            x={M.left + (i + 0.5) * cw}
            y={h - M.bottom + 14}
            textAnchor="middle"
          >
            {formatNumber(t)}
          </text>
        ) : null))}
        {yv.map((t, j) => (j % Math.ceil(ny / 6) === 0 ? (
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
        ) : null))}
        <XLabel w={w} h={h} text={a.label} />
        <YLabel h={h} text={b.label} />
        <text className="annotation" x={w - M.right} y={M.top - 6} textAnchor="end">
          colour: margin (log); black line: limit (margin = 1)
        </text>
      </svg>
    </div>
  );
}

export function MonteCarloHistogram({
  bins,
  p5,
  p50,
  p95,
  required,
}: {
  bins: readonly { x0: number; x1: number; count: number }[];
  p5: number;
  p50: number;
  p95: number;
  required: number | null;
}) {
  const [ref, size] = useSize<HTMLDivElement>();
  const w = Math.max(260, size.width);
  const h = Math.max(200, size.height);
  if (bins.length === 0) return <div className="placeholder">No runs.</div>;
  const lo = Math.min(bins[0]!.x0, required ?? Infinity);
  const hi = Math.max(bins[bins.length - 1]!.x1, required ?? -Infinity);
  const x = scaleLinear().domain([lo, hi]).range([M.left, w - M.right]).nice();
  const y = scaleLinear()
    .domain([0, Math.max(...bins.map((b) => b.count))])
    .range([h - M.bottom, M.top])
    .nice();
  const marks = [
    { v: p5, label: "P5" },
    { v: p50, label: "P50" },
    { v: p95, label: "P95" },
  ];
  return (
    <div className="chart study-chart" ref={ref} data-role="monte-carlo-histogram">
      <svg width={w} height={h} role="img" aria-label="Histogram of the worst-case edge dilution">
        {x.ticks(6).map((t) => (
          <text key={`x${t}`} className="tick" x={x(t)} y={h - M.bottom + 14} textAnchor="middle">
            {formatNumber(t)}
          </text>
        ))}
        {y.ticks(4).map((t) => (
          <g key={`y${t}`} transform={`translate(0,${y(t)})`}>
            <line className="gridline" x1={M.left} x2={w - M.right} />
            <text className="tick" x={M.left - 6} dy="0.32em" textAnchor="end">{t}</text>
          </g>
        ))}
        {bins.map((b, i) => (
          <rect
            key={i}
            className={required !== null && b.x1 <= required ? "study-bar fail" : "study-bar"}
            x={x(b.x0)}
            y={y(b.count)}
            width={Math.max(0.5, x(b.x1) - x(b.x0) - 1)}
            height={y(0) - y(b.count)}
          />
        ))}
        {marks.map((m) => (
          <g key={m.label} transform={`translate(${x(m.v)},0)`}>
            <line className="study-percentile" y1={M.top} y2={h - M.bottom} />
            <text className="annotation" y={M.top - 4} textAnchor="middle">{m.label}</text>
          </g>
        ))}
        {required !== null ? (
          <g transform={`translate(${x(required)},0)`}>
            <line className="study-limit" y1={M.top} y2={h - M.bottom} />
            <text className="annotation" y={h - M.bottom - 4} x={4}>required</text>
          </g>
        ) : null}
        <text className="axis-label" x={(M.left + w - M.right) / 2} y={h - 6} textAnchor="middle">
          edge dilution, worst case per run (×)
        </text>
      </svg>
    </div>
  );
}
