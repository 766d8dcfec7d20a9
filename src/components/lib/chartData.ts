/**
 * What the browser chart draws, computed at build time: the points, the fitted curve with its confidence and
 * prediction bands on an even grid over the validity range, and the residuals. The client only draws this.
 */
import { bands } from '../../core/index.ts';
import { labelSymbol, unitSuffix, usedPoints, type CorrelationEntry, type PolynomialFit } from './entryView.ts';

export interface ChartPoint {
  readonly row: number;
  readonly x: number;
  readonly y: number;
  readonly residual: number;
  /** y − uncertainty and y + uncertainty, when the data file gives an uncertainty. */
  readonly bar?: readonly [number, number];
}

export interface ChartData {
  readonly xLabel: string;
  readonly yLabel: string;
  readonly residualLabel: string;
  readonly confidence: number;
  readonly range: { readonly min: number; readonly max: number };
  /** Points used in the fit, with the residual y − ŷ in y's unit and, when stated, the bar y ± uncertainty. */
  readonly points: readonly ChartPoint[];
  /** Points left out of the fit. */
  readonly excluded: readonly { readonly row: number; readonly x: number; readonly y: number; readonly reason: string }[];
  /** Curve and bands: [x, y, confidence low, confidence high, prediction low, prediction high]; null where undefined. */
  readonly curve: readonly (readonly (number | null)[])[];
  /**
   * The same bands about the curve, for the residual plot: [x, confidence low − y, confidence high − y,
   * prediction low − y, prediction high − y]. Points outside the prediction band stand out there.
   */
  readonly residualBands: readonly (readonly (number | null)[])[];
}

/** Grid points over the range; the ends are exactly min and max. */
export function evenGrid(min: number, max: number, count: number): number[] {
  return Array.from({ length: count }, (_, i) => (i === 0 ? min : i === count - 1 ? max : min + ((max - min) * i) / (count - 1)));
}

function finiteOrNull(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

/** Chart data for one correlation, with bands on `count` grid points (default 200). */
export function chartData(entry: CorrelationEntry, fit: PolynomialFit, count = 200): ChartData {
  const { variable, property } = entry.meta;
  const grid = evenGrid(entry.range.min, entry.range.max, count);
  const computed = bands(fit, grid);
  const curve = computed.map((band) =>
    [band.x, band.y, band.confidenceLow, band.confidenceHigh, band.predictionLow, band.predictionHigh].map(finiteOrNull),
  );
  const residualBands = computed.map((band) =>
    [band.x, band.confidenceLow - band.y, band.confidenceHigh - band.y, band.predictionLow - band.y, band.predictionHigh - band.y].map(finiteOrNull),
  );
  const used = usedPoints(entry);
  return {
    xLabel: `${variable.name}, ${labelSymbol(variable.symbol)}${unitSuffix(variable.unit) ? ` (${variable.unit})` : ''}`,
    yLabel: `${property.name}, ${labelSymbol(property.symbol)}${unitSuffix(property.unit) ? ` (${property.unit})` : ''}`,
    residualLabel: `residual y − ŷ${unitSuffix(property.unit) ? ` (${property.unit})` : ''}`,
    confidence: fit.confidence,
    range: entry.range,
    points: used.map((point, i) => ({
      row: point.row,
      x: point.x,
      y: point.y,
      residual: fit.points.residualsOriginal[i] ?? NaN,
      ...(point.uncertainty === undefined ? {} : { bar: [point.y - point.uncertainty, point.y + point.uncertainty] as const }),
    })),
    excluded: entry.excluded.map((point) => ({ row: point.row, x: point.x, y: point.y, reason: point.reason })),
    curve,
    residualBands,
  };
}
