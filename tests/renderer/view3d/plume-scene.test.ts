/**
 * The 3D scene places what core computed: one jet per port, the mixing-zone edge at its radius from the
 * diffuser, the seabed at the water depth, and a colour scale spanning the dilutions drawn. Built from
 * real core results for the bundled demo scenarios (no DOM: labels are placeholders here).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { Box3, Line, Mesh, Vector3 } from "three";
import { runFile } from "../../../renderer/engine/run-file";
import { buildPlumeScene, niceStep } from "../../../renderer/view3d/plume-scene";
import { azimuthToEastNorth } from "../../../renderer/view3d/plume-geometry";

function demo(name: string) {
  const response = runFile(1, JSON.parse(readFileSync(join(__dirname, "../../../demo-scenarios", name), "utf8")));
  if (!response.ok) throw new Error(response.message);
  return response;
}

describe("buildPlumeScene()", () => {
  for (const name of ["island-cove.json", "sandy-shelf.json", "sheltered-bay.json"]) {
    describe(name, () => {
      const { scenario, result } = demo(name);
      const built = buildPlumeScene({ scenario, result, unitSystem: "si" });
      const named = (n: string) => built.group.children.filter((c) => c.name === n);

      it("draws one jet tube per port", () => {
        expect(named("jet").length, "jet meshes").toBe(scenario.diffuser.portCount);
        expect(named("port").length, "port markers").toBe(scenario.diffuser.portCount);
      });

      it("puts the seabed at the water depth under the diffuser", () => {
        const seabed = named("seabed")[0] as Mesh;
        const box = new Box3().setFromObject(seabed);
        const slopeDrop = scenario.ambient.bedSlope * built.extent * Math.SQRT2;
        expect(box.min.y, "deepest bed point").toBeGreaterThanOrEqual(-scenario.ambient.depth - slopeDrop - 1e-6);
        expect(box.max.y, "shallowest bed point").toBeLessThanOrEqual(-scenario.ambient.depth + slopeDrop + 1e-6);
      });

      it("starts every jet at port height above the bed and keeps it under the water surface", () => {
        for (const jet of named("jet") as Mesh[]) {
          const box = new Box3().setFromObject(jet);
          expect(box.max.y, "jet stays below the surface").toBeLessThan(0);
        }
      });

      it("draws the mixing-zone edge at its radius from the diffuser line", () => {
        const edge = named("mixing-zone-edge")[0] as Line;
        const pos = edge.geometry.getAttribute("position");
        const axis = azimuthToEastNorth(scenario.diffuser.diffuserAzimuth);
        const half = scenario.diffuser.portCount > 1 ? scenario.diffuser.length / 2 : 0;
        for (let k = 0; k < pos.count; k += 5) {
          const east = pos.getX(k);
          const north = -pos.getZ(k);
          const t = Math.max(-half, Math.min(half, east * axis.east + north * axis.north));
          const d = Math.hypot(east - t * axis.east, north - t * axis.north);
          // Buffers are 32-bit floats: agreement to a part in a million.
          expect(Math.abs(d - scenario.mixingZone.radius) / scenario.mixingZone.radius, `edge point ${k}`).toBeLessThan(
            1e-6,
          );
        }
      });

      it("spans the colour scale over the jet's dilutions", () => {
        const path = result.nearField.find((m) => m.method === "integral")?.path ?? [];
        const max = Math.max(...path.map((p) => p.dilution));
        expect(built.domain.low, "scale starts at or below the port dilution").toBeLessThanOrEqual(
          Math.max(1, path[0].dilution),
        );
        expect(built.domain.high, "scale reaches the largest jet dilution").toBeGreaterThanOrEqual(max);
      });

      it("frames the camera on finite, sensible coordinates", () => {
        const c = built.focus.centre;
        expect([c.x, c.y, c.z].every(Number.isFinite), "finite focus").toBe(true);
        expect(built.focus.radius, "positive focus radius").toBeGreaterThan(0);
        expect(
          built.jets.centres.every((p: Vector3) => p.y < 0),
          "jet centres under water",
        ).toBe(true);
      });

      it("releases its GPU resources without error", () => {
        expect(() => built.dispose(), "dispose").not.toThrow();
      });
    });
  }
});

describe("niceStep()", () => {
  it("picks 1, 2 or 5 × 10ⁿ giving about the requested number of steps", () => {
    expect(niceStep(300, 8), "300 m in ~8 steps").toBe(50);
    expect(niceStep(23, 8), "23 m in ~8 steps").toBe(5);
    expect(niceStep(1, 10), "1 m in ~10 steps").toBe(0.1);
  });
});

describe("buildPlumeScene() for a rising plume", () => {
  it("draws the rising jets and a field sheet at the surface, no seabed impact or dense layer", () => {
    const { scenario, result } = demo("power-station-blend.json");
    const built = buildPlumeScene({ scenario, result, unitSystem: "si" });
    const named = (n: string) => built.group.children.filter((c) => c.name === n);
    expect(named("jet").length, "jet meshes").toBe(scenario.diffuser.portCount);
    expect(named("impact").length, "no seabed impact").toBe(0);
    expect(named("spreading-layer").length, "no dense layer").toBe(0);
    const field = named("surface-field");
    expect(field.length, "a surface field sheet").toBe(1);
    const box = new Box3().setFromObject(field[0]!);
    // The sheet lies at the water surface (scene height 0; the seabed is at minus the depth).
    expect(Math.abs(box.max.y) < 0.05 * scenario.ambient.depth, `sheet at ${box.max.y}`).toBe(true);
    expect(Math.abs(box.min.y) < 0.05 * scenario.ambient.depth, `sheet at ${box.min.y}`).toBe(true);
  });
});
