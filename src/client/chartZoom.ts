/**
 * Zoom and pan of the fit chart (d3-zoom): wheel or pinch to zoom, drag to pan, on the upper plot; the residual
 * plot follows in x. Keyboard: with the plot focused, + and − zoom, arrow keys pan, 0 resets; the buttons above
 * the plot do the same. Redraws through the chart's own `redraw`, so nothing is scaled as a bitmap.
 */
import { select } from 'd3-selection';
import { zoom, zoomIdentity, type D3ZoomEvent, type ZoomBehavior } from 'd3-zoom';
import { CHART_LAYOUT } from '../render/chartLayout.ts';
import type { FitChart } from './fitChart.ts';

const { width: WIDTH, mainHeight: MAIN_HEIGHT, margin: MARGIN } = CHART_LAYOUT;
const STEP = 1.5;
const PAN = 40;

export interface ChartZoom {
  readonly behavior: ZoomBehavior<SVGSVGElement, unknown>;
  /** Back to the whole chart. */
  reset(): void;
}

function button(parent: HTMLElement, text: string, label: string, onClick: () => void): HTMLButtonElement {
  const element = document.createElement('button');
  element.type = 'button';
  element.textContent = text;
  element.setAttribute('aria-label', label);
  element.addEventListener('click', onClick);
  parent.append(element);
  return element;
}

/** Make `chart` zoomable; returns the behaviour and a reset. */
export function addChartZoom(chart: FitChart): ChartZoom {
  const svg = chart.main;
  const behavior = zoom<SVGSVGElement, unknown>()
    .scaleExtent([1, 64])
    .extent([
      [MARGIN.left, MARGIN.top],
      [WIDTH - MARGIN.right, MAIN_HEIGHT - MARGIN.bottom],
    ])
    .translateExtent([
      [MARGIN.left, MARGIN.top],
      [WIDTH - MARGIN.right, MAIN_HEIGHT - MARGIN.bottom],
    ])
    .on('zoom', (event: D3ZoomEvent<SVGSVGElement, unknown>) => {
      const t = event.transform;
      chart.view = { x: t.rescaleX(chart.base.x), y: t.rescaleY(chart.base.y), residual: chart.base.residual };
      chart.redraw();
      status.textContent = t.k === 1 ? 'whole chart' : `zoomed ×${Number(t.k.toPrecision(3))}`;
    });
  const toolbar = document.createElement('div');
  toolbar.className = 'chart-toolbar';
  const status = document.createElement('span');
  status.className = 'chart-zoom-status';
  status.setAttribute('aria-live', 'polite');
  status.textContent = 'whole chart';
  const reset = () => svg.call(behavior.transform, zoomIdentity);
  button(toolbar, '+', 'Zoom in', () => svg.call(behavior.scaleBy, STEP));
  button(toolbar, '−', 'Zoom out', () => svg.call(behavior.scaleBy, 1 / STEP));
  button(toolbar, 'Reset zoom', 'Reset zoom to the whole chart', reset).classList.add('chart-reset');
  toolbar.append(status);
  chart.container.prepend(toolbar);

  svg.call(behavior).on('dblclick.zoom', null);
  svg
    .attr('tabindex', 0)
    .attr('aria-label', `${svg.attr('aria-label')}. Focus the plot and use + and − to zoom, arrow keys to pan, 0 to reset.`)
    .on('keydown', (event: KeyboardEvent) => {
      const k = select<SVGSVGElement, unknown>(svg.node()!).property('__zoom')?.k ?? 1;
      const moves: Record<string, () => void> = {
        '+': () => svg.call(behavior.scaleBy, STEP),
        '=': () => svg.call(behavior.scaleBy, STEP),
        '-': () => svg.call(behavior.scaleBy, 1 / STEP),
        '0': reset,
        ArrowLeft: () => svg.call(behavior.translateBy, PAN / k, 0),
        ArrowRight: () => svg.call(behavior.translateBy, -PAN / k, 0),
        ArrowUp: () => svg.call(behavior.translateBy, 0, PAN / k),
        ArrowDown: () => svg.call(behavior.translateBy, 0, -PAN / k),
      };
      const move = moves[event.key];
      if (move === undefined) return;
      event.preventDefault();
      move();
    });
  return { behavior, reset };
}
