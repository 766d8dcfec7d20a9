/**
 * A transformed fit seen in the coordinates where it was fitted: u = 1/x or ln x against v = ln y (or y), so that
 * an Arrhenius-like fit ln p = a₀ + a₁/T + … shows as the straight line or low-order polynomial it is, with its
 * residuals v − v̂ as the fit minimised them. Computed in the browser from the chart data the page already carries
 * (no second copy of the data on the page):
 *
 * - points (x, y) → (u(x), v(y)); the residual v(y) − v(ŷ) with ŷ = y − r from the measured residual r (exact up to
 *   the chart's 6-digit rounding of r);
 * - the curve and its confidence and prediction bands → v of each value: the core computes the bands as
 *   v̂ ± t·σ in the fitted space and takes them back through the inverse of v (core/stats/bands.ts), so v of a
 *   band edge is that band edge in the fitted space, symmetric about the line;
 * - uncertainty bars y ± σ → v(y ± σ); the validity range → the u of its ends, smallest first.
 *
 * u and v are the transforms of core/transforms.ts (forwardX, forwardY), written out again here because browser
 * code must not import the numerical core; test/render/fittedChartData.test.ts checks that they agree.
 * O(n + grid) in the number of points and curve rows.
 */
import type { CurveRow, FitChartData, FittedCoordinates, PointRow } from './chartTypes.ts';

/**
 * u of x under the fit's x transform. @example fittedX('reciprocal', 250) // => 0.004
 */
export function fittedX(transform: FittedCoordinates['x'], x: number): number {
  if (transform === 'reciprocal') return 1 / x;
  if (transform === 'log') return Math.log(x);
  return x;
}

/** v of y under the fit's y transform; NaN where ln y is undefined. @example fittedY('log', Math.E) // => 1 */
export function fittedY(transform: FittedCoordinates['y'], y: number): number {
  return transform === 'log' ? (y > 0 ? Math.log(y) : NaN) : y;
}

function valueOrNull(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

/**
 * The fitted-space residual v(y) − v(ŷ) of a point with measured residual r = y − ŷ.
 * @example fittedResidual('log', 110, 10) // => ln(110/100) ≈ 0.0953
 */
export function fittedResidual(transform: FittedCoordinates['y'], y: number, residual: number): number {
  return transform === 'log' ? Math.log(y) - Math.log(y - residual) : residual;
}

/**
 * `data` in its fitted coordinates, or null when the page names none (an untransformed fit).
 * @example fittedChartData(vapourPressureData)?.xLabel // => "reciprocal temperature, 1/T (1/K)"
 */
export function fittedChartData(data: FitChartData): FitChartData | null {
  const fitted = data.fitted;
  if (fitted === undefined) return null;
  const u = (x: number) => fittedX(fitted.x, x);
  const v = (y: number | null) => (y === null ? null : valueOrNull(fittedY(fitted.y, y)));
  const curve: CurveRow[] = data.curve.map((row) => [u(row[0]), v(row[1]), v(row[2]), v(row[3]), v(row[4]), v(row[5])]);
  if (curve.length > 1 && curve[0]![0] > curve[curve.length - 1]![0]) curve.reverse();
  const points: PointRow[] = data.points.map((p) => {
    const base = [p[0], u(p[1]), fittedY(fitted.y, p[2]), fittedResidual(fitted.y, p[2], p[3])] as const;
    return p.length === 6 ? [...base, fittedY(fitted.y, p[4]), fittedY(fitted.y, p[5])] : base;
  });
  const ends = [u(data.range.min), u(data.range.max)];
  return {
    xLabel: fitted.xLabel,
    yLabel: fitted.yLabel,
    residualLabel: fitted.residualLabel,
    confidence: data.confidence,
    range: { min: Math.min(...ends), max: Math.max(...ends) },
    curve,
    points,
    excluded: data.excluded.map((p) => ({ ...p, x: u(p.x), y: fittedY(fitted.y, p.y) })),
  };
}

/** A previewed order's marks (src/client/orderPreview.ts): curve rows [x, fit, low, high] and residuals [x, r]. */
export interface PreviewMarks {
  readonly curve: readonly (readonly [number, number | null, number | null, number | null])[];
  readonly residuals: readonly (readonly [number, number])[];
}

/**
 * A previewed order's marks in fitted coordinates. A residual's y is that of the measured point it belongs to, so
 * its fitted residual is v(y) − v(y − r) as for the published order; a residual whose point is not found (its x
 * differs) is left out.
 * @example fittedPreview(preview, data).curve[0] // => [u of the first x, ln of its fit, …]
 */
export function fittedPreview<T extends PreviewMarks>(preview: T, data: FitChartData): T {
  const fitted = data.fitted;
  if (fitted === undefined) return preview;
  const v = (y: number | null) => (y === null ? null : valueOrNull(fittedY(fitted.y, y)));
  const n = data.points.length;
  const m = preview.residuals.length;
  const residuals: (readonly [number, number])[] = [];
  preview.residuals.forEach(([x, r], j) => {
    // The preview's residuals belong to every point in order, or to the even sample of
    // render/orderPreviews.ts (sampleIndices: point round(j·(n − 1)/(m − 1))); the x must agree.
    const index = m >= n ? j : m > 1 ? Math.round((j * (n - 1)) / (m - 1)) : 0;
    const point = data.points[index];
    if (point === undefined || point[1] !== x) return;
    residuals.push([fittedX(fitted.x, x), fittedResidual(fitted.y, point[2], r)]);
  });
  return {
    ...preview,
    curve: preview.curve.map((row) => [fittedX(fitted.x, row[0]), v(row[1]), v(row[2]), v(row[3])] as const),
    residuals,
  };
}
