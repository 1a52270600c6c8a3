/**
 * Passive lateral diffusion of a wastefield carried by a current, with the 4/3-law diffusivity.
 *
 * Source: Brooks, N.H., "Diffusion of sewage effluent in an ocean current", Proc. 1st Int. Conf. Waste
 * Disposal in the Marine Environment, Pergamon, pp 246–267 (1960); reproduced in Fischer, List, Koh,
 * Imberger & Brooks, *Mixing in Inland and Coastal Waters*, Academic Press (1979) ch. 9 — formula from
 * memory, quoted in secondary literature and not checked against the original paper. Centreline solution for a field of initial width b, speed u, no vertical mixing:
 *
 *   c_max/c₀ = erf √( (3/2) / ((1 + (2/3)·β·x/b)³ − 1) ),  β = 12·ε₀/(u·b),  ε₀ = α_ε·b^{4/3}
 *
 * and the far-field dilution S_ff = c₀/c_max. Diffusivity grows as ε = α_ε·L^{4/3} (Richardson 1926).
 * Typical α_ε ≈ 0.01 cm^{2/3}/s = 4.6×10⁻⁴ m^{2/3}/s, range about 0.002–0.01 cm^{2/3}/s
 * (from memory). Field tests support the 4/3 law at 20–140 m scales (Snyder, 1967, dye studies in
 * Monterey Bay, Naval Postgraduate School thesis). Limits: S_ff → 1 as x → 0; S_ff grows without bound as x → ∞.
 *
 * Conventions: x is distance travelled with the current from the start of passive diffusion, m.
 */
import { erf } from "./erf";
import { warning, type ResultWarning } from "../warnings";

export const BROOKS_1960_SOURCE =
  "Brooks (1960) 4/3-law lateral diffusion, as reproduced in Fischer et al. (1979) ch. 9";

/** α_ε = 0.01 cm^{2/3}/s expressed in m^{2/3}/s (Fischer et al. 1979 ch. 9, from memory). */
export const FOUR_THIRDS_LAW_COEFFICIENT = 0.01 * Math.pow(0.01, 2 / 3);

export interface BrooksInput {
  /** Distance travelled with the current, m. */
  readonly distance: number;
  /** Initial field width b, m. */
  readonly initialWidth: number;
  /** Current speed u, m/s. */
  readonly currentSpeed: number;
  /** 4/3-law coefficient α_ε, m^{2/3}/s (default 4.6×10⁻⁴). */
  readonly alpha?: number;
}

/**
 * Constants of one wastefield (initial width, current, α_ε) for evaluating the closed forms below at many
 * distances: {@link brooksFieldFromInput} computes the growth rates once, {@link brooksDilutionInField} and
 * {@link brooksWidthInField} then cost one power each (same arithmetic as the single-distance functions).
 */
export interface BrooksField {
  /** Initial field width b, m. */
  readonly b: number;
  /** Current speed u, m/s. */
  readonly u: number;
  /** 4/3-law coefficient α_ε, m^{2/3}/s. */
  readonly alpha: number;
  /** (2/3)·β of the dilution formula, β = 12·ε₀/(u·b). */
  readonly dilutionRate: number;
  /** (2/3)·β of the width formula (the same β, multiplied in another order). */
  readonly widthRate: number;
}

/** The field constants of {@link BrooksField}; `distance` in the input is ignored. */
export function brooksFieldFromInput(input: Omit<BrooksInput, "distance">): BrooksField {
  const { initialWidth: b, currentSpeed: u } = input;
  const alpha = input.alpha ?? FOUR_THIRDS_LAW_COEFFICIENT;
  const eps0 = alpha * Math.pow(b, 4 / 3);
  const beta = (12 * eps0) / (u * b);
  const betaWidth = (12 * alpha * Math.pow(b, 4 / 3)) / (u * b);
  return { b, u, alpha, dilutionRate: (2 / 3) * beta, widthRate: (2 / 3) * betaWidth };
}

/**
 * Centreline far-field dilution S_ff = c₀/c_max from Brooks (1960).
 * @returns dilution ≥ 1 (dimensionless); 1 at x = 0 or when the current is zero (no transport)
 */
export function brooksDilutionFromDistance(input: BrooksInput): number {
  return brooksDilutionInField(brooksFieldFromInput(input), input.distance);
}

/** {@link brooksDilutionFromDistance} at distance x (m) in a field from {@link brooksFieldFromInput}. */
export function brooksDilutionInField(f: BrooksField, x: number): number {
  // No transport or no width: the closed form is undefined; no passive dilution is credited.
  if (!(x > 0) || !(f.b > 0) || !(f.u > 0) || !(f.alpha > 0)) return 1;
  const grow = Math.pow(1 + (f.dilutionRate * x) / f.b, 3) - 1;
  const cRatio = erf(Math.sqrt(1.5 / grow));
  return 1 / cRatio;
}

/** Field width b(x)/b = (1 + (2/3)·β·x/b)^{3/2} of the 4/3-law solution (Brooks 1960, from memory). */
export function brooksWidthFromDistance(input: BrooksInput): number {
  return brooksWidthInField(brooksFieldFromInput(input), input.distance);
}

/** {@link brooksWidthFromDistance} at distance x (m) in a field from {@link brooksFieldFromInput}. */
export function brooksWidthInField(f: BrooksField, x: number): number {
  // No transport, no width or no diffusion: the field keeps its initial width.
  if (!(x > 0) || !(f.b > 0) || !(f.u > 0) || !(f.alpha > 0)) return Math.max(f.b, 0);
  return f.b * Math.pow(1 + (f.widthRate * x) / f.b, 1.5);
}

/** Range checks for {@link brooksDilutionFromDistance}; never throws. */
export function brooksDilutionFromDistanceValidityIssues(input: BrooksInput): ResultWarning[] {
  const out: ResultWarning[] = [];
  const alpha = input.alpha ?? FOUR_THIRDS_LAW_COEFFICIENT;
  const lo = 0.002 * Math.pow(0.01, 2 / 3);
  const hi = FOUR_THIRDS_LAW_COEFFICIENT;
  if (alpha < lo * 0.999 || alpha > hi * 1.001) {
    out.push(
      warning(
        "brooks-alpha-outside-typical",
        "info",
        `4/3-law coefficient ${alpha.toExponential(2)} m^(2/3)/s is outside the typical 0.002–0.01 cm^(2/3)/s.`,
        { parameter: "alpha", value: alpha, range: [lo, hi], source: BROOKS_1960_SOURCE, stage: "far-field" },
      ),
    );
  }
  if (input.currentSpeed <= 0) {
    out.push(
      warning(
        "brooks-no-current",
        "info",
        "Passive diffusion in a current needs a current; none given, so no passive dilution is credited.",
        {
          parameter: "ambient.currentSpeed",
          value: input.currentSpeed,
          source: BROOKS_1960_SOURCE,
          stage: "far-field",
        },
      ),
    );
  }
  return out;
}
