/**
 * Abessi & Roberts (2016): in a weak current the impact dilution of 60° dense jets can be LOWER than in
 * stagnant water, so the stagnant-water value is not always the worst case.
 *
 * Source: Abessi, O., Roberts, P.J.W., "Dense discharge in flowing water through rosette diffuser", Proc.
 * Int. Symp. on Outfall Systems, IAHR (2016), abstract:
 * rosette risers with 4 nozzles at 60° above the floor, 90° apart; for U_r·F < 1 the impact dilution can be
 * lower than in stagnant water. Scope: a rosette riser, not a single jet; carrying the finding to single
 * ports is an extension (said in the warning). The paper's fitted numbers are not used here.
 */
import { warning, type ResultWarning } from "../warnings";

export const ABESSI_ROBERTS_2016_SOURCE =
  "Abessi & Roberts (2016), IAHR Int. Symp. on Outfall Systems, rosette risers at 60°: for U_r·F < 1 " +
  "impact dilution can be lower than in stagnant water (abstract)";

/** U_r·F below which a weak current may reduce impact dilution (Abessi & Roberts 2016, abstract). */
export const WEAK_CURRENT_CROSSFLOW_FROUDE = 1;

/** Warning when 0 < U_r·F < 1; never throws. */
export function weakCurrentValidityIssues(crossflowFroude: number): ResultWarning[] {
  if (!(crossflowFroude > 0 && crossflowFroude < WEAK_CURRENT_CROSSFLOW_FROUDE)) return [];
  return [
    warning(
      "weak-current-lower-dilution",
      "warning",
      `Weak current, U_r·F = ${crossflowFroude.toFixed(2)} < 1: Abessi & Roberts (2016) found that for ` +
        `rosette risers at 60° the impact dilution can then be lower than in stagnant water, so the ` +
        `stagnant-water value may not be conservative (finding for rosettes, applied here to a single jet).`,
      {
        parameter: "crossflowFroude",
        value: crossflowFroude,
        range: [WEAK_CURRENT_CROSSFLOW_FROUDE, Infinity],
        source: ABESSI_ROBERTS_2016_SOURCE,
        stage: "length-scale",
      },
    ),
  ];
}
