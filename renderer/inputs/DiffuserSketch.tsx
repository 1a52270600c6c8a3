/** Small plan sketch of the diffuser: ports, their azimuths, the diffuser axis, north and the current. */
import type { DiffuserInput } from "../../core/scenario/types";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { azimuthToEastNorth } from "../view3d/plume-geometry";
import { portPlacements } from "../view3d/ports";

export function DiffuserSketch(props: {
  diffuser: DiffuserInput;
  currentDirection: number;
  currentSpeed: number;
  unitSystem: UnitSystem;
}) {
  const { diffuser } = props;
  const ports = portPlacements(diffuser);
  const width = 340;
  const height = 116;
  const pad = 20;
  const spanE = Math.max(1e-6, ...ports.map((p) => Math.abs(p.east)));
  const spanN = Math.max(1e-6, ...ports.map((p) => Math.abs(p.north)));
  const scale = ports.length === 1 ? 1 : Math.min((width / 2 - pad - 20) / spanE, (height / 2 - pad) / spanN);
  const arm = ports.length === 1 ? 34 : 14;
  const sx = (e: number) => width / 2 + e * scale;
  const sy = (n: number) => height / 2 - n * scale;
  const axis = azimuthToEastNorth(diffuser.diffuserAzimuth);
  const half = diffuser.length / 2;
  const current = azimuthToEastNorth(props.currentDirection);
  const lengthText = siToDisplay(diffuser.length, "length", props.unitSystem);
  return (
    <svg
      className="diffuser-sketch"
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-label="Plan sketch of the diffuser ports"
    >
      <defs>
        <marker
          id="sk-arrow"
          viewBox="0 0 10 10"
          refX="9"
          refY="5"
          markerWidth="6"
          markerHeight="6"
          orient="auto-start-reverse"
        >
          <path d="M0,0 L10,5 L0,10 z" />
        </marker>
      </defs>
      <rect x={0.5} y={0.5} width={width - 1} height={height - 1} className="sketch-frame" />
      {ports.length > 1 ? (
        <line
          className="sketch-axis"
          x1={sx(-axis.east * half)}
          y1={sy(-axis.north * half)}
          x2={sx(axis.east * half)}
          y2={sy(axis.north * half)}
        />
      ) : null}
      {ports.map((p, i) => {
        const d = azimuthToEastNorth(p.azimuth);
        return (
          <g key={i} className="sketch-port">
            <line
              x1={sx(p.east)}
              y1={sy(p.north)}
              x2={sx(p.east) + d.east * arm}
              y2={sy(p.north) - d.north * arm}
              markerEnd="url(#sk-arrow)"
            />
            <circle cx={sx(p.east)} cy={sy(p.north)} r={2.6} />
          </g>
        );
      })}
      <g className="sketch-north" transform={`translate(${width - 16},${30})`}>
        <line x1={0} y1={10} x2={0} y2={-10} markerEnd="url(#sk-arrow)" />
        <text y={-13} textAnchor="middle">
          N
        </text>
      </g>
      {props.currentSpeed > 0 ? (
        <g className="sketch-current" transform={`translate(${24},${height - 24})`}>
          <line
            x1={-current.east * 12}
            y1={current.north * 12}
            x2={current.east * 12}
            y2={-current.north * 12}
            markerEnd="url(#sk-arrow)"
          />
          <text x={18} y={4}>
            current
          </text>
        </g>
      ) : null}
      <text className="sketch-caption" x={6} y={12}>
        {ports.length} port{ports.length === 1 ? "" : "s"}
        {ports.length > 1 ? `, ${formatNumber(lengthText.value, 3)} ${lengthText.unit}` : ""}
      </text>
    </svg>
  );
}
