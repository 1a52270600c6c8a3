/**
 * The fixed parts of the 3D scene: the seabed with its distance grid and labels, the water surface and
 * the column's corner posts, the diffuser pipe, risers and ports, and the mixing-zone edge with the
 * limit-exceedance ring. Each part is added to the scene's group; what it allocates is tracked for disposal.
 */
import {
  BufferAttribute,
  BufferGeometry,
  CanvasTexture,
  CylinderGeometry,
  DoubleSide,
  Group,
  Line,
  LineBasicMaterial,
  LineDashedMaterial,
  LineSegments,
  Mesh,
  MeshBasicMaterial,
  MeshLambertMaterial,
  PlaneGeometry,
  SphereGeometry,
  Sprite,
  SpriteMaterial,
  SRGBColorSpace,
  Vector3,
} from "three";
import type { Scenario } from "../../core/scenario/types";
import { displayToSI, formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import {
  azimuthToEastNorth,
  offsetOutline,
  seabedGeometry,
  seabedGridPositions,
  seabedHeight,
  worldToScene,
  type BedSpec,
  type PortPlacement,
} from "./plume-geometry";

export const COLOURS = {
  seabed: 0xc9bfa8,
  grid: 0x8a7f68,
  water: 0x5a9bd4,
  diffuser: 0x3b3f45,
  mixingZone: 0xd9822b,
  exceedance: 0xc0392b,
};

/** The scene's group, its notes, and the list of what must be disposed with it. */
export interface SceneKit {
  readonly group: Group;
  readonly notes: string[];
  track<T extends { dispose(): void }>(item: T): T;
  trackSprite(sprite: Sprite): void;
  dispose(): void;
}

export function sceneKit(): SceneKit {
  const group = new Group();
  group.name = "plume-scene";
  const disposables: { dispose(): void }[] = [];
  const track = <T extends { dispose(): void }>(item: T): T => {
    disposables.push(item);
    return item;
  };
  return {
    group,
    notes: [],
    track,
    trackSprite: (sprite: Sprite) => {
      track(sprite.material);
      if (sprite.material.map) track(sprite.material.map);
    },
    dispose: () => {
      for (const d of disposables) d.dispose();
    },
  };
}

/** Where the parts sit: the bed, the patch's half-size and the diffuser with its ports (m). */
export interface SceneFrame {
  readonly bed: BedSpec;
  readonly diffuser: Scenario["diffuser"];
  readonly ports: readonly PortPlacement[];
  /** Half-size of the seabed patch. */
  readonly extent: number;
  /** Small lift above the bed that keeps drawings on it from flickering into it. */
  readonly lift: number;
  readonly portRadius: number;
  /** Length of the diffuser line the layer and the edges are offset from (0 for a single port). */
  readonly lineLength: number;
}

/** Height of the bed at a plan point. */
export function bedZ(bed: BedSpec, east: number, north: number): number {
  return seabedHeight(east, north, bed.depth, bed.slope, bed.slopeAzimuth);
}

/** Round step (1, 2, 5 × 10ⁿ) so that `span` holds about `count` steps. */
export function niceStep(span: number, count: number): number {
  const raw = span / Math.max(1, count);
  const base = 10 ** Math.floor(Math.log10(raw));
  for (const f of [1, 2, 5, 10]) if (f * base >= raw) return f * base;
  return 10 * base;
}

/** Label height as a fraction of the distance to the camera: labels keep one screen size at any zoom. */
const LABEL_SCREEN_HEIGHT = 0.026;

function textSprite(text: string, scale = 1, colour = "#1d2733", onTop = true): Sprite {
  const heightWorld = LABEL_SCREEN_HEIGHT * scale;
  const fontPx = 48;
  if (typeof document === "undefined") {
    // No DOM (scene built in a test or a worker): keep the label's place, without text.
    const blank = new Sprite(new SpriteMaterial({ transparent: true, opacity: 0, sizeAttenuation: false }));
    blank.name = `label:${text}`;
    return blank;
  }
  const canvas = document.createElement("canvas");
  const ctx = canvas.getContext("2d");
  const font = `600 ${fontPx}px "Segoe UI", "DejaVu Sans", "Noto Sans", Arial, sans-serif`;
  let width = 256;
  if (ctx) {
    ctx.font = font;
    width = Math.ceil(ctx.measureText(text).width) + 24;
  }
  canvas.width = width;
  canvas.height = fontPx + 20;
  if (ctx) {
    ctx.font = font;
    ctx.fillStyle = "rgba(255,255,255,0.78)";
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.fillStyle = colour;
    ctx.textBaseline = "middle";
    ctx.fillText(text, 12, canvas.height / 2);
  }
  const texture = new CanvasTexture(canvas);
  texture.colorSpace = SRGBColorSpace;
  // Labels of the seabed grid are hidden behind the jets (depth-tested), so none floats over the plume.
  const material = new SpriteMaterial({ map: texture, depthTest: !onTop, transparent: true, sizeAttenuation: false });
  const sprite = new Sprite(material);
  sprite.scale.set((heightWorld * canvas.width) / canvas.height, heightWorld, 1);
  sprite.renderOrder = 10;
  sprite.name = `label:${text}`;
  return sprite;
}

function lineFrom(points: Vector3[], material: LineBasicMaterial | LineDashedMaterial): Line {
  const geometry = new BufferGeometry().setFromPoints(points);
  const line = new Line(geometry, material);
  if (material instanceof LineDashedMaterial) line.computeLineDistances();
  return line;
}

/** Seabed, its distance grid at a round step, and the step's distance labels along one grid line. */
export function addSeabed(kit: SceneKit, frame: SceneFrame, unitSystem: UnitSystem): void {
  const { group, track } = kit;
  const { extent, bed, lift } = frame;
  const seabed = new Mesh(
    track(seabedGeometry(extent, bed, 32)),
    track(new MeshLambertMaterial({ color: COLOURS.seabed, side: DoubleSide })),
  );
  seabed.name = "seabed";
  group.add(seabed);

  const stepDisplay = niceStep(siToDisplay(extent * 2, "length", unitSystem).value, 8);
  const step = displayToSI(stepDisplay, "length", unitSystem);
  const gridGeometry = track(new BufferGeometry());
  gridGeometry.setAttribute("position", new BufferAttribute(seabedGridPositions(extent, step, bed, lift), 3));
  const grid = new LineSegments(
    gridGeometry,
    track(new LineBasicMaterial({ color: COLOURS.grid, transparent: true, opacity: 0.55 })),
  );
  grid.name = "distance-grid";
  group.add(grid);
  const labelHeight = extent * 0.02; // world-space lift of labels above what they mark
  const unitLabel = siToDisplay(1, "length", unitSystem).unit;
  const labelCount = Math.floor((extent * 0.999) / step);
  for (let k = -labelCount; k <= labelCount; k++) {
    if (k === 0) continue;
    const east = k * step;
    const north = -step;
    const label = textSprite(`${formatNumber(Math.abs(k) * stepDisplay)} ${unitLabel}`, 0.85, "#4a4236", false);
    label.position.copy(worldToScene({ x: east, y: north, z: bedZ(bed, east, north) + labelHeight }));
    kit.trackSprite(label);
    group.add(label);
  }
}

/** Water surface and the column's corner posts. */
export function addWaterColumn(kit: SceneKit, frame: SceneFrame): void {
  const { group, track } = kit;
  const { extent, bed } = frame;
  const surface = new Mesh(
    track(new PlaneGeometry(extent * 2, extent * 2)),
    track(
      new MeshBasicMaterial({
        color: COLOURS.water,
        transparent: true,
        opacity: 0.12,
        side: DoubleSide,
        depthWrite: false,
      }),
    ),
  );
  surface.rotation.x = -Math.PI / 2;
  surface.name = "water-surface";
  group.add(surface);
  const postMaterial = track(new LineBasicMaterial({ color: COLOURS.water, transparent: true, opacity: 0.5 }));
  const corners: [number, number][] = [
    [-extent, -extent],
    [extent, -extent],
    [extent, extent],
    [-extent, extent],
  ];
  const rim = corners.map(([e, n]) => worldToScene({ x: e, y: n, z: 0 }));
  group.add(lineFrom([...rim, rim[0]], postMaterial));
  for (const [e, n] of corners) {
    group.add(
      lineFrom([worldToScene({ x: e, y: n, z: 0 }), worldToScene({ x: e, y: n, z: bedZ(bed, e, n) })], postMaterial),
    );
  }
}

/** Diffuser pipe (for more than one port), the risers and the ports. */
export function addDiffuser(kit: SceneKit, frame: SceneFrame): void {
  const { group, track } = kit;
  const { bed, diffuser, ports, portRadius } = frame;
  const metal = track(new MeshLambertMaterial({ color: COLOURS.diffuser }));
  if (diffuser.length > 0 && ports.length > 1) {
    const axis = azimuthToEastNorth(diffuser.diffuserAzimuth);
    const a = { x: -axis.east * diffuser.length * 0.5, y: -axis.north * diffuser.length * 0.5 };
    const b = { x: axis.east * diffuser.length * 0.5, y: axis.north * diffuser.length * 0.5 };
    const pa = worldToScene({ ...a, z: bedZ(bed, a.x, a.y) + portRadius });
    const pb = worldToScene({ ...b, z: bedZ(bed, b.x, b.y) + portRadius });
    const pipe = new Mesh(
      track(new CylinderGeometry(portRadius * 1.6, portRadius * 1.6, pa.distanceTo(pb), 12)),
      metal,
    );
    pipe.position.copy(pa).add(pb).multiplyScalar(0.5);
    pipe.quaternion.setFromUnitVectors(new Vector3(0, 1, 0), new Vector3().subVectors(pb, pa).normalize());
    pipe.name = "diffuser-pipe";
    group.add(pipe);
  }
  const sphere = track(new SphereGeometry(portRadius * 1.4, 14, 10));
  for (const port of ports) {
    const foot = bedZ(bed, port.east, port.north);
    const top = worldToScene({ x: port.east, y: port.north, z: foot + diffuser.portHeight });
    const footPoint = worldToScene({ x: port.east, y: port.north, z: foot });
    if (diffuser.portHeight > 0) {
      const riser = new Mesh(
        track(new CylinderGeometry(portRadius * 0.7, portRadius * 0.7, top.distanceTo(footPoint), 8)),
        metal,
      );
      riser.position.copy(top).add(footPoint).multiplyScalar(0.5);
      group.add(riser);
    }
    const nozzle = new Mesh(sphere, metal);
    nozzle.position.copy(top);
    nozzle.name = "port";
    group.add(nozzle);
  }
}

/** Mixing-zone boundary and the distance where the governing limit is still exceeded. */
export function addZoneEdges(
  kit: SceneKit,
  frame: SceneFrame,
  mixingZoneRadius: number,
  exceedance: number | null,
): void {
  const { group, track } = kit;
  const { bed, lift, extent } = frame;
  const outline = (radius: number) =>
    offsetOutline(radius, frame.lineLength, frame.diffuser.diffuserAzimuth).map((p) =>
      worldToScene({ x: p.east, y: p.north, z: bedZ(bed, p.east, p.north) + lift * 6 }),
    );
  const mzLine = lineFrom(
    outline(mixingZoneRadius),
    track(new LineBasicMaterial({ color: COLOURS.mixingZone, linewidth: 2 })),
  );
  mzLine.name = "mixing-zone-edge";
  group.add(mzLine);
  // The edge's radius and the exceedance distance are named in the legend, not on the drawing, where a
  // label could run off the view or under its controls.
  if (exceedance !== null) {
    const ring = lineFrom(
      outline(exceedance),
      track(new LineDashedMaterial({ color: COLOURS.exceedance, dashSize: extent * 0.02, gapSize: extent * 0.012 })),
    );
    ring.name = "limit-exceedance";
    group.add(ring);
  }
}
