/**
 * Adaptive integration driver: error-controlled step-size selection around any embedded
 * Runge–Kutta `Stepper`, with event location on the stepper's dense output, and hard guards
 * (maximum steps, maximum t, minimum step) so that it always returns.
 *
 * Step-size control: standard elementary controller h_new = h·min(5, max(0.2, 0.9·err^(−1/(q+1))))
 * with q the embedded (error) order, no growth right after a rejection (Hairer, Nørsett & Wanner
 * 1993, §II.4). Event location: Illinois (modified regula falsi) on g(t_old + θh, y(θ)) with the
 * dense output y(θ), to |Δt| ≤ 1e-12·max(1, |t|).
 *
 * Events that need the slope of the solution (`slope: true`) get the derivative of the dense output
 * during the root search, so the search never calls the right-hand side. Events marked `restart`
 * flag points where the right-hand side is not smooth (a kink in a closure): the step size is capped
 * so that a step ends at the predicted crossing (from `rate`, the event's dg/dt), and when a step
 * does cross, the rest of it is discarded and the integration restarts at the located point. Steps
 * then never straddle the kink, where the error estimate would reject them repeatedly and the
 * 5th-order accuracy is lost (Hairer, Nørsett & Wanner 1993, §II.6, "discontinuities").
 *
 * The inner loop allocates nothing: all vectors are created once per call; event hits (rare)
 * allocate their own state copies.
 */
import type { OdeRhs, Stepper } from "./stepper";
import { OdeEvent, EventSpec, EventSet, eventSetFrom, EventHit, EventLog } from "./events";
import { locateRoot } from "./locate-root";

export { EventLog } from "./events";
export type { OdeEvent, EventSpec, EventSet } from "./events";

export type StopReason = "t-max" | "event" | "max-steps" | "step-underflow" | "callback";

export interface AdaptiveOptions {
  readonly rtol: number;
  /** Absolute tolerance per component. */
  readonly atol: Float64Array;
  /** Initial step. */
  readonly h0: number;
  /** Smallest step allowed before giving up (returns "step-underflow"). */
  readonly hMin: number;
  readonly hMax: number;
  readonly maxSteps: number;
  readonly tMax: number;
  /** When given, event hits go here (reset at the start) and `AdaptiveResult.events` stays empty. */
  readonly eventLog?: EventLog;
}

export interface AdaptiveResult {
  readonly reason: StopReason;
  /** Final t and state (the terminal event's, when one stopped the run). */
  readonly t: number;
  readonly y: Float64Array;
  readonly steps: number;
  readonly rejected: number;
  /** Right-hand-side evaluations by the stepper during this run (event functions not counted). */
  readonly evaluations: number;
  /** Every located event in order of t (non-terminal ones included); empty when `eventLog` was given. */
  readonly events: readonly EventHit[];
}

/**
 * Called after every accepted step (and at the terminal event) with the new point. Return
 * `false` to stop the integration ("callback"). Must not keep a reference to `y`.
 */
export type StepCallback = (t: number, y: Float64Array) => boolean | void;

const STOP_NONE = 0;
const STOP_TERMINAL = 1;
const STOP_RESTART = 2;

interface StepCrossing {
  readonly index: number;
  readonly t: number;
  readonly theta: number;
}

interface Workspace {
  readonly n: number;
  readonly ne: number;
  readonly yNew: Float64Array;
  readonly yTry: Float64Array;
  readonly dyTry: Float64Array;
  readonly gOld: Float64Array;
  readonly gNew: Float64Array;
  readonly rateOld: Float64Array;
  readonly rateNow: Float64Array;
  readonly gTry: Float64Array;
}

/** One set of scratch vectors kept between runs (taken while a run is in progress, so nesting is safe). */
let spare: Workspace | null = null;

