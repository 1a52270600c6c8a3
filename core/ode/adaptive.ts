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

export interface OdeEvent<P> {
  /**
   * Event function g(t, y); an event is a zero crossing of g. Must not allocate. At step ends the
   * driver also passes dy = f(t, y) (already computed by the stepper); inside a step (root search
   * on the dense output) dy is undefined.
   */
  readonly fn: (t: number, y: Float64Array, params: P, dy?: Float64Array) => number;
  /** −1: only crossings from g > 0 to g ≤ 0; +1: from g < 0 to g ≥ 0; 0: either. */
  readonly direction: -1 | 0 | 1;
  /** Stop the integration at this event. */
  readonly terminal: boolean;
  /** g uses dy: inside a step the driver passes the dense output's derivative (never the RHS). */
  readonly slope?: boolean;
  /** The right-hand side is not smooth where g = 0: restart the integration at the crossing. */
  readonly restart?: boolean;
  /** dg/dt at a step end (dy = f(t, y)); with `restart`, steps are cut to end at the predicted crossing. */
  readonly rate?: (t: number, y: Float64Array, params: P, dy: Float64Array) => number;
}

export interface EventHit {
  /** Index into the `events` array given to the driver. */
  readonly index: number;
  readonly t: number;
  readonly y: Float64Array;
}

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
  /** Every located event in order of t (non-terminal ones included). */
  readonly events: readonly EventHit[];
}

/**
 * Called after every accepted step (and at the terminal event) with the new point. Return
 * `false` to stop the integration ("callback"). Must not keep a reference to `y`.
 */
export type StepCallback = (t: number, y: Float64Array) => boolean | void;

