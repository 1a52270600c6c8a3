/**
 * Where each port sits in plan and which way it points, from the normalised diffuser description.
 * Geometry only: the same rules the file format states (ports spaced along the diffuser axis, centred on
 * the diffuser; rosette risers spaced along the axis, each with its own port azimuths).
 */
import type { DiffuserInput } from "../../core/scenario/types";
import { azimuthToEastNorth, type PortPlacement } from "./plume-geometry";

export function portPlacements(diffuser: DiffuserInput): PortPlacement[] {
  const axis = azimuthToEastNorth(diffuser.diffuserAzimuth);
  const along = (offset: number) => ({ east: axis.east * offset, north: axis.north * offset });
  if (diffuser.layout === "rosette" && diffuser.risers) {
    const r = diffuser.risers;
    const out: PortPlacement[] = [];
    for (let i = 0; i < r.count; i++) {
      const centre = along((i - (r.count - 1) / 2) * r.spacing);
      for (let k = 0; k < r.portsPerRiser; k++) {
        // Missing azimuths are spread evenly around the riser.
        const azimuth = r.portAzimuths[k] ?? (diffuser.portAzimuth + (360 * k) / r.portsPerRiser) % 360;
        out.push({ ...centre, azimuth });
      }
    }
    return out;
  }
  if (diffuser.layout === "single" || diffuser.portCount <= 1) {
    return [{ east: 0, north: 0, azimuth: diffuser.portAzimuth }];
  }
  return Array.from({ length: diffuser.portCount }, (_, i) => ({
    ...along((i - (diffuser.portCount - 1) / 2) * diffuser.portSpacing),
    azimuth: diffuser.portAzimuth,
  }));
}

/** Azimuth the computed (representative) jet was run at. */
export function representativeAzimuth(diffuser: DiffuserInput): number {
  if (diffuser.layout === "rosette" && diffuser.risers && diffuser.risers.portAzimuths.length > 0) {
    return diffuser.risers.portAzimuths[0];
  }
  return diffuser.portAzimuth;
}

/**
 * Plan heading of a computed centreline where it leaves the port (degrees clockwise from north), read
 * from the first points; `fallback` for a vertical start or an empty path.
 */
export function pathStartAzimuth(path: readonly { x: number; y: number; s: number }[], fallback: number): number {
  if (path.length < 2) return fallback;
  const total = Math.max(1e-9, path[path.length - 1].s - path[0].s);
  for (const p of path.slice(1, 40)) {
    const dx = p.x - path[0].x;
    const dy = p.y - path[0].y;
    if (Math.hypot(dx, dy) > 1e-3 * total) {
      const deg = (Math.atan2(dx, dy) * 180) / Math.PI;
      return (deg + 360) % 360;
    }
  }
  return fallback;
}