function newWorkspace(n: number, ne: number): Workspace {
  return {
    n,
    ne,
    yNew: new Float64Array(n),
    yTry: new Float64Array(n),
    dyTry: new Float64Array(n),
    gOld: new Float64Array(ne),
    gNew: new Float64Array(ne),
    rateOld: new Float64Array(ne),
    rateNow: new Float64Array(ne),
    gTry: new Float64Array(ne),
  };
}

/** Integrates from (t0, y0) forward until tMax, a terminal event, a guard, or the callback stops it. */
export function integrateAdaptive<P>(
  stepper: Stepper<P>,
  rhs: OdeRhs<P>,
  params: P,
  t0: number,
  y0: Float64Array,
  options: AdaptiveOptions,
  eventList: readonly OdeEvent<P>[] | EventSet<P> = [],
  onStep?: StepCallback,
): AdaptiveResult {
  const events: EventSet<P> = isEventSet(eventList) ? eventList : eventSetFrom(eventList);
  void rhs; // the stepper holds the right-hand side; kept in the signature for readability at call sites
  const { rtol, atol, hMin, hMax, maxSteps, tMax } = options;
  const ne = events.specs.length;
  const run = startRun(stepper, params, events, options.eventLog);
  const { ws } = run;
  const { yNew, yTry, gOld } = ws;
  const exponent = -1 / (stepper.errorOrder + 1);
  let tCapped = Number.NaN; // t of the last kink prediction (once per accepted point, not per attempt)

  stepper.reset(t0, y0, params);
  const evaluations0 = stepper.evaluations;
  if (ne > 0) events.values(t0, stepper.y, params, stepper.f, gOld);

  let h = Math.min(Math.max(options.h0, hMin), hMax);
  let steps = 0;
  let rejected = 0;
  let lastRejected = false;

  const finish = (reason: StopReason, t: number, y: Float64Array): AdaptiveResult => {
    spare = ws;
    return {
      reason,
      t,
      y: Float64Array.from(y),
      steps,
      rejected,
      evaluations: stepper.evaluations - evaluations0,
      events: run.hits,
    };
  };

  for (;;) {
    const t = stepper.t;
    if (t >= tMax) return finish("t-max", t, stepper.y);
    if (steps >= maxSteps) return finish("max-steps", t, stepper.y);
    if (t + h > tMax) h = tMax - t;
    if (run.hasRestart && t !== tCapped) {
      h = capStepAtKinks(run, t, h, hMin, t - tCapped);
      tCapped = t;
    }
    const err = stepper.attempt(h, yNew, atol, rtol);
    if (err > 1) {
      rejected++;
      lastRejected = true;
      h *= Math.max(0.2, 0.9 * Math.pow(err, exponent));
      if (h < hMin) return finish("step-underflow", t, stepper.y);
      continue;
    }
    // Accepted.
    const hUsed = h;
    stepper.accept();
    steps++;
    const tNew = stepper.t;
    let factor = err === 0 ? 5 : Math.min(5, Math.max(0.2, 0.9 * Math.pow(err, exponent)));
    if (lastRejected) factor = Math.min(1, factor);
    lastRejected = false;
    h = Math.min(hUsed * factor, hMax);

    const stop = ne > 0 ? eventsInStep(run, t, hUsed, tNew) : STOP_NONE;
    if (stop === STOP_TERMINAL) {
      onStep?.(run.stopT, yTry);
      return finish("event", run.stopT, yTry);
    }
    if (stop === STOP_RESTART) {
      const stopT = run.stopT;
      stepper.reset(stopT, yTry, params);
      events.values(stopT, stepper.y, params, stepper.f, gOld);
      gOld[run.stopIndex] = 0; // the crossing is consumed: g must leave zero again to count
      if (onStep && onStep(stopT, stepper.y) === false) return finish("callback", stopT, stepper.y);
      continue;
    }
    if (onStep && onStep(tNew, stepper.y) === false) return finish("callback", tNew, stepper.y);
    if (h < hMin) return finish("step-underflow", tNew, stepper.y);
  }
}

