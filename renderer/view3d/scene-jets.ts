/**
 * The computed parts of the 3D scene: each port's jet as a dilution-coloured tube, the impact spots, the
 * spreading layer out to the mixing-zone edge, a rising plume's field, and the points the camera frames.
 */
import { CircleGeometry, Color, DoubleSide, Mesh, MeshBasicMaterial, MeshLambertMaterial, Vector3 } from "three";
import type { BrinefieldResult } from "../../core/result/contract";
import type { PathPoint } from "../../core/nearfield/types";
import type { Rgb } from "./colour-scale";
import { annulusGeometry, placePathPoint, tubeGeometry, worldToScene } from "./plume-geometry";
import { bedZ, type SceneFrame, type SceneKit } from "./scene-ground";

type ColourOf = (dilution: number) => Rgb;
type Series = BrinefieldResult["mixingZone"]["series"];

/** A see-through sheet of vertex colours (the spreading layer, a rising plume's field). */
function sheetMaterial(): MeshLambertMaterial {
  return new MeshLambertMaterial({
    vertexColors: true,
    transparent: true,
    opacity: 0.32,
    side: DoubleSide,
    depthWrite: false,
  });
}

/** Jets: the computed centreline at every port, turned to each port's azimuth. */
export function addJets(
  kit: SceneKit,
  frame: SceneFrame,
  path: readonly PathPoint[],
  colourOf: ColourOf,
  computedAzimuth: number,
): void {
  const { group, track, notes } = kit;
  const { bed, ports, diffuser } = frame;
  const tubeMaterial = track(new MeshLambertMaterial({ vertexColors: true, side: DoubleSide }));
  let turned = false;
  if (path.length >= 2) {
    const colours = path.map((p) => colourOf(p.dilution));
    const radii = path.map((p) => p.halfWidth);
    const segments = ports.length > 24 ? 8 : 16;
    for (const port of ports) {
      const turn = port.azimuth - computedAzimuth;
      if (Math.abs(((turn + 540) % 360) - 180) > 0.5) turned = true;
      const foot = bedZ(bed, port.east, port.north);
      const centreline = path.map((p) => {
        const w = placePathPoint(p, port, turn);
        return worldToScene({ x: w.x, y: w.y, z: w.z + foot + diffuser.portHeight });
      });
      const tube = new Mesh(
        track(tubeGeometry({ centreline, radii, colours, radialSegments: segments })),
        tubeMaterial,
      );
      tube.name = "jet";
      group.add(tube);
    }
  } else {
    notes.push("No centreline from the integral method; jets are not drawn.");
  }
  if (turned)
    notes.push("Ports at other azimuths show the computed jet turned to their azimuth (exact only in still water).");
}

/** Impact spots on the seabed, one per port. */
export function addImpactSpots(
  kit: SceneKit,
  frame: SceneFrame,
  impact: PathPoint,
  colourOf: ColourOf,
  computedAzimuth: number,
): void {
  const { group, track } = kit;
  const { bed, ports, lift, portRadius } = frame;
  const spotMaterial = track(
    new MeshBasicMaterial({
      color: new Color(...colourOf(impact.dilution)),
      transparent: true,
      opacity: 0.85,
      side: DoubleSide,
      depthWrite: false,
    }),
  );
  const spotGeometry = track(new CircleGeometry(Math.max(impact.halfWidth, portRadius * 2), 40));
  for (const port of ports) {
    const w = placePathPoint(impact, port, port.azimuth - computedAzimuth);
    const spot = new Mesh(spotGeometry, spotMaterial);
    spot.rotation.x = -Math.PI / 2;
    spot.position.copy(worldToScene({ x: w.x, y: w.y, z: bedZ(bed, w.x, w.y) + lift * 3 }));
    spot.name = "impact";
    group.add(spot);
  }
}

/**
 * Spreading layer: the top of the dense layer, coloured by dilution, out to the mixing-zone edge.
 * Returns whether it was drawn.
 */
