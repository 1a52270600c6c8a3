export {
  parseScenario,
  parseScenarioText,
  scenarioFromRaw,
  ScenarioError,
  MAX_SCENARIO_TEXT,
  SCENARIO_MIGRATIONS,
} from "./parse";
export type { ParseOutcome, ScenarioIssue } from "./parse";
export { scenarioFileSchema, scenarioJsonSchema, SCENARIO_FORMAT, SCENARIO_VERSION, UNCERTAIN_PATHS } from "./schema";
export type { ScenarioFile } from "./schema";
export { brineFromPlant } from "./plant";
export { inputsHash } from "./hash";
export type * from "./types";
export {
  MAX_INPUT_BYTES,
  MAX_JSON_DEPTH,
  parseJsonText,
  decodeInputBytes,
  stripBom,
  formatByteSize,
  tooLargeMessage,
} from "./json-text";
