/**
 * The properties stage: densities of the discharge and the ambient column, and the reduced gravity at
 * the port, all from one equation of state chosen by {@link equationOfStateFor}.
 *
 * Depths are metres below the surface (positive down); pressure is sea pressure from
 * {@link pressureFromDepth} at the default latitude (45°, the scenario carries no latitude). The ambient
 * profile is interpolated linearly in depth and held constant beyond its first and last points.
 * The stage computes only; a discharge lighter than the ambient is reported downstream, not rejected here.
 */
import type { AmbientColumn } from "../nearfield/types";
import type { DensitiesResult } from "../result/contract";
import type { ProfilePoint, Scenario } from "../scenario/types";
import { warning, type ResultWarning } from "../warnings";
import { equationOfStateFor, type EquationOfState } from "./equation-of-state";
import { pressureFromDepth, pressureFromDepthValidityIssues } from "./pressure-from-depth";
import { STANDARD_GRAVITY } from "../constants";
import { interpolateLinear } from "../interpolate";

export { STANDARD_GRAVITY };

export interface PropertiesStage {
  readonly eos: EquationOfState;
  /** kg/m³ in situ at the port's depth. */
  readonly dischargeDensity: number;
  /** kg/m³ at the port's depth (depth − portHeight). */
  readonly ambientDensityAtPort: number;
  /** g(ρ0 − ρa)/ρa, m/s², with g = 9.80665 m/s² (standard gravity). */
  readonly reducedGravity: number;
  /** Densities at each profile depth plus the port depth and the seabed. */
  readonly column: AmbientColumn;
  readonly densities: DensitiesResult;
  readonly warnings: ResultWarning[];
}

/**
 * Linear interpolation of salinity and temperature in depth, constant beyond the ends.
 * @param profile points sorted by depth (at least one)
 * @param depth depth, m
 */
export function profileAtDepth(
  profile: readonly ProfilePoint[],
  depth: number,
): { salinity: number; temperature: number } {
  // Two points at the same depth: the deeper one's values are taken rather than dividing by zero.
  const depths = profile.map((p) => p.depth);
  return {
    salinity: interpolateLinear(
      depths,
      profile.map((p) => p.salinity),
      depth,
    ),
    temperature: interpolateLinear(
      depths,
      profile.map((p) => p.temperature),
      depth,
    ),
  };
}

/** `profileAtDepth` for one profile, its columns read once (the stage interpolates at several depths). */
function profileInterpolator(
  profile: readonly ProfilePoint[],
): (depth: number) => { salinity: number; temperature: number } {
  const depths = profile.map((p) => p.depth);
  const salinities = profile.map((p) => p.salinity);
  const temperatures = profile.map((p) => p.temperature);
  return (depth) => ({
    salinity: interpolateLinear(depths, salinities, depth),
    temperature: interpolateLinear(depths, temperatures, depth),
  });
}

/**
 * The equation of state's density, evaluated once per distinct (salinity, temperature, pressure) within
 * one stage: a uniform column asks for the same water at the same reference pressure at every depth and
 * at the port. The value is the function's own, so nothing changes but the count of evaluations.
 */
export function densityOnce(eos: EquationOfState): (salinity: number, temperature: number, pressure: number) => number {
  const seen: number[] = []; // salinity, temperature, pressure, density; four numbers per evaluation
  return (salinity, temperature, pressure) => {
    for (let i = 0; i < seen.length; i += 4) {
      if (Object.is(seen[i], salinity) && Object.is(seen[i + 1], temperature) && Object.is(seen[i + 2], pressure))
        return seen[i + 3]!;
    }
    const rho = eos.density(salinity, temperature, pressure);
    seen.push(salinity, temperature, pressure, rho);
    return rho;
  };
}

/**
 * Densities for the pipeline from a normalised scenario.
 * @param scenario the frozen, SI scenario
 * @returns the equation of state, densities at the port, reduced gravity, the ambient column and warnings
 */
