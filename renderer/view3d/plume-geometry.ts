/**
 * Geometry for the 3D view, separate from physics and from drawing: centrelines, widths and dilutions come
 * in (already computed by core), three.js buffers come out. No physics here, only geometry.
 *
 * Frames: core works in world coordinates (x east, y north, z up, metres). three.js is y-up, so a world
 * point (e, n, u) becomes the scene point (e, u, −n). `worldToScene` is the one place that mapping lives.
 */
import { BufferAttribute, BufferGeometry, Vector3 } from "three";
import type { Rgb } from "./colour-scale";

export interface WorldPoint {
  readonly x: number; // m east
  readonly y: number; // m north
  readonly z: number; // m up
}

export function worldToScene(p: WorldPoint): Vector3 {
  return new Vector3(p.x, p.z, -p.y);
}

/** Direction (unit, east/north) of an azimuth in degrees clockwise from north. */
export function azimuthToEastNorth(azimuthDeg: number): { east: number; north: number } {
  const rad = (azimuthDeg * Math.PI) / 180;
  return { east: Math.sin(rad), north: Math.cos(rad) };
}

export interface TubeInput {
  /** Centreline in scene coordinates. */
  readonly centreline: readonly Vector3[];
  /** Tube radius at each centreline point (the jet half-width), same length. */
  readonly radii: readonly number[];
  /** Vertex colour at each centreline point, same length. */
  readonly colours: readonly Rgb[];
  readonly radialSegments?: number;
}

/**
 * A tube along a centreline with rotation-minimising (parallel-transport) frames, so the surface does
 * not twist where the curvature changes sign (at the top of a dense jet's arc). Points closer together
 * than 1 µm are merged. Ends are left open. Returns an empty geometry for fewer than two distinct points.
 */
export function tubeGeometry(input: TubeInput): BufferGeometry {
  const segments = Math.max(3, Math.floor(input.radialSegments ?? 16));
  const pts: Vector3[] = [];
  const radii: number[] = [];
  const colours: Rgb[] = [];
  input.centreline.forEach((p, i) => {
    if (pts.length > 0 && pts[pts.length - 1].distanceToSquared(p) < 1e-12) return;
    pts.push(p);
    radii.push(Math.max(0, input.radii[i] ?? 0));
    colours.push(input.colours[i] ?? [1, 1, 1]);
  });
  const geometry = new BufferGeometry();
  if (pts.length < 2) return geometry;

  const tangents = pts.map((_, i) => {
    const a = pts[Math.max(0, i - 1)];
    const b = pts[Math.min(pts.length - 1, i + 1)];
    return new Vector3().subVectors(b, a).normalize();
  });
  // Initial normal: any vector perpendicular to the first tangent, chosen away from it.
  const t0 = tangents[0];
  const helper = Math.abs(t0.y) < 0.9 ? new Vector3(0, 1, 0) : new Vector3(1, 0, 0);
  const normals: Vector3[] = [new Vector3().crossVectors(t0, helper).normalize()];
  for (let i = 1; i < pts.length; i++) {
    // Parallel transport: remove the component of the previous normal along the new tangent.
    const n = normals[i - 1].clone();
    n.addScaledVector(tangents[i], -n.dot(tangents[i]));
    if (n.lengthSq() < 1e-12) n.copy(normals[i - 1]); // tangent turned 90° in one step: keep the frame
    normals.push(n.normalize());
  }

  const ring = segments + 1; // duplicate seam vertex so colours and normals do not wrap
  const positions = new Float32Array(pts.length * ring * 3);
  const vertexNormals = new Float32Array(pts.length * ring * 3);
  const vertexColours = new Float32Array(pts.length * ring * 3);
  const binormal = new Vector3();
  const dir = new Vector3();
  for (let i = 0; i < pts.length; i++) {
    binormal.crossVectors(tangents[i], normals[i]).normalize();
    for (let j = 0; j < ring; j++) {
      const angle = (j / segments) * Math.PI * 2;
      dir.copy(normals[i]).multiplyScalar(Math.cos(angle)).addScaledVector(binormal, Math.sin(angle));
      const k = (i * ring + j) * 3;
      positions[k] = pts[i].x + dir.x * radii[i];
      positions[k + 1] = pts[i].y + dir.y * radii[i];
      positions[k + 2] = pts[i].z + dir.z * radii[i];
      vertexNormals[k] = dir.x;
      vertexNormals[k + 1] = dir.y;
      vertexNormals[k + 2] = dir.z;
      vertexColours[k] = colours[i][0];
      vertexColours[k + 1] = colours[i][1];
      vertexColours[k + 2] = colours[i][2];
    }
  }
  const index: number[] = [];
  for (let i = 0; i < pts.length - 1; i++) {
    for (let j = 0; j < segments; j++) {
      const a = i * ring + j;
      const b = (i + 1) * ring + j;
      index.push(a, b, a + 1, b, b + 1, a + 1);
    }
  }
  geometry.setAttribute("position", new BufferAttribute(positions, 3));
  geometry.setAttribute("normal", new BufferAttribute(vertexNormals, 3));
  geometry.setAttribute("color", new BufferAttribute(vertexColours, 3));
  geometry.setIndex(index);
  geometry.computeBoundingSphere();
  return geometry;
}

