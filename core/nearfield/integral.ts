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
import { warning, type ResultWarning } from "../warnings";
import {
  ENTRAINMENT_LEE_CHEUNG_1990_SOURCE,
  entrainmentLeeCheung1990ValidityIssues,
} from "../correlations/entrainmentLeeCheung1990";
import { integrateAdaptive, type OdeEvent, type AdaptiveResult } from "../ode/adaptive";
import { stepperDormandPrince45 } from "../ode/dormandPrince45";
import type { Stepper } from "../ode/stepper";
import {
  IB,
  IC,
  INTEGRAL_DIM,
  IMX,
  IMY,
  IMZ,
  IQ,
  IX,
  IY,
  IZ,
  integralJetRhs,
  radiusFromState,
  upperEdgeSlope,
  verticalHalfExtent,
  type IntegralParams,
} from "./integralRhs";
import type {
  AmbientColumn,
  JetSource,
  NearFieldEvent,
  NearFieldMethodResult,
  PathPoint,
  PathSink,
} from "./types";

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
const PATH_POINTS = 200;
const G = 9.80665; // standard gravity, m/s² (CGPM 1901)

/** Gaussian tracer-to-velocity width ratio λ (Fischer et al. 1979: 0.127/0.107 jet, 0.12/0.10 plume; FROM MEMORY). */
export const TRACER_WIDTH_RATIO = 1.2;
/**
 * Flux-average ÷ centreline concentration for Gaussian profiles with width ratio λ:
 * c̄ = ∫u c dA / ∫u dA = c_c·λ²/(1 + λ²) = 0.590 c_c (DERIVED). Top-hat dilution Q/Q0 is the
 * flux-average dilution, so centreline dilution S_c = (Q/Q0)·λ²/(1 + λ²). Fischer et al. (1979)
 * plume constants give the same ratio: μ = 0.15 vs centreline 1/11 = 0.091 → 0.61.
 */
export const CENTRELINE_PROFILE_FACTOR = (TRACER_WIDTH_RATIO ** 2) / (1 + TRACER_WIDTH_RATIO ** 2);

/** Factor by which Lai & Lee (2012) found integral models under-predict dilution at max rise (~30 %). */
const DILUTION_BIAS_FACTOR = 0.7;

export const INTEGRAL_SOURCE =
  "Integral jet model: round buoyant-jet conservation equations, top-hat profiles, entrainment " +
  `closure of ${ENTRAINMENT_LEE_CHEUNG_1990_SOURCE}; centreline dilution via Gaussian profile factor ` +
  "λ²/(1+λ²), λ = 1.2 (Fischer et al. 1979)";

export const INTEGRAL_BIAS =
  "Integral (entrainment) models under-predict the maximum rise of inclined dense jets by about " +
  "10–15 % and the dilution at maximum rise by about 30 % compared with laboratory measurements " +
  "(Lai & Lee 2012), mainly because they ignore detrainment from the inner edge and re-entrainment. " +
  "The dilutions reported here are uncorrected and therefore expected to be conservative (low).";

// Module-scope scratch: one stepper reused across solves (allocation-free steady state).
let sharedStepper: Stepper<IntegralParams> | null = null;
let stepperBusy = false;
const scratchDy = new Float64Array(INTEGRAL_DIM);
let pathS = new Float64Array(512);
let pathX = new Float64Array(512);
let pathY = new Float64Array(512);
let pathZ = new Float64Array(512);
let pathB = new Float64Array(512);
let pathD = new Float64Array(512);
let pathE = new Float64Array(512); // upper-edge elevation z + b·√(1 − t_z²)

function growPath(): void {
  const grow = (a: Float64Array) => {
    const b = new Float64Array(a.length * 2);
    b.set(a);
    return b;
  };
  pathS = grow(pathS);
  pathX = grow(pathX);
  pathY = grow(pathY);
  pathZ = grow(pathZ);
  pathB = grow(pathB);
  pathD = grow(pathD);
  pathE = grow(pathE);
}

/** Builds the RHS parameters from the jet and the ambient column. */
export function integralParamsFrom(jet: JetSource, column: AmbientColumn): IntegralParams {
  const portDepth = column.depth - jet.portHeight;
  const n = column.depths.length;
  const depths = Float64Array.from(column.depths);
  const rho = Float64Array.from(column.densities);
  const sal = Float64Array.from(column.salinities.length === n ? column.salinities : column.depths.map(() => 0));
  // Ambient at port level by the same interpolation the RHS uses.
  const rho0 = interp(depths, rho, portDepth);
  const sal0 = interp(depths, sal, portDepth);
  const epsilon = new Float64Array(n);
  const salinityExcess = new Float64Array(n);
  let stratified = false;
  for (let i = 0; i < n; i++) {
    epsilon[i] = (G * (rho[i] - rho0)) / rho0;
    salinityExcess[i] = sal[i] - sal0;
    if (epsilon[i] !== 0 || salinityExcess[i] !== 0) stratified = true;
  }
  const dir = (column.currentDirection * Math.PI) / 180;
  const ua = Math.max(0, column.currentSpeed || 0);
  return {
    portDepth,
    depths,
    epsilon,
    salinityExcess,
    stratified,
    currentSpeed: ua,
    currentX: Math.sin(dir),
    currentY: Math.cos(dir),
  };
}

