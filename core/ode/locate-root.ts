/**
 * Event location for the adaptive driver (./adaptive): the root of an event function g inside the last
 * accepted step, searched on the stepper's dense output y(θ) by Illinois (modified regula falsi), to
 * |Δt| ≤ 1e-12·max(1, |t|) (Hairer, Nørsett & Wanner 1993, §II.6). Allocates nothing.
 */
import type { Stepper } from "./stepper";
import type { EventSet } from "./events";

/**
 * Illinois (modified regula falsi) search for θ in (0, 1] on the dense output of the last
 * accepted step. Returns the bracket end on the "after" side, so the reported state has crossed.
 */
export function locateRoot<P>(
  stepper: Stepper<P>,
  events: EventSet<P>,
  index: number,
  slope: boolean,
  params: P,
  t: number,
  h: number,
  gA: number,
  gB: number,
  scratch: Float64Array,
  scratchDy: Float64Array,
  gTry: Float64Array,
): number {
  if (gB === 0) return 1;
  let a = 0;
  let b = 1;
  let fa = gA;
  let fb = gB;
  let side = 0;
  const tol = (1e-12 * Math.max(1, Math.abs(t))) / Math.abs(h);
  for (let it = 0; it < 200 && b - a > tol; it++) {
    let m = (a * fb - b * fa) / (fb - fa);
    // Bisect if the secant point is not strictly inside the bracket (flat or non-finite g).
    if (!(m > a && m < b)) m = 0.5 * (a + b);
    stepper.interpolate(m, scratch);
    if (slope) stepper.interpolateDerivative(m, scratchDy);
    events.values(t + m * h, scratch, params, slope ? scratchDy : undefined, gTry, index);
    const fm = gTry[index];
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
