/**
 * Page entry of the fit charts: find every `[data-fit-chart]` figure, read its embedded chart data (or fetch it
 * from the file the figure names, for large data sets), draw it, and add zoom, hover read-out, the "as fitted"
 * switch of a transformed fit and, when the page has an order table with previews, the order preview. The static SVG picture is hidden once the chart is drawn.
 */
import { addChartCoordinates } from './chartCoordinates.ts';
import { addChartHover } from './chartHover.ts';
import { addChartZoom, type ChartZoom } from './chartZoom.ts';
import { drawFitChart, type FitChart, type FitChartData } from './fitChart.ts';

export interface MountedChart {
  readonly chart: FitChart;
  readonly zoom: ChartZoom;
}

let resolveReady: (charts: MountedChart[]) => void = () => undefined;
/** Resolves with the charts of this page once they are drawn, for the modules that act on them (order preview). */
export const chartsReady = new Promise<MountedChart[]>((resolve) => {
  resolveReady = resolve;
});

async function chartDataOf(figure: HTMLElement): Promise<FitChartData | null> {
  const source = figure.querySelector('script[type="application/json"]');
  if (source?.textContent) return JSON.parse(source.textContent) as FitChartData;
  const href = figure.dataset['chartHref'];
  if (!href) return null;
  const response = await fetch(href);
  if (!response.ok) throw new Error(`chart data ${href}: HTTP ${response.status}`);
  return (await response.json()) as FitChartData;
}

/** Draw every chart on the page; resolves when all are drawn. */
export async function mountFitCharts(root: ParentNode = document): Promise<MountedChart[]> {
  const charts: MountedChart[] = [];
  for (const figure of root.querySelectorAll<HTMLElement>('[data-fit-chart]')) {
    const target = figure.querySelector<HTMLElement>('.chart-target');
    if (!target) continue;
    try {
      const data = await chartDataOf(figure);
      if (data === null) continue;
      const chart = drawFitChart(target, data);
      addChartHover(chart);
      const zoom = addChartZoom(chart);
      addChartCoordinates(chart, zoom);
      target.removeAttribute('aria-hidden');
      figure.classList.add('chart-drawn');
      charts.push({ chart, zoom });
    } catch (caught) {
      target.textContent = 'The interactive plot could not be drawn; the static picture and the tables keep every number.';
      console.error(caught);
    }
  }
  resolveReady(charts);
  return charts;
}
