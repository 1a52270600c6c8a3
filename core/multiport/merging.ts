/**
 * Merging of neighbouring dense jets on a multiport diffuser (straight line or rosette risers).
 *
 * Criterion (geometric): neighbouring jets merge where the full jet width equals the spacing between
 * their centrelines — "plumes begin to merge when the width of the individual plumes becomes equal to
 * the spacing between the ports" (Davis, L.R., *Fundamentals of Environmental Discharge Modeling*, CRC
 * Press 1999, chapter 4 on Eulerian integral methods; book details from memory). The published
 * dense-jet threshold in s/(dF) (Abessi & Roberts 2014, J. Hydraulic Engineering 140(8)) has not been
 * read in the paper and is therefore NOT used; s/(dF) is reported for comparison only.
 *
 * Jet width: 2 × the half-width of the integral path where a path exists; otherwise 2 × 0.127·s (Gaussian
 * 1/e tracer half-width of a round jet, Fischer et al. 1979, from memory) along an estimated path length s.
 * Regimes: jets still apart at impact → "independent" (factor 1); touching before maximum rise →
 * "merged-line-source" (line-plume dilution, see line-plume.ts); in between → "partially-merged", where the
 * reduction is scaled by the fraction of the descent travelled after merging (engineering judgement).
 * The dilution factor never exceeds 1: merging can only reduce the single-jet dilution here.
 */
import type { Scenario } from "../scenario/types";
import type { JetSource, NearFieldMethodResult } from "../nearfield/types";
import type { MultiportResult } from "../result/contract";
import { warning, type ResultWarning } from "../warnings";
import { portCountFromDiffuser } from "./port-hydraulics";
import { LINE_PLUME_SOURCE, linePlumeDilutionFromFlux, linePlumeDilutionFromFluxValidityIssues } from "./line-plume";
import { mergingReason } from "./merging-reason";

export const MERGING_SOURCE =
  "Geometric merging criterion (jet width = spacing; Davis 1999, ch. 4) with line-plume " +
  "limit (Fischer et al. 1979 ch. 9; Roberts et al. 1989)";
const JET_TRACER_SPREAD = 0.127; // Fischer et al. (1979) ch. 9, round-jet tracer width b_c/x, from memory

export interface MultiportInput {
  readonly scenario: Scenario;
  readonly jet: JetSource;
  readonly nearField: readonly NearFieldMethodResult[];
  /**
   * Build the texts (default true): `reason` and the note added to each scaled method. Study loops that
   * read only numbers and warnings turn it off: the same regime, factors and warnings, `reason` "" and no
   * note added.
   */
  readonly text?: boolean;
}

export interface JetWidths {
  readonly maxRiseDistance: number; // m, plan
  readonly impactDistance: number; // m, plan
  readonly widthAtMaxRise: number; // m, full width
  readonly widthAtImpact: number; // m, full width
  readonly fallHeight: number; // m, from max rise to seabed
  readonly basis: string;
}

export interface MethodMerging {
  readonly method: string;
  readonly regime: string;
  readonly factor: number;
  readonly widths: JetWidths | null;
  readonly spacingAtMaxRise: number;
  readonly spacingAtImpact: number;
  readonly lineDilution: number | null;
  /** The decision with other jet-width definitions (see MERGING_WIDTH_DEFINITIONS). */
  readonly sensitivity?: readonly MergingSensitivity[];
}

export interface MergingSensitivity {
  readonly method: string;
  readonly definition: string;
  readonly widthFactor: number;
  readonly regime: string;
  readonly factor: number;
}

export interface MultiportAssessment {
  readonly multiport: MultiportResult;
  readonly nearField: NearFieldMethodResult[];
  readonly perMethod: readonly MethodMerging[];
  readonly warnings: ResultWarning[];
}

const degToRad = (deg: number) => (deg * Math.PI) / 180;

