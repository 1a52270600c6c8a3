/**
 * The near-the-limit reference of the speed benchmark: a minimal, hand-written Dormand–Prince 5(4)
 * solve of the integral jet equations (the same right-hand side, tolerances, error norm and
 * step-size controller as `nearFieldIntegral`), stopping where the centreline reaches the seabed.
 * Nothing else: no event table, no path, no warnings, no result object, no generic driver. Every
 * vector is module scope, so a solve allocates nothing. It exists only to show how close the real
 * code path comes to the cost of the arithmetic itself; the app never calls it.
 *
 * Tableau: Dormand & Prince (1980), J. Comput. Appl. Math. 6(1):19–26, RK5(4)7M; dense output of
 * Hairer, Nørsett & Wanner (1993), Solving ODEs I, §II.6.
 */
import { IQ, IZ, IMZ, INTEGRAL_DIM, integralJetRhs, type IntegralParams } from "../../nearfield/integral-rhs";

const N = INTEGRAL_DIM;
const y = new Float64Array(N);
const k1 = new Float64Array(N);
const k2 = new Float64Array(N);
const k3 = new Float64Array(N);
const k4 = new Float64Array(N);
const k5 = new Float64Array(N);
const k6 = new Float64Array(N);
const k7 = new Float64Array(N);
const tmp = new Float64Array(N);
const yn = new Float64Array(N);

export interface MinimalSolve {
  /** Arc length at impact, m. */
  readonly s: number;
  /** Volume flux at impact ÷ source volume flux. */
  readonly fluxRatio: number;
  readonly x: number;
  readonly yNorth: number;
  readonly steps: number;
  readonly evaluations: number;
}

/** What a solve starts from and how tightly it steps (`atol` and `rtol` as in `nearFieldIntegral`). */
export interface MinimalSolveInput {
  readonly params: IntegralParams;
  /** Initial state. */
  readonly y0: Float64Array;
  /** Port height above the seabed, m. */
  readonly portHeight: number;
  readonly rtol: number;
  readonly atol: Float64Array;
  /** First step, m of arc length. */
  readonly h0: number;
  /** Largest step, m of arc length. */
  readonly hMax: number;
}

/** Controller memory across steps, module scope like the vectors (a solve allocates nothing). */
const control = { rateOld: Number.NaN, hPrev: 0 };

/**
 * Solves from the state y0 to the seabed (z = −portHeight) and returns the impact point. Impact located
 * by bisection on the cubic Hermite interpolant of z.
 */
export function minimalImpactSolve(input: MinimalSolveInput): MinimalSolve {
  const { params, y0, portHeight, rtol, atol, hMax } = input;
  y.set(y0);
  integralJetRhs(0, y, k1, params);
  let evaluations = 1;
  let t = 0;
  let h = input.h0;
  let steps = 0;
  let lastRejected = false;
  control.rateOld = Number.NaN;
  control.hPrev = 0;
  let capped = false;
  for (let guard = 0; guard < 100000; guard++) {
    if (!capped && y[IMZ] > 0 && k1[IMZ] < 0) h = stepCappedAtPredictedTop(h);
    capped = true;
    dormandPrinceStep(t, h, params);
    evaluations += 6;
    const err = errorNorm(h, rtol, atol);
    if (!(err <= 1)) {
      lastRejected = true;
      h *= Math.max(0.2, 0.9 * Math.pow(err, -0.2));
      continue;
    }
    steps++;
    capped = false;
    control.hPrev = h;
    if (y[IMZ] > 0 && yn[IMZ] <= 0 && yn[IZ] + portHeight > 0) {
      // Crossed the top: restart there (Hermite interpolation of every component).
      const hi = crossingFraction(y[IMZ], yn[IMZ], h * k1[IMZ], h * k7[IMZ]);
      if (hi < 1 - 1e-12) {
        t = restartAt(t, h, hi, params);
        evaluations++;
        lastRejected = false;
        continue;
      }
    }
    const zOld = y[IZ] + portHeight;
    const zNew = yn[IZ] + portHeight;
    if (zOld > 0 && zNew <= 0 && y[IMZ] < 0) {
      // Cubic Hermite on z (values and slopes at both ends), bisected to the crossing; Q likewise.
      const th = crossingFraction(zOld, zNew, h * k1[IZ], h * k7[IZ]);
      const fluxRatio = interpolated(IQ, h, th) / y0[IQ];
      return {
        s: t + th * h,
        fluxRatio,
        x: interpolated(0, h, th),
        yNorth: interpolated(1, h, th),
        steps,
        evaluations,
      };
    }
    y.set(yn);
    k1.set(k7);
    t += h;
    let factor = err === 0 ? 5 : Math.min(5, Math.max(0.2, 0.9 * Math.pow(err, -0.2)));
    if (lastRejected) factor = Math.min(1, factor);
    lastRejected = false;
    h = Math.min(h * factor, hMax);
  }
  return { s: t, fluxRatio: Number.NaN, x: Number.NaN, yNorth: Number.NaN, steps, evaluations };
}

