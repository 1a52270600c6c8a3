/** Side view of the jet: centreline and half-width band above the seabed, water surface, method markers. */
import { area, line, scaleLinear } from "d3";
import { formatNumber, siToDisplay } from "../../core/units";
import { useSize } from "../ui/use-size";
import { riseMarkers, trajectorySeries, type SideViewProps } from "./chart-data";
import { dilutionColour, dilutionDomain, rgbToHex } from "../view3d/colour-scale";
import { XGridTicks } from "./XGridTicks";

const MARGIN = { top: 26, right: 14, bottom: 34, left: 46 };

export function TrajectoryChart({ result, scenario, unitSystem }: SideViewProps) {
  const [ref, size] = useSize<HTMLDivElement>();
  const points = trajectorySeries(result, scenario, unitSystem);
  const markers = riseMarkers(result, scenario, unitSystem);
  const unit = siToDisplay(1, "length", unitSystem).unit;
  const depth = siToDisplay(scenario.ambient.depth, "length", unitSystem).value;
  const width = Math.max(200, size.width);
  const height = Math.max(150, size.height);
  const maxX = Math.max(1, ...points.map((p) => p.distance), ...markers.map((m) => m.distance)) * 1.08;
  const x = scaleLinear()
    .domain([0, maxX])
    .range([MARGIN.left, width - MARGIN.right])
    .nice();
  // The water column, or the jet's top if core's path leaves it (a jet that reaches the surface).
  const top = Math.max(depth * 1.06, ...points.map((p) => p.upper * 1.04));
  const y = scaleLinear()
    .domain([0, top])
    .range([height - MARGIN.bottom, MARGIN.top]);
  const centre = line<(typeof points)[number]>()
    .x((p) => x(p.distance))
    .y((p) => y(p.height));
  const band = area<(typeof points)[number]>()
    .x((p) => x(p.distance))
    .y0((p) => y(p.lower))
    .y1((p) => y(p.upper));
  const domain = dilutionDomain(points.map((p) => p.dilution));
  const gradientId = "traj-gradient";
  return (
    <div className="chart" ref={ref} data-role="trajectory-chart">
      <svg width={width} height={height} role="img" aria-label="Side view of the jet centreline above the seabed">
        <defs>
          <linearGradient id={gradientId} x1="0" x2="1" y1="0" y2="0">
            {points
              .filter((_, i) => i % Math.max(1, Math.floor(points.length / 24)) === 0)
              .map((p, i) => (
                <stop
                  key={i}
                  offset={`${((x(p.distance) - x(0)) / Math.max(1, x(maxX) - x(0))) * 100}%`}
                  stopColor={rgbToHex(dilutionColour(p.dilution, domain))}
                />
              ))}
          </linearGradient>
        </defs>
        <rect
          className="water"
          x={x.range()[0]}
          y={y(depth)}
          width={x.range()[1] - x.range()[0]}
          height={y(0) - y(depth)}
        />
        <XGridTicks ticks={x.ticks(6)} at={x} top={MARGIN.top} bottom={height - MARGIN.bottom} />
        {y.ticks(5).map((t) => (
          <g key={`y${t}`} transform={`translate(0,${y(t)})`}>
            <line className="gridline" x1={MARGIN.left} x2={width - MARGIN.right} />
            <text className="tick" x={MARGIN.left - 6} dy="0.32em" textAnchor="end">
              {formatNumber(t)}
            </text>
          </g>
        ))}
        <line className="surface" x1={x.range()[0]} x2={x.range()[1]} y1={y(depth)} y2={y(depth)} />
        <text className="annotation" x={x.range()[1] - 4} y={y(depth) - 4} textAnchor="end">
          water surface
        </text>
        <line className="seabed" x1={x.range()[0]} x2={x.range()[1]} y1={y(0)} y2={y(0)} />
        {points.length > 1 ? <path className="jet-band" d={band(points) ?? ""} fill={`url(#${gradientId})`} /> : null}
        {points.length > 1 ? <path className="jet-centre" d={centre(points) ?? ""} /> : null}
        {markers.map((m, i) => (
          <g key={i} className={`marker method-${m.method}`} transform={`translate(${x(m.distance)},${y(m.value)})`}>
            {m.method === "integral" ? (
              <circle r={4} />
            ) : (
              <rect x={-4} y={-4} width={8} height={8} transform="rotate(45)" />
            )}
            <title>{`${m.method}: ${m.label} at ${formatNumber(m.distance, 3)} ${unit}`}</title>
          </g>
        ))}
        <text className="axis-label" x={(x.range()[0] + x.range()[1]) / 2} y={height - 4} textAnchor="middle">
          plan distance from port ({unit})
        </text>
        <text
          className="axis-label"
          transform={`translate(12,${(y.range()[0] + y.range()[1]) / 2}) rotate(-90)`}
          textAnchor="middle"
        >
          height above seabed ({unit})
        </text>
      </svg>
      <div className="chart-key">
        {markers.some((m) => m.method === "integral") ? (
          <span>
            <i className="dot integral" /> integral method
          </span>
        ) : null}
        {markers.some((m) => m.method !== "integral") ? (
          <span>
            <i className="diamond" /> length-scale method
          </span>
        ) : null}
      </div>
    </div>
  );
}
