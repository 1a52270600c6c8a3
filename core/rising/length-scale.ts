/**
 * Near-field method "length-scale" for a discharge lighter than the receiving water: the published
 * round-jet and round-plume asymptotics (./plume-laws.ts) side by side with the integral model.
 *
 * Unstratified water (or a stratification too weak to stop it): the plume rises to the surface; its
 * centreline dilution there is the larger of the jet and plume asymptotes at the height of the surface
 * above the port. Stratified water: the bulk buoyancy frequency over the water above the port gives the
 * trap height z_max = 3.8·(B/N³)^(1/4) (Morton, Taylor & Turner 1956); below the surface the plume is
 * trapped, spreading where its buoyancy vanishes (≈ 0.75·z_max), and the dilution there is the
 * unstratified law at that height. The upper edge's highest point is z_max (or the surface).
 *
 * Judgement, stated in the notes: the laws are for a vertical source in stagnant water; an inclined port
 * is taken at its vertical rise (its longer path adds dilution, so this is cautious); a current bends
 * and dilutes the plume further (not counted); the horizontal offset of an inclined buoyant jet is
 * taken as l_M·cos θ (capped at the rise height).
 */
import type { AmbientColumn, JetSource, NearFieldMethodResult } from "../nearfield/types";
import { nullNearFieldResult } from "../nearfield/types";
import { warning, type ResultWarning } from "../warnings";
import {
  BUOYANT_JET_SOURCE,
  ROUND_JET_SOURCE,
  ROUND_PLUME_SOURCE,
  ROUND_PLUME_TRACER_SPREAD,
  SPREADING_HEIGHT_FRACTION,
  TRAP_HEIGHT_SOURCE,
  bulkBuoyancyFrequencySquared,
  buoyantJetDilution,
  roundSourceFluxes,
  trapHeightFromStratification,
} from "./plume-laws";
import type { RisingField } from "./types";

export const RISING_LENGTH_SCALE_SOURCE = `${ROUND_JET_SOURCE}; ${ROUND_PLUME_SOURCE}; ${TRAP_HEIGHT_SOURCE}; ${BUOYANT_JET_SOURCE}`;

export const RISING_LENGTH_SCALE_BIAS =
  "Asymptotic laws for a vertical round source in stagnant water (coefficients of Fischer et al. 1979). Near the jet-to-plume transition the larger asymptote under-states the dilution; an inclined " +
  "port and any current add dilution that is not counted, so the dilutions are expected to be low (cautious).";

