/**
 * Axes of a static SVG panel (the server-side counterpart of d3-axis): the frame, ticks and tick labels from the
 * scales' own ticks() and tickFormat(), as d3-axis chooses them in the browser, and the axis titles.
 */
import type { ScaleLinear } from 'd3-scale';
import { CHART_LAYOUT } from './chartLayout.ts';
import { escapeXml } from './escapeXml.ts';
import { hundredthsText } from './hundredthsText.ts';

type Scale = ScaleLinear<number, number>;

/** A coordinate with 2 decimals (hundredthsText). @example c(1.23456) // => "1.23" */
export function c(value: number): string {
  return hundredthsText(value);
}

/**
 * Axis lines, ticks, tick labels and the two axis titles of one panel of height `height`, as SVG text.
 * @example svgAxes(x, y, 340, 'T (K)', 'ρ (kg/m³)', 6).startsWith('<g') // => true
 */
export function svgAxes(x: Scale, y: Scale, height: number, xLabel: string, yLabel: string, yTicks: number): string {
  const { width, margin } = CHART_LAYOUT;
  const bottom = height - margin.bottom;
  const parts: string[] = [];
  const xFormat = x.tickFormat(8);
  parts.push(`<path stroke="currentColor" fill="none" d="M${margin.left},${bottom}H${width - margin.right}M${margin.left},${margin.top}V${bottom}"/>`);
  for (const tick of x.ticks(8)) {
    const px = c(x(tick));
    parts.push(`<line x1="${px}" x2="${px}" y1="${bottom}" y2="${bottom + 6}" stroke="currentColor"/><text x="${px}" y="${bottom + 18}" text-anchor="middle">${escapeXml(xFormat(tick))}</text>`);
  }
  const yFormat = y.tickFormat(yTicks);
  for (const tick of y.ticks(yTicks)) {
    const py = c(y(tick));
    parts.push(`<line x1="${margin.left - 6}" x2="${margin.left}" y1="${py}" y2="${py}" stroke="currentColor"/><text x="${margin.left - 9}" y="${py}" dy="0.32em" text-anchor="end">${escapeXml(yFormat(tick))}</text>`);
  }
  parts.push(`<text x="${c((margin.left + width - margin.right) / 2)}" y="${height - 8}" text-anchor="middle" font-size="12">${escapeXml(xLabel)}</text>`);
  parts.push(`<text transform="translate(14,${c((margin.top + bottom) / 2)}) rotate(-90)" text-anchor="middle" font-size="12">${escapeXml(yLabel)}</text>`);
  return `<g font-size="10">${parts.join('')}</g>`;
}

