/**
 * The `brinefield-result` contract, version 1: what `brinefield run --json` prints and what the
 * app and the report read. Plain, serialisable, SI units. Additions are backwards compatible;
 * a change of meaning bumps `version`. Documented in README.md ("Result contract").
 */
import type { ResultWarning } from "../warnings";
import type { NearFieldMethodResult } from "../nearfield/types";
import type { RecordResult } from "../record/summary";
import type { IntakeResult } from "../intake/result";

export const RESULT_FORMAT = "brinefield-result" as const;
export const RESULT_VERSION = 1 as const;

export interface EquationOfStateInfo {
  /** "TEOS-10" or "Sharqawy-2010+Nayar-2016" */
  readonly name: string;
  readonly source: string;
  readonly reason: string;
}

export interface DensitiesResult {
  readonly discharge: number; // kg/m³ at the port (in situ)
  readonly ambient: number; // kg/m³ at the port depth
  readonly reducedGravity: number; // m/s²
  readonly ambientSurface: number; // kg/m³ at the surface
  readonly ambientBottom: number; // kg/m³ at the seabed
  readonly equationOfState: EquationOfStateInfo;
}

export interface PortResult {
  readonly count: number;
  readonly diameter: number; // m effective
  readonly flow: number; // m³/s per port (mean of the split)
  readonly flows: readonly number[]; // m³/s each port
  readonly velocity: number; // m/s (of the mean port)
  readonly froude: number;
  readonly reynolds: number;
  readonly headLoss: number | null; // m, exit loss estimate where a discharge coefficient is given
}

export interface MultiportResult {
  readonly regime: string; // "single-port" | "independent" | "partially-merged" | "merged-line-source" | ...
  readonly merged: boolean;
  readonly portsUsed: number;
  readonly reason: string;
  readonly spacingRatio: number | null; // s/(dF)
  readonly dilutionFactor: number; // applied to single-jet dilutions (≤ 1)
  /**
   * The merging decision per near-field method with jet widths ÷√2, as used, and ×√2 (the common width
   * definitions differ by about √2): regime and dilution factor for each. Absent for a single port.
   */
  readonly mergingSensitivity?: readonly {
    readonly method: string;
    readonly definition: string;
    readonly widthFactor: number;
    readonly regime: string;
    readonly dilutionFactor: number;
  }[];
  readonly source: string;
}

export interface ConstituentAtEdge {
  readonly constituent: string;
  readonly unit: string;
  readonly concentration: number;
  readonly increase: number;
  readonly background: number;
  readonly discharge: number;
  /**
   * Natural background, present only with `ambient.basin`: `background` is then the raised background the
   * box model gives and `increase` is measured from this natural background (the limit's basis).
   */
  readonly naturalBackground?: number;
}

/** Background build-up in an enclosed basin (`ambient.basin`), from a well-mixed box model. */
export interface BasinResult {
  /** Steady increase of the salinity background, g/kg (salt load over the exchange flow). */
  readonly backgroundIncrease: number;
  /** Time to reach 95 % of the steady increase, s. */
  readonly timeTo95Percent: number;
  /** Exchange flow with the open sea, m³/s. */
  readonly exchangeFlow: number;
  readonly method: string;
  readonly volume: number; // m³
  readonly flushingTime: number; // s
  readonly naturalBackground: number; // g/kg, salinity
  readonly raisedBackground: number; // g/kg, salinity
  /** The same balance for every constituent with a limit basis (salinity, temperature, listed ones). */
  readonly constituents: readonly {
    readonly constituent: string;
    readonly unit: string;
    readonly naturalBackground: number;
    readonly increase: number;
    readonly raisedBackground: number;
  }[];
  readonly source: string;
  /** What the box model leaves out. */
  readonly limits: string;
}

export interface SeriesResult {
  /** Plan distance from the diffuser, m. */
  readonly distance: readonly number[];
  /** Minimum (centreline) dilution at that distance. */
  readonly dilution: readonly number[];
  /** Salinity increase over background, g/kg. */
  readonly salinityIncrease: readonly number[];
  /** Dense-layer thickness, m (null inside the jet). */
  readonly layerThickness: readonly (number | null)[];
  /** Stage at each point. */
  readonly stage: readonly SeriesStage[];
}

/** The stage a point of the dilution series lies in. */
export type SeriesStage = "jet" | "spreading-layer" | "passive-diffusion";

/** Seabed area where the governing limit is exceeded. */
export interface FootprintResult {
  readonly area: number; // m² of seabed where the governing limit is exceeded
  readonly furthestExtent: number; // m from the diffuser
}

export interface MixingZoneResult {
  readonly radius: number; // m
  readonly dilution: number; // centreline dilution at the edge
  readonly method: string; // method chain used to reach the edge
  readonly nearFieldMethod: string; // which near-field method fed the edge
  readonly edgeInsideNearField: boolean;
  readonly alternatives: readonly { readonly method: string; readonly dilution: number }[];
  readonly constituents: readonly ConstituentAtEdge[];
  readonly layerThickness: number | null; // m at the edge
  readonly footprint: FootprintResult;
  readonly series: SeriesResult;
  readonly notModelled: readonly string[];
}

