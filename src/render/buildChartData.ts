/**
 * Chart data of one fit, computed without a browser: the fitted curve with its confidence and prediction bands on
 * an even grid over the validity range, the points used with their residuals (and ± uncertainty bars when given),
 * and the points left out. Numbers are rounded for drawing (roundForChart); the range ends stay exact.
 * O(count · p² + n).
 */
import { bands, type PolynomialFit } from '../core/index.ts';
import type { CurveRow, FitChartData, PointRow } from './chartTypes.ts';
import { roundForChart } from './roundForChart.ts';

export interface ChartInputPoint {
  /** Data row number, 1 = first data row. */
  readonly row: number;
  readonly x: number;
  readonly y: number;
  readonly uncertainty?: number | undefined;
}

export interface BuildChartDataInput {
  readonly fit: PolynomialFit;
  /** The points used in the fit, in the fit's order (fit.points.residualsOriginal[i] belongs to points[i]). */
  readonly points: readonly ChartInputPoint[];
  readonly excluded?: readonly (ChartInputPoint & { readonly reason: string })[];
  readonly xLabel: string;
  readonly yLabel: string;
  /** Residual axis title; defaults to "residual y − ŷ". */
  readonly residualLabel?: string;
  /** Range drawn; defaults to fit.range. */
  readonly range?: { readonly min: number; readonly max: number };
  /** Grid points of the curve (default 120: smooth at the chart's 760 units, a few kilobytes of data). */
  readonly count?: number;
}

/**
 * Grid points over [min, max]; the ends are exactly min and max.
 * @example evenGrid(0, 1, 3) // => [0, 0.5, 1]
 */
export function evenGrid(min: number, max: number, count: number): number[] {
  return Array.from({ length: count }, (_, i) => (i === 0 ? min : i === count - 1 ? max : min + ((max - min) * i) / (count - 1)));
}

/**
 * Curve rows [x, fit, conf. low, conf. high, pred. low, pred. high] of `fit` on `count` grid points of `range`.
 * @example curveRows(fit, { min: 250, max: 900 }, 40).length // => 40
 */
export function curveRows(fit: PolynomialFit, range: { readonly min: number; readonly max: number }, count: number, digits = 6): CurveRow[] {
  const grid = evenGrid(range.min, range.max, count);
  return bands(fit, grid).map((band, i) => [
    i === 0 || i === count - 1 ? band.x : (roundForChart(band.x, digits) ?? band.x),
    roundForChart(band.y, digits),
    roundForChart(band.confidenceLow, digits),
    roundForChart(band.confidenceHigh, digits),
    roundForChart(band.predictionLow, digits),
    roundForChart(band.predictionHigh, digits),
  ]);
}

/**
 * @example buildChartData({ fit, points, xLabel: 'temperature, T (K)', yLabel: 'density, ρ (kg/m³)' }).curve.length // => 200
 */
export function buildChartData(input: BuildChartDataInput): FitChartData {
  const { fit } = input;
  const range = input.range ?? fit.range;
  const residuals = fit.points.residualsOriginal;
  const points: PointRow[] = input.points.map((point, i) => {
    const residual = roundForChart(residuals[i] ?? NaN) ?? NaN;
    const base = [point.row, point.x, point.y, residual] as const;
    return point.uncertainty === undefined
      ? base
      : [...base, roundForChart(point.y - point.uncertainty) ?? point.y, roundForChart(point.y + point.uncertainty) ?? point.y];
  });
  return {
    xLabel: input.xLabel,
    yLabel: input.yLabel,
    residualLabel: input.residualLabel ?? 'residual y − ŷ',
    confidence: fit.confidence,
    range: { min: range.min, max: range.max },
    curve: curveRows(fit, range, input.count ?? 120),
    points,
    excluded: (input.excluded ?? []).map((point) => ({ row: point.row, x: point.x, y: point.y, reason: point.reason })),
  };
}
