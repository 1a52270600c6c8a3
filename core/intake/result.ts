/**
 * The `intake` object of a result: the intake's figures for the stated conditions (or, with a record,
 * over time: percentiles and the worst step), the steady plant balance with the recirculated brine when
 * the discharge comes from the plant inputs, and the verdict against `intake.maxSalinityIncrease`.
 */
import type { OverallResult } from "../result/contract";
import type { Scenario } from "../scenario/types";
import type { IntakeSample } from "./intake";
import { INTAKE_SOURCE } from "./intake";
import { recirculationFromPlant, type Recirculation } from "./recirculation";
import { weightedQuantile } from "../record/summary";
import { warning, type ResultWarning } from "../warnings";
import { formatNumber } from "../units";

export interface IntakeResult {
  readonly distance: number;
  readonly bearing: number;
  readonly heightAboveSeabed: number;
  /** Dilution of the water drawn (the worst case or step when there are several); null: no brine reaches it. */
  readonly dilution: number | null;
  /** Salinity increase at the intake, g/kg. */
  readonly salinityIncrease: number;
  readonly inDenseLayer: boolean;
  readonly method: string;
  /** Upstream reach of the layer against the current, m (null when not limited). */
  readonly upstreamReach: number | null;
  /** The case or step these figures are for. */
  readonly governingCase: string;
  /** Only when the discharge comes from the plant inputs. */
  readonly recirculation?: Recirculation;
  readonly maxSalinityIncrease?: number;
  /** The increase judged against the limit: the worst, or with a time share P the one not exceeded for P % of the time. */
  readonly judgedSalinityIncrease?: number;
  readonly verdict?: "meets" | "exceeds";
  /** Every ambient case's intake figures (no record). */
  readonly cases?: readonly {
    readonly name: string;
    readonly dilution: number | null;
    readonly salinityIncrease: number;
    readonly inDenseLayer: boolean;
  }[];
  /** With a record: percentiles over time (time-weighted, see core/record/summary.ts) and the worst step. */
  readonly overTime?: {
    readonly salinityIncrease: { readonly p50: number; readonly p95: number; readonly max: number };
    /** Dilution percentiles; steps where no brine reaches the intake count as infinite dilution (null when so). */
    readonly dilution: { readonly min: number | null; readonly p5: number | null; readonly p50: number | null };
    readonly inDenseLayerPercent: number;
    readonly reachedPercent: number;
    readonly worstStep: { readonly time: number; readonly dilution: number | null; readonly salinityIncrease: number };
  };
  readonly source: string;
}

export interface IntakeCase {
  readonly name: string;
  readonly sample: IntakeSample;
  /** Seconds the step stands for (record); 1 for an ambient case. */
  readonly duration: number;
  readonly time?: number;
}

const nullIfInfinite = (v: number) => (Number.isFinite(v) ? v : null);

/**
 * With a record, `record` is set and `cases` are its computed steps.
 */
