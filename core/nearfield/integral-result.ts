/**
 * Assembly of the integral model's `NearFieldMethodResult` from an integrator run: located events,
 * warnings (stage "integral"), the documented bias and the dilution range, the decimated path.
 */
import { warning, type ResultWarning } from "../warnings";
import { entrainmentLeeCheung1990ValidityIssues } from "../correlations/lee-cheung-1990-entrainment";
import type { AdaptiveResult, EventLog } from "../ode/adaptive";
import { INTEGRAL_DIM, IQ, IX, IY, IZ, verticalHalfExtent, type IntegralParams } from "./integral-rhs";
import type { IntegralPathBuffer } from "./integral-path";
import {
  CENTRELINE_PROFILE_FACTOR,
  DILUTION_BIAS_FACTOR,
  EV_IMPACT,
  EV_MAX_RISE,
  EV_NEUTRAL,
  EV_RETURN,
  EV_SEABED_EDGE,
  EV_SURFACE_CENTRE,
  EV_SURFACE_EDGE,
  INTEGRAL_BIAS,
  INTEGRAL_SOURCE,
  centrelineDilution,
} from "./integral-setup";
import { ROBERTS_1997_NEAR_FIELD_GROWTH } from "../correlations/roberts-1997-inclined-dense-jet";
import { FLUX_AVERAGING_FACTOR } from "./flux-averaging";
import {
  nullNearFieldResult,
  type AmbientColumn,
  type JetSource,
  type NearFieldEvent,
  type NearFieldMethodResult,
} from "./types";

// Hit states read back from the event log (numbers are copied out before the next solve can reuse them).
const HIT_Y = new Float64Array(INTEGRAL_DIM);
const RETURN_Y = new Float64Array(INTEGRAL_DIM);
const IMPACT_Y = new Float64Array(INTEGRAL_DIM);
const RISE_Y = new Float64Array(INTEGRAL_DIM);

/** The stage named in this model's warnings. */
const STAGE = "integral";

const NEAR_FIELD_GROWTH_NOTE =
  `End of the near field: impact dilution × ${ROBERTS_1997_NEAR_FIELD_GROWTH.dilution.toFixed(3)}, ` +
  `${ROBERTS_1997_NEAR_FIELD_GROWTH.spreadLength.toFixed(1)}·d·F beyond impact — the growth from impact to the end ` +
  "of the near field in Roberts et al. (1997) (S_n/S_i = 2.6/1.6, x_n − x_i = (9.0 − 2.4)·d·F; measured at " +
  "60° in stagnant water).";
const CENTRELINE_NOTE =
  "Dilutions are centreline (minimum) values: flux-average (top-hat) dilution × λ²/(1+λ²) with λ = 1.2; " +
  "the …FluxAveraged values are the top-hat dilution Q/Q0, entrainedFlow = Q(impact) − Q0; " +
  "halfWidth is the top-hat radius (≈ √2 × the Gaussian 1/e velocity half-width).";

/** Result for inputs the model cannot run with: nulls and one serious warning. */
export function invalidIntegralResult(
  message: string,
  value: number | undefined,
  parameter: string,
): NearFieldMethodResult {
  const w = warning("integral-invalid-input", "serious", message, { parameter, value, stage: "integral" });
  return { ...nullNearFieldResult("integral", INTEGRAL_SOURCE, INTEGRAL_BIAS, [w], message), path: [], events: [] };
}

function planDistance(y: Float64Array): number {
  return Math.hypot(y[IX], y[IY]);
}

/** Why the step monitor stopped a run early: the jet became a passive layer or was trapped; null when it did not. */
export type IntegralStopKind = "passive-layer" | "trapped" | null;

/** What one run of the integral model left to assemble its result from. */
export interface IntegralRunOutcome {
  readonly jet: JetSource;
  readonly column: AmbientColumn;
  readonly params: IntegralParams;
  readonly run: AdaptiveResult;
  /** The events the run hit (impact, maximum rise, …), in order. */
  readonly log: EventLog;
  /** Why the run stopped early, if it did: the jet became a passive layer or was trapped. */
  readonly stopKind: IntegralStopKind;
  /** Discharge volume flux of the port, m³/s. */
  readonly q0: number;
  /** Exit velocity, m/s. */
  readonly u0: number;
  readonly includePath: boolean;
  readonly path: IntegralPathBuffer;
  readonly maxSteps: number;
  /** Arc length at which the integration stops, m. */
  readonly maxLength: number;
  /** Build the notes (default true; see IntegralOptions.text). */
  readonly text?: boolean;
}