function interp(d: Float64Array, v: Float64Array, x: number): number {
  const n = d.length;
  if (n === 0) return 0;
  if (x <= d[0]) return v[0];
  if (x >= d[n - 1]) return v[n - 1];
  for (let i = 1; i < n; i++) {
    if (x <= d[i]) {
      const span = d[i] - d[i - 1];
      return span > 0 ? v[i - 1] + ((x - d[i - 1]) / span) * (v[i] - v[i - 1]) : v[i];
    }
  }
  return v[n - 1];
}

/** Initial state at the port: top-hat jet of diameter d, speed U along the port axis. */
export function integralInitialState(jet: JetSource, column: AmbientColumn): Float64Array {
  const y0 = new Float64Array(INTEGRAL_DIM);
  const th = (jet.angle * Math.PI) / 180;
  const az = (jet.azimuth * Math.PI) / 180;
  const q0 = jet.flow > 0 ? jet.flow : (jet.velocity * Math.PI * jet.diameter * jet.diameter) / 4;
  const u0 = jet.velocity;
  const m0 = q0 * u0;
  y0[IQ] = q0;
  y0[IMX] = m0 * Math.cos(th) * Math.sin(az);
  y0[IMY] = m0 * Math.cos(th) * Math.cos(az);
  y0[IMZ] = m0 * Math.sin(th);
  y0[IB] = q0 * jet.reducedGravity;
  const portDepth = column.depth - jet.portHeight;
  // A missing salinity profile counts as uniform (salinity excess then equals discharge − 0).
  const sal = column.salinities.length === column.depths.length ? column.salinities : column.depths.map(() => 0);
  const sal0 = interp(Float64Array.from(column.depths), Float64Array.from(sal), portDepth);
  y0[IC] = q0 * (jet.salinity - sal0);
  return y0;
}

/** Centreline (minimum) dilution from the volume-flux ratio Q/Q0. */
export function centrelineDilution(q: number, q0: number): number {
  const s = (q / q0) * CENTRELINE_PROFILE_FACTOR;
  // Within the first few diameters the Gaussian conversion does not hold (undiluted core).
  return s > 1 ? s : 1;
}

const EV_RETURN = 0;
const EV_SEABED_EDGE = 1;
const EV_IMPACT = 2;
const EV_SURFACE_EDGE = 3;
const EV_SURFACE_CENTRE = 4;
const EV_MAX_RISE = 5;

