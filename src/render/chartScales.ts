/**
 * The scales of the fit chart, computed once from the data so that the server-side SVG and the browser chart
 * place every mark at the same coordinates: x over the points and the validity range, y over the points, bars and
 * bands, the residual axis symmetric about zero over the residuals and the bands about the curve.
 * O(n) in the number of points and curve rows.
 */
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { CHART_LAYOUT } from './chartLayout.ts';
import type { FitChartData } from './chartTypes.ts';
import { residualBandRows } from './residualBandRows.ts';

export interface ChartScales {
  readonly x: ScaleLinear<number, number>;
  readonly y: ScaleLinear<number, number>;
  readonly residual: ScaleLinear<number, number>;
}

/** Finite values of a list (null and NaN dropped). */
function finite(values: readonly (number | null | undefined)[]): number[] {
  return values.filter((value): value is number => typeof value === 'number' && Number.isFinite(value));
}

/**
 * [min, max] padded by 5 % so that points do not sit on the frame; a single value gets a ±5 % (or ±1) span.
 * @example paddedExtent([0, 10]) // => [-0.5, 10.5]
 */
export function paddedExtent(values: readonly number[]): [number, number] {
  let low = Infinity;
  let high = -Infinity;
  for (const value of values) {
    if (value < low) low = value;
    if (value > high) high = value;
  }
  if (!Number.isFinite(low) || !Number.isFinite(high)) return [0, 1];
  if (!(low < high)) {
    const half = low === 0 ? 1 : Math.abs(low) * 0.05;
    low -= half;
    high += half;
  }
  const pad = (high - low) * 0.05;
  return [low - pad, high + pad];
}

/** Marks drawn besides `data` (a previewed order) whose values must fit in the frame. */
export interface ExtraMarks {
  /** Rows [x, value, value, …]: every value after x counts for the y axis. */
  readonly curve?: readonly (readonly (number | null)[])[];
  /** Residuals that must fit on the residual axis. */
  readonly residuals?: readonly number[];
}

/**
 * Scales for `data`, widened to hold `extra`.
 * @example chartScales(data).x(data.range.min) // => a pixel position right of the left margin
 */
export function chartScales(data: FitChartData, extra: ExtraMarks = {}): ChartScales {
  const { width, mainHeight, residualHeight, margin } = CHART_LAYOUT;
  const xs = finite([data.range.min, data.range.max, ...data.points.map((p) => p[1]), ...data.excluded.map((p) => p.x)]);
  const x = scaleLinear().domain(paddedExtent(xs)).range([margin.left, width - margin.right]);
  const ys = finite([
    ...data.points.flatMap((p) => [p[2], p[4], p[5]]),
    ...data.excluded.map((p) => p.y),
    ...data.curve.flatMap((row) => row.slice(1)),
    ...(extra.curve ?? []).flatMap((row) => row.slice(1)),
  ]);
  const y = scaleLinear().domain(paddedExtent(ys)).nice().range([mainHeight - margin.bottom, margin.top]);
  const residualValues = finite([...data.points.map((p) => p[3]), ...residualBandRows(data.curve).flatMap((row) => row.slice(1)), ...(extra.residuals ?? [])]);
  let limit = Number.MIN_VALUE;
  for (const value of residualValues) limit = Math.max(limit, Math.abs(value));
  const residual = scaleLinear()
    .domain([-limit * 1.1, limit * 1.1])
    .nice()
    .range([residualHeight - margin.bottom, margin.top]);
  return { x, y, residual };
}
