/**
 * Near-field Method 2: the integral (entrainment) jet model.
 *
 * Integrates the round buoyant-jet conservation equations (./integralRhs) with the Lee & Cheung
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
import { integrateAdaptive, type AdaptiveResult, type OdeEvent } from "../ode/adaptive";
import { stepperDormandPrince45 } from "../ode/dormandPrince45";
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
  integralJetRhs,
  profileAt,
  radiusFromState,
  upperEdgeSlope,
  verticalHalfExtent,
  type IntegralParams,
} from "./integralRhs";
import { IntegralPathBuffer } from "./integralPath";
import { assembleIntegralResult, invalidIntegralResult } from "./integralResult";
import {
  EV_IMPACT,
  EV_MAX_RISE,
  EV_NEUTRAL,
  EV_RETURN,
  EV_SEABED_EDGE,
  EV_SURFACE_CENTRE,
  EV_SURFACE_EDGE,
  centrelineDilution,
  integralInitialState,
  integralParamsFrom,
} from "./integralSetup";
import type { AmbientColumn, JetSource, NearFieldMethodResult, PathSink } from "./types";
import { integralBiasByAngle, integralBiasRatioAtAngle, integralBiasStatement, type IntegralBiasPoint } from "./integralBias";

export {
  CENTRELINE_PROFILE_FACTOR,
  INTEGRAL_BIAS,
  INTEGRAL_SOURCE,
  TRACER_WIDTH_RATIO,
  centrelineDilution,
  integralInitialState,
  integralParamsFrom,
} from "./integralSetup";

export interface IntegralOptions {
  sink?: PathSink;
  /** Include the decimated path in the result (default true). */
  includePath?: boolean;
  /** Relative tolerance of the integrator (default 1e-8). */
  relTol?: number;
  /** Absolute tolerance, relative to each variable's source scale (default 1e-10). */
  absTol?: number;
  /** Maximum accepted steps (default 5000). */
  maxSteps?: number;
  /** Maximum centreline length, m (default max(2000 m, 200·depth)). */
  maxLength?: number;
}

export const INTEGRAL_DEFAULT_REL_TOL = 1e-8;
export const INTEGRAL_DEFAULT_ABS_TOL = 1e-10;
const DEFAULT_MAX_STEPS = 5000;

// Module-scope scratch: one stepper and one path buffer reused across solves.
let sharedStepper: Stepper<IntegralParams> | null = null;
let stepperBusy = false;
const sharedPath = new IntegralPathBuffer();
const scratchDy = new Float64Array(INTEGRAL_DIM);

/** Runs the integral jet model for one port (or equivalent merged port). Never throws. */
export function nearFieldIntegral(
  jet: JetSource,
  column: AmbientColumn,
  options: IntegralOptions = {},
): NearFieldMethodResult {
  for (const [k, v] of [
    ["diameter", jet.diameter],
    ["velocity", jet.velocity],
  ] as const) {
    if (!(v > 0) || !Number.isFinite(v)) return invalidIntegralResult(`Port ${k} must be positive and finite (got ${v}).`, v, k);
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
    return invalidIntegralResult("Ambient profile needs matching depths and densities.", column.depths.length, "column");
  }

  const params = integralParamsFrom(jet, column);
  const y0 = integralInitialState(jet, column);
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

  // Per-component absolute tolerance, scaled by the source value of each variable.
  const atol = new Float64Array(INTEGRAL_DIM);
  const bScale = Math.abs(y0[IB]) > 0 ? Math.abs(y0[IB]) : q0 * 1e-3;
  const cScale = Math.abs(y0[IC]) > 0 ? Math.abs(y0[IC]) : q0;
  atol[IX] = atol[IY] = atol[IZ] = absTol * d;
  atol[IQ] = absTol * q0;
  atol[IMX] = atol[IMY] = atol[IMZ] = absTol * m0;
  atol[IB] = absTol * bScale;
  atol[IC] = absTol * cScale;

  const events: OdeEvent<IntegralParams>[] = [];
  events[EV_RETURN] = { fn: (_s, y) => y[IZ], direction: -1, terminal: false };
  events[EV_SEABED_EDGE] = {
    fn: (_s, y) => y[IZ] - verticalHalfExtent(y) + portHeight,
    direction: -1,
    terminal: false,
  };
  events[EV_IMPACT] = { fn: (_s, y) => y[IZ] + portHeight, direction: -1, terminal: true };
  events[EV_SURFACE_EDGE] = {
    fn: (_s, y) => surfaceAbovePort - (y[IZ] + verticalHalfExtent(y)),
    direction: -1,
    terminal: false,
  };
  events[EV_SURFACE_CENTRE] = { fn: (_s, y) => surfaceAbovePort - y[IZ], direction: -1, terminal: true };
  events[EV_MAX_RISE] = {
    fn: (s, y, p, dy) => {
      if (dy) return upperEdgeSlope(y, dy);
      integralJetRhs(s, y, scratchDy, p);
      return upperEdgeSlope(y, scratchDy);
    },
    direction: -1,
    terminal: false,
  };

  // A rising discharge in stratified water: locate where its buoyancy changes sign (the trap level).
  if (jet.reducedGravity <= 0 && params.stratified) {
    events[EV_NEUTRAL] = {
      fn: (_s, y, p) => y[IB] / y[IQ] - profileAt(p.depths, p.epsilon, p.portDepth - y[IZ]),
      direction: 0,
      terminal: false,
    };
  }

  // Path recording and passive / trapped detection on every accepted step.
  const path = sharedPath;
  path.reset();
  const record = (s: number, y: Float64Array) => {
    const b = radiusFromState(y);
    const dil = centrelineDilution(y[IQ], q0);
    path.push(s, y[IX], y[IY], y[IZ], b, dil, y[IZ] + verticalHalfExtent(y));
    sink?.sample(s, y[IX], y[IY], y[IZ], b, dil);
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
      integralJetRhs(s, y, scratchDy, params);
      // g′ sign from dMz/ds = −π b² g′.
      const sgn = Math.sign(-scratchDy[IMZ]);
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

  let stepper = sharedStepper;
  if (!stepper || stepperBusy) stepper = stepperDormandPrince45(integralJetRhs, INTEGRAL_DIM);
  if (!sharedStepper) sharedStepper = stepper;
  const usingShared = stepper === sharedStepper;
  if (usingShared) stepperBusy = true;

  sink?.begin(256);
  record(0, y0);
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
      },
      events,
      onStep,
    );
  } finally {
    if (usingShared) stepperBusy = false;
    sink?.end();
  }

  const result = assembleIntegralResult(jet, column, params, run, stopKind, q0, u0, includePath, path, maxSteps, maxLength);
  return withAngleBias(result, jet);
}

let computingBias = false;
/** Adds the angle-dependent bias statement and dilution range (see integralBias.ts); never recurses twice. */
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
  const notes = [...(result.notes ?? [])];
  let dilutionRange = result.dilutionRange;
  if (si !== null && at) {
    const high = si / Math.min(at.ratio, 1);
    dilutionRange = [si, Math.max(si, high)];
    notes.push(
      `dilutionRange: low = the computed centreline impact dilution; high = computed ÷ ${Math.min(at.ratio, 1).toFixed(2)}, ` +
        (at.covered
          ? "the model ÷ published ratio at this angle against Lai & Lee's (2012) 1.06·F."
          : "the lowest model ÷ published ratio over 38°–60° (no published impact dilution at this angle is held)."),
    );
  }
  return { ...result, bias: integralBiasStatement(points, jet.angle), dilutionRange, notes };
}
