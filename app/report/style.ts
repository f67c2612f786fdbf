/**
 * The report's look: calm, dense and made for A4 paper. One column, small
 * sans-serif type, thin rules, numbers right-aligned in tabular figures, a
 * caution box in amber, and each major part on a new page when printed.
 * The page footer repeats the caution and the page number.
 */
import { PRELIMINARY_CAUTION } from '../../core/caution';
import { cssString } from './html';

export function reportCss(runningTitle: string): string {
  return `
@page {
  size: A4;
  margin: 15mm 14mm 17mm 14mm;
  @top-left { content: ${cssString(runningTitle)}; font: 7.5pt 'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif; color: #52606d; }
  @top-right { content: "Loftpoint design review"; font: 7.5pt 'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif; color: #52606d; }
  @bottom-left { content: ${cssString(PRELIMINARY_CAUTION)}; width: 150mm; font: 6.8pt 'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif; color: #7b4b00; }
  @bottom-right { content: "Page " counter(page) " of " counter(pages); width: 28mm; white-space: nowrap; font: 7.5pt 'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif; color: #52606d; }
}
:root { color-scheme: light; }
* { box-sizing: border-box; }
html { background: #eef1f4; }
body {
  margin: 0 auto; padding: 14mm 14mm 18mm; max-width: 210mm; background: #ffffff;
  font: 9pt/1.4 'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif; color: #1f2933;
  -webkit-print-color-adjust: exact; print-color-adjust: exact;
}
@media print { html { background: #ffffff; } body { padding: 0; max-width: none; } }
header.title-block { border-bottom: 2px solid #1f2933; padding-bottom: 6pt; margin-bottom: 8pt; }
header.title-block .kicker { font-size: 8pt; letter-spacing: 0.08em; text-transform: uppercase; color: #52606d; margin: 0; }
h1 { font-size: 17pt; margin: 2pt 0 3pt; line-height: 1.2; }
header.title-block .meta { margin: 0; color: #3e4c59; font-size: 8.5pt; }
h2 { font-size: 11.5pt; margin: 12pt 0 5pt; padding-bottom: 2pt; border-bottom: 1px solid #9aa5b1; break-after: avoid; }
h3 { font-size: 9.5pt; margin: 10pt 0 4pt; break-after: avoid; }
h4 { font-size: 8.8pt; margin: 8pt 0 3pt; color: #3e4c59; break-after: avoid; }
p { margin: 0 0 5pt; }
.muted { color: #52606d; }
.small { font-size: 8pt; }
.caution {
  border: 1px solid #d9b36c; border-left: 4px solid #b7791f; background: #fdf6e7; color: #5c3b00;
  padding: 5pt 8pt; margin: 8pt 0; font-size: 8.5pt; break-inside: avoid;
}
.caution strong { display: block; font-size: 9pt; margin-bottom: 1pt; }
.notice { border-left: 3px solid #7b8794; background: #f5f7f9; padding: 4pt 8pt; margin: 6pt 0; font-size: 8.5pt; break-inside: avoid; }
table { border-collapse: collapse; width: 100%; margin: 2pt 0 8pt; font-size: 8.3pt; break-inside: auto; }
caption { text-align: left; font-weight: 600; padding: 0 0 3pt; }
thead { display: table-header-group; }
tr { break-inside: avoid; }
th, td { text-align: left; vertical-align: top; padding: 1.9pt 5pt 1.9pt 0; border-bottom: 1px solid #e4e7eb; }
thead th { font-weight: 600; color: #3e4c59; border-bottom: 1px solid #7b8794; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; padding-left: 6pt; }
td.id, td.code, span.id { font-family: 'DejaVu Sans Mono', 'Menlo', 'Consolas', monospace; font-size: 7.8pt; white-space: nowrap; }
td .label { display: block; color: #52606d; font-size: 7.8pt; }
td.small { font-size: 7.3pt; color: #3e4c59; min-width: 38%; }
td.bad, span.bad { color: #9b2c2c; font-weight: 600; }
td.binds { font-weight: 600; }
/* The requirements table: the label and values take the room, numeric headings wrap over their columns. */
table.requirements th.num { white-space: normal; width: 9%; }
table.requirements td:nth-child(2) { width: 44%; }
table.facts { width: auto; min-width: 55%; }
table.narrow { width: auto; min-width: 55%; }
table.costs tbody tr:nth-child(odd) td { border-bottom: none; }
td.muted { color: #7b8794; }
code { font-family: 'DejaVu Sans Mono', 'Menlo', 'Consolas', monospace; font-size: 7.8pt; }
table.facts th { font-weight: 400; color: #3e4c59; padding-right: 14pt; white-space: nowrap; }
table.facts td { font-variant-numeric: tabular-nums; }
.two-up table.facts td { white-space: nowrap; }
.two-up table.facts th { white-space: normal; padding-right: 8pt; }
table.points { width: auto; min-width: 62%; }
.two-up { display: flex; gap: 14pt; align-items: flex-start; }
.two-up > div, .two-up > section { flex: 1 1 0; min-width: 0; }
.two-up { break-inside: avoid; }
.two-up table.facts { width: 100%; min-width: 0; }
figure.chart { margin: 4pt 0 8pt; break-inside: avoid; }
figure.chart svg { display: block; width: 100%; height: auto; }
pre.note {
  white-space: pre-wrap; overflow-wrap: anywhere; font: 8.5pt/1.45 'DejaVu Sans Mono', 'Menlo', 'Consolas', monospace;
  background: #f5f7f9; border: 1px solid #e4e7eb; padding: 6pt 8pt; margin: 4pt 0 8pt;
}
ul.plain { margin: 0 0 6pt; padding-left: 14pt; }
ul.plain li { margin: 0 0 2pt; }
.report-section.new-page { break-before: page; }
.report-section.new-page > h2:first-child { margin-top: 0; }
.keep { break-inside: avoid; }
#margins, #sizing, #speeds, #warnings { break-inside: avoid; }
table.points, table.facts, table.narrow, pre.note { break-inside: avoid; }
footer.end { margin-top: 14pt; }
`;
}
