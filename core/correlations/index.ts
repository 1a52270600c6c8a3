/** Published correlations, one per file; re-exported with family prefixes. */
export {
  ROBERTS_1997_SOURCE,
  ROBERTS_1997_COEFFICIENTS,
  ROBERTS_1997_DATASET,
  roberts1997CoefficientsAtAngle,
  roberts1997CoefficientsAtAngleValidityIssues,
} from "./roberts-1997-inclined-dense-jet";
export {
  LAI_LEE_2012_SOURCE,
  LAI_LEE_2012_DATASET,
  laiLee2012CoefficientsAtAngle,
  laiLee2012CoefficientsAtAngleValidityIssues,
} from "./lai-lee-2012-inclined-dense-jet";
export {
  LAI_LEE_2013_SOURCE,
  crossflowFroudeFromSpeeds,
  crossflowRegimeFromFroude,
  crossflowFroudeValidityIssues,
  momentumLengthRatioFromCrossflowFroude,
} from "./lai-lee-2013-crossflow-regime";
export { ABESSI_ROBERTS_2016_SOURCE, weakCurrentValidityIssues } from "./abessi-roberts-2016-weak-current";
export { interpolateAngleTable, clampAngle } from "./dense-jet-dataset";
export type { DenseJetDataset, DenseJetCoefficients } from "./dense-jet-dataset";
export {
  ENTRAINMENT_LEE_CHEUNG_1990,
  ENTRAINMENT_LEE_CHEUNG_1990_SOURCE,
  entrainmentLeeCheung1990Alpha,
  entrainmentLeeCheung1990Rate,
  entrainmentLeeCheung1990ValidityIssues,
} from "./lee-cheung-1990-entrainment";
export {
  SHARQAWY_2010_VISCOSITY_SOURCE,
  viscosityFromST,
  viscosityFromSTValidityIssues,
} from "./sharqawy-2010-viscosity";
