/**
 * Dilution and salinity increase against distance, with the limit line (required dilution or allowed
 * increase) and the mixing-zone edge marked, plus each near-field method's impact and end-of-near-field
 * points.
 */
import { line, scaleLinear, scaleLog, type ScaleLinear, type ScaleLogarithmic } from "d3";
import type { BrinefieldResult } from "../../core/result/contract";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { useSize } from "../ui/use-size";
import {
  distanceSeries,
  impactDilutionMarkers,
  salinityIncreaseLimit,
  type DistanceSeriesPoint,
  type MethodMarker,
} from "./chart-data";
import { XGridTicks } from "./XGridTicks";

const MARGIN = { top: 26, right: 14, bottom: 34, left: 52 };

interface Props {
  readonly result: BrinefieldResult;
  readonly unitSystem: UnitSystem;
  readonly quantity: "dilution" | "increase";
}

export function DistanceChart({ result, unitSystem, quantity }: Props) {
  const [ref, size] = useSize<HTMLDivElement>();
  const points = distanceSeries(result, unitSystem);
  const unit = siToDisplay(1, "length", unitSystem).unit;
  const edge = siToDisplay(result.mixingZone.radius, "length", unitSystem).value;
  const width = Math.max(200, size.width);
  const height = Math.max(150, size.height);
  const maxX = Math.max(edge * 1.25, ...points.map((p) => p.distance).filter((d) => d <= edge * 3));
  const x = scaleLinear()
    .domain([0, maxX])
    .range([MARGIN.left, width - MARGIN.right])
    .nice();
  const shown = points.filter((p) => p.distance <= x.domain()[1]);
  const value = (p: DistanceSeriesPoint) => (quantity === "dilution" ? p.dilution : p.increase);
  const required = result.compliance.requiredDilution;
  const limitIncrease = salinityIncreaseLimit(result);
  const limit = quantity === "dilution" ? (Number.isFinite(required) && required > 0 ? required : null) : limitIncrease;
  const markers = quantity === "dilution" ? impactDilutionMarkers(result, unitSystem) : [];
  const values = [...shown.map(value), ...(limit !== null ? [limit] : []), ...markers.map((m) => m.value)].filter(
    (v) => Number.isFinite(v) && v > 0,
  );
  const low = Math.max(quantity === "dilution" ? 1 : 1e-3, Math.min(...values, Infinity) * 0.8);
  const high = Math.max(low * 10, Math.max(...values, 0) * 1.25);
  const y = scaleLog()
    .domain([low, high])
    .range([height - MARGIN.bottom, MARGIN.top])
    .nice();
  const path = line<DistanceSeriesPoint>()
    .defined((p) => value(p) > 0 && Number.isFinite(value(p)))
    .x((p) => x(p.distance))
    .y((p) => y(Math.max(y.domain()[0], value(p))));
  const label = quantity === "dilution" ? "centreline dilution (×)" : "salinity increase (g/kg)";
  const limitLabel =
    quantity === "dilution"
      ? `required dilution ${formatNumber(required, 3)}×`
      : limit !== null
        ? `allowed increase ${formatNumber(limit, 3)} g/kg`
        : "";
  // A stage is drawn (and listed in the key) only when it has a line: two points with a value.
  const stages = Array.from(new Set(shown.map((p) => p.stage))).filter(
    (stage) => shown.filter((p) => p.stage === stage && value(p) > 0 && Number.isFinite(value(p))).length >= 2,
  );
  return (
    <div className="chart" ref={ref} data-role={`${quantity}-chart`}>
      <svg width={width} height={height} role="img" aria-label={`${label} against distance from the diffuser`}>
        <XGridTicks ticks={x.ticks(6)} at={x} top={MARGIN.top} bottom={height - MARGIN.bottom} />
        {y.ticks(4).map((t, i) => (
          <g key={`y${i}`} transform={`translate(0,${y(t)})`}>
            <line className="gridline minor" x1={MARGIN.left} x2={width - MARGIN.right} />
            {y.tickFormat(4, "~g")(t) !== "" ? (
              <text className="tick" x={MARGIN.left - 6} dy="0.32em" textAnchor="end">
                {formatNumber(t)}
              </text>
            ) : null}
          </g>
        ))}
        <line className="axis" x1={MARGIN.left} x2={MARGIN.left} y1={MARGIN.top} y2={height - MARGIN.bottom} />
        <line
          className="axis"
          x1={MARGIN.left}
          x2={width - MARGIN.right}
          y1={height - MARGIN.bottom}
          y2={height - MARGIN.bottom}
        />
        {stages.map((stage) => {
          const part = shown.filter((p) => p.stage === stage);
          return <path key={stage} className={`series stage-${stage}`} d={path(part) ?? ""} />;
        })}
        {limit !== null && limit >= y.domain()[0] && limit <= y.domain()[1] ? (
          <g className="limit-line">
            <line x1={MARGIN.left} x2={width - MARGIN.right} y1={y(limit)} y2={y(limit)} />
            <text x={width - MARGIN.right - 4} y={y(limit) - 4} textAnchor="end">
              {limitLabel}
            </text>
          </g>
        ) : null}
        <g className="edge-line">
          <line x1={x(edge)} x2={x(edge)} y1={MARGIN.top} y2={height - MARGIN.bottom} />
          <text x={x(edge) + 4} y={MARGIN.top + 10}>
            mixing-zone edge {formatNumber(edge, 3)} {unit}
          </text>
        </g>
        <ImpactMarkers markers={markers} x={x} y={y} unit={unit} />
        <text className="axis-label" x={(x.range()[0] + x.range()[1]) / 2} y={height - 4} textAnchor="middle">
          distance from diffuser ({unit})
        </text>
        <text
          className="axis-label"
          transform={`translate(12,${(y.range()[0] + y.range()[1]) / 2}) rotate(-90)`}
          textAnchor="middle"
        >
          {label}
        </text>
      </svg>
      <DistanceChartKey stages={stages} markers={markers} />
    </div>
  );
}