/** Height of the seabed (world z, m) at a plan point, for a plane bed through (0, 0, −depth). */
export function seabedHeight(
  east: number,
  north: number,
  depth: number,
  slope: number,
  slopeAzimuthDeg: number,
): number {
  const down = azimuthToEastNorth(slopeAzimuthDeg);
  return -depth - slope * (east * down.east + north * down.north);
}

export interface BedSpec {
  readonly depth: number;
  readonly slope: number;
  readonly slopeAzimuth: number;
}

/** A square seabed patch of half-size `half` m centred on the diffuser, following the bed slope. */
export function seabedGeometry(half: number, bed: BedSpec, divisions = 24): BufferGeometry {
  const n = Math.max(1, Math.floor(divisions));
  const positions: number[] = [];
  const index: number[] = [];
  for (let i = 0; i <= n; i++) {
    for (let j = 0; j <= n; j++) {
      const east = -half + (2 * half * i) / n;
      const north = -half + (2 * half * j) / n;
      const p = worldToScene({
        x: east,
        y: north,
        z: seabedHeight(east, north, bed.depth, bed.slope, bed.slopeAzimuth),
      });
      positions.push(p.x, p.y, p.z);
    }
  }
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const a = i * (n + 1) + j;
      const b = (i + 1) * (n + 1) + j;
      index.push(a, a + 1, b, b, a + 1, b + 1);
    }
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute("position", new BufferAttribute(new Float32Array(positions), 3));
  geometry.setIndex(index);
  geometry.computeVertexNormals();
  return geometry;
}

/**
 * Grid lines on the seabed every `step` m out to `half` m, lifted `lift` m above the bed so they are
 * not hidden by it. Returns pairs of points for LineSegments.
 */
export function seabedGridPositions(half: number, step: number, bed: BedSpec, lift: number): Float32Array {
  const out: number[] = [];
  const push = (e: number, n: number) => {
    const p = worldToScene({ x: e, y: n, z: seabedHeight(e, n, bed.depth, bed.slope, bed.slopeAzimuth) + lift });
    out.push(p.x, p.y, p.z);
  };
  const count = Math.floor(half / step);
  for (let k = -count; k <= count; k++) {
    const c = k * step;
    // Segments, not one long line, so each follows the (planar) bed exactly at both ends.
    push(c, -half);
    push(c, half);
    push(-half, c);
    push(half, c);
  }
  return new Float32Array(out);
}

/**
 * Plan outline at distance `radius` from a straight diffuser of `length` m along `azimuthDeg` centred on
 * the origin (a circle for a single port, a stadium for a line). Closed: the last point repeats the first.
 */
