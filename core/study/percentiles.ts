/**
 * Sample percentiles by linear interpolation between order statistics: definition 7 of Hyndman & Fan,
 * "Sample quantiles in statistical packages", The American Statistician 50(4):361–365 (1996), the default
 * of R's quantile() and NumPy's percentile(). For n values sorted ascending, the p-quantile is at
 * h = (n − 1)·p, interpolated between x[⌊h⌋] and x[⌊h⌋ + 1].
 */

/** Quantile p ∈ [0, 1] of values already sorted ascending. NaN for an empty list. */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) return Number.NaN;
  if (n === 1) return sorted[0]!;
  const h = (n - 1) * Math.min(1, Math.max(0, p));
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  const a = sorted[lo]!;
  const b = sorted[hi]!;
  // a + (b − a)·f would give a tiny rounding error when a = b; return a exactly then.
  return a === b ? a : a + (b - a) * (h - lo);
}

/** Quantile of unsorted values (copies and sorts; NaN values are dropped). */
export function quantile(values: ArrayLike<number>, p: number): number {
  return quantileSorted(sortedFinite(values), p);
}

export function sortedFinite(values: ArrayLike<number>): Float64Array {
  const out: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (!Number.isNaN(v)) out.push(v);
  }
  return Float64Array.from(out).sort();
}

export interface PercentileSummary {
  readonly p5: number;
  readonly p50: number;
  readonly p95: number;
  readonly mean: number;
  readonly min: number;
  readonly max: number;
  readonly count: number;
}

export function percentileSummary(values: ArrayLike<number>): PercentileSummary {
  const s = sortedFinite(values);
  let sum = 0;
  for (let i = 0; i < s.length; i++) sum += s[i]!;
  return {
    p5: quantileSorted(s, 0.05),
    p50: quantileSorted(s, 0.5),
    p95: quantileSorted(s, 0.95),
    mean: s.length > 0 ? sum / s.length : Number.NaN,
    min: s.length > 0 ? s[0]! : Number.NaN,
    max: s.length > 0 ? s[s.length - 1]! : Number.NaN,
    count: s.length,
  };
}