export function propertiesFromScenario(scenario: Scenario): PropertiesStage {
  const { ambient, discharge, diffuser } = scenario;
  // The range warnings of the salinity conversions made while reading the file come first.
  const warnings: ResultWarning[] = [...(scenario.conversionWarnings ?? [])];
  const waterDepth = ambient.depth;
  const profile = ambient.profile;

  let portDepth = waterDepth - diffuser.portHeight;
  if (portDepth < 0 || portDepth > waterDepth) {
    warnings.push(
      warning(
        "port-outside-water-column",
        "serious",
        `The port height ${diffuser.portHeight} m puts the port outside the ${waterDepth} m water column; ` +
          "densities are taken at the nearest point of the column.",
        {
          parameter: "diffuser.portHeight",
          value: diffuser.portHeight,
          range: [0, waterDepth],
          stage: "properties",
        },
      ),
    );
    portDepth = Math.min(Math.max(portDepth, 0), waterDepth);
  }

  const depthSet = new Set<number>();
  for (const point of profile) if (point.depth >= 0 && point.depth <= waterDepth) depthSet.add(point.depth);
  depthSet.add(portDepth);
  depthSet.add(waterDepth);
  const depths = [...depthSet].sort((a, b) => a - b);
  const at = profileInterpolator(profile);
  const states = depths.map(at);
  const portState = at(portDepth);
  const surfaceState = at(0);

  const eos = equationOfStateFor(
    [discharge.salinity, ...profile.map((p) => p.salinity)],
    [discharge.temperature, ...profile.map((p) => p.temperature)],
  );

  const pressures = depths.map((d) => pressureFromDepth(d));
  const portPressure = pressureFromDepth(portDepth);
  // Every depth converted above lies in [0, waterDepth] (the port's depth is clamped into it), so the
  // deepest (the seabed) is the worst for the depth check; the latitude is the default one.
  warnings.push(...pressureFromDepthValidityIssues(waterDepth));
  // The column carries potential densities referenced to the port's pressure: a column of uniform
  // salinity and temperature is then neutral (no spurious "stratification" from compressibility), and the
  // jet's buoyancy compares like with like. In-situ values are reported as ambientSurface/ambientBottom.
  const density = densityOnce(eos);
  const densities = states.map((s) => density(s.salinity, s.temperature, portPressure));
  const dischargeDensity = density(discharge.salinity, discharge.temperature, portPressure);
  const ambientDensityAtPort = density(portState.salinity, portState.temperature, portPressure);
  const ambientSurface = density(surfaceState.salinity, surfaceState.temperature, 0);
  const bottomState = states[depths.length - 1];
  const ambientBottom = density(bottomState.salinity, bottomState.temperature, pressures[depths.length - 1]);
  const reducedGravity = (STANDARD_GRAVITY * (dischargeDensity - ambientDensityAtPort)) / ambientDensityAtPort;

  warnings.push(...eos.validityIssues(discharge.salinity, discharge.temperature, portPressure, "discharge"));
  const seen = new Set(warnings.map((w) => `${w.code}|${w.parameter}`));
  for (let i = 0; i < depths.length; i++) {
    for (const w of eos.validityIssues(states[i].salinity, states[i].temperature, pressures[i], "ambient")) {
      // One warning per code for the ambient column, with the first depth that triggered it.
      const key = `${w.code}|${w.parameter}`;
      if (seen.has(key)) continue;
      seen.add(key);
      warnings.push({ ...w, message: `${w.message} (first at ${depths[i]} m depth)` });
    }
  }

  const inversion = staticInstability(depths, densities);
  if (inversion) warnings.push(unstableColumnWarning(inversion));

  const column: AmbientColumn = {
    depth: waterDepth,
    depths,
    densities,
    salinities: states.map((s) => s.salinity),
    temperatures: states.map((s) => s.temperature),
    currentSpeed: ambient.currentSpeed,
    currentDirection: ambient.currentDirection,
  };

  return {
    eos,
    dischargeDensity,
    ambientDensityAtPort,
    reducedGravity,
    column,
    densities: {
      discharge: dischargeDensity,
      ambient: ambientDensityAtPort,
      reducedGravity,
      ambientSurface,
      ambientBottom,
      equationOfState: eos.info,
    },
    warnings,
  };
}

/**
 * Largest density inversion tolerated as measurement noise, kg/m³: about 0.1 °C or 0.03 g/kg in
 * seawater, the order of a field profiler's repeatability (common practice, no source; from memory).
 */
export const DENSITY_INVERSION_TOLERANCE = 0.02;

/** A statically unstable stretch of the column: deeper water lighter than shallower water. */
export interface StaticInstability {
  /** Largest density drop with depth, kg/m³ (potential densities at the port's pressure). */
  readonly drop: number;
  readonly upperDepth: number; // m below the surface
  readonly lowerDepth: number; // m below the surface
}

/**
 * The largest inversion in a column (depths ascending, potential densities at one reference pressure),
 * or null when the column is stable or neutral within {@link DENSITY_INVERSION_TOLERANCE}. Compares
 * every depth with the densest water above it, so an inversion spread over many small steps counts.
 */
export function staticInstability(depths: readonly number[], densities: readonly number[]): StaticInstability | null {
  let worst: StaticInstability | null = null;
  let densest = -Infinity;
  let densestDepth = 0;
  for (let i = 0; i < densities.length; i++) {
    const rho = densities[i]!;
    const drop = densest - rho;
    if (drop > DENSITY_INVERSION_TOLERANCE && (worst === null || drop > worst.drop)) {
      worst = { drop, upperDepth: densestDepth, lowerDepth: depths[i]! };
    }
    if (rho > densest) {
      densest = rho;
      densestDepth = depths[i]!;
    }
  }
  return worst;
}

/**
 * A statically unstable ambient column makes the case outside-scope ("serious", properties stage): such
 * a column overturns by itself within minutes, so the stated profile cannot be the steady sea the
 * dense-jet methods assume (they rest on experiments in uniform or stably stratified water, e.g.
 * Roberts, Ferrier & Daviero 1997; the integral model's buoyancy terms would act with the wrong sign),
 * and a profile like this is most often a typing or unit mistake.
 */
function unstableColumnWarning(u: StaticInstability): ResultWarning {
  return warning(
    "ambient-statically-unstable",
    "serious",
    `The ambient profile is statically unstable: water at ${u.lowerDepth} m depth is ${u.drop.toFixed(3)} kg/m³ lighter than ` +
      `water at ${u.upperDepth} m above it. Such a column overturns by itself, and the dense-jet methods assume a stable or ` +
      "neutral sea, so no verdict is given (outside-scope). Check the profile's depths, salinities and temperatures.",
    { parameter: "ambient.profile", value: u.drop, range: [0, DENSITY_INVERSION_TOLERANCE], stage: "properties" },
  );
}
