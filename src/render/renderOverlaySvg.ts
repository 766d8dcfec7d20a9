/**
 * Several correlations of one property on one static SVG, each over its own validity range with its prediction
 * band, so that a reviewer sees at once whether sources agree. Series are told apart by colour, dash pattern and a
 * numbered label at the curve's right end (never colour alone). Scales and paths as in the fit chart.
 * O(total curve rows).
 */
import { scaleLinear } from 'd3-scale';
import { CHART_LAYOUT } from './chartLayout.ts';
import { svgBandPath as bandPath, svgLinePath as linePath } from './svgPaths.ts';
import { paddedExtent } from './chartScales.ts';
import type { CurveRow } from './chartTypes.ts';
import { escapeXml } from './escapeXml.ts';
import { c, svgAxes } from './svgAxes.ts';

export interface OverlaySeries {
  /** Short label drawn at the curve's end, e.g. "1". */
  readonly label: string;
  /** Name for the SVG title of the series. */
  readonly name: string;
  readonly curve: readonly CurveRow[];
}

/** Colours for series (each ≥ 4.5:1 on white) and dash patterns, used in order. */
export const SERIES_COLORS = ['#1f5a8a', '#9a4a00', '#2d6a2d', '#7a3b8f', '#8a1c1c', '#00626b', '#5c5c00', '#4a4a4a'] as const;
export const SERIES_DASHES = ['', '8 4', '2 3', '10 3 2 3', '4 4', '12 4', '1 3', '6 2'] as const;

/**
 * @example renderOverlaySvg([{ label: '1', name: 'A', curve }], 'T (K)', 'c_p (J/(kg·K))').includes('data-series="1"') // => true
 */
export function renderOverlaySvg(series: readonly OverlaySeries[], xLabel: string, yLabel: string, title = 'Correlations of one property over their validity ranges'): string {
  const { width, mainHeight: height, margin } = CHART_LAYOUT;
  const right = margin.right + 24;
  const xs = series.flatMap((s) => s.curve.map((row) => row[0]));
  const ys = series.flatMap((s) => s.curve.flatMap((row) => row.slice(1).filter((v): v is number => v !== null && Number.isFinite(v))));
  const x = scaleLinear().domain(paddedExtent(xs)).range([margin.left, width - right]);
  const y = scaleLinear().domain(paddedExtent(ys)).nice().range([height - margin.bottom, margin.top]);
  const bands = series.map((s, i) => `<path d="${bandPath(s.curve, x, y, 4, 5)}" fill="${SERIES_COLORS[i % SERIES_COLORS.length]}" fill-opacity="0.14"/>`);
  const curves = series.map((s, i) => {
    const color = SERIES_COLORS[i % SERIES_COLORS.length];
    const dash = SERIES_DASHES[i % SERIES_DASHES.length];
    const last = [...s.curve].reverse().find((row) => row[1] !== null);
    const label = last ? `<text x="${c(x(last[0]) + 4)}" y="${c(y(last[1]!))}" dy="0.32em" font-size="12" font-weight="700" fill="${color}">${escapeXml(s.label)}</text>` : '';
    return `<g data-series="${escapeXml(s.label)}"><title>${escapeXml(`${s.label}: ${s.name}`)}</title><path d="${linePath(s.curve, x, y, 1)}" fill="none" stroke="${color}" stroke-width="2"${dash ? ` stroke-dasharray="${dash}"` : ''}/>${label}</g>`;
  });
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-label="${escapeXml(title)}" font-family="system-ui, sans-serif" color="#1d232a">` +
    `<rect width="${width}" height="${height}" fill="#fff"/>${bands.join('')}${svgAxes(x, y, height, xLabel, yLabel, 6)}${curves.join('')}</svg>`
  );
}
