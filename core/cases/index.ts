export {
  expandCases,
  runCases,
  describeCases,
  keptValueNotes,
  scenarioForAmbient,
  STATED_CASE,
  SLACK_WATER_CASE,
} from "./expand";
export type { CaseSpec } from "./expand";
export { overallFromCases } from "./overall";
export type { CaseVerdict } from "./overall";
