/**
 * The constraint diagram, shared by the designer window, the SVG writer and
 * the report: data (display units) -> scales -> geometry -> marks, drawn as
 * Svelte elements in the window and as markup everywhere else (marks.ts,
 * markup.ts). No DOM, no Node. The page's panels take the few names below;
 * everything else is imported from its own module.
 */
// @ts-nocheck

export { chartData, type ChartData } from './data';
export type { ChartScales } from './scales';
export type { Labels } from './labels';
export { KIND_TITLES, CHART_INKS, kindColour, kindTitle } from './palette';
export { shorten } from './text';