/** Widths of one method's jet at maximum rise and at impact, from its path or from its length scales. */
export function jetWidthsFromNearField(nf: NearFieldMethodResult, portHeight: number): JetWidths | null {
  const path = nf.path;
  if (path && path.length >= 2) {
    let iTop = 0;
    for (let i = 1; i < path.length; i++) if (path[i].z > path[iTop].z) iTop = i;
    let iImp = path.length - 1;
    for (let i = iTop; i < path.length; i++) {
      if (path[i].z <= -portHeight) {
        iImp = i;
        break;
      }
    }
    const top = path[iTop];
    const imp = path[iImp];
    return {
      maxRiseDistance: Math.hypot(top.x, top.y),
      impactDistance: Math.hypot(imp.x, imp.y),
      widthAtMaxRise: 2 * top.halfWidth,
      widthAtImpact: 2 * imp.halfWidth,
      fallHeight: top.z + portHeight,
      basis: `${nf.method} path half-widths`,
    };
  }
  if (nf.maxRiseHeight === null) return null;
  const xi = nf.impactDistance ?? nf.returnDistance;
  const xm = nf.maxRiseDistance ?? (xi !== null ? 0.5 * xi : null);
  if (xm === null) return null;
  const zm = nf.maxRiseHeight;
  const ximp = xi ?? 2 * xm;
  const sTop = Math.hypot(xm, zm);
  const sImp = sTop + Math.hypot(Math.max(0, ximp - xm), zm + portHeight);
  return {
    maxRiseDistance: xm,
    impactDistance: ximp,
    widthAtMaxRise: 2 * JET_TRACER_SPREAD * sTop,
    widthAtImpact: 2 * JET_TRACER_SPREAD * sImp,
    fallHeight: zm + portHeight,
    basis: `${nf.method} length scales with round-jet spreading 0.127 s (Fischer et al. 1979 ch. 9)`,
  };
}

/** Smallest angular gap between port azimuths on one riser, radians (2π for a single port). */
function smallestAzimuthGap(azimuths: readonly number[]): number {
  if (azimuths.length < 2) return 2 * Math.PI;
  const a = azimuths.map((x) => ((x % 360) + 360) % 360).sort((p, q) => p - q);
  let gap = 360 - a[a.length - 1] + a[0];
  for (let i = 1; i < a.length; i++) gap = Math.min(gap, a[i] - a[i - 1]);
  return degToRad(gap);
}

/** Distance between neighbouring jet centrelines at plan distance r from their port, m. */
export function neighbourSpacingAtDistance(scenario: Scenario, r: number): number {
  const d = scenario.diffuser;
  if (portCountFromDiffuser(scenario) <= 1) return Infinity;
  if (d.layout === "rosette" && d.risers) {
    const rs = d.risers;
    const gap = smallestAzimuthGap(rs.portAzimuths);
    const within = rs.portsPerRiser > 1 ? 2 * r * Math.sin(Math.min(gap, Math.PI) / 2) : Infinity;
    const between = rs.count > 1 ? rs.spacing : Infinity;
    return Math.min(within, between);
  }
  // Straight diffuser: the spacing seen across the jets is the port spacing projected normal to the jets.
  return d.portSpacing * Math.abs(Math.sin(degToRad(d.diffuserAzimuth - d.portAzimuth)));
}

/** Diffuser length over which a merged discharge spreads, m (see module header). */
function mergedLineLength(scenario: Scenario, maxRiseDistance: number): number {
  const d = scenario.diffuser;
  const n = portCountFromDiffuser(scenario);
  if (d.layout === "rosette" && d.risers) {
    // A single riser whose jets merge forms a ring at the max-rise radius (engineering judgement).
    return d.risers.count > 1 ? d.risers.count * d.risers.spacing : 2 * Math.PI * Math.max(maxRiseDistance, 1e-6);
  }
  return n * d.portSpacing; // each port serves one spacing of diffuser (common practice, no source)
}

/**
 * Applies a merging factor to one method's dilutions after maximum rise. Every dilution goes through the
 * same monotone map g(v) = max(dilution where the jets merge, v·factor), so the order low ≤ value ≤ high of
 * the range, and impact ≤ near-field end, survive the scaling; flux-averaged values and the entrained flow
 * are recomputed from the scaled centreline values with the method's own factor.
 */
