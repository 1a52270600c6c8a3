export { farFieldStage, NOT_MODELLED, STAGNANT_CURRENT } from "./stage";
export type { FarFieldInput, FarFieldOutput, GoverningLayer } from "./stage";
export {
  entrainmentFromRichardson,
  entrainmentFromRichardsonValidityIssues,
  ENTRAINMENT_CUTOFF_RICHARDSON,
  TURNER_1986_SOURCE,
} from "./turner-1986-entrainment";
export {
  bedEntrainmentFromRichardson,
  bedEntrainmentFromRichardsonValidityIssues,
  KATO_PHILLIPS_1969_SOURCE,
} from "./kato-phillips-1969-entrainment";
export {
  brooksDilutionFromDistance,
  brooksDilutionFromDistanceValidityIssues,
  brooksWidthFromDistance,
  brooksFieldFromInput,
  brooksDilutionInField,
  brooksWidthInField,
  FOUR_THIRDS_LAW_COEFFICIENT,
  BROOKS_1960_SOURCE,
} from "./brooks-1960-diffusion";
export {
  spreadingLayerFromNearFieldEnd,
  equilibriumRichardsonFromSlope,
  DEFAULT_BED_DRAG,
  SPREADING_LAYER_SOURCE,
} from "./gravity-current";
export type { BrooksField, BrooksInput } from "./brooks-1960-diffusion";
export type { SpreadingLayerInput, SpreadingLayerSeries } from "./gravity-current";
export { jetProfileFromNearField, dilutionFromProfile, nearFieldEndFromResult } from "./jet-series";
export type { JetProfile } from "./jet-series";
export { erf } from "./erf";
export { footprintFromLayer, footprintStage } from "./footprint";
export type { FootprintJet, FootprintLayer } from "./footprint";
