/**
 * Stage 2 of the pipeline (core/pipeline.ts), port hydraulics: every port's flow, exit velocity, Froude
 * and Reynolds numbers, the viscosity fit's range check, and the jet of the mean port that the near field
 * starts from.
 */
import type { Scenario } from "../scenario/types";
import type { PropertiesStage } from "../properties";
import type { JetSource } from "../nearfield/types";
import { portFlowsAndHydraulics, type PortHydraulics } from "./port-hydraulics";
import { viscosityFromST, viscosityFromSTValidityIssues } from "../correlations/sharqawy-2010-viscosity";
import type { PortResult } from "../result/contract";

/**
 * Port flows, velocity, Froude and Reynolds numbers for every port under the flow split (core/multiport),
 * with the brine's own viscosity; its warnings cover each port's exit velocity.
 */
export function portFromScenario(scenario: Scenario, props: PropertiesStage): PortHydraulics {
  const { salinity, temperature } = scenario.discharge;
  const nu = viscosityFromST(salinity, temperature) / props.dischargeDensity;
  const hydraulics = portFlowsAndHydraulics({
    scenario,
    dischargeDensity: props.dischargeDensity,
    ambientDensity: props.ambientDensityAtPort,
    kinematicViscosity: nu,
  });
  // The viscosity fit's own range (Sharqawy et al. 2010: 0–150 g/kg, 0–180 °C) is checked where it is used.
  const viscosityWarnings = viscosityFromSTValidityIssues(salinity, temperature).map((w) => ({
    ...w,
    parameter: `discharge.${w.parameter}`,
    stage: "port",
  }));
  return { ...hydraulics, warnings: [...hydraulics.warnings, ...viscosityWarnings] };
}

/** Builds the jet of the mean port. */
export function jetFromScenario(scenario: Scenario, props: PropertiesStage, port: PortResult): JetSource {
  const d = scenario.diffuser;
  return {
    diameter: d.portDiameter,
    flow: port.flow,
    velocity: port.velocity,
    density: props.dischargeDensity,
    salinity: scenario.discharge.salinity,
    temperature: scenario.discharge.temperature,
    angle: d.portAngle,
    azimuth: d.portAzimuth,
    portHeight: d.portHeight,
    reducedGravity: props.reducedGravity,
    froude: port.froude,
  };
}
