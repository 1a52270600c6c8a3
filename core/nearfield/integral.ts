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
import { EventLog, integrateAdaptive, type AdaptiveResult, type StepCallback } from "../ode/adaptive";
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
  integralJetRhs,
  profileAt,
  type IntegralParams,
} from "./integral-rhs";
import { IntegralPathBuffer } from "./integral-path";
import { assembleIntegralResult, invalidIntegralResult, type IntegralStopKind } from "./integral-result";
import { integralEventsFor } from "./integral-events";
import { integralInitialState, integralParamsFrom } from "./integral-setup";
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
  /**
   * Build the `notes` (default true). Study loops that read only numbers and warnings turn it off: the same
   * numbers, warnings, events, bias and path, with `notes` empty.
   */
  text?: boolean;
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
const sharedAtol = new Float64Array(INTEGRAL_DIM);
const sharedLog = new EventLog(INTEGRAL_DIM);

const POSITIVE_INPUTS = ["diameter", "velocity"] as const;

/** The result for inputs the model cannot run with (see invalidIntegralResult), or null when they are fine. */
function invalidInputResult(jet: JetSource, column: AmbientColumn): NearFieldMethodResult | null {
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
  return null;
}

/** The integrator's working set for one solve: the shared one when free, else a fresh one (a nested solve). */
interface SolverSet {
  readonly stepper: Stepper<IntegralParams>;
  /** Per-component absolute tolerance. */
  readonly atol: Float64Array;
  readonly log: EventLog;
  readonly shared: boolean;
}

function takeSolverSet(): SolverSet {
  let stepper = sharedStepper;
  if (!stepper || stepperBusy) stepper = stepperDormandPrince45(integralJetRhs, INTEGRAL_DIM);
  if (!sharedStepper) sharedStepper = stepper;
  const shared = stepper === sharedStepper;
  return {
    stepper,
    atol: shared ? sharedAtol : new Float64Array(INTEGRAL_DIM),
    log: shared ? sharedLog : new EventLog(INTEGRAL_DIM),
    shared,
  };
}

/** Fills the per-component absolute tolerance: `absTol` times each variable's source scale. */
function fillAbsoluteTolerance(atol: Float64Array, y0: Float64Array, absTol: number, d: number, u0: number): void {
  const q0 = y0[IQ];
  const m0 = q0 * u0;
  const bScale = Math.abs(y0[IB]) > 0 ? Math.abs(y0[IB]) : q0 * 1e-3;
  const cScale = Math.abs(y0[IC]) > 0 ? Math.abs(y0[IC]) : q0;
  atol[IX] = atol[IY] = atol[IZ] = absTol * d;
  atol[IQ] = absTol * q0;
  atol[IMX] = atol[IMY] = atol[IMZ] = absTol * m0;
  atol[IB] = absTol * bScale;
  atol[IC] = absTol * cScale;
}

/** Path recording and the passive-layer / trapped checks, run on every accepted step. */
interface StepMonitor {
  /** Records a state in the path and passes it to the sink. */
  readonly record: (s: number, y: Float64Array) => void;
  /** The integrator's step callback: records, then stops the run when the jet is trapped or passive. */
  readonly onStep: StepCallback;
  /** Why the monitor stopped the run, if it did. */
  readonly stop: { kind: IntegralStopKind };
}

function stepMonitor(
  jet: JetSource,
  params: IntegralParams,
  path: IntegralPathBuffer,
  sink: PathSink | undefined,
): StepMonitor {
  const stop: { kind: IntegralStopKind } = { kind: null };
  const u0 = jet.velocity;
  const record = (s: number, y: Float64Array) => {
    const i = path.pushState(s, y);
    sink?.sample(s, y[IX], y[IY], y[IZ], path.b[i], path.dilution[i]);
  };
  let lastGSign = Math.sign(jet.reducedGravity);
  let neutralCrossings = 0;
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
        stop.kind = "trapped";
        return false;
      }
    }
    // Momentum excess exhausted: the jet has become a passive layer (or a fountain has stalled).
    if (vRel < 1e-3 * u0) {
      stop.kind = "passive-layer";
      return false;
    }
    return true;
  };
  return { record, onStep, stop };
}

/** Runs the integral jet model for one port (or equivalent merged port). Never throws. */
export function nearFieldIntegral(
  jet: JetSource,
  column: AmbientColumn,
  options: IntegralOptions = {},
): NearFieldMethodResult {
  const invalid = invalidInputResult(jet, column);
  if (invalid) return invalid;

  const params = integralParamsFrom(jet, column);
  const y0 = integralInitialState(jet, column, params);
  const q0 = y0[IQ];
  const d = jet.diameter;
  const u0 = jet.velocity;
  const rtol = options.relTol ?? INTEGRAL_DEFAULT_REL_TOL;
  const absTol = options.absTol ?? INTEGRAL_DEFAULT_ABS_TOL;
  const maxSteps = options.maxSteps ?? DEFAULT_MAX_STEPS;
  const maxLength = options.maxLength ?? Math.max(2000, 200 * column.depth);
  const includePath = options.includePath ?? true;
  const sink = options.sink;

  const { stepper, atol, log, shared } = takeSolverSet();
  fillAbsoluteTolerance(atol, y0, absTol, d, u0);
  const events = integralEventsFor(jet.reducedGravity, params);
  // A nested solve (started from a sink callback) gets its own path buffer, so it cannot overwrite the outer path.
  const path = shared ? sharedPath : new IntegralPathBuffer();
  path.reset();
  path.q0 = q0;
  const monitor = stepMonitor(jet, params, path, sink);

  if (shared) stepperBusy = true;

  sink?.begin(256);
  monitor.record(0, y0);
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
        monitor.onStep,
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
      stopKind: monitor.stop.kind,
      q0,
      u0,
      includePath,
      path,
      maxSteps,
      maxLength,
      text: options.text !== false,
    });
  } finally {
    if (shared) stepperBusy = false;
  }
  return withAngleBias(result, jet, options.text !== false);
}

let computingBias = false;
/** Bias statements by port angle (the text depends only on the angle); bounded, cleared when full. */
const statementByAngle = new Map<number, string>();

/**
 * Adds the angle-dependent bias statement and dilution range (see integral-bias.ts) to the result just
 * assembled (a fresh object, so it is completed in place); never recurses twice.
 */
function withAngleBias(result: NearFieldMethodResult, jet: JetSource, text: boolean): NearFieldMethodResult {
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
    if (text)
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
