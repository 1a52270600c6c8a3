/**
 * Port flows and screening-level port hydraulics.
 *
 * Flow split: each port i carries q_i = Q·f_i with the scenario's flow fractions f_i (equal by default).
 * Exit velocity U_i = q_i / (π d²/4) on the effective (vena-contracta) diameter d; densimetric Froude
 * number F_i = U_i/√(g′d) with g′ = g(ρ₀ − ρa)/ρa (the usual definition).
 * Exit head loss, where a discharge coefficient C_d is given: h = (q/(C_d·A))²/(2g) on the nominal port
 * area A — standard orifice hydraulics (e.g. any hydraulics handbook; common practice, no source).
 * Usual exit velocity range: USUAL_EXIT_VELOCITY in core/constants.ts (one warning for all ports outside it).
 */
import type { Scenario } from "../scenario/types";
import type { PortResult } from "../result/contract";
import { warning, type ResultWarning } from "../warnings";
import { STANDARD_GRAVITY, USUAL_EXIT_VELOCITY, USUAL_EXIT_VELOCITY_TEXT } from "../constants";

/** Kinematic viscosity of seawater near 20 °C, m²/s (handbook value, from memory). */
export const SEAWATER_KINEMATIC_VISCOSITY = 1.05e-6;
export { USUAL_EXIT_VELOCITY };
const EXIT_VELOCITY_SOURCE = `common practice, no source (about ${USUAL_EXIT_VELOCITY_TEXT})`;

export interface PortHydraulicsInput {
  readonly scenario: Scenario;
  /** Discharge density at the port, kg/m³. */
  readonly dischargeDensity: number;
  /** Ambient density at the port depth, kg/m³. */
  readonly ambientDensity: number;
  /** Kinematic viscosity for the Reynolds number, m²/s (default 1.05×10⁻⁶). */
  readonly kinematicViscosity?: number;
}

export interface SinglePortHydraulics {
  readonly index: number;
  readonly flow: number; // m³/s
  readonly velocity: number; // m/s
  readonly froude: number;
  readonly headLoss: number | null; // m
}

export interface PortHydraulics {
  readonly port: PortResult;
  readonly ports: readonly SinglePortHydraulics[];
  readonly warnings: readonly ResultWarning[];
}

/** Number of ports the diffuser has: risers × ports per riser for a rosette, else `portCount`. */
export function portCountFromDiffuser(scenario: Scenario): number {
  const d = scenario.diffuser;
  if (d.layout === "single") return 1;
  if (d.layout === "rosette" && d.risers) return Math.max(1, d.risers.count * d.risers.portsPerRiser);
  return Math.max(1, d.portCount);
}

/** Flow fractions per port: the scenario's split when it matches the port count and sums to 1, else equal. */
export function flowFractionsFromScenario(scenario: Scenario): { fractions: number[]; warnings: ResultWarning[] } {
  const n = portCountFromDiffuser(scenario);
  const split = scenario.diffuser.flowSplit;
  const sum = split.reduce((a, b) => a + b, 0);
  if (split.length === n && split.every((f) => f > 0) && Math.abs(sum - 1) < 1e-6) {
    return { fractions: [...split], warnings: [] };
  }
  const warnings: ResultWarning[] = [];
  if (split.length > 0 && !(split.length === 1 && n === 1)) {
    warnings.push(
      warning(
        "flow-split-ignored",
        "warning",
        `Flow split has ${split.length} entries summing to ${sum.toFixed(4)} for ${n} ports; an equal split was used.`,
        { parameter: "diffuser.flowSplit", value: split.length, stage: "multiport" },
      ),
    );
  }
  return { fractions: new Array<number>(n).fill(1 / n), warnings };
}

/**
 * Per-port flows, exit velocities, Froude numbers and exit head losses, and the mean-port summary
 * (`PortResult`) the result contract carries. Never throws; unusual velocities become warnings.
 */
export function portFlowsAndHydraulics(input: PortHydraulicsInput): PortHydraulics {
  const { scenario } = input;
  const d = scenario.diffuser;
  const nu = input.kinematicViscosity ?? SEAWATER_KINEMATIC_VISCOSITY;
  const { fractions, warnings } = flowFractionsFromScenario(scenario);
  const n = fractions.length;
  const area = (Math.PI * d.portDiameter * d.portDiameter) / 4;
  const nominalArea = (Math.PI * d.portDiameterNominal * d.portDiameterNominal) / 4;
  const gPrime = (STANDARD_GRAVITY * (input.dischargeDensity - input.ambientDensity)) / input.ambientDensity;
  // F = U/√(|g′|·d) for either sign of buoyancy (a rising discharge has g′ < 0); a neutral discharge has
  // no densimetric Froude number: infinity rather than NaN.
  const froudeOf = (u: number) => (gPrime !== 0 ? u / Math.sqrt(Math.abs(gPrime) * d.portDiameter) : Infinity);
  const cd = d.dischargeCoefficient;
  const ports: SinglePortHydraulics[] = fractions.map((f, index) => {
    const flow = scenario.discharge.flow * f;
    const velocity = flow / area;
    const headLoss = cd && cd > 0 ? Math.pow(flow / (cd * nominalArea), 2) / (2 * STANDARD_GRAVITY) : null;
    return { index, flow, velocity, froude: froudeOf(velocity), headLoss };
  });
  // One warning for all ports outside the usual range (a long diffuser would otherwise repeat it per port).
  const unusual = ports.filter((p) => p.velocity < USUAL_EXIT_VELOCITY[0] || p.velocity > USUAL_EXIT_VELOCITY[1]);
  if (unusual.length) {
    const mid = (USUAL_EXIT_VELOCITY[0] + USUAL_EXIT_VELOCITY[1]) / 2;
    const vs = unusual.map((p) => p.velocity);
    const lo = Math.min(...vs);
    const hi = Math.max(...vs);
    const which =
      unusual.length === n
        ? n === 1
          ? "The port"
          : `All ${n} ports`
        : `Ports ${unusual.map((p) => p.index + 1).join(", ")}`;
    const speed = lo === hi ? `${lo.toFixed(2)} m/s` : `${lo.toFixed(2)}–${hi.toFixed(2)} m/s`;
    warnings.push(
      warning(
        "port-velocity-unusual",
        "warning",
        `${which}: exit velocity ${speed}, outside the usual ${USUAL_EXIT_VELOCITY_TEXT}.`,
        {
          parameter: unusual.length === 1 ? `port[${unusual[0].index}].velocity` : "port.velocity",
          // the velocity furthest from the middle of the band
          value: Math.abs(hi - mid) > Math.abs(lo - mid) ? hi : lo,
          range: USUAL_EXIT_VELOCITY,
          source: EXIT_VELOCITY_SOURCE,
          stage: "multiport",
        },
      ),
    );
  }
  const meanFlow = scenario.discharge.flow / n;
  const meanVelocity = meanFlow / area;
  const headLoss = cd && cd > 0 ? Math.max(...ports.map((p) => p.headLoss ?? 0)) : null;
  const port: PortResult = {
    count: n,
    diameter: d.portDiameter,
    flow: meanFlow,
    flows: ports.map((p) => p.flow),
    velocity: meanVelocity,
    froude: froudeOf(meanVelocity),
    reynolds: (meanVelocity * d.portDiameter) / nu,
    headLoss,
  };
  return { port, ports, warnings };
}
