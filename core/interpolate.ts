/**
 * Linear interpolation in a table of ascending abscissae, held at the end values outside the table (the
 * one interpolator of core/; angle tables that must not be extrapolated use interpolateAngleTable in
 * core/correlations/dense-jet-dataset.ts, which says when it is outside).
 * A zero-width interval returns its right-hand value; an empty table has no value (NaN).
 */
export function interpolateLinear(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number): number {
  const n = xs.length;
  if (n === 0) return Number.NaN;
  if (x <= xs[0]!) return ys[0]!;
  for (let i = 1; i < n; i++) {
    if (x <= xs[i]!) {
      const span = xs[i]! - xs[i - 1]!;
      return span > 0 ? ys[i - 1]! + ((x - xs[i - 1]!) / span) * (ys[i]! - ys[i - 1]!) : ys[i]!;
    }
  }
  return ys[n - 1]!;
}