function invalidResult(message: string, value: number | undefined, parameter: string): NearFieldMethodResult {
  return {
    method: "integral",
    source: INTEGRAL_SOURCE,
    maxRiseHeight: null,
    maxRiseDistance: null,
    returnDistance: null,
    impactDistance: null,
    impactDilution: null,
    nearFieldDistance: null,
    nearFieldDilution: null,
    maxRiseDilution: null,
    dilutionRange: null,
    entrainedFlow: null,
    bias: INTEGRAL_BIAS,
    warnings: [warning("integral-invalid-input", "serious", message, { parameter, value, stage: "integral" })],
    path: [],
    events: [],
  };
}

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
    if (!(v > 0) || !Number.isFinite(v)) return invalidResult(`Port ${k} must be positive and finite (got ${v}).`, v, k);
  }
  if (!Number.isFinite(jet.reducedGravity)) {
    return invalidResult("Reduced gravity must be finite.", jet.reducedGravity, "reducedGravity");
  }
  const portHeight = jet.portHeight;
  const surfaceAbovePort = column.depth - portHeight;
  if (!(portHeight >= 0) || !(surfaceAbovePort > 0)) {
    return invalidResult(
      `Port height ${portHeight} m must lie between the seabed and the surface (depth ${column.depth} m).`,
      portHeight,
      "portHeight",
    );
  }
  if (column.depths.length < 1 || column.densities.length !== column.depths.length) {
    return invalidResult("Ambient profile needs matching depths and densities.", column.depths.length, "column");
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

  // Path recording and passive / trapped detection on every accepted step.
  let nPath = 0;
  const record = (s: number, y: Float64Array) => {
    if (nPath >= pathS.length) growPath();
    const b = radiusFromState(y);
    const dil = centrelineDilution(y[IQ], q0);
    pathS[nPath] = s;
    pathX[nPath] = y[IX];
    pathY[nPath] = y[IY];
    pathZ[nPath] = y[IZ];
    pathB[nPath] = b;
    pathD[nPath] = dil;
    pathE[nPath] = y[IZ] + verticalHalfExtent(y);
    nPath++;
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

  return assemble(jet, column, params, run, stopKind, q0, u0, includePath, nPath, maxSteps, maxLength);
}

function planDistance(y: Float64Array): number {
  return Math.hypot(y[IX], y[IY]);
}

function assemble(
  jet: JetSource,
  column: AmbientColumn,
  params: IntegralParams,
  run: AdaptiveResult,
  stopKind: "passive-layer" | "trapped" | null,
  q0: number,
  u0: number,
  includePath: boolean,
  nPath: number,
  maxSteps: number,
  maxLength: number,
): NearFieldMethodResult {
  const warnings: ResultWarning[] = [];
  const notes: string[] = [];
  const events: NearFieldEvent[] = [];
  const push = (kind: NearFieldEvent["kind"], s: number, y: Float64Array) => {
    events.push({ kind, s, x: y[IX], y: y[IY], z: y[IZ], dilution: centrelineDilution(y[IQ], q0) });
  };

  let returnHit: Float64Array | null = null;
  let impactHit: Float64Array | null = null;
  let maxRise: { s: number; y: Float64Array; edge: number } | null = null;
  let surfaceEdge = false;
  let surfaceCentre = false;
  let seabedEdge = false;
  for (const hit of run.events) {
    switch (hit.index) {
      case EV_RETURN:
        push("return-to-port-level", hit.t, hit.y);
        if (!returnHit) {
          returnHit = hit.y;
        }
        break;
      case EV_SEABED_EDGE:
        if (!seabedEdge) push("seabed-contact", hit.t, hit.y);
        seabedEdge = true;
        break;
      case EV_IMPACT:
        push("centreline-impact", hit.t, hit.y);
        impactHit = hit.y;
        break;
      case EV_SURFACE_EDGE:
        if (!surfaceEdge) push("surface-contact", hit.t, hit.y);
        surfaceEdge = true;
        break;
      case EV_SURFACE_CENTRE:
        surfaceCentre = true;
        push("surface-contact", hit.t, hit.y);
        break;
      case EV_MAX_RISE: {
        const edge = hit.y[IZ] + verticalHalfExtent(hit.y);
        if (!maxRise || edge > maxRise.edge) maxRise = { s: hit.t, y: hit.y, edge };
        break;
      }
    }
  }
  // The jet may stop (surface, trap, limits) before its edge turns over: use the highest sample.
  if (!maxRise && nPath > 0) {
    let iBest = 0;
    for (let i = 1; i < nPath; i++) if (pathE[i] > pathE[iBest]) iBest = i;
    notes.push(
      "No turning point of the upper edge was located; the maximum rise is the highest sampled upper edge.",
    );
    const y = new Float64Array(INTEGRAL_DIM);
    y[IX] = pathX[iBest];
    y[IY] = pathY[iBest];
    y[IZ] = pathZ[iBest];
    y[IQ] = Math.max(1, pathD[iBest] / CENTRELINE_PROFILE_FACTOR) * q0;
    maxRise = { s: pathS[iBest], y, edge: pathE[iBest] };
  }
  if (maxRise) {
    events.push({
      kind: "max-rise",
      s: maxRise.s,
      x: maxRise.y[IX],
      y: maxRise.y[IY],
      z: maxRise.y[IZ],
      dilution: centrelineDilution(maxRise.y[IQ], q0),
    });
  }

  const last = run.y;
  const stage = "integral";
  if (surfaceEdge || surfaceCentre) {
    warnings.push(
      warning(
        "jet-reaches-surface",
        surfaceCentre ? "serious" : "warning",
        surfaceCentre
          ? `The jet centreline reaches the surface ${column.depth.toFixed(1)} m above the seabed; the integral model stops there and its dilutions do not apply.`
          : "The upper edge of the jet reaches the water surface; surface interaction is not modelled and the rise and dilutions are approximate.",
        { parameter: "depth", value: column.depth, stage },
      ),
    );
  }
  if (stopKind === "trapped") {
    push("trapped", run.t, last);
    warnings.push(
      warning(
        "jet-trapped",
        "warning",
        `The jet is trapped by the ambient stratification at ${(params.portDepth - last[IZ]).toFixed(1)} m depth (neutral buoyancy with small vertical velocity); it spreads as a layer there instead of reaching the seabed.`,
        { parameter: "column.densities", stage },
      ),
    );
  } else if (stopKind === "passive-layer") {
    push("passive-layer", run.t, last);
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
    push("step-limit", run.t, last);
    warnings.push(
      warning("integral-step-limit", "warning", `The integrator stopped after ${maxSteps} steps without reaching the seabed.`, {
        parameter: "maxSteps",
        value: maxSteps,
        stage,
      }),
    );
  } else if (run.reason === "t-max") {
    push("length-limit", run.t, last);
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
  if (Math.abs(jet.froude) > 1000 || jet.reducedGravity === 0) {
    warnings.push(
      warning(
        "integral-near-neutral",
        "warning",
        `Near-neutral buoyancy (g′ = ${jet.reducedGravity.toPrecision(3)} m/s², F = ${Number.isFinite(jet.froude) ? jet.froude.toFixed(0) : "∞"}): the discharge behaves as a pure jet and may not return to the seabed within the model.`,
        { parameter: "reducedGravity", value: jet.reducedGravity, stage },
      ),
    );
  } else if (jet.reducedGravity < 0) {
    warnings.push(
      warning(
        "integral-positively-buoyant",
        "warning",
        "The discharge is lighter than the ambient water at the port; it rises and impact quantities do not apply.",
        { parameter: "reducedGravity", value: jet.reducedGravity, stage },
      ),
    );
  }
  if (!impactHit) {
    warnings.push(
      warning("integral-no-impact", "warning", "The jet centreline did not reach the seabed; impact distance and dilution are not available.", {
        stage,
      }),
    );
  }
  if (!returnHit && jet.angle <= 0) {
    notes.push("The port does not point upward, so the centreline never rises above port level (no return point).");
  }
  warnings.push(
    ...entrainmentLeeCheung1990ValidityIssues({
      froude: jet.froude,
      angleDeg: jet.angle,
      currentSpeed: params.currentSpeed,
      velocity: u0,
    }),
  );

  const impactDilution = impactHit ? centrelineDilution(impactHit[IQ], q0) : null;
  if (impactDilution !== null) {
    notes.push(
      `dilutionRange: low = the computed centreline impact dilution; high = computed ÷ ${DILUTION_BIAS_FACTOR}, ` +
        "the ~30 % under-prediction Lai & Lee (2012) found for integral-model dilution at maximum rise, " +
        "extrapolated to the impact point (an estimate, not a published impact correction).",
    );
  }
  notes.push(
    "Dilutions are centreline (minimum) values: flux-average (top-hat) dilution × λ²/(1+λ²) with λ = 1.2; " +
      "halfWidth is the top-hat radius (≈ √2 × the Gaussian 1/e velocity half-width).",
  );
  notes.push(`Integration: Dormand–Prince 5(4), ${run.steps} steps, ${run.rejected} rejected, ${run.evaluations} evaluations, stop: ${run.reason}.`);

  events.sort((a, b) => a.s - b.s);
  return {
    method: "integral",
    source: INTEGRAL_SOURCE,
    maxRiseHeight: maxRise ? maxRise.edge : null,
    maxRiseDistance: maxRise ? planDistance(maxRise.y) : null,
    returnDistance: returnHit ? planDistance(returnHit) : null,
    impactDistance: impactHit ? planDistance(impactHit) : null,
    impactDilution,
    nearFieldDistance: null,
    nearFieldDilution: null,
    maxRiseDilution: maxRise ? centrelineDilution(maxRise.y[IQ], q0) : null,
    dilutionRange: impactDilution !== null ? [impactDilution, impactDilution / DILUTION_BIAS_FACTOR] : null,
    entrainedFlow: impactHit ? impactHit[IQ] - q0 : null,
    bias: INTEGRAL_BIAS,
    warnings,
    path: includePath ? decimatePath(nPath) : undefined,
    events,
    notes,
  };
}

/** At most PATH_POINTS points of the recorded path, evenly by index, always keeping the ends. */
function decimatePath(n: number): PathPoint[] {
  const out: PathPoint[] = [];
  if (n === 0) return out;
  const take = (i: number) =>
    out.push({ s: pathS[i], x: pathX[i], y: pathY[i], z: pathZ[i], halfWidth: pathB[i], dilution: pathD[i] });
  if (n <= PATH_POINTS) {
    for (let i = 0; i < n; i++) take(i);
    return out;
  }
  const stride = (n - 1) / (PATH_POINTS - 1);
  let prev = -1;
  for (let k = 0; k < PATH_POINTS; k++) {
    const i = Math.round(k * stride);
    if (i !== prev) take(i);
    prev = i;
  }
  return out;
}
