/**
 * Applicability checks of the length-scale method (length-scale.ts): the current (crossflow Froude number,
 * Lai & Lee 2013; weak current, Abessi & Roberts 2016) and stratification across the jet's rise.
 */
import { warning, type ResultWarning } from "../warnings";
import type { AmbientColumn, JetSource } from "./types";
import { STANDARD_GRAVITY } from "../constants";
import { interpolateLinear } from "../interpolate";
import { weakCurrentValidityIssues } from "../correlations/abessi-roberts-2016-weak-current";
import { LAI_LEE_2012_MAX_RISE_DILUTION } from "../correlations/lai-lee-2012-inclined-dense-jet";
import {
  crossflowFroudeFromSpeeds,
  crossflowFroudeValidityIssues,
  crossflowRegimeFromFroude,
} from "../correlations/lai-lee-2013-crossflow-regime";

export function currentIssues(jet: JetSource, column: AmbientColumn, notes: string[]): ResultWarning[] {
  const fc = crossflowFroudeFromSpeeds(column.currentSpeed, jet.velocity, jet.froude);
  if (!(fc > 0)) return [];
  const rel = (((column.currentDirection - jet.azimuth) % 360) + 360) % 360;
  const off = Math.min(rel, 360 - rel);
  const sense = off < 45 ? "co-flowing" : off > 135 ? "counter-flowing" : "across the jet";
  const relation = `${sense} (${off.toFixed(0)}° from the jet azimuth)`;
  const ratio = `(${column.currentSpeed.toFixed(3)}/${jet.velocity.toFixed(2)})·${jet.froude.toFixed(1)}`;
  notes.push(
    `Crossflow Froude number F_c = (u_a/U)·F = ${ratio} = ${fc.toFixed(2)}: ` +
      `${crossflowRegimeFromFroude(fc)} regime of Lai & Lee (2013); current ${relation}.`,
  );
  // From F_c = 0.8 the stagnant laws are already declared inapplicable; the weak-current caveat
  // (Abessi & Roberts 2016, U_r·F < 1) only matters below that.
  const strong = crossflowFroudeValidityIssues(fc, relation);
  return strong.length > 0 ? strong : weakCurrentValidityIssues(fc);
}

/** Ambient density at a depth below the surface, linear between profile points, held at the ends. */
function densityAtDepth(column: AmbientColumn, depth: number): number {
  return interpolateLinear(column.depths, column.densities, depth);
}

/** Stratification across the jet's rise (`rise`: the highest published rise height, m). */
export function stratificationIssues(jet: JetSource, column: AmbientColumn, rise: number): ResultWarning[] {
  if (column.densities.length < 2 || column.depths.length !== column.densities.length) return [];
  const span = Math.max(...column.densities) - Math.min(...column.densities);
  // 0.01 kg/m³: below CTD density resolution (common practice, no source).
  if (!(span > 0.01)) return [];
  const stage = "length-scale";
  const portDepth = Math.max(0, column.depth - jet.portHeight);
  const topDepth = Math.max(0, portDepth - rise);
  const rhoPort = densityAtDepth(column, portDepth);
  const strat = rhoPort - densityAtDepth(column, topDepth); // > 0 for stable water across the rise
  const excess = (jet.reducedGravity * rhoPort) / STANDARD_GRAVITY;
  // Ambient density change across the rise compared with the jet's excess at maximum rise, Δρ0/S_t with
  // S_t = 0.45·F (Lai & Lee 2012, abstract). The ratio is derived; thresholds 0.1 and 1 are common
  // practice, no source.
  const ratio = (strat * LAI_LEE_2012_MAX_RISE_DILUTION.value * jet.froude) / excess;
  const out: ResultWarning[] = [
    warning(
      "ambient-stratified",
      "info",
      `The water column is stratified (density varies by ${span.toFixed(2)} kg/m³ over the depth); the ` +
        `length-scale correlations are for unstratified water.`,
      { parameter: "ambient.densities", value: span, stage },
    ),
  ];
  if (ratio >= 0.1) {
    out.push(
      warning(
        "stratification-affects-jet",
        ratio >= 1 ? "serious" : "warning",
        `Across the jet's rise the ambient density changes by ${strat.toFixed(3)} kg/m³, ` +
          `${(100 * ratio).toFixed(0)} % of the jet's density excess at maximum rise (Δρ0/S_t with ` +
          `S_t = 0.45·F, Lai & Lee 2012); the unstratified correlations ` +
          `${ratio >= 1 ? "do not apply (the jet may be trapped)" : "are doubtful"}.`,
        { parameter: "ambient.densities", value: ratio, range: [0, 0.1], stage },
      ),
    );
  }
  return out;
}
