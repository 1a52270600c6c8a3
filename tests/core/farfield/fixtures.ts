/**
 * Hand-built inputs for the far-field, multiport and compliance tests. Near-field results are documented
 * published values so these tests do not depend on the near-field implementations:
 * - "length-scale": Roberts, Ferrier & Daviero (1997) 60° stagnant coefficients y_t = 2.2 dF,
 *   x_i = 2.4 dF, S_i = 1.6 F, x_n = 9.0 dF, S_n = 2.6 F (from memory; quoted in secondary literature, not checked against the paper).
 * - "integral": impact dilution S_i = 1.06 F (Lai & Lee 2012, abstract) at the same impact point, with
 *   no separate near-field end (an integral model stops at impact).
 */
import type { Scenario } from "../../../core/scenario/types";
import type { AmbientColumn, JetSource, NearFieldMethodResult } from "../../../core/nearfield/types";
import type { DensitiesResult, PortResult } from "../../../core/result/contract";
import type { AfterNearFieldInput } from "../../../core/pipeline";

export const D = 0.2; // m port diameter
export const F = 20; // densimetric Froude number
export const DF = D * F; // 4 m

export function scenarioFixture(
  over: {
    discharge?: Partial<Scenario["discharge"]>;
    ambient?: Partial<Scenario["ambient"]>;
    diffuser?: Partial<Scenario["diffuser"]>;
    mixingZone?: Partial<Scenario["mixingZone"]>;
    options?: Partial<Scenario["options"]>;
  } = {},
): Scenario {
  return {
    format: "brinefield-scenario",
    version: 1,
    name: "fixture",
    discharge: { flow: 0.1, salinity: 70, temperature: 20, constituents: [], ...over.discharge },
    ambient: {
      depth: 15,
      profile: [
        { depth: 0, salinity: 33.5, temperature: 20 },
        { depth: 15, salinity: 33.5, temperature: 20 },
      ],
      uniform: true,
      currentSpeed: 0,
      currentDirection: 90,
      bedSlope: 0,
      bedSlopeAzimuth: 0,
      ...over.ambient,
    },
    ambientCases: [],
    diffuser: {
      layout: "single",
      portCount: 1,
      portDiameter: D,
      portDiameterNominal: D,
      contraction: 1,
      portAngle: 60,
      portHeight: 1,
      portSpacing: 0,
      portAzimuth: 90,
      diffuserAzimuth: 0,
      length: 0,
      flowSplit: [1],
      ...over.diffuser,
    },
    mixingZone: {
      radius: 100,
      limits: [{ constituent: "salinity", maxIncrease: 2, unit: "g/kg" }],
      ...over.mixingZone,
    },
    options: { nearFieldForEdge: "conservative", farField: "conservative", addSlackWater: true, ...over.options },
    conversions: [],
  };
}

export const RHO_A = 1023.5;
export const RHO_D = 1052.0;
export const G_PRIME = (9.80665 * (RHO_D - RHO_A)) / RHO_A;

export function jetFixture(): JetSource {
  const velocity = F * Math.sqrt(G_PRIME * D);
  return {
    diameter: D,
    flow: (velocity * Math.PI * D * D) / 4,
    velocity,
    density: RHO_D,
    salinity: 70,
    temperature: 20,
    angle: 60,
    azimuth: 90,
    portHeight: 1,
    reducedGravity: G_PRIME,
    froude: F,
  };
}

export function lengthScaleFixture(): NearFieldMethodResult {
  return {
    method: "length-scale",
    source: "Roberts, Ferrier & Daviero (1997)",
    available: true,
    notAvailableReason: null,
    maxRiseHeight: 2.2 * DF,
    maxRiseDistance: null,
    returnDistance: 2.4 * DF,
    impactDistance: 2.4 * DF,
    impactDilution: 1.6 * F,
    nearFieldDistance: 9.0 * DF,
    nearFieldDilution: 2.6 * F,
    dilutionRange: [1.06 * F, 1.6 * F],
    entrainedFlow: null,
    bias: "fixture",
    warnings: [],
  };
}

export function integralFixture(): NearFieldMethodResult {
  return {
    ...lengthScaleFixture(),
    method: "integral",
    source: "fixture: Lai & Lee (2012) impact dilution 1.06 F (confirmed)",
    nearFieldDistance: null,
    nearFieldDilution: null,
    impactDilution: 1.06 * F,
    dilutionRange: [1.06 * F, 1.06 * F * 1.43],
  };
}

export function columnFixture(scenario: Scenario): AmbientColumn {
  return {
    depth: scenario.ambient.depth,
    depths: [0, scenario.ambient.depth],
    densities: [RHO_A, RHO_A],
    salinities: [33.5, 33.5],
    temperatures: [20, 20],
    currentSpeed: scenario.ambient.currentSpeed,
    currentDirection: scenario.ambient.currentDirection,
  };
}

export function densitiesFixture(): DensitiesResult {
  return {
    discharge: RHO_D,
    ambient: RHO_A,
    reducedGravity: G_PRIME,
    ambientSurface: RHO_A,
    ambientBottom: RHO_A,
    equationOfState: { name: "fixture", source: "fixture", reason: "fixture" },
  };
}

export function portFixture(scenario: Scenario): PortResult {
  const jet = jetFixture();
  return {
    count: scenario.diffuser.portCount,
    diameter: D,
    flow: jet.flow,
    flows: [jet.flow],
    velocity: jet.velocity,
    froude: F,
    reynolds: 1e5,
    headLoss: null,
  };
}

export function beyondInputFixture(scenario: Scenario, nearField?: NearFieldMethodResult[]): AfterNearFieldInput {
  const jet = jetFixture();
  const s: Scenario = {
    ...scenario,
    discharge: { ...scenario.discharge, flow: jet.flow * Math.max(1, scenario.diffuser.portCount) },
  };
  return {
    scenario: s,
    jet,
    column: columnFixture(s),
    nearField: nearField ?? [lengthScaleFixture(), integralFixture()],
    densities: densitiesFixture(),
  };
}
