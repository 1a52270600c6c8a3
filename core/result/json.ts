/**
 * JSON text of everything Brinefield prints or saves as JSON (results, sweeps, Monte Carlo summaries,
 * comparisons, claim checks, designs). JSON has no infinity and `JSON.stringify` writes ±Infinity as
 * `null`, which reads as "no bound given"; a range bound that is unbounded (a validity range
 * [20, Infinity], say) is written as the string "Infinity" or "-Infinity" instead. Documented in
 * README.md ("Result contract").
 */

/** An explicit JSON form of one range bound: the number, or "Infinity" / "-Infinity" / "NaN". */
export function rangeBoundJson(v: unknown): unknown {
  if (typeof v !== "number" || Number.isFinite(v)) return v;
  return Number.isNaN(v) ? "NaN" : v > 0 ? "Infinity" : "-Infinity";
}

/** `JSON.stringify` replacer: arrays under a key named `range` or ending in `Range` get explicit bounds. */
export function jsonRangeReplacer(key: string, value: unknown): unknown {
  if (Array.isArray(value) && (key === "range" || key.endsWith("Range"))) return value.map(rangeBoundJson);
  return value;
}

/** Pretty-printed JSON text with explicit range bounds and a final newline. */
export function jsonText(value: unknown): string {
  return JSON.stringify(value, jsonRangeReplacer, 2) + "\n";
}
