/**
 * Error function for the far-field closed forms.
 *
 * Source: Abramowitz, M., Stegun, I.A., *Handbook of Mathematical Functions*, NBS Applied Mathematics
 * Series 55 (1964), eq. 7.1.26 — rational approximation with |error| ≤ 1.5×10⁻⁷ (from memory).
 * Odd symmetry erf(−x) = −erf(x) is used for negative arguments.
 *
 * @param x argument (dimensionless)
 * @returns erf(x), dimensionless, in [−1, 1]
 */
export function erf(x: number): number {
  if (x === Infinity) return 1;
  if (x === -Infinity) return -1;
  const sign = x < 0 ? -1 : 1;
  const ax = Math.abs(x);
  // Coefficients of A&S 7.1.26 (p = 0.3275911, a1…a5).
  const t = 1 / (1 + 0.3275911 * ax);
  const poly = t * (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
  return sign * (1 - poly * Math.exp(-ax * ax));
}
