/** Port positions and headings drawn in the 3D view and the plan sketch. */
import { describe, expect, it } from "vitest";
import type { DiffuserInput } from "../../../core/scenario/types";
import { pathStartAzimuth, portPlacements } from "../../../renderer/view3d/ports";

const base: DiffuserInput = {
  layout: "line",
  portCount: 5,
  portDiameter: 0.2,
  portDiameterNominal: 0.2,
  contraction: 1,
  portAngle: 60,
  portHeight: 1,
  portSpacing: 10,
  portAzimuth: 90,
  diffuserAzimuth: 0,
  length: 40,
  flowSplit: [0.2, 0.2, 0.2, 0.2, 0.2],
};

describe("portPlacements()", () => {
  it("spaces a line of ports evenly along the diffuser axis, centred on the diffuser", () => {
    const ports = portPlacements(base);
    expect(
      ports.map((p) => Math.round(p.north * 1e9) / 1e9),
      "north positions for a north-pointing axis",
    ).toEqual([-20, -10, 0, 10, 20]);
    expect(
      ports.every((p) => Math.abs(p.east) < 1e-9),
      "all on the axis",
    ).toBe(true);
    expect(
      ports.every((p) => p.azimuth === 90),
      "all point along the port azimuth",
    ).toBe(true);
  });
  it("puts a single port at the origin", () => {
    expect(portPlacements({ ...base, layout: "single", portCount: 1 }), "one port").toEqual([
      { east: 0, north: 0, azimuth: 90 },
    ]);
  });
  it("places rosette ports on each riser with the riser's azimuths", () => {
    const ports = portPlacements({
      ...base,
      layout: "rosette",
      portCount: 8,
      diffuserAzimuth: 90,
      risers: { count: 2, portsPerRiser: 4, spacing: 30, portAzimuths: [0, 90, 180, 270] },
    });
    expect(ports.length, "2 risers × 4 ports").toBe(8);
    expect(ports[0].east, "first riser 15 m west of centre").toBeCloseTo(-15, 9);
    expect(ports[7].east, "second riser 15 m east").toBeCloseTo(15, 9);
    expect(
      ports.slice(0, 4).map((p) => p.azimuth),
      "azimuths around a riser",
    ).toEqual([0, 90, 180, 270]);
  });
});

describe("pathStartAzimuth()", () => {
  it("reads the heading where the path leaves the port", () => {
    const path = [0, 1, 2, 3].map((s) => ({ s, x: -s * 0.5, y: -s * 0.5 }));
    expect(pathStartAzimuth(path, 0), "south-west is 225°").toBeCloseTo(225, 9);
  });
  it("falls back for a vertical start or an empty path", () => {
    expect(pathStartAzimuth([], 42), "empty").toBe(42);
    expect(
      pathStartAzimuth(
        [
          { s: 0, x: 0, y: 0 },
          { s: 1, x: 0, y: 0 },
        ],
        42,
      ),
      "vertical",
    ).toBe(42);
  });
});
