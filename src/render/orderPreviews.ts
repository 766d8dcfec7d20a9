/**
 * Previews of the orders the selector did not publish, computed once per dataset when it is fitted (the loader
 * stores them in the fit cache beside the fit, src/load/fitHandbook.ts) so that a reviewer can see what they would
 * have looked like: for each order in the order table, its curve with its prediction band on a coarse
 * grid, its residuals at (a sample of) the points, and its statistics from the order table. Kept small: SAMPLES
 * curve rows and at most RESIDUAL_SAMPLE residuals per order, numbers rounded for drawing. The published order is
 * the page's own chart and is not repeated. Floating-point fits (fitCurves in the core: the numbers of fitCurve, one
 * refit per order, from one factorisation): a preview is a picture.
 */
import { bands, fitCurves, formatNumber, formatRSquared, type FitData, type OrderSelection, type PolynomialFit } from '../core/index.ts';
import { evenGrid } from './buildChartData.ts';
import { roundForChart } from './roundForChart.ts';

const SAMPLES = 30;
const RESIDUAL_SAMPLE = 60;

/** Statistics of one order as the page prints them (the order table's rules: formatNumber, formatRSquared). */
export interface OrderStatistics {
  readonly s: string;
  readonly rSquared: string;
  readonly adjustedRSquared: string;
  readonly aicc: string;
  readonly bic: string;
  readonly looRmse: string;
  /** Weighted fits only. */
  readonly reducedChiSquare?: string;
}

export interface OrderPreview {
  readonly order: number;
  /** [fit, prediction low, prediction high] at each x of OrderPreviews.grid. */
  readonly curve: readonly (readonly [number | null, number | null, number | null])[];
  /** y − ŷ at each x of OrderPreviews.residualX. */
  readonly residuals: readonly (number | null)[];
  readonly statistics: OrderStatistics;
}

export interface OrderPreviews {
  readonly published: number;
  readonly statistics: OrderStatistics;
  /** The x of the curve samples, shared by every order. */
  readonly grid: readonly number[];
  /** The x of the residual samples, shared by every order. */
  readonly residualX: readonly number[];
  readonly previews: readonly OrderPreview[];
  /** True when the residuals of the previews are a sample of the points. */
  readonly sampled: boolean;
}

function statisticsOf(row: OrderSelection['orders'][number]): OrderStatistics {
  return {
    s: formatNumber(row.residualStdDev),
    rSquared: formatRSquared(row.rSquared),
    adjustedRSquared: formatRSquared(row.adjustedRSquared),
    aicc: formatNumber(row.aicc, 5),
    bic: formatNumber(row.bic, 5),
    looRmse: formatNumber(row.looRmse),
    ...(row.reducedChiSquare === null || row.reducedChiSquare === undefined ? {} : { reducedChiSquare: formatNumber(row.reducedChiSquare) }),
  };
}

/** What the previews are computed from: the fit settings of the metadata, the points used and the validity range. */
export interface OrderPreviewInput {
  readonly settings: {
    readonly intercept: boolean;
    readonly transform: { readonly x: PolynomialFit['transformX']; readonly y: PolynomialFit['transformY'] };
    readonly passThrough: readonly { readonly x: number; readonly y: number }[];
    readonly weights: string;
    readonly criterion?: string | undefined;
  };
  /** The points used in the fit, in file order. */
  readonly used: readonly { readonly x: number; readonly y: number; readonly uncertainty?: number | undefined }[];
  readonly range: { readonly min: number; readonly max: number };
}

/**
 * Indices 0…n−1 thinned evenly to at most `limit` (render/fittedPreview finds a residual's point by the same rule).
 * @example sampleIndices(5, 3) // => [0, 2, 4]
 */
export function sampleIndices(n: number, limit: number): number[] {
  if (n <= limit) return Array.from({ length: n }, (_, i) => i);
  return Array.from({ length: limit }, (_, i) => Math.round((i * (n - 1)) / (limit - 1)));
}

/**
 * Previews of every other order in the table, or null without a table.
 * @example orderPreviews({ settings: meta.fit, used, range }, fit, selection)?.previews.map((p) => p.order) // => [1, 3, 4, …]
 */
export function orderPreviews(input: OrderPreviewInput, fit: PolynomialFit, selection: OrderSelection | null | undefined): OrderPreviews | null {
  if (selection === null || selection === undefined || selection.orders.length < 2) return null;
  const { settings, used, range } = input;
  const data: FitData = {
    x: used.map((point) => point.x),
    y: used.map((point) => point.y),
    uncertainty: settings.weights === 'uncertainty' ? used.map((point) => point.uncertainty ?? NaN) : undefined,
  };
  const grid = evenGrid(range.min, range.max, SAMPLES);
  const sample = sampleIndices(used.length, RESIDUAL_SAMPLE);
  const others = selection.orders.filter((row) => row.order !== fit.order);
  const curves = fitCurves(
    data,
    {
      intercept: settings.intercept,
      transformX: settings.transform.x,
      transformY: settings.transform.y,
      constraints: settings.passThrough.map((point) => ({ x: point.x, y: point.y })),
      range,
      ...(settings.criterion === 'chiSquare' ? { uncertaintyScale: 'stated' as const } : {}),
    },
    others.map((row) => row.order),
  );
  const previews: OrderPreview[] = [];
  others.forEach((row, i) => {
    // An order the core refuses (e.g. too few points with the constraints) simply has no preview.
    const other = curves[i];
    if (other === null || other === undefined) return;
    try {
      previews.push({
        order: row.order,
        curve: bands(other, grid).map((band) => [roundForChart(band.y, 5), roundForChart(band.predictionLow, 4), roundForChart(band.predictionHigh, 4)]),
        residuals: sample.map((j) => roundForChart(other.residualsOriginal[j] ?? NaN, 3)),
        statistics: statisticsOf(row),
      });
    } catch {
      // as for a refused order
    }
  });
  const publishedRow = selection.orders.find((row) => row.order === fit.order);
  if (publishedRow === undefined || previews.length === 0) return null;
  return {
    published: fit.order,
    statistics: statisticsOf(publishedRow),
    grid: grid.map((x, i) => (i === 0 || i === SAMPLES - 1 ? x : (roundForChart(x) ?? x))),
    residualX: sample.map((i) => used[i]!.x),
    previews,
    sampled: sample.length < used.length,
  };
}
