/**
 * What the chart draws for one correlation, computed at build time by the shared renderer (src/render): the
 * points, the fitted curve with its confidence and prediction bands over the validity range, and the residuals.
 * The browser only draws this; the static SVG is drawn from the same data. A transformed fit also names its fitted
 * coordinates (transforms and axis titles, a hundred bytes), from which the browser draws the "as fitted" view.
 */
import { buildChartData, type FitChartData, type FittedCoordinates } from '../../render/index.ts';
import { labelSymbol, unitSuffix, usedPoints, type CorrelationEntry, type PolynomialFit } from './entryView.ts';

export type { FitChartData };

/** Above this many points the page links its chart data instead of embedding it (keeps the HTML small). */
export const EMBED_POINT_LIMIT = 400;

/** A unit as a divisor: "K" stays "K", "m/s" becomes "(m/s)". */
function divisor(unit: string): string {
  return /[\s/·*^]/.test(unit) ? `(${unit})` : unit;
}

/** ln of a quantity made dimensionless by its unit: "ln(p / kPa)", or "ln x" for a dimensionless x. */
function lnText(symbol: string, unit: string): string {
  return unitSuffix(unit) ? `ln(${symbol} / ${unit})` : `ln ${symbol}`;
}

/**
 * The fitted coordinates of a transformed fit, or undefined for an untransformed one.
 * @example fittedCoordinates(vapourPressure, fit) // => { x: 'reciprocal', y: 'log', xLabel: 'reciprocal temperature, 1/T (1/K)', yLabel: 'ln of vapour pressure, ln(p_σ / kPa)', … }
 */
export function fittedCoordinates(entry: CorrelationEntry, fit: PolynomialFit, measured: { xLabel: string; yLabel: string; residualLabel: string }): FittedCoordinates | undefined {
  if (fit.transformX === 'identity' && fit.transformY === 'identity') return undefined;
  const { variable, property } = entry.meta;
  const x = labelSymbol(variable.symbol);
  const y = labelSymbol(property.symbol);
  const xLabel =
    fit.transformX === 'reciprocal'
      ? `reciprocal ${variable.name}, 1/${x}${unitSuffix(variable.unit) ? ` (1/${divisor(variable.unit)})` : ''}`
      : fit.transformX === 'log'
        ? `ln of ${variable.name}, ${lnText(x, variable.unit)}`
        : measured.xLabel;
  const logY = fit.transformY === 'log';
  return {
    x: fit.transformX,
    y: fit.transformY,
    xLabel,
    yLabel: logY ? `ln of ${property.name}, ${lnText(y, property.unit)}` : measured.yLabel,
    residualLabel: logY ? 'ln y − ln ŷ' : measured.residualLabel,
  };
}

/**
 * The last chart data computed, by the objects it was computed from: a correlation's folder asks for the same
 * entry's chart data twice (plot.svg and chart-data.json in correlationFiles, the embedded JSON in pageParts), and
 * the result is a pure function of the entry, the fit and the count, never changed by its users. One slot only,
 * so that nothing is kept beyond the correlation being built.
 */
let last: { entry: CorrelationEntry; fit: PolynomialFit; count: number; data: FitChartData } | undefined;

/**
 * Chart data for one correlation, with bands on `count` grid points (default 120). The same entry and fit objects
 * asked for again get the same (read-only) object back.
 * @example chartData(entry, fit).curve.length // => 120
 */
export function chartData(entry: CorrelationEntry, fit: PolynomialFit, count = 120): FitChartData {
  if (last !== undefined && last.entry === entry && last.fit === fit && last.count === count) return last.data;
  const data = computeChartData(entry, fit, count);
  last = { entry, fit, count, data };
  return data;
}

function computeChartData(entry: CorrelationEntry, fit: PolynomialFit, count: number): FitChartData {
  const { variable, property } = entry.meta;
  const labels = {
    xLabel: `${variable.name}, ${labelSymbol(variable.symbol)}${unitSuffix(variable.unit) ? ` (${variable.unit})` : ''}`,
    yLabel: `${property.name}, ${labelSymbol(property.symbol)}${unitSuffix(property.unit) ? ` (${property.unit})` : ''}`,
    residualLabel: `y − ŷ${unitSuffix(property.unit) ? ` (${property.unit})` : ''}`,
  };
  const data = buildChartData({ fit, points: usedPoints(entry), excluded: entry.excluded, ...labels, range: entry.range, count });
  const fitted = fittedCoordinates(entry, fit, labels);
  return fitted === undefined ? data : { ...data, fitted };
}