export function intakeResult(
  scenario: Scenario,
  cases: readonly IntakeCase[],
  record: { readonly percentOfTime: number | null } | null,
): { intake: IntakeResult; warnings: ResultWarning[] } | null {
  const spec = scenario.intake;
  if (!spec || cases.length === 0) return null;
  const worst = cases.reduce((a, c) => (c.sample.salinityIncrease > a.sample.salinityIncrease ? c : a), cases[0]!);
  const w = cases.map((c) => c.duration);
  const inc = cases.map((c) => c.sample.salinityIncrease);
  const dil = cases.map((c) => c.sample.dilution ?? Number.POSITIVE_INFINITY);
  const share = (pred: (c: IntakeCase) => boolean) =>
    (100 * cases.reduce((a, c, i) => a + (pred(c) ? w[i]! : 0), 0)) / w.reduce((a, b) => a + b, 0);
  // The increase the limit is judged on: with a time share P, the increase not exceeded for P % of the time.
  const judged =
    record && record.percentOfTime !== null
      ? weightedQuantile(inc, w, record.percentOfTime / 100)
      : worst.sample.salinityIncrease;
  const max = spec.maxSalinityIncrease;
  const recirculation = recirculationFromPlant(
    scenario,
    worst.sample.dilution,
    worst.sample.background ?? scenario.ambient.profile[scenario.ambient.profile.length - 1]!.salinity,
  );
  const warnings: ResultWarning[] = [];
  const reachedInLayer = cases.filter((c) => c.sample.dilution !== null && c.sample.inDenseLayer);
  if (reachedInLayer.length > 0) {
    warnings.push(
      warning(
        "intake-in-dense-layer",
        "serious",
        `The intake (${formatNumber(spec.distance)} m from the diffuser centre, ${formatNumber(spec.heightAboveSeabed)} m above the seabed) lies inside the spreading brine layer's footprint${
          record
            ? ` for ${formatNumber(
                share((c) => c.sample.dilution !== null && c.sample.inDenseLayer),
                3,
              )} % of the record`
            : ` in ${reachedInLayer.map((c) => `"${c.name}"`).join(", ")}`
        }: it would draw brine back into the plant (salinity increase up to ${formatNumber(worst.sample.salinityIncrease, 3)} g/kg).`,
        { parameter: "intake.distance", value: spec.distance, stage: "intake" },
      ),
    );
  }
  if (recirculation && recirculation.feedSalinity === null) {
    warnings.push(
      warning(
        "intake-runaway",
        "serious",
        "The intake draws back so much brine that the plant balance has no steady state: the feed salinity would keep rising.",
        {
          parameter: "intake.distance",
          value: spec.distance,
          stage: "intake",
        },
      ),
    );
  }
  const intake: IntakeResult = {
    distance: spec.distance,
    bearing: spec.bearing,
    heightAboveSeabed: spec.heightAboveSeabed,
    dilution: worst.sample.dilution,
    salinityIncrease: worst.sample.salinityIncrease,
    inDenseLayer: worst.sample.inDenseLayer,
    method: worst.sample.method,
    upstreamReach: worst.sample.upstreamReach,
    governingCase: worst.name,
    ...(recirculation ? { recirculation } : {}),
    ...(max !== undefined
      ? {
          maxSalinityIncrease: max,
          judgedSalinityIncrease: judged,
          verdict: judged <= max ? ("meets" as const) : ("exceeds" as const),
        }
      : {}),
    ...(record
      ? {
          overTime: {
            salinityIncrease: {
              p50: weightedQuantile(inc, w, 0.5),
              p95: weightedQuantile(inc, w, 0.95),
              max: Math.max(...inc),
            },
            dilution: {
              min: nullIfInfinite(Math.min(...dil)),
              p5: nullIfInfinite(weightedQuantile(dil, w, 0.05)),
              p50: nullIfInfinite(weightedQuantile(dil, w, 0.5)),
            },
            inDenseLayerPercent: share((c) => c.sample.dilution !== null && c.sample.inDenseLayer),
            reachedPercent: share((c) => c.sample.dilution !== null),
            worstStep: {
              time: worst.time ?? 0,
              dilution: worst.sample.dilution,
              salinityIncrease: worst.sample.salinityIncrease,
            },
          },
        }
      : {
          cases: cases.map((c) => ({
            name: c.name,
            dilution: c.sample.dilution,
            salinityIncrease: c.sample.salinityIncrease,
            inDenseLayer: c.sample.inDenseLayer,
          })),
        }),
    source: INTAKE_SOURCE,
  };
  return { intake, warnings };
}

/** The overall verdict with the intake limit folded in: an intake above its limit makes the design fail. */
export function overallWithIntake(overall: OverallResult, intake: IntakeResult | null | undefined): OverallResult {
  if (!intake || intake.verdict !== "exceeds" || overall.verdict === "exceeds") return overall;
  return {
    ...overall,
    governingCase: "intake",
    verdict: "exceeds",
    margin: intake.maxSalinityIncrease! / intake.judgedSalinityIncrease!,
  };
}
