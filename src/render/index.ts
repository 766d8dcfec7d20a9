/**
 * The chart renderer's door: pure functions (no DOM, no file I/O) that turn a fit into chart data and SVG
 * text. The browser chart (src/client) imports the scales and paths from here too, so both draw alike.
 */
export type { CurveRow, ExcludedPoint, FitChartData, FittedCoordinates, PointRow, ResidualBandRow } from './chartTypes.ts';
export { fittedChartData, fittedPreview, fittedResidual, fittedX, fittedY, type PreviewMarks } from './fittedChartData.ts';
export { CHART_COLORS, CHART_LAYOUT } from './chartLayout.ts';
export { chartScales, paddedExtent, type ChartScales, type ExtraMarks } from './chartScales.ts';
export { bandPath, linePath } from './chartPaths.ts';
export { residualBandRows } from './residualBandRows.ts';
export { roundForChart } from './roundForChart.ts';
export { escapeXml } from './escapeXml.ts';
export { renderFitSvg, type RenderFitSvgOptions } from './renderFitSvg.ts';
export { buildChartData, curveRows, evenGrid, type BuildChartDataInput, type ChartInputPoint } from './buildChartData.ts';
export { svgAxes } from './svgAxes.ts';
export { renderOverlaySvg, SERIES_COLORS, SERIES_DASHES, type OverlaySeries } from './renderOverlaySvg.ts';
export { overlapComparison, type OverlapComparison } from './overlapComparison.ts';
export { renderOrderStatsSvg, type OrderStatPanel } from './renderOrderStatsSvg.ts';
export { orderPreviews, sampleIndices, type OrderPreview, type OrderPreviewInput, type OrderPreviews, type OrderStatistics } from './orderPreviews.ts';
