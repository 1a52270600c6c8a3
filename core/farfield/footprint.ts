/**
 * Seabed footprint of a discharge: the area where the dilution is below a required dilution, and how far
 * it reaches. Geometry only (no published coefficients); the layer widths come from gravity-current.ts or
 * the Brooks (1960) field width.
 */
import { dilutionFromProfile, type JetProfile } from "./jet-series";
import { warning, type ResultWarning } from "../warnings";
import type { FootprintResult } from "../result/contract";
import type { GoverningLayer } from "./stage";

export interface FootprintStageInput {
  /** The far-field stage's governing chain (null: nothing reached the seabed, no footprint). */
  readonly governing: GoverningLayer | null;
  /** The compliance stage's governing required dilution. */
  readonly requiredDilution: number;
  /** "edge" runs leave the footprint empty (the edge verdict does not read it). */
  readonly detail?: "full" | "edge";
}

/**
 * The footprint stage: the seabed area below the governing required dilution along the governing chain,
 * with a warning when the limit is still exceeded at the end of the computed range.
 */
export function footprintStage(input: FootprintStageInput): { footprint: FootprintResult; warnings: ResultWarning[] } {
  const g = input.governing;
  if (!g || input.detail === "edge") return { footprint: { area: 0, furthestExtent: 0 }, warnings: [] };
  const footprint = footprintFromLayer(
    { profile: g.profile, impactDistance: g.impactDistance, nearFieldEnd: g.nearFieldEnd },
    g.layer,
    input.requiredDilution,
  );
  const warnings: ResultWarning[] = [];
  if (footprint.furthestExtent >= g.range * 0.999) {
    warnings.push(
      warning(
        "footprint-beyond-range",
        "warning",
        `The governing limit is still exceeded at ${footprint.furthestExtent.toFixed(0)} m, the end of the computed range; the footprint is larger than reported.`,
        {
          stage: "far-field",
        },
      ),
    );
  }
  return { footprint, warnings };
}

export interface FootprintJet {
  readonly profile: JetProfile;
  /** Plan distance where the jet reaches the seabed, m. */
  readonly impactDistance: number;
  /** Plan distance where the near field ends and the layer series starts, m. */
  readonly nearFieldEnd: number;
}

export interface FootprintLayer {
  readonly distance: readonly number[];
  readonly dilution: readonly number[];
  /** Width (advected) or perimeter (radial), m: ∫ width dr is the covered area. */
  readonly width: readonly number[];
}

/**
 * Seabed area where the dilution is below the required dilution, and its furthest extent. The seabed is
 * covered from the impact point on; between impact and the near-field end the layer width grows linearly
 * from zero to its start width (judgement). Radial widths are perimeters, so ∫w dr is an annular area.
 */
export function footprintFromLayer(
  jet: FootprintJet,
  far: FootprintLayer,
  required: number,
): { area: number; furthestExtent: number } {
  if (!(required > 1)) return { area: 0, furthestExtent: 0 };
  const xs: number[] = [];
  const ss: number[] = [];
  const ws: number[] = [];
  const xi = jet.impactDistance;
  const xn = jet.nearFieldEnd;
  const w0 = far.width[0];
  const m = 50;
  for (let i = 0; i < m && xn > xi; i++) {
    const r = xi + ((xn - xi) * i) / m;
    xs.push(r);
    ss.push(dilutionFromProfile(jet.profile, r));
    ws.push((w0 * (r - xi)) / (xn - xi));
  }
  for (let i = 0; i < far.distance.length; i++) {
    xs.push(far.distance[i]);
    ss.push(far.dilution[i]);
    ws.push(far.width[i]);
  }
  let area = 0;
  let extent = 0;
  for (let i = 1; i < xs.length; i++) {
    const a = ss[i - 1] < required;
    const b = ss[i] < required;
    if (!a && !b) continue;
    let x1 = xs[i];
    let w1 = ws[i];
    if (a && !b) {
      // Crossing inside the segment: cut it where the dilution reaches the required value.
      const t = (required - ss[i - 1]) / (ss[i] - ss[i - 1]);
      x1 = xs[i - 1] + t * (xs[i] - xs[i - 1]);
      w1 = ws[i - 1] + t * (ws[i] - ws[i - 1]);
    }
    let x0 = xs[i - 1];
    let w0s = ws[i - 1];
    if (!a && b) {
      const t = (required - ss[i - 1]) / (ss[i] - ss[i - 1]);
      x0 = xs[i - 1] + t * (xs[i] - xs[i - 1]);
      w0s = ws[i - 1] + t * (ws[i] - ws[i - 1]);
    }
    area += 0.5 * (w0s + w1) * (x1 - x0);
    extent = Math.max(extent, x1);
  }
  if (ss.length && ss[0] < required) extent = Math.max(extent, xs[0]);
  return { area, furthestExtent: extent };
}
