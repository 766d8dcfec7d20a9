/**
 * "As fitted" switch of the fit chart, for a transformed fit: redraws the data, the fitted line, its bands and the
 * residuals in the coordinates where the fit was made (e.g. ln(p / kPa) against 1/T), with the axis titles saying
 * so, and back. The fitted view is computed in the browser from the chart data already on the page
 * (render/fittedChartData.ts); zoom goes back to the whole chart, a previewed order follows.
 */
import type { ChartZoom } from './chartZoom.ts';
import type { FitChart } from './fitChart.ts';
import { quantityOf } from './chartHover.ts';

/** Add the switch to the chart's toolbar; nothing for an untransformed fit. */
export function addChartCoordinates(chart: FitChart, zoom: ChartZoom): HTMLInputElement | null {
  const fitted = chart.fitted;
  if (fitted === null) return null;
  const toolbar = chart.container.querySelector('.chart-toolbar') ?? chart.container;
  const label = document.createElement('label');
  label.className = 'chart-coordinates';
  const box = document.createElement('input');
  box.type = 'checkbox';
  box.dataset['fittedCoordinates'] = '';
  const axes = `${quantityOf(fitted.yLabel).symbol} against ${quantityOf(fitted.xLabel).symbol}`;
  label.append(box, ` as fitted: ${axes}`);
  label.title = `Show the data, the fitted curve, its bands and the residuals in the coordinates where the fit was made (${axes})`;
  toolbar.append(label);
  box.addEventListener('change', () => {
    chart.coordinates = box.checked ? 'fitted' : 'measured';
    chart.container.dataset['coordinates'] = chart.coordinates;
    chart.rescale();
    zoom.reset();
  });
  return box;
}
