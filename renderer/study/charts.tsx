/**
 * Study charts drawn with d3 scales into SVG: a line chart for a one-input sweep, a heat map of the
 * margin for a two-input sweep with the limit contour (margin = 1) marked (SweepHeatmap.tsx), and a
 * Monte Carlo histogram with P5/P50/P95. No physics here: the charts draw numbers the core computed.
 */
import { extent, line, scaleLinear, scaleLog } from "d3";
import type { SweepRow } from "../../core/study/sweep";
import { formatNumber } from "../../core/units";
import { logTicks } from "../../core/report/figures";
import { uncertaintyHistogramSvg } from "../../core/report/uncertainty";
import type { MonteCarloStats } from "../../core/study/montecarlo";
import { useSize } from "../ui/use-size";
import { XGridTicks } from "../charts/XGridTicks";

export const M = { top: 20, right: 16, bottom: 40, left: 60 };

/**
 * Ticks for a log axis whose labels never overprint: 1, 2, 5 × 10ⁿ when there is room, else powers of
 * ten, else the two ends; kept at least `minGap` pixels apart.
 */
export function readableLogTicks(lo: number, hi: number, toPixel: (v: number) => number, minGap: number): number[] {
  const thin = (list: number[]) => {
    const out: number[] = [];
    for (const t of list)
      if (out.length === 0 || Math.abs(toPixel(t) - toPixel(out[out.length - 1]!)) >= minGap) out.push(t);
    return out;
  };
  const all = logTicks(lo, hi);
  const decades = all.filter((t) => Math.abs(Math.log10(t) - Math.round(Math.log10(t))) < 1e-9);
  const fine = thin(all);
  if (fine.length === all.length) return fine;
  const coarse = thin(decades);
  return coarse.length >= 2 ? coarse : thin([lo, hi]);
}

/** Linear ticks spaced for labels about `labelWidth` pixels wide. */
function linearTickCount(widthPx: number, labelWidth = 70): number {
  return Math.max(2, Math.min(8, Math.floor(widthPx / labelWidth)));
}

export interface AxisDisplay {
  readonly label: string;
  /** SI value → display value. */
  readonly toDisplay: (v: number) => number;
}

type PathAxis = AxisDisplay & { readonly path: string };
export type GridAxis = PathAxis & { readonly steps: number };

/** A vertical axis title, centred on the plot. */
export function YLabel({ h, text }: { h: number; text: string }) {
  const y = (M.top + h - M.bottom) / 2;
  return (
    <text className="axis-label" transform={`translate(14,${y}) rotate(-90)`} textAnchor="middle">
      {text}
    </text>
  );
}

export function XLabel({ w, h, text }: { w: number; h: number; text: string }) {
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
  const edge = line<{ x: number; y: number }>()
    .x((p) => x(p.x))
    .y((p) => y(p.y));
  const req = line<{ x: number; req: number }>()
    .x((p) => x(p.x))
    .y((p) => y(Math.max(y.domain()[0]!, p.req)));
  return (
    <div className="sweep-chart-block">
      <div className="chart study-chart" ref={ref} data-role="sweep-line-chart">
        <svg width={w} height={h} role="img" aria-label={`Edge dilution against ${axis.label}`}>
          <XGridTicks ticks={x.ticks(linearTickCount(w - M.left - M.right))} at={x} top={M.top} bottom={h - M.bottom} />
          {readableLogTicks(y.domain()[0]!, y.domain()[1]!, (v) => y(v), 18).map((t, i) => (
            <g key={`y${i}`} transform={`translate(0,${y(t)})`}>
              <line className="gridline" x1={M.left} x2={w - M.right} />
              <text className="tick" x={M.left - 6} dy="0.32em" textAnchor="end">
                {formatNumber(t)}
              </text>
            </g>
          ))}
          <path d={req(pts) ?? ""} className="study-limit" />
          <path d={edge(pts) ?? ""} className="study-line" />
          {pts.map((p, i) => (
            <VerdictMark key={i} x={x(p.x)} y={y(p.y)} verdict={p.verdict} />
          ))}
          <XLabel w={w} h={h} text={axis.label} />
          <YLabel h={h} text="Dilution at the edge (×, log scale)" />
        </svg>
      </div>
      <ul className="chart-legend" aria-label="Legend">
        <li>
          <svg width="26" height="10" aria-hidden="true">
            <line x1="0" y1="5" x2="26" y2="5" className="study-line" />
          </svg>{" "}
          dilution at the mixing-zone edge, governing case
        </li>
        <li>
          <svg width="26" height="10" aria-hidden="true">
            <line x1="0" y1="5" x2="26" y2="5" className="study-limit" />
          </svg>{" "}
          required dilution
        </li>
        {(["meets", "exceeds", "outside-scope"] as const).map((verdict) => (
          <li key={verdict}>
            <svg width="10" height="10" aria-hidden="true">
              <VerdictMark x={5} y={5} verdict={verdict} />
            </svg>{" "}
            {verdict.replace("-", " ")}
          </li>
        ))}
      </ul>
    </div>
  );
}

/** A point's verdict as a shape as well as a colour: disc meets, square exceeds, ring outside scope. */
function VerdictMark({ x, y, verdict }: { x: number; y: number; verdict: string }) {
  if (verdict === "meets")
    return (
      <circle cx={x} cy={y} r={3.5} className="study-pass">
        <title>meets</title>
      </circle>
    );
  if (verdict === "outside-scope")
    return (
      <circle cx={x} cy={y} r={3.5} className="study-scope">
        <title>outside-scope</title>
      </circle>
    );
  return (
    <rect x={x - 3.5} y={y - 3.5} width={7} height={7} className="study-fail">
      <title>{verdict}</title>
    </rect>
  );
}

/**
 * Histogram of the per-run worst-case edge dilution with the required dilution (its P5–P95 band when the
 * drawn salinities move it), P5/P50/P95 and labelled axes: the same figure as the report's (core draws it).
 */
export function MonteCarloHistogram({
  bins,
  worst,
}: {
  bins: readonly { x0: number; x1: number; count: number }[];
  worst: Pick<MonteCarloStats, "edgeDilution" | "requiredDilution">;
}) {
  const [ref, size] = useSize<HTMLDivElement>();
  if (bins.length === 0) return <div className="placeholder">No runs.</div>;
  const svg = uncertaintyHistogramSvg(bins, worst, Math.max(420, Math.min(900, size.width || 680)));
  return (
    <div
      className="study-histogram"
      ref={ref}
      data-role="monte-carlo-histogram"
      dangerouslySetInnerHTML={{ __html: svg }}
    />
  );
}