/** Integrates from (t0, y0) forward until tMax, a terminal event, a guard, or the callback stops it. */
export function integrateAdaptive<P>(
  stepper: Stepper<P>,
  rhs: OdeRhs<P>,
  params: P,
  t0: number,
  y0: Float64Array,
  options: AdaptiveOptions,
  events: readonly OdeEvent<P>[] = [],
  onStep?: StepCallback,
): AdaptiveResult {
  void rhs; // the stepper holds the right-hand side; kept in the signature for readability at call sites
  const n = stepper.dim;
  const { rtol, atol, hMin, hMax, maxSteps, tMax } = options;
  const yNew = new Float64Array(n);
  const yTry = new Float64Array(n);
  const dyTry = new Float64Array(n);
  const ne = events.length;
  const gOld = new Float64Array(ne);
  const gNew = new Float64Array(ne);
  const hits: EventHit[] = [];
  const exponent = -1 / (stepper.errorOrder + 1);
  const rateOld = new Float64Array(ne).fill(Number.NaN);
  let tCapped = Number.NaN; // t of the last kink prediction (once per accepted point, not per attempt)
  let hasRestart = false;
  for (let e = 0; e < ne; e++) if (events[e].restart) hasRestart = true;

  stepper.reset(t0, y0, params);
  const evaluations0 = stepper.evaluations;
  for (let e = 0; e < ne; e++) gOld[e] = events[e].fn(t0, stepper.y, params, stepper.f);

  let h = Math.min(Math.max(options.h0, hMin), hMax);
  let steps = 0;
  let rejected = 0;
  let lastRejected = false;

  const finish = (reason: StopReason, t: number, y: Float64Array): AdaptiveResult => ({
    reason,
    t,
    y: Float64Array.from(y),
    steps,
    rejected,
    evaluations: stepper.evaluations - evaluations0,
    events: hits,
  });

  for (;;) {
    const t = stepper.t;
    if (t >= tMax) return finish("t-max", t, stepper.y);
    if (steps >= maxSteps) return finish("max-steps", t, stepper.y);
    if (t + h > tMax) h = tMax - t;
    if (hasRestart && t !== tCapped) {
      h = capAtKink(events, gOld, t, stepper, params, h, hMin, rateOld, t - tCapped);
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

    // Events in this step, earliest first; stop at the first terminal one, cut the step at a restart.
    let terminalHit: EventHit | null = null;
    let restartHit: EventHit | null = null;
    if (ne > 0) {
      for (let e = 0; e < ne; e++) gNew[e] = events[e].fn(tNew, stepper.y, params, stepper.f);
      let stepHits: EventHit[] | null = null; // allocated only when a crossing occurs
      for (let e = 0; e < ne; e++) {
        const a = gOld[e];
        const b = gNew[e];
        const dir = events[e].direction;
        const down = a > 0 && b <= 0;
        const up = a < 0 && b >= 0;
        if ((dir <= 0 && down) || (dir >= 0 && up)) {
          const theta = locateRoot(stepper, events[e], params, t, hUsed, a, b, yTry, dyTry);
          stepper.interpolate(theta, yTry);
          (stepHits ??= []).push({ index: e, t: t + theta * hUsed, y: Float64Array.from(yTry) });
        }
      }
      if (stepHits) {
        stepHits.sort((p, q) => p.t - q.t);
        for (const hit of stepHits) {
          hits.push(hit);
          if (events[hit.index].terminal) {
            terminalHit = hit;
            break;
          }
          // A restart inside the step (not at its end): later crossings of this step are found again.
          if (events[hit.index].restart && hit.t < tNew - 1e-12 * Math.max(1, Math.abs(tNew))) {
            restartHit = hit;
            break;
          }
        }
      }
      if (!restartHit) gOld.set(gNew);
    }
    if (terminalHit) {
      onStep?.(terminalHit.t, terminalHit.y);
      return finish("event", terminalHit.t, terminalHit.y);
    }
    if (restartHit) {
      stepper.reset(restartHit.t, restartHit.y, params);
      for (let e = 0; e < ne; e++) gOld[e] = events[e].fn(restartHit.t, stepper.y, params, stepper.f);
      gOld[restartHit.index] = 0; // the crossing is consumed: g must leave zero again to count
      if (onStep && onStep(restartHit.t, stepper.y) === false) return finish("callback", restartHit.t, stepper.y);
      continue;
    }
    if (onStep && onStep(tNew, stepper.y) === false) return finish("callback", tNew, stepper.y);
    if (h < hMin) return finish("step-underflow", tNew, stepper.y);
  }
}

/**
 * Shortens a step that would cross a restart event, to end at the crossing predicted from g and dg/dt
 * at the current point (a little beyond it, so the crossing falls inside the step's last part and is
 * located on the dense output instead of starting a tiny extra step).
 */
function capAtKink<P>(
  events: readonly OdeEvent<P>[],
  gOld: Float64Array,
  t: number,
  stepper: Stepper<P>,
  params: P,
  h: number,
  hMin: number,
  rateOld: Float64Array,
  hPrev: number,
): number {
  for (let e = 0; e < events.length; e++) {
    const ev = events[e];
    if (!ev.restart || !ev.rate) continue;
    const g = gOld[e];
    const rate = ev.rate(t, stepper.y, params, stepper.f);
    if (g === 0) {
      rateOld[e] = Number.NaN;
      continue;
    }
    // Heading for zero in an allowed direction within this step?
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
    reach *= 1.001;
    if (reach < h && reach > hMin) h = reach;
  }
  return h;
}

/**
 * Illinois (modified regula falsi) search for θ in (0, 1] on the dense output of the last
 * accepted step. Returns the bracket end on the "after" side, so the reported state has crossed.
 */
function locateRoot<P>(
  stepper: Stepper<P>,
  event: OdeEvent<P>,
  params: P,
  t: number,
  h: number,
  gA: number,
  gB: number,
  scratch: Float64Array,
  scratchDy: Float64Array,
): number {
  if (gB === 0) return 1;
  let a = 0;
  let b = 1;
  let fa = gA;
  let fb = gB;
  let side = 0;
  const slope = event.slope === true;
  const tol = (1e-12 * Math.max(1, Math.abs(t))) / Math.abs(h);
  for (let it = 0; it < 200 && b - a > tol; it++) {
    let m = (a * fb - b * fa) / (fb - fa);
    // Bisect if the secant point is not strictly inside the bracket (flat or non-finite g).
    if (!(m > a && m < b)) m = 0.5 * (a + b);
    stepper.interpolate(m, scratch);
    let fm: number;
    if (slope) {
      stepper.interpolateDerivative(m, scratchDy);
      fm = event.fn(t + m * h, scratch, params, scratchDy);
    } else fm = event.fn(t + m * h, scratch, params);
    if (fm === 0) return m;
    if (fm * fb < 0) {
      a = m;
      fa = fm;
      if (side === -1) fb *= 0.5;
      side = -1;
    } else {
      b = m;
      fb = fm;
      if (side === 1) fa *= 0.5;
      side = 1;
    }
  }
  return b;
}
