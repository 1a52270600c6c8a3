/**
 * Near-field Method 2: the integral (entrainment) jet model.
 *
 * Integrates the round buoyant-jet conservation equations (./integral-rhs) with the Lee & Cheung
 * (1990) entrainment closure, adaptive Dormand–Prince 5(4) and event location, from the port to
 * the point where the centreline reaches the seabed. Profiles are top-hat; the result reports the
 * CENTRELINE (minimum) dilution, converted from the flux-average (top-hat) dilution by the Gaussian
 * profile factor (see `CENTRELINE_PROFILE_FACTOR`). Numbers are reported uncorrected; the
 * documented under-prediction of this class of model is stated in `bias` and `dilutionRange`.
 *
 * Start conditions: top-hat radius d/2, velocity U along the port axis, no zone-of-flow-
 * establishment length (its ≈ 6 d is small against the dF scales of brine jets; it is absorbed in
 * the max(1, ·) floor of the centreline dilution near the port).
 */
import { EventLog, integrateAdaptive, type AdaptiveResult, type EventSet, type EventSpec } from "../ode/adaptive";
import { stepperDormandPrince45 } from "../ode/dormand-prince-45";
import type { Stepper } from "../ode/stepper";
import {
  IB,
  IC,
  IMX,
  IMY,
  IMZ,
  INTEGRAL_DIM,
  IQ,
  IX,
  IY,
  IZ,
  entrainmentSwitch,
  integralJetRhs,
  profileAt,
  upperEdgeSlope,
  verticalHalfExtent,
  type IntegralParams,
} from "./integral-rhs";
import { IntegralPathBuffer } from "./integral-path";
import { assembleIntegralResult, invalidIntegralResult } from "./integral-result";
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
  integralInitialState,
  integralParamsFrom,
} from "./integral-setup";
import type { AmbientColumn, JetSource, NearFieldMethodResult, PathSink } from "./types";
import {
  integralBiasByAngle,
  integralBiasRatioAtAngle,
  integralBiasStatement,
  type IntegralBiasPoint,
} from "./integral-bias";

export {
  CENTRELINE_PROFILE_FACTOR,
  INTEGRAL_BIAS,
  INTEGRAL_SOURCE,
  TRACER_WIDTH_RATIO,
  centrelineDilution,
  integralInitialState,
  integralParamsFrom,
} from "./integral-setup";

export interface IntegralOptions {
  sink?: PathSink;
  /** Include the decimated path in the result (default true). */
  includePath?: boolean;
  /** Relative tolerance of the integrator (default 3e-8; `brinefield bench` prints the accuracy study behind it). */
  relTol?: number;
  /** Absolute tolerance, relative to each variable's source scale (default 3e-10). */
  absTol?: number;
  /** Maximum accepted steps (default 5000). */
  maxSteps?: number;
  /** Maximum centreline length, m (default max(2000 m, 200·depth)). */
  maxLength?: number;
}

export const INTEGRAL_DEFAULT_REL_TOL = 3e-8;
export const INTEGRAL_DEFAULT_ABS_TOL = 3e-10;
const DEFAULT_MAX_STEPS = 5000;