/**
 * Same kink handling as the model: while the jet still rises and slows, the step is cut to end just past
 * the predicted top (where M_z reaches zero, quadratic in M_z when the last rate is known).
 */
function stepCappedAtPredictedTop(h: number): number {
  const g = y[IMZ];
  const rate = k1[IMZ];
  const { rateOld, hPrev } = control;
  let reach = -g / rate;
  if (hPrev > 0 && rateOld === rateOld) {
    const c = (rate - rateOld) / hPrev;
    const disc = rate * rate - 2 * c * g;
    if (c !== 0 && disc >= 0) {
      const r2 = (2 * -g) / (rate - Math.sqrt(disc));
      if (r2 > 0) reach = r2;
    }
  }
  control.rateOld = rate;
  reach *= 1.001;
  return reach < h ? reach : h;
}

/** One Dormand–Prince 5(4) step of size h from (t, y, k1): stages k2…k7 and the 5th-order state yn. */
function dormandPrinceStep(t: number, h: number, params: IntegralParams): void {
  for (let i = 0; i < N; i++) tmp[i] = y[i] + h * 0.2 * k1[i];
  integralJetRhs(t + 0.2 * h, tmp, k2, params);
  for (let i = 0; i < N; i++) tmp[i] = y[i] + h * ((3 / 40) * k1[i] + (9 / 40) * k2[i]);
  integralJetRhs(t + 0.3 * h, tmp, k3, params);
  for (let i = 0; i < N; i++) tmp[i] = y[i] + h * ((44 / 45) * k1[i] - (56 / 15) * k2[i] + (32 / 9) * k3[i]);
  integralJetRhs(t + 0.8 * h, tmp, k4, params);
  for (let i = 0; i < N; i++) {
    tmp[i] =
      y[i] + h * ((19372 / 6561) * k1[i] - (25360 / 2187) * k2[i] + (64448 / 6561) * k3[i] - (212 / 729) * k4[i]);
  }
  integralJetRhs(t + (8 / 9) * h, tmp, k5, params);
  for (let i = 0; i < N; i++) {
    tmp[i] =
      y[i] +
      h *
        ((9017 / 3168) * k1[i] -
          (355 / 33) * k2[i] +
          (46732 / 5247) * k3[i] +
          (49 / 176) * k4[i] -
          (5103 / 18656) * k5[i]);
  }
  integralJetRhs(t + h, tmp, k6, params);
  for (let i = 0; i < N; i++) {
    yn[i] =
      y[i] +
      h * ((35 / 384) * k1[i] + (500 / 1113) * k3[i] + (125 / 192) * k4[i] - (2187 / 6784) * k5[i] + (11 / 84) * k6[i]);
  }
  integralJetRhs(t + h, yn, k7, params);
}

/** RMS of the embedded error estimate of the last step, scaled by atol + rtol·max(|y|, |yn|). */
function errorNorm(h: number, rtol: number, atol: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < N; i++) {
    const e =
      h *
      ((71 / 57600) * k1[i] -
        (71 / 16695) * k3[i] +
        (71 / 1920) * k4[i] -
        (17253 / 339200) * k5[i] +
        (22 / 525) * k6[i] -
        (1 / 40) * k7[i]);
    const a = Math.abs(y[i]);
    const b = Math.abs(yn[i]);
    const q = e / (atol[i] + rtol * (a > b ? a : b));
    sum += q * q;
  }
  return Math.sqrt(sum / N);
}

/** Fraction of the step (0…1) where a quantity going from positive to not positive crosses zero, bisected. */
function crossingFraction(p0: number, p1: number, m0: number, m1: number): number {
  let lo = 0;
  let hi = 1;
  for (let it = 0; it < 60; it++) {
    const m = 0.5 * (lo + hi);
    if (hermite(p0, p1, m0, m1, m) > 0) lo = m;
    else hi = m;
  }
  return hi;
}

/** Moves the state to fraction `th` of the last step, refreshes k1 there and returns the new arc length. */
function restartAt(t: number, h: number, th: number, params: IntegralParams): number {
  for (let i = 0; i < N; i++) tmp[i] = interpolated(i, h, th);
  y.set(tmp);
  const tNew = t + th * h;
  integralJetRhs(tNew, y, k1, params);
  control.rateOld = Number.NaN;
  return tNew;
}

/** Component i of the state at fraction `th` of the last step of size h (cubic Hermite, k1 and k7 slopes). */
function interpolated(i: number, h: number, th: number): number {
  return hermite(y[i], yn[i], h * k1[i], h * k7[i], th);
}

function hermite(p0: number, p1: number, m0: number, m1: number, s: number): number {
  const s2 = s * s;
  const s3 = s2 * s;
  return (2 * s3 - 3 * s2 + 1) * p0 + (s3 - 2 * s2 + s) * m0 + (-2 * s3 + 3 * s2) * p1 + (s3 - s2) * m1;
}