/** Each near-field method's impact and end-of-near-field points: a dot (integral) or a diamond (length-scale). */
function ImpactMarkers(props: {
  readonly markers: readonly MethodMarker[];
  readonly x: ScaleLinear<number, number>;
  readonly y: ScaleLogarithmic<number, number>;
  readonly unit: string;
}) {
  const { markers, x, y, unit } = props;
  return (
    <>
      {markers.map((m, i) => (
        <g
          key={i}
          className={`marker method-${m.method}`}
          transform={`translate(${x(m.distance)},${y(Math.max(y.domain()[0], m.value))})`}
        >
          {m.method === "integral" ? (
            <circle r={4} />
          ) : (
            <rect x={-4} y={-4} width={8} height={8} transform="rotate(45)" />
          )}
          <title>{`${m.method}: ${m.label}, dilution ${formatNumber(m.value, 3)} at ${formatNumber(m.distance, 3)} ${unit}`}</title>
        </g>
      ))}
    </>
  );
}

/** The key under the chart: one entry per drawn stage, then the marker shapes shown. */
function DistanceChartKey({
  stages,
  markers,
}: {
  readonly stages: readonly string[];
  readonly markers: readonly MethodMarker[];
}) {
  return (
    <div className="chart-key">
      {stages.map((s) => (
        <span key={s}>
          <i className={`key-line stage-${s}`} /> {s.replace(/-/g, " ")}
        </span>
      ))}
      {markers.some((m) => m.method === "integral") ? (
        <span>
          <i className="dot integral" /> integral
        </span>
      ) : null}
      {markers.some((m) => m.method !== "integral") ? (
        <span>
          <i className="diamond" /> length-scale
        </span>
      ) : null}
    </div>
  );
}
