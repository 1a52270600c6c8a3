/**
 * The integral model's events (indices EV_… of ./integral-setup) and their functions: return to port level,
 * seabed contact and centreline impact, surface contact, the upper edge's turning point (maximum rise), the
 * axis levelling off and the entrainment switch (kinks of the right-hand side, where the driver restarts),
 * and the trap level of a rising discharge in stratified water.
 */
import type { EventSet, EventSpec } from "../ode/adaptive";
import {
  IB,
  IMZ,
  INTEGRAL_DIM,
  IQ,
  IZ,
  entrainmentSwitch,
  integralJetRhs,
  profileAt,
  upperEdgeSlope,
  verticalHalfExtent,
  type IntegralParams,
} from "./integral-rhs";
import {
  EV_IMPACT,
  EV_MAX_RISE,
  EV_NEUTRAL,
  EV_RETURN,
  EV_SEABED_EDGE,
  EV_SURFACE_CENTRE,
  EV_SURFACE_EDGE,
  EV_TOP,
  EV_ENTRAINMENT_SWITCH,
} from "./integral-setup";

const scratchDy = new Float64Array(INTEGRAL_DIM);

/** The model's events, by index EV_… of ./integral-setup. */
const SPECS: EventSpec[] = [];
SPECS[EV_RETURN] = { direction: -1, terminal: false };
SPECS[EV_SEABED_EDGE] = { direction: -1, terminal: false };
SPECS[EV_IMPACT] = { direction: -1, terminal: true };
SPECS[EV_SURFACE_EDGE] = { direction: -1, terminal: false };
SPECS[EV_SURFACE_CENTRE] = { direction: -1, terminal: true };
// Turning point of the upper edge: its slope, from dy (the driver's dense-output derivative inside a step).
SPECS[EV_MAX_RISE] = { direction: -1, terminal: false, slope: true };
// The closure's buoyancy term depends on max(0, −t_z): the RHS has a kink where the axis levels off.
SPECS[EV_TOP] = { direction: 0, terminal: false, restart: true };
/** With a current, also where the closure switches between shear and forced entrainment (another kink). */
const SPECS_WITH_CURRENT: EventSpec[] = [...SPECS];
SPECS_WITH_CURRENT[EV_ENTRAINMENT_SWITCH] = {
  direction: 0,
  terminal: false,
  restart: true,
};

/**
 * Every event function at once, sharing the geometry (one |M⃗|, one radius); the surface lies portDepth
 * above the port, the seabed portHeight below it. Module scope: a solve builds no closures.
 */
function eventValues(
  s: number,
  y: Float64Array,
  p: IntegralParams,
  dy: Float64Array | undefined,
  out: Float64Array,
  only = -1,
): void {
  const z = y[IZ];
  if (only >= 0) {
    // Root search: just that event's value, by the same expression as below (the same number).
    if (only === EV_RETURN) out[EV_RETURN] = z;
    else if (only === EV_SEABED_EDGE) out[EV_SEABED_EDGE] = z - verticalHalfExtent(y) + p.portHeight;
    else if (only === EV_IMPACT) out[EV_IMPACT] = z + p.portHeight;
    else if (only === EV_SURFACE_EDGE) out[EV_SURFACE_EDGE] = p.portDepth - (z + verticalHalfExtent(y));
    else if (only === EV_SURFACE_CENTRE) out[EV_SURFACE_CENTRE] = p.portDepth - z;
    else if (only === EV_MAX_RISE) out[EV_MAX_RISE] = maxRiseValue(s, y, p, dy);
    else if (only === EV_TOP) out[EV_TOP] = y[IMZ];
    else if (only === EV_NEUTRAL) out[EV_NEUTRAL] = neutralBuoyancy(y, p);
    else out[EV_ENTRAINMENT_SWITCH] = entrainmentSwitch(y, p);
    return;
  }
  const half = verticalHalfExtent(y);
  out[EV_RETURN] = z;
  out[EV_SEABED_EDGE] = z - half + p.portHeight;
  out[EV_IMPACT] = z + p.portHeight;
  out[EV_SURFACE_EDGE] = p.portDepth - (z + half);
  out[EV_SURFACE_CENTRE] = p.portDepth - z;
  out[EV_MAX_RISE] = maxRiseValue(s, y, p, dy);
  out[EV_TOP] = y[IMZ];
  if (out.length > EV_ENTRAINMENT_SWITCH) out[EV_ENTRAINMENT_SWITCH] = entrainmentSwitch(y, p);
  if (out.length > EV_NEUTRAL) out[EV_NEUTRAL] = neutralBuoyancy(y, p);
}

/** The upper edge's slope (zero at the maximum rise), from dy when given, else from the right-hand side. */
function maxRiseValue(s: number, y: Float64Array, p: IntegralParams, dy: Float64Array | undefined): number {
  if (dy) return upperEdgeSlope(y, dy);
  integralJetRhs(s, y, scratchDy, p);
  return upperEdgeSlope(y, scratchDy);
}

/** The centreline's reduced gravity relative to the water at its level: zero at the trap level. */
function neutralBuoyancy(y: Float64Array, p: IntegralParams): number {
  return y[IB] / y[IQ] - profileAt(p.depths, p.epsilon, p.portDepth - y[IZ]);
}

/** dg/dt of the restart events (the top's only: the entrainment switch is located after the fact). */
function eventRates(_s: number, _y: Float64Array, _p: IntegralParams, dy: Float64Array, out: Float64Array): void {
  out[EV_TOP] = dy[IMZ];
  if (out.length > EV_ENTRAINMENT_SWITCH) out[EV_ENTRAINMENT_SWITCH] = Number.NaN;
  if (out.length > EV_NEUTRAL) out[EV_NEUTRAL] = Number.NaN;
}

const EVENTS: EventSet<IntegralParams> = {
  specs: SPECS,
  values: eventValues,
  rates: eventRates,
};
const EVENTS_WITH_CURRENT: EventSet<IntegralParams> = {
  specs: SPECS_WITH_CURRENT,
  values: eventValues,
  rates: eventRates,
};
/** A rising discharge in stratified water also locates the trap level (the entrainment switch stays in: with
 * no current it never changes sign). */
const SPECS_RISING_STRATIFIED: EventSpec[] = [...SPECS_WITH_CURRENT];
SPECS_RISING_STRATIFIED[EV_NEUTRAL] = { direction: 0, terminal: false };
const EVENTS_RISING_STRATIFIED: EventSet<IntegralParams> = {
  specs: SPECS_RISING_STRATIFIED,
  values: eventValues,
  rates: eventRates,
};

/**
 * The events a solve watches: a rising discharge in stratified water also locates where its buoyancy
 * changes sign (the trap level); with a current, the entrainment switch is a restart event too.
 */
export function integralEventsFor(reducedGravity: number, params: IntegralParams): EventSet<IntegralParams> {
  return reducedGravity <= 0 && params.stratified
    ? EVENTS_RISING_STRATIFIED
    : params.currentSpeed > 0
      ? EVENTS_WITH_CURRENT
      : EVENTS;
}
