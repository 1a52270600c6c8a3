/**
 * Brine reaching the plant's own seawater intake, read off the same near- and far-field results that give
 * the mixing-zone edge (one pipeline run, `detail: "full"`, whose `mixingZone.series` is the centreline
 * series from the diffuser outward).
 *
 * The rule (screening, conservative where it has to choose):
 * 1. Within the near field (closer to the diffuser centre than the point where the jet joins the seabed
 *    layer) the intake draws water at the near-field dilution, the dilution the jet hands to the layer.
 * 2. Slack water (current below 1 mm/s): the layer spreads radially, the same in every direction; the
 *    intake sees the series dilution at its distance.
 * 3. A current, intake downstream or across (bearing within 90° of the current's direction): the layer
 *    drifts with the current; the intake sees the series dilution at its distance (its sideways offset is
 *    not credited — conservative).
 * 4. A current, intake upstream: the layer's front advances against the opposing component of the current
 *    u_o = u·|cos θ| only while its own front speed exceeds it. A gravity-current front in deep water moves
 *    at c = √2·√(g′h) relative to the water ahead (Benjamin, T.B., "Gravity currents and related phenomena",
 *    J. Fluid Mech. 31(2):209–248, 1968: the energy-conserving front condition in the limit of a deep
 *    ambient; the value √2 is from memory), and the front is arrested where c falls to u_o — Benjamin's own
 *    frame, a front held still by the stream flowing against it. With g′ = g′₀/S and h the layer
 *    thickness along the series, the upstream reach L is the first distance where c ≤ u_o; an intake
 *    beyond L sees no brine (salinity increase 0), one within L sees the series dilution. If the front is
 *    not arrested within the series, it is taken to reach the intake (conservative).
 * Beyond the end of the series the last dilution is kept (it only grows further out: conservative).
 * `inDenseLayer` is true when the intake mouth lies within the layer thickness there; the dilution is the
 * layer's whatever the mouth height (an intake above the layer may draw less brine: conservative).
 * Each record step is a quasi-steady state: no brine is carried from one step to the next.
 */
import type { IntakeInput, Scenario } from "../scenario/types";
import type { SeriesResult } from "../result/contract";
import { STANDARD_GRAVITY } from "../constants";
import { interpolateLinear } from "../interpolate";

/** Front Froude number c/√(g′h) of a gravity current in deep water (Benjamin 1968; value from memory). */
export const FRONT_FROUDE_DEEP = Math.SQRT2;
/** Currents below this are slack water (the far-field stage's own threshold, common practice, no source). */
export const SLACK_CURRENT = 1e-3;

export const INTAKE_SOURCE =
  "Upstream reach of the dense layer: arrested gravity-current front, c = √2·√(g′h) against the opposing current " +
  "(Benjamin, T.B., Gravity currents and related phenomena, J. Fluid Mech. 31(2):209–248, 1968); dilutions read off " +
  "the same near-field and spreading-layer series as the mixing-zone edge; sideways offset and intake height not credited (conservative)";

export interface IntakeSample {
  /** Dilution of the water drawn; null when no brine reaches the intake. */
  readonly dilution: number | null;
  /** Salinity increase over the background at the intake, g/kg (0 when no brine reaches it). */
  readonly salinityIncrease: number;
  readonly inDenseLayer: boolean;
  /** Which part of the rule applied. */
  readonly method: string;
  /** Upstream reach of the layer against the current, m (null when not limited: slack water, downstream). */
  readonly upstreamReach: number | null;
  /** Background salinity the increase is counted from (seabed water), g/kg; set by intakeFromResult. */
  readonly background?: number;
}

/** Layer thickness at x (nearest computed value at or before x; null inside the jet or where not computed). */
function thicknessAt(series: SeriesResult, x: number): number | null {
  let h: number | null = null;
  for (let i = 0; i < series.distance.length; i++) {
    if (series.distance[i]! > x) break;
    if (series.layerThickness[i] !== null) h = series.layerThickness[i]!;
  }
  if (h === null) {
    const first = series.layerThickness.findIndex((v) => v !== null);
    if (first >= 0 && x <= series.distance[first]!) h = series.layerThickness[first]!;
  }
  return h;
}