/** One event of the result at state y (arc length s), with the centreline dilution there. */
function eventAt(kind: NearFieldEvent["kind"], s: number, y: Float64Array, q0: number): NearFieldEvent {
  return { kind, s, x: y[IX], y: y[IY], z: y[IZ], dilution: centrelineDilution(y[IQ], q0) };
}

/** The highest point of the jet's upper edge: arc length, state and edge elevation above the port, m. */
interface MaxRise {
  readonly s: number;
  readonly y: Float64Array;
  readonly edge: number;
}

/** What the event log says: the result's events so far and the points and contacts the result needs. */
interface LoggedEvents {
  readonly events: NearFieldEvent[];
  readonly returnHit: Float64Array | null;
  readonly impactHit: Float64Array | null;
  /** The highest located turning point of the upper edge (it is not in `events`). */
  readonly maxRise: MaxRise | null;
  readonly surfaceEdge: boolean;
  readonly surfaceCentre: boolean;
}

/** Reads the event log in order: one result event per hit (the first seabed or surface contact of the edge only). */
function eventsFromLog(log: EventLog, q0: number): LoggedEvents {
  const events: NearFieldEvent[] = [];
  let returnHit: Float64Array | null = null;
  let impactHit: Float64Array | null = null;
  let maxRise: MaxRise | null = null;
  let surfaceEdge = false;
  let surfaceCentre = false;
  let seabedEdge = false;
  const hitY = HIT_Y;
  for (let k = 0; k < log.count; k++) {
    const t = log.t[k];
    log.copy(k, hitY);
    switch (log.index[k]) {
      case EV_RETURN:
        events.push(eventAt("return-to-port-level", t, hitY, q0));
        if (!returnHit) returnHit = RETURN_Y.set(hitY) ?? RETURN_Y;
        break;
      case EV_SEABED_EDGE:
        if (!seabedEdge) events.push(eventAt("seabed-contact", t, hitY, q0));
        seabedEdge = true;
        break;
      case EV_IMPACT:
        events.push(eventAt("centreline-impact", t, hitY, q0));
        impactHit = IMPACT_Y.set(hitY) ?? IMPACT_Y;
        break;
      case EV_SURFACE_EDGE:
        if (!surfaceEdge) events.push(eventAt("surface-contact", t, hitY, q0));
        surfaceEdge = true;
        break;
      case EV_SURFACE_CENTRE:
        surfaceCentre = true;
        events.push(eventAt("surface-contact", t, hitY, q0));
        break;
      case EV_NEUTRAL:
        events.push(eventAt("neutral-buoyancy", t, hitY, q0));
        break;
      case EV_MAX_RISE: {
        const edge = hitY[IZ] + verticalHalfExtent(hitY);
        if (!maxRise || edge > maxRise.edge) maxRise = { s: t, y: RISE_Y.set(hitY) ?? RISE_Y, edge };
        break;
      }
    }
  }
  return { events, returnHit, impactHit, maxRise, surfaceEdge, surfaceCentre };
}

/** The highest sampled upper edge of the path (for a jet that stopped before its edge turned over). */
function highestSampledRise(path: IntegralPathBuffer, q0: number): MaxRise {
  let iBest = 0;
  for (let i = 1; i < path.length; i++) if (path.edge[i] > path.edge[iBest]) iBest = i;
  const y = new Float64Array(INTEGRAL_DIM);
  y[IX] = path.x[iBest];
  y[IY] = path.y[iBest];
  y[IZ] = path.z[iBest];
  y[IQ] = Math.max(1, path.dilution[iBest] / CENTRELINE_PROFILE_FACTOR) * q0;
  return { s: path.s[iBest], y, edge: path.edge[iBest] };
}

/** Warning when the jet's edge or centreline reaches the water surface (serious for the centreline). */
function surfaceWarnings(column: AmbientColumn, logged: LoggedEvents): ResultWarning[] {
  if (!logged.surfaceEdge && !logged.surfaceCentre) return [];
  const centre = logged.surfaceCentre;
  return [
    warning(
      "jet-reaches-surface",
      centre ? "serious" : "warning",
      centre
        ? `The jet centreline reaches the surface ${column.depth.toFixed(1)} m above the seabed; the integral model stops there and its dilutions do not apply.`
        : "The upper edge of the jet reaches the water surface; surface interaction is not modelled and the rise and dilutions are approximate.",
      { parameter: "depth", value: column.depth, stage: STAGE },
    ),
  ];
}

