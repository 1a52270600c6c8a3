/**
 * Test jets and water columns for the near-field suites: a round dense jet built from its diameter d,
 * densimetric Froude number F and exit velocity U (g′ = U²/(F²d), ambient 1025 kg/m³), and a uniform
 * column. Each suite states its own defaults by passing them here.
 */
import type { AmbientColumn, JetSource } from "../../core/nearfield/types";

const G = 9.80665; // standard gravity, m/s²

export interface JetOptions {
  readonly d?: number;
  readonly F?: number;
  readonly U?: number;
  readonly angle?: number;
  readonly azimuth?: number;
  readonly portHeight?: number;
  readonly temperature?: number;
  readonly salinity?: number;
}

export function denseJet(p: JetOptions = {}): JetSource {
  const d = p.d ?? 0.2;
  const F = p.F ?? 25;
  const U = p.U ?? 4;
  const gPrime = (U * U) / (F * F * d);
  return {
    diameter: d,
    flow: (U * Math.PI * d * d) / 4,
    velocity: U,
    density: 1025 * (1 + gPrime / G),
    salinity: p.salinity ?? 68,
    temperature: p.temperature ?? 20,
    angle: p.angle ?? 60,
    azimuth: p.azimuth ?? 0,
    portHeight: p.portHeight ?? 1,
    reducedGravity: gPrime,
    froude: F,
  };
}

/** A uniform 35 g/kg, 20 °C, 1025 kg/m³ column of the given depth, stagnant unless overridden. */
export function uniformColumn(depth: number, over: Partial<AmbientColumn> = {}): AmbientColumn {
  return {
    depth,
    depths: [0, depth],
    densities: [1025, 1025],
    salinities: [35, 35],
    temperatures: [20, 20],
    currentSpeed: 0,
    currentDirection: 0,
    ...over,
  };
}
