export { reportHtml, reportBody, appendixHtml, REPORT_SECTIONS } from "./html";
export type { ReportInput, ReportOptions } from "./html";
export { documentHtml } from "./document";
export type { DocumentHead } from "./document";
export { questionAsked } from "./verdict-sections";
export { resultCell } from "./section-parts";
export { resultSources } from "./provenance";
export { resultCsv, seriesCsv, studyResultCsv, studySeriesCsv, RESULT_CSV_COLUMNS, SERIES_CSV_COLUMNS } from "./csv";
export { reportNumber, reportValue, densityNumber, reportPercent, escapeHtml, REPORT_SIGNIFICANT } from "./format";
export {
  REFERENCES,
  SECONDARY_QUOTATIONS,
  referencesFromSources,
  secondaryQuotationsFor,
  sourceCites,
} from "./references";
export type { Reference, CollectedReferences, SecondaryQuotation } from "./references";
export { sideViewSvg, dilutionChartSvg, sideViewPath, sideViewKeyPoints, linearTicks, logTicks } from "./figures";
export { valueAtPath, asEntered } from "./inputs";
export { studyReportHtml, studyComparisonHtml } from "./study";
export type { StudyReportInput, StudyReportVariant } from "./study";
export { validationAppendixHtml, VALIDATION_SECTION_ID } from "./validation";
