/**
 * Builds the three.js scene for one result: seabed with a distance grid, water surface, diffuser and
 * ports, each jet as a dilution-coloured tube, impact spots, the spreading layer out to the mixing-zone
 * edge, the mixing-zone boundary, the limit-exceedance extent, current and north arrows. It only places
 * numbers core computed; the geometry itself comes from plume-geometry.ts, and the parts are drawn by
 * scene-ground.ts (seabed, water, diffuser, edges) and scene-jets.ts (jets, spots, layers, camera targets).
 */
import type { Group, Vector3 } from "three";
import type { BrinefieldResult } from "../../core/result/contract";
import type { PathPoint } from "../../core/nearfield/types";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";
import { dilutionColour, dilutionDomain, type DilutionDomain, type Rgb } from "./colour-scale";
import type { BedSpec } from "./plume-geometry";
import { pathStartAzimuth, portPlacements, representativeAzimuth } from "./ports";
import { addDiffuser, addSeabed, addWaterColumn, addZoneEdges, sceneKit, type SceneFrame } from "./scene-ground";
import { addImpactSpots, addJets, addRisingField, addSpreadingLayer, cameraTargets } from "./scene-jets";

export { niceStep } from "./scene-ground";

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
  const kit = sceneKit();

  const depth = scenario.ambient.depth;
  const bed: BedSpec = { depth, slope: scenario.ambient.bedSlope, slopeAzimuth: scenario.ambient.bedSlopeAzimuth };
  const diffuser = scenario.diffuser;
  const ports = portPlacements(diffuser);
  const path = integralPath(result);
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
  const frame: SceneFrame = {
    bed,
    diffuser,
    ports,
    extent,
    lift: Math.max(0.01, extent * 0.0008),
    portRadius: Math.max(diffuser.portDiameterNominal / 2, extent * 0.003),
    lineLength: ports.length > 1 ? diffuser.length : 0,
  };

  addSeabed(kit, frame, unitSystem);
  addWaterColumn(kit, frame);
  addDiffuser(kit, frame);
  const computedAzimuth = pathStartAzimuth(path, representativeAzimuth(diffuser));
  addJets(kit, frame, path, colourOf, computedAzimuth);
  const impact = impactPoint(result, path);
  if (impact) addImpactSpots(kit, frame, impact, colourOf, computedAzimuth);
  const layerDrawn = addSpreadingLayer(kit, frame, series, mzRadius, colourOf);
  addRisingField(kit, frame, result, mzRadius, colourOf);
  addZoneEdges(kit, frame, mzRadius, drawnExceedance);

  // North and the current are shown by the view's compass (an overlay that turns with the camera and is
  // never cut off by the edge of the view); the scene draws neither.
  const speed = scenario.ambient.currentSpeed;
  if (!(speed > 0)) kit.notes.push("Still water (no current).");

  const { focus, jets } = cameraTargets(frame, path, computedAzimuth, reach);
  return {
    group: kit.group,
    domain,
    focus,
    jets,
    extent,
    heading: computedAzimuth,
    depth,
    notes: kit.notes,
    drawn: { spreadingLayer: layerDrawn, mixingZoneRadius: mzRadius, exceedance: drawnExceedance },
    current: speed > 0 ? { toward: scenario.ambient.currentDirection, speed } : null,
    dispose: kit.dispose,
  };
}