function scaleMethod(
  nf: NearFieldMethodResult,
  factor: number,
  note: string | null,
  portFlow: number,
): NearFieldMethodResult {
  if (factor >= 1) return nf;
  const path = nf.path;
  let iTop = 0;
  if (path) for (let i = 1; i < path.length; i++) if (path[i].z > path[iTop].z) iTop = i;
  // Merging lowers dilution from the top of the jets on, but dilution never falls along the path: the
  // reduced curve is held at the dilution reached where the jets merge until it climbs above it.
  const atMerge = path && path.length ? path[iTop].dilution : 1;
  const g = (v: number) => Math.max(1, atMerge, v * factor);
  const gn = (v: number | null | undefined) => (v === null || v === undefined ? null : g(v));
  let running = atMerge;
  const scaledPath = path?.map((p, i) => {
    if (i <= iTop) return p;
    running = Math.max(running, p.dilution * factor);
    return { ...p, dilution: running };
  });
  const impact = gn(nf.impactDilution);
  const k = nf.fluxAveragingFactor ?? null;
  const flux = (v: number | null) => (v === null || k === null ? null : v * k);
  const impactFlux = flux(impact);
  return {
    ...nf,
    impactDilution: impact,
    nearFieldDilution: gn(nf.nearFieldDilution),
    dilutionRange: nf.dilutionRange ? [g(nf.dilutionRange[0]), g(nf.dilutionRange[1])] : null,
    impactDilutionFluxAveraged: impactFlux,
    nearFieldDilutionFluxAveraged: flux(gn(nf.nearFieldDilution)),
    entrainedFlow:
      impactFlux !== null && portFlow > 0
        ? portFlow * (impactFlux - 1)
        : nf.entrainedFlow === null
          ? null
          : nf.entrainedFlow * factor,
    path: scaledPath,
    notes: note === null ? nf.notes : [...(nf.notes ?? []), note],
  };
}

/** Jet-width definitions the merging decision is tried with, as multiples of the width used. */
export const MERGING_WIDTH_DEFINITIONS: readonly { readonly definition: string; readonly widthFactor: number }[] = [
  // The integral path's top-hat width is √2 × the Gaussian 1/e velocity width (DERIVED for equal fluxes):
  // the common width definitions differ by about that factor either way.
  {
    definition: "narrower: width used ÷ √2 (e.g. Gaussian 1/e velocity width instead of top-hat)",
    widthFactor: Math.SQRT1_2,
  },
  { definition: "width used (see basis)", widthFactor: 1 },
  {
    definition: "wider: width used × √2 (e.g. top-hat instead of Gaussian, or the visible edge)",
    widthFactor: Math.SQRT2,
  },
];

/** Regime and dilution factor of one method for jet widths multiplied by `widthFactor`. */
function regimeFor(
  widths: JetWidths,
  widthFactor: number,
  sTop: number,
  sImp: number,
  mergedFactor: number,
): { regime: string; factor: number } {
  const rTop = (widthFactor * widths.widthAtMaxRise) / sTop;
  const rImp = (widthFactor * widths.widthAtImpact) / sImp;
  if (rImp <= 1) return { regime: "independent", factor: 1 };
  if (rTop >= 1) return { regime: "merged-line-source", factor: mergedFactor };
  const after = Math.min(1, Math.max(0, (rImp - 1) / (rImp - rTop)));
  return { regime: "partially-merged", factor: 1 - after * (1 - mergedFactor) };
}

/**
 * Decide whether neighbouring jets merge and reduce each near-field method's dilutions accordingly.
 * The returned `nearField` holds the adjusted results (unchanged when the jets stay apart).
 */
export function multiportFromNearField(input: MultiportInput): MultiportAssessment {
  const { scenario, jet, nearField } = input;
  const text = input.text !== false;
  const n = portCountFromDiffuser(scenario);
  if (n <= 1) return singlePortAssessment(nearField);
  const each = nearField.map((nf) => methodMergingFromNearField(scenario, jet, nf, text));
  const perMethod = each.map((m) => m.merging);
  const warnings: ResultWarning[] = each.flatMap((m) => m.warnings);
  const known = perMethod.filter((m) => m.regime !== "unknown");
  const worst = known.reduce<MethodMerging | null>((w, m) => (w === null || m.factor < w.factor ? m : w), null);
  const regime = mostMergedRegime(known);
  if (!known.length) {
    warnings.push(
      warning(
        "multiport-merging-unknown",
        "warning",
        "No near-field method gave jet widths; merging was not assessed.",
        { stage: "multiport" },
      ),
    );
  }
  const dF = jet.diameter * jet.froude;
  const spacing =
    scenario.diffuser.layout === "rosette" && scenario.diffuser.risers
      ? scenario.diffuser.risers.spacing
      : scenario.diffuser.portSpacing;
  const sensitivity = known.flatMap((m) => m.sensitivity ?? []);
  return {
    multiport: {
      regime,
      merged: regime === "merged-line-source",
      portsUsed: n,
      reason: text ? mergingReason({ known, sensitivity, dF, spacing }) : "",
      spacingRatio: dF > 0 && Number.isFinite(dF) ? spacing / dF : null,
      dilutionFactor: worst ? worst.factor : 1,
      mergingSensitivity: sensitivity.map(({ method, definition, widthFactor, regime, factor }) => ({
        method,
        definition,
        widthFactor,
        regime,
        dilutionFactor: factor,
      })),
      source: `${MERGING_SOURCE}; ${LINE_PLUME_SOURCE}`,
    },
    nearField: each.map((m) => m.adjusted),
    perMethod,
    warnings,
  };
}

