export { reportHtml, reportBody, documentHtml, appendixHtml, questionAsked, resultCell, resultSources, REPORT_SECTIONS } from "./html";
export type { ReportInput, ReportOptions, DocumentHead } from "./html";
export { resultCsv, seriesCsv, RESULT_CSV_COLUMNS, SERIES_CSV_COLUMNS } from "./csv";
export { reportNumber, reportPercent, escapeHtml, REPORT_SIGNIFICANT } from "./format";
export { REFERENCES, referencesFromSources, sourceCites } from "./references";
export type { Reference, CollectedReferences } from "./references";
export { sideViewSvg, dilutionChartSvg, sideViewPoints, linearTicks, logTicks } from "./figures";
export { valueAtPath, asEntered } from "./inputs";
