/**
 * Builds the three.js scene for one result: seabed with a distance grid, water surface, diffuser and
 * ports, each jet as a dilution-coloured tube, impact spots, the spreading layer out to the mixing-zone
 * edge, the mixing-zone boundary, the limit-exceedance extent, current and north arrows. It only places
 * numbers core computed; the geometry itself comes from plumeGeometry.ts.
 */
import {
  BufferAttribute,
  BufferGeometry,
  CanvasTexture,
  CircleGeometry,
  Color,
  CylinderGeometry,
  DoubleSide,
  Group,
  Line,
  LineBasicMaterial,
  LineDashedMaterial,
  LineSegments,
  Mesh,
  MeshLambertMaterial,
  MeshBasicMaterial,
  PlaneGeometry,
  SphereGeometry,
  Sprite,
  SpriteMaterial,
  SRGBColorSpace,
  Vector3,
} from "three";
import type { BrinefieldResult } from "../../core/result/contract";
import type { PathPoint } from "../../core/nearfield/types";
import type { Scenario } from "../../core/scenario/types";
import { displayToSI, formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { dilutionColour, dilutionDomain, type DilutionDomain, type Rgb } from "./colourScale";
import {
  annulusGeometry,
  azimuthToEastNorth,
  offsetOutline,
  placePathPoint,
  seabedGeometry,
  seabedGridPositions,
  seabedHeight,
  tubeGeometry,
  worldToScene,
  type BedSpec,
} from "./plumeGeometry";
import { pathStartAzimuth, portPlacements, representativeAzimuth } from "./ports";

export interface PlumeSceneInput {
  readonly scenario: Scenario;
  readonly result: BrinefieldResult;
  readonly unitSystem: UnitSystem;
}

export interface PlumeSceneOutput {
  readonly group: Group;
  readonly domain: DilutionDomain;
  /** Centre and size of the jets, for framing the camera (scene coordinates, m). */
  readonly focus: { readonly centre: Vector3; readonly radius: number };
  /** Middle of each port's jet and the size of one jet (for close views of a single jet). */
  readonly jets: { readonly centres: readonly Vector3[]; readonly radius: number };
  /** Half-size of the seabed patch, m. */
  readonly extent: number;
  /** Plan heading of the representative jet, degrees clockwise from north. */
  readonly heading: number;
  readonly depth: number;
  /** Plain notes shown under the view (what is approximated in the drawing). */
  readonly notes: readonly string[];
  /** What the scene draws, for a legend that lists only that (distances in m). */
  readonly drawn: {
    readonly spreadingLayer: boolean;
    readonly mixingZoneRadius: number;
    /** Distance out to which the governing limit is exceeded, when that ring is drawn. */
    readonly exceedance: number | null;
  };
  /** Plan directions the view's compass shows: the current (toward, degrees from north) when there is one. */
  readonly current: { readonly toward: number; readonly speed: number } | null;
  dispose(): void;
}

const COLOURS = {
  seabed: 0xc9bfa8,
  grid: 0x8a7f68,
  water: 0x5a9bd4,
  diffuser: 0x3b3f45,
  mixingZone: 0xd9822b,
  exceedance: 0xc0392b,
};

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

function integralPath(result: BrinefieldResult): readonly PathPoint[] {
  const integral = result.nearField.find((m) => m.method === "integral");
  return integral?.path ?? [];
}

/** Where the centreline meets the seabed: the core's impact event, else the lowest point of the path. */
function impactPoint(result: BrinefieldResult, path: readonly PathPoint[]): PathPoint | null {
  const integral = result.nearField.find((m) => m.method === "integral");
  // A rising plume never meets the seabed.
  if (integral?.risingField) return null;
  const event = integral?.events?.find((e) => e.kind === "seabed-contact" || e.kind === "centreline-impact");
  if (event && path.length > 0) {
    let best = path[0];
    for (const p of path) if (Math.abs(p.s - event.s) < Math.abs(best.s - event.s)) best = p;
    return { ...best, x: event.x, y: event.y, z: event.z, dilution: event.dilution };
  }
  if (path.length === 0) return null;
  return path.reduce((low, p) => (p.z < low.z ? p : low), path[0]);
}

export function buildPlumeScene(input: PlumeSceneInput): PlumeSceneOutput {
  const { scenario, result, unitSystem } = input;
  const group = new Group();
  group.name = "plume-scene";
  const disposables: { dispose(): void }[] = [];
  const track = <T extends { dispose(): void }>(item: T): T => {
    disposables.push(item);
    return item;
  };
  const notes: string[] = [];
  const trackSprite = (sprite: Sprite) => {
    track(sprite.material);
    if (sprite.material.map) track(sprite.material.map);
  };

  const depth = scenario.ambient.depth;
  const bed: BedSpec = { depth, slope: scenario.ambient.bedSlope, slopeAzimuth: scenario.ambient.bedSlopeAzimuth };
  const diffuser = scenario.diffuser;
  const ports = portPlacements(diffuser);
  const path = integralPath(result);
  const portZ = -depth + diffuser.portHeight;
  const mzRadius = scenario.mixingZone.radius;
  const series = result.mixingZone.series;

  // Colour domain spans every dilution drawn: jet, impact, layer to the edge.
  const dilutions = [
    ...path.map((p) => p.dilution),
    ...series.dilution.filter((_, i) => series.distance[i] <= mzRadius * 1.05),
    result.mixingZone.dilution,
  ];
  const domain = dilutionDomain(dilutions);
  const colourOf = (d: number): Rgb => dilutionColour(d, domain);

  const reach = path.reduce((m, p) => Math.max(m, Math.hypot(p.x, p.y)), 0);
  const diffuserHalf = diffuser.length / 2;
  // The seabed patch holds everything drawn on it: the mixing zone and any area where the limit is exceeded.
  const exceed = result.mixingZone.footprint.furthestExtent;
  const drawnExceedance = exceed > 0 && Number.isFinite(exceed) ? exceed : null;
  const outerRadius = Math.max(mzRadius, drawnExceedance ?? 0);
  const extent = Math.max(
    outerRadius * 1.12 + (ports.length > 1 ? diffuserHalf : 0),
    reach * 1.6 + diffuserHalf,
    depth * 1.5,
    10,
  );

  // Seabed and grid.
  const seabed = new Mesh(
    track(seabedGeometry(extent, bed, 32)),
    track(new MeshLambertMaterial({ color: COLOURS.seabed, side: DoubleSide })),
  );
  seabed.name = "seabed";
  group.add(seabed);

  const stepDisplay = niceStep(siToDisplay(extent * 2, "length", unitSystem).value, 8);
  const step = displayToSI(stepDisplay, "length", unitSystem);
  const lift = Math.max(0.01, extent * 0.0008);
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
    label.position.copy(
      worldToScene({
        x: east,
        y: north,
        z: seabedHeight(east, north, bed.depth, bed.slope, bed.slopeAzimuth) + labelHeight,
      }),
    );
    trackSprite(label);
    group.add(label);
  }

  // Water surface and the column's corner posts.
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
      lineFrom(
        [
          worldToScene({ x: e, y: n, z: 0 }),
          worldToScene({ x: e, y: n, z: seabedHeight(e, n, bed.depth, bed.slope, bed.slopeAzimuth) }),
        ],
        postMaterial,
      ),
    );
  }

  // Diffuser pipe, risers and ports.
  const metal = track(new MeshLambertMaterial({ color: COLOURS.diffuser }));
  const portRadius = Math.max(diffuser.portDiameterNominal / 2, extent * 0.003);
  if (diffuser.length > 0 && ports.length > 1) {
    const axis = azimuthToEastNorth(diffuser.diffuserAzimuth);
    const a = { x: -axis.east * diffuser.length * 0.5, y: -axis.north * diffuser.length * 0.5 };
    const b = { x: axis.east * diffuser.length * 0.5, y: axis.north * diffuser.length * 0.5 };
    const pa = worldToScene({ ...a, z: seabedHeight(a.x, a.y, bed.depth, bed.slope, bed.slopeAzimuth) + portRadius });
    const pb = worldToScene({ ...b, z: seabedHeight(b.x, b.y, bed.depth, bed.slope, bed.slopeAzimuth) + portRadius });
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
    const bedZ = seabedHeight(port.east, port.north, bed.depth, bed.slope, bed.slopeAzimuth);
    const top = worldToScene({ x: port.east, y: port.north, z: bedZ + diffuser.portHeight });
    const foot = worldToScene({ x: port.east, y: port.north, z: bedZ });
    if (diffuser.portHeight > 0) {
      const riser = new Mesh(
        track(new CylinderGeometry(portRadius * 0.7, portRadius * 0.7, top.distanceTo(foot), 8)),
        metal,
      );
      riser.position.copy(top).add(foot).multiplyScalar(0.5);
      group.add(riser);
    }
    const nozzle = new Mesh(sphere, metal);
    nozzle.position.copy(top);
    nozzle.name = "port";
    group.add(nozzle);
  }

  // Jets: the computed centreline at every port, turned to each port's azimuth.
  const tubeMaterial = track(new MeshLambertMaterial({ vertexColors: true, side: DoubleSide }));
  const computedAzimuth = pathStartAzimuth(path, representativeAzimuth(diffuser));
  let turned = false;
  if (path.length >= 2) {
    const colours = path.map((p) => colourOf(p.dilution));
    const radii = path.map((p) => p.halfWidth);
    const segments = ports.length > 24 ? 8 : 16;
    for (const port of ports) {
      const turn = port.azimuth - computedAzimuth;
      if (Math.abs(((turn + 540) % 360) - 180) > 0.5) turned = true;
      const bedZ = seabedHeight(port.east, port.north, bed.depth, bed.slope, bed.slopeAzimuth);
      const centreline = path.map((p) => {
        const w = placePathPoint(p, port, turn);
        return worldToScene({ x: w.x, y: w.y, z: w.z + bedZ + diffuser.portHeight });
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

  // Impact spots on the seabed.
  const impact = impactPoint(result, path);
  if (impact) {
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
      spot.position.copy(
        worldToScene({ x: w.x, y: w.y, z: seabedHeight(w.x, w.y, bed.depth, bed.slope, bed.slopeAzimuth) + lift * 3 }),
      );
      spot.name = "impact";
      group.add(spot);
    }
  }

  // Spreading layer: the top of the dense layer, coloured by dilution, out to the mixing-zone edge.
  const layer = series.distance
    .map((d, i) => ({ d, h: series.layerThickness[i], s: series.dilution[i] }))
    .filter(
      (p): p is { d: number; h: number; s: number } =>
        p.h !== null && Number.isFinite(p.h) && p.d <= mzRadius * 1.0001 && p.d > 0,
    );
  const layerDrawn = layer.length >= 2;
  if (layerDrawn) {
    const sheet = new Mesh(
      track(
        annulusGeometry({
          distances: layer.map((p) => p.d),
          heights: layer.map((p) => Math.max(p.h, lift * 4)),
          colours: layer.map((p) => colourOf(p.s)),
          bed,
          diffuserLength: ports.length > 1 ? diffuser.length : 0,
          diffuserAzimuth: diffuser.diffuserAzimuth,
        }),
      ),
      track(
        new MeshLambertMaterial({
          vertexColors: true,
          transparent: true,
          opacity: 0.32,
          side: DoubleSide,
          depthWrite: false,
        }),
      ),
    );
    sheet.name = "spreading-layer";
    group.add(sheet);
  }

  // A rising plume's field: a sheet at the surface or at the trap level, coloured by dilution, from where the
  // field starts out to the mixing-zone edge (the method carried to the edge; the integral one otherwise).
  const risingMethod =
    result.nearField.find((m) => m.method === result.mixingZone.nearFieldMethod && m.risingField) ??
    result.nearField.find((m) => m.method === "integral" && m.risingField);
  const rf = risingMethod?.risingField;
  if (rf && rf.kind !== "none") {
    const level = Math.max(0, depth - scenario.diffuser.portHeight - rf.height) + lift * 2;
    const pts = series.distance
      .map((d, i) => ({ d, s: series.dilution[i]! }))
      .filter((p) => p.d >= rf.distance - 1e-9 && p.d <= mzRadius * 1.0001 && p.d > 0);
    if (pts.length >= 2) {
      const sheet = new Mesh(
        track(
          annulusGeometry({
            distances: pts.map((p) => p.d),
            heights: pts.map(() => 0),
            colours: pts.map((p) => colourOf(p.s)),
            bed: { depth: level, slope: 0, slopeAzimuth: 0 },
            diffuserLength: ports.length > 1 ? diffuser.length : 0,
            diffuserAzimuth: diffuser.diffuserAzimuth,
          }),
        ),
        track(
          new MeshLambertMaterial({
            vertexColors: true,
            transparent: true,
            opacity: 0.32,
            side: DoubleSide,
            depthWrite: false,
          }),
        ),
      );
      sheet.name = rf.kind === "trapped" ? "trapped-field" : "surface-field";
      group.add(sheet);
      notes.push(
        rf.kind === "trapped"
          ? "The rising plume is trapped below the surface; the sheet shows its field at the trap level."
          : "The rising plume reaches the surface; the sheet shows its surface field.",
      );
    }
  }

  // Mixing-zone boundary and the distance where the governing limit is still exceeded.
  const outline = (radius: number) =>
    offsetOutline(radius, ports.length > 1 ? diffuser.length : 0, diffuser.diffuserAzimuth).map((p) =>
      worldToScene({
        x: p.east,
        y: p.north,
        z: seabedHeight(p.east, p.north, bed.depth, bed.slope, bed.slopeAzimuth) + lift * 6,
      }),
    );
  const mzLine = lineFrom(outline(mzRadius), track(new LineBasicMaterial({ color: COLOURS.mixingZone, linewidth: 2 })));
  mzLine.name = "mixing-zone-edge";
  group.add(mzLine);
  // The edge's radius and the exceedance distance are named in the legend, not on the drawing, where a
  // label could run off the view or under its controls.
  if (drawnExceedance !== null) {
    const ring = lineFrom(
      outline(drawnExceedance),
      track(new LineDashedMaterial({ color: COLOURS.exceedance, dashSize: extent * 0.02, gapSize: extent * 0.012 })),
    );
    ring.name = "limit-exceedance";
    group.add(ring);
  }

  // North and the current are shown by the view's compass (an overlay that turns with the camera and is
  // never cut off by the edge of the view); the scene draws neither.
  const speed = scenario.ambient.currentSpeed;
  if (!(speed > 0)) notes.push("Still water (no current).");

  // Camera focus: the jets and their impact spots.
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

  return {
    group,
    domain,
    focus: { centre, radius },
    jets: { centres: jetCentres, radius: jetRadius },
    extent,
    heading: computedAzimuth,
    depth,
    notes,
    drawn: { spreadingLayer: layerDrawn, mixingZoneRadius: mzRadius, exceedance: drawnExceedance },
    current: speed > 0 ? { toward: scenario.ambient.currentDirection, speed } : null,
    dispose: () => {
      for (const d of disposables) d.dispose();
    },
  };
}
