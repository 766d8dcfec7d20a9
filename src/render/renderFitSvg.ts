/**
 * The fit chart as one standalone SVG document, without a browser: the data (with ± uncertainty bars), the points
 * left out (open red rings), the fitted curve with its confidence and prediction bands, and below it the residuals
 * with the same bands drawn about the curve. Used as the page's picture when scripts do not run, in print, and by
 * `correlary fit --plot`. Scales and paths are those of chartScales and chartPaths, as in the browser chart
 * (written by fitChartScales and svgPaths, the same numbers and text at less cost).
 * O(n + curve rows).
 */
import { CHART_COLORS, CHART_LAYOUT } from './chartLayout.ts';
import { fitChartScales } from './fitChartScales.ts';
import { svgBandPath as bandPath, svgLinePath as linePath } from './svgPaths.ts';
import type { FitChartData, PointRow } from './chartTypes.ts';
import type { ChartScales } from './chartScales.ts';
import { escapeXml } from './escapeXml.ts';
import { c, svgAxes as axes } from './svgAxes.ts';
import { residualBandRows } from './residualBandRows.ts';

type Scale = ChartScales['x'];

/**
 * Dots as one path of zero-length round-capped segments: a tenth of the bytes of one circle per point. The points
 * are the rows whose columns `xColumn` and `yColumn` are finite (all for the data, those with a residual below),
 * placed by the scales `x` and `y`.
 */
function dots(rows: readonly PointRow[], x: Scale, y: Scale, yColumn: 2 | 3, color: string, diameter: number): string {
  let d = '';
  for (const row of rows) {
    const value = row[yColumn];
    if (yColumn === 3 && !Number.isFinite(value)) continue;
    d += `M${c(x(row[1]))},${c(y(value))}h0`;
  }
  return d === '' ? '' : `<path d="${d}" stroke="${color}" stroke-width="${diameter}" stroke-linecap="round" fill="none"/>`;
}

/** The ± uncertainty bars of the rows that have them, as one path's data. */
function bars(rows: readonly PointRow[], x: Scale, y: Scale): string {
  let d = '';
  for (const p of rows) if (p.length === 6) d += `M${c(x(p[1]))},${c(y(p[4]))}V${c(y(p[5]))}`;
  return d;
}

export interface RenderFitSvgOptions {
  /** Text of the SVG's <title>; defaults to a description of what is drawn. */
  readonly title?: string;
  /** Text of the SVG's <desc> (the cautions, the handbook), which travels with the file; none by default. */
  readonly description?: string;
}

/**
 * Render `data` as an SVG document (a string starting with "<svg").
 * @example renderFitSvg(data).startsWith('<svg') // => true
 */
export function renderFitSvg(data: FitChartData, options: RenderFitSvgOptions = {}): string {
  const { width, mainHeight, residualHeight, margin } = CHART_LAYOUT;
  const { x, y, residual } = fitChartScales(data);
  const level = Math.round(data.confidence * 100);
  const title = options.title ?? `Data and fitted curve with ${level} % confidence and prediction bands, and the residuals below`;
  const barPath = bars(data.points, x, y);
  const residualRows = residualBandRows(data.curve);
  const main = [
    `<path d="${bandPath(data.curve, x, y, 4, 5)}" fill="${CHART_COLORS.prediction}"/>`,
    `<path d="${bandPath(data.curve, x, y, 2, 3)}" fill="${CHART_COLORS.confidence}"/>`,
    axes(x, y, mainHeight, data.xLabel, data.yLabel, 6),
    `<path d="${linePath(data.curve, x, y, 1)}" fill="none" stroke="${CHART_COLORS.curve}" stroke-width="2"/>`,
    barPath === '' ? '' : `<path d="${barPath}" stroke="${CHART_COLORS.point}" stroke-width="1" fill="none"/>`,
    dots(data.points, x, y, 2, CHART_COLORS.point, 6),
    ...data.excluded.map((p) => `<circle cx="${c(x(p.x))}" cy="${c(y(p.y))}" r="4.5" fill="none" stroke="${CHART_COLORS.excluded}" stroke-width="1.5"><title>row ${p.row} left out: ${escapeXml(p.reason)}</title></circle>`),
  ].join('');
  const zero = c(residual(0));
  const lower = [
    `<path d="${bandPath(residualRows, x, residual, 3, 4)}" fill="${CHART_COLORS.prediction}"/>`,
    `<path d="${bandPath(residualRows, x, residual, 1, 2)}" fill="${CHART_COLORS.confidence}"/>`,
    axes(x, residual, residualHeight, data.xLabel, data.residualLabel, 4),
    `<line x1="${margin.left}" x2="${width - margin.right}" y1="${zero}" y2="${zero}" stroke="${CHART_COLORS.zero}" stroke-dasharray="4 3"/>`,
    dots(data.points, x, residual, 3, CHART_COLORS.point, 6),
  ].join('');
  const height = mainHeight + residualHeight;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-labelledby="fit-svg-title" font-family="system-ui, sans-serif" color="#1d232a">` +
    `<title id="fit-svg-title">${escapeXml(title)}</title>${options.description ? `<desc>${escapeXml(options.description)}</desc>` : ''}<rect width="${width}" height="${height}" fill="#fff"/>` +
    `<g class="fit-main">${main}</g><g class="fit-residuals" transform="translate(0,${mainHeight})">${lower}</g></svg>`
  );
}
