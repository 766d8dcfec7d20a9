/**
 * The chart data a correlation page embeds for the browser chart (FitChart.astro), as JSON with `<` escaped so
 * that no value can close its script element; null above EMBED_POINT_LIMIT points (the page then links
 * chart-data.json).
 */
import { EMBED_POINT_LIMIT, chartData } from './chartData.ts';
import { usedPoints, type CorrelationEntry, type PolynomialFit } from './entryView.ts';

/** @example embeddedChartJson(entry, fit)?.startsWith('{"xLabel":') // => true */
export function embeddedChartJson(entry: CorrelationEntry, fit: PolynomialFit): string | null {
  if (usedPoints(entry).length > EMBED_POINT_LIMIT) return null;
  return JSON.stringify(chartData(entry, fit)).replace(/</g, '\\u003c');
}
