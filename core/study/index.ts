/** Studies: comparisons, sweeps, design search and Monte Carlo — loops around the one pipeline. */
export { Xoshiro128, streamFor, standardNormal, mix32, seedFromText } from "./random";
export type { RandomSource } from "./random";
export {
  sampleDistribution,
  resolveDistribution,
  defaultUncertainInputs,
  describeDistribution,
  triangularQuantile,
  DEFAULT_SPREADS_NOTE,
} from "./distributions";
export type { ResolvedDistribution } from "./distributions";
export { quantile, quantileSorted, percentileSummary } from "./percentiles";
export type { PercentileSummary } from "./percentiles";
export { OVERRIDE_PATHS, OverrideError, withOverrides, withRawOverride, readPath, overrideIssue } from "./overrides";
export type { Overrides } from "./overrides";
export { expandCases, describeCases, scenarioForAmbient, SLACK_WATER_CASE } from "../cases";
export type { CaseSpec as StudyCase } from "../cases";
export { summariseResult, worstIndex } from "./summary";
export type { CaseSummary, Evaluator, MethodSummary } from "./summary";
export { evaluatePoint, evaluatePoints, worstSummary } from "./evaluate-point";
export type { PointEvaluation } from "./evaluate-point";
export { planMonteCarlo, runMonteCarloChunk, splitRuns, samplesForRun } from "./montecarlo";
export type { MonteCarloPlan, MonteCarloChunk } from "./montecarlo";
export { summariseMonteCarlo, mergeMonteCarloChunks, histogram } from "./montecarlo-summary";
export type { MonteCarloSummary, MonteCarloStats, MonteCarloSamples } from "./montecarlo-summary";
export { parseSweepAxis, axisFromParts, axisValues, sweepGrid, sweepRows, eosCrossings } from "./sweep";
export type { SweepAxis, SweepRow, SweepGridPoint, EosCrossing } from "./sweep";
export {
  defaultConstraints,
  designConstraintsFrom,
  designCandidates,
  planDesignSearch,
  candidateOverrides,
  exitVelocity,
  DESIGN_MAX_CANDIDATES,
  DESIGN_MAX_RUNS,
} from "./design";
export type { DesignConstraints, DesignCandidate, DesignPlan } from "./design";
export {
  judgeDesign,
  shortList,
  designJson,
  designOutcome,
  designDiffuserBlock,
  nearestMiss,
  DESIGN_RANKING_RULE,
} from "./design-rank";
export type { DesignVerdict, RankedDesign, DesignOutcome, NearestMiss } from "./design-rank";
export { NOMINAL_SIZES_DN, NOMINAL_SIZES_SOURCE } from "./nominal-sizes";
export { parseStudy, studyFileSchema, studyJsonSchema, STUDY_FORMAT, STUDY_VERSION } from "./study-file";
export type { StudyFile, StudyIssue } from "./study-file";
export { studyVariants, compareVariant, flattenRow, sortRows, columnsOf, WORST_CASE_ROW } from "./compare";
export type { CompareRow, FlatRow, StudyVariant, ScenarioReader } from "./compare";
export { evaluateScenario } from "./evaluate";
export * from "./budget";