/** What one run shares with its helpers: the stepper and events, scratch vectors, where hits go, the last stop. */
interface AdaptiveRun<P> {
  readonly stepper: Stepper<P>;
  readonly events: EventSet<P>;
  readonly params: P;
  readonly ws: Workspace;
  /** Event hits, when no `eventLog` was given. */
  readonly hits: EventHit[];
  readonly log: EventLog | undefined;
  /** Some restart event has a rate (dg/dt) to predict its crossing from. */
  readonly hasRestart: boolean;
  /** t and event index of the crossing that stopped or cut the last step (set by eventsInStep). */
  stopT: number;
  stopIndex: number;
}

/** Takes the scratch vectors (the previous run's, when it has finished and the sizes match: no allocation per solve). */
function startRun<P>(stepper: Stepper<P>, params: P, events: EventSet<P>, log: EventLog | undefined): AdaptiveRun<P> {
  const specs = events.specs;
  const n = stepper.dim;
  const ne = specs.length;
  let ws = spare;
  if (ws && ws.n === n && ws.ne === ne) spare = null;
  else ws = newWorkspace(n, ne);
  ws.rateOld.fill(Number.NaN);
  log?.reset();
  let hasRestart = false;
  for (let e = 0; e < ne; e++) {
    if (specs[e].restart && events.rates) hasRestart = true;
  }
  return { stepper, events, params, ws, hits: [], log, hasRestart, stopT: 0, stopIndex: -1 };
}

/** Records an event hit: in the event log when the run has one, else as a copy in `hits`. */
function recordHit<P>(run: AdaptiveRun<P>, index: number, t: number, y: Float64Array): void {
  if (run.log) run.log.push(index, t, y);
  else run.hits.push({ index, t, y: Float64Array.from(y) });
}

/**
 * Caps the next step at the predicted crossing of a restart event (see capAtKink); a crossing the current
 * point has already reached is recorded and consumed here, so the next step starts on the kink.
 */
function capStepAtKinks<P>(run: AdaptiveRun<P>, t: number, h: number, hMin: number, hPrev: number): number {
  const { stepper, ws } = run;
  run.events.rates!(t, stepper.y, run.params, stepper.f, ws.rateNow);
  arrivedAt = -1;
  const capped = capAtKink(run.events.specs, ws.gOld, ws.rateNow, h, hMin, ws.rateOld, hPrev);
  if (arrivedAt >= 0) {
    recordHit(run, arrivedAt, t, stepper.y);
    ws.gOld[arrivedAt] = 0;
  }
  return capped;
}

/**
 * Events crossed in the step just accepted (from t over hUsed to tNew), located on the dense output and
 * recorded earliest first, stopping at the first terminal one or at a restart inside the step. Returns
 * STOP_NONE, STOP_TERMINAL or STOP_RESTART; for a stop, its t and index are in `run.stopT`/`run.stopIndex`
 * and its state in `ws.yTry`.
 */
function eventsInStep<P>(run: AdaptiveRun<P>, t: number, hUsed: number, tNew: number): number {
  const { stepper, events, params, ws } = run;
  const { gOld, gNew } = ws;
  const specs = events.specs;
  events.values(tNew, stepper.y, params, stepper.f, gNew);
  let stepHits: StepCrossing[] | null = null; // allocated only when a crossing occurs
  for (let e = 0; e < specs.length; e++) {
    const a = gOld[e];
    const b = gNew[e];
    const dir = specs[e].direction;
    const down = a > 0 && b <= 0;
    const up = a < 0 && b >= 0;
    if ((dir <= 0 && down) || (dir >= 0 && up)) {
      const slope = specs[e].slope === true;
      const theta = locateRoot(stepper, events, e, slope, params, t, hUsed, a, b, ws.yTry, ws.dyTry, ws.gTry);
      (stepHits ??= []).push({ index: e, t: t + theta * hUsed, theta });
    }
  }
  const stop = stepHits ? recordCrossings(run, stepHits, tNew) : STOP_NONE;
  if (stop !== STOP_RESTART) for (let e = 0; e < specs.length; e++) gOld[e] = gNew[e];
  return stop;
}

