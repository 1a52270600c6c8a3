export {
  portFlowsAndHydraulics,
  portCountFromDiffuser,
  flowFractionsFromScenario,
  SEAWATER_KINEMATIC_VISCOSITY,
  USUAL_EXIT_VELOCITY,
} from "./port-hydraulics";
export type { PortHydraulics, PortHydraulicsInput, SinglePortHydraulics } from "./port-hydraulics";
export {
  linePlumeDilutionFromFlux,
  linePlumeDilutionFromFluxValidityIssues,
  LINE_PLUME_MIN_COEFFICIENT,
  LINE_PLUME_SOURCE,
} from "./line-plume";
export { multiportFromNearField, jetWidthsFromNearField, neighbourSpacingAtDistance, MERGING_SOURCE } from "./merging";
export type { MultiportInput, MultiportAssessment, MethodMerging, JetWidths } from "./merging";
