export {
  reportHtml,
  reportBody,
  documentHtml,
  appendixHtml,
  questionAsked,
  resultCell,
  resultSources,
  REPORT_SECTIONS,
} from "./html";
export type { ReportInput, ReportOptions, DocumentHead } from "./html";
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