/** Records a step's crossings in order of t until the first that stops the run or cuts the step; returns which. */
function recordCrossings<P>(run: AdaptiveRun<P>, stepHits: StepCrossing[], tNew: number): number {
  const specs = run.events.specs;
  const yTry = run.ws.yTry;
  if (stepHits.length > 1) stepHits.sort((p, q) => p.t - q.t);
  for (const hit of stepHits) {
    run.stepper.interpolate(hit.theta, yTry);
    recordHit(run, hit.index, hit.t, yTry);
    let stop = STOP_NONE;
    if (specs[hit.index].terminal) {
      stop = STOP_TERMINAL;
    } else if (specs[hit.index].restart && hit.t < tNew - 1e-12 * Math.max(1, Math.abs(tNew))) {
      // A restart inside the step (not at its end): later crossings of this step are found again.
      stop = STOP_RESTART;
    }
    if (stop !== STOP_NONE) {
      run.stopT = hit.t;
      run.stopIndex = hit.index;
      return stop;
    }
  }
  return STOP_NONE;
}

/** Set by capAtKink: index of a restart event whose crossing the current point has reached, else −1. */
let arrivedAt = -1;
/**
 * A capped step ends this much beyond the predicted crossing, so a slightly late prediction still puts
 * the crossing inside the step (located on the dense output) instead of leaving a sliver for one more.
 */
const KINK_MARGIN = 1.001;

/**
 * Shortens a step that would cross a restart event, to end at the crossing predicted from g and dg/dt
 * at the current point (a little beyond it, so the crossing falls inside the step's last part and is
 * located on the dense output instead of starting a tiny extra step).
 */
function capAtKink(
  specs: readonly EventSpec[],
  gOld: Float64Array,
  rates: Float64Array,
  h: number,
  hMin: number,
  rateOld: Float64Array,
  hPrev: number,
): number {
  for (let e = 0; e < specs.length; e++) {
    const ev = specs[e];
    if (!ev.restart) continue;
    const g = gOld[e];
    const rate = rates[e];
    if (g === 0 || rate !== rate) {
      rateOld[e] = Number.NaN;
      continue;
    }
    // Heading for zero in an allowed direction?
    if (!(g * rate < 0) || (ev.direction < 0 && g < 0) || (ev.direction > 0 && g > 0)) {
      rateOld[e] = rate;
      continue;
    }
    let reach = -g / rate;
    // Curvature of g from the change of its rate over the last step (quadratic prediction).
    const prev = rateOld[e];
    if (hPrev > 0 && prev === prev) {
      const c = (rate - prev) / hPrev;
      const disc = rate * rate - 2 * c * g;
      if (c !== 0 && disc >= 0) {
        const sq = Math.sqrt(disc);
        // Smallest positive root of g + rate·τ + c·τ²/2 = 0, written to avoid cancellation.
        const r1 = (-rate - Math.sign(rate) * sq) / c;
        const r2 = (2 * -g) / (rate + Math.sign(rate) * sq);
        const best = Math.min(r1 > 0 ? r1 : Infinity, r2 > 0 ? r2 : Infinity);
        if (best < Infinity) reach = best;
      }
    }
    rateOld[e] = rate;
    // Already there (the last step ended within a millionth of a step of the crossing): no sliver step.
    if (hPrev > 0 && reach <= 1e-6 * hPrev) {
      arrivedAt = e;
      continue;
    }
    reach *= KINK_MARGIN;
    if (reach < h && reach > hMin) h = reach;
  }
  return h;
}

function isEventSet<P>(x: readonly OdeEvent<P>[] | EventSet<P>): x is EventSet<P> {
  return !Array.isArray(x);
}