// Module-scope scratch: one stepper and one path buffer reused across solves.
let sharedStepper: Stepper<IntegralParams> | null = null;
let stepperBusy = false;
const sharedPath = new IntegralPathBuffer();
const scratchDy = new Float64Array(INTEGRAL_DIM);
const sharedAtol = new Float64Array(INTEGRAL_DIM);
const sharedLog = new EventLog(INTEGRAL_DIM);

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
  if (only >= 0 && only !== EV_SEABED_EDGE && only !== EV_SURFACE_EDGE && only !== EV_MAX_RISE) {
    // Root search on a cheap event: just that value.
    if (only === EV_RETURN) out[EV_RETURN] = z;
    else if (only === EV_IMPACT) out[EV_IMPACT] = z + p.portHeight;
    else if (only === EV_SURFACE_CENTRE) out[EV_SURFACE_CENTRE] = p.portDepth - z;
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
  if (dy) out[EV_MAX_RISE] = upperEdgeSlope(y, dy);
  else {
    integralJetRhs(s, y, scratchDy, p);
    out[EV_MAX_RISE] = upperEdgeSlope(y, scratchDy);
  }
  out[EV_TOP] = y[IMZ];
  if (out.length > EV_ENTRAINMENT_SWITCH) out[EV_ENTRAINMENT_SWITCH] = entrainmentSwitch(y, p);
  if (out.length > EV_NEUTRAL) out[EV_NEUTRAL] = neutralBuoyancy(y, p);
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

const POSITIVE_INPUTS = ["diameter", "velocity"] as const;

/** Runs the integral jet model for one port (or equivalent merged port). Never throws. */
export function nearFieldIntegral(
  jet: JetSource,
  column: AmbientColumn,
  options: IntegralOptions = {},
): NearFieldMethodResult {
  for (const k of POSITIVE_INPUTS) {
    const v = jet[k];
    if (!(v > 0) || !Number.isFinite(v))
      return invalidIntegralResult(`Port ${k} must be positive and finite (got ${v}).`, v, k);
  }
  if (!Number.isFinite(jet.reducedGravity)) {
    return invalidIntegralResult("Reduced gravity must be finite.", jet.reducedGravity, "reducedGravity");
  }
  const portHeight = jet.portHeight;
  const surfaceAbovePort = column.depth - portHeight;
  if (!(portHeight >= 0) || !(surfaceAbovePort > 0)) {
    return invalidIntegralResult(
      `Port height ${portHeight} m must lie between the seabed and the surface (depth ${column.depth} m).`,
      portHeight,
      "portHeight",
    );
  }
  if (column.depths.length < 1 || column.densities.length !== column.depths.length) {
    return invalidIntegralResult(
      "Ambient profile needs matching depths and densities.",
      column.depths.length,
      "column",
    );
  }

  const params = integralParamsFrom(jet, column);
  const y0 = integralInitialState(jet, column, params);
  const q0 = y0[IQ];
  const m0 = q0 * jet.velocity;
  const d = jet.diameter;
  const u0 = jet.velocity;
  const rtol = options.relTol ?? INTEGRAL_DEFAULT_REL_TOL;
  const absTol = options.absTol ?? INTEGRAL_DEFAULT_ABS_TOL;
  const maxSteps = options.maxSteps ?? DEFAULT_MAX_STEPS;
  const maxLength = options.maxLength ?? Math.max(2000, 200 * column.depth);
  const includePath = options.includePath ?? true;
  const sink = options.sink;

  let stepper = sharedStepper;
  if (!stepper || stepperBusy) stepper = stepperDormandPrince45(integralJetRhs, INTEGRAL_DIM);
  if (!sharedStepper) sharedStepper = stepper;
  const usingShared = stepper === sharedStepper;

  // Per-component absolute tolerance, scaled by the source value of each variable.
  const atol = usingShared ? sharedAtol : new Float64Array(INTEGRAL_DIM);
  const log = usingShared ? sharedLog : new EventLog(INTEGRAL_DIM);
  const bScale = Math.abs(y0[IB]) > 0 ? Math.abs(y0[IB]) : q0 * 1e-3;
  const cScale = Math.abs(y0[IC]) > 0 ? Math.abs(y0[IC]) : q0;
  atol[IX] = atol[IY] = atol[IZ] = absTol * d;
  atol[IQ] = absTol * q0;
  atol[IMX] = atol[IMY] = atol[IMZ] = absTol * m0;
  atol[IB] = absTol * bScale;
  atol[IC] = absTol * cScale;

  // A rising discharge in stratified water: locate where its buoyancy changes sign (the trap level).
  const events =
    jet.reducedGravity <= 0 && params.stratified
      ? EVENTS_RISING_STRATIFIED
      : params.currentSpeed > 0
        ? EVENTS_WITH_CURRENT
        : EVENTS;

  // Path recording and passive / trapped detection on every accepted step.
  const path = sharedPath;
  path.reset();
  path.q0 = q0;
  const record = (s: number, y: Float64Array) => {
    const i = path.pushState(s, y);
    sink?.sample(s, y[IX], y[IY], y[IZ], path.b[i], path.dilution[i]);
  };
  let lastGSign = Math.sign(jet.reducedGravity);
  let neutralCrossings = 0;
  let stopKind: "passive-layer" | "trapped" | null = null;
  const ua = params.currentSpeed;
  const onStep = (s: number, y: Float64Array): boolean => {
    record(s, y);
    const q = y[IQ];
    const vx = y[IMX] / q - ua * params.currentX;
    const vy = y[IMY] / q - ua * params.currentY;
    const vz = y[IMZ] / q;
    const vRel = Math.sqrt(vx * vx + vy * vy + vz * vz);
    if (params.stratified) {
      // Sign of the local reduced gravity g′ = B/Q − ε(z) (the RHS's buoyancy term, without the RHS).
      const sgn = Math.sign(y[IB] / q - profileAt(params.depths, params.epsilon, params.portDepth - y[IZ]));
      if (sgn !== 0 && lastGSign !== 0 && sgn !== lastGSign) neutralCrossings++;
      if (sgn !== 0) lastGSign = sgn;
      // Two crossings of the neutral level: the jet oscillates about it and spreads as a layer.
      if (neutralCrossings >= 2 || (neutralCrossings >= 1 && Math.abs(vz) < 1e-3 * u0)) {
        stopKind = "trapped";
        return false;
      }
    }
    // Momentum excess exhausted: the jet has become a passive layer (or a fountain has stalled).
    if (vRel < 1e-3 * u0) {
      stopKind = "passive-layer";
      return false;
    }
    return true;
  };

  if (usingShared) stepperBusy = true;

  sink?.begin(256);
  record(0, y0);
  // The stepper, tolerances and event log stay taken until the result is assembled from them.
  let result: NearFieldMethodResult;
  try {
    let run: AdaptiveResult;
    try {
      run = integrateAdaptive(
        stepper,
        integralJetRhs,
        params,
        0,
        y0,
        {
          rtol,
          atol,
          h0: 0.1 * d,
          hMin: 1e-12 * Math.max(d, 1),
          hMax: Math.max(maxLength / 20, d),
          maxSteps,
          tMax: maxLength,
          eventLog: log,
        },
        events,
        onStep,
      );
    } finally {
      sink?.end();
    }
    result = assembleIntegralResult({
      jet,
      column,
      params,
      run,
      log,
      stopKind,
      q0,
      u0,
      includePath,
      path,
      maxSteps,
      maxLength,
    });
  } finally {
    if (usingShared) stepperBusy = false;
  }
  return withAngleBias(result, jet);
}

let computingBias = false;
/** Bias statements by port angle (the text depends only on the angle); bounded, cleared when full. */
const statementByAngle = new Map<number, string>();

/**
 * Adds the angle-dependent bias statement and dilution range (see integral-bias.ts) to the result just
 * assembled (a fresh object, so it is completed in place); never recurses twice.
 */
function withAngleBias(result: NearFieldMethodResult, jet: JetSource): NearFieldMethodResult {
  if (computingBias) return result;
  let points: readonly IntegralBiasPoint[];
  computingBias = true;
  try {
    points = integralBiasByAngle(nearFieldIntegral);
  } finally {
    computingBias = false;
  }
  const at = integralBiasRatioAtAngle(points, jet.angle);
  const si = result.impactDilution;
  const out = result as Mutable<NearFieldMethodResult>;
  const notes = (out.notes ??= []) as string[];
  if (si !== null && at) {
    const ratio = Math.min(at.ratio, 1);
    out.dilutionRange = [si, Math.max(si, si / ratio)];
    notes.push(
      `dilutionRange: low = the computed centreline impact dilution; high = computed ÷ ${ratio.toFixed(2)}, ` +
        (at.covered
          ? "the model ÷ published ratio at this angle against Lai & Lee's (2012) 1.06·F."
          : "the lowest model ÷ published ratio over 38°–60° (no published impact dilution at this angle is held)."),
    );
  }
  let statement = statementByAngle.get(jet.angle);
  if (statement === undefined) {
    statement = integralBiasStatement(points, jet.angle);
    if (statementByAngle.size >= 256) statementByAngle.clear();
    statementByAngle.set(jet.angle, statement);
  }
  out.bias = statement;
  return result;
}

type Mutable<T> = { -readonly [K in keyof T]: T[K] };
