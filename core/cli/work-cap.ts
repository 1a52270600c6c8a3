/** The work cap of a study command, checked before any work starts (core/study/budget.ts). */
import { workIssue } from "../study/budget";
import { expandCases } from "../cases";
import type { Scenario } from "../scenario/types";
import { CliError } from "./command";

/**
 * Throws a CliError naming the command and the option (`what`, e.g. "--runs 5000") when `count` points
 * or runs of `scenario`, each under every ambient case, would be over the work cap.
 */
export function refuseOverWorkCap(command: string, what: string, count: number, scenario: Scenario): void {
  const caseCount = expandCases(scenario).length;
  const tooMuch = workIssue(
    `${what} × ${caseCount} ambient case${caseCount === 1 ? "" : "s"}`,
    count * caseCount,
    scenario,
  );
  if (tooMuch) throw new CliError(`brinefield ${command}: ${tooMuch}`);
}
