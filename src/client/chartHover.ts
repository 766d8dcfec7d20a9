/**
 * Hover read-out of the fit chart: the nearest data point within 12 px (row, x, y, residual; or the reason it was
 * left out), else the curve and its bands at the pointer's x. Reads the chart's current (possibly zoomed) scales.
 */
import { pointer, select } from 'd3-selection';
import { CHART_COLORS, CHART_LAYOUT } from '../render/chartLayout.ts';
import type { FitChart } from './fitChart.ts';

const { width: WIDTH, mainHeight: MAIN_HEIGHT, margin: MARGIN } = CHART_LAYOUT;

/** Short number text for the read-out. @example short(1.23456789) // => "1.23457" */
function short(value: number | null | undefined): string {
  return typeof value === 'number' && Number.isFinite(value) ? String(Number(value.toPrecision(6))) : '—';
}

/** The read-out text and marker position for pointer position (px, py) in SVG units. */
function readOut(chart: FitChart, px: number, py: number, scale: number): { text: string; mx: number; my: number } | null {
  const { x, y } = chart.view;
  const { data } = chart;
  let best = 12 / Math.max(scale, 1e-6);
  let found: { text: string; mx: number; my: number } | null = null;
  for (const p of data.points) {
    const distance = Math.hypot(x(p[1]) - px, y(p[2]) - py);
    if (distance < best) {
      best = distance;
      found = { text: `row ${p[0]}: x = ${short(p[1])}, y = ${short(p[2])}, residual ${short(p[3])}`, mx: x(p[1]), my: y(p[2]) };
    }
  }
  for (const p of data.excluded) {
    const distance = Math.hypot(x(p.x) - px, y(p.y) - py);
    if (distance < best) {
      best = distance;
      found = { text: `row ${p.row} (left out: ${p.reason}): x = ${short(p.x)}, y = ${short(p.y)}`, mx: x(p.x), my: y(p.y) };
    }
  }
  if (found) return found;
  const target = x.invert(px);
  let nearest = data.curve[0];
  for (const row of data.curve) if (nearest === undefined || Math.abs(row[0] - target) < Math.abs(nearest[0] - target)) nearest = row;
  if (nearest === undefined || nearest[1] === null) return null;
  const level = Math.round(data.confidence * 100);
  return {
    text: `x = ${short(nearest[0])}: fit ${short(nearest[1])}, ${level} % confidence ${short(nearest[2])} to ${short(nearest[3])}, prediction ${short(nearest[4])} to ${short(nearest[5])}`,
    mx: x(nearest[0]),
    my: y(nearest[1]),
  };
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
      const left = Math.min(found.mx * scale + 10, box.width - 260);
      tip.style('display', null).style('left', `${Math.max(0, left)}px`).style('top', `${found.my * scale + 12}px`).text(found.text);
    })
    .on('pointerleave', hide);
}
