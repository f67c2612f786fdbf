/**
 * The constraint diagram, shared by the designer window and the SVG writer:
 * data (display units) -> scales -> labels -> drawing. No DOM, no Node.
 */
export { chartData, upperEnvelope, PLOT_LABEL_CHARS, type ChartData, type ChartDataOptions, type CurveSeries, type LimitSeries, type BoundarySeries, type MarkedPoint, type OverlaySeries } from './data';
export { feasibleRegion } from './region';
export { chartScales, chartDomains, scalesOver, type ScaleOptions, loadingTop, plotArea, axisTitles, LOADING_HEADROOM, type ChartFrame, type ChartMargin, type ChartScales, type PlotArea } from './scales';
export { placeLabels, textWidth, boxesOverlap, boxInside, segmentHitsBox, type Box, type LabelPlacement, type LabelOptions, type Labels, type PointNote } from './labels';
export { legendRows, LEGEND_LINE_CHARS, type LegendRow } from './legend';
export { KIND_COLOURS, KIND_DASHES, KIND_TITLES, CHART_INKS, kindColour, kindDash, kindTitle } from './palette';
export { clipToBand, clipSegment, valueAt, isDefinedPoint, type XY, type Samples } from './clip';
export { escapeXml, shorten, wrapText, formatDisplayed } from './text';
export { SIZING_CAUTION } from './caution';
export { constraintDiagramSvg, type SvgOptions } from './svg';
