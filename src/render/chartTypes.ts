/**
 * The compact chart data of one fit, shared by the server-side SVG renderer (src/render) and the browser chart
 * (src/client). Numbers are rounded for drawing (6 significant digits; x at the range ends exact) and rows are
 * arrays, not objects, so that a page carries a few kilobytes of chart data rather than tens.
 */

/** [x, fit, confidence low, confidence high, prediction low, prediction high]; null where undefined. */
export type CurveRow = readonly [number, number | null, number | null, number | null, number | null, number | null];

/** [row, x, y, residual y − ŷ] or, with a stated uncertainty, [row, x, y, residual, y − u, y + u]. */
export type PointRow = readonly [number, number, number, number] | readonly [number, number, number, number, number, number];

/** A point left out of the fit: [row, x, y] and the reason. */
export interface ExcludedPoint {
  readonly row: number;
  readonly x: number;
  readonly y: number;
  readonly reason: string;
}

/**
 * Where a transformed fit was made: its x and y transforms (core/transforms.ts) and the axis titles there, e.g.
 * "reciprocal temperature, 1/T (1/K)" and "ln of vapour pressure, ln(p / kPa)". Absent for an untransformed fit.
 */
export interface FittedCoordinates {
  readonly x: 'identity' | 'reciprocal' | 'log';
  readonly y: 'identity' | 'log';
  readonly xLabel: string;
  readonly yLabel: string;
  readonly residualLabel: string;
}

export interface FitChartData {
  readonly xLabel: string;
  readonly yLabel: string;
  readonly residualLabel: string;
  /** Confidence level of the bands, e.g. 0.95. */
  readonly confidence: number;
  readonly range: { readonly min: number; readonly max: number };
  /** Curve and bands on an even grid over the validity range. */
  readonly curve: readonly CurveRow[];
  /** Points used in the fit. */
  readonly points: readonly PointRow[];
  readonly excluded: readonly ExcludedPoint[];
  /** A transformed fit's own coordinates, for the chart's "as fitted" view (render/fittedChartData.ts). */
  readonly fitted?: FittedCoordinates;
}

/** Residual band rows derived from the curve: [x, conf. low − fit, conf. high − fit, pred. low − fit, pred. high − fit]. */
export type ResidualBandRow = readonly [number, number | null, number | null, number | null, number | null];
