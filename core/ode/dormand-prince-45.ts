/**
 * Dormand–Prince 5(4) embedded Runge–Kutta stepper (7 stages, first-same-as-last) with its
 * 4th-order continuous extension (dense output).
 *
 * Source: Dormand, J.R., Prince, P.J., "A family of embedded Runge–Kutta formulae", J. Comput.
 * Appl. Math. 6(1):19–26 (1980) — tableau "RK5(4)7M". Dense-output coefficients and the error
 * norm as in Hairer, E., Nørsett, S.P., Wanner, G., Solving Ordinary Differential Equations I,
 * 2nd ed., Springer (1993), §II.4–II.6 (continuous extension of DOPRI5). Coefficients are
 * transcribed as data; the tests check the order of accuracy of both the step and the dense
 * output on problems with exact solutions, so a wrong coefficient fails a test.
 *
 * Allocation-free after construction: every stage vector is a Float64Array owned by the stepper.
 */
import type { OdeRhs, Stepper } from "./stepper";

// Butcher tableau RK5(4)7M (Dormand & Prince 1980, Table 2).
const C2 = 1 / 5;
const C3 = 3 / 10;
const C4 = 4 / 5;
const C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40;
const A32 = 9 / 40;
const A41 = 44 / 45;
const A42 = -56 / 15;
const A43 = 32 / 9;
const A51 = 19372 / 6561;
const A52 = -25360 / 2187;
const A53 = 64448 / 6561;
const A54 = -212 / 729;
const A61 = 9017 / 3168;
const A62 = -355 / 33;
const A63 = 46732 / 5247;
const A64 = 49 / 176;
const A65 = -5103 / 18656;
const A71 = 35 / 384;
const A73 = 500 / 1113;
const A74 = 125 / 192;
const A75 = -2187 / 6784;
const A76 = 11 / 84;
// Error coefficients e = b(5th) − b(4th).
const E1 = 71 / 57600;
const E3 = -71 / 16695;
const E4 = 71 / 1920;
const E5 = -17253 / 339200;
const E6 = 22 / 525;
const E7 = -1 / 40;
// Dense output (Hairer, Nørsett & Wanner 1993, DOPRI5 continuous extension).
const D1 = -12715105075 / 11282082432;
const D3 = 87487479700 / 32700410799;
const D4 = -10690763975 / 1880347072;
const D5 = 701980252875 / 199316789632;
const D6 = -1453857185 / 822651844;
const D7 = 69997945 / 29380423;

class DormandPrince45<P> implements Stepper<P> {
  readonly name = "Dormand–Prince 5(4)";
  readonly order = 5;
  readonly errorOrder = 4;
  readonly dim: number;
  t = 0;
  y: Float64Array;
  f: Float64Array;
  evaluations = 0;

  private readonly rhs: OdeRhs<P>;
  private params!: P;
  private h = 0;
  private readonly k2: Float64Array;
  private readonly k3: Float64Array;
  private readonly k4: Float64Array;
  private readonly k5: Float64Array;
  private readonly k6: Float64Array;
  private readonly k7: Float64Array;
  private readonly tmp: Float64Array;
  private readonly yNew: Float64Array;
  // Dense-output coefficients of the last accepted step.
  private readonly r1: Float64Array;
  private readonly r2: Float64Array;
  private readonly r3: Float64Array;
  private readonly r4: Float64Array;
  private readonly r5: Float64Array;

  constructor(rhs: OdeRhs<P>, dim: number) {
    this.rhs = rhs;
    this.dim = dim;
    const mk = () => new Float64Array(dim);
    this.y = mk();
    this.f = mk();
    this.k2 = mk();
    this.k3 = mk();
    this.k4 = mk();
    this.k5 = mk();
    this.k6 = mk();
    this.k7 = mk();
    this.tmp = mk();
    this.yNew = mk();
    this.r1 = mk();
    this.r2 = mk();
    this.r3 = mk();
    this.r4 = mk();
    this.r5 = mk();
  }