/** One port: no neighbouring jets, the near-field results unchanged. */
function singlePortAssessment(nearField: readonly NearFieldMethodResult[]): MultiportAssessment {
  return {
    multiport: {
      regime: "single-port",
      merged: false,
      portsUsed: 1,
      reason: "One port: no neighbouring jets.",
      spacingRatio: null,
      dilutionFactor: 1,
      source: MERGING_SOURCE,
    },
    nearField: [...nearField],
    perMethod: [],
    warnings: [],
  };
}

/**
 * The merging decision of one near-field method (regime, factor, its sensitivity to the jet-width
 * definition) and that method's result with the dilutions after maximum rise scaled by the factor.
 */
function methodMergingFromNearField(
  scenario: Scenario,
  jet: JetSource,
  nf: NearFieldMethodResult,
  text: boolean,
): { merging: MethodMerging; adjusted: NearFieldMethodResult; warnings: ResultWarning[] } {
  const widths = jetWidthsFromNearField(nf, scenario.diffuser.portHeight);
  if (!widths || nf.impactDilution === null) {
    const merging: MethodMerging = {
      method: nf.method,
      regime: "unknown",
      factor: 1,
      widths,
      spacingAtMaxRise: NaN,
      spacingAtImpact: NaN,
      lineDilution: null,
    };
    return { merging, adjusted: nf, warnings: [] };
  }
  const sTop = neighbourSpacingAtDistance(scenario, widths.maxRiseDistance);
  const sImp = neighbourSpacingAtDistance(scenario, widths.impactDistance);
  const length = mergedLineLength(scenario, widths.maxRiseDistance);
  const q = scenario.discharge.flow / length;
  const lineDilution = linePlumeDilutionFromFlux(q, jet.reducedGravity, widths.fallHeight);
  const warnings = linePlumeDilutionFromFluxValidityIssues(q, jet.reducedGravity, widths.fallHeight);
  const mergedFactor = Math.min(1, lineDilution / nf.impactDilution);
  const { regime, factor } = regimeFor(widths, 1, sTop, sImp, mergedFactor);
  const sensitivity = MERGING_WIDTH_DEFINITIONS.map((d) => ({
    method: nf.method,
    definition: d.definition,
    widthFactor: d.widthFactor,
    ...regimeFor(widths, d.widthFactor, sTop, sImp, mergedFactor),
  }));
  const merging: MethodMerging = {
    method: nf.method,
    regime,
    factor,
    widths,
    spacingAtMaxRise: sTop,
    spacingAtImpact: sImp,
    lineDilution,
    sensitivity,
  };
  const note = text
    ? `Multiport ${regime}: dilutions after maximum rise multiplied by ${factor.toFixed(3)} ` +
      `(line-plume dilution ${lineDilution.toFixed(1)} vs single-jet impact dilution ${nf.impactDilution.toFixed(1)}).`
    : null;
  return { merging, adjusted: scaleMethod(nf, factor, note, jet.flow), warnings: [...warnings] };
}

/** The most merged regime of the methods that could be assessed ("unknown" when none could). */
function mostMergedRegime(known: readonly MethodMerging[]): string {
  const regimeRank = ["independent", "partially-merged", "merged-line-source"];
  return known.length
    ? known.map((m) => m.regime).sort((a, b) => regimeRank.indexOf(b) - regimeRank.indexOf(a))[0]!
    : "unknown";
}
