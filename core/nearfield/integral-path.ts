/**
 * Recording of the integral model's centreline path: one module-scope set of growable Float64Array
 * buffers reused across solves (no allocation per step once grown), and decimation to a short,
 * immutable `PathPoint[]` for the result.
 */
import type { PathPoint } from "./types";
import { IQ, IX, IY, IZ, radiusFromState, verticalHalfExtent } from "./integral-rhs";
import { centrelineDilution } from "./integral-setup";

/** At most this many points in the result's path (the sink still receives every step). */
export const PATH_POINTS = 200;

export class IntegralPathBuffer {
  length = 0;
  s = new Float64Array(512);
  x = new Float64Array(512);
  y = new Float64Array(512);
  z = new Float64Array(512);
  /** Top-hat radius, m. */
  b = new Float64Array(512);
  /** Centreline dilution. */
  dilution = new Float64Array(512);
  /** Upper-edge elevation z + b·√(1 − t_z²), m. */
  edge = new Float64Array(512);

  /** Source volume flux of the run being recorded, m³/s (for the dilution column). */
  q0 = 1;

  reset(): void {
    this.length = 0;
  }

  /** Records the state y at arc length s (radius, dilution and upper edge derived here); returns its index. */
  pushState(s: number, y: Float64Array): number {
    if (this.length >= this.s.length) this.grow();
    const i = this.length++;
    this.s[i] = s;
    this.x[i] = y[IX];
    this.y[i] = y[IY];
    this.z[i] = y[IZ];
    this.b[i] = radiusFromState(y);
    this.dilution[i] = centrelineDilution(y[IQ], this.q0);
    this.edge[i] = y[IZ] + verticalHalfExtent(y);
    return i;
  }

  push(s: number, x: number, y: number, z: number, b: number, dilution: number, edge: number): void {
    if (this.length >= this.s.length) this.grow();
    const i = this.length++;
    this.s[i] = s;
    this.x[i] = x;
    this.y[i] = y;
    this.z[i] = z;
    this.b[i] = b;
    this.dilution[i] = dilution;
    this.edge[i] = edge;
  }

  private grow(): void {
    const g = (a: Float64Array) => {
      const out = new Float64Array(a.length * 2);
      out.set(a);
      return out;
    };
    this.s = g(this.s);
    this.x = g(this.x);
    this.y = g(this.y);
    this.z = g(this.z);
    this.b = g(this.b);
    this.dilution = g(this.dilution);
    this.edge = g(this.edge);
  }

  /** At most PATH_POINTS points, evenly by index, always keeping the first and the last. */
  decimate(): PathPoint[] {
    const n = this.length;
    const out: PathPoint[] = [];
    const take = (i: number) =>
      out.push({
        s: this.s[i],
        x: this.x[i],
        y: this.y[i],
        z: this.z[i],
        halfWidth: this.b[i],
        dilution: this.dilution[i],
      });
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
}
