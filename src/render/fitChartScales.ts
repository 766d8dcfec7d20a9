/**
 * chartScales(data) for the SVG documents written at build time: the same three scales, from the same extents,
 * found by loops over the rows rather than by lists of every value (which made most of its cost and garbage when
 * thousands of charts are drawn). chartScales itself stays as it is: the browser chart is bundled from it, and the
 * published script must keep its bytes. test/render/fitChartScales.test.ts compares both on random chart data.
 */
import { scaleLinear } from 'd3-scale';
import { CHART_LAYOUT } from './chartLayout.ts';
import { paddedExtent, type ChartScales } from './chartScales.ts';
import type { FitChartData } from './chartTypes.ts';

/** Smallest and largest finite values seen, as [low, high] (Infinity, −Infinity while none). */
type Extent = [number, number];

/** Count `value` in `extent` when it is a finite number (null, undefined, NaN and ±Infinity are skipped). */
function add(extent: Extent, value: number | null | undefined): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) return;
  if (value < extent[0]) extent[0] = value;
  if (value > extent[1]) extent[1] = value;
}

/** The largest of `limit` and |value| for a finite value (the residual axis's half-height). */
function widen(limit: number, value: number | null | undefined): number {
  return typeof value === 'number' && Number.isFinite(value) ? Math.max(limit, Math.abs(value)) : limit;
}

/** A band's offset from the curve (residualBandRows), null where either is null. */
function offset(value: number | null | undefined, fit: number | null): number | null {
  return value === null || value === undefined || fit === null ? null : value - fit;
}

/**
 * @example fitChartScales(data).x.domain() // => chartScales(data).x.domain()
 */
export function fitChartScales(data: FitChartData): ChartScales {
  const { width, mainHeight, residualHeight, margin } = CHART_LAYOUT;
  const xs: Extent = [Infinity, -Infinity];
  const ys: Extent = [Infinity, -Infinity];
  let limit = Number.MIN_VALUE;
  add(xs, data.range.min);
  add(xs, data.range.max);
  for (const p of data.points) {
    add(xs, p[1]);
    add(ys, p[2]);
    add(ys, p[4]);
    add(ys, p[5]);
    limit = widen(limit, p[3]);
  }
  for (const p of data.excluded) {
    add(xs, p.x);
    add(ys, p.y);
  }
  for (const row of data.curve) {
    for (let k = 1; k < row.length; k++) add(ys, row[k]);
    for (let k = 2; k < 6; k++) limit = widen(limit, offset(row[k], row[1]));
  }
  // paddedExtent reads only the smallest and largest value, so that of the two ends is that of all the values
  // (and [0, 1] when there were none, the ends then being Infinity and −Infinity).
  const x = scaleLinear().domain(paddedExtent(xs)).range([margin.left, width - margin.right]);
  const y = scaleLinear().domain(paddedExtent(ys)).nice().range([mainHeight - margin.bottom, margin.top]);
  const residual = scaleLinear()
    .domain([-limit * 1.1, limit * 1.1])
    .nice()
    .range([residualHeight - margin.bottom, margin.top]);
  return { x, y, residual };
}
