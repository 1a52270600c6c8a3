/** The vertical grid lines of a chart's distance (x) axis, each with its number under the plot. */
import { formatNumber } from "../../core/units";

export function XGridTicks(props: {
  readonly ticks: readonly number[];
  /** Pixel position of a tick value. */
  readonly at: (t: number) => number;
  /** Pixel heights of the plot's top and bottom edges. */
  readonly top: number;
  readonly bottom: number;
}) {
  return (
    <>
      {props.ticks.map((t) => (
        <g key={`x${t}`} transform={`translate(${props.at(t)},0)`}>
          <line className="gridline" y1={props.top} y2={props.bottom} />
          <text className="tick" y={props.bottom + 14} textAnchor="middle">
            {formatNumber(t)}
          </text>
        </g>
      ))}
    </>
  );
}
