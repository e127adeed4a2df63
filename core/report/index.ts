/**
 * The review report, pure: plan of figures (`reportCharts`), pdfmake document definition
 * (`buildReportDocument`), font descriptors and number formatting. See docs/report.md.
 */
export { buildReportDocument, printableDate } from './document.ts';
export { reportCharts, planReport, PROFILE_STATES, type ReportPlan, type SectionPlan, type MemberPlan } from './figures.ts';
export { reportFormatter, displaySystem, type ReportFormatter } from './format.ts';
export { REPORT_FONT_FAMILY, REPORT_FONT_FILES, reportFontDescriptors, type FontDescriptor } from './fonts.ts';
export { CAUTION_TEXT, FOOTER_CAUTION, pageGeometry } from './layout.ts';
export { ReferenceList, classifyReference, citationMarker, METHOD_REFERENCES } from './references.ts';
export type { ReportInput, ReportMeta, ReportFigure, DocumentDefinition, Content } from './types.ts';