export interface ConstituentCompliance {
  readonly constituent: string;
  readonly unit: string;
  readonly requiredDilution: number;
  readonly edgeDilution: number;
  readonly pass: boolean;
  readonly margin: number; // edge dilution ÷ required dilution
  readonly limit: string; // readable statement of the limit
}

/**
 * The screening verdict at the mixing-zone edge:
 * - "meets": every limit is met and the screening methods apply to the case;
 * - "exceeds": at least one limit is not met (the computed numbers stand);
 * - "outside-scope": the methods do not apply (a dense jet or layer reaches the surface, no near-field
 *   method covers the case, …); the numbers are kept for reading but support no verdict.
 */
export type Verdict = "meets" | "exceeds" | "outside-scope";
/** A study point's state: a verdict, or "refused" when its inputs break a scenario rule. */
export type StudyVerdict = Verdict | "refused";
export const VERDICTS: readonly Verdict[] = ["meets", "exceeds", "outside-scope"];
export const STUDY_VERDICTS: readonly StudyVerdict[] = [...VERDICTS, "refused"];

export interface ComplianceResult {
  readonly governingConstituent: string;
  readonly requiredDilution: number;
  /** True only when `verdict` is "meets". */
  readonly pass: boolean;
  readonly verdict: Verdict;
  /** Why the methods do not apply: non-empty exactly when `verdict` is "outside-scope". */
  readonly scopeReasons: readonly string[];
  readonly margin: number;
  readonly constituents: readonly ConstituentCompliance[];
}

/** Where an ambient case comes from. */
export type CaseKind = "stated" | "listed" | "slack-water" | "record";

/** One ambient case's verdict at the mixing-zone edge (the stated conditions are the case "stated"). */
export interface CaseResult {
  readonly name: string;
  readonly kind: CaseKind;
  readonly edgeDilution: number;
  readonly verdict: Verdict;
  /** Edge dilution ÷ required dilution of the governing limit (≥ 1 meets when in scope). */
  readonly margin: number;
  readonly scopeReasons: readonly string[];
}

/** The verdict over every case: "exceeds" if any case exceeds, else "outside-scope" if any is, else "meets". */
export interface OverallResult {
  /** The case that decides the verdict (the lowest margin among the cases with the deciding verdict). */
  readonly governingCase: string;
  readonly verdict: Verdict;
  readonly margin: number;
  readonly edgeDilution: number;
}

/**
 * The overall verdict of a result; a result without one (written before cases were weighed) is read
 * as its stated conditions alone.
 */
export function overallOf(result: BrinefieldResult): OverallResult {
  return (
    result.overall ?? {
      verdict: result.compliance.verdict,
      governingCase: "stated",
      margin: result.compliance.margin,
      edgeDilution: result.mixingZone.dilution,
    }
  );
}

/** Why the result is outside the methods' scope: every case's reasons, each once, a listed case's named. */
export function scopeReasonsOf(result: BrinefieldResult): string[] {
  const cases = result.cases ?? [];
  return [...new Set(cases.flatMap((k) => k.scopeReasons.map((r) => (k.name === "stated" ? r : `${k.name}: ${r}`))))];
}

export type { BlendResult } from "../rising/blend";
import type { BlendResult } from "../rising/blend";

export interface BrinefieldResult {
  readonly format: typeof RESULT_FORMAT;
  readonly version: typeof RESULT_VERSION;
  readonly program: { readonly name: "brinefield"; readonly version: string };
  /** Short hash of the normalised inputs: equal inputs give equal hashes. */
  readonly inputsHash: string;
  readonly scenarioName: string;
  readonly caution: string;
  readonly conversions: readonly string[];
  readonly discharge: {
    readonly flow: number;
    readonly salinity: number;
    readonly temperature: number;
    readonly fromPlant: boolean;
  };
  readonly densities: DensitiesResult;
  readonly port: PortResult;
  readonly nearField: readonly NearFieldMethodResult[];
  readonly multiport: MultiportResult;
  readonly mixingZone: MixingZoneResult;
  /** The stated conditions' verdict (the case "stated"). */
  readonly compliance: ComplianceResult;
  /** Every ambient case: "stated", each listed case, and "slack water" unless options.addSlackWater is false. */
  readonly cases: readonly CaseResult[];
  /** The verdict over `cases`; the headline verdict of the report and of study rows. */
  readonly overall: OverallResult;
  /** With `ambient.record`: compliance over time (core/record/summary.ts). */
  readonly record?: RecordResult;
  /** With `intake`: brine at the plant's intake (core/intake). */
  readonly intake?: IntakeResult;
  /** Present only with `ambient.basin`: the background build-up used in the compliance. */
  readonly basin?: BasinResult;
  /** Present only for a plant with blending streams: the blend's buoyancy and the blend ratio where it changes sign. */
  readonly blend?: BlendResult;
  readonly warnings: readonly ResultWarning[];
  readonly methods: readonly { readonly stage: string; readonly name: string; readonly source: string }[];
}

export const CAUTION =
  "Caution: screening estimate only. Brinefield's results are not a substitute for detailed " +
  "modelling, field measurements, the permitting authority's requirements, local codes or the " +
  "judgement of a licensed professional, who decide whether a discharge is acceptable.";