/**
 * Warnings for a run that ended before the seabed: the jet trapped or passive (the step monitor's stop),
 * or an integrator guard (step limit, length limit, step underflow). Adds the matching stop events.
 */
function earlyStopWarnings(outcome: IntegralRunOutcome, events: NearFieldEvent[]): ResultWarning[] {
  const { params, run, stopKind, q0, maxSteps, maxLength } = outcome;
  const warnings: ResultWarning[] = [];
  const last = run.y;
  const stage = STAGE;
  if (stopKind === "trapped") {
    events.push(eventAt("trapped", run.t, last, q0));
    warnings.push(
      warning(
        "jet-trapped",
        "warning",
        `The jet is trapped by the ambient stratification at ${(params.portDepth - last[IZ]).toFixed(1)} m depth (neutral buoyancy with small vertical velocity); it spreads as a layer there instead of reaching the seabed.`,
        { parameter: "column.densities", stage },
      ),
    );
  } else if (stopKind === "passive-layer") {
    events.push(eventAt("passive-layer", run.t, last, q0));
    warnings.push(
      warning(
        "jet-momentum-exhausted",
        "warning",
        `The jet's velocity relative to the ambient fell below 0.1 % of the exit velocity at s = ${run.t.toFixed(2)} m; the integral model cannot follow the flow further (passive layer or stalled fountain).`,
        { stage },
      ),
    );
  }
  if (run.reason === "max-steps") {
    events.push(eventAt("step-limit", run.t, last, q0));
    warnings.push(
      warning(
        "integral-step-limit",
        "warning",
        `The integrator stopped after ${maxSteps} steps without reaching the seabed.`,
        {
          parameter: "maxSteps",
          value: maxSteps,
          stage,
        },
      ),
    );
  } else if (run.reason === "t-max") {
    events.push(eventAt("length-limit", run.t, last, q0));
    warnings.push(
      warning(
        "integral-length-limit",
        "warning",
        `The jet centreline reached the length limit of ${maxLength.toFixed(0)} m without reaching the seabed.`,
        { parameter: "maxLength", value: maxLength, stage },
      ),
    );
  } else if (run.reason === "step-underflow") {
    warnings.push(
      warning(
        "integral-step-underflow",
        "warning",
        `The integrator's step size collapsed at s = ${run.t.toPrecision(4)} m (a singular point, e.g. a fountain top); results beyond it are not available.`,
        { stage },
      ),
    );
  }
  return warnings;
}

/** Warnings for a discharge outside the dense-jet case: near-neutral or positively buoyant. */
function buoyancyWarnings(jet: JetSource): ResultWarning[] {
  const stage = STAGE;
  if (Math.abs(jet.froude) > 1000 || jet.reducedGravity === 0) {
    return [
      warning(
        "integral-near-neutral",
        "warning",
        `Near-neutral buoyancy (g′ = ${jet.reducedGravity.toPrecision(3)} m/s², F = ${Number.isFinite(jet.froude) ? jet.froude.toFixed(0) : "∞"}): the discharge behaves as a pure jet and may not return to the seabed within the model.`,
        { parameter: "reducedGravity", value: jet.reducedGravity, stage },
      ),
    ];
  }
  if (jet.reducedGravity < 0) {
    return [
      warning(
        "integral-positively-buoyant",
        "warning",
        "The discharge is lighter than the ambient water at the port; it rises and impact quantities do not apply.",
        { parameter: "reducedGravity", value: jet.reducedGravity, stage },
      ),
    ];
  }
  return [];
}

