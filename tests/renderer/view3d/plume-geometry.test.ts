/**
 * plumeGeometry: centreline + half-width + colours in, three.js buffers out. Pure geometry, checked
 * against its own definitions (a tube of radius r is the set of points at distance r from the
 * centreline) and hand-worked cases.
 */
import { describe, expect, it } from "vitest";
import { Vector3 } from "three";
import {
  annulusGeometry,
  azimuthToEastNorth,
  offsetOutline,
  placePathPoint,
  seabedGeometry,
  seabedHeight,
  tubeGeometry,
  worldToScene,
} from "../../../renderer/view3d/plume-geometry";
import type { Rgb } from "../../../renderer/view3d/colour-scale";

/** A dense jet's arc in the vertical east plane: up and over, like a 60° discharge. */
function arc(n: number): Vector3[] {
  return Array.from({ length: n }, (_, i) => {
    const t = (i / (n - 1)) * Math.PI;
    return new Vector3(5 - 5 * Math.cos(t), 4 * Math.sin(t), 0);
  });
}

describe("worldToScene()", () => {
  it("maps east → +x, up → +y, north → −z (three.js is y-up, right-handed)", () => {
    const p = worldToScene({ x: 1, y: 2, z: 3 });
    expect([p.x, p.y, p.z], "east 1, north 2, up 3").toEqual([1, 3, -2]);
  });
  it("keeps a right-handed frame: east × north = up", () => {
    const e = worldToScene({ x: 1, y: 0, z: 0 });
    const n = worldToScene({ x: 0, y: 1, z: 0 });
    const up = new Vector3().crossVectors(e, n);
    expect(up.distanceTo(worldToScene({ x: 0, y: 0, z: 1 })), "cross product of east and north").toBeLessThan(1e-12);
  });
});

describe("azimuthToEastNorth()", () => {
  it("reads azimuths clockwise from north", () => {
    const east = azimuthToEastNorth(90);
    expect(east.east, "90° points east").toBeCloseTo(1, 12);
    expect(east.north, "90° has no north component").toBeCloseTo(0, 12);
    expect(azimuthToEastNorth(180).north, "180° points south").toBeCloseTo(-1, 12);
  });
});

describe("tubeGeometry()", () => {
  const centreline = arc(40);
  const radii = centreline.map((_, i) => 0.1 + 0.02 * i);
  const colours: Rgb[] = centreline.map((_, i) => [i / 39, 0.5, 1 - i / 39]);
  const segments = 12;
  const geometry = tubeGeometry({ centreline, radii, colours, radialSegments: segments });
  const pos = geometry.getAttribute("position");
  const nor = geometry.getAttribute("normal");
  const col = geometry.getAttribute("color");
  const ring = segments + 1;

  it("has one ring of radialSegments + 1 vertices per centreline point", () => {
    expect(pos.count, "vertex count").toBe(centreline.length * ring);
    expect(geometry.getIndex()?.count, "two triangles per quad").toBe((centreline.length - 1) * segments * 6);
  });

  it("puts every vertex at the half-width from its centreline point, in the plane normal to the path", () => {
    for (let i = 0; i < centreline.length; i++) {
      const tangent = new Vector3()
        .subVectors(centreline[Math.min(i + 1, centreline.length - 1)], centreline[Math.max(i - 1, 0)])
        .normalize();
      for (let j = 0; j < ring; j++) {
        const v = new Vector3().fromBufferAttribute(pos, i * ring + j);
        const offset = v.clone().sub(centreline[i]);
        expect(offset.length(), `radius at point ${i}, vertex ${j}`).toBeCloseTo(radii[i], 5);
        expect(Math.abs(offset.dot(tangent)) / radii[i], `vertex ${j} of ring ${i} lies across the path`).toBeLessThan(
          1e-5,
        );
      }
    }
  });

  it("gives unit normals pointing away from the centreline", () => {
    for (let k = 0; k < pos.count; k += 7) {
      const n = new Vector3().fromBufferAttribute(nor, k);
      const i = Math.floor(k / ring);
      const outward = new Vector3().fromBufferAttribute(pos, k).sub(centreline[i]).normalize();
      expect(n.length(), `normal ${k} is unit length`).toBeCloseTo(1, 5);
      expect(n.dot(outward), `normal ${k} points outward`).toBeCloseTo(1, 5);
    }
  });

  it("does not twist: consecutive rings start within a small angle of each other", () => {
    for (let i = 1; i < centreline.length; i++) {
      const a = new Vector3().fromBufferAttribute(nor, (i - 1) * ring);
      const b = new Vector3().fromBufferAttribute(nor, i * ring);
      // The path turns 180° over 39 steps (≈ 4.6° a step); a twisting frame would jump far more.
      expect(a.angleTo(b), `frame turn between rings ${i - 1} and ${i}`).toBeLessThan((10 * Math.PI) / 180);
    }
  });

  it("copies each point's colour to its whole ring", () => {
    for (const i of [0, 17, 39]) {
      for (const j of [0, 5, segments]) {
        const k = i * ring + j;
        expect([col.getX(k), col.getY(k), col.getZ(k)], `colour of ring ${i}`).toEqual([
          Math.fround(colours[i][0]),
          Math.fround(colours[i][1]),
          Math.fround(colours[i][2]),
        ]);
      }
    }
  });

  it("handles a vertical jet (tangent parallel to the up axis)", () => {
    const up = [new Vector3(0, 0, 0), new Vector3(0, 1, 0), new Vector3(0, 2, 0)];
    const g = tubeGeometry({
      centreline: up,
      radii: [0.5, 0.5, 0.5],
      colours: [
        [1, 1, 1],
        [1, 1, 1],
        [1, 1, 1],
      ],
      radialSegments: 8,
    });
    const p = g.getAttribute("position");
    for (let k = 0; k < p.count; k++) {
      const v = new Vector3().fromBufferAttribute(p, k);
      expect(Math.hypot(v.x, v.z), `vertex ${k} is 0.5 from the vertical axis`).toBeCloseTo(0.5, 5);
      expect(Number.isFinite(v.x + v.y + v.z), `vertex ${k} is finite`).toBe(true);
    }
  });

  it("merges repeated points and returns empty geometry for fewer than two distinct points", () => {
    const p = new Vector3(1, 2, 3);
    const single = tubeGeometry({
      centreline: [p, p.clone(), p.clone()],
      radii: [1, 1, 1],
      colours: [
        [0, 0, 0],
        [0, 0, 0],
        [0, 0, 0],
      ],
    });
    expect(single.getAttribute("position"), "no buffers for a point").toBeUndefined();
    const repeated = tubeGeometry({
      centreline: [new Vector3(0, 0, 0), new Vector3(0, 0, 0), new Vector3(1, 0, 0)],
      radii: [1, 1, 1],
      colours: [
        [0, 0, 0],
        [0, 0, 0],
        [0, 0, 0],
      ],
      radialSegments: 4,
    });
    expect(repeated.getAttribute("position").count, "the duplicate start point is dropped").toBe(2 * 5);
  });
});

