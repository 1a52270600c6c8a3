/**
 * Near-field Method 1, "length-scale": published laboratory laws for an inclined dense jet from a round port
 * in stagnant, unstratified water, scaled by port diameter d and densimetric Froude number F
 * (length = c·d·F, dilution = c·F; see core/correlations/dense-jet-dataset.ts).
 *
 * Datasets held:
 *  1. Lai & Lee (2012), J. Hydro-environment Research 6:9–28, 15°–60° — rise at 15° and 60° (interpolated
 *     between), dilutions at maximum rise and at impact for 38°–60°; read in the paper.
 *  2. Roberts, Ferrier & Daviero (1997), J. Hydraulic Eng. 123(8):693–699, 60° ± 2° — rise, return
 *     distance, impact dilution and near-field end from the same experiments; a secondary quotation.
 * Not implemented, because no coefficient could be cited: Papakonstantis et al. (2011a,b), Shao & Law
 * (2010), Kikkert et al. (2007) analytical solution, Cipollina et al. (2005), Papakonstantis &
 * Christodoulou (2020) polynomial, Abessi & Roberts (2014, 2017) fits.
 *
 * Headline (conservative): where datasets disagree, each quantity takes the value less favourable to the
 * verdict — lower dilution, higher rise, longer distance — and `dilutionRange` shows both impact dilutions
 * (60°: 1.06 F headline, up to 1.6 F). A dataset that gives the impact dilution but not the end of the near
 * field is carried there with the growth Roberts et al. (1997) measured from impact to the near-field end.
 * Every dataset's own values stay in `variants`; `notes` names where each headline came from.
 *
 * Angle coverage: values at an angle come only from data that can be cited for that angle (the rise between
 * 15° and 60° is interpolated between the two cited end points, and the notes say so). Outside 15°–60° the
 * method is not available (`available: false`, every quantity null, the reason given) instead of returning
 * another angle's numbers.
 */
import { warning, type ResultWarning } from "../warnings";
import {
  emptyNearFieldHeadline,
  NEAR_FIELD_HEADLINE_FIELDS,
  nullNearFieldResult,
  type NearFieldHeadlineField,
  type AmbientColumn,
  type JetSource,
  type NearFieldMethodResult,
  type NearFieldVariant,
} from "./types";
import type { DenseJetCoefficients, DenseJetDataset } from "../correlations/dense-jet-dataset";
import { clampAngle } from "../correlations/dense-jet-dataset";
import { ROBERTS_1997_DATASET, ROBERTS_1997_NEAR_FIELD_GROWTH } from "../correlations/roberts-1997-inclined-dense-jet";
import { FLUX_AVERAGING_FACTOR, fluxAveragedFromCentreline } from "./flux-averaging";
import { LAI_LEE_2012_DATASET, LAI_LEE_2012_MAX_RISE_DILUTION } from "../correlations/lai-lee-2012-inclined-dense-jet";
import { currentIssues, stratificationIssues } from "./length-scale-checks";

/** Datasets held; the headline takes, quantity by quantity, the less favourable of those covering the angle. */
export const LENGTH_SCALE_DATASETS: readonly DenseJetDataset[] = [LAI_LEE_2012_DATASET, ROBERTS_1997_DATASET];

/** Union of the studied angles, degrees. */
export const LENGTH_SCALE_ANGLE_RANGE: readonly [number, number] = [
  Math.min(...LENGTH_SCALE_DATASETS.map((d) => d.angleRange[0])),
  Math.max(...LENGTH_SCALE_DATASETS.map((d) => d.angleRange[1])),
];

export interface EvaluatedDataset {
  readonly dataset: DenseJetDataset;
  readonly coefficients: DenseJetCoefficients;
}

/**
 * Datasets usable at `angle` clamped to the studied range. Only the surface check uses the clamped values,
 * as a lower bound on the rise of a steeper port; the method itself never returns another angle's numbers.
 */
export function denseJetDatasetsAtAngle(angle: number): {
  readonly angleUsed: number;
  readonly entries: readonly EvaluatedDataset[];
} {
  const angleUsed = clampAngle(angle, LENGTH_SCALE_ANGLE_RANGE);
  const entries: EvaluatedDataset[] = [];
  for (const dataset of LENGTH_SCALE_DATASETS) {
    const coefficients = dataset.coefficientsAtAngle(angleUsed);
    if (coefficients) entries.push({ dataset, coefficients });
  }
  return { angleUsed, entries };
}

/** Upper-edge rise above the port, m, from every usable dataset (used by the surface check). */
export function publishedRiseHeights(jet: JetSource): { readonly source: string; readonly height: number }[] {
  if (!isDenseJet(jet) || !(jet.angle > 0 && jet.angle <= 90)) return [];
  const scale = jet.diameter * jet.froude;
  return denseJetDatasetsAtAngle(jet.angle)
    .entries.filter((e) => e.coefficients.riseEdge !== null)
    .map((e) => ({ source: e.dataset.source, height: (e.coefficients.riseEdge as number) * scale }));
}

