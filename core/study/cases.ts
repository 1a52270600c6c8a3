/** The ambient cases of studies are the cases of every path: see core/cases. */
export {
  expandCases,
  runCases,
  describeCases,
  keptValueNotes,
  scenarioForAmbient,
  STATED_CASE,
  SLACK_WATER_CASE,
} from "../cases";
export type { CaseSpec as StudyCase } from "../cases";
