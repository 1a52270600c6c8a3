/**
 * The tiny protocol every embedded Runge–Kutta stepper implements, and the right-hand-side
 * signature the integrators call. Steppers own their stage scratch (Float64Array, allocated once
 * at construction) so that a step allocates nothing.
 *
 * Convention: the independent variable is called `t` here; the jet model uses arc length s.
 */

/** dy/dt = f(t, y, params), written into `out` (never allocate inside). */
export type OdeRhs<P> = (t: number, y: Float64Array, out: Float64Array, params: P) => void;

export interface Stepper<P> {
  readonly name: string;
  /** Order of the propagated (higher-order) solution. */
  readonly order: number;
  /** Order of the embedded error estimator, used in the step-size controller exponent. */
  readonly errorOrder: number;
  readonly dim: number;
  /**
   * Starts a new integration at (t, y): evaluates and caches f(t, y). Must be called before the
   * first `attempt`, and again whenever y is changed outside the stepper.
   */
  reset(t: number, y: Float64Array, params: P): void;
  /**
   * Attempts one step of size h from the cached (t, y). Writes the candidate solution into yOut
   * and returns the weighted RMS error norm (≤ 1 means "accept"), with weights
   * atol[i] + rtol·max(|y_i|, |yOut_i|).
   */
  attempt(h: number, yOut: Float64Array, atol: Float64Array, rtol: number): number;
  /** Commits the last attempted step: the candidate becomes the current point (FSAL bookkeeping). */
  accept(): void;
  /**
   * Dense output over the last accepted step: the state at t_old + theta·h, 0 ≤ theta ≤ 1.
   * Valid only between `accept()` and the next `attempt()`.
   */
  interpolate(theta: number, out: Float64Array): void;
  /**
   * Derivative dy/dt of the dense output at t_old + theta·h (same validity as `interpolate`): lets event
   * functions that need the slope be searched without calling the right-hand side.
   */
  interpolateDerivative(theta: number, out: Float64Array): void;
  /** Current point after the last `accept()` (or `reset`). */
  readonly t: number;
  readonly y: Float64Array;
  /** Derivative at the current point. */
  readonly f: Float64Array;
  /** Right-hand-side evaluations since construction (for benchmarks and tests). */
  readonly evaluations: number;
}

export type StepperFactory = <P>(rhs: OdeRhs<P>, dim: number) => Stepper<P>;