  reset(t: number, y: Float64Array, params: P): void {
    this.t = t;
    this.params = params;
    this.y.set(y);
    this.rhs(t, this.y, this.f, params);
    this.evaluations++;
  }

  attempt(h: number, yOut: Float64Array, atol: Float64Array, rtol: number): number {
    const n = this.dim;
    const { y, f: k1, k2, k3, k4, k5, k6, k7, tmp, rhs, params, t } = this;
    this.h = h;
    for (let i = 0; i < n; i++) tmp[i] = y[i] + h * A21 * k1[i];
    rhs(t + C2 * h, tmp, k2, params);
    for (let i = 0; i < n; i++) tmp[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
    rhs(t + C3 * h, tmp, k3, params);
    for (let i = 0; i < n; i++) tmp[i] = y[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
    rhs(t + C4 * h, tmp, k4, params);
    for (let i = 0; i < n; i++) {
      tmp[i] = y[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
    }
    rhs(t + C5 * h, tmp, k5, params);
    for (let i = 0; i < n; i++) {
      tmp[i] = y[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
    }
    rhs(t + h, tmp, k6, params);
    const yNew = this.yNew;
    for (let i = 0; i < n; i++) {
      yNew[i] = y[i] + h * (A71 * k1[i] + A73 * k3[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
    }
    rhs(t + h, yNew, k7, params);
    this.evaluations += 6;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const err = h * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
      const sc = atol[i] + rtol * Math.max(Math.abs(y[i]), Math.abs(yNew[i]));
      const q = err / sc;
      sum += q * q;
    }
    for (let i = 0; i < n; i++) yOut[i] = yNew[i]; // a loop: cheaper than TypedArray.set for a few components
    const norm = Math.sqrt(sum / n);
    // A NaN norm (RHS blew up inside the step) must read as "reject", never as "accept".
    return norm === norm ? norm : Infinity;
  }

  accept(): void {
    const n = this.dim;
    const { y, f: k1, k3, k4, k5, k6, k7, yNew, r1, r2, r3, r4, r5, h } = this;
    for (let i = 0; i < n; i++) {
      const ydiff = yNew[i] - y[i];
      const bspl = h * k1[i] - ydiff;
      r1[i] = y[i];
      r2[i] = ydiff;
      r3[i] = bspl;
      r4[i] = ydiff - h * k7[i] - bspl;
      r5[i] = h * (D1 * k1[i] + D3 * k3[i] + D4 * k4[i] + D5 * k5[i] + D6 * k6[i] + D7 * k7[i]);
    }
    for (let i = 0; i < n; i++) {
      y[i] = yNew[i];
      k1[i] = k7[i]; // first same as last
    }
    this.t += h;
  }

  interpolate(theta: number, out: Float64Array): void {
    const n = this.dim;
    const { r1, r2, r3, r4, r5 } = this;
    const t1 = 1 - theta;
    for (let i = 0; i < n; i++) {
      out[i] = r1[i] + theta * (r2[i] + t1 * (r3[i] + theta * (r4[i] + t1 * r5[i])));
    }
  }

  interpolateDerivative(theta: number, out: Float64Array): void {
    const n = this.dim;
    const { r2, r3, r4, r5 } = this;
    const t1 = 1 - theta;
    const invH = 1 / this.h;
    // d/dθ of r1 + θ·A, A = r2 + (1−θ)·B, B = r3 + θ·C, C = r4 + (1−θ)·r5 (product rule, inside out).
    for (let i = 0; i < n; i++) {
      const c = r4[i] + t1 * r5[i];
      const b = r3[i] + theta * c;
      const a = r2[i] + t1 * b;
      const dB = c - theta * r5[i];
      const dA = t1 * dB - b;
      out[i] = (a + theta * dA) * invH;
    }
  }
}

/** A new Dormand–Prince 5(4) stepper for a system of `dim` equations. */
export function stepperDormandPrince45<P>(rhs: OdeRhs<P>, dim: number): Stepper<P> {
  return new DormandPrince45(rhs, dim);
}