export function addSpreadingLayer(
  kit: SceneKit,
  frame: SceneFrame,
  series: Series,
  mixingZoneRadius: number,
  colourOf: ColourOf,
): boolean {
  const layer = series.distance
    .map((d, i) => ({ d, h: series.layerThickness[i], s: series.dilution[i] }))
    .filter(
      (p): p is { d: number; h: number; s: number } =>
        p.h !== null && Number.isFinite(p.h) && p.d <= mixingZoneRadius * 1.0001 && p.d > 0,
    );
  if (layer.length < 2) return false;
  const sheet = new Mesh(
    kit.track(
      annulusGeometry({
        distances: layer.map((p) => p.d),
        heights: layer.map((p) => Math.max(p.h, frame.lift * 4)),
        colours: layer.map((p) => colourOf(p.s)),
        bed: frame.bed,
        diffuserLength: frame.lineLength,
        diffuserAzimuth: frame.diffuser.diffuserAzimuth,
      }),
    ),
    kit.track(sheetMaterial()),
  );
  sheet.name = "spreading-layer";
  kit.group.add(sheet);
  return true;
}

/**
 * A rising plume's field: a sheet at the surface or at the trap level, coloured by dilution, from where the
 * field starts out to the mixing-zone edge (the method carried to the edge; the integral one otherwise).
 */
export function addRisingField(
  kit: SceneKit,
  frame: SceneFrame,
  result: BrinefieldResult,
  mixingZoneRadius: number,
  colourOf: ColourOf,
): void {
  const series = result.mixingZone.series;
  const risingMethod =
    result.nearField.find((m) => m.method === result.mixingZone.nearFieldMethod && m.risingField) ??
    result.nearField.find((m) => m.method === "integral" && m.risingField);
  const rf = risingMethod?.risingField;
  if (!rf || rf.kind === "none") return;
  const level = Math.max(0, frame.bed.depth - frame.diffuser.portHeight - rf.height) + frame.lift * 2;
  const pts = series.distance
    .map((d, i) => ({ d, s: series.dilution[i]! }))
    .filter((p) => p.d >= rf.distance - 1e-9 && p.d <= mixingZoneRadius * 1.0001 && p.d > 0);
  if (pts.length < 2) return;
  const sheet = new Mesh(
    kit.track(
      annulusGeometry({
        distances: pts.map((p) => p.d),
        heights: pts.map(() => 0),
        colours: pts.map((p) => colourOf(p.s)),
        bed: { depth: level, slope: 0, slopeAzimuth: 0 },
        diffuserLength: frame.lineLength,
        diffuserAzimuth: frame.diffuser.diffuserAzimuth,
      }),
    ),
    kit.track(sheetMaterial()),
  );
  sheet.name = rf.kind === "trapped" ? "trapped-field" : "surface-field";
  kit.group.add(sheet);
  kit.notes.push(
    rf.kind === "trapped"
      ? "The rising plume is trapped below the surface; the sheet shows its field at the trap level."
      : "The rising plume reaches the surface; the sheet shows its surface field.",
  );
}

/** Camera focus (the jets and their impact spots), and the middle and size of each single jet. */
export function cameraTargets(
  frame: SceneFrame,
  path: readonly PathPoint[],
  computedAzimuth: number,
  reach: number,
): {
  focus: { centre: Vector3; radius: number };
  jets: { centres: Vector3[]; radius: number };
} {
  const { ports } = frame;
  const depth = frame.bed.depth;
  const portZ = -depth + frame.diffuser.portHeight;
  const focusPoints: Vector3[] = [];
  for (const port of ports) {
    focusPoints.push(worldToScene({ x: port.east, y: port.north, z: portZ }));
    for (const p of [path[0], path[Math.floor(path.length / 2)], path[path.length - 1]]) {
      if (!p) continue;
      const w = placePathPoint(p, port, port.azimuth - computedAzimuth);
      focusPoints.push(worldToScene({ x: w.x, y: w.y, z: w.z + portZ }));
    }
  }
  const centre = focusPoints
    .reduce((acc, p) => acc.add(p), new Vector3())
    .multiplyScalar(1 / Math.max(1, focusPoints.length));
  const radius = Math.max(depth * 0.6, ...focusPoints.map((p) => p.distanceTo(centre)), 2);
  const jetCentres = ports.map((port) => {
    const mid = path[Math.floor(path.length / 2)];
    const last = path[path.length - 1];
    if (!mid || !last) return worldToScene({ x: port.east, y: port.north, z: portZ });
    const w = placePathPoint({ x: last.x / 2, y: last.y / 2, z: mid.z / 2 }, port, port.azimuth - computedAzimuth);
    return worldToScene({ x: w.x, y: w.y, z: w.z + portZ });
  });
  const rise = path.reduce((m, p) => Math.max(m, p.z + p.halfWidth), 0);
  const jetRadius = Math.max(reach * 0.6, rise * 0.8, depth * 0.5, 1);
  return { focus: { centre, radius }, jets: { centres: jetCentres, radius: jetRadius } };
}
