/**
 * The 3D view's compass: north and the current's direction as they point on screen, drawn over the view
 * in a corner of its own so neither is ever cut off by the view's edge nor lies under its buttons. The
 * view sets the CSS variables --north and --current (degrees clockwise from screen-up) on every frame.
 */
import { forwardRef } from "react";
import { Vector3, type Camera } from "three";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { azimuthToEastNorth, worldToScene } from "./plume-geometry";

/**
 * Where a plan direction (degrees clockwise from north) points on screen, in degrees clockwise from
 * screen-up, seen from `camera` around `target`; null when the direction points at the viewer.
 */
export function screenBearing(
  camera: Camera,
  target: Vector3,
  azimuth: number,
  width: number,
  height: number,
): number | null {
  const dir = azimuthToEastNorth(azimuth);
  const step = Math.max(1e-3, camera.position.distanceTo(target) * 0.05);
  const a = target.clone().project(camera);
  const b = target
    .clone()
    .add(worldToScene({ x: dir.east, y: dir.north, z: 0 }).multiplyScalar(step))
    .project(camera);
  const dx = (b.x - a.x) * width;
  const dy = (b.y - a.y) * height;
  if (Math.hypot(dx, dy) < 1e-6) return null;
  return (Math.atan2(dx, dy) * 180) / Math.PI;
}

export interface CompassProps {
  readonly current: { readonly toward: number; readonly speed: number } | null;
  readonly unitSystem: UnitSystem;
}

export const Compass = forwardRef<SVGSVGElement, CompassProps>(function Compass({ current, unitSystem }, ref) {
  const speed = current ? siToDisplay(current.speed, "speed", unitSystem) : null;
  const label =
    current && speed
      ? `current ${formatNumber(speed.value, 3)} ${speed.unit} toward ${formatNumber(current.toward, 3)}°`
      : "still water";
  return (
    <div className="plume-compass" data-role="compass">
      <svg
        ref={ref}
        viewBox="-34 -34 68 68"
        width="64"
        height="64"
        role="img"
        aria-label={`Compass: north arrow; ${label}`}
      >
        <circle r="24" className="compass-ring" />
        <g className="compass-north" style={{ transform: "rotate(var(--north, 0deg))" }}>
          <path d="M0 -22 L6 -4 L0 -8 L-6 -4 Z" />
          <text y="-24" textAnchor="middle" className="compass-n">
            N
          </text>
        </g>
        {current ? (
          <g className="compass-current" style={{ transform: "rotate(var(--current, 0deg))" }}>
            <line x1="0" y1="16" x2="0" y2="-14" />
            <path d="M0 -21 L5 -12 L-5 -12 Z" />
          </g>
        ) : null}
      </svg>
      <span className="compass-label">{label}</span>
    </div>
  );
});
