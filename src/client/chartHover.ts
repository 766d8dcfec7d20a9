/**
 * Hover read-out of the fit chart: the nearest data point within 12 px (row, x, y, residual; or the reason it was
 * left out), else the curve and its bands at the pointer's x, each number with its unit (taken from the axis
 * titles, "name, symbol (unit)", so the read-out follows the coordinates shown). Reads the chart's current (possibly
 * zoomed) scales. The read-out box is kept inside the upper plot: it flips to the left of or above the pointer
 * near the right or bottom edge, and never wider than the plot.
 */
import { pointer, select } from 'd3-selection';
import { CHART_COLORS, CHART_LAYOUT } from '../render/chartLayout.ts';
import type { FitChart } from './fitChart.ts';

const { width: WIDTH, mainHeight: MAIN_HEIGHT, margin: MARGIN } = CHART_LAYOUT;
/** Gap between the pointer's mark and the read-out box, in CSS pixels. */
const GAP = 12;

/** Short number text for the read-out. @example short(1.23456789) // => "1.23457" */
function short(value: number | null | undefined): string {
  return typeof value === 'number' && Number.isFinite(value) ? String(Number(value.toPrecision(6))) : '—';
}

/**
 * Symbol and unit of an axis title "name, symbol (unit)" (chartData.ts writes them so; the unit is left out for a
 * dimensionless quantity). @example quantityOf('temperature, T (K)') // => { symbol: 'T', unit: ' K' }
 */
export function quantityOf(label: string): { symbol: string; unit: string } {
  const match = /^(?:.*, )?(.+?)(?: \((.+)\))?$/.exec(label);
  return { symbol: match?.[1] ?? label, unit: match?.[2] ? ` ${match[2]}` : '' };
}

/** The read-out lines and marker position for pointer position (px, py) in SVG units. */
function readOut(chart: FitChart, px: number, py: number, scale: number): { lines: string[]; mx: number; my: number } | null {
  const { x, y } = chart.view;
  const { data } = chart;
  const xq = quantityOf(data.xLabel);
  const yq = quantityOf(data.yLabel);
  const xText = (value: number) => `${xq.symbol} = ${short(value)}${xq.unit}`;
  const yText = (value: number) => `${yq.symbol} = ${short(value)}${yq.unit}`;
  let best = 12 / Math.max(scale, 1e-6);
  let found: { lines: string[]; mx: number; my: number } | null = null;
  for (const p of data.points) {
    const distance = Math.hypot(x(p[1]) - px, y(p[2]) - py);
    if (distance < best) {
      best = distance;
      found = { lines: [`row ${p[0]}`, xText(p[1]), yText(p[2]), `residual ${short(p[3])}${yq.unit}`], mx: x(p[1]), my: y(p[2]) };
    }
  }
  for (const p of data.excluded) {
    const distance = Math.hypot(x(p.x) - px, y(p.y) - py);
    if (distance < best) {
      best = distance;
      found = { lines: [`row ${p.row} (left out: ${p.reason})`, xText(p.x), yText(p.y)], mx: x(p.x), my: y(p.y) };
    }
  }
  if (found) return found;
  const target = x.invert(px);
  let nearest = data.curve[0];
  for (const row of data.curve) if (nearest === undefined || Math.abs(row[0] - target) < Math.abs(nearest[0] - target)) nearest = row;
  if (nearest === undefined || nearest[1] === null) return null;
  const level = Math.round(data.confidence * 100);
  return {
    lines: [
      xText(nearest[0]),
      `fit ${yText(nearest[1])}`,
      `${level} % confidence ${short(nearest[2])} to ${short(nearest[3])}${yq.unit}`,
      `${level} % prediction ${short(nearest[4])} to ${short(nearest[5])}${yq.unit}`,
    ],
    mx: x(nearest[0]),
    my: y(nearest[1]),
  };
}

/**
 * Where the read-out box goes: beside the mark (right and below), flipped to the other side where it would leave
 * the plot, and clamped into it. All in CSS pixels relative to the plot's box.
 * @example placeBeside(700, 20, 200, 60, 760, 340) // => { left: 488, top: 32 }
 */
export function placeBeside(mx: number, my: number, width: number, height: number, plotWidth: number, plotHeight: number): { left: number; top: number } {
  let left = mx + GAP;
  if (left + width > plotWidth) left = mx - GAP - width;
  let top = my + GAP;
  if (top + height > plotHeight) top = my - GAP - height;
  return { left: Math.max(0, Math.min(left, plotWidth - width)), top: Math.max(0, Math.min(top, plotHeight - height)) };
}

/** Add the read-out to `chart`. The overlay also receives the zoom's pointer events. */
export function addChartHover(chart: FitChart): void {
  const tip = select(chart.container).append('div').attr('class', 'chart-tooltip').style('display', 'none');
  const marker = chart.main.append('circle').attr('class', 'hover-marker').attr('r', 4).attr('fill', CHART_COLORS.curve).style('display', 'none');
  const hide = () => {
    tip.style('display', 'none');
    marker.style('display', 'none');
  };
  chart.listeners.push(hide);
  chart.main
    .append('rect')
    .attr('class', 'hover-overlay')
    .attr('x', MARGIN.left)
    .attr('y', MARGIN.top)
    .attr('width', WIDTH - MARGIN.left - MARGIN.right)
    .attr('height', MAIN_HEIGHT - MARGIN.top - MARGIN.bottom)
    .attr('fill', 'transparent')
    .on('pointermove', (event: PointerEvent) => {
      const [px, py] = pointer(event);
      const box = chart.main.node()!.getBoundingClientRect();
      const scale = box.width / WIDTH;
      const found = readOut(chart, px, py, scale);
      if (found === null) return hide();
      marker.attr('cx', found.mx).attr('cy', found.my).style('display', null);
      const element = tip.node()!;
      // Lay the text out at most as wide as the plot, then measure it and place it inside the plot's box.
      tip.style('display', null).style('max-width', `${Math.floor(box.width)}px`).style('left', '0px').style('top', '0px');
      element.textContent = found.lines.join('\n');
      const { width, height } = element.getBoundingClientRect();
      const origin = chart.container.getBoundingClientRect();
      const place = placeBeside(found.mx * scale, found.my * scale, width, height, box.width, box.height);
      tip.style('left', `${box.left - origin.left + place.left}px`).style('top', `${box.top - origin.top + place.top}px`);
    })
    .on('pointerleave', hide);
}