/** Smallest angle between two bearings, degrees (0–180). */
export function bearingDifference(a: number, b: number): number {
  const d = Math.abs((((a - b) % 360) + 360) % 360);
  return d > 180 ? 360 - d : d;
}

/**
 * The intake's dilution and salinity increase for one steady state. `series` is the result's
 * `mixingZone.series`; `reducedGravity0` the undiluted discharge's reduced gravity against the bottom water.
 */
export function intakeFromSeries(
  intake: IntakeInput,
  series: SeriesResult,
  current: { readonly speed: number; readonly direction: number },
  reducedGravity0: number,
): IntakeSample {
  const excess = series.salinityIncrease[0]! * series.dilution[0]!;
  const layerStart = series.stage.findIndex((s) => s !== "jet");
  const r = intake.distance;
  const reached = (dilution: number, method: string, upstreamReach: number | null): IntakeSample => {
    const h = thicknessAt(series, Math.max(r, layerStart >= 0 ? series.distance[layerStart]! : 0));
    return {
      dilution,
      salinityIncrease: excess / dilution,
      inDenseLayer: h !== null && intake.heightAboveSeabed <= h,
      method,
      upstreamReach,
    };
  };
  if (layerStart < 0) {
    // No layer was computed (the chain stopped in the jet): the last jet dilution, conservatively.
    return reached(series.dilution[series.dilution.length - 1]!, "near field (no spreading layer computed)", null);
  }
  const r0 = series.distance[layerStart]!;
  const s0 = series.dilution[layerStart]!;
  const u = current.speed < SLACK_CURRENT ? 0 : current.speed;
  let upstreamReach: number | null = null;
  if (u > 0) {
    const theta = bearingDifference(intake.bearing, current.direction);
    if (theta > 90) {
      const uo = u * Math.abs(Math.cos((theta * Math.PI) / 180));
      upstreamReach = r0;
      let arrested = false;
      for (let i = layerStart; i < series.distance.length; i++) {
        const h = series.layerThickness[i];
        if (h === null || h === undefined) break;
        const c = FRONT_FROUDE_DEEP * Math.sqrt((reducedGravity0 / series.dilution[i]!) * h);
        if (c <= uo) {
          arrested = true;
          break;
        }
        upstreamReach = series.distance[i]!;
      }
      if (!arrested) upstreamReach = null;
    }
  }
  if (r <= r0) return reached(s0, "near field: the dilution the jet hands to the seabed layer", upstreamReach);
  if (u === 0)
    return reached(
      interpolateLinear(series.distance, series.dilution, r),
      "slack water: layer spreading radially",
      null,
    );
  if (upstreamReach === null) {
    const up = bearingDifference(intake.bearing, current.direction) > 90;
    return reached(
      interpolateLinear(series.distance, series.dilution, r),
      up
        ? "upstream, front not arrested within the computed layer: taken to reach the intake"
        : "downstream or across: layer drifting with the current",
      null,
    );
  }
  if (r <= upstreamReach)
    return reached(
      interpolateLinear(series.distance, series.dilution, r),
      "upstream, within the layer's arrested front",
      upstreamReach,
    );
  return {
    dilution: null,
    salinityIncrease: 0,
    inDenseLayer: false,
    method: "upstream, beyond the layer's arrested front: no brine",
    upstreamReach,
  };
}

/** The intake sample for a scenario's steady state from its full-detail pipeline result. */
export function intakeFromResult(
  scenario: Scenario,
  result: {
    readonly mixingZone: { readonly series: SeriesResult };
    readonly densities: { readonly discharge: number; readonly ambientBottom: number };
  },
): IntakeSample | null {
  if (!scenario.intake) return null;
  const g0 =
    (STANDARD_GRAVITY * (result.densities.discharge - result.densities.ambientBottom)) / result.densities.ambientBottom;
  const series = result.mixingZone.series;
  const sample = intakeFromSeries(
    scenario.intake,
    series,
    { speed: scenario.ambient.currentSpeed, direction: scenario.ambient.currentDirection },
    g0,
  );
  return { ...sample, background: scenario.discharge.salinity - series.salinityIncrease[0]! * series.dilution[0]! };
}