export function offsetOutline(
  radius: number,
  length: number,
  azimuthDeg: number,
  pointsPerHalf = 48,
): { east: number; north: number }[] {
  const axis = azimuthToEastNorth(azimuthDeg);
  const half = Math.max(0, length) / 2;
  const out: { east: number; north: number }[] = [];
  const baseAngle = Math.atan2(axis.north, axis.east);
  for (const [end, sign] of [
    [half, 1],
    [-half, -1],
  ] as const) {
    const cx = axis.east * end;
    const cy = axis.north * end;
    for (let i = 0; i <= pointsPerHalf; i++) {
      // Half circle around each end, turning from one side of the axis to the other.
      const a = baseAngle - Math.PI / 2 + (sign > 0 ? 0 : Math.PI) + (Math.PI * i) / pointsPerHalf;
      out.push({ east: cx + radius * Math.cos(a), north: cy + radius * Math.sin(a) });
    }
  }
  out.push({ ...out[0] });
  return out;
}

export interface AnnulusInput {
  /** Plan distances from the diffuser, m, ascending. */
  readonly distances: readonly number[];
  /** Height of the sheet above the seabed at each distance, m. */
  readonly heights: readonly number[];
  readonly colours: readonly Rgb[];
  readonly bed: BedSpec;
  /** Length (m) and azimuth (degrees) of the diffuser the distances are measured from (0 = a point). */
  readonly diffuserLength?: number;
  readonly diffuserAzimuth?: number;
  readonly pointsPerHalf?: number;
}

/**
 * A sheet over the seabed between the first and last distance (the top of the spreading layer). Each ring
 * is the outline at that distance from the diffuser: a circle for a point source, a stadium for a line.
 */
export function annulusGeometry(input: AnnulusInput): BufferGeometry {
  const half = Math.max(4, Math.floor(input.pointsPerHalf ?? 36));
  const geometry = new BufferGeometry();
  const n = input.distances.length;
  if (n < 2) return geometry;
  const rings = input.distances.map((d) =>
    offsetOutline(d, input.diffuserLength ?? 0, input.diffuserAzimuth ?? 0, half),
  );
  const segments = rings[0].length - 1;
  const positions = new Float32Array(n * (segments + 1) * 3);
  const colours = new Float32Array(n * (segments + 1) * 3);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= segments; j++) {
      const { east, north } = rings[i][j];
      const z = seabedHeight(east, north, input.bed.depth, input.bed.slope, input.bed.slopeAzimuth) + input.heights[i];
      const p = worldToScene({ x: east, y: north, z });
      const k = (i * (segments + 1) + j) * 3;
      positions.set([p.x, p.y, p.z], k);
      colours.set(input.colours[i], k);
    }
  }
  const index: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    for (let j = 0; j < segments; j++) {
      const a = i * (segments + 1) + j;
      const b = (i + 1) * (segments + 1) + j;
      index.push(a, b, a + 1, b, b + 1, a + 1);
    }
  }
  geometry.setAttribute("position", new BufferAttribute(positions, 3));
  geometry.setAttribute("color", new BufferAttribute(colours, 3));
  geometry.setIndex(index);
  geometry.computeVertexNormals();
  return geometry;
}

export interface PortPlacement {
  /** Port position, m east and north of the diffuser centre. */
  readonly east: number;
  readonly north: number;
  /** Port azimuth, degrees clockwise from north. */
  readonly azimuth: number;
}

/** A path point moved to another port: turned about the vertical by `turnDeg` (clockwise) and shifted. */
export function placePathPoint(p: WorldPoint, port: PortPlacement, turnDeg: number): WorldPoint {
  const t = (turnDeg * Math.PI) / 180;
  // Clockwise turn in plan (azimuths grow clockwise from north).
  const east = p.x * Math.cos(t) + p.y * Math.sin(t);
  const north = -p.x * Math.sin(t) + p.y * Math.cos(t);
  return { x: east + port.east, y: north + port.north, z: p.z };
}