interface Dimensional extends NearFieldVariant {
  readonly maxRiseDilution: number | null;
}

function toDimensional(e: EvaluatedDataset, jet: JetSource): Dimensional {
  const c = e.coefficients;
  const L = jet.diameter * jet.froude;
  const F = jet.froude;
  const len = (v: number | null) => (v === null ? null : v * L);
  // Guard: a dilution is never below 1 (undiluted brine); at very low F the law c·F falls under 1, far
  // outside its studied range, which the Froude-range warning already reports.
  const dil = (v: number | null) => (v === null ? null : Math.max(1, v * F));
  const returnDistance = len(c.returnDistance);
  // Seabed impact: the descending branch is continued below port level as a straight line leaving the return
  // point at the discharge angle (mirror image of the ascent). Published dense-jet trajectories descend at
  // least as steeply as they rise (FROM MEMORY), so the added distance portHeight/tanθ is an upper bound.
  const drop = Math.max(0, jet.portHeight);
  const slope = Math.tan((jet.angle * Math.PI) / 180);
  const impactDistance = returnDistance === null ? null : returnDistance + drop / slope;
  return {
    source: e.dataset.source,
    maxRiseHeight: len(c.riseEdge),
    maxRiseDistance: len(c.maxRiseDistance),
    returnDistance,
    impactDistance,
    // Port-level (return) dilution reported as impact dilution: conservative for a raised port, because the
    // jet keeps diluting on the way down to the bed.
    impactDilution: dil(c.returnDilution),
    nearFieldDistance: len(c.nearFieldDistance),
    nearFieldDilution: dil(c.nearFieldDilution),
    maxRiseDilution: dil(c.maxRiseDilution),
    note: c.notes.length ? c.notes.join(" ") : undefined,
  };
}

function isDenseJet(jet: JetSource): boolean {
  return jet.reducedGravity > 0 && jet.froude > 0 && Number.isFinite(jet.froude) && jet.diameter > 0;
}

function emptyResult(warnings: ResultWarning[], why: string): NearFieldMethodResult {
  return {
    ...nullNearFieldResult("length-scale", "none: " + why, "No length-scale estimate: " + why, warnings, why),
    available: false,
    notAvailableReason: why,
    variants: [],
    notes: [`Not available: ${why}.`],
  };
}

/** The not-available result for a discharge the laws do not describe (not a dense jet, not upward), else null. */
function notADenseUpwardJet(jet: JetSource): NearFieldMethodResult | null {
  const stage = "length-scale";
  if (!isDenseJet(jet)) {
    const why =
      `the discharge is not a dense jet (g′ = ${jet.reducedGravity.toPrecision(3)} m/s², ` +
      `F = ${jet.froude.toPrecision(3)}, d = ${jet.diameter} m); the correlations are for negatively ` +
      `buoyant jets`;
    const w = warning("not-a-dense-jet", "serious", `No length-scale estimate: ${why}.`, { stage });
    return emptyResult([w], why);
  }
  if (!(jet.angle > 0 && jet.angle <= 90)) {
    const why = `discharge angle ${jet.angle}° is not upward (0° < θ ≤ 90°)`;
    const w = warning("angle-not-upward", "serious", `No length-scale estimate: ${why}.`, {
      parameter: "angle",
      value: jet.angle,
      range: [0, 90],
      stage,
    });
    return emptyResult([w], why);
  }
  return null;
}

/**
 * The not-available result for an angle no dataset held covers: values at an angle come only from data
 * that can be cited for that angle, so another angle's numbers are not returned in their place.
 */
function angleNotCovered(jet: JetSource): NearFieldMethodResult {
  const [aLo, aHi] = LENGTH_SCALE_ANGLE_RANGE;
  const why =
    `no published laboratory dataset held covers a ${jet.angle.toFixed(1)}° port (the cited datasets ` +
    `cover ${aLo}°–${aHi}°); another angle's numbers are not used in their place`;
  const w = warning(
    "angle-outside-studied-range",
    "warning",
    `No length-scale estimate: discharge angle ${jet.angle.toFixed(1)}° is outside the ${aLo}°–${aHi}° ` +
      `covered by the published datasets held. ${jet.angle > aHi ? "Steeper" : "Flatter"} jets behave ` +
      `differently, so no other angle's values are used.`,
    { parameter: "angle", value: jet.angle, range: [aLo, aHi], stage: "length-scale" },
  );
  return emptyResult([w], why);
}

/** Each dataset's own dimensional values, with its label. */
interface OwnValues {
  readonly label: string;
  readonly values: Dimensional;
}

