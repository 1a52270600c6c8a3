/**
 * Seawater and brine properties: densities, salinity scales, depth ↔ pressure, the equation-of-state chooser.
 */
export {
  densityTeos10,
  densityTeos10ValidityIssues,
  specificVolumeTeos10,
  gibbsPressureIntegralTeos10,
  TEOS10_SOURCE,
  TEOS10_SALINITY_RANGE,
  TEOS10_TEMPERATURE_RANGE,
  TEOS10_PRESSURE_RANGE,
} from "./teos10-density";
export {
  TEOS10_GIBBS_WATER_PRESSURE_TERMS,
  TEOS10_GIBBS_SALINE_PRESSURE_TERMS,
  TEOS10_SALINITY_UNIT,
  TEOS10_TEMPERATURE_UNIT,
  TEOS10_PRESSURE_UNIT_PA,
} from "./teos10-gibbs-coefficients";
export {
  densitySharqawy2010,
  densitySharqawy2010ValidityIssues,
  SHARQAWY_2010_DENSITY_COEFFICIENTS,
  SHARQAWY_2010_SALINITY_RANGE,
  SHARQAWY_2010_TEMPERATURE_RANGE,
  SHARQAWY_2010_RELATIVE_ACCURACY,
  SHARQAWY_2010_SOURCE,
} from "./sharqawy-2010-density";
export {
  densitySharqawyNayar,
  densitySharqawyNayarValidityIssues,
  pressureFactorNayar2016,
  absolutePressureMpaFromSeaPressure,
  NAYAR_2016_PRESSURE_COEFFICIENTS,
  NAYAR_2016_SALINITY_RANGE,
  NAYAR_2016_TEMPERATURE_RANGE,
  NAYAR_2016_FITTED_SALINITY_MAX,
  NAYAR_2016_MAX_PRESSURE_MPA,
  NAYAR_2016_SOURCE,
  ATMOSPHERIC_PRESSURE_MPA,
} from "./nayar-2016-pressure-correction";
export {
  pressureFromDepth,
  pressureFromDepthValidityIssues,
  depthFromPressure,
  gravityFromLatitude,
  STANDARD_OCEAN_SALINITY,
  DEFAULT_LATITUDE_DEG,
} from "./pressure-from-depth";
export {
  absoluteSalinityFromPractical,
  absoluteSalinityFromPracticalValidityIssues,
  practicalSalinityFromAbsolute,
  REFERENCE_COMPOSITION_FACTOR,
} from "./salinity-scales";
export {
  salinityFromTds,
  salinityFromTdsValidityIssues,
  tdsFromSalinity,
  type DensityFunction,
} from "./salinity-from-tds";
export {
  equationOfStateFor,
  equationOfStateTeos10,
  equationOfStateBrine,
  EOS_NAME_TEOS10,
  EOS_NAME_BRINE,
  type EquationOfState,
} from "./equation-of-state";
export { propertiesFromScenario, profileAtDepth, STANDARD_GRAVITY, type PropertiesStage } from "./stage";
