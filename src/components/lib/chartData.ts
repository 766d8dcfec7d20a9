/**
 * What the chart draws for one correlation, computed at build time by the shared renderer (src/render): the
 * points, the fitted curve with its confidence and prediction bands over the validity range, and the residuals.
 * The browser only draws this; the static SVG is drawn from the same data.
 */
import { buildChartData, type FitChartData } from '../../render/index.ts';
import { labelSymbol, unitSuffix, usedPoints, type CorrelationEntry, type PolynomialFit } from './entryView.ts';

export type { FitChartData };

/** Above this many points the page links its chart data instead of embedding it (keeps the HTML small). */
export const EMBED_POINT_LIMIT = 400;

/** Chart data for one correlation, with bands on `count` grid points (default 120). */
export function chartData(entry: CorrelationEntry, fit: PolynomialFit, count = 120): FitChartData {
  const { variable, property } = entry.meta;
  return buildChartData({
    fit,
    points: usedPoints(entry),
    excluded: entry.excluded,
    xLabel: `${variable.name}, ${labelSymbol(variable.symbol)}${unitSuffix(variable.unit) ? ` (${variable.unit})` : ''}`,
    yLabel: `${property.name}, ${labelSymbol(property.symbol)}${unitSuffix(property.unit) ? ` (${property.unit})` : ''}`,
    residualLabel: `residual y − ŷ${unitSuffix(property.unit) ? ` (${property.unit})` : ''}`,
    range: entry.range,
    count,
  });
}