/** Headline values and, for each, the dataset (or derivation) it came from. */
interface Headline {
  readonly top: Record<HeadlineField, number | null>;
  readonly from: Partial<Record<HeadlineField, string>>;
}

/**
 * Headline: where datasets disagree, the value less favourable to the verdict (lower dilution, higher
 * rise, longer reach); every dataset's own values stay in `variants` and the range shows the spread.
 */
function conservativeHeadline(own: readonly OwnValues[]): Headline {
  const top: Record<HeadlineField, number | null> = emptyNearFieldHeadline();
  const from: Partial<Record<HeadlineField, string>> = {};
  for (const f of HEADLINE_FIELDS) {
    const lower = DILUTION_FIELDS.has(f);
    for (const o of own) {
      const v = o.values[f];
      if (v === null) continue;
      const cur = top[f];
      if (cur === null || (lower ? v < cur : v > cur)) {
        top[f] = v;
        from[f] = o.label;
      }
    }
  }
  return { top, from };
}

/**
 * Mixing between impact and the end of the near field: a dataset that gives the impact dilution but no
 * near-field end is carried there with the growth Roberts et al. (1997) measured from impact to the
 * near-field end; the conservative headline takes the lower of that and any measured value. Updates
 * `headline` in place and notes what it did.
 */
function carryImpactToNearFieldEnd(headline: Headline, jet: JetSource, notes: string[] | null): void {
  const { top, from } = headline;
  if (top.impactDilution === null) return;
  const grown = top.impactDilution * ROBERTS_1997_NEAR_FIELD_GROWTH.dilution;
  if (top.nearFieldDilution === null || grown < top.nearFieldDilution) {
    notes?.push(
      `nearFieldDilution = impact dilution ${top.impactDilution.toFixed(1)} × ` +
        `${ROBERTS_1997_NEAR_FIELD_GROWTH.dilution.toFixed(3)}, the growth from impact to the end of the ` +
        `near field in Roberts et al. (1997) (S_n/S_i = 2.6/1.6)` +
        (top.nearFieldDilution === null ? "." : `, lower than the measured ${top.nearFieldDilution.toFixed(1)}.`),
    );
    top.nearFieldDilution = grown;
    from.nearFieldDilution = `${from.impactDilution} impact dilution with the Roberts et al. (1997) growth`;
  }
  if (top.nearFieldDistance === null && top.impactDistance !== null) {
    top.nearFieldDistance =
      top.impactDistance + ROBERTS_1997_NEAR_FIELD_GROWTH.spreadLength * jet.diameter * jet.froude;
    from.nearFieldDistance = `impact distance + ${ROBERTS_1997_NEAR_FIELD_GROWTH.spreadLength.toFixed(1)}·d·F (Roberts et al. 1997)`;
  }
}

/** The impact dilutions' spread over the datasets, or null (with a note) when fewer than two give one. */
function impactDilutionRange(own: readonly OwnValues[], notes: string[]): readonly [number, number] | null {
  const dilutions = own.map((v) => v.values.impactDilution).filter((v): v is number => v !== null);
  const dilutionRange: readonly [number, number] | null =
    dilutions.length >= 2 ? [Math.min(...dilutions), Math.max(...dilutions)] : null;
  if (dilutionRange === null) {
    notes.push(
      "No dilution range: fewer than two datasets give an impact dilution here and no published scatter " + "is known.",
    );
  }
  return dilutionRange;
}

/** What a length-scale estimate writes besides its numbers and warnings. */
export interface LengthScaleOptions {
  /**
   * Build the `notes` and the variants' `note` texts (default true). Study loops that read only numbers and
   * warnings turn it off: the same numbers, warnings and source, with `notes` empty.
   */
  readonly text?: boolean;
}