/** Runs the rising length-scale method for one port (or a merged group handled by the caller). Never throws. */
export function risingLengthScale(
  jet: JetSource,
  column: AmbientColumn,
): NearFieldMethodResult & { risingField: RisingField } {
  const stage = "length-scale";
  const warnings: ResultWarning[] = [];
  const notes: string[] = [];
  const h = column.depth - jet.portHeight;
  if (!(jet.flow > 0) || !(jet.velocity > 0) || !(h > 0)) {
    const reason = "The port flow, velocity and submergence must be positive.";
    return {
      ...nullNearFieldResult("length-scale", RISING_LENGTH_SCALE_SOURCE, RISING_LENGTH_SCALE_BIAS, [], reason),
      risingField: nullField(),
    };
  }
  const f = roundSourceFluxes(jet.flow, jet.velocity, jet.reducedGravity);
  const n2 = bulkBuoyancyFrequencySquared(column, jet.portHeight);
  const zMax = trapHeightFromStratification(f.b, n2);
  const trapped = zMax < h;
  const fieldHeight = trapped ? SPREADING_HEIGHT_FRACTION * zMax : h;
  const rise = trapped ? zMax : h;
  const at = buoyantJetDilution(f, fieldHeight);
  const theta = (jet.angle * Math.PI) / 180;
  const offset = Math.min(Number.isFinite(f.lM) ? f.lM : rise, rise) * Math.cos(theta);
  // The field starts at the plume's edge: top-hat radius √2·b_g = √2·0.12·z (Fischer et al. 1979, from memory).
  const radius = Math.SQRT2 * ROUND_PLUME_TRACER_SPREAD * fieldHeight;
  const distance = offset + radius;

  notes.push(
    trapped
      ? `Trapped by the stratification: bulk N = ${Math.sqrt(n2).toPrecision(3)} s⁻¹ over the ${h.toFixed(1)} m above the port; maximum rise 3.8·(B/N³)^(1/4) = ${zMax.toFixed(2)} m, spreading at ${SPREADING_HEIGHT_FRACTION}·z_max = ${fieldHeight.toFixed(2)} m above the port.`
      : n2 > 0
        ? `Reaches the surface: the trap height 3.8·(B/N³)^(1/4) = ${zMax.toFixed(1)} m (bulk N = ${Math.sqrt(n2).toPrecision(3)} s⁻¹) is above the ${h.toFixed(1)} m of water over the port.`
        : `Reaches the surface ${h.toFixed(1)} m above the port (unstratified water).`,
    `Dilution at ${fieldHeight.toFixed(2)} m from the ${at.regime} asymptote (l_M = ${Number.isFinite(f.lM) ? f.lM.toFixed(2) : "∞"} m; B = ${f.b.toPrecision(3)} m⁴/s³, M = ${f.m.toPrecision(3)} m⁴/s²); the larger of the round-jet and round-plume laws.`,
    `Horizontal offset of the rising plume taken as min(l_M, rise)·cos θ = ${offset.toFixed(2)} m, and the field starts at the plume's top-hat radius √2·0.12·z = ${radius.toFixed(2)} m (judgement).`,
  );
  if (n2 > 0 && column.depths.length > 2) {
    notes.push(
      "The trap height uses the bulk stratification between the port and the surface (exact for a linear profile); the integral method follows the profile itself.",
    );
  }
  if (n2 < 0) {
    warnings.push(
      warning(
        "length-scale-unstable-column",
        "warning",
        "The water above the port is denser at the top than at the port (unstable); the plume is taken to reach the surface.",
        {
          parameter: "ambient.profile",
          stage,
        },
      ),
    );
  }
  if (column.currentSpeed > 0) {
    const lb = f.b / Math.pow(column.currentSpeed, 3);
    if (lb < rise) {
      warnings.push(
        warning(
          "length-scale-current-bends-plume",
          "info",
          `The current (${column.currentSpeed.toFixed(2)} m/s) bends the plume over within its rise (l_b = B/u³ = ${lb.toPrecision(3)} m < ${rise.toFixed(1)} m): the stagnant-water laws under-state its dilution.`,
          { parameter: "ambient.currentSpeed", value: column.currentSpeed, stage },
        ),
      );
    }
  }
  if (jet.angle < 30) {
    warnings.push(
      warning(
        "length-scale-shallow-port",
        "info",
        `Port angle ${jet.angle.toFixed(0)}° is far from vertical: the vertical-plume laws are rough; its longer path adds dilution not counted here.`,
        {
          parameter: "diffuser.portAngle",
          value: jet.angle,
          stage,
        },
      ),
    );
  }
  const field: RisingField = {
    kind: trapped ? "trapped" : "surface",
    height: fieldHeight,
    dilution: at.dilution,
    distance,
    halfWidth: radius,
    trapHeight: trapped ? fieldHeight : null,
    buoyancyFrequency: n2 > 0 ? Math.sqrt(n2) : 0,
  };
  return {
    method: "length-scale",
    source: RISING_LENGTH_SCALE_SOURCE,
    available: true,
    notAvailableReason: null,
    maxRiseHeight: rise,
    maxRiseDistance: offset,
    returnDistance: null,
    impactDistance: null,
    impactDilution: null,
    nearFieldDistance: distance,
    nearFieldDilution: at.dilution,
    // The overshoot above the trap level adds mixing that is not counted: the same dilution as the field.
    maxRiseDilution: at.dilution,
    dilutionRange: null,
    impactDilutionFluxAveraged: null,
    nearFieldDilutionFluxAveraged: null,
    fluxAveragingFactor: null,
    entrainedFlow: null,
    bias: RISING_LENGTH_SCALE_BIAS,
    warnings,
    notes,
    risingField: field,
  };
}

function nullField(): RisingField {
  return { kind: "none", height: 0, dilution: 1, distance: 0, halfWidth: 0, trapHeight: null, buoyancyFrequency: 0 };
}