/** Impact and end-of-near-field numbers (centreline and flux-average dilution, plan distances), null without impact. */
function impactNumbers(jet: JetSource, impactHit: Float64Array | null, q0: number) {
  const impactDilution = impactHit ? centrelineDilution(impactHit[IQ], q0) : null;
  const impactFlux = impactHit ? impactHit[IQ] / q0 : null;
  // Mixing between impact and the end of the near field, on the growth Roberts et al. (1997) measured in
  // the same experiments (S_n/S_i = 2.6/1.6 over x_n − x_i = (9.0 − 2.4)·d·F, a secondary quotation): the
  // model stops at impact, and without it the integral chain would reach the edge with the impact dilution
  // alone. The impingement region's length scales with the source (d·F), not with a current-swept impact point.
  const impactDistance = impactHit ? planDistance(impactHit) : null;
  const nearFieldDilution = impactDilution === null ? null : impactDilution * ROBERTS_1997_NEAR_FIELD_GROWTH.dilution;
  const spreadLength = ROBERTS_1997_NEAR_FIELD_GROWTH.spreadLength * jet.diameter * Math.abs(jet.froude);
  const nearFieldDistance =
    impactDistance === null ? null : impactDistance + (Number.isFinite(spreadLength) ? spreadLength : 0);
  return { impactDilution, impactFlux, impactDistance, nearFieldDilution, nearFieldDistance };
}

/** Turns the integrator's run into the method result: events, warnings, numbers, notes. */
export function assembleIntegralResult(outcome: IntegralRunOutcome): NearFieldMethodResult {
  const { jet, column, params, run, log, q0, u0, includePath, path } = outcome;
  const warnings: ResultWarning[] = [];
  const notes: string[] = [];
  const text = outcome.text !== false;
  const logged = eventsFromLog(log, q0);
  const { events, returnHit, impactHit } = logged;
  let maxRise = logged.maxRise;
  // The jet may stop (surface, trap, limits) before its edge turns over: use the highest sample.
  if (!maxRise && path.length > 0) {
    notes.push("No turning point of the upper edge was located; the maximum rise is the highest sampled upper edge.");
    maxRise = highestSampledRise(path, q0);
  }
  if (maxRise) events.push(eventAt("max-rise", maxRise.s, maxRise.y, q0));

  warnings.push(...surfaceWarnings(column, logged));
  warnings.push(...earlyStopWarnings(outcome, events));
  warnings.push(...buoyancyWarnings(jet));
  if (!impactHit) {
    warnings.push(
      warning(
        "integral-no-impact",
        "warning",
        "The jet centreline did not reach the seabed; impact distance and dilution are not available.",
        {
          stage: STAGE,
        },
      ),
    );
  }
  if (!returnHit && jet.angle <= 0) {
    notes.push("The port does not point upward, so the centreline never rises above port level (no return point).");
  }
  warnings.push(
    ...entrainmentLeeCheung1990ValidityIssues({
      froude: jet.froude,
      angle: jet.angle,
      currentSpeed: params.currentSpeed,
      velocity: u0,
    }),
  );

  const { impactDilution, impactFlux, impactDistance, nearFieldDilution, nearFieldDistance } = impactNumbers(
    jet,
    impactHit,
    q0,
  );
  if (impactDilution !== null) {
    notes.push(NEAR_FIELD_GROWTH_NOTE);
  }
  notes.push(CENTRELINE_NOTE);
  if (text) {
    notes.push(
      `Integration: Dormand–Prince 5(4), ${run.steps} steps, ${run.rejected} rejected, ${run.evaluations} evaluations, stop: ${run.reason}.`,
    );
  }

  events.sort((a, b) => a.s - b.s);
  return {
    method: "integral",
    source: INTEGRAL_SOURCE,
    available: true,
    notAvailableReason: null,
    maxRiseHeight: maxRise ? maxRise.edge : null,
    maxRiseDistance: maxRise ? planDistance(maxRise.y) : null,
    returnDistance: returnHit ? planDistance(returnHit) : null,
    impactDistance,
    impactDilution,
    nearFieldDistance,
    nearFieldDilution,
    maxRiseDilution: maxRise ? centrelineDilution(maxRise.y[IQ], q0) : null,
    dilutionRange: impactDilution !== null ? [impactDilution, impactDilution / DILUTION_BIAS_FACTOR] : null,
    impactDilutionFluxAveraged: impactFlux,
    nearFieldDilutionFluxAveraged: nearFieldDilution === null ? null : nearFieldDilution * FLUX_AVERAGING_FACTOR,
    fluxAveragingFactor: FLUX_AVERAGING_FACTOR,
    entrainedFlow: impactHit ? impactHit[IQ] - q0 : null,
    bias: INTEGRAL_BIAS,
    warnings,
    path: includePath ? path.decimate() : undefined,
    events,
    notes: text ? notes : [],
  };
}