/** Length-scale (Method 1) near-field estimate for one round dense jet. */
export function nearFieldLengthScale(
  jet: JetSource,
  column: AmbientColumn,
  options: LengthScaleOptions = {},
): NearFieldMethodResult {
  const text = options.text !== false;
  const notApplicable = notADenseUpwardJet(jet);
  if (notApplicable) return notApplicable;
  const entries = LENGTH_SCALE_DATASETS.flatMap((dataset) => {
    const coefficients = dataset.coefficientsAtAngle(jet.angle);
    return coefficients ? [{ dataset, coefficients }] : [];
  });
  if (entries.length === 0) return angleNotCovered(jet);

  const warnings: ResultWarning[] = [];
  const notes: string[] = [];
  for (const e of entries) {
    warnings.push(...e.dataset.validityIssues({ angle: jet.angle, froude: jet.froude }));
  }
  warnings.push(...currentIssues(jet, column, text ? notes : []));
  warnings.push(...stratificationIssues(jet, column, Math.max(0, ...publishedRiseHeights(jet).map((r) => r.height))));

  const own = entries.map((e) => ({ label: e.dataset.label, values: toDimensional(e, jet) }));
  if (text) for (const e of entries) notes.push(...e.coefficients.notes);

  const headline = conservativeHeadline(own);
  carryImpactToNearFieldEnd(headline, jet, text ? notes : null);
  const { top, from } = headline;
  const used = [...new Set(Object.values(from))];
  if (text && own.length > 1) {
    notes.push(
      "Headline values are the less favourable of the datasets for each quantity (lower dilution, higher " +
        "rise, longer distance): " +
        HEADLINE_FIELDS.filter((f) => from[f])
          .map((f) => `${f} from ${from[f]}`)
          .join("; ") +
        ".",
    );
  }
  if (text && top.impactDistance !== null && jet.portHeight > 0) {
    notes.push(
      `Impact distance = return distance + portHeight/tan(${jet.angle.toFixed(1)}°): the descent below port ` +
        `level is continued as a straight line at the discharge angle (an upper bound on the added distance).`,
    );
  }
  const dilutionRange = impactDilutionRange(own, text ? notes : []);

  const source =
    own.length === 1
      ? `${entries[0].dataset.source} — the only dataset held that covers this angle`
      : `${entries.map((e) => e.dataset.source).join("; ")} — headline is the less favourable value of each ` +
        `quantity (${used.join("; ")})`;

  const flux = fluxAveragedFromCentreline(top.impactDilution);
  return {
    method: "length-scale",
    available: true,
    notAvailableReason: null,
    source,
    maxRiseHeight: top.maxRiseHeight,
    maxRiseDistance: top.maxRiseDistance,
    returnDistance: top.returnDistance,
    impactDistance: top.impactDistance,
    impactDilution: top.impactDilution,
    nearFieldDistance: top.nearFieldDistance,
    nearFieldDilution: top.nearFieldDilution,
    maxRiseDilution: top.maxRiseDilution,
    dilutionRange,
    impactDilutionFluxAveraged: flux,
    nearFieldDilutionFluxAveraged: fluxAveragedFromCentreline(top.nearFieldDilution),
    fluxAveragingFactor: FLUX_AVERAGING_FACTOR,
    entrainedFlow: flux === null ? null : jet.flow * (flux - 1),
    bias: BIAS,
    warnings,
    variants: own.map((v) => toVariant(v.values, text)),
    notes: text ? [...notes, BASIS_NOTE] : [],
  };
}

const BASIS_NOTE =
  `Dilutions are centreline (minimum) values; the …FluxAveraged values are × ${FLUX_AVERAGING_FACTOR.toFixed(3)} ` +
  "= (1 + λ²)/λ² for Gaussian velocity and tracer profiles with λ = 1.2 (Fischer et al. 1979), the same " +
  "basis as the integral model. entrainedFlow = Q0 × (flux-averaged impact dilution − 1).";

type HeadlineField = NearFieldHeadlineField;
const HEADLINE_FIELDS = NEAR_FIELD_HEADLINE_FIELDS;
const DILUTION_FIELDS: ReadonlySet<HeadlineField> = new Set(["impactDilution", "nearFieldDilution", "maxRiseDilution"]);

const BIAS =
  "Laboratory length-scale laws for one round jet in stagnant, unstratified, deep water, asymptotic in " +
  "F (F ≳ 20–25), given only at the angles the cited datasets cover. Impact dilution is the centreline " +
  "(minimum) value where the centreline is back at port level, conservative for a raised port. Published " +
  "60° impact dilutions differ by 50 %: 1.06·F (Lai & Lee 2012) is the headline and " +
  "1.6·F (Roberts et al. 1997) the top of the range. Lai & Lee (2012) found a " +
  "Lagrangian integral model under-predicts rise by 10–15 % and dilution at maximum rise by about 30 % " +
  `against these measurements (S_t/F = ${LAI_LEE_2012_MAX_RISE_DILUTION.value}).`;

/** The contract's variant shape (it has no dilution at maximum rise). */
function toVariant(v: Dimensional, withNote: boolean): NearFieldVariant {
  const { source, maxRiseHeight, maxRiseDistance, returnDistance, impactDistance, impactDilution } = v;
  const { nearFieldDistance, nearFieldDilution, note } = v;
  const out = {
    source,
    maxRiseHeight,
    maxRiseDistance,
    returnDistance,
    impactDistance,
    impactDilution,
    nearFieldDistance,
    nearFieldDilution,
  };
  if (!withNote) return out;
  const rise = v.maxRiseDilution;
  const extra = rise === null ? [] : [`Dilution at maximum rise ${rise.toFixed(1)}.`];
  const text = [...(note ? [note] : []), ...extra].join(" ");
  return text ? { ...out, note: text } : out;
}
