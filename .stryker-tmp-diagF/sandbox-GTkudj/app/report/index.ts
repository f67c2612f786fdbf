/**
 * The design-review report: HTML built from an evaluation and its studies,
 * printed to PDF (and the diagram to PNG) by headless Chromium.
 */
// @ts-nocheck

export { buildReport, type ReportInput } from './report';
export { runStudies, type ReportStudies, type StudyOptions, type RangeRow } from './studies';
export { reportDiagramSvg, probabilityText, runText } from './section-studies';
export { DIAGRAM_SIZE, STUDY_DIAGRAM_SIZE } from './section-results';
export type { ReportVersion } from './section-overview';
export { findChromium, printPdf, svgToPng, ChromiumUnavailable, ChromiumFailed, INSTALL_HINT } from './chromium';