describe("seabedHeight()", () => {
  it("is −depth under the diffuser and deepens in the down-slope direction at the slope's rate", () => {
    expect(seabedHeight(0, 0, 12, 0.05, 270), "under the diffuser").toBe(-12);
    expect(seabedHeight(-100, 0, 12, 0.05, 270), "100 m toward 270° (west) is 5 m deeper").toBeCloseTo(-17, 10);
    expect(seabedHeight(100, 0, 12, 0.05, 270), "100 m up-slope is 5 m shallower").toBeCloseTo(-7, 10);
    expect(seabedHeight(0, 100, 12, 0.05, 270), "along the contour the depth does not change").toBeCloseTo(-12, 10);
  });
  it("builds the seabed mesh on that plane", () => {
    const g = seabedGeometry(50, { depth: 10, slope: 0.1, slopeAzimuth: 0 }, 4);
    const p = g.getAttribute("position");
    for (let k = 0; k < p.count; k++) {
      const east = p.getX(k);
      const north = -p.getZ(k);
      expect(p.getY(k), `vertex ${k} lies on the bed plane`).toBeCloseTo(seabedHeight(east, north, 10, 0.1, 0), 4);
    }
  });
});

describe("offsetOutline()", () => {
  const distanceToSegment = (e: number, n: number, half: number, az: number) => {
    const a = azimuthToEastNorth(az);
    const t = Math.max(-half, Math.min(half, e * a.east + n * a.north));
    return Math.hypot(e - t * a.east, n - t * a.north);
  };
  it("is a circle of the radius around a single port", () => {
    for (const p of offsetOutline(30, 0, 0, 24)) {
      expect(Math.hypot(p.east, p.north), "distance from the port").toBeCloseTo(30, 9);
    }
  });
  it("is a stadium at the radius from every point of a line diffuser, and closed", () => {
    const outline = offsetOutline(25, 120, 20, 32);
    for (const p of outline) {
      expect(distanceToSegment(p.east, p.north, 60, 20), "distance from the diffuser line").toBeCloseTo(25, 9);
    }
    expect(outline[outline.length - 1], "last point repeats the first").toEqual(outline[0]);
  });
});

describe("annulusGeometry()", () => {
  it("lifts the sheet by the given height above the sloping bed", () => {
    const bed = { depth: 10, slope: 0.02, slopeAzimuth: 90 };
    const g = annulusGeometry({
      distances: [5, 10, 20],
      heights: [3, 2, 1],
      colours: [
        [0, 0, 0],
        [0, 0, 0],
        [0, 0, 0],
      ],
      bed,
      pointsPerHalf: 8,
    });
    const p = g.getAttribute("position");
    const perRing = p.count / 3;
    for (let k = 0; k < p.count; k++) {
      const ringIndex = Math.floor(k / perRing);
      const east = p.getX(k);
      const north = -p.getZ(k);
      expect(Math.hypot(east, north), `vertex ${k} at its ring's distance`).toBeCloseTo([5, 10, 20][ringIndex], 4);
      expect(p.getY(k) - seabedHeight(east, north, 10, 0.02, 90), `vertex ${k} height above bed`).toBeCloseTo(
        [3, 2, 1][ringIndex],
        4,
      );
    }
  });
});

describe("placePathPoint()", () => {
  it("turns a path point clockwise in plan and moves it to the port", () => {
    const p = placePathPoint({ x: 0, y: 10, z: 2 }, { east: 5, north: -5, azimuth: 90 }, 90);
    expect(p.x, "a point 10 m north, turned 90° clockwise, is 10 m east (plus the port's 5 m)").toBeCloseTo(15, 12);
    expect(p.y, "north coordinate is the port's").toBeCloseTo(-5, 12);
    expect(p.z, "height is unchanged").toBe(2);
  });
});
